// Tests of fourplat::RationalTangle: constructors, the operations' action on the fraction
// against Fraction arithmetic, Conway's theorem on worked examples, and the twist sequences
// the operations carry.
#include "fourplat/tangle.hpp"

#include <gtest/gtest.h>

#include <functional>
#include <string>
#include <unordered_set>

#include "testing.hpp"

namespace fp = fourplat;
using fp::Fraction;
using fp::Integer;
using fp::RationalTangle;
using fp::TwistSequence;

namespace {

Fraction frac(long p, long q) { return Fraction(Integer(p), Integer(q)); }

TwistSequence seq(std::initializer_list<long> v) {
  TwistSequence s;
  for (long a : v) s.twists.emplace_back(a);
  return s;
}

std::string show(const TwistSequence& s) {
  std::string out = "[";
  for (std::size_t i = 0; i < s.twists.size(); ++i) out += (i ? " " : "") + s.twists[i].str();
  return out + "]";
}

// A random tangle: half from a random twist sequence (zeros and mixed signs included), half
// from a random fraction (∞ included).
RationalTangle random_tangle() {
  auto& g = fp::testing::rng();
  if (g() % 2 == 0) {
    TwistSequence s;
    const std::size_t n = 1 + g() % 7;
    for (std::size_t i = 0; i < n; ++i)
      s.twists.push_back(g() % 5 == 0 ? fp::testing::random_integer(80)
                                      : Integer(static_cast<long>(g() % 9) - 4));
    return RationalTangle(s);
  }
  const Integer p = fp::testing::random_integer(70), q = fp::testing::random_integer(70);
  if (p == 0 && q == 0) return RationalTangle::infinity();
  return RationalTangle(Fraction(p, q));
}

Integer random_twist() {
  auto& g = fp::testing::rng();
  return g() % 4 == 0 ? fp::testing::random_integer(100) : Integer(static_cast<long>(g() % 11) - 5);
}

// The carried sequence draws the tangle: its value is the tangle's fraction.
void expect_consistent(const RationalTangle& t, const std::string& what) {
  EXPECT_EQ(fp::twist_value(t.twists()), t.fraction()) << what << " " << show(t.twists());
  EXPECT_EQ(fp::twist_value(t.canonical_twists()), t.fraction()) << what;
}

}  // namespace

TEST(RationalTangle, Constructors) {
  EXPECT_EQ(RationalTangle().fraction(), Fraction(0));
  EXPECT_FALSE(RationalTangle().has_given_twists());
  EXPECT_EQ(RationalTangle().twists(), seq({0}));
  EXPECT_EQ(RationalTangle::infinity().fraction(), Fraction::infinity());
  EXPECT_EQ(RationalTangle::infinity().twists(), seq({0, 0}));
  EXPECT_EQ(RationalTangle::integer(Integer(-4)).fraction(), Fraction(-4));
  EXPECT_EQ(RationalTangle::vertical(Integer(3)).fraction(), frac(1, 3));
  EXPECT_EQ(RationalTangle::vertical(Integer(0)).fraction(), Fraction::infinity());
  const RationalTangle t(seq({2, 1, 1, 2}));
  EXPECT_TRUE(t.has_given_twists());
  EXPECT_EQ(t.twists(), seq({2, 1, 1, 2}));
  EXPECT_EQ(t.fraction(), frac(13, 5));  // 2 + 1/(1 + 1/(1 + 1/2)), by hand
  const RationalTangle f(frac(13, 5));
  EXPECT_FALSE(f.has_given_twists());
  EXPECT_EQ(f.twists(), seq({1, 1, 1, 1, 2}));
  EXPECT_EQ(t, f);
  EXPECT_THROW(RationalTangle(TwistSequence{}), fp::DomainError);
}

