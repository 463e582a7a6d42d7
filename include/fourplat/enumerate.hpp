// fourplat/enumerate.hpp — complete, duplicate-free lists of 2-bridge links and rational tangles
// by crossing number, streamed to a callback and split into shards.
//
// Method (docs/enumeration.md has the proofs): a fraction p/q > 1 with crossing number n ≥ 2 is
// the Stern–Brocot word R·w·R with w ∈ {R,L}^(n−2); reversing w inverts q mod p (Schubert's
// unoriented equivalence) and complementing w replaces q by p − q (the mirror image). So the
// classes up to mirror are the orbits of the Klein group {1, reverse, complement, both} on
// words — the bijection Ernst and Sumners count with (Math. Proc. Camb. Phil. Soc. 102, 1987) —
// and the walk builds w from both ends at once, pair by pair, keeping only the lexicographically
// least word of each orbit. In the Stern–Brocot order the least word is the least q, so every
// item arrives already canonical. p and q are updated incrementally (two additions per letter),
// in machine words, with no allocation per item.
//
// Order: crossing numbers ascending; inside one crossing number a fixed depth-first order. A
// shard I of N is the I-th of N contiguous, equal-sized (±1) ranges of the classes of the whole
// request before the component filter and before oriented classes are split, so shards are
// disjoint, their union is the whole list, and each shard descends straight to its range.
//
// Limits: crossing numbers 0 … 89 (kMaxEnumerationCrossings). For n ≤ 89 every p is at most
// F_(n+1) ≤ F_90 < 2^62, so p, 2p (oriented forms) and every intermediate fit int64 exactly;
// beyond, lists have more than 2^85 members: use the counts (counts.hpp) or random samples
// (families.hpp), which take any n.
// Throws: DomainError for a negative or reversed crossing range or a shard with index ≥ count or
//   count = 0; LimitError for crossing numbers above 89 or more than 2^32 shards. Exceptions
//   thrown by the callback propagate unchanged.
#pragma once

#include <cstdint>
#include <memory>
#include <span>
#include <type_traits>
#include <utility>

#include "fourplat/integer.hpp"

namespace fourplat {

/// A non-owning reference to a callable (like the function_ref of later standards): cheap to
/// copy, never allocates. The referenced callable must outlive every call. Default: empty.
template <typename Signature>
class FunctionRef;

template <typename R, typename... Args>
class FunctionRef<R(Args...)> {
 public:
  FunctionRef() noexcept = default;
  template <typename F>
    requires(!std::is_same_v<std::remove_cvref_t<F>, FunctionRef> &&
             std::is_invocable_r_v<R, F&, Args...>)
  FunctionRef(F&& f) noexcept  // NOLINT(google-explicit-constructor)
      : object_(const_cast<void*>(static_cast<const void*>(std::addressof(f)))),
        call_([](void* o, Args... args) -> R {
          return (*static_cast<std::remove_reference_t<F>*>(o))(std::forward<Args>(args)...);
        }) {}
  R operator()(Args... args) const { return call_(object_, std::forward<Args>(args)...); }
  explicit operator bool() const noexcept { return call_ != nullptr; }

