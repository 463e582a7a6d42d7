// Timed driver for the diagram layer: building the standard diagram, PD export and import, the
// coloring fraction, the propagated coloring witness and the Smith-form determinant, swept over
// the number of crossings. Prints nanoseconds per crossing and the ratio to the diagram build, so
// the figures compare across machines; near-linear rows keep a flat ns/crossing column.
#include <chrono>
#include <cstdio>
#include <functional>
#include <random>

#include "fourplat/coloring.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/pd.hpp"

namespace fp = fourplat;

namespace {

double seconds(const std::function<void()>& f, int reps = 1) {
  const auto t0 = std::chrono::steady_clock::now();
  for (int i = 0; i < reps; ++i) f();
  return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count() / reps;
}

/// A canonical-looking sequence: n crossings spread over twists of 1..4 (all positive).
fp::TwistSequence sequence(std::int64_t n, std::mt19937_64& g) {
  fp::TwistSequence s;
  std::int64_t left = n;
  while (left > 0) {
    const std::int64_t t = std::min<std::int64_t>(left, std::uniform_int_distribution<int>(1, 4)(g));
    s.twists.emplace_back(t);
    left -= t;
  }
  if (s.twists.size() % 2 == 0) s.twists.emplace_back(0);  // odd length
  return s;
}

}  // namespace

int main() {
  std::mt19937_64 g(20261201);
  std::printf("%-10s %-22s %12s %14s %10s\n", "crossings", "operation", "seconds", "ns/crossing", "x build");
  for (std::int64_t n : {1000, 10000, 100000, 1000000}) {
    const auto s = sequence(n, g);
    const double build = seconds([&] { (void)fp::Diagram::of_twists(s); }, n <= 10000 ? 20 : 2);
    const fp::Diagram d = fp::Diagram::of_twists(s);
    const auto pd = d.pd_code();
    auto row = [&](const char* what, double t) {
      std::printf("%-10lld %-22s %12.6f %14.1f %10.2f\n", static_cast<long long>(n), what, t,
                  1e9 * t / static_cast<double>(n), t / build);
    };
    row("diagram build", build);
    row("PD export", seconds([&] { (void)d.pd_code(); }));
    row("PD import+validate", seconds([&] { fp::PdDiagram x(pd); }));
    // Exact integer colors grow like the fraction itself: quadratic, so stop at 10^5.
    if (n <= 100000) row("coloring fraction", seconds([&] { (void)fp::coloring_fraction(d); }));
    row("witness mod 3 (prop.)", seconds([&] { (void)fp::propagated_witness(d, fp::Integer(3)); }));
    if (n <= 100000) {
      fp::PdDiagram x(pd);
      row("determinant (Smith)", seconds([&] { fp::PdDiagram y(pd); (void)y.determinant(); }));
    }
  }
  return 0;
}
