// Tests of the standard diagram (fourplat/diagram.hpp): structure, orientation rule, signs,
// codes, the coloring fraction, and chirality checked by an independent Kauffman bracket state
// sum written here (test-only code).
#include "fourplat/diagram.hpp"

#include <gtest/gtest.h>

#include <map>
#include <numeric>
#include <random>
#include <set>

#include "fourplat/algebraic.hpp"
#include "fourplat/continued_fraction.hpp"
#include "fourplat/pd.hpp"
#include "fourplat/two_bridge.hpp"
#include "testing.hpp"

namespace fp = fourplat;
using fp::Corner;
using fp::Diagram;
using fp::DiagramClosure;
using fp::Fraction;
using fp::Integer;
using fp::TwistSequence;

namespace {

TwistSequence seq(std::initializer_list<long> v) {
  TwistSequence s;
  for (long x : v) s.twists.emplace_back(x);
  return s;
}

std::string show(const TwistSequence& s) {
  std::string out = "[";
  for (const auto& t : s.twists) out += (out.size() > 1 ? " " : "") + t.str();
  return out + "]";
}

/// A random twist sequence: length 1..max_len, terms in [−r, r] (zeros and mixed signs included).
TwistSequence random_sequence(std::mt19937_64& g, int max_len, int r) {
  const int len = std::uniform_int_distribution<int>(1, max_len)(g);
  TwistSequence s;
  for (int i = 0; i < len; ++i) s.twists.emplace_back(std::uniform_int_distribution<int>(-r, r)(g));
  return s;
}

// ---- An independent Kauffman bracket from a PD code (Kauffman 1987, "State models and the Jones
// polynomial"). At X[i,j,k,l] (counterclockwise from the incoming under-edge) the A-smoothing joins
// the regions swept when the over-strand turns counterclockwise, i.e. it pairs (i,j)(k,l); the
// B-smoothing pairs (i,l)(j,k). A positive curl then gives −A³, as the normalisation
// V(t) = (−A³)^{−w}⟨D⟩ needs (checked below on X[1,1,2,2]).
using Laurent = std::map<int, Integer>;  // exponent → coefficient

void add_to(Laurent& a, int e, const Integer& c) {
  Integer& x = a[e];
  x += c;
  if (x == 0) a.erase(e);
}

Laurent bracket(const fp::PdCode& pd) {
  const std::size_t c = pd.size();
  std::int64_t E = 0;
  for (const auto& x : pd)
    for (auto v : x) E = std::max(E, v);
  // δ^k as a polynomial, δ = −A² − A⁻².
  std::vector<Laurent> delta_pow(2 * c + 2);
  delta_pow[0][0] = 1;
  for (std::size_t k = 1; k < delta_pow.size(); ++k)
    for (const auto& [e, v] : delta_pow[k - 1]) {
      add_to(delta_pow[k], e + 2, -v);
      add_to(delta_pow[k], e - 2, -v);
    }
  Laurent out;
  std::vector<std::int64_t> parent(static_cast<std::size_t>(E + 1));
  auto find = [&](std::int64_t a) {
    while (parent[static_cast<std::size_t>(a)] != a) a = parent[static_cast<std::size_t>(a)] = parent[static_cast<std::size_t>(parent[static_cast<std::size_t>(a)])];
    return a;
  };
  auto unite = [&](std::int64_t a, std::int64_t b) { parent[static_cast<std::size_t>(find(a))] = find(b); };
  for (std::uint64_t state = 0; state < (std::uint64_t{1} << c); ++state) {
    std::iota(parent.begin(), parent.end(), 0);
    int a_count = 0;
    for (std::size_t x = 0; x < c; ++x) {
      const auto& r = pd[x];
      if ((state >> x) & 1) {  // A
        unite(r[0], r[1]);
        unite(r[2], r[3]);
        ++a_count;
      } else {
        unite(r[0], r[3]);
        unite(r[1], r[2]);
      }
    }
    std::size_t loops = 0;
    for (std::int64_t v = 1; v <= E; ++v) loops += find(v) == v ? 1 : 0;
    const int shift = a_count - (static_cast<int>(c) - a_count);
    for (const auto& [e, v] : delta_pow[loops - 1]) add_to(out, e + shift, v);
  }
  return out;
}

/// V(t) = (−A³)^{−w}⟨D⟩ with A = t^{−1/4}; keys are exponents of t in quarter units.
Laurent jones_quarter(const fp::PdCode& pd, std::int64_t writhe) {
  Laurent v;
  const Integer sign = writhe % 2 == 0 ? 1 : -1;
  for (const auto& [e, c] : bracket(pd)) add_to(v, -(e - 3 * static_cast<int>(writhe)), sign * c);
  return v;
}

/// A polynomial in t given as {exponent of t: coefficient}, in quarter units.
Laurent poly_t(std::initializer_list<std::pair<int, int>> terms) {
  Laurent p;
  for (auto [e, c] : terms) add_to(p, 4 * e, Integer(c));
  return p;
}

/// The bracket up to a unit ±A^k (an invariant of the unoriented diagram class).
Laurent normalised(const Laurent& b) {
  Laurent out;
  if (b.empty()) return out;
  const int lo = b.begin()->first;
  const Integer s = b.begin()->second < 0 ? -1 : 1;
  for (const auto& [e, c] : b) out[e - lo] = s * c;
  return out;
}

/// Linking number of the oriented b(p,q), p even > 0, q odd: Σ_{k=1}^{p/2} ε_{2k−1},
/// ε_i = (−1)^⌊iq/p⌋ (Tuler; see Kim–No–Yoo, arXiv:2403.11512).
std::int64_t epsilon_linking(Integer p, Integer q) {
  if (p < 0) { p = -p; q = -q; }
  std::int64_t sum = 0;
  for (Integer i = 1; i < p; i += 2) sum += fp::div_floor(i * q, p) % 2 == 0 ? 1 : -1;
  return sum;
}

}  // namespace

