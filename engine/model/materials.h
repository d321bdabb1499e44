// Materials of a bridge's girders and deck. Stresses and moduli in Pa, unit
// weights in N/m^3.
#pragma once

#include <optional>
#include <string>

#include "engine/core/numeric.h"
#include "engine/model/enums.h"

namespace tenthpoint::model {

struct Steel {
  Real yield_strength = 0;               // Fy
  std::optional<Real> tensile_strength;  // Fu
  Real modulus = 200.0e9;                // Es; 29000 ksi (AASHTO LRFD 6.4.1) when read from a US file
};

struct Concrete {
  Real compressive_strength = 0;  // f'c
  std::optional<Real> modulus;    // Ec; absent = AASHTO LRFD 5.4.2.4 from f'c and unit weight
  Real unit_weight = 0;           // wc, for dead load and for Ec
};

struct Reinforcement {
  Real yield_strength = 0;  // fy
  Real modulus = 200.0e9;   // Es
};

struct PrestressingSteel {
  Real tensile_strength = 0;           // fpu
  std::optional<Real> yield_strength;  // fpy; absent = 0.9 fpu (low relaxation, LRFD Table 5.4.4.1-1)
  Real modulus = 196.5e9;              // Ep; 28500 ksi (LRFD 5.4.4.2)
  bool low_relaxation = true;
};

struct Materials {
  MaterialKind kind = MaterialKind::rolled_steel;
  bool composite = false;
  std::optional<Steel> steel;
  std::optional<Concrete> girder_concrete;  // RC and precast girders
  std::optional<Concrete> deck_concrete;
  std::optional<Reinforcement> reinforcement;
  std::optional<PrestressingSteel> strand;
  std::optional<Real> modular_ratio;  // n = E_girder / E_deck; absent = computed
  Real long_term_modular_factor = 3;  // k in kn for long-term composite (LRFD 6.10.1.1.1b)
};

}  // namespace tenthpoint::model
