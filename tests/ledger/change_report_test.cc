// compare_records and Ledger::changes: what moved between two runs.
//
// The rule under test is the changes command's definition (issue #6): rating
// factors that moved beyond a threshold, bridges that newly need posting or
// closure, ratings that are overdue. "Beyond" is read strictly: a move of
// exactly the threshold is not listed, because the threshold is the change an
// agency has said it can ignore (common practice for tolerance bands). The
// differences below are worked by hand in decimal.
#include <string>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/ledger/change_report.h"
#include "engine/ledger/ledger.h"
#include "tests/ledger/ledger_test_support.h"

namespace tenthpoint::ledger {
namespace {

using test::full_record;

BridgeRecord with_inventory_rf(const std::string& id, double rf) {
  BridgeRecord r = full_record(id, rf);
  r.governing.resize(1);  // HL-93 inventory only
  r.recommendation = "none";
  r.rerate_by = "2031-11-30";
  r.post_by.reset();
  return r;
}

}  // namespace

TEST_CASE("a move of exactly the threshold is not listed, whichever way binary rounding falls", "[ledger][changes]") {
  // In IEEE 754 binary64 with round-to-nearest, 0.85 - 0.80 = 0.04999999999999993
  // and 0.90 - 0.85 = 0.050000000000000044 (computed with Python's floats):
  // both are 0.05 in decimal, one lands each side, and neither is listed.
  CHECK(0.85 - 0.80 < 0.05);
  CHECK(0.90 - 0.85 > 0.05);
  const std::vector<BridgeRecord> before{with_inventory_rf("EV-0001", 0.85), with_inventory_rf("EV-0002", 0.90),
                                         with_inventory_rf("EV-0003", 0.85), with_inventory_rf("EV-0004", 1.00)};
  const std::vector<BridgeRecord> after{with_inventory_rf("EV-0001", 0.80), with_inventory_rf("EV-0002", 0.85),
                                        with_inventory_rf("EV-0003", 0.79), with_inventory_rf("EV-0004", 1.06)};
  const ChangeReport r = compare_records(before, after, 0.05, "2026-12-01");
  REQUIRE(r.moved.size() == 2);
  // 0.85 -> 0.79: |-0.06| > 0.05; 1.00 -> 1.06: |0.06| > 0.05 (by hand).
  CHECK(r.moved[0].structure_id == "EV-0003");
  CHECK(r.moved[0].before == std::optional<double>(0.85));
  CHECK(r.moved[0].after == std::optional<double>(0.79));
  CHECK(r.moved[1].structure_id == "EV-0004");
  CHECK(r.moved[1].load_model_id == "HL-93");
  CHECK(r.moved[1].level == "inventory");
}

TEST_CASE("a rating in one run only is listed as appeared or disappeared", "[ledger][changes]") {
  BridgeRecord failed = test::bare_record("EV-0002");
  const std::vector<BridgeRecord> before{with_inventory_rf("EV-0001", 0.85), with_inventory_rf("EV-0002", 0.90)};
  const std::vector<BridgeRecord> after{with_inventory_rf("EV-0001", 0.85), failed, with_inventory_rf("EV-0005", 1.10)};
  const ChangeReport r = compare_records(before, after, 0.05, "2026-12-01");
  REQUIRE(r.moved.size() == 2);
  CHECK(r.moved[0].structure_id == "EV-0002");
  CHECK(r.moved[0].before == std::optional<double>(0.90));
  CHECK_FALSE(r.moved[0].after.has_value());
  CHECK(r.moved[1].structure_id == "EV-0005");
  CHECK_FALSE(r.moved[1].before.has_value());
  CHECK(r.moved[1].after == std::optional<double>(1.10));
}

TEST_CASE("newly posted and newly closed follow the recommendation of the two runs", "[ledger][changes]") {
  auto rec = [](const std::string& id, const std::string& recommendation) {
    BridgeRecord r = with_inventory_rf(id, 0.9);
    r.recommendation = recommendation;
    return r;
  };
  const std::vector<BridgeRecord> before{rec("EV-0001", "none"), rec("EV-0002", "post"), rec("EV-0003", "post"),
                                         rec("EV-0004", "close"), rec("EV-0005", "none")};
  const std::vector<BridgeRecord> after{rec("EV-0001", "post"), rec("EV-0002", "post"), rec("EV-0003", "close"),
                                        rec("EV-0004", "post"), rec("EV-0005", "none"), rec("EV-0006", "post")};
  const ChangeReport r = compare_records(before, after, 0.05, "2026-12-01");
  // EV-0001 none -> post, EV-0004 close -> post, EV-0006 new and posted; EV-0002 stays posted.
  CHECK(r.newly_posted == std::vector<std::string>{"EV-0001", "EV-0004", "EV-0006"});
  CHECK(r.newly_closed == std::vector<std::string>{"EV-0003"});
}

TEST_CASE("a rating is overdue when its rerate or posting deadline is before the later run's date",
          "[ledger][changes]") {
  BridgeRecord on_time = with_inventory_rf("EV-0001", 0.9);
  on_time.rerate_by = "2026-12-01";  // due that very day: not yet overdue
  BridgeRecord late_rerate = with_inventory_rf("EV-0002", 0.9);
  late_rerate.rerate_by = "2026-11-30";
  BridgeRecord late_posting = with_inventory_rf("EV-0003", 0.9);
  late_posting.post_by = "2026-10-02";
  BridgeRecord no_deadline = test::bare_record("EV-0004");
  const ChangeReport r =
      compare_records({}, {on_time, late_rerate, late_posting, no_deadline}, 0.05, std::string("2026-12-01"));
  REQUIRE(r.overdue.size() == 2);
  CHECK(r.overdue[0].structure_id == "EV-0002");
  CHECK(r.overdue[1].structure_id == "EV-0003");
}

TEST_CASE("Ledger::changes compares two stored runs as of the later run's start date", "[ledger][changes]") {
  const auto dir = test::scratch_dir("changes");
  Ledger ledger = Ledger::open(dir / "ledger.sqlite");
  RunInfo info;
  info.started = "2026-11-30T02:00:00Z";
  const RunId r1 = ledger.begin_run(info);
  ledger.record_bridge(r1, with_inventory_rf("EV-0112", 0.95));
  BridgeRecord posted = with_inventory_rf("EV-0031", 0.70);
  ledger.record_bridge(r1, posted);
  info.started = "2026-12-01T02:00:00Z";
  const RunId r2 = ledger.begin_run(info);
  ledger.record_bridge(r2, with_inventory_rf("EV-0112", 0.61));
  posted.recommendation = "post";
  posted.post_by = "2026-11-15";
  ledger.record_bridge(r2, posted);

  const ChangeReport r = ledger.changes(r1, r2, 0.05);
  CHECK(r.from == r1);
  CHECK(r.to == r2);
  CHECK(r.threshold == 0.05);
  REQUIRE(r.moved.size() == 1);
  CHECK(r.moved[0].structure_id == "EV-0112");
  CHECK(r.newly_posted == std::vector<std::string>{"EV-0031"});
  REQUIRE(r.overdue.size() == 1);
  CHECK(r.overdue[0].structure_id == "EV-0031");
  CHECK_THROWS_WITH(ledger.changes(r1, 9, 0.05), Catch::Contains("no run 9"));
}

}  // namespace tenthpoint::ledger
