// Load Factor Rating distribution (AASHTO Standard Specifications 17th ed.,
// 2002, Table 3.23.1 and 3.23.2.3.1; from memory, see REFERENCE.md §2):
// wheel lines per girder, and lanes (= wheel lines / 2, one wheel line being
// half a truck), for one girder line.
//
// Rules (stated once here):
//  - Interior girders, S/D wheel lines with D by the deck type (from memory):
//      concrete deck on steel or prestressed beams  S/7.0 one lane, S/5.5 more;
//        lever rule beyond S = 10 ft and 14 ft respectively;
//      cast-in-place concrete T-beams             S/6.5 and S/6.0, beyond 6 and 10 ft;
//      concrete box girders                        S/8.0 and S/7.0, beyond 12 and 16 ft.
//    Precast boxes (a prestressed shape named "box") are taken as box
//    girders, with a warning: adjacent boxes belong to Std. Spec. 3.23.4.
//  - Exterior girders: the lever rule (Std. Spec. 3.23.2.3.1), wheel
//    placement as in the options, no multiple presence; the several-lane
//    value takes the lane reduction of Std. Spec. 3.12.1 from the options.
//  - Shear uses the moment fraction (Std. Spec. 3.23.1.2 asks for the lever
//    rule for the wheel at the end; not applied here, noted in the warnings).
//  - L plays no part, so there is one factor per effect for the whole girder
//    line (DistributionFactor::index 0, region positive_moment or shear).
//  - Overrides in bridge.rating.distribution_overrides (lanes per girder)
//    win, as for LRFD.
//  - Slab strips (see lrfd_distribution.h): Std. Spec. 3.24.3.2 (from
//    memory), one wheel load over E = 4 + 0.06 S <= 7 ft, S the span in ft,
//    so lanes per strip = strip width / (2 E).
#pragma once

#include "engine/distribution/distribution_factor.h"
#include "engine/distribution/distribution_options.h"
#include "engine/model/bridge.h"

namespace tenthpoint::distribution {

struct LfrGirderFactors {
  std::string girder;
  // value, one_lane and multi_lane are lanes per girder; wheel lines are twice these.
  DistributionFactor moment;
  DistributionFactor shear;

  [[nodiscard]] Real moment_wheel_lines() const { return 2.0 * moment.value; }
  [[nodiscard]] Real shear_wheel_lines() const { return 2.0 * shear.value; }
};

// Precondition: options.is_valid().
[[nodiscard]] LfrGirderFactors lfr_distribution(const model::Bridge& bridge, const model::GirderLine& girder,
                                                const DistributionOptions& options);

}  // namespace tenthpoint::distribution
