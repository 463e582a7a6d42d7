// fourplat classify — the closure of each tangle, classified: from the arguments, or one tangle a
// line from standard input (streaming: memory stays flat however long the input).
//
// Two paths give the same record: a fraction P/Q whose words fit int64 goes through
// parse_fraction_word and summarize_numerator_word (no allocation), everything else through
// parse_tangle_sum and the exact big-integer classes. --no-fast-path (hidden, for tests) forces
// the second, so the two can be compared on the same input.
#include <gmp.h>
#include <unistd.h>

#include <cstdint>
#include <cstring>
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

/// A record written straight into the output buffer: room for `bound` bytes is made first, so
/// each piece is a plain copy (no capacity checks, no format-string parsing). Bounds: a JSON
/// string needs at most 6 bytes per input byte (\u00XX), a number its decimal digits.
class Sink {
 public:
  Sink(fmt::memory_buffer& b, std::size_t bound) : b_(b), start_(b.size()) {
    b_.resize(start_ + bound);
    p_ = b_.data() + start_;
  }
  ~Sink() { b_.resize(static_cast<std::size_t>(p_ - b_.data())); }
  Sink(const Sink&) = delete;
  Sink& operator=(const Sink&) = delete;

  void lit(std::string_view s) noexcept {
    std::memcpy(p_, s.data(), s.size());
    p_ += s.size();
  }
  void ch(char c) noexcept { *p_++ = c; }
  void num(std::int64_t x) noexcept {
    const fmt::format_int f(x);
    lit(std::string_view(f.data(), f.size()));
  }
  void num(const Integer& x) {
    if (const auto w = to_int64(x)) {
      num(*w);
    } else {
      lit(x.str());
    }
  }
  // Numbers in JSON: numbers when they fit int64, else decimal strings (docs/tool.md).
  void json_num(std::int64_t x) noexcept { num(x); }
  void json_num(const Integer& x) {
    if (const auto w = to_int64(x)) {
      num(*w);
    } else {
      ch('"');
      lit(x.str());
      ch('"');
    }
  }
  void json_string(std::string_view s) noexcept { p_ = write_json_string(p_, s); }
  /// "n" or "p/q".
  template <typename N>
  void fraction(const N& p, const N& q) {
    num(p);
    if (q != 1) {
      ch('/');
      num(q);
    }
  }
  /// "b(p,q)".
  template <typename N>
  void link(const N& p, const N& q) {
    lit("b(");
    num(p);
    ch(',');
    num(q);
    ch(')');
  }

 private:
  fmt::memory_buffer& b_;
  std::size_t start_;
  char* p_ = nullptr;
};

/// Upper bound on the decimal digits (and sign) of x.
std::size_t digits_bound(std::int64_t) noexcept { return 20; }
std::size_t digits_bound(const Integer& x) noexcept {
  return mpz_sizeinbase(x.backend().data(), 10) + 2;
}

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

/// The tangle's fraction as classify prints it ("n", "p/q", "1/0"), or null (a non-rational sum).
template <typename N>
struct FractionText {
  bool present;
  N p, q;
};

class Writer {
 public:
  explicit Writer(const Options& o) : o_(o), out_(Output::get()) {}

  template <typename N>
  void link(std::string_view input, const FractionText<N>& f, const std::vector<std::string>* summands,
            const LinkRecord<N>& r) {
    const std::size_t bound = 6 * input.size() + 12 * digits_bound(r.p) + 2 * digits_bound(f.p) +
                              2 * digits_bound(f.q) + strings_bound(summands) + 512;
    {
      Sink k(out_.buffer(), bound);
      const std::string_view kind = kind_name(r.kind);
      if (o_.json) {
        begin_json(k, input, f);
        k.lit(",\"p\":");
        k.json_num(r.p);
        k.lit(",\"q\":");
        k.json_num(r.q);
        k.lit(r.components == 1 ? ",\"components\":1" : ",\"components\":2");
        k.lit(",\"determinant\":");
        k.json_num(r.p);
        k.lit(",\"crossing_number\":");
        k.json_num(r.crossings);
        k.lit(r.amphichiral ? ",\"amphichiral\":true,\"canonical\":\"" : ",\"amphichiral\":false,\"canonical\":\"");
        k.link(r.p, r.canonical_q);
        k.lit("\",\"canonical_mirror\":\"");
        k.link(r.p, r.mirror_q);
        k.lit("\",\"kind\":\"");
        k.lit(kind);
        k.lit("\",\"two_bridge\":true");
        end_json(k, summands);
      } else {
        k.ch(o_.closure == Closure::numerator ? 'N' : 'D');
        k.ch('(');
        k.lit(input);
        k.lit(") = ");
        k.link(r.p, r.q);
        k.lit(r.components == 1 ? "  knot  det " : "  2-component link  det ");
        k.num(r.p);
        k.lit("  crossings ");
        k.num(r.crossings);
        k.lit(r.amphichiral ? "  amphichiral  " : "  chiral  ");
        k.lit(kind);
        k.lit("  canonical ");
        k.link(r.p, r.canonical_q);
        k.lit("  up to mirror ");
        k.link(r.p, r.mirror_q);
        k.ch('\n');
      }
    }
    out_.maybe_flush();
  }

