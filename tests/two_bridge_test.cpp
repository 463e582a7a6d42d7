// Tests of fourplat/two_bridge.hpp: Schubert's classification checked exhaustively against the
// pairwise criterion, the word path against the GMP path (random and at the word boundaries),
// random properties of closures, and the degenerate links.
#include "fourplat/two_bridge.hpp"

#include <gtest/gtest.h>
#include <gmp.h>

#include <algorithm>
#include <cstdint>
#include <cstdio>
#include <ostream>
#include <limits>
#include <numeric>
#include <optional>
#include <random>
#include <vector>

#include "fourplat/continued_fraction.hpp"
#include "fourplat/error.hpp"
#include "fourplat/tangle.hpp"
#include "testing.hpp"

namespace fourplat {

// Readable failure messages ("b(7,3)" rather than bytes); found by argument-dependent lookup.
void PrintTo(const TwoBridgeLink& l, std::ostream* os) { *os << to_string(l); }
void PrintTo(const OrientedTwoBridgeLink& l, std::ostream* os) { *os << to_string(l); }

namespace {

using testing::iterations;
using testing::rng;

/// Inverses mod m of every unit, by direct search (independent of extended Euclid): inv[x] = 0
/// for non-units.
std::vector<int> inverses_by_search(int m) {
  std::vector<int> inv(static_cast<std::size_t>(m), 0);
  for (int x = 1; x < m; ++x) {
    for (int y = 1; y < m; ++y) {
      if ((x * y) % m == 1) {
        inv[static_cast<std::size_t>(x)] = y;
        break;
      }
    }
  }
  return inv;
}

int64_t as_int(const Integer& x) { return x.convert_to<std::int64_t>(); }

// ---------------------------------------------------------------------------------------------
// Schubert's theorem (Schubert 1956; stated in Kauffman–Lambropoulou, Enseign. Math. 49, 2003):
// b(p,q) ≅ b(p,q') iff q' ≡ q^{±1} (mod p). The classes from the canonical representatives must
// be exactly the classes of the pairwise criterion, with inverses found by direct search.

TEST(Schubert, UnorientedClassesMatchPairwiseCriterionUpTo200) {
  for (int p = 2; p <= 200; ++p) {
    const std::vector<int> inv = inverses_by_search(p);
    std::vector<int64_t> canon(static_cast<std::size_t>(p), -1);
    std::vector<int64_t> canon_mirror(static_cast<std::size_t>(p), -1);
    for (int q = 1; q < p; ++q) {
      if (std::gcd(p, q) != 1) continue;
      const TwoBridgeLink l(p, q);
      canon[static_cast<std::size_t>(q)] = as_int(l.canonical().q());
      canon_mirror[static_cast<std::size_t>(q)] = as_int(l.canonical_up_to_mirror().q());
      ASSERT_EQ(l.canonical().p(), p);
    }
    for (int q = 1; q < p; ++q) {
      if (std::gcd(p, q) != 1) continue;
      const int qi = inv[static_cast<std::size_t>(q)];
      ASSERT_NE(qi, 0) << "p=" << p << " q=" << q;
      for (int r = 1; r < p; ++r) {
        if (std::gcd(p, r) != 1) continue;
        const bool pairwise = r == q || r == qi;
        const bool pairwise_mirror = pairwise || r == p - q || r == p - qi;
        ASSERT_EQ(canon[static_cast<std::size_t>(q)] == canon[static_cast<std::size_t>(r)], pairwise)
            << "b(" << p << "," << q << ") vs b(" << p << "," << r << ")";
        ASSERT_EQ(canon_mirror[static_cast<std::size_t>(q)] ==
                      canon_mirror[static_cast<std::size_t>(r)],
                  pairwise_mirror)
            << "up to mirror: b(" << p << "," << q << ") vs b(" << p << "," << r << ")";
      }
      // The representative is the least member of the class.
      EXPECT_EQ(canon[static_cast<std::size_t>(q)], std::min(q, qi));
    }
  }
}

TEST(Schubert, SameLinkAgreesWithPairwiseCriterionSmallP) {
  // same_link / same_up_to_mirror themselves (not just the canonical forms), every pair p ≤ 40.
  for (int p = 2; p <= 40; ++p) {
    const std::vector<int> inv = inverses_by_search(p);
    for (int q = 1; q < p; ++q) {
      if (std::gcd(p, q) != 1) continue;
      for (int r = 1; r < p; ++r) {
        if (std::gcd(p, r) != 1) continue;
        const int qi = inv[static_cast<std::size_t>(q)];
        const bool pairwise = r == q || r == qi;
        // Representatives off the Schubert range: q + kp and −p, −q describe the same link.
        const TwoBridgeLink a(p, q + 3 * p), b(-p, -r);
        EXPECT_EQ(same_link(a, b), pairwise) << p << " " << q << " " << r;
        EXPECT_EQ(same_up_to_mirror(a, b), pairwise || r == p - q || r == p - qi);
      }
    }
  }
  EXPECT_FALSE(same_link(TwoBridgeLink(5, 1), TwoBridgeLink(7, 1)));
}

// Oriented form (same sources): q, q' odd, b(p,q) ≅ b(p,q') iff q' ≡ q^{±1} (mod 2p).
TEST(Schubert, OrientedClassesMatchPairwiseCriterionUpTo200) {
  for (int p = 2; p <= 200; ++p) {
    const int m = 2 * p;
    const std::vector<int> inv = inverses_by_search(m);
    std::vector<int64_t> canon(static_cast<std::size_t>(m), -1);
    std::vector<int64_t> ucanon(static_cast<std::size_t>(p), -1);  // unoriented, by q mod p
    for (int q = 1; q < p; ++q) {
      if (std::gcd(p, q) == 1) ucanon[static_cast<std::size_t>(q)] = as_int(TwoBridgeLink(p, q).canonical().q());
    }
    for (int q = 1; q < m; q += 2) {
      if (std::gcd(p, q) != 1) continue;
      const OrientedTwoBridgeLink l(p, q);
      ASSERT_EQ(l.q(), q);  // already normal
      canon[static_cast<std::size_t>(q)] = as_int(l.canonical().q());
      // Knots are invertible: one oriented class per unoriented class. For p odd, q and its
      // even partner q + p (mod 2p) are the same oriented link.
      if (p % 2 == 1) {
        EXPECT_EQ(OrientedTwoBridgeLink(p, q + p), l);
      }
    }
    for (int q = 1; q < m; q += 2) {
      if (std::gcd(p, q) != 1) continue;
      const int qi = inv[static_cast<std::size_t>(q)];
      ASSERT_NE(qi, 0);
      ASSERT_EQ(canon[static_cast<std::size_t>(q)], std::min(q, qi)) << p << " " << q;
      for (int r = 1; r < m; r += 2) {
        if (std::gcd(p, r) != 1) continue;
        const bool pairwise = r == q || r == qi;
        ASSERT_EQ(canon[static_cast<std::size_t>(q)] == canon[static_cast<std::size_t>(r)], pairwise)
            << "oriented b(" << p << "," << q << ") vs b(" << p << "," << r << ")";
        // Oriented equivalence refines the unoriented one; for knots they coincide.
        const bool unoriented = ucanon[static_cast<std::size_t>(q % p)] ==
                                ucanon[static_cast<std::size_t>(r % p)];
        if (pairwise) {
          ASSERT_TRUE(unoriented);
        }
        if (p % 2 == 1) {
          ASSERT_EQ(pairwise, unoriented) << p << " " << q << " " << r;
        }
      }
    }
  }
}

TEST(Schubert, TwoComponentLinksHaveTwoRelativeOrientations) {
  // q → q + p changes the oriented class exactly when q + p ≢ q⁻¹ (mod 2p) (Schubert's oriented
  // criterion with the inverse found by search). Example: b(8,3) and b(8,11) coincide, because
  // 3·11 = 33 ≡ 1 (mod 16); b(4,1) and b(4,5) do not.
  int differing = 0;
  for (int p = 2; p <= 60; p += 2) {
    for (int q = 1; q < p; q += 2) {
      if (std::gcd(p, q) != 1) continue;
      const OrientedTwoBridgeLink a(p, q);
      const OrientedTwoBridgeLink b = a.reverse_one_component();
      EXPECT_EQ(b.q(), q + p);
      EXPECT_EQ(b.reverse_one_component(), a);
      EXPECT_TRUE(same_link(a.unoriented(), b.unoriented()));
      const auto inv = inverses_by_search(2 * p)[static_cast<std::size_t>(q)];
      EXPECT_EQ(same_oriented_link(a, b), q + p == inv) << p << " " << q;
      differing += same_oriented_link(a, b) ? 0 : 1;
    }
  }
  EXPECT_GT(differing, 100);
  // A knot has one orientation class up to reversal.
  const OrientedTwoBridgeLink k(7, 3);
  EXPECT_EQ(k.reverse_one_component(), k);
}

// ---------------------------------------------------------------------------------------------
// Degenerate and small cases (common practice).

TEST(TwoBridge, DegenerateLinks) {
  const TwoBridgeLink unknot = TwoBridgeLink::unknot();
  EXPECT_EQ(unknot, TwoBridgeLink(1, 0));
  EXPECT_EQ(unknot, TwoBridgeLink(1, 17));
  EXPECT_EQ(unknot, TwoBridgeLink(-1, 5));
  EXPECT_EQ(unknot.components(), 1);
  EXPECT_EQ(unknot.kind(), LinkKind::unknot);
  EXPECT_EQ(unknot.crossing_number(), 0);
  EXPECT_EQ(unknot.determinant(), 1);
  EXPECT_TRUE(unknot.is_amphichiral());
  EXPECT_EQ(unknot.canonical(), unknot);
  EXPECT_EQ(unknot.canonical_up_to_mirror(), unknot);
  EXPECT_EQ(unknot.mirror(), unknot);
  EXPECT_EQ(to_string(unknot), "b(1,0)");

  const TwoBridgeLink unlink = TwoBridgeLink::unlink();
  EXPECT_EQ(unlink, TwoBridgeLink(0, 1));
  EXPECT_EQ(unlink, TwoBridgeLink(0, -1));
  EXPECT_EQ(unlink.components(), 2);
  EXPECT_EQ(unlink.kind(), LinkKind::unlink);
  EXPECT_EQ(unlink.crossing_number(), 0);
  EXPECT_EQ(unlink.determinant(), 0);
  EXPECT_TRUE(unlink.is_amphichiral());
  EXPECT_EQ(unlink.mirror(), unlink);
  EXPECT_EQ(to_string(unlink), "b(0,1)");

  // N(∞) is the unknot, N(0) the unlink; D swaps them (D(F) = N(−1/F)).
  EXPECT_EQ(TwoBridgeLink::numerator_closure(Fraction::infinity()), unknot);
  EXPECT_EQ(TwoBridgeLink::numerator_closure(Fraction(0)), unlink);
  EXPECT_EQ(TwoBridgeLink::denominator_closure(Fraction::infinity()), unlink);
  EXPECT_EQ(TwoBridgeLink::denominator_closure(Fraction(0)), unknot);
  // D of an integer tangle [n] is the unknot (the twists untwist).
  EXPECT_EQ(TwoBridgeLink::denominator_closure(Fraction(7)), unknot);

  EXPECT_EQ(OrientedTwoBridgeLink(1, 0).q(), 1);
  EXPECT_EQ(OrientedTwoBridgeLink(0, -1).q(), 1);
  EXPECT_EQ(to_string(LinkKind::hyperbolic), "hyperbolic");
  EXPECT_EQ(to_string(LinkKind::torus), "torus");
}

TEST(TwoBridge, HopfLinkAndTorusLinks) {
  // Hopf link b(2,1) = T(2,2): two components, two crossings, amphichiral as an unoriented link
  // (common practice).
  const TwoBridgeLink hopf(2, 1);
  EXPECT_EQ(hopf.components(), 2);
  EXPECT_EQ(hopf.crossing_number(), 2);
  EXPECT_EQ(hopf.kind(), LinkKind::torus);
  EXPECT_TRUE(hopf.is_amphichiral());
  EXPECT_EQ(hopf, TwoBridgeLink::numerator_closure(Fraction(2)));
  // T(2,n) = N([n]) = b(n,1): crossing number n; chiral for n ≥ 3; b(n, n−1) is its mirror.
  for (int n = 3; n <= 40; ++n) {
    const TwoBridgeLink t(n, 1);
    EXPECT_EQ(t.kind(), LinkKind::torus);
    EXPECT_EQ(t.crossing_number(), n);
    EXPECT_FALSE(t.is_amphichiral()) << n;
    EXPECT_EQ(t.mirror(), TwoBridgeLink(n, n - 1));
    EXPECT_EQ(TwoBridgeLink(n, n - 1).kind(), LinkKind::torus);
    EXPECT_EQ(t.components(), n % 2 == 1 ? 1 : 2);
    EXPECT_FALSE(same_link(t, t.mirror()));
    EXPECT_TRUE(same_up_to_mirror(t, t.mirror()));
  }
  // Figure-eight b(5,2): amphichiral, hyperbolic; the Whitehead link b(8,3): hyperbolic link.
  EXPECT_TRUE(TwoBridgeLink(5, 2).is_amphichiral());
  EXPECT_EQ(TwoBridgeLink(5, 2).kind(), LinkKind::hyperbolic);
  EXPECT_EQ(TwoBridgeLink(8, 3).components(), 2);
  EXPECT_EQ(TwoBridgeLink(8, 3).crossing_number(), 5);
}

TEST(TwoBridge, RejectsNonCoprime) {
  EXPECT_THROW(TwoBridgeLink(6, 4), DomainError);
  EXPECT_THROW(TwoBridgeLink(0, 0), DomainError);
  EXPECT_THROW(TwoBridgeLink(0, 2), DomainError);
  EXPECT_THROW(TwoBridgeLink(5, 0), DomainError);
  EXPECT_THROW(OrientedTwoBridgeLink(6, 3), DomainError);
  try {
    (void)TwoBridgeLink(12, 18);
    FAIL();
  } catch (const DomainError& e) {
    EXPECT_NE(std::string(e.what()).find("gcd(12, 18) = 6"), std::string::npos) << e.what();
  }
}

TEST(TwoBridge, SchubertNormalForm) {
  EXPECT_EQ(TwoBridgeLink(7, -4), TwoBridgeLink(7, 3));
  EXPECT_EQ(TwoBridgeLink(-7, 4), TwoBridgeLink(7, 3));
  EXPECT_EQ(TwoBridgeLink(-7, -4), TwoBridgeLink(7, 4));
  EXPECT_EQ(TwoBridgeLink(7, 25).q(), 4);
  EXPECT_EQ(to_string(TwoBridgeLink(7, 3)), "b(7,3)");
  EXPECT_EQ(OrientedTwoBridgeLink(7, 4).q(), 11);   // even q → q + p
  EXPECT_EQ(OrientedTwoBridgeLink(8, 3).q(), 3);
  EXPECT_EQ(OrientedTwoBridgeLink(8, 11).q(), 11);  // the other orientation is kept
  EXPECT_EQ(OrientedTwoBridgeLink(8, -3).q(), 13);
  EXPECT_EQ(OrientedTwoBridgeLink(-8, 3).q(), 13);
  EXPECT_EQ(to_string(OrientedTwoBridgeLink(8, 11)), "b(8,11)");
  // The right-handed trefoil N([3]) and its mirror N([−3]) (conventions: docs/conventions.md).
  EXPECT_EQ(closure(RationalTangle::integer(3)), TwoBridgeLink(3, 1));
  EXPECT_EQ(closure(RationalTangle::integer(-3)), TwoBridgeLink(3, 2));
  EXPECT_EQ(closure(RationalTangle::integer(3), Closure::denominator), TwoBridgeLink::unknot());
}

// ---------------------------------------------------------------------------------------------
// Word path against the GMP path.

/// Compares summarize_numerator_word(p, q) with TwoBridgeLink(p, q), field by field; the GMP
/// side computes amphichirality as q² + 1 ≡ 0 (mod p) directly.
void expect_word_matches_big(std::int64_t p, std::int64_t q) {
  const std::optional<LinkSummaryWord> w = summarize_numerator_word(p, q);
  const Integer bp(p), bq(q);
  if (gcd(bp, bq) != 1) {
    EXPECT_FALSE(w.has_value()) << "p=" << p << " q=" << q;
    EXPECT_THROW(TwoBridgeLink(bp, bq), DomainError);
    return;
  }
  const TwoBridgeLink l(bp, bq);
  if (p == std::numeric_limits<std::int64_t>::min()) {
    EXPECT_FALSE(w.has_value()) << "|p| = 2^63 has no word";
    return;
  }
  ASSERT_TRUE(w.has_value()) << "p=" << p << " q=" << q;
  EXPECT_EQ(Integer(w->p), l.p()) << p << " " << q;
  EXPECT_EQ(Integer(w->q), l.q()) << p << " " << q;
  EXPECT_EQ(Integer(w->canonical_q), l.canonical().q()) << p << " " << q;
  EXPECT_EQ(Integer(w->canonical_mirror_q), l.canonical_up_to_mirror().q()) << p << " " << q;
  EXPECT_EQ(Integer(w->crossing_number), l.crossing_number()) << p << " " << q;
  EXPECT_EQ(w->components, l.components()) << p << " " << q;
  const bool amph = l.p() <= 1 || (l.q() * l.q() + 1) % l.p() == 0;
  EXPECT_EQ(w->amphichiral, amph) << p << " " << q;
  EXPECT_EQ(w->amphichiral, l.is_amphichiral());
  EXPECT_EQ(w->kind, l.kind()) << p << " " << q;

  const std::optional<OrientedLinkSummaryWord> o = summarize_oriented_numerator_word(p, q);
  const OrientedTwoBridgeLink ol(bp, bq);
  if (l.p() >= (Integer(1) << 62)) {
    EXPECT_FALSE(o.has_value());
  } else {
    ASSERT_TRUE(o.has_value()) << p << " " << q;
    EXPECT_EQ(Integer(o->p), ol.p());
    EXPECT_EQ(Integer(o->q), ol.q()) << p << " " << q;
    EXPECT_EQ(Integer(o->canonical_q), ol.canonical().q()) << p << " " << q;
    EXPECT_EQ(o->components, l.components());
  }
}

std::int64_t random_word(unsigned bits) {
  // A random integer of up to `bits` bits (corner-biased), clamped into int64.
  Integer x = testing::random_integer(bits);
  if (x > INT64_MAX) x = INT64_MAX;
  if (x < INT64_MIN) x = INT64_MIN;
  return x.convert_to<std::int64_t>();
}

TEST(WordPath, AgreesWithBigPathOnRandomInput) {
  std::mt19937_64& g = rng();
  const int n = iterations(20000);
  for (int i = 0; i < n; ++i) {
    const unsigned bits = std::uniform_int_distribution<unsigned>(1, 63)(g);
    std::int64_t p = random_word(bits);
    std::int64_t q = random_word(std::uniform_int_distribution<unsigned>(1, 63)(g));
    if (i % 2 == 0) {  // mostly coprime pairs: divide out the gcd
      const Integer d = gcd(Integer(p), Integer(q));
      if (d > 1) {
        p = (Integer(p) / d).convert_to<std::int64_t>();
        q = (Integer(q) / d).convert_to<std::int64_t>();
      }
    }
    expect_word_matches_big(p, q);
    if (::testing::Test::HasFailure()) {
      FAIL() << "seed " << testing::seed() << ", input p=" << p << " q=" << q;
    }
  }
}

TEST(WordPath, AgreesAtTheWordBoundaries) {
  constexpr std::int64_t kMax = std::numeric_limits<std::int64_t>::max();
  constexpr std::int64_t kMin = std::numeric_limits<std::int64_t>::min();
  const std::int64_t two62 = std::int64_t{1} << 62;
  // Fibonacci numbers: the longest expansions (F_92 is the largest below 2^63).
  std::vector<std::int64_t> fib = {1, 1};
  while (fib.back() <= kMax - fib[fib.size() - 2]) fib.push_back(fib.back() + fib[fib.size() - 2]);
  const std::vector<std::int64_t> ps = {kMax,      kMax - 1, kMin,      kMin + 1, two62 - 1, two62,
                                        two62 + 1, -two62,   fib.back(), fib[fib.size() - 2],
                                        (std::int64_t{1} << 32) + 1, (std::int64_t{1} << 32) - 1,
                                        3, 2, 1, 0, -1, -2};
  const std::vector<std::int64_t> qs = {1,     -1,    2,         kMax,      kMin,      kMin + 1,
                                        two62, two62 - 1, two62 + 1, fib.back(), fib[fib.size() - 2],
                                        fib[fib.size() - 3], 0, (std::int64_t{1} << 32), 12345};
  for (std::int64_t p : ps) {
    for (std::int64_t q : qs) expect_word_matches_big(p, q);
  }
  // F_n/F_(n−1) = [1; 1, ..., 1, 2] has crossing number n − 1 (here n = 92).
  const auto w = summarize_numerator_word(fib.back(), fib[fib.size() - 2]);
  ASSERT_TRUE(w.has_value());
  EXPECT_EQ(w->crossing_number, static_cast<std::int64_t>(fib.size()) - 1);
  // Beyond the word: the big path still answers, e.g. p = 2^63, 2^64 + 1, 2^64 − 3, 2^127 − 1, 2^128 + 1.
  for (const Integer& bp : {Integer(1) << 63, (Integer(1) << 64) + 1, (Integer(1) << 64) - 3,
                            (Integer(1) << 127) - 1, (Integer(1) << 128) + 1}) {
    const TwoBridgeLink l(bp, 3);
    Integer inv;
    mpz_invert(inv.backend().data(), Integer(3).backend().data(), bp.backend().data());
    EXPECT_EQ(l.canonical().q(), std::min(Integer(3), inv));
    EXPECT_EQ(l.canonical_up_to_mirror().q(), 3);
  }
  // 2^63 = 3k + 2 gives 2^63/3 = [k; 1, 2]: crossing number k + 3.
  EXPECT_EQ(TwoBridgeLink(Integer(1) << 63, 3).crossing_number(), (Integer(1) << 63) / 3 + 3);
  // 2^64 + 1 = 3k' + 2 as well (2^64 ≡ 1 mod 3).
  EXPECT_EQ(TwoBridgeLink((Integer(1) << 64) + 1, 3).crossing_number(),
            ((Integer(1) << 64) + 1) / 3 + 3);
}

TEST(WordPath, BatchAgreesWithSingleCallsForEveryKernel) {
  std::mt19937_64& g = rng();
  const std::size_t n = static_cast<std::size_t>(iterations(5000)) + 13;  // not a multiple of 32
  std::vector<std::int64_t> ps(n), qs(n);
  for (std::size_t i = 0; i < n; ++i) {
    ps[i] = random_word(std::uniform_int_distribution<unsigned>(1, 63)(g));
    qs[i] = random_word(std::uniform_int_distribution<unsigned>(1, 63)(g));
    if (i % 3 != 0) {
      const Integer d = gcd(Integer(ps[i]), Integer(qs[i]));
      if (d > 1) {
        ps[i] = (Integer(ps[i]) / d).convert_to<std::int64_t>();
        qs[i] = (Integer(qs[i]) / d).convert_to<std::int64_t>();
      }
    }
    if (i % 7 == 0) {  // a huge first partial quotient (≥ 2^50: the vector kernel's scalar fix-up)
      ps[i] = (std::int64_t{1} << 62) + 1 + static_cast<std::int64_t>(g() % 1000) * 2;
      qs[i] = static_cast<std::int64_t>(g() % 5000) + 1;
    }
  }
  ps[0] = std::numeric_limits<std::int64_t>::max();  // the largest word, a tiny quotient next
  qs[0] = std::numeric_limits<std::int64_t>::max() - 1;
  std::vector<std::optional<LinkSummaryWord>> out(n);
  int kernels = 0;
  for (WordKernel kernel : {WordKernel::best, WordKernel::scalar, WordKernel::avx512}) {
    if (!word_kernel_available(kernel)) {
      EXPECT_THROW(summarize_numerator_words(ps, qs, out, kernel), DomainError);
      continue;
    }
    ++kernels;
    std::fill(out.begin(), out.end(), std::nullopt);
    summarize_numerator_words(ps, qs, out, kernel);
    for (std::size_t i = 0; i < n; ++i) {
      const auto one = summarize_numerator_word(ps[i], qs[i]);
      SCOPED_TRACE("kernel " + std::to_string(static_cast<int>(kernel)) + ", input " +
                   std::to_string(ps[i]) + "/" + std::to_string(qs[i]));
      ASSERT_EQ(out[i].has_value(), one.has_value());
      if (!one) continue;
      EXPECT_EQ(out[i]->p, one->p);
      EXPECT_EQ(out[i]->q, one->q);
      EXPECT_EQ(out[i]->canonical_q, one->canonical_q);
      EXPECT_EQ(out[i]->canonical_mirror_q, one->canonical_mirror_q);
      EXPECT_EQ(out[i]->crossing_number, one->crossing_number);
      EXPECT_EQ(out[i]->components, one->components);
      EXPECT_EQ(out[i]->amphichiral, one->amphichiral);
      EXPECT_EQ(out[i]->kind, one->kind);
    }
  }
  EXPECT_GE(kernels, 2);
  std::printf("batch kernels tested: %d (AVX-512 %s)\n", kernels,
              word_kernel_available(WordKernel::avx512) ? "available" : "not available");
  // Short and empty batches, and mismatched lengths.
  std::vector<std::optional<LinkSummaryWord>> three(3);
  const std::vector<std::int64_t> p3 = {7, 0, 4}, q3 = {3, 1, 2};
  summarize_numerator_words(p3, q3, three);
  EXPECT_EQ(three[0]->canonical_q, 3);
  EXPECT_EQ(three[1]->kind, LinkKind::unlink);
  EXPECT_FALSE(three[2].has_value());
  summarize_numerator_words({}, {}, {});
  EXPECT_THROW(summarize_numerator_words(p3, q3, std::span(three).first(2)), DomainError);
}

// ---------------------------------------------------------------------------------------------
// Random properties of closures.

Fraction random_fraction(unsigned bits) {
  for (;;) {
    const Integer p = testing::random_integer(bits);
    const Integer q = testing::random_integer(bits);
    if (p == 0 && q == 0) continue;
    return Fraction(p, q);
  }
}

TEST(TwoBridgeProperties, ClosuresCanonicalFormsAndMirrors) {
  const int n = iterations(3000);
  for (int i = 0; i < n; ++i) {
    const unsigned bits = (i % 4 == 0) ? 140 : 40;
    const Fraction f = random_fraction(bits);
    const RationalTangle t(f);
    SCOPED_TRACE("seed " + std::to_string(testing::seed()) + ", F = " + to_string(f));
    // N(T) = D(T^r): the rotation turns one closure into the other (K–L 2003).
    EXPECT_EQ(closure(t), closure(t.rotate(), Closure::denominator));
    EXPECT_EQ(closure(t, Closure::denominator), TwoBridgeLink::numerator_closure(-f.reciprocal()));
    // N(T + [n]) = N(F + n) is the closure of the folded fraction, and N(T*) is the mirror.
    const TwoBridgeLink l = closure(t);
    EXPECT_EQ(closure(t.mirror()), l.mirror());
    EXPECT_EQ(l.determinant(), abs(f.numerator()));
    // Canonical forms are idempotent and class invariants; mirror twice is the identity.
    EXPECT_EQ(l.canonical().canonical(), l.canonical());
    EXPECT_EQ(l.canonical_up_to_mirror().canonical_up_to_mirror(), l.canonical_up_to_mirror());
    EXPECT_EQ(l.mirror().mirror(), l);
    EXPECT_EQ(l.mirror().canonical_up_to_mirror(), l.canonical_up_to_mirror());
    EXPECT_TRUE(same_link(l, l.canonical()));
    EXPECT_LE(l.canonical().q(), l.q());
    EXPECT_LE(l.canonical_up_to_mirror().q(), l.canonical().q());
    // The inverse representative b(p, q⁻¹) is the same link (reversed expansion).
    if (l.p() >= 2) {
      Integer inv;
      mpz_invert(inv.backend().data(), l.q().backend().data(), l.p().backend().data());
      EXPECT_EQ(TwoBridgeLink(l.p(), inv).canonical(), l.canonical());
      EXPECT_EQ(TwoBridgeLink(l.p(), inv).crossing_number(), l.crossing_number());
    }
    // Amphichiral ⇔ the link equals its mirror ⇔ q² ≡ −1 (mod p).
    EXPECT_EQ(l.is_amphichiral(), l.canonical() == l.mirror().canonical());
    EXPECT_EQ(l.is_amphichiral(), same_link(l, l.mirror()));
    // The mirror has the same crossing number, components and determinant.
    EXPECT_EQ(l.mirror().crossing_number(), l.crossing_number());
    EXPECT_EQ(l.mirror().components(), l.components());
    // Oriented classes refine unoriented ones; the oriented canonical form is idempotent.
    const OrientedTwoBridgeLink o = OrientedTwoBridgeLink::numerator_closure(f);
    EXPECT_EQ(o.canonical().canonical(), o.canonical());
    EXPECT_TRUE(same_link(o.canonical().unoriented(), l));
    EXPECT_TRUE(same_link(o.unoriented(), l));
    EXPECT_EQ(o.mirror().mirror(), o);
    EXPECT_TRUE(same_link(o.mirror().unoriented(), l.mirror()));
    EXPECT_TRUE(same_oriented_link(o, o.canonical()));
    if (l.components() == 1) {
      EXPECT_EQ(o.reverse_one_component(), o);
    }
  }
}

TEST(TwoBridgeProperties, CrossingNumberIsSumOfTwistsOfCanonicalSequence) {
  // Kauffman–Murasugi–Thistlethwaite: the canonical (reduced alternating) diagram is minimal. Its
  // crossings, as the continued-fraction module counts them, equal the link's crossing number.
  const int n = iterations(2000);
  for (int i = 0; i < n; ++i) {
    const Fraction f = random_fraction(48);
    const TwoBridgeLink l = TwoBridgeLink::numerator_closure(f);
    if (l.p() <= 1) continue;
    // The tangle p/q with 0 < q < p draws b(p,q) reduced alternating.
    const Fraction reduced(l.p(), l.q());
    EXPECT_EQ(l.crossing_number(), twist_crossings(reduced)) << to_string(f);
  }
}

}  // namespace
}  // namespace fourplat
