// fourplat pd — invariants of a PD code from anywhere (pd.hpp): components, writhe, linking
// number, determinant and Fox colorings, computed from the diagram alone.
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "command.hpp"
#include "fourplat/pd.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

struct Options {
  std::string file;
  std::string modulus;
  bool json = false;
};

void run(const Options& o) {
  const std::string text = read_file_or_stdin(o.file);
  PdCode code;
  try {
    code = parse_pd(text);
  } catch (const ParseError& e) {
    throw ParseError(e.position(), "bad PD code in " + (o.file == "-" ? std::string("standard input") : quoted(o.file)) +
                                       ": " + e.what());
  }
  const PdDiagram d(std::move(code));
  std::optional<Integer> n;
  if (!o.modulus.empty()) n = read_modulus(o.modulus);
  const auto lk = d.linking_number();
  const Integer det = d.determinant();

  Output& out = Output::get();
  if (o.json) {
    Json j;
    j["crossings"] = d.crossing_count();
    j["components"] = d.components();
    j["writhe"] = d.writhe();
    j["linking_number"] = lk ? Json(*lk) : Json(nullptr);
    j["determinant"] = integer_json(det);
    Json factors = Json::array();
    for (const Integer& f : d.invariant_factors()) factors.push_back(integer_json(f));
    j["invariant_factors"] = factors;
    j["pieces"] = d.pieces();
    j["signs"] = d.signs();
    j["arcs"] = d.arcs();
    if (n) {
      j["modulus"] = integer_json(*n);
      j["colorings"] = integer_json(d.coloring_count(*n));
      const auto w = d.coloring_witness(*n);
      if (w) {
        Json c = Json::array();
        for (const Integer& x : *w) c.push_back(integer_json(x));
        j["coloring"] = c;
      } else {
        j["coloring"] = nullptr;
      }
    }
    out.write(j.dump(-1, ' ', false, Json::error_handler_t::replace));
    out.write("\n");
    return;
  }
  const auto line = [&](std::string_view label, const std::string& value) {
    out.print("{:<18}{}\n", label, value);
  };
  line("crossings", std::to_string(d.crossing_count()));
  line("components", std::to_string(d.components()));
  line("writhe", std::to_string(d.writhe()));
  if (lk) line("linking number", std::to_string(*lk));
  line("determinant", det.str());
  if (d.pieces() > 1) line("pieces", std::to_string(d.pieces()) + " (a split diagram)");
  if (n) {
    const Integer count = d.coloring_count(*n);
    line(fmt::format("{}-colorings", n->str()),
         count.str() + (count > *n ? "  (colorable)" : "  (only the constant ones)"));
    if (const auto w = d.coloring_witness(*n)) {
      std::string colors;
      for (const Integer& x : *w) colors += (colors.empty() ? "" : " ") + x.str();
      line("witness", colors + "  (one color per arc, arcs by first edge)");
    }
  }
}

void setup(CLI::App& app) {
  auto o = std::make_shared<Options>();
  app.add_option("FILE", o->file, "a file with a PD code, or - for standard input")->required();
  app.add_option("-n,--modulus", o->modulus, "also count Fox N-colorings, with a witness")->option_text("N");
  app.add_flag("-j,--json", o->json, "one JSON object (keys: docs/tool.md)");
  app.footer(
      "Reads a PD code in any of the forms: X[1,4,2,5] X[3,6,4,1] X[5,2,6,3] (X or x, spaces,\n"
      "commas or new lines between items), a list [[1,4,2,5],[3,6,4,1],[5,2,6,3]], or four labels\n"
      "a line; '#' starts a comment. The code is validated (each label twice, labels consecutive\n"
      "along components, planar by Euler's formula) and the invariants come from the diagram\n"
      "alone: the determinant and colorings from the Smith form of the coloring matrix.\n"
      "\n"
      "Examples:\n"
      "  echo 'X[1,4,2,5] X[3,6,4,1] X[5,2,6,3]' | fourplat pd -\n"
      "  fourplat diagram '[2 1 1 2]' | fourplat pd - --modulus 13 --json\n"
      "  fourplat pd knot.pd --json");
  app.callback([o] { run(*o); });
}

const Registration reg{{"pd", "invariants of a PD code read from a file or stdin", setup}};

}  // namespace
}  // namespace fourplat::app
