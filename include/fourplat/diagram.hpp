// fourplat/diagram.hpp — the standard diagram of a rational tangle (or of a sum of rational
// tangles) and of its closures: crossings, edges, arcs, orientation, signs, PD/DT/Gauss codes and
// the coloring fraction. One Diagram is the single source of every diagram-based answer (coloring
// witnesses, PD export, drawings, state sums in tests).
//
// Construction (Conway's twist order, continued_fraction.hpp). For [a1 ... an] the twist a_i is
// horizontal when n − i is even and vertical otherwise, so an is always horizontal. The drawing
// starts from the seed [0] (two horizontal arcs NW–NE, SW–SE) when a1 is horizontal and from the
// seed [∞] (two vertical arcs NW–SW, NE–SE) when a1 is vertical; then, box by box,
//   horizontal box a_i:  |a_i| crossings placed to the RIGHT of everything built so far, twisting
//                        the current NE and SE ends (T + [a_i]);
//   vertical box a_i:    |a_i| crossings placed BELOW everything built so far, twisting the current
//                        SW and SE ends (T * 1/[a_i]).
// A box with a_i = 0 is kept (it has no crossings), so [a 0 b] draws the same crossings as [a+b].
// A sum T1 + T2 + ... places each summand's diagram to the right of the previous one
// (T1.NE–T2.NW, T1.SE–T2.SW), as in Conway's and Kauffman–Lambropoulou's tangle sum.
//
// Every crossing is drawn as an X with its four corners NW, NE, SW, SE (the same names as the
// tangle's four ends). Its over-strand joins NW–SE when the twist is positive — the crossing [1]
// (fixed by the lead, docs/conventions.md) — and NE–SW when it is negative. The vertical tangle
// 1/[1] is the same crossing as [1] (inversion is mirror ∘ rotation), so the rule is the same in
// both kinds of box. In a horizontal box the k-th crossing's NE, SE corners meet the (k+1)-th's
// NW, SW; in a vertical box its SW, SE corners meet the next one's NW, NE.
//
// Numbering (all indices 0-based in C++; PD edge labels are 1-based as the trade writes them):
//   crossings  in the order of the twist sequence: a1's box first, each box's crossings in order
//              along the box (left to right in a horizontal box, top to bottom in a vertical one);
//              the summands of a sum one after the other.
//   components ordered by the first tangle end they enter at, in the order NW, SW, NE, SE; closed
//              loops that pass no end (possible only in sums) come last, by their lowest crossing.
//   edges      PD edges: the pieces of the oriented curve from one crossing to the next. Edge
//              labels run 1, 2, ... consecutively along component 0, then component 1, ...; the
//              first edge of a component is the one that runs through its entry end (ending at
//              the first crossing met after it), or for a closed loop with no end the one that
//              enters its lowest-numbered crossing at the upper corner of the rule below. In a
//              closure an edge may run through tangle ends and closure arcs (Edge::via lists
//              them); in the open tangle the first and last edges of a strand start and end at
//              the tangle's ends.
//   arcs       the over-arcs (Fox's arcs): maximal pieces of the curve from one under-passage to the
//              next, each a run of consecutive edges. Arcs are numbered in the order of their first
//              edge, where an arc's first edge is the one leaving an under-passage (or, in the open
//              tangle, starting at an end). A component with no under-passage is one arc with all
//              its edges; a crossingless closed component is one arc with no edges.
//
// Orientation rule (docs/conventions.md). Every component (every strand of the open tangle) is
// oriented so that it ENTERS the tangle at the first of its ends in the order NW, SW, NE, SE:
//   N(T), two components:  both run left to right (NW → NE and SW → SE inside the tangle);
//   D(T), two components:  both run top to bottom (NW → SW and NE → SE);
//   knots:                 the component enters at NW;
//   a closed loop with no end (only in sums) enters its lowest-numbered crossing at an upper
//   corner (NW if it passes there, else NE).
// With this rule N([3]) has three positive crossings (writhe +3: the right-handed trefoil) and the
// oriented closure N(p/q) is Schubert's oriented b(p,q) with q taken mod 2p
// (OrientedTwoBridgeLink::numerator_closure): for p even, the tangles p/q and p/(q+p) = (p/q) * 1/[1]
// give the two relative orientations (the extra vertical crossing is a kink of the SW–SE strand
// that reverses its direction through the tangle); their linking numbers are opposite (checked in
// tests/diagram_test.cpp against the ε-sum formula, Kim–No–Yoo arXiv:2403.11512). D(F) = N(−1/F)
// holds as oriented links (D's rule is N's rule carried through the rotation).
//
// Crossing sign (common practice): +1 when the over-strand direction o and the under-strand
// direction u satisfy o × u > 0 (the positive crossing, both strands upward, over-strand from
// lower left to upper right). Writhe = sum of signs; linking number = half the sum of the signs of
// the crossings between two components.
//
// PD code (the open convention): one X[i,j,k,l] per crossing, in crossing order, listing the edge
// labels at its four corners counterclockwise starting from the incoming under-edge (so i → k is
// the under-strand; the crossing is positive exactly when the over-strand runs l → j). The
// corners in counterclockwise order are NE, NW, SW, SE. For the open tangle (closure none) the four
// edges at the tangle's ends appear once each; a strand with no crossing appears in no X.
//
// Throws: DomainError for an empty twist sequence or sum, for a DT code of a diagram that is not a
// closed knot diagram, and for coloring_fraction when the tangle's colorings do not determine a
// fraction; LimitError when the total number of crossings exceeds max_crossings.
#pragma once

