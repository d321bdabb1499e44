// Capacities given by the user for a region of the girder, for instance
// carried over from an earlier rating. Resistances are factored (phi applied,
// but not the condition and system factors phi_c, phi_s, which the rating
// applies). Moments are N*m magnitudes (positive numbers), shears N.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/core/source_location.h"
#include "engine/model/enums.h"

namespace tenthpoint::model {

enum class CapacitySource { given, computed };

// Spellings "given" / "computed", as in bridge files (parse<CapacitySource> in enum_names.cc).
std::string_view to_string(CapacitySource v);

struct GivenCapacity {
  std::vector<std::string> girders;  // girder-line ids; empty = all
  Real start = 0;                    // m; start == end names a single point
  Real end = 0;                      // m
  std::optional<Real> moment_positive;  // phi*Mn+, N*m
  std::optional<Real> moment_negative;  // phi*Mn-, N*m (magnitude)
  std::optional<Real> shear;            // phi*Vn, N
  std::string source;                   // where the numbers came from, e.g. "1994 rating by district office"
  SourceLocation where;
};

struct CapacityInput {
  CapacitySource mode = CapacitySource::given;
  std::vector<GivenCapacity> given;
};

}  // namespace tenthpoint::model
