// Internal to engine/io: the rules of a bridge record that JSON Schema cannot
// express (counts that depend on other fields, references between records,
// stations against the girder length, segment coverage), reported with the
// same precision as schema errors: file:line:col, field path, what was
// expected.
#pragma once

#include "engine/core/diagnostic.h"
#include "engine/io/yaml_node.h"
#include "engine/model/bridge.h"

namespace tenthpoint::io::detail {

// Appends every violation found in `bridge` (built from `root`) to
// `diagnostics`; errors for contradictions, warnings for gaps that still let
// a rating run (e.g. a girder without a given capacity somewhere).
void check_bridge(const model::Bridge& bridge, const YamlNode& root, Diagnostics& diagnostics);

}  // namespace tenthpoint::io::detail
