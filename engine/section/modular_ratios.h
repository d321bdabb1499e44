// The moduli of a bridge's materials and the ratios by which the deck and the
// bars are transformed to the girder material.
//
// Rules (stated once here, applied by every section computation):
//  - girder modulus: Es of `materials.steel` for the steel kinds; Ec of
//    `materials.girder_concrete` (given, else LRFD 5.4.2.4) for RC and
//    prestressed girders.
//  - short-term ratio n = E_girder / E_deck: `materials.modular_ratio` when
//    given, else computed from the deck concrete's Ec. n is not rounded: LRFD
//    6.10.1.1.1b defines n = Es/Ec and does not ask for an integer.
//  - long-term ratio: k*n for steel girders (LRFD 6.10.1.1.1b, k =
//    materials.long_term_modular_factor); n for concrete girders, whose deck
//    and girder creep together, so the deck is transformed by the plain ratio
//    of moduli for every composite stage (long_term_modular_factor is not
//    used for them).
//  - bar ratio: E_bar / E_girder with E_bar from `materials.reinforcement`;
//    for steel girders without a reinforcement entry the deck bars are taken
//    to have the girder steel's modulus (ratio 1; LRFD 5.4.3.2 and 6.4.1 give
//    both as 29000 ksi).
#pragma once

#include <optional>

#include "engine/core/numeric.h"
#include "engine/model/materials.h"
#include "engine/section/section_options.h"

namespace tenthpoint::section {

struct ModularRatios {
  Real girder_modulus = 0;           // Pa, the reference material of every stage
  std::optional<Real> deck_modulus;  // Pa; absent when n was given or the bridge is not composite
  std::optional<Real> short_term;    // n; composite bridges only
  std::optional<Real> long_term;     // k*n (steel) or n (concrete); composite bridges only
  std::optional<Real> bar_ratio;     // E_bar / E_girder; absent when no modulus for the bars is known
  bool short_term_given = false;     // true when n came from materials.modular_ratio
};

// Throws InputError naming the materials field that is missing or not
// positive (e.g. "materials.deck_concrete" for a composite bridge with neither
// a modular ratio nor a deck concrete).
[[nodiscard]] ModularRatios modular_ratios(const model::Materials& materials, const SectionOptions& options = {});

}  // namespace tenthpoint::section