// ---------------------------------------------------------------------------------------------
// Structure

TEST(Diagram, NumberingAndBoxes) {
  const Diagram d = Diagram::of_twists(seq({2, -1, 3}), DiagramClosure::none);
  ASSERT_EQ(d.boxes().size(), 3u);
  EXPECT_EQ(d.boxes()[0].kind, fp::BoxKind::horizontal);  // n odd: a1 horizontal
  EXPECT_EQ(d.boxes()[1].kind, fp::BoxKind::vertical);
  EXPECT_EQ(d.boxes()[2].kind, fp::BoxKind::horizontal);
  EXPECT_FALSE(d.summands()[0].seed_infinity);
  ASSERT_EQ(d.crossing_count(), 6);
  const std::vector<std::size_t> box{0, 0, 1, 2, 2, 2};
  const std::vector<std::int64_t> idx{0, 1, 0, 0, 1, 2};
  for (std::size_t c = 0; c < 6; ++c) {
    EXPECT_EQ(d.crossings()[c].box, box[c]);
    EXPECT_EQ(d.crossings()[c].index_in_box, idx[c]);
    EXPECT_EQ(d.crossings()[c].over_nw_se, c != 2);
  }
  // Inside a horizontal box: NE, SE of one crossing meet NW, SW of the next.
  EXPECT_EQ(d.crossings()[0].neighbor[1], (fp::Port{1, Corner::nw}));
  EXPECT_EQ(d.crossings()[0].neighbor[3], (fp::Port{1, Corner::sw}));
  // The vertical crossing hangs below the first box: its NW, NE meet the tangle's SW and SE.
  // (its NW meets crossing 0's SW along the seed's lower arc).
  EXPECT_EQ(d.crossings()[2].neighbor[0], (fp::Port{0, Corner::sw}));
  EXPECT_EQ(d.crossings()[2].neighbor[1], (fp::Port{1, Corner::se}));
  EXPECT_EQ(d.end_neighbor(Corner::nw), (fp::Port{0, Corner::nw}));
  // Even length: a1 vertical, drawn from the seed [∞].
  const Diagram e = Diagram::of_twists(seq({2, 3}), DiagramClosure::none);
  EXPECT_TRUE(e.summands()[0].seed_infinity);
  EXPECT_EQ(e.boxes()[0].kind, fp::BoxKind::vertical);
  EXPECT_EQ(e.crossings()[1].neighbor[0], (fp::Port{0, Corner::sw}));
  EXPECT_EQ(e.crossings()[1].neighbor[1], (fp::Port{0, Corner::se}));
}

