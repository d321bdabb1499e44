#include "engine/batch/result_writer.h"

#include <fmt/format.h>

#include "engine/core/atomic_file.h"

namespace tenthpoint::batch {

ResultWriter::ResultWriter(ledger::Ledger& ledger, ledger::RunId run, std::filesystem::path out_dir,
                           DependencyIndex* index)
    : ledger_(ledger), run_(run), out_dir_(std::move(out_dir)), index_(index) {}

bool ResultWriter::claim(const std::string& structure_id, const std::string& file) {
  const auto [it, added] = owners_.emplace(structure_id, file);
  return added || it->second == file;
}

const ledger::BridgeRecord& ResultWriter::write(BridgeOutcome& outcome) {
  ledger::BridgeRecord& record = outcome.record;
  if (record.status != ledger::BridgeStatus::failed && !claim(record.structure_id, record.file)) {
    // Two files for one structure would overwrite each other's results and
    // history; `tenthpoint check` reports the same as an inventory error.
    // The failure is stored under its file, not the id (the ledger keeps one
    // record per id and run, and would replace the first file's rating).
    ledger::BridgeRecord duplicate;
    duplicate.name = record.name;
    duplicate.file = record.file;
    duplicate.inputs_hash = record.inputs_hash;
    duplicate.status = ledger::BridgeStatus::failed;
    duplicate.reason = fmt::format("{}: identity.structure_id: '{}' is also the structure id of {}", record.file,
                                   record.structure_id, owners_.at(record.structure_id));
    record = std::move(duplicate);
    outcome.results_json.clear();
  }
  switch (record.status) {
    case ledger::BridgeStatus::rated:
      write_file_atomically(results_path(out_dir_, record.structure_id), outcome.results_json);
      ledger_.record_bridge(run_, record);
      break;
    case ledger::BridgeStatus::unchanged:
      ledger_.carry_forward(run_, {record.structure_id});
      break;
    case ledger::BridgeStatus::failed:
      ledger_.record_bridge(run_, record);
      break;
  }
  if (index_ != nullptr && record.status != ledger::BridgeStatus::failed)
    index_->set(record.file, outcome.dependencies);
  outcome.results_json.clear();
  outcome.results_json.shrink_to_fit();
  return record;
}

}  // namespace tenthpoint::batch
