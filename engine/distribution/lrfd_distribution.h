// AASHTO LRFD 4.6.2.2 and 4.6.2.3 live-load distribution factors for one
// girder line of a bridge: positive moment and shear per span, negative
// moment per interior support where the girder is continuous for live load.
//
// Rules (stated once here):
//  - L (LRFD Table C4.6.2.2.1-1, from memory): the span for positive moment
//    and shear; the mean of the two adjacent spans for negative moment.
//  - Kg: the section at mid-span (the positive-moment section, common
//    practice) for that span's positive moment and shear; for negative
//    moment the mean of the Kg of the two adjacent spans' mid-span sections.
//  - Interior girders: the equations of Tables 4.6.2.2.2b-1 and 4.6.2.2.3a-1.
//    Exterior girders: the lever rule for one lane, e times the interior
//    factor for two or more (4.6.2.2.2d-1, 4.6.2.2.3b-1); with diaphragms on
//    a steel bridge, not less than the rigid-body reaction (4.6.2.2.2d-1).
//  - Nb = 3: the lesser of the equation and the lever rule, lane case by
//    lane case. Nb < 3, Kg unknown, or any parameter outside the range of
//    applicability: the lever rule, with a warning.
//  - The lever rule and rigid-body values carry m from the options; the
//    equations carry m inside them.
//  - Skew (Tables 4.6.2.2.2e-1, 4.6.2.2.3c-1) multiplies the computed
//    one- and multi-lane values, whatever the method, when Kg is known.
//  - Slab bridges (reinforced concrete, a rectangular rc_beam without deck
//    whose width equals the girder line's spacing: a design strip): LRFD
//    4.6.2.3 equivalent strips, factor = strip width / E. The edge-to-edge
//    width W is the girder count times the spacing.
//  - An override in bridge.rating.distribution_overrides for the girder and
//    effect replaces the computed value for every region; the computed one
//    is kept beside it.
#pragma once

#include "engine/distribution/distribution_factor.h"
#include "engine/distribution/distribution_options.h"
#include "engine/model/bridge.h"

namespace tenthpoint::distribution {

// Precondition: options.is_valid(). Throws InputError for a girder line
// whose sections cannot be resolved (see section::GirderSectionProfile).
[[nodiscard]] GirderLineFactors lrfd_distribution(const model::Bridge& bridge, const model::GirderLine& girder,
                                                  const DistributionOptions& options);

}  // namespace tenthpoint::distribution
