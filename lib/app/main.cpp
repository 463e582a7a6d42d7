// The fourplat command-line tool: entry point. Commands live one per file in lib/app/cmd_*.cpp and
// register themselves (command.hpp); this file builds the argument parser and maps failures to
// exit statuses: 0 success, 2 usage errors and bad input (fourplat::Error), 1 anything else.
#include <CLI/CLI.hpp>

#include <cstdio>
#include <exception>
#include <new>
#include <string>
#include <vector>

#include "command.hpp"
#include "fourplat/error.hpp"
#include "output.hpp"

namespace {

// The project version (CMakeLists.txt: project(fourplat VERSION ...)); tests/cli checks they agree.
constexpr const char* kVersion = "0.1.0";

constexpr const char* kDescription =
    "fourplat: exact rational tangles and the 2-bridge knots and links they close into.\n"
    "\n"
    "A TANGLE is a fraction P/Q or an integer N (any size), inf or 1/0 for the tangle [inf],\n"
    "a Conway twist sequence in brackets, [2 1 1 2] or [3,-2] (Conway's order: the last twist is\n"
    "the outermost, horizontal one), or a sum of those joined by '+', such as '3/5 + 2/7'.\n"
    "Quote tangles with spaces or brackets; put '--' before a first argument like -inf.\n"
    "\n"
    "Examples:\n"
    "  fourplat show 5/2                     everything about a tangle and both closures\n"
    "  fourplat classify '[2 1 1 2]' 17/7     one line per tangle; --json for JSON lines\n"
    "  fourplat classify --json < list.txt   one tangle per line from standard input\n"
    "  fourplat compare 7/2 7/4              same tangle? same closure? up to mirror?\n"
    "  fourplat colorings '[3]' --modulus 3  Fox 3-colorings of the trefoil, with a witness\n"
    "  fourplat selftest                     check the build against published values\n"
    "\n"
    "Exit status: 0 success, 2 bad usage or bad input, 1 any other failure.\n"
    "Run 'fourplat COMMAND --help' for the options of a command; docs/tool.md is the guide.";

}  // namespace

int main(int argc, char** argv) {
  using fourplat::app::print_error;
  CLI::App app(kDescription, "fourplat");
  app.set_version_flag("-V,--version", std::string("fourplat ") + kVersion);
  app.require_subcommand(1);
  app.fallthrough(false);
  app.get_formatter()->column_width(34);
  for (const auto& c : fourplat::app::commands()) {
    CLI::App* sub = app.add_subcommand(c.name, c.summary);
    c.setup(*sub);
    // The command list shows each command's one-line summary; a longer description set by a
    // command's setup goes above its footer in its own --help instead.
    if (sub->get_description() != c.summary) {
      const std::string footer = sub->get_footer();
      sub->footer(sub->get_description() + (footer.empty() ? "" : "\n\n" + footer));
      sub->description(c.summary);
    }
  }

  // CLI11 reads a word "[a,b]" as a list and splits it; a leading space keeps a twist sequence
  // such as "[3,-2]" one word (the tangle parser skips leading whitespace).
  std::vector<std::string> words(argv, argv + argc);
  for (std::size_t i = 1; i < words.size(); ++i) {
    if (!words[i].empty() && words[i].front() == '[') words[i].insert(0, 1, ' ');
  }
  std::vector<char*> args;
  for (std::string& w : words) args.push_back(w.data());

  int status = 0;
  try {
    app.parse(argc, args.data());
  } catch (const CLI::CallForHelp&) {
    std::fputs(app.help("", CLI::AppFormatMode::Normal).c_str(), stdout);
    // help() shows the selected subcommand's help when one was given.
    return 0;
  } catch (const CLI::CallForAllHelp&) {
    std::fputs(app.help("", CLI::AppFormatMode::All).c_str(), stdout);
    return 0;
  } catch (const CLI::CallForVersion&) {
    std::printf("fourplat %s\n", kVersion);
    return 0;
  } catch (const CLI::ParseError& e) {
    std::string hint = "fourplat --help";
    for (const CLI::App* sub : app.get_subcommands()) hint = "fourplat " + sub->get_name() + " --help";
    if (app.get_subcommands().empty() && argc < 2) {
      print_error("no command given (try 'fourplat --help')");
    } else {
      print_error(std::string(e.what()) + " (try '" + hint + "')");
    }
    return 2;
  } catch (const fourplat::app::Exit& e) {
    status = e.code;
  } catch (const fourplat::Error& e) {
    print_error(e.what());
    return 2;
  } catch (const std::bad_alloc&) {
    print_error("out of memory");
    return 1;
  } catch (const std::exception& e) {
    print_error(e.what());
    return 1;
  }
  try {
    fourplat::app::Output::get().flush();
  } catch (const std::exception& e) {
    print_error(e.what());
    return 1;
  }
  return status;
}
