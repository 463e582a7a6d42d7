// Tests of fourplat/continued_fraction.hpp: both orders, the canonical, all-even and negative
// expansions, and the fast algorithms (product tree, half-gcd) against the plain ones.
//
// Independent references used here: the plain Euclid and sequential evaluation of namespace
// `reference`; a third evaluation by Fraction arithmetic written in this file; the
// Hirzebruch–Jung ceiling algorithm written in this file; brute force over short sequences;
// published values (OEIS convergents, Fibonacci ratios).
#include "fourplat/continued_fraction.hpp"

#include <gtest/gtest.h>

#include <algorithm>
#include <functional>
#include <map>
#include <string>
#include <vector>

#include "detail/word.hpp"
#include "testing.hpp"

namespace fp = fourplat;
using fp::Fraction;
using fp::Integer;
using fp::Terms;

namespace {

Fraction frac(long p, long q) { return Fraction(Integer(p), Integer(q)); }

Terms terms(std::initializer_list<long> v) {
  Terms t;
  for (long a : v) t.emplace_back(a);
  return t;
}

std::string show(const Terms& t) {
  std::string s = "[";
  for (std::size_t i = 0; i < t.size(); ++i) s += (i ? " " : "") + t[i].str();
  return s + "]";
}

// Value of [a0; a1, ..., an] by Fraction arithmetic, front to back recursively: a third method,
// independent of the matrix product and of the (p, q) recurrence.
Fraction value_by_fractions(const Terms& t, std::size_t i = 0) {
  if (i + 1 == t.size()) return Fraction(t[i]);
  return Fraction(t[i]) + value_by_fractions(t, i + 1).reciprocal();
}

// A random finite fraction with numerator and denominator of up to `bits` bits.
Fraction random_fraction(unsigned bits) {
  while (true) {
    Integer q = fp::testing::random_integer(bits);
    if (q != 0) return Fraction(fp::testing::random_integer(bits), q);
  }
}

// A random term sequence: small terms mostly, occasionally huge ones, any sign, zeros allowed.
Terms random_terms(std::size_t n, bool positive_tail) {
  auto& g = fp::testing::rng();
  Terms t;
  for (std::size_t i = 0; i < n; ++i) {
    Integer a;
    switch (g() % 6) {
      case 0: a = fp::testing::random_integer(200); break;
      case 1: a = fp::testing::random_integer(70); break;
      default: a = static_cast<long>(g() % 9) - 4; break;
    }
    if (positive_tail && i > 0) a = abs(a) + 1;
    t.push_back(a);
  }
  return t;
}

Integer fibonacci(int n) {
  Integer a = 0, b = 1;
  for (int i = 0; i < n; ++i) {
    Integer c = a + b;
    a = b;
    b = c;
  }
  return a;  // F(0) = 0, F(1) = 1
}

bool regular_form(const Terms& t) {
  for (std::size_t i = 1; i < t.size(); ++i)
    if (t[i] < 1) return false;
  return t.size() == 1 || t.back() >= 2;
}

}  // namespace

// ---- regular expansion: published values ----

TEST(RegularExpansion, WorkedExamples) {
  // By hand: 43/19 = 2 + 5/19, 19/5 = 3 + 4/5, 5/4 = 1 + 1/4.
  EXPECT_EQ(fp::regular_expansion(frac(43, 19)), terms({2, 3, 1, 4}));
  // Floor for negatives: −17/5 = −4 + 3/5.
  EXPECT_EQ(fp::regular_expansion(frac(-17, 5)), terms({-4, 1, 1, 2}));
  EXPECT_EQ(fp::regular_expansion(frac(-1, 2)), terms({-1, 2}));
  EXPECT_EQ(fp::regular_expansion(Fraction(7)), terms({7}));
  EXPECT_EQ(fp::regular_expansion(Fraction(0)), terms({0}));
  // Convergents of sqrt(2) = [1; 2, 2, ...]: 577/408 (OEIS A001333 / A000129).
  EXPECT_EQ(fp::regular_expansion(frac(577, 408)), terms({1, 2, 2, 2, 2, 2, 2, 2}));
  // Convergents of e = [2; 1, 2, 1, 1, 4, 1, 1, 6, ...] (OEIS A003417): 1264/465
  // (OEIS A007676 / A007677, from memory).
  EXPECT_EQ(fp::regular_expansion(frac(1264, 465)), terms({2, 1, 2, 1, 1, 4, 1, 1, 6}));
}

