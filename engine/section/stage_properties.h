// Elastic properties of a cross-section for one load stage, in the units of
// the stage's reference material (steel for steel girders, the girder concrete
// for concrete girders), so that EI = modulus * inertia.
//
// Heights are m above the girder soffit (the lowest fibre of the girder:
// the bottom face of a bottom cover plate where there is one). Section moduli
// are positive magnitudes, I / |y - neutral_axis|. The deck-top modulus is of
// the transformed section: the stress in the deck concrete is M / (S_deck *
// deck_ratio), where deck_ratio is the ratio the deck was transformed by (n or
// k*n), AASHTO LRFD 6.10.1.1.1b.
#pragma once

#include <optional>

#include "engine/core/numeric.h"
#include "engine/model/section.h"

namespace tenthpoint::section {

class TransformedSection;

// Where a stage's properties came from.
//  given: the section's `properties` in the bridge file;
//  computed: the section's description (plates, concrete outline, deck);
//  scaled: computed inside a haunched segment and scaled so that its EI meets
//    given properties at the segment's ends (see tapered_section.h).
enum class PropertySource { given, computed, scaled };

struct StageProperties {
  PropertySource source = PropertySource::computed;
  Real modulus = 0;  // Pa, E of the reference material
  Real area = 0;     // m^2, transformed
  Real inertia = 0;  // m^4, transformed, about the neutral axis

  // Known for computed stages; for given stages only what the file implies
  // (neutral axis = I / S_bottom when S_bottom is given).
  std::optional<Real> neutral_axis;  // m above the soffit
  std::optional<Real> girder_top;    // m above the soffit: the girder depth
  std::optional<Real> deck_top;      // m above the soffit; composite stages
  std::optional<Real> deck_ratio;    // the deck's modular ratio (n or k*n); composite stages

  // Absent when the file gave none (given stages), when there is no such
  // fibre (no deck), or when the fibre lies on the neutral axis.
  std::optional<Real> section_modulus_top;     // m^3, top of the girder
  std::optional<Real> section_modulus_bottom;  // m^3, soffit
  std::optional<Real> section_modulus_deck;    // m^3, top of the deck, transformed units

  // E*I, N*m^2.
  [[nodiscard]] Real flexural_rigidity() const { return modulus * inertia; }
  // I / |height - neutral_axis| for any fibre, m^3 (e.g. a deck bar layer);
  // absent when the neutral axis is unknown or the fibre lies on it.
  [[nodiscard]] std::optional<Real> section_modulus_at(Real height) const;
  // The plain-data form of the bridge model (drops heights and modulus).
  [[nodiscard]] model::ElasticSection to_elastic_section() const;

  // Properties of a computed transformed section. `deck_top` and
  // `deck_ratio` are set for composite stages.
  [[nodiscard]] static StageProperties from_transformed(const TransformedSection& section, Real modulus,
                                                        Real girder_top, std::optional<Real> deck_top = std::nullopt,
                                                        std::optional<Real> deck_ratio = std::nullopt);
  // Properties given in the bridge file, transformed to the girder material.
  [[nodiscard]] static StageProperties from_given(const model::ElasticSection& given, Real modulus);
};

}  // namespace tenthpoint::section
