#include "engine/section/prestressed_section.h"

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

constexpr double kHand = 1e-9;  // hand tables in inches vs the engine in SI: round-off only

// AASHTO Type IV as in the EV-0207 record: A = 789 in^2, I = 260730 in^4,
// yb = 24.73 in, h = 54 in (the owner's tabulated values, from memory).
model::PrestressedGirder type_iv() {
  model::PrestressedGirder g;
  g.shape = "AASHTO Type IV";
  g.height = in(54.0);
  g.web_width = in(8.0);
  g.area = in2(789.0);
  g.inertia = in4(260730.0);
  g.centroid_from_bottom = in(24.73);
  return g;
}

detail::SectionContext context() { return detail::SectionContext{"IV", SourceLocation{}}; }

TEST_CASE("the precast girder alone keeps its given gross properties", "[section]") {
  const StageProperties p = PrestressedSection(type_iv(), context()).noncomposite(ksi(4696));
  CHECK(p.area == in2(789.0));
  TP_CHECK_CLOSE(p.inertia, in4(260730.0), kHand, 0.0);
  TP_CHECK_CLOSE(*p.section_modulus_bottom, in3(260730.0 / 24.73), kHand, 0.0);
  TP_CHECK_CLOSE(*p.section_modulus_top, in3(260730.0 / (54.0 - 24.73)), kHand, 0.0);
}

TEST_CASE("the composite precast girder matches a hand transformed-section table", "[section]") {
  // Deck 8 in x 96 in on a 1.5 in haunch; n = Ec_girder / Ec_deck = 1.1433.
  const double n = 1.1433;
  const model::DeckSlab deck{in(8.0), in(96.0), in(1.5), {}};
  const StageProperties p = PrestressedSection(type_iv(), context()).composite(deck, n, ksi(4696));
  // Hand table (inches): girder 789 at 24.73 with Io = 260730; slab 96/n x 8 at
  // 54 + 1.5 + 4 = 59.5 with Io = (96/n) 8^3 / 12. The haunch is not counted.
  const double slab = 96.0 / n * 8.0;
  const double a = 789.0 + slab;
  const double ybar = (789.0 * 24.73 + slab * 59.5) / a;
  const double i = 260730.0 + 789.0 * (24.73 - ybar) * (24.73 - ybar) + (96.0 / n) * 512.0 / 12 +
                   slab * (59.5 - ybar) * (59.5 - ybar);
  TP_CHECK_CLOSE(p.area, in2(a), kHand, 0.0);
  TP_CHECK_CLOSE(*p.neutral_axis, in(ybar), kHand, 0.0);
  TP_CHECK_CLOSE(p.inertia, in4(i), kHand, 0.0);
  TP_CHECK_CLOSE(*p.section_modulus_deck, in3(i / (63.5 - ybar)), kHand, 0.0);
  TP_CHECK_CLOSE(*p.section_modulus_top, in3(i / (54.0 - ybar)), kHand, 0.0);
}

TEST_CASE("a centroid outside the precast height is an input error", "[section]") {
  model::PrestressedGirder g = type_iv();
  g.centroid_from_bottom = in(60.0);
  const Diagnostic d = test::first_error([&] { (void)PrestressedSection(g, context()); });
  CHECK(d.field == "sections[IV].ps_girder.yb");
}

}  // namespace
}  // namespace tenthpoint::section
