// Links against the installed library through the umbrella header and prints one known value:
// N(5/2) = b(5,2), the figure-eight knot, determinant 5 (common practice).
#include <fourplat/fourplat.hpp>

#include <iostream>

int main() {
  const fourplat::RationalTangle t(fourplat::Fraction(fourplat::Integer(5), fourplat::Integer(2)));
  const fourplat::TwoBridgeLink k = fourplat::closure(t);
  std::cout << fourplat::to_string(k.canonical()) << " det " << k.determinant() << "\n";
  return k.determinant() == 5 && k.is_amphichiral() ? 0 : 1;
}
