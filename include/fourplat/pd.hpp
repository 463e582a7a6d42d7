// fourplat/pd.hpp — PD codes from anywhere: parsing, validation, and the invariants that need no
// fraction (components, writhe, linking numbers, determinant, Fox colorings).
//
// Text syntax read by parse_pd (the open PD convention, diagram.hpp): any of
//   X[1,4,2,5] X[3,6,4,1] X[5,2,6,3]          items X[i,j,k,l] (x also accepted), separated by
//                                             spaces, commas or new lines;
//   [[1,4,2,5],[3,6,4,1],[5,2,6,3]]          a JSON-style list of 4-lists;
//   1 4 2 5                                  four integers a line (spaces or commas between).
//   3 6 4 1
// '#' starts a comment running to the end of the line. Labels are positive decimal integers.
//
// Validation (PdDiagram's constructor): at least one crossing; the labels are exactly 1..2c, each
// used twice; following the strands (straight through every crossing) the labels of each
// component are consecutive and increase along it, with the under-strand entering at i and leaving
// at k; the diagram is planar — tracing faces gives V − E + F = 2 for every connected piece
// (Euler's formula). Where a component's labels do not fix its direction (one or two edges and no
// under-passage) it is read as entering its first over-passage at j; such a component lies over
// everything it meets, so that choice moves individual signs but no writhe or linking number.
// Invariants (Fox 1962, "A quick trip through knot theory"; common practice): the coloring matrix
// has one row per crossing, 2·over − under_in − under_out, one column per arc; its Smith normal
// form over Z gives the number of n-colorings n^{a−r}·Π gcd(n, d_i) and the determinant
// Π d_i when the rank r is a − 1 (else 0), which equals |any (c−1)×(c−1) minor| for a connected
// diagram.
// Throws: ParseError (with the character position) for text that is not a PD code; DomainError
// for a PD code that fails validation (naming the crossing and the label) and for a modulus
// n ≤ 0.
#pragma once

#include <cstdint>
#include <memory>
#include <optional>
#include <string_view>
#include <vector>

#include "fourplat/diagram.hpp"
#include "fourplat/integer.hpp"

namespace fourplat {

namespace detail {
class SmithForm;
}

/// Parses the text forms above. Does not validate beyond the syntax (see PdDiagram).
[[nodiscard]] PdCode parse_pd(std::string_view text);

/// One crossing of a validated PD code, oriented.
struct PdCrossing {
  std::array<std::int64_t, 4> labels{};  ///< i, j, k, l as given
  bool over_j_to_l = true;               ///< the over-strand enters at j (else at l)
  int sign = 0;                          ///< +1 exactly when the over-strand runs l → j
  int over_component = 0, under_component = 0;
  std::int64_t over_arc = 0, under_in_arc = 0, under_out_arc = 0;
};

/// A validated PD code. The Smith form behind determinant() and the colorings is computed on the
/// first call that needs it (so one PdDiagram must not be shared by threads before that call).
class PdDiagram {
 public:
  /// Validates the code (see the opening comment); throws DomainError naming what is wrong.
  explicit PdDiagram(PdCode code);
  ~PdDiagram();
  PdDiagram(PdDiagram&&) noexcept;
  PdDiagram& operator=(PdDiagram&&) noexcept;
  PdDiagram(const PdDiagram&) = delete;
  PdDiagram& operator=(const PdDiagram&) = delete;

  [[nodiscard]] const PdCode& code() const noexcept { return code_; }
  [[nodiscard]] std::int64_t crossing_count() const noexcept {
    return static_cast<std::int64_t>(code_.size());
  }
  [[nodiscard]] const std::vector<PdCrossing>& crossings() const noexcept { return crossings_; }
  [[nodiscard]] int components() const noexcept { return static_cast<int>(component_first_.size()); }
  /// First label and number of edges of each component, components ordered by first label.
  [[nodiscard]] const std::vector<std::int64_t>& component_first_label() const noexcept {
    return component_first_;
  }
  [[nodiscard]] const std::vector<std::int64_t>& component_edges() const noexcept {
    return component_size_;
  }
  [[nodiscard]] std::vector<int> signs() const;
  [[nodiscard]] std::int64_t writhe() const noexcept { return writhe_; }
  /// Half the sum of the signs of the crossings between components i ≠ j.
  [[nodiscard]] std::int64_t linking_number(int i, int j) const;
  /// linking_number(0, 1) for two components, nullopt otherwise.
  [[nodiscard]] std::optional<std::int64_t> linking_number() const;
  /// Fox arcs, each as its edge labels in order; numbered as Diagram::arcs() numbers them (by
  /// their first edge, an arc starting at each edge that leaves an under-passage).
  [[nodiscard]] const std::vector<std::vector<std::int64_t>>& arcs() const noexcept { return arcs_; }
  /// Number of connected pieces of the diagram (1 unless it is drawn split).
  [[nodiscard]] int pieces() const noexcept { return pieces_; }

  /// |H₁ of the double branched cover| from the coloring matrix (0 when infinite).
  [[nodiscard]] Integer determinant() const;
  /// The invariant factors other than 1 of the coloring matrix (the torsion of the colorings).
  [[nodiscard]] std::vector<Integer> invariant_factors() const;
  /// Number of Fox n-colorings (constant ones included); DomainError for n ≤ 0.
  [[nodiscard]] Integer coloring_count(const Integer& n) const;
  /// A non-constant n-coloring, one color in [0, n) per arc, or nullopt if only constant ones
  /// exist; DomainError for n ≤ 0.
  [[nodiscard]] std::optional<std::vector<Integer>> coloring_witness(const Integer& n) const;

 private:
  PdCode code_;
  std::vector<PdCrossing> crossings_;
  std::vector<std::int64_t> component_first_, component_size_;
  std::vector<std::vector<std::int64_t>> arcs_;
  std::int64_t writhe_ = 0;
  int pieces_ = 0;
  [[nodiscard]] const detail::SmithForm& smith() const;
  mutable std::unique_ptr<detail::SmithForm> smith_;  // computed on first use
};

}  // namespace fourplat
