// The longitudinal stiffness parameter of AASHTO LRFD 4.6.2.2.1,
// Kg = n (I + A eg^2), of one girder line at one station, with what it was
// computed from. Internal SI: m, m^2, m^4.
//
//  - I, A: the noncomposite girder (section::GirderSectionProfile, stage
//    noncomposite), in the girder material.
//  - eg: from the girder centroid to the mid-depth of the deck, through the
//    haunch: girder_top + haunch + ts/2 - neutral_axis. When the file gives
//    properties only, girder_top is recovered as neutral_axis + I/S_top.
//  - n = E_girder / E_deck: the bridge's modular ratio (section::
//    modular_ratios), or for a noncomposite bridge materials.modular_ratio or
//    the deck concrete's Ec (LRFD 5.4.2.4).
//  - Cast-in-place concrete T-beams (a reinforced-concrete section with a
//    flange and no separate deck; cross-section type e): the stem below the
//    flange is the beam, the flange the deck, n = 1, so A = bw (h - hf),
//    I = bw (h - hf)^3 / 12 and eg = h/2 (common practice, from memory).
#pragma once

#include <optional>
#include <string>

#include "engine/core/numeric.h"
#include "engine/distribution/distribution_options.h"
#include "engine/model/bridge.h"
#include "engine/section/girder_section_profile.h"

namespace tenthpoint::distribution {

struct GirderStiffness {
  // Absent when it cannot be computed; `why_unknown` says why.
  std::optional<Real> kg;              // m^4
  std::optional<Real> slab_thickness;  // ts, m
  Real inertia = 0;                    // m^4
  Real area = 0;                       // m^2
  Real eccentricity = 0;               // eg, m
  Real modular_ratio = 0;              // n
  std::string section_id;              // section at the station
  std::string why_unknown;
};

// Never throws for a missing deck or modulus (it reports why instead); the
// section profile itself throws InputError for a bad girder line.
[[nodiscard]] GirderStiffness girder_stiffness(const model::Bridge& bridge, const model::GirderLine& girder,
                                               const section::GirderSectionProfile& profile, Real station,
                                               const DistributionOptions& options);

}  // namespace tenthpoint::distribution
