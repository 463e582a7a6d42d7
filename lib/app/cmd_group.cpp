// fourplat group — sort a batch of tangles into classes of their closures.
//
// Reads tangles like classify (arguments, or one a line from standard input; blank lines and
// lines starting with '#' skipped), and prints one block per class in the order the classes first
// appear: the canonical b(p,q), its type, determinant and crossing number, and every input that
// closes to it with its line number. Classes are Schubert's unoriented classes, or (--up-to-mirror)
// classes up to mirror image, or (--oriented) oriented classes. --colorable N flags the classes
// with a non-trivial Fox N-coloring (gcd(N, p) > 1). Unlike classify this keeps one entry per
// input in memory (the grouping needs them all).
#include <cstdint>
#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "command.hpp"
#include "fourplat/algebraic.hpp"
#include "fourplat/coloring.hpp"
#include "fourplat/parse.hpp"
#include "fourplat/two_bridge.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

enum class Identify { unoriented, up_to_mirror, oriented };

struct Options {
  std::vector<std::string> words;
  Closure closure = Closure::numerator;
  bool up_to_mirror = false;
  bool oriented = false;
  std::string colorable;  // modulus text, empty when not asked
  bool json = false;
};

struct Member {
  std::string input;
  std::uint64_t line;  // 0 for a command-line argument
};

struct Group {
  TwoBridgeLink representative;  // canonical representative of the class
  std::optional<OrientedTwoBridgeLink> oriented;
  std::vector<Member> members;
};

/// The key of the class of a closure and its printed representative.
struct Keyed {
  std::pair<Integer, Integer> key;
  TwoBridgeLink representative;
  std::optional<OrientedTwoBridgeLink> oriented;
};

Keyed classify_closure(const TangleSum& sum, Closure closure, Identify how) {
  const std::optional<TwoBridgeLink> link = sum.closure_two_bridge(closure);
  if (!link) throw DomainError("its closure is not a 2-bridge link, so it has no Schubert class");
  switch (how) {
    case Identify::unoriented: {
      const TwoBridgeLink c = link->canonical();
      return {{c.p(), c.q()}, c, std::nullopt};
    }
    case Identify::up_to_mirror: {
      const TwoBridgeLink c = link->canonical_up_to_mirror();
      return {{c.p(), c.q()}, c, std::nullopt};
    }
    case Identify::oriented: {
      const std::optional<RationalTangle> r = sum.as_rational();
      if (!r) throw DomainError("oriented classes need a rational tangle, not a sum");
      const OrientedTwoBridgeLink o = oriented_closure(*r, closure).canonical();
      return {{o.p(), o.q()}, o.unoriented().canonical(), o};
    }
  }
  throw Error("unreachable identification mode");
}