// Conway 1970 / Kauffman–Lambropoulou 2004: isotopic exactly when the fractions agree. Pairs of
// different sequences of one fraction — zeros ([a 0 b] = [a + b]), mixed signs, the parity move
// [.. a] = [.. a−1 1], flips (twists added on either side) — and pairs that differ.
TEST(RationalTangle, ConwaysTheoremWorkedExamples) {
  EXPECT_EQ(RationalTangle(seq({3, 0, 4})), RationalTangle(seq({7})));
  EXPECT_EQ(RationalTangle(seq({2, 5, 0, -1, 3})), RationalTangle(seq({2, 4, 3})));
  EXPECT_EQ(RationalTangle(seq({2, -1, 3})), RationalTangle(seq({1})));
  EXPECT_EQ(RationalTangle(seq({3, -2})), RationalTangle(seq({-2, -1, -1})));
  EXPECT_EQ(RationalTangle(seq({2, 3})), RationalTangle(seq({1, 1, 3})));  // innermost 2 = 1 + 1/1
  EXPECT_EQ(RationalTangle(seq({1, 1})), RationalTangle(seq({2})));
  // [n] + T = T + [n] (flip).
  const RationalTangle t(seq({2, -3, 4}));
  EXPECT_EQ(RationalTangle::integer(Integer(5)) + t, t + RationalTangle::integer(Integer(5)));
  // Same numerator, different tangles: [2 3] = 7/2 and [3 2] = 7/3.
  EXPECT_NE(RationalTangle(seq({2, 3})), RationalTangle(seq({3, 2})));
  EXPECT_NE(RationalTangle(seq({1})), RationalTangle(seq({-1})));  // [1] is chiral
  EXPECT_NE(RationalTangle(), RationalTangle::infinity());
}

TEST(RationalTangle, OperationsActOnTheFractionAsTheTableSays) {
  for (int it = 0; it < fp::testing::iterations(2000); ++it) {
    const RationalTangle t = random_tangle();
    const Fraction& f = t.fraction();
    const std::string where = fp::to_string(f) + " from " + show(t.twists());
    const Integer n = random_twist();
    // Rotation F → −1/F, mirror F → −F, inversion F → 1/F (Kauffman–Lambropoulou 2004).
    ASSERT_EQ(t.rotate().fraction(), Fraction(-1) / f) << where;
    ASSERT_EQ(t.mirror().fraction(), -f) << where;
    ASSERT_EQ(t.inverse().fraction(), Fraction(1) / f) << where;
    // T + [n]: F + n; T * 1/[n]: F/(1 + nF) (for F = ∞ the limit 1/n).
    ASSERT_EQ(t.add_horizontal(n).fraction(), f + Fraction(n)) << where;
    const Fraction vertical =
        f.is_infinite() ? Fraction(n).reciprocal()
                        : ((Fraction(1) + Fraction(n) * f).is_zero() ? Fraction::infinity()
                                                                      : f / (Fraction(1) + Fraction(n) * f));
    ASSERT_EQ(t.add_vertical(n).fraction(), vertical) << where << " n " << n;
    // T + [n] by operator+ equals the horizontal twist, on either side.
    ASSERT_EQ(t + RationalTangle::integer(n), t.add_horizontal(n));
    ASSERT_EQ(RationalTangle::integer(n) + t, t.add_horizontal(n));
    // Rotating twice is the identity on rational tangles (F → −1/(−1/F)), four times trivially.
    ASSERT_EQ(t.rotate().rotate(), t) << where;
    ASSERT_EQ(t.rotate().rotate().rotate().rotate(), t) << where;
    ASSERT_EQ(t.mirror().mirror(), t);
    ASSERT_EQ(t.inverse().inverse(), t);
    ASSERT_EQ(t.rotate(), t.inverse().mirror());  // 1/T := −T^r
    // The crossing number is invariant under the symmetries of the square and the mirror.
    const Integer c = t.crossing_number();
    ASSERT_EQ(t.rotate().crossing_number(), c) << where;
    ASSERT_EQ(t.mirror().crossing_number(), c) << where;
    ASSERT_EQ(t.inverse().crossing_number(), c) << where;
    Integer sum = 0;
    for (const Integer& a : t.canonical_twists().twists) sum += abs(a);
    ASSERT_EQ(c, sum);
    // Each operation's result carries a sequence that still draws it.
    expect_consistent(t, "t");
    expect_consistent(t.rotate(), "rotate");
    expect_consistent(t.mirror(), "mirror");
    expect_consistent(t.inverse(), "inverse");
    expect_consistent(t.add_horizontal(n), "add_horizontal");
    expect_consistent(t.add_vertical(n), "add_vertical");
    expect_consistent(t.add_vertical(n).add_vertical(n), "add_vertical twice");
  }
}

