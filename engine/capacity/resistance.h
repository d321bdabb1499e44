// The result of one capacity request: a factored resistance with its status,
// the governing article, warnings for the engineer and the calculation.
//
// Units: moments N*m (magnitudes, positive for either sign of bending),
// shears N, stresses Pa. `factored` = phi * nominal for a computed
// resistance; for a given one it is the value from the bridge file (phi
// already applied there). The condition and system factors phi_c and phi_s
// are never included (the rating applies them; see
// condition_system_factors.h).
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/capacity/calculation_trace.h"
#include "engine/capacity/stage_moduli.h"
#include "engine/core/numeric.h"

namespace tenthpoint::capacity {

// Sense of the bending moment at a section: positive puts the bottom in
// tension (sagging), negative the top (hogging over a pier).
enum class MomentSign { positive, negative };

//  computed: from the section description (and the inspection in force);
//  given: from the bridge file's capacity.given;
//  unavailable: neither; `reason` says what is missing and what to give.
enum class ResistanceStatus { computed, given, unavailable };

[[nodiscard]] std::string_view to_string(MomentSign sign);
[[nodiscard]] std::string_view to_string(ResistanceStatus status);

// The flange-stress form of a steel flexural resistance (LRFD 6.10.7.2,
// 6.10.8.1): the rating sums the stage stresses M/S at each flange (moduli
// below) and compares the sum with phi * Fn. Lateral flange bending fl is
// taken as zero (straight girders with no lateral loads).
struct FlangeStressResistance {
  Real compression_flange = 0;  // Fnc, Pa, nominal
  Real tension_flange = 0;      // Fnt, Pa, nominal
  Real phi = 1.0;
  bool compression_flange_on_top = true;
  StageModuli moduli;
};

struct Resistance {
  ResistanceStatus status = ResistanceStatus::unavailable;
  Real nominal = 0;     // Mn [N*m] or Vn [N]; 0 unless computed
  Real phi = 0;         // resistance factor applied; 0 unless computed
  Real factored = 0;    // phi * nominal, or the given value
  std::string article;  // the governing article, e.g. "AASHTO LRFD 6.10.7.1.2-2"
  std::string reason;   // unavailable: what is missing; given: where the value came from
  std::vector<std::string> warnings;
  CalculationTrace trace;
  // Steel flexure whose resistance is a flange stress (noncompact composite
  // sections in positive flexure, and every 6.10.8 check): the stress form,
  // which the rating should prefer; `factored` is then its moment equivalent
  // at the governing flange of the live-load section.
  std::optional<FlangeStressResistance> flange_stress;

  [[nodiscard]] bool available() const { return status != ResistanceStatus::unavailable; }

  [[nodiscard]] static Resistance unavailable_because(std::string reason);
};

}  // namespace tenthpoint::capacity
