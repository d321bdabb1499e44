#include "engine/section/deck_layout.h"

#include <cassert>

#include <fmt/format.h>

namespace tenthpoint::section {

DeckLayout::DeckLayout(const model::DeckSlab& deck, Real girder_top, const detail::SectionContext& context)
    : deck_(deck), girder_top_(girder_top) {
  context.require_positive(deck.thickness, "deck.thickness");
  context.require_positive(deck.effective_width, "deck.effective_width");
  context.require_nonnegative(deck.haunch, "deck.haunch");
  for (std::size_t i = 0; i < deck.longitudinal_bars.size(); ++i) {
    const model::BarLayer& bars = deck.longitudinal_bars[i];
    context.require_positive(bars.area, fmt::format("deck.bars[{}].area", i));
    context.require_nonnegative(bars.depth, fmt::format("deck.bars[{}].depth", i));
    if (bars.depth > deck.thickness) {
      context.fail(fmt::format("deck.bars[{}].depth", i),
                   fmt::format("must lie within the slab thickness ({:g} m, got {:g} m)", deck.thickness, bars.depth));
    }
  }
}

void DeckLayout::add_concrete(TransformedSection& section, Real deck_ratio) const {
  assert(deck_ratio > 0);
  section.add_rectangle(deck_.effective_width, deck_.thickness, soffit(), 1 / deck_ratio);
}

bool DeckLayout::add_bars(TransformedSection& section, Real bar_ratio) const {
  // Bar depths are measured down from the top of the deck (model::DeckSlab).
  for (const model::BarLayer& bars : deck_.longitudinal_bars)
    section.add_area(bars.area, top() - bars.depth, bar_ratio);
  return !deck_.longitudinal_bars.empty();
}

}  // namespace tenthpoint::section
