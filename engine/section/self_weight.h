// Self-weight per unit length of a girder and the deck it carries, for
// plausibility checks of the dead loads in a bridge file (it does not replace
// them). Line loads in N/m, downward positive; widths in m; unit weights in
// N/m^3.
#pragma once

#include <optional>

#include "engine/core/numeric.h"
#include "engine/core/units.h"
#include "engine/model/materials.h"
#include "engine/model/section.h"

namespace tenthpoint::section {

// Structural steel, 490 lb/ft^3 (common practice; AASHTO LRFD Table 3.5.1-1
// lists 0.490 kcf, from memory).
inline constexpr Real kSteelUnitWeight = 0.490 * units::kKip / (units::kFoot * units::kFoot * units::kFoot);

struct SelfWeightOptions {
  // Deck width carried by the girder (usually the girder spacing, or spacing/2
  // plus overhang for an exterior girder); absent = the deck's effective width.
  std::optional<Real> tributary_width;
  // Width of the haunch concrete; absent = the girder's top width (top cover
  // plate or top flange of a steel girder, flange or web of an RC beam). A
  // precast girder's top width is not in the model, so a precast section with
  // a haunch needs it given.
  std::optional<Real> haunch_width;
  Real steel_unit_weight = kSteelUnitWeight;
};

struct SelfWeight {
  Real girder = 0;  // N/m: steel plates, or the RC / precast concrete section
  Real deck = 0;    // N/m: structural slab over the tributary width
  Real haunch = 0;  // N/m
  [[nodiscard]] Real total() const { return girder + deck + haunch; }
};

// Throws InputError when the section has no description, a needed unit weight
// (materials.girder_concrete, materials.deck_concrete) is missing or not
// positive, or a precast section with a haunch has no haunch_width.
[[nodiscard]] SelfWeight self_weight(const model::SectionDefinition& section, const model::Materials& materials,
                                     const SelfWeightOptions& options = {});

}  // namespace tenthpoint::section
