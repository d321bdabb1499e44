// The posting export (`tenthpoint export`): the rating factors and posting
// values of one run, for posting decisions, in two views, each as CSV or as
// JSON following schemas/export.schema.json.
//
// vehicles  one row per bridge x rating vehicle and level (the governing
//           rating of the load model over the girder lines): load model,
//           category, level, rating factor, rating (RF x W) with its unit,
//           girder, station (m), point, effect, limit state, screening,
//           posting status and posted weight (posting vehicles only), the
//           bridge's recommendation, rating date, inputs hash and run id.
//           A bridge that failed has one row with its status and reason and
//           no vehicle.
// snbi      one row per bridge, organised by the load-rating and posting
//           items of the Specifications for the National Bridge Inventory
//           (FHWA-HIF-22-017, 2022): B.LR.01-B.LR.08, B.PS.01-B.PS.02 and,
//           repeated per legal load, B.EP.01-B.EP.04. Rating factors to two
//           decimals within 0.00-99.99, dates YYYYMMDD. Where the SNBI
//           codes an item by a table whose exact codes the engine does not
//           carry, the plain value is written (see rating_export.cc).
//
// Units: the vehicles view states them per row (rating_unit, posting_unit:
// ton or tonne) and in the JSON "units" table; stations are metres.
#pragma once

#include <map>
#include <string>
#include <string_view>
#include <vector>

#include <nlohmann/json.hpp>

#include "engine/ledger/bridge_record.h"
#include "engine/ledger/ledger.h"

namespace tenthpoint::report {

inline constexpr const char* kExportFormat = "tenthpoint-export";
inline constexpr int kExportFormatVersion = 1;

[[nodiscard]] std::string vehicles_csv(const ledger::RunInfo& run, const std::vector<ledger::BridgeRecord>& records);
[[nodiscard]] nlohmann::json vehicles_json(const ledger::RunInfo& run,
                                           const std::vector<ledger::BridgeRecord>& records);

struct SnbiOptions {
  // B.PS.02, per structure id: the date (YYYY-MM-DD) its posting status last
  // changed, from the ledger's history; the item is left blank without it.
  std::map<std::string, std::string> posting_status_changed;
};

[[nodiscard]] std::string snbi_csv(const ledger::RunInfo& run, const std::vector<ledger::BridgeRecord>& records,
                                   const SnbiOptions& options = {});
[[nodiscard]] nlohmann::json snbi_json(const ledger::RunInfo& run, const std::vector<ledger::BridgeRecord>& records,
                                       const SnbiOptions& options = {});

// SNBI coding rules (FHWA-HIF-22-017, as in REFERENCE.md section 6):
// a rating factor recorded from 0 to 99.99 with two decimals, and a date as
// YYYYMMDD. The factor is cut (not rounded) to the hundredth below, so a
// reported factor never exceeds the computed one (0.996 is "0.99", not a
// "1.00" that would read as needing no posting; common practice).
[[nodiscard]] std::string snbi_rating_factor(double rating_factor);
// "2026-12-01" -> "20261201"; "" for an empty or malformed date.
[[nodiscard]] std::string snbi_date(std::string_view iso_date);

}  // namespace tenthpoint::report
