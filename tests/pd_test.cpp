// Tests of PD import (fourplat/pd.hpp): the three text forms, parse errors with positions,
// validation errors, and invariants against published facts and against the diagrams they came
// from (round trip PD out → PD in).
#include "fourplat/pd.hpp"

#include <gtest/gtest.h>

#include <random>
#include <string>

#include "fourplat/coloring.hpp"
#include "fourplat/continued_fraction.hpp"
#include "testing.hpp"

namespace fp = fourplat;
using fp::Diagram;
using fp::DiagramClosure;
using fp::Fraction;
using fp::Integer;
using fp::PdCode;
using fp::PdDiagram;
using fp::TwistSequence;

namespace {

/// The position of the ParseError thrown by parse_pd, or npos if none.
std::size_t parse_error_at(std::string_view text, std::string* message = nullptr) {
  try {
    (void)fp::parse_pd(text);
  } catch (const fp::ParseError& e) {
    if (message) *message = e.what();
    return e.position();
  }
  return std::string::npos;
}

std::string domain_error(const PdCode& pd) {
  try {
    PdDiagram d(pd);
  } catch (const fp::DomainError& e) {
    return e.what();
  }
  return "";
}

TwistSequence random_sequence(std::mt19937_64& g, int max_len, int r) {
  const int len = std::uniform_int_distribution<int>(1, max_len)(g);
  TwistSequence s;
  for (int i = 0; i < len; ++i) s.twists.emplace_back(std::uniform_int_distribution<int>(-r, r)(g));
  return s;
}

/// The same diagram with every crossing switched (the mirror image): the new incoming under-edge
/// is the old incoming over-edge.
PdCode mirror(const PdDiagram& d) {
  PdCode out;
  for (const auto& x : d.crossings()) {
    const auto& r = x.labels;
    out.push_back(x.over_j_to_l ? std::array<std::int64_t, 4>{r[1], r[2], r[3], r[0]}
                                : std::array<std::int64_t, 4>{r[3], r[0], r[1], r[2]});
  }
  return out;
}

/// A knot's PD code with the start of the labels moved on by `shift` (the same diagram).
PdCode shift_labels(const PdCode& pd, std::int64_t shift) {
  const auto E = static_cast<std::int64_t>(2 * pd.size());
  PdCode out = pd;
  for (auto& x : out)
    for (auto& v : x) v = (v - 1 + shift) % E + 1;
  return out;
}

/// A knot's PD code with its orientation reversed: label e becomes E + 1 − e and each crossing is
/// re-read from its new incoming under-edge (the old k).
PdCode reverse_knot(const PdCode& pd) {
  const auto E = static_cast<std::int64_t>(2 * pd.size());
  PdCode out;
  for (const auto& x : pd) {
    auto f = [&](std::int64_t v) { return E + 1 - v; };
    out.push_back({f(x[2]), f(x[3]), f(x[0]), f(x[1])});
  }
  return out;
}

}  // namespace

// ---------------------------------------------------------------------------------------------
// Parsing

TEST(PdParse, ThreeFormsReadTheSameCode) {
  const PdCode expect{{4, 2, 5, 1}, {2, 6, 3, 5}, {6, 4, 1, 3}};
  EXPECT_EQ(fp::parse_pd("X[4,2,5,1] X[2,6,3,5] X[6,4,1,3]"), expect);
  EXPECT_EQ(fp::parse_pd("  x[4, 2, 5, 1],\n X[2 6 3 5]  # a comment\nX[6,4,1,3]\n"), expect);
  EXPECT_EQ(fp::parse_pd("[[4,2,5,1],[2,6,3,5],[6,4,1,3]]"), expect);
  EXPECT_EQ(fp::parse_pd(" [ [4, 2, 5, 1] , [2,6,3,5],\n [6,4,1,3] ] \n"), expect);
  EXPECT_EQ(fp::parse_pd("# trefoil\n4 2 5 1\n2,6,3,5\n\n6 4 1 3   # last\n"), expect);
  EXPECT_EQ(fp::to_string(expect), "X[4,2,5,1] X[2,6,3,5] X[6,4,1,3]");
}

