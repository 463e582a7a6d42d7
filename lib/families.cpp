// lib/families.cpp — twist-sequence families, patterns, and exactly uniform random samples
// (families.hpp; the uniformity argument is in docs/enumeration.md, "Random samples").
#include "fourplat/families.hpp"

#include <algorithm>
#include <cctype>
#include <string>
#include <utility>

#include "fourplat/counts.hpp"
#include "fourplat/error.hpp"
#include "fourplat/two_bridge.hpp"

namespace fourplat {
namespace {

constexpr std::int64_t kMaxSampleCrossings = 100'000;

// Position in code points of byte offset i (ParseError counts characters, not bytes).
std::size_t char_pos(std::string_view s, std::size_t i) {
  std::size_t n = 0;
  for (std::size_t k = 0; k < i && k < s.size(); ++k) {
    if ((static_cast<unsigned char>(s[k]) & 0xC0U) != 0x80U) ++n;
  }
  return n;
}

// Reads an optionally signed decimal integer at s[i]; advances i.
Integer read_integer(std::string_view s, std::size_t& i) {
  const std::size_t start = i;
  std::string digits;
  if (i < s.size() && (s[i] == '-' || s[i] == '+')) {
    if (s[i] == '-') digits.push_back('-');
    ++i;
  }
  const std::size_t first_digit = i;
  while (i < s.size() && std::isdigit(static_cast<unsigned char>(s[i])) != 0) digits.push_back(s[i++]);
  if (i == first_digit) {
    throw ParseError(char_pos(s, i == start ? start : i), "expected an integer");
  }
  return Integer(digits);
}

// The 2×2 matrix [[a, b], [c, d]] of a Stern–Brocot word, in big integers.
struct BigMat {
  Integer a = 1, b = 0, c = 0, d = 1;
  void append(bool left) {  // · R (letter 0) or · L (letter 1), in place, no allocation
    if (left) {
      a += b;
      c += d;
    } else {
      b += a;
      d += c;
    }
  }
};

// The oriented classes (least q of each, ascending) over the unoriented orbit of the word with
// matrix R·w·R = [[α, β], [γ, δ]] — the big-integer twin of the walk's leaf (lib/enumerate.cpp).
std::vector<Integer> oriented_classes(const Integer& alpha, const Integer& beta,
                                      const Integer& gamma, const Integer& delta, bool mirrors) {
  const Integer two_p = 2 * beta;
  if (boost::multiprecision::bit_test(beta, 0)) {  // a knot: one oriented class
    auto lift = [&beta](const Integer& x) { return boost::multiprecision::bit_test(x, 0) ? x : x + beta; };
    Integer q = std::min(lift(delta), lift(alpha));
    if (!mirrors) q = std::min({q, lift(beta - delta), lift(beta - alpha)});
    return {q};
  }
  // αδ = 1 + pγ gives δ⁻¹ ≡ α + p·[γ odd] and (δ + p)⁻¹ ≡ α + p·[γ even] (mod 2p).
  const bool g = boost::multiprecision::bit_test(gamma, 0);
  const Integer i1 = g ? alpha + beta : alpha;
  const Integer i2 = g ? alpha : alpha + beta;
  const Integer d2 = delta + beta;
  bool same = i1 == d2;
  Integer q1 = std::min(delta, i1), q2 = std::min(d2, i2);
  if (!mirrors) {
    same = same || two_p - delta == d2 || two_p - i1 == d2;
    q1 = std::min({q1, two_p - delta, two_p - i1});
    q2 = std::min({q2, two_p - d2, two_p - i2});
  }
  if (same) return {std::min(q1, q2)};
  return {std::min(q1, q2), std::max(q1, q2)};
}

}  // namespace

// [k 2] = 2 + 1/k = (2k+1)/k; [n] = n; [a b] = b + 1/a = (ab+1)/a (Conway's order).
TwistSequence twist_knot_twists(const Integer& k) { return TwistSequence{{k, Integer(2)}}; }
TwistSequence torus_twists(const Integer& n) { return TwistSequence{{n}}; }
TwistSequence double_twist_twists(const Integer& a, const Integer& b) { return TwistSequence{{a, b}}; }

// A small hand parser: '[' then terms separated by spaces or one comma, then ']'. Each error
// names the character where what was expected did not come.
std::vector<TermRange> parse_pattern(std::string_view s) {
  std::size_t i = 0;
  auto skip_space = [&] {
    while (i < s.size() && std::isspace(static_cast<unsigned char>(s[i])) != 0) ++i;
  };
  skip_space();
  if (i >= s.size() || s[i] != '[') throw ParseError(char_pos(s, i), "expected '[' to open a pattern");
  ++i;
  std::vector<TermRange> out;
  bool need_term = false;  // after a comma
  while (true) {
    skip_space();
    if (i >= s.size()) throw ParseError(char_pos(s, i), "expected ']' to close the pattern");
    if (s[i] == ']') {
      if (need_term || out.empty()) throw ParseError(char_pos(s, i), "expected a term (an integer or A..B)");
      ++i;
      break;
    }
    if (s[i] == ',') {
      if (need_term || out.empty()) throw ParseError(char_pos(s, i), "expected a term before ','");
      need_term = true;
      ++i;
      continue;
    }
    const std::size_t start = i;
    TermRange r;
    r.lo = read_integer(s, i);
    r.hi = r.lo;
    if (i + 1 < s.size() && s[i] == '.' && s[i + 1] == '.') {
      i += 2;
      r.hi = read_integer(s, i);
      if (r.hi < r.lo) {
        throw DomainError("pattern term at character " + std::to_string(char_pos(s, start) + 1) +
                          " is the empty range " + r.lo.str() + ".." + r.hi.str());
      }
    }
    if (i < s.size() && s[i] != ']' && s[i] != ',' && std::isspace(static_cast<unsigned char>(s[i])) == 0) {
      throw ParseError(char_pos(s, i), "expected a space, ',', '..' or ']' after a term");
    }
    out.push_back(std::move(r));
    need_term = false;
  }
  skip_space();
  if (i != s.size()) throw ParseError(char_pos(s, i), "expected nothing after ']'");
  return out;
}

Integer pattern_size(std::span<const TermRange> pattern) {
  Integer n = 1;
  for (const TermRange& r : pattern) n *= r.hi - r.lo + 1;
  return n;
}

bool for_each_pattern(std::span<const TermRange> pattern,
                      FunctionRef<bool(std::span<const Integer>)> sink) {
  if (pattern.empty()) throw DomainError("a pattern needs at least one term");
  if (pattern_size(pattern) > Integer(UINT64_MAX)) {
    throw LimitError("the pattern stands for more than 2^64 sequences");
  }
  // The size check above keeps the loop finite in practice; the sink may stop it any time.
  std::vector<Integer> cur;
  cur.reserve(pattern.size());
  for (const TermRange& r : pattern) cur.push_back(r.lo);
  while (true) {
    if (!sink(std::span<const Integer>(cur))) return false;
    // Odometer: the last term varies fastest.
    std::size_t k = pattern.size();
    while (k > 0) {
      --k;
      if (cur[k] < pattern[k].hi) {
        ++cur[k];
        break;
      }
      cur[k] = pattern[k].lo;
      if (k == 0) return true;
    }
  }
}

LinkClass link_class_of(const Fraction& f, const EnumerationOptions& options) {
  const TwoBridgeLink l = TwoBridgeLink::numerator_closure(f);
  LinkClass c;
  c.p = l.p();
  c.components = l.components();
  c.amphichiral = l.is_amphichiral();
  const Integer cross = l.crossing_number();
  if (const auto w = to_int64(cross)) {
    c.crossings = *w;
  } else {
    throw LimitError("crossing number beyond 2^63");
  }
  c.canonical_q = l.canonical().q();
  c.canonical_mirror_q = l.canonical_up_to_mirror().q();
  c.fraction_p = f.numerator();
  c.fraction_q = f.denominator();
  if (!options.oriented) {
    c.q = options.mirrors ? c.canonical_q : c.canonical_mirror_q;
  } else {
    const OrientedTwoBridgeLink o = OrientedTwoBridgeLink::numerator_closure(f);
    c.q = o.canonical().q();
    if (!options.mirrors) c.q = std::min(c.q, o.mirror().canonical().q());
  }
  return c;
}

LinkClass sample_two_bridge(std::int64_t n, const EnumerationOptions& options, RandomBits& bits) {
  if (n > kMaxSampleCrossings) {
    throw LimitError("random samples go up to 100000 crossings");
  }
  if (count_classes(n, options) == 0) {  // also rejects n < 0
    throw DomainError("no 2-bridge " +
                      std::string(options.components == ComponentFilter::knots   ? "knot"
                                  : options.components == ComponentFilter::links ? "link"
                                                                                 : "knot or link") +
                      " has crossing number " + std::to_string(n));
  }
  // Uniformity (docs/enumeration.md §6): a word is uniform; a class of s words keeps each with
  // probability least_orbit/s, so every class weighs least_orbit·2^−m per trial.
  const bool want_knots = options.components != ComponentFilter::links;
  const bool want_links = options.components != ComponentFilter::knots;
  if (n == 0) {  // the unknot b(1,0) and the unlink b(0,1)
    const bool unknot = want_knots && (!want_links || !bits.next());
    EnumerationOptions o = options;
    return link_class_of(unknot ? Fraction::infinity() : Fraction(0), o);
  }
  const std::int64_t m = n - 2;
  // The least orbit size: 2 up to mirror for n ≥ 3 (complement fixes no word), else 1.
  const int least_orbit = (!options.mirrors && n >= 3) ? 2 : 1;
  while (true) {
    BigMat w;
    w.append(false);  // the leading R
    for (std::int64_t i = 0; i < m; ++i) w.append(bits.next());
    w.append(false);  // the trailing R
    const Integer& alpha = w.a;
    const Integer& beta = w.b;
    const Integer& gamma = w.c;
    const Integer& delta = w.d;
    const bool knot = boost::multiprecision::bit_test(beta, 0);
    if (knot ? !want_knots : !want_links) continue;
    // The unoriented orbit of the word in the requested classification.
    std::vector<Integer> orbit{delta, alpha};
    if (!options.mirrors) {
      orbit.push_back(beta - delta);
      orbit.push_back(beta - alpha);
    }
    std::sort(orbit.begin(), orbit.end());
    orbit.erase(std::unique(orbit.begin(), orbit.end()), orbit.end());
    // Accept with probability least_orbit / |orbit| (a ratio of 1 or 2).
    if (static_cast<int>(orbit.size()) > least_orbit && bits.next()) continue;
    // Accepted: the class's fields, as the walk's leaf computes them (lib/enumerate.cpp).
    LinkClass c;
    c.crossings = n;
    c.components = knot ? 1 : 2;
    c.amphichiral = alpha + delta == beta;
    c.p = beta;
    const Integer cq = std::min(delta, alpha);
    const Integer cq_mirror = std::min(beta - delta, beta - alpha);
    c.canonical_mirror_q = std::min(cq, cq_mirror);
    Integer q;
    if (!options.oriented) {
      q = options.mirrors ? cq : c.canonical_mirror_q;
    } else {
      const std::vector<Integer> ori = oriented_classes(alpha, beta, gamma, delta, options.mirrors);
      std::size_t j = 0;
      if (want_links) {  // one bit for every class, so that each oriented class weighs 1/2
        j = bits.next() ? 1 : 0;
        if (j >= ori.size()) continue;
      }
      q = ori[j];
    }
    // The drawing fraction: p/q, or −p/(2p−q) for an oriented form above p.
    const Integer r = q < beta ? q : q - beta;
    c.canonical_q = (r == delta || r == alpha) ? cq : cq_mirror;
    if (q < beta) {
      c.fraction_p = beta;
      c.fraction_q = q;
    } else {
      c.fraction_p = -beta;
      c.fraction_q = 2 * beta - q;
    }
    c.q = std::move(q);
    return c;
  }
}

Fraction sample_rational_tangle(std::int64_t n, RandomBits& bits) {
  if (n < 0) throw DomainError("crossing number " + std::to_string(n) + " is negative");
  if (n > kMaxSampleCrossings) throw LimitError("random samples go up to 100000 crossings");
  if (n == 0) return bits.next() ? Fraction::infinity() : Fraction(0);
  BigMat w;
  for (std::int64_t i = 0; i < n - 1; ++i) w.append(bits.next());
  // The Stern–Brocot node of the word: the mediant (a + b)/(c + d); then a uniform sign.
  Integer p = w.a + w.b;
  if (bits.next()) p = -p;
  return Fraction(std::move(p), w.c + w.d);
}

}  // namespace fourplat
