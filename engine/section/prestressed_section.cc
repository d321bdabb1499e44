#include "engine/section/prestressed_section.h"

#include <fmt/format.h>

#include "engine/section/deck_layout.h"
#include "engine/section/transformed_section.h"

namespace tenthpoint::section {

PrestressedSection::PrestressedSection(const model::PrestressedGirder& girder, detail::SectionContext context)
    : girder_(girder), context_(std::move(context)) {
  context_.require_positive(girder.height, "ps_girder.height");
  context_.require_positive(girder.area, "ps_girder.area");
  context_.require_positive(girder.inertia, "ps_girder.inertia");
  if (!(girder.centroid_from_bottom > 0 && girder.centroid_from_bottom < girder.height)) {
    context_.fail("ps_girder.yb", fmt::format("must lie between 0 and the height {:g} m (got {:g} m)", girder.height,
                                              girder.centroid_from_bottom));
  }
}

StageProperties PrestressedSection::noncomposite(Real girder_modulus) const {
  TransformedSection s;
  s.add_part(girder_.area, girder_.centroid_from_bottom, girder_.inertia);
  return StageProperties::from_transformed(s, girder_modulus, girder_.height);
}

StageProperties PrestressedSection::composite(const model::DeckSlab& deck, Real deck_ratio, Real girder_modulus) const {
  const DeckLayout layout(deck, girder_.height, context_);
  TransformedSection s;
  s.add_part(girder_.area, girder_.centroid_from_bottom, girder_.inertia);
  layout.add_concrete(s, deck_ratio);
  return StageProperties::from_transformed(s, girder_modulus, girder_.height, layout.top(), deck_ratio);
}

}  // namespace tenthpoint::section
