// BatchRun: the nightly run over a list of bridge files (already listed and
// sharded by the caller), with one ledger.
//
//  1. Decide which bridges changed, cheaply: for every file the ledger has
//     rated before and the DependencyIndex knows, hash its bytes and those of
//     the policy and vehicle files it used (each distinct file once), and
//     compare with the ledger's inputs hash. Equal: carried forward as
//     unchanged in one ledger transaction, no YAML read. `all` skips this.
//  2. Rate the rest on `jobs` worker threads (bridge_job.h). A job whose
//     file is new to the index still compares its hash once parsed, so an
//     unchanged bridge is never rated again without `all`.
//  3. The calling thread is the one writer (result_writer.h); outcomes reach
//     it through a bounded queue (bounded_queue.h), so memory holds a few
//     ratings at a time whatever the inventory size.
//  4. Finish: the dependency index is saved, the run gets its counts, policy
//     versions and finish time.
//
// One failing bridge never stops the run: it is recorded as failed with its
// reason. What stops it is the environment (an unwritable output directory,
// a ledger error), thrown to the caller after the workers have stopped; the
// ledger then holds whole bridges only and the rerun finishes the rest.
#pragma once

#include <cstddef>
#include <filesystem>
#include <string>
#include <vector>

#include "engine/core/calendar_date.h"
#include "engine/ledger/bridge_record.h"
#include "engine/ledger/ledger.h"

namespace tenthpoint::batch {

struct BatchOptions {
  std::filesystem::path out_dir = "reports";  // results under <out>/<safe id>/results.json
  CalendarDate rating_date;
  int jobs = 1;      // worker threads, >= 1
  bool all = false;  // rate every bridge, changed or not
  // The DependencyIndex file (dependency_index.h); empty: none, every
  // previously rated bridge is parsed to find its policy.
  std::filesystem::path dependency_index;
  std::size_t queue_capacity = 0;  // outcomes in flight; 0 = 2 x jobs

  // True when usable; else false with the reason in `why`.
  [[nodiscard]] bool is_valid(std::string* why) const;
};

struct BatchProgress {
  int total = 0;  // bridge files in the run
  int rated = 0;
  int unchanged = 0;
  int failed = 0;
  double elapsed_seconds = 0;

  [[nodiscard]] int done() const { return rated + unchanged + failed; }
};

// Told about the run's progress, on the writer (calling) thread.
class BatchObserver {
 public:
  virtual ~BatchObserver() = default;
  // Once the unchanged bridges found without parsing are carried forward.
  virtual void started(const BatchProgress& /*progress*/) {}
  // After each bridge that went to a worker is in the ledger.
  virtual void bridge_done(const ledger::BridgeRecord& /*record*/, const BatchProgress& /*progress*/) {}
};

// Runs the files as one ledger run described by `info` (command, shard,
// batch; `started` is set here when empty) and returns the finished run:
// its id, counts, policy versions, start and finish times.
[[nodiscard]] ledger::RunInfo run_batch(ledger::Ledger& ledger, ledger::RunInfo info,
                                        const std::vector<std::string>& files, const BatchOptions& options,
                                        BatchObserver* observer = nullptr);

// "id version" of each distinct policy in `records`, joined by "; "
// (RunInfo::policy_versions).
[[nodiscard]] std::string policy_versions(const std::vector<ledger::BridgeRecord>& records);

}  // namespace tenthpoint::batch
