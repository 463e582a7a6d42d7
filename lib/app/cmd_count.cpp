// fourplat count — how many 2-bridge knots and links have crossing number N, by the closed
// formulas of counts.hpp (Ernst–Sumners 1987 for knots; the rest derived in docs/enumeration.md),
// for any N; --by-enumeration walks the lists instead, as a cross-check.
#include <algorithm>
#include <array>
#include <string>

#include "command.hpp"
#include "fields.hpp"
#include "fourplat/counts.hpp"
#include "fourplat/enumerate.hpp"
#include "fourplat/error.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

struct Options {
  std::string crossings;
  bool json = false;
  bool by_enumeration = false;
};

// The counts by walking the lists: one walk per classification.
TwoBridgeCounts count_by_walking(int n) {
  TwoBridgeCounts c;
  c.crossings = n;
  Integer z = 0;
  c.knots = c.knots_with_mirrors = c.links = c.links_with_mirrors = c.links_oriented =
      c.links_oriented_with_mirrors = c.amphichiral_knots = c.amphichiral_links = z;
  for (const bool mir : {false, true}) {
    for (const bool ori : {false, true}) {
      EnumerationOptions o;
      o.mirrors = mir;
      o.oriented = ori;
      std::uint64_t knots = 0, links = 0, amph_k = 0, amph_l = 0;
      for_each_two_bridge(n, n, o, [&](const EnumeratedLink& it) {
        (it.components == 1 ? knots : links) += 1;
        if (it.amphichiral) (it.components == 1 ? amph_k : amph_l) += 1;
        return !InterruptGuard::interrupted();
      });
      // Amphichiral classes are their own mirror images: the walk up to mirror counts them.
      if (!ori) {
        (mir ? c.knots_with_mirrors : c.knots) = knots;
        (mir ? c.links_with_mirrors : c.links) = links;
        if (!mir) {
          c.amphichiral_knots = amph_k;
          c.amphichiral_links = amph_l;
        }
      } else {
        (mir ? c.links_oriented_with_mirrors : c.links_oriented) = links;
      }
    }
  }
  std::uint64_t tangles = 0;
  for_each_rational_tangle(n, n, TangleEnumerationOptions{}, [&](const EnumeratedTangle&) {
    ++tangles;
    return !InterruptGuard::interrupted();
  });
  c.rational_tangles = tangles;
  return c;
}

void run(const Options& o) {
  if (o.crossings.empty()) throw Error("count needs --crossings N or --crossings A..B");
  const auto [lo, hi] = parse_crossing_range(o.crossings, "--crossings");
  if (o.by_enumeration && hi > 32) {
    throw LimitError("--by-enumeration walks up to 32 crossings here (the lists double with each "
                     "crossing); the formulas answer any n");
  }
  InterruptGuard guard;
  Output& out = Output::get();
  const std::array<const char*, 10> keys{"crossings", "knots", "links", "knots_with_mirrors",
                                         "links_oriented", "links_with_mirrors",
                                         "links_oriented_with_mirrors", "amphichiral_knots",
                                         "amphichiral_links", "rational_tangles"};
  // The text table has the JSON keys as its header; a column is as wide as its key or its
  // widest value (big values are allowed to push the row).
  const auto width = [&](std::size_t i) { return std::max<std::size_t>(std::string(keys[i]).size(), 6); };
  if (!o.json) {
    for (std::size_t i = 0; i < keys.size(); ++i) out.print("{}{:>{}}", i ? "  " : "", keys[i], width(i));
    out.write("\n");
  }
  // Key order of the JSON objects: the fixed keys first, then the additions.
  for (std::int64_t n = lo; n <= hi; ++n) {
    const TwoBridgeCounts c = o.by_enumeration ? count_by_walking(static_cast<int>(n)) : count_two_bridge(n);
    const std::array<const Integer*, 9> v{&c.knots, &c.links, &c.knots_with_mirrors, &c.links_oriented,
                                          &c.links_with_mirrors, &c.links_oriented_with_mirrors,
                                          &c.amphichiral_knots, &c.amphichiral_links, &c.rational_tangles};
    if (o.json) {
      Json j;
      j[keys[0]] = n;
      for (std::size_t i = 0; i < v.size(); ++i) j[keys[i + 1]] = integer_json(*v[i]);
      out.write(j.dump());
      out.write("\n");
    } else {
      out.print("{:>{}}", n, width(0));
      for (std::size_t i = 0; i < v.size(); ++i) out.print("  {:>{}}", v[i]->str(), width(i + 1));
      out.write("\n");
    }
    if (InterruptGuard::interrupted()) break;
  }
  out.flush();
  InterruptGuard::exit_if_interrupted();
}

void setup(CLI::App& app) {
  auto o = std::make_shared<Options>();
  app.description(
      "Count the 2-bridge knots and two-component links with crossing number N, exactly, for any\n"
      "N up to 10^8, by closed formulas (knots: Ernst–Sumners 1987; the others derived in\n"
      "docs/enumeration.md). 'knots' and 'links' count a chiral class and its mirror image once\n"
      "and links unoriented; the *_with_mirrors columns count mirror images separately; the\n"
      "oriented columns count Schubert's oriented classes (mod 2p) of links. Crossing number 0\n"
      "counts the unknot and the unlink.\n"
      "\n"
      "Examples:\n"
      "  fourplat count --crossings 3..12\n"
      "  fourplat count --crossings 10000 --json          a 3000-digit answer, in milliseconds\n"
      "  fourplat count --crossings 3..16 --by-enumeration   the same numbers by walking the lists");
  app.add_option("--crossings", o->crossings, "crossing number N or range A..B");
  app.add_flag("--json", o->json, "one JSON object per crossing number (big numbers as strings)");
  app.add_flag("--by-enumeration", o->by_enumeration, "count by walking the lists (up to 32 crossings)");
  app.callback([o] { run(*o); });
}

const Registration reg{{"count", "how many 2-bridge knots and links of each crossing number", setup}};

}  // namespace
}  // namespace fourplat::app
