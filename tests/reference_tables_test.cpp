// Checks of the classification against published tables and counts:
//   * the 2-bridge knots up to 7 crossings and 2-bridge links up to 6 crossings in Rolfsen's
//     table (D. Rolfsen, Knots and Links, 1976, Appendix C) — entries written FROM MEMORY:
//     Conway notation, a fraction, determinant, amphichirality;
//   * the number of 2-bridge knots by crossing number, a knot and its mirror counted once
//     (Ernst–Sumners, "The growth of the number of prime knots", Math. Proc. Camb. Phil. Soc. 102,
//     1987; OEIS A018240), by brute force over all fractions.
#include <gtest/gtest.h>

#include <cstdint>
#include <map>
#include <numeric>
#include <set>
#include <string>
#include <utility>
#include <vector>

#include "fourplat/continued_fraction.hpp"
#include "fourplat/two_bridge.hpp"

namespace fourplat {
namespace {

struct TableEntry {
  const char* name;
  std::vector<int> conway;  // Conway notation = twist sequence in Conway's order
  int p, q;                 // a fraction as recalled (any representative of the class or mirror)
  int determinant;
  int crossings;
  int amphichiral;           // 1 yes, 0 no, −1 not recalled
};

// Rolfsen 1976, Appendix C, from memory. Every prime knot with at most 7 crossings is 2-bridge.
// Amphichiral among them: 4_1 and 6_3 only (common practice).
const std::vector<TableEntry>& knot_table() {
  static const std::vector<TableEntry> t = {
      {"3_1", {3}, 3, 1, 3, 3, 0},
      {"4_1", {2, 2}, 5, 2, 5, 4, 1},
      {"5_1", {5}, 5, 1, 5, 5, 0},
      {"5_2", {3, 2}, 7, 3, 7, 5, 0},
      {"6_1", {4, 2}, 9, 2, 9, 6, 0},
      {"6_2", {3, 1, 2}, 11, 3, 11, 6, 0},
      {"6_3", {2, 1, 1, 2}, 13, 5, 13, 6, 1},
      {"7_1", {7}, 7, 1, 7, 7, 0},
      {"7_2", {5, 2}, 11, 2, 11, 7, 0},
      {"7_3", {4, 3}, 13, 3, 13, 7, 0},
      {"7_4", {3, 1, 3}, 15, 4, 15, 7, 0},
      {"7_5", {3, 2, 2}, 17, 5, 17, 7, 0},
      {"7_6", {2, 2, 1, 2}, 19, 7, 19, 7, 0},
      {"7_7", {2, 1, 1, 1, 2}, 21, 8, 21, 7, 0},
  };
  return t;
}

// Two-component links of Rolfsen's table up to 6 crossings, all 2-bridge (from memory):
// the Hopf link, 4^2_1 = T(2,4), the Whitehead link 5^2_1, 6^2_1 = T(2,6), 6^2_2, 6^2_3.
// Amphichirality is asserted only where it is common practice (the Hopf link is amphichiral,
// T(2,n) for n ≥ 3 is not).
const std::vector<TableEntry>& link_table() {
  static const std::vector<TableEntry> t = {
      {"2^2_1", {2}, 2, 1, 2, 2, 1},
      {"4^2_1", {4}, 4, 1, 4, 4, 0},
      {"5^2_1", {2, 1, 2}, 8, 3, 8, 5, -1},
      {"6^2_1", {6}, 6, 1, 6, 6, 0},
      {"6^2_2", {3, 3}, 10, 3, 10, 6, -1},
      {"6^2_3", {2, 2, 2}, 12, 5, 12, 6, -1},
  };
  return t;
}

TwoBridgeLink from_conway(const std::vector<int>& twists) {
  std::vector<Integer> t(twists.begin(), twists.end());
  return TwoBridgeLink::numerator_closure(twist_value(t));
}

void check_table(const std::vector<TableEntry>& table, int components) {
  std::set<std::pair<std::int64_t, std::int64_t>> seen;
  for (const TableEntry& e : table) {
    SCOPED_TRACE(e.name);
    const TwoBridgeLink l = from_conway(e.conway);
    // The Conway notation and the recalled fraction name the same knot up to mirror image.
    EXPECT_TRUE(same_up_to_mirror(l, TwoBridgeLink(e.p, e.q)));
    EXPECT_EQ(l.determinant(), e.determinant);
    EXPECT_EQ(l.crossing_number(), e.crossings);
    if (e.amphichiral >= 0) {
      EXPECT_EQ(l.is_amphichiral(), e.amphichiral == 1);
    }
    EXPECT_EQ(l.components(), components);
    const TwoBridgeLink c = l.canonical_up_to_mirror();
    EXPECT_TRUE(seen.emplace(c.p().convert_to<std::int64_t>(), c.q().convert_to<std::int64_t>())
                    .second)
        << "two table entries are the same link";
  }
}

TEST(RolfsenTable, TwoBridgeKnotsUpTo7Crossings) { check_table(knot_table(), 1); }
TEST(RolfsenTable, TwoBridgeLinksUpTo6Crossings) { check_table(link_table(), 2); }

// Brute force over all fractions p/q, 0 < q < p ≤ limit, through the word path: per crossing
// number, the set of classes (p, canonical q up to mirror), knots and two-component links apart.
struct Census {
  std::map<std::int64_t, std::set<std::pair<std::int64_t, std::int64_t>>> knots, links;
  std::vector<std::int64_t> min_crossings;  // over all q, indexed by p
};

Census census(std::int64_t limit) {
  Census c;
  c.min_crossings.assign(static_cast<std::size_t>(limit + 1), INT64_MAX);
  for (std::int64_t p = 2; p <= limit; ++p) {
    for (std::int64_t q = 1; q < p; ++q) {
      if (std::gcd(p, q) != 1) continue;
      const auto s = summarize_numerator_word(p, q);
      if (!s) {
        ADD_FAILURE() << "word path failed on " << p << "/" << q;
        continue;
      }
      auto& bucket = (p % 2 == 1 ? c.knots : c.links)[s->crossing_number];
      bucket.emplace(s->p, s->canonical_mirror_q);
      auto& m = c.min_crossings[static_cast<std::size_t>(p)];
      m = std::min(m, s->crossing_number);
    }
  }
  return c;
}

std::vector<std::int64_t> fibonacci(int n) {  // F_1 .. F_n
  std::vector<std::int64_t> f = {1, 1};
  while (static_cast<int>(f.size()) < n) f.push_back(f.back() + f[f.size() - 2]);
  return f;
}

TEST(RolfsenTable, TableIsTheWholeListUpTo7Crossings) {
  // Every 2-bridge knot with crossing number n ≤ 7 (and link with n ≤ 6) found by enumeration is
  // in the table, and vice versa.
  const Census c = census(21);  // F_8 = 21 bounds p for crossing number 7
  for (int n = 3; n <= 7; ++n) {
    std::set<std::pair<std::int64_t, std::int64_t>> table;
    for (const TableEntry& e : knot_table()) {
      if (e.crossings != n) continue;
      const TwoBridgeLink k = from_conway(e.conway).canonical_up_to_mirror();
      table.emplace(k.p().convert_to<std::int64_t>(), k.q().convert_to<std::int64_t>());
    }
    EXPECT_EQ(c.knots.at(n), table) << "crossing number " << n;
  }
  for (int n = 2; n <= 6; ++n) {
    std::set<std::pair<std::int64_t, std::int64_t>> table;
    for (const TableEntry& e : link_table()) {
      if (e.crossings != n) continue;
      const TwoBridgeLink k = from_conway(e.conway).canonical_up_to_mirror();
      table.emplace(k.p().convert_to<std::int64_t>(), k.q().convert_to<std::int64_t>());
    }
    const auto it = c.links.find(n);
    EXPECT_EQ(it == c.links.end() ? decltype(table){} : it->second, table) << "links, n = " << n;
  }
}

// Ernst–Sumners 1987: the number of 2-bridge knots with crossing number n ≥ 3, a knot and its
// mirror image counted once.
std::int64_t ernst_sumners_knots(int n) {
  const std::int64_t a = std::int64_t{1} << (n - 3);
  switch (n % 4) {
    case 0: return (a + (std::int64_t{1} << ((n - 4) / 2))) / 3;
    case 1: return (a + (std::int64_t{1} << ((n - 3) / 2))) / 3;
    case 2: return (a + (std::int64_t{1} << ((n - 4) / 2)) - 1) / 3;
    default: return (a + (std::int64_t{1} << ((n - 3) / 2)) + 1) / 3;
  }
}

TEST(ErnstSumners, KnotCountsByCrossingNumberUpTo16) {
  // The first values, as printed in OEIS A018240 (n = 3..12).
  const std::vector<std::int64_t> oeis = {1, 1, 2, 3, 7, 12, 24, 45, 91, 176};
  for (int n = 3; n <= 12; ++n) {
    EXPECT_EQ(ernst_sumners_knots(n), oeis[static_cast<std::size_t>(n - 3)]) << n;
  }
  const std::vector<std::int64_t> fib = fibonacci(17);  // F_17 = 1597
  const Census c = census(fib[16]);
  for (int n = 3; n <= 16; ++n) {
    const auto it = c.knots.find(n);
    ASSERT_NE(it, c.knots.end()) << n;
    EXPECT_EQ(static_cast<std::int64_t>(it->second.size()), ernst_sumners_knots(n))
        << "crossing number " << n;
    // The largest determinant with crossing number n is F_{n+1} (MATH.md §2): no p beyond it.
    for (std::int64_t p = fib[static_cast<std::size_t>(n)] + 1; p <= fib[16]; ++p) {
      ASSERT_GT(c.min_crossings[static_cast<std::size_t>(p)], n) << "p = " << p;
    }
    EXPECT_EQ(c.min_crossings[static_cast<std::size_t>(fib[static_cast<std::size_t>(n)])], n);
  }
}

}  // namespace
}  // namespace fourplat
