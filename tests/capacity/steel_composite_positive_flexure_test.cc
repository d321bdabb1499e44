#include "engine/capacity/steel_composite_positive_flexure.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "engine/section/section_stages.h"
#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::capacity {
namespace {

using test::in;
using test::ksi;
using test::plate;

// Hand values in kip and inch; only conversion round-off remains.
constexpr double kHand = 1e-9;

model::Materials a36_composite(double deck_fc, double n) {
  model::Materials m;
  m.kind = model::MaterialKind::welded_plate_girder;
  m.composite = true;
  m.steel = model::Steel{ksi(36), ksi(58), ksi(29000)};
  m.deck_concrete = model::Concrete{ksi(deck_fc), std::nullopt, test::kcf(0.150)};
  m.modular_ratio = n;
  return m;
}

CompositePositiveFlexureInput input(const model::SteelIGirder& girder, const model::DeckSlab& deck, double deck_fc,
                                    double n) {
  model::SectionDefinition definition;
  definition.id = "S";
  definition.description = girder;
  definition.deck = deck;
  CompositePositiveFlexureInput in;
  in.label = "S";
  in.girder = girder;
  in.deck = deck;
  in.steel_yield = ksi(36);
  in.steel_modulus = ksi(29000);
  in.deck_strength = ksi(deck_fc);
  in.stages = section::section_stages(definition, a36_composite(deck_fc, n));
  return in;
}

model::SteelIGirder w33x130() {
  model::SteelIGirder g;  // AISC Manual Table 1-1, from memory
  g.top_flange = plate(11.5, 0.855);
  g.web = plate(31.39, 0.580);
  g.bottom_flange = plate(11.5, 0.855);
  return g;
}

// Mp of W33x130 under a 102 x 7.5 in slab on a 1.5 in haunch, PNA in the
// slab (Table D6.1-1), by hand, for a deck of strength fc.
struct HandMp {
  double mp, dp, dt;
};
HandMp w33_hand(double fc) {
  const double ps = 0.85 * fc * 102 * 7.5;
  const double pc = 36 * 11.5 * 0.855;
  const double pw = 36 * 31.39 * 0.580;
  const double y = 7.5 * (2 * pc + pw) / ps;
  const double below = 7.5 - y + 1.5;
  const double mp =
      y * y * ps / 15 + pc * (below + 0.4275) + pw * (below + 0.855 + 15.695) + pc * (below + 0.855 + 31.39 + 0.4275);
  return {mp, y, 33.1 + 9.0};
}

TEST_CASE("a compact composite section with Dp > 0.1 Dt takes Mn = Mp (1.07 - 0.7 Dp/Dt)", "[capacity]") {
  // EV-0112's W33x130 on a 3 ksi deck: PNA in the slab, so Dcp = 0 and the
  // web is compact (6.10.6.2.2-1); D/tw = 54 <= 150 (6.10.2.1.1).
  // Dp = 5.24 in > 0.1 Dt = 4.21 in: Mn by 6.10.7.1.2-2, by hand.
  const model::DeckSlab deck{in(7.5), in(102), in(1.5), {}};
  const CompositePositiveFlexure f = composite_positive_flexure(input(w33x130(), deck, 3, 9), ResistanceFactors{});
  const HandMp hand = w33_hand(3);
  CHECK(f.compact);
  CHECK(f.ductile);  // Dp <= 0.42 Dt (6.10.7.3-1)
  REQUIRE(hand.dp > 0.1 * hand.dt);
  TP_CHECK_CLOSE(test::to_kip_in(f.plastic.plastic_moment), hand.mp, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_kip_in(f.resistance.nominal), hand.mp * (1.07 - 0.7 * hand.dp / hand.dt), kHand, 1.0);
  CHECK(f.resistance.article == "AASHTO LRFD 6.10.7.1.2-2");
  CHECK(f.resistance.phi == Approx(1.0));  // LRFD 6.5.4.2
  CHECK_FALSE(f.resistance.flange_stress.has_value());
}

TEST_CASE("a compact composite section with Dp <= 0.1 Dt takes Mn = Mp (6.10.7.1.2-1)", "[capacity]") {
  // The same girder on a 6 ksi deck: Dp = 2.6 in <= 4.21 in (hand).
  const model::DeckSlab deck{in(7.5), in(102), in(1.5), {}};
  const CompositePositiveFlexure f = composite_positive_flexure(input(w33x130(), deck, 6, 9), ResistanceFactors{});
  const HandMp hand = w33_hand(6);
  REQUIRE(hand.dp <= 0.1 * hand.dt);
  TP_CHECK_CLOSE(test::to_kip_in(f.resistance.nominal), hand.mp, kHand, 1.0);
  CHECK(f.resistance.article == "AASHTO LRFD 6.10.7.1.2-1");
}

TEST_CASE("a deep plastic neutral axis makes the web noncompact and the section fail ductility", "[capacity]") {
  // PG54 (14 x 3/4, 54 x 7/16, 16 x 1-1/4) under a 24 x 6 in slab of 3 ksi
  // on a 2 in haunch, n = 9. Table D6.1-1 case I: Dcp = Y = 26.2 in, so
  // 2 Dcp / tw = 120 > 3.76 sqrt(E / Fy) = 106.7: noncompact (6.10.6.2.2-1);
  // Dp = 6 + 2 + 0.75 + Y = 35.0 in > 0.42 Dt = 26.9 in: not ductile (6.10.7.3).
  model::SteelIGirder g;
  g.top_flange = plate(14, 0.75);
  g.web = plate(54, 0.4375);
  g.bottom_flange = plate(16, 1.25);
  const model::DeckSlab deck{in(6), in(24), in(2), {}};
  const CompositePositiveFlexure f = composite_positive_flexure(input(g, deck, 3, 9), ResistanceFactors{});
  const double ps = 0.85 * 3 * 24 * 6;
  const double y = 27 * ((36 * 16 * 1.25 - 36 * 14 * 0.75 - ps) / (36 * 54 * 0.4375) + 1);
  TP_CHECK_CLOSE(test::to_in(f.plastic.web_compression_depth), y, kHand, 1.0);
  REQUIRE(2 * y / 0.4375 > 3.76 * std::sqrt(29000.0 / 36.0));
  CHECK_FALSE(f.compact);
  CHECK_FALSE(f.ductile);
  REQUIRE_FALSE(f.resistance.warnings.empty());
  CHECK_THAT(f.resistance.warnings[0], Catch::Contains("ductility requirement of AASHTO LRFD 6.10.7.3"));

  // Noncompact: Fnc = Rb Rh Fyc with Rb = 1.0 (D/tw = 123 <= 150), Fnt =
  // Rh Fyt (6.10.7.2.2-1, -2).
  REQUIRE(f.resistance.flange_stress.has_value());
  CHECK(test::to_ksi(f.resistance.flange_stress->compression_flange) == Approx(36.0));
  CHECK(test::to_ksi(f.resistance.flange_stress->tension_flange) == Approx(36.0));
  CHECK(f.resistance.flange_stress->compression_flange_on_top);

  // Moment equivalent min(Fy S_top, Fy S_bottom) on the short-term section,
  // with S from a textbook transformed-section table (slab 24/9 wide), by hand.
  struct Row {
    double a, y, io;
  };
  const Row rows[] = {{16 * 1.25, 0.625, 16 * std::pow(1.25, 3) / 12},
                      {0.4375 * 54, 1.25 + 27, 0.4375 * std::pow(54, 3) / 12},
                      {14 * 0.75, 55.625, 14 * std::pow(0.75, 3) / 12},
                      {24.0 / 9 * 6, 56 + 2 + 3, 24.0 / 9 * std::pow(6, 3) / 12}};
  double a = 0, ay = 0, ay2 = 0;
  for (const Row& r : rows) {
    a += r.a;
    ay += r.a * r.y;
    ay2 += r.io + r.a * r.y * r.y;
  }
  const double ybar = ay / a;
  const double inertia = ay2 - a * ybar * ybar;
  const double mn = 36 * std::min(inertia / (56 - ybar), inertia / ybar);
  TP_CHECK_CLOSE(test::to_kip_in(f.resistance.nominal), mn, kHand, 1.0);
  CHECK(f.resistance.article == "AASHTO LRFD 6.10.7.2");
}

}  // namespace
}  // namespace tenthpoint::capacity
