// Streamed rows: the field table, filters, writers, interrupts and progress (fields.hpp).
#include "fields.hpp"

#include <unistd.h>

#include <algorithm>
#include <cerrno>
#include <chrono>
#include <cstdio>
#include <cstring>
#include <iterator>
#include <stdexcept>

#include "command.hpp"
#include "fourplat/continued_fraction.hpp"
#include "fourplat/error.hpp"
#include "fourplat/parse.hpp"
#include "fourplat/two_bridge.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

// ---- cells ----

// Integers keep a word-size fast path: fmt writes an int64 without allocating, while a big
// value goes through GMP's conversion (and is marked so that JSON writes it as a string).
void set_int(Cell& c, const Integer& x) {
  c.kind = Cell::integer;
  c.text.clear();
  if (const auto w = to_int64(x)) {
    fmt::format_to(std::back_inserter(c.text), "{}", *w);
    c.fits_word = true;
  } else {
    c.text = x.str();
    c.fits_word = false;
  }
}
void set_int(Cell& c, std::int64_t x) {
  c.kind = Cell::integer;
  c.text.clear();
  fmt::format_to(std::back_inserter(c.text), "{}", x);
  c.fits_word = true;
}
void set_bool(Cell& c, bool b) {
  c.kind = Cell::boolean;
  c.text = b ? "true" : "false";
}
void set_link(Cell& c, const Integer& p, const Integer& q) {
  c.kind = Cell::string;
  c.text.clear();
  const auto wp = to_int64(p), wq = to_int64(q);
  if (wp && wq) {
    fmt::format_to(std::back_inserter(c.text), "b({},{})", *wp, *wq);
  } else {
    c.text = "b(" + p.str() + "," + q.str() + ")";
  }
}

// x mod p in [0, p); p = 0 is the unlink b(0,1), whose q is 1 by convention.
Integer mod_p(const Integer& x, const Integer& p) { return p == 0 ? Integer(1) : mod_floor(x, p); }

// ---- the field table (each function reads the row only) ----
// The order here is the order of --list-fields and of --fields all. A new invariant is one more
// entry; set needs_twists when it reads Row::twists, so the generators fill them only then.

