#include "engine/pipeline/girder_line_detail.h"

#include <cassert>

namespace tenthpoint::pipeline {
namespace {

using live_load::EffectKind;
using live_load::Extreme;

// The dynamic allowance the rating applied to this effect and extreme:
// the maximum moment is sagging (positive-moment IM), the minimum hogging
// (negative-moment IM); shear uses the shear IM either way (as
// rating::rate_girder_line).
Real impact_for(const rating::DynamicAllowanceAt& impact, EffectKind kind, Extreme extreme, std::size_t point) {
  if (kind != EffectKind::moment) return impact.shear[point];
  return extreme == Extreme::maximum ? impact.positive_moment[point] : impact.negative_moment[point];
}

Real distribution_for(const rating::GirderDistribution& d, EffectKind kind, Extreme extreme, std::size_t point) {
  if (kind != EffectKind::moment) return d.shear[point];
  return extreme == Extreme::maximum ? d.moment_positive[point] : d.moment_negative[point];
}

EnvelopeEntry entry_of(const live_load::MovingLoadEnvelope& envelope, EffectKind kind, std::size_t point,
                       Extreme extreme, Real distribution, Real impact, bool impact_on_lane) {
  EnvelopeEntry e;
  const live_load::EffectKey key{kind, point, extreme};
  if (const std::optional<std::size_t>& g = envelope.governing.at(key)) {
    const std::optional<live_load::CaseExtreme>& value = envelope.cases[*g].values.at(key);
    assert(value);
    e.static_case = static_cast<std::int32_t>(*g);
    e.train = value->train_value();
    e.lane = value->lane_value();
    e.total = value->total();
    if (value->train) e.placement = value->train->placement;
  }
  // The same choice as the rating (rating/girder_rating.h): the most adverse
  // case after IM, which can differ from the static governing case.
  const Real sign = live_load::sign_of(extreme);
  Real best = 0;
  for (std::size_t c = 0; c < envelope.cases.size(); ++c) {
    const std::optional<live_load::CaseExtreme>& value = envelope.cases[c].values.at(key);
    if (!value) continue;
    const Real adverse =
        sign * ((1 + impact) * value->train_value() + (impact_on_lane ? 1 + impact : 1.0) * value->lane_value());
    if (e.distributed_case < 0 || adverse > best) {
      best = adverse;
      e.distributed_case = static_cast<std::int32_t>(c);
    }
  }
  if (e.distributed_case >= 0) e.distributed = sign * best * distribution;
  return e;
}

}  // namespace

GirderLineDetail girder_line_detail(const analysis::GirderLineAnalysis& analysis,
                                    const std::vector<live_load::MovingLoadEnvelope>& envelopes,
                                    const rating::GirderDistribution& distribution,
                                    const rating::DynamicAllowanceAt& impact) {
  GirderLineDetail d;
  d.girder_id = analysis.girder_id;
  d.points = analysis.live_influence.points;
  const std::size_t n = d.points.size();
  for (const analysis::ComponentEffects& c : analysis.dead_loads)
    d.dead_loads.push_back({c.component, c.effects.moment, c.effects.shear_left, c.effects.shear_right});
  d.distribution = distribution;
  d.impact = impact;
  for (const live_load::MovingLoadEnvelope& envelope : envelopes) {
    LoadModelEnvelope m;
    m.load_model_id = envelope.load_model_id;
    for (const live_load::CaseEnvelope& c : envelope.cases) m.cases.push_back({c.case_id, c.chain, c.lane.has_value()});
    for (EffectKind kind : {EffectKind::moment, EffectKind::shear_left, EffectKind::shear_right}) {
      std::vector<live_load::ExtremePair<EnvelopeEntry>>& out =
          kind == EffectKind::moment ? m.moment : (kind == EffectKind::shear_left ? m.shear_left : m.shear_right);
      out.resize(n);
      for (std::size_t i = 0; i < n; ++i)
        for (Extreme extreme : live_load::kExtremes)
          out[i][extreme] = entry_of(envelope, kind, i, extreme, distribution_for(distribution, kind, extreme, i),
                                     impact_for(impact, kind, extreme, i), impact.applies_to_lane);
    }
    d.envelopes.push_back(std::move(m));
  }
  return d;
}

}  // namespace tenthpoint::pipeline
