// Elastic properties of a precast prestressed girder from its given gross
// properties (area, inertia, centroid height yb, height), alone and acting
// with a cast-in-place deck. The strands are not transformed: gross precast
// properties are the common practice for stiffness and for service stresses
// of the precast shape. Results are in girder-concrete units (E = Ec of the
// girder); heights m above the soffit.
#pragma once

#include "engine/core/numeric.h"
#include "engine/model/section.h"
#include "engine/section/input_checks.h"
#include "engine/section/stage_properties.h"

namespace tenthpoint::section {

class PrestressedSection {
 public:
  // Throws InputError when height, area or inertia is not positive or yb does
  // not lie strictly inside the height.
  PrestressedSection(const model::PrestressedGirder& girder, detail::SectionContext context);

  [[nodiscard]] Real height() const { return girder_.height; }
  [[nodiscard]] Real area() const { return girder_.area; }

  // The precast girder alone (DC1), from its given gross properties.
  [[nodiscard]] StageProperties noncomposite(Real girder_modulus) const;
  // Precast girder plus the deck transformed by deck_ratio = Ec_girder / Ec_deck.
  [[nodiscard]] StageProperties composite(const model::DeckSlab& deck, Real deck_ratio, Real girder_modulus) const;

 private:
  model::PrestressedGirder girder_;
  detail::SectionContext context_;
};

}  // namespace tenthpoint::section
