#include "engine/section/stage_properties.h"

#include <algorithm>
#include <cassert>
#include <cmath>

#include "engine/section/transformed_section.h"

namespace tenthpoint::section {
namespace {

// A fibre closer to the neutral axis than this share of the section depth is
// taken to lie on it: its section modulus is unbounded and carries no stress.
constexpr Real kOnAxisShareOfDepth = 1e-12;

std::optional<Real> modulus_at(Real inertia, Real neutral_axis, Real height, Real depth) {
  const Real arm = std::abs(height - neutral_axis);
  if (arm <= kOnAxisShareOfDepth * depth) return std::nullopt;
  return inertia / arm;
}

}  // namespace

std::optional<Real> StageProperties::section_modulus_at(Real height) const {
  if (!neutral_axis) return std::nullopt;
  const Real depth =
      std::max({std::abs(height), std::abs(*neutral_axis), girder_top.value_or(0), deck_top.value_or(0)});
  return modulus_at(inertia, *neutral_axis, height, depth);
}

model::ElasticSection StageProperties::to_elastic_section() const {
  return model::ElasticSection{area, inertia, section_modulus_top, section_modulus_bottom, section_modulus_deck};
}

StageProperties StageProperties::from_transformed(const TransformedSection& section, Real modulus, Real girder_top,
                                                  std::optional<Real> deck_top, std::optional<Real> deck_ratio) {
  assert(modulus > 0 && girder_top > 0);
  StageProperties p;
  p.source = PropertySource::computed;
  p.modulus = modulus;
  p.area = section.area();
  p.inertia = section.inertia();
  p.neutral_axis = section.centroid();
  p.girder_top = girder_top;
  p.deck_top = deck_top;
  p.deck_ratio = deck_ratio;
  const Real depth = deck_top.value_or(girder_top);
  p.section_modulus_top = modulus_at(p.inertia, *p.neutral_axis, girder_top, depth);
  p.section_modulus_bottom = modulus_at(p.inertia, *p.neutral_axis, 0, depth);
  if (deck_top) p.section_modulus_deck = modulus_at(p.inertia, *p.neutral_axis, *deck_top, depth);
  return p;
}

StageProperties StageProperties::from_given(const model::ElasticSection& given, Real modulus) {
  StageProperties p;
  p.source = PropertySource::given;
  p.modulus = modulus;
  p.area = given.area;
  p.inertia = given.inertia;
  p.section_modulus_top = given.section_modulus_top;
  p.section_modulus_bottom = given.section_modulus_bottom;
  p.section_modulus_deck = given.section_modulus_deck;
  // S_bottom = I / y_bottom with y measured up from the soffit, so the
  // neutral axis follows from the given modulus. The girder depth does not
  // follow from S_top in general: in a composite stage the neutral axis may
  // lie above the girder top, and a magnitude cannot say which side.
  if (given.section_modulus_bottom && *given.section_modulus_bottom > 0) {
    p.neutral_axis = given.inertia / *given.section_modulus_bottom;
  }
  return p;
}

}  // namespace tenthpoint::section