TEST(Diagram, NeighboursAreSymmetric) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(300); ++it) {
    const auto s = random_sequence(g, 7, 3);
    const Diagram d = Diagram::of_twists(s, DiagramClosure::none);
    for (std::int64_t c = 0; c < d.crossing_count(); ++c)
      for (int k = 0; k < 4; ++k) {
        const fp::Port p = d.crossings()[static_cast<std::size_t>(c)].neighbor[static_cast<std::size_t>(k)];
        const fp::Port back = p.is_end() ? d.end_neighbor(p.corner)
                                         : d.crossings()[static_cast<std::size_t>(p.crossing)].neighbor[static_cast<std::size_t>(p.corner)];
        ASSERT_EQ(back, (fp::Port{c, static_cast<Corner>(k)})) << show(s);
      }
  }
}

TEST(Diagram, EmptyAndHugeInputsAreRejected) {
  EXPECT_THROW((void)Diagram::of_twists(TwistSequence{}), fp::DomainError);
  EXPECT_THROW((void)Diagram::of_sum(std::span<const TwistSequence>{}), fp::DomainError);
  TwistSequence big;
  big.twists.push_back(Integer(1) << 40);
  EXPECT_THROW((void)Diagram::of_twists(big), fp::LimitError);
  big.twists.back() = Integer(1) << 80;
  EXPECT_THROW((void)Diagram::of_twists(big), fp::LimitError);
}

TEST(Diagram, CrossinglessClosures) {
  const Diagram unlink = Diagram::of_fraction(Fraction(0));
  EXPECT_EQ(unlink.crossing_count(), 0);
  EXPECT_EQ(unlink.components(), 2);
  EXPECT_EQ(unlink.crossingless_components(), 2);
  EXPECT_TRUE(unlink.pd_code().empty());
  EXPECT_EQ(unlink.arcs().size(), 2u);
  const Diagram unknot = Diagram::of_fraction(Fraction::infinity());
  EXPECT_EQ(unknot.components(), 1);
  EXPECT_TRUE(unknot.pd_code().empty());
  EXPECT_TRUE(unknot.dt_code().empty());
  EXPECT_EQ(Diagram::of_fraction(Fraction(0), DiagramClosure::denominator).components(), 1);
  EXPECT_EQ(Diagram::of_fraction(Fraction::infinity(), DiagramClosure::denominator).components(), 2);
}

// ---------------------------------------------------------------------------------------------
// Known values

TEST(Diagram, RightHandedTrefoil) {
  const Diagram d = Diagram::of_twists(seq({3}));
  EXPECT_EQ(d.components(), 1);
  EXPECT_EQ(d.writhe(), 3);  // fixed by the lead: N([3]) is the right-handed trefoil
  for (int s : d.signs()) EXPECT_EQ(s, 1);
  // DT code of the trefoil: 4 6 2 (common practice).
  EXPECT_EQ(d.dt_code(), (std::vector<std::int64_t>{4, 6, 2}));
  // Jones polynomial of the right-handed trefoil: t + t³ − t⁴ (common practice).
  EXPECT_EQ(jones_quarter(d.pd_code(), d.writhe()), poly_t({{1, 1}, {3, 1}, {4, -1}}));
  // The mirror N([−3]): t⁻¹ + t⁻³ − t⁻⁴, writhe −3, DT code negated.
  const Diagram m = Diagram::of_twists(seq({-3}));
  EXPECT_EQ(m.writhe(), -3);
  EXPECT_EQ(jones_quarter(m.pd_code(), m.writhe()), poly_t({{-1, 1}, {-3, 1}, {-4, -1}}));
  EXPECT_EQ(m.dt_code(), (std::vector<std::int64_t>{-4, -6, -2}));
  const auto g = d.gauss_code();
  ASSERT_EQ(g.components.size(), 1u);
  EXPECT_EQ(g.components[0], (std::vector<std::int64_t>{1, -2, 3, -1, 2, -3}));
}

