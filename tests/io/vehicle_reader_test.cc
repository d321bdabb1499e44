#include "engine/io/vehicle_reader.h"

#include <catch2/catch.hpp>

#include "tests/io/diagnostic_search.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::io;
using tenthpoint::test::describe_all;
using tenthpoint::test::find_diagnostic;

namespace {

constexpr double kKip = 4448.2216152605;  // N, NIST SP 811 B.8
constexpr double kFoot = 0.3048;          // m
constexpr double kTon = 2.0 * kKip;       // N, the 2000 lb ton of posting

const model::VehicleLibrary& shipped() {
  static const VehicleReadResult read = read_shipped_vehicles("aashto");
  INFO(describe_all(read.diagnostics));
  REQUIRE(read.ok());
  return *read.library;
}

}  // namespace

TEST_CASE("the shipped AASHTO vehicle library reads clean", "[io][vehicles]") {
  const VehicleReadResult read = read_shipped_vehicles("aashto");
  INFO(describe_all(read.diagnostics));
  CHECK(read.ok());
  CHECK(read.diagnostics.empty());
  const VehicleReadResult from_file = read_vehicle_file(test::source_path("engine/data/vehicles/aashto.yaml"));
  CHECK(from_file.ok());
}

// Gross weights from the project's trade reference, section 4 (the table of
// rating vehicles; its values are tagged [M], recalled from memory of the MBE
// figures and the FHWA EV memorandum, except HL-93 which is [C], AASHTO LRFD
// 3.6.1.2.2). The table notes that each vehicle's axles add up to its gross
// weight; this checks the shipped file against it.
TEST_CASE("each shipped vehicle's axle weights add up to its gross weight", "[io][vehicles]") {
  struct Gross {
    const char* train;
    double tons;
  };
  const Gross table[] = {
      {"HL93-TRUCK", 36.0},   // 8 + 32 + 32 kip, LRFD 3.6.1.2.2 [C]
      {"HL93-TANDEM", 25.0},  // 2 x 25 kip, LRFD 3.6.1.2.3 [C]
      {"TYPE-3", 25.0},      {"TYPE-3S2", 36.0}, {"TYPE-3-3", 40.0}, {"SU4", 27.0},  {"SU5", 31.0},
      {"SU6", 34.75},        {"SU7", 38.75},     {"NRL", 40.0},      {"EV2", 28.75},  // 57.5 kip
      {"EV3", 43.0},                                                                  // 86 kip
      {"HS20-TRUCK", 36.0},
  };
  for (const Gross& g : table) {
    INFO(g.train);
    const model::AxleTrain* train = shipped().find_train(g.train);
    REQUIRE(train != nullptr);
    TP_CHECK_CLOSE(train->gross_weight(), g.tons * kTon, 1e-12, 1.0);
    CHECK(train->spacings.size() + 1 == train->axle_weights.size());
  }
  // The one-truck load models carry the same W for rating in tons and posting.
  for (const char* id : {"TYPE-3", "TYPE-3S2", "TYPE-3-3", "SU4", "SU5", "SU6", "SU7", "NRL", "EV2", "EV3"}) {
    INFO(id);
    const model::LoadModel* m = shipped().find_load_model(id);
    REQUIRE(m != nullptr);
    REQUIRE(m->rating_weight.has_value());
    TP_CHECK_CLOSE(*m->rating_weight, shipped().find_train(id)->gross_weight(), 1e-12, 1.0);
  }
}

