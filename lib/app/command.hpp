// The tool's command registry: each lib/app/cmd_<name>.cpp registers one subcommand with a
// static Registration, so adding a command touches no other file.
//
//   static const fourplat::app::Registration reg{{"count", "count 2-bridge knots and links", setup}};
//
// `setup(CLI::App& sub)` adds the subcommand's options and sets `sub.callback(...)`. Inside a
// callback: write results to stdout; throw fourplat::Error (or a subtype) for bad input — main
// prints "fourplat: <what()>" on stderr and exits 2; throw app::Exit{code} to end with a status
// after the output is complete (e.g. classify when some input lines failed).
#pragma once

#include <functional>
#include <string>
#include <vector>

#include <CLI/CLI.hpp>

namespace fourplat::app {

struct Command {
  std::string name;
  std::string summary;
  std::function<void(CLI::App&)> setup;
};

/// Thrown by a command to end the program with this status once its output is flushed.
struct Exit {
  int code;
};

/// All registered commands, in registration order.
std::vector<Command>& commands();

struct Registration {
  explicit Registration(Command c) { commands().push_back(std::move(c)); }
};

}  // namespace fourplat::app
