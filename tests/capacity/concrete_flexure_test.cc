#include "engine/capacity/concrete_flexure.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "engine/capacity/concrete_stress_block.h"
#include "engine/capacity/tension_control.h"
#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::capacity {
namespace {

using test::in;
using test::in2;
using test::kip_in;
using test::ksi;
using test::step;

// Hand calculations are in kip and inch and compared after one conversion;
// only the round-off of the conversions remains.
constexpr double kHand = 1e-9;

ConcreteFlexureSection rectangle(double b, double h, double d, double as, double fc, double fy) {
  ConcreteFlexureSection s;
  s.label = "test rectangle";
  s.height = in(h);
  s.flange_width = in(b);
  s.web_width = in(b);
  s.concrete_strength = ksi(fc);
  s.bars = {{in2(as), in(d)}};
  s.bar_yield = ksi(fy);
  s.bar_modulus = ksi(29000);
  return s;
}

TEST_CASE("beta1 and alpha1 follow the limits of LRFD 5.6.2.2", "[capacity]") {
  // AASHTO LRFD 5.6.2.2: beta1 = 0.85 up to 4 ksi, -0.05 per ksi, >= 0.65;
  // alpha1 = 0.85 up to 10 ksi, -0.02 per ksi, >= 0.75.
  CHECK(concrete_stress_block(ksi(3.0)).beta1 == Approx(0.85));
  CHECK(concrete_stress_block(ksi(4.0)).beta1 == Approx(0.85));
  CHECK(concrete_stress_block(ksi(6.0)).beta1 == Approx(0.75));
  CHECK(concrete_stress_block(ksi(9.0)).beta1 == Approx(0.65));
  CHECK(concrete_stress_block(ksi(6.0)).alpha1 == Approx(0.85));
  CHECK(concrete_stress_block(ksi(12.0)).alpha1 == Approx(0.81));
  CHECK(concrete_stress_block(ksi(18.0)).alpha1 == Approx(0.75));
}

TEST_CASE("a singly reinforced rectangle matches the Whitney stress block worked by hand", "[capacity]") {
  // Textbook example: b = 12 in, d = 20 in, 3 #8 (As = 2.37 in^2, bar areas
  // of ASTM A615, from memory), f'c = 4 ksi, fy = 60 ksi. Worked by hand
  // with AASHTO LRFD 5.6.3.1.1-4 and 5.6.3.2.3 (Mn = As fy (d - a/2)):
  // a = As fy / (0.85 f'c b) = 3.49 in, Mn = 2,596 kip-in.
  const ConcreteFlexure f = concrete_flexure(rectangle(12, 22.5, 20, 2.37, 4, 60), ResistanceFactors{});
  REQUIRE(f.resistance.status == ResistanceStatus::computed);
  const double a = 2.37 * 60 / (0.85 * 4 * 12);
  const double mn = 2.37 * 60 * (20 - a / 2);
  TP_CHECK_CLOSE(test::to_in(f.block_depth), a, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_in(f.neutral_axis_depth), a / 0.85, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_kip_in(f.resistance.nominal), mn, kHand, 1.0);
  CHECK(a == Approx(3.49).margin(0.005));   // the textbook's rounded a
  CHECK(mn == Approx(2596.2).margin(0.1));  // and Mn
  CHECK_FALSE(f.t_section);
  // eps_t = 0.003 (d - c) / c = 0.0116 >= 0.005: tension-controlled, phi = 0.90 (LRFD 5.5.4.2).
  CHECK(f.control.regime == StrainRegime::tension_controlled);
  CHECK(f.resistance.phi == Approx(0.90));
  TP_CHECK_CLOSE(test::to_kip_in(f.resistance.factored), 0.9 * mn, kHand, 1.0);
  // dv = max(Mn / (As fy), 0.9 de, 0.72 h) = max(d - a/2, 18, 16.2) (LRFD 5.7.2.8).
  TP_CHECK_CLOSE(test::to_in(f.shear_depth), 20 - a / 2, kHand, 1.0);
  // The trace names the equation of each step.
  REQUIRE(f.resistance.trace.find("Mn") != nullptr);
  CHECK(f.resistance.trace.find("Mn")->reference == "AASHTO LRFD 5.6.3.2.2-1 with bw = b (5.6.3.2.3)");
}

TEST_CASE("a T-beam whose stress block passes below the flange uses the T-section equations", "[capacity]") {
  // b = 48, bw = 12, hf = 3, d = 24 in, As = 10 in^2, f'c = 4, fy = 60 ksi.
  // Rectangular trial a = 600 / (0.85 x 4 x 48) = 3.68 in > hf, so by LRFD
  // 5.6.3.1.1-3 c = (As fy - 0.85 f'c (b - bw) hf) / (0.85 f'c beta1 bw) and
  // 5.6.3.2.2-1 Mn = As fy (d - a/2) + 0.85 f'c (b - bw) hf (a/2 - hf/2), by hand.
  ConcreteFlexureSection s = rectangle(48, 27, 24, 10, 4, 60);
  s.web_width = in(12);
  s.flange_thickness = in(3);
  const ConcreteFlexure f = concrete_flexure(s, ResistanceFactors{});
  REQUIRE(f.resistance.status == ResistanceStatus::computed);
  CHECK(f.t_section);
  const double overhang = 0.85 * 4 * (48 - 12) * 3;
  const double c = (10 * 60 - overhang) / (0.85 * 4 * 0.85 * 12);
  const double a = 0.85 * c;
  const double mn = 10 * 60 * (24 - a / 2) + overhang * (a / 2 - 1.5);
  TP_CHECK_CLOSE(test::to_in(f.neutral_axis_depth), c, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_kip_in(f.resistance.nominal), mn, kHand, 1.0);
  CHECK(a > 3.0);
  CHECK(f.resistance.article == "AASHTO LRFD 5.6.3.2.2");
}

TEST_CASE("phi falls linearly through the transition region of LRFD 5.5.4.2", "[capacity]") {
  // b = 12, d = 20 in, As = 5 in^2, f'c = 4, fy = 60: c = As fy / (0.85 f'c
  // 0.85 b); eps_t = 0.003 (d - c)/c; eps_cl = fy/Es (LRFD 5.6.2.1),
  // eps_tl = 0.005; phi = 0.75 + 0.15 (eps_t - eps_cl)/(eps_tl - eps_cl)
  // (LRFD 5.5.4.2-2), by hand.
  const ConcreteFlexure f = concrete_flexure(rectangle(12, 22.5, 20, 5, 4, 60), ResistanceFactors{});
  const double c = 5 * 60 / (0.85 * 4 * 0.85 * 12);
  const double eps_t = 0.003 * (20 - c) / c;
  const double eps_cl = 60.0 / 29000.0;
  const double phi = 0.75 + 0.15 * (eps_t - eps_cl) / (0.005 - eps_cl);
  CHECK(f.control.regime == StrainRegime::transition);
  CHECK(f.control.net_tensile_strain == Approx(eps_t).epsilon(1e-9));
  CHECK(f.resistance.phi == Approx(phi).epsilon(1e-9));
  CHECK(phi > 0.75);
  CHECK(phi < 0.90);
}

TEST_CASE("an over-reinforced rectangle whose bars do not yield is compression-controlled and says so", "[capacity]") {
  // As = 8 in^2 in the same beam: c = 13.8 in, eps_t = 0.0013 < fy/Es:
  // phi = 0.75 (LRFD 5.5.4.2) and fs = fy over-estimates Mn (a warning).
  const ConcreteFlexure f = concrete_flexure(rectangle(12, 22.5, 20, 8, 4, 60), ResistanceFactors{});
  CHECK(f.control.regime == StrainRegime::compression_controlled);
  CHECK(f.resistance.phi == Approx(0.75));
  REQUIRE(f.resistance.warnings.size() == 1);
  CHECK_THAT(f.resistance.warnings[0], Catch::Contains("has not yielded"));
}

TEST_CASE("a face without tension steel has no flexural resistance and names what is missing", "[capacity]") {
  ConcreteFlexureSection s = rectangle(12, 22.5, 20, 2.37, 4, 60);
  s.bars.clear();
  const ConcreteFlexure f = concrete_flexure(s, ResistanceFactors{});
  CHECK(f.resistance.status == ResistanceStatus::unavailable);
  CHECK_THAT(f.resistance.reason, Catch::StartsWith("test rectangle: no tension reinforcement"));
  CHECK_THAT(f.resistance.reason, Catch::Contains("capacity.given"));
}

// The EV-0207 demo girder: AASHTO Type IV, 46 half-inch 270 ksi
// low-relaxation strands (0.153 in^2 each) in layers of 12, 12, 12 and 10
// at 2, 4, 6 and 8 in above the soffit, 54 in deep, under a 1.5 in haunch
// and an 8 in deck 96 in wide of 4 ksi concrete.
ConcreteFlexureSection type_iv_composite(double deck_thickness, double deck_width) {
  ConcreteFlexureSection s;
  s.label = "Type IV composite";
  const double top = 54 + 1.5 + deck_thickness;
  s.height = in(top);
  s.flange_width = in(deck_width);
  s.flange_thickness = in(deck_thickness);
  s.web_width = in(8);
  s.concrete_strength = ksi(4);
  for (const auto& [count, height] : {std::pair{12, 2.0}, {12, 4.0}, {12, 6.0}, {10, 8.0}}) {
    s.strands.push_back({in2(count * 0.153), in(top - height)});
  }
  s.strand_tensile_strength = ksi(270);
  s.strand_yield_strength = ksi(243);
  return s;
}

TEST_CASE("fps of a Type IV girder with a composite deck matches LRFD 5.6.3.1.1-1 worked by hand", "[capacity]") {
  // k = 2 (1.04 - fpy/fpu) = 0.28 for low-relaxation strand (LRFD
  // 5.6.3.1.1-2; the 0.28 of Table C5.6.3.1.1-1, from memory).
  // Rectangular section (5.6.3.1.1-4): c = Aps fpu / (0.85 f'c beta1 b + k Aps fpu / dp);
  // fps = fpu (1 - k c / dp) (5.6.3.1.1-1); Mn = Aps fps (dp - a/2) (5.6.3.2.2-1), by hand.
  const ConcreteFlexure f = concrete_flexure(type_iv_composite(8, 96), ResistanceFactors{});
  REQUIRE(f.resistance.status == ResistanceStatus::computed);
  const double aps = 46 * 0.153;
  const double dp = 63.5 - (12 * 2.0 + 12 * 4.0 + 12 * 6.0 + 10 * 8.0) / 46.0;
  const double k = 2 * (1.04 - 243.0 / 270.0);
  const double c = aps * 270 / (0.85 * 4 * 0.85 * 96 + k * aps * 270 / dp);
  const double fps = 270 * (1 - k * c / dp);
  const double a = 0.85 * c;
  const double mn = aps * fps * (dp - a / 2);
  CHECK(step(f.resistance.trace, "k") == Approx(0.28).epsilon(1e-12));
  TP_CHECK_CLOSE(test::to_in(f.neutral_axis_depth), c, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_ksi(f.strand_stress), fps, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_kip_in(f.resistance.nominal), mn, kHand, 1.0);
  CHECK_FALSE(f.t_section);  // a = 5.6 in lies in the 8 in deck
  // eps_t = 0.003 (61.5 - c)/c is far beyond 0.005: phi = 1.00 (LRFD 5.5.4.2, prestressed).
  CHECK(f.resistance.phi == Approx(1.0));
  // de = dp without mild steel (LRFD 5.7.2.8-2).
  TP_CHECK_CLOSE(test::to_in(f.effective_depth), dp, kHand, 1.0);
}

TEST_CASE("a thin deck over a Type IV girder puts the stress block into the web (5.6.3.1.1-3)", "[capacity]") {
  // A 4 in deck 48 in wide: the rectangular trial gives a > hf, so
  // c = (Aps fpu - 0.85 f'c (b - bw) hf) / (0.85 f'c beta1 bw + k Aps fpu / dp), by hand.
  const ConcreteFlexure f = concrete_flexure(type_iv_composite(4, 48), ResistanceFactors{});
  const double aps = 46 * 0.153;
  const double dp = 59.5 - (12 * 2.0 + 12 * 4.0 + 12 * 6.0 + 10 * 8.0) / 46.0;
  const double k = 0.28;
  const double overhang = 0.85 * 4 * (48 - 8) * 4;
  const double c = (aps * 270 - overhang) / (0.85 * 4 * 0.85 * 8 + k * aps * 270 / dp);
  const double fps = 270 * (1 - k * c / dp);
  const double a = 0.85 * c;
  const double mn = aps * fps * (dp - a / 2) + overhang * (a / 2 - 2);
  CHECK(f.t_section);
  // 1e-6: the hand value uses k = 0.28 as printed, the engine 2 (1.04 - fpy/fpu).
  TP_CHECK_CLOSE(test::to_in(f.neutral_axis_depth), c, 1e-6, 1.0);
  TP_CHECK_CLOSE(test::to_kip_in(f.resistance.nominal), mn, 1e-6, 1.0);
}

}  // namespace
}  // namespace tenthpoint::capacity
