// Tests of Fox colorings (fourplat/coloring.hpp) and of the Smith normal form behind them
// (lib/detail/smith.hpp): the formula n·gcd(n,p) against the diagram's coloring equations
// (Smith form), against brute force, and the witnesses against Fox's rule.
#include "fourplat/coloring.hpp"

#include <gtest/gtest.h>

#include <functional>
#include <set>

#include "detail/smith.hpp"
#include "fourplat/continued_fraction.hpp"
#include "fourplat/pd.hpp"
#include "testing.hpp"

namespace fp = fourplat;
using fp::Closure;
using fp::Diagram;
using fp::DiagramClosure;
using fp::Fraction;
using fp::Integer;
using fp::TwistSequence;

namespace {

/// Every tangle fraction whose crossing number is exactly c (c ≥ 1), both signs: the values of all
/// compositions of c read as twist sequences, and their reciprocals (a final twist 0).
std::set<Fraction> fractions_with_crossings(int c) {
  std::set<Fraction> out;
  for (std::uint32_t mask = 0; mask < (1u << (c - 1)); ++mask) {
    TwistSequence s;
    int run = 1;
    for (int i = 0; i < c - 1; ++i) {
      if ((mask >> i) & 1u) {
        s.twists.emplace_back(run);
        run = 1;
      } else {
        ++run;
      }
    }
    s.twists.emplace_back(run);
    const Fraction v = fp::twist_value(s);
    for (const Fraction& f : {v, v.reciprocal()}) {
      out.insert(f);
      out.insert(-f);
    }
  }
  return out;
}

/// Brute force: the number of color vectors in (Z/n)^arcs obeying Fox's rule on d.
std::int64_t brute_force_count(const Diagram& d, int n) {
  const std::size_t a = d.arcs().size();
  std::vector<Integer> col(a, Integer(0));
  std::int64_t count = 0;
  std::function<void(std::size_t)> rec = [&](std::size_t i) {
    if (i == a) {
      count += fp::satisfies_fox_rule(d, col, Integer(n)) ? 1 : 0;
      return;
    }
    for (int v = 0; v < n; ++v) {
      col[i] = v;
      rec(i + 1);
    }
  };
  rec(0);
  return count;
}

void check_witness(const Diagram& d, const std::optional<std::vector<Integer>>& w, const Integer& n,
                   const std::string& what) {
  ASSERT_TRUE(w.has_value()) << what;
  ASSERT_EQ(w->size(), d.arcs().size()) << what;
  ASSERT_TRUE(fp::satisfies_fox_rule(d, *w, n)) << what;
  std::set<Integer> colors(w->begin(), w->end());
  ASSERT_GT(colors.size(), 1u) << what << ": the witness must not be constant";
  for (const auto& v : *w) ASSERT_TRUE(v >= 0 && v < n) << what;
}

}  // namespace

// ---------------------------------------------------------------------------------------------
// The formula

TEST(Coloring, FormulaOnKnownLinks) {
  // The trefoil b(3,1) is 3-colorable with 9 colorings; the figure-eight b(5,2) is 5-colorable but
  // not 3-colorable (Fox 1962; common practice).
  const fp::TwoBridgeLink trefoil(Integer(3), Integer(1)), eight(Integer(5), Integer(2));
  EXPECT_EQ(fp::coloring_count(trefoil, Integer(3)), 9);
  EXPECT_TRUE(fp::is_three_colorable(trefoil));
  EXPECT_FALSE(fp::is_three_colorable(eight));
  EXPECT_TRUE(fp::is_colorable(eight, Integer(5)));
  EXPECT_EQ(fp::coloring_count(eight, Integer(5)), 25);
  EXPECT_EQ(fp::coloring_count(eight, Integer(3)), 3);
  // The unlink: n² (one free color per component); the unknot: n.
  EXPECT_EQ(fp::coloring_count(fp::TwoBridgeLink::unlink(), Integer(7)), 49);
  EXPECT_EQ(fp::coloring_count(fp::TwoBridgeLink::unknot(), Integer(7)), 7);
  EXPECT_EQ(fp::coloring_count(trefoil, Integer(1)), 1);
}

