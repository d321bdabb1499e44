// ResultWriter: the one writer of a run. Every outcome of a bridge job
// (bridge_job.h) passes through it on one thread, in the order the workers
// finish, and is made durable in this order: the results file first
// (<out>/<safe id>/results.json, written atomically), then the bridge's
// ledger transaction. A run killed at any moment therefore never leaves a
// ledger row without its results file; at worst a results file whose row
// was not yet committed, which the rerun rates and writes again.
//
// It also keeps structure ids unique within the run: a second file with an
// id already written is recorded as failed, naming the first file.
#pragma once

#include <filesystem>
#include <map>
#include <string>

#include "engine/batch/bridge_job.h"
#include "engine/batch/dependency_index.h"
#include "engine/ledger/ledger.h"

namespace tenthpoint::batch {

class ResultWriter {
 public:
  // `index` (optional) learns the dependencies of every bridge written.
  ResultWriter(ledger::Ledger& ledger, ledger::RunId run, std::filesystem::path out_dir,
               DependencyIndex* index = nullptr);

  // Records `file` as the owner of `structure_id` in this run; false when
  // another file owns it already.
  bool claim(const std::string& structure_id, const std::string& file);

  // Writes one outcome (results file, then ledger) and returns the record
  // as stored. Throws what the file system or the ledger throws (an
  // unwritable output directory is the environment's problem, not the
  // bridge's); nothing is half-written then.
  const ledger::BridgeRecord& write(BridgeOutcome& outcome);

 private:
  ledger::Ledger& ledger_;
  ledger::RunId run_;
  std::filesystem::path out_dir_;
  DependencyIndex* index_;
  std::map<std::string, std::string> owners_;  // structure id -> file
};

}  // namespace tenthpoint::batch
