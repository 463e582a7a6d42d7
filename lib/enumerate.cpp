// lib/enumerate.cpp — the canonical walk over Stern–Brocot words (see enumerate.hpp and
// docs/enumeration.md for the proofs of every claim in the comments).
//
// Notation: letters 0 = R = [[1,1],[0,1]] and 1 = L = [[1,0],[1,1]]. A word w of length
// m = n − 2 gives M = R·w·R = [[α, β], [γ, δ]] (det 1, entries ≥ 0), and then
//   p = β, q = δ (0 < q < p), q⁻¹ ≡ α (mod p), and αδ = 1 + βγ;
// the fraction β/δ has crossing number n, and every fraction > 1 with crossing number n arises
// from exactly one word. reverse(w) gives q⁻¹, complement(w) gives p − q.
//
// The walk chooses the pairs (w_i, w_{m−1−i}) from the outside in, so the lexicographic
// comparisons of w with reverse(w) and with reverse(complement(w)) are decided by the first pair
// that is unequal / equal. A small state machine tracks which comparisons are still open:
//   kStart  nothing decided yet (first pair must start with 0: w ≤ complement(w))
//   kRev    every pair so far equal: w vs reverse(w) open; next unequal pair must be (0,1)
//   kRc     every pair so far unequal: w vs reverse-complement open; next equal pair must be (0,0)
//   kFree   all decided
// With mirrors distinguished only w ≤ reverse(w) is required: the walk starts in kRev.
#include "fourplat/enumerate.hpp"

#include <algorithm>
#include <array>
#include <cstddef>
#include <cstdint>
#include <string>

#include "fourplat/error.hpp"

namespace fourplat {
namespace {

__extension__ using u128 = unsigned __int128;
using i64 = std::int64_t;

constexpr int kMaxPairs = kMaxEnumerationCrossings / 2 + 1;
constexpr std::uint64_t kProgressMask = 0xFFFF;

struct Mat {
  i64 a, b, c, d;
};

// Right multiplication by a letter (appending it) and left multiplication (prepending it).
// Entries of every prefix or suffix product are bounded by those of the full product, which are
// at most p ≤ F_(n+1) < 2^62: no addition here can overflow.
inline Mat append(const Mat& m, int letter) {
  return letter == 0 ? Mat{m.a, m.a + m.b, m.c, m.c + m.d} : Mat{m.a + m.b, m.b, m.c + m.d, m.d};
}
inline Mat prepend(int letter, const Mat& m) {
  return letter == 0 ? Mat{m.a + m.c, m.b + m.d, m.c, m.d} : Mat{m.a, m.b, m.a + m.c, m.b + m.d};
}
constexpr Mat kR{1, 1, 0, 1};

enum State : int { kStart = 0, kRev = 1, kRc = 2, kFree = 3 };

// Next state after the pair (x, y) from state s, or -1 when the pair would make w non-canonical.
constexpr int next_state(int s, int x, int y) {
  switch (s) {
    case kStart: return x != 0 ? -1 : (y == 0 ? kRev : kRc);
    case kRev: return x == y ? kRev : (x == 0 ? kFree : -1);
    case kRc: return x != y ? kRc : (x == 0 ? kFree : -1);
    default: return kFree;
  }
}
// The middle letter of an odd-length word: kStart and kRc need 0 (complement, reverse-complement
// comparisons are decided there); kRev and kFree allow both.
constexpr int middle_options(int s) { return (s == kStart || s == kRc) ? 1 : 2; }

void check_range(int lo, int hi) {
  if (lo < 0 || hi < lo) {
    throw DomainError("crossing range " + std::to_string(lo) + ".." + std::to_string(hi) +
                      " is empty or negative");
  }
  if (hi > kMaxEnumerationCrossings) {
    throw LimitError("enumeration goes up to " + std::to_string(kMaxEnumerationCrossings) +
                     " crossings (p ≤ F_90 < 2^62 fits a word; beyond, the list has more than "
                     "2^85 members): use counts or random samples for larger n");
  }
}

void check_shard(const Shard& s) {
  if (s.count == 0 || s.index >= s.count) {
    throw DomainError("shard " + std::to_string(s.index + 1) + "/" + std::to_string(s.count) +
                      " does not exist: the part must be between 1 and the number of parts");
  }
  if (s.count > (std::uint64_t{1} << 32)) throw LimitError("at most 2^32 shards");
}

Integer to_integer(u128 x) {
  Integer r = static_cast<std::uint64_t>(x >> 64);
  r <<= 64;
  r += static_cast<std::uint64_t>(x);
  return r;
}

// ---- sizes of canonical subtrees ----

// size[s][r]: canonical completions from state s with r pairs left (and the middle letter when
// the word length is odd). Each entry is at most 2^87.
struct Sizes {
  std::array<std::array<u128, kMaxPairs + 1>, 4> size{};
  void build(int pairs, bool middle) {
    for (int s = 0; s < 4; ++s) size[s][0] = middle ? static_cast<u128>(middle_options(s)) : 1;
    for (int r = 1; r <= pairs; ++r) {
      for (int s = 0; s < 4; ++s) {
        u128 t = 0;
        for (int x = 0; x < 2; ++x)
          for (int y = 0; y < 2; ++y)
            if (const int nx = next_state(s, x, y); nx >= 0) t += size[nx][r - 1];
        size[s][r] = t;
      }
    }
  }
};

// Canonical words (= classes before the component filter) with crossing number n.
u128 classes_at(int n, bool mirrors) {
  if (n == 0) return 2;  // the unknot and the unlink
  if (n == 1) return 0;
  const int m = n - 2;
  Sizes s;
  s.build(m / 2, m % 2 == 1);
  return s.size[mirrors ? kRev : kStart][m / 2];
}

// The part [first, first + size) of [0, whole) that shard s owns.
void shard_bounds(u128 whole, const Shard& s, u128& first, u128& size) {
  // ⌊I·W/N⌋ with W < 2^90 and N ≤ 2^32: I·W < 2^122 fits u128.
  const u128 b0 = whole * s.index / s.count;
  const u128 b1 = whole * (s.index + 1) / s.count;
  first = b0;
  size = b1 - b0;
}

// ---- the two-bridge walk ----

class LinkWalker {
 public:
  LinkWalker(const EnumerationOptions& o, FunctionRef<bool(const EnumeratedLink&)> sink,
             u128 shard_total)
      : opt_(o), sink_(sink), total_(static_cast<double>(shard_total)) {}

