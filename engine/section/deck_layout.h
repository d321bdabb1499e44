// Where a cast-in-place deck sits on a girder and how it enters a transformed
// section.
//
// The haunch (concrete between the girder top and the deck soffit) is left
// out of the stiffness: its width varies along the girder and is seldom
// known, and it is commonly ignored for stiffness and strength. It does raise
// the slab, so the deck soffit is at girder_top + haunch.
//
// The deck concrete enters at effective width / deck_ratio over the
// structural thickness. Deck bars are not part of the uncracked composite
// sections (common practice); they enter only the cracked negative section.
#pragma once

#include "engine/core/numeric.h"
#include "engine/model/section.h"
#include "engine/section/input_checks.h"
#include "engine/section/transformed_section.h"

namespace tenthpoint::section {

class DeckLayout {
 public:
  // `girder_top` in m above the girder soffit. Throws InputError when the deck
  // has a non-positive thickness or width, a negative haunch, or a bar layer
  // with a non-positive area or a depth outside the slab.
  DeckLayout(const model::DeckSlab& deck, Real girder_top, const detail::SectionContext& context);

  [[nodiscard]] Real soffit() const { return girder_top_ + deck_.haunch; }  // m above the girder soffit
  [[nodiscard]] Real top() const { return soffit() + deck_.thickness; }     // m above the girder soffit

  // The slab, `effective_width / deck_ratio` wide. Precondition: deck_ratio > 0.
  void add_concrete(TransformedSection& section, Real deck_ratio) const;
  // The longitudinal bars, each area times `bar_ratio` (E_bar / E_reference).
  // Returns false, adding nothing, when the deck has no bars.
  bool add_bars(TransformedSection& section, Real bar_ratio) const;

 private:
  model::DeckSlab deck_;
  Real girder_top_;
};

}  // namespace tenthpoint::section
