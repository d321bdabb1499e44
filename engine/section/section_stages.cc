#include "engine/section/section_stages.h"

#include <cassert>
#include <type_traits>

#include <fmt/format.h>

#include "engine/section/input_checks.h"
#include "engine/section/modular_ratios.h"
#include "engine/section/prestressed_section.h"
#include "engine/section/reinforced_concrete_section.h"
#include "engine/section/steel_i_section.h"

namespace tenthpoint::section {
namespace {

detail::SectionContext context_of(const model::SectionDefinition& section) {
  return detail::SectionContext{section.id, section.where};
}

const char* description_field(const model::SectionDescription& description) {
  return std::visit(
      [](const auto& d) {
        using T = std::decay_t<decltype(d)>;
        if constexpr (std::is_same_v<T, model::SteelIGirder>) {
          return "steel_i";
        } else if constexpr (std::is_same_v<T, model::ReinforcedConcreteBeam>) {
          return "rc_beam";
        } else {
          return "ps_girder";
        }
      },
      description);
}

// The description must be of the bridge's material kind: the moduli, and so
// every transformed property, follow from the kind.
void check_kind(const model::SectionDescription& description, const model::Materials& materials,
                const detail::SectionContext& context) {
  const bool ok = std::visit(
      [&](const auto& d) {
        using T = std::decay_t<decltype(d)>;
        if constexpr (std::is_same_v<T, model::SteelIGirder>) {
          return model::is_steel(materials.kind);
        } else if constexpr (std::is_same_v<T, model::ReinforcedConcreteBeam>) {
          return materials.kind == model::MaterialKind::reinforced_concrete;
        } else {
          return materials.kind == model::MaterialKind::prestressed_concrete;
        }
      },
      description);
  if (!ok) {
    context.fail(description_field(description),
                 fmt::format("does not match materials.kind {}", to_string(materials.kind)));
  }
}

Real rc_bar_ratio(const ModularRatios& ratios, const detail::SectionContext& context) {
  if (!ratios.bar_ratio) context.fail("rc_beam", "needs materials.reinforcement for transformed bars");
  return *ratios.bar_ratio;
}

SectionStages describe(const model::SectionDefinition& section, const model::Materials& materials,
                       const SectionOptions& options) {
  const detail::SectionContext context = context_of(section);
  if (!section.description) {
    context.fail("properties", "no description to compute properties from (give steel_i, rc_beam or ps_girder)");
  }
  check_kind(*section.description, materials, context);
  const ModularRatios ratios = modular_ratios(materials, options);
  const Real e = ratios.girder_modulus;
  const bool composite = materials.composite;
  if (composite && !section.deck) {
    context.fail("deck", "needed to compute the composite stages (materials.composite is true)");
  }

  SectionStages out;
  out.composite = composite;
  std::visit(
      [&](const auto& d) {
        using T = std::decay_t<decltype(d)>;
        if constexpr (std::is_same_v<T, model::SteelIGirder>) {
          const SteelISection steel(d, context);
          out.noncomposite = steel.noncomposite(e);
          if (!composite) return;
          out.short_term = steel.composite(*section.deck, *ratios.short_term, e);
          out.long_term = steel.composite(*section.deck, *ratios.long_term, e);
          assert(ratios.bar_ratio);
          out.cracked_negative = steel.cracked_negative(*section.deck, *ratios.bar_ratio, e);
        } else if constexpr (std::is_same_v<T, model::ReinforcedConcreteBeam>) {
          const ReinforcedConcreteSection beam(d, context);
          const std::optional<Real> bars =
              options.transform_rc_bars ? std::optional<Real>(rc_bar_ratio(ratios, context)) : std::nullopt;
          out.noncomposite = bars ? beam.gross_transformed(e, *bars) : beam.gross_properties(e);
          if (!composite) return;
          out.short_term = beam.composite(*section.deck, *ratios.short_term, e, bars);
          out.long_term = beam.composite(*section.deck, *ratios.long_term, e, bars);
        } else {
          const PrestressedSection girder(d, context);
          out.noncomposite = girder.noncomposite(e);
          if (!composite) return;
          out.short_term = girder.composite(*section.deck, *ratios.short_term, e);
          out.long_term = girder.composite(*section.deck, *ratios.long_term, e);
        }
      },
      *section.description);
  return out;
}

void check_given(const model::ElasticSection& given, const detail::SectionContext& context, const char* stage) {
  context.require_positive(given.area, fmt::format("properties.{}.area", stage));
  context.require_positive(given.inertia, fmt::format("properties.{}.inertia", stage));
  auto check_optional = [&](const std::optional<Real>& value, const char* name) {
    if (value) context.require_positive(*value, fmt::format("properties.{}.{}", stage, name));
  };
  check_optional(given.section_modulus_top, "section_modulus_top");
  check_optional(given.section_modulus_bottom, "section_modulus_bottom");
  check_optional(given.section_modulus_deck, "section_modulus_deck");
}

}  // namespace

const StageProperties& SectionStages::at(model::SectionStage stage) const {
  if (!composite) return noncomposite;
  switch (stage) {
    case model::SectionStage::noncomposite:
      return noncomposite;
    case model::SectionStage::long_term_composite:
      assert(long_term);
      return *long_term;
    case model::SectionStage::short_term_composite:
      assert(short_term);
      return *short_term;
  }
  return noncomposite;
}

SectionStages described_section_stages(const model::SectionDefinition& section, const model::Materials& materials,
                                       const SectionOptions& options) {
  return describe(section, materials, options);
}

SectionStages section_stages(const model::SectionDefinition& section, const model::Materials& materials,
                             const SectionOptions& options) {
  const detail::SectionContext context = context_of(section);
  if (!section.properties) return describe(section, materials, options);

  const model::SectionProperties& given = *section.properties;
  const bool composite = materials.composite;
  if (!composite) {
    constexpr const char* kNotComposite = "given for a non-composite bridge (materials.composite is false)";
    if (given.long_term) context.fail("properties.long_term", kNotComposite);
    if (given.short_term) context.fail("properties.short_term", kNotComposite);
    if (given.cracked_negative) context.fail("properties.cracked_negative", kNotComposite);
  }
  // The description fills only the stages the file leaves out; when every
  // stage is given, the description is not looked at for stiffness at all.
  const bool all_given = !composite || (given.long_term && given.short_term && given.cracked_negative);
  const bool can_describe = section.description && (!composite || section.deck);
  std::optional<SectionStages> described;
  if (can_describe && !all_given) described = describe(section, materials, options);

  const Real e = modular_ratios(materials, options).girder_modulus;
  auto resolve = [&](const std::optional<model::ElasticSection>& stage, const char* name,
                     const std::optional<StageProperties>& computed, bool required) -> std::optional<StageProperties> {
    if (stage) {
      check_given(*stage, context, name);
      return StageProperties::from_given(*stage, e);
    }
    if (computed) return computed;
    if (required) {
      context.fail(fmt::format("properties.{}", name),
                   section.description ? "missing, and the section has no deck to compute it from"
                                       : "missing, and the section has no description to compute it from");
    }
    return std::nullopt;
  };

  SectionStages out;
  out.composite = composite;
  out.noncomposite =
      *resolve(std::optional<model::ElasticSection>(given.noncomposite), "noncomposite", std::nullopt, true);
  if (composite) {
    out.long_term = resolve(given.long_term, "long_term", described ? described->long_term : std::nullopt, true);
    out.short_term = resolve(given.short_term, "short_term", described ? described->short_term : std::nullopt, true);
    out.cracked_negative = resolve(given.cracked_negative, "cracked_negative",
                                   described ? described->cracked_negative : std::nullopt, false);
  }
  return out;
}

}  // namespace tenthpoint::section
