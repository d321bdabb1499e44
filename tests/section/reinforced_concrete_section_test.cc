#include "engine/section/reinforced_concrete_section.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/section/section_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

using test::in;
using test::in2;
using test::in3;
using test::in4;
using test::ksi;

// Hand computations in inches against the engine in SI: round-off only.
constexpr double kHand = 1e-9;
const double kEc = test::ksi(3000.0);  // any positive modulus: these checks are geometric

detail::SectionContext context(const char* id = "TB") {
  return detail::SectionContext{id, SourceLocation{"t.yaml", 7, 3}};
}

// The EV-0058 end-span T-beam: h = 39, bw = 16, b = 84, hf = 7 in; bottom bars
// 6.24 in^2 at d = 35.6 and 3.12 in^2 at 32.8; top bars 1.40 in^2 at 2.0 in.
model::ReinforcedConcreteBeam t_beam() {
  model::ReinforcedConcreteBeam b;
  b.height = in(39.0);
  b.web_width = in(16.0);
  b.flange_width = in(84.0);
  b.flange_thickness = in(7.0);
  b.bottom_bars = {{in2(6.24), in(35.6)}, {in2(3.12), in(32.8)}};
  b.top_bars = {{in2(1.40), in(2.0)}};
  return b;
}

TEST_CASE("the gross T-beam matches a hand transformed-section table", "[section]") {
  const StageProperties p = ReinforcedConcreteSection(t_beam(), context()).gross_properties(kEc);
  // Web 16 x 32 at y = 16; flange 84 x 7 at y = 35.5 (textbook composite-area table).
  const double a = 512.0 + 588.0;
  const double ybar = (512.0 * 16.0 + 588.0 * 35.5) / a;
  const double ig = 16.0 * 32768.0 / 12 + 512.0 * (16.0 - ybar) * (16.0 - ybar) + 84.0 * 343.0 / 12 +
                    588.0 * (35.5 - ybar) * (35.5 - ybar);
  TP_CHECK_CLOSE(p.area, in2(a), kHand, 0.0);
  TP_CHECK_CLOSE(*p.neutral_axis, in(ybar), kHand, 0.0);
  TP_CHECK_CLOSE(p.inertia, in4(ig), kHand, 0.0);
  TP_CHECK_CLOSE(*p.section_modulus_top, in3(ig / (39.0 - ybar)), kHand, 0.0);
  // Evaluated once by hand: A = 1100 in^2, ybar = 26.424 in, Ig = 150161 in^4.
  TP_CHECK_CLOSE(p.inertia, in4(150161.25), 1e-6, 0.0);
}

TEST_CASE("the gross transformed T-beam adds each bar as (n - 1) A", "[section]") {
  const double n = 9.0;
  const StageProperties p = ReinforcedConcreteSection(t_beam(), context()).gross_transformed(kEc, n);
  // Hand table (inches): concrete as above plus (n-1)A at each bar height.
  const double rows[][2] = {{512.0, 16.0}, {588.0, 35.5}, {8 * 6.24, 3.4}, {8 * 3.12, 6.2}, {8 * 1.40, 37.0}};
  double a = 0, ay = 0, ay2 = 16.0 * 32768.0 / 12 + 84.0 * 343.0 / 12;
  for (const auto& r : rows) {
    a += r[0];
    ay += r[0] * r[1];
    ay2 += r[0] * r[1] * r[1];
  }
  const double ybar = ay / a;
  TP_CHECK_CLOSE(p.area, in2(a), kHand, 0.0);
  TP_CHECK_CLOSE(*p.neutral_axis, in(ybar), kHand, 0.0);
  TP_CHECK_CLOSE(p.inertia, in4(ay2 - a * ybar * ybar), kHand, 0.0);
}

