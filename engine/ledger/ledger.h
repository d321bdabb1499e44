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
#include "engine/ledger/change_report.h"
#include "engine/ledger/ledger_error.h"

namespace tenthpoint::ledger {

// RunId is declared in bridge_record.h; RatingChange and ChangeReport in
// change_report.h.

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

class Ledger {
 public:
  // Opens (creating it and its directory, and migrating, as needed) the
  // ledger at `path`. Throws LedgerError naming the file when it cannot be
  // opened, is not a ledger, or was written by a newer engine; such a file is
  // left as it was.
  [[nodiscard]] static Ledger open(const std::filesystem::path& path);

  Ledger(Ledger&&) noexcept;
  Ledger& operator=(Ledger&&) noexcept;
  ~Ledger();

  // Records a new run; `info.started` defaults to now (UTC) when empty. The
  // id, finish time and counts of `info` are ignored.
  [[nodiscard]] RunId begin_run(const RunInfo& info);
  // Stores one bridge of a run in one transaction. A record of the same
  // bridge already in the run (same non-empty structure id; for an empty id,
  // the same file) is replaced. Throws LedgerError, storing nothing, when the
  // run does not exist or a number is NaN or infinite (naming the bridge and
  // the field).
  void record_bridge(RunId run, const BridgeRecord& record);
  // Carries the last result of each unchanged bridge (by structure id) into
  // `run` with status unchanged, in one transaction: the copy keeps the
  // governing rows, postings and dates of its source and sets carried_from to
  // the run that computed them. Throws LedgerError, carrying none, when a
  // bridge has no successful record in an earlier run.
  void carry_forward(RunId run, const std::vector<std::string>& structure_ids);
  // Sets the finish time (now, UTC, when `finished` is empty) and the counts.
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
  // The run begun last, finished or not.
  [[nodiscard]] std::optional<RunInfo> latest_run() const;
  // The run begun last among those that finished (a killed run never does).
  [[nodiscard]] std::optional<RunInfo> latest_finished_run() const;
  [[nodiscard]] std::vector<RunInfo> runs() const;
  // The state of every bridge in a run (rated, unchanged or failed).
  [[nodiscard]] std::vector<BridgeRecord> run_results(RunId run) const;
  // The latest record of one bridge before `run` (or overall), for "what changed".
  // Any status: a failed record is returned as such.
  [[nodiscard]] std::optional<BridgeRecord> previous_record(const std::string& structure_id,
                                                            std::optional<RunId> before_run) const;
  // Every run that has a record of the bridge, oldest (lowest run id) first.
  [[nodiscard]] std::vector<HistoryEntry> history(const std::string& structure_id) const;
  // compare_records() over the two runs' records, as of the date `to` started.
  // Throws LedgerError when either run does not exist.
  [[nodiscard]] ChangeReport changes(RunId from, RunId to, double threshold) const;

  // Copies every run and result of the shard ledgers into this one, in one
  // transaction. Runs with the same non-empty `batch` become one run of this
  // ledger (shard cleared, counts summed, earliest start and latest finish);
  // other runs are copied as they are. Run ids are renumbered. Throws
  // LedgerError when two shards of a batch hold the same bridge.
  // A batch already in this ledger (from an earlier merge) is joined, so
  // merging the same shard twice is refused as a duplicate bridge. The merged
  // run is finished only when every shard's run finished. Each shard must
  // exist (it is opened, and migrated if older, never created).
  void merge(const std::vector<std::filesystem::path>& shards);

  // The file this ledger was opened from.
  [[nodiscard]] const std::filesystem::path& path() const;

  // PRAGMA integrity_check == "ok".
  [[nodiscard]] bool integrity_ok() const;

 private:
  struct Impl;
  explicit Ledger(std::unique_ptr<Impl> impl);
  std::unique_ptr<Impl> impl_;
};

}  // namespace tenthpoint::ledger
