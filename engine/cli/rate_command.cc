// tenthpoint rate: the nightly run. Rates every bridge of an inventory (or
// of one shard of it) on worker threads, skips the bridges whose inputs have
// not changed since their last rating, writes <out>/<id>/results.json, keeps
// every result in the ledger and writes the run's summary files. With
// --bridge, rates one bridge now and tells what changed since its last
// rating. One bridge that cannot be rated never stops the others: it is
// recorded as failed with its reason and the exit code says so.
#include <unistd.h>

#include <CLI/CLI.hpp>
#include <algorithm>
#include <cmath>
#include <cstdio>
#include <ctime>
#include <filesystem>
#include <fstream>
#include <iterator>
#include <map>
#include <set>
#include <string>
#include <thread>
#include <vector>

#include <fmt/format.h>
#include <spdlog/sinks/basic_file_sink.h>
#include <spdlog/spdlog.h>
#include <nlohmann/json.hpp>

#include "engine/batch/batch_run.h"
#include "engine/batch/bridge_job.h"
#include "engine/batch/dependency_index.h"
#include "engine/batch/result_writer.h"
#include "engine/batch/shard.h"
#include "engine/batch/utc_timestamp.h"
#include "engine/cli/command.h"
#include "engine/cli/console.h"
#include "engine/cli/run_progress.h"
#include "engine/core/atomic_file.h"
#include "engine/core/version.h"
#include "engine/io/bridge_reader.h"
#include "engine/io/inventory_listing.h"
#include "engine/ledger/ledger.h"
#include "engine/report/record_headline.h"
#include "engine/report/run_summary.h"

