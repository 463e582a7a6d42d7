// Timed driver for continued fractions (issue 2, benchmarks (b) and (c)):
//   (b) the value of a 10^6-term continued fraction: balanced product tree against the
//       sequential recurrence;
//   (c) the regular expansion of 10^5- and 10^6-bit fractions: half-gcd against plain Euclid.
// Times are CPU seconds of the measuring thread (best of a few runs). Every time is also given in units of a baseline operation measured in the same run (one GMP
// multiplication of two 10^6-bit numbers) so that figures compare across machines.
// Usage: continued_fraction_bench [--quick]   (--quick: smaller sizes, for a smoke run)
// Build in Release: cmake -DCMAKE_BUILD_TYPE=Release.
#include <fmt/core.h>

#include <algorithm>
#include <ctime>
#include <cstdint>
#include <cstring>
#include <functional>
#include <random>
#include <string>
#include <vector>

#include "detail/word.hpp"
#include "fourplat/continued_fraction.hpp"

namespace fp = fourplat;
using fp::Fraction;
using fp::Integer;

namespace {

// CPU time of this thread: the code measured is single-threaded, and on a shared machine
// the wall clock also counts the time other processes hold the core.
double cpu_seconds() {
  timespec t{};
  clock_gettime(CLOCK_THREAD_CPUTIME_ID, &t);
  return static_cast<double>(t.tv_sec) + 1e-9 * static_cast<double>(t.tv_nsec);
}

// Best of `reps` runs, in CPU seconds.
double best_of(int reps, const std::function<void()>& f) {
  double best = 1e300;
  for (int i = 0; i < reps; ++i) {
    const double t0 = cpu_seconds();
    f();
    best = std::min(best, cpu_seconds() - t0);
  }
  return best;
}

Integer random_bits(std::mt19937_64& g, std::size_t bits) {
  Integer x = 0;
  for (std::size_t done = 0; done < bits; done += 64) x = (x << 64) + Integer(g());
  x >>= static_cast<unsigned>((bits + 63) / 64 * 64 - bits);
  return x;
}

std::size_t bit_length(const Integer& x) { return mpz_sizeinbase(fp::detail::mpz(x), 2); }

double baseline = 1;  // seconds for one 10^6 × 10^6-bit GMP multiplication

void row(const std::string& what, const std::string& size, const std::string& method, double t,
         const std::string& note = "") {
  fmt::print("{:<34} {:>12} {:<22} {:>10.4f} {:>12.1f}  {}\n", what, size, method, t, t / baseline,
             note);
}

}  // namespace

