// The limit states beyond Strength I, worked by hand on simple spans: Service
// II of a composite steel girder from f = M / S per stage (AASHTO LRFD
// 6.10.4.2.2, MBE 6A.6.4.2.1), Service III of a prestressed girder (MBE
// 6A.5.4.2.2, LRFD Table 5.9.2.3.2b-1), Strength II of a permit with gamma_LL
// interpolated from the agency's permit table (MBE Table 6A.4.5.4.2a-1 as the
// Eastvale policy gives it: an agency table, from memory), and the governing
// limit state of a level.
#include <algorithm>
#include <cmath>

#include <catch2/catch.hpp>

#include "engine/core/errors.h"
#include "engine/core/units.h"
#include "engine/io/policy_reader.h"
#include "engine/io/vehicle_reader.h"
#include "engine/live_load/prepared_influence_lines.h"
#include "engine/rating/girder_rating.h"
#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::rating;

namespace {

constexpr Real kFt = units::kFoot;
constexpr Real kKip = units::kKip;
constexpr Real kKipFt = units::kKipFoot;
constexpr Real kKsi = units::kKsi;
constexpr Real kIn = units::kInch;

// Hand values are worked in kip, ft and in and compared after one
// conversion; the tolerance covers the conversions' round-off only.
constexpr Real kHand = 1e-9;

// HL-93 at midspan of a 100 ft simple span: the truck with its middle axle
// on the section gives 8(18) + 32(25) + 32(18) = 1520 kip-ft and the lane
// 0.64 (100)^2 / 8 = 800 kip-ft (influence-line triangle, textbook; LRFD
// 3.6.1.2); LL + IM with g = 0.6 and IM = 0.33 on the truck only (LRFD 3.6.2.1).
constexpr Real kLiveMidspan = 0.6 * (1.33 * 1520.0 + 800.0);  // kip-ft

model::DeadLoad uniform(model::DeadLoadComponent component, Real kip_per_ft) {
  model::DeadLoad d;
  d.component = component;
  d.description = "uniform";
  d.shape = model::UniformLoad{kip_per_ft * units::kKipPerFoot, {}, {}};
  return d;
}

model::Bridge simple_span(model::MaterialKind kind) {
  model::Bridge b;
  b.identity.structure_id = "TEST-LIMIT-STATES";
  b.traffic.clear_roadway_width = 36 * kFt;
  b.traffic.lanes = 3;
  b.geometry.span_lengths = {100 * kFt};
  b.geometry.supports = {model::SupportKind::pin, model::SupportKind::roller};
  b.materials.kind = kind;
  model::GirderLine g;
  g.id = "G";
  g.count = 5;
  g.spacing = 8 * kFt;
  g.segments.push_back({0, 100 * kFt, "S", std::nullopt, std::nullopt, {}});
  b.girders.push_back(g);
  return b;
}

// A symmetric plate girder (16 x 1 in flanges, 60 x 5/8 in web, Fy = 50 ksi)
// with an 8 in deck 96 in wide directly on the top flange (no haunch, no
// bars), n = 8, k = 3; DC1 1.0, DC2 0.2, DW 0.25 kip/ft.
model::Bridge composite_steel() {
  model::Bridge b = simple_span(model::MaterialKind::welded_plate_girder);
  b.materials.composite = true;
  b.materials.steel = model::Steel{50 * kKsi, 65 * kKsi, 29000 * kKsi};
  b.materials.deck_concrete = model::Concrete{4 * kKsi, std::nullopt, capacity::test::kcf(0.150)};
  b.materials.modular_ratio = 8;
  model::SectionDefinition s;
  s.id = "S";
  model::SteelIGirder girder;
  girder.top_flange = capacity::test::plate(16, 1);
  girder.web = capacity::test::plate(60, 0.625);
  girder.bottom_flange = capacity::test::plate(16, 1);
  s.description = girder;
  s.deck = model::DeckSlab{8 * kIn, 96 * kIn, 0, {}};
  b.sections.push_back(s);
  b.dead_loads = {uniform(model::DeadLoadComponent::dc1, 1.0), uniform(model::DeadLoadComponent::dc2, 0.2),
                  uniform(model::DeadLoadComponent::dw, 0.25)};
  b.capacity.mode = model::CapacitySource::computed;
  return b;
}

// Section moduli of that girder at the top and bottom of the steel, in^3,
// by the transformed-section method (parallel axis theorem; textbook): the
// deck of area 96 (8) / n' at 62 + 4 in above the soffit.
struct Moduli {
  Real top = 0;
  Real bottom = 0;
};

Moduli steel_moduli(Real deck_ratio) {
  const Real steel_area = 2 * 16 * 1 + 60 * 0.625;
  const Real steel_inertia = 0.625 * 60 * 60 * 60 / 12 + 2 * (16.0 / 12 + 16 * 30.5 * 30.5);
  if (deck_ratio == 0) return {steel_inertia / 31, steel_inertia / 31};
  const Real deck_area = 96 * 8 / deck_ratio;
  const Real area = steel_area + deck_area;
  const Real centroid = (steel_area * 31 + deck_area * 66) / area;
  const Real inertia = steel_inertia + steel_area * (centroid - 31) * (centroid - 31) +
                       96 / deck_ratio * 8 * 8 * 8 / 12 + deck_area * (66 - centroid) * (66 - centroid);
  return {inertia / (62 - centroid), inertia / centroid};
}

struct Rated {
  analysis::GirderLineAnalysis analysis;
  std::vector<live_load::MovingLoadEnvelope> envelopes;
  GirderRating rating;
};

GirderRatingInputs inputs(const analysis::GirderLineAnalysis& analysis, const capacity::GirderCapacity& capacity,
                          const model::Policy& policy) {
  GirderRatingInputs in;
  in.method = model::RatingMethod::lrfr;
  in.analysis = &analysis;
  in.capacity = &capacity;
  in.policy = &policy;
  in.moment_factors.product = 1.0;
  in.shear_factors.product = 1.0;
  const std::size_t n = analysis.live_influence.points.size();
  in.distribution = GirderDistribution::uniform(n, 0.6, 0.6, 0.8);
  in.impact = DynamicAllowanceAt::uniform(n, 0.33, false);
  return in;
}

const PointRating* at_midspan(const LevelRating& level, LimitState state, RatedEffect effect,
                              std::string_view fibre = "") {
  for (const PointRating& p : level.points)
    if (p.limit_state == state && p.effect == effect && std::abs(p.station - 50 * kFt) < 1e-6 &&
        (fibre.empty() || p.fibre == fibre))
      return &p;
  return nullptr;
}

model::Policy shipped_policy() {
  const io::PolicyReadResult p = io::read_shipped_policy("default");
  REQUIRE(p.ok());
  return *p.policy;
}

const model::LoadModel& hl93() {
  static const io::VehicleReadResult vehicles = io::read_shipped_vehicles("aashto");
  REQUIRE(vehicles.ok());
  const model::LoadModel* m = vehicles.library->find_load_model("HL93");
  REQUIRE(m != nullptr);
  return *m;
}

const model::VehicleLibrary& aashto() {
  static const io::VehicleReadResult vehicles = io::read_shipped_vehicles("aashto");
  REQUIRE(vehicles.ok());
  return *vehicles.library;
}

}  // namespace

