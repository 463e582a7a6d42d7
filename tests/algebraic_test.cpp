// Tests of fourplat/algebraic.hpp: sums of rational tangles.
//
// The Ernst–Sumners closure formula (Math. Proc. Camb. Phil. Soc. 108, 1990) is checked against
// things it was not derived from:
//   * the Kauffman bracket (Kauffman, "State models and the Jones polynomial", Topology 26, 1987)
//     of the diagram of the sum, computed by the tangle-bracket recursion of Goldman–Kauffman
//     ("Rational tangles", Adv. Appl. Math. 18, 1997) over the twist boxes of both summands, must
//     equal the bracket of the standard diagram of b(P,Q) up to a unit (−A³)^k — and in general
//     not that of its mirror, which pins the sign of the determinant-one condition;
//   * |⟨L⟩| at A = e^{iπ/4} is the determinant and |⟨L⟩| at A = 1 is 2^{c−1} for c components
//     (common practice: V(−1) and V(1) = (−2)^{c−1}, Lickorish–Millett, Comment. Math. Helv. 61,
//     1986), for sums of any number of parts;
//   * the two-column pretzel link N(1/[n] + 1/[m]) is one twist region of n + m crossings
//     (crossings slide between the columns — common practice), i.e. N(1/[n+m−1] + [1]);
//   * Kauffman–Lambropoulou's unknotting criterion ("Hard unknots and collapsing tangles",
//     arXiv:math/0601525): N(P/Q + R/S) is the unknot iff |PS + QR| = 1.
#include "fourplat/algebraic.hpp"

#include <gtest/gtest.h>

#include <cstdint>
#include <ostream>
#include <cstdlib>
#include <map>
#include <random>
#include <string>
#include <vector>

#include "fourplat/continued_fraction.hpp"
#include "fourplat/error.hpp"
#include "fourplat/two_bridge.hpp"
#include "testing.hpp"

namespace fourplat {

// Readable failure messages ("b(7,3)" rather than bytes); found by argument-dependent lookup.
void PrintTo(const TwoBridgeLink& l, std::ostream* os) { *os << to_string(l); }
void PrintTo(const OrientedTwoBridgeLink& l, std::ostream* os) { *os << to_string(l); }

namespace {

using testing::iterations;
using testing::rng;

// ---------------------------------------------------------------------------------------------
// A small Laurent polynomial in A and the tangle bracket ⟨T⟩ = f·⟨[0]⟩ + g·⟨[∞]⟩.

struct Poly {
  std::map<int, std::int64_t> c;  // exponent → coefficient, no zero coefficients