const std::vector<FieldDef> kFields = {
    {"index", "position of the row in the output, from 1", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_int(c, static_cast<std::int64_t>(r.index)); }},
    {"crossing_number", "crossing number of the link (Kauffman, Murasugi, Thistlethwaite 1987)", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_int(c, r.crossings); }},
    {"p", "p of b(p,q): the determinant", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_int(c, r.p); }},
    {"q", "q of the listed form b(p,q) (canonical; odd and below 2p when oriented)", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_int(c, r.q); }},
    {"canonical", "\"b(p,q)\": the class in the listing's classification (least q)", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_link(c, r.p, r.q); }},
    {"canonical_unoriented", "least b(p,q) of the unoriented class, mirrors distinguished", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_link(c, r.p, r.canonical_q); }},
    {"canonical_mirror", "least b(p,q) of the class up to mirror image", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_link(c, r.p, r.canonical_mirror_q); }},
    {"canonical_oriented", "least oriented form (q odd, mod 2p) of the drawing tangle's closure", false,
     [](const Row& r, const FieldContext&, Cell& c) {
       const OrientedTwoBridgeLink o =
           OrientedTwoBridgeLink::numerator_closure(Fraction(r.fraction_p, r.fraction_q)).canonical();
       set_link(c, o.p(), o.q());
     }},
    {"mirror", "least b(p,q) of the mirror image (unoriented)", false,
     [](const Row& r, const FieldContext&, Cell& c) {
       const TwoBridgeLink m = TwoBridgeLink(r.p, r.canonical_q).mirror().canonical();
       set_link(c, m.p(), m.q());
     }},
    {"closure", "Schubert form b(p, q mod p) of the numerator closure of the drawing tangle", false,
     [](const Row& r, const FieldContext&, Cell& c) {
       const Integer p = abs(r.fraction_p);
       set_link(c, p, r.fraction_p < 0 ? mod_p(-r.fraction_q, p) : mod_p(r.fraction_q, p));
     }},
    {"fraction", "\"p/q\" of a rational tangle whose numerator closure is the row", false,
     [](const Row& r, const FieldContext&, Cell& c) {
       c.kind = Cell::string;
       c.text.clear();
       const auto wp = to_int64(r.fraction_p), wq = to_int64(r.fraction_q);
       if (wp && wq) {
         fmt::format_to(std::back_inserter(c.text), "{}/{}", *wp, *wq);
       } else {
         c.text = r.fraction_p.str() + "/" + r.fraction_q.str();
       }
     }},
    {"twists", "twist sequence in Conway's order: the family's, else the canonical one", true,
     [](const Row& r, const FieldContext&, Cell& c) {
       c.kind = Cell::string;
       c.text = "[";
       for (std::size_t i = 0; i < r.twists.size(); ++i) {
         if (i > 0) c.text += ' ';
         if (const auto w = to_int64(r.twists[i])) {
           fmt::format_to(std::back_inserter(c.text), "{}", *w);
         } else {
           c.text += r.twists[i].str();
         }
       }
       c.text += ']';
     }},
    {"tangle_crossings", "crossing number of the drawing tangle (sum of |canonical twists|)", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_int(c, r.tangle_crossings); }},
    {"components", "1 for a knot, 2 for a two-component link", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_int(c, std::int64_t{r.components}); }},
    {"determinant", "|Δ(−1)| = p", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_int(c, r.p); }},
    {"amphichiral", "equal to its mirror image: q² ≡ −1 (mod p)", false,
     [](const Row& r, const FieldContext&, Cell& c) { set_bool(c, r.amphichiral); }},
    {"kind", "unknot, unlink, torus (T(2,p)) or hyperbolic (Menasco 1984)", false,
     [](const Row& r, const FieldContext&, Cell& c) {
       c.kind = Cell::string;
       c.text = r.p == 0 ? "unlink" : r.p == 1 ? "unknot" : r.canonical_mirror_q == 1 ? "torus" : "hyperbolic";
     }},
    {"colorable", "non-trivially Fox colorable mod --modulus: gcd(modulus, p) > 1", false,
     [](const Row& r, const FieldContext& ctx, Cell& c) { set_bool(c, gcd(ctx.modulus, r.p) > 1); }},
    {"colorings", "number of Fox colorings mod --modulus, trivial ones included: n·gcd(n,p)", false,
     [](const Row& r, const FieldContext& ctx, Cell& c) { set_int(c, ctx.modulus * gcd(ctx.modulus, r.p)); }},
};

// CSV: quote a field with a comma, a quote, a line break or outer spaces (RFC 4180).
void append_csv(fmt::memory_buffer& out, const Cell& c) {
  if (c.kind == Cell::null) return;
  const std::string& t = c.text;
  const bool quote = t.find_first_of(",\"\r\n") != std::string::npos ||
                     (!t.empty() && (t.front() == ' ' || t.back() == ' '));
  if (!quote) {
    out.append(t.data(), t.data() + t.size());
    return;
  }
  out.push_back('"');
  for (const char ch : t) {
    if (ch == '"') out.push_back('"');
    out.push_back(ch);
  }
  out.push_back('"');
}

// The table is for people: yes/no for booleans, '-' for a missing value.
std::string_view table_text(const Cell& c) {
  if (c.kind == Cell::boolean) return c.text == "true" ? "yes" : "no";
  if (c.kind == Cell::null) return "-";
  return c.text;
}

// Display width of UTF-8 text: code points.
std::size_t width_of(std::string_view s) {
  std::size_t n = 0;
  for (const char ch : s) n += (static_cast<unsigned char>(ch) & 0xC0U) != 0x80U ? 1 : 0;
  return n;
}

// A streamed table cannot know its widths: the first rows are held back to size the columns
// (later, wider values push their row to the right).
constexpr std::size_t kTableSizingRows = 200;
// The buffer is written out at this size, always at a line boundary.
constexpr std::size_t kFlushAt = std::size_t{1} << 16;

// The handler only stores to a volatile sig_atomic_t, the one thing a handler may do safely; the
// listing loop reads the flag after each row. Guards nest (count) and restore the old handlers.

volatile std::sig_atomic_t g_interrupted = 0;
struct sigaction g_old_int {}, g_old_term {};
int g_guards = 0;

extern "C" void on_interrupt(int) { g_interrupted = 1; }

}  // namespace

// ---- rows ----

