// A subcommand of the `tenthpoint` program. Each command declares its
// options on a CLI11 subcommand and runs once parsing has succeeded. Commands
// are the only code (with main) that prints; the engine returns plain data.
#pragma once

#include <memory>
#include <vector>

namespace CLI {
class App;
}

namespace tenthpoint::cli {

// Process exit codes shared by every command.
inline constexpr int kExitOk = 0;
inline constexpr int kExitFindings = 1;  // ran, but some input failed (bad bridge, failed rating)
inline constexpr int kExitUsage = 2;     // bad command line or unusable environment

class Command {
 public:
  virtual ~Command() = default;
  // Declares the subcommand and its options on `app`; called once. Returns
  // the subcommand so the caller can tell which one was chosen.
  virtual CLI::App* declare(CLI::App& app) = 0;
  // Runs after a successful parse when this subcommand was chosen.
  virtual int run() = 0;
};

std::unique_ptr<Command> make_check_command();
std::unique_ptr<Command> make_diagrams_command();
std::unique_ptr<Command> make_rate_command();
std::unique_ptr<Command> make_export_command();
std::unique_ptr<Command> make_merge_command();
std::unique_ptr<Command> make_history_command();
std::unique_ptr<Command> make_changes_command();

}  // namespace tenthpoint::cli
