// fourplat/error.hpp — the exception family every fourplat function throws.
//
//   std::runtime_error
//     └─ fourplat::Error            any failure fourplat reports
//          ├─ ParseError            text that is not what was expected (carries the position)
//          ├─ DomainError           a value outside a function's domain: 0/0, ∞ where a finite
//          │                        value is needed, a zero modulus, gcd(p,q) ≠ 1, ...
//          └─ LimitError            a request too large to answer (more than fits in memory)
//
// The tool maps Error and its subtypes to exit status 2 with one line on stderr.
#pragma once

#include <cstddef>
#include <stdexcept>
#include <string>

namespace fourplat {

/// Base of every exception fourplat throws.
class Error : public std::runtime_error {
 public:
  using std::runtime_error::runtime_error;
};

/// Text that does not parse. `position()` is the 0-based character offset of the offending
/// character in the input given to the parser; `what()` reads "at character N: expected ...".
class ParseError : public Error {
 public:
  ParseError(std::size_t position, const std::string& message)
      : Error("at character " + std::to_string(position + 1) + ": " + message),
        position_(position) {}
  [[nodiscard]] std::size_t position() const noexcept { return position_; }

 private:
  std::size_t position_;
};

/// An argument outside the function's domain (0/0, ∞ where a finite value is needed, a zero or
/// negative modulus, a pair p, q that is not coprime, ...).
class DomainError : public Error {
 public:
  using Error::Error;
};

/// A request too large to answer (for example a list that would not fit in memory).
class LimitError : public Error {
 public:
  using Error::Error;
};

}  // namespace fourplat
