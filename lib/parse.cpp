// Parsers for fourplat's text forms (grammar in fourplat/parse.hpp and docs/tool.md).
//
// One hand-written cursor over the input, no recursion, no backtracking beyond a few characters:
// every parser is linear in the input. Big integers go through GMP's mpz_set_str, which converts
// long digit strings by divide and conquer (subquadratic).
#include "fourplat/parse.hpp"

#include "detail/word.hpp"  // binary gcd on words (Stein 1967)

#include <gmp.h>

#include <array>
#include <cstddef>
#include <utility>
#include <vector>

namespace fourplat {
namespace {

constexpr std::string_view kMinus = "\xE2\x88\x92";     // U+2212 MINUS SIGN
constexpr std::string_view kInfinity = "\xE2\x88\x9E";  // U+221E INFINITY

constexpr bool is_space(char c) noexcept {
  return c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\v' || c == '\f';
}
constexpr bool is_digit(char c) noexcept { return c >= '0' && c <= '9'; }

/// Number of code points in the first `bytes` bytes of UTF-8 text (continuation bytes skipped).
std::size_t code_points(std::string_view s, std::size_t bytes) noexcept {
  std::size_t n = 0;
  for (std::size_t i = 0; i < bytes && i < s.size(); ++i) {
    if ((static_cast<unsigned char>(s[i]) & 0xC0U) != 0x80U) ++n;
  }
  return n;
}

/// Length of the valid UTF-8 sequence starting at s[i], or 0 if it is not one.
std::size_t utf8_length(std::string_view s, std::size_t i) noexcept {
  const auto b = static_cast<unsigned char>(s[i]);
  std::size_t len = 0;
  if (b >= 0xC2 && b <= 0xDF) len = 2;
  else if (b >= 0xE0 && b <= 0xEF) len = 3;
  else if (b >= 0xF0 && b <= 0xF4) len = 4;
  else return 0;
  if (i + len > s.size()) return 0;
  for (std::size_t k = 1; k < len; ++k) {
    if ((static_cast<unsigned char>(s[i + k]) & 0xC0U) != 0x80U) return 0;
  }
  return len;
}

class Cursor {
 public:
  explicit Cursor(std::string_view s) : s_(s) {}

  [[nodiscard]] std::size_t pos() const noexcept { return i_; }
  void seek(std::size_t i) noexcept { i_ = i; }
  [[nodiscard]] bool at_end() const noexcept { return i_ >= s_.size(); }
  [[nodiscard]] char peek() const noexcept { return at_end() ? '\0' : s_[i_]; }
  [[nodiscard]] bool starts_with(std::string_view t) const noexcept {
    return s_.substr(i_).starts_with(t);
  }

  /// Skips whitespace; true if any was skipped.
  bool skip_space() noexcept {
    const std::size_t start = i_;
    while (!at_end() && is_space(s_[i_])) ++i_;
    return i_ != start;
  }

  /// Throws "expected <what>, found <the character at byte offset at>".
  [[noreturn]] void fail(std::size_t at, std::string_view what) const {
    throw ParseError(code_points(s_, at), "expected " + std::string(what) + ", found " + found(at));
  }
  [[noreturn]] void fail_here(std::string_view what) const { fail(i_, what); }
  /// Throws with a message of its own at byte offset `at`.
  [[noreturn]] void fail_message(std::size_t at, const std::string& message) const {
    throw ParseError(code_points(s_, at), message);
  }

  /// Length of a sign (+, -, −) at the cursor, 0 if none; `negative` tells which.
  std::size_t sign_length(bool& negative) const noexcept {
    negative = false;
    if (peek() == '+') return 1;
    if (peek() == '-') {
      negative = true;
      return 1;
    }
    if (starts_with(kMinus)) {
      negative = true;
      return kMinus.size();
    }
    return 0;
  }

  /// Whether an integer (a sign followed by a digit, or a digit) starts at the cursor.
  [[nodiscard]] bool integer_starts() const noexcept {
    bool negative = false;
    const std::size_t n = sign_length(negative);
    return i_ + n < s_.size() && is_digit(s_[i_ + n]);
  }

