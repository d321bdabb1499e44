// The run summary: summary.json validates against schemas/summary.schema.json,
// summary.csv quotes per RFC 4180, and the headline values are the records'.
#include "engine/report/run_summary.h"

#include <filesystem>

#include <catch2/catch.hpp>

#include "engine/pipeline/rating_summary.h"
#include "tests/report/report_test_support.h"

using namespace tenthpoint;
using nlohmann::json;

namespace {

ledger::RunInfo run_info() {
  ledger::RunInfo run;
  run.id = 3;
  run.started = "2026-12-01T02:00:00Z";
  run.finished = "2026-12-01T02:04:00Z";
  run.engine_version = "0.1.0";
  run.policy_versions = "eastvale 2026.1";
  run.command = "tenthpoint rate inventory";
  run.rated = 2;
  run.failed = 1;
  return run;
}

std::vector<ledger::BridgeRecord> records() {
  std::vector<ledger::BridgeRecord> out;
  for (const char* name : {"ev-0207-quarry-hill.yaml", "ev-0348-cedar-mill.yaml"}) {
    const test::RatedDemo demo = test::rate_demo(name);
    ledger::BridgeRecord r = pipeline::summarize_rating(demo.bridge, demo.rating);
    r.file = test::demo_file(name);
    r.inputs_hash = "00ff";
    out.push_back(std::move(r));
  }
  // A name with a comma and a quote, as an agency might type it.
  out.front().name = "Quarry Hill \"Old\" Bridge, east";
  ledger::BridgeRecord failed;
  failed.structure_id = "EV-9999";
  failed.file = "inventory/ev-9999.yaml";
  failed.status = ledger::BridgeStatus::failed;
  failed.reason = "inventory/ev-9999.yaml:12: geometry.spans[0]: must be positive (got -80)";
  out.push_back(failed);
  return out;
}

std::vector<std::string> lines(const std::string& text) {
  std::vector<std::string> out;
  std::size_t start = 0;
  for (std::size_t at = text.find("\r\n"); at != std::string::npos; at = text.find("\r\n", start)) {
    out.push_back(text.substr(start, at - start));
    start = at + 2;
  }
  return out;
}

}  // namespace

TEST_CASE("summary.json validates against its schema and keeps every bridge", "[report][summary]") {
  const std::vector<ledger::BridgeRecord> r = records();
  const json doc = report::summary_json(run_info(), r);
  CHECK(test::schema_violations(doc, "summary.schema.json") == "");
  REQUIRE(doc["bridges"].size() == 3);
  CHECK(doc["bridges"][2]["status"] == "failed");
  CHECK(doc["bridges"][2]["inventory"].is_null());
  // The headline inventory RF is the smallest design-load inventory RF of the record.
  double smallest = 1e9;
  for (const ledger::GoverningRow& g : r[0].governing)
    if (g.level == "inventory" && g.category == "design") smallest = std::min(smallest, g.rating_factor);
  CHECK(doc["bridges"][0]["inventory"]["rating_factor"].get<double>() == smallest);
}

TEST_CASE("summary.csv quotes a name with a comma and a quote and names units in its header", "[report][summary]") {
  const std::string csv = report::summary_csv(records());
  const std::vector<std::string> rows = lines(csv);
  REQUIRE(rows.size() == 4);  // header and three bridges
  // RFC 4180 section 2, rules 6 and 7: quoted, inner quotes doubled.
  CHECK(rows[1].find(",\"Quarry Hill \"\"Old\"\" Bridge, east\",") != std::string::npos);
  // A US bridge's postings in tons, an SI bridge's in tonnes (MBE 6A.8.3 postings; units.h).
  CHECK(rows[0].find("posting_TYPE-3_status") != std::string::npos);
  CHECK(rows[0].find("posting_TYPE-3_ton") != std::string::npos);
  CHECK(rows[0].find("posting_TYPE-3_tonne") != std::string::npos);
  CHECK(rows[3].rfind("EV-9999,,failed,", 0) == 0);
}

TEST_CASE("write_run_summary writes both files whole", "[report][summary]") {
  const std::filesystem::path dir = std::filesystem::temp_directory_path() / "tenthpoint_summary_test";
  std::filesystem::remove_all(dir);
  report::write_run_summary(dir, run_info(), records());
  const json doc = json::parse(test::read_text(dir / "summary.json"));
  CHECK(doc["run"]["id"] == 3);
  CHECK(test::read_text(dir / "summary.csv") == report::summary_csv(records()));
  std::filesystem::remove_all(dir);
}
