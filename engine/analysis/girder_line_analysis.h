// GirderLineAnalysis: everything the line-girder analysis gives for one girder
// line of a bridge, built from the bridge model. It is the bridge between the
// plain bridge record (engine/model) and the structural models of this module.
//
// Structural system per load stage (AASHTO LRFD 3.3.2, 4.6.2.2.1; MBE 6A.3):
//   DC1  noncomposite section; hinges over every interior support marked
//        `simple_made_continuous` (precast girders erected as simple spans)
//        and every `hinge`;
//   DC2, DW  long-term composite section (3n), continuous except at hinges;
//   live load  short-term composite section (n), continuous except at hinges.
// Hinges are the supports marked `hinge` plus geometry.hinges inside spans,
// in every stage.
// On a non-composite bridge all stages use the noncomposite section.
//
// Dead loads are turned into per-girder line loads here:
//   per_girder          applied as given to the girder lines it names (all when none);
//   cross_section       shared out by its rule:
//     equal             load / number of girders in the cross-section;
//     tributary_width   load x (tributary width of this girder / sum of all
//                       tributary widths); a tributary width is the spacing
//                       for an interior girder and spacing/2 + overhang for
//                       an exterior one;
//     exterior_only     load / number of exterior girders, on exterior lines only.
//   A wearing surface is thickness x width (the clear roadway unless given) x
//   unit weight, then shared out the same way.
//
// Analysis points: those of LineGirderModel (tenth points, supports, hinges,
// section changes) plus the bridge's points of interest and the ends of every
// section-loss region recorded for this girder line in any inspection.
//
// Failure: InputError for section data that cannot be resolved (from
// engine/section); ModelError naming the bridge for a structure that cannot
// be analysed.
#pragma once

#include <map>
#include <memory>
#include <string>
#include <vector>

#include "engine/analysis/dead_load_case.h"
#include "engine/analysis/dead_load_effects.h"
#include "engine/analysis/influence_lines.h"
#include "engine/analysis/line_girder_model.h"
#include "engine/model/bridge.h"
#include "engine/section/section_options.h"

namespace tenthpoint::analysis {

struct GirderLineAnalysisOptions {
  ModelOptions model;
  section::SectionOptions section;
  InfluenceLineOptions influence;
};

struct ComponentEffects {
  model::DeadLoadComponent component = model::DeadLoadComponent::dc1;
  DeadLoadCase loads;       // per-girder line loads of the component
  DeadLoadEffects effects;  // on the component's own structural system
};

struct GirderLineAnalysis {
  std::string bridge_id;
  std::string girder_id;
  // One model per stage that the bridge needs; `live` carries the influence
  // lines used for live load.
  std::unique_ptr<LineGirderModel> dc1_model;
  std::unique_ptr<LineGirderModel> long_term_model;
  std::unique_ptr<LineGirderModel> live_model;
  InfluenceLines live_influence;                // on live_model
  std::vector<ComponentEffects> dead_loads;     // DC1, DC2, DW in that order (each present, possibly empty)
  bool wearing_surface_field_measured = false;  // every DW wearing surface was measured in the field

  [[nodiscard]] const ComponentEffects& component(model::DeadLoadComponent c) const;
};

// The layout (spans, supports, hinges, named points) of `girder` for the
// live-load and long-term stages; DC1 adds hinges at simple_made_continuous
// supports (see with_hinges_at_supports).
[[nodiscard]] GirderLayout girder_layout(const model::Bridge& bridge, const model::GirderLine& girder);

// The per-girder line loads of one component for `girder`, by the rules above.
[[nodiscard]] DeadLoadCase girder_dead_loads(const model::Bridge& bridge, const model::GirderLine& girder,
                                             model::DeadLoadComponent component);

[[nodiscard]] GirderLineAnalysis analyse_girder_line(const model::Bridge& bridge, const model::GirderLine& girder,
                                                     const GirderLineAnalysisOptions& options = {});

}  // namespace tenthpoint::analysis