  /// [sign] digits.
  Integer integer(std::string_view what) {
    bool negative = false;
    const std::size_t sign = sign_length(negative);
    if (!(i_ + sign < s_.size() && is_digit(s_[i_ + sign]))) {
      fail(sign != 0 ? i_ + sign : i_, sign != 0 ? "a digit after the sign" : what);
    }
    i_ += sign;
    const std::size_t start = i_;
    while (!at_end() && is_digit(s_[i_])) ++i_;
    const std::string_view digits = s_.substr(start, i_ - start);
    Integer x;
    if (digits.size() <= 18) {  // < 10^18 < 2^63: exact in a word
      std::int64_t v = 0;
      for (char c : digits) v = v * 10 + (c - '0');
      x = v;
    } else {
      // mpz_set_str needs a terminated string of the digits alone (no sign, no base prefix).
      const std::string copy(digits);
      mpz_set_str(x.backend().data(), copy.c_str(), 10);
    }
    if (negative) x = -x;
    return x;
  }

  /// Case-insensitive "inf" not followed by a letter or digit, or "∞"; consumed when present.
  bool infinity_word() noexcept {
    if (starts_with(kInfinity)) {
      i_ += kInfinity.size();
      return true;
    }
    if (i_ + 3 > s_.size()) return false;
    for (std::size_t k = 0; k < 3; ++k) {
      const char c = static_cast<char>(s_[i_ + k] | 0x20);  // ASCII lower case
      if (c != "inf"[k]) return false;
    }
    i_ += 3;
    return true;
  }

  /// A fraction: [sign] inf | ∞ | integer [ws '/' ws integer].
  Fraction fraction(std::string_view what) {
    const std::size_t start = i_;
    bool negative = false;
    const std::size_t sign = sign_length(negative);
    i_ += sign;
    if (infinity_word()) return Fraction::infinity();
    i_ = start;
    Integer p = integer(what);
    const std::size_t after = i_;
    skip_space();
    if (peek() != '/') {
      i_ = after;
      return Fraction(std::move(p));
    }
    const std::size_t slash = i_++;
    skip_space();
    Integer q = integer("the denominator (an integer) after '/'");
    if (p == 0 && q == 0) {
      fail_message(slash, "0/0 is not a fraction: expected a non-zero numerator or denominator");
    }
    return Fraction(std::move(p), std::move(q));
  }

  /// '[' ws integer (sep integer)* ws ']' with sep = whitespace and/or one comma.
  TwistSequence twists() {
    if (peek() != '[') fail_here("'[' to open a twist sequence");
    ++i_;
    skip_space();
    TwistSequence seq;
    if (peek() == ']') fail_here("a twist (an integer): a twist sequence has at least one term");
    seq.twists.push_back(integer("a twist (an integer)"));
    for (;;) {
      const bool spaced = skip_space();
      if (peek() == ']') {
        ++i_;
        return seq;
      }
      if (peek() == ',') {
        ++i_;
        skip_space();
        seq.twists.push_back(integer("a twist (an integer) after ','"));
        continue;
      }
      if (spaced && integer_starts()) {
        seq.twists.push_back(integer("a twist (an integer)"));
        continue;
      }
      fail_here(spaced ? "a twist (an integer), ',' or ']'" : "',', a space or ']' after a twist");
    }
  }

  /// A rational tangle: a twist sequence or a fraction.
  RationalTangle tangle() {
    if (peek() == '[') return RationalTangle(twists());
    return RationalTangle(fraction("a tangle (an integer, a fraction P/Q, inf, or twists [a1 ... an])"));
  }

  /// Whitespace, then the end of the input.
  void finish(std::string_view what = "end of input") {
    skip_space();
    if (!at_end()) fail_here(what);
  }

 private:
  std::string found(std::size_t at) const {
    if (at >= s_.size()) return "end of input";
    const char c = s_[at];
    const auto b = static_cast<unsigned char>(c);
    if (b >= 0x21 && b < 0x7F) return std::string("'") + c + "'";
    if (b == ' ') return "a space";
    if (b < 0x80) return "a control character";
    const std::size_t len = utf8_length(s_, at);
    if (len != 0) return "'" + std::string(s_.substr(at, len)) + "'";
    static constexpr std::array<char, 16> hex = {'0', '1', '2', '3', '4', '5', '6', '7',
                                                 '8', '9', 'A', 'B', 'C', 'D', 'E', 'F'};
    return std::string("byte 0x") + hex[b >> 4U] + hex[b & 0xFU] + " (not UTF-8)";
  }