// Assignments into the reused Integers reuse their limbs: no allocation per row.
void Row::set(const EnumeratedLink& it, bool oriented_listing) {
  tangle = false;
  oriented = oriented_listing;
  crossings = it.crossings;
  tangle_crossings = it.crossings;
  components = it.components;
  amphichiral = it.amphichiral;
  p = it.p;
  q = it.q;
  fraction_p = it.fraction_p;
  fraction_q = it.fraction_q;
  canonical_q = it.canonical_q;
  canonical_mirror_q = it.canonical_mirror_q;
  has_twists = !it.twists.empty();
  twists.resize(it.twists.size());
  for (std::size_t i = 0; i < it.twists.size(); ++i) twists[i] = it.twists[i];
}

void Row::set(const LinkClass& c, bool oriented_listing) {
  tangle = false;
  oriented = oriented_listing;
  crossings = c.crossings;
  components = c.components;
  amphichiral = c.amphichiral;
  p = c.p;
  q = c.q;
  fraction_p = c.fraction_p;
  fraction_q = c.fraction_q;
  canonical_q = c.canonical_q;
  canonical_mirror_q = c.canonical_mirror_q;
  // A family member's tangle may have more crossings than its closure ([1 1] closes to 0).
  const Fraction f(fraction_p, fraction_q);
  const Integer tc = twist_crossings(f);
  tangle_crossings = to_int64(tc).value_or(-1);
  has_twists = false;
  twists.clear();
}

void Row::set_tangle(const Integer& fp, const Integer& fq, std::int64_t tangle_cross) {
  tangle = true;
  oriented = false;
  fraction_p = fp;
  fraction_q = fq;
  tangle_crossings = tangle_cross;
  const auto wp = to_int64(fp), wq = to_int64(fq);
  std::optional<LinkSummaryWord> s;
  if (wp && wq) s = summarize_numerator_word(*wp, *wq);
  if (s) {  // the word path (always, for enumerated tangles)
    p = s->p;
    q = s->canonical_q;
    canonical_q = s->canonical_q;
    canonical_mirror_q = s->canonical_mirror_q;
    crossings = s->crossing_number;
    components = s->components;
    amphichiral = s->amphichiral;
  } else {
    const TwoBridgeLink l = TwoBridgeLink::numerator_closure(Fraction(fp, fq));
    p = l.p();
    canonical_q = l.canonical().q();
    q = canonical_q;
    canonical_mirror_q = l.canonical_up_to_mirror().q();
    crossings = to_int64(l.crossing_number()).value_or(-1);
    components = l.components();
    amphichiral = l.is_amphichiral();
  }
  has_twists = false;
  twists.clear();
}

// ---- fields ----

const std::vector<FieldDef>& all_fields() { return kFields; }

// Names are matched exactly; a repeated name is kept once, in its first place.
std::vector<const FieldDef*> select_fields(std::string_view list, std::string_view defaults) {
  std::string text(list);
  if (text.empty()) text = defaults;
  if (!text.empty() && text.front() == '+') text = std::string(defaults) + "," + text.substr(1);
  std::vector<const FieldDef*> out;
  std::size_t i = 0;
  while (i <= text.size()) {
    const std::size_t j = std::min(text.find(',', i), text.size());
    std::string name = text.substr(i, j - i);
    name.erase(0, name.find_first_not_of(" \t"));
    name.erase(name.find_last_not_of(" \t") + 1);
    i = j + 1;
    if (name.empty()) continue;
    if (name == "all") {
      for (const FieldDef& f : kFields) out.push_back(&f);
      continue;
    }
    const auto f = std::find_if(kFields.begin(), kFields.end(), [&](const FieldDef& d) { return d.name == name; });
    if (f == kFields.end()) {
      std::string valid;
      for (const FieldDef& d : kFields) valid += (valid.empty() ? "" : ", ") + std::string(d.name);
      throw Error("unknown field '" + name + "' (fields: " + valid + ", or all)");
    }
    if (std::find(out.begin(), out.end(), &*f) == out.end()) out.push_back(&*f);
  }
  if (out.empty()) throw Error("--fields selects no field");
  return out;
}

std::string fields_help() {
  std::string s = "Fields (--fields a,b,c; 'all'; '+a,b' adds to the defaults):\n";
  for (const FieldDef& f : kFields) s += fmt::format("  {:<22}{}\n", f.name, f.help);
  return s;
}

// ---- filters ----