TEST(Diagram, BracketNormalisationOnACurl) {
  // X[1,1,2,2] is a positive curl (over-strand 2 → 1 runs l → j): its bracket is −A³.
  EXPECT_EQ(bracket({{1, 1, 2, 2}}), (Laurent{{3, Integer(-1)}}));
  EXPECT_EQ(fp::PdDiagram({{1, 1, 2, 2}}).writhe(), 1);
}

TEST(Diagram, FigureEight) {
  // 5/2 = [2 2]: the figure-eight knot, amphichiral: writhe 0 on its reduced alternating diagram
  // and V = t² − t + 1 − t⁻¹ + t⁻² (common practice).
  const Diagram d = Diagram::of_fraction(Fraction(Integer(5), Integer(2)));
  EXPECT_EQ(d.crossing_count(), 4);
  EXPECT_EQ(d.writhe(), 0);
  EXPECT_EQ(jones_quarter(d.pd_code(), d.writhe()), poly_t({{2, 1}, {1, -1}, {0, 1}, {-1, -1}, {-2, 1}}));
}

TEST(Diagram, HopfLinkAndTorusLinks) {
  // Positive Hopf link N([2]): lk = +1, V = −t^{1/2} − t^{5/2} (common practice).
  const Diagram h = Diagram::of_twists(seq({2}));
  EXPECT_EQ(h.components(), 2);
  EXPECT_EQ(h.linking_number(), 1);
  Laurent hopf;
  add_to(hopf, 2, Integer(-1));
  add_to(hopf, 10, Integer(-1));
  EXPECT_EQ(jones_quarter(h.pd_code(), h.writhe()), hopf);
  // T(2,2k) = N([2k]) with parallel strands: lk = k (common practice).
  for (long k = 1; k <= 12; ++k) {
    EXPECT_EQ(Diagram::of_twists(seq({2 * k})).linking_number(), k);
    EXPECT_EQ(Diagram::of_twists(seq({-2 * k})).linking_number(), -k);
  }
  // The Whitehead link b(8,3) has linking number 0 (common practice).
  EXPECT_EQ(Diagram::of_fraction(Fraction(Integer(8), Integer(3))).linking_number(), 0);
}

TEST(Diagram, JonesOfMirrorIsConjugate) {
  // V_{mirror}(t) = V(t⁻¹) (Jones 1985; common practice): N(−F) against N(F).
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(40); ++it) {
    const auto s = random_sequence(g, 4, 3);
    TwistSequence neg = s;
    for (auto& t : neg.twists) t = -t;
    const Diagram d = Diagram::of_twists(s), m = Diagram::of_twists(neg);
    if (d.crossing_count() == 0 || d.crossing_count() > 10 || d.crossingless_components() > 0) continue;
    Laurent v = jones_quarter(d.pd_code(), d.writhe()), w = jones_quarter(m.pd_code(), m.writhe()), vbar;
    for (const auto& [e, c] : v) vbar[-e] = c;
    EXPECT_EQ(w, vbar) << show(s);
  }
}

// ---------------------------------------------------------------------------------------------
// Canonical diagrams

TEST(Diagram, CanonicalDiagramIsReducedAlternating) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(2000); ++it) {
    const Integer p = fp::testing::random_integer(30, g);
    Integer q = fp::testing::random_integer(30, g);
    if (p == 0 && q == 0) continue;
    if (fp::gcd(p, q) != 1) q = 1;
    const Fraction f(p, q);
    if (fp::twist_crossings(f) > 20000) continue;  // keep the test small
    const Diagram d = Diagram::of_fraction(f);
    // The canonical sequence draws the minimal diagram: crossings = crossing number of the tangle.
    ASSERT_EQ(Integer(d.crossing_count()), fp::twist_crossings(f)) << fp::to_string(f);
    ASSERT_TRUE(d.is_alternating()) << fp::to_string(f);
    // For |F| > 1 the numerator closure is reduced alternating, so its crossing count is the
    // crossing number of b(p,q) (Kauffman, Murasugi, Thistlethwaite 1987).
    if (!f.is_infinite() && boost::multiprecision::abs(f.numerator()) > f.denominator() && f.denominator() != 0) {
      ASSERT_EQ(Integer(d.crossing_count()), fp::TwoBridgeLink::numerator_closure(f).crossing_number())
          << fp::to_string(f);
    }
    ASSERT_EQ(d.components(), fp::TwoBridgeLink::numerator_closure(f).components()) << fp::to_string(f);
  }
}

