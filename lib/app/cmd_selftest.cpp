// fourplat selftest — a quick check of this build against published values and against itself
// by independent methods (the unit tests do this at length; this is for an installed tool).
#include <memory>
#include <tuple>
#include <string>
#include <vector>

#include "command.hpp"
#include "fourplat/coloring.hpp"
#include "fourplat/counts.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/parse.hpp"
#include "fourplat/pd.hpp"
#include "fourplat/two_bridge.hpp"
#include "output.hpp"

namespace fourplat::app {
namespace {

struct Options {
  bool quiet = false;
};

class Checks {
 public:
  explicit Checks(bool quiet) : quiet_(quiet) {}
  void check(bool ok, const std::string& what) {
    ++(ok ? passed_ : failed_);
    if (!ok || !quiet_) Output::get().print("{}  {}\n", ok ? "ok  " : "FAIL", what);
  }
  [[nodiscard]] int failed() const { return failed_; }
  [[nodiscard]] int passed() const { return passed_; }

 private:
  bool quiet_;
  int passed_ = 0, failed_ = 0;
};

TwoBridgeLink n_of(const std::string& tangle) { return closure(parse_tangle(tangle), Closure::numerator); }

void run(const Options& o) {
  Checks c(o.quiet);
  // Rolfsen, "Knots and Links" (1976), Appendix C (from memory): the 2-bridge knots to 6
  // crossings by Conway notation, with determinant and crossing number.
  struct Knot {
    const char* name;
    const char* conway;
    int det;
    int crossings;
    bool amphichiral;
  };
  for (const Knot& k : {Knot{"3_1", "[3]", 3, 3, false}, Knot{"4_1", "[2 2]", 5, 4, true},
                        Knot{"5_1", "[5]", 5, 5, false}, Knot{"5_2", "[3 2]", 7, 5, false},
                        Knot{"6_1", "[4 2]", 9, 6, false}, Knot{"6_2", "[3 1 2]", 11, 6, false},
                        Knot{"6_3", "[2 1 1 2]", 13, 6, true}}) {
    const TwoBridgeLink l = n_of(k.conway);
    c.check(l.determinant() == k.det && l.crossing_number() == k.crossings && l.is_knot() &&
                l.is_amphichiral() == k.amphichiral,
            fmt::format("{} = N({}): determinant {}, crossing number {}, {} (Rolfsen 1976)", k.name,
                        k.conway, k.det, k.crossings, k.amphichiral ? "amphichiral" : "chiral"));
  }
  // Fox: the trefoil has 9 three-colorings, the figure-eight 3 (only constants) and 25
  // five-colorings; by the formula and by the Smith form of the diagram's coloring matrix.
  for (const auto& [tangle, n, count] : std::vector<std::tuple<const char*, int, int>>{
           {"[3]", 3, 9}, {"[2 2]", 3, 3}, {"[2 2]", 5, 25}, {"[2 1 1 2]", 13, 169}}) {
    const RationalTangle t = parse_tangle(tangle);
    const Diagram d = Diagram::of_tangle(t, DiagramClosure::numerator);
    const auto w = propagated_witness(d, Integer(n));
    c.check(coloring_count(closure(t), Integer(n)) == count && coloring_count(d, Integer(n)) == count &&
                (count == n) == !w.has_value() && (!w || satisfies_fox_rule(d, *w, Integer(n))),
            fmt::format("N({}) has {} Fox {}-colorings, formula = diagram, witness obeys Fox's rule",
                        tangle, count, n));
  }
  // The right-handed trefoil N([3]) = b(3,1): three positive crossings (docs/conventions.md).
  c.check(Diagram::of_tangle(parse_tangle("[3]")).writhe() == 3, "N([3]) has writhe +3 (right-handed)");
  // Schubert 1956: b(7,2) = b(7,4) (2·4 ≡ 1 mod 7); the trefoil is chiral, b(3,1) ≠ b(3,2).
  c.check(same_link(n_of("7/2"), n_of("7/4")) && !same_link(n_of("3"), n_of("-3")) &&
              same_up_to_mirror(n_of("3"), n_of("-3")),
          "Schubert: b(7,2) = b(7,4); b(3,1) and b(3,2) are mirror images, not equal");
  // Conway's theorem: [3 0 3] = [6]; [2 -3] and its canonical form have the same fraction.
  c.check(parse_tangle("[3 0 3]") == parse_tangle("6") &&
              parse_tangle("[2 -3]") == RationalTangle(parse_tangle("[2 -3]").canonical_twists()),
          "Conway: [3 0 3] = [6]; a sequence and its canonical form agree");
  // Ernst–Sumners 1987 (OEIS A018240): 2-bridge knots by crossing number 3..12.
  const std::vector<int> es = {1, 1, 2, 3, 7, 12, 24, 45, 91, 176};
  bool counts_ok = true;
  for (std::size_t i = 0; i < es.size(); ++i) {
    counts_ok = counts_ok && count_two_bridge(static_cast<std::int64_t>(i) + 3).knots == es[i];
  }
  c.check(counts_ok, "Ernst-Sumners: 1 1 2 3 7 12 24 45 91 176 knots with 3..12 crossings (OEIS A018240)");
  // The coloring fraction of the diagram equals the continued-fraction value.
  bool cf_ok = true;
  for (const char* t : {"[2 1 1 2]", "[3 -2 4]", "[1 1 1 1 1 1]", "[0 5]"}) {
    cf_ok = cf_ok && coloring_fraction(Diagram::of_tangle(parse_tangle(t), DiagramClosure::none)) ==
                         parse_tangle(t).fraction();
  }
  c.check(cf_ok, "coloring fraction of the diagram = continued fraction (Kauffman-Lambropoulou 2004)");
  // PD out and in: the exported code of N([2 1 1 2]) read back has determinant 13 and writhe 0.
  const Diagram d = Diagram::of_tangle(parse_tangle("[2 1 1 2]"));
  const PdDiagram back(parse_pd(to_string(d.pd_code())));
  c.check(back.determinant() == 13 && back.writhe() == d.writhe() && back.components() == 1,
          "PD round trip of N([2 1 1 2]): determinant 13, same writhe");
  // The word path agrees with the exact path near 2^62.
  const std::int64_t p = (std::int64_t{1} << 62) + 1, q = 3;
  const auto w = summarize_numerator_word(p, q);
  const TwoBridgeLink big{Integer(p), Integer(q)};
  c.check(w && w->canonical_q == big.canonical().q() && w->canonical_mirror_q == big.canonical_up_to_mirror().q() &&
              w->crossing_number == big.crossing_number(),
          "word and GMP paths agree on b(2^62 + 1, 3)");

  Output::get().print("selftest: {} passed, {} failed\n", c.passed(), c.failed());
  if (c.failed() != 0) throw Exit{1};
}

void setup(CLI::App& app) {
  auto o = std::make_shared<Options>();
  app.add_flag("-q,--quiet", o->quiet, "print failures and the summary only");
  app.footer("Checks the build against published values (Rolfsen's table, Fox colorings, Schubert's and\n"
             "Conway's theorems, the Ernst-Sumners counts) and against itself by independent methods.\n"
             "Exit status 0 when every check passes, 1 otherwise.\n"
             "\n"
             "Example:\n"
             "  fourplat selftest");
  app.callback([o] { run(*o); });
}

const Registration reg{{"selftest", "check this build against published values", setup}};

}  // namespace
}  // namespace fourplat::app
