// The tenthpoint command as a user meets it: exit codes, messages, files.
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

struct Run {
  int exit_code = -1;
  std::string output;  // stdout and stderr together
};

Run run(const std::string& args) {
  const std::string command = std::string(TENTHPOINT_BINARY_DIR) + "/tenthpoint " + args + " 2>&1";
  Run result;
  FILE* pipe = ::popen(command.c_str(), "r");
  REQUIRE(pipe != nullptr);
  std::array<char, 4096> buffer{};
  std::size_t n = 0;
  while ((n = std::fread(buffer.data(), 1, buffer.size(), pipe)) > 0) result.output.append(buffer.data(), n);
  const int status = ::pclose(pipe);
  result.exit_code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
  return result;
}

fs::path temp_dir(const std::string& name) {
  const fs::path dir = fs::temp_directory_path() / ("tp-cli-" + name + "-" + std::to_string(::getpid()));
  fs::remove_all(dir);
  return dir;
}

std::string slurp(const fs::path& p) {
  std::ifstream in(p);
  std::stringstream ss;
  ss << in.rdbuf();
  return ss.str();
}

}  // namespace

TEST_CASE("check accepts the shipped demo inventory and exits 0", "[cli][check]") {
  const Run r = run("check inventory/");
  INFO(r.output);
  CHECK(r.exit_code == 0);
  CHECK_THAT(r.output, Catch::Contains("0 with errors"));
}

TEST_CASE("check names file, line and field of a bad record and exits 1", "[cli][check]") {
  const Run r = run("check tests/data/bad/negative-span.yaml");
  INFO(r.output);
  CHECK(r.exit_code == 1);
  CHECK_THAT(r.output, Catch::Contains("tests/data/bad/negative-span.yaml:"));
  CHECK_THAT(r.output, Catch::Contains("geometry.spans["));
}

TEST_CASE("check --format json is machine readable and counts every file", "[cli][check]") {
  const Run r = run("check inventory/ tests/data/bad/negative-span.yaml --format json");
  CHECK(r.exit_code == 1);
  const auto doc = nlohmann::json::parse(r.output);
  CHECK(doc["with_errors"].get<int>() == 1);
  CHECK(doc["bridges"].get<int>() == doc["valid"].get<int>() + doc["with_warnings"].get<int>() + 1);
}

TEST_CASE("check --out writes the check result and the inventory summary", "[cli][check]") {
  const fs::path out = temp_dir("check");
  const Run r = run("check inventory/ --out " + out.string());
  CHECK(r.exit_code == 0);
  CHECK(nlohmann::json::parse(slurp(out / "check.json"))["with_errors"] == 0);
  const std::string csv = slurp(out / "inventory-summary.csv");
  CHECK(csv.rfind("structure_id,name,file,", 0) == 0);
  CHECK_THAT(csv, Catch::Contains("EV-0112,Willow Run Road Bridge"));
  fs::remove_all(out);
}

TEST_CASE("bad command-line input gets a clear message and exit code 2", "[cli]") {
  Run r = run("");
  CHECK(r.exit_code == 2);
  r = run("rate-everything");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("rate-everything"));
  r = run("check inventory/ --format xml");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("xml"));
  r = run("diagrams no/such/file.yaml");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("no/such/file.yaml"));
}

TEST_CASE("diagrams writes influence lines of a demo bridge under a safe directory name", "[cli][diagrams]") {
  const fs::path out = temp_dir("diagrams");
  const Run r = run("diagrams inventory/ev-0112-willow-run.yaml --format json --out " + out.string());
  INFO(r.output);
  REQUIRE(r.exit_code == 0);
  const auto doc = nlohmann::json::parse(slurp(out / "EV-0112" / "diagrams.json"));
  CHECK(doc["girders"].size() == 2);
  CHECK(doc["units"]["station"] == "ft");
  fs::remove_all(out);
}

TEST_CASE("rate rates the demo inventory, one bridge on request, and refuses a bad date", "[cli][rate]") {
  Run r = run("rate inventory/ --date 2026-12-01");
  INFO(r.output);
  CHECK(r.exit_code == 0);
  CHECK_THAT(r.output, Catch::Contains("bridges rated, 0 failed"));
  r = run("rate inventory/ --bridge EV-0112 --date 2026-12-01");
  CHECK(r.exit_code == 0);
  CHECK_THAT(r.output, Catch::Contains("EV-0112  Willow Run Road Bridge"));
  CHECK_THAT(r.output, Catch::Contains("HL93"));
  CHECK_THAT(r.output, Catch::Contains("1 bridges rated"));
  r = run("rate inventory/ --bridge NO-SUCH-ID");
  CHECK(r.exit_code == 1);
  CHECK_THAT(r.output, Catch::Contains("NO-SUCH-ID"));
  r = run("rate inventory/ --date 2026-13-45");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("--date"));
}

TEST_CASE("a bridge that cannot be rated is reported as failed while the others are rated", "[cli][rate]") {
  const Run r = run("rate inventory/ev-0112-willow-run.yaml tests/data/bad/negative-span.yaml --date 2026-12-01");
  INFO(r.output);
  CHECK(r.exit_code == 1);
  CHECK_THAT(r.output, Catch::Contains("negative-span.yaml: failed"));
  CHECK_THAT(r.output, Catch::Contains("1 bridges rated, 1 failed"));
}
