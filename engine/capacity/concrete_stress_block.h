// The equivalent rectangular stress block of AASHTO LRFD 5.6.2.2: a uniform
// stress alpha1 f'c over a depth a = beta1 c from the compression face.
// The article states its limits in ksi; this converts from internal Pa.
#pragma once

#include "engine/core/numeric.h"

namespace tenthpoint::capacity {

struct ConcreteStressBlock {
  Real alpha1 = 0.85;  // stress factor
  Real beta1 = 0.85;   // depth factor
};

// alpha1 = 0.85 for f'c <= 10 ksi, less 0.02 per ksi above, not below 0.75;
// beta1 = 0.85 for f'c <= 4 ksi, less 0.05 per ksi above, not below 0.65
// (LRFD 5.6.2.2). Precondition: compressive_strength > 0 (Pa).
[[nodiscard]] ConcreteStressBlock concrete_stress_block(Real compressive_strength);

}  // namespace tenthpoint::capacity
