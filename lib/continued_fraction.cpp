// Continued fractions in standard and Conway order; see fourplat/continued_fraction.hpp.
#include "fourplat/continued_fraction.hpp"

#include <algorithm>
#include <cassert>
#include <cstdint>
#include <string>
#include <utility>

#include "detail/word.hpp"

namespace fourplat {

namespace {

using detail::word_of;

// ---------------------------------------------------------------------------------------------
// Values: products of 2×2 matrices.
//
// [a0; a1, ..., an] = p/q where (p p'; q q') = M(a0)·M(a1)···M(an), M(a) = (a 1; 1 0)
// (Euler–Wallis recurrence). The determinant is ±1, so p and q are coprime and never both zero;
// this also gives the projective convention x + 1/0 = ∞, 1/∞ = 0 for free.
// For the negative expansion the factor is N(b) = (b −1; 1 0) (determinant 1).
// ---------------------------------------------------------------------------------------------

struct Mat {
  Integer a, b, c, d;  // (a b; c d)
};

Mat multiply(const Mat& x, const Mat& y) {
  return {x.a * y.a + x.b * y.c, x.a * y.b + x.b * y.d, x.c * y.a + x.d * y.c,
          x.c * y.b + x.d * y.d};
}

// Product of the factors (t s; 1 0) for the terms t (read backwards when `reversed`, for
// Conway's order), with s = +1 (regular) or −1 (negative expansion). Runs of terms are packed
// greedily into int64 matrices with checked arithmetic (no allocation per term); a term that
// does not fit a word becomes its own factor.
std::vector<Mat> leaf_products(std::span<const Integer> terms, std::int64_t s, bool reversed) {
  std::vector<Mat> out;
  out.reserve(terms.size() / 4 + 1);
  std::int64_t a = 1, b = 0, c = 0, d = 1;  // the current packed word matrix
  bool open = false;
  auto flush = [&] {
    if (open) out.push_back({Integer(a), Integer(b), Integer(c), Integer(d)});
    a = 1, b = 0, c = 0, d = 1;
    open = false;
  };
  const std::size_t n = terms.size();
  for (std::size_t i = 0; i < n; ++i) {
    const Integer& t = terms[reversed ? n - 1 - i : i];
    const auto w = word_of(t);
    if (w) {
      // (a b; c d)·(t s; 1 0) = (a·t + b, s·a; c·t + d, s·c); s·a and s·c fail only at INT64_MIN.
      std::int64_t na, nb, nc, nd;
      if (detail::try_mul_add(a, *w, b, na) && detail::try_mul_add(c, *w, d, nc) &&
          detail::try_mul(s, a, nb) && detail::try_mul(s, c, nd)) {
        a = na, b = nb, c = nc, d = nd;
        open = true;
        continue;
      }
      flush();
      a = *w, b = s, c = 1, d = 0;  // start a new word matrix with this factor alone
      open = true;
      continue;
    }
    flush();
    out.push_back({t, Integer(s), Integer(1), Integer(0)});
  }
  flush();
  return out;
}

// Balanced product tree: multiply neighbours pairwise until one matrix is left. Each level
// halves the count, so the sizes stay balanced and GMP's subquadratic multiplication does the
// work: O(M(N) log N) for an N-bit result, against O(N²) for the sequential recurrence.
// Returns (p, q) normalised as a Fraction is (q ≥ 0; ∞ as 1/0); coprime since det = ±1.
// Short sequences of word terms whose value fits a word: the recurrence on checked int64, with
// no allocation; nullopt as soon as anything does not fit.
std::optional<ValueParts> word_parts(std::span<const Integer> terms, std::int64_t s,
                                     bool reversed) {
  if (terms.size() > 64) return std::nullopt;
  // Back to front: (p, q) ← (t·p + s·q, p), from (t_last, 1).
  std::int64_t p = 1, q = 0;
  const std::size_t n = terms.size();
  for (std::size_t i = n; i-- > 0;) {
    const auto t = word_of(terms[reversed ? n - 1 - i : i]);
    std::int64_t sq, np;
    if (!t || !detail::try_mul(s, q, sq) || !detail::try_mul_add(*t, p, sq, np)) return std::nullopt;
    q = p;
    p = np;
  }
  if (q < 0) {
    if (!detail::try_neg(p, p) || !detail::try_neg(q, q)) return std::nullopt;
  } else if (q == 0) {
    p = 1;
  }
  return ValueParts{Integer(p), Integer(q)};
}

ValueParts tree_parts(std::span<const Integer> terms, std::int64_t s, bool reversed) {
  if (terms.empty()) throw DomainError("the value of an empty continued fraction is undefined");
  if (auto w = word_parts(terms, s, reversed)) return std::move(*w);
  std::vector<Mat> level = leaf_products(terms, s, reversed);
  while (level.size() > 2) {
    std::vector<Mat> next;
    next.reserve(level.size() / 2 + 1);
    for (std::size_t i = 0; i + 1 < level.size(); i += 2)
      next.push_back(multiply(level[i], level[i + 1]));
    if (level.size() % 2 == 1) next.push_back(std::move(level.back()));
    level = std::move(next);
  }
  ValueParts r;
  if (level.size() == 1) {
    r.numerator = std::move(level[0].a);
    r.denominator = std::move(level[0].c);
  } else {  // last step: only the first column of the product is needed
    const Mat& x = level[0];
    const Mat& y = level[1];
    r.numerator = x.a * y.a + x.b * y.c;
    r.denominator = x.c * y.a + x.d * y.c;
  }
  if (r.denominator < 0) {
    r.numerator = -r.numerator;
    r.denominator = -r.denominator;
  } else if (r.denominator == 0) {
    r.numerator = 1;  // ±1/0: the one point ∞
  }
  return r;
}

Fraction tree_value(std::span<const Integer> terms, std::int64_t s, bool reversed) {
  ValueParts r = tree_parts(terms, s, reversed);
  // Fraction's constructor spends a gcd (coprimality is already known here).
  return Fraction(std::move(r.numerator), std::move(r.denominator));
}

// ---------------------------------------------------------------------------------------------
// Expansions.
// ---------------------------------------------------------------------------------------------

// ---------------------------------------------------------------------------------------------
// Fast regular expansion: half-gcd divide and conquer with exact verification.
//
// Subtractive Euclid on a pair (A, B) of positive integers applies R: (A, B) → (A − B, B) when
// A > B and L: (A, B) → (A, B − A) when B > A; the run lengths of R and L are the partial
// quotients. In matrix form (A; B) = M (α; β) with M a product of R = (1 1; 0 1) and
// L = (1 0; 1 1). Every matrix of SL2(Z) with non-negative entries is such a product in exactly
// one way, and if M⁻¹(A; B) is positive then the product is a prefix of the Euclid sequence of
// (A, B) (the first factor must be R when A > B, since L would make B > A; induct). So a
// candidate reduction is exact as soon as its remainders are positive — that is the check that
// makes every shortcut below safe, whatever heuristics chose it.
//
// The reduction of a pair is kept "safe" by the condition
//     P(M, α, β):   α ≥ v  and  β ≥ w     for M = (u v; w x),
// which is monotone along the Euclid sequence (remainders only drop, entries only grow), so
// the admissible reductions form a prefix. Lemma (after Möller, "On Schönhage's algorithm and
// subquadratic integer gcd computation", Math. Comp. 77, 2008): if (a; b) = M (α; β) with P,
// and A = 2^k a + a', B = 2^k b + b' with 0 ≤ a', b' < 2^k, then M⁻¹(A; B) = 2^k (α; β) +
// (x a' − v b'; u b' − w a') is positive, because x a' − v b' > −2^k v ≥ −2^k α. So a matrix
// computed from the leading bits is a valid prefix for the whole numbers.
//
// hgcd(a, b) reduces (a, b) as far as P allows (about half their size): twice on the leading
// half recursively (Knuth–Schönhage), and near the end by Lehmer steps on the leading 62 bits
// in machine words (Lehmer 1938), each step again limited by P. After composing, P is checked
// on the exact remainders and, should the composite overshoot, steps are undone from the end
// ("correction steps"). Cost O(M(n) log n) against O(n²) for plain Euclid.
// ---------------------------------------------------------------------------------------------

namespace hgcd {

using detail::mpz;

// The runs found so far: q times R (al −= q·be) or q times L (be −= q·al). Neighbouring runs
// may share a side (a partial quotient split across levels); they are merged at the end.
// Quotients that fit a word are kept as words (almost all of them: Gauss–Kuzmin), the rare
// big ones in a side list, so that recording a quotient does not allocate.
class Runs {
 public:
  explicit Runs(std::size_t expected) { runs_.reserve(expected); }
  std::size_t size() const noexcept { return runs_.size(); }
  bool empty() const noexcept { return runs_.empty(); }
  bool back_is_r() const noexcept { return runs_.back().r_side; }
  void push(std::uint64_t q, bool r_side) { runs_.push_back({q, r_side, false}); }
  void push(Integer q, bool r_side) {
    if (mpz_fits_ulong_p(mpz(q)) != 0) return push(mpz_get_ui(mpz(q)), r_side);
    big_.push_back(std::move(q));
    runs_.push_back({0, r_side, true});
  }
  void pop() {
    if (runs_.back().big) big_.pop_back();
    runs_.pop_back();
  }
  // target += sign·q·factor for the last run's q.
  void addmul_back(mpz_ptr target, mpz_srcptr factor, bool add) const {
    const Run& r = runs_.back();
    if (r.big) {
      (add ? mpz_addmul : mpz_submul)(target, mpz(big_.back()), factor);
    } else {
      (add ? mpz_addmul_ui : mpz_submul_ui)(target, factor, r.q);
    }
  }
  // The partial quotients, merging runs of one side (the first run is R).
  void append_terms(Terms& out) {
    bool have = false, side = true;
    std::size_t b = 0;
    for (const Run& r : runs_) {
      Integer q = r.big ? std::move(big_[b++]) : Integer(r.q);
      if (q == 0) continue;
      if (have && r.r_side == side) {
        out.back() += q;
      } else {
        out.push_back(std::move(q));
        side = r.r_side;
        have = true;
      }
    }
  }

