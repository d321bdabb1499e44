// Service I data of a reinforced concrete section for permit loads: the
// tension steel stress under the permit is held to 0.9 fy (MBE 6A.5.4.2.2b,
// from memory), each load's steel stress taken on the cracked transformed
// section (elastic, textbook: straight-line stresses, concrete carries no
// tension):
//   compression zone b kd^2 / 2 = n As (d - kd)  (kd <= hf, or a rectangle),
//   or with the flange overhangs (b - bw) hf (kd - hf/2) + bw kd^2 / 2 when
//   kd > hf;
//   Icr about the neutral axis; fs = n M (d - kd) / Icr = M / Ss.
// The tension bars act at their centroid d (layers lumped); compression bars
// are neglected. n = Es / Ec of the beam concrete. Every load stage acts on
// the same section (a reinforced concrete beam is one stage). Units internal
// SI: lengths m, stresses Pa, Ss m^3.
#pragma once

#include <string>

#include "engine/capacity/calculation_trace.h"
#include "engine/capacity/concrete_flexure.h"
#include "engine/capacity/resistance.h"

namespace tenthpoint::capacity {

struct ReinforcedServiceLimits {
  ResistanceStatus status = ResistanceStatus::computed;  // computed or unavailable
  std::string reason;                                    // when unavailable
  Real allowable_stress = 0;                             // 0.9 fy, Pa
  Real modular_ratio = 0;                                // n = Es / Ec
  Real neutral_axis_depth = 0;                           // kd, m from the compression face
  Real cracked_inertia = 0;                              // Icr, m^4, in concrete units
  Real steel_section_modulus = 0;                        // Ss = Icr / (n (d - kd)), m^3: fs = M / Ss
  CalculationTrace trace;
};

// `section` as concrete_section_builder.h gives it for one sense of bending;
// `concrete_modulus` Ec of its compression concrete, Pa. Unavailable without
// tension bars.
[[nodiscard]] ReinforcedServiceLimits reinforced_service_limits(const ConcreteFlexureSection& section,
                                                                Real concrete_modulus);

}  // namespace tenthpoint::capacity
