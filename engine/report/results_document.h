// The per-bridge results document (results.json, schemas/results.schema.json):
// everything a report needs to show and check one bridge's rating without
// re-running it: the inputs echo, the analysis points, the dead-load effects
// per component, per load model the static per-lane envelopes (the governing
// case's train, lane and combined values with the train's placement) and the
// distributed envelopes per girder after dynamic allowance, the distribution
// factors with their method and the dynamic allowance at every point, the
// capacities, the rating factor at every point per load model, level,
// effect and limit state, the governing values, the postings, the
// recommendation, the deadlines, the warnings and the caution text.
//
// Units: the bridge's own system (its `units`, US or SI), converted with
// engine/core/units.h from_internal, and named in the document's "units"
// table: stations and spans ft / m, moments kip-ft / kN-m, shears and axle
// weights kip / kN, stresses ksi / MPa (the capacity and terms of a service
// limit-state rating), vehicle weights, ratings and postings ton / tonne.
// Rating, distribution and impact factors are dimensionless. Signs as
// analysis::InfluenceLines (sagging moment positive; shear = resultant of
// the forces left of the cut, upward positive); capacities and the terms
// of a rating factor are magnitudes.
//
// The large tables (envelopes per effect and extreme, the ratings of a load
// model at a level) are columns: one array per field, entry i belonging to
// analysis point i (envelopes) or to rating i (ratings); cases are referred
// to by their index in the load model's "cases".
//
// Every number in the document is finite: results_document throws
// ModelError naming the bridge and the JSON path of the first NaN or
// infinity (see finite_numbers.h).
//
// Floating-point numbers are rounded to kResultsSignificantDigits
// significant digits, except in "governing" and "postings", which keep the
// rating factors, weights and terms that the ledger and summary hold at full
// precision.
#pragma once

#include <optional>
#include <string>

#include <nlohmann/json.hpp>

#include "engine/model/bridge.h"
#include "engine/pipeline/bridge_rating.h"

namespace tenthpoint::report {

// Where and when the rating was made, for the record.
struct ResultsContext {
  std::string engine_version;
  std::string inputs_hash;          // hex SHA-256 of the inputs (see engine/ledger/bridge_record.h)
  std::string source_file;          // the bridge file as given
  std::optional<long long> run_id;  // the ledger's run, when the rating belongs to one
  std::string run_time;             // ISO 8601 UTC date-time of the run, e.g. 2026-12-01T02:00:00Z
};

// The caution every results document and report carries.
inline constexpr const char* kCaution =
    "Results support, and never replace, the judgment of a licensed engineer; factors and vehicles follow the "
    "configured policy; local codes govern.";

// Format identifier and version of results.json.
inline constexpr const char* kResultsFormat = "tenthpoint-results";
inline constexpr int kResultsFormatVersion = 1;

// Significant digits of the rounded numbers of results.json. A rating
// engineer reads six (RF 0.8297, 3194.52 kip-ft); the seventh is a guard
// digit, so a value shown to six digits from the file is the value rounded
// from the engine's own result (except at an exact tie). Seven digits is a
// relative error of at most 5e-7, below the 1e-6 of the largest ordinate to
// which the influence lines are exact (DEVELOPERS.md, "Exact influence
// lines"), so no digit dropped carries information. A 17-digit number is
// 20 to 24 bytes of text, a 7-digit one at most 14.
inline constexpr int kResultsSignificantDigits = 7;

// `rating` must come from rate_bridge on `bridge` (its details fill the
// girder sections; a rating without details gives girders without points,
// envelopes or dead loads).
[[nodiscard]] nlohmann::json results_document(const model::Bridge& bridge, const pipeline::BridgeRating& rating,
                                              const ResultsContext& context);

}  // namespace tenthpoint::report
