// fourplat/two_bridge.hpp — 2-bridge knots and links b(p,q) and Schubert's classification.
//
// Schubert form (the invariant every constructor restores): p ≥ 0, 0 ≤ q < p, gcd(p,q) = 1,
// with the two degenerate cases written b(1,0) (the unknot) and b(0,1) (the two-component
// unlink). N(p/q) = b(p,q) (numerator closure of the rational tangle p/q).
//
// Classification (Schubert 1956, as stated in Kauffman–Lambropoulou, Enseign. Math. 49, 2003):
//   unoriented:   b(p,q) ≅ b(p,q')  iff  q' ≡ q^{±1} (mod p)      (mirrors not identified)
//   oriented:     q, q' odd:  b(p,q) ≅ b(p,q')  iff  q' ≡ q^{±1} (mod 2p)
//   mirror image: b(p,q)* = b(p,−q);  amphichiral iff q² ≡ −1 (mod p).
// Canonical representatives take the least q in the class, so they are usable as hash keys.
// Crossing number: the sum of the partial quotients of p/q (Kauffman, Murasugi, Thistlethwaite
// 1987). Throws: DomainError for gcd(p,q) ≠ 1 and for batch spans of different lengths; the
// word-path functions never throw (they return nullopt where the GMP path would throw).
#pragma once

#include <cstddef>
#include <cstdint>
#include <functional>
#include <optional>
#include <span>
#include <string>
#include <utility>

#include "fourplat/fraction.hpp"
#include "fourplat/integer.hpp"
#include "fourplat/tangle.hpp"

namespace fourplat {

/// Coarse type: unlink (p = 0), unknot (p = 1), torus link T(2,p) (q ≡ ±1 mod p, p ≥ 2), or
/// hyperbolic (all others; Menasco 1984).
enum class LinkKind { unlink, unknot, torus, hyperbolic };

class OrientedTwoBridgeLink;

class TwoBridgeLink {
 public:
  /// b(p,q) from any coprime p, q (negative values allowed; reduced to Schubert form:
  /// (p,q) ~ (−p,−q), q taken mod p). Throws DomainError when gcd(p,q) ≠ 1.
  TwoBridgeLink(Integer p, Integer q);

  /// N(F) = b(p,q) for F = p/q; N(∞) = b(1,0) the unknot; N(0) = b(0,1) the unlink.
  [[nodiscard]] static TwoBridgeLink numerator_closure(const Fraction& f);
  /// D(F) = N(−1/F).
  [[nodiscard]] static TwoBridgeLink denominator_closure(const Fraction& f);
  [[nodiscard]] static TwoBridgeLink unknot();
  [[nodiscard]] static TwoBridgeLink unlink();

  [[nodiscard]] const Integer& p() const noexcept { return p_; }
  [[nodiscard]] const Integer& q() const noexcept { return q_; }
  /// 1 for a knot (p odd), 2 for a two-component link (p even).
  [[nodiscard]] int components() const noexcept;
  [[nodiscard]] bool is_knot() const noexcept { return components() == 1; }
  /// |Δ(−1)| = p.
  [[nodiscard]] const Integer& determinant() const noexcept { return p_; }
  [[nodiscard]] LinkKind kind() const;
  /// Sum of the partial quotients of p/q (0 for the unknot and the unlink).
  [[nodiscard]] Integer crossing_number() const;

  /// b(p,−q).
  [[nodiscard]] TwoBridgeLink mirror() const;
  /// q² ≡ −1 (mod p); the unknot and the unlink count as amphichiral.
  [[nodiscard]] bool is_amphichiral() const;
  /// Least representative of the unoriented class: b(p, min(q, q⁻¹ mod p)).
  [[nodiscard]] TwoBridgeLink canonical() const;
  /// Least representative of the class up to mirror image: min over q^{±1}, −q^{±1} mod p.
  [[nodiscard]] TwoBridgeLink canonical_up_to_mirror() const;

  /// Same Schubert form (not the same link: use same_link for that).
  friend bool operator==(const TwoBridgeLink&, const TwoBridgeLink&) = default;

 private:
  struct Normalized {};
  TwoBridgeLink(Integer p, Integer q, Normalized) : p_(std::move(p)), q_(std::move(q)) {}
  Integer p_;
  Integer q_;
};

/// An oriented 2-bridge link: Schubert's b(p,q) with q odd, 0 < q < 2p (and b(1,1) for the
/// unknot, b(0,1) for the unlink). For a knot there is one oriented class per unoriented one
/// (2-bridge knots are invertible); a two-component link b(p,q), p even, has the two relative
/// orientations q and q + p (mod 2p).
class OrientedTwoBridgeLink {
 public:
  /// From p and any q coprime to p; q is replaced by q + p when even, then taken mod 2p.
  OrientedTwoBridgeLink(Integer p, Integer q);
  /// The oriented numerator closure of the tangle p/q (orientation rule in docs/conventions.md).
  [[nodiscard]] static OrientedTwoBridgeLink numerator_closure(const Fraction& f);

