// What the agency asks for when this bridge is rated.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "engine/core/calendar_date.h"
#include "engine/core/numeric.h"
#include "engine/core/source_location.h"
#include "engine/model/enums.h"

namespace tenthpoint::model {

// A distribution factor fixed by the engineer instead of computed, e.g. from
// a refined analysis. Lanes per girder, already including multiple presence.
struct DistributionOverride {
  std::string girder;  // girder-line id
  ForceEffect effect = ForceEffect::moment;
  Real value = 0;
  std::string reason;
  SourceLocation where;
};

struct RatingRequest {
  RatingMethod method = RatingMethod::lrfr;
  std::string vehicle_set;  // a set named in the policy; empty = the policy's default for the method
  std::string policy;       // policy file path, relative to the bridge file; empty = the shipped default
  std::vector<DistributionOverride> distribution_overrides;
  std::optional<Real> condition_factor;  // member-level phi_c given by the engineer (MBE 6A.4.2.3)
  std::optional<Real> system_factor;     // phi_s given by the engineer (MBE 6A.4.2.4)
  std::string riding_surface;            // a dynamic-allowance option named in the policy; empty = default
  std::optional<CalendarDate> as_of;     // rate with the inspection in force on this date
  SourceLocation where;
};

}  // namespace tenthpoint::model