TEST(Coloring, ZeroAndNegativeModuliAreRejected) {
  const fp::TwoBridgeLink trefoil(Integer(3), Integer(1));
  EXPECT_THROW((void)fp::coloring_count(trefoil, Integer(0)), fp::DomainError);
  EXPECT_THROW((void)fp::is_colorable(trefoil, Integer(-3)), fp::DomainError);
  EXPECT_THROW((void)fp::colorings(Fraction(3), Closure::numerator, Integer(0)), fp::DomainError);
  const Diagram d = Diagram::of_fraction(Fraction(3));
  EXPECT_THROW((void)fp::coloring_count(d, Integer(0)), fp::DomainError);
  EXPECT_THROW((void)fp::coloring_witness(d, Integer(-1)), fp::DomainError);
  try {
    (void)fp::coloring_count(trefoil, Integer(0));
  } catch (const fp::DomainError& e) {
    EXPECT_NE(std::string(e.what()).find("modulus"), std::string::npos);
  }
  EXPECT_THROW((void)fp::coloring_count(Diagram::of_fraction(Fraction(3), DiagramClosure::none), Integer(3)),
               fp::DomainError);
}

TEST(Coloring, TrefoilWitnessByHand) {
  // N([3]): three arcs, colors 0, 1, 2 in some order (each crossing sees all three colors).
  const auto c = fp::colorings(Fraction(3), Closure::numerator, Integer(3));
  EXPECT_EQ(c.count, 9);
  ASSERT_TRUE(c.coloring.has_value());
  EXPECT_EQ(std::set<Integer>(c.coloring->begin(), c.coloring->end()), (std::set<Integer>{0, 1, 2}));
  EXPECT_FALSE(fp::colorings(Fraction(3), Closure::numerator, Integer(5)).coloring.has_value());
  // The unlink N([0]) has no crossing but two arcs: colors 0 and 1.
  const auto u = fp::colorings(Fraction(0), Closure::numerator, Integer(4));
  EXPECT_EQ(u.count, 16);
  ASSERT_TRUE(u.coloring.has_value());
  EXPECT_EQ(*u.coloring, (std::vector<Integer>{0, 1}));
}

// ---------------------------------------------------------------------------------------------
// Every tangle up to 8 crossings exhaustively, 9..12 sampled: formula vs the exported PD code's
// Smith form, witnesses on the exported arcs.

TEST(Coloring, AllTanglesUpToTwelveCrossings) {
  auto& g = fp::testing::rng();
  const std::vector<int> moduli{1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 12, 15, 16, 21, 34, 55};
  int checked = 0;
  for (int c = 1; c <= 12; ++c) {
    const auto all = fractions_with_crossings(c);
    std::vector<Fraction> pick(all.begin(), all.end());
    if (c > 8) {  // a sample: a few hundred per crossing number
      std::shuffle(pick.begin(), pick.end(), g);
      pick.resize(std::min<std::size_t>(pick.size(), static_cast<std::size_t>(fp::testing::iterations(150))));
    }
    for (const Fraction& f : pick) {
      for (Closure cl : {Closure::numerator, Closure::denominator}) {
        const Diagram d = Diagram::of_fraction(f, fp::diagram_closure(cl));
        ASSERT_EQ(Integer(d.crossing_count()), fp::twist_crossings(f));
        const std::string what = fp::to_string(f) + (cl == Closure::numerator ? " N" : " D");
        const Integer det = fp::closure_determinant(f, cl);
        const fp::PdDiagram pd(fp::parse_pd(fp::to_string(d.pd_code())));
        ASSERT_EQ(pd.determinant(), det) << what;
        ASSERT_EQ(fp::determinant(d), det) << what;
        for (int n : moduli) {
          const Integer N(n);
          const Integer expect = N * fp::gcd(N, det);
          ASSERT_EQ(pd.coloring_count(N), expect) << what << " mod " << n;
          const auto w = fp::colorings(f, cl, N);
          ASSERT_EQ(w.count, expect);
          if (expect > N) {
            check_witness(d, w.coloring, N, what + " propagated mod " + std::to_string(n));
            const auto pw = pd.coloring_witness(N);
            check_witness(d, pw, N, what + " PD Smith mod " + std::to_string(n));  // same arcs
          } else {
            ASSERT_FALSE(w.coloring.has_value()) << what;
            ASSERT_FALSE(pd.coloring_witness(N).has_value()) << what;
          }
        }
        ++checked;
      }
    }
  }
  EXPECT_GT(checked, 1000);  // 1..8 exhaustively gives more than 1000 closures alone
}

