#include "engine/distribution/girder_stiffness.h"

#include <cmath>
#include <variant>

#include "engine/core/errors.h"
#include "engine/section/concrete_modulus.h"
#include "engine/section/modular_ratios.h"

namespace tenthpoint::distribution {
namespace {

const model::Segment* segment_at(const model::GirderLine& girder, Real station) {
  for (const auto& s : girder.segments) {
    if (station >= s.start && station <= s.end) return &s;
  }
  return nullptr;
}

// n for Kg. LRFD 4.6.2.2.1 defines n = E_B / E_D whether or not the deck is
// composite, so a noncomposite bridge still has one when the deck concrete is known.
std::optional<Real> deck_ratio(const model::Materials& materials, const DistributionOptions& options) {
  try {
    const auto ratios = section::modular_ratios(materials, options.section);
    if (ratios.short_term) return ratios.short_term;
    if (materials.modular_ratio) return materials.modular_ratio;
    if (materials.deck_concrete) {
      return ratios.girder_modulus /
             section::concrete_modulus(*materials.deck_concrete, options.section.concrete_modulus_formula,
                                       options.section.aggregate_factor, "materials.deck_concrete");
    }
  } catch (const InputError&) {
    return std::nullopt;
  }
  return std::nullopt;
}

}  // namespace

GirderStiffness girder_stiffness(const model::Bridge& bridge, const model::GirderLine& girder,
                                 const section::GirderSectionProfile& profile, Real station,
                                 const DistributionOptions& options) {
  GirderStiffness out;
  const model::Segment* segment = segment_at(girder, station);
  const model::SectionDefinition* definition = segment ? bridge.find_section(segment->section) : nullptr;
  if (definition == nullptr) {
    out.why_unknown = "no section at the station";
    return out;
  }
  out.section_id = definition->id;

  if (!definition->deck && definition->description) {
    if (const auto* rc = std::get_if<model::ReinforcedConcreteBeam>(&*definition->description);
        rc != nullptr && rc->flange_thickness > 0) {
      const Real stem = rc->height - rc->flange_thickness;
      out.area = rc->web_width * stem;
      out.inertia = rc->web_width * std::pow(stem, 3) / 12.0;
      out.eccentricity = 0.5 * rc->height;
      out.modular_ratio = 1.0;
      out.slab_thickness = rc->flange_thickness;
      out.kg = out.inertia + out.area * out.eccentricity * out.eccentricity;
      return out;
    }
  }
  if (!definition->deck) {
    out.why_unknown = "section " + definition->id + " has no deck, so ts and eg are unknown";
    return out;
  }
  const auto& deck = *definition->deck;
  out.slab_thickness = deck.thickness;

  const auto stage = profile.stage_at(model::SectionStage::noncomposite, station);
  out.area = stage.area;
  out.inertia = stage.inertia;
  std::optional<Real> top = stage.girder_top;
  if (!top && stage.neutral_axis && stage.section_modulus_top) {
    top = *stage.neutral_axis + stage.inertia / *stage.section_modulus_top;
  }
  if (!stage.neutral_axis || !top) {
    out.why_unknown = "section " + definition->id + " gives no neutral axis or girder depth, so eg is unknown";
    return out;
  }
  const auto n = deck_ratio(bridge.materials, options);
  if (!n) {
    out.why_unknown = "no modular ratio and no deck concrete to compute n from";
    return out;
  }
  out.modular_ratio = *n;
  out.eccentricity = *top + deck.haunch + 0.5 * deck.thickness - *stage.neutral_axis;
  // LRFD 4.6.2.2.1-1: Kg = n (I + A eg^2).
  out.kg = out.modular_ratio * (out.inertia + out.area * out.eccentricity * out.eccentricity);
  return out;
}

}  // namespace tenthpoint::distribution
