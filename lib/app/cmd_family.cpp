// fourplat family — families of 2-bridge links for experiments (twist knots, T(2,n), double
// twists, patterns with ranges) and exactly uniform random samples of links and tangles.
#include <algorithm>
#include <memory>
#include <optional>
#include <set>
#include <string>
#include <utility>

#include "command.hpp"
#include "fields.hpp"
#include "fourplat/continued_fraction.hpp"
#include "fourplat/counts.hpp"
#include "fourplat/error.hpp"
#include "fourplat/families.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

constexpr const char* kFamilyFields = "twists,fraction,crossing_number,canonical,components,amphichiral";
constexpr const char* kSampleFields = "crossing_number,p,q,canonical,components,amphichiral";
constexpr const char* kTangleFields = "fraction,twists,tangle_crossings,closure";

enum class Kind { twist, torus, double_twist, pattern, sample, tangles };

struct Options {
  Kind kind = Kind::twist;
  std::string range;     // twist, torus
  std::string a, b;      // double-twist
  std::string pattern;   // pattern
  std::string crossings; // sample, tangles: the crossing number; others: a filter
  std::uint64_t samples = 1;
  std::uint64_t seed = 1;
  bool knots = false, links = false, mirrors = false, oriented = false, unique = false;
  ListingOptions listing;
};

// Lists the members of a twist-sequence family through the writer.
class Members {
 public:
  Members(const Options& o, RowWriter& w) : o_(o), w_(w) {
    e_.mirrors = o.mirrors;
    e_.oriented = o.oriented;
  }
  // Returns false to stop (interrupted).
  // The member's class through the big-integer path (members can be any size), its own twist
  // sequence, and with --unique a set of the classes already listed.
  bool add(const TwistSequence& t) {
    const Fraction f = twist_value(t);
    const LinkClass c = link_class_of(f, e_);
    row_.set(c, o_.oriented);
    row_.twists = t.twists;
    row_.has_twists = true;
    if (o_.unique) {
      if (!w_.filters.accept(row_)) return !InterruptGuard::interrupted();
      if (!seen_.emplace(c.p, c.q).second) return !InterruptGuard::interrupted();
    }
    return w_.write(row_);
  }

 private:
  const Options& o_;
  RowWriter& w_;
  EnumerationOptions e_;
  Row row_;
  std::set<std::pair<Integer, Integer>> seen_;
};

void run(const Options& o) {
  if (o.listing.list_fields) {
    Output::get().write(fields_help());
    return;
  }
  if (o.knots && o.links) throw Error("--knots and --links exclude each other (give neither for both)");
  const std::optional<int> comp = o.knots ? std::optional<int>(1) : o.links ? std::optional<int>(2) : std::nullopt;
  const char* defaults = o.kind == Kind::sample ? kSampleFields : o.kind == Kind::tangles ? kTangleFields : kFamilyFields;
  RowWriter writer(o.listing, select_fields(o.listing.fields, defaults), make_context(o.listing));
  writer.filters = make_filters(o.listing, comp);
  InterruptGuard guard;
  Members members(o, writer);

  if (o.kind == Kind::sample || o.kind == Kind::tangles) {
    if (o.crossings.empty()) throw Error("family sample and family tangles need --crossings N");
    const auto [n, n2] = parse_crossing_range(o.crossings, "--crossings");
    if (n != n2) throw Error("--crossings takes one crossing number here, got a range");
    // One bit stream for the whole run: sample i depends on the seed and on i only.
    RandomBits bits(o.seed);
    Row row;
    EnumerationOptions e;
    e.components = o.knots ? ComponentFilter::knots : o.links ? ComponentFilter::links : ComponentFilter::both;
    e.mirrors = o.mirrors;
    e.oriented = o.oriented;
    for (std::uint64_t i = 0; i < o.samples; ++i) {
      if (o.kind == Kind::sample) {
        row.set(sample_two_bridge(n, e, bits), o.oriented);
      } else {
        const Fraction f = sample_rational_tangle(n, bits);
        row.set_tangle(f.numerator(), f.denominator(), n);
      }
      if (writer.needs_twists()) {
        row.twists = canonical_twists(Fraction(row.fraction_p, row.fraction_q)).twists;
        row.has_twists = true;
      }
      if (!writer.write(row)) break;
    }
  } else {
    if (!o.crossings.empty()) writer.filters.crossings = parse_crossing_range(o.crossings, "--crossings");
    // Iterates an integer range (any size) until the callback says stop.
    auto each = [&](const std::string& text, const char* what, auto&& f) {
      const auto [lo, hi] = parse_integer_range(text, what);
      for (Integer k = lo; k <= hi; ++k) {
        if (!f(k)) return false;
      }
      return true;
    };
    switch (o.kind) {
      case Kind::twist:
        each(o.range.empty() ? "1..10" : o.range, "--range",
             [&](const Integer& k) { return members.add(twist_knot_twists(k)); });
        break;
      case Kind::torus:
        each(o.range.empty() ? "2..10" : o.range, "--range",
             [&](const Integer& k) { return members.add(torus_twists(k)); });
        break;
      case Kind::double_twist:
        each(o.a.empty() ? "1..4" : o.a, "--a", [&](const Integer& x) {
          return each(o.b.empty() ? "1..4" : o.b, "--b",
                      [&](const Integer& y) { return members.add(double_twist_twists(x, y)); });
        });
        break;
      case Kind::pattern: {
        if (o.pattern.empty()) throw Error("family pattern needs a PATTERN such as '[1..3 2 -2..2]'");
        // main() puts a space before a word that starts with '['; positions count from the '['.
        const std::string text = o.pattern.substr(std::min(o.pattern.find_first_not_of(' '), o.pattern.size()));
        std::vector<TermRange> pat;
        try {
          pat = parse_pattern(text);
        } catch (const ParseError& e) {
          throw ParseError(e.position(), "bad pattern " + app::quoted(text) + ": " + bare_message(e));
        }
        TwistSequence t;
        for_each_pattern(pat, [&](std::span<const Integer> s) {
          t.twists.assign(s.begin(), s.end());
          return members.add(t);
        });
        break;
      }
      default: break;
    }
  }
  writer.finish();
  InterruptGuard::exit_if_interrupted();
}