// Colorability: b(p,q) has n·gcd(n,p) Fox n-colorings, so a non-trivial one exists iff
// gcd(n,p) > 1 (common practice; MATH.md §3).
bool Filters::accept(const Row& r) const {
  if (components && r.components != *components) return false;
  if (amphichiral && r.amphichiral != *amphichiral) return false;
  if (colorable && gcd(*colorable, r.p) <= 1) return false;
  if (det_divisible_by && r.p % *det_divisible_by != 0) return false;
  if (crossings && (r.crossings < crossings->first || r.crossings > crossings->second)) return false;
  return true;
}

void add_listing_options(CLI::App& app, ListingOptions& o) {
  app.add_option("--fields", o.fields, "comma-separated fields; 'all'; '+f,g' adds to the defaults")
      ->group("Output");
  app.add_option("--format", o.format, "jsonl, csv or table (default: table on a terminal, else jsonl)")
      ->check(CLI::IsMember({"jsonl", "csv", "table"}))
      ->group("Output");
  app.add_flag("--no-header", o.no_header, "csv and table without the header line")->group("Output");
  app.add_flag("--list-fields", o.list_fields, "list the fields and exit")->group("Output");
  app.add_flag("--count", o.count_only, "print only the number of rows that pass the filters")->group("Output");
  app.add_option("--modulus", o.modulus, "modulus of the colorable and colorings fields (default 3)")
      ->group("Output");
  app.add_option("--colorable", o.colorable, "keep links non-trivially Fox colorable mod N (gcd(N,p) > 1)")
      ->group("Filters");
  app.add_flag("--amphichiral", o.amphichiral, "keep amphichiral classes only")->group("Filters");
  app.add_flag("--chiral", o.chiral, "keep chiral classes only")->group("Filters");
  app.add_option("--det-divisible-by", o.det_divisible_by, "keep links whose determinant K divides")
      ->group("Filters");
}

Filters make_filters(const ListingOptions& o, std::optional<int> components) {
  Filters f;
  f.components = components;
  if (o.amphichiral && o.chiral) throw Error("--amphichiral and --chiral exclude each other");
  if (o.amphichiral) f.amphichiral = true;
  if (o.chiral) f.amphichiral = false;
  if (!o.colorable.empty()) {
    const Integer n = parse_integer(o.colorable);
    if (n < 2) throw DomainError("--colorable needs a modulus of at least 2, got " + n.str());
    f.colorable = n;
  }
  if (!o.det_divisible_by.empty()) {
    const Integer k = parse_integer(o.det_divisible_by);
    if (k < 1) throw DomainError("--det-divisible-by needs a positive integer, got " + k.str());
    f.det_divisible_by = k;
  }
  return f;
}

FieldContext make_context(const ListingOptions& o) {
  FieldContext c;
  c.modulus = parse_integer(o.modulus);
  if (c.modulus < 1) throw DomainError("--modulus must be at least 1, got " + c.modulus.str());
  return c;
}

// ---- the writer ----

RowWriter::RowWriter(const ListingOptions& o, std::vector<const FieldDef*> fields, FieldContext ctx)
    : header_(!o.no_header), count_only_(o.count_only), fields_(std::move(fields)), ctx_(std::move(ctx)) {
  if (o.format.empty()) {
    format_ = stdout_is_terminal() ? Format::table : Format::jsonl;
  } else {
    format_ = o.format == "csv" ? Format::csv : o.format == "table" ? Format::table : Format::jsonl;
  }
  for (const FieldDef* f : fields_) needs_twists_ = needs_twists_ || f->needs_twists;
  cells_.resize(fields_.size());
  if (format_ == Format::csv && header_ && !count_only_) {
    for (std::size_t i = 0; i < fields_.size(); ++i) {
      if (i > 0) out_.push_back(',');
      out_.append(fields_[i]->name.data(), fields_[i]->name.data() + fields_[i]->name.size());
    }
    out_.push_back('\n');
  }
}

RowWriter::~RowWriter() {
  try {
    flush_out(true);
  } catch (...) {  // nothing to do: stdout is gone
  }
}

// Rows that fail a filter are neither numbered nor counted.
bool RowWriter::write(Row& r) {
  if (!filters.accept(r)) return !InterruptGuard::interrupted();
  ++rows_;
  r.index = rows_;
  if (count_only_) return !InterruptGuard::interrupted();
  for (std::size_t i = 0; i < fields_.size(); ++i) fields_[i]->get(r, ctx_, cells_[i]);
  if (format_ == Format::table && !widths_fixed_) {
    pending_.push_back(cells_);
    if (pending_.size() >= kTableSizingRows) flush_table_widths();
  } else {
    emit_line(cells_);
  }
  return !InterruptGuard::interrupted();
}