// F(n+1)/F(n) = [1; 1, ..., 1, 2] with n − 1 terms (common practice): the longest expansion for
// its size, the worst case of Euclid (Lamé 1844). Crosses the word boundary at n ≈ 93.
TEST(RegularExpansion, FibonacciRatiosAreAllOnes) {
  for (int n : {3, 4, 10, 50, 92, 93, 94, 95, 186, 187, 300, 1000, 5000, 30000}) {
    const Terms t = fp::regular_expansion(Fraction(fibonacci(n + 1), fibonacci(n)));
    ASSERT_EQ(t.size(), static_cast<std::size_t>(n - 1)) << "n = " << n;
    for (std::size_t i = 0; i + 1 < t.size(); ++i) ASSERT_EQ(t[i], 1) << "n = " << n << " i " << i;
    EXPECT_EQ(t.back(), 2);
  }
}

// ---- regular expansion: fast against plain, and round trips ----

TEST(RegularExpansion, AgreesWithPlainEuclidAcrossSizes) {
  const unsigned sizes[] = {8, 62, 63, 64, 65, 127, 128, 129, 200, 700, 1500, 3000, 6000, 20000};
  for (unsigned bits : sizes) {
    const int n = fp::testing::iterations(bits <= 3000 ? 200 : 15);
    for (int i = 0; i < n; ++i) {
      const Fraction x = random_fraction(bits);
      const Terms fast = fp::regular_expansion(x);
      const Terms slow = fp::reference::regular_expansion_euclid(x);
      ASSERT_EQ(fast, slow) << "bits " << bits << " x = " << fp::to_string(x);
      ASSERT_TRUE(regular_form(fast)) << fp::to_string(x);
      if (bits <= 700) {  // (Fraction arithmetic spends a gcd a term)
        ASSERT_EQ(value_by_fractions(slow), x);
      } else {
        ASSERT_EQ(fp::reference::standard_value_sequential(slow), x);
      }
    }
  }
}

// Sizes where the recursion of the half-gcd runs several levels deep.
TEST(RegularExpansion, AgreesWithPlainEuclidOnLargeInputs) {
  for (unsigned bits : {50000u, 120000u}) {
    for (int i = 0; i < fp::testing::iterations(2); ++i) {
      const Fraction x = random_fraction(bits);
      ASSERT_EQ(fp::regular_expansion(x), fp::reference::regular_expansion_euclid(x))
          << "bits " << bits;
    }
  }
}

// Uniqueness of the regular expansion: the value of any regular sequence expands back to it.
// Huge quotients (up to 10^4 bits) and long runs of ones (Fibonacci-like) included — the cases
// where a half-gcd must correct its guesses.
TEST(RegularExpansion, ExpandsValuesOfRegularSequencesBack) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(60); ++it) {
    const std::size_t n = 1 + g() % (it % 3 == 0 ? 1500 : 200);
    Terms t;
    t.push_back(fp::testing::random_integer(100));
    for (std::size_t i = 1; i < n; ++i) {
      const unsigned kind = static_cast<unsigned>(g() % 100);
      Integer a = 1;  // mostly ones: Fibonacci-like stretches
      if (kind < 2) a = abs(fp::testing::random_integer(3000)) + 1;
      else if (kind < 10) a = abs(fp::testing::random_integer(64)) + 1;
      else if (kind < 40) a = static_cast<long>(g() % 5) + 1;
      t.push_back(a);
    }
    if (n > 1 && t.back() == 1) t.back() = 2;
    const Fraction x = fp::standard_value(t);
    ASSERT_EQ(fp::regular_expansion(x), t) << "n " << n << " it " << it;
  }
}

TEST(RegularExpansion, WordBoundaries) {
  // Numerators and denominators at ±(2^63 − 1), INT64_MIN, 2^64 ± 1, 2^127 ± 1, 2^128.
  const Integer two63 = Integer(1) << 63, two64 = Integer(1) << 64, two127 = Integer(1) << 127;
  const std::vector<Integer> corners = {
      two63 - 1, -(two63 - 1), -two63, two63,      two63 + 1, two64 - 1, two64,
      two64 + 1, two127 - 1,   two127, two127 + 1, -two127,   (two127 << 1) - 1,
      Integer(1), Integer(-1), Integer(2), Integer(3)};
  for (const Integer& p : corners)
    for (const Integer& q : corners) {
      const Fraction x(p, q);
      const Terms t = fp::regular_expansion(x);
      ASSERT_EQ(t, fp::reference::regular_expansion_euclid(x)) << fp::to_string(x);
      ASSERT_EQ(fp::reference::standard_value_sequential(t), x);
    }
}

