// summarize_rating: the ledger's record of one rated bridge
// (engine/ledger/bridge_record.h) from its BridgeRating: identity, method,
// policy, dates, the governing rating per load model and level, the posting
// of every legal (and emergency) vehicle, the recommendation and deadlines.
//
// Units: ratings and posted weights in the bridge's posting unit (US: short
// ton of 2000 lb, "ton"; SI: tonne-force, "tonne"), stations in m, dates ISO
// 8601. The caller (the batch run) sets file, inputs_hash and status; this
// function leaves them at their defaults (status rated).
#pragma once

#include "engine/ledger/bridge_record.h"
#include "engine/model/bridge.h"
#include "engine/pipeline/bridge_rating.h"

namespace tenthpoint::pipeline {

[[nodiscard]] ledger::BridgeRecord summarize_rating(const model::Bridge& bridge, const BridgeRating& rating);

// "ton" for US bridges, "tonne" for SI ones (BridgeRecord::weight_unit).
[[nodiscard]] std::string_view posting_unit_name(units::UnitSystem system);

}  // namespace tenthpoint::pipeline