#include <array>
#include <cstddef>
#include <cstdint>
#include <optional>
#include <span>
#include <string>
#include <vector>

#include "fourplat/continued_fraction.hpp"
#include "fourplat/fraction.hpp"
#include "fourplat/integer.hpp"
#include "fourplat/tangle.hpp"

namespace fourplat {

class TangleSum;

/// The four corners of a crossing, and equally the four ends of the tangle.
enum class Corner : std::uint8_t { nw = 0, ne = 1, sw = 2, se = 3 };

/// "NW", "NE", "SW", "SE".
[[nodiscard]] const char* to_string(Corner c) noexcept;

/// Which closure a diagram draws: N(T), D(T), or the open tangle itself.
enum class DiagramClosure : std::uint8_t { numerator, denominator, none };

/// The DiagramClosure of a Closure.
[[nodiscard]] constexpr DiagramClosure diagram_closure(Closure c) noexcept {
  return c == Closure::numerator ? DiagramClosure::numerator : DiagramClosure::denominator;
}

/// "numerator", "denominator", "none".
[[nodiscard]] const char* to_string(DiagramClosure c) noexcept;

/// Horizontal (T + [a]) or vertical (T * 1/[a]) twist box.
enum class BoxKind : std::uint8_t { horizontal, vertical };

/// A place where a strand of the diagram ends: a corner of a crossing, or (crossing == −1) one
/// of the tangle's four ends, named by `corner`.
struct Port {
  std::int64_t crossing = -1;
  Corner corner = Corner::nw;
  [[nodiscard]] bool is_end() const noexcept { return crossing < 0; }
  friend bool operator==(const Port&, const Port&) = default;
};

/// One twist box a_i (boxes of zero twists are kept, with no crossings).
struct TwistBox {
  int summand = 0;                 ///< which summand of a sum (0 for a rational tangle)
  std::size_t position = 0;        ///< i − 1 for the twist a_i of that summand's sequence
  BoxKind kind = BoxKind::horizontal;
  std::int64_t twists = 0;         ///< a_i (its sign is the sign of every crossing type in it)
  std::int64_t first_crossing = 0; ///< index of its first crossing
  std::int64_t crossings = 0;      ///< |a_i|
};

/// One summand of the diagram (a rational tangle drawn from its twist sequence).
struct Summand {
  TwistSequence twists;
  bool seed_infinity = false;      ///< drawn from the seed [∞] (a1 vertical) rather than [0]
  std::size_t first_box = 0;
  std::size_t boxes = 0;
  std::int64_t first_crossing = 0;
  std::int64_t crossings = 0;
};

struct Crossing {
  // Where it sits (enough to draw it).
  std::size_t box = 0;             ///< index into Diagram::boxes()
  std::int64_t index_in_box = 0;   ///< 0-based position along its box
  int summand = 0;
  BoxKind kind = BoxKind::horizontal;
  bool over_nw_se = true;          ///< over-strand joins NW–SE (positive twist, the crossing [1])
  /// What each corner (indexed by Corner) is joined to in the open tangle: another crossing's
  /// corner or one of the tangle's ends (closure arcs are not included here).
  std::array<Port, 4> neighbor{};

