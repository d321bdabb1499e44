// BridgeRecord: what the ledger keeps of one bridge in one run, as plain
// data. It is the common currency of the nightly run: the batch run builds
// it from a BridgeRating (pipeline::summarize_rating), the ledger stores and
// reads it, and the summary files and the posting export are written from it.
//
// Units: ratings and posted weights are in the bridge's posting unit
// (`weight_unit`: "ton" = short ton of 2000 lb for US bridges, "tonne" =
// metric tonne-force for SI bridges), stations in metres. Rating factors are
// dimensionless. Dates are ISO 8601 (YYYY-MM-DD) strings.
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/core/name_table.h"

namespace tenthpoint::ledger {

// A run's number in its ledger: 1, 2, ... in the order runs were begun (a
// merge renumbers the shards' runs in the order they started).
using RunId = std::int64_t;

enum class BridgeStatus {
  rated,      // rated in this run
  unchanged,  // inputs hash equal to its last rating: carried forward, not recomputed
  failed,     // could not be read or rated; `reason` says why
};

inline constexpr NameTable<BridgeStatus, 3> kBridgeStatusNames{{
    {BridgeStatus::rated, "rated"},
    {BridgeStatus::unchanged, "unchanged"},
    {BridgeStatus::failed, "failed"},
}};
// The ledger's (and the summary files') spelling of a status.
[[nodiscard]] constexpr std::string_view to_string(BridgeStatus s) { return name_of(kBridgeStatusNames, s); }
[[nodiscard]] constexpr std::optional<BridgeStatus> parse_bridge_status(std::string_view text) {
  return value_of(kBridgeStatusNames, text);
}

// The governing rating of one load model at one level over the girder lines.
struct GoverningRow {
  std::string load_model_id;  // e.g. "HL-93", "TYPE-3S2"
  std::string name;
  std::string category;  // design, legal, specialized_hauling, permit, emergency, lfr_design
  std::string level;     // inventory or operating
  double rating_factor = 0;
  std::optional<double> rating_weight;  // RF x W in weight_unit; none for lane-type loads
  std::string girder_id;
  double station = 0;  // m from the start of the bridge
  std::string point;   // e.g. "span 2 @ 0.4"
  std::string effect;  // positive_moment, negative_moment, shear
  std::string limit_state;
  bool screened_out = false;

  friend bool operator==(const GoverningRow&, const GoverningRow&) = default;
};

// The posting of one legal (or emergency) vehicle.
struct PostingRow {
  std::string load_model_id;
  double rating_factor = 0;
  std::string status;                   // none, post, close
  std::optional<double> posted_weight;  // in weight_unit, when status == "post"
  std::string reason;

  friend bool operator==(const PostingRow&, const PostingRow&) = default;
};

struct BridgeRecord {
  std::string structure_id;  // may be empty when the file could not be read
  std::string name;
  std::string file;         // the bridge file as given on the command line
  std::string inputs_hash;  // hex SHA-256 over the bridge file, its policy and vehicle files, the engine version
  BridgeStatus status = BridgeStatus::rated;
  std::string reason;  // for failed: the first error, file:line: field: message

  std::string method;  // lrfr or lfr
  std::string policy_id;
  std::string policy_version;
  std::string edition;
  std::string vehicle_set;
  std::string rating_date;  // YYYY-MM-DD
  std::optional<std::string> inspection_date;
  std::string weight_unit;  // ton or tonne

  std::vector<GoverningRow> governing;
  std::vector<PostingRow> postings;
  std::string recommendation;  // none, post, close
  std::string recommendation_reason;
  std::optional<std::string> rerate_by;
  std::optional<std::string> post_by;
  int warning_count = 0;

  // For an unchanged record: the run whose rating it carries (set by
  // Ledger::carry_forward; none for rated and failed records).
  std::optional<RunId> carried_from;

  friend bool operator==(const BridgeRecord&, const BridgeRecord&) = default;
};

}  // namespace tenthpoint::ledger
