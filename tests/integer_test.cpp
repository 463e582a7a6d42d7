// Tests of the machine-word helpers (lib/detail/word.hpp) and of integer.hpp's floor helpers,
// against GMP (through Integer and GMP's own floor-rounding mpz functions — a general-purpose
// reference library) on random input biased to the 2^63, 2^64 and 2^127 boundaries.
#include "fourplat/integer.hpp"

#include <gtest/gtest.h>

#include <cstdint>
#include <vector>

#include "detail/word.hpp"
#include "fourplat/continued_fraction.hpp"
#include "testing.hpp"

namespace fp = fourplat;
namespace dt = fourplat::detail;
using fp::Integer;

namespace {

const Integer kMin64 = Integer(INT64_MIN), kMax64 = Integer(INT64_MAX);
const Integer kTwo64 = Integer(1) << 64;

// A random int64 biased to the corners: INT64_MIN, INT64_MAX, ±(2^63 − 1), 0, ±1, ±2^31, ±2^32,
// square roots of the boundary (products near 2^63), and uniform words.
std::int64_t corner64() {
  auto& g = fp::testing::rng();
  static const std::vector<std::int64_t> corners = {
      INT64_MIN,     INT64_MIN + 1, INT64_MAX,     INT64_MAX - 1, 0,          1,
      -1,            2,             -2,            1LL << 31,     -(1LL << 31), 1LL << 32,
      -(1LL << 32),  3037000499LL,  -3037000499LL, 3037000500LL,  -3037000500LL,
      1LL << 62,     -(1LL << 62)};
  switch (g() % 4) {
    case 0: return corners[g() % corners.size()];
    case 1: {  // near a corner
      const std::int64_t c = corners[g() % corners.size()];
      const std::int64_t d = static_cast<std::int64_t>(g() % 5) - 2;
      std::int64_t r;
      return dt::try_add(c, d, r) ? r : c;
    }
    case 2: return static_cast<std::int64_t>(g() >> (g() % 64));  // all magnitudes
    default: return static_cast<std::int64_t>(g());
  }
}

std::uint64_t corner_u64() {
  auto& g = fp::testing::rng();
  switch (g() % 4) {
    case 0: return UINT64_MAX - g() % 3;
    case 1: return (std::uint64_t{1} << 63) + g() % 3 - 1;
    case 2: return g() >> (g() % 64);
    default: return g();
  }
}

bool fits64(const Integer& x) { return x >= kMin64 && x <= kMax64; }

// GMP's own floor division, called directly (a reference independent of div_floor's code).
Integer gmp_fdiv_q(const Integer& a, const Integer& b) {
  Integer q;
  mpz_fdiv_q(dt::mpz(q), dt::mpz(a), dt::mpz(b));
  return q;
}
Integer gmp_fdiv_r(const Integer& a, const Integer& b) {
  Integer r;
  mpz_fdiv_r(dt::mpz(r), dt::mpz(a), dt::mpz(b));
  return r;
}

}  // namespace

// Each checked operation succeeds exactly when the exact (GMP) result fits in int64, and then
// writes that result.
TEST(WordArithmetic, CheckedOpsAgreeWithGmp) {
  for (int i = 0; i < fp::testing::iterations(200000); ++i) {
    const std::int64_t a = corner64(), b = corner64(), c = corner64();
    const Integer A(a), B(b), C(c);
    std::int64_t r = 0;
    ASSERT_EQ(dt::try_add(a, b, r), fits64(A + B)) << a << " + " << b;
    if (fits64(A + B)) {
      ASSERT_EQ(Integer(r), A + B);
    }
    ASSERT_EQ(dt::try_sub(a, b, r), fits64(A - B)) << a << " - " << b;
    if (fits64(A - B)) {
      ASSERT_EQ(Integer(r), A - B);
    }
    ASSERT_EQ(dt::try_mul(a, b, r), fits64(A * B)) << a << " * " << b;
    if (fits64(A * B)) {
      ASSERT_EQ(Integer(r), A * B);
    }
    ASSERT_EQ(dt::try_neg(a, r), fits64(-A)) << a;
    if (fits64(-A)) {
      ASSERT_EQ(Integer(r), -A);
    }
    // a·b + c fails when the product overflows even if the sum would come back in range:
    // the helper is conservative exactly there, never wrong.
    const bool ok = dt::try_mul_add(a, b, c, r);
    if (ok) {
      ASSERT_EQ(Integer(r), A * B + C) << a << " * " << b << " + " << c;
    }
    ASSERT_EQ(ok, fits64(A * B) && fits64(A * B + C)) << a << " * " << b << " + " << c;
    ASSERT_EQ(Integer(dt::magnitude(a)), abs(A));
  }
}