  // Orientation (from the rule above, for the diagram's closure).
  Corner over_in = Corner::nw, over_out = Corner::se;
  Corner under_in = Corner::sw, under_out = Corner::ne;
  int sign = 0;                    ///< +1 or −1
  std::array<std::int64_t, 4> edge{};  ///< PD label (1-based) of the edge at each corner
  std::int64_t over_arc = 0;       ///< arc passing over (0-based index into arcs())
  std::int64_t under_in_arc = 0;   ///< arc ending at the incoming under-corner
  std::int64_t under_out_arc = 0;  ///< arc starting at the outgoing under-corner
  int over_component = 0, under_component = 0;
};

/// A PD edge: from the corner where it leaves a crossing to the corner where it enters the next.
/// In the open tangle an edge may start or end at a tangle end (tail or head is then an end).
struct Edge {
  std::int64_t label = 0;          ///< 1-based PD label (index + 1)
  int component = 0;
  Port tail;                       ///< where it starts
  Port head;                       ///< where it ends
  std::vector<Corner> via;         ///< tangle ends it runs through, in order (closed diagrams)
};

/// A Fox arc (over-arc): consecutive edges from one under-passage to the next.
struct Arc {
  int component = 0;
  std::vector<std::int64_t> edges;  ///< PD labels, in the order of the orientation
};

struct Component {
  std::int64_t first_edge = 0;     ///< 1-based label of its first edge (meaningless if no edges)
  std::int64_t edges = 0;          ///< number of edges (0 for a crossingless loop)
  /// The end where it enters the tangle (nullopt for a closed loop that passes no end).
  std::optional<Corner> entry;
  /// The end where it leaves the tangle (open tangle strands; nullopt otherwise).
  std::optional<Corner> exit;
};

/// PD code: X[i,j,k,l] per crossing (see the opening comment).
using PdCode = std::vector<std::array<std::int64_t, 4>>;

/// Signed Gauss code: per component the crossings in the order they are met from its first edge
/// on, +(index + 1) when passing over and −(index + 1) when passing under; `signs[c]` is the sign
/// of crossing c.
struct GaussCode {
  std::vector<std::vector<std::int64_t>> components;
  std::vector<int> signs;
};

/// The integer colors at the tangle's four ends (Kauffman–Lambropoulou 2004): a at NW, b at NE,
/// c at SW, d at SE, from the coloring that gives the seed's two arcs the colors 0 and 1.
struct EndColors {
  Integer nw, ne, sw, se;
};

class Diagram {
 public:
  /// The largest total number of crossings a Diagram accepts (LimitError above it).
  static constexpr std::int64_t max_crossings = std::int64_t{1} << 24;

  /// The standard diagram of a Conway twist sequence (any sequence: zeros and mixed signs allowed).
  /// Throws DomainError if empty, LimitError if it has more than max_crossings crossings.
  [[nodiscard]] static Diagram of_twists(const TwistSequence& twists,
                                         DiagramClosure closure = DiagramClosure::numerator);
  /// The reduced alternating diagram of the canonical twist sequence of f (canonical_twists).
  [[nodiscard]] static Diagram of_fraction(const Fraction& f,
                                           DiagramClosure closure = DiagramClosure::numerator);
  /// The diagram of the tangle's own sequence (the one it was built from, else the canonical one).
  [[nodiscard]] static Diagram of_tangle(const RationalTangle& t,
                                         DiagramClosure closure = DiagramClosure::numerator);
  /// The sum T1 + T2 + ... of the given twist sequences, left to right. Throws DomainError if empty.
  [[nodiscard]] static Diagram of_sum(std::span<const TwistSequence> summands,
                                      DiagramClosure closure = DiagramClosure::numerator);
  /// The sum of a TangleSum's rational parts, each drawn from its own twist sequence.
  [[nodiscard]] static Diagram of_sum(const TangleSum& sum,
                                      DiagramClosure closure = DiagramClosure::numerator);

  [[nodiscard]] DiagramClosure closure() const noexcept { return closure_; }
  [[nodiscard]] bool is_closed() const noexcept { return closure_ != DiagramClosure::none; }

