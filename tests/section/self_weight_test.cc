#include "engine/section/self_weight.h"

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/section/section_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

using test::in;
using test::in2;
using test::kcf;
using test::ksi;

Real kip_per_ft(Real x) { return x * units::kKipPerFoot; }

TEST_CASE("a W33x130 from plates weighs close to its nominal 130 lb/ft", "[section]") {
  model::SectionDefinition s{"W33x130", std::nullopt, test::w33x130(), std::nullopt, {}};
  const SelfWeight w = self_weight(s, test::composite_steel(9.0));
  // Hand: 37.8712 in^2 x 490 lb/ft^3 / 144 in^2/ft^2 = 128.87 lb/ft (steel
  // 490 lb/ft^3, common practice).
  TP_CHECK_CLOSE(w.girder, kip_per_ft(37.8712 * 0.490 / 144), 1e-9, 0.0);
  // The designation's 130 lb/ft (AISC Manual Table 1-1, from memory) includes
  // the fillets the plates leave out: within 2 %.
  TP_CHECK_CLOSE(w.girder, kip_per_ft(0.130), 0.02, 0.0);
  CHECK(w.deck == 0.0);
}

TEST_CASE("the Willow Run interior girder's self-weight is close to the file's DC1 line load", "[section]") {
  const model::DeckSlab deck{in(7.5), in(102.0), in(1.5), {}};
  model::SectionDefinition s{"W33x130", std::nullopt, test::w33x130(), deck, {}};
  model::Materials m = test::composite_steel(9.0);
  m.deck_concrete->unit_weight = kcf(0.150);
  SelfWeightOptions options;
  options.tributary_width = 8.5 * units::kFoot;  // girder spacing
  const SelfWeight w = self_weight(s, m, options);
  // Hand, kip/ft: deck 7.5/12 x 8.5 x 0.150 = 0.796875; haunch 1.5 x 11.5 /
  // 144 x 0.150 = 0.0179688 (top flange width); beam 0.12887.
  TP_CHECK_CLOSE(w.deck, kip_per_ft(7.5 / 12 * 8.5 * 0.150), 1e-9, 0.0);
  TP_CHECK_CLOSE(w.haunch, kip_per_ft(1.5 * 11.5 / 144 * 0.150), 1e-9, 0.0);
  // EV-0112 gives DC1 = 0.95 kip/ft for beam, deck, haunch and stay-in-place
  // forms; the structural parts alone come to 0.944 kip/ft, within 2 %.
  TP_CHECK_CLOSE(w.total(), kip_per_ft(0.95), 0.02, 0.0);
  CHECK(w.total() < kip_per_ft(0.95));
}

TEST_CASE("an RC T-beam weighs its gross area times the unit weight", "[section]") {
  model::ReinforcedConcreteBeam beam;
  beam.height = in(39.0);
  beam.web_width = in(16.0);
  beam.flange_width = in(84.0);
  beam.flange_thickness = in(7.0);
  beam.bottom_bars = {{in2(9.36), in(34.7)}};
  model::SectionDefinition s{"TB", std::nullopt, beam, std::nullopt, {}};
  model::Materials m;
  m.kind = model::MaterialKind::reinforced_concrete;
  m.girder_concrete = model::Concrete{ksi(3.0), std::nullopt, kcf(0.150)};
  // Hand: (84 x 7 + 16 x 32) = 1100 in^2 x 0.150 / 144 = 1.14583 kip/ft.
  TP_CHECK_CLOSE(self_weight(s, m).girder, kip_per_ft(1100.0 * 0.150 / 144), 1e-9, 0.0);
}

TEST_CASE("a precast girder with a haunch needs the haunch width", "[section]") {
  model::PrestressedGirder g;
  g.height = in(54.0);
  g.web_width = in(8.0);
  g.area = in2(789.0);
  g.inertia = in2(1.0) * in2(260730.0);
  g.centroid_from_bottom = in(24.73);
  model::SectionDefinition s{"IV", std::nullopt, g, model::DeckSlab{in(8.0), in(96.0), in(1.5), {}}, {}};
  model::Materials m;
  m.kind = model::MaterialKind::prestressed_concrete;
  m.girder_concrete = model::Concrete{ksi(6.0), std::nullopt, kcf(0.150)};
  m.deck_concrete = model::Concrete{ksi(4.0), std::nullopt, kcf(0.150)};
  const Diagnostic d = test::first_error([&] { (void)self_weight(s, m); });
  CHECK(d.field == "sections[IV].deck.haunch");
  CHECK(d.message == "a precast girder's haunch weight needs the haunch width");
  SelfWeightOptions options;
  options.haunch_width = in(20.0);  // AASHTO Type IV top flange (from memory)
  // Hand: 1.5 x 20 / 144 x 0.150 = 0.03125 kip/ft; girder 789 / 144 x 0.150 = 0.821875 kip/ft.
  const SelfWeight w = self_weight(s, m, options);
  TP_CHECK_CLOSE(w.haunch, kip_per_ft(0.03125), 1e-9, 0.0);
  TP_CHECK_CLOSE(w.girder, kip_per_ft(0.821875), 1e-9, 0.0);
}

}  // namespace
}  // namespace tenthpoint::section
