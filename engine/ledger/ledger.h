// Ledger: the rating history of an inventory, kept in one SQLite file in the
// output directory (default <out>/ledger.sqlite). Its schema is created and
// migrated by the engine (PRAGMA user_version); every statement binds its
// parameters, none is built by string concatenation.
//
// Writes are transactional per bridge: record_bridge() commits one bridge's
// rows (result, governing ratings, postings) in one transaction, so a run
// killed at any moment leaves whole bridges only. A run that was killed has
// no finish time; the next run carries on from the bridges it completed.
//
// One Ledger is one connection and is not shared between threads: the batch
// run rates bridges on worker threads and writes from one thread.
#pragma once

#include <cstdint>
#include <filesystem>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "engine/ledger/bridge_record.h"

namespace tenthpoint::ledger {

using RunId = std::int64_t;

struct RunInfo {
  RunId id = 0;
  std::string started;   // ISO 8601 UTC date-time, e.g. 2026-12-01T02:00:00Z
  std::string finished;  // empty while running, or when the run was killed
  std::string engine_version;
  std::string policy_versions;  // the policies used, "id version" joined by "; "
  std::string command;          // the command line, for the record
  std::string shard;            // "K/N", or empty for a whole inventory
  std::string batch;            // shared by the shard runs of one night (e.g. a scheduler's array job id)
  int rated = 0;
  int unchanged = 0;
  int failed = 0;
};

// One line of a bridge's history: its state after one run.
struct HistoryEntry {
  RunId run = 0;
  std::string run_started;
  BridgeRecord record;  // the governing rows and postings as of that run
};

struct RatingChange {
  std::string structure_id;
  std::string load_model_id;
  std::string level;
  std::optional<double> before;  // none: not rated in the earlier run
  std::optional<double> after;   // none: not rated in the later run
};

struct ChangeReport {
  RunId from = 0;
  RunId to = 0;
  double threshold = 0;                   // |after - before| that counts as a move
  std::vector<RatingChange> moved;        // rating factors that moved beyond the threshold
  std::vector<std::string> newly_posted;  // structure ids whose recommendation became post
  std::vector<std::string> newly_closed;  // ... became close
  std::vector<BridgeRecord> overdue;      // rerate_by or post_by before the later run's date
};

class Ledger {
 public:
  // Opens (creating and migrating as needed) the ledger at `path`. Throws
  // LedgerError naming the file when it cannot be opened, is not a ledger,
  // or was written by a newer engine.
  [[nodiscard]] static Ledger open(const std::filesystem::path& path);

  Ledger(Ledger&&) noexcept;
  Ledger& operator=(Ledger&&) noexcept;
  ~Ledger();

  [[nodiscard]] RunId begin_run(const RunInfo& info);
  // Stores one bridge of a run in one transaction.
  void record_bridge(RunId run, const BridgeRecord& record);
  // Carries the last result of each unchanged bridge (by structure id) into
  // `run` with status unchanged, in one transaction.
  void carry_forward(RunId run, const std::vector<std::string>& structure_ids);
  void finish_run(RunId run, const RunInfo& counts_and_finish_time);

  // The inputs hash of a bridge file's latest successful rating (rated or
  // carried forward), with its structure id; none when never rated.
  struct LastInputs {
    std::string structure_id;
    std::string inputs_hash;
  };
  [[nodiscard]] std::optional<LastInputs> last_inputs(const std::string& file) const;
  // Every bridge file's latest successful inputs, for a whole-inventory
  // incremental check without one query per file.
  [[nodiscard]] std::vector<std::pair<std::string, LastInputs>> all_last_inputs() const;

  [[nodiscard]] std::optional<RunInfo> run(RunId id) const;
  [[nodiscard]] std::optional<RunInfo> latest_run() const;
  [[nodiscard]] std::vector<RunInfo> runs() const;
  // The state of every bridge in a run (rated, unchanged or failed).
  [[nodiscard]] std::vector<BridgeRecord> run_results(RunId run) const;
  // The latest record of one bridge before `run` (or overall), for "what changed".
  [[nodiscard]] std::optional<BridgeRecord> previous_record(const std::string& structure_id,
                                                            std::optional<RunId> before_run) const;
  [[nodiscard]] std::vector<HistoryEntry> history(const std::string& structure_id) const;
  [[nodiscard]] ChangeReport changes(RunId from, RunId to, double threshold) const;

  // Copies every run and result of the shard ledgers into this one, in one
  // transaction. Runs with the same non-empty `batch` become one run of this
  // ledger (shard cleared, counts summed, earliest start and latest finish);
  // other runs are copied as they are. Run ids are renumbered. Throws
  // LedgerError when two shards of a batch hold the same bridge.
  void merge(const std::vector<std::filesystem::path>& shards);

  // PRAGMA integrity_check == "ok".
  [[nodiscard]] bool integrity_ok() const;

 private:
  struct Impl;
  explicit Ledger(std::unique_ptr<Impl> impl);
  std::unique_ptr<Impl> impl_;
};

}  // namespace tenthpoint::ledger
