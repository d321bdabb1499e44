// The tenthpoint command: parses the command line, configures logging (the
// only place log sinks are set up) and dispatches to a subcommand.
#include <spdlog/sinks/stdout_color_sinks.h>
#include <spdlog/spdlog.h>

#include <unistd.h>
#include <CLI/CLI.hpp>
#include <cstdio>
#include <exception>
#include <string>
#include <vector>

#include "engine/cli/command.h"
#include "engine/core/version.h"

namespace {

spdlog::level::level_enum parse_level(const std::string& name) {
  const auto level = spdlog::level::from_str(name);
  return level == spdlog::level::off && name != "off" ? spdlog::level::info : level;
}

}  // namespace

int main(int argc, char** argv) {
  using namespace tenthpoint::cli;

  CLI::App app{
      "tenthpoint: batch load rating of multi-span highway bridges.\n"
      "Results support, and never replace, the judgment of a licensed engineer.",
      "tenthpoint"};
  app.set_version_flag("--version", std::string("tenthpoint ") + tenthpoint::kEngineVersion);
  app.require_subcommand(1);
  std::string log_level = "warn";
  app.add_option("--log-level", log_level, "trace, debug, info, warn, error or off")
      ->check(CLI::IsMember({"trace", "debug", "info", "warn", "error", "off"}))
      ->capture_default_str();

  struct Declared {
    std::unique_ptr<Command> command;
    CLI::App* subcommand;
  };
  std::vector<Declared> commands;
  for (auto make : {make_check_command, make_rate_command, make_merge_command, make_diagrams_command,
                    make_history_command, make_changes_command, make_export_command}) {
    auto command = make();
    CLI::App* sub = command->declare(app);
    commands.push_back({std::move(command), sub});
  }

  // CLI11 reports a mistyped command only as "a subcommand is required";
  // name the word and the commands there are instead.
  for (int i = 1; i < argc; ++i) {
    const std::string word = argv[i];
    if (word.empty() || word[0] == '-') {
      if (word == "--log-level") ++i;  // skip its value
      continue;
    }
    bool known = false;
    std::string names;
    for (const auto& declared : commands) {
      known = known || declared.subcommand->get_name() == word;
      names += (names.empty() ? "" : ", ") + declared.subcommand->get_name();
    }
    if (!known) {
      std::fprintf(stderr, "tenthpoint: unknown command '%s'; expected one of: %s\n", word.c_str(), names.c_str());
      return kExitUsage;
    }
    break;
  }

  try {
    app.parse(argc, argv);
  } catch (const CLI::CallForHelp& e) {
    return app.exit(e);
  } catch (const CLI::CallForAllHelp& e) {
    return app.exit(e);
  } catch (const CLI::CallForVersion& e) {
    return app.exit(e);
  } catch (const CLI::ParseError& e) {
    app.exit(e);
    return kExitUsage;
  }

  // Diagnostics of the engine go to stderr; results go to stdout or files.
  auto logger = spdlog::stderr_color_mt("tenthpoint");
  logger->set_pattern(::isatty(STDERR_FILENO) ? "%^%l%$: %v" : "%Y-%m-%dT%H:%M:%S %l: %v");
  spdlog::set_default_logger(logger);
  spdlog::set_level(parse_level(log_level));

  try {
    for (auto& [command, subcommand] : commands)
      if (subcommand->parsed()) return command->run();
  } catch (const std::exception& e) {
    // Commands handle input errors themselves; what reaches here is an
    // environment problem (an unwritable output directory, say).
    std::fprintf(stderr, "tenthpoint: %s\n", e.what());
    return kExitUsage;
  }
  return kExitUsage;
}
