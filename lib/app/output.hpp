// Shared helpers of the fourplat tool: buffered standard output, JSON pieces, the one-line error
// format, terminal checks, reading tangles from arguments and from line streams.
#pragma once

#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <optional>
#include <iterator>
#include <string>
#include <string_view>
#include <vector>

#include <CLI/CLI.hpp>
#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "fourplat/algebraic.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/error.hpp"
#include "fourplat/integer.hpp"
#include "fourplat/tangle.hpp"
#include "fourplat/two_bridge.hpp"

namespace fourplat::app {

using Json = nlohmann::ordered_json;  // keys in insertion order: the order the guide documents

/// Standard output through one large buffer (written with fwrite when it fills, and at exit).
class Output {
 public:
  static Output& get();
  template <typename... Args>
  void print(fmt::format_string<Args...> f, Args&&... args) {
    fmt::format_to(std::back_inserter(buf_), f, std::forward<Args>(args)...);
    if (buf_.size() >= kFlushAt) flush();
  }
  void write(std::string_view s) {
    buf_.append(s.data(), s.data() + s.size());
    if (buf_.size() >= kFlushAt) flush();
  }
  /// The buffer itself, for writers that append piece by piece; call maybe_flush() after.
  fmt::memory_buffer& buffer() noexcept { return buf_; }
  void maybe_flush() {
    if (buf_.size() >= kFlushAt) flush();
  }
  /// Writes everything buffered; throws std::runtime_error if stdout fails.
  void flush();

 private:
  static constexpr std::size_t kFlushAt = std::size_t{1} << 16;
  fmt::memory_buffer buf_;
};

/// stdout / stdin / stderr is a terminal.
bool stdout_is_terminal();
bool stdin_is_terminal();
bool stderr_is_terminal();

/// Writes "fourplat: <message>" as one line on stderr (after flushing stdout, to keep order).
void print_error(std::string_view message);

/// The input quoted for a message: at most ~60 characters, control characters shown as '?'.
/// (The std::string overload beats std::quoted, which argument-dependent lookup also finds.)
std::string quoted(std::string_view input);
inline std::string quoted(const std::string& input) { return quoted(std::string_view(input)); }

/// An Integer as JSON: a number when it fits int64, else its decimal string (docs/tool.md).
Json integer_json(const Integer& x);

/// Appends s as a JSON string literal (escapes; invalid UTF-8 bytes become U+FFFD).
void append_json_string(fmt::memory_buffer& out, std::string_view s);
/// The same into raw memory with room for 6 * s.size() + 2 bytes; returns the end.
char* write_json_string(char* out, std::string_view s) noexcept;

/// Groups command-line words into tangle texts, so that unquoted sums and twist sequences work:
/// words inside an open '[' or joined by '+' form one tangle ("[2", "1]", "3/5", "+", "2/7" gives
/// "[2 1]" and "3/5 + 2/7").
std::vector<std::string> group_words(const std::vector<std::string>& words);

/// parse_tangle_sum, with the error rethrown as "bad tangle '<input>': <what>".
TangleSum read_tangle_sum(std::string_view text);
/// A rational tangle (a sum that folds to one is accepted too), or an Error saying why not.
RationalTangle read_rational_tangle(std::string_view text);

/// The fields of a 2-bridge closure as JSON: link, p, q, canonical, canonical_mirror, oriented
/// (when given), components, determinant, crossing_number, amphichiral, kind, three_colorable.
Json link_json(const TwoBridgeLink& l, const OrientedTwoBridgeLink* oriented);
/// The same as labelled lines, each starting with `indent`.
void print_link(const TwoBridgeLink& l, const OrientedTwoBridgeLink* oriented, std::string_view indent);
/// The oriented closure of a rational tangle: N(F), or D(F) = N(−1/F) as oriented links.
OrientedTwoBridgeLink oriented_closure(const RationalTangle& t, Closure which);

/// The largest diagram the tool builds (a witness or a code needs the diagram in memory:
/// about 200 bytes a crossing).
inline constexpr std::int64_t kMaxToolCrossings = 2000000;

/// Number of crossings of the diagram draw_diagram would build (without building it).
Integer diagram_crossings(const TangleSum& s, bool canonical);
/// The standard diagram of the tangle as written: a single tangle from its given twists (or its
/// canonical ones, for a fraction or with `canonical`), a sum from its summands left to right.
/// Throws LimitError above kMaxToolCrossings.
Diagram draw_diagram(const TangleSum& s, DiagramClosure closure, bool canonical);
/// What draw_diagram draws, for messages: "[2 1 2]" or "3/5 + [2 1]" (canonical twists shown).
std::string drawn_twists(const TangleSum& s, bool canonical);

/// A --modulus value: a positive decimal integer of any size (ParseError / DomainError if not).
Integer read_modulus(const std::string& text);
/// A non-constant n-coloring of a closed diagram drawn by draw_diagram(s, ...), one color per
/// arc: integer propagation through a single rational tangle (Kauffman–Lambropoulou), the Smith
/// form of the coloring matrix for a sum. nullopt when only constant colorings exist.
std::optional<std::vector<Integer>> diagram_witness(const TangleSum& s, const Diagram& d, const Integer& n);

/// Reads a whole file, or standard input for "-"; throws Error if it cannot.
std::string read_file_or_stdin(const std::string& path);
/// Writes text to a file (replacing it), or to standard output for "" or "-".
void write_file_or_stdout(const std::string& path, std::string_view text);

/// Adds --closure numerator|denominator to a command.
void add_closure_option(CLI::App& app, Closure& closure);

/// Reads lines from a file descriptor through a large buffer; a line is valid until the next
/// call. Memory stays flat: only a line longer than the buffer is copied (and only that line).
/// Before each read that may wait for input, the buffered output is flushed, so a pipeline that
/// feeds lines slowly gets its answers as they come.
class LineReader {
 public:
  explicit LineReader(int fd) : fd_(fd), buf_(std::size_t{1} << 16) {}
  /// Reads the FILE's descriptor directly (do not mix with stdio reads of the same FILE).
  explicit LineReader(std::FILE* f) : LineReader(fileno(f)) {}
  /// The next line without its '\n' (and '\r'); false at the end of the input.
  bool next(std::string_view& line);
  /// 1-based number of the line last returned.
  [[nodiscard]] std::uint64_t line_number() const noexcept { return number_; }

 private:
  bool refill();
  int fd_;
  std::vector<char> buf_;
  std::size_t pos_ = 0;
  std::size_t end_ = 0;
  std::string carry_;
  bool eof_ = false;
  std::uint64_t number_ = 0;
};

/// A progress counter on stderr, shown only when stderr is a terminal and stdout and stdin are not
/// (so it never mixes with output on the screen or with typing).
class Progress {
 public:
  explicit Progress(std::string_view what);
  ~Progress();
  Progress(const Progress&) = delete;
  Progress& operator=(const Progress&) = delete;
  void tick() {
    if (enabled_ && (++count_ & 0xFFFFU) == 0) show();
  }

 private:
  void show();
  bool enabled_;
  bool shown_ = false;
  std::uint64_t count_ = 0;
  std::string what_;
};

/// Lower-case words for the text output.
inline const char* yes_no(bool b) { return b ? "yes" : "no"; }

}  // namespace fourplat::app
