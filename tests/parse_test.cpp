// Tests of fourplat/parse.hpp: what parses to what, what is rejected and where, round trips with
// the printed forms, big numbers across the word boundaries, and huge inputs.
#include "fourplat/parse.hpp"

#include <gtest/gtest.h>

#include <chrono>
#include <string>
#include <vector>

#include "fourplat/format.hpp"
#include "testing.hpp"

namespace fp = fourplat;
using fp::Fraction;
using fp::Integer;
using fp::ParseError;

namespace {

Fraction frac(long p, long q) { return Fraction(Integer(p), Integer(q)); }

/// Position (code points) of the ParseError that parsing `text` with `parse` throws; -1 if none.
template <typename Parse>
long error_position(Parse parse, const std::string& text, std::string* message = nullptr) {
  try {
    (void)parse(text);
  } catch (const ParseError& e) {
    if (message) *message = e.what();
    return static_cast<long>(e.position());
  }
  return -1;
}

auto tangle_sum = [](const std::string& s) { return fp::parse_tangle_sum(s); };
auto tangle = [](const std::string& s) { return fp::parse_tangle(s); };
auto fraction = [](const std::string& s) { return fp::parse_fraction(s); };
auto twists = [](const std::string& s) { return fp::parse_twist_sequence(s); };
auto two_bridge = [](const std::string& s) { return fp::parse_two_bridge(s); };
auto integer = [](const std::string& s) { return fp::parse_integer(s); };

/// Decimal text of x built digit by digit (independent of GMP's conversion).
std::string decimal_by_division(Integer x) {
  if (x == 0) return "0";
  const bool negative = x < 0;
  if (negative) x = -x;
  std::string digits;
  while (x != 0) {
    digits += static_cast<char>('0' + static_cast<int>(x % 10));
    x /= 10;
  }
  if (negative) digits += '-';
  return {digits.rbegin(), digits.rend()};
}

}  // namespace

TEST(ParseInteger, SignsWhitespaceAndDecimalOnly) {
  EXPECT_EQ(fp::parse_integer("0"), 0);
  EXPECT_EQ(fp::parse_integer("-0"), 0);
  EXPECT_EQ(fp::parse_integer("+12"), 12);
  EXPECT_EQ(fp::parse_integer("-12"), -12);
  EXPECT_EQ(fp::parse_integer("\xE2\x88\x92" "12"), -12);  // U+2212 MINUS SIGN
  EXPECT_EQ(fp::parse_integer(" \t42\n"), 42);
  EXPECT_EQ(fp::parse_integer("010"), 10);  // never octal
  EXPECT_EQ(fp::parse_integer("0000000000000000000000000000007"), 7);
}

TEST(ParseInteger, WordBoundaries) {
  // 2^63 − 1, 2^63, 2^64, 2^127 and their neighbours, against shifts (not against the parser).
  const Integer two63 = Integer(1) << 63, two64 = Integer(1) << 64, two127 = Integer(1) << 127;
  for (const Integer& base : {two63, two64, two127}) {
    for (int d = -1; d <= 1; ++d) {
      for (int s : {1, -1}) {
        const Integer x = s * (base + d);
        EXPECT_EQ(fp::parse_integer(decimal_by_division(x)), x) << decimal_by_division(x);
      }
    }
  }
  EXPECT_EQ(fp::parse_integer("9223372036854775807"), two63 - 1);
  EXPECT_EQ(fp::parse_integer("-9223372036854775808"), -two63);
  EXPECT_EQ(fp::parse_integer("18446744073709551616"), two64);
  EXPECT_EQ(fp::parse_integer("170141183460469231731687303715884105728"), two127);
}

TEST(ParseInteger, RandomBigAgreeWithDigitByDigitConversion) {
  for (int i = 0; i < fp::testing::iterations(2000); ++i) {
    const Integer x = fp::testing::random_integer(600);
    const std::string text = decimal_by_division(x);
    ASSERT_EQ(fp::parse_integer(text), x) << text;
  }
}

