// Internal values written back in a file's own units, for messages such as
// "gap of 2 ft between segments [0] and [1]".
#pragma once

#include <string>

#include "engine/core/numeric.h"
#include "engine/core/units.h"

namespace tenthpoint::io {

// `value` (internal SI) in the user unit of `quantity`, to 6 significant
// digits, with its label: "54 ft", "345 MPa", "0.25" (dimensionless).
[[nodiscard]] std::string format_quantity(Real value, units::Quantity quantity, units::UnitSystem system);

// A plain number to 6 significant digits without trailing zeros: "54", "0.0625".
[[nodiscard]] std::string format_number(Real value);

}  // namespace tenthpoint::io