  [[nodiscard]] const Integer& p() const noexcept { return p_; }
  [[nodiscard]] const Integer& q() const noexcept { return q_; }
  [[nodiscard]] TwoBridgeLink unoriented() const;
  /// The other relative orientation of a two-component link (q → q + p); a knot is returned as is.
  [[nodiscard]] OrientedTwoBridgeLink reverse_one_component() const;
  /// Least representative of the oriented class: min(q, q⁻¹ mod 2p).
  [[nodiscard]] OrientedTwoBridgeLink canonical() const;
  [[nodiscard]] OrientedTwoBridgeLink mirror() const;

  friend bool operator==(const OrientedTwoBridgeLink&, const OrientedTwoBridgeLink&) = default;

 private:
  struct Normalized {};
  OrientedTwoBridgeLink(Integer p, Integer q, Normalized) : p_(std::move(p)), q_(std::move(q)) {}
  Integer p_;
  Integer q_;
};

/// Closure of a rational tangle.
[[nodiscard]] TwoBridgeLink closure(const RationalTangle& t, Closure which = Closure::numerator);

/// Schubert's theorem, unoriented.
[[nodiscard]] bool same_link(const TwoBridgeLink& a, const TwoBridgeLink& b);
/// The same link or each other's mirror image.
[[nodiscard]] bool same_up_to_mirror(const TwoBridgeLink& a, const TwoBridgeLink& b);
/// Schubert's theorem, oriented.
[[nodiscard]] bool same_oriented_link(const OrientedTwoBridgeLink& a, const OrientedTwoBridgeLink& b);

/// "b(p,q)".
[[nodiscard]] std::string to_string(const TwoBridgeLink& l);
[[nodiscard]] std::string to_string(const OrientedTwoBridgeLink& l);
[[nodiscard]] std::string to_string(LinkKind k);

/// Word-size summary of the class of b(p,q), for hot paths: everything classify prints.
struct LinkSummaryWord {
  std::int64_t p = 0;                   ///< Schubert form
  std::int64_t q = 0;
  std::int64_t canonical_q = 0;         ///< canonical(): b(p, canonical_q)
  std::int64_t canonical_mirror_q = 0;  ///< canonical_up_to_mirror()
  std::int64_t crossing_number = 0;
  int components = 0;
  bool amphichiral = false;
  LinkKind kind = LinkKind::unknot;
};

/// The summary of N(p/q) computed in machine words without allocation, or nullopt when the word
/// path cannot answer: p = INT64_MIN (|p| = 2^63 is not a word), or gcd(p, q) ≠ 1 (then
/// TwoBridgeLink throws the DomainError). Any other (p, q) is answered, exactly as
/// TwoBridgeLink(p, q) would: no intermediate exceeds |p| (extended Euclid, Knuth TAOCP 4.5.2).
[[nodiscard]] std::optional<LinkSummaryWord> summarize_numerator_word(std::int64_t p,
                                                                      std::int64_t q) noexcept;

/// The kernel of summarize_numerator_words: the fastest one this CPU runs (`best`), the portable
/// scalar one (eight interleaved Euclid chains), or AVX-512 (32 chains in four 8-lane vectors,
/// quotients from double-precision division corrected in integers; x86-64 with AVX-512F/DQ).
enum class WordKernel { best, scalar, avx512 };

/// Whether this build and CPU can run the kernel (`best` and `scalar` always can).
[[nodiscard]] bool word_kernel_available(WordKernel k) noexcept;

/// out[i] = summarize_numerator_word(p[i], q[i]) for every i, with many independent Euclid
/// chains in flight at once (one chain alone waits on the divider's latency), so a batch is
/// several times faster than a loop of single calls. No allocation; every kernel gives the same
/// answers. Throws DomainError when the three spans differ in length or the kernel is not
/// available.
void summarize_numerator_words(std::span<const std::int64_t> p, std::span<const std::int64_t> q,
                               std::span<std::optional<LinkSummaryWord>> out,
                               WordKernel kernel = WordKernel::best);

/// Word-size oriented class of N(p/q): Schubert's b(p,q) with q odd in (0, 2p).
struct OrientedLinkSummaryWord {
  std::int64_t p = 0;            ///< as OrientedTwoBridgeLink(p, q).p()
  std::int64_t q = 0;            ///< as OrientedTwoBridgeLink(p, q).q()
  std::int64_t canonical_q = 0;  ///< OrientedTwoBridgeLink::canonical(): min(q, q⁻¹ mod 2p)
  int components = 0;
};

/// The oriented summary in machine words, or nullopt when 2|p| does not fit an int64
/// (|p| ≥ 2^62) or gcd(p, q) ≠ 1. Agrees with OrientedTwoBridgeLink(p, q).canonical().
[[nodiscard]] std::optional<OrientedLinkSummaryWord> summarize_oriented_numerator_word(
    std::int64_t p, std::int64_t q) noexcept;

}  // namespace fourplat

template <>
struct std::hash<fourplat::TwoBridgeLink> {
  std::size_t operator()(const fourplat::TwoBridgeLink& l) const noexcept {
    const std::size_t h = std::hash<fourplat::Integer>{}(l.p());
    return h ^ (std::hash<fourplat::Integer>{}(l.q()) + 0x9e3779b97f4a7c15ULL + (h << 6) + (h >> 2));
  }
};
