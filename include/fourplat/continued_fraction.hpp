// fourplat/continued_fraction.hpp — continued fractions in the two orders of the trade.
//
// Two orders, never mixed silently:
//   * standard order  [a0; a1, ..., an]  =  a0 + 1/(a1 + 1/(a2 + ... + 1/an))   (`Terms`)
//   * Conway's twist order  [a1 a2 ... an]  =  an + 1/(a(n-1) + ... + 1/a1)       (`TwistSequence`)
//     a1 is the innermost (first) twist, an the outermost horizontal twist; the twist sequence is
//     the standard expansion read backwards.
// Values use the projective convention x + 1/0 = x + ∞ = ∞ and 1/∞ = 0, so zeros inside a
// sequence are allowed (Conway's [a 0 b] = [a+b]).
// Long sequences: values by a balanced product tree of 2×2 integer matrices (GMP's fast
// multiplication does the work), expansions by a half-gcd style divide and conquer; the plain
// methods are kept in namespace `reference` for tests and benchmarks.
// Throws: DomainError for an empty sequence, for ∞ where a finite value is needed, and for
//   sequences whose value is undefined (never happens for integer terms: the value is then in
//   Q ∪ {∞}); LimitError for a negative or all-even expansion too long to hold in memory.
#pragma once

#include <optional>
#include <span>
#include <vector>

#include "fourplat/fraction.hpp"
#include "fourplat/integer.hpp"

namespace fourplat {

/// Terms in standard order [a0; a1, ..., an].
using Terms = std::vector<Integer>;

/// A Conway twist sequence [a1 ... an] (Conway's order: a1 innermost, an outermost).
struct TwistSequence {
  std::vector<Integer> twists;
  friend bool operator==(const TwistSequence&, const TwistSequence&) = default;
};

/// The regular expansion [a0; a1, ..., an] of a finite fraction: a_i ≥ 1 for i ≥ 1 and an ≥ 2
/// when n ≥ 1 (so it is unique); an integer m gives [m]. Throws DomainError for ∞.
[[nodiscard]] Terms regular_expansion(const Fraction& x);

/// Value of [a0; a1, ..., an] (standard order), any integer terms. Throws DomainError if empty.
[[nodiscard]] Fraction standard_value(std::span<const Integer> terms);

/// Numerator and denominator of standard_value(terms) straight from the matrix product: coprime
/// (the product has determinant ±1), denominator ≥ 0, ∞ as 1/0 — the same pair the Fraction
/// holds, without the gcd that constructing a Fraction spends (most of the time for 10^6 terms).
/// Throws DomainError if empty.
struct ValueParts {
  Integer numerator;
  Integer denominator;
};
[[nodiscard]] ValueParts standard_value_parts(std::span<const Integer> terms);

/// Value of Conway's [a1 ... an] = an + 1/(a(n-1) + ... + 1/a1). Throws DomainError if empty.
[[nodiscard]] Fraction twist_value(std::span<const Integer> twists);
[[nodiscard]] inline Fraction twist_value(const TwistSequence& s) { return twist_value(s.twists); }

/// Kauffman–Lambropoulou's canonical form (Adv. Appl. Math. 33, 2004): odd length, all terms of
/// one sign, every term non-zero except possibly the last (outermost) one, which is 0 exactly when
/// |x| < 1. It draws the reduced alternating diagram; the sum of |terms| is the crossing number of
/// the tangle. 0 gives [0]; ∞ gives [0 0] (the one even-length exception).
[[nodiscard]] TwistSequence canonical_twists(const Fraction& x);

/// The all-even expansion: standard order, every term even and non-zero except possibly a0 (which
/// is 0 exactly when |x| < 1), where one exists (for p/q in lowest terms: exactly when p or q is
/// even). Unique when it exists. Used by the Conway polynomial, genus and signature
/// (Koseleff–Pecker, J. Symbolic Comput. 68, 2015). Throws DomainError for ∞, LimitError when it
/// would have more than 2^26 terms (N/(N − 1) has N − 1).
[[nodiscard]] std::optional<Terms> even_expansion(const Fraction& x);

/// The negative (Hirzebruch–Jung) expansion x = b1 − 1/(b2 − 1/(... − 1/bk)) with b_i ≥ 2 for
/// i ≥ 2 (b1 any integer). Throws DomainError for ∞, LimitError when the expansion would have
/// more than 2^26 terms (its length is about the sum of the odd-indexed regular quotients).
[[nodiscard]] Terms negative_expansion(const Fraction& x);

/// Value of b1 − 1/(b2 − ... − 1/bk).
[[nodiscard]] Fraction negative_value(std::span<const Integer> terms);

/// Sum of |a_i| over the canonical twist sequence: the crossing number of the tangle.
[[nodiscard]] Integer twist_crossings(const Fraction& x);

namespace reference {
/// Plain Euclid, one division a step: the slow, obviously correct regular_expansion.
[[nodiscard]] Terms regular_expansion_euclid(const Fraction& x);
/// Plain back-to-front evaluation: the slow, obviously correct standard_value.
[[nodiscard]] Fraction standard_value_sequential(std::span<const Integer> terms);
}  // namespace reference

}  // namespace fourplat
