#include "engine/rating/girder_rating.h"

#include <algorithm>
#include <array>
#include <cassert>
#include <cmath>
#include <set>

#include <fmt/format.h>

namespace tenthpoint::rating {
namespace {

using live_load::CaseExtreme;
using live_load::EffectKind;
using live_load::Extreme;

// Capacities at one analysis point, computed once and shared by every load
// model and level. At a section change the smaller of the two sides governs
// (common practice: the weaker section at the point).
struct PointCapacity {
  capacity::Resistance positive;
  capacity::Resistance negative;
  std::array<capacity::Resistance, 2> shear;  // left, right of the point
};

const capacity::Resistance& weaker(const capacity::Resistance& a, const capacity::Resistance& b) {
  if (!a.available()) return b.available() ? b : a;
  if (!b.available()) return a;
  return a.factored <= b.factored ? a : b;
}

PointCapacity capacity_at(const capacity::GirderCapacity& girder, Real station) {
  using capacity::MomentSign;
  using section::Side;
  PointCapacity c;
  const Real length = girder.length();
  const auto flexure = [&](MomentSign sign) {
    const capacity::Resistance left = station > 0 ? girder.flexure(station, sign, Side::left) : capacity::Resistance{};
    const capacity::Resistance right =
        station < length ? girder.flexure(station, sign, Side::right) : capacity::Resistance{};
    return weaker(left, right);
  };
  c.positive = flexure(MomentSign::positive);
  c.negative = flexure(MomentSign::negative);
  c.shear[0] = station > 0 ? girder.shear(station, Side::left)
                           : capacity::Resistance::unavailable_because("no girder left of the first support");
  c.shear[1] = station < length ? girder.shear(station, Side::right)
                                : capacity::Resistance::unavailable_because("no girder right of the last support");
  return c;
}

// The adverse live load per girder after IM, over every case of the model:
// g [ (1 + IM) train + (1 + IM_lane) lane ] for the most adverse case.
struct GoverningLive {
  Real value = 0;  // magnitude, N*m or N
  std::string case_id;
  bool any = false;
};

GoverningLive governing_live(const live_load::MovingLoadEnvelope& envelope, EffectKind kind, std::size_t point,
                             Extreme extreme, Real distribution, Real impact, bool impact_on_lane) {
  GoverningLive best;
  const Real sign = live_load::sign_of(extreme);
  for (const live_load::CaseEnvelope& c : envelope.cases) {
    const auto& entry = c.values.of(kind)[point][extreme];
    if (!entry) continue;
    const Real value =
        sign * ((1 + impact) * entry->train_value() + (impact_on_lane ? 1 + impact : 1.0) * entry->lane_value());
    if (!best.any || value > best.value) best = {value, c.case_id, true};
  }
  best.value *= distribution;
  return best;
}

struct DeadAt {
  Real dc = 0;  // DC1 + DC2, signed as the effect
  Real dw = 0;
};

DeadAt dead_moment(const analysis::GirderLineAnalysis& a, std::size_t point) {
  using model::DeadLoadComponent;
  return {a.component(DeadLoadComponent::dc1).effects.moment[point] +
              a.component(DeadLoadComponent::dc2).effects.moment[point],
          a.component(DeadLoadComponent::dw).effects.moment[point]};
}

DeadAt dead_shear(const analysis::GirderLineAnalysis& a, std::size_t point, bool left) {
  using model::DeadLoadComponent;
  const auto v = [&](DeadLoadComponent c) {
    const analysis::DeadLoadEffects& e = a.component(c).effects;
    return left ? e.shear_left[point] : e.shear_right[point];
  };
  return {v(DeadLoadComponent::dc1) + v(DeadLoadComponent::dc2), v(DeadLoadComponent::dw)};
}

bool better(const PointRating& candidate, const std::optional<PointRating>& current) {
  if (candidate.result.status != RatingStatus::rated) return false;
  return !current || candidate.result.rating_factor < current->result.rating_factor;
}

}  // namespace

std::string_view to_string(RatedEffect effect) {
  switch (effect) {
    case RatedEffect::positive_moment:
      return "positive_moment";
    case RatedEffect::negative_moment:
      return "negative_moment";
    case RatedEffect::shear:
      return "shear";
  }
  return "positive_moment";
}

DynamicAllowanceAt DynamicAllowanceAt::uniform(std::size_t points, Real im, bool applies_to_lane) {
  DynamicAllowanceAt d;
  d.positive_moment.assign(points, im);
  d.negative_moment.assign(points, im);
  d.shear.assign(points, im);
  d.applies_to_lane = applies_to_lane;
  return d;
}

GirderDistribution GirderDistribution::uniform(std::size_t points, Real moment_positive, Real moment_negative,
                                               Real shear) {
  GirderDistribution d;
  d.moment_positive.assign(points, moment_positive);
  d.moment_negative.assign(points, moment_negative);
  d.shear.assign(points, shear);
  return d;
}

std::vector<model::RatingLevel> rating_levels(model::VehicleCategory category) {
  using model::RatingLevel;
  if (category == model::VehicleCategory::design || category == model::VehicleCategory::lfr_design)
    return {RatingLevel::inventory, RatingLevel::operating};
  return {RatingLevel::operating};
}

GirderRating rate_girder_line(const GirderRatingInputs& in) {
  assert(in.analysis && in.capacity && in.policy);
  const analysis::GirderLineAnalysis& a = *in.analysis;
  const std::vector<analysis::AnalysisPoint>& points = a.live_influence.points;
  const bool lfr = in.method == model::RatingMethod::lfr;

  GirderRating out;
  out.girder_id = a.girder_id;

  std::vector<PointCapacity> capacities;
  capacities.reserve(points.size());
  std::set<std::string> reasons;
  for (const analysis::AnalysisPoint& p : points) {
    capacities.push_back(capacity_at(*in.capacity, p.station));
    for (const capacity::Resistance* r : {&capacities.back().positive, &capacities.back().negative,
                                          &capacities.back().shear[0], &capacities.back().shear[1]}) {
      if (!r->available() && !r->reason.empty() && r->reason.rfind("no girder", 0) != 0) reasons.insert(r->reason);
      for (const std::string& w : r->warnings) reasons.insert(w);
    }
  }
  out.warnings.assign(reasons.begin(), reasons.end());

  const model::StrengthDeadLoadFactors& dead_factors = in.policy->lrfr.strength_i;
  const Real gamma_dc = dead_factors.dc;
  const Real gamma_dw = dead_load_factor_dw(dead_factors, in.wearing_surface_field_measured);

  for (const RatedLoadModel& rated : in.load_models) {
    assert(rated.model && rated.envelope);
    const model::LoadModel& lm = *rated.model;
    LoadModelRating mr;
    mr.load_model_id = lm.id;
    mr.name = lm.name;
    mr.category = lm.category;
    mr.rating_weight = lm.rating_weight;

    for (model::RatingLevel level : rating_levels(lm.category)) {
      LevelRating lr;
      lr.level = level;
      Real gamma_ll = 0;
      if (lfr) {
        gamma_ll = in.policy->lfr.a2.at(level);
        lr.factor_source = fmt::format("policy lfr.a2.{} (MBE 6B.4.1)", model::to_string(level));
      } else {
        const LiveLoadFactor f = live_load_factor(in.policy->lrfr, lm.category, level, LimitState::strength_i, in.adtt);
        gamma_ll = f.gamma_ll;
        lr.factor_source = f.source;
      }

      const auto rate = [&](std::size_t i, RatedEffect effect, const std::string& side, const capacity::Resistance& r,
                            const capacity::ConditionSystemFactors& factors, DeadAt dead, const GoverningLive& live,
                            Real distribution, Real impact) {
        if (!live.any || !r.available()) return;
        PointRating pr;
        pr.point = i;
        pr.station = points[i].station;
        pr.label = points[i].label();
        pr.effect = effect;
        pr.side = side;
        pr.level = level;
        pr.resistance = r.factored;
        pr.resistance_article = r.article;
        pr.distribution = distribution;
        pr.impact = impact;
        pr.gamma_ll = gamma_ll;
        pr.case_id = live.case_id;
        if (lfr) {
          // MBE 6B.4.1-1; LFR applies no condition or system factor.
          pr.capacity_factor = 1.0;
          pr.result = lfr_rating_factor(r.factored, dead.dc + dead.dw, in.policy->lfr.a1, live.value, gamma_ll);
        } else {
          // MBE 6A.4.2.1-1 with C = phi_c phi_s phi Rn (phi_c phi_s at its floor).
          pr.capacity_factor = factors.product;
          pr.result = lrfr_rating_factor(factors.product * r.factored, dead.dc, gamma_dc, dead.dw, gamma_dw, live.value,
                                         gamma_ll);
        }
        if (better(pr, lr.governing)) lr.governing = pr;
        lr.points.push_back(std::move(pr));
      };

      for (std::size_t i = 0; i < points.size(); ++i) {
        const PointCapacity& cap = capacities[i];
        const Real station = points[i].station;
        const GirderDistribution& g = in.distribution;
        const DeadAt dm = dead_moment(a, i);
        {
          const Real im = in.impact.positive_moment[i];
          rate(i, RatedEffect::positive_moment, "", cap.positive, in.moment_factors, dm,
               governing_live(*rated.envelope, EffectKind::moment, i, Extreme::maximum, g.moment_positive[i], im,
                              in.impact.applies_to_lane),
               g.moment_positive[i], im);
        }
        {
          const Real im = in.impact.negative_moment[i];
          rate(i, RatedEffect::negative_moment, "", cap.negative, in.moment_factors, DeadAt{-dm.dc, -dm.dw},
               governing_live(*rated.envelope, EffectKind::moment, i, Extreme::minimum, g.moment_negative[i], im,
                              in.impact.applies_to_lane),
               g.moment_negative[i], im);
        }
        const Real im = in.impact.shear[i];
        // Concrete webs (LRFD 5.7.3.4.2) need the factored demand at the
        // section: Vu from this vehicle at this level and, conservatively for
        // the longitudinal strain, the factored moment with the largest live
        // moment at the point (the concurrent moment is not tracked).
        const bool concrete = !lfr && (in.material == model::MaterialKind::reinforced_concrete ||
                                       in.material == model::MaterialKind::prestressed_concrete);
        const GoverningLive live_moment =
            governing_live(*rated.envelope, EffectKind::moment, i, Extreme::maximum, g.moment_positive[i],
                           in.impact.positive_moment[i], in.impact.applies_to_lane);
        const Real mu = gamma_dc * dm.dc + gamma_dw * dm.dw + gamma_ll * live_moment.value;
        for (int s = 0; s < 2; ++s) {
          const bool left = s == 0;
          const EffectKind kind = left ? EffectKind::shear_left : EffectKind::shear_right;
          const DeadAt dv = dead_shear(a, i, left);
          for (Extreme e : live_load::kExtremes) {
            const Real sign = live_load::sign_of(e);
            const GoverningLive live =
                governing_live(*rated.envelope, kind, i, e, g.shear[i], im, in.impact.applies_to_lane);
            const DeadAt dead{sign * dv.dc, sign * dv.dw};
            const capacity::Resistance* resistance = &cap.shear[s];
            capacity::Resistance with_demand;
            if (concrete && live.any && cap.shear[s].status != capacity::ResistanceStatus::given) {
              const Real vu = std::abs(gamma_dc * dead.dc + gamma_dw * dead.dw + gamma_ll * live.value);
              with_demand = in.capacity->shear(station, left ? section::Side::left : section::Side::right,
                                               capacity::ShearDemand{mu, vu, 0.0});
              if (with_demand.available()) resistance = &with_demand;
            }
            rate(i, RatedEffect::shear, left ? "left" : "right", *resistance, in.shear_factors, dead, live, g.shear[i],
                 im);
          }
        }
      }
      mr.levels.push_back(std::move(lr));
    }
    out.load_models.push_back(std::move(mr));
  }
  return out;
}

}  // namespace tenthpoint::rating
