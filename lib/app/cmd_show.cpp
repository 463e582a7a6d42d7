// fourplat show — a labelled summary of one tangle (or sum of tangles) and of both its closures.
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "command.hpp"
#include "fourplat/algebraic.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/parse.hpp"
#include "fourplat/two_bridge.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

struct Options {
  std::vector<std::string> words;
  bool json = false;
};

/// Connectivity of a rational tangle from the parities of p/q (Kauffman–Lambropoulou 2003):
/// p even, q odd joins like [0]; p odd, q even like [∞]; both odd like [1].
std::string connectivity(const Fraction& f) {
  const bool p_even = f.numerator() % 2 == 0, q_even = f.denominator() % 2 == 0;
  if (p_even) return "[0]";
  if (q_even) return "[inf]";
  return "[1]";
}
std::string connectivity_text(const Fraction& f) {
  const std::string c = connectivity(f);
  if (c == "[0]") return "like [0]: NW-NE and SW-SE joined";
  if (c == "[inf]") return "like [inf]: NW-SW and NE-SE joined";
  return "like [1]: NW-SE and NE-SW joined";
}

/// The coloring fraction (Kauffman–Lambropoulou 2004) read off the tangle's own diagram: an
/// independent check of the continued-fraction value; nullopt when the diagram is too large.
std::optional<Fraction> diagram_fraction(const RationalTangle& t) {
  const TangleSum one({t});
  if (diagram_crossings(one, false) > kMaxToolCrossings) return std::nullopt;
  return coloring_fraction(draw_diagram(one, DiagramClosure::none, false));
}

void show_rational(const std::string& input, const RationalTangle& t, bool json) {
  Output& out = Output::get();
  const TwoBridgeLink n = closure(t, Closure::numerator), d = closure(t, Closure::denominator);
  const OrientedTwoBridgeLink on = oriented_closure(t, Closure::numerator);
  const OrientedTwoBridgeLink od = oriented_closure(t, Closure::denominator);
  if (json) {
    Json j;
    j["input"] = input;
    j["fraction"] = to_string(t.fraction());
    j["twists"] = to_string(t.twists());
    j["twists_given"] = t.has_given_twists();
    j["canonical_twists"] = to_string(t.canonical_twists());
    j["crossing_number"] = integer_json(t.crossing_number());
    j["connectivity"] = connectivity(t.fraction());
    const std::optional<Fraction> cf = diagram_fraction(t);
    j["coloring_fraction"] = cf ? Json(to_string(*cf)) : Json(nullptr);
    j["numerator"] = link_json(n, &on);
    j["denominator"] = link_json(d, &od);
    out.write(j.dump(-1, ' ', false, Json::error_handler_t::replace));
    out.write("\n");
    return;
  }
  const auto line = [&](std::string_view label, const std::string& value) {
    out.print("{:<20}{}\n", label, value);
  };
  line("tangle", input);
  line("fraction", to_string(t.fraction()));
  if (t.has_given_twists()) line("twists (given)", to_string(t.twists()));
  line("twists (canonical)", to_string(t.canonical_twists()) + "  (Kauffman-Lambropoulou form)");
  line("crossing number", t.crossing_number().str());
  line("connectivity", connectivity_text(t.fraction()));
  if (const std::optional<Fraction> cf = diagram_fraction(t)) {
    line("coloring fraction", to_string(*cf) + (*cf == t.fraction() ? "  (from the diagram's end colors: agrees)"
                                                                    : "  (from the diagram's end colors: DISAGREES)"));
  }
  out.write("numerator closure N(T)\n");
  print_link(n, &on, "  ");
  out.write("denominator closure D(T)\n");
  print_link(d, &od, "  ");
}

