#include "engine/capacity/tension_control.h"

#include <algorithm>
#include <cassert>

#include "engine/core/units.h"

namespace tenthpoint::capacity {

std::string_view to_string(StrainRegime regime) {
  switch (regime) {
    case StrainRegime::tension_controlled:
      return "tension-controlled";
    case StrainRegime::transition:
      return "transition";
    case StrainRegime::compression_controlled:
      return "compression-controlled";
  }
  return "?";
}

Real compression_controlled_strain_limit(bool prestressed, Real bar_yield, Real bar_modulus) {
  // AASHTO LRFD 5.6.2.1: 0.002 for all prestressing steel; the yield strain
  // fy/Es for nonprestressed reinforcement.
  if (prestressed) return 0.002;
  assert(bar_yield > 0 && bar_modulus > 0);
  return bar_yield / bar_modulus;
}

Real tension_controlled_strain_limit(bool prestressed, Real bar_yield) {
  // AASHTO LRFD 5.6.2.1: 0.005 for prestressing steel and fy <= 75 ksi; the
  // 8th ed. added 0.008 for fy = 100 ksi with interpolation between.
  if (prestressed) return 0.005;
  const Real fy_ksi = bar_yield / units::kKsi;
  if (fy_ksi <= 75.0) return 0.005;
  return 0.005 + 0.003 * std::min(1.0, (fy_ksi - 75.0) / 25.0);
}

TensionControl tension_control(Real net_tensile_strain, Real compression_limit, Real tension_limit, Real phi_tension,
                               Real phi_compression) {
  assert(tension_limit > compression_limit);
  TensionControl out;
  out.net_tensile_strain = net_tensile_strain;
  out.compression_limit = compression_limit;
  out.tension_limit = tension_limit;
  if (net_tensile_strain >= tension_limit) {
    out.phi = phi_tension;
    out.regime = StrainRegime::tension_controlled;
  } else if (net_tensile_strain <= compression_limit) {
    out.phi = phi_compression;
    out.regime = StrainRegime::compression_controlled;
  } else {
    // AASHTO LRFD 5.5.4.2-1 / -2: linear between the two limits.
    out.phi = phi_compression + (phi_tension - phi_compression) * (net_tensile_strain - compression_limit) /
                                    (tension_limit - compression_limit);
    out.regime = StrainRegime::transition;
  }
  return out;
}

}  // namespace tenthpoint::capacity