  std::string_view s_;
  std::size_t i_ = 0;
};

/// b(p,q) into p and q; checks coprimality.
std::pair<Integer, Integer> link_numbers(Cursor& c) {
  c.skip_space();
  const std::size_t start = c.pos();
  if (c.peek() != 'b') c.fail_here("a 2-bridge link b(p,q)");
  c.seek(c.pos() + 1);
  c.skip_space();
  if (c.peek() != '(') c.fail_here("'(' after b");
  c.seek(c.pos() + 1);
  c.skip_space();
  Integer p = c.integer("p (an integer) in b(p,q)");
  c.skip_space();
  if (c.peek() != ',') c.fail_here("',' between p and q in b(p,q)");
  c.seek(c.pos() + 1);
  c.skip_space();
  Integer q = c.integer("q (an integer) in b(p,q)");
  c.skip_space();
  if (c.peek() != ')') c.fail_here("')' to close b(p,q)");
  c.seek(c.pos() + 1);
  c.finish();
  if (gcd(p, q) != 1) {
    c.fail_message(start, "b(" + p.str() + "," + q.str() +
                              ") is not a 2-bridge link: expected coprime p and q");
  }
  return {std::move(p), std::move(q)};
}

// Checked word arithmetic for parse_fraction_word: v = 10 v + d while v ≤ 2^63 − 1.
bool push_digit(std::int64_t& v, char c) noexcept {
  return !__builtin_mul_overflow(v, 10, &v) && !__builtin_add_overflow(v, c - '0', &v);
}

std::uint64_t magnitude(std::int64_t x) noexcept {
  return x < 0 ? std::uint64_t{0} - static_cast<std::uint64_t>(x) : static_cast<std::uint64_t>(x);
}


}  // namespace

Integer parse_integer(std::string_view text) {
  Cursor c(text);
  c.skip_space();
  Integer x = c.integer("an integer");
  c.finish();
  return x;
}

Fraction parse_fraction(std::string_view text) {
  Cursor c(text);
  c.skip_space();
  Fraction f = c.fraction("a fraction (an integer, P/Q or inf)");
  c.finish();
  return f;
}

TwistSequence parse_twist_sequence(std::string_view text) {
  Cursor c(text);
  c.skip_space();
  TwistSequence s = c.twists();
  c.finish();
  return s;
}

RationalTangle parse_tangle(std::string_view text) {
  Cursor c(text);
  c.skip_space();
  RationalTangle t = c.tangle();
  c.skip_space();
  if (c.peek() == '+') c.fail_here("end of input (a sum of tangles is not accepted here)");
  c.finish();
  return t;
}

TangleSum parse_tangle_sum(std::string_view text) {
  Cursor c(text);
  std::vector<RationalTangle> parts;
  c.skip_space();
  parts.push_back(c.tangle());
  for (;;) {
    c.skip_space();
    if (c.at_end()) break;
    if (c.peek() != '+') c.fail_here("'+' or end of input");
    c.seek(c.pos() + 1);
    c.skip_space();
    parts.push_back(c.tangle());
  }
  return TangleSum(std::move(parts));
}

TwoBridgeLink parse_two_bridge(std::string_view text) {
  Cursor c(text);
  auto [p, q] = link_numbers(c);
  return TwoBridgeLink(std::move(p), std::move(q));
}

OrientedTwoBridgeLink parse_oriented_two_bridge(std::string_view text) {
  Cursor c(text);
  auto [p, q] = link_numbers(c);
  return OrientedTwoBridgeLink(std::move(p), std::move(q));
}

LinkKind parse_link_kind(std::string_view text) {
  Cursor c(text);
  c.skip_space();
  const std::size_t start = c.pos();
  for (LinkKind k : {LinkKind::unlink, LinkKind::unknot, LinkKind::torus, LinkKind::hyperbolic}) {
    const std::string name = to_string(k);
    if (c.starts_with(name)) {
      c.seek(start + name.size());
      c.finish();
      return k;
    }
  }
  c.fail_here("a link kind (unlink, unknot, torus or hyperbolic)");
}

Closure parse_closure(std::string_view text) {
  Cursor c(text);
  c.skip_space();
  const std::size_t start = c.pos();
  for (Closure k : {Closure::numerator, Closure::denominator}) {
    const std::string_view name = to_string(k);
    if (c.starts_with(name)) {
      c.seek(start + name.size());
      c.finish();
      return k;
    }
  }
  c.fail_here("a closure (numerator or denominator)");
}

namespace {
/// One of the given names (exact, or in any ASCII case when `any_case`), as a whole input.
/// to_string(T) must return a view of static text (const char* or std::string_view).
template <typename T, std::size_t N>
T parse_name(std::string_view text, const std::array<T, N>& values, std::string_view what, bool any_case) {
  Cursor c(text);
  c.skip_space();
  const std::size_t start = c.pos();
  for (T v : values) {
    const std::string_view name = to_string(v);
    bool match = start + name.size() <= text.size();
    for (std::size_t k = 0; match && k < name.size(); ++k) {
      const char a = text[start + k], b = name[k];
      match = a == b || (any_case && (a | 0x20) == (b | 0x20) && ((b | 0x20) >= 'a' && (b | 0x20) <= 'z'));
    }
    if (match) {
      c.seek(start + name.size());
      c.finish();
      return v;
    }
  }
  c.fail_here(what);
}
}  // namespace

Corner parse_corner(std::string_view text) {
  return parse_name(text, std::array{Corner::nw, Corner::ne, Corner::sw, Corner::se},
                    "a corner (NW, NE, SW or SE)", true);
}

DiagramClosure parse_diagram_closure(std::string_view text) {
  return parse_name(text, std::array{DiagramClosure::numerator, DiagramClosure::denominator, DiagramClosure::none},
                    "a closure (numerator, denominator or none)", false);
}

BoxKind parse_box_kind(std::string_view text) {
  return parse_name(text, std::array{BoxKind::horizontal, BoxKind::vertical}, "a box kind (horizontal or vertical)",
                    false);
}

std::optional<FractionWord> parse_fraction_word(std::string_view s) noexcept {
  std::size_t i = 0;
  const std::size_t n = s.size();
  auto skip = [&] {
    while (i < n && is_space(s[i])) ++i;
  };
  // [sign] digits into v (magnitude ≤ 2^63 − 1, so negation is safe).
  auto number = [&](std::int64_t& v) -> bool {
    bool negative = false;
    if (i < n && (s[i] == '+' || s[i] == '-')) {
      negative = s[i] == '-';
      ++i;
    } else if (s.substr(i).starts_with(kMinus)) {
      negative = true;
      i += kMinus.size();
    }
    if (i >= n || !is_digit(s[i])) return false;
    v = 0;
    while (i < n && is_digit(s[i])) {
      if (!push_digit(v, s[i])) return false;
      ++i;
    }
    if (negative) v = -v;
    return true;
  };
  std::int64_t p = 0;
  std::int64_t q = 1;
  skip();
  if (!number(p)) return std::nullopt;
  skip();
  if (i < n && s[i] == '/') {
    ++i;
    skip();
    if (!number(q)) return std::nullopt;
    skip();
  }
  if (i != n || q == 0) return std::nullopt;
  if (q < 0) {
    p = -p;
    q = -q;
  }
  const auto g = static_cast<std::int64_t>(detail::gcd(magnitude(p), static_cast<std::uint64_t>(q)));
  return FractionWord{p / g, q / g};  // g ≥ 1 since q ≠ 0
}

std::string to_string(const TwistSequence& s) {
  std::string out = "[";
  for (std::size_t k = 0; k < s.twists.size(); ++k) {
    if (k != 0) out += ' ';
    out += s.twists[k].str();
  }
  out += ']';
  return out;
}

std::string to_string(const RationalTangle& t) {
  return t.has_given_twists() ? to_string(t.twists()) : to_string(t.fraction());
}

std::string to_string(const TangleSum& s) {
  std::string out;
  for (const RationalTangle& t : s.summands()) {
    if (!out.empty()) out += " + ";
    out += to_string(t);
  }
  return out;
}

}  // namespace fourplat