void show_sum(const std::string& input, const TangleSum& s, bool json) {
  Output& out = Output::get();
  Json j;
  j["input"] = input;
  Json parts = Json::array();
  for (const RationalTangle& t : s.summands()) {
    parts.push_back({{"tangle", to_string(t)}, {"fraction", to_string(t.fraction())}});
  }
  j["summands"] = parts;
  j["rational_parts"] = s.rational_parts();
  for (Closure c : {Closure::numerator, Closure::denominator}) {
    const std::optional<TwoBridgeLink> l = s.closure_two_bridge(c);
    Json k;
    if (l) {
      k = link_json(*l, nullptr);
      k["two_bridge"] = true;
    } else {
      k["two_bridge"] = false;
      k["components"] = s.components(c);
      k["determinant"] = integer_json(s.determinant(c));
    }
    j[std::string(to_string(c))] = k;
  }
  if (json) {
    out.write(j.dump(-1, ' ', false, Json::error_handler_t::replace));
    out.write("\n");
    return;
  }
  const auto line = [&](std::string_view label, const std::string& value) {
    out.print("{:<20}{}\n", label, value);
  };
  line("tangle sum", input);
  for (std::size_t k = 0; k < s.summands().size(); ++k) {
    const RationalTangle& t = s.summands()[k];
    line(fmt::format("summand {}", k + 1),
         t.has_given_twists() ? to_string(t) + "  (fraction " + to_string(t.fraction()) + ")"
                              : to_string(t.fraction()));
  }
  line("non-integer parts", std::to_string(s.rational_parts()) +
                                (s.rational_parts() >= 3 ? "  (a Montesinos tangle)" : ""));
  for (Closure c : {Closure::numerator, Closure::denominator}) {
    out.write(c == Closure::numerator ? "numerator closure N(T)\n" : "denominator closure D(T)\n");
    if (const std::optional<TwoBridgeLink> l = s.closure_two_bridge(c)) {
      print_link(*l, nullptr, "  ");
    } else {
      out.print("  {:<18}{}\n", "2-bridge", "no (not a 2-bridge link in general)");
      out.print("  {:<18}{}\n", "components", s.components(c));
      out.print("  {:<18}{}\n", "determinant", s.determinant(c).str());
      out.print("  {:<18}{}\n", "3-colorable", yes_no(s.determinant(c) % 3 == 0));
    }
  }
}

void run(const Options& o) {
  const std::vector<std::string> groups = group_words(o.words);
  if (groups.size() != 1) {
    throw Error("show takes one tangle, got " + std::to_string(groups.size()) +
                " (quote a tangle with spaces: fourplat show '[2 1 1 2]')");
  }
  const std::string& input = groups.front();
  const TangleSum s = read_tangle_sum(input);
  if (s.summands().size() == 1) {
    show_rational(input, s.summands().front(), o.json);
  } else if (const auto t = s.as_rational()) {
    show_rational(input, *t, o.json);  // integer summands fold in: a rational tangle
  } else {
    show_sum(input, s, o.json);
  }
}

void setup(CLI::App& app) {
  auto o = std::make_shared<Options>();
  app.add_option("TANGLE", o->words, "the tangle: P/Q, N, inf, [a1 ... an], or a sum T1 + T2 + ...")
      ->required();
  app.add_flag("-j,--json", o->json, "one JSON object instead of the labelled lines");
  app.footer(
      "Shows the fraction, the given and canonical twist sequences, the crossing number and the\n"
      "connectivity of the tangle, and for both closures N(T) and D(T): the Schubert form b(p,q),\n"
      "the canonical forms (unoriented, up to mirror image, oriented), components, determinant,\n"
      "crossing number, chirality, kind and 3-colorability.\n"
      "\n"
      "Examples:\n"
      "  fourplat show 5/2              the figure-eight knot is N(5/2)\n"
      "  fourplat show '[2 1 1 2]'\n"
      "  fourplat show '3/5 + 2/7'      a sum of two rational tangles\n"
      "  fourplat show 13/5 --json");
  app.callback([o] { run(*o); });
}

const Registration reg{{"show", "everything about one tangle and its two closures", setup}};

}  // namespace
}  // namespace fourplat::app
