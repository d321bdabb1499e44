// The tenthpoint command as a user meets it: exit codes, messages, files.
#include <fcntl.h>
#include <signal.h>
#include <sys/wait.h>
#include <unistd.h>

#include <array>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <map>
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

Run run_shell(const std::string& command) {
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

Run run(const std::string& args) {
  return run_shell(std::string(TENTHPOINT_BINARY_DIR) + "/tenthpoint " + args + " 2>&1");
}

std::string fmt_count(int total, int rated, int unchanged) {
  return std::to_string(total) + " bridges: " + std::to_string(rated) + " rated, " + std::to_string(unchanged) +
         " unchanged, 0 failed";
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
  const fs::path out = temp_dir("rate");
  Run r = run("rate inventory/ --date 2026-12-01 --out " + out.string());
  INFO(r.output);
  CHECK(r.exit_code == 0);
  CHECK_THAT(r.output, Catch::Contains("14 bridges: 14 rated, 0 unchanged, 0 failed"));
  CHECK(fs::exists(out / "EV-0112" / "results.json"));
  CHECK_FALSE(fs::exists(out / "EV-0112" / "rating.json"));
  CHECK(fs::exists(out / "ledger.sqlite"));
  CHECK(fs::exists(out / "summary.csv"));
  CHECK(nlohmann::json::parse(slurp(out / "summary.json"))["bridges"].size() == 14);
  // spdlog's file sink in the output directory (issue #6: "spdlog also logs
  // to a file in the output directory").
  CHECK_THAT(slurp(out / "tenthpoint.log"), Catch::Contains("finished: 14 rated"));

  r = run("rate inventory/ --bridge EV-0112 --date 2026-12-01 --out " + out.string());
  CHECK(r.exit_code == 0);
  CHECK_THAT(r.output, Catch::Contains("EV-0112  Willow Run Road Bridge"));
  CHECK_THAT(r.output, Catch::Contains("HL93"));
  CHECK_THAT(r.output, Catch::Contains("changes since the rating of 2026-12-01 (run 1"));
  CHECK_THAT(r.output, Catch::Contains("inputs unchanged"));
  CHECK_THAT(r.output, Catch::Contains("1 bridge rated (run 2)"));
  r = run("rate inventory/ --bridge EV-0112 --date 2026-12-01 --format json --out " + out.string());
  CHECK(r.exit_code == 0);
  CHECK(nlohmann::json::parse(r.output)[0]["structure_id"] == "EV-0112");
  r = run("rate inventory/ --bridge NO-SUCH-ID --out " + out.string());
  CHECK(r.exit_code == 1);
  CHECK_THAT(r.output, Catch::Contains("NO-SUCH-ID"));
  r = run("rate inventory/ --date 2026-13-45 --out " + out.string());
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("--date"));
  fs::remove_all(out);
}

TEST_CASE("a bridge that cannot be rated is reported as failed while the others are rated", "[cli][rate]") {
  const fs::path out = temp_dir("rate-failed");
  const Run r =
      run("rate inventory/ev-0112-willow-run.yaml tests/data/bad/negative-span.yaml --date 2026-12-01 --out " +
          out.string());
  INFO(r.output);
  CHECK(r.exit_code == 1);
  CHECK_THAT(r.output, Catch::Contains("negative-span.yaml: failed: tests/data/bad/negative-span.yaml:"));
  CHECK_THAT(r.output, Catch::Contains("2 bridges: 1 rated, 0 unchanged, 1 failed"));
  fs::remove_all(out);
}

TEST_CASE("rate refuses bad command-line input with a clear message and exit code 2", "[cli][rate]") {
  Run r = run("rate inventory/ --shard 5/4");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("--shard: '5/4': the shard index must be from 0 to 3"));
  r = run("rate inventory/ --shard a/b");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("'a/b' is not K/N"));
  r = run("rate inventory/ --shard 0/0");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("at least 1"));
  r = run("rate inventory/ --jobs 0");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("--jobs"));
  r = run("rate no/such/inventory");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("no such file or directory: no/such/inventory"));
  r = run("merge");
  CHECK(r.exit_code == 2);
  r = run("merge no/such/ledger.sqlite --into x.sqlite");
  CHECK(r.exit_code == 2);
  CHECK_THAT(r.output, Catch::Contains("no such ledger: no/such/ledger.sqlite"));
}

namespace {

// The demo inventory three times over (ids and file names suffixed), so a
// run lasts long enough to be killed part-way.
fs::path tripled_inventory(const fs::path& root) {
  const fs::path inventory = root / "inventory";
  fs::create_directories(inventory);
  fs::copy("inventory/policies", inventory / "policies", fs::copy_options::recursive);
  for (const auto& entry : fs::directory_iterator("inventory")) {
    if (entry.path().extension() != ".yaml") continue;
    const std::string text = slurp(entry.path());
    for (const std::string suffix : {"", "-B", "-C"}) {
      std::string copy = text;
      const std::string key = "structure_id: ";
      const std::size_t at = copy.find(key);
      REQUIRE(at != std::string::npos);
      copy.insert(copy.find('\n', at), suffix);
      std::ofstream(inventory / (entry.path().stem().string() + suffix + ".yaml")) << copy;
    }
  }
  return inventory;
}

}  // namespace