// ---- values ----

TEST(StandardValue, ThreeMethodsAgree) {
  for (int it = 0; it < fp::testing::iterations(3000); ++it) {
    const Terms t = random_terms(1 + fp::testing::rng()() % 12, false);
    Fraction by_fractions;
    try {
      by_fractions = value_by_fractions(t);
    } catch (const fp::DomainError&) {
      continue;  // unreachable for integer terms, but Fraction would say so if it were
    }
    ASSERT_EQ(fp::standard_value(t), by_fractions) << show(t);
    ASSERT_EQ(fp::reference::standard_value_sequential(t), by_fractions) << show(t);
    const fp::ValueParts parts = fp::standard_value_parts(t);
    ASSERT_EQ(parts.numerator, by_fractions.numerator()) << show(t);
    ASSERT_EQ(parts.denominator, by_fractions.denominator()) << show(t);
  }
}

TEST(StandardValue, LongSequencesTreeEqualsSequential) {
  for (std::size_t n : {1u, 2u, 3u, 17u, 1000u, 20000u}) {
    const Terms t = random_terms(n, false);
    ASSERT_EQ(fp::standard_value(t), fp::reference::standard_value_sequential(t)) << "n " << n;
  }
  // Terms at the int64 edges force the packed word matrices to spill at every step.
  const Integer big = INT64_MAX, small = INT64_MIN;
  const Terms edges = {big, small, big, Integer(1), small, Integer(-1), big + 1, small - 1, big};
  EXPECT_EQ(fp::standard_value(edges), value_by_fractions(edges));
}

// Projective convention (Conway 1970): [a 0 b] = [a + b] in either order; a trailing 0 makes
// the value ∞; [0 0] in Conway's order is ∞.
TEST(StandardValue, ZerosFollowConway) {
  for (long a : {-3L, 0L, 2L, 7L})
    for (long b : {-5L, 0L, 1L, 4L}) {
      EXPECT_EQ(fp::twist_value(terms({a, 0, b})), Fraction(a + b));
      EXPECT_EQ(fp::standard_value(terms({a, 0, b})), Fraction(a + b));
      EXPECT_EQ(fp::standard_value(terms({5, a, 0, b, 3})),
                fp::standard_value(terms({5, a + b, 3})));
    }
  EXPECT_EQ(fp::standard_value(terms({4, 0})), Fraction::infinity());
  EXPECT_EQ(fp::twist_value(terms({0, 0})), Fraction::infinity());
  EXPECT_EQ(fp::twist_value(terms({0})), Fraction(0));
  EXPECT_EQ(fp::twist_value(terms({3, 0})), frac(1, 3));  // a vertical 3: 1/[3]
}

TEST(TwistValue, IsStandardValueReadBackwards) {
  // Conway's [2 1 1 2] = 2 + 1/(1 + 1/(1 + 1/2)) = 13/5 (by hand).
  EXPECT_EQ(fp::twist_value(terms({2, 1, 1, 2})), frac(13, 5));
  EXPECT_EQ(fp::twist_value(terms({3, -2})), frac(-5, 3));  // −2 + 1/3
  for (int it = 0; it < fp::testing::iterations(500); ++it) {
    Terms t = random_terms(1 + fp::testing::rng()() % 10, false);
    const fp::TwistSequence s{t};
    std::reverse(t.begin(), t.end());
    ASSERT_EQ(fp::twist_value(s), fp::reference::standard_value_sequential(t)) << show(t);
  }
}

// ---- canonical twists (Kauffman–Lambropoulou 2004) ----

namespace {
void expect_canonical(const Fraction& x, const fp::TwistSequence& c) {
  const Terms& t = c.twists;
  ASSERT_FALSE(t.empty());
  ASSERT_EQ(fp::twist_value(c), x) << show(t);
  if (x.is_infinite()) {
    EXPECT_EQ(t, terms({0, 0}));
    return;
  }
  EXPECT_EQ(t.size() % 2, 1u) << show(t);
  Integer sum = 0;
  for (std::size_t i = 0; i < t.size(); ++i) {
    if (i + 1 < t.size()) {
      EXPECT_NE(t[i], 0) << show(t);
    }
    EXPECT_TRUE(t[i].sign() == 0 || t[i].sign() == x.sign()) << show(t);  // one sign
    sum += abs(t[i]);
  }
  EXPECT_EQ(t.back() == 0, abs(x.numerator()) < x.denominator()) << show(t);
  EXPECT_EQ(sum, fp::twist_crossings(x));
  EXPECT_EQ(fp::canonical_twists(fp::twist_value(c)), c);  // idempotent
}
}  // namespace