 private:
  void* object_ = nullptr;
  R (*call_)(void*, Args...) = nullptr;
};

/// The largest crossing number the generators accept (see the opening comment).
inline constexpr int kMaxEnumerationCrossings = 89;

/// Which links: knots (p odd), two-component links (p even), or both.
enum class ComponentFilter { knots, links, both };

/// Part `index` (0-based) of `count` equal parts of a request.
struct Shard {
  std::uint64_t index = 0;
  std::uint64_t count = 1;
};

/// The classification the list is made in.
struct EnumerationOptions {
  ComponentFilter components = ComponentFilter::both;
  /// false: a chiral class and its mirror image are one item (the default, as Ernst–Sumners
  /// count); true: both are listed (amphichiral classes once).
  bool mirrors = false;
  /// Oriented classes (Schubert mod 2p): a two-component link gives one or two items (its two
  /// relative orientations, when they differ); knots are invertible and give one.
  bool oriented = false;
  /// Fill EnumeratedLink::twists (costs a Euclid per item).
  bool twists = false;
  Shard shard{};
  /// Called now and then (about every 65536 classes) with the fraction of the shard done.
  FunctionRef<void(double)> progress{};
};

/// One class, as the generator hands it to the callback (valid during the call only).
struct EnumeratedLink {
  int crossings = 0;
  int components = 0;          ///< 1 for a knot (p odd), 2 for a link (p even)
  bool amphichiral = false;    ///< q² ≡ −1 (mod p)
  std::int64_t p = 0;          ///< the determinant
  /// The least q of the item's class in the requested classification: unoriented 0 ≤ q < p
  /// (mirrors identified or not); oriented: q odd, 0 < q < 2p. The item is b(p,q).
  std::int64_t q = 0;
  /// A tangle fraction_p/fraction_q (reduced, fraction_q ≥ 0) whose numerator closure is the
  /// item: p/q when q < p, else −p/(2p − q) (whose oriented closure is b(p,q) again, as
  /// OrientedTwoBridgeLink reads it); the unknot is 1/0, the unlink 0/1.
  std::int64_t fraction_p = 0;
  std::int64_t fraction_q = 0;
  /// The unoriented class of N(fraction): its least q with mirrors distinguished, and up to mirror.
  std::int64_t canonical_q = 0;
  std::int64_t canonical_mirror_q = 0;
  /// Kauffman–Lambropoulou canonical twist sequence of the fraction in Conway's order (only with
  /// options.twists; otherwise empty).
  std::span<const std::int64_t> twists{};
};

/// One rational tangle with its fraction p/q (q ≥ 0; ∞ = 1/0).
struct EnumeratedTangle {
  int crossings = 0;
  std::int64_t p = 0;
  std::int64_t q = 1;
  std::span<const std::int64_t> twists{};  ///< canonical twist sequence (with options.twists)
};

struct TangleEnumerationOptions {
  bool twists = false;
  Shard shard{};
  FunctionRef<void(double)> progress{};
};

/// Calls `sink` once for every class of 2-bridge links with crossing number in [lo, hi] that the
/// options select (this shard's part). Crossing number 0 lists the unknot b(1,0) and the
/// unlink b(0,1); crossing number 1 lists nothing. The sink returns false to stop; the function
/// returns false exactly when it was stopped.
bool for_each_two_bridge(int lo, int hi, const EnumerationOptions& options,
                         FunctionRef<bool(const EnumeratedLink&)> sink);

/// Every rational tangle with crossing number in [lo, hi], each fraction once: 0 and ∞ for
/// n = 0, then the 2^n fractions ±p/q whose canonical twist sequence has n crossings.
bool for_each_rational_tangle(int lo, int hi, const TangleEnumerationOptions& options,
                              FunctionRef<bool(const EnumeratedTangle&)> sink);

/// The sharding unit of a two-bridge request: the number of classes before the component
/// filter and the oriented split, for the whole range and for the options' shard.
struct ShardExtent {
  Integer whole;
  Integer first;  ///< index of the shard's first unit in the whole range
  Integer size;   ///< units in this shard
};
[[nodiscard]] ShardExtent two_bridge_shard_extent(int lo, int hi, const EnumerationOptions& options);
/// The same for rational tangles (unit: a fraction and its negative; 0 and ∞ are one unit).
[[nodiscard]] ShardExtent rational_tangle_shard_extent(int lo, int hi, const TangleEnumerationOptions& options);

/// Kauffman–Lambropoulou canonical twist sequence of p/q (q ≥ 0, gcd 1, |p|, q < 2^62) in
/// Conway's order, written to `out` (room for 96 terms is always enough for such p, q); returns
/// the length. Word-size twin of canonical_twists (continued_fraction.hpp).
std::size_t canonical_twists_word(std::int64_t p, std::int64_t q, std::span<std::int64_t> out);

}  // namespace fourplat
