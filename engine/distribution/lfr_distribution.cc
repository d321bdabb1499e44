#include "engine/distribution/lfr_distribution.h"

#include <algorithm>
#include <cctype>
#include <string>
#include <variant>

#include <fmt/format.h>

#include "engine/core/units.h"
#include "engine/distribution/lever_rule.h"

namespace tenthpoint::distribution {
namespace {

Real ft(Real metres) { return metres / units::kFoot; }

// Std. Spec. Table 3.23.1 (from memory): S/D wheel lines, and the spacing
// beyond which the lever rule is used instead.
struct DeckType {
  const char* name;
  Real d_one;
  Real d_multi;
  Real lever_beyond_one_ft;
  Real lever_beyond_multi_ft;
};

constexpr DeckType kOnBeams{"concrete deck on steel or prestressed beams", 7.0, 5.5, 10.0, 14.0};
constexpr DeckType kTBeams{"concrete T-beams", 6.5, 6.0, 6.0, 10.0};
constexpr DeckType kBoxes{"concrete box girders", 8.0, 7.0, 12.0, 16.0};

bool contains_box(std::string shape) {
  std::transform(shape.begin(), shape.end(), shape.begin(), [](unsigned char ch) { return std::tolower(ch); });
  return shape.find("box") != std::string::npos;
}

const model::SectionDefinition* first_section(const model::Bridge& bridge, const model::GirderLine& girder) {
  return girder.segments.empty() ? nullptr : bridge.find_section(girder.segments.front().section);
}

const DeckType& deck_type(const model::Bridge& bridge, const model::GirderLine& girder,
                          std::vector<std::string>& warnings) {
  const auto* def = first_section(bridge, girder);
  if (def != nullptr && def->description) {
    if (const auto* ps = std::get_if<model::PrestressedGirder>(&*def->description); ps && contains_box(ps->shape)) {
      warnings.push_back(
          "precast box beams taken as concrete box girders of Table 3.23.1; adjacent boxes belong "
          "to Std. Spec. 3.23.4, which is not implemented");
      return kBoxes;
    }
    if (std::holds_alternative<model::ReinforcedConcreteBeam>(*def->description) && !def->deck) return kTBeams;
  }
  return kOnBeams;
}

bool is_slab_strip(const model::Bridge& bridge, const model::GirderLine& girder) {
  if (bridge.materials.kind != model::MaterialKind::reinforced_concrete) return false;
  const auto* def = first_section(bridge, girder);
  if (def == nullptr || def->deck || !def->description) return false;
  const auto* rc = std::get_if<model::ReinforcedConcreteBeam>(&*def->description);
  return rc != nullptr && rc->flange_thickness <= 0 && std::abs(rc->web_width - girder.spacing) < 1e-3;
}

DistributionFactor compute(const model::Bridge& bridge, const model::GirderLine& girder,
                           const DistributionOptions& options, model::ForceEffect effect) {
  DistributionFactor f;
  f.effect = effect;
  f.region = effect == model::ForceEffect::moment ? FactorRegion::positive_moment : FactorRegion::shear;
  const Real s = ft(girder.spacing);
  const int lanes = std::max(1, bridge.traffic.lanes);
  f.trace.spacing_ft = s;
  f.trace.girders = bridge.girder_count();
  f.trace.lanes = lanes;
  // S/D and the slab strip hold no lane reduction (Std. Spec. 3.12.1 applies to
  // the lever rule with several trucks only); 1 is recorded for them.
  f.multiple_presence_one_lane = 1.0;
  f.multiple_presence_multi_lane = 1.0;

  const bool exterior = girder.position == model::GirderPosition::exterior;
  const Real curb = girder.curb_distance.value_or(0.0);
  if (exterior && !girder.curb_distance) f.warnings.push_back("curb_distance not given: taken as 0");
  std::vector<Real> reductions;
  for (int n = 1; n <= lanes; ++n) reductions.push_back(options.lfr_lane_reduction_for(n));
  const auto rule = exterior ? exterior_lever_rule(girder.spacing, curb, lanes, options)
                             : interior_lever_rule(girder.spacing, girder.spacing, lanes, options);
  const auto lever = apply_lane_factors(rule.reaction_by_trucks, reductions);
  f.lever_one_lane = lever.one_lane;
  f.lever_multi_lane = lever.multi_lane;

  if (is_slab_strip(bridge, girder)) {
    // Std. Spec. 3.24.3.2 (from memory): E = 4 + 0.06 S <= 7 ft, one wheel over E.
    const Real span = ft(*std::max_element(bridge.geometry.span_lengths.begin(), bridge.geometry.span_lengths.end()));
    const Real e = std::min(4.0 + 0.06 * span, 7.0);
    f.method = FactorMethod::strip;
    f.trace.span_ft = span;
    f.trace.strip_one_lane_in = 12.0 * e;
    f.one_lane = s / (2.0 * e);
  } else if (exterior) {
    // Std. Spec. 3.23.2.3.1: the lever rule for the exterior girder.
    f.method = FactorMethod::lever_rule;
    f.one_lane = lever.one_lane;
    f.multi_lane = lever.multi_lane;
    f.multiple_presence_one_lane = lever.one_lane_factor;
    f.multiple_presence_multi_lane = lever.multi_lane_factor;
  } else {
    std::vector<std::string> notes;
    const DeckType& type = deck_type(bridge, girder, notes);
    f.warnings.insert(f.warnings.end(), notes.begin(), notes.end());
    f.method = FactorMethod::equation;
    // Std. Spec. Table 3.23.1: S/D wheel lines; lanes are half of that.
    f.equation_one_lane = 0.5 * s / type.d_one;
    f.one_lane = *f.equation_one_lane;
    if (s > type.lever_beyond_one_ft) {
      f.one_lane = lever.one_lane;
      f.method = FactorMethod::lever_rule;
      f.warnings.push_back(fmt::format("S = {:.4g} ft exceeds {:g} ft ({}): one lane by the lever rule", s,
                                       type.lever_beyond_one_ft, type.name));
    }
    if (lanes > 1) {
      f.equation_multi_lane = 0.5 * s / type.d_multi;
      f.multi_lane = f.equation_multi_lane;
      if (s > type.lever_beyond_multi_ft) {
        f.multi_lane = lever.multi_lane;
        f.multiple_presence_multi_lane = lever.multi_lane_factor;
        f.method = FactorMethod::lever_rule;
        f.warnings.push_back(fmt::format("S = {:.4g} ft exceeds {:g} ft ({}): two or more lanes by the lever rule", s,
                                         type.lever_beyond_multi_ft, type.name));
      }
    }
  }
  if (effect == model::ForceEffect::shear && f.method != FactorMethod::strip) {
    f.warnings.push_back(
        "shear takes the moment fraction; Std. Spec. 3.23.1.2 asks for the lever rule for the "
        "wheel at the end (not applied)");
  }
  f.value = std::max(f.one_lane, f.multi_lane.value_or(0.0));
  for (const auto& o : bridge.rating.distribution_overrides) {
    if (o.girder == girder.id && o.effect == effect) {
      f.computed_value = f.value;
      f.computed_method = f.method;
      f.value = o.value;
      f.method = FactorMethod::override_value;
      f.override_reason = o.reason;
      break;
    }
  }
  return f;
}

}  // namespace

LfrGirderFactors lfr_distribution(const model::Bridge& bridge, const model::GirderLine& girder,
                                  const DistributionOptions& options) {
  LfrGirderFactors out;
  out.girder = girder.id;
  out.moment = compute(bridge, girder, options, model::ForceEffect::moment);
  out.shear = compute(bridge, girder, options, model::ForceEffect::shear);
  return out;
}

}  // namespace tenthpoint::distribution
