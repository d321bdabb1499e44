#include "engine/rating/girder_rating.h"

#include <algorithm>
#include <array>
#include <cassert>
#include <cmath>
#include <set>

#include <fmt/format.h>

#include "engine/core/errors.h"

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

// Dead-load moments per load stage, signed as the analysis gives them: the
// stress form of the service limit states divides each by its own section
// (DC1 noncomposite; DC2 and DW long-term composite).
struct StageMoments {
  Real dc1 = 0;
  Real dc2 = 0;
  Real dw = 0;
};

StageMoments stage_moments(const analysis::GirderLineAnalysis& a, std::size_t point) {
  using model::DeadLoadComponent;
  return {a.component(DeadLoadComponent::dc1).effects.moment[point],
          a.component(DeadLoadComponent::dc2).effects.moment[point],
          a.component(DeadLoadComponent::dw).effects.moment[point]};
}

// Service data at one point, left and right of it (a section change can sit
// on the point; the lower rating of the two sides governs).
struct PointService {
  std::array<capacity::SteelServiceLimits, 2> steel;
  std::array<capacity::PrestressedServiceLimits, 2> prestressed;
  std::array<std::array<capacity::ReinforcedServiceLimits, 2>, 2> reinforced;  // [positive, negative][side]
};

// Reasons a service check is skipped or qualified repeat at every section;
// one line per kind, with the count.
class RepeatedNotes {
 public:
  void add(const std::string& text) {
    if (text.empty()) return;
    ++count_;
    if (first_.empty()) first_ = text;
  }
  void write(std::vector<std::string>& out, std::string_view what) const {
    if (count_ == 0) return;
    out.push_back(count_ == 1 ? fmt::format("{}: {}", what, first_)
                              : fmt::format("{}: {} (and at {} more sections)", what, first_, count_ - 1));
  }

 private:
  std::string first_;
  int count_ = 0;
};

bool is_strength(LimitState s) { return s == LimitState::strength_i || s == LimitState::strength_ii; }

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

std::vector<LimitState> rated_limit_states(model::RatingMethod method, model::MaterialKind material,
                                           model::VehicleCategory category, model::RatingLevel level,
                                           const model::ServiceChecks& checks) {
  using model::RatingLevel;
  using model::VehicleCategory;
  // LFR (MBE 6B.4.1) rates the strength of the member only.
  if (method == model::RatingMethod::lfr) return {LimitState::strength_i};
  const bool permit = category == VehicleCategory::permit;
  const bool design = category == VehicleCategory::design || category == VehicleCategory::lfr_design;
  // Emergency vehicles are rated as legal loads at the operating level (FHWA
  // memorandum of 3 Nov 2016), so they follow the legal-load switches.
  const bool legal = category == VehicleCategory::legal || category == VehicleCategory::specialized_hauling ||
                     category == VehicleCategory::emergency;
  // MBE Table 6A.4.2.2-1 (from memory): Strength II for permits, Strength I
  // for every other load.
  std::vector<LimitState> states{permit ? LimitState::strength_ii : LimitState::strength_i};
  if (model::is_steel(material)) {
    // Service II for steel: design load at inventory and operating, legal and
    // permit loads (their one level); each switchable in the policy.
    const bool rate = design ? (level == RatingLevel::inventory ? checks.service_ii_design_inventory
                                                                : checks.service_ii_design_operating)
                             : (permit ? checks.service_ii_permit : legal && checks.service_ii_legal);
    if (rate) states.push_back(LimitState::service_ii);
  } else if (material == model::MaterialKind::prestressed_concrete) {
    // Service III for prestressed concrete: the design load at inventory (the
    // table has no operating factor); optional for legal loads (MBE
    // 6A.5.4.1, from memory), off unless the policy asks.
    const bool rate = design ? level == RatingLevel::inventory && checks.service_iii_design_inventory
                             : legal && checks.service_iii_legal;
    if (rate) states.push_back(LimitState::service_iii);
  } else if (material == model::MaterialKind::reinforced_concrete) {
    // Service I for permits on reinforced concrete: the steel stress.
    if (permit && checks.service_i_permit) states.push_back(LimitState::service_i);
  }
  return states;
}

