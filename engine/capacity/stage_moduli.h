// The section moduli a rating divides each load stage's moment by to get a
// fibre stress (f = M / S), for the rating factors written in stress form
// (steel Service II, steel flange-stress strength checks, prestressed
// Service III). Which section carries each stage follows AASHTO LRFD 3.3.2
// and 6.10.1.1.1: DC1 on the noncomposite section; DC2 and DW on the
// long-term composite section (or, for steel in negative flexure at the
// strength limit state, the cracked section of steel plus deck bars,
// 6.10.1.1.1c); live load on the short-term composite section (or the same
// cracked section). On a non-composite bridge every stage uses the
// noncomposite section.
//
// Moduli are positive magnitudes, m^3, at the extreme fibres of the girder
// (top of the top flange or top plate, soffit); absent when the section
// properties do not give that fibre.
#pragma once

#include <optional>
#include <string>

#include "engine/core/numeric.h"
#include "engine/section/section_stages.h"

namespace tenthpoint::capacity {

struct FibreModuli {
  std::optional<Real> top;     // m^3, top of the girder
  std::optional<Real> bottom;  // m^3, girder soffit
};

struct StageModuli {
  FibreModuli dc1;        // noncomposite section
  FibreModuli dc2_dw;     // long-term composite, or cracked for negative flexure
  FibreModuli live_load;  // short-term composite, or cracked for negative flexure
  std::string basis;      // in words, e.g. "noncomposite / long-term (3n) / short-term (n), LRFD 6.10.1.1.1b"
};

// Positive flexure, or any flexure of a concrete girder or a non-composite
// bridge: noncomposite / long-term / short-term (SectionStages::at).
[[nodiscard]] StageModuli uncracked_stage_moduli(const section::SectionStages& stages);
// Negative flexure of a composite steel girder at the strength limit state:
// DC1 on the steel alone, DC2, DW and live load on the steel plus deck bars
// (LRFD 6.10.1.1.1c); the steel alone for all three when the deck has no
// bars. A non-composite bridge gives uncracked_stage_moduli().
[[nodiscard]] StageModuli cracked_stage_moduli(const section::SectionStages& stages);

}  // namespace tenthpoint::capacity