void RowWriter::emit_line(const std::vector<Cell>& cells) {
  switch (format_) {
    case Format::jsonl: {
      out_.push_back('{');
      for (std::size_t i = 0; i < fields_.size(); ++i) {
        if (i > 0) out_.push_back(',');
        append_json_string(out_, fields_[i]->name);
        out_.push_back(':');
        const Cell& c = cells[i];
        switch (c.kind) {
          case Cell::integer:  // big integers as decimal strings, as everywhere in the tool
            if (c.fits_word) {
              out_.append(c.text.data(), c.text.data() + c.text.size());
            } else {
              append_json_string(out_, c.text);
            }
            break;
          case Cell::string: append_json_string(out_, c.text); break;
          case Cell::boolean: out_.append(c.text.data(), c.text.data() + c.text.size()); break;
          default: out_.append(std::string_view("null")); break;
        }
      }
      out_.push_back('}');
      break;
    }
    case Format::csv:
      for (std::size_t i = 0; i < cells.size(); ++i) {
        if (i > 0) out_.push_back(',');
        append_csv(out_, cells[i]);
      }
      break;
    case Format::table:
      for (std::size_t i = 0; i < cells.size(); ++i) {
        const std::string_view t = table_text(cells[i]);
        const std::size_t w = width_of(t), col = widths_[i];
        const std::size_t pad = col > w ? col - w : 0;
        if (i > 0) out_.append(std::string_view("  "));
        const bool right = cells[i].kind == Cell::integer;
        if (right) out_.append(std::string(pad, ' '));
        out_.append(t);
        if (!right && i + 1 < cells.size()) out_.append(std::string(pad, ' '));
      }
      break;
  }
  out_.push_back('\n');
  if (out_.size() >= kFlushAt) flush_out(false);
}

// Fixes the column widths from the header and the held-back rows, then writes them all.
void RowWriter::flush_table_widths() {
  widths_.assign(fields_.size(), 0);
  for (std::size_t i = 0; i < fields_.size(); ++i) {
    if (header_) widths_[i] = width_of(fields_[i]->name);
    for (const auto& row : pending_) widths_[i] = std::max(widths_[i], width_of(table_text(row[i])));
  }
  widths_fixed_ = true;
  if (header_) {
    for (std::size_t i = 0; i < fields_.size(); ++i) {
      if (i > 0) out_.append(std::string_view("  "));
      const std::string_view n = fields_[i]->name;
      const bool right = !pending_.empty() && pending_.front()[i].kind == Cell::integer;
      const std::size_t pad = widths_[i] - width_of(n);
      if (right) out_.append(std::string(pad, ' '));
      out_.append(n);
      if (!right && i + 1 < fields_.size()) out_.append(std::string(pad, ' '));
    }
    out_.push_back('\n');
  }
  for (const auto& row : pending_) emit_line(row);
  pending_.clear();
}

void RowWriter::finish() {
  if (count_only_) {
    fmt::format_to(std::back_inserter(out_), "{}\n", rows_);
  } else if (format_ == Format::table && !widths_fixed_) {
    flush_table_widths();
  }
  flush_out(true);
}

// Writes the buffer, which holds whole lines only, with write(2) (retrying partial writes).
void RowWriter::flush_out(bool) {
  std::size_t done = 0;
  while (done < out_.size()) {
    const ssize_t k = ::write(STDOUT_FILENO, out_.data() + done, out_.size() - done);
    if (k < 0) {
      if (errno == EINTR) continue;
      out_.clear();
      throw std::runtime_error(std::string("cannot write the output: ") + std::strerror(errno));
    }
    done += static_cast<std::size_t>(k);
  }
  out_.clear();
}

// ---- interrupts ----

InterruptGuard::InterruptGuard() {
  if (g_guards++ > 0) return;
  g_interrupted = 0;
  struct sigaction sa {};
  sa.sa_handler = on_interrupt;
  sigemptyset(&sa.sa_mask);
  sa.sa_flags = SA_RESTART;
  sigaction(SIGINT, &sa, &g_old_int);
  sigaction(SIGTERM, &sa, &g_old_term);
}

