// The posting export: both views validate against schemas/export.schema.json,
// and the SNBI view follows the FHWA-HIF-22-017 coding rules as REFERENCE.md
// section 6 states them (rating factors 0 to 99.99 with two decimals, dates
// YYYYMMDD).
#include "engine/report/rating_export.h"

#include <catch2/catch.hpp>

#include "engine/pipeline/rating_summary.h"
#include "tests/report/report_test_support.h"

using namespace tenthpoint;
using nlohmann::json;

namespace {

ledger::RunInfo run_info() {
  ledger::RunInfo run;
  run.id = 5;
  run.started = "2026-12-01T02:00:00Z";
  run.engine_version = "0.1.0";
  return run;
}

std::vector<ledger::BridgeRecord> records() {
  std::vector<ledger::BridgeRecord> out;
  for (const char* name : {"ev-0042-grange-hall.yaml", "ev-0415-county-road-9.yaml"}) {
    const test::RatedDemo demo = test::rate_demo(name);
    ledger::BridgeRecord r = pipeline::summarize_rating(demo.bridge, demo.rating);
    r.inputs_hash = "beef";
    out.push_back(std::move(r));
  }
  ledger::BridgeRecord failed;
  failed.structure_id = "EV-9999";
  failed.status = ledger::BridgeStatus::failed;
  failed.reason = "no such file";
  out.push_back(failed);
  return out;
}

}  // namespace

TEST_CASE("SNBI rating factors have two decimals within 0.00 to 99.99 and dates are YYYYMMDD", "[report][export]") {
  // FHWA-HIF-22-017 coding rules as in REFERENCE.md section 6.
  CHECK(report::snbi_rating_factor(0.374) == "0.37");
  CHECK(report::snbi_rating_factor(123.4) == "99.99");
  CHECK(report::snbi_rating_factor(-0.2) == "0.00");
  CHECK(report::snbi_rating_factor(0.29) == "0.29");
  // Cut, not rounded, so a factor below 1 never reads as 1.00 (common practice).
  CHECK(report::snbi_rating_factor(0.996) == "0.99");
  CHECK(report::snbi_date("2026-12-01") == "20261201");
  CHECK(report::snbi_date("2026-1-01") == "");
}

TEST_CASE("the vehicles view has one row per bridge and rating vehicle and validates", "[report][export]") {
  const std::vector<ledger::BridgeRecord> r = records();
  const json doc = report::vehicles_json(run_info(), r);
  CHECK(test::schema_violations(doc, "export.schema.json") == "");
  CHECK(doc["rows"].size() == r[0].governing.size() + r[1].governing.size() + 1);
  const json& first = doc["rows"][0];
  CHECK(first["vehicle"]["load_model_id"] == r[0].governing[0].load_model_id);
  CHECK(first["vehicle"]["rating_factor"].get<double>() == r[0].governing[0].rating_factor);
  CHECK(doc["rows"].back()["vehicle"].is_null());
  CHECK(doc["units"]["station"] == "m");

  const std::string csv = report::vehicles_csv(run_info(), r);
  CHECK(csv.rfind("run_id,structure_id,name,bridge_status,", 0) == 0);
  CHECK(csv.find(",rating_unit,") != std::string::npos);
}

TEST_CASE("the SNBI view has one row per bridge with the load-rating and posting items", "[report][export]") {
  const std::vector<ledger::BridgeRecord> r = records();
  report::SnbiOptions options;
  options.posting_status_changed["EV-0042"] = "2025-06-30";
  const json doc = report::snbi_json(run_info(), r, options);
  CHECK(test::schema_violations(doc, "export.schema.json") == "");
  REQUIRE(doc["rows"].size() == 3);
  const json& row = doc["rows"][0];
  CHECK(row["B.LR.03"] == "20261201");
  CHECK(row["B.LR.04"] == "LFR");
  CHECK(row["B.PS.02"] == "20250630");
  // HS20 is EV-0042's design load (LFR); B.LR.05 is its inventory factor cut to two decimals.
  double inventory = 1e9;
  for (const ledger::GoverningRow& g : r[0].governing)
    if (g.level == "inventory" && (g.category == "design" || g.category == "lfr_design"))
      inventory = std::min(inventory, g.rating_factor);
  CHECK(row["B.LR.05"] == report::snbi_rating_factor(inventory));
  CHECK_FALSE(row["B.EP"].empty());
  CHECK(doc["rows"][2]["B.LR.05"] == "");

  const std::string csv = report::snbi_csv(run_info(), r, options);
  CHECK(csv.find("B.LR.01,B.LR.02,B.LR.03,B.LR.04,B.LR.05,B.LR.06,B.LR.07,B.LR.08,B.PS.01,B.PS.02") !=
        std::string::npos);
  CHECK(csv.find("B.EP.01_1,B.EP.02_1,B.EP.03_1,B.EP.04_1") != std::string::npos);
}
