#include "engine/capacity/steel_service_limits.h"

#include <catch2/catch.hpp>

#include "engine/section/section_stages.h"
#include "tests/capacity/capacity_test_support.h"

namespace tenthpoint::capacity {
namespace {

using test::in;
using test::in2;
using test::ksi;
using test::plate;

model::SectionDefinition w33x130_with_deck() {
  model::SectionDefinition d;
  d.id = "W33x130";
  model::SteelIGirder g;
  g.top_flange = plate(11.5, 0.855);
  g.web = plate(31.39, 0.580);
  g.bottom_flange = plate(11.5, 0.855);
  d.description = g;
  d.deck = model::DeckSlab{in(7.5), in(102), in(1.5), {model::BarLayer{in2(3.4), in(2.5)}}};
  return d;
}

model::Materials a36(bool composite) {
  model::Materials m;
  m.kind = model::MaterialKind::rolled_steel;
  m.composite = composite;
  m.steel = model::Steel{ksi(36), ksi(58), ksi(29000)};
  m.deck_concrete = model::Concrete{ksi(3), std::nullopt, test::kcf(0.150)};
  m.modular_ratio = 9;
  return m;
}

TEST_CASE("composite flanges are limited to 0.95 Rh Fyf at Service II (LRFD 6.10.4.2.2-1, -2)", "[capacity]") {
  const section::SectionStages stages = section::section_stages(w33x130_with_deck(), a36(true));
  const SteelServiceLimits s = steel_service_limits(ksi(36), stages, true);
  CHECK(test::to_ksi(s.top_flange) == Approx(0.95 * 36));
  CHECK(test::to_ksi(s.bottom_flange) == Approx(0.95 * 36));
  // Each stage divides by its own section (LRFD 6.10.1.1.1): DC1 by the
  // steel alone, DC2/DW by the 3n section, LL by the n section; the stiffer
  // the section, the larger its bottom modulus.
  REQUIRE(s.positive_moment.dc1.bottom);
  REQUIRE(s.positive_moment.dc2_dw.bottom);
  REQUIRE(s.positive_moment.live_load.bottom);
  CHECK(*s.positive_moment.dc1.bottom == stages.noncomposite.section_modulus_bottom.value());
  CHECK(*s.positive_moment.dc2_dw.bottom == stages.long_term->section_modulus_bottom.value());
  CHECK(*s.positive_moment.live_load.bottom == stages.short_term->section_modulus_bottom.value());
  CHECK(*s.positive_moment.dc1.bottom < *s.positive_moment.dc2_dw.bottom);
  CHECK(*s.positive_moment.dc2_dw.bottom < *s.positive_moment.live_load.bottom);
  // Negative flexure on the uncracked sections by default (LRFD 6.10.4.2.1, from
  // memory); the cracked option uses steel plus deck bars (6.10.1.1.1c).
  CHECK(*s.negative_moment.live_load.top == stages.short_term->section_modulus_top.value());
  const SteelServiceLimits cracked = steel_service_limits(ksi(36), stages, false);
  CHECK(*cracked.negative_moment.live_load.top == stages.cracked_negative->section_modulus_top.value());
}

TEST_CASE("non-composite flanges are limited to 0.80 Rh Fyf at Service II (LRFD 6.10.4.2.2-3)", "[capacity]") {
  model::SectionDefinition d = w33x130_with_deck();
  d.deck.reset();
  const section::SectionStages stages = section::section_stages(d, a36(false));
  const SteelServiceLimits s = steel_service_limits(ksi(36), stages, true);
  CHECK(test::to_ksi(s.top_flange) == Approx(0.80 * 36));
  CHECK(test::to_ksi(s.bottom_flange) == Approx(0.80 * 36));
  CHECK(*s.positive_moment.live_load.bottom == *s.positive_moment.dc1.bottom);
}

}  // namespace
}  // namespace tenthpoint::capacity
