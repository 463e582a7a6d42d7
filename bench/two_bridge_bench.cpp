// Benchmark (a) of the core issue: classify random fractions p/q with p < 2^62 on one core.
//
// A timed driver (own main) printing one table: the word path one call at a time, the batched
// word path (scalar kernel and the default, AVX-512 where the CPU has it), and the GMP path (TwoBridgeLink: everything `classify` prints) on the same inputs,
// with a bare Euclid loop (sum of partial quotients only, lib/detail/word.hpp) as the baseline
// that makes the figures comparable across machines. Allocations are counted by replacing the
// global operator new and GMP's memory functions (GMP does not allocate through operator new), so
// "allocation-free" is measured, not claimed.
//
// "time ratio" is each time over the default batch kernel's time.
// Usage: two_bridge_bench [N]   (N inputs, default 1000000)
#include <chrono>
#include <cinttypes>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <new>
#include <numeric>
#include <optional>
#include <random>
#include <string>
#include <vector>

#include <gmp.h>

#include "detail/word.hpp"
#include "fourplat/two_bridge.hpp"

namespace {
std::uint64_t g_allocations = 0;  // single-threaded driver: no atomics needed
}  // namespace

void* operator new(std::size_t n) {
  ++g_allocations;
  if (void* p = std::malloc(n == 0 ? 1 : n)) return p;
  throw std::bad_alloc();
}
void* operator new[](std::size_t n) {
  ++g_allocations;
  if (void* p = std::malloc(n == 0 ? 1 : n)) return p;
  throw std::bad_alloc();
}
void operator delete(void* p) noexcept { std::free(p); }
namespace {
void* gmp_alloc(std::size_t n) {
  ++g_allocations;
  return std::malloc(n);
}
void* gmp_realloc(void* p, std::size_t, std::size_t n) {
  ++g_allocations;
  return std::realloc(p, n);
}
void gmp_free(void* p, std::size_t) { std::free(p); }
}  // namespace
void operator delete[](void* p) noexcept { std::free(p); }
void operator delete(void* p, std::size_t) noexcept { std::free(p); }
void operator delete[](void* p, std::size_t) noexcept { std::free(p); }

namespace {

using Clock = std::chrono::steady_clock;

struct Row {
  std::string name;
  double seconds = 0;
  std::uint64_t allocations = 0;
  std::uint64_t checksum = 0;
};

template <class F>
Row timed(const std::string& name, F&& body) {
  Row r;
  r.name = name;
  double best = 1e300;
  for (int rep = 0; rep < 3; ++rep) {  // best of three: the machine is shared
    const std::uint64_t a0 = g_allocations;
    const auto t0 = Clock::now();
    r.checksum = body();
    const double s = std::chrono::duration<double>(Clock::now() - t0).count();
    r.allocations = g_allocations - a0;
    best = std::min(best, s);
  }
  r.seconds = best;
  return r;
}

std::uint64_t mix(const fourplat::LinkSummaryWord& s) {
  return static_cast<std::uint64_t>(s.canonical_q) * 3 + static_cast<std::uint64_t>(s.canonical_mirror_q) * 5 +
         static_cast<std::uint64_t>(s.crossing_number) * 7 + static_cast<std::uint64_t>(s.amphichiral) +
         static_cast<std::uint64_t>(s.kind) * 11 + static_cast<std::uint64_t>(s.components);
}

}  // namespace

