// Effective prestress after all losses for a pretensioned girder whose file
// gives none: elastic shortening (AASHTO LRFD 5.9.3.2.3a) plus the
// approximate long-term losses of 5.9.3.3, in the units the articles use
// (ksi):
//   dfpES = (Ep / Eci) fcgp                                    (5.9.3.2.3a-1)
//   dfpLT = 10.0 fpi Aps / Ag gamma_h gamma_st + 12.0 gamma_h gamma_st + dfpR
//                                                              (5.9.3.3-1)
//   gamma_h = 1.7 - 0.01 H (-2), gamma_st = 5 / (1 + f'ci) (-3),
//   dfpR = 2.4 ksi low-relaxation, 10.0 ksi stress-relieved strands (from memory);
//   fpe = fpj - dfpES - dfpLT.
// Assumptions the inputs force (each is recorded in the trace):
//  - jacking stress fpj = 0.75 fpu for low-relaxation and 0.70 fpu for
//    stress-relieved strands (LRFD Table 5.9.2.2-1 limits, from memory)
//    unless given; fpi = fpj (no losses before transfer);
//  - f'ci = transfer_strength_ratio x f'c (0.75 by default, an assumption:
//    the model holds no transfer strength); Eci by LRFD 5.4.2.4 from f'ci;
//  - fcgp from the prestress after transfer on the gross precast section
//    with the girder's self-weight moment left out (it depends on the
//    station and span; leaving it out over-estimates the loss, which is
//    conservative for the Service III tension check). fcgp then depends on
//    dfpES itself, which is solved in closed form;
//  - relative humidity H = 40 % unless given (low, so conservative).
// The approximate method is meant for standard precast pretensioned members
// under average exposure (5.9.3.3); its use here is stated in the trace.
#pragma once

#include <optional>
#include <string>

#include "engine/capacity/calculation_trace.h"
#include "engine/core/numeric.h"
#include "engine/model/materials.h"
#include "engine/model/section.h"
#include "engine/section/concrete_modulus.h"

namespace tenthpoint::capacity {

struct PrestressLossOptions {
  Real relative_humidity = 40.0;        // H, percent
  Real transfer_strength_ratio = 0.75;  // f'ci / f'c
  std::optional<Real> jacking_ratio;    // fpj / fpu; absent = 0.75 (low relaxation) or 0.70

  [[nodiscard]] bool is_valid(std::string* why) const;
};

struct PrestressLosses {
  Real jacking_stress = 0;       // fpj, Pa
  Real elastic_shortening = 0;   // dfpES, Pa
  Real long_term = 0;            // dfpLT, Pa
  Real effective_prestress = 0;  // fpe, Pa
  CalculationTrace trace;
};

// Preconditions: the girder has strands and positive gross properties; the
// concrete has a positive f'c and unit weight; the strand a positive fpu.
[[nodiscard]] PrestressLosses approximate_prestress_losses(const model::PrestressedGirder& girder,
                                                           const model::Concrete& girder_concrete,
                                                           const model::PrestressingSteel& strand,
                                                           const PrestressLossOptions& options,
                                                           section::ConcreteModulusFormula formula, Real k1);

}  // namespace tenthpoint::capacity
