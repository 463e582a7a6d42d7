// Tests of fourplat::Fraction: the invariant, ∞ rules and ordering.
#include "fourplat/fraction.hpp"

#include <gtest/gtest.h>

#include <set>

#include "testing.hpp"

namespace fp = fourplat;
using fp::Fraction;
using fp::Integer;

TEST(Fraction, ReducesAndNormalisesSign) {
  const Fraction f(Integer(6), Integer(-4));
  EXPECT_EQ(f.numerator(), -3);
  EXPECT_EQ(f.denominator(), 2);
  EXPECT_EQ(Fraction(Integer(0), Integer(-7)), Fraction(0));
  EXPECT_EQ(Fraction(Integer(0), Integer(-7)).denominator(), 1);
}

TEST(Fraction, InfinityIsOnePoint) {
  EXPECT_EQ(Fraction(Integer(-5), Integer(0)), Fraction::infinity());
  EXPECT_EQ(Fraction::infinity().numerator(), 1);
  EXPECT_EQ(-Fraction::infinity(), Fraction::infinity());
  EXPECT_EQ(Fraction(0).reciprocal(), Fraction::infinity());
  EXPECT_EQ(Fraction::infinity().reciprocal(), Fraction(0));
  EXPECT_EQ(Fraction::infinity() + Fraction(3), Fraction::infinity());
}

TEST(Fraction, UndefinedOperationsThrow) {
  EXPECT_THROW(Fraction(Integer(0), Integer(0)), fp::DomainError);
  EXPECT_THROW(Fraction::infinity() + Fraction::infinity(), fp::DomainError);
  EXPECT_THROW(Fraction(0) * Fraction::infinity(), fp::DomainError);
  EXPECT_THROW(Fraction(0) / Fraction(0), fp::DomainError);
  try {
    Fraction(Integer(0), Integer(0));
  } catch (const fp::Error& e) {
    EXPECT_NE(std::string(e.what()).find("0/0"), std::string::npos);
  }
}

TEST(Fraction, OrderPutsInfinityOnTop) {
  std::set<Fraction> s{Fraction::infinity(), Fraction(Integer(-1), Integer(2)), Fraction(3),
                       Fraction(Integer(7), Integer(3))};
  std::vector<Fraction> v(s.begin(), s.end());
  ASSERT_EQ(v.size(), 4u);
  EXPECT_EQ(v.front(), Fraction(Integer(-1), Integer(2)));
  EXPECT_EQ(v.back(), Fraction::infinity());
  EXPECT_LT(Fraction(Integer(2), Integer(3)), Fraction(Integer(3), Integer(4)));
}

// Field laws on random fractions with big entries, against GMP's own rational type
// (mpq_class via Boost's gmp_rational — a general-purpose reference library).
TEST(Fraction, ArithmeticAgreesWithGmpRational) {
  using Q = boost::multiprecision::mpq_rational;
  for (int i = 0; i < fp::testing::iterations(2000); ++i) {
    Integer a = fp::testing::random_integer(200), b = fp::testing::random_integer(200);
    Integer c = fp::testing::random_integer(200), d = fp::testing::random_integer(200);
    if (b == 0 || d == 0) continue;
    const Fraction x(a, b), y(c, d);
    const Q qx(Q(a) / Q(b)), qy(Q(c) / Q(d));
    auto same = [](const Fraction& f, const Q& q) {
      return f.numerator() == Integer(boost::multiprecision::numerator(q)) &&
             f.denominator() == Integer(boost::multiprecision::denominator(q));
    };
    EXPECT_TRUE(same(x + y, qx + qy)) << fp::to_string(x) << " + " << fp::to_string(y);
    EXPECT_TRUE(same(x - y, qx - qy));
    EXPECT_TRUE(same(x * y, qx * qy));
    if (c != 0) {
      EXPECT_TRUE(same(x / y, qx / qy));
    }
    EXPECT_EQ(x < y, qx < qy);
  }
}
