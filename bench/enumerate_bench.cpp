// Timed driver for the enumeration (enumerate.hpp) and the counts (counts.hpp).
//
//   enumerate_bench [MAX_N] [THREADS]     defaults: 30 and 2
//
// Prints, in one run:
//   * the floor — a bare depth-first walk over every composition of every n ≤ MAX_N (the
//     Stern–Brocot words, 2^(n−1) of them) with the same incremental arithmetic as the
//     enumeration (two additions per letter) and nothing else but a checksum per word;
//   * the enumeration of every 2-bridge class of crossing number ≤ MAX_N, canonicalised, through
//     the public callback, split over THREADS threads by --shard, and its ratio to the floor;
//     the same for knots only, mirrors listed, oriented classes;
//   * the shard imbalance (items per shard, max/min) for several shard counts;
//   * the counts for n = 10^4 by the closed formulas;
//   * the peak resident set size after enumerating n = 24 and n = 30 (getrusage).
#include <sys/resource.h>

#include <algorithm>
#include <chrono>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <thread>
#include <vector>

#include "fourplat/counts.hpp"
#include "fourplat/enumerate.hpp"

namespace {

using Clock = std::chrono::steady_clock;
using i64 = std::int64_t;

double seconds_since(Clock::time_point t0) {
  return std::chrono::duration<double>(Clock::now() - t0).count();
}

// ---- the floor ----

struct Mat {
  i64 a, b, c, d;
};

struct FloorWalk {
  std::uint64_t sum = 0;
  std::uint64_t words = 0;
  // All words of length r appended to m; the leaf adds the mediant (a+b)/(c+d) to a checksum.
  void walk(int r, const Mat& m) {
    if (r == 0) {
      sum += static_cast<std::uint64_t>(m.a + m.b) * 31U + static_cast<std::uint64_t>(m.c + m.d);
      ++words;
      return;
    }
    walk(r - 1, Mat{m.a, m.a + m.b, m.c, m.c + m.d});  // · R
    walk(r - 1, Mat{m.a + m.b, m.b, m.c + m.d, m.d});  // · L
  }
};

// The floor on `threads` threads: thread t takes the words whose first letters, read as a
// binary number of log2(threads) bits, equal t (an exact split).
double floor_walk(int max_n, int threads, std::uint64_t& words, std::uint64_t& sum) {
  int bits = 0;
  while ((1 << bits) < threads) ++bits;
  const auto t0 = Clock::now();
  std::vector<FloorWalk> parts(static_cast<std::size_t>(threads));
  std::vector<std::thread> pool;
  for (int t = 0; t < threads; ++t) {
    pool.emplace_back([&, t] {
      FloorWalk& w = parts[static_cast<std::size_t>(t)];
      for (int n = 1; n <= max_n; ++n) {
        const int len = n - 1;
        if (len < bits) {  // short words: thread 0 walks them whole
          if (t == 0) w.walk(len, Mat{1, 0, 0, 1});
          continue;
        }
        Mat m{1, 0, 0, 1};
        for (int k = bits - 1; k >= 0; --k) {
          m = ((t >> k) & 1) == 0 ? Mat{m.a, m.a + m.b, m.c, m.c + m.d} : Mat{m.a + m.b, m.b, m.c + m.d, m.d};
        }
        w.walk(len - bits, m);
      }
    });
  }
  for (auto& th : pool) th.join();
  const double s = seconds_since(t0);
  words = sum = 0;
  for (const FloorWalk& w : parts) {
    words += w.words;
    sum += w.sum;
  }
  return s;
}

// ---- the enumeration ----

struct Run {
  double seconds = 0;
  std::uint64_t items = 0;
  std::uint64_t checksum = 0;
  std::vector<std::uint64_t> per_shard;
  std::vector<double> shard_seconds;
};

Run enumerate(int lo, int hi, fourplat::EnumerationOptions o, int threads) {
  Run r;
  r.per_shard.assign(static_cast<std::size_t>(threads), 0);
  r.shard_seconds.assign(static_cast<std::size_t>(threads), 0);
  std::vector<std::uint64_t> sums(static_cast<std::size_t>(threads), 0);
  const auto t0 = Clock::now();
  std::vector<std::thread> pool;
  for (int t = 0; t < threads; ++t) {
    pool.emplace_back([&, t, o]() mutable {
      const auto ts = Clock::now();
      o.shard = {static_cast<std::uint64_t>(t), static_cast<std::uint64_t>(threads)};
      std::uint64_t k = 0, s = 0;
      fourplat::for_each_two_bridge(lo, hi, o, [&](const fourplat::EnumeratedLink& it) {
        ++k;
        s += static_cast<std::uint64_t>(it.p) * 31U + static_cast<std::uint64_t>(it.q);
        return true;
      });
      r.per_shard[static_cast<std::size_t>(t)] = k;
      sums[static_cast<std::size_t>(t)] = s;
      r.shard_seconds[static_cast<std::size_t>(t)] = seconds_since(ts);
    });
  }
  for (auto& th : pool) th.join();
  r.seconds = seconds_since(t0);
  for (int t = 0; t < threads; ++t) {
    r.items += r.per_shard[static_cast<std::size_t>(t)];
    r.checksum += sums[static_cast<std::size_t>(t)];
  }
  return r;
}

long peak_rss_kib() {
  rusage u{};
  getrusage(RUSAGE_SELF, &u);
  return u.ru_maxrss;  // KiB on Linux
}

}  // namespace

