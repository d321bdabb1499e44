// Flexural resistance of a composite steel I-girder in positive flexure,
// AASHTO LRFD 6.10.7, for a straight, homogeneous girder (Rh = 1.0):
//  - compact (6.10.6.2.2: Fy <= 70 ksi, D/tw <= 150, 2 Dcp / tw <= 3.76
//    sqrt(E / Fyc)): Mn = Mp when Dp <= 0.1 Dt (6.10.7.1.2-1), else
//    Mn = Mp (1.07 - 0.7 Dp / Dt) (6.10.7.1.2-2);
//  - noncompact: flange stresses Fnc = Rb Rh Fyc (6.10.7.2.2-1) and
//    Fnt = Rh Fyt (6.10.7.2.2-2), with the moment equivalent
//    min(Fnc S_top, Fnt S_bottom) on the short-term composite section.
// The ductility requirement Dp <= 0.42 Dt (6.10.7.3) is checked; a section
// that fails it keeps its computed Mn with a warning (an existing girder is
// rated as it is). The continuous-span cap Mn <= 1.3 Rh My (6.10.7.1.2-3)
// is not applied: My needs the dead-load moments of each stage (D6.2.2),
// which the capacity stage does not have; the trace says so.
// Mp comes from steel_plastic_moment.h. Units internal SI.
#pragma once

#include <optional>
#include <string>

#include "engine/capacity/resistance.h"
#include "engine/capacity/resistance_factors.h"
#include "engine/capacity/steel_plastic_moment.h"
#include "engine/model/section.h"
#include "engine/section/section_stages.h"

namespace tenthpoint::capacity {

struct CompositePositiveFlexureInput {
  std::string label;  // names the section in messages
  model::SteelIGirder girder;
  model::DeckSlab deck;
  Real steel_yield = 0;    // Fy of flanges and web, Pa
  Real steel_modulus = 0;  // E, Pa
  Real deck_strength = 0;  // f'c of the deck, Pa
  bool include_deck_bars = false;
  std::optional<Real> deck_bar_yield;  // Pa, needed when include_deck_bars
  section::SectionStages stages;       // composite stages of this section (moduli, Dc)
};

struct CompositePositiveFlexure {
  Resistance resistance;
  CompositePlasticMoment plastic;
  bool compact = false;
  bool ductile = false;  // Dp <= 0.42 Dt
};

// Precondition: stages.composite with computed short-term properties.
[[nodiscard]] CompositePositiveFlexure composite_positive_flexure(const CompositePositiveFlexureInput& input,
                                                                  const ResistanceFactors& factors);

}  // namespace tenthpoint::capacity
