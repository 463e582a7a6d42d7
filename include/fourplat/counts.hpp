// fourplat/counts.hpp — the number of 2-bridge knots and links with a given crossing number, by
// closed formulas, exact for every n (no listing).
//
// Knots up to mirror image: Ernst–Sumners, "The growth of the number of prime knots", Math. Proc.
// Camb. Phil. Soc. 102 (1987) (OEIS A018240). The other counts are derived in
// docs/enumeration.md by the same method — Burnside's lemma for the Klein group {1, reverse,
// complement, both} acting on the binary words of the Stern–Brocot bijection, with the parity of
// p read off the action of the letters on the three points of the projective line over F_2 — and
// checked against enumeration and against Schubert's theorem applied directly to all fractions.
// Conventions: crossing number 0 counts the unknot b(1,0) as a knot and the two-component unlink
// b(0,1) as a link; crossing number 1 has nothing; the Hopf link is the only class at n = 2.
// Throws: DomainError for n < 0; LimitError for n > 10^8 (answers of more than 12 MB).
#pragma once

#include <cstdint>

#include "fourplat/enumerate.hpp"
#include "fourplat/integer.hpp"

namespace fourplat {

/// Every count fourplat knows for one crossing number.
struct TwoBridgeCounts {
  std::int64_t crossings = 0;
  Integer knots;                        ///< up to mirror image (Ernst–Sumners 1987)
  Integer knots_with_mirrors;           ///< a chiral knot and its mirror image both counted
  Integer links;                        ///< two-component, unoriented, up to mirror image
  Integer links_with_mirrors;           ///< two-component, unoriented, mirrors distinguished
  Integer links_oriented;               ///< two-component, oriented (Schubert mod 2p), up to mirror
  Integer links_oriented_with_mirrors;  ///< two-component, oriented, mirrors distinguished
  Integer amphichiral_knots;            ///< knots with q² ≡ −1 (mod p)
  Integer amphichiral_links;            ///< two-component links with q² ≡ −1 (mod p)
  Integer rational_tangles;             ///< fractions with this tangle crossing number
};

/// All counts for crossing number n.
[[nodiscard]] TwoBridgeCounts count_two_bridge(std::int64_t n);

/// The number of items for_each_two_bridge(n, n, options, …) lists without sharding.
[[nodiscard]] Integer count_classes(std::int64_t n, const EnumerationOptions& options);

/// The number of rational tangles with crossing number n: 2 (0 and ∞) for n = 0, else 2^n.
[[nodiscard]] Integer count_rational_tangles(std::int64_t n);

}  // namespace fourplat