void add_classification(CLI::App& app, Options& o) {
  app.add_flag("--knots", o.knots, "knots only");
  app.add_flag("--links", o.links, "two-component links only");
  app.add_flag("--mirrors", o.mirrors, "distinguish mirror images (canonical, q and --unique)");
  app.add_flag("--oriented", o.oriented, "oriented classes (Schubert mod 2p)");
}

void add_member_options(CLI::App& app, Options& o) {
  add_classification(app, o);
  app.add_option("--crossings", o.crossings, "keep members with crossing number N or in A..B");
  app.add_flag("--unique", o.unique, "drop a member whose class was listed before (keeps a set in memory)");
  add_listing_options(app, o.listing);
}

CLI::App* sub(CLI::App& parent, const char* name, const char* help, Kind kind,
              std::shared_ptr<Options>& keep) {
  keep = std::make_shared<Options>();
  keep->kind = kind;
  CLI::App* s = parent.add_subcommand(name, help);
  auto o = keep;
  s->callback([o] { run(*o); });
  return s;
}

void setup(CLI::App& app) {
  app.description(
      "Families of 2-bridge links for experiments, and exactly uniform random samples. Members\n"
      "are Conway twist sequences (Conway's order); each row shows the sequence, its fraction and\n"
      "the class of the numerator closure (up to mirror unless --mirrors, as in enumerate).\n"
      "\n"
      "Examples:\n"
      "  fourplat family twist --range 1..8            twist knots [k 2] = b(2k+1,k): 3_1, 4_1, 5_2, ...\n"
      "  fourplat family torus --range 2..9            T(2,n) = [n] = b(n,1)\n"
      "  fourplat family double-twist --a 1..5 --b 2..6 --knots\n"
      "  fourplat family pattern '[1..3 1 1..3]' --unique --mirrors\n"
      "  fourplat family sample --crossings 40 --knots --samples 5 --seed 7\n"
      "  fourplat family tangles --crossings 12 --samples 3");
  app.require_subcommand(1);
  // One Options per subcommand, alive for the whole run (CLI11 keeps pointers into them).
  static std::shared_ptr<Options> twist, torus, dbl, pattern, sample, tangles;
  CLI::App* s = sub(app, "twist", "twist knots [k 2] = b(2k+1,k) for k in --range", Kind::twist, twist);
  s->add_option("--range", twist->range, "k from A..B (default 1..10)");
  add_member_options(*s, *twist);

  s = sub(app, "torus", "torus knots and links T(2,n) = [n] for n in --range", Kind::torus, torus);
  s->add_option("--range", torus->range, "n from A..B (default 2..10)");
  add_member_options(*s, *torus);

  s = sub(app, "double-twist", "double-twist tangles [a b], closure b(ab+1,a)", Kind::double_twist, dbl);
  s->add_option("--a", dbl->a, "a from A..B (default 1..4)");
  s->add_option("--b", dbl->b, "b from A..B (default 1..4)");
  add_member_options(*s, *dbl);

  s = sub(app, "pattern", "every twist sequence of a pattern with a range per term", Kind::pattern, pattern);
  s->add_option("PATTERN", pattern->pattern, "such as '[1..3 2 -2..2]' (terms: N or A..B)");
  add_member_options(*s, *pattern);

  s = sub(app, "sample", "uniform random 2-bridge classes of a crossing number", Kind::sample, sample);
  s->add_option("--crossings", sample->crossings, "crossing number N (up to 100000)");
  s->add_option("--samples", sample->samples, "number of samples (default 1)");
  s->add_option("--seed", sample->seed, "seed of std::mt19937_64 (default 1)");
  add_classification(*s, *sample);
  add_listing_options(*s, sample->listing);

  s = sub(app, "tangles", "uniform random rational tangles of a crossing number", Kind::tangles, tangles);
  s->add_option("--crossings", tangles->crossings, "crossing number N (up to 100000)");
  s->add_option("--samples", tangles->samples, "number of samples (default 1)");
  s->add_option("--seed", tangles->seed, "seed of std::mt19937_64 (default 1)");
  add_listing_options(*s, tangles->listing);
}

const Registration reg{{"family", "twist knots, T(2,n), double twists, patterns, random samples", setup}};

}  // namespace
}  // namespace fourplat::app