TEST_CASE("HL-93 is the design truck, the tandem and the two-truck case with the lane load", "[io][vehicles]") {
  // AASHTO LRFD 3.6.1.2.2-3.6.1.2.4 [C] and 3.6.1.3.1 [M: the project reference].
  const model::AxleTrain* truck = shipped().find_train("HL93-TRUCK");
  REQUIRE(truck != nullptr);
  TP_CHECK_CLOSE(truck->axle_weights[0], 8 * kKip, 1e-12, 1.0);
  TP_CHECK_CLOSE(truck->spacings[0].min, 14 * kFoot, 1e-12, 1.0);
  CHECK_FALSE(truck->spacings[0].variable());
  TP_CHECK_CLOSE(truck->spacings[1].min, 14 * kFoot, 1e-12, 1.0);
  TP_CHECK_CLOSE(truck->spacings[1].max, 30 * kFoot, 1e-12, 1.0);
  const model::AxleTrain* tandem = shipped().find_train("HL93-TANDEM");
  TP_CHECK_CLOSE(tandem->spacings[0].min, 4 * kFoot, 1e-12, 1.0);

  const model::LoadModel* hl93 = shipped().find_load_model("HL93");
  REQUIRE(hl93 != nullptr);
  CHECK(hl93->category == model::VehicleCategory::design);
  REQUIRE(hl93->cases.size() == 3);
  for (const model::LoadCase& c : hl93->cases) TP_CHECK_CLOSE(c.lane->intensity, 0.64 * kKip / kFoot, 1e-12, 1.0);
  const model::LoadCase& two = hl93->cases[2];
  CHECK(two.count == 2);
  CHECK(two.train_factor == 0.90);
  CHECK(two.lane->factor == 0.90);
  TP_CHECK_CLOSE(two.gap->min, 50 * kFoot, 1e-12, 1.0);
  TP_CHECK_CLOSE(*two.fixed_variable_spacing, 14 * kFoot, 1e-12, 1.0);
  CHECK(two.between_contraflexure_points_only);
  CHECK(two.applies_to(model::LoadEffect::negative_moment));
  CHECK(two.applies_to(model::LoadEffect::interior_reaction));
  CHECK_FALSE(two.applies_to(model::LoadEffect::positive_moment));
  CHECK(hl93->cases[0].applies_to(model::LoadEffect::shear));
}

TEST_CASE("the NRL's first spacing is variable", "[io][vehicles]") {
  // The project reference gives 6 ft and warns the first spacing may be
  // variable; the shipped range is 6 to 14 ft (from memory of the MBE figure).
  const model::AxleTrain* nrl = shipped().find_train("NRL");
  REQUIRE(nrl != nullptr);
  CHECK(nrl->spacings[0].variable());
  TP_CHECK_CLOSE(nrl->spacings[0].min, 6 * kFoot, 1e-12, 1.0);
  for (std::size_t i = 1; i < nrl->spacings.size(); ++i) CHECK_FALSE(nrl->spacings[i].variable());
}

TEST_CASE("the lane-type legal load and the HS20 lane loading follow the reference", "[io][vehicles]") {
  // MBE 6A.4.4.2.1 [M]: spans over 200 ft take 0.75 x Type 3-3 + 0.2 kip/ft;
  // negative moment and interior reactions take two 0.75 x Type 3-3 30 ft apart + 0.2 kip/ft.
  const model::LoadModel* lane = shipped().find_load_model("LANE-LEGAL");
  REQUIRE(lane != nullptr);
  REQUIRE(lane->cases.size() == 2);
  TP_CHECK_CLOSE(*lane->cases[0].spans.longer_than, 200 * kFoot, 1e-12, 1.0);
  CHECK(lane->cases[0].train_factor == 0.75);
  TP_CHECK_CLOSE(lane->cases[0].lane->intensity, 0.2 * kKip / kFoot, 1e-12, 1.0);
  CHECK(lane->cases[1].count == 2);
  TP_CHECK_CLOSE(lane->cases[1].gap->min, 30 * kFoot, 1e-12, 1.0);
  TP_CHECK_CLOSE(lane->cases[1].gap->max, 30 * kFoot, 1e-12, 1.0);
  CHECK_FALSE(lane->cases[1].applies_to(model::LoadEffect::positive_moment));

  // Standard Specifications 3.7 as quoted by practitioners [C]: 0.64 kip/ft
  // with 18 kip for moment, 26 kip for shear; a second load for negative moment [M].
  const model::LoadModel* hs20 = shipped().find_load_model("HS20");
  REQUIRE(hs20 != nullptr);
  CHECK(hs20->rated_with(model::RatingMethod::lfr));
  CHECK_FALSE(hs20->rated_with(model::RatingMethod::lrfr));
  const model::LoadCase& hs20_lane = hs20->cases[1];
  CHECK_FALSE(hs20_lane.train.has_value());
  TP_CHECK_CLOSE(hs20_lane.lane_concentrated->moment, 18 * kKip, 1e-12, 1.0);
  TP_CHECK_CLOSE(hs20_lane.lane_concentrated->shear, 26 * kKip, 1e-12, 1.0);
  CHECK(hs20_lane.lane_concentrated->second_load_for_negative_moment);
}