TEST(ParseFraction, Forms) {
  EXPECT_EQ(fp::parse_fraction("7/3"), frac(7, 3));
  EXPECT_EQ(fp::parse_fraction("6/-4"), frac(-3, 2));
  EXPECT_EQ(fp::parse_fraction(" -5 / 2 "), frac(-5, 2));
  EXPECT_EQ(fp::parse_fraction("+10/4"), frac(5, 2));
  EXPECT_EQ(fp::parse_fraction("0/5"), Fraction(0));
  EXPECT_EQ(fp::parse_fraction("-17"), Fraction(-17));
  for (const char* inf : {"inf", "INF", "Inf", "-inf", "+inf", "\xE2\x88\x9E", "1/0", "-1/0", "5/0", " inf "}) {
    EXPECT_EQ(fp::parse_fraction(inf), Fraction::infinity()) << inf;
  }
}

TEST(ParseFraction, ZeroOverZeroIsAParseErrorAtTheSlash) {
  std::string message;
  EXPECT_EQ(error_position(fraction, "0/0", &message), 1);
  EXPECT_NE(message.find("0/0"), std::string::npos) << message;
  EXPECT_EQ(error_position(fraction, " -0 / 00", &message), 4);
  EXPECT_EQ(error_position(tangle_sum, "1/2 + 0/0"), 7);
}

TEST(ParseErrors, PositionsAndMessages) {
  struct Case {
    const char* text;
    long position;
  };
  const std::vector<Case> cases = {
      {"", 0},          {"   ", 3},        {"3/x", 2},     {"3/", 2},         {"- 3", 1},
      {"abc", 0},       {"3/5 x", 4},      {"3/5/7", 3},   {"3 5", 2},        {"[ ]", 2},
      {"[]", 1},        {"[3,]", 3},       {"[3,,2]", 3},  {"[3-2]", 2},      {"[3 2", 4},
      {"[3 2]]", 5},    {"[3 2] x", 6},    {"3/5 +", 5},   {"3/5 + + 2", 7},  {"+ 3/5", 1},
      {"[[2]]", 1},     {"[2 inf]", 3},    {"[2/3]", 2},   {"infinity", 3},   {"3.5", 1},
      {"0x10", 1},      {"1e5", 1},        {"3/5 - 2/7", 4},
      {"\xE2\x88\x92" "3/x", 3},  // positions count code points: the minus sign is one character
      {"3\xC3\x97" "5", 1},       // '×' is reported at character 1, not byte 1 of 2
      {"3\xFF", 1},               // a byte that is not UTF-8
  };
  for (const Case& c : cases) {
    std::string message;
    EXPECT_EQ(error_position(tangle_sum, c.text, &message), c.position) << "input: '" << c.text << "'";
    EXPECT_NE(message.find("expected"), std::string::npos) << message;
    // ParseError's what() counts characters from 1 for people.
    EXPECT_NE(message.find("at character " + std::to_string(c.position + 1) + ":"), std::string::npos)
        << message;
  }
  std::string message;
  error_position(tangle_sum, "3/", &message);
  EXPECT_NE(message.find("found end of input"), std::string::npos) << message;
  error_position(tangle_sum, "3\xFF", &message);
  EXPECT_NE(message.find("0xFF"), std::string::npos) << message;
  EXPECT_EQ(error_position(tangle, "3/5 + 2/7", &message), 4);
  EXPECT_NE(message.find("sum"), std::string::npos) << message;
  EXPECT_EQ(error_position(integer, "3/5"), 1);
  EXPECT_EQ(error_position(twists, "3"), 0);
}

TEST(ParseTwists, SeparatorsAndValues) {
  using TS = fp::TwistSequence;
  EXPECT_EQ(fp::parse_twist_sequence("[2 1 1 2]"), (TS{{2, 1, 1, 2}}));
  EXPECT_EQ(fp::parse_twist_sequence("[3,-2]"), (TS{{3, -2}}));
  EXPECT_EQ(fp::parse_twist_sequence("[ 3 , -2 ]"), (TS{{3, -2}}));
  EXPECT_EQ(fp::parse_twist_sequence("[3 ,-2,\t+4]"), (TS{{3, -2, 4}}));
  EXPECT_EQ(fp::parse_twist_sequence("[0]"), (TS{{0}}));
  // Values in Conway's order (docs/conventions.md): [2 1 2] = 2 + 1/(1 + 1/2) = 8/3.
  EXPECT_EQ(fp::parse_tangle("[2 1 2]").fraction(), frac(8, 3));
  EXPECT_EQ(fp::parse_tangle("[3 2]").fraction(), frac(7, 3));
  EXPECT_EQ(fp::parse_tangle("[0 0]").fraction(), Fraction::infinity());
  EXPECT_TRUE(fp::parse_tangle("[3 2]").has_given_twists());
  EXPECT_FALSE(fp::parse_tangle("7/3").has_given_twists());
}

