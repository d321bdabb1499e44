#include "engine/capacity/concrete_stress_block.h"

#include <algorithm>
#include <cassert>

#include "engine/core/units.h"

namespace tenthpoint::capacity {

ConcreteStressBlock concrete_stress_block(Real compressive_strength) {
  assert(compressive_strength > 0);
  const Real fc_ksi = compressive_strength / units::kKsi;
  ConcreteStressBlock block;
  // AASHTO LRFD 5.6.2.2: beta1 0.85 up to 4.0 ksi, -0.05 per ksi, >= 0.65.
  block.beta1 = std::clamp(0.85 - 0.05 * (fc_ksi - 4.0), 0.65, 0.85);
  // AASHTO LRFD 5.6.2.2 (8th ed. on): alpha1 0.85 up to 10.0 ksi, -0.02 per ksi, >= 0.75.
  block.alpha1 = std::clamp(0.85 - 0.02 * (fc_ksi - 10.0), 0.75, 0.85);
  return block;
}

}  // namespace tenthpoint::capacity