TEST(PdParse, ErrorsSayWhereAndWhat) {
  std::string msg;
  EXPECT_EQ(parse_error_at("", &msg), 0u);
  EXPECT_NE(msg.find("empty"), std::string::npos);
  EXPECT_EQ(parse_error_at("X[1,2,3]", &msg), 7u);  // the ']' after three labels
  EXPECT_NE(msg.find("label"), std::string::npos);
  EXPECT_EQ(parse_error_at("X[1,2,3,4,5]", &msg), 9u);
  EXPECT_NE(msg.find("exactly 4"), std::string::npos);
  EXPECT_EQ(parse_error_at("X[1,2,3,4] Y[1,2,3,4]"), 11u);
  EXPECT_EQ(parse_error_at("X(1,2,3,4)"), 1u);
  EXPECT_EQ(parse_error_at("[[1,2,3,4],[5,6]]"), 15u);
  EXPECT_EQ(parse_error_at("[[1,2,3,4]"), 10u);
  EXPECT_EQ(parse_error_at("[[1,2,3,4]] extra"), 12u);
  EXPECT_EQ(parse_error_at("1 2 3\n4 5 6 7", &msg), 5u);  // the line ends after 3 labels
  EXPECT_NE(msg.find("4 labels"), std::string::npos);
  EXPECT_EQ(parse_error_at("1 2 3 4 5"), 8u);
  EXPECT_EQ(parse_error_at("X[0,1,2,3]", &msg), 2u);
  EXPECT_NE(msg.find("start at 1"), std::string::npos);
  EXPECT_EQ(parse_error_at("X[-1,1,2,3]", &msg), 2u);
  EXPECT_EQ(parse_error_at("X[1,2,3,99999999999999999999]"), 8u);
  EXPECT_EQ(parse_error_at("# only a comment\n"), 17u);
  EXPECT_EQ(parse_error_at("hello"), 0u);
}

// ---------------------------------------------------------------------------------------------
// Validation

TEST(PdValidate, RejectsBadCodesWithClearMessages) {
  EXPECT_NE(domain_error({}).find("empty"), std::string::npos);
  EXPECT_NE(domain_error({{1, 2, 3, 7}, {3, 4, 1, 2}}).find("outside 1..4"), std::string::npos);
  EXPECT_NE(domain_error({{1, 1, 1, 2}, {3, 4, 3, 2}}).find("third time"), std::string::npos);
  EXPECT_NE(domain_error({{1, 2, 3, 4}, {3, 4, 2, 2}}).find("label 2 appears a third time"), std::string::npos);
  // Trefoil with labels 2 and 3 swapped: not consecutive along the knot.
  const std::string nc = domain_error({{4, 2, 5, 1}, {3, 6, 2, 5}, {6, 4, 1, 2}});
  EXPECT_FALSE(nc.empty());
  // The right-handed trefoil read from its outgoing under-edge at crossing 1.
  const std::string under = domain_error({{5, 1, 4, 2}, {2, 6, 3, 5}, {6, 4, 1, 3}});
  EXPECT_NE(under.find("crossing 1"), std::string::npos) << under;
  EXPECT_NE(under.find("incoming under-edge"), std::string::npos) << under;
  // A code that passes every label check but lives on a torus, not in the plane.
  const std::string np = domain_error({{1, 4, 2, 3}, {4, 2, 3, 1}});
  EXPECT_NE(np.find("not a planar diagram"), std::string::npos) << np;
  EXPECT_NE(np.find("Euler"), std::string::npos) << np;
}

// ---------------------------------------------------------------------------------------------
// Invariants

TEST(PdInvariants, KnownKnotsAndLinks) {
  // The right-handed trefoil N([3]): determinant 3, writhe +3, 9 three-colorings (common
  // practice). Its mirror has writhe −3 and the same determinant.
  const PdDiagram t(fp::parse_pd("X[4,2,5,1] X[2,6,3,5] X[6,4,1,3]"));
  EXPECT_EQ(t.components(), 1);
  EXPECT_EQ(t.writhe(), 3);
  EXPECT_EQ(t.determinant(), 3);
  EXPECT_EQ(t.coloring_count(Integer(3)), 9);
  EXPECT_EQ(t.coloring_count(Integer(5)), 5);
  EXPECT_EQ(t.arcs().size(), 3u);
  const PdDiagram tm(mirror(t));
  EXPECT_EQ(tm.writhe(), -3);
  EXPECT_EQ(tm.determinant(), 3);
  // The Hopf link: determinant 2, linking number ±1 (common practice).
  const PdDiagram h(fp::parse_pd("X[3,2,4,1] X[2,3,1,4]"));
  EXPECT_EQ(h.components(), 2);
  EXPECT_EQ(h.determinant(), 2);
  EXPECT_EQ(h.linking_number(), 1);
  EXPECT_EQ(h.coloring_count(Integer(2)), 4);
  // One curl: the unknot (determinant 1, only constant colorings).
  const PdDiagram k(fp::parse_pd("X[1,1,2,2]"));
  EXPECT_EQ(k.determinant(), 1);
  EXPECT_EQ(k.writhe(), 1);
  EXPECT_FALSE(k.coloring_witness(Integer(3)).has_value());
  EXPECT_THROW((void)k.coloring_count(Integer(0)), fp::DomainError);
}

