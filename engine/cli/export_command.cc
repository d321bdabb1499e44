// tenthpoint export: the rating factors and posting values of a run (the
// latest, or --run ID) from the ledger, for posting decisions. Two views:
// vehicles (one row per bridge and rating vehicle) and snbi (one row per
// bridge by the SNBI load-rating and posting items), each as CSV or JSON
// following schemas/export.schema.json (engine/report/rating_export.h).
#include <CLI/CLI.hpp>
#include <cstdio>
#include <map>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "engine/cli/command.h"
#include "engine/cli/ledger_output.h"
#include "engine/core/atomic_file.h"
#include "engine/ledger/ledger.h"
#include "engine/ledger/ledger_error.h"
#include "engine/report/rating_export.h"

namespace tenthpoint::cli {
namespace {

// B.PS.02: the rating date of the first run of the latest unbroken stretch
// of runs, up to `run`, in which the bridge's recommendation was what it is
// in `run` (failed runs say nothing about the posting and are skipped).
std::map<std::string, std::string> posting_status_changes(const ledger::Ledger& ledger, ledger::RunId run,
                                                          const std::vector<ledger::BridgeRecord>& records) {
  std::map<std::string, std::string> out;
  for (const ledger::BridgeRecord& r : records) {
    if (r.structure_id.empty() || r.status == ledger::BridgeStatus::failed) continue;
    std::string since;
    std::string status;
    for (const ledger::HistoryEntry& e : ledger.history(r.structure_id)) {  // oldest first
      if (e.run > run) break;
      if (e.record.status == ledger::BridgeStatus::failed) continue;
      if (e.record.recommendation != status) {
        status = e.record.recommendation;
        since = e.record.rating_date;
      }
    }
    if (!since.empty()) out.emplace(r.structure_id, since);
  }
  return out;
}

class ExportCommand final : public Command {
 public:
  CLI::App* declare(CLI::App& app) override {
    CLI::App* sub = app.add_subcommand(
        "export", "Write the rating factors and posting values of a run for posting decisions (CSV or JSON)");
    sub->add_option("--run", run_, "Run id in the ledger; the latest run when omitted")->check(CLI::PositiveNumber);
    add_ledger_options(sub, location_);
    sub->add_option("--view", view_, "vehicles (one row per bridge and rating vehicle) or snbi (one row per bridge)")
        ->check(CLI::IsMember({"vehicles", "snbi"}))
        ->capture_default_str();
    sub->add_option("--format", format_, "csv or json")->check(CLI::IsMember({"csv", "json"}))->capture_default_str();
    sub->add_option("--to", to_, "Output file, written atomically; standard output when omitted");
    return sub;
  }

  int run() override {
    std::optional<ledger::Ledger> ledger = open_existing_ledger(location_);
    if (!ledger) return kExitUsage;
    const std::string where = location_.path().string();
    try {
      const std::optional<ledger::RunInfo> run = run_ > 0 ? ledger->run(run_) : ledger->latest_run();
      if (!run) {
        if (run_ > 0) {
          const std::optional<ledger::RunInfo> latest = ledger->latest_run();
          const std::string known = latest ? fmt::format(" (its runs are 1 to {})", latest->id) : std::string();
          std::fprintf(stderr, "tenthpoint: the ledger %s has no run %lld%s\n", where.c_str(), run_, known.c_str());
        } else
          std::fprintf(stderr, "tenthpoint: the ledger %s holds no run yet; rate an inventory first\n", where.c_str());
        return kExitUsage;
      }
      const std::vector<ledger::BridgeRecord> records = ledger->run_results(run->id);
      std::string text;
      if (view_ == "vehicles") {
        text = format_ == "json" ? report::vehicles_json(*run, records).dump(2) + "\n"
                                 : report::vehicles_csv(*run, records);
      } else {
        report::SnbiOptions options;
        options.posting_status_changed = posting_status_changes(*ledger, run->id, records);
        text = format_ == "json" ? report::snbi_json(*run, records, options).dump(2) + "\n"
                                 : report::snbi_csv(*run, records, options);
      }
      if (to_.empty()) {
        std::fwrite(text.data(), 1, text.size(), stdout);
      } else {
        write_file_atomically(to_, text);
        std::fprintf(stderr, "%s: %zu bridge%s of run %lld\n", to_.c_str(), records.size(),
                     records.size() == 1 ? "" : "s", static_cast<long long>(run->id));
      }
      return kExitOk;
    } catch (const ledger::LedgerError& e) {
      std::fprintf(stderr, "tenthpoint: %s\n", e.what());
      return kExitUsage;
    } catch (const std::runtime_error& e) {
      // write_file_atomically and the finite-number guard name the file or the bridge.
      std::fprintf(stderr, "tenthpoint: export: %s\n", e.what());
      return kExitFindings;
    }
  }

 private:
  long long run_ = 0;  // 0: the latest run
  LedgerLocation location_;
  std::string view_ = "vehicles";
  std::string format_ = "csv";
  std::string to_;
};

}  // namespace

std::unique_ptr<Command> make_export_command() { return std::make_unique<ExportCommand>(); }

}  // namespace tenthpoint::cli