  // Walks the canonical words of crossing number n with local ranks in [lo, hi).
  void run(int n, u128 lo, u128 hi) {
    if (stopped_ || lo >= hi) return;
    n_ = n;
    if (n == 0) {  // rank 0: the unknot b(1,0) = N(1/0); rank 1: the unlink b(0,1) = N(0/1)
      if (lo == 0) emit_special(1, 0, 1, opt_.oriented ? 1 : 0);
      if (hi >= 2 && !stopped_) emit_special(0, 1, 2, 1);
      return;
    }
    const int m = n - 2;
    pairs_ = m / 2;
    middle_ = (m % 2) == 1;
    sizes_.build(pairs_, middle_);
    const int s0 = opt_.mirrors ? kRev : kStart;
    if (lo == 0 && hi >= sizes_.size[s0][pairs_]) {
      full(s0, pairs_, kR, kR);
    } else {
      ranged(s0, pairs_, kR, kR, lo, hi);
    }
  }
  [[nodiscard]] bool stopped() const noexcept { return stopped_; }

 private:
  void full(int s, int r, const Mat& l, const Mat& rt) {
    if (r == 0) {
      finish(s, l, rt);
      return;
    }
    for (int x = 0; x < 2; ++x) {
      const Mat l2 = append(l, x);
      for (int y = 0; y < 2; ++y) {
        const int ns = next_state(s, x, y);
        if (ns < 0) continue;
        full(ns, r - 1, l2, prepend(y, rt));
        if (stopped_) return;
      }
    }
  }