TEST_CASE("Service II of a composite steel girder is (fR - fD) / (gamma_L fL) with f = M / S per stage",
          "[rating][service]") {
  const model::Bridge bridge = composite_steel();
  const model::Policy policy = shipped_policy();
  const analysis::GirderLineAnalysis analysis = analysis::analyse_girder_line(bridge, bridge.girders[0]);
  const live_load::PreparedInfluenceLines lines(analysis.live_influence);
  const std::vector<live_load::MovingLoadEnvelope> envelopes =
      live_load::compute_moving_load_envelopes(lines, {&hl93()}, aashto());
  const capacity::GirderCapacity capacity(bridge, bridge.girders[0]);
  GirderRatingInputs in = inputs(analysis, capacity, policy);
  in.material = bridge.materials.kind;
  in.load_models = {{&hl93(), &envelopes[0]}};
  const GirderRating rating = rate_girder_line(in);
  REQUIRE(rating.load_models.size() == 1);
  REQUIRE(rating.load_models[0].levels.size() == 2);

  // Hand calculation at midspan. Moments wL^2/8: DC1 1250, DC2 250, DW 312.5
  // kip-ft. DC1 on the steel alone, DC2 and DW on the 3n = 24 section, LL +
  // IM on the n = 8 section (LRFD 6.10.1.1.1b). fR = 0.95 Fy = 47.5 ksi for
  // both flanges of a composite section (LRFD 6.10.4.2.2-1, -2); gamma_D =
  // 1.0 and gamma_L 1.30 / 1.00 at inventory / operating (MBE Table
  // 6A.4.2.2-1, from memory).
  const Moduli nc = steel_moduli(0);
  const Moduli lt = steel_moduli(24);
  const Moduli st = steel_moduli(8);
  const auto expected = [&](bool top, Real gamma) {
    const Real f_dead = 1250 * 12 / (top ? nc.top : nc.bottom) + (250 + 312.5) * 12 / (top ? lt.top : lt.bottom);
    const Real f_live = kLiveMidspan * 12 / (top ? st.top : st.bottom);
    return (47.5 - f_dead) / (gamma * f_live);
  };
  for (const LevelRating& level : rating.load_models[0].levels) {
    const bool inventory = level.level == model::RatingLevel::inventory;
    const Real gamma = inventory ? 1.30 : 1.00;
    const PointRating* bottom =
        at_midspan(level, LimitState::service_ii, RatedEffect::positive_moment, "bottom flange");
    const PointRating* top = at_midspan(level, LimitState::service_ii, RatedEffect::positive_moment, "top flange");
    REQUIRE(bottom != nullptr);
    REQUIRE(top != nullptr);
    TP_CHECK_CLOSE(bottom->result.rating_factor, expected(false, gamma), kHand, 1.0);
    TP_CHECK_CLOSE(top->result.rating_factor, expected(true, gamma), kHand, 1.0);
    CHECK(bottom->gamma_ll == Approx(gamma));
    CHECK(bottom->capacity_factor == 1.0);  // no phi_c phi_s at a service limit state (MBE 6A.4.2.1)
    TP_CHECK_CLOSE(bottom->result.capacity / kKsi, 47.5, kHand, 1.0);

    // The bottom flange governs this girder at Service II (about 2.15 at
    // inventory by hand), below every Strength I rating (moment and shear):
    // the level's governing rating says so.
    REQUIRE(level.governing.has_value());
    CHECK(level.governing->limit_state == LimitState::service_ii);
    CHECK(level.governing->fibre == "bottom flange");
    const PointRating* strength = at_midspan(level, LimitState::strength_i, RatedEffect::positive_moment);
    REQUIRE(strength != nullptr);
    CHECK(strength->result.rating_factor > bottom->result.rating_factor);
    CHECK(level.governing->result.rating_factor <= bottom->result.rating_factor);
    REQUIRE(level.factors.size() == 2);
    CHECK(level.factors[0].limit_state == LimitState::strength_i);
    CHECK(level.factors[1].limit_state == LimitState::service_ii);
  }
  TP_CHECK_CLOSE(expected(false, 1.30), 2.1469, 1e-4, 1.0);  // the figure quoted above, as worked by hand
}

