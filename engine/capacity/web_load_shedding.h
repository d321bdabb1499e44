// The web load-shedding factor Rb of AASHTO LRFD 6.10.1.10.2: the share of
// the compression flange's yield stress a slender web lets it reach once the
// web has buckled in bending.
//   Rb = 1.0 when 2 Dc / tw <= lambda_rw = 5.7 sqrt(E / Fyc) (6.10.1.10.2-2, -4);
//   otherwise Rb = 1 - awc / (1200 + 300 awc) (2 Dc / tw - lambda_rw) <= 1.0
//   (6.10.1.10.2-3), awc = 2 Dc tw / (bfc tfc) (6.10.1.10.2-5).
// (A section composite in positive flexure whose web satisfies D/tw <= 150
// also has Rb = 1.0; the caller applies that case.) Homogeneous girders only
// (Rh = 1.0). Lengths m, stresses Pa.
#pragma once

#include "engine/capacity/calculation_trace.h"
#include "engine/core/numeric.h"

namespace tenthpoint::capacity {

struct WebLoadShedding {
  Real factor = 1.0;           // Rb
  Real web_slenderness = 0;    // 2 Dc / tw
  Real slenderness_limit = 0;  // lambda_rw
  Real area_ratio = 0;         // awc
};

// Preconditions: web_thickness, flange width and thickness, yield and
// modulus positive; compression_depth (Dc) >= 0. Adds its steps to `trace`.
[[nodiscard]] WebLoadShedding web_load_shedding(Real compression_depth, Real web_thickness, Real flange_width,
                                                Real flange_thickness, Real flange_yield, Real modulus,
                                                CalculationTrace& trace);

}  // namespace tenthpoint::capacity