  // Only the completions with local rank in [lo, hi) (0 ≤ lo < hi ≤ size[s][r]).
  void ranged(int s, int r, const Mat& l, const Mat& rt, u128 lo, u128 hi) {
    if (r == 0) {
      // The middle letter (or none): ranks 0 and 1 are the letters 0 and 1.
      if (!middle_) {
        finish_leaf(l, rt);
        return;
      }
      for (int x = 0; x < middle_options(s) && !stopped_; ++x) {
        if (static_cast<u128>(x) >= lo && static_cast<u128>(x) < hi) finish_leaf(append(l, x), rt);
      }
      return;
    }
    u128 base = 0;
    for (int x = 0; x < 2; ++x) {
      for (int y = 0; y < 2; ++y) {
        const int ns = next_state(s, x, y);
        if (ns < 0) continue;
        const u128 sz = sizes_.size[ns][r - 1];
        const u128 b0 = base, b1 = base + sz;
        base = b1;
        if (b1 <= lo || b0 >= hi) continue;
        const Mat l2 = append(l, x), r2 = prepend(y, rt);
        if (lo <= b0 && b1 <= hi) {
          full(ns, r - 1, l2, r2);
        } else {
          ranged(ns, r - 1, l2, r2, lo > b0 ? lo - b0 : 0, (hi < b1 ? hi : b1) - b0);
        }
        if (stopped_) return;
      }
    }
  }

  void finish(int s, const Mat& l, const Mat& rt) {
    if (!middle_) {
      finish_leaf(l, rt);
      return;
    }
    finish_leaf(append(l, 0), rt);
    if (middle_options(s) == 2 && !stopped_) finish_leaf(append(l, 1), rt);
  }

  // A canonical word is complete: M = l·rt.
  void finish_leaf(const Mat& l, const Mat& rt) {
    if ((++done_ & kProgressMask) == 0 && opt_.progress) {
      opt_.progress(total_ > 0 ? static_cast<double>(done_) / total_ : 1.0);
    }
    const i64 alpha = l.a * rt.a + l.b * rt.c;
    const i64 beta = l.a * rt.b + l.b * rt.d;
    const i64 gamma = l.c * rt.a + l.d * rt.c;
    const i64 delta = l.c * rt.b + l.d * rt.d;
    const bool knot = (beta & 1) != 0;
    if (knot ? opt_.components == ComponentFilter::links
             : opt_.components == ComponentFilter::knots) {
      return;
    }
    EnumeratedLink& it = item_;
    it.crossings = n_;
    it.components = knot ? 1 : 2;
    it.p = beta;
    it.amphichiral = alpha + delta == beta;  // q⁻¹ ≡ −q (mod p)
    // The walk visits the least word of its orbit, which is the least q (Stern–Brocot order);
    // taking the minimum again costs three comparisons and keeps the item right by itself.
    delta_ = delta;
    alpha_ = alpha;
    cq_ = std::min(delta, alpha);
    cq_mirror_ = std::min(beta - delta, beta - alpha);
    it.canonical_mirror_q = std::min(cq_, cq_mirror_);
    if (!opt_.oriented) {
      emit(opt_.mirrors ? cq_ : it.canonical_mirror_q);
      return;
    }
    const i64 two_p = 2 * beta;  // < 2^63: p < 2^62
    if (knot) {
      // One oriented class: the odd lifts of the unoriented orbit (mod 2p) form one orbit.
      auto lift = [beta](i64 x) { return (x & 1) != 0 ? x : x + beta; };
      i64 q = std::min(lift(delta), lift(alpha));
      if (!opt_.mirrors) q = std::min(q, std::min(lift(beta - delta), lift(beta - alpha)));
      emit(q);
      return;
    }
    // A link: δ and α are odd; the lifts of δ are δ and δ + p, and since αδ = 1 + pγ,
    // δ⁻¹ ≡ α + p·[γ odd] and (δ + p)⁻¹ ≡ α + p·[γ even] (mod 2p).
    const i64 g = gamma & 1;
    const i64 i1 = alpha + beta * g;
    const i64 i2 = alpha + beta * (1 - g);
    const i64 d2 = delta + beta;
    bool same = (i1 == d2);
    i64 q1 = std::min(delta, i1);
    i64 q2 = std::min(d2, i2);
    if (!opt_.mirrors) {  // also q → −q (mod 2p)
      same = same || (two_p - delta == d2) || (two_p - i1 == d2);
      q1 = std::min(q1, std::min(two_p - delta, two_p - i1));
      q2 = std::min(q2, std::min(two_p - d2, two_p - i2));
    }
    if (same) {
      emit(std::min(q1, q2));
    } else {
      emit(std::min(q1, q2));
      if (!stopped_) emit(std::max(q1, q2));
    }
  }

