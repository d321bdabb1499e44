// Service II permanent-deformation limits for steel flanges, AASHTO LRFD
// 6.10.4.2.2, in the form a rating needs: the limit stress fR of each flange
// and the section moduli each load stage's stress is computed with, so that
// RF = (fR - fDC1 - fDC2,DW) / fLL with f = M / S per stage.
//  - composite sections: top flange ff <= 0.95 Rh Fyf (6.10.4.2.2-1), bottom
//    flange ff + fl/2 <= 0.95 Rh Fyf (-2);
//  - non-composite sections: both flanges ff + fl/2 <= 0.80 Rh Fyf (-3);
// with Rh = 1.0 (homogeneous) and fl = 0.
// Stage sections: positive flexure noncomposite / long-term / short-term.
// Negative flexure of a composite girder: the same uncracked sections when
// `uncracked_negative` (LRFD 6.10.4.2.1 allows the deck as effective in
// negative flexure at Service II for members with shear connectors along
// their length and the 1 % deck steel of 6.10.1.7, from memory), else the
// cracked section (steel plus deck bars) for DC2, DW and LL.
// The web bend-buckling check of 6.10.4.2.2-4 is not included. Stresses Pa.
#pragma once

#include <string>
#include <vector>

#include "engine/capacity/calculation_trace.h"
#include "engine/capacity/resistance.h"
#include "engine/capacity/stage_moduli.h"
#include "engine/core/numeric.h"
#include "engine/section/section_stages.h"

namespace tenthpoint::capacity {

struct SteelServiceLimits {
  ResistanceStatus status = ResistanceStatus::computed;  // computed or unavailable
  std::string reason;                                    // when unavailable
  std::vector<std::string> warnings;
  Real top_flange = 0;     // fR, Pa, limit on the top flange stress (magnitude)
  Real bottom_flange = 0;  // fR, Pa, limit on the bottom flange stress (magnitude)
  StageModuli positive_moment;
  StageModuli negative_moment;
  CalculationTrace trace;
};

// Precondition: flange_yield > 0.
[[nodiscard]] SteelServiceLimits steel_service_limits(Real flange_yield, const section::SectionStages& stages,
                                                      bool uncracked_negative);

}  // namespace tenthpoint::capacity
