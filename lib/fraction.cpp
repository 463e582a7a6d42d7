// Exact fractions on the projective line Q ∪ {∞}; see fourplat/fraction.hpp for the invariant.
#include "fourplat/fraction.hpp"

#include <utility>

namespace fourplat {

Fraction::Fraction(Integer p, Integer q) : p_(std::move(p)), q_(std::move(q)) {
  if (q_ == 0) {
    if (p_ == 0) throw DomainError("0/0 is not a fraction");
    p_ = 1;  // every p/0 is the one point ∞ = 1/0
    return;
  }
  if (q_ < 0) {
    p_ = -p_;
    q_ = -q_;
  }
  if (q_ != 1) {
    Integer g = gcd(p_, q_);
    if (g != 1) {
      p_ /= g;
      q_ /= g;
    }
  }
}

Fraction Fraction::infinity() { return Fraction(Integer(1), Integer(0), Reduced{}); }

Fraction Fraction::reciprocal() const {
  if (p_ < 0) return Fraction(-q_, -p_, Reduced{});
  if (p_ == 0) return infinity();
  return Fraction(q_, p_, Reduced{});
}

Fraction Fraction::operator-() const {
  if (is_infinite()) return *this;
  return Fraction(-p_, q_, Reduced{});
}

Fraction& Fraction::operator+=(const Fraction& o) {
  if (is_infinite() || o.is_infinite()) {
    if (is_infinite() && o.is_infinite()) throw DomainError("∞ + ∞ is undefined");
    *this = infinity();
    return *this;
  }
  if (q_ == 1 && o.q_ == 1) {
    p_ += o.p_;
    return *this;
  }
  *this = Fraction(p_ * o.q_ + o.p_ * q_, q_ * o.q_);
  return *this;
}

Fraction& Fraction::operator-=(const Fraction& o) {
  if (is_infinite() && o.is_infinite()) throw DomainError("∞ − ∞ is undefined");
  return *this += -o;
}

Fraction& Fraction::operator*=(const Fraction& o) {
  if (is_infinite() || o.is_infinite()) {
    if (is_zero() || o.is_zero()) throw DomainError("0 · ∞ is undefined");
    *this = infinity();
    return *this;
  }
  *this = Fraction(p_ * o.p_, q_ * o.q_);
  return *this;
}

Fraction& Fraction::operator/=(const Fraction& o) {
  if (is_infinite() && o.is_infinite()) throw DomainError("∞ / ∞ is undefined");
  if (is_zero() && o.is_zero()) throw DomainError("0 / 0 is undefined");
  return *this *= o.reciprocal();
}

std::strong_ordering operator<=>(const Fraction& a, const Fraction& b) {
  if (a.is_infinite() || b.is_infinite()) return a.is_infinite() <=> b.is_infinite();
  const Integer lhs = a.p_ * b.q_;
  const Integer rhs = b.p_ * a.q_;
  if (lhs < rhs) return std::strong_ordering::less;
  if (lhs > rhs) return std::strong_ordering::greater;
  return std::strong_ordering::equal;
}

Fraction operator+(Fraction a, const Fraction& b) { return a += b; }
Fraction operator-(Fraction a, const Fraction& b) { return a -= b; }
Fraction operator*(Fraction a, const Fraction& b) { return a *= b; }
Fraction operator/(Fraction a, const Fraction& b) { return a /= b; }

std::string to_string(const Fraction& x) {
  if (x.is_integer()) return x.numerator().str();
  return x.numerator().str() + "/" + x.denominator().str();
}

}  // namespace fourplat
