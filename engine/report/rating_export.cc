#include "engine/report/rating_export.h"

#include <cmath>

#include <fmt/format.h>

#include "engine/core/csv_field.h"
#include "engine/report/finite_numbers.h"
#include "engine/report/record_headline.h"
#include "engine/report/run_summary.h"

namespace tenthpoint::report {
namespace {

using nlohmann::json;

const ledger::PostingRow* posting_of(const ledger::BridgeRecord& r, const std::string& load_model_id) {
  for (const ledger::PostingRow& p : r.postings)
    if (p.load_model_id == load_model_id) return &p;
  return nullptr;
}

std::string csv_line(const std::vector<std::string>& fields) {
  std::string out;
  for (std::size_t i = 0; i < fields.size(); ++i) {
    if (i > 0) out += ',';
    out += csv_field(fields[i]);
  }
  return out + "\r\n";  // RFC 4180 line break
}

std::string number(double value, int decimals) { return fmt::format("{:.{}f}", value, decimals); }

json optional_number(const std::optional<double>& v) { return v ? json(*v) : json(nullptr); }

// One row of the vehicles view as named fields, shared by CSV and JSON.
struct VehicleRow {
  const ledger::BridgeRecord* record = nullptr;
  const ledger::GoverningRow* row = nullptr;  // nullptr for a failed bridge
  const ledger::PostingRow* posting = nullptr;
};

std::vector<VehicleRow> vehicle_rows(const std::vector<ledger::BridgeRecord>& records) {
  std::vector<VehicleRow> rows;
  for (const ledger::BridgeRecord& r : records) {
    if (r.governing.empty()) {
      rows.push_back({&r, nullptr, nullptr});
      continue;
    }
    for (const ledger::GoverningRow& g : r.governing)
      // Postings are made at the operating level (MBE 6A.8.3).
      rows.push_back({&r, &g, g.level == "operating" ? posting_of(r, g.load_model_id) : nullptr});
  }
  return rows;
}

json units_json() {
  return {{"rating_factor", "dimensionless"},
          {"rating", "rating_unit of the row: ton (US short ton, 2000 lb) or tonne (tonne-force)"},
          {"posted_weight", "posting_unit of the row: ton or tonne"},
          {"station", "m"},
          {"dates", "ISO 8601 YYYY-MM-DD"}};
}

// The legal loads of a record in the order rated, for the B.EP items:
// legal and specialized hauling vehicles and emergency vehicles (legal on
// the Interstate under 23 U.S.C. 127 as the FHWA memorandum of 3 Nov 2016
// reads it; from memory), at the operating level.
std::vector<const ledger::GoverningRow*> legal_loads(const ledger::BridgeRecord& r) {
  std::vector<const ledger::GoverningRow*> out;
  for (const ledger::GoverningRow& g : r.governing)
    if (g.level == "operating" && (is_legal_category(g.category) || g.category == "emergency")) out.push_back(&g);
  return out;
}

// B.EP.03 posting type: the engine posts gross-weight limits only. The SNBI
// codes this item by a table; coding table per FHWA-HIF-22-017; verify
// against the agency's submittal.
std::string posting_type(const ledger::PostingRow* p) {
  if (p == nullptr) return "";
  if (p->status == "post") return "gross weight";
  if (p->status == "close") return "closed";
  return "";
}

std::string posting_value(const ledger::PostingRow* p) {
  return p && p->posted_weight ? number(*p->posted_weight, 1) : "";
}

// B.LR.08 routine permit loads: the permit vehicles rated and their
// factors, as plain text ("ID RF; ID RF"). Coding table per
// FHWA-HIF-22-017; verify against the agency's submittal.
std::string routine_permits(const ledger::BridgeRecord& r) {
  std::string out;
  for (const ledger::GoverningRow& g : r.governing)
    if (g.category == "permit") {
      if (!out.empty()) out += "; ";
      out += g.load_model_id + " " + snbi_rating_factor(g.rating_factor);
    }
  return out;
}

struct SnbiItems {
  // B.LR.01 design load and B.LR.02 design method describe the original
  // design, which the bridge format does not record: left blank.
  std::string lr01, lr02;
  std::string lr03, lr04, lr05, lr06, lr07, lr08;
  // B.PS.01 posting status, as the recommendation's plain value (none, post,
  // close). Coding table per FHWA-HIF-22-017; verify against the agency's
  // submittal.
  std::string ps01, ps02;
  struct Legal {
    std::string ep01, ep02, ep03, ep04;
  };
  std::vector<Legal> legal;
};

SnbiItems snbi_items(const ledger::BridgeRecord& r, const SnbiOptions& options) {
  SnbiItems s;
  const RecordHeadline h = record_headline(r);
  if (r.status != ledger::BridgeStatus::failed) {
    s.lr03 = snbi_date(r.rating_date);
    // B.LR.04 load rating method: the plain value (LRFR, LFR). Coding table
    // per FHWA-HIF-22-017; verify against the agency's submittal.
    s.lr04 = r.method;
    s.ps01 = r.recommendation;
  }
  if (h.inventory) s.lr05 = snbi_rating_factor(h.inventory->rating_factor);
  if (h.operating) s.lr06 = snbi_rating_factor(h.operating->rating_factor);
  if (h.legal) s.lr07 = snbi_rating_factor(h.legal->rating_factor);
  s.lr08 = routine_permits(r);
  if (auto it = options.posting_status_changed.find(r.structure_id); it != options.posting_status_changed.end())
    s.ps02 = snbi_date(it->second);
  for (const ledger::GoverningRow* g : legal_loads(r)) {
    const ledger::PostingRow* p = posting_of(r, g->load_model_id);
    // B.EP.01 legal load configuration: the load model id (the SNBI codes
    // configurations by a table; verify against the agency's submittal).
    s.legal.push_back({g->load_model_id, snbi_rating_factor(g->rating_factor), posting_type(p), posting_value(p)});
  }
  return s;
}

}  // namespace

std::string snbi_rating_factor(double rating_factor) {
  if (!std::isfinite(rating_factor) || rating_factor <= 0) return "0.00";
  if (rating_factor >= 99.99) return "99.99";
  // Cut to the hundredth below; the small allowance keeps a factor that is
  // a hundredth in decimal but just under it in binary (0.29) at its value.
  const double hundredths = std::floor(rating_factor * 100.0 + 1e-9);
  return fmt::format("{:.2f}", hundredths / 100.0);
}

std::string snbi_date(std::string_view iso) {
  // YYYY-MM-DD: digits at 0-3, 5-6, 8-9.
  if (iso.size() != 10 || iso[4] != '-' || iso[7] != '-') return "";
  std::string out;
  for (std::size_t i : {0u, 1u, 2u, 3u, 5u, 6u, 8u, 9u}) {
    if (iso[i] < '0' || iso[i] > '9') return "";
    out += iso[i];
  }
  return out;
}

std::string vehicles_csv(const ledger::RunInfo& run, const std::vector<ledger::BridgeRecord>& records) {
  std::string out = csv_line({"run_id",        "structure_id",  "name",           "bridge_status", "reason",
                              "method",        "load_model_id", "vehicle_name",   "category",      "level",
                              "rating_factor", "rating",        "rating_unit",    "girder_id",     "station_m",
                              "point",         "effect",        "limit_state",    "screened_out",  "posting_status",
                              "posted_weight", "posting_unit",  "recommendation", "rating_date",   "inputs_hash"});
  for (const VehicleRow& v : vehicle_rows(records)) {
    const ledger::BridgeRecord& r = *v.record;
    const ledger::GoverningRow* g = v.row;
    out += csv_line({std::to_string(run.id),
                     r.structure_id,
                     r.name,
                     std::string(ledger::to_string(r.status)),
                     r.reason,
                     r.method,
                     g ? g->load_model_id : "",
                     g ? g->name : "",
                     g ? g->category : "",
                     g ? g->level : "",
                     g ? number(g->rating_factor, 3) : "",
                     g && g->rating_weight ? number(*g->rating_weight, 1) : "",
                     g && g->rating_weight ? r.weight_unit : "",
                     g ? g->girder_id : "",
                     g ? number(g->station, 3) : "",
                     g ? g->point : "",
                     g ? g->effect : "",
                     g ? g->limit_state : "",
                     g ? (g->screened_out ? "yes" : "no") : "",
                     v.posting ? v.posting->status : "",
                     posting_value(v.posting),
                     v.posting && v.posting->posted_weight ? r.weight_unit : "",
                     r.recommendation,
                     r.rating_date,
                     r.inputs_hash});
  }
  return out;
}

json vehicles_json(const ledger::RunInfo& run, const std::vector<ledger::BridgeRecord>& records) {
  json rows = json::array();
  for (const VehicleRow& v : vehicle_rows(records)) {
    const ledger::BridgeRecord& r = *v.record;
    const ledger::GoverningRow* g = v.row;
    json row{{"run_id", run.id},
             {"structure_id", r.structure_id},
             {"name", r.name},
             {"bridge_status", std::string(ledger::to_string(r.status))},
             {"reason", r.reason},
             {"method", r.method},
             {"recommendation", r.recommendation},
             {"rating_date", r.rating_date},
             {"inputs_hash", r.inputs_hash},
             {"vehicle", nullptr}};
    if (g != nullptr)
      row["vehicle"] = {{"load_model_id", g->load_model_id},
                        {"name", g->name},
                        {"category", g->category},
                        {"level", g->level},
                        {"rating_factor", g->rating_factor},
                        {"rating", optional_number(g->rating_weight)},
                        {"rating_unit", g->rating_weight ? json(r.weight_unit) : json(nullptr)},
                        {"girder_id", g->girder_id},
                        {"station", g->station},
                        {"point", g->point},
                        {"effect", g->effect},
                        {"limit_state", g->limit_state},
                        {"screened_out", g->screened_out},
                        {"posting", v.posting ? json{{"status", v.posting->status},
                                                     {"posted_weight", optional_number(v.posting->posted_weight)},
                                                     {"posting_unit", r.weight_unit},
                                                     {"reason", v.posting->reason}}
                                              : json(nullptr)}};
    rows.push_back(std::move(row));
  }
  json doc{{"format", kExportFormat}, {"format_version", kExportFormatVersion},
           {"view", "vehicles"},      {"run", run_json(run)},
           {"units", units_json()},   {"rows", rows}};
  require_finite(doc, fmt::format("run {}", run.id), "export");
  return doc;
}

std::string snbi_csv(const ledger::RunInfo& run, const std::vector<ledger::BridgeRecord>& records,
                     const SnbiOptions& options) {
  std::vector<SnbiItems> items;
  std::size_t legal_columns = 0;
  for (const ledger::BridgeRecord& r : records) {
    items.push_back(snbi_items(r, options));
    legal_columns = std::max(legal_columns, items.back().legal.size());
  }
  std::vector<std::string> header{"run_id",  "structure_id", "name",    "bridge_status", "B.LR.01",
                                  "B.LR.02", "B.LR.03",      "B.LR.04", "B.LR.05",       "B.LR.06",
                                  "B.LR.07", "B.LR.08",      "B.PS.01", "B.PS.02",       "posting_unit"};
  // B.EP.01-04 repeat per legal load: suffix _1, _2, ... in the order rated.
  for (std::size_t k = 1; k <= legal_columns; ++k)
    for (const char* item : {"B.EP.01", "B.EP.02", "B.EP.03", "B.EP.04"})
      header.push_back(fmt::format("{}_{}", item, k));
  std::string out = csv_line(header);
  for (std::size_t i = 0; i < records.size(); ++i) {
    const ledger::BridgeRecord& r = records[i];
    const SnbiItems& s = items[i];
    std::vector<std::string> row{std::to_string(run.id),
                                 r.structure_id,
                                 r.name,
                                 std::string(ledger::to_string(r.status)),
                                 s.lr01,
                                 s.lr02,
                                 s.lr03,
                                 s.lr04,
                                 s.lr05,
                                 s.lr06,
                                 s.lr07,
                                 s.lr08,
                                 s.ps01,
                                 s.ps02,
                                 r.weight_unit};
    for (std::size_t k = 0; k < legal_columns; ++k) {
      const SnbiItems::Legal empty;
      const SnbiItems::Legal& l = k < s.legal.size() ? s.legal[k] : empty;
      for (const std::string* f : {&l.ep01, &l.ep02, &l.ep03, &l.ep04}) row.push_back(*f);
    }
    out += csv_line(row);
  }
  return out;
}

json snbi_json(const ledger::RunInfo& run, const std::vector<ledger::BridgeRecord>& records,
               const SnbiOptions& options) {
  json rows = json::array();
  for (const ledger::BridgeRecord& r : records) {
    const SnbiItems s = snbi_items(r, options);
    json legal = json::array();
    for (const SnbiItems::Legal& l : s.legal)
      legal.push_back({{"B.EP.01", l.ep01}, {"B.EP.02", l.ep02}, {"B.EP.03", l.ep03}, {"B.EP.04", l.ep04}});
    rows.push_back({{"structure_id", r.structure_id},
                    {"name", r.name},
                    {"bridge_status", std::string(ledger::to_string(r.status))},
                    {"posting_unit", r.weight_unit},
                    {"B.LR.01", s.lr01},
                    {"B.LR.02", s.lr02},
                    {"B.LR.03", s.lr03},
                    {"B.LR.04", s.lr04},
                    {"B.LR.05", s.lr05},
                    {"B.LR.06", s.lr06},
                    {"B.LR.07", s.lr07},
                    {"B.LR.08", s.lr08},
                    {"B.PS.01", s.ps01},
                    {"B.PS.02", s.ps02},
                    {"B.EP", legal}});
  }
  return {{"format", kExportFormat},
          {"format_version", kExportFormatVersion},
          {"view", "snbi"},
          {"run", run_json(run)},
          {"units",
           {{"rating_factor", "dimensionless, two decimals, 0.00 to 99.99 (FHWA-HIF-22-017)"},
            {"dates", "YYYYMMDD"},
            {"B.EP.04", "posting_unit of the row: ton or tonne"}}},
          {"rows", rows}};
}

}  // namespace tenthpoint::report
