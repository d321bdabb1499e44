// Units at the boundary. Inside the engine every quantity is in one coherent
// SI system: metre, newton, pascal, radian (so moments are N*m, line loads
// N/m, stresses Pa, second moments m^4). Values are converted as they are read
// and converted back only when written for people.
//
// A bridge file declares its unit system; each field of the format is tagged
// with a Quantity, which fixes the unit a bare number is read in:
//
//   Quantity        US            SI
//   length          ft            m        spans, stations, spacings
//   section_length  in            mm       plate sizes, depths, slab thickness
//   area            in^2          mm^2
//   section_modulus in^3          mm^3
//   inertia         in^4          mm^4
//   force           kip           kN
//   moment          kip-ft        kN-m
//   line_load       kip/ft        kN/m
//   stress          ksi           MPa      E, fy, f'c, fpu, allowable stresses
//   unit_weight     kip/ft^3      kN/m^3   concrete, wearing surface
//   angle           degree        degree
//   weight_tons     ton (2 kip)   tonne    vehicle gross weights, posting values
#pragma once

#include <optional>
#include <string_view>

#include "engine/core/numeric.h"

namespace tenthpoint::units {

// Exact conversion constants (NIST SP 811, Appendix B).
inline constexpr Real kFoot = 0.3048;                 // m
inline constexpr Real kInch = 0.0254;                 // m
inline constexpr Real kMillimetre = 1.0e-3;           // m
inline constexpr Real kPoundForce = 4.4482216152605;  // N
inline constexpr Real kKip = 1000.0 * kPoundForce;    // N
inline constexpr Real kKilonewton = 1.0e3;            // N
inline constexpr Real kKsi = kKip / (kInch * kInch);  // Pa
inline constexpr Real kMegapascal = 1.0e6;            // Pa
inline constexpr Real kKipFoot = kKip * kFoot;        // N*m
inline constexpr Real kKipPerFoot = kKip / kFoot;     // N/m
inline constexpr Real kPi = 3.14159265358979323846;
inline constexpr Real kDegree = kPi / 180.0;  // rad
// US "ton" in bridge posting is the short ton of 2000 lb; SI postings use the
// tonne-force (1000 kg x standard gravity 9.80665 m/s^2).
inline constexpr Real kShortTon = 2.0 * kKip;  // N
inline constexpr Real kTonneForce = 9806.65;   // N

enum class UnitSystem { us, si };

enum class Quantity {
  length,
  section_length,
  area,
  section_modulus,
  inertia,
  force,
  moment,
  line_load,
  stress,
  unit_weight,
  angle,
  weight_tons,
  dimensionless,
};

// Size of one user unit of `quantity` in internal units.
[[nodiscard]] Real scale(Quantity quantity, UnitSystem system);

[[nodiscard]] inline Real to_internal(Real value, Quantity quantity, UnitSystem system) {
  return value * scale(quantity, system);
}
[[nodiscard]] inline Real from_internal(Real value, Quantity quantity, UnitSystem system) {
  return value / scale(quantity, system);
}

// The label of the user unit, e.g. "kip-ft" or "kN-m"; "" for dimensionless.
[[nodiscard]] std::string_view label(Quantity quantity, UnitSystem system);

// "US" / "SI" (the spelling in bridge files), and its inverse.
[[nodiscard]] std::string_view to_string(UnitSystem system);
[[nodiscard]] std::optional<UnitSystem> parse_unit_system(std::string_view text);

[[nodiscard]] std::string_view to_string(Quantity quantity);

}  // namespace tenthpoint::units
