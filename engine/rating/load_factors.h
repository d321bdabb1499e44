// Live-load factors for LRFR by what is rated, from the policy's tables
// (MBE Tables 6A.4.2.2-1, 6A.4.4.2.3a-1, 6A.4.5.4.2a-1), and the dead-load
// factors of the strength limit state.
#pragma once

#include <optional>
#include <string>

#include "engine/core/numeric.h"
#include "engine/model/policy.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::rating {

enum class LimitState { strength_i, strength_ii, service_i, service_ii, service_iii };

[[nodiscard]] std::string_view to_string(LimitState state);

struct LiveLoadFactor {
  Real gamma_ll = 0;
  std::string source;  // e.g. "policy lrfr.legal, ADTT 2400 interpolated"
};

// gamma_LL for a load model of `category` rated at `level` in `state`, for a
// bridge with `adtt` (nullopt = unknown). Legal loads and specialized
// hauling vehicles use the ADTT table at Strength I and the policy's legal
// Service II / III factors; emergency vehicles the policy's EV factor; design
// loads the design (or Service II / III) factors; permits their Service II
// and Service I factors. Strength II of permits is not handled here (its
// factor depends on the permit type and the loading ratio: see
// permit_live_load_factor). Throws InputError when the policy has no factor
// for the case.
[[nodiscard]] LiveLoadFactor live_load_factor(const model::LrfrFactors& factors, model::VehicleCategory category,
                                              model::RatingLevel level, LimitState state, std::optional<Real> adtt);

// MBE Table 6A.4.5.4.2a-1 as the policy gives it: rows of (ADTT, loading
// ratio, gamma_LL) for one permit type, interpolated linearly in ADTT and in
// the loading ratio (N/m: gross weight over axle-group length), clamped at the
// table's edges. Throws InputError when the type has no rows.
[[nodiscard]] LiveLoadFactor permit_live_load_factor(const model::PermitType& permit, std::optional<Real> adtt,
                                                     Real loading_ratio, Real unknown_adtt);

// gamma_DW of Strength I: the field-measured value when the wearing surface
// thickness was measured (MBE Table 6A.4.2.2-1 note).
[[nodiscard]] Real dead_load_factor_dw(const model::StrengthDeadLoadFactors& factors, bool field_measured);

}  // namespace tenthpoint::rating