TEST(CanonicalTwists, WorkedExamples) {
  // 13/5 = [2; 1, 1, 2] has even length; [.., 2] = [.., 1, 1] makes it [1 1 1 1 2].
  EXPECT_EQ(fp::canonical_twists(frac(13, 5)).twists, terms({1, 1, 1, 1, 2}));
  EXPECT_EQ(fp::canonical_twists(frac(-17, 5)).twists, terms({-2, -2, -3}));
  EXPECT_EQ(fp::canonical_twists(frac(-1, 3)).twists, terms({-1, -2, 0}));
  EXPECT_EQ(fp::canonical_twists(Fraction(0)).twists, terms({0}));
  EXPECT_EQ(fp::canonical_twists(Fraction(5)).twists, terms({5}));
  EXPECT_EQ(fp::canonical_twists(Fraction::infinity()).twists, terms({0, 0}));
  // Conway 1970: differing sequences of equal fraction — mixed signs, zeros, flypes — have one
  // canonical form. [2 −1 3] = 3 + 1/(−1 + 1/2) = 1; [1 1] = [2]; [3 −2] = [−2 −1 −1].
  EXPECT_EQ(fp::canonical_twists(fp::twist_value(terms({2, -1, 3}))).twists, terms({1}));
  EXPECT_EQ(fp::canonical_twists(fp::twist_value(terms({1, 1}))).twists, terms({2}));
  EXPECT_EQ(fp::canonical_twists(fp::twist_value(terms({3, -2}))).twists, terms({-2, -1, -1}));
  EXPECT_EQ(fp::canonical_twists(fp::twist_value(terms({2, 0, 3, 4}))).twists,
            fp::canonical_twists(fp::twist_value(terms({5, 4}))).twists);
}

// Reading a sequence backwards keeps the numerator and inverts the denominator:
// p/q and p/q' with q·q' ≡ (−1)^(L+1) (mod p) for L positive terms — the continuant is
// symmetric and M(a1)···M(aL) has determinant (−1)^L (common practice; MATH.md hazard 2: an
// odd-length reversal is the same unoriented 2-bridge link). Example by hand: [2 3 4] = 30/7,
// [4 3 2] = 30/13, 7·13 = 91 ≡ 1 (mod 30).
TEST(TwistValue, ReversalKeepsNumeratorAndInvertsDenominator) {
  EXPECT_EQ(fp::twist_value(terms({2, 3, 4})), frac(30, 7));
  EXPECT_EQ(fp::twist_value(terms({4, 3, 2})), frac(30, 13));
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(1000); ++it) {
    Terms t;
    const std::size_t n = 1 + g() % 12;
    for (std::size_t i = 0; i < n; ++i) t.emplace_back(static_cast<long>(1 + g() % 30));
    Terms r(t.rbegin(), t.rend());
    const Fraction x = fp::twist_value(t), y = fp::twist_value(r);
    ASSERT_EQ(x.numerator(), y.numerator()) << show(t);
    const Integer sign = n % 2 == 1 ? 1 : -1;
    ASSERT_EQ(fp::mod_floor(x.denominator() * y.denominator() - sign, x.numerator()), 0)
        << show(t);
  }
}

TEST(CanonicalTwists, PropertiesOnRandomFractions) {
  for (unsigned bits : {4u, 20u, 64u, 130u, 400u}) {
    for (int it = 0; it < fp::testing::iterations(400); ++it) {
      const Fraction x = random_fraction(bits);
      expect_canonical(x, fp::canonical_twists(x));
      // Word route to the crossing number: the sum of partial quotients of |p|/q.
      const auto p = fp::detail::word_of(abs(x.numerator()));
      const auto q = fp::detail::word_of(x.denominator());
      if (p && q) {
        ASSERT_EQ(fp::twist_crossings(x),
                  Integer(fp::detail::partial_quotient_sum(static_cast<std::uint64_t>(*p),
                                                           static_cast<std::uint64_t>(*q))));
      }
    }
  }
  expect_canonical(Fraction::infinity(), fp::canonical_twists(Fraction::infinity()));
}

