// Fuzz harness for fourplat/parse.hpp (libFuzzer interface; CTest replays the committed corpus
// in tests/fuzz/corpus/parse/ with replay_main.cpp).
//
// For any bytes, each parser either returns a value or throws ParseError with a position inside
// the input (never another exception, never a crash or hang), and every value prints as text that
// parses back to the same value. The word fast path agrees with the full parser.
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <string_view>

#include "fourplat/format.hpp"
#include "fourplat/parse.hpp"

namespace fp = fourplat;

namespace {

[[noreturn]] void failure(const char* what, std::string_view input) {
  std::fprintf(stderr, "parse_fuzz: %s on input of %zu bytes: '%.*s'\n", what, input.size(),
               static_cast<int>(input.size() > 200 ? 200 : input.size()), input.data());
  std::abort();
}

/// Runs parse(text); on success checks check(value); a ParseError must point into the input.
template <typename Parse, typename Check>
void exercise(std::string_view text, std::size_t characters, Parse parse, Check check) {
  try {
    auto value = parse(text);
    try {
      check(value);
    } catch (const fp::ParseError&) {
      failure("printed form does not parse", text);
    }
  } catch (const fp::ParseError& e) {
    if (e.position() > characters) failure("error position past the end", text);
  }
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view text(reinterpret_cast<const char*>(data), size);
  std::size_t characters = 0;  // code points (continuation bytes not counted)
  for (char c : text) characters += (static_cast<unsigned char>(c) & 0xC0U) != 0x80U;

  try {
    exercise(text, characters, fp::parse_integer, [&](const fp::Integer& x) {
      if (fp::parse_integer(fmt::format("{}", x)) != x) failure("integer round trip", text);
    });
    exercise(text, characters, fp::parse_fraction, [&](const fp::Fraction& f) {
      if (fp::parse_fraction(fmt::format("{}", f)) != f) failure("fraction round trip", text);
      const auto word = fp::parse_fraction_word(text);
      if (word && fp::Fraction(fp::Integer(word->p), fp::Integer(word->q)) != f) {
        failure("word fast path disagrees", text);
      }
    });
    if (fp::parse_fraction_word(text)) {  // the fast path answers only where the full parser does
      try {
        (void)fp::parse_fraction(text);
      } catch (const fp::ParseError&) {
        failure("word fast path accepted what the parser rejects", text);
      }
    }
    exercise(text, characters, fp::parse_twist_sequence, [&](const fp::TwistSequence& s) {
      if (fp::parse_twist_sequence(fmt::format("{}", s)) != s) failure("twists round trip", text);
    });
    exercise(text, characters, fp::parse_tangle_sum, [&](const fp::TangleSum& s) {
      const fp::TangleSum back = fp::parse_tangle_sum(fmt::format("{}", s));
      if (back.summands().size() != s.summands().size()) failure("sum round trip (size)", text);
      for (std::size_t k = 0; k < s.summands().size(); ++k) {
        const auto& a = s.summands()[k];
        const auto& b = back.summands()[k];
        if (!(a == b) || a.has_given_twists() != b.has_given_twists() || a.twists() != b.twists()) {
          failure("sum round trip (summand)", text);
        }
      }
    });
    exercise(text, characters, fp::parse_two_bridge, [&](const fp::TwoBridgeLink& l) {
      if (!(fp::parse_two_bridge(fmt::format("{}", l)) == l)) failure("link round trip", text);
    });
    exercise(text, characters, fp::parse_oriented_two_bridge, [&](const fp::OrientedTwoBridgeLink& l) {
      if (!(fp::parse_oriented_two_bridge(fmt::format("{}", l)) == l)) failure("oriented link round trip", text);
    });
    exercise(text, characters, fp::parse_link_kind, [&](fp::LinkKind k) {
      if (fp::parse_link_kind(fmt::format("{}", k)) != k) failure("kind round trip", text);
    });
    exercise(text, characters, fp::parse_closure, [&](fp::Closure c) {
      if (fp::parse_closure(fmt::format("{}", c)) != c) failure("closure round trip", text);
    });
    exercise(text, characters, fp::parse_corner, [&](fp::Corner c) {
      if (fp::parse_corner(fmt::format("{}", c)) != c) failure("corner round trip", text);
    });
    exercise(text, characters, fp::parse_diagram_closure, [&](fp::DiagramClosure c) {
      if (fp::parse_diagram_closure(fmt::format("{}", c)) != c) failure("diagram closure round trip", text);
    });
  } catch (const std::exception& e) {
    failure(e.what(), text);  // anything but ParseError breaks the contract of parse.hpp
  }
  return 0;
}