int main(int argc, char** argv) {
  mp_set_memory_functions(gmp_alloc, gmp_realloc, gmp_free);
  const std::size_t n = argc > 1 ? std::strtoull(argv[1], nullptr, 10) : 1000000;
  // Inputs: p uniform in [2, 2^62), q uniform in [1, p) with gcd(p, q) = 1; fixed seed.
  std::mt19937_64 g(20261201);
  std::vector<std::int64_t> ps(n), qs(n);
  for (std::size_t i = 0; i < n; ++i) {
    for (;;) {
      const std::uint64_t p = 2 + g() % ((std::uint64_t{1} << 62) - 2);
      const std::uint64_t q = 1 + g() % (p - 1);
      if (std::gcd(p, q) == 1) {
        ps[i] = static_cast<std::int64_t>(p);
        qs[i] = static_cast<std::int64_t>(q);
        break;
      }
    }
  }
  std::vector<std::optional<fourplat::LinkSummaryWord>> out(n);
  std::vector<Row> rows;

  rows.push_back(timed("baseline: bare Euclid (quotient sum only)", [&] {
    std::uint64_t sum = 0;
    for (std::size_t i = 0; i < n; ++i) {
      sum += fourplat::detail::partial_quotient_sum(static_cast<std::uint64_t>(ps[i]),
                                                    static_cast<std::uint64_t>(qs[i]));
    }
    return sum;
  }));
  rows.push_back(timed("word path, one call per input", [&] {
    std::uint64_t sum = 0;
    for (std::size_t i = 0; i < n; ++i) {
      if (const auto s = fourplat::summarize_numerator_word(ps[i], qs[i])) sum += mix(*s);
    }
    return sum;
  }));
  const bool avx512 = fourplat::word_kernel_available(fourplat::WordKernel::avx512);
  rows.push_back(timed("word path, batched, scalar kernel", [&] {
    fourplat::summarize_numerator_words(ps, qs, out, fourplat::WordKernel::scalar);
    std::uint64_t sum = 0;
    for (const auto& s : out) sum += s ? mix(*s) : 0;
    return sum;
  }));
  rows.push_back(timed(avx512 ? "word path, batched, AVX-512 kernel (default)"
                              : "word path, batched (AVX-512 unavailable: scalar)",
                       [&] {
                         fourplat::summarize_numerator_words(ps, qs, out);
                         std::uint64_t sum = 0;
                         for (const auto& s : out) sum += s ? mix(*s) : 0;
                         return sum;
                       }));
  rows.push_back(timed("GMP path (TwoBridgeLink, all classify fields)", [&] {
    std::uint64_t sum = 0;
    for (std::size_t i = 0; i < n; ++i) {
      const fourplat::TwoBridgeLink l(ps[i], qs[i]);
      fourplat::LinkSummaryWord s;
      s.canonical_q = l.canonical().q().convert_to<std::int64_t>();
      s.canonical_mirror_q = l.canonical_up_to_mirror().q().convert_to<std::int64_t>();
      s.crossing_number = l.crossing_number().convert_to<std::int64_t>();
      s.amphichiral = l.is_amphichiral();
      s.kind = l.kind();
      s.components = l.components();
      sum += mix(s);
    }
    return sum;
  }));

  const double batch = rows[3].seconds;  // the default batch kernel
  std::printf("two_bridge_bench: %zu random fractions p/q, p < 2^62, one core\n\n", n);
  std::printf("%-48s %10s %14s %9s %12s\n", "method", "time [s]", "per second", "time ratio",
              "allocations");
  for (const Row& r : rows) {
    std::printf("%-48s %10.4f %14.4g %8.2fx %12" PRIu64 "\n", r.name.c_str(), r.seconds,
                static_cast<double>(n) / r.seconds, r.seconds / batch, r.allocations);
  }
  bool agree = true;
  for (const Row& r : rows) agree = agree && (&r == &rows[0] || r.checksum == rows[1].checksum);
  std::printf("\nchecksums of the four classifiers %s (%" PRIu64 ")\n", agree ? "agree" : "DIFFER",
              rows[1].checksum);
  std::printf("default batch: %.1fx faster than the GMP path, %.1fx than single calls, %.2fx the "
              "baseline Euclid's time\n",
              rows[4].seconds / batch, rows[1].seconds / batch, batch / rows[0].seconds);
  return agree ? 0 : 1;
}
