#include "engine/distribution/distribution_factor.h"

#include <fmt/format.h>

namespace tenthpoint::distribution {

std::string_view to_string(FactorMethod method) {
  switch (method) {
    case FactorMethod::equation:
      return "equation";
    case FactorMethod::lever_rule:
      return "lever rule";
    case FactorMethod::lesser_of:
      return "lesser of equation and lever rule";
    case FactorMethod::rigid_body:
      return "rigid body";
    case FactorMethod::strip:
      return "equivalent strip";
    case FactorMethod::override_value:
      return "override";
  }
  return "?";
}

std::string_view to_string(FactorRegion region) {
  switch (region) {
    case FactorRegion::positive_moment:
      return "positive moment";
    case FactorRegion::negative_moment:
      return "negative moment";
    case FactorRegion::shear:
      return "shear";
  }
  return "?";
}

const DistributionFactor* GirderLineFactors::find(FactorRegion region, int index) const {
  for (const auto& f : factors) {
    if (f.region == region && f.index == index) return &f;
  }
  return nullptr;
}

std::vector<std::string> GirderLineFactors::all_warnings() const {
  std::vector<std::string> out;
  for (const auto& f : factors) {
    const char* where = f.region == FactorRegion::negative_moment ? "support" : "span";
    for (const auto& w : f.warnings)
      out.push_back(fmt::format("{} {} {}: {}", to_string(f.region), where, f.index + 1, w));
  }
  return out;
}

}  // namespace tenthpoint::distribution
