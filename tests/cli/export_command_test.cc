// tenthpoint export as a user meets it: a run of the ledger written as the
// vehicles and SNBI views, and clear messages for a run or ledger that is
// not there. The document contents are checked against their schema in
// tests/report; here the command's options, files and exit codes.
#include <sys/wait.h>
#include <unistd.h>

#include <array>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

namespace fs = std::filesystem;

namespace {

struct Result {
  int exit_code = -1;
  std::string output;  // stdout and stderr together
};

Result tenthpoint(const std::string& args) {
  Result r;
  FILE* pipe = ::popen((std::string(TENTHPOINT_BINARY_DIR) + "/tenthpoint " + args + " 2>&1").c_str(), "r");
  REQUIRE(pipe != nullptr);
  std::array<char, 4096> buffer{};
  std::size_t n = 0;
  while ((n = std::fread(buffer.data(), 1, buffer.size(), pipe)) > 0) r.output.append(buffer.data(), n);
  const int status = ::pclose(pipe);
  r.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
  return r;
}

std::string slurp(const fs::path& p) {
  std::ifstream in(p);
  std::stringstream ss;
  ss << in.rdbuf();
  return ss.str();
}

std::size_t line_count(const std::string& text) {
  std::size_t n = 0;
  for (char c : text) n += c == '\n';
  return n;
}

}  // namespace

TEST_CASE("export writes the latest run as vehicle rows and as SNBI items", "[cli][export]") {
  const fs::path dir = fs::temp_directory_path() / ("tp-export-" + std::to_string(::getpid()));
  fs::remove_all(dir);
  const std::string inventory = std::string(TENTHPOINT_SOURCE_DIR) + "/inventory/";
  const Result rated = tenthpoint("rate " + inventory + "ev-0207-quarry-hill.yaml " + inventory +
                                  "ev-0031-pasture-lane.yaml --out " + dir.string());
  INFO(rated.output);
  REQUIRE(rated.exit_code == 0);

  const Result csv = tenthpoint("export --out " + dir.string());
  CHECK(csv.exit_code == 0);
  CHECK(csv.output.rfind("run_id,structure_id,name,bridge_status,", 0) == 0);
  // One header line and at least the design load at two levels per bridge.
  CHECK(line_count(csv.output) >= 5);
  CHECK(csv.output.find("\n1,EV-0031,") != std::string::npos);

  const fs::path snbi = dir / "snbi.json";
  const Result json = tenthpoint("export --out " + dir.string() + " --view snbi --format json --to " + snbi.string());
  CHECK(json.exit_code == 0);
  const nlohmann::json doc = nlohmann::json::parse(slurp(snbi));
  CHECK(doc["view"] == "snbi");
  REQUIRE(doc["rows"].size() == 2);
  for (const nlohmann::json& row : doc["rows"]) {
    // FHWA-HIF-22-017 date coding (REFERENCE.md section 6): eight digits.
    CHECK(row["B.LR.03"].get<std::string>().size() == 8);
    CHECK(row["B.LR.05"].get<std::string>().find('.') != std::string::npos);
  }

  const Result no_run = tenthpoint("export --out " + dir.string() + " --run 9");
  CHECK(no_run.exit_code == 2);
  CHECK(no_run.output.find("has no run 9 (its runs are 1 to 1)") != std::string::npos);
  const Result bad_view = tenthpoint("export --out " + dir.string() + " --view posting");
  CHECK(bad_view.exit_code == 2);
  CHECK(bad_view.output.find("--view") != std::string::npos);
  fs::remove_all(dir);
}

TEST_CASE("export names a missing ledger and creates nothing", "[cli][export]") {
  const fs::path missing = fs::temp_directory_path() / ("tp-export-none-" + std::to_string(::getpid()) + ".sqlite");
  const Result r = tenthpoint("export --ledger " + missing.string());
  CHECK(r.exit_code == 2);
  CHECK(r.output.find(missing.string()) != std::string::npos);
  CHECK_FALSE(fs::exists(missing));
}
