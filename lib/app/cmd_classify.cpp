// fourplat classify — the closure of each tangle, classified: from the arguments, or one tangle a
// line from standard input (streaming: memory stays flat however long the input).
//
// Two paths give the same record: a fraction P/Q whose words fit int64 goes through
// parse_fraction_word and summarize_numerator_word (no allocation), everything else through
// parse_tangle_sum and the exact big-integer classes. --no-fast-path (hidden, for tests) forces
// the second, so the two can be compared on the same input.
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
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
  bool no_fast_path = false;
};

// Numbers print the same from both paths: JSON numbers when they fit int64, else strings.
void json_number(fmt::memory_buffer& b, std::int64_t x) { fmt::format_to(std::back_inserter(b), "{}", x); }
void json_number(fmt::memory_buffer& b, const Integer& x) {
  if (const auto w = to_int64(x)) {
    json_number(b, *w);
  } else {
    b.push_back('"');
    const std::string s = x.str();
    b.append(s.data(), s.data() + s.size());
    b.push_back('"');
  }
}
void text_number(fmt::memory_buffer& b, std::int64_t x) { fmt::format_to(std::back_inserter(b), "{}", x); }
void text_number(fmt::memory_buffer& b, const Integer& x) {
  const std::string s = x.str();
  b.append(s.data(), s.data() + s.size());
}
void put(fmt::memory_buffer& b, std::string_view s) { b.append(s.data(), s.data() + s.size()); }

/// Everything classify prints for a 2-bridge closure; N is std::int64_t or Integer.
template <typename N>
struct LinkRecord {
  N p, q, canonical_q, mirror_q, crossings;
  int components;
  bool amphichiral;
  LinkKind kind;
};

/// What is known of a closure that is not 2-bridge (a sum with three or more rational parts).
struct SumRecord {
  Integer determinant;
  int components;
  int parts;
};

/// Fraction text: "n", "p/q", "1/0".
template <typename N>
void fraction_text(fmt::memory_buffer& b, const N& p, const N& q) {
  text_number(b, p);
  if (q != 1) {
    b.push_back('/');
    text_number(b, q);
  }
}

template <typename N>
void link_text(fmt::memory_buffer& b, const N& p, const N& q) {
  put(b, "b(");
  text_number(b, p);
  b.push_back(',');
  text_number(b, q);
  b.push_back(')');
}

class Writer {
 public:
  Writer(const Options& o) : o_(o), out_(Output::get()) {}

  /// One record. `fraction` is written by the callback (nothing for a non-rational sum).
  template <typename N, typename FractionFn>
  void link(std::string_view input, FractionFn&& fraction, const std::vector<std::string>* summands,
            const LinkRecord<N>& r) {
    fmt::memory_buffer& b = out_.buffer();
    const std::string_view kind = kind_name(r.kind);
    if (o_.json) {
      begin_json(b, input, fraction);
      put(b, ",\"p\":");
      json_number(b, r.p);
      put(b, ",\"q\":");
      json_number(b, r.q);
      fmt::format_to(std::back_inserter(b), ",\"components\":{}", r.components);
      put(b, ",\"determinant\":");
      json_number(b, r.p);
      put(b, ",\"crossing_number\":");
      json_number(b, r.crossings);
      put(b, r.amphichiral ? ",\"amphichiral\":true,\"canonical\":\"" : ",\"amphichiral\":false,\"canonical\":\"");
      link_text(b, r.p, r.canonical_q);
      put(b, "\",\"canonical_mirror\":\"");
      link_text(b, r.p, r.mirror_q);
      put(b, "\",\"kind\":\"");
      put(b, kind);
      put(b, "\",\"two_bridge\":true");
      end_json(b, summands);
    } else {
      b.push_back(o_.closure == Closure::numerator ? 'N' : 'D');
      b.push_back('(');
      put(b, input);
      put(b, ") = ");
      link_text(b, r.p, r.q);
      put(b, r.components == 1 ? "  knot  det " : "  2-component link  det ");
      text_number(b, r.p);
      put(b, "  crossings ");
      text_number(b, r.crossings);
      put(b, r.amphichiral ? "  amphichiral  " : "  chiral  ");
      put(b, kind);
      put(b, "  canonical ");
      link_text(b, r.p, r.canonical_q);
      put(b, "  up to mirror ");
      link_text(b, r.p, r.mirror_q);
      b.push_back('\n');
    }
    out_.maybe_flush();
  }

