// tenthpoint changes: what moved between two runs of the ledger: rating
// factors that moved by more than a threshold, bridges that newly need
// posting or closure, and ratings that are overdue. Like diff(1), the exit
// code says whether there is anything to look at (0 none, 1 some), so a
// nightly script can alert on it.
#include <CLI/CLI.hpp>
#include <cstdio>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "engine/cli/command.h"
#include "engine/cli/ledger_output.h"
#include "engine/ledger/ledger.h"

namespace tenthpoint::cli {
namespace {

using ledger::RunId;

std::string optional_rating(const std::optional<double>& rf) { return rf ? rating_text(*rf) : "-"; }

std::string change_text(const ledger::RatingChange& c) {
  if (!c.before) return "new";
  if (!c.after) return "gone";
  return fmt::format("{:+.2f}", *c.after - *c.before);
}

// Which deadline of an overdue record passed (both may have).
std::string overdue_text(const ledger::BridgeRecord& r, const std::string& as_of) {
  std::string out;
  if (r.rerate_by && *r.rerate_by < as_of) out += "rerate by " + *r.rerate_by;
  if (r.post_by && *r.post_by < as_of) out += (out.empty() ? "" : ", ") + std::string("post by ") + *r.post_by;
  return out;
}

std::string list_or_none(const std::vector<std::string>& ids) {
  if (ids.empty()) return "none";
  std::string out;
  for (const std::string& id : ids) out += (out.empty() ? "" : ", ") + id;
  return out;
}

class ChangesCommand final : public Command {
 public:
  CLI::App* declare(CLI::App& app) override {
    CLI::App* sub = app.add_subcommand(
        "changes",
        "List what changed between two runs of the ledger: moved rating factors, new postings and closures, overdue "
        "ratings (exit 0 when nothing, 1 when something is listed)");
    sub->add_option("runs", runs_, "RUN_A RUN_B: the earlier and the later run (default: the latest two finished runs)")
        ->expected(0, 2);
    sub->add_option("--threshold", threshold_,
                    "A rating factor is listed when it moved by more than this (a move of exactly it is not)")
        ->check(CLI::NonNegativeNumber)
        ->capture_default_str();
    add_ledger_options(sub, location_);
    sub->add_option("--format", format_, "text or json")->check(CLI::IsMember({"text", "json"}))->capture_default_str();
    return sub;
  }

  int run() override {
    if (runs_.size() == 1) {
      std::fprintf(stderr, "tenthpoint: changes takes two runs (RUN_A RUN_B) or none (the latest two finished)\n");
      return kExitUsage;
    }
    std::optional<ledger::Ledger> ledger = open_existing_ledger(location_);
    if (!ledger) return kExitUsage;
    const std::string path = location_.path().string();

    std::optional<ledger::RunInfo> from, to;
    if (runs_.empty()) {
      std::vector<ledger::RunInfo> finished;
      for (ledger::RunInfo& r : ledger->runs())
        if (!r.finished.empty()) finished.push_back(std::move(r));
      if (finished.size() < 2) {
        std::fprintf(stderr,
                     "tenthpoint: the ledger %s has %zu finished run%s; changes compares two (rate again, or name "
                     "two runs: tenthpoint changes RUN_A RUN_B)\n",
                     path.c_str(), finished.size(), finished.size() == 1 ? "" : "s");
        return kExitUsage;
      }
      from = finished[finished.size() - 2];
      to = finished.back();
    } else {
      from = ledger->run(runs_[0]);
      to = ledger->run(runs_[1]);
      for (std::size_t i = 0; i < 2; ++i)
        if (!(i == 0 ? from : to)) {
          const auto all = ledger->runs();
          std::fprintf(stderr, "tenthpoint: the ledger %s has no run %lld (%s)\n", path.c_str(),
                       static_cast<long long>(runs_[i]),
                       all.empty() ? "it has no runs"
                                   : fmt::format("its runs are {} to {}", all.front().id, all.back().id).c_str());
          return kExitUsage;
        }
    }

    const ledger::ChangeReport report = ledger->changes(from->id, to->id, threshold_);
    const std::string as_of = to->started.substr(0, 10);
    if (format_ == "json")
      print_json(report, *from, *to, as_of, path);
    else
      print_text(report, *from, *to, as_of, path);
    const bool anything = !report.moved.empty() || !report.newly_posted.empty() || !report.newly_closed.empty() ||
                          !report.overdue.empty();
    return anything ? kExitFindings : kExitOk;
  }

