// fourplat diagram — the standard diagram of a tangle or of a closure, as a PD, DT or Gauss code
// or as an SVG drawing (diagram.hpp, svg.hpp), with an optional Fox coloring.
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "command.hpp"
#include "fourplat/coloring.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/parse.hpp"
#include "fourplat/svg.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

struct Options {
  std::vector<std::string> words;
  std::string format = "pd";
  std::string closure = "numerator";
  std::string coloring;  // modulus, empty for none
  std::string output;
  std::string title;
  bool json = false;
  bool canonical = false;
  bool arrows = false;
  bool crossing_numbers = false;
  bool end_names = false;
};

DiagramClosure closure_of(const std::string& name) {
  if (name == "none") return DiagramClosure::none;
  return diagram_closure(parse_closure(name));
}

/// What a crossingless closure is, for the one-line comment that stands for an empty code.
std::string crossingless_name(const Diagram& d) {
  if (!d.is_closed()) return "an open tangle with no crossings";
  if (d.components() == 1) return "the unknot";
  if (d.components() == 2) return "the two-component unlink";
  return "the " + std::to_string(d.components()) + "-component unlink";
}

Json pd_json(const PdCode& pd) {
  Json a = Json::array();
  for (const auto& x : pd) a.push_back({x[0], x[1], x[2], x[3]});
  return a;
}

void run(const Options& o) {
  const std::vector<std::string> groups = group_words(o.words);
  if (groups.size() != 1) throw Error("diagram takes one tangle, got " + std::to_string(groups.size()));
  const std::string& input = groups.front();
  const TangleSum s = read_tangle_sum(input);
  const DiagramClosure closure = closure_of(o.closure);
  if (o.json && o.format == "svg") throw Error("--json goes with --format pd, dt or gauss, not svg");
  const Diagram d = draw_diagram(s, closure, o.canonical);

  std::optional<Integer> modulus;
  std::optional<std::vector<Integer>> colors;
  if (!o.coloring.empty()) {
    if (!d.is_closed()) throw DomainError("--coloring needs a closure (numerator or denominator), not none");
    modulus = read_modulus(o.coloring);
    colors = diagram_witness(s, d, *modulus);
    if (!colors && o.format == "svg") {
      throw DomainError(fmt::format("{} has no non-constant {}-coloring (its determinant is {})",
                                    crossingless_name(d) == "the unknot" ? "the unknot" : "this closure",
                                    modulus->str(), determinant(d).str()));
    }
  }

  const bool knot = d.is_closed() && d.components() == 1;
  std::string text;
  if (o.json) {
    Json j;
    j["input"] = input;
    j["closure"] = to_string(closure);
    j["diagram"] = drawn_twists(s, o.canonical);
    j["pd"] = pd_json(d.pd_code());
    j["components"] = d.components();
    j["crossings"] = d.crossing_count();
    j["writhe"] = d.writhe();
    j["signs"] = d.signs();
    const auto lk = d.linking_number();
    j["linking_number"] = lk ? Json(*lk) : Json(nullptr);
    Json arcs = Json::array();
    for (const Arc& a : d.arcs()) arcs.push_back(a.edges);
    j["arcs"] = arcs;
    j["crossingless_components"] = d.crossingless_components();
    j["dt"] = knot ? Json(d.dt_code()) : Json(nullptr);
    const GaussCode g = d.gauss_code();
    j["gauss"] = {{"components", g.components}, {"signs", g.signs}};
    if (modulus) {
      j["modulus"] = integer_json(*modulus);
      if (colors) {
        Json c = Json::array();
        for (const Integer& x : *colors) c.push_back(integer_json(x));
        j["coloring"] = c;
      } else {
        j["coloring"] = nullptr;
      }
    }
    text = j.dump(-1, ' ', false, Json::error_handler_t::replace) + "\n";
  } else if (o.format == "pd") {
    if (d.crossing_count() == 0) {
      text = "# no crossings: " + crossingless_name(d) + "\n";
    } else {
      text = to_string(d.pd_code()) + "\n";
      if (d.crossingless_components() > 0) {
        text += fmt::format("# and {} crossingless component(s), which a PD code cannot list\n",
                            d.crossingless_components());
      }
    }
  } else if (o.format == "dt") {
    if (!knot) {
      throw DomainError(fmt::format("a DT code is for knots; this {} has {} components",
                                    d.is_closed() ? "closure" : "open tangle", d.components()));
    }
    if (d.crossing_count() == 0) {
      text = "# no crossings: the unknot\n";
    } else {
      const std::vector<std::int64_t> dt = d.dt_code();
      text = fmt::format("{}\n", fmt::join(dt, " "));
    }
  } else if (o.format == "gauss") {
    const GaussCode g = d.gauss_code();
    for (const auto& comp : g.components) text += fmt::format("{}\n", fmt::join(comp, " "));
    text += "signs:";
    for (int sign : g.signs) text += sign > 0 ? " +" : " -";
    text += "\n";
  } else {  // svg
    SvgOptions opt;
    opt.arrows = o.arrows;
    opt.crossing_numbers = o.crossing_numbers;
    opt.end_names = o.end_names;
    opt.title = o.title;
    if (colors) {
      opt.coloring = *colors;
      opt.modulus = *modulus;
    }
    text = svg(d, opt);
  }
  write_file_or_stdout(o.output, text);
}

