// fourplat/integer.hpp — the one arbitrary-precision integer type, and word-size helpers.
//
// `Integer` is Boost.Multiprecision over GMP's mpz with expression templates switched off, so
// `auto x = a * b;` always holds a value, never a dangling expression.
//
// Hot paths (batch classification, enumeration) work on std::int64_t with the checked helpers
// below and promote to Integer when a result would not fit: see lib/detail/word.hpp.
// Throws: nothing here but std::bad_alloc.
#pragma once

#include <cstdint>
#include <optional>
#include <string>

#include <boost/multiprecision/gmp.hpp>

namespace fourplat {

using Integer = boost::multiprecision::number<boost::multiprecision::gmp_int,
                                              boost::multiprecision::et_off>;

/// The value as an int64 when it fits, otherwise nullopt.
[[nodiscard]] inline std::optional<std::int64_t> to_int64(const Integer& x) {
  if (x >= INT64_MIN && x <= INT64_MAX) return x.convert_to<std::int64_t>();
  return std::nullopt;
}

/// Decimal text of x ("-123").
[[nodiscard]] inline std::string to_string(const Integer& x) { return x.str(); }

/// gcd(a, b) ≥ 0 with gcd(0, 0) = 0.
[[nodiscard]] inline Integer gcd(const Integer& a, const Integer& b) {
  return boost::multiprecision::gcd(a, b);
}

/// a mod m in [0, m) for m > 0 (C++'s % truncates toward zero; this does not).
[[nodiscard]] inline Integer mod_floor(const Integer& a, const Integer& m) {
  Integer r = a % m;
  if (r < 0) r += m;
  return r;
}

/// ⌊a / b⌋ for b ≠ 0.
[[nodiscard]] inline Integer div_floor(const Integer& a, const Integer& b) {
  Integer q, r;
  boost::multiprecision::divide_qr(a, b, q, r);
  if (r != 0 && ((r < 0) != (b < 0))) --q;
  return q;
}

}  // namespace fourplat