TEST_CASE("the cracked T-beam with its neutral axis in the web matches the textbook T-section formulas", "[section]") {
  const double n = 9.0;
  const CrackedSection c = ReinforcedConcreteSection(t_beam(), context()).cracked_transformed(kEc, n);
  // Textbook cracked T-section (neutral axis below the flange), inches:
  //   b hf (c - hf/2) + bw (c - hf)^2 / 2 + (n-1) A's (c - d') = n sum As (d - c)
  // a quadratic (bw/2) c^2 + B c + C = 0.
  const double b = 84, bw = 16, hf = 7, as_top = 1.40, d_top = 2.0;
  const double tension_area = 6.24 + 3.12;
  const double tension_moment = 6.24 * 35.6 + 3.12 * 32.8;
  const double qa = bw / 2;
  const double qb = (b - bw) * hf + (n - 1) * as_top + n * tension_area;
  const double qc = -(b - bw) * hf * hf / 2 - (n - 1) * as_top * d_top - n * tension_moment;
  const double depth = (-qb + std::sqrt(qb * qb - 4 * qa * qc)) / (2 * qa);
  REQUIRE(depth > hf);  // the assumption of the formulas holds
  const double icr = b * hf * hf * hf / 12 + b * hf * (depth - hf / 2) * (depth - hf / 2) +
                     bw * std::pow(depth - hf, 3) / 3 + (n - 1) * as_top * (depth - d_top) * (depth - d_top) +
                     n * (6.24 * std::pow(35.6 - depth, 2) + 3.12 * std::pow(32.8 - depth, 2));
  TP_CHECK_CLOSE(c.neutral_axis_depth, in(depth), kHand, 0.0);
  TP_CHECK_CLOSE(c.properties.inertia, in4(icr), kHand, 0.0);
  TP_CHECK_CLOSE(*c.properties.neutral_axis, in(39.0 - depth), kHand, 0.0);
  // Evaluated once by hand: c = 7.316 in, Icr = 74443 in^4.
  TP_CHECK_CLOSE(c.properties.inertia, in4(74443.3), 1e-5, 0.0);
}

TEST_CASE("a cracked rectangle matches the closed form k = sqrt(2 rho n + (rho n)^2) - rho n", "[section]") {
  // The EV-0031 slab strip: 12 in wide, h = 16.5 in, As = 2.18 in^2 at d = 14.44 in.
  model::ReinforcedConcreteBeam strip;
  strip.height = in(16.5);
  strip.web_width = in(12.0);
  strip.flange_width = in(12.0);
  strip.flange_thickness = 0;
  strip.bottom_bars = {{in2(2.18), in(14.44)}};
  const double n = 9.0;
  const CrackedSection c = ReinforcedConcreteSection(strip, context()).cracked_transformed(kEc, n);
  // Singly reinforced rectangle, elastic cracked section (any RC textbook):
  // rho = As / (b d), kd = k d, Icr = b (kd)^3 / 3 + n As (d - kd)^2.
  const double rho = 2.18 / (12.0 * 14.44);
  const double k = std::sqrt(2 * rho * n + rho * n * rho * n) - rho * n;
  const double kd = k * 14.44;
  const double icr = 12.0 * kd * kd * kd / 3 + n * 2.18 * (14.44 - kd) * (14.44 - kd);
  TP_CHECK_CLOSE(c.neutral_axis_depth, in(kd), kHand, 0.0);
  TP_CHECK_CLOSE(c.properties.inertia, in4(icr), kHand, 0.0);
}

TEST_CASE("a T-beam whose neutral axis stays in the flange cracks like a rectangle b wide", "[section]") {
  model::ReinforcedConcreteBeam beam = t_beam();
  beam.bottom_bars = {{in2(3.12), in(35.6)}};
  beam.top_bars.clear();
  const double n = 9.0;
  const CrackedSection c = ReinforcedConcreteSection(beam, context()).cracked_transformed(kEc, n);
  // Closed form for a rectangle of width b = 84 in (valid because kd <= hf).
  const double rho = 3.12 / (84.0 * 35.6);
  const double kd = (std::sqrt(2 * rho * n + rho * n * rho * n) - rho * n) * 35.6;
  REQUIRE(kd < 7.0);
  TP_CHECK_CLOSE(c.neutral_axis_depth, in(kd), kHand, 0.0);
  TP_CHECK_CLOSE(c.properties.inertia, in4(84.0 * kd * kd * kd / 3 + n * 3.12 * (35.6 - kd) * (35.6 - kd)), kHand, 0.0);
}

