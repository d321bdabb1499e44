#include "engine/report/run_summary.h"

#include <algorithm>
#include <utility>

#include <fmt/format.h>

#include "engine/core/atomic_file.h"
#include "engine/core/csv_field.h"
#include "engine/report/finite_numbers.h"
#include "engine/report/record_headline.h"

namespace tenthpoint::report {
namespace {

using nlohmann::json;

// A vehicle class of the posting columns, in one weight unit.
struct PostingColumn {
  std::string load_model_id;
  std::string unit;
  bool operator==(const PostingColumn&) const = default;
};

std::vector<PostingColumn> posting_columns(const std::vector<ledger::BridgeRecord>& records) {
  std::vector<PostingColumn> columns;
  for (const ledger::BridgeRecord& r : records)
    for (const ledger::PostingRow& p : r.postings) {
      const PostingColumn c{p.load_model_id, r.weight_unit};
      if (std::find(columns.begin(), columns.end(), c) == columns.end()) columns.push_back(c);
    }
  return columns;
}

std::string rf_text(const ledger::GoverningRow* row) { return row ? fmt::format("{:.3f}", row->rating_factor) : ""; }
std::string id_text(const ledger::GoverningRow* row) { return row ? row->load_model_id : ""; }

json headline_json(const ledger::GoverningRow* row) {
  if (row == nullptr) return nullptr;
  return {{"load_model_id", row->load_model_id},
          {"rating_factor", row->rating_factor},
          {"rating", row->rating_weight ? json(*row->rating_weight) : json(nullptr)},
          {"girder_id", row->girder_id},
          {"point", row->point},
          {"effect", row->effect},
          {"limit_state", row->limit_state}};
}

json optional_text(const std::optional<std::string>& s) { return s ? json(*s) : json(nullptr); }

}  // namespace

std::string summary_csv(const std::vector<ledger::BridgeRecord>& records) {
  const std::vector<PostingColumn> columns = posting_columns(records);
  std::vector<std::string> header{"structure_id", "name",
                                  "status",       "reason",
                                  "method",       "policy",
                                  "inventory_rf", "inventory_load_model",
                                  "operating_rf", "operating_load_model",
                                  "legal_rf",     "legal_load_model"};
  // One status column per vehicle class, then its weight column(s).
  std::vector<std::string> ids;
  for (const PostingColumn& c : columns)
    if (std::find(ids.begin(), ids.end(), c.load_model_id) == ids.end()) ids.push_back(c.load_model_id);
  for (const std::string& id : ids) {
    header.push_back(fmt::format("posting_{}_status", id));
    for (const PostingColumn& c : columns)
      if (c.load_model_id == id) header.push_back(fmt::format("posting_{}_{}", id, c.unit));
  }
  for (const char* h :
       {"recommendation", "rating_date", "inspection_date", "rerate_by", "post_by", "warnings", "inputs_hash", "file"})
    header.emplace_back(h);

  std::string out;
  const auto write_row = [&out](const std::vector<std::string>& fields) {
    for (std::size_t i = 0; i < fields.size(); ++i) {
      if (i > 0) out += ',';
      out += csv_field(fields[i]);
    }
    out += "\r\n";  // RFC 4180 line break
  };
  write_row(header);
  for (const ledger::BridgeRecord& r : records) {
    const RecordHeadline h = record_headline(r);
    std::vector<std::string> row{r.structure_id,
                                 r.name,
                                 std::string(ledger::to_string(r.status)),
                                 r.reason,
                                 r.method,
                                 r.policy_id.empty() ? "" : fmt::format("{} {}", r.policy_id, r.policy_version),
                                 rf_text(h.inventory),
                                 id_text(h.inventory),
                                 rf_text(h.operating),
                                 id_text(h.operating),
                                 rf_text(h.legal),
                                 id_text(h.legal)};
    for (const std::string& id : ids) {
      const ledger::PostingRow* posting = nullptr;
      for (const ledger::PostingRow& p : r.postings)
        if (p.load_model_id == id) posting = &p;
      row.push_back(posting ? posting->status : "");
      for (const PostingColumn& c : columns)
        if (c.load_model_id == id)
          row.push_back(posting && posting->posted_weight && c.unit == r.weight_unit
                            ? fmt::format("{:.1f}", *posting->posted_weight)
                            : "");
    }
    row.push_back(r.recommendation);
    row.push_back(r.rating_date);
    row.push_back(r.inspection_date.value_or(""));
    row.push_back(r.rerate_by.value_or(""));
    row.push_back(r.post_by.value_or(""));
    row.push_back(std::to_string(r.warning_count));
    row.push_back(r.inputs_hash);
    row.push_back(r.file);
    write_row(row);
  }
  return out;
}

json run_json(const ledger::RunInfo& run) {
  return {{"id", run.id},
          {"started", run.started},
          {"finished", run.finished.empty() ? json(nullptr) : json(run.finished)},
          {"engine_version", run.engine_version},
          {"policy_versions", run.policy_versions},
          {"command", run.command},
          {"shard", run.shard},
          {"batch", run.batch},
          {"rated", run.rated},
          {"unchanged", run.unchanged},
          {"failed", run.failed}};
}

json summary_json(const ledger::RunInfo& run, const std::vector<ledger::BridgeRecord>& records) {
  json bridges = json::array();
  for (const ledger::BridgeRecord& r : records) {
    const RecordHeadline h = record_headline(r);
    json postings = json::array();
    for (const ledger::PostingRow& p : r.postings)
      postings.push_back({{"load_model_id", p.load_model_id},
                          {"rating_factor", p.rating_factor},
                          {"status", p.status},
                          {"posted_weight", p.posted_weight ? json(*p.posted_weight) : json(nullptr)},
                          {"reason", p.reason}});
    bridges.push_back({{"structure_id", r.structure_id},
                       {"name", r.name},
                       {"file", r.file},
                       {"status", std::string(ledger::to_string(r.status))},
                       {"reason", r.reason},
                       {"carried_from", r.carried_from ? json(*r.carried_from) : json(nullptr)},
                       {"method", r.method},
                       {"policy", {{"id", r.policy_id}, {"version", r.policy_version}, {"edition", r.edition}}},
                       {"vehicle_set", r.vehicle_set},
                       {"weight_unit", r.weight_unit},
                       {"inventory", headline_json(h.inventory)},
                       {"operating", headline_json(h.operating)},
                       {"legal", headline_json(h.legal)},
                       {"postings", postings},
                       {"recommendation", r.recommendation},
                       {"recommendation_reason", r.recommendation_reason},
                       {"rating_date", r.rating_date},
                       {"inspection_date", optional_text(r.inspection_date)},
                       {"rerate_by", optional_text(r.rerate_by)},
                       {"post_by", optional_text(r.post_by)},
                       {"warning_count", r.warning_count},
                       {"inputs_hash", r.inputs_hash}});
  }
  return {{"format", kSummaryFormat},
          {"format_version", kSummaryFormatVersion},
          {"run", run_json(run)},
          {"units",
           {{"rating_factor", "dimensionless"},
            {"rating", "the bridge's weight_unit: ton (US short ton, 2000 lb) or tonne (tonne-force)"},
            {"posted_weight", "the bridge's weight_unit"},
            {"dates", "ISO 8601 YYYY-MM-DD"}}},
          {"bridges", bridges}};
}

void write_run_summary(const std::filesystem::path& dir, const ledger::RunInfo& run,
                       const std::vector<ledger::BridgeRecord>& records) {
  const json document = summary_json(run, records);
  require_finite(document, fmt::format("run {}", run.id), "summary.json");
  // JSON first, then CSV: each file is whole, and both come from the same records.
  write_file_atomically(dir / "summary.json", document.dump(2) + "\n");
  write_file_atomically(dir / "summary.csv", summary_csv(records));
}

}  // namespace tenthpoint::report
