// Reads a vehicle library (schemas/vehicles.schema.json) into
// model::VehicleLibrary, converting to internal SI, or reports every problem:
// the schema's, then the rules it cannot state (one spacing fewer than the
// axles, [min, max] ranges in order, cases naming trains that exist, a gap
// for every multi-train case, unique ids, a rating weight that matches its
// truck).
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include "engine/core/diagnostic.h"
#include "engine/io/yaml_node.h"
#include "engine/io/yaml_parser.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::io {

struct VehicleReadOptions {
  YamlLimits limits;
};

struct VehicleReadResult {
  std::optional<model::VehicleLibrary> library;  // set exactly when diagnostics hold no error
  Diagnostics diagnostics;

  [[nodiscard]] bool ok() const { return library.has_value(); }
};

[[nodiscard]] VehicleReadResult read_vehicle_file(const std::string& path, const VehicleReadOptions& options = {});
[[nodiscard]] VehicleReadResult read_vehicle_text(std::string_view text, const std::string& file,
                                                  const VehicleReadOptions& options = {});
// A library compiled into the engine by name ("aashto").
[[nodiscard]] VehicleReadResult read_shipped_vehicles(std::string_view name = "aashto",
                                                      const VehicleReadOptions& options = {});

namespace detail {

// Validates and builds a parsed vehicles document. Trains named by cases may
// also come from `known` (libraries loaded before). `field_prefix` is put in
// front of every field path (a policy's inline vehicles report as
// "vehicles.inline.axle_trains[0]...").
[[nodiscard]] VehicleReadResult read_vehicle_document(const YamlNode& document,
                                                      const model::VehicleLibrary* known = nullptr,
                                                      std::string_view field_prefix = "");

}  // namespace detail
}  // namespace tenthpoint::io
