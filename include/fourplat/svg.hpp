// fourplat/svg.hpp — SVG drawings of the standard diagram of a tangle, of a sum of tangles and of
// their closures, in twist-box form. The style (layout, palette, labels) is documented in
// docs/drawing.md.
//
// Layout: the boxes of the Diagram (diagram.hpp) form a staircase. A horizontal box T + [a] is a
// row of |a| crossings to the right of the tangle so far, a vertical box T * 1/[a] a column of
// |a| crossings below it; every crossing is a unit square whose two strands leave it along the
// box, so strands run smoothly from crossing to crossing and, with rounded corners, from box to
// box. Summands of a sum stand side by side; closure arcs run around the whole drawing
// (N: NW–NE over the top, SW–SE under the bottom; D: NW–SW on the left, NE–SE on the right).
// Every drawn strand is one Fox arc of the Diagram (from an under-passage to the next): the
// under-strand stops short of every crossing, and a paper-coloured halo under the over-strand
// keeps the gap clean. With a coloring, each arc is drawn in the style of its color class and
// carries a badge with its color number.
//
// Output is deterministic (same diagram and options, same bytes); coordinates are written in
// pixels with at most two decimals. Geometry uses floating point; no number shown in the drawing
// comes from a floating-point computation.
//
// Throws: DomainError for inconsistent options (a coloring whose length is not the number of
// arcs, a modulus < 1 with a coloring, a color outside 0..modulus−1, a coloring that breaks Fox's
// rule at some crossing, non-positive or non-finite sizes); LimitError for a diagram with more than
// max_svg_crossings crossings.
#pragma once

#include <cstdint>
#include <string>
#include <vector>

#include "fourplat/diagram.hpp"
#include "fourplat/integer.hpp"

namespace fourplat {

/// The largest diagram svg() draws (the output grows by about 0.6 kB per crossing, more with
/// arrows and labels).
inline constexpr std::int64_t max_svg_crossings = 100000;

struct SvgOptions {
  /// An arrow on every edge along the orientation of its component (diagram.hpp's rule).
  bool arrows = false;
  /// The number of every crossing (index + 1, the numbering of Gauss codes) beside it.
  bool crossing_numbers = false;
  /// The names NW, NE, SW, SE at the four loose ends (open tangle only; ignored for closures).
  bool end_names = false;
  /// A Fox coloring, one color per arc in the order of Diagram::arcs() (empty: no overlay).
  std::vector<Integer> coloring;
  /// Its modulus n ≥ 1 (required with a coloring).
  Integer modulus = 0;
  /// With a coloring: the color number of every arc in a badge on the arc.
  bool color_numbers = true;
  /// Pixels per crossing at most; the drawing shrinks below this to fit max_width × max_height.
  double unit = 40;
  double max_width = 960;
  double max_height = 1280;
  /// Text of the <title> element; empty: a description of the diagram ("Numerator closure of
  /// the tangle [2 1 2]").
  std::string title;
};

/// The drawing of d as a complete SVG 1.1 document (UTF-8, ending with a newline).
[[nodiscard]] std::string svg(const Diagram& d, const SvgOptions& options = {});

/// The colour (#rrggbb) and dash pattern index (0 solid, 1 dashed, 2 dotted) svg() uses for the
/// color class k ≥ 0 — the Okabe–Ito palette, repeated with dashes beyond 8 classes.
struct SvgSwatch {
  const char* stroke;
  const char* text;  ///< colour of a number written on this swatch
  int dash;
};
[[nodiscard]] SvgSwatch svg_swatch(std::int64_t color_class) noexcept;

}  // namespace fourplat