void run(const Options& o) {
  if (o.up_to_mirror && o.oriented) throw DomainError("--up-to-mirror and --oriented exclude each other");
  const Identify how = o.oriented ? Identify::oriented
                                  : (o.up_to_mirror ? Identify::up_to_mirror : Identify::unoriented);
  std::optional<Integer> modulus;
  if (!o.colorable.empty()) {
    modulus = parse_integer(o.colorable);
    if (*modulus < 1) throw DomainError("--colorable needs a modulus of at least 1, got " + o.colorable);
  }

  std::vector<Group> groups;
  std::map<std::pair<Integer, Integer>, std::size_t> index;
  int failures = 0;
  auto take = [&](std::string_view text, std::uint64_t line) {
    try {
      const Keyed k = classify_closure(read_tangle_sum(text), o.closure, how);
      auto [it, fresh] = index.try_emplace(k.key, groups.size());
      if (fresh) groups.push_back({k.representative, k.oriented, {}});
      groups[it->second].members.push_back({std::string(text), line});
    } catch (const Error& e) {
      ++failures;
      print_error(line != 0 ? fmt::format("line {}: {}: {}", line, quoted(text), e.what())
                            : fmt::format("{}: {}", quoted(text), e.what()));
    }
  };
  if (!o.words.empty()) {
    for (const std::string& w : group_words(o.words)) take(w, 0);
  } else {
    LineReader reader(stdin);
    std::string_view line;
    while (reader.next(line)) {
      const auto first = line.find_first_not_of(" \t");
      if (first == std::string_view::npos || line[first] == '#') continue;
      take(line.substr(first), reader.line_number());
    }
  }

  Output& out = Output::get();
  const bool one = groups.size() == 1;
  const std::string what = std::string(how == Identify::oriented ? "oriented " : "") +
                           (one ? "class" : "classes") +
                           (how == Identify::up_to_mirror ? " up to mirror image" : "");
  if (o.json) {
    for (const Group& g : groups) {
      Json j;
      j["class"] = g.oriented ? to_string(*g.oriented) : to_string(g.representative);
      j["identification"] = how == Identify::oriented ? "oriented"
                            : how == Identify::up_to_mirror ? "up_to_mirror" : "unoriented";
      j["p"] = integer_json(g.representative.p());
      j["q"] = integer_json(g.oriented ? g.oriented->q() : g.representative.q());
      j["components"] = g.representative.components();
      j["determinant"] = integer_json(g.representative.determinant());
      j["crossing_number"] = integer_json(g.representative.crossing_number());
      j["amphichiral"] = g.representative.is_amphichiral();
      j["kind"] = to_string(g.representative.kind());
      if (modulus) j["colorable"] = is_colorable(g.representative, *modulus);
      Json members = Json::array();
      for (const Member& m : g.members) {
        Json e;
        e["input"] = m.input;
        if (m.line != 0) e["line"] = m.line;
        members.push_back(e);
      }
      j["members"] = members;
      out.write(j.dump());
      out.write("\n");
    }
  } else {
    std::size_t inputs = 0;
    for (const Group& g : groups) inputs += g.members.size();
    out.print("{} input{} in {} {}\n", inputs, inputs == 1 ? "" : "s", groups.size(), what);
    for (const Group& g : groups) {
      const TwoBridgeLink& l = g.representative;
      out.print("\n{}  {}, det {}, {} crossings, {}, {}", g.oriented ? to_string(*g.oriented) : to_string(l),
                l.is_knot() ? "knot" : "2-component link", l.determinant().str(),
                l.crossing_number().str(), l.is_amphichiral() ? "amphichiral" : "chiral",
                to_string(l.kind()));
      if (modulus && is_colorable(l, *modulus)) out.print("  [{}-colorable]", modulus->str());
      out.print("\n");
      for (const Member& m : g.members) {
        if (m.line != 0) {
          out.print("    line {:>4}  {}\n", m.line, m.input);
        } else {
          out.print("    {}\n", m.input);
        }
      }
    }
  }
  out.flush();
  if (failures != 0) throw Exit{2};
}

void setup(CLI::App& sub) {
  auto opts = std::make_shared<Options>();
  sub.add_option("tangles", opts->words, "tangles (default: one a line from standard input)");
  add_closure_option(sub, opts->closure);
  sub.add_flag("--up-to-mirror,-m", opts->up_to_mirror, "identify a link with its mirror image");
  sub.add_flag("--oriented", opts->oriented, "oriented classes (Schubert mod 2p) instead");
  sub.add_option("--colorable", opts->colorable, "flag classes with a non-trivial Fox N-coloring")
      ->type_name("N");
  sub.add_flag("--json", opts->json, "one JSON object per class");
  sub.footer(
      "Examples:\n"
      "  fourplat group 7/2 7/4 '[3 2]' 7/3          b(7,2) twice, then b(7,3)\n"
      "  fourplat group --up-to-mirror < list.txt    a knot and its mirror image together\n"
      "  fourplat group --colorable 3 --json < list.txt");
  sub.callback([opts] { run(*opts); });
}

const Registration reg{{"group", "sort tangles into classes of their closures", setup}};

}  // namespace
}  // namespace fourplat::app