// ---------------------------------------------------------------------------------------------
// Orientation rule

TEST(Diagram, LinkingNumberMatchesSchubertOrientation) {
  // For p even the oriented closure N(p/q) must be Schubert's oriented b(p, q mod 2p): its linking
  // number is the ε-sum of (p, q), and p/(q+p) gives the other relative orientation.
  int links = 0;
  for (std::int64_t p = 2; p <= 60; p += 2)
    for (std::int64_t q = -3 * p; q <= 3 * p; ++q) {
      if (std::gcd(p, q) != 1) continue;
      const Fraction f{Integer(p), Integer(q)};
      const Diagram d = Diagram::of_fraction(f);
      ASSERT_EQ(d.components(), 2);
      ASSERT_EQ(*d.linking_number(), epsilon_linking(Integer(p), Integer(q))) << p << "/" << q;
      const Diagram other = Diagram::of_fraction(Fraction{Integer(p), Integer(q + p)});
      ASSERT_EQ(*other.linking_number(), -*d.linking_number()) << p << "/" << q;
      // The same oriented Schubert class gives the same linking number.
      const auto o = fp::OrientedTwoBridgeLink::numerator_closure(f).canonical();
      ASSERT_EQ(*Diagram::of_fraction(Fraction{o.p(), o.q()}).linking_number(), *d.linking_number());
      // D(F) = N(−1/F) as oriented links.
      const Fraction r = -f.reciprocal();
      const Diagram dd = Diagram::of_fraction(r, DiagramClosure::denominator);
      ASSERT_EQ(dd.components(), 2);
      ASSERT_EQ(*dd.linking_number(), *d.linking_number()) << p << "/" << q;
      ++links;
    }
  EXPECT_GT(links, 1000);
}

TEST(Diagram, OrientationRuleEntersAtFirstEnd) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(500); ++it) {
    const auto s = random_sequence(g, 6, 3);
    for (auto cl : {DiagramClosure::numerator, DiagramClosure::denominator, DiagramClosure::none}) {
      const Diagram d = Diagram::of_twists(s, cl);
      ASSERT_TRUE(d.component_list()[0].entry.has_value());
      EXPECT_EQ(*d.component_list()[0].entry, Corner::nw) << show(s);
      // Edges run consecutively: edge k's head is edge k+1's tail crossing.
      for (const auto& cm : d.component_list())
        for (std::int64_t k = 0; k + 1 < cm.edges; ++k) {
          const auto& a = d.edges()[static_cast<std::size_t>(cm.first_edge - 1 + k)];
          const auto& b = d.edges()[static_cast<std::size_t>(cm.first_edge + k)];
          ASSERT_EQ(a.head.crossing, b.tail.crossing) << show(s);
        }
    }
  }
}

// ---------------------------------------------------------------------------------------------
// Codes

TEST(Diagram, ExportedPdCodesAreValidAndAgree) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(1500); ++it) {
    const auto s = random_sequence(g, 7, 4);
    for (auto cl : {DiagramClosure::numerator, DiagramClosure::denominator}) {
      const Diagram d = Diagram::of_twists(s, cl);
      if (d.crossing_count() == 0) continue;
      const fp::PdDiagram pd(d.pd_code());  // throws if invalid
      ASSERT_EQ(pd.components(), d.components() - d.crossingless_components()) << show(s);
      ASSERT_EQ(pd.writhe(), d.writhe()) << show(s);
      // Signs agree except at crossings under a component whose direction a PD code cannot
      // tell (two edges, no under-passage); such a component lies over everything it meets, so
      // reversing it changes no writhe or linking number.
      for (std::size_t c = 0; c < d.crossings().size(); ++c) {
        const int oc = d.crossings()[c].over_component;
        const auto& cm = d.component_list()[static_cast<std::size_t>(oc)];
        bool ambiguous = cm.edges <= 2;
        for (const auto& x : d.crossings()) ambiguous = ambiguous && x.under_component != oc;
        if (!ambiguous) {
          ASSERT_EQ(pd.signs()[c], d.signs()[c]) << show(s) << " crossing " << c;
        }
      }
      std::vector<std::vector<std::int64_t>> arcs;
      for (const auto& a : d.arcs())
        if (!a.edges.empty()) arcs.push_back(a.edges);
      if (d.crossingless_components() == 0) {
        ASSERT_EQ(pd.arcs(), arcs) << show(s);
      }
      if (d.components() == 2 && d.crossingless_components() == 0) {
        ASSERT_EQ(pd.linking_number(), d.linking_number()) << show(s);
      }
      // Round trip through the text form.
      const fp::PdDiagram again(fp::parse_pd(fp::to_string(d.pd_code())));
      ASSERT_EQ(again.code(), d.pd_code());
    }
  }
}

