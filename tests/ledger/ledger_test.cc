// The ledger file: creation, migration and refusal, round trips, history,
// carrying forward, the incremental check's queries and hostile ids.
//
// Expected behaviour comes from SQLite's documented semantics: a committed
// transaction is all-or-nothing (https://www.sqlite.org/atomiccommit.html),
// PRAGMA user_version and application_id are stored in the database header
// (https://www.sqlite.org/fileformat.html, offsets 60 and 68), REAL values are
// 8-byte IEEE floating point and round-trip exactly
// (https://www.sqlite.org/datatype3.html), and bound parameters are values,
// never SQL (https://www.sqlite.org/lang_expr.html#varparam).
#include <fstream>
#include <limits>
#include <string>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/ledger/ledger.h"
#include "tests/ledger/ledger_test_support.h"

namespace tenthpoint::ledger {
namespace {

using test::bare_record;
using test::full_record;
using test::RawDatabase;
using test::scratch_dir;

RunInfo run_info(const std::string& started, const std::string& batch = "", const std::string& shard = "") {
  RunInfo info;
  info.started = started;
  info.engine_version = "0.1.0";
  info.policy_versions = "eastvale-county 2026.1";
  info.command = "tenthpoint rate inventory/";
  info.batch = batch;
  info.shard = shard;
  return info;
}

std::string slurp(const std::filesystem::path& p) {
  std::ifstream in(p, std::ios::binary);
  return std::string(std::istreambuf_iterator<char>(in), {});
}

}  // namespace

TEST_CASE("a new ledger gets schema version 1 and the ledger application id", "[ledger]") {
  const auto dir = scratch_dir("create");
  const auto path = dir / "ledger.sqlite";
  { (void)Ledger::open(path); }
  RawDatabase raw(path);
  // Source: the values the schema writes, read back through SQLite's own PRAGMAs (fileformat.html).
  CHECK(raw.value("PRAGMA user_version") == "1");
  CHECK(raw.value("PRAGMA application_id") == std::to_string(0x54504C47));
  const auto tables = raw.rows("SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name");
  REQUIRE(tables.size() == 4);
  CHECK(tables[0][0] == "governing");
  CHECK(tables[1][0] == "postings");
  CHECK(tables[2][0] == "results");
  CHECK(tables[3][0] == "runs");
  CHECK(raw.value("PRAGMA journal_mode") == "wal");
}

TEST_CASE("a ledger in a directory that does not exist yet creates the directory", "[ledger]") {
  const auto dir = scratch_dir("mkdir");
  const auto path = dir / "reports" / "night" / "ledger.sqlite";
  Ledger ledger = Ledger::open(path);
  CHECK(std::filesystem::is_regular_file(path));
  CHECK(ledger.integrity_ok());
}

TEST_CASE("a reopened ledger keeps its runs and records and is not migrated again", "[ledger]") {
  const auto dir = scratch_dir("reopen");
  const auto path = dir / "ledger.sqlite";
  RunId run = 0;
  {
    Ledger ledger = Ledger::open(path);
    run = ledger.begin_run(run_info("2026-11-30T02:00:00Z"));
    ledger.record_bridge(run, full_record("EV-0112"));
  }
  Ledger again = Ledger::open(path);
  REQUIRE(again.runs().size() == 1);
  CHECK(again.run_results(run) == std::vector<BridgeRecord>{full_record("EV-0112")});
  CHECK(again.integrity_ok());
  RawDatabase raw(path);
  CHECK(raw.value("PRAGMA user_version") == "1");
}

TEST_CASE("a ledger written by a newer engine is refused with the file named and left as it was", "[ledger]") {
  const auto dir = scratch_dir("newer");
  const auto path = dir / "ledger.sqlite";
  { (void)Ledger::open(path); }
  {
    RawDatabase raw(path);
    raw.exec("PRAGMA user_version = 7");
  }
  try {
    (void)Ledger::open(path);
    FAIL("a newer ledger was opened");
  } catch (const LedgerError& e) {
    CHECK(e.file() == path);
    CHECK_THAT(e.what(), Catch::StartsWith(path.string() + ": "));
    CHECK_THAT(e.what(), Catch::Contains("newer engine"));
    CHECK_THAT(e.what(), Catch::Contains("version 7"));
  }
  RawDatabase raw(path);
  CHECK(raw.value("PRAGMA user_version") == "7");
}

TEST_CASE("a file that is not an SQLite database is refused with the file named and not overwritten", "[ledger]") {
  const auto dir = scratch_dir("notdb");
  const auto path = dir / "ledger.sqlite";
  const std::string content = "structure_id,rf\nEV-0112,0.87\n";
  {
    std::ofstream out(path);
    out << content;
  }
  try {
    (void)Ledger::open(path);
    FAIL("a text file was opened as a ledger");
  } catch (const LedgerError& e) {
    CHECK(e.file() == path);
    CHECK_THAT(e.what(), Catch::StartsWith(path.string() + ": "));
    CHECK_THAT(e.what(), Catch::Contains("not an SQLite database"));
  }
  CHECK(slurp(path) == content);
}

TEST_CASE("another application's SQLite database is refused and its journal mode is left alone", "[ledger]") {
  const auto dir = scratch_dir("otherapp");
  const auto path = dir / "other.sqlite";
  {
    sqlite3* db = nullptr;
    REQUIRE(sqlite3_open(path.c_str(), &db) == SQLITE_OK);
    REQUIRE(sqlite3_exec(db, "CREATE TABLE inspections(id TEXT); INSERT INTO inspections VALUES ('x')", nullptr,
                         nullptr, nullptr) == SQLITE_OK);
    sqlite3_close(db);
  }
  try {
    (void)Ledger::open(path);
    FAIL("another application's database was opened as a ledger");
  } catch (const LedgerError& e) {
    CHECK_THAT(e.what(), Catch::StartsWith(path.string() + ": "));
    CHECK_THAT(e.what(), Catch::Contains("not a tenthpoint ledger"));
  }
  RawDatabase raw(path);
  // Source: SQLite's default journal mode is DELETE (https://www.sqlite.org/pragma.html#pragma_journal_mode).
  CHECK(raw.value("PRAGMA journal_mode") == "delete");
  CHECK(raw.value("SELECT count(*) FROM inspections") == "1");
}

TEST_CASE("a record round-trips with every field, optional fields set and unset", "[ledger]") {
  const auto dir = scratch_dir("roundtrip");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  const RunId run = ledger.begin_run(run_info("2026-11-30T02:00:00Z"));
  const BridgeRecord full = full_record("EV-0112");
  const BridgeRecord bare = bare_record("EV-0031");
  BridgeRecord no_id = bare_record("");
  no_id.file = "inventory/unreadable.yaml";
  ledger.record_bridge(run, full);
  ledger.record_bridge(run, bare);
  ledger.record_bridge(run, no_id);

  const auto results = ledger.run_results(run);
  REQUIRE(results.size() == 3);
  // Ordered by structure id: "" < "EV-0031" < "EV-0112".
  CHECK(results[0] == no_id);
  CHECK(results[1] == bare);
  CHECK(results[2] == full);
  CHECK(results[2].governing[2].rating_weight == std::optional<double>(35.5));
  CHECK_FALSE(results[2].governing[0].rating_weight.has_value());
  CHECK_FALSE(results[1].inspection_date.has_value());
  CHECK_FALSE(results[1].rerate_by.has_value());
}

TEST_CASE("recording a bridge twice in one run keeps the second record only", "[ledger]") {
  const auto dir = scratch_dir("replace");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  const RunId run = ledger.begin_run(run_info("2026-11-30T02:00:00Z"));
  ledger.record_bridge(run, full_record("EV-0112", 0.87));
  ledger.record_bridge(run, full_record("EV-0112", 0.64));
  const auto results = ledger.run_results(run);
  REQUIRE(results.size() == 1);
  CHECK(results[0].governing[0].rating_factor == 0.64);
  RawDatabase raw(ledger.path());
  CHECK(raw.value("SELECT count(*) FROM governing") == "3");
}

TEST_CASE("a record with a NaN or infinite number is refused and nothing of it is stored", "[ledger]") {
  const auto dir = scratch_dir("nan");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  const RunId run = ledger.begin_run(run_info("2026-11-30T02:00:00Z"));
  BridgeRecord bad = full_record("EV-0112");
  bad.postings[1].posted_weight = std::numeric_limits<double>::infinity();
  CHECK_THROWS_WITH(ledger.record_bridge(run, bad),
                    Catch::Contains("EV-0112") && Catch::Contains("posting TYPE-3S2 posted_weight"));
  bad = full_record("EV-0112");
  bad.governing[0].rating_factor = std::numeric_limits<double>::quiet_NaN();
  CHECK_THROWS_WITH(ledger.record_bridge(run, bad), Catch::Contains("governing HL-93 inventory rating_factor"));
  CHECK(ledger.run_results(run).empty());
}

TEST_CASE("recording into a run that does not exist is refused", "[ledger]") {
  const auto dir = scratch_dir("norun");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  CHECK_THROWS_WITH(ledger.record_bridge(42, full_record("EV-0112")), Catch::Contains("no run 42"));
  CHECK_THROWS_WITH(ledger.finish_run(42, RunInfo{}), Catch::Contains("no run 42"));
}

TEST_CASE("runs keep their times and counts; a run that was never finished has no finish time", "[ledger]") {
  const auto dir = scratch_dir("runs");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  CHECK_FALSE(ledger.latest_run().has_value());
  const RunId first = ledger.begin_run(run_info("2026-11-29T02:00:00Z"));
  RunInfo done;
  done.finished = "2026-11-29T02:14:09Z";
  done.rated = 40;
  done.unchanged = 3;
  done.failed = 1;
  ledger.finish_run(first, done);
  const RunId killed = ledger.begin_run(run_info("2026-11-30T02:00:00Z", "job-881", "2/4"));

  const auto a = ledger.run(first);
  REQUIRE(a.has_value());
  CHECK(a->started == "2026-11-29T02:00:00Z");
  CHECK(a->finished == "2026-11-29T02:14:09Z");
  CHECK(a->rated == 40);
  CHECK(a->unchanged == 3);
  CHECK(a->failed == 1);
  CHECK(a->policy_versions == "eastvale-county 2026.1");
  const auto b = ledger.run(killed);
  REQUIRE(b.has_value());
  CHECK(b->finished.empty());
  CHECK(b->batch == "job-881");
  CHECK(b->shard == "2/4");
  CHECK(ledger.latest_run()->id == killed);
  CHECK(ledger.latest_finished_run()->id == first);
  CHECK_FALSE(ledger.run(99).has_value());
}

TEST_CASE("history lists every run that has a record of the bridge, oldest first", "[ledger]") {
  const auto dir = scratch_dir("history");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  const RunId r1 = ledger.begin_run(run_info("2026-11-28T02:00:00Z"));
  ledger.record_bridge(r1, full_record("EV-0112", 0.91));
  const RunId r2 = ledger.begin_run(run_info("2026-11-29T02:00:00Z"));
  ledger.record_bridge(r2, bare_record("EV-0112"));
  const RunId r3 = ledger.begin_run(run_info("2026-11-30T02:00:00Z"));
  ledger.record_bridge(r3, full_record("EV-0031"));  // another bridge only
  const RunId r4 = ledger.begin_run(run_info("2026-12-01T02:00:00Z"));
  ledger.record_bridge(r4, full_record("EV-0112", 0.78));

  const auto h = ledger.history("EV-0112");
  REQUIRE(h.size() == 3);
  CHECK(h[0].run == r1);
  CHECK(h[0].run_started == "2026-11-28T02:00:00Z");
  CHECK(h[0].record.governing[0].rating_factor == 0.91);
  CHECK(h[1].run == r2);
  CHECK(h[1].record.status == BridgeStatus::failed);
  CHECK(h[2].run == r4);
  CHECK(h[2].record.governing[0].rating_factor == 0.78);
  CHECK(ledger.history("EV-9999").empty());

  CHECK(ledger.previous_record("EV-0112", r4)->status == BridgeStatus::failed);
  CHECK(ledger.previous_record("EV-0112", r2)->governing[0].rating_factor == 0.91);
  CHECK(ledger.previous_record("EV-0112", std::nullopt)->governing[0].rating_factor == 0.78);
  CHECK_FALSE(ledger.previous_record("EV-0112", r1).has_value());
}

TEST_CASE("carry_forward copies the latest successful record with status unchanged and its source run", "[ledger]") {
  const auto dir = scratch_dir("carry");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  const RunId r1 = ledger.begin_run(run_info("2026-11-28T02:00:00Z"));
  ledger.record_bridge(r1, full_record("EV-0112", 0.91));
  ledger.record_bridge(r1, full_record("EV-0031", 1.20));
  const RunId r2 = ledger.begin_run(run_info("2026-11-29T02:00:00Z"));
  ledger.carry_forward(r2, {"EV-0112", "EV-0031"});
  ledger.record_bridge(r2, bare_record("EV-0031"));  // the later failure replaces the carried record
  const RunId r3 = ledger.begin_run(run_info("2026-11-30T02:00:00Z"));
  ledger.carry_forward(r3, {"EV-0112", "EV-0031"});

  const auto in2 = ledger.run_results(r2);
  REQUIRE(in2.size() == 2);
  CHECK(in2[0].status == BridgeStatus::failed);
  BridgeRecord expected = full_record("EV-0112", 0.91);
  expected.status = BridgeStatus::unchanged;
  expected.carried_from = r1;
  CHECK(in2[1] == expected);

  // Carried twice, it still names the run that computed it; EV-0031's last
  // success is run 1's rating, not run 2's failure.
  const auto in3 = ledger.run_results(r3);
  REQUIRE(in3.size() == 2);
  CHECK(in3[1] == expected);
  CHECK(in3[0].status == BridgeStatus::unchanged);
  CHECK(in3[0].carried_from == std::optional<RunId>(r1));
  CHECK(in3[0].governing[0].rating_factor == 1.20);

  RawDatabase raw(ledger.path());
  CHECK(raw.value(test::kPartialBridges) == "0");
  // Carried records share their source's rows rather than copying them; the
  // view shows them with every result that has them.
  CHECK(raw.value("SELECT count(*) FROM governing") == "6");
  CHECK(raw.value("SELECT count(*) FROM result_governing WHERE run = 3") == "6");
  CHECK(raw.value("SELECT count(*) FROM result_postings WHERE run = 3") == "4");
}

TEST_CASE("a record whose ratings a later run carries cannot be replaced", "[ledger]") {
  const auto dir = scratch_dir("carriedreplace");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  const RunId r1 = ledger.begin_run(run_info("2026-11-28T02:00:00Z"));
  ledger.record_bridge(r1, full_record("EV-0112", 0.91));
  const RunId r2 = ledger.begin_run(run_info("2026-11-29T02:00:00Z"));
  ledger.carry_forward(r2, {"EV-0112"});
  CHECK_THROWS_WITH(ledger.record_bridge(r1, full_record("EV-0112", 0.50)),
                    Catch::Contains("EV-0112") && Catch::Contains("run 2 carries"));
  CHECK(ledger.run_results(r2)[0].governing[0].rating_factor == 0.91);
  // Replacing the carried record itself is fine: a rerun rates it after all.
  ledger.record_bridge(r2, full_record("EV-0112", 0.50));
  CHECK(ledger.run_results(r2)[0].status == BridgeStatus::rated);
  CHECK(ledger.run_results(r1)[0].governing[0].rating_factor == 0.91);
}

TEST_CASE("carry_forward of a bridge never rated carries nothing at all", "[ledger]") {
  const auto dir = scratch_dir("carrymissing");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  const RunId r1 = ledger.begin_run(run_info("2026-11-28T02:00:00Z"));
  ledger.record_bridge(r1, full_record("EV-0112"));
  const RunId r2 = ledger.begin_run(run_info("2026-11-29T02:00:00Z"));
  CHECK_THROWS_WITH(ledger.carry_forward(r2, {"EV-0112", "EV-0404"}),
                    Catch::Contains("EV-0404") && Catch::Contains("no successful rating"));
  // One transaction (atomiccommit.html): EV-0112's copy was rolled back too.
  CHECK(ledger.run_results(r2).empty());
}

TEST_CASE("last inputs are those of each file's latest successful record", "[ledger]") {
  const auto dir = scratch_dir("inputs");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  const RunId r1 = ledger.begin_run(run_info("2026-11-28T02:00:00Z"));
  BridgeRecord a = full_record("EV-0112");
  a.inputs_hash = "hash-a1";
  ledger.record_bridge(r1, a);
  BridgeRecord b = full_record("EV-0031");
  b.inputs_hash = "hash-b1";
  ledger.record_bridge(r1, b);
  const RunId r2 = ledger.begin_run(run_info("2026-11-29T02:00:00Z"));
  a.inputs_hash = "hash-a2";
  ledger.record_bridge(r2, a);
  BridgeRecord b_failed = bare_record("EV-0031");
  b_failed.inputs_hash = "hash-b2";
  ledger.record_bridge(r2, b_failed);

  const auto all = ledger.all_last_inputs();
  REQUIRE(all.size() == 2);
  CHECK(all[0].first == "inventory/EV-0031.yaml");
  CHECK(all[0].second.structure_id == "EV-0031");
  CHECK(all[0].second.inputs_hash == "hash-b1");  // the failure does not count
  CHECK(all[1].first == "inventory/EV-0112.yaml");
  CHECK(all[1].second.inputs_hash == "hash-a2");
  CHECK(ledger.last_inputs("inventory/EV-0112.yaml")->inputs_hash == "hash-a2");
  CHECK(ledger.last_inputs("inventory/EV-0031.yaml")->inputs_hash == "hash-b1");
  CHECK_FALSE(ledger.last_inputs("inventory/EV-0404.yaml").has_value());
}

TEST_CASE("an SQL injection attempt in a structure id is stored verbatim and runs nothing", "[ledger]") {
  const auto dir = scratch_dir("injection");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  const std::string hostile = "x'); DROP TABLE runs;--";
  const std::string quoted = "EV-0112\" OR 1=1 --";
  const RunId run = ledger.begin_run(run_info("2026-11-30T02:00:00Z"));
  BridgeRecord r = full_record(hostile);
  r.name = "Robert'); DROP TABLE results;--";
  ledger.record_bridge(run, r);
  ledger.record_bridge(run, full_record(quoted));
  const RunId next = ledger.begin_run(run_info("2026-12-01T02:00:00Z"));
  ledger.carry_forward(next, {hostile});

  // Bound parameters are values, never SQL (lang_expr.html#varparam).
  RawDatabase raw(ledger.path());
  CHECK(raw.value("SELECT count(*) FROM runs") == "2");
  CHECK(raw.value("SELECT count(*) FROM sqlite_master WHERE type = 'table'") == "4");
  const auto h = ledger.history(hostile);
  REQUIRE(h.size() == 2);
  CHECK(h[0].record.structure_id == hostile);
  CHECK(h[0].record.name == "Robert'); DROP TABLE results;--");
  CHECK(ledger.history(quoted).size() == 1);
  CHECK(ledger.history("x").empty());
}

}  // namespace tenthpoint::ledger
