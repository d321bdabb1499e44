// A hand-checkable rating from section to RF: a simple span with given
// capacities, rated for HL-93 at the inventory and operating levels, checked
// against the published closed forms worked out in this file.
#include "engine/rating/girder_rating.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "engine/io/policy_reader.h"
#include "engine/io/vehicle_reader.h"
#include "engine/live_load/prepared_influence_lines.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::rating;

namespace {

constexpr Real kFt = units::kFoot;
constexpr Real kKip = units::kKip;
constexpr Real kKipFt = units::kKipFoot;

// 100 ft simple span, one girder line; given capacities phi Mn+ = 6000
// kip-ft and phi Vn = 400 kip over the whole girder (invented round numbers
// for the arithmetic); DC 1.2 kip/ft, DW 0.2 kip/ft per girder.
model::Bridge simple_span() {
  model::Bridge b;
  b.identity.structure_id = "TEST-RATE";
  b.traffic.clear_roadway_width = 36 * kFt;
  b.traffic.lanes = 3;
  b.geometry.span_lengths = {100 * kFt};
  b.geometry.supports = {model::SupportKind::pin, model::SupportKind::roller};
  b.materials.kind = model::MaterialKind::rolled_steel;
  b.materials.steel = model::Steel{50 * units::kKsi, std::nullopt, 29000 * units::kKsi};
  model::SectionDefinition s;
  s.id = "S";
  s.properties = model::SectionProperties{};
  s.properties->noncomposite.area = 0.05;
  s.properties->noncomposite.inertia = 0.02;
  b.sections.push_back(s);
  model::GirderLine g;
  g.id = "G";
  g.count = 5;
  g.spacing = 8 * kFt;
  g.segments.push_back({0, 100 * kFt, "S", std::nullopt, std::nullopt, {}});
  b.girders.push_back(g);
  model::DeadLoad dc;
  dc.component = model::DeadLoadComponent::dc1;
  dc.description = "girder and deck";
  dc.shape = model::UniformLoad{1.2 * units::kKipPerFoot, {}, {}};
  model::DeadLoad dw = dc;
  dw.component = model::DeadLoadComponent::dw;
  dw.shape = model::UniformLoad{0.2 * units::kKipPerFoot, {}, {}};
  b.dead_loads = {dc, dw};
  b.capacity.mode = model::CapacitySource::given;
  model::GivenCapacity given;
  given.start = 0;
  given.end = 100 * kFt;
  given.moment_positive = 6000 * kKipFt;
  given.shear = 400 * kKip;
  given.source = "test";
  b.capacity.given.push_back(given);
  return b;
}

}  // namespace

TEST_CASE("a simple span rated for HL-93 reproduces the hand calculation at midspan", "[rating][girder]") {
  const model::Bridge bridge = simple_span();
  const io::PolicyReadResult policy = io::read_shipped_policy("default");
  const io::VehicleReadResult vehicles = io::read_shipped_vehicles("aashto");
  REQUIRE(policy.ok());
  REQUIRE(vehicles.ok());
  const model::LoadModel* hl93 = vehicles.library->find_load_model("HL93");
  REQUIRE(hl93 != nullptr);

  const analysis::GirderLineAnalysis analysis = analysis::analyse_girder_line(bridge, bridge.girders[0]);
  const live_load::PreparedInfluenceLines lines(analysis.live_influence);
  const std::vector<live_load::MovingLoadEnvelope> envelopes =
      live_load::compute_moving_load_envelopes(lines, {hl93}, *vehicles.library);
  const capacity::GirderCapacity capacity(bridge, bridge.girders[0]);

  GirderRatingInputs in;
  in.method = model::RatingMethod::lrfr;
  in.analysis = &analysis;
  in.capacity = &capacity;
  in.policy = &*policy.policy;
  in.moment_factors.product = 0.95;  // phi_c = 0.95 (fair), phi_s = 1.0
  in.shear_factors.product = 0.95;
  in.distribution = GirderDistribution::uniform(analysis.live_influence.points.size(), 0.6, 0.6, 0.8);
  in.impact = DynamicAllowanceAt::uniform(analysis.live_influence.points.size(), 0.33, false);
  in.load_models = {{hl93, &envelopes[0]}};
  const GirderRating rating = rate_girder_line(in);

  REQUIRE(rating.load_models.size() == 1);
  REQUIRE(rating.load_models[0].levels.size() == 2);
  // Hand calculation at midspan (L = 100 ft):
  //  truck: 72(L/2 - 2.333)^2/L - 112 = 1523.9 kip-ft with the 14 ft spacing
  //    (resultant rule, ../shared/REFERENCE.md section 7; exactly
  //    72 (50 - 28/12)^2 / 100 - 112 with the 2.333 ft = 28/12 ft offset);
  //    at midspan itself the truck with its middle axle on the section gives
  //    8*18 + 32*25 + 32*18 = 1520 kip-ft (influence-line triangle, textbook).
  //  lane: 0.64 L^2 / 8 = 800 kip-ft (LRFD 3.6.1.2.4, no IM).
  //  LL+IM = 0.6 (1.33 * 1520 + 800) = 1692.96 kip-ft.
  //  DC = 1.2 L^2/8 = 1500, DW = 0.2 L^2/8 = 250 kip-ft.
  //  Inventory RF = (0.95*6000 - 1.25*1500 - 1.50*250) / (1.75*1692.96).
  const Real ll = 0.6 * (1.33 * 1520.0 + 800.0);
  const Real expected_inventory = (0.95 * 6000 - 1.25 * 1500 - 1.50 * 250) / (1.75 * ll);
  const Real expected_operating = (0.95 * 6000 - 1.25 * 1500 - 1.50 * 250) / (1.35 * ll);
  for (const LevelRating& level : rating.load_models[0].levels) {
    const PointRating* mid = nullptr;
    for (const PointRating& p : level.points)
      if (p.effect == RatedEffect::positive_moment && std::abs(p.station - 50 * kFt) < 1e-6) mid = &p;
    REQUIRE(mid != nullptr);
    const Real expected = level.level == model::RatingLevel::inventory ? expected_inventory : expected_operating;
    TP_CHECK_CLOSE(mid->result.rating_factor, expected, 1e-9, 1.0);
    TP_CHECK_CLOSE(mid->result.live / (1.75 * kKipFt),
                   (level.level == model::RatingLevel::inventory ? 1.0 : 1.35 / 1.75) * ll, 1e-9, 1.0);
    REQUIRE(level.governing.has_value());
    CHECK(level.governing->result.rating_factor <= mid->result.rating_factor);
  }
}
