// Choices a section computation leaves to the engineer or the agency policy.
// Defaults are the ones stated beside each field; validated once by is_valid.
#pragma once

#include <string>

#include "engine/core/numeric.h"
#include "engine/section/concrete_modulus.h"

namespace tenthpoint::section {

struct SectionOptions {
  // Ec when a concrete's modulus is not given (AASHTO LRFD 5.4.2.4).
  ConcreteModulusFormula concrete_modulus_formula = ConcreteModulusFormula::lrfd_9th;
  // K1, the aggregate correction factor of LRFD 5.4.2.4 (1.0 unless tested).
  Real aggregate_factor = 1.0;
  // Stiffness of a reinforced concrete beam: false = gross concrete section
  // (common practice for line-girder analysis; LRFD 4.5.2.2, from memory, asks
  // for cracked or uncracked stiffness consistent with the expected
  // behaviour); true = gross section with the bars transformed by (n-1).
  bool transform_rc_bars = false;

  // True when the options are usable; otherwise false with the reason in *why
  // (when why is not null).
  [[nodiscard]] bool is_valid(std::string* why) const;
};

}  // namespace tenthpoint::section
