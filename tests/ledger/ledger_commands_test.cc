// tenthpoint history and tenthpoint changes as a user meets them: a ledger
// written through the library, then the real binary run over it. Expected
// values are the records written here and their differences by hand; exit
// codes are those of engine/cli/command.h (0 ok, 1 findings, 2 usage).
#include <sys/wait.h>

#include <array>
#include <cstdio>
#include <string>

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include "engine/ledger/ledger.h"
#include "tests/ledger/ledger_test_support.h"

namespace tenthpoint::ledger {
namespace {

struct Run {
  int exit_code = -1;
  std::string output;  // stdout
  std::string errors;  // stderr
};

Run run(const std::string& args, const std::filesystem::path& dir) {
  const auto err = dir / "stderr.txt";
  const std::string command = std::string(TENTHPOINT_BINARY_DIR) + "/tenthpoint " + args + " 2>" + err.string();
  Run result;
  FILE* pipe = ::popen(command.c_str(), "r");
  REQUIRE(pipe != nullptr);
  std::array<char, 4096> buffer{};
  std::size_t n = 0;
  while ((n = std::fread(buffer.data(), 1, buffer.size(), pipe)) > 0) result.output.append(buffer.data(), n);
  const int status = ::pclose(pipe);
  result.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
  FILE* in = std::fopen(err.c_str(), "r");
  if (in != nullptr) {
    while ((n = std::fread(buffer.data(), 1, buffer.size(), in)) > 0) result.errors.append(buffer.data(), n);
    std::fclose(in);
  }
  return result;
}

RunInfo night(const std::string& started) {
  RunInfo info;
  info.started = started;
  info.engine_version = "0.1.0";
  return info;
}

RunInfo finished(const std::string& at) {
  RunInfo info;
  info.finished = at;
  return info;
}

// Three nights of two bridges: EV-0112 drops from 0.95 to 0.61 after an
// inspection on night 3 and becomes posted, with its posting deadline passed.
std::filesystem::path write_ledger(const std::filesystem::path& out) {
  const auto path = out / "ledger.sqlite";
  Ledger ledger = Ledger::open(path);
  BridgeRecord a = test::full_record("EV-0112", 0.95);
  a.recommendation = "none";
  a.post_by.reset();
  BridgeRecord b = test::full_record("EV-0031", 1.20);
  b.recommendation = "none";
  b.post_by.reset();
  const RunId r1 = ledger.begin_run(night("2026-11-29T02:00:00Z"));
  ledger.record_bridge(r1, a);
  ledger.record_bridge(r1, b);
  ledger.finish_run(r1, finished("2026-11-29T02:10:00Z"));
  const RunId r2 = ledger.begin_run(night("2026-11-30T02:00:00Z"));
  ledger.carry_forward(r2, {"EV-0112", "EV-0031"});
  ledger.finish_run(r2, finished("2026-11-30T02:01:00Z"));
  const RunId r3 = ledger.begin_run(night("2026-12-01T02:00:00Z"));
  a.governing[0].rating_factor = 0.61;
  a.recommendation = "post";
  a.post_by = "2026-11-20";
  ledger.record_bridge(r3, a);
  ledger.carry_forward(r3, {"EV-0031"});
  ledger.finish_run(r3, finished("2026-12-01T02:05:00Z"));
  return path;
}

}  // namespace

TEST_CASE("history shows every run of a bridge, oldest first, as text and as json", "[ledger][cli]") {
  const auto out = test::scratch_dir("cli-history");
  write_ledger(out);
  const Run text = run("history EV-0112 --out " + out.string(), out);
  INFO(text.output << text.errors);
  CHECK(text.exit_code == 0);
  CHECK_THAT(text.output, Catch::Contains("EV-0112"));
  CHECK_THAT(text.output, Catch::Contains("3 runs"));
  CHECK_THAT(text.output, Catch::Contains("ratings of run 1"));
  CHECK_THAT(text.output, Catch::Contains("0.95") && Catch::Contains("0.61"));
  CHECK(text.output.find("2026-11-29T02:00:00Z") < text.output.find("2026-12-01T02:00:00Z"));

  const Run json = run("history EV-0112 --format json --ledger " + (out / "ledger.sqlite").string(), out);
  CHECK(json.exit_code == 0);
  const auto doc = nlohmann::json::parse(json.output);
  REQUIRE(doc["entries"].size() == 3);
  CHECK(doc["entries"][0]["run"] == 1);
  CHECK(doc["entries"][1]["record"]["status"] == "unchanged");
  CHECK(doc["entries"][1]["record"]["carried_from_run"] == 1);
  CHECK(doc["entries"][2]["record"]["governing"][0]["rating_factor"] == 0.61);
  CHECK(doc["entries"][2]["record"]["deadlines"]["post_by"] == "2026-11-20");
}

TEST_CASE("history of a bridge the ledger does not know says so and exits 1", "[ledger][cli]") {
  const auto out = test::scratch_dir("cli-history-unknown");
  write_ledger(out);
  const Run r = run("history EV-9999 --out " + out.string(), out);
  CHECK(r.exit_code == 1);
  CHECK_THAT(r.errors, Catch::Contains("no record of structure 'EV-9999'"));
}

TEST_CASE("history and changes without a ledger name the missing file and exit 2", "[ledger][cli]") {
  const auto out = test::scratch_dir("cli-noledger");
  const Run r = run("history EV-0112 --out " + out.string(), out);
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.errors, Catch::Contains((out / "ledger.sqlite").string()));
  CHECK_FALSE(std::filesystem::exists(out / "ledger.sqlite"));
  const Run c = run("changes --out " + out.string(), out);
  CHECK(c.exit_code == 2);
}

