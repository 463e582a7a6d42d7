// Tests of the families and random samples (families.hpp): known members against knot tables,
// patterns, and the uniformity of the samplers by a chi-squared test at a fixed seed — with a
// naive sampler as the negative control that the test must reject.
#include "fourplat/families.hpp"

#include <gtest/gtest.h>

#include <cmath>
#include <cstdint>
#include <map>
#include <set>
#include <string>
#include <utility>
#include <vector>

#include "fourplat/counts.hpp"
#include "fourplat/error.hpp"
#include "fourplat/two_bridge.hpp"
#include "testing.hpp"

namespace fourplat {
namespace {

TwoBridgeLink closure_of(const TwistSequence& t) {
  return TwoBridgeLink::numerator_closure(twist_value(t));
}

TEST(Families, TwistKnots) {
  // The twist knots with k = 1 … 6 half-twists are 3_1, 4_1, 5_2, 6_1, 7_2, 8_1 with
  // determinants 3, 5, 7, 9, 11, 13 (Rolfsen, Knots and Links, 1976, Appendix C; from memory).
  for (int k = 1; k <= 6; ++k) {
    const TwoBridgeLink l = closure_of(twist_knot_twists(k));
    EXPECT_EQ(l.crossing_number(), k + 2) << k;
    EXPECT_EQ(l.determinant(), 2 * k + 1) << k;
    EXPECT_TRUE(l.is_knot());
    EXPECT_EQ(l.is_amphichiral(), k == 2) << k;  // only the figure-eight knot
  }
  EXPECT_EQ(closure_of(twist_knot_twists(0)), TwoBridgeLink::unknot());
}

TEST(Families, TorusLinksAndDoubleTwists) {
  for (int n = 2; n <= 30; ++n) {
    const TwoBridgeLink l = closure_of(torus_twists(n));
    EXPECT_EQ(l, TwoBridgeLink(n, 1));
    EXPECT_EQ(l.crossing_number(), n);
    EXPECT_EQ(l.components(), n % 2 == 1 ? 1 : 2);
    EXPECT_EQ(l.kind(), LinkKind::torus);
  }
  EXPECT_EQ(closure_of(torus_twists(0)), TwoBridgeLink::unlink());
  // [a b] = b + 1/a = (ab + 1)/a (Conway's order, docs/conventions.md).
  for (int a = -6; a <= 6; ++a)
    for (int b = -6; b <= 6; ++b)
      if (a != 0) {
        EXPECT_EQ(twist_value(double_twist_twists(a, b)), Fraction(Integer(a * b + 1), Integer(a)));
      }
  // [2 2] is the figure-eight knot b(5,2), [3 2] the knot 5_2 = b(7,3) (common practice).
  EXPECT_TRUE(same_link(closure_of(double_twist_twists(2, 2)), TwoBridgeLink(5, 2)));
  EXPECT_TRUE(same_link(closure_of(double_twist_twists(3, 2)), TwoBridgeLink(7, 3)));
}

TEST(Families, Patterns) {
  const auto pat = parse_pattern(" [1..3 2, -1..1] ");
  ASSERT_EQ(pat.size(), 3U);
  EXPECT_EQ(pattern_size(pat), 9);
  std::vector<std::vector<int>> seen;
  for_each_pattern(pat, [&](std::span<const Integer> s) {
    std::vector<int> v;
    for (const Integer& x : s) v.push_back(x.convert_to<int>());
    seen.push_back(v);
    return true;
  });
  ASSERT_EQ(seen.size(), 9U);
  EXPECT_EQ(seen.front(), (std::vector<int>{1, 2, -1}));
  EXPECT_EQ(seen[1], (std::vector<int>{1, 2, 0}));
  EXPECT_EQ(seen.back(), (std::vector<int>{3, 2, 1}));
  int calls = 0;
  EXPECT_FALSE(for_each_pattern(pat, [&](std::span<const Integer>) { return ++calls < 4; }));
  EXPECT_EQ(calls, 4);
  EXPECT_EQ(pattern_size(parse_pattern("[123456789012345678901234567890]")), 1);
}

TEST(Families, PatternErrors) {
  auto position = [](const char* text) -> long {
    try {
      (void)parse_pattern(text);
    } catch (const ParseError& e) {
      return static_cast<long>(e.position());
    }
    return -1;
  };
  EXPECT_EQ(position("1 2]"), 0);
  EXPECT_EQ(position("[]"), 1);
  EXPECT_EQ(position("[1 2"), 4);
  EXPECT_EQ(position("[1..]"), 4);
  EXPECT_EQ(position("[1,,2]"), 3);
  EXPECT_EQ(position("[1x]"), 2);
  EXPECT_EQ(position("[1] 2"), 4);
  EXPECT_THROW((void)parse_pattern("[3..1]"), DomainError);
}

// ---- random samples ----

// Upper 0.1 % point of the chi-squared distribution with k degrees of freedom by the
// Wilson–Hilferty approximation (common practice; z = 3.0902 is the 0.999 normal quantile).
double chi2_critical(int k) {
  const double a = 2.0 / (9.0 * k);
  return k * std::pow(1.0 - a + 3.0902 * std::sqrt(a), 3.0);
}

double chi2(const std::map<std::pair<Integer, Integer>, int>& hist, int classes, int samples) {
  const double expected = static_cast<double>(samples) / classes;
  double s = 0;
  for (const auto& [k, v] : hist) s += (v - expected) * (v - expected) / expected;
  s += (classes - static_cast<int>(hist.size())) * expected;  // classes never drawn
  return s;
}

std::set<std::pair<Integer, Integer>> listed(int n, const EnumerationOptions& o) {
  std::set<std::pair<Integer, Integer>> s;
  for_each_two_bridge(n, n, o, [&](const EnumeratedLink& it) {
    s.emplace(Integer(it.p), Integer(it.q));
    return true;
  });
  return s;
}

TEST(Families, SamplesAreListedClassesInEveryMode) {
  RandomBits bits(testing::seed());
  for (const auto comp : {ComponentFilter::knots, ComponentFilter::links, ComponentFilter::both})
    for (const bool mir : {false, true})
      for (const bool ori : {false, true})
        for (int n : {0, 2, 5, 8, 9}) {
          EnumerationOptions o;
          o.components = comp;
          o.mirrors = mir;
          o.oriented = ori;
          if (count_classes(n, o) == 0) {
            EXPECT_THROW((void)sample_two_bridge(n, o, bits), DomainError);
            continue;
          }
          const auto all = listed(n, o);
          for (int i = 0; i < 40; ++i) {
            const LinkClass c = sample_two_bridge(n, o, bits);
            EXPECT_TRUE(all.count({c.p, c.q})) << "b(" << c.p << "," << c.q << ") n=" << n;
            EXPECT_EQ(c.crossings, n);
            // The drawing fraction closes to the class (big-integer path).
            const Fraction f(c.fraction_p, c.fraction_q);
            const LinkClass again = link_class_of(f, o);
            EXPECT_EQ(again.q, c.q);
            EXPECT_EQ(again.canonical_q, c.canonical_q);
            EXPECT_EQ(again.canonical_mirror_q, c.canonical_mirror_q);
            EXPECT_EQ(again.amphichiral, c.amphichiral);
            EXPECT_EQ(again.components, c.components);
          }
        }
}

TEST(Families, SamplesAreUniformChiSquared) {
  struct Case {
    int n;
    ComponentFilter comp;
    bool mirrors, oriented;
  };
  // 45 knots at 10 crossings (Ernst–Sumners 1987); links with mirrors; oriented links.
  for (const Case& cs : {Case{10, ComponentFilter::knots, false, false},
                         Case{9, ComponentFilter::links, true, false},
                         Case{8, ComponentFilter::links, false, true},
                         Case{8, ComponentFilter::both, true, true}}) {
    EnumerationOptions o;
    o.components = cs.comp;
    o.mirrors = cs.mirrors;
    o.oriented = cs.oriented;
    const int classes = static_cast<int>(count_classes(cs.n, o));
    const int samples = classes * 100;
    RandomBits bits(testing::seed() + static_cast<std::uint64_t>(cs.n));
    std::map<std::pair<Integer, Integer>, int> hist;
    for (int i = 0; i < samples; ++i) {
      const LinkClass c = sample_two_bridge(cs.n, o, bits);
      ++hist[{c.p, c.q}];
    }
    EXPECT_EQ(static_cast<int>(hist.size()), classes);
    const double s = chi2(hist, classes, samples);
    EXPECT_LT(s, chi2_critical(classes - 1)) << "n=" << cs.n << " seed=" << testing::seed();
  }
}

TEST(Families, NaiveSamplerFailsTheSameTest) {
  // Negative control: a uniform fraction mapped to its class up to mirror over-weights classes
  // with four fractions against the palindromic ones with two; the test above must see that.
  const int n = 10, classes = static_cast<int>(count_two_bridge(n).knots);
  const int samples = classes * 100;
  RandomBits bits(testing::seed());
  std::map<std::pair<Integer, Integer>, int> hist;
  int drawn = 0;
  while (drawn < samples) {
    Integer a = 1, b = 1, c = 0, d = 1;  // R, then n − 2 random letters, then R
    for (int i = 0; i < n - 2; ++i) {
      if (bits.next()) { a += b; c += d; } else { b += a; d += c; }
    }
    b += a;
    d += c;
    const TwoBridgeLink l(b, d);
    if (!l.is_knot()) continue;
    ++drawn;
    ++hist[{l.p(), l.canonical_up_to_mirror().q()}];
  }
  EXPECT_GT(chi2(hist, classes, samples), chi2_critical(classes - 1));
}

TEST(Families, RandomTanglesAreUniform) {
  const int n = 6, fractions = 64;
  RandomBits bits(testing::seed());
  std::map<std::pair<Integer, Integer>, int> hist;
  for (int i = 0; i < fractions * 100; ++i) {
    const Fraction f = sample_rational_tangle(n, bits);
    EXPECT_EQ(twist_crossings(f), n);
    ++hist[{f.numerator(), f.denominator()}];
  }
  EXPECT_EQ(static_cast<int>(hist.size()), fractions);
  EXPECT_LT(chi2(hist, fractions, fractions * 100), chi2_critical(fractions - 1));
  RandomBits b0(1);
  EXPECT_EQ(twist_crossings(sample_rational_tangle(0, b0)), 0);
}

TEST(Families, LargeCrossingNumbersAndDeterminism) {
  RandomBits a(42), b(42);
  EnumerationOptions o;
  o.oriented = true;
  for (int i = 0; i < 3; ++i) {
    const LinkClass x = sample_two_bridge(1000, o, a), y = sample_two_bridge(1000, o, b);
    EXPECT_EQ(x.q, y.q);
    const TwoBridgeLink l = TwoBridgeLink::numerator_closure(Fraction(x.fraction_p, x.fraction_q));
    EXPECT_EQ(l.crossing_number(), 1000);
    EXPECT_GT(l.p(), Integer(1) << 127);
    EXPECT_EQ(link_class_of(Fraction(x.fraction_p, x.fraction_q), o).q, x.q);
  }
  const Fraction t = sample_rational_tangle(500, a);
  EXPECT_EQ(twist_crossings(t), 500);
  EXPECT_THROW((void)sample_two_bridge(100'001, o, a), LimitError);
  EXPECT_THROW((void)sample_two_bridge(-1, o, a), DomainError);
  EXPECT_THROW((void)sample_two_bridge(1, o, a), DomainError);
  o.components = ComponentFilter::links;
  EXPECT_THROW((void)sample_two_bridge(3, o, a), DomainError);  // no 2-bridge link has 3 crossings
}

}  // namespace
}  // namespace fourplat