// Different fractions never share a canonical sequence; equal fractions always do.
TEST(CanonicalTwists, InjectiveOnFractions) {
  std::map<std::vector<Integer>, Fraction> seen;
  for (long p = -40; p <= 40; ++p)
    for (long q = 0; q <= 40; ++q) {
      if (p == 0 && q == 0) continue;
      const Fraction x = frac(p, q);
      const auto [where, fresh] = seen.emplace(fp::canonical_twists(x).twists, x);
      if (!fresh) {
        EXPECT_EQ(where->second, x) << "canonical form shared by two fractions";
      }
    }
}

// The canonical sequence draws the minimal diagram (Kauffman–Lambropoulou 2004, with the
// minimality of reduced alternating diagrams, Kauffman / Murasugi / Thistlethwaite 1987): no
// twist sequence of the same fraction has fewer crossings. Brute force over all sequences of
// length ≤ 5 with terms in [−3, 3].
TEST(CanonicalTwists, CrossingsAreMinimalOverAllShortSequences) {
  std::map<Fraction, Integer> least;  // fraction → least Σ|a_i| seen
  std::vector<long> t;
  std::function<void(std::size_t)> walk = [&](std::size_t len) {
    if (t.size() == len) {
      Terms s;
      long sum = 0;
      for (long a : t) s.emplace_back(a), sum += a < 0 ? -a : a;
      const Fraction x = fp::twist_value(s);
      auto [it, fresh] = least.emplace(x, Integer(sum));
      if (!fresh && it->second > sum) it->second = sum;
      return;
    }
    for (long a = -3; a <= 3; ++a) {
      t.push_back(a);
      walk(len);
      t.pop_back();
    }
  };
  for (std::size_t len = 1; len <= 5; ++len) walk(len);
  int equal = 0;
  for (const auto& [x, sum] : least) {
    const Integer c = fp::twist_crossings(x);
    ASSERT_LE(c, sum) << fp::to_string(x);
    bool reachable = true;  // is the canonical sequence itself inside the searched range?
    const Terms ct = fp::canonical_twists(x).twists;
    for (const Integer& a : ct) reachable = reachable && abs(a) <= 3;
    reachable = reachable && ct.size() <= 5;
    if (reachable) {
      EXPECT_EQ(c, sum) << fp::to_string(x);
      ++equal;
    }
  }
  EXPECT_GT(equal, 100);
}

// ---- all-even expansion ----

TEST(EvenExpansion, WorkedExamples) {
  // By hand: 5/2 = 2 + 1/2; 3/2 = 2 − 1/2; 7/4 = 2 − 1/4; 1/2 = 0 + 1/2;
  // −2/3 = 1/(−2 + 1/2); −3/4 = 1/(−4/3) with −4/3 = −2 + 1/(2 + 1/(−2)).
  EXPECT_EQ(*fp::even_expansion(frac(5, 2)), terms({2, 2}));
  EXPECT_EQ(*fp::even_expansion(frac(3, 2)), terms({2, -2}));
  EXPECT_EQ(*fp::even_expansion(frac(7, 4)), terms({2, -4}));
  EXPECT_EQ(*fp::even_expansion(frac(1, 2)), terms({0, 2}));
  EXPECT_EQ(*fp::even_expansion(frac(-2, 3)), terms({0, -2, 2}));
  EXPECT_EQ(*fp::even_expansion(frac(-3, 4)), terms({0, -2, 2, -2}));
  EXPECT_EQ(*fp::even_expansion(Fraction(0)), terms({0}));
  EXPECT_EQ(*fp::even_expansion(Fraction(-6)), terms({-6}));
  EXPECT_FALSE(fp::even_expansion(frac(3, 5)).has_value());
  EXPECT_FALSE(fp::even_expansion(Fraction(1)).has_value());
  EXPECT_THROW((void)fp::even_expansion(Fraction::infinity()), fp::DomainError);
}

