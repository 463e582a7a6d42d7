// fourplat/parse.hpp — reading the text forms of fourplat's values, and writing them back.
//
// The tangle syntax (docs/tool.md has the full grammar):
//   integer      N, any size, optional sign + - or − (U+2212):       3   -12   +7
//   fraction     P/Q (whitespace allowed around /), any P/0 with P ≠ 0 is ∞:   7/3   -5/2
//   infinity     inf (any case), ∞ (U+221E), 1/0
//   twists       Conway's twist order [a1 ... an], terms separated by spaces and/or one comma:
//                [2 1 1 2]   [3,-2]   [ 3 , -2 ]
//   sum          tangles joined by +:   3/5 + 2/7   [2 1] + [3]   1/2+1/3+1/5
//   link         Schubert's b(p,q), any coprime integers (reduced to Schubert form):  b(7,3)
// (PD codes have their own parser, parse_pd in fourplat/pd.hpp.)
// Leading and trailing whitespace is ignored everywhere; anything else after a complete value is
// an error. Each parser accepts exactly the text fourplat prints for its type (the fmt formatters
// of fourplat/format.hpp and the to_string functions), and more.
// Parsing is linear in the input (big integers through GMP's subquadratic conversion) and uses
// no recursion, so huge inputs are safe.
// Throws: ParseError, with the 0-based character offset (Unicode code points) of the offending
//   character and an "expected ..." message, for every text that is not a value of the type —
//   including 0/0, b(p,q) with gcd(p,q) ≠ 1, empty input and "[ ]". Nothing else but
//   std::bad_alloc.
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

#include "fourplat/algebraic.hpp"
#include "fourplat/continued_fraction.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/fraction.hpp"
#include "fourplat/integer.hpp"
#include "fourplat/tangle.hpp"
#include "fourplat/two_bridge.hpp"

namespace fourplat {

/// A decimal integer (no base prefixes: "010" is ten).
[[nodiscard]] Integer parse_integer(std::string_view text);
/// A fraction "P/Q" or an integer "N"; "inf", "∞" and "P/0" (P ≠ 0) for ∞. 0/0 is a ParseError.
[[nodiscard]] Fraction parse_fraction(std::string_view text);
/// A twist sequence in Conway's order, in square brackets; at least one term.
[[nodiscard]] TwistSequence parse_twist_sequence(std::string_view text);
/// A rational tangle: a fraction (canonical diagram) or a twist sequence (kept as given).
[[nodiscard]] RationalTangle parse_tangle(std::string_view text);
/// One or more rational tangles joined by '+', in order (a single tangle is a one-term sum).
[[nodiscard]] TangleSum parse_tangle_sum(std::string_view text);
/// Schubert's b(p,q) for coprime integers p, q (whitespace allowed inside the parentheses).
[[nodiscard]] TwoBridgeLink parse_two_bridge(std::string_view text);
/// An oriented b(p,q): the same syntax, read with OrientedTwoBridgeLink's rule for q.
[[nodiscard]] OrientedTwoBridgeLink parse_oriented_two_bridge(std::string_view text);
/// "unlink", "unknot", "torus" or "hyperbolic" (as to_string(LinkKind) prints them).
[[nodiscard]] LinkKind parse_link_kind(std::string_view text);

/// "numerator" or "denominator" (as to_string(Closure) prints them).
[[nodiscard]] Closure parse_closure(std::string_view text);

/// "NW", "NE", "SW" or "SE" (as to_string(Corner) prints them; lower case accepted).
[[nodiscard]] Corner parse_corner(std::string_view text);
/// "numerator", "denominator" or "none" (as to_string(DiagramClosure) prints them).
[[nodiscard]] DiagramClosure parse_diagram_closure(std::string_view text);
/// "horizontal" or "vertical".
[[nodiscard]] BoxKind parse_box_kind(std::string_view text);

/// A fraction p/q in machine words, reduced with q > 0 (q = 0 is never returned).
struct FractionWord {
  std::int64_t p = 0;
  std::int64_t q = 1;
};

/// The fast path of batch readers: text that is a plain finite integer or fraction "P/Q" with
/// |P|, |Q| < 2^63 and Q ≠ 0, as reduced words; nullopt for anything else (including text that
/// does not parse: call parse_tangle_sum for the value or the error). Never throws, never
/// allocates. Agrees with parse_fraction wherever it returns a value.
[[nodiscard]] std::optional<FractionWord> parse_fraction_word(std::string_view text) noexcept;

/// The printed forms that the parsers above read back (the fmt formatters print the same):
/// "[a1 a2 ... an]".
[[nodiscard]] std::string to_string(const TwistSequence& s);
/// The given twist sequence when the tangle carries one, otherwise its fraction.
[[nodiscard]] std::string to_string(const RationalTangle& t);
/// The summands joined by " + ".
[[nodiscard]] std::string to_string(const TangleSum& s);
/// "numerator" or "denominator".
[[nodiscard]] inline std::string_view to_string(Closure c) noexcept {
  return c == Closure::numerator ? "numerator" : "denominator";
}
/// "horizontal" or "vertical".
[[nodiscard]] inline std::string_view to_string(BoxKind k) noexcept {
  return k == BoxKind::horizontal ? "horizontal" : "vertical";
}

}  // namespace fourplat
