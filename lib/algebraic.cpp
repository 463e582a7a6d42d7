// Sums of rational tangles: closures, determinants and components without pretending the sum is
// rational.
//
// ---- The numerator closure of a sum of two rational tangles (Ernst–Sumners) ----
// Ernst–Sumners ("A calculus for rational tangles: applications to DNA recombination", Math.
// Proc. Camb. Phil. Soc. 108, 1990) show that N(a/b + c/d) is the 2-bridge link
//     b(ad + bc, a'd + b'c)   for integers a', b' with a determinant-one condition on (a, b, a', b').
// The sign of that condition is convention-dependent (the other sign gives the mirror image).
// In fourplat's conventions (docs/conventions.md: [1] as fixed there, N(p/q) = b(p,q), N([3])
// the right-handed trefoil) it is
//     a'·b − a·b' = 1.
// Derivation. (1) The value does not depend on the choice: the solutions are (a' + ta, b' + tb),
// which change a'd + b'c by t(ad + bc) ≡ 0. (2) gcd(ad + bc, a'd + b'c) = 1, because
// (ad + bc, a'd + b'c) is the image of the primitive vector (d, c) under a matrix of determinant
// ab' − a'b = ∓1. (3) The sign is pinned by a case that needs no theorem: for S = [n] integer
// (c/d = n/1) the sum is the rational tangle a/b + n, so N = b(a + nb, b). The formula gives
// b(a + nb, a' + b'n); modulo P = a + nb we have nb ≡ −a, hence
//     b·(a' + b'n) ≡ a'b − ab' (mod P).
// With a'b − ab' = 1 this says a' + b'n ≡ b⁻¹, the same unoriented link as b(P, b) (Schubert);
// with −1 it would be b(P, −b⁻¹), the mirror. For T = [n] (a/b = n/1) the choice a' = 1, b' = 0
// gives b(nd + c, d) = N(c/d + n) directly. (4) Independent checks in tests/algebraic_test.cpp:
// N(T + S) = N(S + T); the pretzel link N(1/[n] + 1/[m]) is the torus link of one twist region of
// n + m crossings, b(n + m, −1) in our conventions; and the Kauffman bracket of the diagram of the
// sum (state sum over its twist boxes) equals that of the diagram of b(P, Q) up to a unit.
// The case c/d = 1/0: N([∞] + S) = D(S) = b(d, −c) is the formula with b = 0 as well.
//
// ---- Determinants (any number of summands) ----
// N: det N(T1 + ... + Tr) = |Σ_i p_i Π_{j≠i} q_j| (the unreduced numerator of Σ p_i/q_i;
//    Kauffman–Lambropoulou, "Hard unknots and collapsing tangles", arXiv:math/0601525; for r = 2
//    it is |ad + bc| above). Reducing the fraction would be wrong: 1/2 + 1/2 closes to T(2,4),
//    determinant 4, not 1.
// D: D(T + S) is the connected sum D(T) # D(S) (a sphere through the two strands joining T to S
//    meets the link twice), so det D(T1 + ... + Tr) = Π |det D(Ti)| = Π |q_i|, since
//    D(p/q) = b(q, −p). A summand [∞] (q = 0) contributes a split unlink: determinant 0.
//
// ---- Components ----
// By connectivity (Kauffman–Lambropoulou, "On the classification of rational knots", Enseign.
// Math. 49, 2003): p/q with p even joins like [0] (NW–NE, SW–SE), p odd and q even like [∞]
// (NW–SW, NE–SE), both odd like [1] (NW–SE, NE–SW). The arcs of the parts, the joins of the sum
// and the closure arcs form a 2-regular graph on the 4r ends; its cycles are the components.
#include "fourplat/algebraic.hpp"

#include <numeric>
#include <utility>

#include <gmp.h>

#include "detail/word.hpp"

namespace fourplat {

namespace {

/// The number of summands that are not integer tangles ([∞] counts as one).
int non_integer_count(const std::vector<RationalTangle>& parts) {
  int n = 0;
  for (const RationalTangle& t : parts) n += t.is_integer() ? 0 : 1;
  return n;
}

/// Sum of the integer summands.
Integer integer_total(const std::vector<RationalTangle>& parts) {
  Integer total = 0;
  for (const RationalTangle& t : parts) {
    if (t.is_integer()) total += t.fraction().numerator();
  }
  return total;
}

}  // namespace

TwoBridgeLink numerator_closure_of_sum(const Fraction& x, const Fraction& y) {
  const Integer& a = x.numerator();
  const Integer& b = x.denominator();
  const Integer& c = y.numerator();
  const Integer& d = y.denominator();
  // gcdext: s·b + t·a = gcd(b, a) = 1, so a' = s and b' = −t give a'b − ab' = 1.
  Integer g, s, t;
  mpz_gcdext(detail::mpz(g), detail::mpz(s), detail::mpz(t), detail::mpz(b), detail::mpz(a));
  const Integer a_prime = s;
  const Integer b_prime = -t;
  return TwoBridgeLink(a * d + b * c, a_prime * d + b_prime * c);
}

namespace {

/// Union–find over the 4r ends, for counting the cycles of the closed diagram.
class Ends {
 public:
  explicit Ends(std::size_t n) : parent_(n) { std::iota(parent_.begin(), parent_.end(), 0); }
  std::size_t find(std::size_t x) {
    while (parent_[x] != x) x = parent_[x] = parent_[parent_[x]];
    return x;
  }
  void join(std::size_t x, std::size_t y) { parent_[find(x)] = find(y); }
  int classes() {
    int n = 0;
    for (std::size_t i = 0; i < parent_.size(); ++i) n += find(i) == i ? 1 : 0;
    return n;
  }

