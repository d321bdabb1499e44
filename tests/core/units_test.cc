#include "engine/core/units.h"

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::units;

// Exact definitions: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N
// (NIST SP 811, Appendix B). Round-trips hold to rounding error of doubles.
TEST_CASE("every quantity round-trips through internal units in both systems", "[core][units]") {
  const Quantity all[] = {Quantity::length,       Quantity::section_length, Quantity::area,   Quantity::section_modulus,
                          Quantity::inertia,      Quantity::force,          Quantity::moment, Quantity::line_load,
                          Quantity::stress,       Quantity::unit_weight,    Quantity::angle,  Quantity::weight_tons,
                          Quantity::dimensionless};
  for (UnitSystem system : {UnitSystem::us, UnitSystem::si}) {
    for (Quantity q : all) {
      for (double v : {-1234.5678, 0.001, 1.0, 36.0, 29000.0, 1.0e7}) {
        INFO(to_string(q) << " in " << to_string(system));
        TP_CHECK_CLOSE(from_internal(to_internal(v, q, system), q, system), v, 1e-14, 1e-300);
      }
    }
  }
}

TEST_CASE("US and SI user units agree on the same physical value", "[core][units]") {
  // 1 ksi = 6.894757 MPa (NIST SP 811 B.8).
  TP_CHECK_CLOSE(
      to_internal(1.0, Quantity::stress, UnitSystem::us) / to_internal(1.0, Quantity::stress, UnitSystem::si),
      6.894757293168361, 1e-12, 1.0);
  // 1 kip-ft = 1.355818 kN-m (NIST SP 811 B.8, torque).
  TP_CHECK_CLOSE(
      to_internal(1.0, Quantity::moment, UnitSystem::us) / to_internal(1.0, Quantity::moment, UnitSystem::si),
      1.3558179483314, 1e-12, 1.0);
  // 1 kip/ft = 14.593903 kN/m.
  TP_CHECK_CLOSE(
      to_internal(1.0, Quantity::line_load, UnitSystem::us) / to_internal(1.0, Quantity::line_load, UnitSystem::si),
      14.593902937206, 1e-12, 1.0);
  // 1 in^4 = 416231.4256 mm^4 (0.0254^4 m^4).
  TP_CHECK_CLOSE(
      to_internal(1.0, Quantity::inertia, UnitSystem::us) / to_internal(1.0, Quantity::inertia, UnitSystem::si),
      416231.4256, 1e-12, 1.0);
  // 1 kcf = 157.087463 kN/m^3.
  TP_CHECK_CLOSE(
      to_internal(1.0, Quantity::unit_weight, UnitSystem::us) / to_internal(1.0, Quantity::unit_weight, UnitSystem::si),
      157.08746384, 1e-9, 1.0);
}

TEST_CASE("unit systems parse from their file spelling only", "[core][units]") {
  CHECK(parse_unit_system("US") == UnitSystem::us);
  CHECK(parse_unit_system("SI") == UnitSystem::si);
  CHECK_FALSE(parse_unit_system("us").has_value());
  CHECK_FALSE(parse_unit_system("metric").has_value());
  CHECK(label(Quantity::moment, UnitSystem::us) == "kip-ft");
  CHECK(label(Quantity::moment, UnitSystem::si) == "kN-m");
}
