#include "engine/capacity/resistance_factors.h"

#include <catch2/catch.hpp>

#include "engine/capacity/capacity_options.h"

namespace tenthpoint::capacity {
namespace {

TEST_CASE("the default resistance factors are those of LRFD 5.5.4.2 and 6.5.4.2", "[capacity]") {
  // AASHTO LRFD 6.5.4.2 (steel flexure and shear 1.00) and 5.5.4.2 (RC
  // tension-controlled 0.90, PS tension-controlled 1.00, compression-
  // controlled 0.75, shear 0.90), all from memory.
  const ResistanceFactors f;
  CHECK(f.steel_flexure == 1.00);
  CHECK(f.steel_shear == 1.00);
  CHECK(f.rc_tension_controlled == 0.90);
  CHECK(f.ps_tension_controlled == 1.00);
  CHECK(f.compression_controlled == 0.75);
  CHECK(f.concrete_shear == 0.90);
  CHECK(f.source(ResistanceFactorId::steel_shear) == "AASHTO LRFD 6.5.4.2 (phi_v)");
  std::string why;
  CHECK(f.is_valid(&why));
}

TEST_CASE("an overridden factor names its default and is checked once", "[capacity]") {
  ResistanceFactors f;
  f.concrete_shear = 0.85;
  CHECK(f.source(ResistanceFactorId::concrete_shear) ==
        "overridden in the capacity options (default 0.90, AASHTO LRFD 5.5.4.2)");
  f.steel_flexure = 1.2;
  std::string why;
  CHECK_FALSE(f.is_valid(&why));
  CHECK(why == "resistance factor for steel flexure must be in (0, 1] (got 1.2)");

  CapacityOptions options;
  options.resistance.compression_controlled = 0.95;
  CHECK_FALSE(options.is_valid(&why));
  CHECK(why == "the compression-controlled resistance factor must not exceed the tension-controlled ones");
  options = CapacityOptions{};
  options.moment_gradient_factor = 0.9;
  CHECK_FALSE(options.is_valid(&why));
  CHECK(why == "moment gradient factor Cb must be in [1.0, 2.3]");
}

}  // namespace
}  // namespace tenthpoint::capacity
