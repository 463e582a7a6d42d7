// fourplat/coloring.hpp — Fox n-colorings of 2-bridge links and of closed diagrams, with
// explicit witnesses on the arcs of the standard diagram.
//
// A Fox n-coloring gives every arc of a diagram a color in Z/n so that at every crossing
// 2·over ≡ under_in + under_out (mod n) (Fox 1962, "A quick trip through knot theory"). The n
// constant colorings always exist; "n-colorable" means a non-constant one exists.
//   * For b(p,q) the number of n-colorings is n·gcd(n,p) (common practice: the double branched
//     cover is the lens space L(p,q) with H₁ = Z/p; p = 0 gives the unlink's n²); b(p,q) is
//     n-colorable iff gcd(n,p) > 1 and 3-colorable iff 3 | p.
//   * Witnesses come from the integer coloring of the tangle (Kauffman–Lambropoulou 2004): the
//     seed arcs get 0 and t, colors propagate box by box, and the closure joins end colors that
//     differ by t·p (numerator) or t·q (denominator), so t = n / gcd(n, p) closes them mod n.
//   * For any closed Diagram (sums included) the count and a witness also come from the Smith
//     normal form over Z of its coloring matrix (lib/detail/smith.hpp): n^{a−r}·Π gcd(n, d_i).
// Colors are listed one per arc, aligned with Diagram::arcs() (so fourplat's `colorings` and
// `diagram` commands agree), as residues in [0, n) with the arc 0 colored 0.
// Throws: DomainError for a modulus n ≤ 0 and for colorings of an open tangle (closure none).
#pragma once

#include <optional>
#include <span>
#include <vector>

#include "fourplat/diagram.hpp"
#include "fourplat/fraction.hpp"
#include "fourplat/integer.hpp"
#include "fourplat/tangle.hpp"
#include "fourplat/two_bridge.hpp"

namespace fourplat {

/// n·gcd(n, p) for b(p,q); n ≥ 1.
[[nodiscard]] Integer coloring_count(const TwoBridgeLink& link, const Integer& n);
/// A non-constant n-coloring exists: gcd(n, p) > 1.
[[nodiscard]] bool is_colorable(const TwoBridgeLink& link, const Integer& n);
/// 3 | p.
[[nodiscard]] bool is_three_colorable(const TwoBridgeLink& link);

/// The determinant of a closure of the tangle f: |p| for N(p/q), |q| for D(p/q).
[[nodiscard]] Integer closure_determinant(const Fraction& f, Closure which);

/// Count and witness for one closure of a rational tangle.
struct Colorings {
  Integer modulus;
  Integer count;  ///< number of n-colorings, the n constant ones included
  /// A non-constant coloring, one color per arc of Diagram::of_fraction(f, closure) (the reduced
  /// alternating diagram of the canonical twist sequence); nullopt when only constants exist.
  std::optional<std::vector<Integer>> coloring;
};

/// The n-colorings of N(f) or D(f): the count by the formula, the witness on the canonical
/// diagram. n ≥ 1.
[[nodiscard]] Colorings colorings(const Fraction& f, Closure which, const Integer& n);

/// Number of n-colorings of a closed diagram, from the Smith form of its coloring matrix.
[[nodiscard]] Integer coloring_count(const Diagram& d, const Integer& n);
/// A non-constant n-coloring of a closed diagram (Smith form), or nullopt.
[[nodiscard]] std::optional<std::vector<Integer>> coloring_witness(const Diagram& d, const Integer& n);
/// The determinant of a closed diagram from its coloring matrix (0 when its rank is deficient).
[[nodiscard]] Integer determinant(const Diagram& d);
/// The invariant factors other than 1 of the diagram's coloring matrix.
[[nodiscard]] std::vector<Integer> coloring_invariant_factors(const Diagram& d);

/// The witness by integer propagation on a closed diagram of ONE rational tangle (any twist
/// sequence): the tangle coloring with seed colors 0 and t = n / gcd(n, closure difference), or
/// nullopt when that gcd is 1. Throws DomainError for a sum or an open tangle.
[[nodiscard]] std::optional<std::vector<Integer>> propagated_witness(const Diagram& d, const Integer& n);

/// Whether colors (one per arc of d) satisfy Fox's rule mod n at every crossing.
[[nodiscard]] bool satisfies_fox_rule(const Diagram& d, std::span<const Integer> colors, const Integer& n);

}  // namespace fourplat