InterruptGuard::~InterruptGuard() {
  if (--g_guards > 0) return;
  sigaction(SIGINT, &g_old_int, nullptr);
  sigaction(SIGTERM, &g_old_term, nullptr);
}

bool InterruptGuard::interrupted() noexcept { return g_interrupted != 0; }

void InterruptGuard::exit_if_interrupted() {
  if (interrupted()) {
    std::fputs("fourplat: interrupted; the output holds complete lines only\n", stderr);
    throw Exit{130};
  }
}

// ---- progress ----

ProgressBar::ProgressBar(std::string what)
    : enabled_(stderr_is_terminal() && !stdout_is_terminal()), what_(std::move(what)) {}

ProgressBar::~ProgressBar() {
  if (drawn_) std::fputs("\r\033[K", stderr);
}

// Redraws at most five times a second; "\r" returns to the start of the line.
void ProgressBar::update(double fraction) {
  if (!enabled_) return;
  const auto now = std::chrono::duration_cast<std::chrono::milliseconds>(
                       std::chrono::steady_clock::now().time_since_epoch())
                       .count();
  if (drawn_ && now - last_ms_ < 200) return;
  last_ms_ = now;
  drawn_ = true;
  fraction = std::clamp(fraction, 0.0, 1.0);
  constexpr int kWidth = 30;
  const int filled = static_cast<int>(fraction * kWidth);
  std::fprintf(stderr, "\r%s [%s%s] %5.1f%%", what_.c_str(), std::string(static_cast<std::size_t>(filled), '#').c_str(),
               std::string(static_cast<std::size_t>(kWidth - filled), ' ').c_str(), 100.0 * fraction);
  std::fflush(stderr);
}

// ---- option parsing ----

std::pair<Integer, Integer> parse_integer_range(std::string_view text, std::string_view what) {
  const std::size_t dots = text.find("..");
  // Each bound is parsed on its own; an error position is moved back into the whole text.
  auto bound = [&](std::string_view part, std::size_t offset) {
    try {
      return parse_integer(part);
    } catch (const ParseError& e) {
      throw ParseError(e.position() + offset, std::string(what) + " expects N or A..B, got " +
                                                  app::quoted(text) + ": " + bare_message(e));
    }
  };
  if (dots == std::string_view::npos) {
    const Integer n = bound(text, 0);
    return {n, n};
  }
  const Integer a = bound(text.substr(0, dots), 0);
  const Integer b = bound(text.substr(dots + 2), dots + 2);
  if (b < a) {
    throw DomainError(std::string(what) + " " + std::string(text) + " is an empty range (write A..B with A ≤ B)");
  }
  return {a, b};
}

std::pair<std::int64_t, std::int64_t> parse_crossing_range(std::string_view text, std::string_view what) {
  const auto [a, b] = parse_integer_range(text, what);
  if (a < 0) throw DomainError(std::string(what) + ": crossing numbers are at least 0, got " + a.str());
  const auto wa = to_int64(a), wb = to_int64(b);
  if (!wa || !wb || *wb > 100'000'000) {
    throw LimitError(std::string(what) + ": crossing numbers go up to 10^8");
  }
  return {*wa, *wb};
}

std::string bare_message(const ParseError& e) {
  const std::string m = e.what();
  const std::size_t k = m.find(": ");
  return m.rfind("at character ", 0) == 0 && k != std::string::npos ? m.substr(k + 2) : m;
}

// The tool counts shards from 1 (part I of N), the library from 0.
Shard parse_shard(std::string_view text) {
  const std::size_t slash = text.find('/');
  if (slash == std::string_view::npos) {
    throw ParseError(0, "--shard expects I/N (part I of N, 1 ≤ I ≤ N), got " + app::quoted(text));
  }
  const Integer i = parse_integer(text.substr(0, slash)), n = parse_integer(text.substr(slash + 1));
  if (n < 1 || n > (Integer(1) << 32)) throw DomainError("--shard: N must be between 1 and 2^32, got " + n.str());
  if (i < 1 || i > n) throw DomainError("--shard: the part I must be between 1 and " + n.str() + ", got " + i.str());
  return Shard{i.convert_to<std::uint64_t>() - 1, n.convert_to<std::uint64_t>()};
}

}  // namespace fourplat::app