  void not_two_bridge(std::string_view input, const std::vector<std::string>& summands, const SumRecord& r) {
    fmt::memory_buffer& b = out_.buffer();
    if (o_.json) {
      begin_json(b, input, [](fmt::memory_buffer& bb) { put(bb, "null"); });
      put(b, ",\"p\":null,\"q\":null");
      fmt::format_to(std::back_inserter(b), ",\"components\":{}", r.components);
      put(b, ",\"determinant\":");
      json_number(b, r.determinant);
      put(b, ",\"crossing_number\":null,\"amphichiral\":null,\"canonical\":null,\"canonical_mirror\":null,"
             "\"kind\":null,\"two_bridge\":false");
      end_json(b, &summands);
    } else {
      b.push_back(o_.closure == Closure::numerator ? 'N' : 'D');
      b.push_back('(');
      put(b, input);
      fmt::format_to(std::back_inserter(b), ")  not 2-bridge ({} rational parts)  {}  det ", r.parts,
                     r.components == 1 ? "knot" : fmt::format("{}-component link", r.components));
      text_number(b, r.determinant);
      b.push_back('\n');
    }
    out_.maybe_flush();
  }

  /// A bad input: a JSON error record, or one line on stderr.
  void error(std::string_view input, std::uint64_t line, std::string_view message) {
    if (o_.json) {
      fmt::memory_buffer& b = out_.buffer();
      put(b, "{\"input\":");
      append_json_string(b, input);
      if (line != 0) fmt::format_to(std::back_inserter(b), ",\"line\":{}", line);
      put(b, ",\"error\":");
      append_json_string(b, message);
      put(b, "}\n");
      out_.maybe_flush();
    } else if (line != 0) {
      print_error(fmt::format("line {}: bad tangle {}: {}", line, quoted(input), message));
    } else {
      print_error(fmt::format("bad tangle {}: {}", quoted(input), message));
    }
  }

 private:
  static std::string_view kind_name(LinkKind k) {
    switch (k) {  // the names of to_string(LinkKind), without an allocation per record
      case LinkKind::unlink: return "unlink";
      case LinkKind::unknot: return "unknot";
      case LinkKind::torus: return "torus";
      case LinkKind::hyperbolic: return "hyperbolic";
    }
    return "unknown";
  }

  template <typename FractionFn>
  void begin_json(fmt::memory_buffer& b, std::string_view input, FractionFn&& fraction) {
    put(b, "{\"input\":");
    append_json_string(b, input);
    put(b, ",\"fraction\":");
    fraction(b);
    put(b, o_.closure == Closure::numerator ? ",\"closure\":\"numerator\"" : ",\"closure\":\"denominator\"");
  }

  static void end_json(fmt::memory_buffer& b, const std::vector<std::string>* summands) {
    if (summands != nullptr) {
      put(b, ",\"summands\":[");
      for (std::size_t k = 0; k < summands->size(); ++k) {
        if (k != 0) b.push_back(',');
        append_json_string(b, (*summands)[k]);
      }
      b.push_back(']');
    }
    put(b, "}\n");
  }

  const Options& o_;
  Output& out_;
};

LinkRecord<Integer> big_record(const TwoBridgeLink& l) {
  return {l.p(), l.q(), l.canonical().q(), l.canonical_up_to_mirror().q(), l.crossing_number(),
          l.components(), l.is_amphichiral(), l.kind()};
}

/// The word path: true when it wrote the record.
bool classify_word(std::string_view input, const Options& o, Writer& w) {
  const auto f = parse_fraction_word(input);
  if (!f) return false;
  // N(p/q) directly; D(p/q) = N(−q/p) (docs/conventions.md). q > 0, |p| < 2^63, so −q is safe;
  // p = 0 makes D's fraction ∞, which the exact path handles.
  std::int64_t np = f->p, nq = f->q;
  if (o.closure == Closure::denominator) {
    if (f->p == 0) return false;
    np = -f->q;
    nq = f->p;
  }
  const auto s = summarize_numerator_word(np, nq);
  if (!s) return false;
  const LinkRecord<std::int64_t> r{s->p, s->q, s->canonical_q, s->canonical_mirror_q, s->crossing_number,
                                   s->components, s->amphichiral, s->kind};
  const std::int64_t fp = f->p, fq = f->q;
  w.link(input, [&](fmt::memory_buffer& b) {
    b.push_back('"');
    fraction_text(b, fp, fq);
    b.push_back('"');
  }, nullptr, r);
  return true;
}

