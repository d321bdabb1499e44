// The cracked transformed section of a reinforced concrete beam for the
// Service I steel stress under permits, against the textbook closed forms
// (elastic cracked section: first moments of the transformed areas balance).
#include "engine/capacity/reinforced_service_limits.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::capacity {
namespace {

using test::in;
using test::in2;
using test::ksi;

constexpr double kHand = 1e-9;  // conversions' round-off only

ConcreteFlexureSection beam(double b, double hf, double bw, double d, double as) {
  ConcreteFlexureSection s;
  s.label = "test beam";
  s.height = in(d + 3);
  s.flange_width = in(b);
  s.flange_thickness = in(hf);
  s.web_width = in(bw);
  s.concrete_strength = ksi(4);
  s.bars = {{in2(as), in(d)}};
  s.bar_yield = ksi(60);
  s.bar_modulus = ksi(29000);
  return s;
}

}  // namespace

TEST_CASE("a T-beam whose neutral axis is below the flange takes the overhangs into kd and Icr", "[capacity]") {
  // b = 48 in, hf = 4 in, bw = 12 in, d = 30 in, As = 10 in^2, n = 29000 /
  // 3625 = 8. The rectangular trial 24 kd^2 = 80 (30 - kd) gives kd = 8.47 in
  // > hf, so the flanged balance holds: bw kd^2 / 2 + ((b - bw) hf + n As) kd
  // - ((b - bw) hf^2 / 2 + n As d) = 0, and Icr adds the overhangs about the
  // neutral axis (parallel axis theorem).
  const ReinforcedServiceLimits r = reinforced_service_limits(beam(48, 4, 12, 30, 10), ksi(3625));
  REQUIRE(r.status == ResistanceStatus::computed);
  const double n = 8;
  const double p = 36 * 4 + n * 10;
  const double q = 36 * 16 / 2.0 + n * 10 * 30;
  const double kd = (-p + std::sqrt(p * p + 2 * 12 * q)) / 12;
  const double icr =
      12 * kd * kd * kd / 3 + 36 * (64 / 12.0 + 4 * (kd - 2) * (kd - 2)) + n * 10 * (30 - kd) * (30 - kd);
  CHECK(kd > 4);
  TP_CHECK_CLOSE(r.modular_ratio, n, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_in(r.neutral_axis_depth), kd, kHand, 1.0);
  TP_CHECK_CLOSE(r.cracked_inertia / std::pow(units::kInch, 4), icr, kHand, 1.0);
  TP_CHECK_CLOSE(r.steel_section_modulus / std::pow(units::kInch, 3), icr / (n * (30 - kd)), kHand, 1.0);
  TP_CHECK_CLOSE(test::to_ksi(r.allowable_stress), 54.0, kHand, 1.0);  // 0.9 fy (MBE 6A.5.4.2.2b, from memory)
}

TEST_CASE("a face without tension bars has no Service I steel stress and says so", "[capacity]") {
  ConcreteFlexureSection s = beam(12, 0, 12, 20, 3);
  s.bars.clear();
  const ReinforcedServiceLimits r = reinforced_service_limits(s, ksi(3600));
  CHECK(r.status == ResistanceStatus::unavailable);
  CHECK_THAT(r.reason, Catch::Contains("no tension bars"));
}

}  // namespace tenthpoint::capacity