TEST_CASE("changes compares the latest two finished runs by default", "[ledger][cli]") {
  const auto out = test::scratch_dir("cli-changes");
  write_ledger(out);
  const Run r = run("changes --out " + out.string(), out);
  INFO(r.output << r.errors);
  CHECK(r.exit_code == 1);  // something to look at
  CHECK_THAT(r.output, Catch::Contains("from run 2") && Catch::Contains("to run 3"));
  CHECK_THAT(r.output, Catch::Contains("-0.34"));  // 0.61 - 0.95 by hand
  CHECK_THAT(r.output, Catch::Contains("newly posted: EV-0112"));
  CHECK_THAT(r.output, Catch::Contains("post by 2026-11-20"));

  const Run j = run("changes 2 3 --format json --threshold 0.5 --out " + out.string(), out);
  const auto doc = nlohmann::json::parse(j.output);
  // |0.61 - 0.95| = 0.34 is not more than 0.5 (and the operating factor did not move).
  CHECK(doc["moved"].empty());
  CHECK(doc["newly_posted"] == nlohmann::json::array({"EV-0112"}));
  CHECK(doc["overdue"].size() == 1);
  CHECK(doc["as_of"] == "2026-12-01");

  const Run same = run("changes 1 2 --out " + out.string(), out);
  CHECK(same.exit_code == 0);  // night 2 carried everything forward
  CHECK_THAT(same.output, Catch::Contains("moved by more than 0.05: none"));
}

TEST_CASE("changes with an unknown run or one run only is a usage error with a clear message", "[ledger][cli]") {
  const auto out = test::scratch_dir("cli-changes-bad");
  write_ledger(out);
  const Run unknown = run("changes 1 9 --out " + out.string(), out);
  CHECK(unknown.exit_code == 2);
  CHECK_THAT(unknown.errors, Catch::Contains("no run 9") && Catch::Contains("runs are 1 to 3"));
  const Run one = run("changes 1 --out " + out.string(), out);
  CHECK(one.exit_code == 2);
  CHECK_THAT(one.errors, Catch::Contains("two runs"));

  const auto fresh = test::scratch_dir("cli-changes-one-run");
  {
    Ledger ledger = Ledger::open(fresh / "ledger.sqlite");
    const RunId r = ledger.begin_run(night("2026-12-01T02:00:00Z"));
    ledger.finish_run(r, finished("2026-12-01T02:05:00Z"));
  }
  const Run few = run("changes --out " + fresh.string(), fresh);
  CHECK(few.exit_code == 2);
  CHECK_THAT(few.errors, Catch::Contains("1 finished run;"));
}

}  // namespace tenthpoint::ledger