TEST_CASE("a top bar below the cracked neutral axis counts as tension steel n A", "[section]") {
  model::ReinforcedConcreteBeam beam = t_beam();
  beam.bottom_bars = {{in2(3.12), in(35.6)}};
  beam.top_bars = {{in2(1.0), in(6.0)}};
  const double n = 9.0;
  const CrackedSection c = ReinforcedConcreteSection(beam, context()).cracked_transformed(kEc, n);
  // Both layers in tension, compression block b = 84 wide (hand, inches):
  // 42 c^2 + 9 (3.12 + 1.0) c - 9 (3.12 x 35.6 + 1.0 x 6.0) = 0.
  const double qb = 9.0 * 4.12;
  const double qc = -9.0 * (3.12 * 35.6 + 6.0);
  const double depth = (-qb + std::sqrt(qb * qb - 4 * 42.0 * qc)) / (2 * 42.0);
  REQUIRE(depth < 6.0);
  TP_CHECK_CLOSE(c.neutral_axis_depth, in(depth), kHand, 0.0);
  const double icr =
      84.0 * depth * depth * depth / 3 + n * 3.12 * std::pow(35.6 - depth, 2) + n * 1.0 * std::pow(6.0 - depth, 2);
  TP_CHECK_CLOSE(c.properties.inertia, in4(icr), kHand, 0.0);
}

TEST_CASE("the cracked section is far less stiff than the gross section", "[section]") {
  // Sanity of order (common practice): Icr of a lightly reinforced T-beam is
  // a fraction of Ig, and adding bars to the gross section stiffens it.
  const ReinforcedConcreteSection s(t_beam(), context());
  const double ig = s.gross_properties(kEc).inertia;
  CHECK(s.cracked_transformed(kEc, 9.0).properties.inertia < 0.6 * ig);
  CHECK(s.gross_transformed(kEc, 9.0).inertia > ig);
}

TEST_CASE("reinforced concrete beam input errors name the field", "[section]") {
  SECTION("a flange as thick as the beam") {
    model::ReinforcedConcreteBeam beam = t_beam();
    beam.flange_thickness = beam.height;
    const Diagnostic d = test::first_error([&] { (void)ReinforcedConcreteSection(beam, context()); });
    CHECK(d.field == "sections[TB].rc_beam.flange_thickness");
  }
  SECTION("a flange narrower than the web") {
    model::ReinforcedConcreteBeam beam = t_beam();
    beam.flange_width = in(12.0);
    const Diagnostic d = test::first_error([&] { (void)ReinforcedConcreteSection(beam, context()); });
    CHECK(d.field == "sections[TB].rc_beam.flange_width");
  }
  SECTION("a bar below the soffit") {
    model::ReinforcedConcreteBeam beam = t_beam();
    beam.bottom_bars[1].depth = in(40.0);
    const Diagnostic d = test::first_error([&] { (void)ReinforcedConcreteSection(beam, context()); });
    CHECK(d.field == "sections[TB].rc_beam.bottom_bars[1].depth");
    CHECK(d.message.rfind("must lie inside the beam", 0) == 0);
  }
  SECTION("no tension bars for a cracked section") {
    model::ReinforcedConcreteBeam beam = t_beam();
    beam.bottom_bars.clear();
    const ReinforcedConcreteSection s(beam, context());
    const Diagnostic d = test::first_error([&] { (void)s.cracked_transformed(kEc, 9.0); });
    CHECK(d.message == "a cracked section needs tension bars");
  }
  SECTION("a bar modular ratio of 1 or less") {
    const ReinforcedConcreteSection s(t_beam(), context());
    const Diagnostic d = test::first_error([&] { (void)s.gross_transformed(kEc, 0.9); });
    CHECK(d.message.rfind("bar modular ratio Es/Ec must exceed 1", 0) == 0);
  }
}

}  // namespace
}  // namespace tenthpoint::section