// Unsigned sums and products on both sides of 2^64.
TEST(WordArithmetic, UnsignedChecksCrossTwoToThe64) {
  for (int i = 0; i < fp::testing::iterations(100000); ++i) {
    const std::uint64_t a = corner_u64(), b = corner_u64();
    std::uint64_t r = 0;
    const Integer sum = Integer(a) + Integer(b), product = Integer(a) * Integer(b);
    ASSERT_EQ(dt::try_add(a, b, r), sum < kTwo64);
    if (sum < kTwo64) {
      ASSERT_EQ(Integer(r), sum);
    }
    ASSERT_EQ(dt::try_mul(a, b, r), product < kTwo64);
    if (product < kTwo64) {
      ASSERT_EQ(Integer(r), product);
    }
  }
}

// Floor rounding against mpz_fdiv_q / mpz_fdiv_r, signs in all four combinations.
TEST(WordArithmetic, FloorDivisionAgreesWithGmp) {
  for (int i = 0; i < fp::testing::iterations(200000); ++i) {
    const std::int64_t a = corner64(), b = corner64();
    if (b == 0) continue;
    const Integer A(a), B(b);
    std::int64_t q = 0;
    const Integer expect_q = gmp_fdiv_q(A, B);
    ASSERT_EQ(dt::try_floor_div(a, b, q), fits64(expect_q)) << a << " / " << b;
    if (fits64(expect_q)) {
      ASSERT_EQ(Integer(q), expect_q) << a << " / " << b;
    }
    ASSERT_EQ(Integer(dt::floor_mod(a, b)), gmp_fdiv_r(A, B)) << a << " mod " << b;
    if (b > 0) {
      ASSERT_EQ(Integer(dt::mod_floor(a, b)), fp::mod_floor(A, B));
    }
  }
  std::int64_t q;
  EXPECT_FALSE(dt::try_floor_div(INT64_MIN, -1, q));  // 2^63
  EXPECT_EQ(dt::floor_mod(INT64_MIN, -1), 0);
}

// integer.hpp's helpers on big values (beyond any word) against GMP's floor functions.
TEST(IntegerHelpers, FloorAndConversionAgainstGmp) {
  for (int i = 0; i < fp::testing::iterations(20000); ++i) {
    const Integer a = fp::testing::random_integer(200), b = fp::testing::random_integer(140);
    if (b == 0) continue;
    ASSERT_EQ(fp::div_floor(a, b), gmp_fdiv_q(a, b)) << a << " / " << b;
    const Integer m = abs(b);
    ASSERT_EQ(fp::mod_floor(a, m), gmp_fdiv_r(a, m)) << a << " mod " << m;
    ASSERT_EQ(fp::to_int64(a).has_value(), fits64(a));
    ASSERT_EQ(dt::word_of(a), fp::to_int64(a)) << a;
  }
  const std::vector<Integer> edges = {kMax64, kMax64 + 1, kMin64, kMin64 - 1, kTwo64, -kTwo64,
                                      Integer(0), kMax64 - 1, kMin64 + 1};
  for (const Integer& x : edges) {
    EXPECT_EQ(fp::to_int64(x).has_value(), fits64(x)) << x;
    EXPECT_EQ(dt::word_of(x), fp::to_int64(x)) << x;
    if (fits64(x)) {
      EXPECT_EQ(Integer(*fp::to_int64(x)), x);
    }
  }
}

// a·b mod m with the product formed in 128 bits, against the exact product reduced by GMP.
TEST(WordArithmetic, MulmodThroughInt128) {
  for (int i = 0; i < fp::testing::iterations(100000); ++i) {
    const std::uint64_t a = corner_u64(), b = corner_u64(), m = corner_u64() | 1;
    // Products up to (2^64 − 1)^2, just below 2^128.
    ASSERT_EQ(Integer(dt::mulmod(a, b, m)), Integer(a) * Integer(b) % Integer(m))
        << a << " * " << b << " mod " << m;
    const std::int64_t sa = corner64(), sb = corner64();
    std::int64_t sm = corner64();
    if (sm <= 0) sm = sm == INT64_MIN ? INT64_MAX : -sm;
    if (sm == 0) sm = 7;
    ASSERT_EQ(Integer(dt::mulmod(sa, sb, sm)), fp::mod_floor(Integer(sa) * Integer(sb), Integer(sm)))
        << sa << " * " << sb << " mod " << sm;
  }
}