  void not_two_bridge(std::string_view input, const std::vector<std::string>& summands, const SumRecord& r) {
    {
      Sink k(out_.buffer(), 6 * input.size() + strings_bound(&summands) + 4 * digits_bound(r.determinant) + 512);
      if (o_.json) {
        begin_json(k, input, FractionText<Integer>{false, 0, 1});
        k.lit(",\"p\":null,\"q\":null,\"components\":");
        k.num(std::int64_t{r.components});
        k.lit(",\"determinant\":");
        k.json_num(r.determinant);
        k.lit(",\"crossing_number\":null,\"amphichiral\":null,\"canonical\":null,\"canonical_mirror\":null,"
              "\"kind\":null,\"two_bridge\":false");
        end_json(k, &summands);
      } else {
        k.ch(o_.closure == Closure::numerator ? 'N' : 'D');
        k.ch('(');
        k.lit(input);
        k.lit(")  not 2-bridge (");
        k.num(std::int64_t{r.parts});
        k.lit(" rational parts)  ");
        if (r.components == 1) {
          k.lit("knot");
        } else {
          k.num(std::int64_t{r.components});
          k.lit("-component link");
        }
        k.lit("  det ");
        k.num(r.determinant);
        k.ch('\n');
      }
    }
    out_.maybe_flush();
  }

  /// A bad input: a JSON error record, or one line on stderr.
  void error(std::string_view input, std::uint64_t line, std::string_view message) {
    if (o_.json) {
      {
        Sink k(out_.buffer(), 6 * (input.size() + message.size()) + 64);
        k.lit("{\"input\":");
        k.json_string(input);
        if (line != 0) {
          k.lit(",\"line\":");
          k.num(static_cast<std::int64_t>(line));
        }
        k.lit(",\"error\":");
        k.json_string(message);
        k.lit("}\n");
      }
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

  static std::size_t strings_bound(const std::vector<std::string>* v) {
    std::size_t n = 0;
    if (v != nullptr) {
      for (const std::string& s : *v) n += 6 * s.size() + 3;
    }
    return n;
  }

  template <typename N>
  void begin_json(Sink& k, std::string_view input, const FractionText<N>& f) {
    k.lit("{\"input\":");
    k.json_string(input);
    if (f.present) {
      k.lit(",\"fraction\":\"");
      k.fraction(f.p, f.q);
      k.ch('"');
    } else {
      k.lit(",\"fraction\":null");
    }
    k.lit(o_.closure == Closure::numerator ? ",\"closure\":\"numerator\"" : ",\"closure\":\"denominator\"");
  }

  static void end_json(Sink& k, const std::vector<std::string>* summands) {
    if (summands != nullptr) {
      k.lit(",\"summands\":[");
      for (std::size_t i = 0; i < summands->size(); ++i) {
        if (i != 0) k.ch(',');
        k.json_string((*summands)[i]);
      }
      k.ch(']');
    }
    k.lit("}\n");
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
  w.link(input, FractionText<std::int64_t>{true, f->p, f->q}, nullptr, r);
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
  FractionText<Integer> fraction{false, 0, 1};
  if (rational) fraction = {true, rational->fraction().numerator(), rational->fraction().denominator()};
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
    LineReader reader(STDIN_FILENO);
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