// Rational knots from their Conway notation, checked by determinant against the knot table of
// Rolfsen, "Knots and Links" (1976), Appendix C (from memory): 3_1 = "3" det 3, 4_1 = "2 2" det 5,
// 5_1 = "5" det 5, 5_2 = "3 2" det 7, 6_1 = "4 2" det 9, 6_2 = "3 1 2" det 11, 6_3 = "2 1 1 2"
// det 13. The determinant does not depend on the reading order of the notation.
TEST(ParseTwists, ConwayNotationOfSmallKnotsGivesTheTableDeterminants) {
  const std::vector<std::pair<const char*, int>> table = {
      {"[3]", 3}, {"[2 2]", 5}, {"[5]", 5}, {"[3 2]", 7}, {"[4 2]", 9}, {"[3 1 2]", 11}, {"[2 1 1 2]", 13}};
  for (const auto& [text, det] : table) {
    const fp::RationalTangle t = fp::parse_tangle(text);
    EXPECT_EQ(abs(t.fraction().numerator()), det) << text;
  }
}

TEST(ParseSum, Summands) {
  const fp::TangleSum s = fp::parse_tangle_sum("3/5 + 2/7");
  ASSERT_EQ(s.summands().size(), 2u);
  EXPECT_EQ(s.summands()[0].fraction(), frac(3, 5));
  EXPECT_EQ(s.summands()[1].fraction(), frac(2, 7));
  const fp::TangleSum t = fp::parse_tangle_sum("[2 1]+[3]");
  ASSERT_EQ(t.summands().size(), 2u);
  EXPECT_TRUE(t.summands()[0].has_given_twists());
  EXPECT_EQ(fp::parse_tangle_sum("1/2+1/3+1/5").summands().size(), 3u);
  EXPECT_EQ(fp::parse_tangle_sum("3/5 + -2/7").summands()[1].fraction(), frac(-2, 7));
  EXPECT_EQ(fp::parse_tangle_sum(" 7/3 ").summands().size(), 1u);
}

TEST(ParseLink, SchubertForms) {
  const fp::TwoBridgeLink k = fp::parse_two_bridge("b(7,3)");
  EXPECT_EQ(k.p(), 7);
  EXPECT_EQ(k.q(), 3);
  EXPECT_EQ(fp::parse_two_bridge(" b( 7 , 3 ) "), k);
  EXPECT_EQ(fp::parse_two_bridge("b(7,10)"), k);  // q is taken mod p
  EXPECT_EQ(fp::parse_two_bridge("b(1,0)"), fp::TwoBridgeLink::unknot());
  EXPECT_EQ(fp::parse_two_bridge("b(0,1)"), fp::TwoBridgeLink::unlink());
  std::string message;
  EXPECT_EQ(error_position(two_bridge, "b(4,2)", &message), 0);
  EXPECT_NE(message.find("coprime"), std::string::npos) << message;
  EXPECT_EQ(error_position(two_bridge, "b(0,0)"), 0);
  EXPECT_EQ(error_position(two_bridge, "b(7,3"), 5);
  EXPECT_EQ(error_position(two_bridge, "b7,3)"), 1);
  EXPECT_EQ(error_position(two_bridge, "b(7 3)"), 4);
  EXPECT_EQ(error_position(two_bridge, "b(7,3) x"), 7);
  EXPECT_EQ(error_position(two_bridge, "7/3"), 0);
}

TEST(ParseLink, KindsAndClosures) {
  for (fp::LinkKind k : {fp::LinkKind::unlink, fp::LinkKind::unknot, fp::LinkKind::torus,
                         fp::LinkKind::hyperbolic}) {
    EXPECT_EQ(fp::parse_link_kind(fmt::format(" {} ", k)), k);
  }
  EXPECT_THROW((void)fp::parse_link_kind("unknotted"), ParseError);
  EXPECT_THROW((void)fp::parse_link_kind(""), ParseError);
  EXPECT_EQ(fp::parse_closure("numerator"), fp::Closure::numerator);
  EXPECT_EQ(fp::parse_closure("denominator"), fp::Closure::denominator);
  EXPECT_THROW((void)fp::parse_closure("num"), ParseError);
}