  // Emits b(p,q); q < 2p. The drawing tangle and its unoriented class follow from q mod p.
  void emit(i64 q) {
    EnumeratedLink& it = item_;
    it.q = q;
    const i64 r = q < it.p ? q : q - it.p;
    it.canonical_q = (r == delta_ || r == alpha_) ? cq_ : cq_mirror_;
    if (q < it.p) {
      it.fraction_p = it.p;
      it.fraction_q = q;
    } else {
      it.fraction_p = -it.p;
      it.fraction_q = 2 * it.p - q;
    }
    if (opt_.twists) {
      it.twists = std::span<const i64>(
          twists_.data(), canonical_twists_word(it.fraction_p, it.fraction_q, twists_));
    }
    if (!sink_(it)) stopped_ = true;
  }

  void emit_special(i64 p, i64 unoriented_q, int components, i64 oriented_q) {
    if (components == 1 ? opt_.components == ComponentFilter::links
                        : opt_.components == ComponentFilter::knots) {
      return;
    }
    EnumeratedLink& it = item_;
    it.crossings = 0;
    it.components = components;
    it.amphichiral = true;
    it.p = p;
    it.canonical_q = unoriented_q;
    it.canonical_mirror_q = unoriented_q;
    it.q = opt_.oriented ? oriented_q : unoriented_q;
    it.fraction_p = p;  // N(1/0) is the unknot, N(0/1) the unlink
    it.fraction_q = unoriented_q;
    if (opt_.twists) {
      it.twists = std::span<const i64>(twists_.data(), canonical_twists_word(p, unoriented_q, twists_));
    }
    if (!sink_(it)) stopped_ = true;
  }

  const EnumerationOptions& opt_;
  FunctionRef<bool(const EnumeratedLink&)> sink_;
  double total_;
  std::uint64_t done_ = 0;
  bool stopped_ = false;
  int n_ = 0;
  int pairs_ = 0;
  bool middle_ = false;
  Sizes sizes_;
  EnumeratedLink item_;
  i64 delta_ = 0, alpha_ = 0, cq_ = 0, cq_mirror_ = 0;  // the current orbit's two classes
  std::array<i64, 96> twists_{};
};

// ---- the tangle walk: every Stern–Brocot word of length n − 1 ----

class TangleWalker {
 public:
  TangleWalker(const TangleEnumerationOptions& o, FunctionRef<bool(const EnumeratedTangle&)> sink,
               u128 shard_total)
      : opt_(o), sink_(sink), total_(static_cast<double>(shard_total)) {}

  void run(int n, u128 lo, u128 hi) {
    if (stopped_ || lo >= hi) return;
    n_ = n;
    if (n == 0) {  // one unit: 0 then ∞
      emit(0, 1);
      if (!stopped_) emit(1, 0);
      return;
    }
    walk(n - 1, Mat{1, 0, 0, 1}, lo, hi);
  }
  [[nodiscard]] bool stopped() const noexcept { return stopped_; }

 private:
  // Words of length r appended to m; local ranks [lo, hi) of 2^r.
  void walk(int r, const Mat& m, u128 lo, u128 hi) {
    if (r == 0) {
      if ((++done_ & kProgressMask) == 0 && opt_.progress) {
        opt_.progress(total_ > 0 ? static_cast<double>(done_) / total_ : 1.0);
      }
      // The Stern–Brocot node of the word is the mediant (a + b)/(c + d).
      const i64 p = m.a + m.b, q = m.c + m.d;
      emit(p, q);
      if (!stopped_) emit(-p, q);
      return;
    }
    const u128 half = static_cast<u128>(1) << (r - 1);
    if (lo < half && !stopped_) walk(r - 1, append(m, 0), lo, hi < half ? hi : half);
    if (hi > half && !stopped_) walk(r - 1, append(m, 1), lo > half ? lo - half : 0, hi - half);
  }

  void emit(i64 p, i64 q) {
    item_.crossings = n_;
    item_.p = p;
    item_.q = q;
    if (opt_.twists) {
      item_.twists = std::span<const i64>(twists_.data(), canonical_twists_word(p, q, twists_));
    }
    if (!sink_(item_)) stopped_ = true;
  }