/// The exact path: any tangle or sum. Throws fourplat::Error for bad input.
void classify_exact(std::string_view input, const Options& o, Writer& w) {
  const TangleSum sum = parse_tangle_sum(input);
  std::vector<std::string> summands;
  const bool is_sum = sum.summands().size() > 1;
  if (is_sum) {
    for (const RationalTangle& t : sum.summands()) summands.push_back(to_string(t.fraction()));
  }
  const std::optional<RationalTangle> rational =
      is_sum ? sum.as_rational() : std::optional<RationalTangle>(sum.summands().front());
  const auto fraction = [&](fmt::memory_buffer& b) {
    if (rational) {
      append_json_string(b, to_string(rational->fraction()));
    } else {
      put(b, "null");
    }
  };
  std::optional<TwoBridgeLink> link;
  if (rational) {
    link = closure(*rational, o.closure);
  } else {
    link = sum.closure_two_bridge(o.closure);
  }
  if (link) {
    w.link(input, fraction, is_sum ? &summands : nullptr, big_record(*link));
  } else {
    w.not_two_bridge(input, summands, {sum.determinant(o.closure), sum.components(o.closure), sum.rational_parts()});
  }
}

/// Trims the line; false for blank lines and # comments.
bool wanted(std::string_view& line) {
  const std::size_t a = line.find_first_not_of(" \t\r\v\f");
  if (a == std::string_view::npos) return false;
  const std::size_t z = line.find_last_not_of(" \t\r\v\f");
  line = line.substr(a, z - a + 1);
  return line.front() != '#';
}

void run(const Options& o) {
  Writer w(o);
  std::uint64_t failed = 0, first_failed = 0, total = 0;
  auto one = [&](std::string_view input, std::uint64_t line) {
    ++total;
    if (!o.no_fast_path && classify_word(input, o, w)) return;
    try {
      classify_exact(input, o, w);
    } catch (const Error& e) {
      if (failed++ == 0) first_failed = line != 0 ? line : total;
      w.error(input, line, e.what());
    }
  };
  if (!o.words.empty()) {
    for (const std::string& text : group_words(o.words)) {
      std::string_view t = text;
      if (!wanted(t)) t = std::string_view(text);  // an empty argument is an error, not skipped
      one(t, 0);
    }
  } else {
    LineReader reader(stdin);
    Progress progress("classified lines:");
    std::string_view line;
    while (reader.next(line)) {
      progress.tick();
      if (!wanted(line)) continue;
      one(line, reader.line_number());
    }
  }
  if (failed != 0) {
    if (o.json) {  // the errors went to stdout; say so once on stderr
      print_error(fmt::format("{} of {} inputs failed (the first at {} {})", failed, total,
                              o.words.empty() ? "line" : "input", first_failed));
    }
    throw Exit{2};
  }
}

void setup(CLI::App& app) {
  auto o = std::make_shared<Options>();
  app.add_option("TANGLE", o->words,
                 "tangles to classify (default: one per line from standard input; blank lines and "
                 "lines starting with # are skipped)");
  add_closure_option(app, o->closure);
  app.add_flag("-j,--json", o->json,
               "one JSON object per input, one per line (keys: docs/tool.md)");
  app.add_flag("--no-fast-path", o->no_fast_path, "use the exact path only (testing)")->group("");
  app.footer(
      "For each tangle T, the closure N(T) (or D(T)) as Schubert's b(p,q), 0 <= q < p, with its\n"
      "components, determinant, crossing number, chirality, kind, and the canonical forms of its\n"
      "class (unoriented, and up to mirror image). A sum of two rational tangles closes to a\n"
      "2-bridge link too; a sum of three or more non-integer parts reports its determinant and\n"
      "components and \"two_bridge\": false.\n"
      "\n"
      "A bad input is reported (on stderr with its line number, or as {\"input\", \"error\"} with\n"
      "--json) and the rest is still classified; the exit status is then 2.\n"
      "\n"
      "Examples:\n"
      "  fourplat classify 5/2 '[2 1 1 2]' 17/7\n"
      "  fourplat classify --closure denominator 7/3\n"
      "  fourplat classify '3/5 + 2/7' --json\n"
      "  seq 1 1000 | sed 's|$|/7|' | fourplat classify --json > classes.jsonl");
  app.callback([o] { run(*o); });
}

const Registration reg{{"classify", "classify the closures of tangles (arguments or stdin)", setup}};

}  // namespace
}  // namespace fourplat::app
