// fourplat/format.hpp — {fmt} formatters for fourplat's public value types.
//
//   fmt::format("{}", Fraction(7, 3))            "7/3"         (∞ is "1/0", integers "n")
//   fmt::format("{:>8}", Integer(42))            "      42"    (width, fill, alignment work)
//   fmt::format("{}", TwistSequence{{2, 1, 2}})  "[2 1 2]"
//   fmt::format("{}", tangle)                    the given twists, or the fraction
//   fmt::format("{}", TwoBridgeLink(7, 3))       "b(7,3)"
//   fmt::format("{}", sum)                       "3/5 + [2 1]"
//   fmt::format("{}", LinkKind::torus)           "torus";  Closure::numerator: "numerator"
//   fmt::format("{}", Corner::nw)                "NW";  DiagramClosure::none: "none";  BoxKind
//   fmt::format("{}", diagram.pd_code())         "X[4,2,5,1] X[2,6,3,5] X[6,4,1,3]"  (PdCode, the
//                                                 form parse_pd of fourplat/pd.hpp reads back)
// Every formatter prints exactly the text that the matching parser of fourplat/parse.hpp reads
// back, and accepts the standard string format specification ([[fill]align][width][.precision]),
// as fmt 9 allows by specialising fmt::formatter and inheriting formatter<string_view>.
// This header needs {fmt} (9 or later); the core headers do not. Throws: fmt::format_error for a
// bad format specification, nothing else but std::bad_alloc.
#pragma once

#include <string>
#include <string_view>

#include <fmt/format.h>

#include "fourplat/algebraic.hpp"
#include "fourplat/continued_fraction.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/fraction.hpp"
#include "fourplat/integer.hpp"
#include "fourplat/parse.hpp"
#include "fourplat/tangle.hpp"
#include "fourplat/two_bridge.hpp"

namespace fourplat::detail {
/// Base of every fourplat formatter: the value's text, then the string specification.
template <typename T>
struct TextFormatter : fmt::formatter<std::string_view> {
  template <typename FormatContext>
  auto format(const T& value, FormatContext& ctx) const -> decltype(ctx.out()) {
    const auto text = fourplat::to_string(value);  // std::string or std::string_view
    return fmt::formatter<std::string_view>::format(std::string_view(text), ctx);
  }
};
}  // namespace fourplat::detail

template <>
struct fmt::formatter<fourplat::Integer> : fourplat::detail::TextFormatter<fourplat::Integer> {};
template <>
struct fmt::formatter<fourplat::Fraction> : fourplat::detail::TextFormatter<fourplat::Fraction> {};
template <>
struct fmt::formatter<fourplat::TwistSequence>
    : fourplat::detail::TextFormatter<fourplat::TwistSequence> {};
template <>
struct fmt::formatter<fourplat::RationalTangle>
    : fourplat::detail::TextFormatter<fourplat::RationalTangle> {};
template <>
struct fmt::formatter<fourplat::TangleSum> : fourplat::detail::TextFormatter<fourplat::TangleSum> {};
template <>
struct fmt::formatter<fourplat::TwoBridgeLink>
    : fourplat::detail::TextFormatter<fourplat::TwoBridgeLink> {};
template <>
struct fmt::formatter<fourplat::OrientedTwoBridgeLink>
    : fourplat::detail::TextFormatter<fourplat::OrientedTwoBridgeLink> {};
template <>
struct fmt::formatter<fourplat::LinkKind> : fourplat::detail::TextFormatter<fourplat::LinkKind> {};
template <>
struct fmt::formatter<fourplat::Closure> : fourplat::detail::TextFormatter<fourplat::Closure> {};
template <>
struct fmt::formatter<fourplat::Corner> : fourplat::detail::TextFormatter<fourplat::Corner> {};
template <>
struct fmt::formatter<fourplat::DiagramClosure>
    : fourplat::detail::TextFormatter<fourplat::DiagramClosure> {};
template <>
struct fmt::formatter<fourplat::BoxKind> : fourplat::detail::TextFormatter<fourplat::BoxKind> {};
/// PdCode is std::vector<std::array<std::int64_t, 4>>: this formatter prints every such vector as
/// a PD code (a full specialisation, so it wins over fmt/ranges.h where that is included).
template <>
struct fmt::formatter<fourplat::PdCode> : fourplat::detail::TextFormatter<fourplat::PdCode> {};
