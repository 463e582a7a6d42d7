// fourplat enumerate — every 2-bridge class (or rational tangle) with the given crossing numbers,
// each exactly once, streamed as JSON lines, CSV or a table; --shard I/N for array jobs.
#include <optional>
#include <string>

#include "command.hpp"
#include "fields.hpp"
#include "fourplat/counts.hpp"
#include "fourplat/enumerate.hpp"
#include "fourplat/error.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

constexpr const char* kLinkFields = "crossing_number,p,q,canonical,components,amphichiral";
constexpr const char* kTangleFields = "fraction,twists,tangle_crossings,closure";

struct Options {
  std::string crossings;
  bool knots = false, links = false, mirrors = false, oriented = false, tangles = false;
  std::string shard;
  ListingOptions listing;
};

void run(const Options& o) {
  if (o.listing.list_fields) {
    Output::get().write(fields_help());
    return;
  }
  if (o.crossings.empty()) throw Error("enumerate needs --crossings N or --crossings A..B");
  const auto [lo, hi] = parse_crossing_range(o.crossings, "--crossings");
  if (hi > kMaxEnumerationCrossings) {
    throw LimitError("enumerate lists up to " + std::to_string(kMaxEnumerationCrossings) +
                     " crossings (beyond, the list has more than 2^85 members and p exceeds a "
                     "machine word): use 'fourplat count' or 'fourplat family sample'");
  }
  if (o.knots && o.links) throw Error("--knots and --links exclude each other (give neither for both)");
  if (o.tangles && (o.knots || o.links || o.mirrors || o.oriented)) {
    throw Error("--tangles lists every fraction: --knots, --links, --mirrors and --oriented do not apply");
  }
  // Everything is checked before the first row, so a bad option never leaves partial output.
  const Shard shard = o.shard.empty() ? Shard{} : parse_shard(o.shard);
  RowWriter writer(o.listing, select_fields(o.listing.fields, o.tangles ? kTangleFields : kLinkFields),
                   make_context(o.listing));
  writer.filters = make_filters(o.listing, std::nullopt);
  InterruptGuard guard;
  ProgressBar bar("enumerate");
  // One Row is reused for every item; the sink returns false once Ctrl-C was pressed, which
  // stops the walk after a complete line.
  Row row;
  const int a = static_cast<int>(lo), b = static_cast<int>(hi);
  if (o.tangles) {
    TangleEnumerationOptions t;
    t.twists = writer.needs_twists();
    t.shard = shard;
    auto progress = [&](double f) { bar.update(f); };
    if (bar.enabled()) t.progress = progress;
    for_each_rational_tangle(a, b, t, [&](const EnumeratedTangle& x) {
      row.set_tangle(Integer(x.p), Integer(x.q), x.crossings);
      row.twists.assign(x.twists.begin(), x.twists.end());
      row.has_twists = t.twists;
      return writer.write(row);
    });
  } else {
    // The component filter runs inside the walk (cheaper than a row filter).
    EnumerationOptions e;
    e.components = o.knots ? ComponentFilter::knots : o.links ? ComponentFilter::links : ComponentFilter::both;
    e.mirrors = o.mirrors;
    e.oriented = o.oriented;
    e.twists = writer.needs_twists();
    e.shard = shard;
    auto progress = [&](double f) { bar.update(f); };
    if (bar.enabled()) e.progress = progress;
    for_each_two_bridge(a, b, e, [&](const EnumeratedLink& it) {
      row.set(it, o.oriented);
      return writer.write(row);
    });
  }
  writer.finish();
  InterruptGuard::exit_if_interrupted();
}

void setup(CLI::App& app) {
  auto o = std::make_shared<Options>();
  app.description(
      "List every 2-bridge knot and link with the given crossing numbers, each class exactly once\n"
      "(Schubert's classification; a knot and its mirror image once unless --mirrors), or with\n"
      "--tangles every rational tangle. Rows stream in a fixed order; --shard I/N selects part I\n"
      "of N equal parts (1 ≤ I ≤ N) whose union is the whole list, for cluster array jobs.\n"
      "\n"
      "Examples:\n"
      "  fourplat enumerate --crossings 7                      the 7 knots (and 3 links) of 7 crossings\n"
      "  fourplat enumerate --crossings 3..10 --knots --format table\n"
      "  fourplat enumerate --crossings 8 --links --oriented --mirrors --fields canonical,fraction\n"
      "  fourplat enumerate --crossings 12 --knots --colorable 3 --count\n"
      "  fourplat enumerate --crossings 24 --shard 3/16 > part3.jsonl\n"
      "  fourplat enumerate --tangles --crossings 4 --fields fraction,twists\n"
      "  fourplat enumerate --list-fields");
  app.add_option("--crossings", o->crossings, "crossing number N or range A..B (0 … 89)");
  app.add_flag("--knots", o->knots, "knots only (p odd)");
  app.add_flag("--links", o->links, "two-component links only (p even)");
  app.add_flag("--mirrors", o->mirrors, "list a chiral class and its mirror image separately");
  app.add_flag("--oriented", o->oriented, "oriented classes (Schubert mod 2p): links may give two rows");
  app.add_flag("--tangles", o->tangles, "rational tangles instead: every fraction once");
  app.add_option("--shard", o->shard, "part I of N (1 ≤ I ≤ N)");
  add_listing_options(app, o->listing);
  app.callback([o] { run(*o); });
}

const Registration reg{{"enumerate", "every 2-bridge class (or rational tangle) of given crossing numbers", setup}};

}  // namespace
}  // namespace fourplat::app
