// Magnitudes that are legal but implausible, most often a unit slip (a yield
// stress in psi in a ksi file, a span in inches). They draw a warning, not an
// error: the record may be right, and the engineer decides. The bounds live
// in one table (plausibility_bounds.cc), each with its reason.
#pragma once

#include <span>
#include <string_view>

#include "engine/core/diagnostic.h"
#include "engine/core/numeric.h"
#include "engine/core/units.h"
#include "engine/io/yaml_node.h"

namespace tenthpoint::io {

struct PlausibilityBound {
  std::string_view field;  // field pattern; "[]" stands for every item: "geometry.spans[]"
  std::string_view what;   // what the value is, for the message: "span length"
  units::Quantity quantity;
  Real low_us;  // plausible range in US units of `quantity` (ft, in, ksi, ...)
  Real high_us;
  std::string_view reason;  // why the range, and its source
};

// The table, in the order the checks run.
[[nodiscard]] std::span<const PlausibilityBound> plausibility_bounds();

// Warnings for every value of a bridge document outside its bound, naming the
// likely unit slip when a factor brings it into range ("looks like psi;
// expected ksi"), plus a check that given section properties imply a
// sensible depth. `root` must have passed bridge.schema.json.
void check_plausibility(const YamlNode& root, units::UnitSystem system, Diagnostics& diagnostics);

}  // namespace tenthpoint::io
