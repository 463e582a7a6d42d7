// lib/detail/word.hpp — checked machine-word arithmetic for fourplat's hot paths.
//
// The pattern (FLINT's small-or-big integers): compute on std::int64_t with every operation
// checked by the compiler's overflow builtins; when one fails, redo the computation on Integer.
// Nothing here is ever allowed to overflow silently:
//   * try_add / try_sub / try_mul / try_neg return true and write the result when it fits in
//     int64, and return false (leaving `out` unspecified) when it does not;
//   * mulmod and the modular helpers work through unsigned __int128, so a·b never overflows;
//   * floor_div / floor_mod round toward −∞ (C++'s / and % truncate toward zero).
// word_or_big() packages the "try the word path, else Integer" idiom.
// Throws: nothing (preconditions are stated per function and checked only in debug builds).
#pragma once

#include <cassert>
#include <cstdint>
#include <optional>
#include <type_traits>
#include <utility>

#include <gmp.h>

#include "fourplat/integer.hpp"

namespace fourplat::detail {

static_assert(sizeof(long) == 8, "the word paths assume LP64 (long is 64 bits, as GMP's si/ui)");

__extension__ using i128 = __int128;
__extension__ using u128 = unsigned __int128;

// ---- checked int64 arithmetic (true = the result fits and was written) ----

[[nodiscard]] inline bool try_add(std::int64_t a, std::int64_t b, std::int64_t& out) noexcept {
  return !__builtin_add_overflow(a, b, &out);
}
[[nodiscard]] inline bool try_sub(std::int64_t a, std::int64_t b, std::int64_t& out) noexcept {
  return !__builtin_sub_overflow(a, b, &out);
}
[[nodiscard]] inline bool try_mul(std::int64_t a, std::int64_t b, std::int64_t& out) noexcept {
  return !__builtin_mul_overflow(a, b, &out);
}
/// −a; fails only for INT64_MIN.
[[nodiscard]] inline bool try_neg(std::int64_t a, std::int64_t& out) noexcept {
  return !__builtin_sub_overflow(std::int64_t{0}, a, &out);
}
/// a·b + c in one step (the continued-fraction recurrence p' = a·p + p_prev).
[[nodiscard]] inline bool try_mul_add(std::int64_t a, std::int64_t b, std::int64_t c,
                                      std::int64_t& out) noexcept {
  std::int64_t t;
  return !__builtin_mul_overflow(a, b, &t) && !__builtin_add_overflow(t, c, &out);
}
[[nodiscard]] inline bool try_add(std::uint64_t a, std::uint64_t b, std::uint64_t& out) noexcept {
  return !__builtin_add_overflow(a, b, &out);
}
[[nodiscard]] inline bool try_mul(std::uint64_t a, std::uint64_t b, std::uint64_t& out) noexcept {
  return !__builtin_mul_overflow(a, b, &out);
}

/// |a| as an unsigned word (exact also for INT64_MIN, whose magnitude is 2^63).
[[nodiscard]] constexpr std::uint64_t magnitude(std::int64_t a) noexcept {
  return a < 0 ? std::uint64_t{0} - static_cast<std::uint64_t>(a) : static_cast<std::uint64_t>(a);
}

// ---- floor division ----

/// ⌊a / b⌋ for b ≠ 0; false only for INT64_MIN / −1 (= 2^63, not an int64).
[[nodiscard]] inline bool try_floor_div(std::int64_t a, std::int64_t b, std::int64_t& out) noexcept {
  assert(b != 0);
  if (a == INT64_MIN && b == -1) return false;
  std::int64_t q = a / b;
  // Truncation rounded up exactly when the remainder is non-zero and the signs differ.
  if ((a % b != 0) && ((a < 0) != (b < 0))) --q;
  out = q;
  return true;
}

/// a − b·⌊a / b⌋ for b ≠ 0: in [0, b) for b > 0 and in (b, 0] for b < 0 (always fits).
[[nodiscard]] inline std::int64_t floor_mod(std::int64_t a, std::int64_t b) noexcept {
  assert(b != 0);
  if (b == -1) return 0;  // INT64_MIN % −1 traps on x86
  std::int64_t r = a % b;
  if (r != 0 && ((r < 0) != (b < 0))) r += b;  // |r| < |b| and opposite signs: cannot overflow
  return r;
}

// ---- modular arithmetic through unsigned __int128 ----

/// a·b mod m for m > 0, never overflowing (the product is formed in 128 bits).
[[nodiscard]] inline std::uint64_t mulmod(std::uint64_t a, std::uint64_t b, std::uint64_t m) noexcept {
  assert(m != 0);
  return static_cast<std::uint64_t>(static_cast<u128>(a) * b % m);
}

/// a·b mod m in [0, m) for signed a, b and m > 0.
[[nodiscard]] inline std::int64_t mulmod(std::int64_t a, std::int64_t b, std::int64_t m) noexcept {
  assert(m > 0);
  i128 r = static_cast<i128>(a) * b % m;  // |a·b| ≤ 2^126: fits in signed 128 bits
  if (r < 0) r += m;
  return static_cast<std::int64_t>(r);
}

/// a mod m in [0, m) for m > 0.
[[nodiscard]] inline std::int64_t mod_floor(std::int64_t a, std::int64_t m) noexcept {
  assert(m > 0);
  return floor_mod(a, m);
}

/// gcd(|a|, |b|) on unsigned words (gcd(0, 0) = 0); binary GCD (Stein 1967).
[[nodiscard]] inline std::uint64_t gcd(std::uint64_t a, std::uint64_t b) noexcept {
  if (a == 0) return b;
  if (b == 0) return a;
  const int shift = __builtin_ctzll(a | b);
  a >>= __builtin_ctzll(a);
  do {
    b >>= __builtin_ctzll(b);
    if (a > b) std::swap(a, b);
    b -= a;
  } while (b != 0);
  return a << shift;
}

/// g = gcd(a, b) ≥ 0 with a·s + b·t = g. g is unsigned because gcd(INT64_MIN, 0) = 2^63.
struct ExtendedGcd {
  std::uint64_t g;
  std::int64_t s;
  std::int64_t t;
};

/// Extended Euclid on int64. The cofactors are the minimal ones (|s| ≤ |b|/(2g), |t| ≤ |a|/(2g)
/// when both are non-zero, Knuth TAOCP 4.5.2), so they always fit; the steps run in __int128 so
/// the magnitudes up to 2^63 are exact.
[[nodiscard]] inline ExtendedGcd extended_gcd(std::int64_t a, std::int64_t b) noexcept {
  i128 r0 = a, r1 = b, s0 = 1, s1 = 0, t0 = 0, t1 = 1;
  while (r1 != 0) {
    const i128 q = r0 / r1;
    i128 tmp = r0 - q * r1; r0 = r1; r1 = tmp;
    tmp = s0 - q * s1; s0 = s1; s1 = tmp;
    tmp = t0 - q * t1; t0 = t1; t1 = tmp;
  }
  if (r0 < 0) { r0 = -r0; s0 = -s0; t0 = -t0; }
  return {static_cast<std::uint64_t>(r0), static_cast<std::int64_t>(s0),
          static_cast<std::int64_t>(t0)};
}

/// The inverse of a modulo m > 0 in [0, m), or nullopt when gcd(a, m) ≠ 1. (m = 1 gives 0.)
[[nodiscard]] inline std::optional<std::int64_t> inverse_mod(std::int64_t a, std::int64_t m) noexcept {
  assert(m > 0);
  if (m == 1) return 0;
  const ExtendedGcd e = extended_gcd(mod_floor(a, m), m);
  if (e.g != 1) return std::nullopt;
  return mod_floor(e.s, m);
}

/// The mpz behind an Integer (for GMP calls that Boost does not wrap).
[[nodiscard]] inline mpz_srcptr mpz(const Integer& x) noexcept { return x.backend().data(); }
[[nodiscard]] inline mpz_ptr mpz(Integer& x) noexcept { return x.backend().data(); }

/// The value as an int64 when it fits (one GMP call, no allocation).
[[nodiscard]] inline std::optional<std::int64_t> word_of(const Integer& x) noexcept {
  if (mpz_fits_slong_p(mpz(x)) == 0) return std::nullopt;
  return static_cast<std::int64_t>(mpz_get_si(mpz(x)));
}

/// An Integer holding a signed 128-bit value exactly.
[[nodiscard]] inline Integer integer_of(i128 v) {
  const bool negative = v < 0;
  const u128 m = negative ? u128{0} - static_cast<u128>(v) : static_cast<u128>(v);
  Integer r(static_cast<std::uint64_t>(m >> 64));
  r <<= 64;
  r += static_cast<std::uint64_t>(m);
  if (negative) r = -r;
  return r;
}

/// The value as a signed 128-bit word when it fits (−2^127 included).
[[nodiscard]] inline std::optional<i128> int128_of(const Integer& x) {
  const std::size_t n = mpz_sizeinbase(mpz(x), 2);
  if (n == 128 && x.sign() < 0 && mpz_scan1(mpz(x), 0) == 127)
    return static_cast<i128>(u128{1} << 127);  // −2^127: the one 128-bit magnitude that fits
  if (n > 127) return std::nullopt;
  const Integer m = abs(x);
  const std::uint64_t lo = mpz_getlimbn(mpz(m), 0);
  const std::uint64_t hi = mpz_size(mpz(m)) > 1 ? mpz_getlimbn(mpz(m), 1) : 0;
  const i128 v = static_cast<i128>((static_cast<u128>(hi) << 64) | lo);
  return x.sign() < 0 ? -v : v;
}

/// The "try the word, else Integer" idiom: `word()` returns std::optional<R> (nullopt when some
/// checked step overflowed), `big()` returns the same value computed on Integer. R must be
/// constructible from what `word()` yields (typically R = Integer from std::int64_t).
///   Integer s = word_or_big([&]() -> std::optional<std::int64_t> { ... },
///                           [&] { return Integer(a) * b + c; });
template <class Word, class Big>
[[nodiscard]] auto word_or_big(Word&& word, Big&& big) -> std::invoke_result_t<Big> {
  if (auto w = std::forward<Word>(word)()) return std::invoke_result_t<Big>(*w);
  return std::forward<Big>(big)();
}

// ---- continued fractions on words (shared by classification and enumeration) ----

/// Calls f(a) for each partial quotient a of p/q (q > 0, p ≥ 0) by Euclid, a0 = ⌊p/q⌋ first;
/// the last quotient is ≥ 2 unless the expansion has one term. No allocation.
template <class F>
inline void for_each_partial_quotient(std::uint64_t p, std::uint64_t q, F&& f) {
  assert(q != 0);
  while (q != 0) {
    const std::uint64_t a = p / q;
    const std::uint64_t r = p - a * q;
    f(a);
    p = q;
    q = r;
  }
}

/// Sum of the partial quotients of p/q (q > 0, p ≥ 0). It never exceeds max(p, q), so it fits:
/// by induction p = aq + r gives a + (sum for q/r) ≤ a + q ≤ aq + r when r ≥ 1.
[[nodiscard]] inline std::uint64_t partial_quotient_sum(std::uint64_t p, std::uint64_t q) noexcept {
  std::uint64_t sum = 0;
  for_each_partial_quotient(p, q, [&](std::uint64_t a) { sum += a; });
  return sum;
}

}  // namespace fourplat::detail
