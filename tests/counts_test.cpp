// Tests of the closed-form counts (counts.hpp) against published values, against Schubert's
// theorem applied to every fraction, and against a numerical Burnside count in big integers
// that crosses the 2^63, 2^64 and 2^127 boundaries.
#include "fourplat/counts.hpp"

#include <gtest/gtest.h>

#include <algorithm>
#include <array>
#include <cstdint>
#include <map>
#include <numeric>
#include <set>
#include <tuple>
#include <vector>

#include "fourplat/error.hpp"

namespace fourplat {
namespace {

using i64 = std::int64_t;

// Ernst–Sumners, "The growth of the number of prime knots", Math. Proc. Camb. Phil. Soc. 102
// (1987): the number of 2-bridge knots with n ≥ 3 crossings, a knot and its mirror counted once,
// typed in from the published four-case formula.
Integer ernst_sumners(i64 n) {
  const auto p2 = [](i64 k) { return Integer(1) << static_cast<unsigned>(k); };
  switch (n % 4) {
    case 0: return (p2(n - 3) + p2((n - 4) / 2)) / 3;
    case 1: return (p2(n - 3) + p2((n - 3) / 2)) / 3;
    case 2: return (p2(n - 3) + p2((n - 4) / 2) - 1) / 3;
    default: return (p2(n - 3) + p2((n - 3) / 2) + 1) / 3;
  }
}

TEST(Counts, ErnstSumnersPublishedValues) {
  // Ernst–Sumners 1987 (and OEIS A018240): n = 3 … 12.
  const std::array<int, 10> published{1, 1, 2, 3, 7, 12, 24, 45, 91, 176};
  for (int i = 0; i < 10; ++i) {
    EXPECT_EQ(count_two_bridge(i + 3).knots, published[static_cast<std::size_t>(i)]) << "n=" << i + 3;
  }
  // OEIS A018240, further terms n = 13 … 20 (from memory).
  const std::array<int, 8> more{352, 693, 1387, 2752, 5504, 10965, 21931, 43776};
  for (int i = 0; i < 8; ++i) {
    EXPECT_EQ(count_two_bridge(i + 13).knots, more[static_cast<std::size_t>(i)]) << "n=" << i + 13;
  }
}

TEST(Counts, ErnstSumnersFormulaForManyN) {
  for (i64 n = 3; n <= 300; ++n) EXPECT_EQ(count_two_bridge(n).knots, ernst_sumners(n)) << n;
  // n = 10^4 (≡ 0 mod 4): a 3000-digit answer.
  EXPECT_EQ(count_two_bridge(10000).knots, ernst_sumners(10000));
}

TEST(Counts, AllClassesMatchBinaryStringsUpToReversalAndComplement) {
  // OEIS A005418, binary strings of length m up to reversal and complement, m = 1 … 12 (from
  // memory): the 2-bridge knots and links with n = m + 2 crossings up to mirror image.
  const std::array<int, 12> a005418{1, 2, 3, 6, 10, 20, 36, 72, 136, 272, 528, 1056};
  for (int m = 1; m <= 12; ++m) {
    const TwoBridgeCounts c = count_two_bridge(m + 2);
    EXPECT_EQ(c.knots + c.links, a005418[static_cast<std::size_t>(m - 1)]) << "n=" << m + 2;
  }
}

TEST(Counts, SmallCrossingNumbers) {
  // The unknot and the unlink at 0 (fourplat's convention); nothing at 1; the Hopf link at 2,
  // with its two orientations b(2,1), b(2,3), mirror images of each other (common practice).
  const TwoBridgeCounts c0 = count_two_bridge(0), c1 = count_two_bridge(1), c2 = count_two_bridge(2);
  EXPECT_EQ(c0.knots, 1);
  EXPECT_EQ(c0.links, 1);
  EXPECT_EQ(c1.knots + c1.links + c1.knots_with_mirrors + c1.links_oriented_with_mirrors, 0);
  EXPECT_EQ(c2.knots, 0);
  EXPECT_EQ(c2.links, 1);
  EXPECT_EQ(c2.links_oriented, 1);
  EXPECT_EQ(c2.links_oriented_with_mirrors, 2);
  EXPECT_EQ(c2.amphichiral_links, 1);
  // Rolfsen's table (Knots and Links, 1976, Appendix C; from memory): the 2-bridge knots with
  // 4 … 7 crossings are 4_1; 5_1, 5_2; 6_1, 6_2, 6_3; 7_1 … 7_7, of which 4_1 and 6_3 are
  // amphichiral, and the two-component 2-bridge links of 5 crossings: the Whitehead link only.
  EXPECT_EQ(count_two_bridge(6).amphichiral_knots, 1);
  EXPECT_EQ(count_two_bridge(7).knots_with_mirrors, 14);
  EXPECT_EQ(count_two_bridge(5).links, 1);
  // Amphichiral 2-bridge knots in the same table (from memory): 8_3, 8_9, 8_12 and
  // 10_17, 10_33, 10_37, 10_43, 10_45.
  EXPECT_EQ(count_two_bridge(8).amphichiral_knots, 3);
  EXPECT_EQ(count_two_bridge(10).amphichiral_knots, 5);
  for (i64 n = 0; n <= 30; ++n) {
    EXPECT_EQ(count_rational_tangles(n), n == 0 ? Integer(2) : Integer(1) << static_cast<unsigned>(n));
  }
}

// ---- Schubert's theorem applied to every fraction (independent of the word model) ----

i64 partial_quotient_sum(i64 p, i64 q) {
  i64 s = 0;
  while (q != 0) {
    s += p / q;
    const i64 r = p % q;
    p = q;
    q = r;
  }
  return s;
}

i64 inverse_mod(i64 a, i64 m) {  // extended Euclid; gcd(a, m) = 1, m ≥ 2
  i64 r0 = m, r1 = a % m, s0 = 0, s1 = 1;
  while (r1 != 0) {
    const i64 t = r0 / r1;
    std::tie(r0, r1) = std::make_tuple(r1, r0 - t * r1);
    std::tie(s0, s1) = std::make_tuple(s1, s0 - t * s1);
  }
  return ((s0 % m) + m) % m;
}

struct BruteCounts {
  std::map<std::string, i64> value;
};

// Classes of b(p,q), 0 < q < p, with crossing number n, found by grouping fractions with the
// criteria of Schubert 1956 (as stated by Kauffman–Lambropoulou, Enseign. Math. 49, 2003):
// unoriented q' ≡ q^{±1} (mod p), mirror q → −q, oriented q' ≡ q^{±1} (mod 2p) for odd q, q'.
// A class key includes p (two different p never give the same link).
std::map<i64, BruteCounts> brute_force(i64 max_n) {
  std::vector<i64> fib{0, 1};
  while (static_cast<i64>(fib.size()) < max_n + 3) fib.push_back(fib[fib.size() - 1] + fib[fib.size() - 2]);
  std::map<i64, std::set<std::vector<i64>>> sets[8];
  for (i64 p = 2; p <= fib[static_cast<std::size_t>(max_n + 1)]; ++p) {
    for (i64 q = 1; q < p; ++q) {
      if (std::gcd(p, q) != 1) continue;
      const i64 n = partial_quotient_sum(p, q);
      if (n > max_n) continue;
      const bool knot = p % 2 == 1;
      const i64 qi = inverse_mod(q, p);
      const bool amph = (q * q) % p == p - 1 || p == 2;
      auto key = [p](std::vector<i64> v) {
        std::sort(v.begin(), v.end());
        v.erase(std::unique(v.begin(), v.end()), v.end());
        v.insert(v.begin(), p);
        return v;
      };
      const int kind = knot ? 0 : 1;
      sets[kind * 4 + 0][n].insert(key({q, qi, p - q, p - qi}));      // up to mirror
      sets[kind * 4 + 1][n].insert(key({q, qi}));                     // mirrors distinguished
      if (amph) sets[kind * 4 + 2][n].insert(key({q, qi}));           // amphichiral classes
      if (!knot) {
        for (const i64 lift : {q, q + p}) {  // both lifts are odd when p is even
          const i64 li = inverse_mod(lift, 2 * p);
          sets[3][n].insert(key({lift, li}));                                   // oriented
          sets[7][n].insert(key({lift, li, 2 * p - lift, 2 * p - li}));         // oriented, up to mirror
        }
      }
    }
  }
  std::map<i64, BruteCounts> out;
  const char* names[8] = {"knots", "knots_with_mirrors", "amphichiral_knots", "links_oriented_with_mirrors",
                          "links", "links_with_mirrors", "amphichiral_links", "links_oriented"};
  for (i64 n = 2; n <= max_n; ++n) {
    for (int k = 0; k < 8; ++k) out[n].value[names[k]] = static_cast<i64>(sets[k][n].size());
  }
  return out;
}

TEST(Counts, AgreeWithSchubertOnEveryFraction) {
  const i64 max_n = 15;  // every p ≤ F_16 = 987
  const auto brute = brute_force(max_n);
  for (i64 n = 2; n <= max_n; ++n) {
    const TwoBridgeCounts c = count_two_bridge(n);
    const auto& b = brute.at(n).value;
    EXPECT_EQ(c.knots, b.at("knots")) << n;
    EXPECT_EQ(c.knots_with_mirrors, b.at("knots_with_mirrors")) << n;
    EXPECT_EQ(c.amphichiral_knots, b.at("amphichiral_knots")) << n;
    EXPECT_EQ(c.links, b.at("links")) << n;
    EXPECT_EQ(c.links_with_mirrors, b.at("links_with_mirrors")) << n;
    EXPECT_EQ(c.amphichiral_links, b.at("amphichiral_links")) << n;
    EXPECT_EQ(c.links_oriented, b.at("links_oriented")) << n;
    EXPECT_EQ(c.links_oriented_with_mirrors, b.at("links_oriented_with_mirrors")) << n;
  }
}

// ---- a numerical Burnside count over GL2(F_2), in big integers ----

// 2×2 matrices over F_2 as bits (a b / c d) = a·8 + b·4 + c·2 + d.
using M2 = int;
constexpr M2 mul2(M2 x, M2 y) {
  const int a = x >> 3 & 1, b = x >> 2 & 1, c = x >> 1 & 1, d = x & 1;
  const int e = y >> 3 & 1, f = y >> 2 & 1, g = y >> 1 & 1, h = y & 1;
  return ((a * e + b * g) & 1) << 3 | ((a * f + b * h) & 1) << 2 | ((c * e + d * g) & 1) << 1 |
         ((c * f + d * h) & 1);
}
constexpr M2 kR2 = 0b1101, kL2 = 0b1011, kJ2 = 0b0110, kI2 = 0b1001;
constexpr M2 inv2(M2 x) {  // det = 1 over F_2: the inverse is the adjugate
  const int a = x >> 3 & 1, b = x >> 2 & 1, c = x >> 1 & 1, d = x & 1;
  return d << 3 | b << 2 | c << 1 | a;
}
constexpr bool beta_even(M2 m) { return (m >> 2 & 1) == 0; }
constexpr bool gamma_odd(M2 m) { return (m >> 1 & 1) == 1; }

// count[X] of words of length len with product ≡ X (mod 2).
std::map<M2, Integer> words_by_product(i64 len) {
  std::map<M2, Integer> c{{kI2, Integer(1)}};
  for (i64 i = 0; i < len; ++i) {
    std::map<M2, Integer> d;
    for (const auto& [x, k] : c) {
      d[mul2(x, kR2)] += k;
      d[mul2(x, kL2)] += k;
    }
    c = std::move(d);
  }
  return c;
}

// Burnside over the Klein group with fixed points counted numerically; the orientation rule
// from first principles: a palindromic link word is fixed by inversion mod 2p iff γ is even, a
// reverse-complement-fixed link word by inversion-and-mirror mod 2p iff γ is odd.
TwoBridgeCounts burnside(i64 n) {
  const i64 m = n - 2;
  Integer e, k, pe, pk, pl_even, ae, ak, al_odd;
  for (const auto& [w, c] : words_by_product(m)) {
    (beta_even(mul2(mul2(kR2, w), kR2)) ? e : k) += c;
  }
  const auto half = words_by_product(m / 2);
  for (const auto& [v, c] : half) {
    // palindromes v·x·rev(v): rev(v) ≡ v⁻¹ (mod 2), the letters being involutions mod 2
    std::vector<M2> mids;
    if (m % 2 == 1) mids = {kR2, kL2}; else mids = {kI2};
    for (const M2 x : mids) {
      const M2 full = mul2(mul2(kR2, mul2(mul2(v, x), inv2(v))), kR2);
      if (beta_even(full)) {
        pe += c;
        if (!gamma_odd(full)) pl_even += c;
      } else {
        pk += c;
      }
    }
    if (m % 2 == 0) {  // v·rc(v): complement is conjugation by J
      const M2 full = mul2(mul2(kR2, mul2(v, mul2(mul2(kJ2, inv2(v)), kJ2))), kR2);
      if (beta_even(full)) {
        ae += c;
        if (gamma_odd(full)) al_odd += c;
      } else {
        ak += c;
      }
    }
  }
  TwoBridgeCounts r;
  r.crossings = n;
  r.knots = (k + pk + ak) / 4;
  r.knots_with_mirrors = (k + pk) / 2;
  r.links = (e + pe + ae) / 4;
  r.links_with_mirrors = (e + pe) / 2;
  // Oriented: each unoriented class has two lifts mod 2p; Burnside on lifts.
  r.links_oriented_with_mirrors = (2 * e + 2 * pl_even) / 2;
  r.links_oriented = (2 * e + 2 * pl_even + 2 * al_odd) / 4;
  r.amphichiral_knots = ak / 2;
  r.amphichiral_links = ae / 2;
  return r;
}

TEST(Counts, ClosedFormsAgreeWithNumericalBurnsideAcrossWordBoundaries) {
  // n = 3 … 140 crosses 2^63 (n ≈ 68), 2^64 and 2^127 (n ≈ 132) in every count.
  bool crossed63 = false, crossed64 = false, crossed127 = false;
  for (i64 n = 3; n <= 140; ++n) {
    const TwoBridgeCounts c = count_two_bridge(n), b = burnside(n);
    EXPECT_EQ(c.knots, b.knots) << n;
    EXPECT_EQ(c.knots_with_mirrors, b.knots_with_mirrors) << n;
    EXPECT_EQ(c.links, b.links) << n;
    EXPECT_EQ(c.links_with_mirrors, b.links_with_mirrors) << n;
    EXPECT_EQ(c.links_oriented, b.links_oriented) << n;
    EXPECT_EQ(c.links_oriented_with_mirrors, b.links_oriented_with_mirrors) << n;
    EXPECT_EQ(c.amphichiral_knots, b.amphichiral_knots) << n;
    EXPECT_EQ(c.amphichiral_links, b.amphichiral_links) << n;
    crossed63 = crossed63 || c.links >= (Integer(1) << 63);
    crossed64 = crossed64 || c.links >= (Integer(1) << 64);
    crossed127 = crossed127 || c.links >= (Integer(1) << 127);
  }
  EXPECT_TRUE(crossed63 && crossed64 && crossed127);
}

TEST(Counts, CountClassesFollowsTheOptions) {
  for (i64 n = 0; n <= 12; ++n) {
    const TwoBridgeCounts c = count_two_bridge(n);
    EnumerationOptions o;
    EXPECT_EQ(count_classes(n, o), c.knots + c.links);
    o.components = ComponentFilter::knots;
    o.oriented = true;
    EXPECT_EQ(count_classes(n, o), c.knots);  // knots are invertible
    o.components = ComponentFilter::links;
    o.mirrors = true;
    EXPECT_EQ(count_classes(n, o), c.links_oriented_with_mirrors);
  }
}

TEST(Counts, Errors) {
  EXPECT_THROW((void)count_two_bridge(-1), DomainError);
  EXPECT_THROW((void)count_two_bridge(100'000'001), LimitError);
  EXPECT_THROW((void)count_rational_tangles(-3), DomainError);
}

}  // namespace
}  // namespace fourplat