 private:
  void print_text(const ledger::ChangeReport& report, const ledger::RunInfo& from, const ledger::RunInfo& to,
                  const std::string& as_of, const std::string& path) const {
    std::string out =
        fmt::format("changes from run {} ({}) to run {} ({}) in {}\n", from.id, from.started, to.id, to.started, path);
    out += fmt::format("\nrating factors that moved by more than {}: {}\n", threshold_,
                       report.moved.empty() ? "none" : std::to_string(report.moved.size()));
    if (!report.moved.empty()) {
      std::vector<std::vector<std::string>> table{{"  structure", "load model", "level", fmt::format("run {}", from.id),
                                                   fmt::format("run {}", to.id), "change"}};
      for (const ledger::RatingChange& c : report.moved)
        table.push_back({"  " + c.structure_id, c.load_model_id, c.level, optional_rating(c.before),
                         optional_rating(c.after), change_text(c)});
      out += text_table(table, {3, 4, 5});
    }
    out += "\nnewly posted: " + list_or_none(report.newly_posted) + "\n";
    out += "newly closed: " + list_or_none(report.newly_closed) + "\n";
    out += fmt::format("\noverdue as of {}: {}\n", as_of,
                       report.overdue.empty() ? "none" : std::to_string(report.overdue.size()));
    if (!report.overdue.empty()) {
      std::vector<std::vector<std::string>> table;
      for (const ledger::BridgeRecord& r : report.overdue)
        table.push_back({"  " + r.structure_id, overdue_text(r, as_of), r.name});
      out += text_table(table);
    }
    std::fwrite(out.data(), 1, out.size(), stdout);
  }

  void print_json(const ledger::ChangeReport& report, const ledger::RunInfo& from, const ledger::RunInfo& to,
                  const std::string& as_of, const std::string& path) const {
    using nlohmann::json;
    const auto number = [](const std::optional<double>& v) { return v ? json(*v) : json(nullptr); };
    json moved = json::array();
    for (const ledger::RatingChange& c : report.moved)
      moved.push_back({{"structure_id", c.structure_id},
                       {"load_model", c.load_model_id},
                       {"level", c.level},
                       {"before", number(c.before)},
                       {"after", number(c.after)},
                       {"change", c.before && c.after ? json(*c.after - *c.before) : json(nullptr)}});
    json overdue = json::array();
    for (const ledger::BridgeRecord& r : report.overdue)
      overdue.push_back({{"structure_id", r.structure_id},
                         {"name", r.name},
                         {"rerate_by", r.rerate_by ? json(*r.rerate_by) : json(nullptr)},
                         {"post_by", r.post_by ? json(*r.post_by) : json(nullptr)}});
    const json doc{{"ledger", path},
                   {"from", {{"run", from.id}, {"started", from.started}}},
                   {"to", {{"run", to.id}, {"started", to.started}}},
                   {"threshold", report.threshold},
                   {"as_of", as_of},
                   {"moved", std::move(moved)},
                   {"newly_posted", report.newly_posted},
                   {"newly_closed", report.newly_closed},
                   {"overdue", std::move(overdue)}};
    std::printf("%s\n", doc.dump(2).c_str());
  }

  std::vector<RunId> runs_;
  double threshold_ = 0.05;
  LedgerLocation location_;
  std::string format_ = "text";
};

}  // namespace

std::unique_ptr<Command> make_changes_command() { return std::make_unique<ChangesCommand>(); }

}  // namespace tenthpoint::cli
