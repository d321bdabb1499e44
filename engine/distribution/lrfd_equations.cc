#include "engine/distribution/lrfd_equations.h"

#include <algorithm>
#include <cmath>

#include <fmt/format.h>

#include "engine/core/units.h"

namespace tenthpoint::distribution {
namespace {

// Kg / (12 L ts^3), the longitudinal stiffness parameter, dimensionless in
// in^4 / (ft in^3) as the equations are calibrated.
Real stiffness_ratio(const LrfdEquationInputs& in) { return in.kg_in4 / (12.0 * in.span_ft * std::pow(in.slab_in, 3)); }

Real capped_skew_radians(const LrfdEquationInputs& in) { return std::min(in.skew_degrees, 60.0) * units::kDegree; }

void check(std::vector<std::string>& out, const char* name, Real value, Real low, Real high, const char* unit) {
  if (value < low || value > high) {
    out.push_back(fmt::format("{} = {:.4g} {} is outside {:g} to {:g} {}, the range of applicability of LRFD 4.6.2.2",
                              name, value, unit, low, high, unit));
  }
}

}  // namespace

Real interior_moment_one_lane(const LrfdEquationInputs& in) {
  // LRFD Table 4.6.2.2.2b-1, one design lane loaded.
  return 0.06 + std::pow(in.spacing_ft / 14.0, 0.4) * std::pow(in.spacing_ft / in.span_ft, 0.3) *
                    std::pow(stiffness_ratio(in), 0.1);
}

Real interior_moment_multi_lane(const LrfdEquationInputs& in) {
  // LRFD Table 4.6.2.2.2b-1, two or more design lanes loaded.
  return 0.075 + std::pow(in.spacing_ft / 9.5, 0.6) * std::pow(in.spacing_ft / in.span_ft, 0.2) *
                     std::pow(stiffness_ratio(in), 0.1);
}

Real interior_shear_one_lane(const LrfdEquationInputs& in) { return 0.36 + in.spacing_ft / 25.0; }

Real interior_shear_multi_lane(const LrfdEquationInputs& in) {
  return 0.2 + in.spacing_ft / 12.0 - std::pow(in.spacing_ft / 35.0, 2.0);
}

Real exterior_moment_correction(const LrfdEquationInputs& in) { return 0.77 + in.curb_ft / 9.1; }

Real exterior_shear_correction(const LrfdEquationInputs& in) { return 0.6 + in.curb_ft / 10.0; }

Real skew_moment_c1(const LrfdEquationInputs& in) {
  if (in.skew_degrees < 30.0) return 0.0;  // LRFD Table 4.6.2.2.2e-1: c1 = 0 for theta < 30 degrees
  return 0.25 * std::pow(stiffness_ratio(in), 0.25) * std::pow(in.spacing_ft / in.span_ft, 0.5);
}

Real skew_moment_factor(const LrfdEquationInputs& in) {
  return 1.0 - skew_moment_c1(in) * std::pow(std::tan(capped_skew_radians(in)), 1.5);
}

Real skew_shear_factor(const LrfdEquationInputs& in) {
  return 1.0 + 0.20 * std::pow(1.0 / stiffness_ratio(in), 0.3) * std::tan(capped_skew_radians(in));
}

std::vector<std::string> outside_range(const LrfdEquationInputs& in, bool exterior) {
  std::vector<std::string> out;
  check(out, "S", in.spacing_ft, 3.5, 16.0, "ft");
  check(out, "ts", in.slab_in, 4.5, 12.0, "in");
  check(out, "L", in.span_ft, 20.0, 240.0, "ft");
  check(out, "Kg", in.kg_in4, 10000.0, 7000000.0, "in^4");
  if (exterior) check(out, "de", in.curb_ft, -1.0, 5.5, "ft");
  return out;
}

}  // namespace tenthpoint::distribution
