// fourplat compare — are two tangles isotopic; are their closures the same link (unoriented,
// oriented, up to mirror image)? The answer is in the output, never in the exit status.
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "command.hpp"
#include "fourplat/algebraic.hpp"
#include "fourplat/parse.hpp"
#include "fourplat/two_bridge.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

struct Options {
  std::vector<std::string> words;
  Closure closure = Closure::numerator;
  bool json = false;
};

/// A yes/no/unknown answer.
using Answer = std::optional<bool>;

Json answer_json(Answer a) { return a ? Json(*a) : Json(nullptr); }
std::string answer_text(Answer a) { return a ? (*a ? "yes" : "no") : "unknown"; }

void run(const Options& o) {
  const std::vector<std::string> groups = group_words(o.words);
  if (groups.size() != 2) {
    throw Error("compare takes two tangles, got " + std::to_string(groups.size()) +
                " (quote a tangle with spaces: fourplat compare '[2 2]' 5/2)");
  }
  const TangleSum a = read_tangle_sum(groups[0]), b = read_tangle_sum(groups[1]);
  const std::optional<RationalTangle> ra = a.as_rational(), rb = b.as_rational();

  // Tangles: Conway's theorem for rational ones; a sum of two or more non-integer rational
  // tangles is never rational, so it differs from every rational tangle; two such sums: unknown.
  Answer tangles;
  if (ra && rb) tangles = *ra == *rb;
  else if (ra || rb) tangles = false;

  const std::optional<TwoBridgeLink> la = a.closure_two_bridge(o.closure), lb = b.closure_two_bridge(o.closure);
  Answer same, mirror, oriented;
  if (la && lb) {
    same = same_link(*la, *lb);
    mirror = same_up_to_mirror(*la, *lb);
  } else if (a.determinant(o.closure) != b.determinant(o.closure) ||
             a.components(o.closure) != b.components(o.closure)) {
    same = mirror = false;  // invariants differ (determinant and components ignore mirrors)
  }
  if (ra && rb) {
    oriented = same_oriented_link(oriented_closure(*ra, o.closure), oriented_closure(*rb, o.closure));
  } else if (same && !*same) {
    oriented = false;
  }

  const auto closure_name = [&](const std::optional<TwoBridgeLink>& l) {
    return l ? Json(to_string(*l)) : Json(nullptr);
  };
  Output& out = Output::get();
  if (o.json) {
    Json j;
    j["a"] = groups[0];
    j["b"] = groups[1];
    j["closure"] = std::string(to_string(o.closure));
    j["tangles_equal"] = answer_json(tangles);
    j["closures_equal"] = answer_json(same);
    j["closures_equal_up_to_mirror"] = answer_json(mirror);
    j["closures_equal_oriented"] = answer_json(oriented);
    j["a_fraction"] = ra ? Json(to_string(ra->fraction())) : Json(nullptr);
    j["b_fraction"] = rb ? Json(to_string(rb->fraction())) : Json(nullptr);
    j["a_closure"] = closure_name(la);
    j["b_closure"] = closure_name(lb);
    out.write(j.dump(-1, ' ', false, Json::error_handler_t::replace));
    out.write("\n");
    return;
  }
  const char c = o.closure == Closure::numerator ? 'N' : 'D';
  const auto describe = [&](char name, const std::string& text, const std::optional<RationalTangle>& r,
                            const std::optional<TwoBridgeLink>& l, const TangleSum& s) {
    std::string d = text;
    if (r && to_string(r->fraction()) != text) d += " = " + to_string(r->fraction());
    d += fmt::format(", {}({}) = ", c, name);
    d += l ? to_string(*l) : fmt::format("a closure with determinant {}", s.determinant(o.closure).str());
    return d;
  };
  out.print("A: {}\n", describe('A', groups[0], ra, la, a));
  out.print("B: {}\n", describe('B', groups[1], rb, lb, b));
  out.print("{:<34}{}\n", "tangles isotopic", answer_text(tangles));
  out.print("{:<34}{}\n", fmt::format("{}(A), {}(B) the same link", c, c), answer_text(same));
  out.print("{:<34}{}\n", "the same up to mirror image", answer_text(mirror));
  out.print("{:<34}{}\n", "the same as oriented links", answer_text(oriented));
}

void setup(CLI::App& app) {
  auto o = std::make_shared<Options>();
  app.add_option("A-and-B", o->words, "the two tangles A and B (P/Q, N, inf, [a1 ... an], or sums)")->required();
  add_closure_option(app, o->closure);
  app.add_flag("-j,--json", o->json, "one JSON object (keys: docs/tool.md)");
  app.footer(
      "Tangles are compared by Conway's theorem (equal fractions), closures by Schubert's\n"
      "classification of 2-bridge links: unoriented, oriented (q mod 2p) and up to mirror image.\n"
      "For sums that do not close to a 2-bridge link the answer is \"no\" when the determinants or\n"
      "components differ and \"unknown\" (JSON null) otherwise. The exit status is 0 whatever the\n"
      "answer; 2 for bad input.\n"
      "\n"
      "Examples:\n"
      "  fourplat compare 7/2 7/4           different tangles, the same knot b(7,2) = b(7,4)\n"
      "  fourplat compare '[3 2]' 7/3       the same tangle\n"
      "  fourplat compare 5/2 -5/2          the figure-eight knot is its own mirror image\n"
      "  fourplat compare 3 -3 --json       the two trefoils");
  app.callback([o] { run(*o); });
}

const Registration reg{{"compare", "are two tangles, or their closures, the same?", setup}};

}  // namespace
}  // namespace fourplat::app
