// Streamed rows of the listing commands (enumerate, family): the field table, the filters, the
// three output formats, the progress bar, and clean stops on Ctrl-C.
//
// A Row describes one 2-bridge class (or one rational tangle and its numerator closure) with
// big-integer values that are reused from row to row, so streaming allocates nothing per row
// once the buffers have grown. Every field is one entry of the table in fields.cpp — a name, a
// one-line help, the kind of its value and a function Row → Cell — so an invariant added later
// (a polynomial, a signature) is one more entry: its function receives the row's fraction and
// twist sequence, and the writers need no change.
//
// Output is written in whole lines only: rows are formatted into a buffer that is handed to the
// operating system at line boundaries, and SIGINT/SIGTERM only set a flag that the listing loop
// checks after each row, so an interrupted run leaves complete lines (and exits with 130).
#pragma once

#include <csignal>
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include <CLI/CLI.hpp>
#include <fmt/format.h>

#include "fourplat/enumerate.hpp"
#include "fourplat/error.hpp"
#include "fourplat/families.hpp"
#include "fourplat/integer.hpp"

namespace fourplat::app {

/// One listed item. Link rows: the class b(p,q) in the listing's classification (q odd and
/// below 2p when oriented), drawn by the tangle fraction_p/fraction_q. Tangle rows: the tangle
/// fraction_p/fraction_q, with p, q the Schubert form of its numerator closure.
struct Row {
  bool tangle = false;
  bool oriented = false;  ///< q is an oriented form
  std::uint64_t index = 0;  ///< 1-based position in the output
  std::int64_t crossings = 0;         ///< crossing number of the link
  std::int64_t tangle_crossings = 0;  ///< crossing number of the drawing tangle
  int components = 0;
  bool amphichiral = false;
  Integer p, q;
  Integer fraction_p, fraction_q;
  Integer canonical_q, canonical_mirror_q;
  std::vector<Integer> twists;  ///< the given or canonical twist sequence (when needed)
  bool has_twists = false;

  void set(const EnumeratedLink& it, bool oriented_listing);
  void set(const LinkClass& c, bool oriented_listing);
  /// A tangle row for the fraction p/q (q ≥ 0).
  void set_tangle(const Integer& fp, const Integer& fq, std::int64_t tangle_cross);
};

/// A formatted value.
struct Cell {
  enum Kind { integer, string, boolean, null } kind = null;
  std::string text;  ///< decimal digits, the string itself, or "true"/"false"
  bool fits_word = true;  ///< an integer that fits int64 (JSON writes bigger ones as strings)
};

/// Settings some fields read.
struct FieldContext {
  Integer modulus = 3;  ///< for colorable and colorings
};

struct FieldDef {
  std::string_view name;
  std::string_view help;
  bool needs_twists = false;
  void (*get)(const Row&, const FieldContext&, Cell&) = nullptr;
};

/// Every field, in the order --list-fields prints them.
const std::vector<FieldDef>& all_fields();
/// The fields of a comma-separated list ("all" for every field, a leading '+' adds to the
/// defaults); throws Error naming an unknown field and the valid ones.
std::vector<const FieldDef*> select_fields(std::string_view list, std::string_view defaults);
/// The --list-fields text.
std::string fields_help();

/// Row filters of the listing commands (all must hold).
struct Filters {
  std::optional<int> components;  ///< 1 (knots) or 2 (links)
  std::optional<Integer> colorable;  ///< non-trivially colorable mod n: gcd(n, p) > 1
  std::optional<bool> amphichiral;
  std::optional<Integer> det_divisible_by;
  std::optional<std::pair<std::int64_t, std::int64_t>> crossings;
  [[nodiscard]] bool accept(const Row& r) const;
};

enum class Format { jsonl, csv, table };

/// Options shared by every listing command.
struct ListingOptions {
  std::string fields;
  std::string format;  ///< "" = table on a terminal, jsonl otherwise
  bool no_header = false;
  bool list_fields = false;
  bool count_only = false;
  std::string modulus = "3";
  std::string colorable;  ///< text of --colorable (an integer ≥ 2), "" for none
  bool amphichiral = false;
  bool chiral = false;
  std::string det_divisible_by;
};
void add_listing_options(CLI::App& app, ListingOptions& o);
/// Filters from the options (and a component restriction).
Filters make_filters(const ListingOptions& o, std::optional<int> components);
/// The field settings from the options (--modulus, an integer ≥ 1).
FieldContext make_context(const ListingOptions& o);

/// Formats rows in whole lines on standard output.
class RowWriter {
 public:
  RowWriter(const ListingOptions& o, std::vector<const FieldDef*> fields, FieldContext ctx);
  ~RowWriter();
  RowWriter(const RowWriter&) = delete;
  RowWriter& operator=(const RowWriter&) = delete;
  /// Applies the filters, numbers the row and writes it; returns false once interrupted.
  bool write(Row& r);
  /// Writes what is buffered (and, for --count, the count).
  void finish();
  [[nodiscard]] bool needs_twists() const noexcept { return needs_twists_; }
  [[nodiscard]] std::uint64_t rows() const noexcept { return rows_; }
  Filters filters;

 private:
  void emit_line(const std::vector<Cell>& cells);
  void flush_table_widths();
  void flush_out(bool all);
  Format format_;
  bool header_;
  bool count_only_;
  std::vector<const FieldDef*> fields_;
  FieldContext ctx_;
  bool needs_twists_ = false;
  std::uint64_t rows_ = 0;
  std::vector<Cell> cells_;
  fmt::memory_buffer out_;
  // Table: the first rows are held back to size the columns.
  std::vector<std::vector<Cell>> pending_;
  std::vector<std::size_t> widths_;
  bool widths_fixed_ = false;
};

/// SIGINT and SIGTERM set a flag while one of these lives (the previous handlers come back).
class InterruptGuard {
 public:
  InterruptGuard();
  ~InterruptGuard();
  InterruptGuard(const InterruptGuard&) = delete;
  InterruptGuard& operator=(const InterruptGuard&) = delete;
  [[nodiscard]] static bool interrupted() noexcept;
  /// Throws app::Exit{130} when interrupted (after the caller flushed its lines).
  static void exit_if_interrupted();
};

/// A progress bar on stderr, drawn only when stderr is a terminal and stdout is not.
class ProgressBar {
 public:
  explicit ProgressBar(std::string what);
  ~ProgressBar();
  ProgressBar(const ProgressBar&) = delete;
  ProgressBar& operator=(const ProgressBar&) = delete;
  void update(double fraction);
  [[nodiscard]] bool enabled() const noexcept { return enabled_; }

 private:
  bool enabled_;
  bool drawn_ = false;
  std::string what_;
  std::int64_t last_ms_ = 0;
};

/// "N" or "A..B" (A ≤ B), each a non-negative integer; `what` names the option in errors.
std::pair<std::int64_t, std::int64_t> parse_crossing_range(std::string_view text, std::string_view what);
/// "A..B" or "N" over big integers (either sign).
std::pair<Integer, Integer> parse_integer_range(std::string_view text, std::string_view what);
/// The message of a ParseError without its "at character N: " prefix (to wrap it in context).
std::string bare_message(const ParseError& e);
/// "I/N" with 1 ≤ I ≤ N ≤ 2^32, to the library's 0-based Shard.
Shard parse_shard(std::string_view text);

}  // namespace fourplat::app