TEST(Coloring, ThreeWaysOnSmallDiagrams) {
  // Formula vs Smith form of the diagram's equations vs brute force over all n^arcs colorings,
  // for every tangle with at most 5 crossings (any twist sequence drawn from it, sums too).
  for (int c = 1; c <= 5; ++c)
    for (const Fraction& f : fractions_with_crossings(c))
      for (Closure cl : {Closure::numerator, Closure::denominator}) {
        const Diagram d = Diagram::of_fraction(f, fp::diagram_closure(cl));
        const Integer det = fp::closure_determinant(f, cl);
        for (int n = 1; n <= (d.arcs().size() <= 4 ? 6 : 4); ++n) {
          const Integer N(n);
          const Integer formula = N * fp::gcd(N, det);
          ASSERT_EQ(fp::coloring_count(d, N), formula) << fp::to_string(f);
          ASSERT_EQ(Integer(brute_force_count(d, n)), formula) << fp::to_string(f) << " mod " << n;
        }
      }
  // Non-canonical diagrams (zeros, mixed signs): Smith form vs brute force.
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(60); ++it) {
    TwistSequence s;
    const int len = std::uniform_int_distribution<int>(1, 4)(g);
    for (int i = 0; i < len; ++i) s.twists.emplace_back(std::uniform_int_distribution<int>(-2, 2)(g));
    const Diagram d = Diagram::of_twists(s);
    if (d.arcs().size() > 6) continue;
    const Integer det = fp::closure_determinant(fp::twist_value(s), Closure::numerator);
    for (int n = 2; n <= 4; ++n) {
      ASSERT_EQ(fp::coloring_count(d, Integer(n)), Integer(brute_force_count(d, n)));
      ASSERT_EQ(fp::coloring_count(d, Integer(n)), Integer(n) * fp::gcd(Integer(n), det));
    }
  }
}

TEST(Coloring, WitnessesOnNonCanonicalAndSumDiagrams) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(300); ++it) {
    TwistSequence s;
    const int len = std::uniform_int_distribution<int>(1, 6)(g);
    for (int i = 0; i < len; ++i) s.twists.emplace_back(std::uniform_int_distribution<int>(-4, 4)(g));
    const Diagram d = Diagram::of_twists(s);
    const Integer det = fp::closure_determinant(fp::twist_value(s), Closure::numerator);
    for (int n : {2, 3, 5, 6, 8}) {
      const Integer N(n);
      if (fp::gcd(N, det) > 1) {
        check_witness(d, fp::propagated_witness(d, N), N, "propagated");
        check_witness(d, fp::coloring_witness(d, N), N, "smith");
      } else {
        ASSERT_FALSE(fp::propagated_witness(d, N).has_value());
        ASSERT_FALSE(fp::coloring_witness(d, N).has_value());
      }
    }
  }
  // Pretzel P(3,3,3) = N(1/3 + 1/3 + 1/3): determinant |3·3 + 3·3 + 3·3| = 27 (common practice
  // for pretzel links), so 3-, 9- and 27-colorable.
  const std::vector<TwistSequence> parts(3, TwistSequence{{Integer(3), Integer(0)}});
  const Diagram p = Diagram::of_sum(parts);
  EXPECT_EQ(fp::determinant(p), 27);
  for (int n : {3, 9, 27}) check_witness(p, fp::coloring_witness(p, Integer(n)), Integer(n), "pretzel");
  EXPECT_THROW((void)fp::propagated_witness(p, Integer(3)), fp::DomainError);
}

TEST(Coloring, BigModuliAcrossWordBoundaries) {
  // p = F_90 (a Fibonacci numerator) and moduli around 2^63, 2^64, 2^127 with common factors.
  Integer a = 0, b = 1;
  TwistSequence fib;
  for (int i = 0; i < 89; ++i) {
    fib.twists.emplace_back(1);
    Integer c2 = a + b;
    a = b;
    b = c2;
  }
  const Fraction f = fp::twist_value(fib);
  const Integer p = f.numerator();
  const Diagram d = Diagram::of_fraction(f);
  for (const Integer& base : {Integer(1) << 63, Integer(1) << 64, Integer(1) << 127}) {
    for (const Integer& n : {base - 1, base, base + 1, p * base, p * 3, p}) {
      const Integer expect = n * fp::gcd(n, p);
      ASSERT_EQ(fp::coloring_count(fp::TwoBridgeLink::numerator_closure(f), n), expect);
      ASSERT_EQ(fp::coloring_count(d, n), expect) << n;
      const auto w = fp::colorings(f, Closure::numerator, n);
      if (expect > n) {
        check_witness(d, w.coloring, n, "big modulus " + n.str());
        check_witness(d, fp::coloring_witness(d, n), n, "big modulus smith " + n.str());
      } else {
        ASSERT_FALSE(w.coloring.has_value());
      }
    }
  }
}

// ---------------------------------------------------------------------------------------------
// Smith normal form against determinantal divisors (Smith 1861: d1·…·dk = gcd of the k×k minors)