int main(int argc, char** argv) {
  const bool quick = argc > 1 && std::strcmp(argv[1], "--quick") == 0;
  std::mt19937_64 g(20261201);

  {  // baseline
    const Integer a = random_bits(g, 1000000), b = random_bits(g, 1000000);
    Integer c;
    baseline = best_of(5, [&] { c = a * b; });
  }
  fmt::print("continued_fraction_bench{}\n", quick ? " (--quick)" : "");
  fmt::print("baseline: one GMP multiplication of two 10^6-bit numbers = {:.5f} s\n\n", baseline);
  fmt::print("{:<34} {:>12} {:<22} {:>10} {:>12}  {}\n", "case", "size", "method", "cpu s",
             "x baseline", "note");
  fmt::print("{}\n", std::string(120, '-'));

  // ---- (b) value of a long continued fraction ----
  const std::size_t n_terms = quick ? 100000 : 1000000;
  std::vector<Integer> terms;
  terms.reserve(n_terms);
  for (std::size_t i = 0; i < n_terms; ++i) terms.emplace_back(static_cast<long>(1 + g() % 9));
  fp::ValueParts parts;
  const double tree = best_of(3, [&] { parts = fp::standard_value_parts(terms); });
  row("(b) value, terms uniform in 1..9", fmt::format("{} terms", n_terms), "product tree", tree,
      fmt::format("p has {} bits", bit_length(parts.numerator)));
  Fraction value;
  const double tree_fraction = best_of(1, [&] { value = fp::standard_value(terms); });
  row("", "", "tree + Fraction gcd", tree_fraction, "the Fraction constructor's gcd");
  // The sequential recurrence is quadratic (about 20 s at 10^6 terms here): measured at
  // growing sizes up to the full one; a size left out is extrapolated by n².
  double seq_at_largest = 0;
  std::size_t largest = 0;
  for (std::size_t n : {25000ul, 50000ul, 100000ul, 200000ul, 1000000ul}) {
    if (n > n_terms) break;
    const std::span<const Integer> head(terms.data(), n);
    fp::ValueParts tp;
    const double t_tree = best_of(3, [&] { tp = fp::standard_value_parts(head); });
    Fraction s;
    const double t_seq = best_of(1, [&] { s = fp::reference::standard_value_sequential(head); });
    if (s.numerator() != tp.numerator || s.denominator() != tp.denominator) {
      fmt::print("MISMATCH: tree and sequential values differ at {} terms\n", n);
      return 1;
    }
    row("", fmt::format("{} terms", n), "sequential", t_seq,
        fmt::format("tree {:.4f} s, ratio {:.0f}x", t_tree, t_seq / t_tree));
    seq_at_largest = t_seq;
    largest = n;
  }
  if (largest != 0 && largest < n_terms) {
    const double scale = static_cast<double>(n_terms) / static_cast<double>(largest);
    const double estimate = seq_at_largest * scale * scale;
    row("", fmt::format("{} terms", n_terms), "sequential (n² est.)", estimate,
        fmt::format("ratio to tree {:.0f}x (estimated)", estimate / tree));
  }
  fmt::print("\n");

  // ---- (c) expansion of a big fraction ----
  std::vector<std::size_t> sizes = {100000, 1000000};
  if (quick) sizes = {20000, 100000};
  for (std::size_t bits : sizes) {
    const Integer p = random_bits(g, bits) | (Integer(1) << (bits - 1));
    Integer q = random_bits(g, bits - 1) + 1;
    const Fraction x(p, q);
    fp::Terms fast, slow;
    const double t_fast = best_of(3, [&] { fast = fp::regular_expansion(x); });
    const double t_slow =
        best_of(bits >= 1000000 ? 1 : 3, [&] { slow = fp::reference::regular_expansion_euclid(x); });
    if (fast != slow) {
      fmt::print("MISMATCH: half-gcd and Euclid differ at {} bits\n", bits);
      return 1;
    }
    row("(c) expansion, random p/q", fmt::format("{} bits", bits), "half-gcd", t_fast,
        fmt::format("{} terms", fast.size()));
    row("", "", "plain Euclid", t_slow, fmt::format("ratio {:.1f}x", t_slow / t_fast));
  }
  {  // worst case: a Fibonacci ratio, all quotients 1
    const std::size_t n = quick ? 100000 : 1000000;
    // F(k+1)/F(k) = [1; 1, ..., 1], and F(k) has about 0.694·k bits: the all-ones value.
    std::vector<Integer> ones(static_cast<std::size_t>(static_cast<double>(n) / 0.6942), Integer(1));
    const fp::ValueParts fib = fp::standard_value_parts(ones);
    const Fraction x(fib.numerator, fib.denominator);
    fp::Terms fast;
    const double t_fast = best_of(3, [&] { fast = fp::regular_expansion(x); });
    fp::Terms slow;
    const double t_slow = best_of(1, [&] { slow = fp::reference::regular_expansion_euclid(x); });
    if (fast != slow) {
      fmt::print("MISMATCH: half-gcd and Euclid differ on the Fibonacci ratio\n");
      return 1;
    }
    row("(c) expansion, Fibonacci ratio", fmt::format("{} bits", bit_length(x.numerator())),
        "half-gcd", t_fast, fmt::format("{} terms (all 1)", fast.size()));
    row("", "", "plain Euclid", t_slow, fmt::format("ratio {:.1f}x", t_slow / t_fast));
  }
  // Scaling of the two methods (for the 10^6-bit ratio if Euclid is ever too slow to run).
  fmt::print("\nscaling of the expansion (random p/q):\n");
  for (std::size_t bits : {12500ul, 25000ul, 50000ul, 100000ul, 200000ul}) {
    if (quick && bits > 50000) break;
    const Fraction x(random_bits(g, bits) | (Integer(1) << (bits - 1)), random_bits(g, bits - 1) + 1);
    fp::Terms f;
    const double t_fast = best_of(3, [&] { f = fp::regular_expansion(x); });
    const double t_slow = best_of(1, [&] { f = fp::reference::regular_expansion_euclid(x); });
    fmt::print("  {:>8} bits: half-gcd {:.5f} s, Euclid {:.5f} s, ratio {:.1f}x\n", bits, t_fast,
               t_slow, t_slow / t_fast);
  }
  return 0;
}
