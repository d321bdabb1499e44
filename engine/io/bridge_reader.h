// Reads one bridge file into model::Bridge (internal SI), or reports every
// problem in it. The stages, each reporting all it finds:
//   1. the text: size, encoding, YAML syntax, hostile structure (yaml_parser.h);
//   2. the format: schemas/bridge.schema.json (schema_validator.h);
//   3. the rules the schema cannot state: support and continuity counts,
//      stations inside the girder, segment coverage, references between
//      records, dates (bridge_checks.h);
//   4. plausibility: legal but implausible magnitudes, as warnings
//      (plausibility_bounds.h).
// A stage runs only when the ones before it found no error, so one slip does
// not cascade into a page of consequences.
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include "engine/core/diagnostic.h"
#include "engine/io/schema_validator.h"
#include "engine/io/yaml_parser.h"
#include "engine/model/bridge.h"

namespace tenthpoint::io {

struct BridgeReadOptions {
  YamlLimits limits;
  SchemaValidationOptions validation;
  bool plausibility_warnings = true;
};

struct BridgeReadResult {
  std::optional<model::Bridge> bridge;  // set exactly when diagnostics hold no error
  Diagnostics diagnostics;              // errors and warnings in file order

  [[nodiscard]] bool ok() const { return bridge.has_value(); }
};

// Reads, validates and builds the bridge in `path`; locations name `path`.
[[nodiscard]] BridgeReadResult read_bridge_file(const std::string& path, const BridgeReadOptions& options = {});

// The same for text already in memory; `file` labels the locations.
[[nodiscard]] BridgeReadResult read_bridge_text(std::string_view text, const std::string& file,
                                                const BridgeReadOptions& options = {});

// As read_bridge_file, but throws InputError (holding every diagnostic) when
// the file has errors. Warnings are appended to `warnings` when given.
[[nodiscard]] model::Bridge load_bridge(const std::string& path, Diagnostics* warnings = nullptr,
                                        const BridgeReadOptions& options = {});

}  // namespace tenthpoint::io