TEST_CASE("a policy that makes design-load Service II at inventory optional leaves it out", "[rating][service]") {
  // MBE 6A.4.2.2: agencies may treat some service checks as optional; the
  // policy's service_checks switch them (common practice).
  model::ServiceChecks checks;
  using model::MaterialKind;
  using model::RatingLevel;
  using model::RatingMethod;
  using model::VehicleCategory;
  const auto states = [&](MaterialKind m, VehicleCategory c, RatingLevel l) {
    return rated_limit_states(RatingMethod::lrfr, m, c, l, checks);
  };
  using LS = std::vector<LimitState>;
  CHECK(states(MaterialKind::rolled_steel, VehicleCategory::design, RatingLevel::inventory) ==
        LS{LimitState::strength_i, LimitState::service_ii});
  CHECK(states(MaterialKind::rolled_steel, VehicleCategory::permit, RatingLevel::operating) ==
        LS{LimitState::strength_ii, LimitState::service_ii});
  CHECK(states(MaterialKind::prestressed_concrete, VehicleCategory::design, RatingLevel::inventory) ==
        LS{LimitState::strength_i, LimitState::service_iii});
  // No Service III factor at operating in MBE Table 6A.4.2.2-1 (from memory),
  // and legal loads at Service III only when asked.
  CHECK(states(MaterialKind::prestressed_concrete, VehicleCategory::design, RatingLevel::operating) ==
        LS{LimitState::strength_i});
  CHECK(states(MaterialKind::prestressed_concrete, VehicleCategory::legal, RatingLevel::operating) ==
        LS{LimitState::strength_i});
  CHECK(states(MaterialKind::reinforced_concrete, VehicleCategory::legal, RatingLevel::operating) ==
        LS{LimitState::strength_i});
  CHECK(rated_limit_states(RatingMethod::lfr, MaterialKind::rolled_steel, VehicleCategory::lfr_design,
                           RatingLevel::inventory, checks) == LS{LimitState::strength_i});
  checks.service_ii_design_inventory = false;
  checks.service_iii_legal = true;
  CHECK(states(MaterialKind::rolled_steel, VehicleCategory::design, RatingLevel::inventory) ==
        LS{LimitState::strength_i});
  CHECK(states(MaterialKind::rolled_steel, VehicleCategory::design, RatingLevel::operating) ==
        LS{LimitState::strength_i, LimitState::service_ii});
  CHECK(states(MaterialKind::prestressed_concrete, VehicleCategory::legal, RatingLevel::operating) ==
        LS{LimitState::strength_i, LimitState::service_iii});

  // The same switch read from a policy file.
  const std::string text = R"(format_version: 1
units: US
extends: default
id: test-optional
version: "1"
name: test
edition: test
lrfr:
  service_checks: {service_ii_design_inventory: false}
)";
  const io::PolicyReadResult read = io::read_policy_text(text, "optional.yaml");
  REQUIRE(read.ok());
  CHECK_FALSE(read.policy->lrfr.service_checks.service_ii_design_inventory);
  CHECK(read.policy->lrfr.service_checks.service_ii_design_operating);
  REQUIRE(read.policy->lrfr.service_ii_legal.has_value());
  CHECK(*read.policy->lrfr.service_ii_legal == Approx(1.30));  // MBE Table 6A.4.2.2-1 (from memory)
}

