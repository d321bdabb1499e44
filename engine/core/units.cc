#include "engine/core/units.h"

#include <cassert>

namespace tenthpoint::units {

Real scale(Quantity quantity, UnitSystem system) {
  const bool us = system == UnitSystem::us;
  switch (quantity) {
    case Quantity::length:
      return us ? kFoot : 1.0;
    case Quantity::section_length:
      return us ? kInch : kMillimetre;
    case Quantity::area:
      return us ? kInch * kInch : kMillimetre * kMillimetre;
    case Quantity::section_modulus:
      return us ? kInch * kInch * kInch : kMillimetre * kMillimetre * kMillimetre;
    case Quantity::inertia:
      return us ? kInch * kInch * kInch * kInch : kMillimetre * kMillimetre * kMillimetre * kMillimetre;
    case Quantity::force:
      return us ? kKip : kKilonewton;
    case Quantity::moment:
      return us ? kKipFoot : kKilonewton;  // kN*m = 1e3 N*m
    case Quantity::line_load:
      return us ? kKipPerFoot : kKilonewton;  // kN/m = 1e3 N/m
    case Quantity::stress:
      return us ? kKsi : kMegapascal;
    case Quantity::unit_weight:
      return us ? kKip / (kFoot * kFoot * kFoot) : kKilonewton;  // kN/m^3
    case Quantity::angle:
      return kDegree;
    case Quantity::weight_tons:
      return us ? kShortTon : kTonneForce;
    case Quantity::dimensionless:
      return 1.0;
  }
  assert(false && "unhandled Quantity");
  return 1.0;
}

std::string_view label(Quantity quantity, UnitSystem system) {
  const bool us = system == UnitSystem::us;
  switch (quantity) {
    case Quantity::length:
      return us ? "ft" : "m";
    case Quantity::section_length:
      return us ? "in" : "mm";
    case Quantity::area:
      return us ? "in^2" : "mm^2";
    case Quantity::section_modulus:
      return us ? "in^3" : "mm^3";
    case Quantity::inertia:
      return us ? "in^4" : "mm^4";
    case Quantity::force:
      return us ? "kip" : "kN";
    case Quantity::moment:
      return us ? "kip-ft" : "kN-m";
    case Quantity::line_load:
      return us ? "kip/ft" : "kN/m";
    case Quantity::stress:
      return us ? "ksi" : "MPa";
    case Quantity::unit_weight:
      return us ? "kcf" : "kN/m^3";
    case Quantity::angle:
      return "deg";
    case Quantity::weight_tons:
      return us ? "ton" : "t";
    case Quantity::dimensionless:
      return "";
  }
  return "";
}

std::string_view to_string(UnitSystem system) { return system == UnitSystem::us ? "US" : "SI"; }

std::optional<UnitSystem> parse_unit_system(std::string_view text) {
  if (text == "US") return UnitSystem::us;
  if (text == "SI") return UnitSystem::si;
  return std::nullopt;
}

std::string_view to_string(Quantity quantity) {
  switch (quantity) {
    case Quantity::length:
      return "length";
    case Quantity::section_length:
      return "section_length";
    case Quantity::area:
      return "area";
    case Quantity::section_modulus:
      return "section_modulus";
    case Quantity::inertia:
      return "inertia";
    case Quantity::force:
      return "force";
    case Quantity::moment:
      return "moment";
    case Quantity::line_load:
      return "line_load";
    case Quantity::stress:
      return "stress";
    case Quantity::unit_weight:
      return "unit_weight";
    case Quantity::angle:
      return "angle";
    case Quantity::weight_tons:
      return "weight_tons";
    case Quantity::dimensionless:
      return "dimensionless";
  }
  return "dimensionless";
}

}  // namespace tenthpoint::units
