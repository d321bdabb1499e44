// Elastic properties of a steel I-girder (rolled or built up from plates, with
// optional cover plates) alone and acting with a concrete deck, AASHTO LRFD
// 6.10.1.1.1.
//
// The steel is modelled as rectangles: a rolled shape's fillets are left out,
// which puts its area and inertia a few per cent under the tabulated values.
// Plates stack from the soffit up: bottom cover plate, bottom flange, web,
// top flange, top cover plate. "Top" and "bottom" of the girder are the
// extreme steel fibres (outer faces of the cover plates where present).
// Heights are m above the soffit; results in steel units (E = Es).
#pragma once

#include <optional>

#include "engine/core/numeric.h"
#include "engine/model/section.h"
#include "engine/section/input_checks.h"
#include "engine/section/stage_properties.h"
#include "engine/section/transformed_section.h"

namespace tenthpoint::section {

class SteelISection {
 public:
  // Throws InputError when a plate has a non-positive width or thickness.
  SteelISection(const model::SteelIGirder& girder, detail::SectionContext context);

  // Soffit to top of the topmost plate, m.
  [[nodiscard]] Real depth() const;
  // Steel area, m^2.
  [[nodiscard]] Real steel_area() const;
  // The plates as a transformed section (factor 1).
  [[nodiscard]] TransformedSection steel() const;

  // The girder alone (DC1), LRFD 6.10.1.1.1a.
  [[nodiscard]] StageProperties noncomposite(Real steel_modulus) const;
  // Steel plus deck concrete transformed by `deck_ratio` (n for short-term,
  // k*n for long-term), LRFD 6.10.1.1.1b. Throws InputError on a bad deck.
  [[nodiscard]] StageProperties composite(const model::DeckSlab& deck, Real deck_ratio, Real steel_modulus) const;
  // Steel plus the deck's longitudinal bars (concrete cracked, carrying
  // nothing), LRFD 6.10.1.1.1c. `bar_ratio` = E_bar / Es. Absent when the deck
  // has no bars. Its deck_top is the top of the deck.
  [[nodiscard]] std::optional<StageProperties> cracked_negative(const model::DeckSlab& deck, Real bar_ratio,
                                                                Real steel_modulus) const;

 private:
  model::SteelIGirder girder_;
  detail::SectionContext context_;
};

}  // namespace tenthpoint::section
