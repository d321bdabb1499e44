// The condition factor phi_c (MBE 6A.4.2.3) and system factor phi_s (MBE
// 6A.4.2.4) of a strength rating, each with where it came from, and their
// product held at the policy's lower limit (MBE 6A.4.2.1: phi_c phi_s >=
// 0.85 in the shipped policy).
//
// phi_c: the member-level value given in rating.condition_factor when set;
// else the policy's table row for the superstructure condition rating of the
// inspection in force on `as_of` (Bridge::latest_inspection). InputError
// when neither exists (no inspection on record and no given factor): the
// condition factor is never assumed.
// phi_s: for shear, the policy's shear value (1.0, MBE 6A.4.2.4); for
// moment, rating.system_factor when set, else the first policy rule that
// matches the bridge (material kind, total girder count, the largest girder
// spacing), else the policy's standard value.
// Neither factor is ever above 1.0 in MBE; the product limit is applied
// only from below.
#pragma once

#include <optional>
#include <string>

#include "engine/core/calendar_date.h"
#include "engine/core/numeric.h"
#include "engine/model/bridge.h"
#include "engine/model/policy.h"

namespace tenthpoint::capacity {

struct ConditionSystemFactors {
  Real condition = 1.0;  // phi_c
  std::string condition_source;
  Real system = 1.0;  // phi_s
  std::string system_source;
  Real product = 1.0;  // phi_c phi_s after the lower limit
  Real lower_limit = 0;
  bool lower_limit_applied = false;
  std::string product_source;
};

[[nodiscard]] ConditionSystemFactors condition_system_factors(const model::Bridge& bridge, const model::Policy& policy,
                                                              model::ForceEffect effect,
                                                              std::optional<CalendarDate> as_of);

}  // namespace tenthpoint::capacity
