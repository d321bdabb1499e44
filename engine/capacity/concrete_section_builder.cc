#include "engine/capacity/concrete_section_builder.h"

#include <cassert>

#include <fmt/format.h>

#include "engine/core/errors.h"
#include "engine/section/deck_layout.h"
#include "engine/section/input_checks.h"
#include "engine/section/prestressed_section.h"
#include "engine/section/reinforced_concrete_section.h"

namespace tenthpoint::capacity {
namespace {

[[noreturn]] void missing_material(const std::string& file, const char* field, const std::string& section_id,
                                   const char* why) {
  throw InputError(SourceLocation{file, 0, 0}, field,
                   fmt::format("missing; needed for the {} of section {}", why, section_id));
}

std::string label_of(const model::SectionDefinition& definition, MomentSign sign) {
  return fmt::format("sections[{}] {} moment", definition.id, to_string(sign));
}

Real deck_strength(const model::Materials& materials, const model::SectionDefinition& definition,
                   const std::string& file) {
  if (!materials.deck_concrete) missing_material(file, "materials.deck_concrete", definition.id, "composite flexure");
  return materials.deck_concrete->compressive_strength;
}

void set_stirrups(ConcreteShearSection& shear, const std::optional<Real>& area, const std::optional<Real>& spacing,
                  const model::Materials& materials, const model::SectionDefinition& definition,
                  const std::string& file) {
  shear.stirrup_area = area;
  shear.stirrup_spacing = spacing;
  if (area && spacing) {
    if (!materials.reinforcement) missing_material(file, "materials.reinforcement", definition.id, "stirrups");
    shear.stirrup_yield = materials.reinforcement->yield_strength;
  }
}

}  // namespace

ConcreteMemberSections reinforced_concrete_sections(const model::SectionDefinition& definition,
                                                    const model::Materials& materials, MomentSign sign,
                                                    Real density_factor, const std::string& file) {
  assert(definition.description && std::holds_alternative<model::ReinforcedConcreteBeam>(*definition.description));
  const auto& beam = std::get<model::ReinforcedConcreteBeam>(*definition.description);
  const section::detail::SectionContext context{definition.id, definition.where};
  const section::ReinforcedConcreteSection checked(beam, context);  // validates the dimensions
  if (!materials.girder_concrete) missing_material(file, "materials.girder_concrete", definition.id, "flexure");
  const bool composite = materials.composite && definition.deck.has_value();
  if (composite) static_cast<void>(section::DeckLayout(*definition.deck, beam.height, context));  // validates

  ConcreteMemberSections out;
  ConcreteFlexureSection& f = out.flexure;
  f.label = label_of(definition, sign);
  const Real fc = materials.girder_concrete->compressive_strength;
  const Real deck_offset =
      composite ? definition.deck->haunch + definition.deck->thickness : 0.0;  // deck top above beam top
  const Real h = beam.height + deck_offset;
  f.height = h;
  f.web_width = beam.web_width;
  if (sign == MomentSign::positive) {
    if (composite) {
      f.flange_width = definition.deck->effective_width;
      f.flange_thickness = definition.deck->thickness;
      f.concrete_strength = deck_strength(materials, definition, file);
      out.notes.push_back(
          "deck taken as the compression flange over the beam's web width (haunch and beam flange "
          "left out, conservative)");
    } else {
      f.flange_width = beam.flange_thickness > 0 ? beam.flange_width : beam.web_width;
      f.flange_thickness = beam.flange_thickness;
      f.concrete_strength = fc;
    }
    for (const model::BarLayer& layer : beam.bottom_bars) f.bars.push_back({layer.area, layer.depth + deck_offset});
  } else {
    f.flange_width = beam.web_width;
    f.flange_thickness = 0;
    f.concrete_strength = fc;
    for (const model::BarLayer& layer : beam.top_bars) f.bars.push_back({layer.area, h - layer.depth - deck_offset});
    if (composite) {
      for (const model::BarLayer& layer : definition.deck->longitudinal_bars)
        f.bars.push_back({layer.area, h - layer.depth});
    }
  }
  if (!f.bars.empty()) {
    if (!materials.reinforcement) missing_material(file, "materials.reinforcement", definition.id, "bars");
    f.bar_yield = materials.reinforcement->yield_strength;
    f.bar_modulus = materials.reinforcement->modulus;
  }

  ConcreteShearSection& v = out.shear;
  v.label = fmt::format("sections[{}]", definition.id);
  v.web_width = beam.web_width;
  v.height = h;
  v.concrete_strength = fc;
  v.density_factor = density_factor;
  set_stirrups(v, beam.stirrup_area, beam.stirrup_spacing, materials, definition, file);
  for (const ReinforcementLayer& layer : f.bars) v.bar_area += layer.area;
  v.bar_modulus = f.bar_modulus;
  return out;
}

ConcreteMemberSections prestressed_sections(const model::SectionDefinition& definition,
                                            const model::Materials& materials, MomentSign sign, Real density_factor,
                                            const std::string& file) {
  assert(definition.description && std::holds_alternative<model::PrestressedGirder>(*definition.description));
  const auto& girder = std::get<model::PrestressedGirder>(*definition.description);
  const section::detail::SectionContext context{definition.id, definition.where};
  const section::PrestressedSection checked(girder, context);  // validates the dimensions
  context.require_positive(girder.web_width, "ps_girder.web_width");
  if (!materials.girder_concrete) missing_material(file, "materials.girder_concrete", definition.id, "flexure");
  if (!materials.strand) missing_material(file, "materials.strand", definition.id, "flexure");
  const bool composite = materials.composite && definition.deck.has_value();
  if (composite) static_cast<void>(section::DeckLayout(*definition.deck, girder.height, context));  // validates

  ConcreteMemberSections out;
  ConcreteFlexureSection& f = out.flexure;
  f.label = label_of(definition, sign);
  const Real fc = materials.girder_concrete->compressive_strength;
  const Real top = composite ? girder.height + definition.deck->haunch + definition.deck->thickness : girder.height;
  f.height = top;
  f.web_width = girder.web_width;
  const model::PrestressingSteel& strand = *materials.strand;
  const Real fpy = strand.yield_strength.value_or((strand.low_relaxation ? 0.90 : 0.85) * strand.tensile_strength);
  if (!strand.yield_strength) {
    out.notes.push_back(strand.low_relaxation ? "fpy = 0.90 fpu (low relaxation, AASHTO LRFD Table 5.4.4.1-1)"
                                              : "fpy = 0.85 fpu (stress relieved, AASHTO LRFD Table 5.4.4.1-1)");
  }

  ConcreteShearSection& v = out.shear;
  v.label = fmt::format("sections[{}]", definition.id);
  v.web_width = girder.web_width;
  v.height = top;
  v.concrete_strength = fc;
  v.density_factor = density_factor;
  v.prestressed = true;
  set_stirrups(v, girder.stirrup_area, girder.stirrup_spacing, materials, definition, file);

  if (sign == MomentSign::positive) {
    if (composite) {
      f.flange_width = definition.deck->effective_width;
      f.flange_thickness = definition.deck->thickness;
      f.concrete_strength = deck_strength(materials, definition, file);
      out.notes.push_back(
          "deck taken as the compression flange; below it only the girder web width carries "
          "compression (haunch and precast top flange not in the model; conservative)");
    } else {
      f.flange_width = girder.web_width;
      f.flange_thickness = 0;
      f.concrete_strength = fc;
      out.warnings.push_back(fmt::format(
          "sections[{}]: non-composite precast girder: the compression zone is taken over the web width because the "
          "top flange width is not in the model (conservative)",
          definition.id));
    }
    for (const model::StrandLayer& layer : girder.strands) {
      if (layer.count > 0) f.strands.push_back({layer.count * layer.strand_area, top - layer.height_from_bottom});
    }
    f.strand_tensile_strength = strand.tensile_strength;
    f.strand_yield_strength = fpy;
    for (const ReinforcementLayer& layer : f.strands) v.strand_area += layer.area;
    v.strand_modulus = strand.modulus;
    v.strand_tensile_strength = strand.tensile_strength;
  } else {
    f.flange_width = girder.web_width;
    f.flange_thickness = 0;
    f.concrete_strength = fc;
    if (composite) {
      for (const model::BarLayer& layer : definition.deck->longitudinal_bars)
        f.bars.push_back({layer.area, top - layer.depth});
    }
    if (!f.bars.empty()) {
      if (!materials.reinforcement) missing_material(file, "materials.reinforcement", definition.id, "deck bars");
      f.bar_yield = materials.reinforcement->yield_strength;
      f.bar_modulus = materials.reinforcement->modulus;
      out.notes.push_back(
          "negative moment: deck bars in tension, compression over the girder web width at the "
          "soffit (bottom flange not in the model; conservative); strands left out");
    }
    for (const ReinforcementLayer& layer : f.bars) v.bar_area += layer.area;
    v.bar_modulus = f.bar_modulus;
  }
  return out;
}

}  // namespace tenthpoint::capacity