TEST(Diagram, DtAndGaussCodesAreConsistent) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(500); ++it) {
    const auto s = random_sequence(g, 6, 3);
    const Diagram d = Diagram::of_twists(s);
    const auto gauss = d.gauss_code();
    std::map<std::int64_t, int> met;
    for (const auto& comp : gauss.components)
      for (auto v : comp) met[v]++;
    for (std::int64_t c = 1; c <= d.crossing_count(); ++c) {
      ASSERT_EQ(met[c], 1) << show(s);   // passed over once
      ASSERT_EQ(met[-c], 1) << show(s);  // and under once
    }
    if (d.components() != 1) {
      EXPECT_THROW((void)d.dt_code(), fp::DomainError);
      continue;
    }
    const auto dt = d.dt_code();
    ASSERT_EQ(static_cast<std::int64_t>(dt.size()), d.crossing_count());
    std::set<std::int64_t> evens;
    for (auto v : dt) {
      ASSERT_EQ(v % 2, 0);
      evens.insert(v < 0 ? -v : v);
    }
    ASSERT_EQ(static_cast<std::int64_t>(evens.size()), d.crossing_count());
    // For an alternating knot every sign agrees (common practice).
    if (d.is_alternating() && !dt.empty()) {
      for (auto v : dt) ASSERT_EQ(v > 0, dt[0] > 0) << show(s);
    }
  }
  EXPECT_THROW((void)Diagram::of_twists(seq({3}), DiagramClosure::none).dt_code(), fp::DomainError);
}

// ---------------------------------------------------------------------------------------------
// Coloring fraction (Kauffman–Lambropoulou, Adv. Appl. Math. 33 (2004), second proof of
// Conway's theorem)

TEST(Diagram, ColoringFractionOfTheBasicTangles) {
  // Our sign: F = (a − b)/(c − a) gives F([1]) = 1.
  const auto e = fp::end_colors(Diagram::of_twists(seq({1})));
  EXPECT_EQ(e.nw, 0);
  EXPECT_EQ(e.nw + e.se, e.ne + e.sw);
  EXPECT_EQ(fp::coloring_fraction(Diagram::of_twists(seq({1}))), Fraction(1));
  EXPECT_EQ(fp::coloring_fraction(Diagram::of_twists(seq({-1}))), Fraction(-1));
  EXPECT_EQ(fp::coloring_fraction(Diagram::of_twists(seq({0}))), Fraction(0));
  EXPECT_EQ(fp::coloring_fraction(Diagram::of_twists(seq({0, 0}))), Fraction::infinity());
  EXPECT_EQ(fp::coloring_fraction(Diagram::of_twists(seq({2, 1, 2}))), Fraction(Integer(8), Integer(3)));
}

TEST(Diagram, ColoringFractionEqualsContinuedFraction) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(5000); ++it) {
    const auto s = random_sequence(g, 9, 5);
    const Diagram d = Diagram::of_twists(s, DiagramClosure::none);
    const auto e = fp::end_colors(d);
    ASSERT_EQ(e.nw + e.se, e.ne + e.sw) << show(s);  // K–L: a + d = b + c
    ASSERT_EQ(fp::coloring_fraction(d), fp::twist_value(s)) << show(s);
  }
  // Long sequences with big terms (colors far beyond 2^64).
  for (int it = 0; it < fp::testing::iterations(20); ++it) {
    TwistSequence s;
    const int len = std::uniform_int_distribution<int>(50, 200)(g);
    for (int i = 0; i < len; ++i) s.twists.emplace_back(std::uniform_int_distribution<int>(-30, 30)(g));
    ASSERT_EQ(fp::coloring_fraction(Diagram::of_twists(s)), fp::twist_value(s)) << show(s);
  }
}

