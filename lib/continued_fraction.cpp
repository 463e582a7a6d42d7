// Continued fractions in standard and Conway order; see fourplat/continued_fraction.hpp.
#include "fourplat/continued_fraction.hpp"

#include <algorithm>
#include <cstdint>
#include <string>
#include <utility>

#include "detail/word.hpp"

namespace fourplat {

namespace {

using detail::word_of;

// ---------------------------------------------------------------------------------------------
// Values: products of 2×2 matrices.
//
// [a0; a1, ..., an] = p/q where (p p'; q q') = M(a0)·M(a1)···M(an), M(a) = (a 1; 1 0)
// (Euler–Wallis recurrence). The determinant is ±1, so p and q are coprime and never both zero;
// this also gives the projective convention x + 1/0 = ∞, 1/∞ = 0 for free.
// For the negative expansion the factor is N(b) = (b −1; 1 0) (determinant 1).
// ---------------------------------------------------------------------------------------------

struct Mat {
  Integer a, b, c, d;  // (a b; c d)
};

Mat multiply(const Mat& x, const Mat& y) {
  return {x.a * y.a + x.b * y.c, x.a * y.b + x.b * y.d, x.c * y.a + x.d * y.c,
          x.c * y.b + x.d * y.d};
}

// Product of the factors (t s; 1 0) for the terms t in order, with s = +1 (regular) or −1
// (negative expansion). Runs of terms are packed greedily into int64 matrices with checked
// arithmetic (no allocation per term); a term that does not fit a word becomes its own factor.
std::vector<Mat> leaf_products(std::span<const Integer> terms, std::int64_t s) {
  std::vector<Mat> out;
  out.reserve(terms.size() / 4 + 1);
  std::int64_t a = 1, b = 0, c = 0, d = 1;  // the current packed word matrix
  bool open = false;
  auto flush = [&] {
    if (open) out.push_back({Integer(a), Integer(b), Integer(c), Integer(d)});
    a = 1, b = 0, c = 0, d = 1;
    open = false;
  };
  for (const Integer& t : terms) {
    const auto w = word_of(t);
    if (w) {
      // (a b; c d)·(t s; 1 0) = (a·t + b, s·a; c·t + d, s·c); s·a and s·c fail only at INT64_MIN.
      std::int64_t na, nb, nc, nd;
      if (detail::try_mul_add(a, *w, b, na) && detail::try_mul_add(c, *w, d, nc) &&
          detail::try_mul(s, a, nb) && detail::try_mul(s, c, nd)) {
        a = na, b = nb, c = nc, d = nd;
        open = true;
        continue;
      }
      flush();
      a = *w, b = s, c = 1, d = 0;  // start a new word matrix with this factor alone
      open = true;
      continue;
    }
    flush();
    out.push_back({t, Integer(s), Integer(1), Integer(0)});
  }
  flush();
  return out;
}

// Balanced product tree: multiply neighbours pairwise until one matrix is left. Each level
// halves the count, so the sizes stay balanced and GMP's subquadratic multiplication does the
// work: O(M(N) log N) for an N-bit result.
Fraction tree_value(std::span<const Integer> terms, std::int64_t s) {
  if (terms.empty()) throw DomainError("the value of an empty continued fraction is undefined");
  std::vector<Mat> level = leaf_products(terms, s);
  if (level.empty()) return Fraction(Integer(1), Integer(0));  // not reached: terms non-empty
  while (level.size() > 2) {
    std::vector<Mat> next;
    next.reserve(level.size() / 2 + 1);
    for (std::size_t i = 0; i + 1 < level.size(); i += 2) next.push_back(multiply(level[i], level[i + 1]));
    if (level.size() % 2 == 1) next.push_back(std::move(level.back()));
    level = std::move(next);
  }
  if (level.size() == 1) return Fraction(std::move(level[0].a), std::move(level[0].c));
  // Last step: only the first column of the product is needed.
  const Mat& x = level[0];
  const Mat& y = level[1];
  return Fraction(x.a * y.a + x.b * y.c, x.c * y.a + x.d * y.c);
}

// ---------------------------------------------------------------------------------------------
// Expansions.
// ---------------------------------------------------------------------------------------------

// Longest expansion built in memory (2^26 Integers ≈ 1 GiB): beyond it, LimitError.
constexpr std::uint64_t kMaxTerms = std::uint64_t{1} << 26;

[[noreturn]] void throw_infinite(const char* what) {
  throw DomainError(std::string("∞ has no ") + what + " (it needs a finite fraction)");
}

// Plain Euclid on p/q (q > 0): the regular expansion, one division a step.
Terms euclid(Integer p, Integer q) {
  Terms out;
  Integer a, r;
  // a0 = ⌊p/q⌋ (floor, so that the remainder is in [0, q)).
  a = div_floor(p, q);
  r = p - a * q;
  out.push_back(a);
  p = std::move(q);
  q = std::move(r);
  while (q != 0) {
    boost::multiprecision::divide_qr(p, q, a, r);
    out.push_back(a);
    p = std::move(q);
    q = std::move(r);
  }
  return out;
}

Terms regular_expansion_impl(const Fraction& x) {
  if (x.is_infinite()) throw_infinite("regular continued fraction");
  const auto wp = word_of(x.numerator());
  const auto wq = word_of(x.denominator());
  if (wp && wq) {
    std::int64_t a0 = 0;
    (void)detail::try_floor_div(*wp, *wq, a0);
    Terms out;
    out.emplace_back(a0);
    const auto r = static_cast<std::uint64_t>(detail::floor_mod(*wp, *wq));
    if (r != 0)
      detail::for_each_partial_quotient(static_cast<std::uint64_t>(*wq), r,
                                        [&](std::uint64_t a) { out.emplace_back(a); });
    return out;
  }
  return euclid(x.numerator(), x.denominator());
}

// Standard-order terms of |x| for x finite; shared by the canonical form and the crossings.
Terms abs_expansion(const Fraction& x) {
  if (x.sign() >= 0) return regular_expansion_impl(x);
  return regular_expansion_impl(-x);
}

}  // namespace

Terms regular_expansion(const Fraction& x) { return regular_expansion_impl(x); }

Fraction standard_value(std::span<const Integer> terms) { return tree_value(terms, 1); }

Fraction twist_value(std::span<const Integer> twists) {
  if (twists.empty()) throw DomainError("the value of an empty twist sequence is undefined");
  std::vector<Integer> reversed(twists.rbegin(), twists.rend());
  return tree_value(reversed, 1);
}

TwistSequence canonical_twists(const Fraction& x) {
  // Kauffman–Lambropoulou 2004: expand |x| regularly, fix the parity with
  // [..., a] = [..., a − 1, 1] (a ≥ 2 is the last regular term), read backwards, and give every
  // term the sign of x.
  TwistSequence out;
  if (x.is_infinite()) {
    out.twists = {Integer(0), Integer(0)};
    return out;
  }
  Terms t = abs_expansion(x);
  if (t.size() % 2 == 0) {
    t.back() -= 1;
    t.emplace_back(1);
  }
  std::reverse(t.begin(), t.end());
  if (x.sign() < 0)
    for (Integer& a : t) a = -a;
  out.twists = std::move(t);
  return out;
}

std::optional<Terms> even_expansion(const Fraction& x) {
  if (x.is_infinite()) throw_infinite("all-even continued fraction");
  // Each step takes the even a with |y − a| < 1 (unique unless y is an odd integer, where no
  // expansion exists), then continues with 1/(y − a), whose modulus exceeds 1. Subtracting an
  // even number keeps the parities of numerator and denominator and inversion swaps them, so
  // the process ends at 0 exactly when p or q is even. Denominators drop strictly: it ends.
  Integer p = x.numerator(), q = x.denominator();
  if (p % 2 != 0 && q % 2 != 0) return std::nullopt;
  Terms out;
  while (true) {
    // a = the even integer nearest to p/q: 2·round(p/(2q)) with |p/q − a| < 1.
    Integer a = 2 * div_floor(p + q, 2 * q);
    Integer r = p - a * q;  // |r| < q
    out.push_back(std::move(a));
    if (r == 0) break;
    // y' = q / r
    p = std::move(q);
    q = std::move(r);
    if (q < 0) {
      p = -p;
      q = -q;
    }
  }
  return out;
}

Terms negative_expansion(const Fraction& x) {
  if (x.is_infinite()) throw_infinite("negative (Hirzebruch–Jung) continued fraction");
  // From the regular expansion [a0; a1, ..., an] (the standard relation between the two, e.g.
  // Hirzebruch 1953; Myerson, "On semi-regular continued fractions", 1987, from memory):
  //   a0 + 1/y = (a0 + 1) − 1/(y/(y − 1)), and y/(y − 1) = 1 + 1/(y − 1) peels one 2 off a1,
  // which gives  [a0 + 1, 2^(a1 − 1), a2 + 2, 2^(a3 − 1), a4 + 2, ...]  where 2^(k) is k twos,
  // and the last even-indexed term gets + 1 instead of + 2 (an n = 0 expansion stays [a0]).
  // The length 1 + Σ_odd (a_i − 1) + ... can be astronomically large (x = 1/N gives N − 1
  // twos), so it is checked before anything is built.
  const Terms a = regular_expansion_impl(x);
  const std::size_t n = a.size() - 1;
  if (n == 0) return a;
  Integer length = 1;
  for (std::size_t i = 1; i <= n; ++i) length += (i % 2 == 1) ? a[i] - 1 : Integer(1);
  if (length > kMaxTerms)
    throw LimitError("the negative continued fraction of this fraction has " + length.str() +
                     " terms (more than " + std::to_string(kMaxTerms) + ")");
  Terms out;
  out.reserve(static_cast<std::size_t>(length));
  out.push_back(a[0] + 1);
  for (std::size_t i = 1; i <= n; ++i) {
    if (i % 2 == 1) {
      const auto twos = static_cast<std::size_t>(a[i] - 1);
      for (std::size_t k = 0; k < twos; ++k) out.emplace_back(2);
    } else {
      out.push_back(a[i] + (i < n ? 2 : 1));
    }
  }
  return out;
}

Fraction negative_value(std::span<const Integer> terms) { return tree_value(terms, -1); }

Integer twist_crossings(const Fraction& x) {
  if (x.is_infinite()) return 0;
  Integer sum = 0;
  for (const Integer& a : abs_expansion(x)) sum += a;
  return sum;
}

namespace reference {

Terms regular_expansion_euclid(const Fraction& x) {
  if (x.is_infinite()) throw_infinite("regular continued fraction");
  return euclid(x.numerator(), x.denominator());
}

Fraction standard_value_sequential(std::span<const Integer> terms) {
  if (terms.empty()) throw DomainError("the value of an empty continued fraction is undefined");
  // Back to front: p/q ← a + q/p, i.e. (p, q) ← (a·p + q, p); starting from (an, 1).
  Integer p = terms.back(), q = 1;
  for (std::size_t i = terms.size() - 1; i-- > 0;) {
    Integer np = terms[i] * p + q;
    q = std::move(p);
    p = std::move(np);
  }
  return Fraction(std::move(p), std::move(q));
}

}  // namespace reference

}  // namespace fourplat