  static Poly monomial(int e, std::int64_t k = 1) {
    Poly p;
    if (k != 0) p.c[e] = k;
    return p;
  }
  friend Poly operator+(const Poly& a, const Poly& b) {
    Poly r = a;
    for (const auto& [e, k] : b.c) {
      if ((r.c[e] += k) == 0) r.c.erase(e);
    }
    return r;
  }
  friend Poly operator*(const Poly& a, const Poly& b) {
    Poly r;
    for (const auto& [e1, k1] : a.c) {
      for (const auto& [e2, k2] : b.c) {
        if ((r.c[e1 + e2] += k1 * k2) == 0) r.c.erase(e1 + e2);
      }
    }
    return r;
  }
  friend bool operator==(const Poly&, const Poly&) = default;
  std::string str() const {
    std::string s;
    for (const auto& [e, k] : c) s += (k < 0 ? " - " : " + ") + std::to_string(std::llabs(k)) + "A^" + std::to_string(e);
    return s.empty() ? "0" : s;
  }
};

const Poly kDelta = Poly::monomial(2, -1) + Poly::monomial(-2, -1);  // δ = −A² − A⁻²

struct Bracket {
  Poly f, g;
};

// The crossing [±1]: ⟨[1]⟩ = A⟨[0]⟩ + A⁻¹⟨[∞]⟩ (the A-smoothing of the crossing of
// docs/conventions.md opens the horizontal channel); ⟨[−1]⟩ swaps A and A⁻¹.
Bracket crossing(int sign) { return {Poly::monomial(sign), Poly::monomial(-sign)}; }

// T + S: [0]+[0] = [0], [0]+[∞] = [∞]+[0] = [∞], [∞]+[∞] = δ[∞] (a loop in the middle).
Bracket add(const Bracket& x, const Bracket& y) {
  return {x.f * y.f, x.f * y.g + x.g * y.f + kDelta * x.g * y.g};
}
// T * S (S below T): [0]*[0] = δ[0], [0]*[∞] = [∞]*[0] = [0], [∞]*[∞] = [∞].
Bracket stack(const Bracket& x, const Bracket& y) {
  return {kDelta * x.f * y.f + x.f * y.g + x.g * y.f, x.g * y.g};
}
Poly numerator(const Bracket& b) { return kDelta * b.f + b.g; }
Poly denominator(const Bracket& b) { return b.f + kDelta * b.g; }

/// A rational tangle drawn crossing by crossing from a Conway twist sequence, with its fraction
/// tracked alongside as (p, q) (horizontal twist: p += a·q; vertical twist: q += a·p).
struct Drawn {
  Bracket bracket;
  Integer p, q;
  int crossings = 0;
};

Drawn draw(const std::vector<Integer>& twists) {
  Drawn d;
  const bool odd = twists.size() % 2 == 1;
  d.bracket = odd ? Bracket{Poly::monomial(0), Poly{}} : Bracket{Poly{}, Poly::monomial(0)};
  d.p = odd ? 0 : 1;
  d.q = odd ? 1 : 0;
  for (std::size_t i = 0; i < twists.size(); ++i) {
    const bool horizontal = (twists.size() - 1 - i) % 2 == 0;  // the last twist is horizontal
    const Integer& a = twists[i];
    const int sign = a < 0 ? -1 : 1;
    for (Integer k = 0; k < abs(a); ++k) {
      d.bracket = horizontal ? add(d.bracket, crossing(sign)) : stack(d.bracket, crossing(sign));
      ++d.crossings;
    }
    if (horizontal) {
      d.p += a * d.q;
    } else {
      d.q += a * d.p;
    }
  }
  return d;
}

/// The standard diagram of b(P, Q) (Schubert form): the regular expansion of P/Q in Conway's
/// order, by plain Euclid (unknot: [∞]; unlink: [0]).
Drawn draw_link(const TwoBridgeLink& l) {
  if (l.p() == 0) return draw({Integer(0)});
  if (l.p() == 1) return draw({Integer(0), Integer(0)});
  std::vector<Integer> standard;
  Integer a = l.p(), b = l.q();
  while (b != 0) {
    standard.push_back(a / b);
    Integer r = a % b;
    a = b;
    b = r;
  }
  return draw(std::vector<Integer>(standard.rbegin(), standard.rend()));
}

/// x = ±A^{3k}·y with the sign (−1)^k: brackets of isotopic diagrams (Reidemeister I).
bool equal_up_to_unit(const Poly& x, const Poly& y) {
  if (x.c.empty() || y.c.empty()) return x.c.empty() && y.c.empty();
  const int shift = x.c.begin()->first - y.c.begin()->first;
  if (shift % 3 != 0) return false;
  const std::int64_t sign = (shift / 3) % 2 == 0 ? 1 : -1;
  return x == Poly::monomial(shift, sign) * y;
}

/// |⟨L⟩(e^{iπ/4})|: all exponents are ≡ e₀ (mod 4) for a link diagram, and A⁴ = −1 there.
std::int64_t bracket_determinant(const Poly& x) {
  const int e0 = x.c.begin()->first;
  std::int64_t s = 0;
  for (const auto& [e, k] : x.c) {
    EXPECT_EQ(((e - e0) % 4 + 4) % 4, 0) << x.str();
    s += (((e - e0) / 4) % 2 == 0) ? k : -k;
  }
  return std::llabs(s);
}

/// Components from |⟨L⟩(1)| = 2^{c−1}.
int bracket_components(const Poly& x) {
  std::int64_t v = 0;
  for (const auto& [e, k] : x.c) v += k;
  v = std::llabs(v);
  int c = 1;
  while (v > 1) {
    EXPECT_EQ(v % 2, 0);
    v /= 2;
    ++c;
  }
  return c;
}

Fraction random_fraction(unsigned bits, std::mt19937_64& g) {
  for (;;) {
    const Integer p = testing::random_integer(bits, g), q = testing::random_integer(bits, g);
    if (p != 0 || q != 0) return Fraction(p, q);
  }
}

std::vector<Integer> random_twists(std::mt19937_64& g, int max_len, int max_abs) {
  const int len = std::uniform_int_distribution<int>(1, max_len)(g);
  std::vector<Integer> t;
  for (int i = 0; i < len; ++i) t.emplace_back(std::uniform_int_distribution<int>(-max_abs, max_abs)(g));
  return t;
}

std::string show(const std::vector<Integer>& t) {
  std::string s = "[";
  for (const Integer& a : t) s += (s.size() > 1 ? " " : "") + a.str();
  return s + "]";
}

// ---------------------------------------------------------------------------------------------

TEST(ErnstSumners, BracketOfTheSumDiagramMatchesTheFormulaAndNotTheMirror) {
  std::mt19937_64& g = rng();
  const int n = iterations(600);
  int decisive = 0;  // cases where the mirror's bracket differs
  for (int i = 0; i < n; ++i) {
    const std::vector<Integer> ts = random_twists(g, 4, 3), ss = random_twists(g, 4, 3);
    const Drawn t = draw(ts), s = draw(ss);
    SCOPED_TRACE("T = " + show(ts) + ", S = " + show(ss) + ", seed " + std::to_string(testing::seed()));
    // The drawn fractions are the library's twist values (Conway's order).
    ASSERT_EQ(Fraction(t.p, t.q), twist_value(ts));
    ASSERT_EQ(Fraction(s.p, s.q), twist_value(ss));
    const TwoBridgeLink link = numerator_closure_of_sum(twist_value(ts), twist_value(ss));
    const Poly sum = numerator(add(t.bracket, s.bracket));
    const Poly expected = numerator(draw_link(link).bracket);
    EXPECT_TRUE(equal_up_to_unit(sum, expected))
        << to_string(link) << ": " << sum.str() << " vs " << expected.str();
    const Poly mirrored = numerator(draw_link(link.mirror()).bracket);
    if (!equal_up_to_unit(sum, mirrored)) ++decisive;
    // Determinant and components from the bracket of the sum diagram.
    EXPECT_EQ(bracket_determinant(sum), link.determinant());
    EXPECT_EQ(bracket_components(sum), link.components());
  }
  // Most random sums are chiral, so the sign was really tested.
  EXPECT_GT(decisive, n / 2);
}

TEST(ErnstSumners, IntegerSummandAgreesWithRationalPath) {
  std::mt19937_64& g = rng();
  const int n = iterations(3000);
  for (int i = 0; i < n; ++i) {
    const Fraction f = random_fraction(40, g);
    const Integer m = testing::random_integer(30, g);
    const RationalTangle t(f), k = RationalTangle::integer(m);
    SCOPED_TRACE("F = " + to_string(f) + ", n = " + m.str());
    // N(T + [n]) = N([n] + T) = N(F + n).
    const TwoBridgeLink rational = closure(t.add_horizontal(m));
    EXPECT_TRUE(same_link(numerator_closure_of_sum(f, Fraction(m)), rational));
    EXPECT_TRUE(same_link(numerator_closure_of_sum(Fraction(m), f), rational));
    EXPECT_EQ(*TangleSum({t, k}).closure_two_bridge(), rational);
    EXPECT_EQ(*TangleSum({k, t, k}).closure_two_bridge(), closure(t.add_horizontal(2 * m)));
  }
}

TEST(ErnstSumners, SymmetricAndIndependentOfTheIntegerPlacement) {
  std::mt19937_64& g = rng();
  const int n = iterations(3000);
  for (int i = 0; i < n; ++i) {
    const Fraction x = random_fraction(50, g), y = random_fraction(50, g);
    const Integer m = testing::random_integer(20, g);
    SCOPED_TRACE(to_string(x) + " + " + to_string(y));
    const TwoBridgeLink l = numerator_closure_of_sum(x, y);
    // N(T + S) = N(S + T) (turn the picture over; rational tangles are flip-invariant).
    EXPECT_TRUE(same_link(l, numerator_closure_of_sum(y, x)));
    // Twists slide around the closure: N((T + [m]) + S) = N(T + (S + [m])).
    EXPECT_TRUE(same_link(numerator_closure_of_sum(x + Fraction(m), y),
                          numerator_closure_of_sum(x, y + Fraction(m))));
    // The mirror of the sum is the sum of the mirrors.
    EXPECT_TRUE(same_link(numerator_closure_of_sum(-x, -y), l.mirror()));
    // Determinant |ad + bc|, and TangleSum agrees.
    EXPECT_EQ(l.determinant(), abs(x.numerator() * y.denominator() + x.denominator() * y.numerator()));
    const TangleSum s({RationalTangle(x), RationalTangle(y)});
    EXPECT_EQ(s.determinant(), l.determinant());
    EXPECT_EQ(s.components(), l.components());
    EXPECT_TRUE(same_link(*s.closure_two_bridge(), l));
  }
}

TEST(ErnstSumners, TwoColumnPretzelIsOneTwistRegion) {
  for (int a = -12; a <= 12; ++a) {
    for (int b = -12; b <= 12; ++b) {
      if (a == 0 || b == 0) continue;
      const TwoBridgeLink l = *sum(RationalTangle::vertical(a), RationalTangle::vertical(b))
                                   .closure_two_bridge();
      // One column of a + b − 1 vertical twists beside one crossing [1] — a rational tangle.
      const Fraction one_column = Fraction(Integer(1), Integer(a + b - 1)) + Fraction(1);
      EXPECT_EQ(l, TwoBridgeLink::numerator_closure(one_column)) << a << " " << b;
      EXPECT_EQ(l, TwoBridgeLink(a + b, -1)) << a << " " << b;
    }
  }
  // The Hopf link N([1] + [1]) and the trefoil N(1/[2] + [1]) = b(3,2), the mirror of N([3]):
  // vertical twists of positive fraction have the opposite handedness to horizontal ones in a
  // closure (common practice for the standard 4-plat; D(1/[3]) = N([−3])).
  EXPECT_EQ(*sum(RationalTangle::integer(1), RationalTangle::integer(1)).closure_two_bridge(),
            TwoBridgeLink(2, 1));
  EXPECT_EQ(*sum(RationalTangle::vertical(2), RationalTangle::integer(1)).closure_two_bridge(),
            TwoBridgeLink(3, 2));
}

TEST(ErnstSumners, UnknotCriterion) {
  // Kauffman–Lambropoulou (arXiv:math/0601525): N(P/Q + R/S) is the unknot iff |PS + QR| = 1;
  // when it is, the bracket of the sum diagram is a unit.
  std::mt19937_64& g = rng();
  int unknots = 0;
  for (int i = 0; i < iterations(2000); ++i) {
    const std::vector<Integer> ts = random_twists(g, 3, 3), ss = random_twists(g, 3, 3);
    const Fraction x = twist_value(ts), y = twist_value(ss);
    const Integer det = abs(x.numerator() * y.denominator() + x.denominator() * y.numerator());
    const TwoBridgeLink l = numerator_closure_of_sum(x, y);
    EXPECT_EQ(l == TwoBridgeLink::unknot(), det == 1) << show(ts) << " + " << show(ss);
    if (det == 1) {
      ++unknots;
      const Poly b = numerator(add(draw(ts).bracket, draw(ss).bracket));
      EXPECT_EQ(b.c.size(), 1u) << b.str();
    }
  }
  EXPECT_GT(unknots, 10);
}

TEST(ErnstSumners, InfinitySummands) {
  // N([∞] + S) = D(S) = b(d, −c).
  for (const Fraction& s : {Fraction(7, 3), Fraction(-5, 2), Fraction(4), Fraction(0), Fraction::infinity()}) {
    const TwoBridgeLink l = numerator_closure_of_sum(Fraction::infinity(), s);
    EXPECT_EQ(l, TwoBridgeLink::denominator_closure(s)) << to_string(s);
    EXPECT_TRUE(same_link(numerator_closure_of_sum(s, Fraction::infinity()), l));
  }
  // N([∞] + [∞]) is the two-component unlink (a middle loop beside one big circle).
  const TangleSum ii({RationalTangle::infinity(), RationalTangle::infinity()});
  EXPECT_EQ(*ii.closure_two_bridge(), TwoBridgeLink::unlink());
  EXPECT_EQ(ii.components(), 2);
  EXPECT_EQ(ii.determinant(), 0);
  EXPECT_EQ(ii.components(Closure::denominator), 3);
  EXPECT_FALSE(ii.closure_two_bridge(Closure::denominator).has_value());
}

// ---------------------------------------------------------------------------------------------
// Any number of summands: determinants and components against the bracket of the diagram.

TEST(TangleSum, DeterminantsAndComponentsOfLongSumsMatchTheBracket) {
  std::mt19937_64& g = rng();
  const int n = iterations(400);
  for (int i = 0; i < n; ++i) {
    const int r = std::uniform_int_distribution<int>(1, 4)(g);
    std::vector<RationalTangle> parts;
    Bracket total;
    std::string text;
    for (int j = 0; j < r; ++j) {
      const bool infinity = std::uniform_int_distribution<int>(0, 15)(g) == 0;
      const std::vector<Integer> ts =
          infinity ? std::vector<Integer>{0, 0} : random_twists(g, 3, 3);
      const Drawn d = draw(ts);
      total = j == 0 ? d.bracket : add(total, d.bracket);
      parts.emplace_back(TwistSequence{ts});
      text += (j ? " + " : "") + show(ts);
    }
    SCOPED_TRACE(text + ", seed " + std::to_string(testing::seed()));
    const TangleSum s(parts);
    for (Closure which : {Closure::numerator, Closure::denominator}) {
      const Poly b = which == Closure::numerator ? numerator(total) : denominator(total);
      EXPECT_EQ(Integer(bracket_determinant(b)), s.determinant(which));
      EXPECT_EQ(bracket_components(b), s.components(which));
      if (auto l = s.closure_two_bridge(which)) {
        EXPECT_TRUE(equal_up_to_unit(b, numerator(draw_link(*l).bracket))) << to_string(*l);
        EXPECT_EQ(l->components(), s.components(which));
        EXPECT_EQ(l->determinant(), s.determinant(which));
      }
    }
    // D(T1 + ... + Tr) = D(T1) # ... # D(Tr): determinants multiply, components add minus r − 1.
    Integer det = 1;
    int comps = 1 - r;
    for (const RationalTangle& t : parts) {
      det *= closure(t, Closure::denominator).determinant();
      comps += closure(t, Closure::denominator).components();
    }
    EXPECT_EQ(s.determinant(Closure::denominator), det);
    EXPECT_EQ(s.components(Closure::denominator), comps);
  }
}

TEST(TangleSum, RationalSumsFoldTheirIntegers) {
  const RationalTangle t(TwistSequence{{Integer(2), Integer(3)}});  // 3 + 1/2 = 7/2
  const TangleSum s({RationalTangle::integer(4), t, RationalTangle::integer(-1)});
  EXPECT_EQ(s.rational_parts(), 1);
  ASSERT_TRUE(s.as_rational().has_value());
  EXPECT_EQ(s.as_rational()->fraction(), Fraction(13, 2));
  EXPECT_EQ(*s.closure_two_bridge(), TwoBridgeLink(13, 2));
  EXPECT_EQ(*s.closure_two_bridge(Closure::denominator), TwoBridgeLink(2, -13));
  const TangleSum ints({RationalTangle::integer(2), RationalTangle::integer(3)});
  EXPECT_EQ(ints.rational_parts(), 0);
  EXPECT_EQ(ints.as_rational()->fraction(), Fraction(5));
  EXPECT_EQ(TangleSum({RationalTangle::infinity(), RationalTangle::integer(3)}).as_rational()->fraction(),
            Fraction::infinity());
  // Two non-integer parts: not rational, but N is still 2-bridge; D is not (a connected sum).
  const TangleSum two({RationalTangle(Fraction(1, 2)), RationalTangle(Fraction(1, 2))});
  EXPECT_EQ(two.rational_parts(), 2);
  EXPECT_FALSE(two.as_rational().has_value());
  EXPECT_EQ(*two.closure_two_bridge(), TwoBridgeLink(4, -1));  // T(2,4) from two columns of 2
  EXPECT_EQ(two.determinant(), 4);                             // not |1/2 + 1/2| = 1
  EXPECT_FALSE(two.closure_two_bridge(Closure::denominator).has_value());
  EXPECT_EQ(two.determinant(Closure::denominator), 4);  // Hopf # Hopf
  EXPECT_EQ(two.components(Closure::denominator), 3);
  // Three non-integer parts: a Montesinos link, left as it is.
  const TangleSum three({RationalTangle(Fraction(1, 2)), RationalTangle(Fraction(1, 3)),
                         RationalTangle(Fraction(1, 5))});
  EXPECT_EQ(three.rational_parts(), 3);
  EXPECT_FALSE(three.closure_two_bridge().has_value());
  EXPECT_EQ(three.determinant(), 3 * 5 + 2 * 5 + 2 * 3);  // pretzel P(2,3,5): |Σ p_i Π q_j|
  EXPECT_EQ(three.components(), 1);  // one even entry: a knot
  EXPECT_THROW(TangleSum(std::vector<RationalTangle>{}), DomainError);
  EXPECT_EQ(sum(RationalTangle(Fraction(1, 3)), RationalTangle(Fraction(1, 3))).summands().size(), 2u);
}

}  // namespace
}  // namespace fourplat
