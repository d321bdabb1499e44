#include "engine/section/section_options.h"

#include <cmath>

namespace tenthpoint::section {

bool SectionOptions::is_valid(std::string* why) const {
  // K1 multiplies Ec; a non-positive value would give a zero or negative
  // modulus and so a singular stiffness.
  if (!(aggregate_factor > 0) || !std::isfinite(aggregate_factor)) {
    if (why != nullptr) *why = "aggregate_factor (K1) must be positive";
    return false;
  }
  return true;
}

}  // namespace tenthpoint::section