int main(int argc, char** argv) {
  const int max_n = argc > 1 ? std::atoi(argv[1]) : 30;
  const int threads = argc > 2 ? std::atoi(argv[2]) : 2;
  if (max_n < 2 || max_n > fourplat::kMaxEnumerationCrossings || threads < 1 || threads > 64) {
    std::fprintf(stderr, "usage: enumerate_bench [MAX_N 2..89] [THREADS 1..64]\n");
    return 2;
  }
  std::printf("fourplat enumerate_bench: crossing numbers 0..%d, %d thread(s), %u hardware threads\n\n",
              max_n, threads, std::thread::hardware_concurrency());

  // Memory first, so that the peaks belong to these runs alone.
  fourplat::EnumerationOptions plain;
  const long rss0 = peak_rss_kib();
  const Run r24 = enumerate(24, 24, plain, 1);
  const long rss24 = peak_rss_kib();
  long rss30 = 0;
  Run r30;
  if (max_n >= 30) {
    r30 = enumerate(30, 30, plain, 1);
    rss30 = peak_rss_kib();
  }

  std::uint64_t floor_words = 0, floor_sum = 0;
  const double floor_s = floor_walk(max_n, threads, floor_words, floor_sum);

  std::printf("%-44s %14s %9s %12s %8s\n", "walk", "items", "seconds", "items/s", "vs floor");
  std::printf("%-44s %14llu %9.3f %12.3g %8s\n", "floor: every composition, bare arithmetic",
              static_cast<unsigned long long>(floor_words), floor_s, static_cast<double>(floor_words) / floor_s,
              "1.00");
  struct Mode {
    const char* name;
    fourplat::EnumerationOptions o;
  };
  std::vector<Mode> modes;
  modes.push_back({"all classes up to mirror (the target)", plain});
  fourplat::EnumerationOptions knots;
  knots.components = fourplat::ComponentFilter::knots;
  modes.push_back({"knots up to mirror", knots});
  fourplat::EnumerationOptions mirrors;
  mirrors.mirrors = true;
  modes.push_back({"all classes, mirrors listed", mirrors});
  fourplat::EnumerationOptions oriented;
  oriented.oriented = true;
  modes.push_back({"all classes, oriented, up to mirror", oriented});
  fourplat::EnumerationOptions twists;
  twists.twists = true;
  modes.push_back({"all classes up to mirror, with twist sequences", twists});
  std::vector<Run> runs;
  for (const Mode& m : modes) {
    const Run r = enumerate(0, max_n, m.o, threads);
    runs.push_back(r);
    std::printf("%-44s %14llu %9.3f %12.3g %8.2f\n", m.name, static_cast<unsigned long long>(r.items), r.seconds,
                static_cast<double>(r.items) / r.seconds, r.seconds / floor_s);
  }
  const fourplat::Integer expected = [&] {
    fourplat::Integer s = 0;
    for (int n = 0; n <= max_n; ++n) s += fourplat::count_classes(n, plain);
    return s;
  }();
  std::printf("\nclasses listed %llu, by the formulas %s: %s\n", static_cast<unsigned long long>(runs[0].items),
              expected.str().c_str(), fourplat::Integer(runs[0].items) == expected ? "equal" : "DIFFERENT");
  std::printf("target: ≤ 10 s on 2 cores and ≤ 2× the floor; measured %.3f s, ratio %.2f\n", runs[0].seconds,
              runs[0].seconds / floor_s);
  std::printf("time per shard (target run):");
  for (const double s : runs[0].shard_seconds) std::printf(" %.3f s", s);
  std::printf("\n");

  // Shard imbalance: items per shard relative to the mean, for several shard counts (n ≤ 24).
  std::printf("\n%-10s %-14s %12s %12s %12s %10s\n", "shards", "listing", "min items", "max items", "mean",
              "max/mean");
  for (const int parts : {2, 7, 64, 1000}) {
    for (const Mode& m : {modes[0], modes[1], modes[3]}) {
      std::vector<std::uint64_t> sizes;
      for (int t = 0; t < parts; ++t) {
        fourplat::EnumerationOptions o = m.o;
        o.shard = {static_cast<std::uint64_t>(t), static_cast<std::uint64_t>(parts)};
        std::uint64_t k = 0;
        fourplat::for_each_two_bridge(0, 24, o, [&](const fourplat::EnumeratedLink&) { return ++k, true; });
        sizes.push_back(k);
      }
      const auto [mn, mx] = std::minmax_element(sizes.begin(), sizes.end());
      double mean = 0;
      for (const auto s : sizes) mean += static_cast<double>(s);
      mean /= parts;
      std::printf("%-10d %-14s %12llu %12llu %12.1f %10.5f\n", parts,
                  m.o.components == fourplat::ComponentFilter::knots ? "knots"
                  : m.o.oriented                                     ? "oriented"
                                                                     : "all",
                  static_cast<unsigned long long>(*mn), static_cast<unsigned long long>(*mx), mean,
                  static_cast<double>(*mx) / mean);
    }
  }

  // Counts by formula at n = 10^4.
  const int reps = 200;
  const auto tc = Clock::now();
  std::size_t digits = 0;
  for (int i = 0; i < reps; ++i) {
    const fourplat::TwoBridgeCounts c = fourplat::count_two_bridge(10000);
    digits += c.knots.str().size() > 0 ? 1 : 0;
  }
  const double per = seconds_since(tc) / reps;
  std::printf("\ncounts for n = 10^4 (all nine numbers, formulas): %.3f ms each (target < 10 ms); knots has %zu digits\n",
              per * 1e3, fourplat::count_two_bridge(10000).knots.str().size());
  (void)digits;

  std::printf("\npeak RSS: start %ld KiB; after n = 24 (%llu classes) %ld KiB", rss0,
              static_cast<unsigned long long>(r24.items), rss24);
  if (max_n >= 30) {
    std::printf("; after n = 30 (%llu classes) %ld KiB", static_cast<unsigned long long>(r30.items), rss30);
  }
  std::printf("\n(checksums: floor %llu, target %llu)\n", static_cast<unsigned long long>(floor_sum),
              static_cast<unsigned long long>(runs[0].checksum));
  return 0;
}