TEST_CASE("Service III of a prestressed girder is (fR - fD - fP) / (gamma_L fL) at the bottom fibre",
          "[rating][service]") {
  // A non-composite AASHTO Type IV girder (A = 789 in^2, I = 260,730 in^4,
  // yb = 24.73 in, from memory), 46 strands of 0.153 in^2 with fpe = 160 ksi
  // given; f'c = 6 ksi. DC1 1.6, DC2 0.2, DW 0.25 kip/ft.
  model::Bridge bridge = simple_span(model::MaterialKind::prestressed_concrete);
  bridge.materials = capacity::test::ps_materials();
  bridge.materials.composite = false;
  bridge.materials.deck_concrete.reset();
  model::SectionDefinition s;
  s.id = "S";
  s.description = capacity::test::type_iv(160.0);
  bridge.sections.push_back(s);
  bridge.dead_loads = {uniform(model::DeadLoadComponent::dc1, 1.6), uniform(model::DeadLoadComponent::dc2, 0.2),
                       uniform(model::DeadLoadComponent::dw, 0.25)};
  const model::Policy policy = shipped_policy();
  const analysis::GirderLineAnalysis analysis = analysis::analyse_girder_line(bridge, bridge.girders[0]);
  const live_load::PreparedInfluenceLines lines(analysis.live_influence);
  const std::vector<live_load::MovingLoadEnvelope> envelopes =
      live_load::compute_moving_load_envelopes(lines, {&hl93()}, aashto());
  const capacity::GirderCapacity capacity(bridge, bridge.girders[0]);
  GirderRatingInputs in = inputs(analysis, capacity, policy);
  in.material = bridge.materials.kind;
  in.load_models = {{&hl93(), &envelopes[0]}};
  const GirderRating rating = rate_girder_line(in);
  const LevelRating& inventory = rating.load_models[0].levels[0];
  REQUIRE(inventory.level == model::RatingLevel::inventory);

  // By hand: Sb = I / yb; strand centroid 224 / 46 = 4.870 in, e = 19.86 in;
  // P = Aps fpe; fP = -(P/A + P e / Sb) (elastic stress); fR = 0.19 sqrt(f'c)
  // ksi (LRFD Table 5.9.2.3.2b-1, from memory); fD = (1.6 + 0.2 + 0.25)
  // (100)^2 / 8 (12) / Sb; fL = LL+IM (12) / Sb; gamma_L = 0.80 (MBE Table
  // 6A.4.2.2-1).
  const Real sb = 260730 / 24.73;
  const Real aps = 46 * 0.153;
  const Real p = aps * 160;
  const Real e = 24.73 - 224.0 / 46;
  const Real fp = -(p / 789 + p * e / sb);
  const Real fr = 0.19 * std::sqrt(6.0);
  const Real fd = (1.6 + 0.2 + 0.25) * 100 * 100 / 8 * 12 / sb;
  const Real fl = kLiveMidspan * 12 / sb;
  const PointRating* mid = at_midspan(inventory, LimitState::service_iii, RatedEffect::positive_moment);
  REQUIRE(mid != nullptr);
  CHECK(mid->fibre == "bottom fibre");
  TP_CHECK_CLOSE(mid->result.rating_factor, (fr - fd - fp) / (0.80 * fl), kHand, 1.0);
  CHECK(mid->gamma_ll == Approx(0.80));
  // About 0.71: Service III governs this girder's inventory rating.
  REQUIRE(inventory.governing.has_value());
  CHECK(inventory.governing->limit_state == LimitState::service_iii);
  // Only the design load at inventory is rated at Service III by default.
  const LevelRating& operating = rating.load_models[0].levels[1];
  for (const PointRating& point : operating.points) CHECK(point.limit_state == LimitState::strength_i);
}

