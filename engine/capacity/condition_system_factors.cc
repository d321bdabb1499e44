#include "engine/capacity/condition_system_factors.h"

#include <algorithm>

#include <fmt/format.h>

#include "engine/core/errors.h"

namespace tenthpoint::capacity {
namespace {

bool rule_matches(const model::SystemFactorRule& rule, const model::Bridge& bridge) {
  if (!rule.materials.empty() &&
      std::find(rule.materials.begin(), rule.materials.end(), bridge.materials.kind) == rule.materials.end()) {
    return false;
  }
  const int girders = bridge.girder_count();
  if (rule.min_girders && girders < *rule.min_girders) return false;
  if (rule.max_girders && girders > *rule.max_girders) return false;
  if (rule.max_spacing) {
    // Spacings read from feet carry round-off; a micrometre decides nothing.
    constexpr Real kTolerance = 1e-6;
    for (const model::GirderLine& g : bridge.girders)
      if (g.spacing > *rule.max_spacing + kTolerance) return false;
  }
  return true;
}

}  // namespace

ConditionSystemFactors condition_system_factors(const model::Bridge& bridge, const model::Policy& policy,
                                                model::ForceEffect effect, std::optional<CalendarDate> as_of) {
  ConditionSystemFactors out;
  if (bridge.rating.condition_factor) {
    out.condition = *bridge.rating.condition_factor;
    out.condition_source = "rating.condition_factor given by the engineer (MBE 6A.4.2.3)";
  } else {
    const model::Inspection* inspection = bridge.latest_inspection(as_of);
    if (inspection == nullptr) {
      throw InputError(bridge.rating.where, "rating.condition_factor",
                       as_of ? fmt::format("no inspection on or before {} to take the superstructure condition from; "
                                           "give rating.condition_factor",
                                           as_of->to_iso())
                             : std::string("no inspection on record to take the superstructure condition from; give "
                                           "rating.condition_factor"));
    }
    const int rating = inspection->superstructure_condition;
    const std::optional<Real> phi = policy.condition_factor(rating);
    if (!phi) {
      throw InputError(
          inspection->where, "superstructure",
          fmt::format("condition rating {} is not in the condition-factor table of policy {}", rating, policy.id));
    }
    out.condition = *phi;
    out.condition_source = fmt::format(
        "policy {} condition-factor table (MBE 6A.4.2.3), superstructure condition {} of the inspection of {}",
        policy.id, rating, inspection->date.to_iso());
  }

  if (effect == model::ForceEffect::shear) {
    out.system = policy.system_factor.shear;
    out.system_source = fmt::format("policy {} system factor for shear (MBE 6A.4.2.4)", policy.id);
  } else if (bridge.rating.system_factor) {
    out.system = *bridge.rating.system_factor;
    out.system_source = "rating.system_factor given by the engineer (MBE 6A.4.2.4)";
  } else {
    out.system = policy.system_factor.standard;
    out.system_source = fmt::format("policy {} standard system factor (MBE 6A.4.2.4)", policy.id);
    for (const model::SystemFactorRule& rule : policy.system_factor.rules) {
      if (!rule_matches(rule, bridge)) continue;
      out.system = rule.phi_s;
      out.system_source = fmt::format("policy {} rule {}: {}", policy.id, rule.id, rule.source);
      break;
    }
  }

  out.lower_limit = policy.minimum_condition_system_product;
  const Real product = out.condition * out.system;
  if (product < out.lower_limit) {
    out.product = out.lower_limit;
    out.lower_limit_applied = true;
    out.product_source =
        fmt::format("phi_c phi_s = {:.4f} raised to the lower limit {:.2f} of policy {} (MBE 6A.4.2.1)", product,
                    out.lower_limit, policy.id);
  } else {
    out.product = product;
    out.product_source = fmt::format("phi_c phi_s = {:.4f} (not below the lower limit {:.2f} of policy {})", product,
                                     out.lower_limit, policy.id);
  }
  return out;
}

}  // namespace tenthpoint::capacity
