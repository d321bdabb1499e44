// BridgeJob: one bridge file of a run, from its bytes to the record the
// ledger keeps and the results document the writer puts on disk. Runs on a
// worker thread; touches no shared state but the run's PolicyCache and
// InputsHasher (both thread-safe), and writes nothing.
//
// Steps: read the file's bytes; parse and validate it (engine/io); take its
// policy from the cache; compute its inputs hash (inputs_hash.h); when the
// hash equals `last_inputs_hash` (and the job is not forced) stop there with
// status unchanged; else rate it (pipeline::rate_bridge), summarise it for
// the ledger and build its results.json document.
//
// Failure is an outcome, never an exception: an InputError (the bridge file
// or its policy), a ModelError, or any other std::exception from the engine
// ends the job with status failed and the reason (for input errors the first
// error as "file:line: field: message").
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "engine/batch/inputs_hash.h"
#include "engine/batch/policy_cache.h"
#include "engine/core/calendar_date.h"
#include "engine/core/errors.h"
#include "engine/ledger/bridge_record.h"
#include "engine/ledger/ledger.h"
#include "engine/model/bridge.h"
#include "engine/pipeline/bridge_rating.h"

namespace tenthpoint::batch {

struct BridgeJob {
  std::string file;                             // as listed; becomes BridgeRecord::file
  std::optional<std::string> last_inputs_hash;  // from the ledger; none = never rated
  bool force = false;                           // rate even when the hash is unchanged (--all, --bridge)
};

// What the run shares with its jobs.
struct JobContext {
  PolicyCache* policies = nullptr;
  InputsHasher* hasher = nullptr;
  CalendarDate rating_date;
  ledger::RunId run = 0;
  std::string run_started;   // ISO 8601 UTC
  bool keep_rating = false;  // keep the bridge and its rating in the outcome (for a one-bridge summary)
};

struct BridgeOutcome {
  // status rated, unchanged or failed; file and inputs_hash always set;
  // structure_id set whenever the file could be read.
  ledger::BridgeRecord record;
  std::vector<std::string> dependencies;  // the policy and vehicle files used, for the DependencyIndex
  std::string results_json;               // the results document (rated only)
  std::optional<model::Bridge> bridge;    // with JobContext::keep_rating, when read
  std::optional<pipeline::BridgeRating> rating;
};

[[nodiscard]] BridgeOutcome run_bridge_job(const BridgeJob& job, const JobContext& context);

// The reason recorded for an input error: its first error as
// "file:line: field: message", and how many more there are.
[[nodiscard]] std::string input_error_reason(const InputError& error);

// <out>/<safe structure id>/results.json (engine/core/safe_file_name.h).
[[nodiscard]] std::filesystem::path results_path(const std::filesystem::path& out_dir, const std::string& structure_id);

}  // namespace tenthpoint::batch
