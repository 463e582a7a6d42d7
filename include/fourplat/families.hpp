// fourplat/families.hpp — families of 2-bridge links for experiments: twist knots, T(2,n),
// double-twist knots, patterns with a range per term, and exactly uniform random samples.
//
// Families are given by Conway twist sequences (Conway's order, continued_fraction.hpp):
//   twist knot K_k      [k 2]   N = b(2k+1, k)    (k half-twists and a clasp; K_1 = 3_1, K_2 = 4_1)
//   torus link T(2,n)   [n]     N = b(n, 1)
//   double twist        [a b]   N = b(ab+1, a)
//   pattern             [r1 … rk] with each r_i an integer or a range A..B
// Random samples (method and proof in docs/enumeration.md): draw a uniform word w of length
// n − 2 (a uniform fraction p/q > 1 of crossing number n), reject by the component filter, and
// accept with probability c/|orbit of w| (c the least orbit size); every class then has the same
// probability per trial. Oriented classes: a further uniform bit j is accepted when j is less
// than the number of oriented classes over the unoriented one. Bits come straight from
// std::mt19937_64, whose output the standard fixes, so a seed gives the same samples everywhere.
// Throws: ParseError from parse_pattern (with the position); DomainError for an empty range or
//   a crossing number with no class of the requested kind; LimitError for samples beyond
//   10^5 crossings and patterns with more than 2^64 members.
#pragma once

#include <cstdint>
#include <random>
#include <span>
#include <string_view>
#include <vector>

#include "fourplat/continued_fraction.hpp"
#include "fourplat/enumerate.hpp"
#include "fourplat/fraction.hpp"
#include "fourplat/integer.hpp"

namespace fourplat {

/// The twist knot with k half-twists: [k 2] (k = 0 gives the unknot, negative k the other clasp).
[[nodiscard]] TwistSequence twist_knot_twists(const Integer& k);
/// The torus link T(2,n): [n].
[[nodiscard]] TwistSequence torus_twists(const Integer& n);
/// The double-twist tangle [a b].
[[nodiscard]] TwistSequence double_twist_twists(const Integer& a, const Integer& b);

/// Inclusive range lo..hi of one term of a pattern (lo ≤ hi).
struct TermRange {
  Integer lo;
  Integer hi;
};

/// Reads "[r1 r2 … rk]" where each r_i is an integer or a range "A..B" (A ≤ B), separated by
/// spaces or commas: "[1..4 2]", "[-3..3, 1, 2..5]". Throws ParseError (position, what was
/// expected) or DomainError for a range with A > B.
[[nodiscard]] std::vector<TermRange> parse_pattern(std::string_view text);
/// The number of sequences a pattern stands for.
[[nodiscard]] Integer pattern_size(std::span<const TermRange> pattern);
/// Calls sink with every sequence of the pattern, in lexicographic order (the last term varies
/// fastest); returns false when the sink stopped it.
bool for_each_pattern(std::span<const TermRange> pattern,
                      FunctionRef<bool(std::span<const Integer>)> sink);

/// A class of 2-bridge links with big-integer fields, as a sample or a family member gives it;
/// the fields mean what EnumeratedLink's mean.
struct LinkClass {
  std::int64_t crossings = 0;
  int components = 0;
  bool amphichiral = false;
  Integer p;
  Integer q;  ///< least q of the class in the requested classification
  Integer fraction_p;
  Integer fraction_q;
  Integer canonical_q;
  Integer canonical_mirror_q;
};

/// The class of N(f) in the classification of `options` (components ignored), with f as its
/// drawing fraction. Throws DomainError when N(f) is no 2-bridge link (never: every fraction
/// closes to one).
[[nodiscard]] LinkClass link_class_of(const Fraction& f, const EnumerationOptions& options);

/// Uniform random bits from std::mt19937_64 with the given seed.
class RandomBits {
 public:
  explicit RandomBits(std::uint64_t seed) : gen_(seed) {}
  bool next() {
    if (left_ == 0) {
      word_ = gen_();
      left_ = 64;
    }
    const bool b = (word_ & 1U) != 0;
    word_ >>= 1;
    --left_;
    return b;
  }

 private:
  std::mt19937_64 gen_;
  std::uint64_t word_ = 0;
  int left_ = 0;
};

/// One class drawn uniformly from those for_each_two_bridge(n, n, options, …) would list.
[[nodiscard]] LinkClass sample_two_bridge(std::int64_t n, const EnumerationOptions& options,
                                          RandomBits& bits);

/// One rational tangle drawn uniformly from the fractions with crossing number n.
[[nodiscard]] Fraction sample_rational_tangle(std::int64_t n, RandomBits& bits);

}  // namespace fourplat
