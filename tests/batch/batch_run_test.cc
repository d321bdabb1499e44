// The nightly run end to end over a copy of the demo inventory: ledger,
// results files, incremental reruns, failures, shards. The run semantics
// (what is rated, carried forward or failed) are those of issue #6: common
// practice for incremental batch systems; the expected values come from the
// runs themselves compared with each other, never from stored numbers.
#include "engine/batch/batch_run.h"

#include <unistd.h>

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <map>
#include <sstream>
#include <string>
#include <vector>

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include "engine/batch/dependency_index.h"
#include "engine/batch/shard.h"
#include "engine/io/inventory_listing.h"
#include "engine/ledger/ledger.h"
#include "tests/report/report_test_support.h"

namespace fs = std::filesystem;
namespace batch = tenthpoint::batch;
namespace ledger = tenthpoint::ledger;

namespace {

std::string slurp(const fs::path& p) {
  std::ifstream in(p, std::ios::binary);
  std::stringstream ss;
  ss << in.rdbuf();
  return ss.str();
}

void replace_in_file(const fs::path& p, const std::string& from, const std::string& to) {
  std::string text = slurp(p);
  const std::size_t at = text.find(from);
  REQUIRE(at != std::string::npos);
  text.replace(at, from.size(), to);
  std::ofstream(p, std::ios::binary) << text;
}

// A scratch copy of the demo inventory and an output directory.
struct Scratch {
  fs::path root;
  fs::path inventory;
  fs::path out;

  explicit Scratch(const std::string& name) {
    root = fs::temp_directory_path() / ("tp-batch-" + name + "-" + std::to_string(::getpid()));
    fs::remove_all(root);
    inventory = root / "inventory";
    out = root / "out";
    fs::create_directories(root);
    fs::copy("inventory", inventory, fs::copy_options::recursive);
  }
  ~Scratch() { fs::remove_all(root); }

  [[nodiscard]] std::vector<std::string> files() const {
    return tenthpoint::io::list_inventory({inventory.string()}).files;
  }

  ledger::RunInfo run(ledger::Ledger& l, const std::vector<std::string>& which, bool all = false,
                      const fs::path& ledger_path = {}, const std::string& shard = "",
                      const std::string& batch_label = "") const {
    batch::BatchOptions options;
    options.out_dir = out;
    options.rating_date = tenthpoint::CalendarDate{2026, 12, 1};
    options.jobs = 2;
    options.all = all;
    options.dependency_index =
        batch::DependencyIndex::path_for_ledger(ledger_path.empty() ? out / "ledger.sqlite" : ledger_path);
    ledger::RunInfo info;
    info.command = "test";
    info.shard = shard;
    info.batch = batch_label;
    return batch::run_batch(l, info, which, options);
  }
};

std::map<std::string, double> governing_rfs(const std::vector<ledger::BridgeRecord>& records) {
  std::map<std::string, double> out;
  for (const ledger::BridgeRecord& r : records)
    for (const ledger::GoverningRow& g : r.governing)
      out[r.structure_id + " " + g.load_model_id + " " + g.level] = g.rating_factor;
  return out;
}

int count_status(const std::vector<ledger::BridgeRecord>& records, ledger::BridgeStatus status) {
  return static_cast<int>(
      std::count_if(records.begin(), records.end(), [&](const ledger::BridgeRecord& r) { return r.status == status; }));
}

}  // namespace

