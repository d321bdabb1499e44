// Service III (tension in the precompressed tensile zone) data for a
// pretensioned girder, in the form a rating needs for
//   RF = (fR - fD - fP) / fL
// with stresses at the bottom fibre of the precast girder, tension positive:
//  - fR, the allowable tension: 0.19 lambda sqrt(f'c) <= 0.6 ksi for bonded
//    strands under not worse than moderate corrosion conditions, or 0.0948
//    lambda sqrt(f'c) <= 0.3 ksi under severe corrosion conditions (AASHTO
//    LRFD Table 5.9.2.3.2b-1, which MBE 6A.5.4.2.2b points to for LRFR;
//    both from memory), or the value given in the options;
//  - fP, the bottom-fibre stress from the effective prestress, -(P/A + P e /
//    Sb) on the gross precast section (negative: precompression), with
//    P = Aps fpe; fpe as given in the bridge file, else estimated by
//    prestress_losses.h;
//  - the bottom-fibre section moduli the rating divides each stage's moment
//    by to get fD and fL (noncomposite for DC1, long-term for DC2 and DW,
//    short-term for live load).
// Only the bottom fibre under positive moment is covered (the deck top over
// a pier of a continuous girder is not). Units internal SI.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "engine/capacity/calculation_trace.h"
#include "engine/capacity/prestress_losses.h"
#include "engine/capacity/resistance.h"
#include "engine/capacity/stage_moduli.h"
#include "engine/core/numeric.h"
#include "engine/model/materials.h"
#include "engine/model/section.h"
#include "engine/section/section_options.h"
#include "engine/section/section_stages.h"

namespace tenthpoint::capacity {

enum class CorrosionExposure { moderate, severe };

struct PrestressedServiceOptions {
  CorrosionExposure exposure = CorrosionExposure::moderate;
  std::optional<Real> allowable_tension;  // fR, Pa; replaces the table value when set
  PrestressLossOptions losses;

  [[nodiscard]] bool is_valid(std::string* why) const;
};

struct PrestressedServiceLimits {
  ResistanceStatus status = ResistanceStatus::computed;  // computed or unavailable
  std::string reason;                                    // when unavailable
  Real allowable_tension = 0;                            // fR, Pa, positive
  Real prestress_bottom_stress = 0;                      // fP, Pa, tension positive (negative = precompression)
  Real effective_prestress = 0;                          // fpe, Pa
  bool effective_prestress_estimated = false;
  Real prestress_force = 0;  // P, N
  Real eccentricity = 0;     // e, m, strand centroid below the precast centroid
  StageModuli moduli;        // bottom fibres used; top fibres for reference
  std::vector<std::string> warnings;
  CalculationTrace trace;
};

// Unavailable (with the reason) when the girder has no strands. Throws
// InputError when materials.girder_concrete or materials.strand is missing.
[[nodiscard]] PrestressedServiceLimits prestressed_service_limits(
    const std::string& label, const model::PrestressedGirder& girder, const model::Materials& materials,
    const section::SectionStages& stages, const PrestressedServiceOptions& options,
    const section::SectionOptions& section_options, Real density_factor);

}  // namespace tenthpoint::capacity
