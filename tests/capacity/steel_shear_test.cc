#include "engine/capacity/steel_shear.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::capacity {
namespace {

using test::in;
using test::in2;
using test::ksi;
using test::step;

// Hand values in kip and inch; only conversion round-off remains.
constexpr double kHand = 1e-9;
constexpr double kE = 29000;

SteelShearInput web(double d, double tw, double fy) {
  SteelShearInput s;
  s.label = "test web";
  s.web_depth = in(d);
  s.web_thickness = in(tw);
  s.web_yield = ksi(fy);
  s.modulus = ksi(kE);
  s.compression_flange_area = in2(20);
  s.tension_flange_area = in2(20);
  return s;
}

// C of LRFD 6.10.9.3.2-4, -5, -6, by hand.
double c_ratio(double slenderness, double k, double fy) {
  const double root = std::sqrt(kE * k / fy);
  if (slenderness <= 1.12 * root) return 1.0;
  if (slenderness <= 1.40 * root) return 1.12 / slenderness * root;
  return 1.57 / (slenderness * slenderness) * (kE * k / fy);
}

TEST_CASE("an unstiffened web takes Vn = C Vp with k = 5 in each range of C (6.10.9.2)", "[capacity]") {
  // Fy = 50 ksi, tw = 0.5 in: sqrt(E k / Fy) = 53.9, so D/tw = 50, 70, 100 fall
  // in the ranges of 6.10.9.3.2-4, -5 and -6; Vp = 0.58 Fyw D tw (6.10.9.2-2).
  for (const double slenderness : {50.0, 70.0, 100.0}) {
    INFO("D/tw = " << slenderness);
    const double d = slenderness * 0.5;
    const Resistance r = steel_shear(web(d, 0.5, 50), ResistanceFactors{});
    const double vp = 0.58 * 50 * d * 0.5;
    const double c = c_ratio(slenderness, 5, 50);
    CHECK(step(r.trace, "C") == Approx(c).epsilon(1e-12));
    TP_CHECK_CLOSE(test::to_kip(r.nominal), c * vp, kHand, 1.0);
    CHECK(r.article == "AASHTO LRFD 6.10.9.2");
    CHECK(r.phi == Approx(1.0));  // LRFD 6.5.4.2
  }
  // The three values are in the three ranges.
  CHECK(c_ratio(50, 5, 50) == 1.0);
  CHECK(c_ratio(70, 5, 50) < 1.0);
  CHECK(c_ratio(70, 5, 50) > c_ratio(100, 5, 50));
}

TEST_CASE("a stiffened interior panel adds the tension field of 6.10.9.3.2-2", "[capacity]") {
  // D = 60, tw = 7/16, do = 90 in (do/D = 1.5), Fy = 50, flanges 20 in^2 each:
  // 2 D tw / (Afc + Aft) = 1.31 <= 2.5. k = 5 + 5 / (do/D)^2 (-7); C in the
  // elastic range (-6); Vn = Vp [C + 0.87 (1 - C) / sqrt(1 + (do/D)^2)], by hand.
  SteelShearInput s = web(60, 0.4375, 50);
  s.stiffener_spacing = in(90);
  const Resistance r = steel_shear(s, ResistanceFactors{});
  const double k = 5 + 5 / (1.5 * 1.5);
  const double c = c_ratio(60 / 0.4375, k, 50);
  const double vp = 0.58 * 50 * 60 * 0.4375;
  CHECK(step(r.trace, "k") == Approx(k));
  TP_CHECK_CLOSE(test::to_kip(r.nominal), vp * (c + 0.87 * (1 - c) / std::sqrt(1 + 1.5 * 1.5)), kHand, 1.0);
  CHECK(r.article == "AASHTO LRFD 6.10.9.3.2");
}

TEST_CASE("small flanges reduce the tension field (6.10.9.3.2-8)", "[capacity]") {
  // The same web with 10 x 1/2 in flanges: 2 D tw / (Afc + Aft) = 5.25 > 2.5, so
  // Vn = Vp [C + 0.87 (1 - C) / (sqrt(1 + (do/D)^2) + do/D)], by hand.
  SteelShearInput s = web(60, 0.4375, 50);
  s.stiffener_spacing = in(90);
  s.compression_flange_area = in2(5);
  s.tension_flange_area = in2(5);
  const Resistance r = steel_shear(s, ResistanceFactors{});
  const double k = 5 + 5 / (1.5 * 1.5);
  const double c = c_ratio(60 / 0.4375, k, 50);
  const double vp = 0.58 * 50 * 60 * 0.4375;
  TP_CHECK_CLOSE(test::to_kip(r.nominal), vp * (c + 0.87 * (1 - c) / (std::sqrt(1 + 2.25) + 1.5)), kHand, 1.0);
}

TEST_CASE("a stiffened panel in the inelastic range of C keeps the tension field", "[capacity]") {
  // D = 40, tw = 0.5 (D/tw = 80), do = 40 in: k = 10, sqrt(E k / Fy) = 76.2,
  // 1.12 x 76.2 = 85.3 > 80: C = 1.0, Vn = Vp; with D = 48 (D/tw = 96) C is
  // in the inelastic range (-5), by hand.
  SteelShearInput s = web(40, 0.5, 50);
  s.stiffener_spacing = in(40);
  const Resistance yielding = steel_shear(s, ResistanceFactors{});
  TP_CHECK_CLOSE(test::to_kip(yielding.nominal), 0.58 * 50 * 40 * 0.5, kHand, 1.0);

  SteelShearInput t = web(48, 0.5, 50);
  t.stiffener_spacing = in(48);
  const Resistance inelastic = steel_shear(t, ResistanceFactors{});
  const double c = c_ratio(96, 10, 50);
  REQUIRE(c < 1.0);
  REQUIRE(96 <= 1.40 * std::sqrt(kE * 10 / 50.0));
  const double vp = 0.58 * 50 * 48 * 0.5;
  TP_CHECK_CLOSE(test::to_kip(inelastic.nominal), vp * (c + 0.87 * (1 - c) / std::sqrt(2.0)), kHand, 1.0);
}

TEST_CASE("an end panel has no tension field (6.10.9.3.3)", "[capacity]") {
  SteelShearInput s = web(60, 0.4375, 50);
  s.stiffener_spacing = in(90);
  s.end_panel = true;
  const Resistance r = steel_shear(s, ResistanceFactors{});
  const double c = c_ratio(60 / 0.4375, 5 + 5 / 2.25, 50);
  TP_CHECK_CLOSE(test::to_kip(r.nominal), c * 0.58 * 50 * 60 * 0.4375, kHand, 1.0);
  CHECK(r.article == "AASHTO LRFD 6.10.9.3.3");
}

TEST_CASE("stiffeners farther apart than 3 D leave the web unstiffened (6.10.9.1)", "[capacity]") {
  SteelShearInput s = web(30, 0.5, 50);
  s.stiffener_spacing = in(100);
  const Resistance r = steel_shear(s, ResistanceFactors{});
  CHECK(step(r.trace, "k") == 5.0);
  CHECK(r.article == "AASHTO LRFD 6.10.9.2");
}

}  // namespace
}  // namespace tenthpoint::capacity
