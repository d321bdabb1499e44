#include "engine/section/steel_i_section.h"

#include <cassert>

#include "engine/section/deck_layout.h"

namespace tenthpoint::section {

SteelISection::SteelISection(const model::SteelIGirder& girder, detail::SectionContext context)
    : girder_(girder), context_(std::move(context)) {
  context_.require_positive(girder.top_flange.width, "steel_i.top_flange.width");
  context_.require_positive(girder.top_flange.thickness, "steel_i.top_flange.thickness");
  context_.require_positive(girder.web.width, "steel_i.web.depth");
  context_.require_positive(girder.web.thickness, "steel_i.web.thickness");
  context_.require_positive(girder.bottom_flange.width, "steel_i.bottom_flange.width");
  context_.require_positive(girder.bottom_flange.thickness, "steel_i.bottom_flange.thickness");
  if (girder.top_cover_plate) {
    context_.require_positive(girder.top_cover_plate->width, "steel_i.top_cover_plate.width");
    context_.require_positive(girder.top_cover_plate->thickness, "steel_i.top_cover_plate.thickness");
  }
  if (girder.bottom_cover_plate) {
    context_.require_positive(girder.bottom_cover_plate->width, "steel_i.bottom_cover_plate.width");
    context_.require_positive(girder.bottom_cover_plate->thickness, "steel_i.bottom_cover_plate.thickness");
  }
}

Real SteelISection::depth() const {
  Real d = girder_.bottom_flange.thickness + girder_.web.width + girder_.top_flange.thickness;
  if (girder_.bottom_cover_plate) d += girder_.bottom_cover_plate->thickness;
  if (girder_.top_cover_plate) d += girder_.top_cover_plate->thickness;
  return d;
}

Real SteelISection::steel_area() const { return steel().area(); }

TransformedSection SteelISection::steel() const {
  TransformedSection s;
  Real level = 0;
  auto add_plate = [&](const model::Plate& p) {
    s.add_rectangle(p.width, p.thickness, level);
    level += p.thickness;
  };
  if (girder_.bottom_cover_plate) add_plate(*girder_.bottom_cover_plate);
  add_plate(girder_.bottom_flange);
  // The web stands on its edge: model::Plate stores the web depth D as width.
  s.add_rectangle(girder_.web.thickness, girder_.web.width, level);
  level += girder_.web.width;
  add_plate(girder_.top_flange);
  if (girder_.top_cover_plate) add_plate(*girder_.top_cover_plate);
  return s;
}

StageProperties SteelISection::noncomposite(Real steel_modulus) const {
  return StageProperties::from_transformed(steel(), steel_modulus, depth());
}

StageProperties SteelISection::composite(const model::DeckSlab& deck, Real deck_ratio, Real steel_modulus) const {
  assert(deck_ratio > 0);
  const DeckLayout layout(deck, depth(), context_);
  TransformedSection s = steel();
  layout.add_concrete(s, deck_ratio);
  return StageProperties::from_transformed(s, steel_modulus, depth(), layout.top(), deck_ratio);
}

std::optional<StageProperties> SteelISection::cracked_negative(const model::DeckSlab& deck, Real bar_ratio,
                                                               Real steel_modulus) const {
  const DeckLayout layout(deck, depth(), context_);
  TransformedSection s = steel();
  // LRFD 6.10.1.1.1c: for negative flexure the section is the steel girder
  // plus the longitudinal reinforcement within the effective deck width.
  if (!layout.add_bars(s, bar_ratio)) return std::nullopt;
  StageProperties p = StageProperties::from_transformed(s, steel_modulus, depth(), layout.top());
  // The cracked deck carries no stress, so no deck-top modulus; bar stresses
  // come from section_modulus_at(bar height).
  p.section_modulus_deck.reset();
  return p;
}

}  // namespace tenthpoint::section
