// fourplat/tangle.hpp — rational tangles as values; equality is isotopy rel boundary.
//
// A RationalTangle holds its fraction F in Q ∪ {∞} — the complete invariant by Conway's theorem
// (Conway 1970; Goldman–Kauffman 1997; Kauffman–Lambropoulou 2004) — and, when it was built from a
// twist sequence, that sequence, which a diagram can draw. Operations act on F as follows:
//   T + [n]        horizontal twist       F → F + n
//   T * 1/[n]      vertical twist         F → 1/(n + 1/F) = F/(1 + nF)
//   rotation       90°                    F → −1/F
//   mirror image                          F → −F
//   inversion      1/T := −T^r            F → 1/F
// A given twist sequence is carried through every operation above, since each has an exact
// counterpart on sequences: T + [n] adds n to the last twist; T * 1/[n] appends "n 0" (or adds n
// to b in a trailing "b 0"); mirror negates every twist; inversion appends a 0 (or drops a
// trailing 0: [... b 0 0] = [... b]); rotation is mirror of inversion. A tangle built from a
// fraction carries none, and `twists()` then returns the canonical sequence.
// Throws: ParseError never; DomainError where noted.
#pragma once

#include <cstddef>
#include <functional>
#include <optional>

#include "fourplat/continued_fraction.hpp"
#include "fourplat/fraction.hpp"

namespace fourplat {

/// Which closure of a tangle: numerator N(T) joins NW–NE and SW–SE, denominator D(T) joins
/// NW–SW and NE–SE.
enum class Closure { numerator, denominator };

class RationalTangle {
 public:
  /// The tangle [0].
  RationalTangle();
  /// The rational tangle with fraction f (drawn from its canonical twist sequence).
  explicit RationalTangle(Fraction f);
  /// The tangle of a Conway twist sequence [a1 ... an]; throws DomainError if empty.
  explicit RationalTangle(TwistSequence twists);

  /// The integer tangle [n] (n horizontal half-twists).
  [[nodiscard]] static RationalTangle integer(const Integer& n);
  /// The vertical tangle 1/[n].
  [[nodiscard]] static RationalTangle vertical(const Integer& n);
  /// [∞].
  [[nodiscard]] static RationalTangle infinity();

  [[nodiscard]] const Fraction& fraction() const noexcept { return fraction_; }
  /// The twist sequence it was built from, or the canonical one.
  [[nodiscard]] TwistSequence twists() const;
  /// Whether it carries a sequence given by the user (rather than the canonical one).
  [[nodiscard]] bool has_given_twists() const noexcept { return given_.has_value(); }
  /// Kauffman–Lambropoulou canonical twist sequence of the fraction.
  [[nodiscard]] TwistSequence canonical_twists() const;
  /// Crossing number of the tangle: sum of |terms| of the canonical sequence.
  [[nodiscard]] Integer crossing_number() const;
  /// An integer tangle [n] (F ∈ Z) — the only summands that keep a sum rational.
  [[nodiscard]] bool is_integer() const noexcept { return fraction_.is_integer(); }

  /// T + [n]: F → F + n.
  [[nodiscard]] RationalTangle add_horizontal(const Integer& n) const;
  /// T * 1/[n]: F → F / (1 + nF).
  [[nodiscard]] RationalTangle add_vertical(const Integer& n) const;
  /// Rotation by 90°: F → −1/F.
  [[nodiscard]] RationalTangle rotate() const;
  /// Mirror image (all crossings switched): F → −F.
  [[nodiscard]] RationalTangle mirror() const;
  /// Inversion 1/T := −T^r: F → 1/F.
  [[nodiscard]] RationalTangle inverse() const;

  /// Isotopy rel boundary (Conway's theorem: equal fractions).
  friend bool operator==(const RationalTangle& a, const RationalTangle& b) noexcept {
    return a.fraction_ == b.fraction_;
  }

 private:
  Fraction fraction_;
  std::optional<TwistSequence> given_;
};

/// T + S for rational tangles when the sum is rational (one of them an integer tangle);
/// throws DomainError otherwise — use fourplat::TangleSum (algebraic.hpp) for general sums.
[[nodiscard]] RationalTangle operator+(const RationalTangle& t, const RationalTangle& s);

}  // namespace fourplat

template <>
struct std::hash<fourplat::RationalTangle> {
  std::size_t operator()(const fourplat::RationalTangle& t) const noexcept {
    return std::hash<fourplat::Fraction>{}(t.fraction());
  }
};
