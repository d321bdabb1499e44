#include "engine/distribution/lrfd_distribution.h"

#include <algorithm>
#include <cmath>
#include <variant>

#include <fmt/format.h>

#include "engine/core/units.h"
#include "engine/distribution/girder_stiffness.h"
#include "engine/distribution/lever_rule.h"
#include "engine/distribution/lrfd_equations.h"
#include "engine/section/girder_section_profile.h"

namespace tenthpoint::distribution {
namespace {

constexpr Real kIn2 = units::kInch * units::kInch;
constexpr Real kIn4 = kIn2 * kIn2;

Real ft(Real metres) { return metres / units::kFoot; }
Real in(Real metres) { return metres / units::kInch; }

struct Context {
  const model::Bridge& bridge;
  const model::GirderLine& girder;
  const DistributionOptions& options;
  bool exterior = false;
  int girders = 0;
  int lanes = 1;
  Real curb = 0;  // de, m
};

// A slab bridge's design strip: a rectangular reinforced-concrete section with
// no deck, as wide as the girder line's spacing.
bool is_slab_strip(const model::Bridge& bridge, const model::GirderLine& girder) {
  if (bridge.materials.kind != model::MaterialKind::reinforced_concrete || girder.segments.empty()) return false;
  const auto* def = bridge.find_section(girder.segments.front().section);
  if (def == nullptr || def->deck || !def->description) return false;
  const auto* rc = std::get_if<model::ReinforcedConcreteBeam>(&*def->description);
  return rc != nullptr && rc->flange_thickness <= 0 && std::abs(rc->web_width - girder.spacing) < 1e-3;
}

void strip_factor(const Context& c, Real span, DistributionFactor& f) {
  // LRFD 4.6.2.3-1 and -2, in inches with L1 and W1 in ft: L1 the span, at
  // most 60 ft; W1 the edge-to-edge width, at most 30 ft (one lane) or 60 ft.
  const Real width_ft = ft(c.girder.spacing) * c.girders;
  const Real l1 = std::min(ft(span), 60.0);
  const Real e_one = 10.0 + 5.0 * std::sqrt(l1 * std::min(width_ft, 30.0));
  const Real e_multi = std::min(84.0 + 1.44 * std::sqrt(l1 * std::min(width_ft, 60.0)), 12.0 * width_ft / c.lanes);
  const Real strip_in = in(c.girder.spacing);
  f.method = FactorMethod::strip;
  // The strip equations hold multiple presence already (LRFD C4.6.2.3, from memory).
  f.multiple_presence_one_lane = 1.0;
  f.multiple_presence_multi_lane = 1.0;
  f.one_lane = strip_in / e_one;
  f.trace.strip_one_lane_in = e_one;
  if (c.lanes > 1) {
    f.multi_lane = strip_in / e_multi;
    f.trace.strip_multi_lane_in = e_multi;
  }
  if (f.effect == model::ForceEffect::shear) {
    f.warnings.push_back(
        "shear on the moment strip: LRFD 5.12.2.1 (from memory) deems slabs designed for moment "
        "satisfactory in shear");
  }
}

FactoredLanes lever(const Context& c) {
  const Real s = c.girder.spacing;
  const auto rule =
      c.exterior ? exterior_lever_rule(s, c.curb, c.lanes, c.options) : interior_lever_rule(s, s, c.lanes, c.options);
  std::vector<Real> m;
  for (int n = 1; n <= c.lanes; ++n) m.push_back(c.options.multiple_presence_for(n));
  return apply_lane_factors(rule.reaction_by_trucks, m);
}

void computed_factor(const Context& c, Real span, const GirderStiffness& stiffness, DistributionFactor& f) {
  const bool moment = f.effect == model::ForceEffect::moment;
  LrfdEquationInputs eq;
  eq.spacing_ft = ft(c.girder.spacing);
  eq.span_ft = ft(span);
  eq.girders = c.girders;
  eq.curb_ft = ft(c.curb);
  eq.skew_degrees = c.bridge.geometry.skew / units::kDegree;
  if (stiffness.kg) {
    eq.kg_in4 = *stiffness.kg / kIn4;
    eq.slab_in = in(*stiffness.slab_thickness);
    f.trace.kg_in4 = eq.kg_in4;
    f.trace.slab_in = eq.slab_in;
    f.trace.eg_in = in(stiffness.eccentricity);
    f.trace.inertia_in4 = stiffness.inertia / kIn4;
    f.trace.area_in2 = stiffness.area / kIn2;
    f.trace.modular_ratio = stiffness.modular_ratio;
  }
  if (c.exterior) f.trace.curb_ft = eq.curb_ft;

  const FactoredLanes lev = lever(c);
  f.lever_one_lane = lev.one_lane;
  f.lever_multi_lane = lev.multi_lane;

  std::vector<std::string> outside;
  if (!stiffness.kg) {
    outside.push_back("Kg unknown (" + stiffness.why_unknown + ")");
  } else {
    outside = outside_range(eq, c.exterior);
  }
  if (c.girders < 3) outside.push_back(fmt::format("Nb = {} is below 3", c.girders));

  if (!outside.empty()) {
    for (auto& w : outside) f.warnings.push_back(w + "; the lever rule is used");
    f.method = FactorMethod::lever_rule;
    f.one_lane = lev.one_lane;
    f.multi_lane = lev.multi_lane;
    f.multiple_presence_one_lane = lev.one_lane_factor;
    f.multiple_presence_multi_lane = lev.multi_lane_factor;
  } else {
    const Real g1 = moment ? interior_moment_one_lane(eq) : interior_shear_one_lane(eq);
    const Real gm = moment ? interior_moment_multi_lane(eq) : interior_shear_multi_lane(eq);
    Real eq_one = g1;
    Real eq_multi = gm;
    f.method = FactorMethod::equation;
    f.multiple_presence_one_lane = 1.0;  // inside the equations (LRFD C4.6.2.2.2)
    f.multiple_presence_multi_lane = 1.0;
    if (c.exterior) {
      // LRFD 4.6.2.2.2d-1 / 4.6.2.2.3b-1: lever rule for one lane, e g_interior for more.
      const Real e = moment ? exterior_moment_correction(eq) : exterior_shear_correction(eq);
      f.trace.exterior_correction = e;
      eq_one = lev.one_lane;
      f.multiple_presence_one_lane = lev.one_lane_factor;
      eq_multi = e * gm;
    }
    f.equation_one_lane = eq_one;
    if (c.lanes > 1) f.equation_multi_lane = eq_multi;
    f.one_lane = eq_one;
    if (c.lanes > 1) f.multi_lane = eq_multi;
    if (c.girders == 3) {
      // LRFD 4.6.2.2.2b-1 and 4.6.2.2.3a-1, Nb = 3: the lesser of the equation and the lever rule.
      f.method = FactorMethod::lesser_of;
      if (lev.one_lane < f.one_lane) {
        f.one_lane = lev.one_lane;
        f.multiple_presence_one_lane = lev.one_lane_factor;
      }
      if (f.multi_lane && lev.multi_lane && *lev.multi_lane < *f.multi_lane) {
        f.multi_lane = lev.multi_lane;
        f.multiple_presence_multi_lane = lev.multi_lane_factor;
      }
    }
  }

  const bool braced = !c.girder.brace_stations.empty();
  if (c.exterior && braced && c.options.rigid_body_check && model::is_steel(c.bridge.materials.kind) &&
      c.girders >= 2) {
    // LRFD 4.6.2.2.2d-1: exterior factor not less than the rigid-body reaction (with m).
    const auto rigid = rigid_body_reaction(c.girders, c.girder.spacing, c.curb, c.lanes, c.options);
    std::vector<Real> m;
    for (int n = 1; n <= c.lanes; ++n) m.push_back(c.options.multiple_presence_for(n));
    const auto factored = apply_lane_factors(rigid.reaction_by_trucks, m);
    const Real governing = std::max(factored.one_lane, factored.multi_lane.value_or(0.0));
    f.rigid_body = governing;
    if (factored.one_lane > f.one_lane) {
      f.one_lane = factored.one_lane;
      f.multiple_presence_one_lane = factored.one_lane_factor;
      f.method = FactorMethod::rigid_body;
    }
    if (factored.multi_lane && f.multi_lane && *factored.multi_lane > *f.multi_lane) {
      f.multi_lane = factored.multi_lane;
      f.multiple_presence_multi_lane = factored.multi_lane_factor;
      f.method = FactorMethod::rigid_body;
    }
  }

  if (eq.skew_degrees > 0) {
    if (!stiffness.kg) {
      f.warnings.push_back("skew correction not applied: Kg unknown");
    } else if (moment) {
      f.trace.skew_c1 = skew_moment_c1(eq);
      f.trace.skew_factor = skew_moment_factor(eq);
    } else if (!c.exterior && !c.options.skew_shear_on_all_girders) {
      f.trace.skew_factor = 1.0;
    } else {
      f.trace.skew_factor = skew_shear_factor(eq);
    }
    if (eq.skew_degrees > 60.0) f.warnings.push_back("skew above 60 degrees: corrections taken at 60 degrees");
  }
  f.one_lane *= f.trace.skew_factor;
  if (f.multi_lane) *f.multi_lane *= f.trace.skew_factor;
}

const model::DistributionOverride* find_override(const model::Bridge& bridge, const std::string& girder,
                                                 model::ForceEffect effect) {
  for (const auto& o : bridge.rating.distribution_overrides) {
    if (o.girder == girder && o.effect == effect) return &o;
  }
  return nullptr;
}

DistributionFactor make_factor(const Context& c, model::ForceEffect effect, FactorRegion region, int index, Real span,
                               const GirderStiffness& stiffness, bool slab) {
  DistributionFactor f;
  f.effect = effect;
  f.region = region;
  f.index = index;
  f.trace.spacing_ft = ft(c.girder.spacing);
  f.trace.span_ft = ft(span);
  f.trace.skew_degrees = c.bridge.geometry.skew / units::kDegree;
  f.trace.girders = c.girders;
  f.trace.lanes = c.lanes;
  f.trace.section_id = stiffness.section_id;
  if (slab) {
    strip_factor(c, span, f);
  } else {
    computed_factor(c, span, stiffness, f);
  }
  f.value = std::max(f.one_lane, f.multi_lane.value_or(0.0));
  if (const auto* o = find_override(c.bridge, c.girder.id, effect)) {
    f.computed_value = f.value;
    f.computed_method = f.method;
    f.value = o->value;
    f.method = FactorMethod::override_value;
    f.override_reason = o->reason;
  }
  return f;
}

GirderStiffness mean(GirderStiffness a, const GirderStiffness& b) {
  if (!a.kg || !b.kg) return a.kg ? b : a;
  a.kg = 0.5 * (*a.kg + *b.kg);
  a.inertia = 0.5 * (a.inertia + b.inertia);
  a.area = 0.5 * (a.area + b.area);
  a.eccentricity = 0.5 * (a.eccentricity + b.eccentricity);
  if (a.section_id != b.section_id) a.section_id += " / " + b.section_id;
  return a;
}

}  // namespace

GirderLineFactors lrfd_distribution(const model::Bridge& bridge, const model::GirderLine& girder,
                                    const DistributionOptions& options) {
  Context c{bridge, girder, options};
  c.exterior = girder.position == model::GirderPosition::exterior;
  c.girders = bridge.girder_count();
  c.lanes = std::max(1, bridge.traffic.lanes);
  GirderLineFactors out;
  out.girder = girder.id;
  out.position = girder.position;
  std::vector<std::string> line_warnings;
  if (c.exterior && !girder.curb_distance) {
    line_warnings.push_back("curb_distance (de) not given: taken as 0, the barrier face over the exterior web");
  }
  c.curb = girder.curb_distance.value_or(0.0);

  const bool slab = is_slab_strip(bridge, girder);
  const section::GirderSectionProfile profile(bridge, girder, options.section);
  const auto& spans = bridge.geometry.span_lengths;
  std::vector<GirderStiffness> midspan;
  for (std::size_t i = 0; i < spans.size(); ++i) {
    const Real station = bridge.geometry.support_station(i) + 0.5 * spans[i];
    midspan.push_back(girder_stiffness(bridge, girder, profile, station, options));
  }
  const int n_spans = static_cast<int>(spans.size());
  for (int i = 0; i < n_spans; ++i) {
    const auto k = static_cast<std::size_t>(i);
    out.factors.push_back(
        make_factor(c, model::ForceEffect::moment, FactorRegion::positive_moment, i, spans[k], midspan[k], slab));
    out.factors.push_back(
        make_factor(c, model::ForceEffect::shear, FactorRegion::shear, i, spans[k], midspan[k], slab));
  }
  for (int j = 1; j < n_spans; ++j) {
    const auto k = static_cast<std::size_t>(j);
    if (k - 1 < bridge.geometry.continuity.size() && bridge.geometry.continuity[k - 1] == model::Continuity::hinge) {
      continue;
    }
    const Real span = 0.5 * (spans[k - 1] + spans[k]);
    out.factors.push_back(make_factor(c, model::ForceEffect::moment, FactorRegion::negative_moment, j, span,
                                      mean(midspan[k - 1], midspan[k]), slab));
  }
  for (auto& f : out.factors) f.warnings.insert(f.warnings.begin(), line_warnings.begin(), line_warnings.end());
  return out;
}

}  // namespace tenthpoint::distribution
