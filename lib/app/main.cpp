// The fourplat command-line tool: entry point. Commands live one per file in lib/app/.
#include <cstdio>
#include <cstring>

int main(int argc, char** argv) {
  if (argc > 1 && std::strcmp(argv[1], "--version") == 0) {
    std::puts("fourplat 0.1.0");
    return 0;
  }
  std::fputs("fourplat: no command given (try --version)\n", stderr);
  return 2;
}
