// Tests of fourplat/format.hpp: the text of every formatter, the standard width/fill/alignment
// specification on each, and agreement with the to_string functions.
#include "fourplat/format.hpp"

#include <gtest/gtest.h>

#include <string>

#include "testing.hpp"

namespace fp = fourplat;
using fp::Fraction;
using fp::Integer;

namespace {
Fraction frac(long p, long q) { return Fraction(Integer(p), Integer(q)); }

/// Decimal text by repeated division (independent of GMP's conversion).
std::string decimal(Integer x) {
  if (x == 0) return "0";
  const bool negative = x < 0;
  if (negative) x = -x;
  std::string d;
  while (x != 0) {
    d.insert(d.begin(), static_cast<char>('0' + static_cast<int>(x % 10)));
    x /= 10;
  }
  return negative ? "-" + d : d;
}
}  // namespace

TEST(Format, Integers) {
  EXPECT_EQ(fmt::format("{}", Integer(0)), "0");
  EXPECT_EQ(fmt::format("{}", Integer(-42)), "-42");
  // Across the word boundaries 2^63, 2^64, 2^127 (digits from 2^k by exact doubling).
  for (unsigned k : {62U, 63U, 64U, 65U, 127U, 128U, 1000U}) {
    for (int d = -1; d <= 1; ++d) {
      const Integer x = (Integer(1) << k) + d;
      EXPECT_EQ(fmt::format("{}", x), decimal(x));
      EXPECT_EQ(fmt::format("{}", -x), decimal(-x));
    }
  }
  EXPECT_EQ(fmt::format("{}", Integer(1) << 64), "18446744073709551616");
  for (int i = 0; i < fp::testing::iterations(500); ++i) {
    const Integer x = fp::testing::random_integer(400);
    ASSERT_EQ(fmt::format("{}", x), decimal(x));
  }
}

TEST(Format, FractionsAndInfinity) {
  EXPECT_EQ(fmt::format("{}", frac(7, 3)), "7/3");
  EXPECT_EQ(fmt::format("{}", frac(6, -4)), "-3/2");
  EXPECT_EQ(fmt::format("{}", Fraction(5)), "5");
  EXPECT_EQ(fmt::format("{}", Fraction(0)), "0");
  EXPECT_EQ(fmt::format("{}", Fraction::infinity()), "1/0");
}

TEST(Format, TwistsTanglesAndSums) {
  EXPECT_EQ(fmt::format("{}", fp::TwistSequence{{2, 1, 1, 2}}), "[2 1 1 2]");
  EXPECT_EQ(fmt::format("{}", fp::TwistSequence{{3, -2}}), "[3 -2]");
  EXPECT_EQ(fp::to_string(fp::TwistSequence{{Integer(1) << 70}}), "[1180591620717411303424]");
  // A tangle prints the twists it was given, or else its fraction.
  const fp::RationalTangle given(fp::TwistSequence{{2, 1, 2}});
  EXPECT_EQ(fmt::format("{}", given), "[2 1 2]");
  EXPECT_EQ(fmt::format("{}", fp::RationalTangle(frac(8, 3))), "8/3");
  EXPECT_EQ(fmt::format("{}", fp::RationalTangle::infinity()), "1/0");
  const fp::TangleSum s({fp::RationalTangle(frac(3, 5)), given, fp::RationalTangle(Fraction(-2))});
  EXPECT_EQ(fmt::format("{}", s), "3/5 + [2 1 2] + -2");
  EXPECT_EQ(fp::to_string(s), fmt::format("{}", s));
}

TEST(Format, LinksKindsAndClosures) {
  EXPECT_EQ(fmt::format("{}", fp::TwoBridgeLink(Integer(7), Integer(3))), "b(7,3)");
  EXPECT_EQ(fmt::format("{}", fp::TwoBridgeLink::unknot()), "b(1,0)");
  EXPECT_EQ(fmt::format("{}", fp::TwoBridgeLink::unlink()), "b(0,1)");
  const fp::OrientedTwoBridgeLink o(Integer(8), Integer(3));
  EXPECT_EQ(fmt::format("{}", o), fp::to_string(o));
  EXPECT_EQ(fmt::format("{}", fp::LinkKind::torus), "torus");
  EXPECT_EQ(fmt::format("{}", fp::LinkKind::hyperbolic), "hyperbolic");
  EXPECT_EQ(fmt::format("{}", fp::Closure::numerator), "numerator");
  EXPECT_EQ(fmt::format("{}", fp::Closure::denominator), "denominator");
}

TEST(Format, WidthFillAndAlignmentOnEveryType) {
  EXPECT_EQ(fmt::format("{:>8}", Integer(42)), "      42");
  EXPECT_EQ(fmt::format("{:<6}|", frac(7, 3)), "7/3   |");
  EXPECT_EQ(fmt::format("{:*^9}", frac(7, 3)), "***7/3***");
  EXPECT_EQ(fmt::format("{:>10}", fp::TwistSequence{{3, 2}}), "     [3 2]");
  EXPECT_EQ(fmt::format("{:-<10}", fp::TwoBridgeLink(Integer(5), Integer(2))), "b(5,2)----");
  EXPECT_EQ(fmt::format("{:^12}", fp::LinkKind::unknot), "   unknot   ");
  EXPECT_EQ(fmt::format("{:>13}", fp::Closure::numerator), "    numerator");
  EXPECT_EQ(fmt::format("{:>5}", fp::RationalTangle(Fraction(3))), "    3");
  EXPECT_EQ(fmt::format("{:>9}", fp::TangleSum({fp::RationalTangle(Fraction(1)),
                                                 fp::RationalTangle(frac(1, 2))})),
            "  1 + 1/2");
  EXPECT_EQ(fmt::format("{:>{}}", Integer(7), 4), "   7");  // dynamic width
  EXPECT_EQ(fmt::format("{:.3}", fp::TwistSequence{{1, 2, 3}}), "[1 ");  // precision truncates
  // A value wider than the width is never cut.
  EXPECT_EQ(fmt::format("{:3}", Integer(123456)), "123456");
  EXPECT_THROW((void)fmt::format(fmt::runtime("{:d}"), Integer(1)), fmt::format_error);
}

TEST(Format, DiagramTypes) {
  EXPECT_EQ(fmt::format("{}", fp::Corner::nw), "NW");
  EXPECT_EQ(fmt::format("{:>4}", fp::Corner::se), "  SE");
  EXPECT_EQ(fmt::format("{}", fp::DiagramClosure::none), "none");
  EXPECT_EQ(fmt::format("{:<12}|", fp::DiagramClosure::denominator), "denominator |");
  EXPECT_EQ(fmt::format("{}", fp::BoxKind::vertical), "vertical");
  // The PD code of a made-up three-crossing code, in the trade's X[i,j,k,l] notation.
  const fp::PdCode pd = {{4, 2, 5, 1}, {2, 6, 3, 5}, {6, 4, 1, 3}};
  EXPECT_EQ(fmt::format("{}", pd), "X[4,2,5,1] X[2,6,3,5] X[6,4,1,3]");
  EXPECT_EQ(fmt::format("{}", pd), fp::to_string(pd));
}
