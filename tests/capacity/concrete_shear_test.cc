#include "engine/capacity/concrete_shear.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::capacity {
namespace {

using test::in;
using test::in2;
using test::kip;
using test::kip_in;
using test::ksi;
using test::step;

// Hand calculations in kip and inch; only conversion round-off remains.
constexpr double kHand = 1e-9;
constexpr double kPi = 3.14159265358979323846;

// The beam of the flexure test: b = 12 in, h = 22.5 in, d = 20 in, As =
// 2.37 in^2 (Es = 29000 ksi), f'c = 4 ksi, #4 two-leg stirrups (Av = 0.40
// in^2) at 10 in, fy = 60 ksi. dv = d - a/2 = 18.257 in (LRFD 5.7.2.8).
ConcreteShearSection beam(bool stirrups) {
  ConcreteShearSection s;
  s.label = "test beam";
  s.web_width = in(12);
  s.height = in(22.5);
  s.concrete_strength = ksi(4);
  if (stirrups) {
    s.stirrup_area = in2(0.40);
    s.stirrup_spacing = in(10);
    s.stirrup_yield = ksi(60);
  }
  s.bar_area = in2(2.37);
  s.bar_modulus = ksi(29000);
  return s;
}

const double kDv = 20 - 2.37 * 60 / (0.85 * 4 * 12) / 2;  // in

TEST_CASE("the simplified procedure takes beta = 2 and theta = 45 degrees (LRFD 5.7.3.4.1)", "[capacity]") {
  // By hand: Vc = 0.0316 beta sqrt(f'c) bv dv (5.7.3.3-3), Vs = Av fy dv
  // cot 45 / s (5.7.3.3-4), Vn = min(Vc + Vs, 0.25 f'c bv dv) (5.7.3.3-1, -2).
  const Resistance r =
      concrete_shear(beam(true), in(kDv), std::nullopt, ConcreteShearMethod::simplified, in(0.75), ResistanceFactors{});
  REQUIRE(r.status == ResistanceStatus::computed);
  const double vc = 0.0316 * 2.0 * std::sqrt(4.0) * 12 * kDv;
  const double vs = 0.40 * 60 * kDv / 10;
  TP_CHECK_CLOSE(test::to_kip(step(r.trace, "Vc")), vc, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_kip(step(r.trace, "Vs")), vs, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_kip(r.nominal), vc + vs, kHand, 1.0);
  CHECK(r.phi == Approx(0.90));  // LRFD 5.5.4.2, normal-weight concrete
  TP_CHECK_CLOSE(test::to_kip(r.factored), 0.9 * (vc + vs), kHand, 1.0);
  // Av,min = 0.0316 sqrt(f'c) bv s / fy (5.7.2.5-1) = 0.126 in^2 < 0.40: no warning.
  TP_CHECK_CLOSE(step(r.trace, "Av,min") / in2(1), 0.0316 * 2 * 12 * 10 / 60.0, kHand, 1.0);
  CHECK(r.warnings.empty());
}

TEST_CASE("the general procedure takes eps_s, beta and theta from the demand (LRFD 5.7.3.4.2)", "[capacity]") {
  // Mu = 1500 kip-in, Vu = 50 kip, Nu = 0. By hand:
  // |Mu| = max(1500, Vu dv); eps_s = (|Mu|/dv + Vu) / (Es As) (5.7.3.4.2-4);
  // beta = 4.8 / (1 + 750 eps_s) (-1, the stirrups exceed Av,min);
  // theta = 29 + 3500 eps_s degrees (-3); Vs = Av fy dv cot(theta) / s.
  const ShearDemand demand{kip_in(1500), kip(50), 0};
  const Resistance r =
      concrete_shear(beam(true), in(kDv), demand, ConcreteShearMethod::general, in(0.75), ResistanceFactors{});
  REQUIRE(r.status == ResistanceStatus::computed);
  const double mu = std::max(1500.0, 50 * kDv);
  const double eps = (mu / kDv + 50) / (29000 * 2.37);
  const double beta = 4.8 / (1 + 750 * eps);
  const double theta = 29 + 3500 * eps;
  const double vc = 0.0316 * beta * 2.0 * 12 * kDv;
  const double vs = 0.40 * 60 * kDv / std::tan(theta * kPi / 180) / 10;
  CHECK(step(r.trace, "eps_s") == Approx(eps).epsilon(1e-9));
  CHECK(step(r.trace, "beta") == Approx(beta).epsilon(1e-9));
  CHECK(step(r.trace, "theta") == Approx(theta * kPi / 180).epsilon(1e-9));
  TP_CHECK_CLOSE(test::to_kip(r.nominal), vc + vs, kHand, 1.0);
}

TEST_CASE("the general procedure without stirrups uses the crack-spacing form 5.7.3.4.2-2", "[capacity]") {
  // No stirrups: beta = 4.8 / (1 + 750 eps_s) x 51 / (39 + sxe), sxe = dv
  // 1.38 / (ag + 0.63) = dv for ag = 0.75 in (5.7.3.4.2-7), Vs = 0, by hand.
  const ShearDemand demand{kip_in(1500), kip(50), 0};
  const Resistance r =
      concrete_shear(beam(false), in(kDv), demand, ConcreteShearMethod::general, in(0.75), ResistanceFactors{});
  const double eps = (1500 / kDv + 50) / (29000 * 2.37);
  const double sxe = kDv * 1.38 / (0.75 + 0.63);
  const double beta = 4.8 / (1 + 750 * eps) * 51 / (39 + sxe);
  CHECK(step(r.trace, "sxe") / in(1) == Approx(sxe).epsilon(1e-9));
  CHECK(step(r.trace, "beta") == Approx(beta).epsilon(1e-9));
  TP_CHECK_CLOSE(test::to_kip(r.nominal), 0.0316 * beta * 2.0 * 12 * kDv, kHand, 1.0);
}

TEST_CASE("a negative eps_s of a prestressed web is taken as zero (LRFD 5.7.3.4.2)", "[capacity]") {
  // Aps fpo = 7 x 0.7 x 270 kip outweighs the demand: eps_s < 0 -> 0, so
  // beta = 4.8 and theta = 29 degrees (5.7.3.4.2-1, -3).
  ConcreteShearSection s = beam(true);
  s.prestressed = true;
  s.bar_area = 0;
  s.strand_area = in2(7.0);
  s.strand_modulus = ksi(28500);
  s.strand_tensile_strength = ksi(270);
  const Resistance r = concrete_shear(s, in(kDv), ShearDemand{kip_in(1500), kip(50), 0}, ConcreteShearMethod::general,
                                      in(0.75), ResistanceFactors{});
  CHECK(step(r.trace, "eps_s") == 0.0);
  CHECK(step(r.trace, "beta") == Approx(4.8));
  CHECK(step(r.trace, "theta") == Approx(29 * kPi / 180));
}

TEST_CASE("Vn is capped at 0.25 f'c bv dv (LRFD 5.7.3.3-2)", "[capacity]") {
  // Stirrups of 4 in^2 at 4 in would give Vs = 4 x 60 x dv / 4; the cap,
  // 0.25 x 4 x 12 x dv = 219 kip, governs (hand).
  ConcreteShearSection s = beam(true);
  s.stirrup_area = in2(4.0);
  s.stirrup_spacing = in(4.0);
  const Resistance r =
      concrete_shear(s, in(kDv), std::nullopt, ConcreteShearMethod::simplified, in(0.75), ResistanceFactors{});
  TP_CHECK_CLOSE(test::to_kip(r.nominal), 0.25 * 4 * 12 * kDv, kHand, 1.0);
}

TEST_CASE("the general procedure without a demand is unavailable and says what it needs", "[capacity]") {
  const Resistance r =
      concrete_shear(beam(true), in(kDv), std::nullopt, ConcreteShearMethod::general, in(0.75), ResistanceFactors{});
  CHECK(r.status == ResistanceStatus::unavailable);
  CHECK(r.reason ==
        "test beam: the general shear procedure (AASHTO LRFD 5.7.3.4.2) needs the factored Mu and Vu at "
        "the section");
}

TEST_CASE("beta = 2 on a deep web without minimum stirrups is flagged (LRFD 5.7.3.4.1)", "[capacity]") {
  const Resistance r = concrete_shear(beam(false), in(kDv), std::nullopt, ConcreteShearMethod::simplified, in(0.75),
                                      ResistanceFactors{});
  REQUIRE(r.warnings.size() == 1);
  CHECK_THAT(r.warnings[0], Catch::Contains("minimum transverse reinforcement"));
  // Vc alone, by hand.
  TP_CHECK_CLOSE(test::to_kip(r.nominal), 0.0316 * 2.0 * 2.0 * 12 * kDv, kHand, 1.0);
}

}  // namespace
}  // namespace tenthpoint::capacity
