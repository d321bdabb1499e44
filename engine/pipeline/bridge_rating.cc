#include "engine/pipeline/bridge_rating.h"

#include <algorithm>
#include <cmath>

#include <fmt/format.h>

#include "engine/analysis/girder_line_analysis.h"
#include "engine/capacity/condition_system_factors.h"
#include "engine/capacity/girder_capacity.h"
#include "engine/core/errors.h"
#include "engine/distribution/distribution_options.h"
#include "engine/distribution/dynamic_allowance.h"
#include "engine/distribution/lfr_distribution.h"
#include "engine/distribution/lrfd_distribution.h"
#include "engine/live_load/envelope_cache.h"

namespace tenthpoint::pipeline {
namespace {

using model::RatingLevel;
using model::VehicleCategory;

std::vector<const model::LoadModel*> load_models_of(const model::Bridge& bridge, const model::Policy& policy,
                                                    std::string* set_id) {
  const model::VehicleSet* set = policy.find_set(bridge.rating.method, bridge.rating.vehicle_set);
  if (set == nullptr)
    throw InputError(bridge.rating.where, "rating.vehicle_set",
                     fmt::format("the policy '{}' has no {} vehicle set '{}'", policy.id,
                                 model::to_string(bridge.rating.method), bridge.rating.vehicle_set));
  *set_id = set->id;
  std::vector<const model::LoadModel*> models;
  for (const std::string& id : set->load_models) {
    const model::LoadModel* m = policy.vehicles.find_load_model(id);
    if (m == nullptr)
      throw InputError(SourceLocation{policy.source_files.empty() ? "policy" : policy.source_files.front(), 0, 0},
                       "vehicles.sets",
                       fmt::format("vehicle set '{}' names '{}', which no vehicle library holds", set->id, id));
    models.push_back(m);
  }
  return models;
}

// Distribution factor of a region at each analysis point: positive moment
// and shear by the point's span; negative moment by the nearer interior
// support of the point's span (the positive-moment factor where the girder
// has no continuous support there).
rating::GirderDistribution distribution_at_points(const distribution::GirderLineFactors& f,
                                                  const std::vector<analysis::AnalysisPoint>& points,
                                                  std::size_t span_count) {
  using distribution::FactorRegion;
  rating::GirderDistribution d;
  for (const analysis::AnalysisPoint& p : points) {
    const int span = static_cast<int>(p.span);
    const distribution::DistributionFactor* pos = f.find(FactorRegion::positive_moment, span);
    const distribution::DistributionFactor* shear = f.find(FactorRegion::shear, span);
    // Interior supports are numbered 1 .. span_count - 1; try the nearer
    // end of the point's span first, then the farther one.
    const int nearer = p.span_fraction < 0.5 ? span : span + 1;
    const int farther = p.span_fraction < 0.5 ? span + 1 : span;
    const auto interior = [&](int support) { return support > 0 && support < static_cast<int>(span_count); };
    const distribution::DistributionFactor* neg = nullptr;
    if (interior(nearer)) neg = f.find(FactorRegion::negative_moment, nearer);
    if (neg == nullptr && interior(farther)) neg = f.find(FactorRegion::negative_moment, farther);
    d.moment_positive.push_back(pos ? pos->value : 0.0);
    d.shear.push_back(shear ? shear->value : 0.0);
    d.moment_negative.push_back(neg ? neg->value : (pos ? pos->value : 0.0));
  }
  return d;
}

// The one-lane factors (their multiple presence included) at each point, by
// the same regions, for permits that cross alone (MBE 6A.4.5.4.2b).
rating::GirderDistribution one_lane_at_points(distribution::GirderLineFactors f,
                                              const std::vector<analysis::AnalysisPoint>& points,
                                              std::size_t span_count) {
  for (distribution::DistributionFactor& factor : f.factors) factor.value = factor.one_lane;
  return distribution_at_points(f, points, span_count);
}

// Dynamic allowance per point, by the rules of engine/distribution
// (dynamic_allowance.h): LRFR IM for the riding surface on axle loads only;
// LFR impact on truck and lane loading with L per effect. For negative
// moment the nearer interior support of the point's span sets L.
rating::DynamicAllowanceAt impact_at_points(const model::Bridge& bridge, const model::Policy& policy,
                                            const std::vector<analysis::AnalysisPoint>& points) {
  if (bridge.rating.method == model::RatingMethod::lrfr)
    return rating::DynamicAllowanceAt::uniform(points.size(),
                                               distribution::lrfr_dynamic_allowance(bridge, policy).fraction, false);
  const int spans = static_cast<int>(bridge.geometry.span_lengths.size());
  rating::DynamicAllowanceAt d;
  d.applies_to_lane = true;
  for (const analysis::AnalysisPoint& p : points) {
    const int span = static_cast<int>(p.span);
    d.positive_moment.push_back(distribution::lfr_impact_positive_moment(bridge, policy, span).fraction);
    d.shear.push_back(distribution::lfr_impact_shear(bridge, policy, p.station).fraction);
    int support = p.span_fraction < 0.5 ? span : span + 1;
    if (support <= 0 || support >= spans) support = p.span_fraction < 0.5 ? span + 1 : span;
    d.negative_moment.push_back(support > 0 && support < spans
                                    ? distribution::lfr_impact_negative_moment(bridge, policy, support).fraction
                                    : d.positive_moment.back());
  }
  return d;
}

// LFR distribution is one moment and one shear factor per girder line
// (Standard Specifications Table 3.23.1), in lanes.
rating::GirderDistribution lfr_distribution_at_points(const distribution::LfrGirderFactors& f, std::size_t points) {
  return rating::GirderDistribution::uniform(points, f.moment.value, f.moment.value, f.shear.value);
}

bool is_legal(VehicleCategory c) { return c == VehicleCategory::legal || c == VehicleCategory::specialized_hauling; }
bool is_design(VehicleCategory c) { return c == VehicleCategory::design || c == VehicleCategory::lfr_design; }

Real posting_unit(units::UnitSystem system) {
  return system == units::UnitSystem::us ? units::kShortTon : units::kTonneForce;
}

}  // namespace

const GoverningRating* BridgeRating::find(std::string_view load_model_id, model::RatingLevel level) const {
  for (const GoverningRating& g : governing)
    if (g.load_model_id == load_model_id && g.level == level) return &g;
  return nullptr;
}

bool inspection_reduced_capacity(const model::Bridge& bridge, std::optional<CalendarDate> as_of) {
  const model::Inspection* current = bridge.latest_inspection(as_of);
  if (current == nullptr) return false;
  const model::Inspection* previous = nullptr;
  for (const model::Inspection& record : bridge.inspections)
    if (record.date < current->date && (previous == nullptr || record.date >= previous->date)) previous = &record;
  if (previous == nullptr) return !current->section_loss.empty();
  return current->superstructure_condition < previous->superstructure_condition ||
         current->section_loss.size() > previous->section_loss.size();
}

BridgeRating rate_bridge(const model::Bridge& bridge, const model::Policy& policy, CalendarDate rating_date) {
  BridgeRating out;
  out.bridge_id = bridge.identity.structure_id;
  out.method = bridge.rating.method;
  out.policy_id = policy.id;
  out.policy_version = policy.version;
  out.edition = policy.edition;
  out.rating_date = rating_date;
  const std::vector<const model::LoadModel*> models = load_models_of(bridge, policy, &out.vehicle_set);
  const std::optional<CalendarDate> as_of = bridge.rating.as_of;
  if (const model::Inspection* inspection = bridge.latest_inspection(as_of)) out.inspection_date = inspection->date;

  const capacity::ConditionSystemFactors moment_factors =
      capacity::condition_system_factors(bridge, policy, model::ForceEffect::moment, as_of);
  const capacity::ConditionSystemFactors shear_factors =
      capacity::condition_system_factors(bridge, policy, model::ForceEffect::shear, as_of);
  const distribution::DistributionOptions distribution_options = distribution::DistributionOptions::from_policy(policy);

  // Girder lines with identical live-load influence lines share their
  // envelopes (live_load/envelope_cache.h): the same numbers, computed once.
  live_load::EnvelopeCache envelope_cache(models, policy.vehicles);
  for (const model::GirderLine& girder : bridge.girders) {
    const analysis::GirderLineAnalysis analysis = analysis::analyse_girder_line(bridge, girder);
    const std::vector<live_load::MovingLoadEnvelope>& envelopes = envelope_cache.envelopes_for(analysis.live_influence);
    // Prestressed webs take the general procedure of LRFD 5.7.3.4.2 (the
    // simplified one ignores the prestress); reinforced concrete keeps the
    // simplified procedure of 5.7.3.4.1, which is written for it.
    capacity::CapacityOptions capacity_options;
    if (bridge.materials.kind == model::MaterialKind::prestressed_concrete)
      capacity_options.shear_method = capacity::ConcreteShearMethod::general;
    const capacity::GirderCapacity capacity(bridge, girder, capacity_options);
    const bool lrfr = bridge.rating.method == model::RatingMethod::lrfr;
    distribution::GirderLineFactors factors;
    std::optional<distribution::LfrGirderFactors> lfr_factors;
    if (lrfr) {
      factors = distribution::lrfd_distribution(bridge, girder, distribution_options);
    } else {
      lfr_factors = distribution::lfr_distribution(bridge, girder, distribution_options);
      factors.girder = girder.id;
      factors.position = girder.position;
      factors.factors = {lfr_factors->moment, lfr_factors->shear};
    }

    rating::GirderRatingInputs in;
    in.method = bridge.rating.method;
    in.material = bridge.materials.kind;
    in.analysis = &analysis;
    in.capacity = &capacity;
    in.policy = &policy;
    in.moment_factors = moment_factors;
    in.shear_factors = shear_factors;
    in.distribution =
        lrfr ? distribution_at_points(factors, analysis.live_influence.points, bridge.geometry.span_lengths.size())
             : lfr_distribution_at_points(*lfr_factors, analysis.live_influence.points.size());
    if (lrfr)
      in.one_lane_distribution =
          one_lane_at_points(factors, analysis.live_influence.points, bridge.geometry.span_lengths.size());
    in.impact = impact_at_points(bridge, policy, analysis.live_influence.points);
    in.adtt = bridge.traffic.adtt;
    in.wearing_surface_field_measured = analysis.wearing_surface_field_measured;
    for (std::size_t m = 0; m < models.size(); ++m) in.load_models.push_back({models[m], &envelopes[m]});
    rating::GirderRating rated = rating::rate_girder_line(in);
    out.details.push_back(girder_line_detail(analysis, envelopes, in.distribution, in.impact));
    rated.girder_count = girder.count;
    for (const std::string& w : factors.all_warnings()) out.warnings.push_back(fmt::format("{}: {}", girder.id, w));
    for (const std::string& w : rated.warnings) out.warnings.push_back(fmt::format("{}: {}", girder.id, w));
    out.girders.push_back(std::move(rated));
    out.distribution.push_back(std::move(factors));
  }

  // Governing per load model and level over the girder lines.
  for (const model::LoadModel* m : models) {
    for (RatingLevel level : rating::rating_levels(m->category)) {
      GoverningRating g;
      g.load_model_id = m->id;
      g.name = m->name;
      g.category = m->category;
      g.level = level;
      g.rating_weight = m->rating_weight;
      bool found = false;
      for (const rating::GirderRating& girder : out.girders)
        for (const rating::LoadModelRating& lm : girder.load_models)
          if (lm.load_model_id == m->id)
            for (const rating::LevelRating& lr : lm.levels)
              if (lr.level == level && lr.governing &&
                  (!found || lr.governing->result.rating_factor < g.at.result.rating_factor)) {
                g.at = *lr.governing;
                g.girder_id = girder.girder_id;
                found = true;
              }
      if (!found) continue;
      if (g.rating_weight) g.rating_weight_rated = g.at.result.rating_factor * *g.rating_weight;
      out.governing.push_back(std::move(g));
    }
  }

  // Screening (MBE 6A.4.3, 6A.4.4.2.1; FHWA EV memorandum of 3 Nov 2016),
  // with the policy's thresholds.
  const model::ScreeningPolicy& screen = policy.screening;
  const auto min_rf = [&](auto predicate, RatingLevel level) {
    std::optional<Real> rf;
    for (const GoverningRating& g : out.governing)
      if (predicate(g) && g.level == level)
        rf = rf ? std::min(*rf, g.at.result.rating_factor) : g.at.result.rating_factor;
    return rf;
  };
  const std::optional<Real> design_operating =
      min_rf([](const GoverningRating& g) { return is_design(g.category); }, RatingLevel::operating);
  const std::optional<Real> design_inventory =
      min_rf([](const GoverningRating& g) { return is_design(g.category); }, RatingLevel::inventory);
  if (out.method == model::RatingMethod::lrfr && design_operating && screen.design_operating_skips_legal > 0 &&
      *design_operating >= screen.design_operating_skips_legal) {
    out.screening.push_back(fmt::format(
        "design-load operating RF {:.2f} >= {:.2f}: the legal loads need not be rated (MBE 6A.4.3); shown for "
        "information, not used for posting",
        *design_operating, screen.design_operating_skips_legal));
    for (GoverningRating& g : out.governing)
      if (is_legal(g.category)) {
        g.screened_out = true;
        g.screening_reason = "design-load operating RF passes the screening";
      }
  }
  if (const GoverningRating* nrl = out.find("NRL", RatingLevel::operating);
      nrl && screen.nrl_skips > 0 && nrl->at.result.rating_factor >= screen.nrl_skips) {
    out.screening.push_back(fmt::format(
        "NRL RF {:.2f} >= {:.2f}: the specialized hauling vehicles it screens need not be rated (MBE 6A.4.4.2.1)",
        nrl->at.result.rating_factor, screen.nrl_skips));
    for (GoverningRating& g : out.governing)
      if (std::find(screen.nrl_screens.begin(), screen.nrl_screens.end(), g.load_model_id) !=
          screen.nrl_screens.end()) {
        g.screened_out = true;
        g.screening_reason = "NRL passes the screening";
      }
  }
  const Real ev_threshold = out.method == model::RatingMethod::lrfr ? screen.emergency_group_1_lrfr_hl93_inventory
                                                                    : screen.emergency_group_1_lfr_hs20_inventory;
  if (design_inventory && ev_threshold > 0 && *design_inventory >= ev_threshold) {
    out.screening.push_back(fmt::format(
        "design-load inventory RF {:.2f} >= {:.2f}: group 1, no emergency-vehicle rating needed (FHWA memorandum "
        "of 3 Nov 2016)",
        *design_inventory, ev_threshold));
    for (GoverningRating& g : out.governing)
      if (g.category == VehicleCategory::emergency) {
        g.screened_out = true;
        g.screening_reason = "emergency-vehicle group 1";
      }
  }

  // Posting per legal vehicle and emergency vehicle (MBE 6A.8.3), at the
  // operating level (legal loads are rated at one level).
  const Real ton = posting_unit(bridge.units);
  for (const GoverningRating& g : out.governing) {
    if (g.screened_out || !g.rating_weight || g.level != RatingLevel::operating) continue;
    if (!is_legal(g.category) && g.category != VehicleCategory::emergency) continue;
    VehiclePosting p{g.load_model_id, g.name, g.at.result.rating_factor, *g.rating_weight,
                     rating::posting_for(g.at.result.rating_factor, *g.rating_weight, policy.posting, ton)};
    if (is_legal(g.category)) {
      if (p.decision.status == rating::PostingStatus::close)
        out.recommendation = rating::PostingStatus::close;
      else if (p.decision.status == rating::PostingStatus::post && out.recommendation == rating::PostingStatus::none)
        out.recommendation = rating::PostingStatus::post;
    }
    out.postings.push_back(std::move(p));
  }
  switch (out.recommendation) {
    case rating::PostingStatus::none:
      out.recommendation_reason = "every legal load rated is carried (RF >= 1.0) or screened out";
      break;
    case rating::PostingStatus::post:
      out.recommendation_reason = "post the values per vehicle class";
      break;
    case rating::PostingStatus::close:
      out.recommendation_reason = "a legal load rates below the closure threshold: consider closing the bridge";
      break;
  }
  out.deadlines =
      rating::rating_deadlines(policy.deadlines, out.inspection_date, inspection_reduced_capacity(bridge, as_of),
                               rating_date, out.recommendation != rating::PostingStatus::none);
  return out;
}

}  // namespace tenthpoint::pipeline
