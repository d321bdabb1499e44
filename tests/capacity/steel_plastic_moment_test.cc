#include "engine/capacity/steel_plastic_moment.h"

#include <catch2/catch.hpp>

#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::capacity {
namespace {

using test::in;
using test::ksi;
using test::plate;

// The hand values below are AASHTO LRFD Table D6.1-1 evaluated in kip and
// inch; only conversion round-off separates them from the engine.
constexpr double kHand = 1e-9;

model::SteelIGirder w33x130() {
  // W33x130 as plates (AISC Manual Table 1-1, from memory): bf = 11.5,
  // tf = 0.855, D = d - 2 tf = 31.39, tw = 0.580 in.
  model::SteelIGirder g;
  g.top_flange = plate(11.5, 0.855);
  g.web = plate(31.39, 0.580);
  g.bottom_flange = plate(11.5, 0.855);
  return g;
}

model::SteelIGirder plate_girder_54() {
  // The EV-0245 positive-moment girder: 14 x 3/4 top, 54 x 7/16 web, 16 x 1-1/4 bottom.
  model::SteelIGirder g;
  g.top_flange = plate(14.0, 0.75);
  g.web = plate(54.0, 0.4375);
  g.bottom_flange = plate(16.0, 1.25);
  return g;
}

model::DeckSlab deck(double width, double thickness, double haunch) {
  return model::DeckSlab{in(thickness), in(width), in(haunch), {}};
}

TEST_CASE("Mp with the plastic neutral axis in the slab matches Table D6.1-1 case III-VII", "[capacity]") {
  // EV-0112: W33x130, A36, 7.5 in deck 102 in wide of 3 ksi concrete on a
  // 1.5 in haunch; bars left out (Prt = Prb = 0). By hand:
  // Ps = 0.85 f'c beff ts; Pc = Pt = Fy bf tf; Pw = Fy D tw;
  // Y = ts (Pc + Pw + Pt) / Ps (depth of the PNA below the deck top);
  // Mp = Y^2 Ps / (2 ts) + Pc dc + Pw dw + Pt dt, distances from the PNA.
  const CompositePlasticMoment m =
      composite_plastic_moment(w33x130(), deck(102, 7.5, 1.5), ksi(36), ksi(3), false, std::nullopt);
  const double ps = 0.85 * 3 * 102 * 7.5;
  const double pc = 36 * 11.5 * 0.855;
  const double pw = 36 * 31.39 * 0.580;
  const double pt = pc;
  REQUIRE(pc + pw + pt < ps);  // Table D6.1-1: PNA in the slab
  const double y = 7.5 * (pc + pw + pt) / ps;
  const double below = 7.5 - y + 1.5;  // PNA to the top of the steel
  const double mp = y * y * ps / (2 * 7.5) + pc * (below + 0.855 / 2) + pw * (below + 0.855 + 31.39 / 2) +
                    pt * (below + 0.855 + 31.39 + 0.855 / 2);
  CHECK(m.location == PlasticNeutralAxisLocation::slab);
  TP_CHECK_CLOSE(test::to_kip_in(m.plastic_moment), mp, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_in(m.depth_to_neutral_axis), y, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_in(m.total_depth), 33.1 + 1.5 + 7.5, kHand, 1.0);
  CHECK(m.web_compression_depth == 0.0);  // Dcp = 0 with the PNA above the web (D6.3.2)
}

TEST_CASE("Mp with the plastic neutral axis in the top flange matches Table D6.1-1 case II", "[capacity]") {
  // PG54 with a 60 in x 8 in slab of 3 ksi concrete on a 2 in haunch, Fy = 36.
  // Pt + Pw >= Pc + Ps fails and Pt + Pw + Pc >= Ps holds: case II. By hand
  // Y = (tc / 2) [(Pw + Pt - Ps) / Pc + 1] below the top of the top flange;
  // Mp = Pc / (2 tc) [Y^2 + (tc - Y)^2] + Ps ds + Pw dw + Pt dt.
  const CompositePlasticMoment m =
      composite_plastic_moment(plate_girder_54(), deck(60, 8, 2), ksi(36), ksi(3), false, std::nullopt);
  const double ps = 0.85 * 3 * 60 * 8;
  const double pc = 36 * 14 * 0.75;
  const double pw = 36 * 54 * 0.4375;
  const double pt = 36 * 16 * 1.25;
  REQUIRE(pt + pw < pc + ps);
  REQUIRE(pt + pw + pc >= ps);
  const double tc = 0.75;
  const double y = tc / 2 * ((pw + pt - ps) / pc + 1);
  const double mp = pc / (2 * tc) * (y * y + (tc - y) * (tc - y)) + ps * (y + 2 + 4) + pw * (tc - y + 27) +
                    pt * (tc - y + 54 + 0.625);
  CHECK(m.location == PlasticNeutralAxisLocation::top_flange);
  TP_CHECK_CLOSE(test::to_kip_in(m.plastic_moment), mp, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_in(m.depth_to_neutral_axis), 8 + 2 + y, kHand, 1.0);
  CHECK(m.web_compression_depth == 0.0);
}

TEST_CASE("Mp with the plastic neutral axis in the web matches Table D6.1-1 case I", "[capacity]") {
  // PG54 with a 40 in x 6 in slab of 3 ksi concrete on a 2 in haunch, Fy = 36.
  // Pt + Pw >= Pc + Ps: case I. By hand
  // Y = (D / 2) [(Pt - Pc - Ps) / Pw + 1] below the top of the web;
  // Mp = Pw / (2 D) [Y^2 + (D - Y)^2] + Ps ds + Pc dc + Pt dt.
  const CompositePlasticMoment m =
      composite_plastic_moment(plate_girder_54(), deck(40, 6, 2), ksi(36), ksi(3), false, std::nullopt);
  const double ps = 0.85 * 3 * 40 * 6;
  const double pc = 36 * 14 * 0.75;
  const double pw = 36 * 54 * 0.4375;
  const double pt = 36 * 16 * 1.25;
  REQUIRE(pt + pw >= pc + ps);
  const double d = 54;
  const double y = d / 2 * ((pt - pc - ps) / pw + 1);
  const double mp =
      pw / (2 * d) * (y * y + (d - y) * (d - y)) + ps * (y + 0.75 + 2 + 3) + pc * (y + 0.375) + pt * (d - y + 0.625);
  CHECK(m.location == PlasticNeutralAxisLocation::web);
  TP_CHECK_CLOSE(test::to_kip_in(m.plastic_moment), mp, kHand, 1.0);
  // Dcp = Y, the web depth above the PNA (D6.3.2).
  TP_CHECK_CLOSE(test::to_in(m.web_compression_depth), y, kHand, 1.0);
}

TEST_CASE("deck bars above the plastic neutral axis add their force at their lever arm", "[capacity]") {
  // The case-I girder with 3 in^2 of 60 ksi bars 2 in below the deck top.
  // Table D6.1-1 case I with Prt: Y = (D/2)[(Pt - Pc - Ps - Prt)/Pw + 1];
  // Mp gains Prt drt, by hand.
  model::DeckSlab slab = deck(40, 6, 2);
  slab.longitudinal_bars = {model::BarLayer{test::in2(3.0), in(2.0)}};
  const CompositePlasticMoment m = composite_plastic_moment(plate_girder_54(), slab, ksi(36), ksi(3), true, ksi(60));
  const double ps = 0.85 * 3 * 40 * 6;
  const double prt = 60 * 3.0;
  const double pc = 36 * 14 * 0.75;
  const double pw = 36 * 54 * 0.4375;
  const double pt = 36 * 16 * 1.25;
  const double d = 54;
  const double y = d / 2 * ((pt - pc - ps - prt) / pw + 1);
  const double mp = pw / (2 * d) * (y * y + (d - y) * (d - y)) + ps * (y + 0.75 + 2 + 3) + prt * (y + 0.75 + 2 + 4) +
                    pc * (y + 0.375) + pt * (d - y + 0.625);
  TP_CHECK_CLOSE(test::to_kip_in(m.plastic_moment), mp, kHand, 1.0);
}

}  // namespace
}  // namespace tenthpoint::capacity
