// fourplat/fraction.hpp — exact fractions p/q in Q ∪ {∞}.
//
// Invariant (restored by every constructor and mutator, as Boost.Rational does):
//   gcd(p, q) = 1, q ≥ 0; zero is 0/1; the single infinity ∞ is 1/0 (there is no −∞: the
//   fraction of a tangle lives on the projective line, where −1/0 = 1/0).
// Order: finite fractions compare as rationals; ∞ compares greater than every finite value and
//   equal to itself, so a std::set<Fraction> or a sort is well defined.
// Throws: DomainError for 0/0 and for the undefined operations ∞ + ∞, ∞ − ∞, 0 · ∞, ∞ / ∞, 0 / 0.
#pragma once

#include <compare>
#include <cstddef>
#include <cstdint>
#include <functional>
#include <string>

#include "fourplat/error.hpp"
#include "fourplat/integer.hpp"

namespace fourplat {

class Fraction {
 public:
  /// 0/1.
  Fraction() : p_(0), q_(1) {}
  /// n/1.
  Fraction(Integer n) : p_(std::move(n)), q_(1) {}  // NOLINT(google-explicit-constructor)
  Fraction(std::int64_t n) : p_(n), q_(1) {}         // NOLINT(google-explicit-constructor)
  Fraction(int n) : p_(n), q_(1) {}                  // NOLINT(google-explicit-constructor)
  /// p/q reduced to lowest terms with q ≥ 0; p/0 with p ≠ 0 is ∞. Throws DomainError for 0/0.
  Fraction(Integer p, Integer q);

  /// The fraction 1/0 of the tangle [∞].
  [[nodiscard]] static Fraction infinity();

  /// p and q of the reduced form (q = 0 exactly for ∞, where p = 1).
  [[nodiscard]] const Integer& numerator() const noexcept { return p_; }
  [[nodiscard]] const Integer& denominator() const noexcept { return q_; }
  [[nodiscard]] bool is_infinite() const noexcept { return q_ == 0; }
  [[nodiscard]] bool is_integer() const noexcept { return q_ == 1; }
  [[nodiscard]] bool is_zero() const noexcept { return p_ == 0; }
  /// −1, 0 or +1; ∞ counts as +1.
  [[nodiscard]] int sign() const noexcept { return p_.sign(); }

  /// 1/x, with 1/0 = ∞ and 1/∞ = 0 (the inversion of a tangle).
  [[nodiscard]] Fraction reciprocal() const;
  /// −x, with −∞ = ∞ (the mirror image of a tangle).
  [[nodiscard]] Fraction operator-() const;

  Fraction& operator+=(const Fraction& other);
  Fraction& operator-=(const Fraction& other);
  Fraction& operator*=(const Fraction& other);
  Fraction& operator/=(const Fraction& other);

  friend bool operator==(const Fraction& a, const Fraction& b) noexcept {
    return a.p_ == b.p_ && a.q_ == b.q_;
  }
  friend std::strong_ordering operator<=>(const Fraction& a, const Fraction& b);

 private:
  struct Reduced {};
  Fraction(Integer p, Integer q, Reduced) : p_(std::move(p)), q_(std::move(q)) {}
  Integer p_;
  Integer q_;
};

[[nodiscard]] Fraction operator+(Fraction a, const Fraction& b);
[[nodiscard]] Fraction operator-(Fraction a, const Fraction& b);
[[nodiscard]] Fraction operator*(Fraction a, const Fraction& b);
[[nodiscard]] Fraction operator/(Fraction a, const Fraction& b);

/// "p/q", "n" for integers, "1/0" for ∞ — the form the parser reads back.
[[nodiscard]] std::string to_string(const Fraction& x);

}  // namespace fourplat

template <>
struct std::hash<fourplat::Fraction> {
  std::size_t operator()(const fourplat::Fraction& x) const noexcept {
    const std::size_t h = std::hash<fourplat::Integer>{}(x.numerator());
    return h ^ (std::hash<fourplat::Integer>{}(x.denominator()) + 0x9e3779b97f4a7c15ULL +
                (h << 6) + (h >> 2));
  }
};
