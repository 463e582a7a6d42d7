// Shared helpers of the fourplat tool (see output.hpp).
#include "output.hpp"

#include <unistd.h>

#include <cerrno>
#include <cstring>
#include <stdexcept>

#include "fourplat/coloring.hpp"
#include "fourplat/parse.hpp"

namespace fourplat::app {

Output& Output::get() {
  static Output out;
  return out;
}

void Output::flush() {
  if (buf_.size() == 0) return;
  const std::size_t n = std::fwrite(buf_.data(), 1, buf_.size(), stdout);
  buf_.clear();
  if (n == 0 || std::fflush(stdout) != 0) throw std::runtime_error("cannot write to standard output");
}

bool stdout_is_terminal() { return ::isatty(STDOUT_FILENO) == 1; }
bool stdin_is_terminal() { return ::isatty(STDIN_FILENO) == 1; }
bool stderr_is_terminal() { return ::isatty(STDERR_FILENO) == 1; }

void print_error(std::string_view message) {
  try {
    Output::get().flush();
  } catch (const std::exception&) {  // stdout is gone; the error still goes to stderr
  }
  std::string line = "fourplat: ";
  for (char c : message) line += (c == '\n' || c == '\r') ? ' ' : c;  // one line, always
  line += '\n';
  std::fputs(line.c_str(), stderr);
  std::fflush(stderr);
}

std::string quoted(std::string_view input) {
  constexpr std::size_t kMax = 60;
  std::string out = "'";
  std::size_t shown = 0;
  for (std::size_t i = 0; i < input.size(); ++i) {
    const auto b = static_cast<unsigned char>(input[i]);
    if (shown >= kMax && (b & 0xC0U) != 0x80U) {
      out += "...";
      break;
    }
    out += (b < 0x20 || b == 0x7F) ? '?' : input[i];
    if ((b & 0xC0U) != 0x80U) ++shown;
  }
  out += "'";
  return out;
}

Json integer_json(const Integer& x) {
  if (const auto w = to_int64(x)) return *w;
  return x.str();
}

char* write_json_string(char* out, std::string_view s) noexcept {
  static constexpr char hex[] = "0123456789abcdef";
  *out++ = '"';
  const std::size_t n = s.size();
  for (std::size_t i = 0; i < n;) {
    const auto b = static_cast<unsigned char>(s[i]);
    if (b >= 0x20 && b < 0x80 && b != '"' && b != '\\') {  // the common case: copied as is
      *out++ = static_cast<char>(b);
      ++i;
    } else if (b == '"' || b == '\\') {
      *out++ = '\\';
      *out++ = static_cast<char>(b);
      ++i;
    } else if (b < 0x20) {
      const char esc[] = {'\\', 'u', '0', '0', hex[b >> 4U], hex[b & 0xFU]};
      std::memcpy(out, esc, 6);
      out += 6;
      ++i;
    } else {
      // A valid UTF-8 sequence is copied; anything else becomes U+FFFD, one byte at a time.
      std::size_t len = 0;
      if (b >= 0xC2 && b <= 0xDF) len = 2;
      else if (b >= 0xE0 && b <= 0xEF) len = 3;
      else if (b >= 0xF0 && b <= 0xF4) len = 4;
      bool ok = len != 0 && i + len <= n;
      for (std::size_t k = 1; ok && k < len; ++k) {
        ok = (static_cast<unsigned char>(s[i + k]) & 0xC0U) == 0x80U;
      }
      if (ok && len == 3) {  // no overlong forms, no surrogates
        const auto b1 = static_cast<unsigned char>(s[i + 1]);
        ok = !(b == 0xE0 && b1 < 0xA0) && !(b == 0xED && b1 >= 0xA0);
      }
      if (ok && len == 4) {
        const auto b1 = static_cast<unsigned char>(s[i + 1]);
        ok = !(b == 0xF0 && b1 < 0x90) && !(b == 0xF4 && b1 >= 0x90);
      }
      if (ok) {
        std::memcpy(out, s.data() + i, len);
        out += len;
        i += len;
      } else {
        std::memcpy(out, "\xEF\xBF\xBD", 3);
        out += 3;
        ++i;
      }
    }
  }
  *out++ = '"';
  return out;
}

void append_json_string(fmt::memory_buffer& out, std::string_view s) {
  const std::size_t start = out.size();
  out.resize(start + 6 * s.size() + 2);
  char* end = write_json_string(out.data() + start, s);
  out.resize(static_cast<std::size_t>(end - out.data()));
}

std::vector<std::string> group_words(const std::vector<std::string>& words) {
  std::vector<std::string> groups;
  bool have = false;  // a group is under way (it may be empty text: an empty argument)
  int depth = 0;      // '[' not yet closed in the group
  bool open = false;  // the group ends with '+' and needs a next summand
  for (const std::string& w : words) {
    const std::string_view t = w;
    const std::size_t first = t.find_first_not_of(" \t");
    const bool starts_plus = first != std::string_view::npos && t[first] == '+';
    if (have && (open || depth > 0 || starts_plus)) {
      groups.back() += ' ';
      groups.back() += w;
    } else {
      groups.push_back(w);
      depth = 0;
    }
    have = true;
    for (char c : w) depth += c == '[' ? 1 : c == ']' ? -1 : 0;
    if (depth < 0) depth = 0;
    const std::size_t last = t.find_last_not_of(" \t");
    open = last != std::string_view::npos && t[last] == '+';
  }
  for (std::string& g : groups) {  // trim: main() may have put a space before a '['
    const std::size_t a = g.find_first_not_of(" \t");
    g.erase(0, a == std::string::npos ? g.size() : a);
    const std::size_t z = g.find_last_not_of(" \t");
    g.erase(z == std::string::npos ? 0 : z + 1);
  }
  return groups;
}

TangleSum read_tangle_sum(std::string_view text) {
  try {
    return parse_tangle_sum(text);
  } catch (const ParseError& e) {
    throw ParseError(e.position(), "bad tangle " + quoted(text) + ": " + e.what());
  }
}

RationalTangle read_rational_tangle(std::string_view text) {
  const TangleSum s = read_tangle_sum(text);
  if (s.summands().size() == 1) return s.summands().front();
  if (auto t = s.as_rational()) return *t;
  throw DomainError(quoted(text) + " is a sum of " + std::to_string(s.rational_parts()) +
                    " non-integer rational tangles, which is not a rational tangle");
}

Json link_json(const TwoBridgeLink& l, const OrientedTwoBridgeLink* oriented) {
  Json j;
  j["link"] = to_string(l);
  j["p"] = integer_json(l.p());
  j["q"] = integer_json(l.q());
  j["canonical"] = to_string(l.canonical());
  j["canonical_mirror"] = to_string(l.canonical_up_to_mirror());
  if (oriented != nullptr) j["oriented"] = to_string(oriented->canonical());
  j["components"] = l.components();
  j["determinant"] = integer_json(l.determinant());
  j["crossing_number"] = integer_json(l.crossing_number());
  j["amphichiral"] = l.is_amphichiral();
  j["kind"] = to_string(l.kind());
  j["three_colorable"] = l.p() % 3 == 0;  // Fox 3-colorable iff 3 | det (common practice)
  return j;
}

void print_link(const TwoBridgeLink& l, const OrientedTwoBridgeLink* oriented, std::string_view indent) {
  Output& out = Output::get();
  const auto line = [&](std::string_view label, const std::string& value) {
    out.print("{}{:<18}{}\n", indent, label, value);
  };
  line("link", to_string(l));
  line("canonical", to_string(l.canonical()) + "  (least q of the class)");
  line("up to mirror", to_string(l.canonical_up_to_mirror()));
  if (oriented != nullptr) line("oriented", to_string(oriented->canonical()) + "  (Schubert, q mod 2p)");
  line("components", l.components() == 1 ? std::string("1 (a knot)") : std::string("2 (a link)"));
  line("determinant", l.determinant().str());
  line("crossing number", l.crossing_number().str());
  line("amphichiral", yes_no(l.is_amphichiral()));
  line("kind", to_string(l.kind()));
  line("3-colorable", yes_no(l.p() % 3 == 0));
}

OrientedTwoBridgeLink oriented_closure(const RationalTangle& t, Closure which) {
  if (which == Closure::numerator) return OrientedTwoBridgeLink::numerator_closure(t.fraction());
  return OrientedTwoBridgeLink::numerator_closure(-t.fraction().reciprocal());
}

namespace {
TwistSequence drawn(const RationalTangle& t, bool canonical) {
  return canonical ? t.canonical_twists() : t.twists();
}
}  // namespace

Integer diagram_crossings(const TangleSum& s, bool canonical) {
  Integer n = 0;
  for (const RationalTangle& t : s.summands()) {
    for (const Integer& a : drawn(t, canonical).twists) n += abs(a);
  }
  return n;
}

Diagram draw_diagram(const TangleSum& s, DiagramClosure closure, bool canonical) {
  const Integer n = diagram_crossings(s, canonical);
  if (n > kMaxToolCrossings) {
    throw LimitError("the diagram would have " + n.str() + " crossings; the tool draws at most " +
                     std::to_string(kMaxToolCrossings));
  }
  if (s.summands().size() == 1) return Diagram::of_twists(drawn(s.summands().front(), canonical), closure);
  std::vector<TwistSequence> parts;
  for (const RationalTangle& t : s.summands()) parts.push_back(drawn(t, canonical));
  return Diagram::of_sum(parts, closure);
}

std::string drawn_twists(const TangleSum& s, bool canonical) {
  std::string out;
  for (const RationalTangle& t : s.summands()) {
    if (!out.empty()) out += " + ";
    out += to_string(drawn(t, canonical));
  }
  return out;
}

Integer read_modulus(const std::string& text) {
  Integer n;
  try {
    n = parse_integer(text);
  } catch (const ParseError& e) {
    throw ParseError(e.position(), "bad modulus " + quoted(text) + ": " + e.what());
  }
  if (n <= 0) throw DomainError("the modulus must be a positive integer, not " + n.str());
  return n;
}

std::optional<std::vector<Integer>> diagram_witness(const TangleSum& s, const Diagram& d, const Integer& n) {
  return s.summands().size() == 1 ? propagated_witness(d, n) : coloring_witness(d, n);
}

std::string read_file_or_stdin(const std::string& path) {
  std::string text;
  std::FILE* f = path == "-" ? stdin : std::fopen(path.c_str(), "rb");
  if (f == nullptr) throw Error("cannot open " + quoted(path) + ": " + std::strerror(errno));
  std::vector<char> buf(std::size_t{1} << 16);
  std::size_t n = 0;
  while ((n = std::fread(buf.data(), 1, buf.size(), f)) > 0) text.append(buf.data(), n);
  const bool failed = std::ferror(f) != 0;
  if (f != stdin) std::fclose(f);
  if (failed) throw Error("cannot read " + quoted(path));
  return text;
}

void write_file_or_stdout(const std::string& path, std::string_view text) {
  if (path.empty() || path == "-") {
    Output::get().write(text);
    return;
  }
  std::FILE* f = std::fopen(path.c_str(), "wb");
  // Failing to write is not bad input: std::runtime_error, exit status 1.
  if (f == nullptr) throw std::runtime_error("cannot write " + quoted(path) + ": " + std::strerror(errno));
  const bool ok = std::fwrite(text.data(), 1, text.size(), f) == text.size();
  if (std::fclose(f) != 0 || !ok) throw std::runtime_error("cannot write " + quoted(path));
}

void add_closure_option(CLI::App& app, Closure& closure) {
  app.add_option_function<std::string>(
         "-c,--closure", [&closure](const std::string& s) { closure = parse_closure(s); },
         "which closure: numerator N(T) (joins NW-NE and SW-SE; the default) or denominator "
         "D(T) (joins NW-SW and NE-SE)")
      ->check(CLI::IsMember({"numerator", "denominator"}))
      ->option_text("numerator|denominator");
}

bool LineReader::refill() {
  if (eof_) return false;
  Output::get().flush();  // the reader may wait: let the answers so far out first
  pos_ = 0;
  for (;;) {
    const ssize_t n = ::read(fd_, buf_.data(), buf_.size());
    if (n > 0) {
      end_ = static_cast<std::size_t>(n);
      return true;
    }
    if (n == 0) break;
    if (errno != EINTR) throw std::runtime_error("cannot read the input: " + std::string(std::strerror(errno)));
  }
  end_ = 0;
  eof_ = true;
  return false;
}

bool LineReader::next(std::string_view& line) {
  carry_.clear();
  for (;;) {
    if (pos_ == end_ && !refill()) {
      if (carry_.empty()) return false;
      line = carry_;  // a last line without '\n'
      break;
    }
    const char* start = buf_.data() + pos_;
    const auto* nl = static_cast<const char*>(std::memchr(start, '\n', end_ - pos_));
    if (nl != nullptr) {
      const auto len = static_cast<std::size_t>(nl - start);
      pos_ += len + 1;
      if (carry_.empty()) {
        line = std::string_view(start, len);
      } else {
        carry_.append(start, len);
        line = carry_;
      }
      break;
    }
    carry_.append(start, end_ - pos_);
    pos_ = end_;
  }
  if (!line.empty() && line.back() == '\r') line.remove_suffix(1);
  ++number_;
  return true;
}

Progress::Progress(std::string_view what)
    : enabled_(stderr_is_terminal() && !stdout_is_terminal() && !stdin_is_terminal()), what_(what) {}

Progress::~Progress() {
  if (shown_) std::fputs("\r\033[K", stderr);
}

void Progress::show() {
  std::fprintf(stderr, "\rfourplat: %s %llu", what_.c_str(), static_cast<unsigned long long>(count_));
  std::fflush(stderr);
  shown_ = true;
}

}  // namespace fourplat::app