// Given sequences are extended the way the header says (so a diagram of the result is the
// user's diagram with the twists added).
TEST(RationalTangle, OperationsExtendAGivenSequence) {
  const RationalTangle t(seq({2, 3}));
  EXPECT_EQ(t.add_horizontal(Integer(4)).twists(), seq({2, 7}));
  EXPECT_EQ(t.add_vertical(Integer(4)).twists(), seq({2, 3, 4, 0}));
  EXPECT_EQ(t.add_vertical(Integer(4)).add_vertical(Integer(1)).twists(), seq({2, 3, 5, 0}));
  EXPECT_EQ(t.mirror().twists(), seq({-2, -3}));
  EXPECT_EQ(t.inverse().twists(), seq({2, 3, 0}));
  EXPECT_EQ(t.inverse().inverse().twists(), seq({2, 3}));
  EXPECT_EQ(t.rotate().twists(), seq({-2, -3, 0}));
  EXPECT_TRUE(t.rotate().has_given_twists());
  // From a fraction: nothing given, the canonical sequence of the result.
  const RationalTangle f(frac(7, 2));
  EXPECT_FALSE(f.add_horizontal(Integer(1)).has_given_twists());
  EXPECT_EQ(f.add_horizontal(Integer(1)).twists(), fp::canonical_twists(frac(9, 2)));
}

TEST(RationalTangle, SumOfTwoNonIntegerTanglesIsNotRational) {
  const RationalTangle a(frac(1, 2)), b(frac(2, 3));
  EXPECT_THROW((void)(a + b), fp::DomainError);
  EXPECT_THROW((void)(RationalTangle::infinity() + RationalTangle::infinity()), fp::DomainError);
  try {
    (void)(a + b);
  } catch (const fp::DomainError& e) {
    EXPECT_NE(std::string(e.what()).find("not rational"), std::string::npos) << e.what();
  }
  // [∞] + [n] = [∞]; [m] + [n] = [m + n].
  EXPECT_EQ(RationalTangle::infinity() + RationalTangle::integer(Integer(3)),
            RationalTangle::infinity());
  EXPECT_EQ(RationalTangle::integer(Integer(2)) + RationalTangle::integer(Integer(-7)),
            RationalTangle::integer(Integer(-5)));
}

TEST(RationalTangle, HashAgreesWithIsotopy) {
  std::unordered_set<RationalTangle> set;
  set.insert(RationalTangle(seq({2, 1, 1, 2})));
  set.insert(RationalTangle(frac(13, 5)));
  set.insert(RationalTangle(seq({1, 1, 1, 1, 2})));
  set.insert(RationalTangle(seq({3, 0, -1})));  // = [2]
  set.insert(RationalTangle::integer(Integer(2)));
  EXPECT_EQ(set.size(), 2u);
}

// Crossing numbers of small tangles by brute force: the least Σ|a_i| over all sequences with
// terms in [−3, 3] of length ≤ 4 that reach the fraction is never below crossing_number()
// (Kauffman–Lambropoulou 2004: the canonical alternating diagram is minimal).
TEST(RationalTangle, CrossingNumberIsALowerBoundForEveryDiagram) {
  std::vector<long> t;
  std::function<void(std::size_t)> walk = [&](std::size_t len) {
    if (t.size() == len) {
      TwistSequence s;
      long sum = 0;
      for (long a : t) s.twists.emplace_back(a), sum += a < 0 ? -a : a;
      const RationalTangle r(s);
      ASSERT_LE(r.crossing_number(), sum) << show(s);
      return;
    }
    for (long a = -3; a <= 3; ++a) {
      t.push_back(a);
      walk(len);
      t.pop_back();
    }
  };
  for (std::size_t len = 1; len <= 4; ++len) walk(len);
}