std::optional<Real> permit_loading_ratio(const model::LoadModel& lm, const model::VehicleLibrary& library) {
  for (const model::LoadCase& c : lm.cases) {
    if (!c.train) continue;
    const model::AxleTrain* train = library.find_train(*c.train);
    if (train == nullptr || !(train->shortest_length() > 0)) continue;
    return train->gross_weight() * c.train_factor / train->shortest_length();
  }
  return std::nullopt;
}

GirderRating rate_girder_line(const GirderRatingInputs& in) {
  assert(in.analysis && in.capacity && in.policy);
  const analysis::GirderLineAnalysis& a = *in.analysis;
  const std::vector<analysis::AnalysisPoint>& points = a.live_influence.points;
  const bool lfr = in.method == model::RatingMethod::lfr;
  const model::LrfrFactors& lrfr = in.policy->lrfr;

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

  // Service data, computed once per point for every load model.
  const bool steel = model::is_steel(in.material);
  const bool prestressed = in.material == model::MaterialKind::prestressed_concrete;
  const bool reinforced = in.material == model::MaterialKind::reinforced_concrete;
  std::vector<PointService> service(points.size());
  const bool any_permit = std::any_of(in.load_models.begin(), in.load_models.end(), [](const RatedLoadModel& m) {
    return m.model->category == model::VehicleCategory::permit;
  });
  if (!lfr && reinforced && any_permit && in.policy->lrfr.service_checks.service_i_permit) {
    const Real length = in.capacity->length();
    for (std::size_t i = 0; i < points.size(); ++i) {
      const Real station = points[i].station;
      for (int sign = 0; sign < 2; ++sign)
        for (int s = 0; s < 2; ++s) {
          const bool left = s == 0;
          capacity::ReinforcedServiceLimits& r = service[i].reinforced[sign][s];
          if (left ? !(station > 0) : !(station < length)) {
            r.status = capacity::ResistanceStatus::unavailable;
            continue;
          }
          r = in.capacity->reinforced_service(
              station, sign == 0 ? capacity::MomentSign::positive : capacity::MomentSign::negative,
              left ? section::Side::left : section::Side::right);
        }
    }
  }
  if (!lfr && (steel || prestressed)) {
    RepeatedNotes skipped;
    RepeatedNotes qualified;
    const Real length = in.capacity->length();
    for (std::size_t i = 0; i < points.size(); ++i) {
      const Real station = points[i].station;
      for (int s = 0; s < 2; ++s) {
        const bool left = s == 0;
        if (left ? !(station > 0) : !(station < length)) {
          service[i].steel[s].status = capacity::ResistanceStatus::unavailable;
          service[i].prestressed[s].status = capacity::ResistanceStatus::unavailable;
          continue;
        }
        const section::Side side = left ? section::Side::left : section::Side::right;
        if (steel) {
          service[i].steel[s] = in.capacity->steel_service(station, side);
          service[i].prestressed[s].status = capacity::ResistanceStatus::unavailable;
          if (service[i].steel[s].status == capacity::ResistanceStatus::unavailable)
            skipped.add(service[i].steel[s].reason);
          for (const std::string& w : service[i].steel[s].warnings) qualified.add(w);
        } else {
          service[i].prestressed[s] = in.capacity->prestressed_service(station, side);
          service[i].steel[s].status = capacity::ResistanceStatus::unavailable;
          if (service[i].prestressed[s].status == capacity::ResistanceStatus::unavailable)
            skipped.add(service[i].prestressed[s].reason);
          for (const std::string& w : service[i].prestressed[s].warnings) qualified.add(w);
        }
      }
    }
    const char* name = steel ? "Service II not rated" : "Service III not rated";
    skipped.write(out.warnings, name);
    qualified.write(out.warnings, steel ? "Service II" : "Service III");
  }

  const model::StrengthDeadLoadFactors& dead_factors = lrfr.strength_i;
  const Real gamma_dc = dead_factors.dc;
  const Real gamma_dw = dead_load_factor_dw(dead_factors, in.wearing_surface_field_measured);
  // MBE Table 6A.4.2.2-1 (from memory): DC and DW at 1.0 in the service
  // limit states.
  constexpr Real kServiceDead = 1.0;

  for (const RatedLoadModel& rated : in.load_models) {
    assert(rated.model && rated.envelope);
    const model::LoadModel& lm = *rated.model;
    LoadModelRating mr;
    mr.load_model_id = lm.id;
    mr.name = lm.name;
    mr.category = lm.category;
    mr.rating_weight = lm.rating_weight;

    // Permits (LRFR): the policy's permit type sets the factor, the lanes and IM.
    const model::PermitType* permit = nullptr;
    GirderDistribution g = in.distribution;
    DynamicAllowanceAt impact = in.impact;
    std::optional<Real> loading_ratio;
    if (!lfr && lm.category == model::VehicleCategory::permit) {
      permit = lrfr.find_permit_type_for(lm.id);
      if (permit == nullptr) {
        throw InputError(
            SourceLocation{in.policy->source_files.empty() ? "policy" : in.policy->source_files.front(), 0, 0},
            "lrfr.permit_types",
            fmt::format("permit vehicle '{}' is in no permit type's load_models, so its load factor (MBE Table "
                        "6A.4.5.4.2a-1) is unknown; name it under the permit type it is issued as",
                        lm.id));
      }
      mr.permit_type = permit->id;
      loading_ratio = permit_loading_ratio(lm, in.policy->vehicles);
      if (permit->distribution == model::PermitDistribution::one_lane) {
        if (in.one_lane_distribution.moment_positive.size() == points.size()) {
          // MBE 6A.4.5.4.2b: one loaded lane, its multiple presence (1.2)
          // divided out when the permit crosses alone.
          g = in.one_lane_distribution;
          const Real m = permit->divide_out_multiple_presence ? lrfr.multiple_presence_for(1) : 1.0;
          for (std::vector<Real>* v : {&g.moment_positive, &g.moment_negative, &g.shear})
            for (Real& x : *v) x /= m;
        } else {
          mr.warnings.push_back(
              fmt::format("permit type {} asks for the one-lane distribution factor, which is not available here; the "
                          "multiple-lane factor is used (conservative)",
                          permit->id));
        }
      }
      if (permit->dynamic_allowance)
        impact = DynamicAllowanceAt::uniform(points.size(), *permit->dynamic_allowance, false);
    }
    if (!lfr && lm.category == model::VehicleCategory::permit && prestressed && lrfr.service_checks.service_i_permit) {
      mr.warnings.push_back(
          "Service I for permits on prestressed concrete (MBE Table 6A.4.2.2-1) is not rated; only Strength II is");
    }

    for (model::RatingLevel level : rating_levels(lm.category)) {
      LevelRating lr;
      lr.level = level;
      for (LimitState state : rated_limit_states(in.method, in.material, lm.category, level, lrfr.service_checks)) {
        LimitStateFactor factor;
        factor.limit_state = state;
        if (lfr) {
          factor.gamma_ll = in.policy->lfr.a2.at(level);
          factor.source = fmt::format("policy lfr.a2.{} (MBE 6B.4.1)", model::to_string(level));
        } else if (permit != nullptr && state == LimitState::strength_ii) {
          // Unknown ADTT: the table's highest ADTT (the largest factor,
          // conservative); a lane-only permit takes the lowest loading
          // ratio (the largest factor).
          Real highest_adtt = 0;
          for (const model::PermitRow& row : permit->rows) highest_adtt = std::max(highest_adtt, row.adtt);
          const LiveLoadFactor f = permit_live_load_factor(*permit, in.adtt, loading_ratio.value_or(0.0), highest_adtt);
          factor.gamma_ll = f.gamma_ll;
          factor.source = f.source;
        } else {
          const LiveLoadFactor f = live_load_factor(lrfr, lm.category, level, state, in.adtt);
          factor.gamma_ll = f.gamma_ll;
          factor.source = f.source;
        }
        if (is_strength(state)) lr.factor_source = factor.source;
        lr.factors.push_back(factor);
      }

      for (const LimitStateFactor& factor : lr.factors) {
        const Real gamma_ll = factor.gamma_ll;
        const auto start = [&](std::size_t i, RatedEffect effect, const std::string& side, const GoverningLive& live,
                               Real distribution, Real im) {
          PointRating pr;
          pr.point = i;
          pr.station = points[i].station;
          pr.label = points[i].label();
          pr.effect = effect;
          pr.side = side;
          pr.limit_state = factor.limit_state;
          pr.level = level;
          pr.distribution = distribution;
          pr.impact = im;
          pr.gamma_ll = gamma_ll;
          pr.case_id = live.case_id;
          return pr;
        };
        const auto keep = [&](PointRating&& pr) {
          if (better(pr, lr.governing)) lr.governing = pr;
          lr.points.push_back(std::move(pr));
        };

        if (is_strength(factor.limit_state)) {
          const auto rate = [&](std::size_t i, RatedEffect effect, const std::string& side,
                                const capacity::Resistance& r, const capacity::ConditionSystemFactors& factors,
                                DeadAt dead, const GoverningLive& live, Real distribution, Real im) {
            if (!live.any || !r.available()) return;
            PointRating pr = start(i, effect, side, live, distribution, im);
            pr.resistance = r.factored;
            pr.resistance_article = r.article;
            if (lfr) {
              // MBE 6B.4.1-1; LFR applies no condition or system factor.
              pr.capacity_factor = 1.0;
              pr.result = lfr_rating_factor(r.factored, dead.dc + dead.dw, in.policy->lfr.a1, live.value, gamma_ll);
            } else {
              // MBE 6A.4.2.1-1 with C = phi_c phi_s phi Rn (phi_c phi_s at its
              // floor); Strength II takes the Strength I dead-load factors (MBE
              // Table 6A.4.2.2-1, from memory).
              pr.capacity_factor = factors.product;
              pr.result = lrfr_rating_factor(factors.product * r.factored, dead.dc, gamma_dc, dead.dw, gamma_dw,
                                             live.value, gamma_ll);
            }
            keep(std::move(pr));
          };

          for (std::size_t i = 0; i < points.size(); ++i) {
            const PointCapacity& cap = capacities[i];
            const Real station = points[i].station;
            const DeadAt dm = dead_moment(a, i);
            {
              const Real im = impact.positive_moment[i];
              rate(i, RatedEffect::positive_moment, "", cap.positive, in.moment_factors, dm,
                   governing_live(*rated.envelope, EffectKind::moment, i, Extreme::maximum, g.moment_positive[i], im,
                                  impact.applies_to_lane),
                   g.moment_positive[i], im);
            }
            {
              const Real im = impact.negative_moment[i];
              rate(i, RatedEffect::negative_moment, "", cap.negative, in.moment_factors, DeadAt{-dm.dc, -dm.dw},
                   governing_live(*rated.envelope, EffectKind::moment, i, Extreme::minimum, g.moment_negative[i], im,
                                  impact.applies_to_lane),
                   g.moment_negative[i], im);
            }
            const Real im = impact.shear[i];
            // Concrete webs (LRFD 5.7.3.4.2) need the factored demand at the
            // section: Vu from this vehicle at this level and, conservatively
            // for the longitudinal strain, the factored moment with the
            // largest live moment at the point (the concurrent moment is not
            // tracked).
            const bool concrete = !lfr && (in.material == model::MaterialKind::reinforced_concrete ||
                                           in.material == model::MaterialKind::prestressed_concrete);
            const GoverningLive live_moment =
                governing_live(*rated.envelope, EffectKind::moment, i, Extreme::maximum, g.moment_positive[i],
                               impact.positive_moment[i], impact.applies_to_lane);
            const Real mu = gamma_dc * dm.dc + gamma_dw * dm.dw + gamma_ll * live_moment.value;
            for (int s = 0; s < 2; ++s) {
              const bool left = s == 0;
              const EffectKind kind = left ? EffectKind::shear_left : EffectKind::shear_right;
              const DeadAt dv = dead_shear(a, i, left);
              for (Extreme e : live_load::kExtremes) {
                const Real sign = live_load::sign_of(e);
                const GoverningLive live =
                    governing_live(*rated.envelope, kind, i, e, g.shear[i], im, impact.applies_to_lane);
                const DeadAt dead{sign * dv.dc, sign * dv.dw};
                const capacity::Resistance* resistance = &cap.shear[s];
                capacity::Resistance with_demand;
                if (concrete && live.any && cap.shear[s].status != capacity::ResistanceStatus::given) {
                  const Real vu = std::abs(gamma_dc * dead.dc + gamma_dw * dead.dw + gamma_ll * live.value);
                  with_demand = in.capacity->shear(station, left ? section::Side::left : section::Side::right,
                                                   capacity::ShearDemand{mu, vu, 0.0});
                  if (with_demand.available()) resistance = &with_demand;
                }
                rate(i, RatedEffect::shear, left ? "left" : "right", *resistance, in.shear_factors, dead, live,
                     g.shear[i], im);
              }
            }
          }
          continue;
        }

        // Service limit states in stress form; no phi_c phi_s (C = fR).
        for (std::size_t i = 0; i < points.size(); ++i) {
          const StageMoments m = stage_moments(a, i);
          for (RatedEffect effect : {RatedEffect::positive_moment, RatedEffect::negative_moment}) {
            const bool positive = effect == RatedEffect::positive_moment;
            // Service III covers the bottom fibre in positive moment only
            // (prestressed_service_limits.h).
            if (factor.limit_state == LimitState::service_iii && !positive) continue;
            const int sign_index = positive ? 0 : 1;
            const Real sense = positive ? 1.0 : -1.0;  // moments as magnitudes in the adverse sense
            const Real im = positive ? impact.positive_moment[i] : impact.negative_moment[i];
            const Real distribution = positive ? g.moment_positive[i] : g.moment_negative[i];
            const GoverningLive live =
                governing_live(*rated.envelope, EffectKind::moment, i, positive ? Extreme::maximum : Extreme::minimum,
                               distribution, im, impact.applies_to_lane);
            if (!live.any) continue;
            // The lower rating of the two sides of the point, per fibre.
            std::optional<PointRating> fibre_best[2];
            for (int s = 0; s < 2; ++s) {
              if (factor.limit_state == LimitState::service_i) {
                const capacity::ReinforcedServiceLimits& limits = service[i].reinforced[sign_index][s];
                if (limits.status == capacity::ResistanceStatus::unavailable) continue;
                // MBE 6A.5.4.2.2b (from memory): fs under the permit <= 0.9 fy,
                // every load on the one cracked section (fs = M / Ss).
                const Real ss = limits.steel_section_modulus;
                PointRating pr = start(i, effect, "", live, distribution, im);
                pr.fibre = "tension steel";
                pr.resistance = limits.allowable_stress;
                pr.resistance_article = "MBE 6A.5.4.2.2b";
                pr.result = rating_factor(
                    limits.allowable_stress,
                    {{"fsDC", kServiceDead, sense * (m.dc1 + m.dc2) / ss}, {"fsDW", kServiceDead, sense * m.dw / ss}},
                    {"fsLL+IM", gamma_ll, live.value / ss});
                if (pr.result.status == RatingStatus::rated &&
                    (!fibre_best[0] || pr.result.rating_factor < fibre_best[0]->result.rating_factor))
                  fibre_best[0] = std::move(pr);
              } else if (factor.limit_state == LimitState::service_ii) {
                const capacity::SteelServiceLimits& limits = service[i].steel[s];
                if (limits.status == capacity::ResistanceStatus::unavailable) continue;
                const capacity::StageModuli& moduli = positive ? limits.positive_moment : limits.negative_moment;
                for (int top = 0; top < 2; ++top) {
                  const auto pick = [&](const capacity::FibreModuli& f) { return top == 1 ? f.top : f.bottom; };
                  const std::optional<Real> s1 = pick(moduli.dc1);
                  const std::optional<Real> s2 = pick(moduli.dc2_dw);
                  const std::optional<Real> sl = pick(moduli.live_load);
                  if (!s1 || !s2 || !sl) continue;
                  // LRFD 6.10.4.2.2 with MBE 6A.6.4.2.1 (from memory): flange
                  // stress f = M / S of each stage on its own section.
                  const Real fr = top == 1 ? limits.top_flange : limits.bottom_flange;
                  PointRating pr = start(i, effect, "", live, distribution, im);
                  pr.fibre = top == 1 ? "top flange" : "bottom flange";
                  pr.resistance = fr;
                  pr.resistance_article = "AASHTO LRFD 6.10.4.2.2";
                  pr.result = rating_factor(fr,
                                            {{"fDC1", kServiceDead, sense * m.dc1 / *s1},
                                             {"fDC2", kServiceDead, sense * m.dc2 / *s2},
                                             {"fDW", kServiceDead, sense * m.dw / *s2}},
                                            {"fLL+IM", gamma_ll, live.value / *sl});
                  if (pr.result.status == RatingStatus::rated &&
                      (!fibre_best[top] || pr.result.rating_factor < fibre_best[top]->result.rating_factor))
                    fibre_best[top] = std::move(pr);
                }
              } else {
                const capacity::PrestressedServiceLimits& limits = service[i].prestressed[s];
                if (limits.status == capacity::ResistanceStatus::unavailable) continue;
                const std::optional<Real> s1 = limits.moduli.dc1.bottom;
                const std::optional<Real> s2 = limits.moduli.dc2_dw.bottom;
                const std::optional<Real> sl = limits.moduli.live_load.bottom;
                if (!s1 || !s2 || !sl) continue;
                // MBE 6A.5.4.2.2 / LRFD 5.9.2.3.2b: bottom-fibre tension,
                // positive moment puts the soffit in tension (f = M / Sb).
                PointRating pr = start(i, effect, "", live, distribution, im);
                pr.fibre = "bottom fibre";
                pr.resistance = limits.allowable_tension;
                pr.resistance_article = "AASHTO LRFD Table 5.9.2.3.2b-1 (MBE 6A.5.4.2.2)";
                pr.result = rating_factor(limits.allowable_tension,
                                          {{"fP", 1.0, limits.prestress_bottom_stress},
                                           {"fDC1", kServiceDead, m.dc1 / *s1},
                                           {"fDC2", kServiceDead, m.dc2 / *s2},
                                           {"fDW", kServiceDead, m.dw / *s2}},
                                          {"fLL+IM", gamma_ll, live.value / *sl});
                if (pr.result.status == RatingStatus::rated &&
                    (!fibre_best[0] || pr.result.rating_factor < fibre_best[0]->result.rating_factor))
                  fibre_best[0] = std::move(pr);
              }
            }
            for (std::optional<PointRating>& best : fibre_best)
              if (best) keep(std::move(*best));
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