// Existence exactly when p or q is even, and uniqueness: brute force over every even sequence
// with a0 ∈ [−8, 8] even, then up to 4 terms in ±{2, 4, 6, 8} (each value reached at most once),
// against even_expansion of every fraction with |p|, q ≤ 30.
TEST(EvenExpansion, ExistsExactlyWhenPOrQEvenAndIsUnique) {
  std::map<Fraction, Terms> found;
  std::vector<long> evens = {-8, -6, -4, -2, 2, 4, 6, 8};
  Terms t;
  std::function<void()> walk = [&] {
    const Fraction x = fp::standard_value(t);
    const auto [it, fresh] = found.emplace(x, t);
    ASSERT_TRUE(fresh) << "two even expansions of " << fp::to_string(x) << ": " << show(t)
                       << " and " << show(it->second);
    if (t.size() == 5) return;
    for (long a : evens) {
      t.emplace_back(a);
      walk();
      t.pop_back();
    }
  };
  for (long a0 = -8; a0 <= 8; a0 += 2) {
    t = terms({a0});
    walk();
  }
  for (long p = -30; p <= 30; ++p)
    for (long q = 1; q <= 30; ++q) {
      const Fraction x = frac(p, q);
      if (x.denominator() != q) continue;  // each fraction once
      const auto e = fp::even_expansion(x);
      const bool parity = (p % 2 == 0) || (q % 2 == 0);
      ASSERT_EQ(e.has_value(), parity) << fp::to_string(x);
      const auto hit = found.find(x);
      if (!parity) {
        ASSERT_EQ(hit, found.end()) << "odd/odd fraction with an even expansion";
        continue;
      }
      ASSERT_EQ(fp::standard_value(*e), x);
      for (std::size_t i = 0; i < e->size(); ++i) {
        ASSERT_EQ((*e)[i] % 2, 0);
        if (i > 0) {
          ASSERT_NE((*e)[i], 0);
        }
      }
      ASSERT_EQ((*e)[0] == 0, abs(x.numerator()) < x.denominator()) << fp::to_string(x);
      if (hit != found.end()) {
        ASSERT_EQ(hit->second, *e) << fp::to_string(x);
      }
    }
}

namespace {
// The direct method: a = the even integer nearest to y (|y − a| < 1), y ← 1/(y − a); gives up
// (nullopt) after `cap` terms or at an odd integer.
std::optional<Terms> nearest_even_method(Fraction y, std::size_t cap) {
  Terms out;
  while (out.size() < cap) {
    const Integer a = 2 * fp::div_floor(y.numerator() + y.denominator(), 2 * y.denominator());
    if (y.is_integer() && y.numerator() % 2 != 0) return std::nullopt;
    out.push_back(a);
    const Fraction r = y - Fraction(a);
    if (r.is_zero()) return out;
    y = r.reciprocal();
  }
  return std::nullopt;
}
}  // namespace

TEST(EvenExpansion, AgreesWithNearestEvenMethod) {
  int compared = 0;
  for (int it = 0; it < fp::testing::iterations(2000); ++it) {
    const Fraction x = random_fraction(it % 2 ? 16 : 120);
    std::optional<Terms> e;
    try {
      e = fp::even_expansion(x);
    } catch (const fp::LimitError&) {
      continue;
    }
    ASSERT_EQ(e.has_value(), x.numerator() % 2 == 0 || x.denominator() % 2 == 0);
    if (!e || e->size() > 2000) continue;
    ASSERT_EQ(nearest_even_method(x, 2001), e) << fp::to_string(x);
    ASSERT_EQ(value_by_fractions(*e), x);
    ++compared;
  }
  EXPECT_GT(compared, fp::testing::iterations(2000) / 3);
}

TEST(EvenExpansion, TooLongIsALimitError) {
  // (2^40 + 1)/2^40 = [2, −2, 2, ...] with 2^40 terms.
  const Integer n = Integer(1) << 40;
  EXPECT_THROW((void)fp::even_expansion(Fraction(n + 1, n)), fp::LimitError);
  // (N + 1)/N for N = 10 even: [2 −2 2 −2 2 −2 2 −2 2 −2] (by the rule above).
  EXPECT_EQ(fp::even_expansion(frac(11, 10))->size(), 10u);
}

// ---- negative (Hirzebruch–Jung) expansion ----