 private:
  struct Run {
    std::uint64_t q;
    bool r_side;
    bool big;  // q is big_.back()-ordered: the i-th big run holds big_[i]
  };
  std::vector<Run> runs_;
  std::vector<Integer> big_;
};

// (A; B) = M (al; be) with M = (u v; w x), det M = 1, non-negative entries; t0..t5 scratch.
struct State {
  Integer al, be;
  Integer u{1}, v{0}, w{0}, x{1};
  Integer t0, t1, t2, t3, t4, t5;
};

std::size_t bits(const Integer& z) { return mpz_sizeinbase(mpz(z), 2); }

bool safe(const State& s) { return s.al >= s.v && s.be >= s.w; }

// ⌊z / 2^k⌋ for z ≥ 0 when it fits in 64 bits, read straight from the limbs.
std::uint64_t top_word(const Integer& z, std::size_t k) {
  mpz_srcptr p = mpz(z);
  const auto n = static_cast<std::size_t>(mpz_size(p));
  const std::size_t limb = k / 64, off = k % 64;
  if (limb >= n) return 0;
  std::uint64_t lo = mpz_getlimbn(p, static_cast<mp_size_t>(limb)) >> off;
  if (off != 0 && limb + 1 < n)
    lo |= mpz_getlimbn(p, static_cast<mp_size_t>(limb + 1)) << (64 - off);
  return lo;
}

void apply_r(State& s, const Integer& j) {
  mpz_submul(mpz(s.al), mpz(j), mpz(s.be));
  mpz_addmul(mpz(s.v), mpz(j), mpz(s.u));
  mpz_addmul(mpz(s.x), mpz(j), mpz(s.w));
}
void apply_l(State& s, const Integer& j) {
  mpz_submul(mpz(s.be), mpz(j), mpz(s.al));
  mpz_addmul(mpz(s.u), mpz(j), mpz(s.v));
  mpz_addmul(mpz(s.w), mpz(j), mpz(s.x));
}
// Undo the last run and drop it.
void undo_back(State& s, Runs& runs) {
  if (runs.back_is_r()) {
    runs.addmul_back(mpz(s.al), mpz(s.be), true);
    runs.addmul_back(mpz(s.v), mpz(s.u), false);
    runs.addmul_back(mpz(s.x), mpz(s.w), false);
  } else {
    runs.addmul_back(mpz(s.be), mpz(s.al), true);
    runs.addmul_back(mpz(s.u), mpz(s.v), false);
    runs.addmul_back(mpz(s.w), mpz(s.x), false);
  }
  runs.pop();
}

// The longest single run that keeps P: for an R-run, al − j·be ≥ v + j·u gives
// j = ⌊(al − v)/(be + u)⌋ (never above the true quotient ⌊al/be⌋). Returns false if j = 0.
bool direct_step(State& s, Runs& runs) {
  Integer& j = s.t0;
  if (s.al > s.be) {
    mpz_sub(mpz(s.t1), mpz(s.al), mpz(s.v));
    mpz_add(mpz(s.t2), mpz(s.be), mpz(s.u));
    mpz_fdiv_q(mpz(j), mpz(s.t1), mpz(s.t2));
    if (j == 0) return false;
    apply_r(s, j);
    runs.push(j, true);
  } else if (s.be > s.al) {
    mpz_sub(mpz(s.t1), mpz(s.be), mpz(s.w));
    mpz_add(mpz(s.t2), mpz(s.al), mpz(s.x));
    mpz_fdiv_q(mpz(j), mpz(s.t1), mpz(s.t2));
    if (j == 0) return false;
    apply_l(s, j);
    runs.push(j, false);
  } else {
    return false;
  }
  return true;
}

// Undo runs until P holds again, then redo the longest safe part of the last undone run.
// P held when there were `first` runs, so the undoing stops there at the latest.
void correct(State& s, Runs& runs, std::size_t first) {
  if (safe(s)) return;
  while (!safe(s) && runs.size() > first) undo_back(s, runs);
  (void)direct_step(s, runs);  // P-limited, so it cannot overshoot again
}

// One Lehmer step: run the P-limited Euclid on the leading t ≤ 62 bits in words (P on the
// words makes the word matrix valid for the whole pair, by the lemma), apply the word matrix
// with single-limb multiplications, then correct against P for the whole state.
void lehmer_step(State& s, Runs& runs, std::size_t t, std::size_t first) {
  const std::size_t n = std::max(bits(s.al), bits(s.be));
  const std::size_t k = n > t ? n - t : 0;
  std::uint64_t a = top_word(s.al, k), b = top_word(s.be, k);
  std::uint64_t U = 1, V = 0, W = 0, X = 1;
  const std::size_t mark = runs.size();
  // Word invariants: a, b < 2^62 and every entry ≤ the original top words, so b + U, a + X
  // and the updates below stay below 2^63.
  while (true) {
    if (a > b) {
      if (a - V < b + U) break;
      const std::uint64_t j = (a - V) / (b + U);
      a -= j * b, V += j * U, X += j * W;
      runs.push(j, true);
    } else if (b > a) {
      if (b - W < a + X) break;
      const std::uint64_t j = (b - W) / (a + X);
      b -= j * a, U += j * V, W += j * X;
      runs.push(j, false);
    } else {
      break;
    }
  }
  if (runs.size() == mark) return;
  // (al; be) ← (X·al − V·be; U·be − W·al);  M ← M·(U V; W X).
  mpz_mul_ui(mpz(s.t0), mpz(s.al), X);
  mpz_submul_ui(mpz(s.t0), mpz(s.be), V);
  mpz_mul_ui(mpz(s.t1), mpz(s.be), U);
  mpz_submul_ui(mpz(s.t1), mpz(s.al), W);
  mpz_swap(mpz(s.al), mpz(s.t0));
  mpz_swap(mpz(s.be), mpz(s.t1));
  mpz_mul_ui(mpz(s.t0), mpz(s.u), U);
  mpz_addmul_ui(mpz(s.t0), mpz(s.v), W);
  mpz_mul_ui(mpz(s.t1), mpz(s.u), V);
  mpz_addmul_ui(mpz(s.t1), mpz(s.v), X);
  mpz_mul_ui(mpz(s.t2), mpz(s.w), U);
  mpz_addmul_ui(mpz(s.t2), mpz(s.x), W);
  mpz_mul_ui(mpz(s.t3), mpz(s.w), V);
  mpz_addmul_ui(mpz(s.t3), mpz(s.x), X);
  mpz_swap(mpz(s.u), mpz(s.t0));
  mpz_swap(mpz(s.v), mpz(s.t1));
  mpz_swap(mpz(s.w), mpz(s.t2));
  mpz_swap(mpz(s.x), mpz(s.t3));
  correct(s, runs, first);
}

// Below this many leading bits a recursive call does not pay; Lehmer steps take over.
constexpr std::size_t kRecurseBits = 1200;
// Operand sizes differing by this many bits mean a big quotient: one direct division instead.
constexpr std::size_t kDirectGap = 32;

// Reduce s (which starts with M = I) as far as P allows; appends the runs to `runs`.
void reduce(State& s, Runs& runs) {
  const std::size_t first = runs.size();
  const std::size_t n0 = std::max(bits(s.al), bits(s.be));
  while (true) {
    const std::size_t big = std::max(bits(s.al), bits(s.be));
    const std::size_t small = std::min(bits(s.al), bits(s.be));
    if (big - small >= kDirectGap) {
      if (!direct_step(s, runs)) return;
      continue;
    }
    const std::size_t e = std::max({bits(s.u), bits(s.v), bits(s.w), bits(s.x)});
    // P allows roughly (small − e)/2 more bits of reduction (remainders shrink as entries grow).
    const std::size_t room = small > e + 2 ? (small - e - 2) / 2 : 0;
    if (room < 2) {
      if (!direct_step(s, runs)) return;
      continue;
    }
    // Leading part for the recursive call: at most half of the original size (so the call
    // really is smaller), at most 2·room minus a margin (so it does not overshoot P).
    const std::size_t sub = std::min((n0 + 1) / 2, 2 * room > 64 ? 2 * room - 32 : 0);
    // P held before each attempt, so a correction never goes below `mark`: an attempt made
    // progress exactly when runs remain above it. Otherwise one direct step.
    const std::size_t mark = runs.size();
    if (sub < kRecurseBits) {
      lehmer_step(s, runs, std::min<std::size_t>(62, 2 * room), first);
      if (runs.size() == mark && !direct_step(s, runs)) return;
      continue;
    }
    const std::size_t k = big - sub;
    State t;
    mpz_fdiv_q_2exp(mpz(t.al), mpz(s.al), k);
    mpz_fdiv_q_2exp(mpz(t.be), mpz(s.be), k);
    reduce(t, runs);
    if (runs.size() == mark) {
      if (!direct_step(s, runs)) return;
      continue;
    }
    // New remainders from the low parts: (al; be) = 2^k (t.al; t.be) + T⁻¹(al_lo; be_lo),
    // T⁻¹ = (x −v; −w u). Positive by the lemma.
    mpz_fdiv_r_2exp(mpz(s.t0), mpz(s.al), k);
    mpz_fdiv_r_2exp(mpz(s.t1), mpz(s.be), k);
    mpz_mul_2exp(mpz(s.al), mpz(t.al), k);
    mpz_addmul(mpz(s.al), mpz(t.x), mpz(s.t0));
    mpz_submul(mpz(s.al), mpz(t.v), mpz(s.t1));
    mpz_mul_2exp(mpz(s.be), mpz(t.be), k);
    mpz_addmul(mpz(s.be), mpz(t.u), mpz(s.t1));
    mpz_submul(mpz(s.be), mpz(t.w), mpz(s.t0));
    // M ← M·T.
    mpz_mul(mpz(s.t0), mpz(s.u), mpz(t.u));
    mpz_addmul(mpz(s.t0), mpz(s.v), mpz(t.w));
    mpz_mul(mpz(s.t1), mpz(s.u), mpz(t.v));
    mpz_addmul(mpz(s.t1), mpz(s.v), mpz(t.x));
    mpz_mul(mpz(s.t2), mpz(s.w), mpz(t.u));
    mpz_addmul(mpz(s.t2), mpz(s.x), mpz(t.w));
    mpz_mul(mpz(s.t3), mpz(s.w), mpz(t.v));
    mpz_addmul(mpz(s.t3), mpz(s.x), mpz(t.x));
    mpz_swap(mpz(s.u), mpz(s.t0));
    mpz_swap(mpz(s.v), mpz(s.t1));
    mpz_swap(mpz(s.w), mpz(s.t2));
    mpz_swap(mpz(s.x), mpz(s.t3));
    correct(s, runs, first);
    if (runs.size() == mark && !direct_step(s, runs)) return;
  }
}

// Partial quotients of A/B for A > B > 0 coprime (the terms a1, ..., an of the regular
// expansion), appended to `out`.
void expand(Integer A, Integer B, Terms& out) {
  // About 0.584 quotients a bit (Lévy's constant: log2 of the growth is π²/(12 ln 2)·log2 e).
  const std::size_t expected = bits(B) * 6 / 10 + 16;
  Runs runs(expected);
  out.reserve(out.size() + expected);
  Integer q;
  auto full_step = [&](Integer& big, const Integer& small, bool r_side) {
    mpz_fdiv_qr(mpz(q), mpz(big), mpz(big), mpz(small));
    runs.push(q, r_side);
  };
  while (B != 0 && A != 0) {
    const std::size_t na = bits(A), nb = bits(B);
    if (na <= 64 && nb <= 64) {
      // Word Euclid to the end. A tie (1, 1) could only be the very last step: it extends
      // the previous run, so that the last quotient is ≥ 2 as the regular expansion requires.
      std::uint64_t a = top_word(A, 0), b = top_word(B, 0);
      bool side = runs.empty() || runs.back_is_r();
      while (a != 0 && b != 0) {
        if (a != b) side = a > b;
        if (side) {
          runs.push(a / b, true);
          a %= b;
        } else {
          runs.push(b / a, false);
          b %= a;
        }
      }
      break;
    }
    if (std::max(na, nb) - std::min(na, nb) >= kDirectGap) {
      if (A > B) full_step(A, B, true); else full_step(B, A, false);
      continue;
    }
    State s;
    mpz_swap(mpz(s.al), mpz(A));
    mpz_swap(mpz(s.be), mpz(B));
    const std::size_t mark = runs.size();
    reduce(s, runs);
    mpz_swap(mpz(s.al), mpz(A));
    mpz_swap(mpz(s.be), mpz(B));
    if (runs.size() == mark) {
      if (A > B) full_step(A, B, true); else full_step(B, A, false);
    }
  }
  runs.append_terms(out);
}

}  // namespace hgcd

// Longest expansion built in memory (2^26 Integers ≈ 1 GiB): beyond it, LimitError.
constexpr std::uint64_t kMaxTerms = std::uint64_t{1} << 26;

[[noreturn]] void throw_infinite(const char* what) {
  throw DomainError(std::string("∞ has no ") + what + " (it needs a finite fraction)");
}

// Plain Euclid on p/q (q > 0): the regular expansion, one division a step.
Terms euclid(Integer p, Integer q) {
  Terms out;
  Integer a, r;
  // a0 = ⌊p/q⌋ (floor, so that the remainder is in [0, q)).
  a = div_floor(p, q);
  r = p - a * q;
  out.push_back(a);
  p = std::move(q);
  q = std::move(r);
  while (q != 0) {
    boost::multiprecision::divide_qr(p, q, a, r);
    out.push_back(a);
    p = std::move(q);
    q = std::move(r);
  }
  return out;
}

Terms regular_expansion_impl(const Fraction& x) {
  if (x.is_infinite()) throw_infinite("regular continued fraction");
  const auto wp = word_of(x.numerator());
  const auto wq = word_of(x.denominator());
  Terms out;
  if (wp && wq) {  // word path: Euclid on machine words, no Integer arithmetic
    std::int64_t a0 = 0;
    (void)detail::try_floor_div(*wp, *wq, a0);  // q > 0, so it cannot fail
    out.emplace_back(a0);
    const auto r = static_cast<std::uint64_t>(detail::floor_mod(*wp, *wq));
    if (r != 0)
      detail::for_each_partial_quotient(static_cast<std::uint64_t>(*wq), r,
                                        [&](std::uint64_t a) { out.emplace_back(a); });
    return out;
  }
  // a0 = ⌊p/q⌋ and r in [0, q); then the half-gcd expansion of q/r.
  Integer a0, r;
  mpz_fdiv_qr(detail::mpz(a0), detail::mpz(r), detail::mpz(x.numerator()),
              detail::mpz(x.denominator()));
  out.push_back(std::move(a0));
  if (r != 0) hgcd::expand(x.denominator(), std::move(r), out);
  return out;
}

// Standard-order terms of |x| for x finite; shared by the canonical form and the crossings.
Terms abs_expansion(const Fraction& x) {
  if (x.sign() >= 0) return regular_expansion_impl(x);
  return regular_expansion_impl(-x);
}

}  // namespace

Terms regular_expansion(const Fraction& x) { return regular_expansion_impl(x); }

Fraction standard_value(std::span<const Integer> terms) { return tree_value(terms, 1, false); }

ValueParts standard_value_parts(std::span<const Integer> terms) {
  return tree_parts(terms, 1, false);
}

Fraction twist_value(std::span<const Integer> twists) {
  if (twists.empty()) throw DomainError("the value of an empty twist sequence is undefined");
  return tree_value(twists, 1, true);
}

TwistSequence canonical_twists(const Fraction& x) {
  // Kauffman–Lambropoulou 2004: expand |x| regularly, fix the parity with
  // [..., a] = [..., a − 1, 1] (a ≥ 2 is the last regular term), read backwards, and give every
  // term the sign of x.
  TwistSequence out;
  if (x.is_infinite()) {
    out.twists = {Integer(0), Integer(0)};
    return out;
  }
  Terms t = abs_expansion(x);
  if (t.size() % 2 == 0) {
    t.back() -= 1;
    t.emplace_back(1);
  }
  std::reverse(t.begin(), t.end());
  if (x.sign() < 0)
    for (Integer& a : t) a = -a;
  out.twists = std::move(t);
  return out;
}

namespace {

// The all-even expansion read off the regular expansion of |x|, with runs compressed.
// Each step of the direct method takes the even a with |y − a| < 1 (unique unless y is an odd
// integer, where no expansion exists) and continues with 1/(y − a). On y = [h; b1, b2, ...]:
//   h even:            emit h, continue with [b1; b2, ...];
//   h odd, h ≥ 3:      emit h + 1, continue with −w/(w − 1) for w = [b1; ...], i.e. with
//                      −[1; b1 − 1, b2, ...] (b1 > 1) or −[b2 + 1; b3, ...] (b1 = 1);
//   h = 1, b1 = m:     the same rule m times in a row emits 2, −2, 2, ... (m terms) and
//                      continues with ±[b2 + 1; b3, ...].
// Signs alternate as the case says (the rule is odd: the expansion of −y is minus that of y).
// The length can be exponential in the size of x (N/(N − 1) gives N − 1 terms), so a first
// pass counts it and a second builds it. The walk on the terms is O(number of terms).
template <class Emit>
bool walk_even(Terms stack, Emit&& emit) {  // stack: the regular terms of |x|, last first
  bool negative = false;
  while (true) {
    Integer h = std::move(stack.back());
    stack.pop_back();
    if (stack.empty()) {  // y = h, an integer
      if (h % 2 != 0) return false;
      emit(h, negative, 1);
      return true;
    }
    if (h % 2 == 0) {
      emit(h, negative, 1);
      continue;
    }
    if (h != 1) {
      emit(h + 1, negative, 1);
      negative = !negative;
      if (stack.back() > 1) {
        stack.back() -= 1;
        stack.emplace_back(1);  // the next head is 1
      } else {
        stack.pop_back();       // b1 = 1, never the last regular term
        stack.back() += 1;
      }
      continue;
    }
    // h = 1: a run of m alternating twos.
    Integer m = std::move(stack.back());
    stack.pop_back();
    emit(Integer(2), negative, m);
    if (m % 2 != 0) negative = !negative;
    if (stack.empty()) return true;
    stack.back() += 1;
  }
}

}  // namespace

std::optional<Terms> even_expansion(const Fraction& x) {
  if (x.is_infinite()) throw_infinite("all-even continued fraction");
  // Subtracting an even number keeps the parities of p and q and inversion swaps them, and the
  // direct method ends at 0/1: so an expansion exists exactly when p or q is even.
  if (x.numerator() % 2 != 0 && x.denominator() % 2 != 0) return std::nullopt;
  Terms regular = abs_expansion(x);
  std::reverse(regular.begin(), regular.end());
  Integer length = 0;
  const bool ok = walk_even(regular, [&](const Integer&, bool, const Integer& m) { length += m; });
  if (!ok) return std::nullopt;  // not reached: the parity test decided
  if (length > kMaxTerms)
    throw LimitError("the all-even continued fraction of this fraction has " + length.str() +
                     " terms (more than " + std::to_string(kMaxTerms) + ")");
  const bool flip = x.sign() < 0;
  Terms out;
  out.reserve(static_cast<std::size_t>(length));
  (void)walk_even(std::move(regular), [&](const Integer& a, bool negative, const Integer& m) {
    bool neg = negative != flip;
    const auto count = static_cast<std::size_t>(m);
    for (std::size_t k = 0; k < count; ++k) {
      out.push_back(neg ? Integer(-a) : a);
      neg = !neg;
    }
  });
  return out;
}

Terms negative_expansion(const Fraction& x) {
  if (x.is_infinite()) throw_infinite("negative (Hirzebruch–Jung) continued fraction");
  // From the regular expansion [a0; a1, ..., an] (the standard relation between the two, e.g.
  // Hirzebruch 1953; Myerson, "On semi-regular continued fractions", 1987, from memory):
  //   a0 + 1/y = (a0 + 1) − 1/(y/(y − 1)), and y/(y − 1) = 1 + 1/(y − 1) peels one 2 off a1,
  // which gives  [a0 + 1, 2^(a1 − 1), a2 + 2, 2^(a3 − 1), a4 + 2, ...]  where 2^(k) is k twos,
  // and the last even-indexed term gets + 1 instead of + 2 (an n = 0 expansion stays [a0]).
  // The length 1 + Σ_odd (a_i − 1) + ... can be astronomically large (x = 1/N gives N − 1
  // twos), so it is checked before anything is built.
  const Terms a = regular_expansion_impl(x);
  const std::size_t n = a.size() - 1;
  if (n == 0) return a;
  Integer length = 1;
  for (std::size_t i = 1; i <= n; ++i) length += (i % 2 == 1) ? a[i] - 1 : Integer(1);
  if (length > kMaxTerms)
    throw LimitError("the negative continued fraction of this fraction has " + length.str() +
                     " terms (more than " + std::to_string(kMaxTerms) + ")");
  Terms out;
  out.reserve(static_cast<std::size_t>(length));
  out.push_back(a[0] + 1);
  for (std::size_t i = 1; i <= n; ++i) {
    if (i % 2 == 1) {
      const auto twos = static_cast<std::size_t>(a[i] - 1);
      for (std::size_t k = 0; k < twos; ++k) out.emplace_back(2);
    } else {
      out.push_back(a[i] + (i < n ? 2 : 1));
    }
  }
  return out;
}

Fraction negative_value(std::span<const Integer> terms) { return tree_value(terms, -1, false); }

Integer twist_crossings(const Fraction& x) {
  if (x.is_infinite()) return 0;
  // Word path: the sum of partial quotients of |p|/q, no allocation (the sum fits: see
  // detail::partial_quotient_sum).
  if (const auto p = word_of(x.numerator()), q = word_of(x.denominator()); p && q)
    return Integer(detail::partial_quotient_sum(detail::magnitude(*p), static_cast<std::uint64_t>(*q)));
  Integer sum = 0;
  for (const Integer& a : abs_expansion(x)) sum += a;
  return sum;
}

namespace reference {

Terms regular_expansion_euclid(const Fraction& x) {
  if (x.is_infinite()) throw_infinite("regular continued fraction");
  return euclid(x.numerator(), x.denominator());
}

Fraction standard_value_sequential(std::span<const Integer> terms) {
  if (terms.empty()) throw DomainError("the value of an empty continued fraction is undefined");
  // Back to front: p/q ← a + q/p, i.e. (p, q) ← (a·p + q, p); starting from (an, 1).
  Integer p = terms.back(), q = 1;
  for (std::size_t i = terms.size() - 1; i-- > 0;) {
    Integer np = terms[i] * p + q;
    q = std::move(p);
    p = std::move(np);
  }
  return Fraction(std::move(p), std::move(q));
}

}  // namespace reference

}  // namespace fourplat
