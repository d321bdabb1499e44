#include "engine/capacity/capacity_options.h"

#include <cmath>

namespace tenthpoint::capacity {

bool CapacityOptions::is_valid(std::string* why) const {
  auto fail = [&](const char* message) {
    if (why != nullptr) *why = message;
    return false;
  };
  if (!resistance.is_valid(why)) return false;
  if (!(aggregate_size > 0) || !std::isfinite(aggregate_size)) return fail("aggregate size must be positive");
  if (!(density_factor > 0 && density_factor <= 1.0)) return fail("concrete density factor lambda must be in (0, 1]");
  // LRFD 6.10.8.2.3: Cb >= 1.0 (and at most 2.3 by 6.10.8.2.3-7).
  if (!(moment_gradient_factor >= 1.0 && moment_gradient_factor <= 2.3)) {
    return fail("moment gradient factor Cb must be in [1.0, 2.3]");
  }
  if (!prestressed_service.is_valid(why)) return false;
  return section.is_valid(why);
}

}  // namespace tenthpoint::capacity
