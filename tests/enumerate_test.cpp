// Tests of the generators (enumerate.hpp): every item checked on the independent big-integer
// path (TwoBridgeLink, OrientedTwoBridgeLink, canonical_twists), completeness against Schubert's
// theorem on every fraction, counts against the closed formulas, shards, limits and errors.
#include "fourplat/enumerate.hpp"

#include <gtest/gtest.h>

#include <algorithm>
#include <array>
#include <cstdint>
#include <map>
#include <numeric>
#include <set>
#include <string>
#include <tuple>
#include <utility>
#include <vector>

#include "fourplat/continued_fraction.hpp"
#include "fourplat/counts.hpp"
#include "fourplat/error.hpp"
#include "fourplat/two_bridge.hpp"
#include "testing.hpp"

namespace fourplat {
namespace {

using i64 = std::int64_t;

std::string describe(const EnumerationOptions& o) {
  const char* comp[] = {"knots", "links", "both"};
  return std::string(comp[static_cast<int>(o.components)]) + (o.mirrors ? " mirrors" : "") +
         (o.oriented ? " oriented" : "");
}

std::vector<EnumerationOptions> all_modes() {
  std::vector<EnumerationOptions> v;
  for (const auto c : {ComponentFilter::knots, ComponentFilter::links, ComponentFilter::both})
    for (const bool mir : {false, true})
      for (const bool ori : {false, true}) {
        EnumerationOptions o;
        o.components = c;
        o.mirrors = mir;
        o.oriented = ori;
        v.push_back(o);
      }
  return v;
}

TEST(Enumerate, CountsAgreeWithFormulasInEveryMode) {
  // Every mode by enumeration for n ≤ 20 (a few seconds under sanitizers).
  for (const EnumerationOptions& o : all_modes()) {
    for (int n = 0; n <= 20; ++n) {
      std::uint64_t k = 0;
      for_each_two_bridge(n, n, o, [&](const EnumeratedLink&) { return ++k, true; });
      EXPECT_EQ(Integer(k), count_classes(n, o)) << describe(o) << " n=" << n;
    }
  }
}

TEST(Enumerate, CountsAgreeWithFormulasUpTo26) {
  // n = 21 … 26: one walk per classification, items sorted into knots and links by the sink (the
  // component filter itself is covered above).
  for (const bool mir : {false, true}) {
    for (const bool ori : {false, true}) {
      EnumerationOptions o;
      o.mirrors = mir;
      o.oriented = ori;
      for (int n = 21; n <= 26; ++n) {
        std::uint64_t knots = 0, links = 0;
        for_each_two_bridge(n, n, o, [&](const EnumeratedLink& it) {
          (it.components == 1 ? knots : links) += 1;
          return true;
        });
        const TwoBridgeCounts c = count_two_bridge(n);
        EXPECT_EQ(Integer(knots), mir ? c.knots_with_mirrors : c.knots) << describe(o) << " n=" << n;
        EXPECT_EQ(Integer(links), ori ? (mir ? c.links_oriented_with_mirrors : c.links_oriented)
                                      : (mir ? c.links_with_mirrors : c.links))
            << describe(o) << " n=" << n;
      }
    }
  }
}

// Every field of every item against the big-integer classification of h2's TwoBridgeLink.
void check_item(const EnumeratedLink& it, const EnumerationOptions& o, int n) {
  SCOPED_TRACE(describe(o) + " n=" + std::to_string(n) + " b(" + std::to_string(it.p) + "," +
               std::to_string(it.q) + ")");
  ASSERT_EQ(it.crossings, n);
  const TwoBridgeLink l(it.fraction_p, it.fraction_q);  // N(fraction)
  EXPECT_EQ(l.crossing_number(), n);
  EXPECT_EQ(l.components(), it.components);
  EXPECT_EQ(l.is_amphichiral(), it.amphichiral);
  EXPECT_EQ(l.canonical().q(), it.canonical_q);
  EXPECT_EQ(l.canonical_up_to_mirror().q(), it.canonical_mirror_q);
  if (o.components == ComponentFilter::knots) {
    EXPECT_EQ(it.components, 1);
  }
  if (o.components == ComponentFilter::links) {
    EXPECT_EQ(it.components, 2);
  }
  if (!o.oriented) {
    // The item is canonical in its classification.
    EXPECT_EQ(it.q, o.mirrors ? l.canonical().q() : l.canonical_up_to_mirror().q());
    EXPECT_EQ(it.fraction_q, it.q);
    EXPECT_EQ(it.fraction_p, it.p);
  } else {
    const OrientedTwoBridgeLink ol(it.p, it.q);
    EXPECT_EQ(ol.q(), it.q);  // already odd and in (0, 2p)
    const OrientedTwoBridgeLink c = ol.canonical();
    const OrientedTwoBridgeLink cm = ol.mirror().canonical();
    EXPECT_EQ(it.q, o.mirrors ? c.q() : std::min(c.q(), cm.q()));
    // The tangle p/fraction_q closes to this oriented class.
    const auto closed = OrientedTwoBridgeLink::numerator_closure(Fraction(Integer(it.fraction_p), Integer(it.fraction_q)));
    EXPECT_TRUE(same_oriented_link(closed, ol));
  }
  if (o.twists) {
    std::vector<Integer> tw(it.twists.begin(), it.twists.end());
    const Fraction f(Integer(it.fraction_p), Integer(it.fraction_q));
    EXPECT_EQ(TwistSequence{tw}, canonical_twists(f));
    EXPECT_EQ(twist_value(tw), f);
    i64 sum = 0;
    for (const i64 t : it.twists) sum += t < 0 ? -t : t;
    if (n > 0) {
      EXPECT_EQ(sum, n);
    }
  }
}

// The key of a class in the options' classification (what must not repeat).
std::pair<i64, i64> class_key(const EnumeratedLink& it) { return {it.p, it.q}; }

TEST(Enumerate, EveryItemIsCanonicalAndOfTheRightCrossingNumber) {
  for (EnumerationOptions o : all_modes()) {
    o.twists = true;
    for (int n = 0; n <= 14; ++n) {
      std::set<std::pair<i64, i64>> seen;
      for_each_two_bridge(n, n, o, [&](const EnumeratedLink& it) {
        check_item(it, o, n);
        EXPECT_TRUE(seen.insert(class_key(it)).second) << "duplicate b(" << it.p << "," << it.q << ")";
        return !::testing::Test::HasFatalFailure();
      });
    }
  }
}

// ---- completeness: Schubert's theorem on every fraction with p ≤ F_13 ----

i64 quotient_sum(i64 p, i64 q) {
  i64 s = 0;
  while (q != 0) {
    s += p / q;
    std::tie(p, q) = std::make_pair(q, p % q);
  }
  return s;
}
i64 inverse_mod(i64 a, i64 m) {
  for (i64 x = 1; x < m; ++x)
    if ((a * x) % m == 1) return x;
  return 1;  // m = 1
}

TEST(Enumerate, EveryClassUpTo12CrossingsAppearsExactlyOnce) {
  // Built independently: all 0 < q < p ≤ F_13 = 233, crossing number by Euclid, grouped by
  // Schubert's theorem (1956; Kauffman–Lambropoulou, Enseign. Math. 49, 2003). Every 2-bridge
  // link with crossing number ≤ 12 has p ≤ F_13, so each class is found.
  for (const bool mir : {false, true}) {
    for (const bool ori : {false, true}) {
      std::map<std::vector<i64>, int> classes;  // class → times enumerated
      for (i64 p = 2; p <= 233; ++p) {
        for (i64 q = 1; q < p; ++q) {
          if (std::gcd(p, q) != 1 || quotient_sum(p, q) > 12) continue;
          std::vector<std::vector<i64>> keys;
          if (!ori) {
            const i64 qi = inverse_mod(q, p);
            std::vector<i64> k{q, qi};
            if (!mir) k.insert(k.end(), {p - q, p - qi});
            keys.push_back(k);
          } else {
            for (const i64 lift : {q, q + p}) {
              if (lift % 2 == 0) continue;
              const i64 li = inverse_mod(lift, 2 * p);
              std::vector<i64> k{lift, li};
              if (!mir) k.insert(k.end(), {2 * p - lift, 2 * p - li});
              keys.push_back(k);
            }
          }
          for (auto& k : keys) {
            std::sort(k.begin(), k.end());
            k.erase(std::unique(k.begin(), k.end()), k.end());
            k.insert(k.begin(), p);
            classes.emplace(k, 0);
          }
        }
      }
      EnumerationOptions o;
      o.mirrors = mir;
      o.oriented = ori;
      std::uint64_t items = 0;
      for_each_two_bridge(2, 12, o, [&](const EnumeratedLink& it) {
        ++items;
        // Find the class containing q (it is the least element of its key).
        bool found = false;
        for (auto i = classes.lower_bound({it.p}); i != classes.end() && i->first[0] == it.p; ++i) {
          if (std::find(i->first.begin() + 1, i->first.end(), it.q) != i->first.end()) {
            EXPECT_EQ(i->first[1], it.q) << "not the least q of its class";
            ++i->second;
            found = true;
            break;
          }
        }
        EXPECT_TRUE(found) << "b(" << it.p << "," << it.q << ") is no class";
        return true;
      });
      for (const auto& [k, times] : classes) {
        EXPECT_EQ(times, 1) << "class of b(" << k[0] << "," << k[1] << ") mirrors=" << mir
                            << " oriented=" << ori;
      }
      EXPECT_EQ(items, classes.size());
    }
  }
}

// ---- shards ----

TEST(Enumerate, ShardsAreDisjointBalancedAndCoverTheWhole) {
  for (EnumerationOptions o : {all_modes()[4], all_modes()[11], all_modes()[3]}) {
    std::vector<std::pair<i64, i64>> whole;
    for_each_two_bridge(0, 15, o, [&](const EnumeratedLink& it) {
      whole.push_back(class_key(it));
      return true;
    });
    for (const std::uint64_t parts : {1U, 2U, 3U, 5U, 8U, 64U, 1000U}) {
      std::vector<std::pair<i64, i64>> joined;
      Integer units = 0;
      for (std::uint64_t i = 0; i < parts; ++i) {
        o.shard = {i, parts};
        const ShardExtent ext = two_bridge_shard_extent(0, 15, o);
        EXPECT_EQ(ext.first, ext.whole * i / parts);
        units += ext.size;
        // Balanced: every part holds ⌊W/N⌋ or ⌈W/N⌉ classes before the filter.
        EXPECT_LE(ext.size, ext.whole / parts + 1);
        EXPECT_GE(ext.size, ext.whole / parts);
        for_each_two_bridge(0, 15, o, [&](const EnumeratedLink& it) {
          joined.push_back(class_key(it));
          return true;
        });
      }
      o.shard = {};
      EXPECT_EQ(units, two_bridge_shard_extent(0, 15, o).whole);
      // Shards in order, concatenated, are exactly the unsharded list (same order, no duplicate).
      EXPECT_EQ(joined, whole) << describe(o) << " parts=" << parts;
    }
  }
}

TEST(Enumerate, StopsWhenTheSinkSaysSo) {
  EnumerationOptions o;
  int calls = 0;
  EXPECT_FALSE(for_each_two_bridge(3, 20, o, [&](const EnumeratedLink&) { return ++calls < 10; }));
  EXPECT_EQ(calls, 10);
  EXPECT_TRUE(for_each_two_bridge(3, 5, o, [](const EnumeratedLink&) { return true; }));
  o.oriented = true;  // a stop between the two orientations of one link
  calls = 0;
  EXPECT_FALSE(for_each_two_bridge(2, 2, o, [&](const EnumeratedLink&) { return ++calls < 1; }));
  EXPECT_EQ(calls, 1);
}

TEST(Enumerate, SmallCases) {
  // 0 crossings: the unknot b(1,0) = N(1/0) and the unlink b(0,1) = N(0/1); 1: nothing;
  // 2: the Hopf link; 3: the trefoil b(3,1) (and with mirrors its mirror b(3,2)); 4: T(2,4) =
  // b(4,1) and the figure-eight knot b(5,2) (common practice).
  auto list = [](int n, EnumerationOptions o) {
    std::vector<std::pair<i64, i64>> v;
    for_each_two_bridge(n, n, o, [&](const EnumeratedLink& it) {
      v.push_back(class_key(it));
      return true;
    });
    return v;
  };
  using V = std::vector<std::pair<i64, i64>>;
  EnumerationOptions o;
  EXPECT_EQ(list(0, o), (V{{1, 0}, {0, 1}}));
  EXPECT_EQ(list(1, o), V{});
  EXPECT_EQ(list(2, o), (V{{2, 1}}));
  EXPECT_EQ(list(3, o), (V{{3, 1}}));
  EXPECT_EQ(list(4, o), (V{{4, 1}, {5, 2}}));
  o.oriented = true;
  EXPECT_EQ(list(0, o), (V{{1, 1}, {0, 1}}));  // oriented unknot is b(1,1)
  o.mirrors = true;
  EXPECT_EQ(list(2, o), (V{{2, 1}, {2, 3}}));  // the Hopf link's two orientations
  o.oriented = false;
  EXPECT_EQ(list(3, o), (V{{3, 1}, {3, 2}}));
}

TEST(Enumerate, WordsAreExactUpTo89Crossings) {
  // At the top of the range p reaches F_90 = 2880067194370816120 (the word alternating R and L):
  // sample shards spread over n = 89 and check the items on the big-integer path.
  EnumerationOptions o;
  o.mirrors = true;
  o.oriented = true;
  o.twists = true;
  i64 max_p = 0;
  const std::uint64_t parts = std::uint64_t{1} << 32;
  for (std::uint64_t i = 0; i < parts; i += parts / 61 + 12345) {
    o.shard = {i, parts};
    int taken = 0;
    for_each_two_bridge(89, 89, o, [&](const EnumeratedLink& it) {
      check_item(it, o, 89);
      max_p = std::max(max_p, it.p);
      return ++taken < 3;
    });
  }
  EXPECT_GT(max_p, i64{1} << 40);
  // F_90 itself: the alternating word is the continued fraction [1; 1, …, 1] of F_90/F_89.
  const TwoBridgeLink fib(Integer("2880067194370816120"), Integer("1779979416004714189"));
  EXPECT_EQ(fib.crossing_number(), 89);
}

TEST(Enumerate, Errors) {
  EnumerationOptions o;
  auto none = [](const EnumeratedLink&) { return true; };
  EXPECT_THROW(for_each_two_bridge(-1, 3, o, none), DomainError);
  EXPECT_THROW(for_each_two_bridge(5, 3, o, none), DomainError);
  EXPECT_THROW(for_each_two_bridge(3, 90, o, none), LimitError);
  o.shard = {3, 3};
  EXPECT_THROW(for_each_two_bridge(3, 5, o, none), DomainError);
  o.shard = {0, 0};
  EXPECT_THROW(for_each_two_bridge(3, 5, o, none), DomainError);
  TangleEnumerationOptions t;
  EXPECT_THROW(for_each_rational_tangle(0, 90, t, [](const EnumeratedTangle&) { return true; }), LimitError);
}

// ---- rational tangles ----

TEST(Enumerate, RationalTanglesEachFractionOnce) {
  TangleEnumerationOptions o;
  o.twists = true;
  std::set<Fraction> all;
  for (int n = 0; n <= 13; ++n) {
    std::uint64_t k = 0;
    for_each_rational_tangle(n, n, o, [&](const EnumeratedTangle& t) {
      ++k;
      const Fraction f{Integer(t.p), Integer(t.q)};
      EXPECT_EQ(f.numerator(), t.p);  // reduced, q ≥ 0
      EXPECT_EQ(f.denominator(), t.q);
      EXPECT_EQ(twist_crossings(f), n) << to_string(f);
      std::vector<Integer> tw(t.twists.begin(), t.twists.end());
      EXPECT_EQ(TwistSequence{tw}, canonical_twists(f)) << to_string(f);
      EXPECT_TRUE(all.insert(f).second) << to_string(f);
      return true;
    });
    EXPECT_EQ(Integer(k), count_rational_tangles(n)) << n;
  }
  // Independently: every fraction with |p|, q ≤ 20 whose crossing number is ≤ 13 was listed.
  for (i64 p = -20; p <= 20; ++p)
    for (i64 q = 0; q <= 20; ++q)
      if (std::gcd(p, q) == 1) {
        const Fraction f{Integer(p), Integer(q)};
        if (twist_crossings(f) <= 13) {
          EXPECT_TRUE(all.count(f)) << to_string(f);
        }
      }
}

TEST(Enumerate, RationalTangleShards) {
  TangleEnumerationOptions o;
  std::vector<std::pair<i64, i64>> whole, joined;
  for_each_rational_tangle(0, 12, o, [&](const EnumeratedTangle& t) {
    whole.emplace_back(t.p, t.q);
    return true;
  });
  for (std::uint64_t i = 0; i < 7; ++i) {
    o.shard = {i, 7};
    for_each_rational_tangle(0, 12, o, [&](const EnumeratedTangle& t) {
      joined.emplace_back(t.p, t.q);
      return true;
    });
  }
  EXPECT_EQ(joined, whole);
}

TEST(Enumerate, CanonicalTwistsWordAgreesWithTheBigIntegerPath) {
  auto& g = testing::rng();
  std::array<i64, 96> buf{};
  for (int it = 0; it < testing::iterations(20000); ++it) {
    i64 p = 0, q = 0;
    do {
      p = static_cast<i64>(testing::random_integer(61, g).convert_to<long long>());
      q = static_cast<i64>(testing::random_integer(61, g).convert_to<long long>());
      if (q < 0) q = -q;
    } while (std::gcd(p, q) != 1);
    const Fraction f{Integer(p), Integer(q)};
    const std::size_t len = canonical_twists_word(p, q, buf);
    std::vector<Integer> tw(buf.begin(), buf.begin() + static_cast<std::ptrdiff_t>(len));
    ASSERT_EQ(TwistSequence{tw}, canonical_twists(f)) << p << "/" << q;
  }
}

}  // namespace
}  // namespace fourplat
