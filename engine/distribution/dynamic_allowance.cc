#include "engine/distribution/dynamic_allowance.h"

#include <algorithm>
#include <cassert>

#include <fmt/format.h>

#include "engine/core/errors.h"

namespace tenthpoint::distribution {

ImpactValue lrfr_dynamic_allowance(const model::Bridge& bridge, const model::Policy& policy) {
  const std::string& surface = bridge.rating.riding_surface;
  const auto im = policy.dynamic_allowance.for_surface(surface);
  if (!im) {
    throw InputError(bridge.rating.where, "rating.riding_surface",
                     fmt::format("'{}' is not a riding surface of policy {}", surface, policy.id));
  }
  // LRFD 3.6.2.1 and MBE C6A.4.4.3: the policy's standard IM or a named surface option.
  return {*im, 0.0, surface.empty() ? std::string("standard") : "riding surface " + surface};
}

ImpactValue lfr_impact_positive_moment(const model::Bridge& bridge, const model::Policy& policy, int span) {
  const auto& spans = bridge.geometry.span_lengths;
  assert(span >= 0 && static_cast<std::size_t>(span) < spans.size());
  const Real l = spans[static_cast<std::size_t>(span)];
  return {policy.lfr.impact.at(l), l, fmt::format("span {}", span + 1)};
}

ImpactValue lfr_impact_negative_moment(const model::Bridge& bridge, const model::Policy& policy, int support) {
  const auto& spans = bridge.geometry.span_lengths;
  assert(support >= 1 && static_cast<std::size_t>(support) < spans.size());
  const auto k = static_cast<std::size_t>(support);
  // Std. Spec. 3.8.2.2 (from memory): the average of the two adjacent spans.
  const Real l = 0.5 * (spans[k - 1] + spans[k]);
  return {policy.lfr.impact.at(l), l, fmt::format("mean of spans {} and {}", support, support + 1)};
}

ImpactValue lfr_impact_shear(const model::Bridge& bridge, const model::Policy& policy, Real station) {
  const auto& spans = bridge.geometry.span_lengths;
  assert(!spans.empty());
  std::size_t i = 0;
  while (i + 1 < spans.size() && station > bridge.geometry.support_station(i + 1)) ++i;
  const Real start = bridge.geometry.support_station(i);
  const Real end = bridge.geometry.support_station(i + 1);
  // Std. Spec. 3.8.2.2 (from memory): the loaded portion from the point to the far reaction.
  const Real l = std::clamp(std::max(station - start, end - station), 0.0, end - start);
  return {policy.lfr.impact.at(l), l, fmt::format("loaded length in span {}", i + 1)};
}

}  // namespace tenthpoint::distribution