// gcd, Bézout cofactors and modular inverses against GMP and against brute force.
TEST(WordArithmetic, GcdExtendedGcdAndInverse) {
  for (int i = 0; i < fp::testing::iterations(100000); ++i) {
    const std::int64_t a = corner64(), b = corner64();
    const Integer A(a), B(b);
    const Integer g = fp::gcd(A, B);
    ASSERT_EQ(Integer(dt::gcd(dt::magnitude(a), dt::magnitude(b))), g) << a << " " << b;
    const dt::ExtendedGcd e = dt::extended_gcd(a, b);
    ASSERT_EQ(Integer(e.g), g) << a << " " << b;
    ASSERT_EQ(A * e.s + B * e.t, g) << a << " " << b;  // Bézout, checked in Integer
    if (a != 0 && b != 0 && g != 0) {  // minimal cofactors (Knuth TAOCP 4.5.2)
      ASSERT_LE(abs(Integer(e.s)), std::max(Integer(1), abs(B) / g)) << a << " " << b;
      ASSERT_LE(abs(Integer(e.t)), std::max(Integer(1), abs(A) / g)) << a << " " << b;
    }
    std::int64_t m = b == INT64_MIN ? INT64_MAX : (b < 0 ? -b : b);
    if (m == 0) m = 1;
    const auto inv = dt::inverse_mod(a, m);
    ASSERT_EQ(inv.has_value(), fp::gcd(A, Integer(m)) == 1) << a << " mod " << m;
    if (inv) {
      ASSERT_GE(*inv, 0);
      ASSERT_LT(*inv, m);
      ASSERT_EQ(fp::mod_floor(A * *inv, Integer(m)), m == 1 ? 0 : 1) << a << " mod " << m;
    }
  }
  // Brute force for every small modulus.
  for (std::int64_t m = 1; m <= 60; ++m)
    for (std::int64_t a = -70; a <= 70; ++a) {
      std::optional<std::int64_t> brute;
      for (std::int64_t x = 0; x < m && !brute; ++x)
        if (dt::mod_floor(a * x, m) == 1 % m) brute = x;
      ASSERT_EQ(dt::inverse_mod(a, m), brute) << a << " mod " << m;
    }
  const dt::ExtendedGcd e = dt::extended_gcd(INT64_MIN, 0);  // gcd 2^63 does not fit int64
  EXPECT_EQ(Integer(e.g), Integer(1) << 63);
}

TEST(WordArithmetic, Int128RoundTripsAcrossTwoToThe127) {
  const Integer two127 = Integer(1) << 127;
  const std::vector<Integer> edges = {two127 - 1, -(two127 - 1), -two127, two127, -two127 - 1,
                                      kTwo64,     kTwo64 - 1,    kTwo64 + 1, -kTwo64, Integer(0),
                                      kMin64,     kMax64};
  for (const Integer& x : edges) {
    const auto w = dt::int128_of(x);
    const bool fits = x >= -two127 && x < two127;
    ASSERT_EQ(w.has_value(), fits) << x;
    if (w) {
      ASSERT_EQ(dt::integer_of(*w), x) << x;
    }
  }
  for (int i = 0; i < fp::testing::iterations(20000); ++i) {
    const Integer x = fp::testing::random_integer(128);
    const auto w = dt::int128_of(x);
    ASSERT_EQ(w.has_value(), x >= -two127 && x < two127) << x;
    if (w) {
      ASSERT_EQ(dt::integer_of(*w), x);
    }
    // Products of two int64 in __int128 are exact (|a·b| ≤ 2^126).
    const std::int64_t a = corner64(), b = corner64();
    ASSERT_EQ(dt::integer_of(static_cast<dt::i128>(a) * b), Integer(a) * Integer(b));
  }
}

// The word-or-big idiom on a·b + c: the word path when it fits, Integer otherwise.
TEST(WordArithmetic, WordOrBigPromotesOnOverflow) {
  int promoted = 0;
  for (int i = 0; i < fp::testing::iterations(50000); ++i) {
    const std::int64_t a = corner64(), b = corner64(), c = corner64();
    bool used_big = false;
    const Integer r = dt::word_or_big(
        [&]() -> std::optional<std::int64_t> {
          std::int64_t out;
          if (dt::try_mul_add(a, b, c, out)) return out;
          return std::nullopt;
        },
        [&] {
          used_big = true;
          return Integer(a) * Integer(b) + Integer(c);
        });
    ASSERT_EQ(r, Integer(a) * Integer(b) + Integer(c));
    promoted += used_big;
  }
  EXPECT_GT(promoted, 0);
}

// The word continued-fraction helpers against the Integer regular expansion.
TEST(WordArithmetic, PartialQuotientsAgreeWithRegularExpansion) {
  for (int i = 0; i < fp::testing::iterations(20000); ++i) {
    const std::uint64_t p = corner_u64(), q = corner_u64() | 1;
    std::vector<Integer> word;
    dt::for_each_partial_quotient(p, q, [&](std::uint64_t a) { word.emplace_back(a); });
    const fp::Terms big = fp::reference::regular_expansion_euclid(
        fp::Fraction(Integer(p), Integer(q)));
    const Integer g = fp::gcd(Integer(p), Integer(q));
    if (g == 1) {
      ASSERT_EQ(word, big) << p << "/" << q;
    }
    Integer sum = 0;
    for (const Integer& a : word) sum += a;
    ASSERT_EQ(Integer(dt::partial_quotient_sum(p, q)), sum);
    ASSERT_LE(sum, Integer(std::max(p, q)));  // the bound that keeps the sum in a word
  }
}
