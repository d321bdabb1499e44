// Flexural strength of a concrete section for Load Factor Rating (MBE 6B.5),
// by the load-factor design articles of the AASHTO Standard Specifications
// for Highway Bridges, 17th ed. (2002):
//  - reinforced concrete, 8.16.3: rectangular stress block of 0.85 f'c over
//    a = As fy / (0.85 f'c b) (8-17, 8-18); flanged sections with a > hf by
//    8-19 to 8-21; phi = 0.90 (8.16.1.2.2); beta1 per 8.16.2.7; a warning
//    when rho exceeds 0.75 rho_b (8.16.3.1.1);
//  - prestressed concrete, 9.17: fsu* = f's (1 - (gamma*/beta1)(rho* f's /
//    f'c)) (9-17), Mn = Aps fsu* d (1 - 0.6 rho* fsu* / f'c) (9-13) for a
//    rectangular section (hf >= 1.4 d rho* fsu* / f'c, 9.17.2), else the
//    flanged form 9-14/9-15; over-reinforced (rho* fsu*/f'c > 0.36 beta1,
//    9.18.1) by 9-20/9-21; phi = 1.0 (9.14). Mild tension bars beside the
//    strands are left out (conservative; said in the trace).
// Equation numbers are from memory of the 17th edition.
//
// The section comes in the same form as for the LRFD calculation
// (concrete_flexure.h, built by concrete_section_builder.h): described from
// its compression face. Units internal SI; the Standard Specifications state
// their formulas in psi and in, and the ratios used here are dimensionless,
// so only beta1's limits convert.
#pragma once

#include "engine/capacity/concrete_flexure.h"

namespace tenthpoint::capacity {

// beta1 of the Standard Specifications 8.16.2.7: 0.85 up to f'c = 4000 psi,
// less 0.05 per 1000 psi above, not below 0.65. Precondition: f'c > 0 (Pa).
[[nodiscard]] Real standard_spec_beta1(Real compressive_strength);

// Same preconditions and unavailable cases as concrete_flexure(). The
// result's effective_depth is d (the tension steel centroid), which the LFR
// shear calculation uses; shear_depth is d as well.
[[nodiscard]] ConcreteFlexure lfr_concrete_flexure(const ConcreteFlexureSection& section);

}  // namespace tenthpoint::capacity