namespace {

// A two-axle permit: 50 + 50 kip, 40 ft apart, W = 50 tons; loading ratio
// 100 kip / 40 ft = 2.5 kip/ft. At midspan of a 100 ft span the axles at 50
// and 10 ft give 50 (25) + 50 (5) = 1500 kip-ft (influence line, textbook).
struct TestPermit {
  model::VehicleLibrary library;
  model::LoadModel model;
};

TestPermit test_permit() {
  TestPermit t;
  model::AxleTrain train;
  train.id = "TEST-P2";
  train.name = "test permit";
  train.axle_weights = {50 * kKip, 50 * kKip};
  train.spacings = {{40 * kFt, 40 * kFt}};
  t.library.trains.push_back(train);
  t.model.id = "TEST-P2";
  t.model.name = "test permit";
  t.model.category = model::VehicleCategory::permit;
  t.model.methods = {model::RatingMethod::lrfr};
  t.model.rating_weight = 100 * kKip;
  model::LoadCase c;
  c.id = "truck";
  c.train = "TEST-P2";
  t.model.cases = {c};
  t.library.load_models.push_back(t.model);
  return t;
}

// The simple span of the HL-93 check in girder_rating_test.cc: given phi Mn
// = 6000 kip-ft, phi Vn = 400 kip; DC 1.2 and DW 0.2 kip/ft (1500 and 250
// kip-ft at midspan); no section description, so no Service II.
model::Bridge given_capacity_span() {
  model::Bridge b = simple_span(model::MaterialKind::rolled_steel);
  b.materials.steel = model::Steel{50 * kKsi, std::nullopt, 29000 * kKsi};
  model::SectionDefinition s;
  s.id = "S";
  s.properties = model::SectionProperties{};
  s.properties->noncomposite.area = 0.05;
  s.properties->noncomposite.inertia = 0.02;
  b.sections.push_back(s);
  b.dead_loads = {uniform(model::DeadLoadComponent::dc1, 1.2), uniform(model::DeadLoadComponent::dw, 0.2)};
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

model::Policy eastvale_policy() {
  const io::PolicyReadResult p =
      io::read_policy_file(std::string(TENTHPOINT_SOURCE_DIR) + "/inventory/policies/eastvale.yaml");
  REQUIRE(p.ok());
  return *p.policy;
}

}  // namespace

TEST_CASE("a permit rates at Strength II with gamma_LL interpolated in ADTT and loading ratio", "[rating][permit]") {
  const TestPermit permit = test_permit();
  model::Policy policy = eastvale_policy();
  policy.vehicles.merge(permit.library);
  model::PermitType* routine = nullptr;
  for (model::PermitType& t : policy.lrfr.permit_types)
    if (t.id == "routine") routine = &t;
  REQUIRE(routine != nullptr);
  routine->load_models = {"TEST-P2"};

  const model::Bridge bridge = given_capacity_span();
  const analysis::GirderLineAnalysis analysis = analysis::analyse_girder_line(bridge, bridge.girders[0]);
  const live_load::PreparedInfluenceLines lines(analysis.live_influence);
  const std::vector<live_load::MovingLoadEnvelope> envelopes =
      live_load::compute_moving_load_envelopes(lines, {&permit.model}, policy.vehicles);
  const capacity::GirderCapacity capacity(bridge, bridge.girders[0]);
  GirderRatingInputs in = inputs(analysis, capacity, policy);
  in.moment_factors.product = 0.95;
  in.adtt = 2500;
  in.load_models = {{&permit.model, &envelopes[0]}};
  const GirderRating rating = rate_girder_line(in);
  REQUIRE(rating.load_models.size() == 1);
  const LoadModelRating& rated = rating.load_models[0];
  CHECK(rated.permit_type == "routine");
  REQUIRE(rated.levels.size() == 1);
  const LevelRating& level = rated.levels[0];
  CHECK(level.level == model::RatingLevel::operating);

  // Eastvale's routine table (agency table after MBE Table 6A.4.5.4.2a-1,
  // from memory): at ADTT 1000, 1.20 for 2.0 and 1.10 for 3.0 kip/ft; at ADTT
  // 5000, 1.30 and 1.20. At 2.5 kip/ft: 1.15 and 1.25; at ADTT 2500:
  // 1.15 + (1500 / 4000)(0.10) = 1.1875 (linear interpolation, by hand).
  const Real gamma = 1.15 + 1500.0 / 4000.0 * 0.10;
  REQUIRE_FALSE(level.factors.empty());
  CHECK(level.factors[0].limit_state == LimitState::strength_ii);
  TP_CHECK_CLOSE(level.factors[0].gamma_ll, gamma, 1e-12, 1.0);
  const PointRating* mid = at_midspan(level, LimitState::strength_ii, RatedEffect::positive_moment);
  REQUIRE(mid != nullptr);
  // Strength II with the Strength I dead-load factors (MBE Table 6A.4.2.2-1,
  // from memory): RF = (0.95 (6000) - 1.25 (1500) - 1.50 (250)) /
  // (gamma 0.6 (1.33) 1500).
  TP_CHECK_CLOSE(mid->result.rating_factor, (0.95 * 6000 - 1.25 * 1500 - 1.50 * 250) / (gamma * 0.6 * 1.33 * 1500),
                 kHand, 1.0);
  REQUIRE(level.governing.has_value());
  CHECK(level.governing->limit_state == LimitState::strength_ii);
  // The steel girder has no description here: Service II is skipped, and said.
  CHECK(std::any_of(rating.warnings.begin(), rating.warnings.end(),
                    [](const std::string& w) { return w.rfind("Service II not rated", 0) == 0; }));
}

TEST_CASE("a single-trip escorted permit takes one lane with the multiple presence divided out", "[rating][permit]") {
  const TestPermit permit = test_permit();
  model::Policy policy = eastvale_policy();
  policy.vehicles.merge(permit.library);
  for (model::PermitType& t : policy.lrfr.permit_types)
    if (t.id == "single-trip-escorted") t.load_models = {"TEST-P2"};

  const model::Bridge bridge = given_capacity_span();
  const analysis::GirderLineAnalysis analysis = analysis::analyse_girder_line(bridge, bridge.girders[0]);
  const live_load::PreparedInfluenceLines lines(analysis.live_influence);
  const std::vector<live_load::MovingLoadEnvelope> envelopes =
      live_load::compute_moving_load_envelopes(lines, {&permit.model}, policy.vehicles);
  const capacity::GirderCapacity capacity(bridge, bridge.girders[0]);
  GirderRatingInputs in = inputs(analysis, capacity, policy);
  in.moment_factors.product = 0.95;
  in.adtt = 2500;
  in.one_lane_distribution = GirderDistribution::uniform(analysis.live_influence.points.size(), 0.5, 0.5, 0.7);
  in.load_models = {{&permit.model, &envelopes[0]}};
  const GirderRating rating = rate_girder_line(in);
  const LevelRating& level = rating.load_models[0].levels[0];
  // MBE 6A.4.5.4.2b (from memory): one-lane g = 0.5 with m = 1.2 divided out;
  // Eastvale's single-trip type: gamma_LL 1.15, IM 0 (escorted at 10 mph or
  // less, MBE C6A.4.5.5, from memory).
  const PointRating* mid = at_midspan(level, LimitState::strength_ii, RatedEffect::positive_moment);
  REQUIRE(mid != nullptr);
  TP_CHECK_CLOSE(mid->distribution, 0.5 / 1.2, 1e-12, 1.0);
  CHECK(mid->impact == 0.0);
  TP_CHECK_CLOSE(mid->result.rating_factor, (0.95 * 6000 - 1.25 * 1500 - 1.50 * 250) / (1.15 * 0.5 / 1.2 * 1500), kHand,
                 1.0);
}

TEST_CASE("a permit vehicle no permit type names is an input error naming the policy field", "[rating][permit]") {
  const TestPermit permit = test_permit();
  model::Policy policy = eastvale_policy();
  policy.vehicles.merge(permit.library);
  const model::Bridge bridge = given_capacity_span();
  const analysis::GirderLineAnalysis analysis = analysis::analyse_girder_line(bridge, bridge.girders[0]);
  const live_load::PreparedInfluenceLines lines(analysis.live_influence);
  const std::vector<live_load::MovingLoadEnvelope> envelopes =
      live_load::compute_moving_load_envelopes(lines, {&permit.model}, policy.vehicles);
  const capacity::GirderCapacity capacity(bridge, bridge.girders[0]);
  GirderRatingInputs in = inputs(analysis, capacity, policy);
  in.load_models = {{&permit.model, &envelopes[0]}};
  try {
    (void)rate_girder_line(in);
    FAIL("expected an InputError");
  } catch (const InputError& e) {
    REQUIRE_FALSE(e.diagnostics().empty());
    CHECK(e.diagnostics()[0].field == "lrfr.permit_types");
    CHECK_THAT(e.diagnostics()[0].message, Catch::Contains("TEST-P2"));
  }
}

TEST_CASE("the Eastvale permit truck's loading ratio is its gross weight over its length", "[rating][permit]") {
  // EC-P8 (invented): 240 kip over 14 + 4.5 + 30 + 4.5 + 32 + 4.5 + 4.5 = 94 ft.
  const model::Policy policy = eastvale_policy();
  const model::LoadModel* p8 = policy.vehicles.find_load_model("EC-P8");
  REQUIRE(p8 != nullptr);
  CHECK(p8->category == model::VehicleCategory::permit);
  const std::optional<Real> ratio = permit_loading_ratio(*p8, policy.vehicles);
  REQUIRE(ratio.has_value());
  TP_CHECK_CLOSE(*ratio / units::kKipPerFoot, 240.0 / 94.0, 1e-12, 1.0);
  REQUIRE(policy.lrfr.find_permit_type_for("EC-P8") != nullptr);
  CHECK(policy.lrfr.find_permit_type_for("EC-P8")->id == "routine");
}

TEST_CASE("a permit on reinforced concrete rates at Service I with the cracked-section steel stress",
          "[rating][permit][service]") {
  // A 24 x 60 in rectangular beam, As = 20 in^2 at d = 56 in, fy = 60 ksi,
  // f'c = 4 ksi with Ec given as 3600 ksi (n = 29000 / 3600); DC 1.2 and DW
  // 0.2 kip/ft on the 100 ft span; the two-axle test permit (1500 kip-ft at
  // midspan, g = 0.6, IM 0.33) as a routine permit.
  const TestPermit permit = test_permit();
  model::Policy policy = eastvale_policy();
  policy.vehicles.merge(permit.library);
  for (model::PermitType& t : policy.lrfr.permit_types)
    if (t.id == "routine") t.load_models = {"TEST-P2"};
  model::Bridge bridge = simple_span(model::MaterialKind::reinforced_concrete);
  bridge.materials.girder_concrete = model::Concrete{4 * kKsi, 3600 * kKsi, capacity::test::kcf(0.150)};
  bridge.materials.reinforcement = model::Reinforcement{60 * kKsi, 29000 * kKsi};
  model::SectionDefinition s;
  s.id = "S";
  model::ReinforcedConcreteBeam beam;
  beam.height = 60 * kIn;
  beam.web_width = 24 * kIn;
  beam.flange_width = 24 * kIn;
  beam.bottom_bars = {model::BarLayer{20 * kIn * kIn, 56 * kIn}};
  s.description = beam;
  bridge.sections.push_back(s);
  bridge.dead_loads = {uniform(model::DeadLoadComponent::dc1, 1.2), uniform(model::DeadLoadComponent::dw, 0.2)};
  const analysis::GirderLineAnalysis analysis = analysis::analyse_girder_line(bridge, bridge.girders[0]);
  const live_load::PreparedInfluenceLines lines(analysis.live_influence);
  const std::vector<live_load::MovingLoadEnvelope> envelopes =
      live_load::compute_moving_load_envelopes(lines, {&permit.model}, policy.vehicles);
  const capacity::GirderCapacity capacity(bridge, bridge.girders[0]);
  GirderRatingInputs in = inputs(analysis, capacity, policy);
  in.material = bridge.materials.kind;
  in.adtt = 2500;
  in.load_models = {{&permit.model, &envelopes[0]}};
  const GirderRating rating = rate_girder_line(in);
  const LevelRating& level = rating.load_models[0].levels[0];
  REQUIRE(level.factors.size() == 2);
  CHECK(level.factors[1].limit_state == LimitState::service_i);
  CHECK(level.factors[1].gamma_ll == Approx(1.00));  // policy service_i_permit (MBE Table 6A.4.2.2-1, from memory)

  // By hand (elastic cracked section, textbook): 24 kd^2 / 2 = n As (56 - kd);
  // Icr = 24 kd^3 / 3 + n As (56 - kd)^2; fs = n M (d - kd) / Icr; fR = 0.9
  // fy = 54 ksi (MBE 6A.5.4.2.2b, from memory); RF = (fR - fs,D) / (1.0 fs,L).
  const Real n = 29000.0 / 3600.0;
  const Real nas = n * 20;
  const Real kd = (-nas + std::sqrt(nas * nas + 2 * 24 * nas * 56)) / 24;
  const Real icr = 24 * kd * kd * kd / 3 + nas * (56 - kd) * (56 - kd);
  const Real ss = icr / (n * (56 - kd));
  const Real fs_dead = (1500 + 250) * 12 / ss;
  const Real fs_live = 0.6 * 1.33 * 1500 * 12 / ss;
  const PointRating* mid = at_midspan(level, LimitState::service_i, RatedEffect::positive_moment);
  REQUIRE(mid != nullptr);
  CHECK(mid->fibre == "tension steel");
  TP_CHECK_CLOSE(mid->result.rating_factor, (54 - fs_dead) / fs_live, kHand, 1.0);
  TP_CHECK_CLOSE(kd, 21.52, 1e-3, 1.0);  // the neutral axis depth as worked by hand above
}
