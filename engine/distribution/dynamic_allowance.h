// The dynamic load allowance applied to truck (axle) effects.
//
// The caller multiplies static axle-load effects by (1 + IM) and never lane
// loads (AASHTO LRFD 3.6.2.1; in LFR the lane load of Std. Spec. 3.7.6 takes
// the same impact as the truck, see lfr_impact).
//
// LRFR: IM from the policy's dynamic_allowance for the bridge's
// rating.riding_surface (the standard value when it names none).
// LFR: I = 50 / (L + 125) <= 0.30 (Std. Spec. 3.8.2.1, from memory), the
// policy's lfr.impact, with L by effect (Std. Spec. 3.8.2.2, from memory):
//  - positive moment: the span;
//  - negative moment at an interior support: the mean of the two adjacent spans;
//  - shear at a station: the loaded length from the point to the far support
//    of its span, max(x - start, end - x), which is the span at either end.
// Lengths m, results fractions (0.33, not 33).
#pragma once

#include <string>

#include "engine/core/numeric.h"
#include "engine/model/bridge.h"
#include "engine/model/policy.h"

namespace tenthpoint::distribution {

struct ImpactValue {
  Real fraction = 0;  // IM or I
  Real length = 0;    // m, the L used (LFR); 0 for LRFR
  std::string basis;  // e.g. "riding surface smooth", "span 1", "mean of spans 1 and 2"
};

// Throws InputError at bridge.rating.where when the riding surface is not
// one the policy names.
[[nodiscard]] ImpactValue lrfr_dynamic_allowance(const model::Bridge& bridge, const model::Policy& policy);

// Span index from 0.
[[nodiscard]] ImpactValue lfr_impact_positive_moment(const model::Bridge& bridge, const model::Policy& policy,
                                                     int span);
// Interior support index 1 .. span count - 1.
[[nodiscard]] ImpactValue lfr_impact_negative_moment(const model::Bridge& bridge, const model::Policy& policy,
                                                     int support);
// `station` in m along the girder, within [0, total length].
[[nodiscard]] ImpactValue lfr_impact_shear(const model::Bridge& bridge, const model::Policy& policy, Real station);

}  // namespace tenthpoint::distribution
