#include "command.hpp"

namespace fourplat::app {
std::vector<Command>& commands() {
  static std::vector<Command> all;  // function-local: safe during static registration
  return all;
}
}  // namespace fourplat::app