TEST_CASE("a full run rates every demo bridge into the ledger and writes a valid results.json for each",
          "[batch][run]") {
  const Scratch s("full");
  const std::vector<std::string> files = s.files();
  REQUIRE(files.size() == 14);
  fs::create_directories(s.out);
  ledger::Ledger l = ledger::Ledger::open(s.out / "ledger.sqlite");
  const ledger::RunInfo run = s.run(l, files);
  CHECK(run.rated == 14);
  CHECK(run.failed == 0);
  CHECK(run.unchanged == 0);
  CHECK_FALSE(run.finished.empty());
  CHECK_THAT(run.policy_versions, Catch::Contains("eastvale-county 2025.1"));

  const std::vector<ledger::BridgeRecord> records = l.run_results(run.id);
  REQUIRE(records.size() == 14);
  for (const ledger::BridgeRecord& r : records) {
    INFO(r.structure_id << " " << r.reason);
    CHECK(r.status == ledger::BridgeStatus::rated);
    CHECK(r.inputs_hash.size() == 64);
    CHECK_FALSE(r.governing.empty());
    const fs::path results = s.out / r.structure_id / "results.json";
    REQUIRE(fs::exists(results));
    const std::string text = slurp(results);
    // Written compact, on one line (no indentation), with a final newline.
    CHECK(text.find('\n') == text.size() - 1);
    const nlohmann::json document = nlohmann::json::parse(text);
    CHECK(tenthpoint::test::schema_violations(document, "results.schema.json") == "");
    CHECK(document.dump().find(r.inputs_hash) != std::string::npos);
  }
  CHECK(l.integrity_ok());
}

TEST_CASE("a rerun with nothing changed recomputes nothing, and --all recomputes everything", "[batch][run]") {
  const Scratch s("rerun");
  const std::vector<std::string> files = s.files();
  fs::create_directories(s.out);
  ledger::Ledger l = ledger::Ledger::open(s.out / "ledger.sqlite");
  const ledger::RunInfo first = s.run(l, files);
  const auto results_time = fs::last_write_time(s.out / "EV-0112" / "results.json");

  const ledger::RunInfo second = s.run(l, files);
  CHECK(second.rated == 0);
  CHECK(second.unchanged == 14);
  CHECK(second.failed == 0);
  CHECK(fs::last_write_time(s.out / "EV-0112" / "results.json") == results_time);
  const auto carried = l.run_results(second.id);
  CHECK(count_status(carried, ledger::BridgeStatus::unchanged) == 14);
  CHECK(governing_rfs(carried) == governing_rfs(l.run_results(first.id)));

  // Without the dependency index every bridge is parsed to find its policy,
  // and still none is rated again.
  fs::remove(batch::DependencyIndex::path_for_ledger(s.out / "ledger.sqlite"));
  const ledger::RunInfo third = s.run(l, files);
  CHECK(third.rated == 0);
  CHECK(third.unchanged == 14);

  const ledger::RunInfo forced = s.run(l, files, /*all=*/true);
  CHECK(forced.rated == 14);
  CHECK(forced.unchanged == 0);
  CHECK(governing_rfs(l.run_results(forced.id)) == governing_rfs(l.run_results(first.id)));
}

TEST_CASE("editing one bridge's inspection reruns that bridge only, and its history shows both ratings",
          "[batch][run]") {
  const Scratch s("edit");
  const std::vector<std::string> files = s.files();
  fs::create_directories(s.out);
  ledger::Ledger l = ledger::Ledger::open(s.out / "ledger.sqlite");
  const ledger::RunInfo first = s.run(l, files);
  REQUIRE(first.rated == 14);

  // Superstructure condition 6 -> 4: the shipped policy's condition factor
  // table (MBE Table 6A.4.2.3-1) lowers phi_c from 1.00 to 0.85, so the
  // strength rating factors of the bridge drop.
  replace_in_file(s.inventory / "ev-0112-willow-run.yaml", "    superstructure: 6\n", "    superstructure: 4\n");
  const ledger::RunInfo second = s.run(l, files);
  CHECK(second.rated == 1);
  CHECK(second.unchanged == 13);
  const auto records = l.run_results(second.id);
  for (const ledger::BridgeRecord& r : records)
    CHECK(r.status == (r.structure_id == "EV-0112" ? ledger::BridgeStatus::rated : ledger::BridgeStatus::unchanged));

  std::vector<ledger::HistoryEntry> rated;
  for (const ledger::HistoryEntry& h : l.history("EV-0112"))
    if (h.record.status == ledger::BridgeStatus::rated) rated.push_back(h);
  REQUIRE(rated.size() == 2);
  CHECK(rated[0].run == first.id);
  CHECK(rated[1].run == second.id);
  CHECK(rated[0].record.inputs_hash != rated[1].record.inputs_hash);
  const auto before = governing_rfs({rated[0].record});
  const auto after = governing_rfs({rated[1].record});
  const std::string key = "EV-0112 HL93 inventory";
  REQUIRE(before.count(key) == 1);
  REQUIRE(after.count(key) == 1);
  CHECK(after.at(key) < before.at(key));
}