TEST(ParseDiagramNames, RoundTripAndErrors) {
  for (fp::Corner c : {fp::Corner::nw, fp::Corner::ne, fp::Corner::sw, fp::Corner::se}) {
    EXPECT_EQ(fp::parse_corner(fmt::format("{}", c)), c);
  }
  EXPECT_EQ(fp::parse_corner(" se "), fp::Corner::se);
  for (fp::DiagramClosure c : {fp::DiagramClosure::numerator, fp::DiagramClosure::denominator, fp::DiagramClosure::none}) {
    EXPECT_EQ(fp::parse_diagram_closure(fmt::format("{}", c)), c);
  }
  EXPECT_EQ(fp::parse_box_kind(fmt::format("{}", fp::BoxKind::vertical)), fp::BoxKind::vertical);
  EXPECT_EQ(error_position([](const std::string& s) { return fp::parse_corner(s); }, "N"), 0);
  EXPECT_EQ(error_position([](const std::string& s) { return fp::parse_corner(s); }, "NWX"), 2);
  EXPECT_EQ(error_position([](const std::string& s) { return fp::parse_diagram_closure(s); }, "nonex"), 4);
}

TEST(ParseFractionWord, FastPathAgreesWithTheFullParser) {
  EXPECT_FALSE(fp::parse_fraction_word("inf"));
  EXPECT_FALSE(fp::parse_fraction_word("1/0"));
  EXPECT_FALSE(fp::parse_fraction_word("[3]"));
  EXPECT_FALSE(fp::parse_fraction_word("3/5 + 1"));
  EXPECT_FALSE(fp::parse_fraction_word(""));
  EXPECT_FALSE(fp::parse_fraction_word("9223372036854775808"));    // 2^63
  EXPECT_FALSE(fp::parse_fraction_word("-9223372036854775808"));   // −2^63 is excluded too
  EXPECT_FALSE(fp::parse_fraction_word("1/-9223372036854775808"));
  const auto max = fp::parse_fraction_word("-9223372036854775807/ 3");
  ASSERT_TRUE(max);
  EXPECT_EQ(max->p, -9223372036854775807LL);  // 2^63 − 1 = 7² · 73 · 127 · 337 · 92737 · 649657
  EXPECT_EQ(max->q, 3);
  const auto reduced = fp::parse_fraction_word("9223372036854775807/-49");
  ASSERT_TRUE(reduced);
  EXPECT_EQ(reduced->p, -188232082384791343LL);
  EXPECT_EQ(reduced->q, 1);
  const auto r = fp::parse_fraction_word(" 6/-4 ");
  ASSERT_TRUE(r);
  EXPECT_EQ(r->p, -3);
  EXPECT_EQ(r->q, 2);
  // Random texts near the boundary, and mutations: wherever the fast path answers it agrees.
  auto& g = fp::testing::rng();
  int answered = 0;
  for (int i = 0; i < fp::testing::iterations(5000); ++i) {
    const Integer p = fp::testing::random_integer(66, g), q = fp::testing::random_integer(66, g);
    std::string text = p.str() + (g() % 3 == 0 ? " / " : "/") + q.str();
    if (g() % 7 == 0) text[g() % text.size()] = "x/ -+0"[g() % 6];
    const auto word = fp::parse_fraction_word(text);
    Fraction full;
    bool parsed = true;
    try {
      full = fp::parse_fraction(text);
    } catch (const ParseError&) {
      parsed = false;
    }
    if (word) {
      ++answered;
      ASSERT_TRUE(parsed) << text;
      ASSERT_EQ(Fraction(Integer(word->p), Integer(word->q)), full) << text;
      ASSERT_GT(word->q, 0) << text;
    } else if (parsed && !full.is_infinite()) {
      // Declined only when a number in the text does not fit a word (|n| ≥ 2^63).
      bool too_big = false;
      for (std::size_t k = 0; k < text.size();) {
        std::size_t e = k;
        while (e < text.size() && text[e] >= '0' && text[e] <= '9') ++e;
        if (e > k && fp::parse_integer(text.substr(k, e - k)) >= (Integer(1) << 63)) too_big = true;
        k = e > k ? e : k + 1;
      }
      ASSERT_TRUE(too_big) << text;
    }
  }
  EXPECT_GT(answered, 0);
}

