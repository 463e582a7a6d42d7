// 2-bridge links b(p,q): Schubert normal form, Schubert's classification (unoriented, oriented,
// up to mirror), and the allocation-free word path used by batch classification.
//
// Two independent implementations live here, on purpose (FLINT's habit of keeping a plain
// version beside the fast one): the classes TwoBridgeLink / OrientedTwoBridgeLink compute on
// Integer (GMP) only, and summarize_numerator_word(s) compute on machine words only. The tests
// compare the two on random input and at the word boundaries.
//
// Sources: Schubert 1956 and its oriented form as stated in Kauffman–Lambropoulou, "On the
// classification of rational knots", Enseign. Math. 49 (2003); crossing number = sum of the
// partial quotients (Kauffman, Murasugi, Thistlethwaite 1987); extended Euclid and the bound on
// its cofactors: Knuth, TAOCP vol. 2, §4.5.2.
#include "fourplat/two_bridge.hpp"

#include <algorithm>
#include <climits>
#include <cstdint>
#include <string>
#include <utility>

#include <gmp.h>

#if defined(__x86_64__) && defined(__GNUC__)
#include <immintrin.h>
#endif

#include "detail/word.hpp"

namespace fourplat {

namespace {

// ---------------------------------------------------------------------------------------------
// Big-integer helpers (GMP only).

/// q⁻¹ mod m for m ≥ 2 and gcd(q, m) = 1 (callers guarantee it: Schubert form is coprime).
Integer inverse_mod(const Integer& q, const Integer& m) {
  Integer r;
  if (mpz_invert(detail::mpz(r), detail::mpz(q), detail::mpz(m)) == 0) {
    throw DomainError("internal: " + q.str() + " has no inverse modulo " + m.str());
  }
  return r;
}

/// Sum of the partial quotients of p/q, plain Euclid on Integer (p ≥ 0, q > 0).
Integer partial_quotient_sum_big(Integer a, Integer b) {
  Integer sum = 0, k, r;
  while (b != 0) {
    boost::multiprecision::divide_qr(a, b, k, r);
    sum += k;
    a = std::move(b);
    b = std::move(r);
  }
  return sum;
}

void require_coprime(const Integer& p, const Integer& q) {
  const Integer g = gcd(p, q);
  if (g != 1) {
    throw DomainError("b(p,q) needs coprime p and q, but gcd(" + p.str() + ", " + q.str() +
                      ") = " + g.str());
  }
}

// ---------------------------------------------------------------------------------------------
// Word helpers (no allocation, no Integer).

using u64 = std::uint64_t;
using i64 = std::int64_t;
using u32 = std::uint32_t;

/// Result of extended Euclid on (p, q), p > q ≥ 1: the sum of the partial quotients of p/q, the
/// gcd, and the cofactor s with s·q ≡ gcd (mod p).
struct WordEuclid {
  u64 sum;
  u64 gcd;
  i64 cofactor;
};

// Why nothing overflows. With remainders r_{-1} = p, r_0 = q, r_{i+1} = r_{i-1} − k_i r_i and
// cofactors s_{-1} = 0, s_0 = 1, s_{i+1} = s_{i-1} − k_i s_i (so r_i ≡ s_i·q mod p), the s_i
// alternate in sign and |s_{i+1}| = |s_{i-1}| + k_i |s_i| grows to |s_last| = p/gcd (Knuth
// 4.5.2). So every true cofactor has magnitude ≤ p < 2^63: computing them modulo 2^64 in
// unsigned words and reading the final one as signed is exact. The sum of partial quotients is
// ≤ p (see detail::partial_quotient_sum).

/// One call: 64-bit divisions while the dividend needs more than 32 bits, then 32-bit ones (a
/// shorter latency on current x86). The loop is latency-bound on the divider.
inline WordEuclid word_euclid(u64 a, u64 b) noexcept {
  u64 sum = 0, s0 = 0, s1 = 1;
  while (b != 0 && (a >> 32) != 0) {
    const u64 k = a / b;
    const u64 r = a - k * b;
    sum += k;
    const u64 s2 = s0 - k * s1;
    s0 = s1;
    s1 = s2;
    a = b;
    b = r;
  }
  if (b != 0) {  // both now below 2^32
    u32 a32 = static_cast<u32>(a), b32 = static_cast<u32>(b);
    while (b32 != 0) {
      const u32 k = a32 / b32;
      const u32 r = a32 - k * b32;
      sum += k;
      const u64 s2 = s0 - u64{k} * s1;
      s0 = s1;
      s1 = s2;
      a32 = b32;
      b32 = r;
    }
    a = a32;
  }
  return {sum, a, static_cast<i64>(s0)};
}

/// Schubert normal form on words: P = |p|, Q ∈ [0, P) with Q ≡ sign(p)·q (mod P), and for p = 0
/// Q = |q|. False when |p| = 2^63 (no word holds it).
inline bool normalise_word(i64 p, i64 q, u64& big_p, u64& big_q) noexcept {
  if (p == INT64_MIN) return false;
  if (p == 0) {
    big_p = 0;
    big_q = detail::magnitude(q);
    return true;
  }
  const i64 m = p < 0 ? -p : p;
  i64 r = q % m;  // |r| < m; defined for every q since m ≥ 1
  if (p < 0) r = -r;
  if (r < 0) r += m;
  big_p = static_cast<u64>(m);
  big_q = static_cast<u64>(r);
  return true;
}

constexpr LinkSummaryWord unlink_word() noexcept {
  LinkSummaryWord s;
  s.p = 0;
  s.q = 1;
  s.canonical_q = 1;
  s.canonical_mirror_q = 1;
  s.crossing_number = 0;
  s.components = 2;
  s.amphichiral = true;
  s.kind = LinkKind::unlink;
  return s;
}

constexpr LinkSummaryWord unknot_word() noexcept {
  LinkSummaryWord s;
  s.p = 1;
  s.q = 0;
  s.canonical_q = 0;
  s.canonical_mirror_q = 0;
  s.crossing_number = 0;
  s.components = 1;
  s.amphichiral = true;
  s.kind = LinkKind::unknot;
  return s;
}

/// The summary of b(P, Q), P ≥ 2, 1 ≤ Q < P, from the Euclid results (inv = Q⁻¹ mod P).
inline LinkSummaryWord finish_word(u64 big_p, u64 big_q, u64 sum, u64 inv) noexcept {
  LinkSummaryWord s;
  s.p = static_cast<i64>(big_p);
  s.q = static_cast<i64>(big_q);
  s.canonical_q = static_cast<i64>(std::min(big_q, inv));
  s.canonical_mirror_q =
      static_cast<i64>(std::min(std::min(big_q, inv), std::min(big_p - big_q, big_p - inv)));
  s.crossing_number = static_cast<i64>(sum);
  s.components = (big_p & 1) != 0 ? 1 : 2;
  // q² ≡ −1 ⇔ q ≡ −q⁻¹ (mod p) ⇔ q + q⁻¹ = p, both lying in [1, p − 1]: no 128-bit product.
  s.amphichiral = big_q + inv == big_p;
  s.kind = (big_q == 1 || big_q == big_p - 1) ? LinkKind::torus : LinkKind::hyperbolic;
  return s;
}

/// The cofactor s (|s| ≤ p/2) as a residue in [0, p).
inline u64 residue(i64 s, u64 p) noexcept {
  return s < 0 ? p - detail::magnitude(s) : static_cast<u64>(s);
}

}  // namespace

// =============================================================================================
// TwoBridgeLink (GMP path)

TwoBridgeLink::TwoBridgeLink(Integer p, Integer q) : p_(std::move(p)), q_(std::move(q)) {
  require_coprime(p_, q_);
  if (p_ < 0) {  // the fraction p/q equals (−p)/(−q)
    p_ = -p_;
    q_ = -q_;
  }
  if (p_ == 0) {
    q_ = 1;  // gcd(0, q) = 1 forces q = ±1: the unlink b(0,1)
  } else {
    q_ = mod_floor(q_, p_);  // p = 1 gives the unknot b(1,0)
  }
}

TwoBridgeLink TwoBridgeLink::numerator_closure(const Fraction& f) {
  return TwoBridgeLink(f.numerator(), f.denominator());
}

// D(p/q) = N(−1/F) = N(−q/p) = b(−q, p) ~ b(q, −p).
TwoBridgeLink TwoBridgeLink::denominator_closure(const Fraction& f) {
  return TwoBridgeLink(f.denominator(), -f.numerator());
}

TwoBridgeLink TwoBridgeLink::unknot() { return TwoBridgeLink(Integer(1), Integer(0), Normalized{}); }
TwoBridgeLink TwoBridgeLink::unlink() { return TwoBridgeLink(Integer(0), Integer(1), Normalized{}); }

int TwoBridgeLink::components() const noexcept { return boost::multiprecision::bit_test(p_, 0) ? 1 : 2; }

LinkKind TwoBridgeLink::kind() const {
  if (p_ == 0) return LinkKind::unlink;
  if (p_ == 1) return LinkKind::unknot;
  if (q_ == 1 || q_ == p_ - 1) return LinkKind::torus;  // T(2,p) and its mirror
  return LinkKind::hyperbolic;
}

Integer TwoBridgeLink::crossing_number() const {
  if (p_ <= 1) return 0;
  return partial_quotient_sum_big(p_, q_);
}

TwoBridgeLink TwoBridgeLink::mirror() const { return TwoBridgeLink(p_, -q_); }

bool TwoBridgeLink::is_amphichiral() const {
  if (p_ <= 1) return true;
  return (q_ * q_ + 1) % p_ == 0;
}

TwoBridgeLink TwoBridgeLink::canonical() const {
  if (p_ <= 1) return *this;
  Integer inv = inverse_mod(q_, p_);
  return TwoBridgeLink(p_, std::min(q_, inv), Normalized{});
}

TwoBridgeLink TwoBridgeLink::canonical_up_to_mirror() const {
  if (p_ <= 1) return *this;
  const Integer inv = inverse_mod(q_, p_);
  Integer best = std::min(q_, inv);
  best = std::min(best, p_ - q_);
  best = std::min(best, p_ - inv);
  return TwoBridgeLink(p_, std::move(best), Normalized{});
}

// =============================================================================================
// OrientedTwoBridgeLink (GMP path)

OrientedTwoBridgeLink::OrientedTwoBridgeLink(Integer p, Integer q)
    : p_(std::move(p)), q_(std::move(q)) {
  require_coprime(p_, q_);
  if (p_ < 0) {
    p_ = -p_;
    q_ = -q_;
  }
  if (p_ == 0) {
    q_ = 1;
    return;
  }
  if (!boost::multiprecision::bit_test(q_, 0)) q_ += p_;  // q even forces p odd: q + p is odd
  q_ = mod_floor(q_, 2 * p_);
}

OrientedTwoBridgeLink OrientedTwoBridgeLink::numerator_closure(const Fraction& f) {
  return OrientedTwoBridgeLink(f.numerator(), f.denominator());
}

TwoBridgeLink OrientedTwoBridgeLink::unoriented() const { return TwoBridgeLink(p_, q_); }

OrientedTwoBridgeLink OrientedTwoBridgeLink::reverse_one_component() const {
  if (p_ == 0 || boost::multiprecision::bit_test(p_, 0)) return *this;
  return OrientedTwoBridgeLink(p_, mod_floor(q_ + p_, 2 * p_), Normalized{});
}

OrientedTwoBridgeLink OrientedTwoBridgeLink::canonical() const {
  if (p_ <= 1) return *this;
  const Integer m = 2 * p_;
  Integer inv = inverse_mod(q_, m);  // q odd and coprime to p, so coprime to 2p; q⁻¹ is odd
  return OrientedTwoBridgeLink(p_, std::min(q_, inv), Normalized{});
}

OrientedTwoBridgeLink OrientedTwoBridgeLink::mirror() const { return OrientedTwoBridgeLink(p_, -q_); }

// =============================================================================================
// Free functions

TwoBridgeLink closure(const RationalTangle& t, Closure which) {
  return which == Closure::numerator ? TwoBridgeLink::numerator_closure(t.fraction())
                                     : TwoBridgeLink::denominator_closure(t.fraction());
}

bool same_link(const TwoBridgeLink& a, const TwoBridgeLink& b) {
  return a.p() == b.p() && a.canonical() == b.canonical();
}

bool same_up_to_mirror(const TwoBridgeLink& a, const TwoBridgeLink& b) {
  return a.p() == b.p() && a.canonical_up_to_mirror() == b.canonical_up_to_mirror();
}

bool same_oriented_link(const OrientedTwoBridgeLink& a, const OrientedTwoBridgeLink& b) {
  return a.p() == b.p() && a.canonical() == b.canonical();
}

std::string to_string(const TwoBridgeLink& l) {
  return "b(" + l.p().str() + "," + l.q().str() + ")";
}

std::string to_string(const OrientedTwoBridgeLink& l) {
  return "b(" + l.p().str() + "," + l.q().str() + ")";
}

std::string to_string(LinkKind k) {
  switch (k) {
    case LinkKind::unlink: return "unlink";
    case LinkKind::unknot: return "unknot";
    case LinkKind::torus: return "torus";
    case LinkKind::hyperbolic: return "hyperbolic";
  }
  return "unknown";
}

// =============================================================================================
// Word path

std::optional<LinkSummaryWord> summarize_numerator_word(std::int64_t p, std::int64_t q) noexcept {
  u64 big_p = 0, big_q = 0;
  if (!normalise_word(p, q, big_p, big_q)) return std::nullopt;
  if (big_p == 0) {
    if (big_q != 1) return std::nullopt;  // gcd(0, q) = |q| ≠ 1
    return unlink_word();
  }
  if (big_p == 1) return unknot_word();
  if (big_q == 0) return std::nullopt;  // gcd = p ≥ 2
  const WordEuclid e = word_euclid(big_p, big_q);
  if (e.gcd != 1) return std::nullopt;
  return finish_word(big_p, big_q, e.sum, residue(e.cofactor, big_p));
}

namespace {

// Scalar batch kernel. Eight independent Euclid chains advance in rounds; finished lanes are
// refilled from the input. Two things beat the single call here:
//   * the divisions of different lanes overlap in the pipelined divider;
//   * each division step also takes the next step when its quotient is 1, without dividing:
//     after r = a − k·b, if r > b − r then ⌊b/r⌋ = 1 and the remainder after it is b − r. The
//     choice is made with masks, not branches (a branch here is mispredicted ~40 % of the time).
//     This is the nearest-integer Euclid in disguise and does about 0.7× the divisions of the
//     regular one (Gauss–Kuzmin statistics: a quotient is 1 with probability ~0.415).
void words_scalar(std::span<const std::int64_t> p, std::span<const std::int64_t> q,
                  std::span<std::optional<LinkSummaryWord>> out) noexcept {
  constexpr int kLanes = 8;
  const std::size_t n = p.size();
  u64 a[kLanes], b[kLanes], sum[kLanes], s0[kLanes], s1[kLanes], lane_p[kLanes], lane_q[kLanes];
  std::size_t index[kLanes];
  bool busy[kLanes];
  std::size_t next = 0;

  // Load the next input needing Euclid into lane l, answering the special cases on the way.
  auto refill = [&](int l) {
    while (next < n) {
      const std::size_t i = next++;
      u64 big_p = 0, big_q = 0;
      if (!normalise_word(p[i], q[i], big_p, big_q)) {
        out[i] = std::nullopt;
      } else if (big_p == 0) {
        out[i] = big_q == 1 ? std::optional(unlink_word()) : std::nullopt;
      } else if (big_p == 1) {
        out[i] = unknot_word();
      } else if (big_q == 0) {
        out[i] = std::nullopt;
      } else {
        a[l] = big_p;
        b[l] = big_q;
        sum[l] = 0;
        s0[l] = 0;
        s1[l] = 1;
        lane_p[l] = big_p;
        lane_q[l] = big_q;
        index[l] = i;
        busy[l] = true;
        return;
      }
    }
    busy[l] = false;
    b[l] = 0;
  };

  int active = 0;
  for (int l = 0; l < kLanes; ++l) {
    refill(l);
    active += busy[l] ? 1 : 0;
  }
  while (active > 0) {
    for (int l = 0; l < kLanes; ++l) {
      if (b[l] != 0) {
        const u64 k = a[l] / b[l];
        const u64 r = a[l] - k * b[l];
        const u64 t = b[l] - r;
        const u64 m = u64{0} - static_cast<u64>(r > t);  // all ones: absorb a quotient 1
        const u64 sp = s0[l] - k * s1[l];                // cofactor of r
        const u64 spp = s1[l] - sp;                      // cofactor of t = b − r
        sum[l] += k - m;                                 // k, or k + 1 when absorbing
        const u64 na = b[l] ^ ((r ^ b[l]) & m);
        const u64 nb = r ^ ((t ^ r) & m);
        const u64 n0 = s1[l] ^ ((sp ^ s1[l]) & m);
        const u64 n1 = sp ^ ((spp ^ sp) & m);
        a[l] = na;
        b[l] = nb;
        s0[l] = n0;
        s1[l] = n1;
      } else if (busy[l]) {
        const std::size_t i = index[l];
        if (a[l] != 1) {
          out[i] = std::nullopt;
        } else {
          out[i] = finish_word(lane_p[l], lane_q[l], sum[l],
                               residue(static_cast<i64>(s0[l]), lane_p[l]));
        }
        refill(l);
        if (!busy[l]) --active;
      }
    }
  }
}

#if defined(__x86_64__) && defined(__GNUC__)
#define FOURPLAT_HAVE_AVX512_KERNEL 1

bool cpu_has_avx512() noexcept {
  return __builtin_cpu_supports("avx512f") && __builtin_cpu_supports("avx512dq");
}

// AVX-512 kernel: blocks of 32 inputs in four independent 8-lane vectors (four, so that the
// ~50-cycle latency of one step is hidden behind the other vectors), stepping in lock-step until
// every lane is done, with the same quotient-1 absorption as the scalar kernel.
// The quotient k = ⌊a/b⌋ comes from a double division: a, b < 2^63 convert with relative error
// ≤ 2^-53 each and the division adds one more, so for a/b < 2^50 the estimate is within 3/8 of
// a/b and its truncation is k − 1, k or k + 1; r = a − k·b in 64-bit integers, one correction
// each way makes it exact. (r stays in (−b, 2b) and below 2^63, so signed compares are right.)
// Lanes whose estimate is ≥ 2^50 — a huge partial quotient, rare — divide in scalar code.
__attribute__((target("avx512f,avx512dq"))) void words_avx512(
    std::span<const std::int64_t> p, std::span<const std::int64_t> q,
    std::span<std::optional<LinkSummaryWord>> out) noexcept {
  constexpr int kGroups = 4;
  constexpr int kWidth = 8 * kGroups;
  const std::size_t n = p.size();
  const __m512i one = _mm512_set1_epi64(1);
  const __m512i zero = _mm512_setzero_si512();
  const __m512d huge_quotient = _mm512_set1_pd(0x1p50);
  std::size_t base = 0;
  for (; base + kWidth <= n; base += kWidth) {
    alignas(64) u64 lane_p[kWidth], lane_q[kWidth];
    std::uint32_t valid = 0;
    for (int l = 0; l < kWidth; ++l) {
      const std::size_t i = base + static_cast<std::size_t>(l);
      u64 big_p = 0, big_q = 0;
      lane_p[l] = 1;  // an idle lane: b = 0 from the start
      lane_q[l] = 0;
      if (!normalise_word(p[i], q[i], big_p, big_q)) {
        out[i] = std::nullopt;
      } else if (big_p == 0) {
        out[i] = big_q == 1 ? std::optional(unlink_word()) : std::nullopt;
      } else if (big_p == 1) {
        out[i] = unknot_word();
      } else if (big_q == 0) {
        out[i] = std::nullopt;
      } else {
        lane_p[l] = big_p;
        lane_q[l] = big_q;
        valid |= std::uint32_t{1} << l;
      }
    }
    __m512i a[kGroups], b[kGroups], sum[kGroups], s0[kGroups], s1[kGroups];
    for (int g = 0; g < kGroups; ++g) {
      a[g] = _mm512_load_si512(lane_p + 8 * g);
      b[g] = _mm512_load_si512(lane_q + 8 * g);
      sum[g] = zero;
      s0[g] = zero;
      s1[g] = one;
    }
    for (;;) {
      __mmask8 any = 0;
      for (int g = 0; g < kGroups; ++g) {
        const __mmask8 act = _mm512_test_epi64_mask(b[g], b[g]);
        any = static_cast<__mmask8>(any | act);
        if (act == 0) continue;
        const __m512i bb = _mm512_mask_mov_epi64(one, act, b[g]);  // idle lanes divide by 1
        const __m512d qd = _mm512_div_pd(_mm512_cvtepi64_pd(a[g]), _mm512_cvtepi64_pd(bb));
        const __mmask8 huge =
            static_cast<__mmask8>(_mm512_cmp_pd_mask(qd, huge_quotient, _CMP_GE_OQ) & act);
        __m512i k = _mm512_cvttpd_epi64(qd);
        __m512i r = _mm512_sub_epi64(a[g], _mm512_mullo_epi64(k, bb));
        const __mmask8 low = _mm512_cmplt_epi64_mask(r, zero);
        k = _mm512_mask_sub_epi64(k, low, k, one);
        r = _mm512_mask_add_epi64(r, low, r, bb);
        const __mmask8 high = _mm512_cmpge_epi64_mask(r, bb);
        k = _mm512_mask_add_epi64(k, high, k, one);
        r = _mm512_mask_sub_epi64(r, high, r, bb);
        if (__builtin_expect(huge != 0, 0)) {
          alignas(64) u64 av[8], bv[8], kv[8], rv[8];
          _mm512_store_si512(av, a[g]);
          _mm512_store_si512(bv, bb);
          _mm512_store_si512(kv, k);
          _mm512_store_si512(rv, r);
          for (int l = 0; l < 8; ++l) {
            if (((huge >> l) & 1) != 0) {
              kv[l] = av[l] / bv[l];
              rv[l] = av[l] - kv[l] * bv[l];
            }
          }
          k = _mm512_load_si512(kv);
          r = _mm512_load_si512(rv);
        }
        const __m512i t = _mm512_sub_epi64(bb, r);
        const __mmask8 absorb = _mm512_cmpgt_epu64_mask(r, t);
        const __m512i sp = _mm512_sub_epi64(s0[g], _mm512_mullo_epi64(k, s1[g]));
        const __m512i spp = _mm512_sub_epi64(s1[g], sp);
        sum[g] = _mm512_mask_add_epi64(sum[g], act, sum[g], _mm512_mask_add_epi64(k, absorb, k, one));
        a[g] = _mm512_mask_mov_epi64(a[g], act, _mm512_mask_mov_epi64(bb, absorb, r));
        b[g] = _mm512_mask_mov_epi64(b[g], act, _mm512_mask_mov_epi64(r, absorb, t));
        s0[g] = _mm512_mask_mov_epi64(s0[g], act, _mm512_mask_mov_epi64(s1[g], absorb, sp));
        s1[g] = _mm512_mask_mov_epi64(s1[g], act, _mm512_mask_mov_epi64(sp, absorb, spp));
      }
      if (any == 0) break;
    }
    alignas(64) u64 gcds[kWidth], sums[kWidth], cofactors[kWidth];
    for (int g = 0; g < kGroups; ++g) {
      _mm512_store_si512(gcds + 8 * g, a[g]);
      _mm512_store_si512(sums + 8 * g, sum[g]);
      _mm512_store_si512(cofactors + 8 * g, s0[g]);
    }
    for (int l = 0; l < kWidth; ++l) {
      if (((valid >> l) & 1) == 0) continue;
      const std::size_t i = base + static_cast<std::size_t>(l);
      if (gcds[l] != 1) {
        out[i] = std::nullopt;
      } else {
        out[i] = finish_word(lane_p[l], lane_q[l], sums[l],
                             residue(static_cast<i64>(cofactors[l]), lane_p[l]));
      }
    }
  }
  words_scalar(p.subspan(base), q.subspan(base), out.subspan(base));  // the last < 32 inputs
}
#endif

}  // namespace

bool word_kernel_available(WordKernel k) noexcept {
  if (k != WordKernel::avx512) return true;
#ifdef FOURPLAT_HAVE_AVX512_KERNEL
  return cpu_has_avx512();
#else
  return false;
#endif
}

void summarize_numerator_words(std::span<const std::int64_t> p, std::span<const std::int64_t> q,
                               std::span<std::optional<LinkSummaryWord>> out, WordKernel kernel) {
  if (p.size() != q.size() || p.size() != out.size()) {
    throw DomainError("summarize_numerator_words: spans of different lengths (" +
                      std::to_string(p.size()) + ", " + std::to_string(q.size()) + ", " +
                      std::to_string(out.size()) + ")");
  }
  if (!word_kernel_available(kernel)) {
    throw DomainError("summarize_numerator_words: the AVX-512 kernel needs an x86-64 CPU with "
                      "AVX-512F and AVX-512DQ");
  }
  if (kernel == WordKernel::best) {
    kernel = word_kernel_available(WordKernel::avx512) ? WordKernel::avx512 : WordKernel::scalar;
  }
#ifdef FOURPLAT_HAVE_AVX512_KERNEL
  if (kernel == WordKernel::avx512) {
    words_avx512(p, q, out);
    return;
  }
#endif
  words_scalar(p, q, out);
}

// Oriented class mod 2p from the mod-p inverse. Let Q be the odd residue mod 2p (Schubert) and
// u = Q⁻¹ mod p. The inverse mod 2p is u or u + p, whichever V makes Q·V odd and ≡ 1 (mod 2p):
//   p odd:  exactly one of u, u + p is odd, and Q·V − 1 is even and divisible by p, hence by 2p;
//   p even: u and u + p are both odd; Q·u − 1 = k·p and Q·(u + p) − 1 = (k + Q)·p with Q odd,
//           so exactly one of the two multipliers is even — test Q·u mod 2p (128-bit product).
std::optional<OrientedLinkSummaryWord> summarize_oriented_numerator_word(std::int64_t p,
                                                                          std::int64_t q) noexcept {
  if (p == INT64_MIN) return std::nullopt;
  const u64 big_p = detail::magnitude(p);
  if (big_p >= (u64{1} << 62)) return std::nullopt;  // 2p must fit an int64
  if (big_p == 0) {
    if (detail::magnitude(q) != 1) return std::nullopt;
    return OrientedLinkSummaryWord{0, 1, 1, 2};
  }
  if (big_p == 1) return OrientedLinkSummaryWord{1, 1, 1, 1};
  const i64 m2 = static_cast<i64>(2 * big_p);
  i64 r = q % m2;  // the residue mod 2p matters for p even: keep it
  if (p < 0) r = -r;
  if (r < 0) r += m2;
  u64 odd_q = static_cast<u64>(r);
  if ((odd_q & 1) == 0) {  // q even: p must be odd (else gcd ≥ 2), and q + p is the odd choice
    if ((big_p & 1) == 0) return std::nullopt;
    odd_q = (odd_q + big_p) % (2 * big_p);
  }
  const u64 q_mod_p = odd_q % big_p;
  if (q_mod_p == 0) return std::nullopt;
  const WordEuclid e = word_euclid(big_p, q_mod_p);
  if (e.gcd != 1) return std::nullopt;
  const u64 u = residue(e.cofactor, big_p);
  u64 v;
  if ((big_p & 1) != 0) {
    v = (u & 1) != 0 ? u : u + big_p;
  } else {
    v = detail::mulmod(odd_q, u, 2 * big_p) == 1 ? u : u + big_p;
  }
  return OrientedLinkSummaryWord{static_cast<i64>(big_p), static_cast<i64>(odd_q),
                                 static_cast<i64>(std::min(odd_q, v)),
                                 (big_p & 1) != 0 ? 1 : 2};
}

}  // namespace fourplat