TEST_CASE("changing the agency policy reruns exactly the bridges that use it", "[batch][run]") {
  const Scratch s("policy");
  const std::vector<std::string> files = s.files();
  fs::create_directories(s.out);
  ledger::Ledger l = ledger::Ledger::open(s.out / "ledger.sqlite");
  (void)s.run(l, files);
  std::ofstream(s.inventory / "policies" / "eastvale.yaml", std::ios::app) << "# reviewed 2026\n";
  const ledger::RunInfo second = s.run(l, files);
  // Five demo bridges name policies/eastvale.yaml; the others use the shipped default.
  CHECK(second.rated == 5);
  CHECK(second.unchanged == 9);
}

TEST_CASE("a bridge file with a fatal error ends as failed with its reason while the others are rated",
          "[batch][run]") {
  const Scratch s("failed");
  replace_in_file(s.inventory / "ev-0031-pasture-lane.yaml", "format_version: 1\n", "format_version: 1\nbogus: 3\n");
  const std::vector<std::string> files = s.files();
  fs::create_directories(s.out);
  ledger::Ledger l = ledger::Ledger::open(s.out / "ledger.sqlite");
  const ledger::RunInfo run = s.run(l, files);
  CHECK(run.rated == 13);
  CHECK(run.failed == 1);
  for (const ledger::BridgeRecord& r : l.run_results(run.id)) {
    if (r.status != ledger::BridgeStatus::failed) continue;
    CHECK(r.file == (s.inventory / "ev-0031-pasture-lane.yaml").string());
    // "file:line: field: message" (the reader's diagnostic, issue #6).
    CHECK_THAT(r.reason, Catch::StartsWith(r.file + ":"));
    CHECK_THAT(r.reason, Catch::Contains("bogus"));
    CHECK(r.governing.empty());
  }
  // A failed bridge is tried again the next night.
  const ledger::RunInfo again = s.run(l, files);
  CHECK(again.failed == 1);
  CHECK(again.unchanged == 13);
}

TEST_CASE("four shards merged equal one unsharded run", "[batch][run][shard]") {
  const Scratch s("shards");
  const std::vector<std::string> files = s.files();
  fs::create_directories(s.out);
  ledger::Ledger whole = ledger::Ledger::open(s.out / "ledger.sqlite");
  const ledger::RunInfo one = s.run(whole, files);

  std::vector<fs::path> shard_ledgers;
  std::size_t total = 0;
  for (int k = 0; k < 4; ++k) {
    const batch::Shard shard{k, 4};
    const fs::path path = s.out / ("ledger." + shard.file_suffix() + ".sqlite");
    ledger::Ledger part = ledger::Ledger::open(path);
    const std::vector<std::string> mine = batch::select_shard(files, s.inventory, shard);
    total += mine.size();
    (void)s.run(part, mine, /*all=*/false, path, shard.to_string(), "night-1");
    shard_ledgers.push_back(path);
  }
  CHECK(total == files.size());

  const fs::path merged_path = s.out / "merged.sqlite";
  {
    ledger::Ledger merged = ledger::Ledger::open(merged_path);
    merged.merge(shard_ledgers);
  }
  ledger::Ledger merged = ledger::Ledger::open(merged_path);
  const auto run = merged.latest_run();
  REQUIRE(run);
  CHECK(run->batch == "night-1");
  CHECK(run->shard.empty());
  CHECK(run->rated == one.rated);
  const auto merged_records = merged.run_results(run->id);
  const auto whole_records = whole.run_results(one.id);
  CHECK(merged_records.size() == whole_records.size());
  CHECK(governing_rfs(merged_records) == governing_rfs(whole_records));
}
