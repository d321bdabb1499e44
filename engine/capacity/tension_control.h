// The strain-based resistance factor for concrete flexure, AASHTO LRFD
// 5.5.4.2 with the strain limits of 5.6.2.1: tension-controlled when the net
// tensile strain in the extreme tension steel is at least the
// tension-controlled limit, compression-controlled at or below the
// compression-controlled limit, and linear in between.
#pragma once

#include <string_view>

#include "engine/core/numeric.h"

namespace tenthpoint::capacity {

enum class StrainRegime { tension_controlled, transition, compression_controlled };

[[nodiscard]] std::string_view to_string(StrainRegime regime);

struct TensionControl {
  Real net_tensile_strain = 0;  // epsilon_t, positive in tension
  Real compression_limit = 0;   // epsilon_cl
  Real tension_limit = 0;       // epsilon_tl
  Real phi = 0;
  StrainRegime regime = StrainRegime::tension_controlled;
};

// epsilon_cl (LRFD 5.6.2.1): 0.002 for prestressing steel; fy / Es for
// nonprestressed bars. Stresses in Pa. Precondition: fy, Es > 0.
[[nodiscard]] Real compression_controlled_strain_limit(bool prestressed, Real bar_yield, Real bar_modulus);
// epsilon_tl (LRFD 5.6.2.1): 0.005 for prestressing steel and for bars with
// fy <= 75 ksi; rising linearly to 0.008 at fy = 100 ksi (from memory).
[[nodiscard]] Real tension_controlled_strain_limit(bool prestressed, Real bar_yield);

// phi = phi_c + (phi_t - phi_c)(eps_t - eps_cl)/(eps_tl - eps_cl), held in
// [phi_c, phi_t] (LRFD 5.5.4.2-1 for prestressed with phi_t = 1.0, -2 for
// nonprestressed with phi_t = 0.9, phi_c = 0.75). Precondition:
// tension_limit > compression_limit.
[[nodiscard]] TensionControl tension_control(Real net_tensile_strain, Real compression_limit, Real tension_limit,
                                             Real phi_tension, Real phi_compression);

}  // namespace tenthpoint::capacity