void setup(CLI::App& app) {
  auto o = std::make_shared<Options>();
  app.add_option("TANGLE", o->words, "the tangle: P/Q, N, inf, [a1 ... an], or a sum T1 + T2 + ...")
      ->required();
  app.add_option("-f,--format", o->format, "pd (the default), dt (knots), gauss, or svg")
      ->check(CLI::IsMember({"pd", "dt", "gauss", "svg"}))
      ->option_text("pd|dt|gauss|svg");
  app.add_option("-c,--closure", o->closure,
                 "numerator N(T) (the default), denominator D(T), or none (the open tangle)")
      ->check(CLI::IsMember({"numerator", "denominator", "none"}))
      ->option_text("numerator|denominator|none");
  app.add_option("--coloring", o->coloring,
                 "add a non-constant Fox N-coloring (svg: drawn; --json: the \"coloring\" key)")
      ->option_text("N");
  app.add_option("-o,--output", o->output, "write to FILE instead of standard output")->option_text("FILE");
  app.add_flag("-j,--json", o->json,
               "one JSON object with pd, components, crossings, writhe, arcs, ... (docs/tool.md)");
  app.add_flag("--canonical", o->canonical, "draw the canonical twist sequence, not the one given");
  app.add_flag("--arrows", o->arrows, "svg: orientation arrows on every edge");
  app.add_flag("--crossing-numbers", o->crossing_numbers, "svg: number every crossing");
  app.add_flag("--end-names", o->end_names, "svg: name the ends NW NE SW SE (with --closure none)");
  app.add_option("--title", o->title, "svg: the drawing's title")->option_text("TEXT");
  app.footer(
      "The standard diagram of the tangle as written: its twist sequence box by box (Conway's\n"
      "order), a fraction by its canonical sequence, a sum summand by summand left to right.\n"
      "Edges are numbered along each oriented component (orientation rule: docs/conventions.md);\n"
      "PD items X[i,j,k,l] start at the incoming under-edge and run counterclockwise.\n"
      "The arcs in --json are the Fox arcs that `fourplat colorings --json` colors, in order.\n"
      "\n"
      "Examples:\n"
      "  fourplat diagram '[3]'                      PD code of the right-handed trefoil\n"
      "  fourplat diagram 5/2 --format dt\n"
      "  fourplat diagram '[2 1 2]' --json --coloring 3\n"
      "  fourplat diagram '[2 1 2]' --format svg --coloring 3 -o knot.svg\n"
      "  fourplat diagram '[3 2]' --closure none --format svg --end-names -o tangle.svg");
  app.callback([o] { run(*o); });
}

const Registration reg{{"diagram", "the standard diagram: PD, DT, Gauss code or SVG drawing", setup}};

}  // namespace
}  // namespace fourplat::app
