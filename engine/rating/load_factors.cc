#include "engine/rating/load_factors.h"

#include <algorithm>
#include <set>

#include <fmt/format.h>

#include "engine/core/errors.h"
#include "engine/core/units.h"

namespace tenthpoint::rating {
namespace {

[[noreturn]] void missing(const std::string& what) {
  throw InputError(SourceLocation{"policy", 0, 0}, what, "the policy gives no factor for this case");
}

std::string adtt_text(std::optional<Real> adtt) { return adtt ? fmt::format("ADTT {:g}", *adtt) : "ADTT unknown"; }

// Linear interpolation in a sorted list of (x, y), clamped at both ends.
Real interpolate(const std::vector<std::pair<Real, Real>>& points, Real x) {
  if (x <= points.front().first) return points.front().second;
  if (x >= points.back().first) return points.back().second;
  for (std::size_t i = 1; i < points.size(); ++i) {
    if (x <= points[i].first) {
      const auto [x0, y0] = points[i - 1];
      const auto [x1, y1] = points[i];
      return x1 == x0 ? y1 : y0 + (y1 - y0) * (x - x0) / (x1 - x0);
    }
  }
  return points.back().second;
}

}  // namespace

std::string_view to_string(LimitState state) {
  switch (state) {
    case LimitState::strength_i:
      return "Strength I";
    case LimitState::strength_ii:
      return "Strength II";
    case LimitState::service_i:
      return "Service I";
    case LimitState::service_ii:
      return "Service II";
    case LimitState::service_iii:
      return "Service III";
  }
  return "Strength I";
}

LiveLoadFactor live_load_factor(const model::LrfrFactors& factors, model::VehicleCategory category,
                                model::RatingLevel level, LimitState state, std::optional<Real> adtt) {
  using model::VehicleCategory;
  const std::string level_name(model::to_string(level));
  switch (category) {
    case VehicleCategory::design:
    case VehicleCategory::lfr_design:
      // MBE Table 6A.4.2.2-1: design-load rating at inventory and operating.
      if (state == LimitState::strength_i)
        return {factors.design.at(level), fmt::format("policy lrfr.design.{} (MBE Table 6A.4.2.2-1)", level_name)};
      if (state == LimitState::service_ii)
        return {factors.service_ii.at(level),
                fmt::format("policy lrfr.service_ii.{} (MBE Table 6A.4.2.2-1)", level_name)};
      if (state == LimitState::service_iii)
        return {factors.service_iii, "policy lrfr.service_iii (MBE Table 6A.4.2.2-1)"};
      break;
    case VehicleCategory::legal:
    case VehicleCategory::specialized_hauling:
      // MBE 6A.4.4.2.3: legal loads at one level, gamma_LL by ADTT; Service II
      // for steel and (where rated) Service III for prestressed concrete take
      // the legal-load column of MBE Table 6A.4.2.2-1.
      if (state == LimitState::strength_i) {
        if (factors.legal.rows.empty()) missing("lrfr.legal");
        return {factors.legal.gamma_ll(adtt),
                fmt::format("policy lrfr.legal at {} (MBE Table 6A.4.4.2.3a-1)", adtt_text(adtt))};
      }
      if (state == LimitState::service_ii) {
        if (!factors.service_ii_legal) missing("lrfr.service_ii.legal");
        return {*factors.service_ii_legal, "policy lrfr.service_ii.legal (MBE Table 6A.4.2.2-1)"};
      }
      if (state == LimitState::service_iii) {
        if (!factors.service_iii_legal) missing("lrfr.service_iii.legal");
        return {*factors.service_iii_legal, "policy lrfr.service_iii.legal (MBE Table 6A.4.2.2-1)"};
      }
      break;
    case VehicleCategory::emergency:
      if (state == LimitState::strength_i)
        return {factors.emergency.gamma_ll, "policy lrfr.emergency (MBE 6A.4.4.2.3, EV provisions)"};
      if (state == LimitState::service_ii)
        return {factors.service_ii.operating, "policy lrfr.service_ii.operating (MBE Table 6A.4.2.2-1)"};
      break;
    case VehicleCategory::permit:
      // Strength II: see permit_live_load_factor (by permit type).
      if (state == LimitState::service_ii) {
        if (!factors.service_ii_permit) missing("lrfr.service_ii.permit");
        return {*factors.service_ii_permit, "policy lrfr.service_ii.permit (MBE Table 6A.4.2.2-1)"};
      }
      if (state == LimitState::service_i)
        return {factors.service_i_permit, "policy lrfr.service_i_permit (MBE Table 6A.4.2.2-1)"};
      break;
  }
  missing(fmt::format("{} at {} ({})", model::to_string(category), level_name, to_string(state)));
}

LiveLoadFactor permit_live_load_factor(const model::PermitType& permit, std::optional<Real> adtt, Real loading_ratio,
                                       Real unknown_adtt) {
  if (permit.rows.empty()) missing(fmt::format("lrfr.permit_types[{}]", permit.id));
  const Real a = adtt.value_or(unknown_adtt);
  // Interpolate in loading ratio at each tabulated ADTT, then in ADTT
  // (MBE Table 6A.4.5.4.2a-1 allows interpolation in both).
  std::set<Real> adtts;
  for (const model::PermitRow& r : permit.rows) adtts.insert(r.adtt);
  std::vector<std::pair<Real, Real>> by_adtt;
  for (Real level : adtts) {
    std::vector<std::pair<Real, Real>> by_ratio;
    for (const model::PermitRow& r : permit.rows)
      if (r.adtt == level) by_ratio.emplace_back(r.loading_ratio, r.gamma_ll);
    std::sort(by_ratio.begin(), by_ratio.end());
    by_adtt.emplace_back(level, interpolate(by_ratio, loading_ratio));
  }
  return {interpolate(by_adtt, a),
          fmt::format("policy permit type {} at {} and loading ratio {:.3g} kip/ft (MBE Table 6A.4.5.4.2a-1)",
                      permit.id, adtt_text(adtt), loading_ratio / units::kKipPerFoot)};
}

Real dead_load_factor_dw(const model::StrengthDeadLoadFactors& factors, bool field_measured) {
  return field_measured ? factors.dw_field_measured : factors.dw;
}

}  // namespace tenthpoint::rating
