#include "engine/capacity/steel_flange_flexure.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::capacity {
namespace {

using test::ft;
using test::in;
using test::in3;
using test::ksi;
using test::plate;
using test::step;

// Hand values in kip and inch; only conversion round-off remains.
constexpr double kHand = 1e-9;
constexpr double kPi = 3.14159265358979323846;
constexpr double kE = 29000;

// A doubly symmetric noncomposite girder: flanges bf x tf, web D x tw,
// Fy = 36 ksi, compression in the top flange, Dc = D/2.
SteelFlangeFlexureInput girder(double bf, double tf, double d, double tw, double lb_ft) {
  SteelFlangeFlexureInput s;
  s.label = "test girder";
  s.girder.top_flange = plate(bf, tf);
  s.girder.web = plate(d, tw);
  s.girder.bottom_flange = plate(bf, tf);
  s.steel_yield = ksi(36);
  s.steel_modulus = ksi(kE);
  s.compression_on_top = true;
  s.unbraced_length = ft(lb_ft);
  s.web_compression_depth = in(d / 2);
  s.compression_modulus = in3(100);
  s.tension_modulus = in3(100);
  return s;
}

// LRFD 6.10.8.2.2 and 6.10.8.2.3 by hand for Fy = 36 ksi, Rb = Rh = 1, Cb = 1.
const double kFyr = 0.7 * 36;                          // 6.10.8.2.2
const double kLambdaPf = 0.38 * std::sqrt(kE / 36.0);  // 6.10.8.2.2-4
const double kLambdaRf = 0.56 * std::sqrt(kE / kFyr);  // 6.10.8.2.2-5

double rt(double bf, double tf, double dc, double tw) {  // 6.10.8.2.3-9
  return bf / std::sqrt(12 * (1 + dc * tw / (3 * bf * tf)));
}

TEST_CASE("a compact flange reaches Rb Rh Fyc by local buckling (6.10.8.2.2-1)", "[capacity]") {
  // W21x62 as plates (EV-0077; AISC Manual Table 1-1, from memory): lambda_f
  // = 8.24 / (2 x 0.615) = 6.70 <= lambda_pf = 10.8.
  const SteelFlangeFlexure f = steel_flange_flexure(girder(8.24, 0.615, 19.76, 0.40, 4), ResistanceFactors{});
  CHECK(step(f.resistance.trace, "lambda_f") == Approx(8.24 / 1.23));
  CHECK(test::to_ksi(f.local_buckling_stress) == Approx(36.0));
  CHECK(f.load_shedding == 1.0);  // 2 Dc / tw = 49 <= lambda_rw = 5.7 sqrt(E/Fy) = 162 (6.10.1.10.2-2)
}

TEST_CASE("a noncompact flange interpolates between Fyc and Fyr (6.10.8.2.2-2)", "[capacity]") {
  // 14 x 1/2 in flanges: lambda_f = 14 between lambda_pf = 10.8 and lambda_rf = 19.0.
  const SteelFlangeFlexure f = steel_flange_flexure(girder(14, 0.5, 19.76, 0.40, 4), ResistanceFactors{});
  const double lambda = 14.0;
  REQUIRE(lambda > kLambdaPf);
  REQUIRE(lambda <= kLambdaRf);
  const double fnc = (1 - (1 - kFyr / 36) * (lambda - kLambdaPf) / (kLambdaRf - kLambdaPf)) * 36;
  TP_CHECK_CLOSE(test::to_ksi(f.local_buckling_stress), fnc, kHand, 1.0);
  CHECK(f.resistance.warnings.empty());
}

TEST_CASE("a slender flange beyond lambda_rf is bounded by elastic local buckling (AISC 360-16 F3-2)", "[capacity]") {
  // 20 x 1/2 in flanges: lambda_f = 20 > lambda_rf. Fnc = min(6.10.8.2.2-2,
  // 0.9 E kc / lambda_f^2), kc = 4 / sqrt(D / tw) in [0.35, 0.76] (AISC
  // 360-16 Table B4.1b note [a] and Eq. F3-2), by hand.
  const SteelFlangeFlexure f = steel_flange_flexure(girder(20, 0.5, 19.76, 0.40, 4), ResistanceFactors{});
  const double lambda = 20.0;
  const double inelastic = (1 - (1 - kFyr / 36) * (lambda - kLambdaPf) / (kLambdaRf - kLambdaPf)) * 36;
  const double kc = std::clamp(4 / std::sqrt(19.76 / 0.40), 0.35, 0.76);
  const double elastic = 0.9 * kE * kc / (lambda * lambda);
  TP_CHECK_CLOSE(test::to_ksi(f.local_buckling_stress), std::min(inelastic, elastic), kHand, 1.0);
  REQUIRE(f.resistance.warnings.size() == 1);
  CHECK_THAT(f.resistance.warnings[0], Catch::Contains("slender compression flange"));
}

TEST_CASE("lateral-torsional buckling follows the three ranges of 6.10.8.2.3", "[capacity]") {
  // W21x62 as plates with Dc = D/2: rt by 6.10.8.2.3-9, Lp = rt sqrt(E/Fyc)
  // (-4) = 5.0 ft, Lr = pi rt sqrt(E/Fyr) (-5) = 18.8 ft, by hand.
  const double r = rt(8.24, 0.615, 9.88, 0.40);
  const double lp = r * std::sqrt(kE / 36.0);
  const double lr = kPi * r * std::sqrt(kE / kFyr);

  SECTION("Lb <= Lp: Fnc = Rb Rh Fyc (-1)") {
    const SteelFlangeFlexure f = steel_flange_flexure(girder(8.24, 0.615, 19.76, 0.40, 4), ResistanceFactors{});
    REQUIRE(48 <= lp);
    TP_CHECK_CLOSE(test::to_in(step(f.resistance.trace, "rt")), r, kHand, 1.0);
    TP_CHECK_CLOSE(step(f.resistance.trace, "Lp") / in(1), lp, kHand, 1.0);
    TP_CHECK_CLOSE(step(f.resistance.trace, "Lr") / in(1), lr, kHand, 1.0);
    CHECK(test::to_ksi(f.lateral_torsional_stress) == Approx(36.0));
  }
  SECTION("Lp < Lb <= Lr: the inelastic line (-2) with Cb = 1") {
    const SteelFlangeFlexure f = steel_flange_flexure(girder(8.24, 0.615, 19.76, 0.40, 12), ResistanceFactors{});
    const double lb = 144;
    REQUIRE(lb > lp);
    REQUIRE(lb <= lr);
    const double fnc = (1 - (1 - kFyr / 36) * (lb - lp) / (lr - lp)) * 36;
    TP_CHECK_CLOSE(test::to_ksi(f.lateral_torsional_stress), fnc, kHand, 1.0);
    // Fnc = min(FLB, LTB) and the moment equivalent Fnc S_c (S = 100 in^3 given).
    TP_CHECK_CLOSE(test::to_kip_in(f.resistance.nominal), fnc * 100, kHand, 1.0);
    CHECK(f.resistance.article == "AASHTO LRFD 6.10.8.2.3");
  }
  SECTION("Lb > Lr: Fcr = Cb Rb pi^2 E / (Lb / rt)^2 (-3, -8)") {
    const SteelFlangeFlexure f = steel_flange_flexure(girder(8.24, 0.615, 19.76, 0.40, 24), ResistanceFactors{});
    const double lb = 288;
    REQUIRE(lb > lr);
    const double fcr = kPi * kPi * kE / ((lb / r) * (lb / r));
    TP_CHECK_CLOSE(test::to_ksi(f.lateral_torsional_stress), fcr, kHand, 1.0);
  }
  SECTION("a moment gradient Cb > 1 raises the inelastic range but not above Fyc") {
    SteelFlangeFlexureInput s = girder(8.24, 0.615, 19.76, 0.40, 12);
    s.moment_gradient_factor = 1.75;
    const SteelFlangeFlexure f = steel_flange_flexure(s, ResistanceFactors{});
    const double fnc = 1.75 * (1 - (1 - kFyr / 36) * (144 - lp) / (lr - lp)) * 36;
    TP_CHECK_CLOSE(test::to_ksi(f.lateral_torsional_stress), std::min(fnc, 36.0), kHand, 1.0);
  }
}

TEST_CASE("a slender web sheds load to the flange: Rb by 6.10.1.10.2-3", "[capacity]") {
  // D = 60, tw = 5/16, Dc = 30, bfc = 12, tfc = 3/4 in, Fy = 50 ksi. By hand:
  // lambda_rw = 5.7 sqrt(E / Fyc); awc = 2 Dc tw / (bfc tfc);
  // Rb = 1 - awc / (1200 + 300 awc) (2 Dc / tw - lambda_rw).
  SteelFlangeFlexureInput s = girder(12, 0.75, 60, 0.3125, 4);
  s.steel_yield = ksi(50);
  const SteelFlangeFlexure f = steel_flange_flexure(s, ResistanceFactors{});
  const double lambda_rw = 5.7 * std::sqrt(kE / 50.0);
  const double awc = 2 * 30 * 0.3125 / (12 * 0.75);
  const double rb = 1 - awc / (1200 + 300 * awc) * (2 * 30 / 0.3125 - lambda_rw);
  CHECK(f.load_shedding == Approx(rb).epsilon(1e-12));
  CHECK(rb < 1.0);
  TP_CHECK_CLOSE(test::to_ksi(f.local_buckling_stress), rb * 50, kHand, 1.0);  // compact flange: Rb Fyc
}

TEST_CASE("a bottom compression flange with a cover plate is merged into one plate", "[capacity]") {
  // 10 x 0.67 flange plus 10 x 0.625 cover plate: tfc = 1.295 in, lambda_f = 3.86 (hand).
  SteelFlangeFlexureInput s = girder(10, 0.67, 28.31, 0.52, 4);
  s.compression_on_top = false;
  s.girder.bottom_cover_plate = plate(10, 0.625);
  const SteelFlangeFlexure f = steel_flange_flexure(s, ResistanceFactors{});
  CHECK(step(f.resistance.trace, "tfc") / in(1) == Approx(1.295));
  CHECK(step(f.resistance.trace, "lambda_f") == Approx(10 / (2 * 1.295)));
  REQUIRE(f.resistance.flange_stress.has_value());
  CHECK_FALSE(f.resistance.flange_stress->compression_flange_on_top);
  // Tension flange: Fnt = Rh Fyt (6.10.8.3-1).
  CHECK(test::to_ksi(f.resistance.flange_stress->tension_flange) == Approx(36.0));
}

TEST_CASE("without flange section moduli the 6.10.8 resistance has no moment form", "[capacity]") {
  SteelFlangeFlexureInput s = girder(8.24, 0.615, 19.76, 0.40, 4);
  s.compression_modulus.reset();
  const SteelFlangeFlexure f = steel_flange_flexure(s, ResistanceFactors{});
  CHECK(f.resistance.status == ResistanceStatus::unavailable);
  CHECK_THAT(f.resistance.reason, Catch::Contains("section moduli at the flanges are not known"));
  CHECK(f.resistance.flange_stress.has_value());  // the stress form is still there
}

}  // namespace
}  // namespace tenthpoint::capacity
