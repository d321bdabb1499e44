#include "engine/section/self_weight.h"

#include <type_traits>

#include "engine/section/deck_layout.h"
#include "engine/section/input_checks.h"
#include "engine/section/prestressed_section.h"
#include "engine/section/reinforced_concrete_section.h"
#include "engine/section/steel_i_section.h"

namespace tenthpoint::section {
namespace {

Real concrete_unit_weight(const std::optional<model::Concrete>& concrete, const char* field,
                          const detail::SectionContext& context) {
  if (!concrete) context.fail(field, "needed for the self-weight");
  if (!(concrete->unit_weight > 0)) context.fail(field, "unit_weight must be positive for the self-weight");
  return concrete->unit_weight;
}

}  // namespace

SelfWeight self_weight(const model::SectionDefinition& section, const model::Materials& materials,
                       const SelfWeightOptions& options) {
  const detail::SectionContext context{section.id, section.where};
  if (!section.description)
    context.fail("properties", "a self-weight needs a steel_i, rc_beam or ps_girder description");
  context.require_positive(options.steel_unit_weight, "self_weight.steel_unit_weight");

  SelfWeight out;
  std::optional<Real> top_width;
  std::visit(
      [&](const auto& d) {
        using T = std::decay_t<decltype(d)>;
        if constexpr (std::is_same_v<T, model::SteelIGirder>) {
          out.girder = SteelISection(d, context).steel_area() * options.steel_unit_weight;
          top_width = d.top_cover_plate ? d.top_cover_plate->width : d.top_flange.width;
        } else if constexpr (std::is_same_v<T, model::ReinforcedConcreteBeam>) {
          const ReinforcedConcreteSection beam(d, context);
          // Gross concrete area times the given unit weight: a reinforced-
          // concrete unit weight (e.g. 0.150 kcf) already allows for the bars
          // (common practice), so bars are neither added nor deducted.
          out.girder = beam.concrete_area() *
                       concrete_unit_weight(materials.girder_concrete, "materials.girder_concrete", context);
          top_width = beam.is_rectangle() ? d.web_width : d.flange_width;
        } else {
          const PrestressedSection girder(d, context);
          out.girder =
              girder.area() * concrete_unit_weight(materials.girder_concrete, "materials.girder_concrete", context);
        }
      },
      *section.description);

  if (section.deck) {
    const model::DeckSlab& deck = *section.deck;
    // Constructing the layout validates the slab dimensions; its heights are
    // not needed here.
    [[maybe_unused]] const DeckLayout checked(deck, 0, context);
    const Real unit_weight = concrete_unit_weight(materials.deck_concrete, "materials.deck_concrete", context);
    const Real width = options.tributary_width.value_or(deck.effective_width);
    context.require_positive(width, "self_weight.tributary_width");
    out.deck = deck.thickness * width * unit_weight;
    if (deck.haunch > 0) {
      const std::optional<Real> haunch_width = options.haunch_width ? options.haunch_width : top_width;
      if (!haunch_width) context.fail("deck.haunch", "a precast girder's haunch weight needs the haunch width");
      context.require_positive(*haunch_width, "self_weight.haunch_width");
      out.haunch = deck.haunch * *haunch_width * unit_weight;
    }
  }
  return out;
}

}  // namespace tenthpoint::section