  [[nodiscard]] const std::vector<Summand>& summands() const noexcept { return summands_; }
  [[nodiscard]] const std::vector<TwistBox>& boxes() const noexcept { return boxes_; }
  [[nodiscard]] const std::vector<Crossing>& crossings() const noexcept { return crossings_; }
  [[nodiscard]] std::int64_t crossing_count() const noexcept {
    return static_cast<std::int64_t>(crossings_.size());
  }
  /// Edges, indexed by label − 1.
  [[nodiscard]] const std::vector<Edge>& edges() const noexcept { return edges_; }
  [[nodiscard]] const std::vector<Arc>& arcs() const noexcept { return arcs_; }
  [[nodiscard]] const std::vector<Component>& component_list() const noexcept {
    return components_;
  }
  /// Number of components (strands for the open tangle), crossingless loops included.
  [[nodiscard]] int components() const noexcept { return static_cast<int>(components_.size()); }
  /// Components that meet no crossing (the unknot N([∞]), the unlink N([0]), loops in sums).
  [[nodiscard]] int crossingless_components() const noexcept;
  /// What a tangle end is joined to inside the open tangle (a crossing corner or another end).
  [[nodiscard]] const Port& end_neighbor(Corner end) const noexcept {
    return end_neighbor_[static_cast<std::size_t>(end)];
  }
  /// The arc through a tangle end in the open tangle or closure.
  [[nodiscard]] std::int64_t end_arc(Corner end) const noexcept {
    return end_arc_[static_cast<std::size_t>(end)];
  }

  [[nodiscard]] std::int64_t writhe() const noexcept { return writhe_; }
  /// Half the sum of the signs of the crossings between components i and j (i ≠ j).
  [[nodiscard]] std::int64_t linking_number(int i, int j) const;
  /// For a two-component diagram, linking_number(0, 1); nullopt otherwise.
  [[nodiscard]] std::optional<std::int64_t> linking_number() const;
  /// Over- and under-passages alternate along every component.
  [[nodiscard]] bool is_alternating() const;

  /// PD code (empty for a crossingless diagram: use components()).
  [[nodiscard]] PdCode pd_code() const;
  /// Signs of the crossings, in crossing order (the same as crossings()[c].sign).
  [[nodiscard]] std::vector<int> signs() const;
  /// Dowker–Thistlethwaite code of a closed knot diagram: the crossing at the head of edge k gets
  /// label k (so labels are the PD edge labels); for the odd labels 1, 3, ..., 2n − 1 in order,
  /// the even label at the same crossing, negated when the curve passes OVER at the even label
  /// (common practice: the right-handed trefoil N([3]) gives 4 6 2). Empty for the crossingless
  /// unknot. Throws DomainError for a link or an open tangle.
  [[nodiscard]] std::vector<std::int64_t> dt_code() const;
  [[nodiscard]] GaussCode gauss_code() const;

 private:
  Diagram() = default;
  void build(std::span<const TwistSequence> summands, DiagramClosure closure);
  void orient();

  DiagramClosure closure_ = DiagramClosure::numerator;
  std::vector<Summand> summands_;
  std::vector<TwistBox> boxes_;
  std::vector<Crossing> crossings_;
  std::vector<Edge> edges_;
  std::vector<Arc> arcs_;
  std::vector<Component> components_;
  std::array<Port, 4> end_neighbor_{};
  std::array<std::int64_t, 4> end_arc_{-1, -1, -1, -1};
  std::int64_t writhe_ = 0;
};

/// Integer end colors of the diagram's tangle (closure ignored) from its Fox coloring over Z with
/// seed colors 0 and 1. The colors grow like the fraction's numerator and denominator, so this is
/// quadratic in the number of crossings for long sequences (twist_value is the fast way to F).
/// (Kauffman–Lambropoulou 2004, second proof of Conway's theorem.) They
/// satisfy nw + se = ne + sw, and nw = 0. For a sum: the coloring that is not constant, with
/// nw = 0 and the other three coprime (unique up to sign). Throws DomainError if the tangle's
/// colorings do not determine the ends (a sum whose parts do not glue, e.g. [∞] + [∞]).
[[nodiscard]] EndColors end_colors(const Diagram& d);

/// The coloring fraction F = (a − b)/(c − a) from the end colors a (NW), b (NE), c (SW), d (SE).
/// With our crossing [1] (over-strand NW–SE) this sign makes F([1]) = 1, F([0]) = 0, F([∞]) = ∞;
/// Kauffman–Lambropoulou's (a − b)/(a − c) is its negative, i.e. the other crossing convention.
/// It equals twist_value of the sequence for every twist sequence (tests/diagram_test.cpp) and is
/// additive over sums. Throws DomainError as end_colors does.
[[nodiscard]] Fraction coloring_fraction(const Diagram& d);

/// "X[1,4,2,5] X[3,6,4,1] ..." (the form parse_pd in pd.hpp reads back).
[[nodiscard]] std::string to_string(const PdCode& pd);

}  // namespace fourplat
