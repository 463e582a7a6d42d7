// fourplat/algebraic.hpp — sums of rational tangles, honestly represented.
//
// T1 + T2 + ... + Tr of rational tangles is rational only when at most one summand is not an
// integer tangle (then the integers fold into it). A TangleSum keeps the summands, so that
//   * the numerator closure of a sum of two rational tangles is still the 2-bridge link it is
//     (Ernst–Sumners, Math. Proc. Camb. Phil. Soc. 108, 1990): N(a/b + c/d) = b(ad + bc, ·);
//   * the determinant of either closure of any sum, whatever r is: |Σ p_i Π_{j≠i} q_j| for N, and
//     Π |q_i| for D (D(T + S) is the connected sum D(T) # D(S));
//   * sums of three or more non-integer parts (Montesinos links) are kept as they are.
// Throws: DomainError for an empty sum and where noted.
#pragma once

#include <optional>
#include <vector>

#include "fourplat/fraction.hpp"
#include "fourplat/tangle.hpp"
#include "fourplat/two_bridge.hpp"

namespace fourplat {

class TangleSum {
 public:
  /// The sum T1 + ... + Tr in this order; throws DomainError if empty.
  explicit TangleSum(std::vector<RationalTangle> summands);

  [[nodiscard]] const std::vector<RationalTangle>& summands() const noexcept { return parts_; }
  /// The sum as a rational tangle when it is one (at most one non-integer summand), else nullopt.
  [[nodiscard]] std::optional<RationalTangle> as_rational() const;
  /// The number of summands that are not integer tangles once integers are folded in.
  [[nodiscard]] int rational_parts() const;

  /// The closure as a 2-bridge link when it is one: always for a rational sum; for N of a sum with
  /// two non-integer parts (Ernst–Sumners); for D when it is rational. Otherwise nullopt.
  [[nodiscard]] std::optional<TwoBridgeLink> closure_two_bridge(Closure which = Closure::numerator) const;
  /// Determinant of the closure (any number of parts).
  [[nodiscard]] Integer determinant(Closure which = Closure::numerator) const;
  /// Number of components of the closure (from the connectivity of each rational part).
  [[nodiscard]] int components(Closure which = Closure::numerator) const;

 private:
  std::vector<RationalTangle> parts_;
};

[[nodiscard]] TangleSum sum(const RationalTangle& a, const RationalTangle& b);

/// Ernst–Sumners (Math. Proc. Camb. Phil. Soc. 108, 1990) in fourplat's conventions:
/// N(a/b + c/d) = b(ad + bc, a'd + b'c) with a'b − ab' = 1 (derivation in lib/algebraic.cpp).
/// Valid for every pair of fractions, integers and ∞ included (then it agrees with the closure
/// of the rational sum).
[[nodiscard]] TwoBridgeLink numerator_closure_of_sum(const Fraction& x, const Fraction& y);

}  // namespace fourplat