namespace {
// Hirzebruch's ceiling algorithm (Hirzebruch 1953): b = ⌈y⌉, y ← 1/(b − y) until b = y.
Terms ceiling_algorithm(const Fraction& x) {
  Terms out;
  Fraction y = x;
  while (true) {
    Integer b = -fp::div_floor(-y.numerator(), y.denominator());
    out.push_back(b);
    const Fraction r = Fraction(b) - y;
    if (r.is_zero()) return out;
    y = r.reciprocal();
  }
}
Fraction negative_by_fractions(const Terms& t, std::size_t i = 0) {
  if (i + 1 == t.size()) return Fraction(t[i]);
  return Fraction(t[i]) - negative_by_fractions(t, i + 1).reciprocal();
}
}  // namespace

TEST(NegativeExpansion, WorkedExamples) {
  // 7/3 = 3 − 1/(2 − 1/2) (by hand); n/(n − 1) = [[2, ..., 2]] with n − 1 twos, the chain of an
  // A_{n−1} singularity's resolution (common practice).
  EXPECT_EQ(fp::negative_expansion(frac(7, 3)), terms({3, 2, 2}));
  EXPECT_EQ(fp::negative_expansion(frac(6, 5)), terms({2, 2, 2, 2, 2}));
  EXPECT_EQ(fp::negative_expansion(frac(3, 8)), terms({1, 2, 3, 2}));
  EXPECT_EQ(fp::negative_expansion(Fraction(-4)), terms({-4}));
  EXPECT_EQ(fp::negative_value(terms({3, 2, 2})), frac(7, 3));
  // Any integer terms are allowed in a value: 2 − 1/(1 − 1/2) = 2 − 2 = 0 (by hand).
  EXPECT_EQ(fp::negative_value(terms({2, 1, 2})), Fraction(0));
}

TEST(NegativeExpansion, AgreesWithCeilingAlgorithm) {
  for (int it = 0; it < fp::testing::iterations(1000); ++it) {
    const Fraction x = random_fraction(it % 3 == 0 ? 12 : 80);
    // Skip the astronomically long ones (each odd-indexed quotient a gives a − 1 twos).
    const Terms regular = fp::regular_expansion(x);
    bool short_enough = true;
    for (std::size_t i = 1; i < regular.size(); i += 2) short_enough &= regular[i] < 500;
    if (!short_enough) continue;
    Terms fast;
    try {
      fast = fp::negative_expansion(x);
    } catch (const fp::LimitError&) {
      continue;  // astronomically long: see the limit test
    }
    ASSERT_EQ(fast, ceiling_algorithm(x)) << fp::to_string(x);
    for (std::size_t i = 1; i < fast.size(); ++i) ASSERT_GE(fast[i], 2);
    ASSERT_EQ(fp::negative_value(fast), x);
    ASSERT_EQ(negative_by_fractions(fast), x);
  }
}

TEST(NegativeExpansion, TooLongIsALimitError) {
  // 1/2^40 = [[1, 2, ..., 2]] with 2^40 − 1 twos.
  EXPECT_THROW((void)fp::negative_expansion(Fraction(Integer(1), Integer(1) << 40)),
               fp::LimitError);
}

// ---- bad input ----

TEST(ContinuedFraction, BadInputThrowsDomainError) {
  const std::vector<Integer> empty;
  EXPECT_THROW((void)fp::standard_value(empty), fp::DomainError);
  EXPECT_THROW((void)fp::standard_value_parts(empty), fp::DomainError);
  EXPECT_THROW((void)fp::twist_value(empty), fp::DomainError);
  EXPECT_THROW((void)fp::twist_value(fp::TwistSequence{}), fp::DomainError);
  EXPECT_THROW((void)fp::negative_value(empty), fp::DomainError);
  EXPECT_THROW((void)fp::reference::standard_value_sequential(empty), fp::DomainError);
  EXPECT_THROW((void)fp::regular_expansion(Fraction::infinity()), fp::DomainError);
  EXPECT_THROW((void)fp::reference::regular_expansion_euclid(Fraction::infinity()),
               fp::DomainError);
  EXPECT_THROW((void)fp::negative_expansion(Fraction::infinity()), fp::DomainError);
  try {
    (void)fp::regular_expansion(Fraction::infinity());
    FAIL();
  } catch (const fp::DomainError& e) {
    EXPECT_NE(std::string(e.what()).find("∞"), std::string::npos) << e.what();
  }
  try {
    (void)fp::standard_value(empty);
    FAIL();
  } catch (const fp::DomainError& e) {
    EXPECT_NE(std::string(e.what()).find("empty"), std::string::npos) << e.what();
  }
  EXPECT_EQ(fp::twist_crossings(Fraction::infinity()), 0);
}