TEST_CASE("a run killed part-way leaves whole bridges in the ledger and the rerun completes it", "[cli][rate][kill]") {
  // Reference: SQLite's atomic commit (https://www.sqlite.org/atomiccommit.html):
  // a transaction is committed entirely or not at all, even when the process
  // dies; the run writes each bridge's results file before its transaction.
  const fs::path root = temp_dir("kill");
  const fs::path inventory = tripled_inventory(root);
  const fs::path out = root / "out";
  const fs::path ledger_path = out / "ledger.sqlite";
  const std::string binary = std::string(TENTHPOINT_BINARY_DIR) + "/tenthpoint";

  const pid_t child = ::fork();
  REQUIRE(child >= 0);
  if (child == 0) {
    const int null = ::open("/dev/null", O_WRONLY);
    ::dup2(null, STDOUT_FILENO);
    ::dup2(null, STDERR_FILENO);
    ::execl(binary.c_str(), binary.c_str(), "rate", inventory.c_str(), "--out", out.c_str(), "--jobs", "1", "--date",
            "2026-12-01", static_cast<char*>(nullptr));
    ::_exit(127);
  }
  // Kill once a few bridges are committed: the ledger's row count, read
  // through the sqlite3 shell so this test opens no connection that could
  // create or migrate the file under the running process.
  int committed = 0;
  for (int i = 0; i < 2000 && committed < 4; ++i) {
    ::usleep(5000);
    if (!fs::exists(ledger_path)) continue;
    const Run count =
        run_shell("sqlite3 -readonly " + ledger_path.string() + " 'SELECT count(*) FROM results' 2>/dev/null");
    committed = std::atoi(count.output.c_str());
  }
  ::kill(child, SIGKILL);
  int status = 0;
  ::waitpid(child, &status, 0);
  REQUIRE(WIFSIGNALED(status));
  REQUIRE(committed >= 4);

  const Run check = run_shell(
      "sqlite3 -readonly " + ledger_path.string() +
      " 'PRAGMA integrity_check; SELECT count(*) FROM runs WHERE finished IS NULL OR finished = '\"'\"''\"'\"';"
      " SELECT count(*) FROM results WHERE status <> '\"'\"'rated'\"'\"';'");
  INFO(check.output);
  CHECK(check.output == "ok\n1\n0\n");
  // Whole bridges: every committed result has its governing rows and its
  // results file.
  const Run ids = run_shell("sqlite3 -readonly " + ledger_path.string() +
                            " 'SELECT structure_id FROM results WHERE NOT EXISTS (SELECT 1 FROM governing g WHERE"
                            " g.result = results.id)'");
  CHECK(ids.output.empty());
  const Run listed = run_shell("sqlite3 -readonly " + ledger_path.string() + " 'SELECT structure_id FROM results'");
  std::istringstream lines(listed.output);
  int files = 0;
  for (std::string id; std::getline(lines, id);) {
    CHECK(fs::exists(out / id / "results.json"));
    ++files;
  }
  CHECK(files >= 4);

  const Run rerun = run("rate " + inventory.string() + " --out " + out.string() + " --date 2026-12-01 --jobs 2");
  INFO(rerun.output);
  CHECK(rerun.exit_code == 0);
  CHECK_THAT(rerun.output, Catch::Contains(fmt_count(42, 42 - files, files)));
  fs::remove_all(root);
}

TEST_CASE("four shards merged equal one unsharded run", "[cli][rate][shard]") {
  const fs::path out = temp_dir("shards");
  const Run whole = run("rate inventory/ --date 2026-12-01 --out " + (out / "whole").string());
  REQUIRE(whole.exit_code == 0);
  std::string ledgers;
  for (int k = 0; k < 4; ++k) {
    const Run part = run("rate inventory/ --date 2026-12-01 --jobs 1 --batch night-1 --shard " + std::to_string(k) +
                         "/4 --out " + (out / "shards").string());
    INFO(part.output);
    REQUIRE(part.exit_code == 0);
    CHECK(fs::exists(out / "shards" / ("summary.shard-" + std::to_string(k) + "-of-4.csv")));
    ledgers += " " + (out / "shards" / ("ledger.shard-" + std::to_string(k) + "-of-4.sqlite")).string();
  }
  const Run merged = run("merge" + ledgers + " --into " + (out / "merged" / "ledger.sqlite").string());
  INFO(merged.output);
  REQUIRE(merged.exit_code == 0);
  CHECK_THAT(merged.output, Catch::Contains("14 bridges (14 rated, 0 unchanged, 0 failed)"));

  const auto rows = [](const fs::path& summary) {
    std::map<std::string, std::string> by_id;
    const nlohmann::json doc = nlohmann::json::parse(slurp(summary));
    for (const auto& b : doc["bridges"])
      by_id[b["structure_id"].get<std::string>()] = b["inventory"].dump() + b["operating"].dump() + b["legal"].dump();
    return by_id;
  };
  const auto expected = rows(out / "whole" / "summary.json");
  CHECK(expected.size() == 14);
  CHECK(rows(out / "merged" / "summary.json") == expected);
  fs::remove_all(out);
}