TEST(RoundTrip, FractionsPrintAndParseBack) {
  for (int i = 0; i < fp::testing::iterations(3000); ++i) {
    const Integer p = fp::testing::random_integer(300), q = fp::testing::random_integer(300);
    if (p == 0 && q == 0) continue;
    const Fraction f(p, q);
    ASSERT_EQ(fp::parse_fraction(fmt::format("{}", f)), f) << fmt::format("{}", f);
    ASSERT_EQ(fp::parse_fraction(fp::to_string(f)), f) << fmt::format("{}", f);
    ASSERT_EQ(fp::parse_tangle(fmt::format("{}", f)).fraction(), f) << fmt::format("{}", f);
  }
}

TEST(RoundTrip, TwistSequencesTanglesAndSums) {
  auto& g = fp::testing::rng();
  for (int i = 0; i < fp::testing::iterations(1000); ++i) {
    fp::TwistSequence s;
    const std::size_t n = 1 + g() % 12;
    for (std::size_t k = 0; k < n; ++k) s.twists.push_back(fp::testing::random_integer(g() % 2 ? 8 : 90, g));
    const std::string text = fmt::format("{}", s);
    ASSERT_EQ(fp::parse_twist_sequence(text), s) << text;
    const fp::RationalTangle t = fp::parse_tangle(text);
    ASSERT_TRUE(t.has_given_twists()) << text;
    ASSERT_EQ(t.twists(), s) << text;
    ASSERT_EQ(fmt::format("{}", t), text);
    ASSERT_EQ(fp::parse_tangle(fmt::format("{}", fp::RationalTangle(t.fraction()))), t) << text;

    std::vector<fp::RationalTangle> parts = {t, fp::RationalTangle(Fraction(fp::testing::random_integer(40, g)))};
    if (g() % 2) parts.push_back(fp::RationalTangle(fp::TwistSequence{{Integer(-3), Integer(2)}}));
    const fp::TangleSum sum(parts);
    const fp::TangleSum back = fp::parse_tangle_sum(fmt::format("{}", sum));
    ASSERT_EQ(back.summands().size(), parts.size());
    for (std::size_t k = 0; k < parts.size(); ++k) {
      ASSERT_EQ(back.summands()[k], parts[k]);
      ASSERT_EQ(back.summands()[k].has_given_twists(), parts[k].has_given_twists());
    }
  }
}

TEST(RoundTrip, LinksPrintAndParseBack) {
  for (int i = 0; i < fp::testing::iterations(2000); ++i) {
    const Integer p = fp::testing::random_integer(130), q = fp::testing::random_integer(130);
    if (gcd(p, q) != 1) continue;
    const fp::TwoBridgeLink l(p, q);
    ASSERT_EQ(fp::parse_two_bridge(fmt::format("{}", l)), l) << fmt::format("{}", l);
    if (p == 0) continue;
    const fp::OrientedTwoBridgeLink o(abs(p), q);
    ASSERT_EQ(fp::parse_oriented_two_bridge(fmt::format("{}", o)), o) << fmt::format("{}", o);
  }
}

// Huge inputs finish (linear parsers, no recursion); timings belong to bench/, these only check
// that the answers are right and nothing overflows a stack.
TEST(ParseHuge, LongNumbersSequencesSumsAndNesting) {
  std::string digits(1000000, '7');
  const Integer big = fp::parse_integer(digits);
  EXPECT_EQ(big * 9, 7 * (boost::multiprecision::pow(Integer(10), 1000000) - 1));  // 77...7 = 7(10^n − 1)/9

  std::string bad = std::string(1000000, '1') + "x";
  EXPECT_EQ(error_position(fraction, bad), 1000000);

  // [1 1 ... 1] with n terms is F(n+1)/F(n) (Fibonacci numbers: the all-ones continued fraction).
  std::string ones = "[";
  for (int k = 0; k < 20000; ++k) ones += k ? " 1" : "1";
  ones += "]";
  const Fraction f = fp::parse_tangle(ones).fraction();
  Integer a = 1, b = 1;  // F(1), F(2)
  for (int k = 2; k <= 20000; ++k) {
    Integer c = a + b;
    a = b;
    b = c;
  }
  EXPECT_EQ(f, Fraction(b, a));

  std::string sum = "1";
  for (int k = 0; k < 100000; ++k) sum += "+1";
  EXPECT_EQ(fp::parse_tangle_sum(sum).summands().size(), 100001u);

  const std::string nested(200000, '[');
  EXPECT_EQ(error_position(tangle_sum, nested), 1);
  EXPECT_EQ(error_position(tangle_sum, std::string(200000, ' ') + "]"), 200000);
}