TEST(PdInvariants, SplitDiagrams) {
  // Two trefoils drawn apart: determinant 0 (a split link), 3-colorings 3·3·3 = 27... counted as
  // n^{a−r}Π gcd: each trefoil has 9, and the union has 9·9 = 81.
  PdCode two = fp::parse_pd("X[4,2,5,1] X[2,6,3,5] X[6,4,1,3]");
  for (const auto& x : fp::parse_pd("X[4,2,5,1] X[2,6,3,5] X[6,4,1,3]"))
    two.push_back({x[0] + 6, x[1] + 6, x[2] + 6, x[3] + 6});
  const PdDiagram d(two);
  EXPECT_EQ(d.pieces(), 2);
  EXPECT_EQ(d.components(), 2);
  EXPECT_EQ(d.determinant(), 0);
  EXPECT_EQ(d.coloring_count(Integer(3)), 81);
  EXPECT_EQ(d.linking_number(), 0);
}

TEST(PdInvariants, RelabelledAndReversedCodesAgree) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(300); ++it) {
    const Diagram dg = Diagram::of_twists(random_sequence(g, 6, 3));
    if (dg.components() != 1 || dg.crossing_count() == 0) continue;
    const PdDiagram a(dg.pd_code());
    const PdCode shifted = shift_labels(dg.pd_code(), std::uniform_int_distribution<std::int64_t>(1, 2 * dg.crossing_count() - 1)(g));
    const PdDiagram b(shifted), c(reverse_knot(dg.pd_code())), m(mirror(a));
    for (const PdDiagram* x : {&b, &c}) {
      ASSERT_EQ(x->writhe(), a.writhe());  // reversing a knot keeps every sign
      ASSERT_EQ(x->determinant(), a.determinant());
      ASSERT_EQ(x->coloring_count(Integer(6)), a.coloring_count(Integer(6)));
    }
    ASSERT_EQ(m.writhe(), -a.writhe());
    ASSERT_EQ(m.determinant(), a.determinant());
  }
}

TEST(PdInvariants, RoundTripFromDiagrams) {
  // PD out → text → PD in: the invariants of the diagram and of the fraction are recovered.
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(800); ++it) {
    const TwistSequence s = random_sequence(g, 7, 4);
    const Fraction f = fp::twist_value(s);
    for (auto cl : {fp::Closure::numerator, fp::Closure::denominator}) {
      const Diagram d = Diagram::of_twists(s, fp::diagram_closure(cl));
      if (d.crossing_count() == 0 || d.crossingless_components() > 0) continue;
      const PdDiagram pd(fp::parse_pd(fp::to_string(d.pd_code())));
      ASSERT_EQ(pd.components(), d.components());
      ASSERT_EQ(pd.writhe(), d.writhe());
      ASSERT_EQ(pd.linking_number(), d.linking_number());
      ASSERT_EQ(pd.determinant(), fp::closure_determinant(f, cl));
      for (int n : {2, 3, 4, 7, 10}) {
        const Integer N(n);
        ASSERT_EQ(pd.coloring_count(N), N * fp::gcd(N, fp::closure_determinant(f, cl)));
        ASSERT_EQ(pd.coloring_count(N), fp::coloring_count(d, N));
        if (auto w = pd.coloring_witness(N)) {
          ASSERT_TRUE(fp::satisfies_fox_rule(d, *w, N));
        }
      }
    }
  }
}

TEST(PdInvariants, LongChainDeterminantIsFibonacci) {
  // [1 1 ... 1] (n ones) has fraction F_{n+1}/F_n, so N of it has determinant F_{n+1}
  // (OEIS A000045); its PD code of 3000 crossings gives the same number.
  TwistSequence s;
  s.twists.assign(3000, Integer(1));
  Integer a = 1, b = 1;  // F_1, F_2
  for (int i = 2; i <= 3000; ++i) {
    Integer c = a + b;
    a = b;
    b = c;
  }  // b = F_3001
  const PdDiagram pd(Diagram::of_twists(s).pd_code());
  EXPECT_EQ(pd.determinant(), b);
  EXPECT_EQ(fp::twist_value(s).numerator(), b);
}