TEST(Diagram, ColoringFractionIsAdditiveOverSums) {
  // F(T1 + T2) = F(T1) + F(T2) for the coloring fraction (Kauffman–Lambropoulou 2004).
  auto& g = fp::testing::rng();
  int checked = 0;
  for (int it = 0; it < fp::testing::iterations(1000); ++it) {
    std::vector<TwistSequence> parts;
    const int r = std::uniform_int_distribution<int>(2, 3)(g);
    for (int i = 0; i < r; ++i) parts.push_back(random_sequence(g, 4, 3));
    Fraction expect = fp::twist_value(parts[0]);
    bool defined = true;
    for (int i = 1; i < r; ++i) {
      const Fraction v = fp::twist_value(parts[static_cast<std::size_t>(i)]);
      if (expect.is_infinite() && v.is_infinite()) { defined = false; break; }
      expect += v;
    }
    const Diagram d = Diagram::of_sum(parts, DiagramClosure::none);
    if (!defined) {
      EXPECT_THROW((void)fp::coloring_fraction(d), fp::DomainError);
      continue;
    }
    ASSERT_EQ(fp::coloring_fraction(d), expect);
    ++checked;
  }
  EXPECT_GT(checked, 100);
}

// ---------------------------------------------------------------------------------------------
// Sums: the diagram against the algebra of algebraic.hpp

TEST(Diagram, SumsAgreeWithTheAlgebra) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(150); ++it) {
    std::vector<fp::RationalTangle> parts;
    std::vector<TwistSequence> seqs;
    for (int i = 0; i < 2; ++i) {
      Integer p = std::uniform_int_distribution<int>(-9, 9)(g), q = std::uniform_int_distribution<int>(1, 9)(g);
      if (fp::gcd(p, q) != 1) p = 1;
      const Fraction f(p, q);
      parts.emplace_back(f);
      seqs.push_back(fp::canonical_twists(f));
    }
    const fp::TangleSum sum(parts);
    for (auto cl : {fp::Closure::numerator, fp::Closure::denominator}) {
      const Diagram d = Diagram::of_sum(sum, fp::diagram_closure(cl));
      ASSERT_EQ(d.components(), sum.components(cl));
      if (d.crossing_count() == 0 || d.crossingless_components() > 0) continue;
      const fp::PdDiagram pd(d.pd_code());
      ASSERT_EQ(pd.determinant(), sum.determinant(cl));
      // The 2-bridge link the algebra names (Ernst–Sumners 1990) has the same Kauffman bracket,
      // up to a unit, as the drawn sum — chirality included (brackets of mirrors differ by A ↔ 1/A).
      const auto tb = sum.closure_two_bridge(cl);
      if (!tb || d.crossing_count() > 11) continue;
      const Diagram ref = Diagram::of_fraction(Fraction(tb->p(), tb->q() == 0 ? Integer(1) : tb->q()));
      if (ref.crossing_count() == 0 || tb->p() <= 1) continue;
      ASSERT_EQ(normalised(bracket(d.pd_code())), normalised(bracket(ref.pd_code())))
          << fp::to_string(parts[0].fraction()) << " + " << fp::to_string(parts[1].fraction()) << " "
          << (cl == fp::Closure::numerator ? "N" : "D") << " -> " << fp::to_string(*tb);
    }
  }
}

// ---------------------------------------------------------------------------------------------
// Size

TEST(Diagram, LargeDiagramsBuildInLinearTime) {
  // 10^5 crossings: [1 1 ... 1] (Fibonacci fractions) and one long box.
  TwistSequence fib;
  fib.twists.assign(100001, Integer(1));
  const Diagram d = Diagram::of_twists(fib);
  EXPECT_EQ(d.crossing_count(), 100001);
  EXPECT_EQ(static_cast<std::int64_t>(d.edges().size()), 2 * d.crossing_count());
  EXPECT_TRUE(d.is_alternating());
  const fp::PdDiagram pd(d.pd_code());
  EXPECT_EQ(pd.writhe(), d.writhe());
  const Diagram box = Diagram::of_twists(seq({200000}));
  EXPECT_EQ(box.linking_number(), 100000);
}
