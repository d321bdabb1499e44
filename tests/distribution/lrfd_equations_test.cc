#include "engine/distribution/lrfd_equations.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

namespace tenthpoint::distribution {
namespace {

constexpr double kTight = 1e-12;  // the same closed form evaluated twice

LrfdEquationInputs willow_run_like() {
  LrfdEquationInputs in;
  in.spacing_ft = 8.5;
  in.span_ft = 70.0;
  in.slab_in = 7.5;
  in.kg_in4 = 221450.0;
  in.girders = 5;
  in.curb_ft = 1.25;
  return in;
}

TEST_CASE("the skew reduction of moment at 45 degrees is 1 - c1", "[distribution]") {
  // LRFD Table 4.6.2.2.2e-1: c1 = 0.25 (Kg / (12 L ts^3))^0.25 (S/L)^0.5, tan 45 = 1.
  auto in = willow_run_like();
  in.skew_degrees = 45.0;
  const double ratio = 221450.0 / (12.0 * 70.0 * 7.5 * 7.5 * 7.5);         // 0.62490
  const double c1 = 0.25 * std::pow(ratio, 0.25) * std::sqrt(8.5 / 70.0);  // 0.07745
  TP_CHECK_CLOSE(skew_moment_c1(in), c1, kTight, 1.0);
  TP_CHECK_CLOSE(skew_moment_factor(in), 1.0 - c1, kTight, 1.0);
  TP_CHECK_CLOSE(skew_moment_factor(in), 0.92254, 1e-4, 1.0);  // rounded hand value
}

TEST_CASE("the skew reduction vanishes below 30 degrees and stops growing at 60", "[distribution]") {
  auto in = willow_run_like();
  in.skew_degrees = 29.0;
  CHECK(skew_moment_factor(in) == 1.0);
  in.skew_degrees = 70.0;
  const double at_70 = skew_moment_factor(in);
  in.skew_degrees = 60.0;
  CHECK(at_70 == skew_moment_factor(in));
}

TEST_CASE("the shear correction at 45 degrees is 1 + 0.2 (12 L ts^3 / Kg)^0.3", "[distribution]") {
  // LRFD Table 4.6.2.2.3c-1.
  auto in = willow_run_like();
  in.skew_degrees = 45.0;
  const double inverse = 12.0 * 70.0 * 421.875 / 221450.0;
  TP_CHECK_CLOSE(skew_shear_factor(in), 1.0 + 0.2 * std::pow(inverse, 0.3), kTight, 1.0);
}

TEST_CASE("the range of applicability flags each parameter outside it", "[distribution]") {
  auto in = willow_run_like();
  CHECK(outside_range(in, true).empty());
  in.spacing_ft = 18.0;
  in.curb_ft = 6.0;
  const auto warnings = outside_range(in, true);
  REQUIRE(warnings.size() == 2);
  CHECK(warnings[0] == "S = 18 ft is outside 3.5 to 16 ft, the range of applicability of LRFD 4.6.2.2");
  CHECK(warnings[1] == "de = 6 ft is outside -1 to 5.5 ft, the range of applicability of LRFD 4.6.2.2");
  CHECK(outside_range(in, false).size() == 1);
}

}  // namespace
}  // namespace tenthpoint::distribution
