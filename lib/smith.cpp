// Smith normal form over Z (lib/detail/smith.hpp): sparse unit-pivot elimination, then the
// classical dense algorithm on what is left.
#include "detail/smith.hpp"

#include <algorithm>
#include <queue>
#include <tuple>

#include "fourplat/error.hpp"

namespace fourplat::detail {

namespace {

void normalise(SparseRow& r) {
  std::sort(r.begin(), r.end(), [](const auto& a, const auto& b) { return a.first < b.first; });
  std::size_t w = 0;
  for (std::size_t i = 0; i < r.size();) {
    std::int64_t c = r[i].first;
    Integer v = 0;
    for (; i < r.size() && r[i].first == c; ++i) v += r[i].second;
    if (v != 0) r[w++] = {c, std::move(v)};
  }
  r.resize(w);
}

const Integer* find_entry(const SparseRow& r, std::int64_t c) {
  auto it = std::lower_bound(r.begin(), r.end(), c, [](const auto& e, std::int64_t x) { return e.first < x; });
  return it != r.end() && it->first == c ? &it->second : nullptr;
}

/// s − f·r for sorted rows; `added` receives the columns new to s.
SparseRow axpy(const SparseRow& s, const Integer& f, const SparseRow& r, std::vector<std::int64_t>& added) {
  SparseRow out;
  out.reserve(s.size() + r.size());
  std::size_t i = 0, j = 0;
  while (i < s.size() || j < r.size()) {
    if (j == r.size() || (i < s.size() && s[i].first < r[j].first)) {
      out.push_back(s[i++]);
    } else if (i == s.size() || r[j].first < s[i].first) {
      out.emplace_back(r[j].first, -f * r[j].second);
      added.push_back(r[j].first);
      ++j;
    } else {
      Integer v = s[i].second - f * r[j].second;
      if (v != 0) out.emplace_back(s[i].first, std::move(v));
      ++i;
      ++j;
    }
  }
  return out;
}

Integer abs_int(const Integer& x) { return x < 0 ? Integer(-x) : x; }

}  // namespace

SmithForm::SmithForm(std::int64_t cols, std::vector<SparseRow> rows) : cols_(cols) {
  const auto nrows = rows.size();
  for (auto& r : rows) normalise(r);

  // ---- Sparse phase: unit pivots in Markowitz order. ----
  std::vector<std::vector<std::size_t>> col_rows(static_cast<std::size_t>(cols));
  for (std::size_t i = 0; i < nrows; ++i)
    for (const auto& e : rows[i]) col_rows[static_cast<std::size_t>(e.first)].push_back(i);
  std::vector<char> row_alive(nrows, 1), col_alive(static_cast<std::size_t>(cols), 1);
  std::vector<std::uint32_t> stamp(nrows, 0);
  using Item = std::tuple<std::size_t, std::size_t, std::uint32_t>;  // (length, row, stamp)
  std::priority_queue<Item, std::vector<Item>, std::greater<>> heap;
  for (std::size_t i = 0; i < nrows; ++i) heap.emplace(rows[i].size(), i, 0);

  std::vector<std::int64_t> added;
  while (!heap.empty()) {
    auto [len, r, st] = heap.top();
    heap.pop();
    if (!row_alive[r] || st != stamp[r]) continue;
    if (rows[r].empty()) {  // a zero row says nothing
      row_alive[r] = 0;
      continue;
    }
    // The unit entry whose column meets the fewest rows.
    std::int64_t best = -1;
    std::size_t best_count = 0;
    for (const auto& e : rows[r]) {
      if (e.second != 1 && e.second != -1) continue;
      const std::size_t cnt = col_rows[static_cast<std::size_t>(e.first)].size();
      if (best < 0 || cnt < best_count) {
        best = e.first;
        best_count = cnt;
      }
    }
    if (best < 0) continue;  // stuck for now; re-queued if an update changes it
    const std::size_t j = static_cast<std::size_t>(best);
    const int piv = *find_entry(rows[r], best) == 1 ? 1 : -1;
    row_alive[r] = 0;
    col_alive[j] = 0;
    auto others = std::move(col_rows[j]);
    col_rows[j].clear();
    for (std::size_t s : others) {
      if (s == r || !row_alive[s]) continue;
      const Integer* v = find_entry(rows[s], best);
      if (v == nullptr) continue;  // a stale entry of the column list
      const Integer f = *v * piv;  // s − f·r clears column j since f·piv = v
      added.clear();
      rows[s] = axpy(rows[s], f, rows[r], added);
      for (std::int64_t c : added) col_rows[static_cast<std::size_t>(c)].push_back(s);
      heap.emplace(rows[s].size(), s, ++stamp[s]);
    }
    Substitution sub{best, piv, {}};
    for (auto& e : rows[r])
      if (e.first != best) sub.rest.push_back(std::move(e));
    rows[r].clear();
    subs_.push_back(std::move(sub));
    ++units_;
  }

  // ---- Dense phase on the rows and columns left. ----
  std::vector<std::int64_t> col_index(static_cast<std::size_t>(cols), -1);
  for (std::int64_t c = 0; c < cols; ++c)
    if (col_alive[static_cast<std::size_t>(c)]) {
      col_index[static_cast<std::size_t>(c)] = static_cast<std::int64_t>(dense_cols_.size());
      dense_cols_.push_back(c);
    }
  const std::size_t K = dense_cols_.size();
  std::vector<std::vector<Integer>> a;
  for (std::size_t i = 0; i < nrows; ++i) {
    if (!row_alive[i] || rows[i].empty()) continue;
    std::vector<Integer> row(K, Integer(0));
    for (const auto& e : rows[i]) row[static_cast<std::size_t>(col_index[static_cast<std::size_t>(e.first)])] = e.second;
    a.push_back(std::move(row));
  }
  v_.assign(K, std::vector<Integer>(K, Integer(0)));
  for (std::size_t i = 0; i < K; ++i) v_[i][i] = 1;
  const std::size_t R = a.size();
  auto col_op = [&](std::size_t dst, const Integer& f, std::size_t src) {  // col dst −= f·col src
    for (std::size_t i = 0; i < R; ++i)
      if (a[i][src] != 0) a[i][dst] -= f * a[i][src];
    for (std::size_t i = 0; i < K; ++i)
      if (v_[i][src] != 0) v_[i][dst] -= f * v_[i][src];
  };
  auto col_swap = [&](std::size_t x, std::size_t y) {
    if (x == y) return;
    for (auto& row : a) std::swap(row[x], row[y]);
    for (auto& row : v_) std::swap(row[x], row[y]);
  };
  bool rest_zero = false;
  for (std::size_t t = 0; t < std::min(R, K) && !rest_zero; ++t) {
    for (;;) {
      // The least non-zero entry of the remaining block becomes the pivot.
      std::size_t pi = R, pj = K;
      for (std::size_t i = t; i < R; ++i)
        for (std::size_t j = t; j < K; ++j)
          if (a[i][j] != 0 && (pi == R || abs_int(a[i][j]) < abs_int(a[pi][pj]))) {
            pi = i;
            pj = j;
          }
      if (pi == R) {  // the rest is zero
        rest_zero = true;
        break;
      }
      std::swap(a[t], a[pi]);
      col_swap(t, pj);
      bool clean = true;
      for (std::size_t i = t + 1; i < R; ++i) {
        if (a[i][t] == 0) continue;
        const Integer q = div_floor(a[i][t], a[t][t]);
        for (std::size_t j = t; j < K; ++j)
          if (a[t][j] != 0) a[i][j] -= q * a[t][j];
        if (a[i][t] != 0) clean = false;
      }
      for (std::size_t j = t + 1; j < K; ++j) {
        if (a[t][j] == 0) continue;
        const Integer q = div_floor(a[t][j], a[t][t]);
        col_op(j, q, t);
        if (a[t][j] != 0) clean = false;
      }
      if (!clean) continue;
      // Divisibility: d_t must divide every remaining entry, else fold that row in and repeat.
      bool divides = true;
      for (std::size_t i = t + 1; i < R && divides; ++i)
        for (std::size_t j = t + 1; j < K; ++j)
          if (a[i][j] % a[t][t] != 0) {
            for (std::size_t jj = t; jj < K; ++jj) a[t][jj] += a[i][jj];
            divides = false;
            break;
          }
      if (divides) break;
    }
    if (!rest_zero) dense_factors_.push_back(abs_int(a[t][t]));
  }
  for (const auto& d : dense_factors_)
    if (d != 1) dense_factors_nonunit_.push_back(d);
}

std::vector<Integer> SmithForm::invariant_factors() const {
  std::vector<Integer> out(static_cast<std::size_t>(units_), Integer(1));
  out.insert(out.end(), dense_factors_.begin(), dense_factors_.end());
  return out;
}

Integer SmithForm::count_solutions_mod(const Integer& n) const {
  if (n <= 0) throw DomainError("modulus must be positive, got " + to_string(n));
  Integer count = 1;
  for (const auto& d : dense_factors_nonunit_) count *= gcd(n, d);
  for (std::int64_t k = rank(); k < cols_; ++k) count *= n;
  return count;
}

std::vector<std::vector<Integer>> SmithForm::solution_generators_mod(const Integer& n) const {
  if (n <= 0) throw DomainError("modulus must be positive, got " + to_string(n));
  std::vector<std::vector<Integer>> gens;
  const std::size_t K = dense_cols_.size();
  for (std::size_t t = 0; t < K; ++t) {
    Integer scale;
    if (t < dense_factors_.size()) {
      const Integer g = gcd(n, dense_factors_[t]);
      if (g == 1) continue;
      scale = n / g;
    } else {
      scale = 1;  // a free direction
    }
    std::vector<Integer> x(static_cast<std::size_t>(cols_), Integer(0));
    for (std::size_t i = 0; i < K; ++i)
      x[static_cast<std::size_t>(dense_cols_[i])] = mod_floor(scale * v_[i][t], n);
    for (auto it = subs_.rbegin(); it != subs_.rend(); ++it) {  // back-substitute
      Integer s = 0;
      for (const auto& e : it->rest) s += e.second * x[static_cast<std::size_t>(e.first)];
      x[static_cast<std::size_t>(it->col)] = mod_floor(it->pivot == 1 ? Integer(-s) : s, n);
    }
    gens.push_back(std::move(x));
  }
  return gens;
}

}  // namespace fourplat::detail
