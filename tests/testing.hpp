// Shared helpers for fourplat's tests: a fixed default seed, an iteration multiplier from the
// environment (FOURPLAT_ITERATIONS, a positive number, default 1), and random integers biased
// toward the corners (0, ±1, word boundaries, Fibonacci numbers), as FLINT's tests are.
#pragma once

#include <cstdint>
#include <cstdlib>
#include <random>
#include <string>

#include "fourplat/integer.hpp"

namespace fourplat::testing {

/// Seed of every random test; FOURPLAT_SEED overrides it (print it in failure messages).
inline std::uint64_t seed() {
  if (const char* s = std::getenv("FOURPLAT_SEED")) return std::strtoull(s, nullptr, 10);
  return 20261201;
}

/// n scaled by FOURPLAT_ITERATIONS (at least 1).
inline int iterations(int n) {
  double m = 1.0;
  if (const char* s = std::getenv("FOURPLAT_ITERATIONS")) m = std::strtod(s, nullptr);
  const double scaled = n * (m > 0 ? m : 1.0);
  return scaled < 1 ? 1 : static_cast<int>(scaled);
}

inline std::mt19937_64& rng() {
  static std::mt19937_64 g(seed());
  return g;
}

/// A random Integer of up to `bits` bits, either sign, biased toward corner values.
inline Integer random_integer(unsigned bits, std::mt19937_64& g = rng()) {
  std::uniform_int_distribution<int> pick(0, 9);
  const int kind = pick(g);
  Integer x;
  if (kind == 0) {
    x = std::uniform_int_distribution<int>(-2, 2)(g);
  } else if (kind == 1) {  // near a power of two: 2^k - 1, 2^k, 2^k + 1
    const unsigned k = std::uniform_int_distribution<unsigned>(1, bits)(g);
    x = (Integer(1) << k) + std::uniform_int_distribution<int>(-1, 1)(g);
  } else if (kind == 2) {  // a Fibonacci number: worst case for Euclid
    Integer a = 0, b = 1;
    const int steps = std::uniform_int_distribution<int>(1, static_cast<int>(bits * 1.44))(g);
    for (int i = 0; i < steps; ++i) { Integer c = a + b; a = b; b = c; }
    x = b;
  } else {
    const unsigned k = std::uniform_int_distribution<unsigned>(1, bits)(g);
    for (unsigned done = 0; done < k; done += 64) x = (x << 64) + Integer(g());
    x >>= static_cast<unsigned>((k + 63) / 64 * 64 - k);
  }
  if (g() & 1) x = -x;
  return x;
}

}  // namespace fourplat::testing
