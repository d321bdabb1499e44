#include "engine/analysis/girder_line_analysis.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <variant>

#include <fmt/format.h>

#include "engine/core/errors.h"
#include "engine/section/girder_section_profile.h"

namespace tenthpoint::analysis {
namespace {

SupportKind to_analysis(model::SupportKind kind) {
  switch (kind) {
    case model::SupportKind::pin:
      return SupportKind::pin;
    case model::SupportKind::roller:
      return SupportKind::roller;
    case model::SupportKind::fixed:
      return SupportKind::fixed;
  }
  return SupportKind::pin;
}

FlexuralRigidity to_rigidity(const section::StiffnessProfile& profile) {
  FlexuralRigidity rigidity;
  rigidity.segments.reserve(profile.pieces.size());
  for (const section::StiffnessPiece& piece : profile.pieces) {
    RigiditySegment segment;
    segment.start = piece.start;
    segment.end = piece.end;
    if (piece.prismatic())
      segment.constant = std::get<Real>(piece.flexural_rigidity);
    else
      segment.varying = std::get<std::function<Real(Real)>>(piece.flexural_rigidity);
    rigidity.segments.push_back(std::move(segment));
  }
  return rigidity;
}

bool applies_to(const std::vector<std::string>& girders, const std::string& id) {
  return girders.empty() || std::find(girders.begin(), girders.end(), id) != girders.end();
}

Real tributary_width(const model::GirderLine& g) {
  if (g.position == model::GirderPosition::interior) return g.spacing;
  return 0.5 * g.spacing + g.overhang.value_or(0.5 * g.spacing);
}

// Fraction of a cross-section load that one girder of `girder` carries.
Real cross_section_share(const model::Bridge& bridge, const model::GirderLine& girder, model::DistributionRule rule) {
  switch (rule) {
    case model::DistributionRule::equal: {
      const int n = bridge.girder_count();
      return n > 0 ? 1.0 / n : 0.0;
    }
    case model::DistributionRule::tributary_width: {
      Real total = 0;
      for (const model::GirderLine& g : bridge.girders) total += g.count * tributary_width(g);
      return total > 0 ? tributary_width(girder) / total : 0.0;
    }
    case model::DistributionRule::exterior_only: {
      if (girder.position != model::GirderPosition::exterior) return 0.0;
      int exterior = 0;
      for (const model::GirderLine& g : bridge.girders)
        if (g.position == model::GirderPosition::exterior) exterior += g.count;
      return exterior > 0 ? 1.0 / exterior : 0.0;
    }
  }
  return 0.0;
}

}  // namespace

const ComponentEffects& GirderLineAnalysis::component(model::DeadLoadComponent c) const {
  for (const ComponentEffects& e : dead_loads)
    if (e.component == c) return e;
  assert(false && "every component is present");
  return dead_loads.front();
}

GirderLayout girder_layout(const model::Bridge& bridge, const model::GirderLine& girder) {
  GirderLayout layout;
  layout.bridge_id = bridge.identity.structure_id;
  layout.span_lengths = bridge.geometry.span_lengths;
  for (model::SupportKind kind : bridge.geometry.supports) layout.supports.push_back(to_analysis(kind));
  for (std::size_t i = 0; i < bridge.geometry.continuity.size(); ++i)
    if (bridge.geometry.continuity[i] == model::Continuity::hinge)
      layout.hinge_stations.push_back(bridge.geometry.support_station(i + 1));
  for (Real x : bridge.geometry.hinges) layout.hinge_stations.push_back(x);
  std::sort(layout.hinge_stations.begin(), layout.hinge_stations.end());
  for (const model::NamedPoint& p : bridge.points_of_interest) layout.named_points.push_back({p.label, p.station});
  // Section-loss regions get their own points so a rating sees the reduced
  // section where it starts and ends, not only at the nearest tenth point.
  for (const model::Inspection& inspection : bridge.inspections) {
    for (const model::SectionLoss& loss : inspection.section_loss) {
      if (loss.girder != girder.id) continue;
      const std::string what(model::to_string(loss.element));
      layout.named_points.push_back({fmt::format("{} loss start ({})", what, inspection.date.to_iso()), loss.start});
      layout.named_points.push_back({fmt::format("{} loss end ({})", what, inspection.date.to_iso()), loss.end});
    }
  }
  return layout;
}

DeadLoadCase girder_dead_loads(const model::Bridge& bridge, const model::GirderLine& girder,
                               model::DeadLoadComponent component) {
  DeadLoadCase loads;
  loads.name = std::string(model::to_string(component));
  const Real length = bridge.geometry.total_length();
  for (const model::DeadLoad& load : bridge.dead_loads) {
    if (load.component != component) continue;
    Real share = 1.0;
    if (load.scope == model::LoadScope::per_girder) {
      if (!applies_to(load.girders, girder.id)) continue;
    } else {
      share = cross_section_share(bridge, girder, load.rule);
      if (!applies_to(load.girders, girder.id)) share = 0.0;
    }
    if (share == 0.0) continue;
    if (const auto* u = std::get_if<model::UniformLoad>(&load.shape)) {
      const Real start = u->start.value_or(0.0);
      const Real end = u->end.value_or(length);
      if (start <= 0.0 && end >= length)
        loads.add_uniform(share * u->intensity);
      else
        loads.add_partial(start, end, share * u->intensity);
    } else if (const auto* p = std::get_if<model::PointLoad>(&load.shape)) {
      loads.add_point(p->station, share * p->force, load.description);
    } else if (const auto* ws = std::get_if<model::WearingSurface>(&load.shape)) {
      const Real width = ws->width.value_or(bridge.traffic.clear_roadway_width);
      loads.add_uniform(share * ws->thickness * width * ws->unit_weight);
    }
  }
  return loads;
}

GirderLineAnalysis analyse_girder_line(const model::Bridge& bridge, const model::GirderLine& girder,
                                       const GirderLineAnalysisOptions& options) {
  const section::GirderSectionProfile sections(bridge, girder, options.section);
  const GirderLayout layout = girder_layout(bridge, girder);

  std::vector<std::size_t> made_continuous;
  for (std::size_t i = 0; i < bridge.geometry.continuity.size(); ++i)
    if (bridge.geometry.continuity[i] == model::Continuity::simple_made_continuous) made_continuous.push_back(i + 1);

  GirderLineAnalysis out;
  out.bridge_id = bridge.identity.structure_id;
  out.girder_id = girder.id;
  out.dc1_model = std::make_unique<LineGirderModel>(with_hinges_at_supports(layout, made_continuous),
                                                    to_rigidity(sections.stiffness(model::SectionStage::noncomposite)),
                                                    options.model);
  out.long_term_model = std::make_unique<LineGirderModel>(
      layout, to_rigidity(sections.stiffness(model::SectionStage::long_term_composite)), options.model);
  out.live_model = std::make_unique<LineGirderModel>(
      layout, to_rigidity(sections.stiffness(model::SectionStage::short_term_composite)), options.model);
  out.live_influence = compute_influence_lines(*out.live_model, options.influence);

  for (model::DeadLoadComponent c :
       {model::DeadLoadComponent::dc1, model::DeadLoadComponent::dc2, model::DeadLoadComponent::dw}) {
    ComponentEffects effects;
    effects.component = c;
    effects.loads = girder_dead_loads(bridge, girder, c);
    const LineGirderModel& system = c == model::DeadLoadComponent::dc1 ? *out.dc1_model : *out.long_term_model;
    effects.effects = solve_dead_load(system, effects.loads);
    out.dead_loads.push_back(std::move(effects));
  }

  bool any_wearing = false;
  bool all_measured = true;
  for (const model::DeadLoad& load : bridge.dead_loads) {
    if (const auto* ws = std::get_if<model::WearingSurface>(&load.shape)) {
      any_wearing = true;
      all_measured = all_measured && ws->field_measured;
    }
  }
  out.wearing_surface_field_measured = any_wearing && all_measured;
  return out;
}

}  // namespace tenthpoint::analysis
