// Replay driver for the libFuzzer-style harnesses in tests/fuzz/: runs LLVMFuzzerTestOneInput on
// every file of the directories (or on the files) named on the command line, so CTest exercises
// each harness on its committed corpus without libFuzzer. With libFuzzer, build the harness alone
// with -fsanitize=fuzzer instead and leave this file out.
#include <algorithm>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <iterator>
#include <string>
#include <vector>

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size);

namespace {
int replay(const std::filesystem::path& file) {
  std::ifstream in(file, std::ios::binary);
  if (!in) {
    std::fprintf(stderr, "replay: cannot read %s\n", file.c_str());
    return 1;
  }
  const std::vector<char> bytes((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
  std::vector<std::uint8_t> data(bytes.begin(), bytes.end());  // an exact-size buffer, as libFuzzer gives
  (void)LLVMFuzzerTestOneInput(data.data(), data.size());
  return 0;
}
}  // namespace

int main(int argc, char** argv) {
  if (argc < 2) {
    std::fprintf(stderr, "usage: %s CORPUS_DIR_OR_FILE...\n", argv[0]);
    return 2;
  }
  std::size_t count = 0;
  int failures = 0;
  for (int a = 1; a < argc; ++a) {
    const std::filesystem::path arg(argv[a]);
    std::vector<std::filesystem::path> files;
    if (std::filesystem::is_directory(arg)) {
      for (const auto& entry : std::filesystem::directory_iterator(arg)) {
        if (entry.is_regular_file()) files.push_back(entry.path());
      }
      std::sort(files.begin(), files.end());  // deterministic order
    } else {
      files.push_back(arg);
    }
    for (const auto& f : files) {
      std::printf("replay %s\n", f.c_str());
      std::fflush(stdout);  // a crash names the input that caused it
      failures += replay(f);
      ++count;
    }
  }
  if (count == 0) {
    std::fprintf(stderr, "replay: no inputs found\n");
    return 1;
  }
  std::printf("replayed %zu inputs\n", count);
  return failures == 0 ? 0 : 1;
}
