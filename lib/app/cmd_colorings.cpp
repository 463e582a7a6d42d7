// fourplat colorings — the number of Fox n-colorings of a closure and a non-constant witness on
// the arcs of its standard diagram (the same diagram, and so the same arcs, that `fourplat diagram`
// prints for the same tangle and closure).
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "command.hpp"
#include "fourplat/coloring.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/parse.hpp"
#include "fourplat/two_bridge.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

struct Options {
  std::vector<std::string> words;
  Closure closure = Closure::numerator;
  std::string modulus;
  bool json = false;
  bool canonical = false;
};

void run(const Options& o) {
  const std::vector<std::string> groups = group_words(o.words);
  if (groups.size() != 1) throw Error("colorings takes one tangle, got " + std::to_string(groups.size()));
  const std::string& input = groups.front();
  const TangleSum s = read_tangle_sum(input);
  const Integer n = read_modulus(o.modulus);

  // The count: n·gcd(n, p) for a 2-bridge closure (coloring.hpp); the Smith form of the
  // diagram's coloring matrix otherwise.
  const std::optional<TwoBridgeLink> link = s.closure_two_bridge(o.closure);
  const Integer crossings = diagram_crossings(s, o.canonical);
  const bool drawable = crossings <= kMaxToolCrossings;
  std::optional<Diagram> d;
  if (drawable) d = draw_diagram(s, diagram_closure(o.closure), o.canonical);

  Integer count;
  if (link) {
    count = coloring_count(*link, n);
  } else if (d) {
    count = coloring_count(*d, n);
  } else {
    throw LimitError("this sum's diagram has " + crossings.str() + " crossings; the tool counts "
                     "colorings of sums with at most " + std::to_string(kMaxToolCrossings));
  }
  // The witness: integer propagation through one rational tangle's diagram (Kauffman–
  // Lambropoulou), the Smith form for a sum.
  std::optional<std::vector<Integer>> witness;
  if (d) witness = diagram_witness(s, *d, n);
  const Integer determinant = link ? link->determinant() : s.determinant(o.closure);
  const bool colorable = count > n;  // more than the n constant colorings

  Output& out = Output::get();
  if (o.json) {
    Json j;
    j["input"] = input;
    j["closure"] = std::string(to_string(o.closure));
    j["modulus"] = integer_json(n);
    j["count"] = integer_json(count);
    j["colorable"] = colorable;
    if (witness) {
      Json colors = Json::array();
      for (const Integer& c : *witness) colors.push_back(integer_json(c));
      j["coloring"] = colors;
    } else {
      j["coloring"] = nullptr;
    }
    j["coloring_omitted"] = !drawable;
    j["diagram"] = drawn_twists(s, o.canonical);
    j["crossings"] = integer_json(crossings);
    j["arcs"] = d ? Json(d->arcs().size()) : Json(nullptr);
    j["determinant"] = integer_json(determinant);
    j["link"] = link ? Json(to_string(*link)) : Json(nullptr);
    out.write(j.dump(-1, ' ', false, Json::error_handler_t::replace));
    out.write("\n");
    return;
  }
  const char c = o.closure == Closure::numerator ? 'N' : 'D';
  out.print("{}({}){}: {} Fox {}-colorings ({} constant); {}\n", c, input,
            link ? " = " + to_string(*link) : std::string(), count.str(), n.str(), n.str(),
            colorable ? "colorable" : "not colorable (only the constant colorings)");
  if (witness) {
    out.print("witness on the {} arcs of the diagram {}:", d->arcs().size(), drawn_twists(s, o.canonical));
    for (const Integer& x : *witness) out.print(" {}", x.str());
    out.write("\n");
  } else if (!drawable && colorable) {
    out.print("witness omitted: the diagram has {} crossings (at most {} are drawn)\n", crossings.str(),
              kMaxToolCrossings);
  }
}

void setup(CLI::App& app) {
  auto o = std::make_shared<Options>();
  app.add_option("TANGLE", o->words, "the tangle: P/Q, N, inf, [a1 ... an], or a sum T1 + T2 + ...")
      ->required();
  app.add_option("-n,--modulus", o->modulus, "count colorings with colors mod N (N >= 1, any size)")
      ->required()
      ->option_text("N");
  add_closure_option(app, o->closure);
  app.add_flag("--canonical", o->canonical,
               "use the diagram of the canonical twist sequence, not the one given");
  app.add_flag("-j,--json", o->json, "one JSON object (keys: docs/tool.md)");
  app.footer(
      "A Fox n-coloring gives every arc of the diagram a color mod n so that at each crossing\n"
      "2 * over = under + under (mod n). The count includes the n constant colorings; for b(p,q)\n"
      "it is n * gcd(n, p). The witness is a non-constant coloring, one color per arc of the\n"
      "standard diagram of the tangle as written, in the order `fourplat diagram --json` lists\n"
      "the arcs; there is none when only the constant colorings exist.\n"
      "\n"
      "Examples:\n"
      "  fourplat colorings '[3]' --modulus 3         the trefoil: 9 colorings\n"
      "  fourplat colorings 5/2 -n 5 --json           the figure-eight knot is 5-colorable\n"
      "  fourplat colorings '[2 1 1 2]' -n 13 --canonical");
  app.callback([o] { run(*o); });
}

const Registration reg{{"colorings", "Fox n-colorings of a closure: the count and a witness", setup}};

}  // namespace
}  // namespace fourplat::app