namespace {

Integer det_dense(std::vector<std::vector<Integer>> m) {  // Laplace expansion; small sizes only
  const std::size_t k = m.size();
  if (k == 0) return 1;
  if (k == 1) return m[0][0];
  Integer sum = 0;
  for (std::size_t j = 0; j < k; ++j) {
    std::vector<std::vector<Integer>> sub;
    for (std::size_t i = 1; i < k; ++i) {
      std::vector<Integer> row;
      for (std::size_t jj = 0; jj < k; ++jj)
        if (jj != j) row.push_back(m[i][jj]);
      sub.push_back(row);
    }
    sum += (j % 2 == 0 ? 1 : -1) * m[0][j] * det_dense(sub);
  }
  return sum;
}

Integer minors_gcd(const std::vector<std::vector<Integer>>& m, std::size_t k) {
  const std::size_t R = m.size(), C = m[0].size();
  Integer g = 0;
  for (std::uint32_t rs = 0; rs < (1u << R); ++rs) {
    if (static_cast<std::size_t>(__builtin_popcount(rs)) != k) continue;
    for (std::uint32_t cs = 0; cs < (1u << C); ++cs) {
      if (static_cast<std::size_t>(__builtin_popcount(cs)) != k) continue;
      std::vector<std::vector<Integer>> sub;
      for (std::size_t i = 0; i < R; ++i) {
        if (!((rs >> i) & 1u)) continue;
        std::vector<Integer> row;
        for (std::size_t j = 0; j < C; ++j)
          if ((cs >> j) & 1u) row.push_back(m[i][j]);
        sub.push_back(row);
      }
      g = fp::gcd(g, det_dense(sub));
    }
  }
  return g;
}

}  // namespace

TEST(Smith, InvariantFactorsAreDeterminantalDivisorRatios) {
  auto& g = fp::testing::rng();
  for (int it = 0; it < fp::testing::iterations(400); ++it) {
    const std::size_t R = std::uniform_int_distribution<std::size_t>(1, 4)(g);
    const std::size_t C = std::uniform_int_distribution<std::size_t>(1, 4)(g);
    const int range = it % 3 == 0 ? 1 : 9;  // ±1 entries exercise the sparse unit phase
    std::vector<std::vector<Integer>> m(R, std::vector<Integer>(C));
    std::vector<fp::detail::SparseRow> rows(R);
    for (std::size_t i = 0; i < R; ++i)
      for (std::size_t j = 0; j < C; ++j) {
        m[i][j] = std::uniform_int_distribution<int>(-range, range)(g);
        if (m[i][j] != 0) rows[i].emplace_back(static_cast<std::int64_t>(j), m[i][j]);
      }
    const fp::detail::SmithForm s(static_cast<std::int64_t>(C), rows);
    const auto d = s.invariant_factors();
    Integer prev = 1;
    for (std::size_t k = 1; k <= std::min(R, C); ++k) {
      const Integer dk = minors_gcd(m, k);
      if (dk == 0) {
        ASSERT_EQ(static_cast<std::size_t>(s.rank()), k - 1);
        break;
      }
      ASSERT_LT(k - 1, d.size());
      ASSERT_EQ(d[k - 1], dk / prev) << "k = " << k;
      prev = dk;
    }
    // Solutions mod n: count and generators against brute force.
    for (int n = 2; n <= 4; ++n) {
      std::int64_t brute = 0;
      std::set<std::vector<int>> sols;
      std::vector<int> x(C, 0);
      std::function<void(std::size_t)> rec = [&](std::size_t j) {
        if (j == C) {
          for (std::size_t i = 0; i < R; ++i) {
            Integer v = 0;
            for (std::size_t jj = 0; jj < C; ++jj) v += m[i][jj] * x[jj];
            if (fp::mod_floor(v, Integer(n)) != 0) return;
          }
          ++brute;
          sols.insert(x);
          return;
        }
        for (int v = 0; v < n; ++v) {
          x[j] = v;
          rec(j + 1);
        }
      };
      rec(0);
      ASSERT_EQ(s.count_solutions_mod(Integer(n)), brute);
      // The generators lie in the solution group and generate all of it.
      std::set<std::vector<int>> span{std::vector<int>(C, 0)};
      for (const auto& gen : s.solution_generators_mod(Integer(n))) {
        std::vector<int> gv;
        for (const auto& v : gen) gv.push_back(v.convert_to<int>());
        ASSERT_TRUE(sols.count(gv)) << "a generator is not a solution";
        for (bool grew = true; grew;) {
          grew = false;
          for (auto y : std::vector<std::vector<int>>(span.begin(), span.end())) {
            for (std::size_t j = 0; j < C; ++j) y[j] = (y[j] + gv[j]) % n;
            grew = span.insert(y).second || grew;
          }
        }
      }
      ASSERT_EQ(static_cast<std::int64_t>(span.size()), brute);
    }
  }
}
