// tenthpoint merge: combine the ledgers of a sharded run (one per node or
// Slurm array task) into one ledger, and write the merged run's summary
// files beside it. The shard runs of one night share a --batch label and
// become one run of the merged ledger (engine/ledger/ledger.h, merge).
#include <CLI/CLI.hpp>
#include <cstdio>
#include <filesystem>
#include <string>
#include <vector>

#include <fmt/format.h>

#include "engine/cli/command.h"
#include "engine/ledger/ledger.h"
#include "engine/report/run_summary.h"

namespace tenthpoint::cli {
namespace {

namespace fs = std::filesystem;

class MergeCommand final : public Command {
 public:
  CLI::App* declare(CLI::App& app) override {
    CLI::App* sub = app.add_subcommand("merge", "Merge shard ledgers into one ledger and write its run summary");
    sub->add_option("shards", shards_, "Shard ledger files (ledger.shard-K-of-N.sqlite)")->required();
    auto* into = sub->add_option("--into", into_, "The merged ledger file (created when absent)");
    auto* out = sub->add_option("--out", out_, "Or: an output directory; the merged ledger is <out>/ledger.sqlite");
    into->excludes(out);
    return sub;
  }

  int run() override {
    if (into_.empty() && out_.empty()) return usage("give --into FILE or --out DIR for the merged ledger");
    for (const std::string& shard : shards_)
      if (std::error_code ec; !fs::is_regular_file(shard, ec)) return usage(fmt::format("no such ledger: {}", shard));
    const fs::path target = !into_.empty() ? fs::path(into_) : fs::path(out_) / "ledger.sqlite";
    for (const std::string& shard : shards_)
      if (std::error_code ec; fs::equivalent(shard, target, ec))
        return usage(fmt::format("{} is both a shard and the merged ledger", shard));
    if (target.has_parent_path()) fs::create_directories(target.parent_path());

    ledger::Ledger ledger = ledger::Ledger::open(target);
    std::vector<fs::path> paths(shards_.begin(), shards_.end());
    ledger.merge(paths);
    const std::optional<ledger::RunInfo> run = ledger.latest_run();
    if (!run) {
      std::printf("merged %zu shard ledgers into %s: no runs\n", shards_.size(), target.string().c_str());
      return kExitOk;
    }
    const std::vector<ledger::BridgeRecord> records = ledger.run_results(run->id);
    const fs::path dir = target.has_parent_path() ? target.parent_path() : fs::path(".");
    report::write_run_summary(dir, *run, records);
    std::printf("merged %zu shard ledgers into %s: run %lld%s, %zu bridges (%d rated, %d unchanged, %d failed)%s\n",
                shards_.size(), target.string().c_str(), static_cast<long long>(run->id),
                run->batch.empty() ? "" : fmt::format(" (batch {})", run->batch).c_str(), records.size(), run->rated,
                run->unchanged, run->failed, run->finished.empty() ? "; a shard's run did not finish" : "");
    std::printf("wrote %s and %s\n", (dir / "summary.csv").string().c_str(), (dir / "summary.json").string().c_str());
    return run->failed == 0 && !run->finished.empty() ? kExitOk : kExitFindings;
  }

 private:
  static int usage(const std::string& message) {
    std::fprintf(stderr, "tenthpoint merge: %s\n", message.c_str());
    return kExitUsage;
  }

  std::vector<std::string> shards_;
  std::string into_;
  std::string out_;
};

}  // namespace

std::unique_ptr<Command> make_merge_command() { return std::make_unique<MergeCommand>(); }

}  // namespace tenthpoint::cli