namespace tenthpoint::cli {
namespace {

namespace fs = std::filesystem;
using units::Quantity;

CalendarDate today() {
  const std::time_t now = std::time(nullptr);
  std::tm utc{};
  ::gmtime_r(&now, &utc);
  return CalendarDate{utc.tm_year + 1900, utc.tm_mon + 1, utc.tm_mday};
}

Real tons(Real weight, units::UnitSystem system) { return units::from_internal(weight, Quantity::weight_tons, system); }

Quantity effect_quantity(rating::RatedEffect e) {
  return e == rating::RatedEffect::shear ? Quantity::force : Quantity::moment;
}

// The one-bridge document printed by `--bridge ID --format json`.
nlohmann::json to_json(const pipeline::BridgeRating& r, const model::Bridge& b) {
  using nlohmann::json;
  const units::UnitSystem u = b.units;
  json doc{{"structure_id", r.bridge_id},
           {"name", b.identity.name},
           {"method", std::string(model::to_string(r.method))},
           {"policy", {{"id", r.policy_id}, {"version", r.policy_version}, {"edition", r.edition}}},
           {"vehicle_set", r.vehicle_set},
           {"rating_date", r.rating_date.to_iso()},
           {"inspection_date", r.inspection_date ? json(r.inspection_date->to_iso()) : json(nullptr)},
           {"units",
            {{"length", std::string(units::label(Quantity::length, u))},
             {"moment", std::string(units::label(Quantity::moment, u))},
             {"force", std::string(units::label(Quantity::force, u))},
             {"weight", std::string(units::label(Quantity::weight_tons, u))}}},
           {"caution",
            "Results support, and never replace, the judgment of a "
            "licensed engineer; factors and vehicles follow the "
            "configured policy; local codes govern."}};
  json governing = json::array();
  for (const pipeline::GoverningRating& g : r.governing) {
    const rating::PointRating& p = g.at;
    const Quantity q = effect_quantity(p.effect);
    governing.push_back({{"load_model", g.load_model_id},
                         {"category", std::string(model::to_string(g.category))},
                         {"level", std::string(model::to_string(g.level))},
                         {"rating_factor", p.result.rating_factor},
                         {"rating_tons", g.rating_weight_rated ? json(tons(*g.rating_weight_rated, u)) : json(nullptr)},
                         {"girder", g.girder_id},
                         {"station", units::from_internal(p.station, Quantity::length, u)},
                         {"point", p.label},
                         {"effect", std::string(rating::to_string(p.effect))},
                         {"side", p.side},
                         {"limit_state", std::string(rating::to_string(p.limit_state))},
                         {"capacity", units::from_internal(p.result.capacity, q, u)},
                         {"permanent_factored", units::from_internal(p.result.permanent, q, u)},
                         {"live_factored", units::from_internal(p.result.live, q, u)},
                         {"capacity_factor", p.capacity_factor},
                         {"distribution_factor", p.distribution},
                         {"impact", p.impact},
                         {"gamma_ll", p.gamma_ll},
                         {"governing_case", p.case_id},
                         {"screened_out", g.screened_out},
                         {"screening_reason", g.screening_reason}});
  }
  doc["governing"] = std::move(governing);
  doc["screening"] = r.screening;
  json postings = json::array();
  for (const pipeline::VehiclePosting& p : r.postings)
    postings.push_back(
        {{"load_model", p.load_model_id},
         {"rating_factor", p.rating_factor},
         {"status", std::string(rating::to_string(p.decision.status))},
         {"posted_weight",
          p.decision.status == rating::PostingStatus::post ? json(tons(p.decision.posted_weight, u)) : json(nullptr)},
         {"reason", p.decision.reason}});
  doc["postings"] = std::move(postings);
  doc["recommendation"] = {{"status", std::string(rating::to_string(r.recommendation))},
                           {"reason", r.recommendation_reason}};
  doc["deadlines"] = {{"rerate_by", r.deadlines.rerate_by ? json(r.deadlines.rerate_by->to_iso()) : json(nullptr)},
                      {"post_by", r.deadlines.post_by ? json(r.deadlines.post_by->to_iso()) : json(nullptr)}};
  doc["warnings"] = r.warnings;
  return doc;
}

void print_summary(const pipeline::BridgeRating& r, const model::Bridge& b) {
  std::printf("%s  %s  (%s, policy %s %s)\n", r.bridge_id.c_str(), b.identity.name.c_str(),
              std::string(model::to_string(r.method)).c_str(), r.policy_id.c_str(), r.policy_version.c_str());
  for (const pipeline::GoverningRating& g : r.governing) {
    const std::string weight = g.rating_weight_rated ? fmt::format("{:7.1f} {}", tons(*g.rating_weight_rated, b.units),
                                                                   units::label(Quantity::weight_tons, b.units))
                                                     : std::string(9, ' ');
    std::printf("  %-10s %-9s RF %6.2f %s  %s, %s, %s%s\n", g.load_model_id.c_str(),
                std::string(model::to_string(g.level)).c_str(), g.at.result.rating_factor, weight.c_str(),
                g.girder_id.c_str(), g.at.label.c_str(), std::string(rating::to_string(g.at.effect)).c_str(),
                g.screened_out ? "  [screened out]" : "");
  }
  for (const std::string& s : r.screening) std::printf("  screening: %s\n", s.c_str());
  std::printf("  recommendation: %s (%s)\n", std::string(rating::to_string(r.recommendation)).c_str(),
              r.recommendation_reason.c_str());
  for (const pipeline::VehiclePosting& p : r.postings)
    if (p.decision.status != rating::PostingStatus::none)
      std::printf("    %s: %s\n", p.load_model_id.c_str(), p.decision.reason.c_str());
  if (r.deadlines.rerate_by) std::printf("  re-rate by %s\n", r.deadlines.rerate_by->to_iso().c_str());
  if (r.deadlines.post_by) std::printf("  post by %s\n", r.deadlines.post_by->to_iso().c_str());
}

// Rating factors that differ by less than half the last printed digit are
// the same to a reader (the summary prints two decimals).
constexpr double kPrintedRfResolution = 0.005;

// What changed between a bridge's previous record and this rating.
void print_changes(const ledger::BridgeRecord& now, const std::optional<ledger::BridgeRecord>& before,
                   const std::optional<ledger::RunInfo>& before_run) {
  if (!before) {
    std::printf("  changes: first rating of %s in this ledger\n", now.structure_id.c_str());
    return;
  }
  const std::string when = before_run ? fmt::format("run {} of {}", before_run->id, before_run->started) : "before";
  if (before->status == ledger::BridgeStatus::failed) {
    std::printf("  changes: the previous attempt (%s) failed: %s\n", when.c_str(), before->reason.c_str());
    return;
  }
  std::printf("  changes since the rating of %s (%s):\n", before->rating_date.c_str(), when.c_str());
  int changes = 0;
  if (before->inputs_hash == now.inputs_hash) std::printf("    inputs unchanged (same inputs hash)\n");
  std::map<std::pair<std::string, std::string>, double> old_rf;
  for (const ledger::GoverningRow& g : before->governing) old_rf[{g.load_model_id, g.level}] = g.rating_factor;
  for (const ledger::GoverningRow& g : now.governing) {
    const auto it = old_rf.find({g.load_model_id, g.level});
    if (it == old_rf.end()) {
      std::printf("    %-10s %-9s RF %6.2f (new)\n", g.load_model_id.c_str(), g.level.c_str(), g.rating_factor);
      ++changes;
      continue;
    }
    if (std::abs(g.rating_factor - it->second) >= kPrintedRfResolution) {
      std::printf("    %-10s %-9s RF %6.2f -> %6.2f (%+.2f)\n", g.load_model_id.c_str(), g.level.c_str(), it->second,
                  g.rating_factor, g.rating_factor - it->second);
      ++changes;
    }
    old_rf.erase(it);
  }
  for (const auto& [key, rf] : old_rf) {
    std::printf("    %-10s %-9s RF %6.2f (no longer rated)\n", key.first.c_str(), key.second.c_str(), rf);
    ++changes;
  }
  if (before->recommendation != now.recommendation) {
    std::printf("    recommendation: %s -> %s\n", before->recommendation.c_str(), now.recommendation.c_str());
    ++changes;
  }
  if (changes == 0)
    std::printf(
        "    no rating factor moved by %.3f or more; recommendation "
        "unchanged\n",
        kPrintedRfResolution);
}

void print_run_table(const std::vector<ledger::BridgeRecord>& records) {
  for (const ledger::BridgeRecord& r : records) {
    if (r.status == ledger::BridgeStatus::unchanged) continue;
    const std::string id = r.structure_id.empty() ? r.file : r.structure_id;
    if (r.status == ledger::BridgeStatus::failed) {
      std::printf("%-10s failed     %s\n", id.c_str(), r.reason.c_str());
      continue;
    }
    const auto rf = [](const ledger::GoverningRow* g) {
      return g == nullptr ? std::string("   -") : fmt::format("{:4.2f}", g->rating_factor);
    };
    const report::RecordHeadline headline = report::record_headline(r);
    const std::string legal =
        headline.legal ? fmt::format("{} ({})", rf(headline.legal), headline.legal->load_model_id) : rf(nullptr);
    std::printf("%-10s %-4s  design inv %s op %s  legal %-16s  %-5s  %s\n", id.c_str(), r.method.c_str(),
                rf(headline.inventory).c_str(), rf(headline.operating).c_str(), legal.c_str(), r.recommendation.c_str(),
                r.name.c_str());
  }
}

std::string slurp(const fs::path& path) {
  std::ifstream in(path, std::ios::binary);
  return std::string((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
}

// The run's log in the output directory, beside the stderr sink main()
// configured: info and up whatever --log-level says about the terminal.
void add_log_file(const fs::path& file) {
  auto logger = spdlog::default_logger();
  const spdlog::level::level_enum terminal_level = logger->level();
  auto sink = std::make_shared<spdlog::sinks::basic_file_sink_mt>(file.string());
  sink->set_pattern("%Y-%m-%dT%H:%M:%S.%e %l: %v");
  sink->set_level(std::min(terminal_level, spdlog::level::info));
  for (auto& existing : logger->sinks()) existing->set_level(terminal_level);
  logger->sinks().push_back(std::move(sink));
  logger->set_level(std::min(terminal_level, spdlog::level::info));
}

class RateCommand final : public Command {
 public:
  CLI::App* declare(CLI::App& app) override {
    CLI::App* sub = app.add_subcommand("rate",
                                       "Rate an inventory: changed bridges on worker threads, "
                                       "results, ledger and run summary");
    sub->add_option("inventory", paths_, "Inventory directories, list files or bridge files")->required();
    sub->add_option("--out", out_, "Output directory: <id>/results.json, ledger, summary, log")->capture_default_str();
    sub->add_option("--jobs", jobs_, "Worker threads (default: one per core)")
        ->check(CLI::Range(1, 1024))
        ->capture_default_str();
    sub->add_flag("--all", all_, "Rate every bridge, also those unchanged since their last rating");
    sub->add_option("--shard", shard_, "Rate shard K of N only (K from 0, as SLURM_ARRAY_TASK_ID)");
    sub->add_option("--batch", batch_,
                    "Label shared by the shard runs of one night (e.g. the array job id; default with --shard: "
                    "<date>-of-<N>)");
    sub->add_option("--ledger", ledger_, "Ledger file (default <out>/ledger.sqlite, per shard with --shard)");
    sub->add_option("--bridge", bridge_id_, "Rate only the bridge with this structure id, and say what changed");
    sub->add_option("--date", date_, "Rating date YYYY-MM-DD (default: today, UTC)");
    sub->add_option("--format", format_, "text or json")->check(CLI::IsMember({"text", "json"}))->capture_default_str();
    return sub;
  }

  int run() override {
    CalendarDate rating_date = today();
    if (!date_.empty()) {
      const auto parsed = parse_calendar_date(date_);
      if (!parsed) return usage(fmt::format("--date: '{}' is not a date; expected YYYY-MM-DD", date_));
      rating_date = *parsed;
    }
    std::optional<batch::Shard> shard;
    if (!shard_.empty()) {
      std::string why;
      shard = batch::parse_shard(shard_, why);
      if (!shard) return usage("--shard: " + why);
      if (!bridge_id_.empty())
        return usage(
            "--shard and --bridge cannot be combined: --bridge rates "
            "one bridge");
    }
    for (const std::string& path : paths_)
      if (std::error_code ec; !fs::exists(path, ec)) return usage(fmt::format("no such file or directory: {}", path));

    const io::InventoryListing listing = io::list_inventory(paths_);
    print_diagnostics(listing.diagnostics);
    std::vector<std::string> files = listing.files;
    if (shard) files = batch::select_shard(files, inventory_root(), *shard);

    const fs::path out(out_);
    fs::create_directories(out);
    add_log_file(out / (shard ? fmt::format("tenthpoint.{}.log", shard->file_suffix()) : "tenthpoint.log"));
    const fs::path ledger_path =
        !ledger_.empty() ? fs::path(ledger_)
                         : out / (shard ? fmt::format("ledger.{}.sqlite", shard->file_suffix()) : "ledger.sqlite");
    ledger::Ledger ledger = ledger::Ledger::open(ledger_path);

    ledger::RunInfo info;
    info.command = command_line();
    info.shard = shard ? shard->to_string() : "";
    info.batch = batch_;
    // Shard runs are joined by their batch label when merged; without one
    // each shard would stay a run of its own. The rating date and shard
    // count tie together the shards of one night's array by default.
    if (shard && info.batch.empty()) {
      info.batch = fmt::format("{}-of-{}", rating_date.to_iso(), shard->count);
      spdlog::info("--shard without --batch: batch label '{}'", info.batch);
    }
    const int status = bridge_id_.empty() ? rate_inventory(ledger, ledger_path, files, info, rating_date, shard)
                                          : rate_one(ledger, ledger_path, listing.files, info, rating_date);
    return status == kExitOk && has_errors(listing.diagnostics) ? kExitFindings : status;
  }

 private:
  static int usage(const std::string& message) {
    std::fprintf(stderr, "tenthpoint rate: %s\n", message.c_str());
    return kExitUsage;
  }

  // Shard keys are paths relative to the first inventory argument (its
  // directory for a list or bridge file), so they do not depend on where the
  // command runs from.
  fs::path inventory_root() const {
    const fs::path first(paths_.front());
    return fs::is_directory(first) ? first : first.parent_path();
  }

  std::string command_line() const {
    std::string text = "tenthpoint rate";
    for (const std::string& p : paths_) text += " " + p;
    text += " --out " + out_;
    if (all_) text += " --all";
    if (!shard_.empty()) text += " --shard " + shard_;
    if (!batch_.empty()) text += " --batch " + batch_;
    if (!bridge_id_.empty()) text += " --bridge " + bridge_id_;
    if (!date_.empty()) text += " --date " + date_;
    return text;
  }

  int rate_inventory(ledger::Ledger& ledger, const fs::path& ledger_path, const std::vector<std::string>& files,
                     ledger::RunInfo info, CalendarDate rating_date, const std::optional<batch::Shard>& shard) {
    batch::BatchOptions options;
    options.out_dir = out_;
    options.rating_date = rating_date;
    options.jobs = jobs_;
    options.all = all_;
    options.dependency_index = batch::DependencyIndex::path_for_ledger(ledger_path);
    RunProgress progress(RunProgressOptions{::isatty(STDERR_FILENO) == 1});
    batch::BatchProgress last;
    struct Tracker final : batch::BatchObserver {
      RunProgress& display;
      batch::BatchProgress& last;
      Tracker(RunProgress& d, batch::BatchProgress& l) : display(d), last(l) {}
      void started(const batch::BatchProgress& p) override {
        last = p;
        display.started(p);
      }
      void bridge_done(const ledger::BridgeRecord& r, const batch::BatchProgress& p) override {
        last = p;
        display.bridge_done(r, p);
      }
    } tracker(progress, last);
    const ledger::RunInfo done = batch::run_batch(ledger, std::move(info), files, options, &tracker);
    progress.finish(last);

    const std::vector<ledger::BridgeRecord> records = ledger.run_results(done.id);
    // A shard's summary carries its suffix, so that the tasks of an array
    // sharing one output directory do not overwrite each other's.
    const std::string stem = shard ? "summary." + shard->file_suffix() : "summary";
    const fs::path out_dir(out_);
    const std::string summary = report::summary_json(done, records).dump(1) + "\n";
    write_file_atomically(out_dir / (stem + ".csv"), report::summary_csv(records));
    write_file_atomically(out_dir / (stem + ".json"), summary);
    if (format_ == "json") {
      std::printf("%s", summary.c_str());
    } else {
      // A short table for an inventory a person reads; a national one is read
      // in summary.csv.
      constexpr std::size_t kTableRows = 200;
      if (static_cast<std::size_t>(done.rated + done.failed) <= kTableRows) print_run_table(records);
      std::printf(
          "run %lld: %d bridges: %d rated, %d unchanged, %d failed; "
          "results in %s, ledger %s\n",
          static_cast<long long>(done.id), done.rated + done.unchanged + done.failed, done.rated, done.unchanged,
          done.failed, out_.c_str(), ledger_path.string().c_str());
    }
    if (files.empty()) {
      std::fprintf(stderr, "tenthpoint: no bridge files found\n");
      return kExitFindings;
    }
    return done.failed == 0 ? kExitOk : kExitFindings;
  }

  // The listed file whose structure id is bridge_id_: the ledger's record of
  // files first, then any file whose bytes mention the id (parsed to be
  // sure); nullopt when none.
  std::optional<std::string> find_bridge(const ledger::Ledger& ledger, const std::vector<std::string>& files) const {
    std::vector<std::string> candidates;
    const std::set<std::string> listed(files.begin(), files.end());
    for (const auto& [file, inputs] : ledger.all_last_inputs())
      if (inputs.structure_id == bridge_id_ && listed.count(file) > 0) candidates.push_back(file);
    for (const std::string& file : files)
      if (slurp(file).find(bridge_id_) != std::string::npos) candidates.push_back(file);
    for (const std::string& file : candidates) {
      const io::BridgeReadResult read = io::read_bridge_file(file);
      if (read.bridge && read.bridge->identity.structure_id == bridge_id_) return file;
    }
    return std::nullopt;
  }

  int rate_one(ledger::Ledger& ledger, const fs::path& ledger_path, const std::vector<std::string>& files,
               ledger::RunInfo info, CalendarDate rating_date) {
    const std::optional<std::string> file = find_bridge(ledger, files);
    if (!file) {
      std::fprintf(stderr,
                   "tenthpoint: no bridge with structure id '%s' in the "
                   "inventory given\n",
                   bridge_id_.c_str());
      return kExitFindings;
    }
    info.started = batch::utc_timestamp();
    info.engine_version = kEngineVersion;
    info.id = ledger.begin_run(info);
    batch::InputsHasher hasher(kEngineVersion);
    batch::PolicyCache policies;
    const batch::JobContext context{&policies, &hasher, rating_date, info.id, info.started, true};
    batch::BridgeOutcome outcome = batch::run_bridge_job(batch::BridgeJob{*file, std::nullopt, true}, context);
    const fs::path index_path = batch::DependencyIndex::path_for_ledger(ledger_path);
    batch::DependencyIndex index = batch::DependencyIndex::load(index_path);
    batch::ResultWriter writer(ledger, info.id, out_, &index);
    const ledger::BridgeRecord record = writer.write(outcome);
    info.rated = record.status == ledger::BridgeStatus::rated ? 1 : 0;
    info.failed = record.status == ledger::BridgeStatus::failed ? 1 : 0;
    info.policy_versions = batch::policy_versions({record});
    info.finished = batch::utc_timestamp();
    ledger.finish_run(info.id, info);
    try {
      index.save(index_path);
    } catch (const std::exception& e) {
      spdlog::warn("{}", e.what());
    }

    if (record.status == ledger::BridgeStatus::failed) {
      std::fprintf(stderr, "%s: failed: %s\n", file->c_str(), record.reason.c_str());
      if (format_ == "json")
        std::printf("%s\n", nlohmann::json::array({{{"file", *file}, {"status", "failed"}, {"reason", record.reason}}})
                                .dump(1)
                                .c_str());
      return kExitFindings;
    }
    if (format_ == "json") {
      std::printf("%s\n", nlohmann::json::array({to_json(*outcome.rating, *outcome.bridge)}).dump(1).c_str());
      return kExitOk;
    }
    print_summary(*outcome.rating, *outcome.bridge);
    const std::optional<ledger::BridgeRecord> before = ledger.previous_record(bridge_id_, info.id);
    std::optional<ledger::RunInfo> before_run;
    if (before) {
      for (const ledger::HistoryEntry& h : ledger.history(bridge_id_))
        if (h.run < info.id) before_run = ledger.run(h.run);
    }
    print_changes(record, before, before_run);
    std::printf("1 bridge rated (run %lld); results in %s\n", static_cast<long long>(info.id),
                batch::results_path(out_, record.structure_id).string().c_str());
    return kExitOk;
  }

  std::vector<std::string> paths_;
  std::string out_ = "reports";
  int jobs_ = static_cast<int>(std::max(1u, std::thread::hardware_concurrency()));
  bool all_ = false;
  std::string shard_;
  std::string batch_;
  std::string ledger_;
  std::string bridge_id_;
  std::string date_;
  std::string format_ = "text";
};

}  // namespace

std::unique_ptr<Command> make_rate_command() { return std::make_unique<RateCommand>(); }

}  // namespace tenthpoint::cli
