// Kill safety: a writer killed with SIGKILL at random moments, between and
// inside record_bridge and carry_forward calls, leaves a ledger that passes
// PRAGMA integrity_check and holds whole bridges only.
//
// Reference: SQLite's atomic commit (https://www.sqlite.org/atomiccommit.html):
// a transaction interrupted by a crash is rolled back when the database is
// next opened, so a reader sees every committed transaction whole and none
// of an uncommitted one. Each bridge is one transaction, so every result row
// has exactly the child rows it was written with (its stored counts), and a
// carry_forward is all of its bridges or none.
#include <signal.h>
#include <sys/wait.h>
#include <unistd.h>

#include <array>
#include <chrono>
#include <random>
#include <string>
#include <thread>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/ledger/ledger.h"
#include "tests/ledger/ledger_test_support.h"

namespace tenthpoint::ledger {
namespace {

constexpr int kKills = 25;  // issue #8 asks for at least 20

// The child: a rerun that carries forward what earlier runs completed, then
// rates new bridges until it is killed. After its first bridge it writes one
// byte to `ready`. Never returns into Catch.
[[noreturn]] void write_until_killed(const std::filesystem::path& file, unsigned seed, int iteration, int ready) {
  ::signal(SIGPIPE, SIG_IGN);
  try {
    Ledger ledger = Ledger::open(file);
    RunInfo info;
    info.command = "kill test writer";
    const RunId run = ledger.begin_run(info);
    std::vector<std::string> done;
    for (const auto& [path, last] : ledger.all_last_inputs()) done.push_back(last.structure_id);
    ledger.carry_forward(run, done);
    std::mt19937 rng(seed);
    for (int i = 0;; ++i) {
      BridgeRecord r = test::full_record("K-" + std::to_string(iteration) + "-" + std::to_string(i));
      // Between 0 and 59 governing rows and 0 and 9 postings: transactions of
      // different sizes, so the kill lands at different points of a commit.
      const std::size_t governing = rng() % 60;
      while (r.governing.size() < governing) r.governing.push_back(r.governing[r.governing.size() % 3]);
      r.governing.resize(governing);
      r.postings.resize(rng() % 10, r.postings[0]);
      ledger.record_bridge(run, r);
      if (i == 0) {
        // The parent may not be listening (odd kills): SIGPIPE is ignored.
        [[maybe_unused]] const auto written = ::write(ready, "r", 1);
      }
    }
  } catch (...) {
    ::_exit(3);
  }
}

}  // namespace

TEST_CASE("a writer killed at random moments leaves an intact ledger of whole bridges", "[ledger][kill]") {
  const auto dir = test::scratch_dir("kill");
  const auto file = dir / "ledger.sqlite";
  const unsigned seed = std::random_device{}();
  INFO("seed " << seed);
  std::mt19937 rng(seed);
  std::uniform_int_distribution<int> delay_ms(2, 60);

  for (int k = 0; k < kKills; ++k) {
    INFO("kill " << k);
    std::array<int, 2> ready{};
    REQUIRE(::pipe(ready.data()) == 0);
    const pid_t child = ::fork();
    REQUIRE(child >= 0);
    if (child == 0) {
      ::close(ready[0]);
      write_until_killed(file, seed + static_cast<unsigned>(k), k, ready[1]);
    }
    ::close(ready[1]);
    // Odd kills count from the fork, so some land while the ledger is opened,
    // migrated or carried forward; even ones from the first bridge written,
    // so on a busy machine too most land among the bridges.
    if (k % 2 == 0) {
      char byte = 0;
      CHECK(::read(ready[0], &byte, 1) == 1);
    }
    ::close(ready[0]);
    std::this_thread::sleep_for(std::chrono::milliseconds(delay_ms(rng)));
    REQUIRE(::kill(child, SIGKILL) == 0);
    int status = 0;
    REQUIRE(::waitpid(child, &status, 0) == child);
    // Killed, not ended by an error of its own.
    REQUIRE(WIFSIGNALED(status));
    if (!std::filesystem::exists(file)) continue;  // killed before it created the file

    test::RawDatabase raw(file);
    CHECK(raw.value("PRAGMA integrity_check") == "ok");
    // Killed before the schema's transaction committed: an empty database,
    // which the next open sets up.
    if (raw.value("SELECT count(*) FROM sqlite_master WHERE name = 'results'") == "0") continue;
    CHECK(raw.value(test::kPartialBridges) == "0");
    // No run ever finished: a killed run has no finish time.
    CHECK(raw.value("SELECT count(*) FROM runs WHERE finished IS NOT NULL") == "0");
    // Each run's carried bridges are all of the earlier successful ones, or none.
    for (const auto& row : raw.rows("SELECT (SELECT count(*) FROM results x WHERE x.run = r.id AND x.status = "
                                    "'unchanged'), (SELECT count(DISTINCT y.structure_id) FROM results y WHERE "
                                    "y.run < r.id AND y.status IN ('rated', 'unchanged')) FROM runs r")) {
      const bool none_or_all = row[0] == "0" || row[0] == row[1];
      CHECK(none_or_all);
    }
  }
  REQUIRE(std::filesystem::exists(file));
  Ledger ledger = Ledger::open(file);
  CHECK(ledger.integrity_ok());
  // The kills came while bridges were being written, not all before the first.
  test::RawDatabase raw(file);
  CHECK(std::stoi(raw.value("SELECT count(*) FROM results WHERE status = 'rated'")) > 0);
}

}  // namespace tenthpoint::ledger
