// Ledger::merge: shard ledgers of one batch become one run, equal to the run
// that rated the whole inventory in one ledger. The merge is one transaction,
// so a refused merge leaves the target as it was
// (https://www.sqlite.org/atomiccommit.html).
#include <algorithm>
#include <string>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/ledger/ledger.h"
#include "tests/ledger/ledger_test_support.h"

namespace tenthpoint::ledger {
namespace {

using test::full_record;
using test::scratch_dir;

constexpr int kShards = 4;
constexpr int kBridges = 14;

std::string bridge_id(int i) { return "EV-" + std::to_string(1000 + i); }

BridgeRecord record_of(int i, int night) {
  if (i % 7 == 3) return test::bare_record(bridge_id(i));  // a failed bridge among them
  BridgeRecord r = full_record(bridge_id(i), 0.5 + 0.05 * i + 0.01 * night);
  r.inputs_hash = "hash-" + std::to_string(i) + "-" + std::to_string(night);
  return r;
}

RunInfo night_run(int night, int shard) {
  RunInfo info;
  info.started = "2026-11-2" + std::to_string(night) + "T02:0" + std::to_string(std::max(shard, 0)) + ":00Z";
  info.engine_version = "0.1.0";
  info.policy_versions = shard == 1 ? "eastvale-county 2026.1; eastvale-lfr 3" : "eastvale-county 2026.1";
  info.command = "tenthpoint rate inventory/";
  info.batch = "night-" + std::to_string(night);
  info.shard = shard < 0 ? "" : std::to_string(shard) + "/" + std::to_string(kShards);
  return info;
}

RunInfo finish_info(int night, int rated, int unchanged, int failed) {
  RunInfo info;
  info.finished = "2026-11-2" + std::to_string(night) + "T02:30:00Z";
  info.rated = rated;
  info.unchanged = unchanged;
  info.failed = failed;
  return info;
}

// Night 1 rates every bridge; night 2 rates the even ones again and carries
// the odd, successfully rated ones forward. `shard` < 0: the whole inventory.
void run_nights(Ledger& ledger, int shard) {
  for (int night = 1; night <= 2; ++night) {
    const RunId run = ledger.begin_run(night_run(night, shard));
    std::vector<std::string> carried;
    int rated = 0, unchanged = 0, failed = 0;
    for (int i = 0; i < kBridges; ++i) {
      if (shard >= 0 && i % kShards != shard) continue;
      const bool carry = night == 2 && i % 2 == 1 && i % 7 != 3;
      if (carry) {
        carried.push_back(bridge_id(i));
        ++unchanged;
        continue;
      }
      const BridgeRecord r = record_of(i, night);
      ledger.record_bridge(run, r);
      ++(r.status == BridgeStatus::failed ? failed : rated);
    }
    ledger.carry_forward(run, carried);
    ledger.finish_run(run, finish_info(night, rated, unchanged, failed));
  }
}

std::vector<std::filesystem::path> write_shards(const std::filesystem::path& dir) {
  std::vector<std::filesystem::path> paths;
  for (int k = 0; k < kShards; ++k) {
    paths.push_back(dir / ("shard-" + std::to_string(k) + ".sqlite"));
    Ledger shard = Ledger::open(paths.back());
    run_nights(shard, k);
  }
  return paths;
}

}  // namespace

TEST_CASE("four shard ledgers merged equal the same runs in one ledger", "[ledger][merge]") {
  const auto dir = scratch_dir("merge");
  Ledger whole = Ledger::open(dir / "whole.sqlite");
  run_nights(whole, -1);
  const auto shards = write_shards(dir);
  Ledger merged = Ledger::open(dir / "merged.sqlite");
  merged.merge(shards);

  const auto expected_runs = whole.runs();
  const auto merged_runs = merged.runs();
  REQUIRE(merged_runs.size() == 2);
  REQUIRE(expected_runs.size() == 2);
  for (std::size_t n = 0; n < 2; ++n) {
    INFO("night " << n + 1);
    const RunInfo& m = merged_runs[n];
    const RunInfo& w = expected_runs[n];
    CHECK(m.id == w.id);
    CHECK(m.batch == w.batch);
    CHECK(m.shard.empty());
    CHECK(m.rated == w.rated);
    CHECK(m.unchanged == w.unchanged);
    CHECK(m.failed == w.failed);
    CHECK(m.started == w.started);  // shard 0 started first, at :00
    CHECK(m.finished == w.finished);
    CHECK(m.policy_versions == "eastvale-county 2026.1; eastvale-lfr 3");
    // Every record equal, the carried ones naming the merged night-1 run.
    CHECK(merged.run_results(m.id) == whole.run_results(w.id));
  }
  CHECK(merged.run_results(2).size() == kBridges);
  CHECK(merged.history(bridge_id(1)).size() == 2);
  CHECK(merged.integrity_ok());
}

TEST_CASE("a bridge in two shards of one batch refuses the merge and leaves the ledger as it was", "[ledger][merge]") {
  const auto dir = scratch_dir("mergedup");
  std::vector<std::filesystem::path> shards{dir / "a.sqlite", dir / "b.sqlite"};
  for (int k = 0; k < 2; ++k) {
    Ledger shard = Ledger::open(shards[static_cast<std::size_t>(k)]);
    const RunId run = shard.begin_run(night_run(1, k));
    shard.record_bridge(run, full_record("EV-0112"));
    shard.record_bridge(run, full_record(bridge_id(k)));
  }
  Ledger merged = Ledger::open(dir / "merged.sqlite");
  try {
    merged.merge(shards);
    FAIL("a duplicate bridge was merged");
  } catch (const LedgerError& e) {
    CHECK_THAT(e.what(), Catch::Contains("EV-0112") && Catch::Contains("a.sqlite") && Catch::Contains("b.sqlite"));
  }
  CHECK(merged.runs().empty());

  // The same shard merged twice is the same kind of duplicate.
  merged.merge({shards[0]});
  CHECK_THROWS_WITH(merged.merge({shards[0]}), Catch::Contains("already in"));
  REQUIRE(merged.runs().size() == 1);
  CHECK(merged.run_results(merged.runs()[0].id).size() == 2);
  // A later shard of the batch joins the run merged before.
  {
    Ledger late = Ledger::open(dir / "c.sqlite");
    const RunId run = late.begin_run(night_run(1, 2));
    late.record_bridge(run, full_record(bridge_id(2)));
  }
  merged.merge({dir / "c.sqlite"});
  REQUIRE(merged.runs().size() == 1);
  CHECK(merged.run_results(merged.runs()[0].id).size() == 3);
}

TEST_CASE("a batch with an unfinished shard merges into an unfinished run", "[ledger][merge]") {
  const auto dir = scratch_dir("mergekilled");
  std::vector<std::filesystem::path> shards{dir / "a.sqlite", dir / "b.sqlite"};
  for (int k = 0; k < 2; ++k) {
    Ledger shard = Ledger::open(shards[static_cast<std::size_t>(k)]);
    const RunId run = shard.begin_run(night_run(1, k));
    shard.record_bridge(run, full_record(bridge_id(k)));
    if (k == 0) shard.finish_run(run, finish_info(1, 1, 0, 0));
  }
  Ledger merged = Ledger::open(dir / "merged.sqlite");
  merged.merge(shards);
  REQUIRE(merged.runs().size() == 1);
  CHECK(merged.runs()[0].finished.empty());
  CHECK(merged.run_results(merged.runs()[0].id).size() == 2);
}

TEST_CASE("a shard file that does not exist is named and not created", "[ledger][merge]") {
  const auto dir = scratch_dir("mergemissing");
  Ledger merged = Ledger::open(dir / "merged.sqlite");
  const auto missing = dir / "shard-9.sqlite";
  CHECK_THROWS_WITH(merged.merge({missing}), Catch::StartsWith(missing.string()) && Catch::Contains("no such"));
  CHECK_FALSE(std::filesystem::exists(missing));
  CHECK_THROWS_WITH(merged.merge({dir / "merged.sqlite"}), Catch::Contains("being merged into"));
}

}  // namespace tenthpoint::ledger