  const TangleEnumerationOptions& opt_;
  FunctionRef<bool(const EnumeratedTangle&)> sink_;
  double total_;
  std::uint64_t done_ = 0;
  bool stopped_ = false;
  int n_ = 0;
  EnumeratedTangle item_;
  std::array<i64, 96> twists_{};
};

u128 tangle_units_at(int n) { return n == 0 ? 1 : static_cast<u128>(1) << (n - 1); }

// Splits the shard's global range [first, first + size) over the crossing numbers lo..hi.
template <typename UnitsAt, typename Run>
void for_each_part(int lo, int hi, u128 first, u128 size, UnitsAt units_at, Run run) {
  u128 base = 0;
  const u128 end = first + size;
  for (int n = lo; n <= hi; ++n) {
    const u128 u = units_at(n);
    const u128 b0 = base, b1 = base + u;
    base = b1;
    if (b1 <= first || b0 >= end) continue;
    if (!run(n, first > b0 ? first - b0 : 0, (end < b1 ? end : b1) - b0)) return;
  }
}

}  // namespace

std::size_t canonical_twists_word(i64 p, i64 q, std::span<i64> out) {
  if (q == 0) {  // ∞ = [0 0]
    out[0] = 0;
    out[1] = 0;
    return 2;
  }
  const i64 sign = p < 0 ? -1 : 1;
  i64 a = p < 0 ? -p : p, b = q;
  // Regular expansion [t0; t1, …, tk] by Euclid (last term ≥ 2 unless k = 0).
  std::size_t k = 0;
  while (true) {
    out[k++] = a / b;
    const i64 r = a % b;
    if (r == 0) break;
    a = b;
    b = r;
  }
  // Odd length: [..., t] = [..., t − 1, 1] (Kauffman–Lambropoulou's parity fix).
  if (k % 2 == 0) {
    out[k - 1] -= 1;
    out[k++] = 1;
  }
  std::reverse(out.begin(), out.begin() + static_cast<std::ptrdiff_t>(k));  // twist order
  if (sign < 0) {
    for (std::size_t i = 0; i < k; ++i) out[i] = -out[i];
  }
  return k;
}

ShardExtent two_bridge_shard_extent(int lo, int hi, const EnumerationOptions& options) {
  check_range(lo, hi);
  check_shard(options.shard);
  u128 whole = 0;
  for (int n = lo; n <= hi; ++n) whole += classes_at(n, options.mirrors);
  u128 first = 0, size = 0;
  shard_bounds(whole, options.shard, first, size);
  return {to_integer(whole), to_integer(first), to_integer(size)};
}

ShardExtent rational_tangle_shard_extent(int lo, int hi, const TangleEnumerationOptions& options) {
  check_range(lo, hi);
  check_shard(options.shard);
  u128 whole = 0;
  for (int n = lo; n <= hi; ++n) whole += tangle_units_at(n);
  u128 first = 0, size = 0;
  shard_bounds(whole, options.shard, first, size);
  return {to_integer(whole), to_integer(first), to_integer(size)};
}

bool for_each_two_bridge(int lo, int hi, const EnumerationOptions& options,
                         FunctionRef<bool(const EnumeratedLink&)> sink) {
  check_range(lo, hi);
  check_shard(options.shard);
  u128 whole = 0;
  for (int n = lo; n <= hi; ++n) whole += classes_at(n, options.mirrors);
  u128 first = 0, size = 0;
  shard_bounds(whole, options.shard, first, size);
  LinkWalker walker(options, sink, size);
  for_each_part(
      lo, hi, first, size, [&](int n) { return classes_at(n, options.mirrors); },
      [&](int n, u128 a, u128 b) {
        walker.run(n, a, b);
        return !walker.stopped();
      });
  if (!walker.stopped() && options.progress) options.progress(1.0);
  return !walker.stopped();
}

bool for_each_rational_tangle(int lo, int hi, const TangleEnumerationOptions& options,
                              FunctionRef<bool(const EnumeratedTangle&)> sink) {
  check_range(lo, hi);
  check_shard(options.shard);
  u128 whole = 0;
  for (int n = lo; n <= hi; ++n) whole += tangle_units_at(n);
  u128 first = 0, size = 0;
  shard_bounds(whole, options.shard, first, size);
  TangleWalker walker(options, sink, size);
  for_each_part(lo, hi, first, size, tangle_units_at, [&](int n, u128 a, u128 b) {
    walker.run(n, a, b);
    return !walker.stopped();
  });
  if (!walker.stopped() && options.progress) options.progress(1.0);
  return !walker.stopped();
}

}  // namespace fourplat