TEST_CASE("a bad vehicle file fails with every problem at its line", "[io][vehicles][errors]") {
  const char* text = R"(format_version: 1
units: US
id: bad
name: bad vehicles
axle_trains:
  - {id: T1, name: one, axles: [10, 20, 20], spacings: [14], source: test}
  - {id: T2, name: two, axles: [10, 20], spacings: [[30, 14]], source: test}
  - {id: T1, name: again, axles: [5], spacings: [], source: test}
load_models:
  - id: M1
    name: model
    category: legal
    methods: [LRFR]
    source: test
    cases:
      - {id: c1, train: T3}
      - {id: c2, train: T2, count: 2}
  - {id: M2, name: m, category: truck, methods: [LRFR], source: test, cases: [{id: c, train: T2}]}
)";
  const VehicleReadResult schema_fail = read_vehicle_text(text, "bad-vehicles.yaml");
  INFO(describe_all(schema_fail.diagnostics));
  CHECK_FALSE(schema_fail.ok());
  // The schema error (an unknown category) is reported first; rules beyond
  // the schema wait until the file conforms.
  CHECK(find_diagnostic(
            schema_fail.diagnostics, Severity::error,
            "expected one of: design, legal, specialized_hauling, permit, emergency, lfr_design (got 'truck')",
            18) != nullptr);

  std::string fixed = text;
  fixed.replace(fixed.find("category: truck"), 15, "category: legal");
  const VehicleReadResult r = read_vehicle_text(fixed, "bad-vehicles.yaml");
  INFO(describe_all(r.diagnostics));
  CHECK_FALSE(r.ok());
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "expected 2 spacings for 3 axles", 6) != nullptr);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "got min 30 ft above max 14 ft", 7) != nullptr);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "axle train id 'T1' is already used (line 6)", 8) != nullptr);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "unknown axle train 'T3' (did you mean 'T1'?)", 16) != nullptr);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "2 trains need a gap between them", 17) != nullptr);
}

TEST_CASE("a variable spacing written wrong gets one message naming both forms", "[io][vehicles][errors]") {
  const char* text = R"(format_version: 1
units: US
id: bad
name: bad
axle_trains:
  - {id: T1, name: one, axles: [10, 20], spacings: [fourteen], source: test}
load_models: []
)";
  const VehicleReadResult r = read_vehicle_text(text, "x.yaml");
  INFO(describe_all(r.diagnostics));
  REQUIRE(r.diagnostics.size() == 1);
  CHECK(r.diagnostics[0].message == "expected a number or a list (got 'fourteen')");
  CHECK(r.diagnostics[0].field == "axle_trains[0].spacings[0]");
  CHECK(r.diagnostics[0].where.line == 6);
}

TEST_CASE("a rating weight that differs from its truck draws a warning", "[io][vehicles]") {
  const char* text = R"(format_version: 1
units: US
id: w
name: w
axle_trains:
  - {id: T1, name: one, axles: [16, 17, 17], spacings: [15, 4], source: test}
load_models:
  - {id: M1, name: m, category: legal, methods: [LRFR], rating_weight: 52, source: test, cases: [{id: c, train: T1}]}
)";
  const VehicleReadResult r = read_vehicle_text(text, "x.yaml");
  CHECK(r.ok());
  CHECK(find_diagnostic(r.diagnostics, Severity::warning,
                        "rating weight 52 ton differs from the gross weight of train 'T1' (25 ton)", 8) != nullptr);
}
