// Rational tangles as values; see fourplat/tangle.hpp for the operations' table.
#include "fourplat/tangle.hpp"

#include <utility>

namespace fourplat {

RationalTangle::RationalTangle() : fraction_(0) {}

RationalTangle::RationalTangle(Fraction f) : fraction_(std::move(f)) {}

RationalTangle::RationalTangle(TwistSequence twists)
    : fraction_(twist_value(twists.twists)),  // throws DomainError when empty
      given_(std::move(twists)) {}

RationalTangle RationalTangle::integer(const Integer& n) {
  return RationalTangle(TwistSequence{{n}});
}

RationalTangle RationalTangle::vertical(const Integer& n) {
  // 1/[n]: the twist n made vertical by a zero horizontal twist, Conway's [n 0].
  return RationalTangle(TwistSequence{{n, Integer(0)}});
}

RationalTangle RationalTangle::infinity() { return RationalTangle(Fraction::infinity()); }

TwistSequence RationalTangle::twists() const {
  if (given_) return *given_;
  return canonical_twists();
}

TwistSequence RationalTangle::canonical_twists() const {
  return fourplat::canonical_twists(fraction_);
}

Integer RationalTangle::crossing_number() const { return twist_crossings(fraction_); }

RationalTangle RationalTangle::add_horizontal(const Integer& n) const {
  RationalTangle r;
  r.fraction_ = fraction_ + Fraction(n);
  if (given_) {  // the last (outermost) twist is horizontal: it absorbs n
    r.given_ = given_;
    r.given_->twists.back() += n;
  }
  return r;
}

RationalTangle RationalTangle::add_vertical(const Integer& n) const {
  RationalTangle r;
  // F/(1 + nF) = 1/(n + 1/F), written so that ∞ and 0 follow the projective rules.
  r.fraction_ = (Fraction(n) + fraction_.reciprocal()).reciprocal();
  if (given_) {
    r.given_ = given_;
    std::vector<Integer>& t = r.given_->twists;
    if (t.size() >= 2 && t.back() == 0) {
      t[t.size() - 2] += n;  // [... b 0] is already vertical at b: the twist merges into it
    } else {
      t.push_back(n);
      t.emplace_back(0);
    }
  }
  return r;
}

RationalTangle RationalTangle::rotate() const { return inverse().mirror(); }

RationalTangle RationalTangle::mirror() const {
  RationalTangle r;
  r.fraction_ = -fraction_;
  if (given_) {  // switching every crossing negates every twist
    r.given_ = given_;
    for (Integer& a : r.given_->twists) a = -a;
  }
  return r;
}

RationalTangle RationalTangle::inverse() const {
  RationalTangle r;
  r.fraction_ = fraction_.reciprocal();
  if (given_) {
    // [a1 ... an 0] = 1/[a1 ... an]: the same twist boxes with horizontal and vertical swapped;
    // [... 0 0] = [...] removes a trailing zero pair instead of growing the sequence.
    r.given_ = given_;
    std::vector<Integer>& t = r.given_->twists;
    if (t.size() >= 2 && t.back() == 0) {
      t.pop_back();  // [... b 0] → [... b]: the vertical b becomes horizontal
    } else {
      t.emplace_back(0);
    }
  }
  return r;
}

RationalTangle operator+(const RationalTangle& t, const RationalTangle& s) {
  // Only an integer summand keeps the sum rational; twists added on the left equal twists added
  // on the right (flype), so either way the integer is absorbed into the last twist.
  if (s.is_integer()) return t.add_horizontal(s.fraction().numerator());
  if (t.is_integer()) return s.add_horizontal(t.fraction().numerator());
  throw DomainError("the sum of rational tangles " + to_string(t.fraction()) + " and " +
                    to_string(s.fraction()) +
                    " is not rational (neither is an integer tangle); use TangleSum");
}

}  // namespace fourplat
