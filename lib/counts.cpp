// lib/counts.cpp — closed formulas for the numbers of 2-bridge classes (derivations in
// docs/enumeration.md, section "Counting").
//
// For n ≥ 3 put m = n − 2. Fractions p/q > 1 with crossing number n are the 2^m binary words w
// of length m (enumerate.hpp). Letters act on the three points of P¹(F_2) as the transpositions
// R = (A C), L = (B C) with A = [0:1] (p even), B = [1:0], C = [1:1]; w gives a link (p even)
// iff its permutation fixes C. Walks on the hexagon Cayley graph of S_3 give
//   E  = #link words              = (2^m + 2(−1)^m)/3,     K = 2^m − E knot words;
// palindromes w = v x rev(v) have permutation V X V⁻¹ (m odd) or the identity (m even):
//   m even: PE = 2^(m/2), PK = 0;   m odd, h = (m−1)/2: PE = (2^(h+1) − 2(−1)^h)/3, PK = 2^(h+1) − PE;
// reverse-complement-fixed words v·rc(v) (m even only) are links iff V fixes C:
//   AE = (2^(m/2) + 2(−1)^(m/2))/3, AK = 2^(m/2) − AE.
// Burnside for the Klein group (complement fixes no word when m ≥ 1):
//   knots = (K + PK + AK)/4 (Ernst–Sumners 1987),  knots_with_mirrors = (K + PK)/2,
//   links = (E + PE + AE)/4,  links_with_mirrors = (E + PE)/2,
// and for oriented links (Schubert mod 2p; every palindromic link word has γ ≡ m (mod 2), every
// reverse-complement-fixed one γ even, with γ the lower-left entry of R·w·R):
//   links_oriented_with_mirrors = E + PE (m even), E (m odd);
//   links_oriented = links_with_mirrors (m even), E/2 (m odd).
#include "fourplat/counts.hpp"

#include <string>

#include "fourplat/error.hpp"

namespace fourplat {
namespace {

Integer pow2(std::int64_t k) { return Integer(1) << static_cast<unsigned>(k); }

// x / d, which must be exact: a remainder would mean a wrong formula, never bad input.
Integer exact_div(const Integer& x, unsigned d) {
  Integer q, r;
  boost::multiprecision::divide_qr(x, Integer(d), q, r);
  if (r != 0) throw Error("internal error: a counting formula is not an integer");
  return q;
}

int minus_one_pow(std::int64_t k) { return k % 2 == 0 ? 1 : -1; }

void check_n(std::int64_t n) {
  if (n < 0) throw DomainError("crossing number " + std::to_string(n) + " is negative");
  if (n > 100'000'000) {
    throw LimitError("counts are limited to crossing number 10^8 (2^n has 12 MB beyond)");
  }
}

}  // namespace

Integer count_rational_tangles(std::int64_t n) {
  check_n(n);
  return n == 0 ? Integer(2) : pow2(n);
}

TwoBridgeCounts count_two_bridge(std::int64_t n) {
  check_n(n);
  TwoBridgeCounts c;
  c.crossings = n;
  c.rational_tangles = count_rational_tangles(n);
  if (n == 0) {  // the unknot and the unlink, each its own mirror image and reverse
    c.knots = c.knots_with_mirrors = c.amphichiral_knots = 1;
    c.links = c.links_with_mirrors = c.links_oriented = c.links_oriented_with_mirrors = 1;
    c.amphichiral_links = 1;
    return c;
  }
  if (n == 1) {
    c.knots = c.knots_with_mirrors = c.links = c.links_with_mirrors = c.links_oriented =
        c.links_oriented_with_mirrors = c.amphichiral_knots = c.amphichiral_links = 0;
    return c;
  }
  if (n == 2) {  // the Hopf link b(2,1): amphichiral; two orientations b(2,1), b(2,3), mirrors
    c.knots = c.knots_with_mirrors = c.amphichiral_knots = 0;
    c.links = c.links_with_mirrors = c.links_oriented = c.amphichiral_links = 1;
    c.links_oriented_with_mirrors = 2;
    return c;
  }
  const std::int64_t m = n - 2;
  const Integer all = pow2(m);
  const Integer e = exact_div(all + 2 * minus_one_pow(m), 3);
  const Integer k = all - e;
  Integer pe, pk, ae, ak;
  if (m % 2 == 0) {
    const Integer half = pow2(m / 2);
    pe = half;
    pk = 0;
    ae = exact_div(half + 2 * minus_one_pow(m / 2), 3);
    ak = half - ae;
  } else {
    const std::int64_t h = (m - 1) / 2;
    const Integer pal = pow2(h + 1);
    pe = exact_div(pal - 2 * minus_one_pow(h), 3);
    pk = pal - pe;
    ae = ak = 0;
  }
  c.knots = exact_div(k + pk + ak, 4);
  c.knots_with_mirrors = exact_div(k + pk, 2);
  c.links = exact_div(e + pe + ae, 4);
  c.links_with_mirrors = exact_div(e + pe, 2);
  c.links_oriented_with_mirrors = m % 2 == 0 ? e + pe : e;
  c.links_oriented = m % 2 == 0 ? c.links_with_mirrors : exact_div(e, 2);
  c.amphichiral_knots = exact_div(ak, 2);
  c.amphichiral_links = exact_div(ae, 2);
  return c;
}

Integer count_classes(std::int64_t n, const EnumerationOptions& options) {
  const TwoBridgeCounts c = count_two_bridge(n);
  const bool mir = options.mirrors;
  // Knots are invertible: their oriented and unoriented classes agree.
  const Integer knots = mir ? c.knots_with_mirrors : c.knots;
  Integer links;
  if (options.oriented) {
    links = mir ? c.links_oriented_with_mirrors : c.links_oriented;
  } else {
    links = mir ? c.links_with_mirrors : c.links;
  }
  switch (options.components) {
    case ComponentFilter::knots: return knots;
    case ComponentFilter::links: return links;
    default: return knots + links;
  }
}

}  // namespace fourplat
