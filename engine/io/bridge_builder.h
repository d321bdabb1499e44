// Internal to engine/io: builds model::Bridge from a bridge document that
// has passed bridge.schema.json, converting every number to internal SI.
// Values the schema cannot vouch for (calendar dates) are checked here and
// reported into `diagnostics`.
#pragma once

#include "engine/core/diagnostic.h"
#include "engine/io/yaml_node.h"
#include "engine/model/bridge.h"

namespace tenthpoint::io::detail {

// Precondition: `root` conforms to bridge.schema.json.
[[nodiscard]] model::Bridge build_bridge(const YamlNode& root, Diagnostics& diagnostics);

}  // namespace tenthpoint::io::detail
