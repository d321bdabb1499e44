#include "engine/batch/bridge_job.h"

#include <exception>

#include <fmt/format.h>

#include "engine/core/safe_file_name.h"
#include "engine/io/bridge_reader.h"
#include "engine/io/text_file.h"
#include "engine/pipeline/rating_summary.h"
#include "engine/report/results_document.h"

namespace tenthpoint::batch {
namespace {

// A failed record names the bridge and why, and carries no ratings: a
// half-made summary must not pass for a rating.
BridgeOutcome failed(BridgeOutcome outcome, std::string reason) {
  ledger::BridgeRecord record;
  record.structure_id = std::move(outcome.record.structure_id);
  record.name = std::move(outcome.record.name);
  record.file = std::move(outcome.record.file);
  record.inputs_hash = std::move(outcome.record.inputs_hash);
  record.status = ledger::BridgeStatus::failed;
  record.reason = std::move(reason);
  outcome.record = std::move(record);
  outcome.results_json.clear();
  outcome.rating.reset();
  return outcome;
}

}  // namespace

std::string input_error_reason(const InputError& error) {
  std::size_t errors = 0;
  const Diagnostic* first = nullptr;
  for (const Diagnostic& d : error.diagnostics()) {
    if (d.severity != Severity::error) continue;
    if (first == nullptr) first = &d;
    ++errors;
  }
  if (first == nullptr) return error.what();
  std::string where = first->where.file;
  if (first->where.line > 0) where += fmt::format(":{}", first->where.line);
  std::string reason = where.empty() ? std::string() : where + ": ";
  if (!first->field.empty()) reason += first->field + ": ";
  reason += first->message;
  if (errors > 1) reason += fmt::format(" (and {} more error{})", errors - 1, errors > 2 ? "s" : "");
  return reason;
}

std::filesystem::path results_path(const std::filesystem::path& out_dir, const std::string& structure_id) {
  return out_dir / safe_file_name(structure_id) / "results.json";
}

BridgeOutcome run_bridge_job(const BridgeJob& job, const JobContext& context) {
  BridgeOutcome outcome;
  ledger::BridgeRecord& record = outcome.record;
  record.file = job.file;
  std::string bytes;
  try {
    const io::BridgeReadOptions read_options;
    io::TextFile text = io::read_text_file(job.file, read_options.limits.max_file_bytes);
    if (!text.text) throw InputError(text.diagnostics);
    bytes = std::move(*text.text);
    // Until the policy is known the hash covers the bridge alone; a bridge
    // that fails before then is rated again next night whatever its hash.
    record.inputs_hash = context.hasher->inputs_hash(bytes, {});

    io::BridgeReadResult read = io::read_bridge_text(bytes, job.file, read_options);
    if (!read.bridge) throw InputError(read.diagnostics);
    const model::Bridge& bridge = *read.bridge;
    record.structure_id = bridge.identity.structure_id;
    record.name = bridge.identity.name;

    const std::shared_ptr<const CachedPolicy> policy = context.policies->policy_for(bridge);
    if (!policy->read.policy) throw InputError(policy->read.diagnostics);
    outcome.dependencies = policy->dependencies;
    record.inputs_hash = context.hasher->inputs_hash(bytes, outcome.dependencies);
    if (!job.force && job.last_inputs_hash && *job.last_inputs_hash == record.inputs_hash) {
      record.status = ledger::BridgeStatus::unchanged;
      return outcome;
    }

    pipeline::BridgeRating rating = pipeline::rate_bridge(bridge, *policy->read.policy, context.rating_date);
    ledger::BridgeRecord summary = pipeline::summarize_rating(bridge, rating);
    summary.file = record.file;
    summary.inputs_hash = record.inputs_hash;
    summary.status = ledger::BridgeStatus::rated;
    summary.warning_count += static_cast<int>(count(read.diagnostics, Severity::warning));
    record = std::move(summary);

    report::ResultsContext results_context;
    results_context.engine_version = context.hasher->engine_version();
    results_context.inputs_hash = record.inputs_hash;
    results_context.source_file = job.file;
    results_context.run_id = context.run;
    results_context.run_time = context.run_started;
    // Compact, without indentation: fewer bytes and less time at nightly scale
    // (tools/bench_batch/NOTES.md, "results.json"); a reader who wants it
    // indented runs a formatter.
    outcome.results_json = report::results_document(bridge, rating, results_context).dump() + "\n";
    if (context.keep_rating) {
      outcome.rating = std::move(rating);
      outcome.bridge = std::move(read.bridge);
    }
    return outcome;
  } catch (const InputError& e) {
    return failed(std::move(outcome), input_error_reason(e));
  } catch (const ModelError& e) {
    return failed(std::move(outcome), e.what());
  } catch (const std::exception& e) {
    // An engine fault on one bridge (a broken invariant that threw, memory
    // exhausted by one pathological record) still must not stop the run.
    return failed(std::move(outcome), fmt::format("internal error while rating: {}", e.what()));
  }
}

}  // namespace tenthpoint::batch