 private:
  std::vector<std::size_t> parent_;
};

}  // namespace

TangleSum::TangleSum(std::vector<RationalTangle> summands) : parts_(std::move(summands)) {
  if (parts_.empty()) throw DomainError("a tangle sum needs at least one summand");
}

int TangleSum::rational_parts() const { return non_integer_count(parts_); }

std::optional<RationalTangle> TangleSum::as_rational() const {
  const int n = non_integer_count(parts_);
  if (n > 1) return std::nullopt;  // Kauffman–Lambropoulou: not rational
  const Integer total = integer_total(parts_);
  if (n == 0) return RationalTangle::integer(total);
  for (const RationalTangle& t : parts_) {
    // Integers slide through a rational tangle (flip invariance): T + [n] = [n] + T.
    if (!t.is_integer()) return t.add_horizontal(total);
  }
  return std::nullopt;  // unreachable: n == 1
}

std::optional<TwoBridgeLink> TangleSum::closure_two_bridge(Closure which) const {
  if (auto r = as_rational()) return closure(*r, which);
  if (which != Closure::numerator || non_integer_count(parts_) != 2) return std::nullopt;
  // N(X + [n] + Y) = N((X + [n]) + Y): fold every integer into the first non-integer part.
  const Fraction* first = nullptr;
  const Fraction* second = nullptr;
  for (const RationalTangle& t : parts_) {
    if (t.is_integer()) continue;
    (first == nullptr ? first : second) = &t.fraction();
  }
  return numerator_closure_of_sum(*first + Fraction(integer_total(parts_)), *second);
}

Integer TangleSum::determinant(Closure which) const {
  if (which == Closure::denominator) {
    Integer product = 1;
    for (const RationalTangle& t : parts_) product *= t.fraction().denominator();
    return product;  // denominators are ≥ 0
  }
  // Running unreduced sum P/Q of p_i/q_i: P = Σ p_i Π_{j≠i} q_j, Q = Π q_j.
  Integer num = 0, den = 1;
  for (const RationalTangle& t : parts_) {
    const Integer& p = t.fraction().numerator();
    const Integer& q = t.fraction().denominator();
    num = num * q + p * den;
    den *= q;
  }
  return abs(num);
}

int TangleSum::components(Closure which) const {
  // Ends of part i: 4i + {0: NW, 1: NE, 2: SW, 3: SE}.
  const std::size_t r = parts_.size();
  Ends ends(4 * r);
  for (std::size_t i = 0; i < r; ++i) {
    const std::size_t nw = 4 * i, ne = nw + 1, sw = nw + 2, se = nw + 3;
    const Fraction& f = parts_[i].fraction();
    const bool p_odd = boost::multiprecision::bit_test(f.numerator(), 0);
    const bool q_odd = boost::multiprecision::bit_test(f.denominator(), 0);
    if (!p_odd) {  // like [0]
      ends.join(nw, ne);
      ends.join(sw, se);
    } else if (!q_odd) {  // like [∞]
      ends.join(nw, sw);
      ends.join(ne, se);
    } else {  // like [1]
      ends.join(nw, se);
      ends.join(ne, sw);
    }
    if (i + 1 < r) {  // T_i + T_{i+1}: NE_i–NW_{i+1}, SE_i–SW_{i+1}
      ends.join(ne, 4 * (i + 1));
      ends.join(se, 4 * (i + 1) + 2);
    }
  }
  const std::size_t last = 4 * (r - 1);
  if (which == Closure::numerator) {  // NW–NE and SW–SE of the whole sum
    ends.join(0, last + 1);
    ends.join(2, last + 3);
  } else {  // NW–SW and NE–SE of the whole sum
    ends.join(0, 2);
    ends.join(last + 1, last + 3);
  }
  return ends.classes();
}

TangleSum sum(const RationalTangle& a, const RationalTangle& b) { return TangleSum({a, b}); }

}  // namespace fourplat
