#include "engine/model/policy.h"
#include "engine/core/name_table.h"

#include <algorithm>
#include <array>
#include <cassert>
#include <utility>

namespace tenthpoint::model {
namespace {

constexpr NameTable<RatingLevel, 2> kRatingLevel{
    {{RatingLevel::inventory, "inventory"}, {RatingLevel::operating, "operating"}}};
constexpr NameTable<RoundingRule, 3> kRoundingRule{
    {{RoundingRule::down, "down"}, {RoundingRule::nearest, "nearest"}, {RoundingRule::up, "up"}}};
constexpr NameTable<RowInterpolation, 2> kRowInterpolation{
    {{RowInterpolation::interpolate, "interpolate"}, {RowInterpolation::higher_row, "higher_row"}}};
constexpr NameTable<PermitDistribution, 2> kPermitDistribution{
    {{PermitDistribution::one_lane, "one_lane"}, {PermitDistribution::multiple_lanes, "multiple_lanes"}}};
constexpr NameTable<EmergencyLanes, 3> kEmergencyLanes{{{EmergencyLanes::alone_in_one_lane, "alone_in_one_lane"},
                                                        {EmergencyLanes::every_lane, "every_lane"},
                                                        {EmergencyLanes::with_legal_loads, "with_legal_loads"}}};

Real last_or_indexed(const std::vector<Real>& values, int count) {
  assert(!values.empty() && count >= 1);
  const std::size_t i = std::min(values.size(), static_cast<std::size_t>(std::max(count, 1))) - 1;
  return values[i];
}

}  // namespace

std::string_view to_string(RatingLevel v) { return name_of(kRatingLevel, v); }
std::string_view to_string(RoundingRule v) { return name_of(kRoundingRule, v); }
std::string_view to_string(RowInterpolation v) { return name_of(kRowInterpolation, v); }
std::string_view to_string(PermitDistribution v) { return name_of(kPermitDistribution, v); }
std::string_view to_string(EmergencyLanes v) { return name_of(kEmergencyLanes, v); }
template <>
std::optional<RatingLevel> parse(std::string_view t) {
  return value_of(kRatingLevel, t);
}
template <>
std::optional<RoundingRule> parse(std::string_view t) {
  return value_of(kRoundingRule, t);
}
template <>
std::optional<RowInterpolation> parse(std::string_view t) {
  return value_of(kRowInterpolation, t);
}
template <>
std::optional<PermitDistribution> parse(std::string_view t) {
  return value_of(kPermitDistribution, t);
}
template <>
std::optional<EmergencyLanes> parse(std::string_view t) {
  return value_of(kEmergencyLanes, t);
}

Real LegalLoadFactors::gamma_ll(std::optional<Real> adtt) const {
  assert(!rows.empty());
  if (!adtt) return unknown_adtt;
  if (*adtt <= rows.front().adtt) return rows.front().gamma_ll;
  if (*adtt >= rows.back().adtt) return rows.back().gamma_ll;
  for (std::size_t i = 1; i < rows.size(); ++i) {
    const AdttRow& low = rows[i - 1];
    const AdttRow& high = rows[i];
    if (*adtt > high.adtt) continue;
    if (between_rows == RowInterpolation::higher_row || high.adtt <= low.adtt) return high.gamma_ll;
    const Real t = (*adtt - low.adtt) / (high.adtt - low.adtt);
    return low.gamma_ll + t * (high.gamma_ll - low.gamma_ll);
  }
  return rows.back().gamma_ll;
}

const PermitType* LrfrFactors::find_permit_type(std::string_view id) const {
  auto it = std::find_if(permit_types.begin(), permit_types.end(), [&](const PermitType& p) { return p.id == id; });
  return it == permit_types.end() ? nullptr : &*it;
}

const PermitType* LrfrFactors::find_permit_type_for(std::string_view load_model_id) const {
  auto it = std::find_if(permit_types.begin(), permit_types.end(), [&](const PermitType& p) {
    return std::find(p.load_models.begin(), p.load_models.end(), load_model_id) != p.load_models.end();
  });
  return it == permit_types.end() ? nullptr : &*it;
}

Real LrfrFactors::multiple_presence_for(int lanes) const { return last_or_indexed(multiple_presence, lanes); }

Real ImpactFormula::at(Real span_length) const { return std::min(maximum, numerator / (span_length + offset)); }

Real LfrFactors::lane_reduction_for(int lanes) const { return last_or_indexed(multiple_lane_reduction, lanes); }

std::optional<Real> DynamicAllowance::for_surface(std::string_view name) const {
  if (name.empty()) return standard;
  auto it = riding_surfaces.find(std::string(name));
  if (it == riding_surfaces.end()) return std::nullopt;
  return it->second;
}

const VehicleSet* Policy::find_set(RatingMethod method, std::string_view set_id) const {
  std::string wanted(set_id);
  if (wanted.empty()) {
    auto it = default_sets.find(method);
    if (it == default_sets.end()) return nullptr;
    wanted = it->second;
  }
  auto it = std::find_if(vehicle_sets.begin(), vehicle_sets.end(),
                         [&](const VehicleSet& s) { return s.method == method && s.id == wanted; });
  return it == vehicle_sets.end() ? nullptr : &*it;
}

std::optional<Real> Policy::condition_factor(int superstructure_rating) const {
  for (const ConditionFactorRow& row : condition_factors)
    if (superstructure_rating >= row.from && superstructure_rating <= row.to) return row.phi_c;
  return std::nullopt;
}

}  // namespace tenthpoint::model
