#include "engine/capacity/condition_system_factors.h"

#include <catch2/catch.hpp>

#include "engine/io/policy_reader.h"
#include "tests/capacity/capacity_test_support.h"

namespace tenthpoint::capacity {
namespace {

model::Policy shipped_policy() {
  io::PolicyReadResult result = io::read_shipped_policy("default");
  REQUIRE(result.ok());
  return *result.policy;
}

model::Inspection inspection(int year, int superstructure) {
  model::Inspection i;
  i.date = CalendarDate{year, 6, 1};
  i.superstructure_condition = superstructure;
  return i;
}

// Four rolled-steel girder lines at 8 ft: no system-factor rule of the
// shipped policy matches (MBE Table 6A.4.2.4-1, REFERENCE.md section 3, from
// memory), so phi_s = 1.00.
model::Bridge bridge(int superstructure) {
  model::Bridge b;
  b.materials.kind = model::MaterialKind::rolled_steel;
  model::GirderLine g;
  g.id = "G";
  g.count = 4;
  g.spacing = test::ft(8);
  b.girders = {g};
  b.inspections = {inspection(2020, superstructure)};
  return b;
}

TEST_CASE("the condition rating maps to phi_c by MBE 6A.4.2.3", "[capacity]") {
  // MBE 6A.4.2.3 and its commentary (REFERENCE.md section 3, from memory):
  // good or satisfactory (6 or more) 1.00, fair (5) 0.95, poor (4 or less) 0.85.
  const model::Policy policy = shipped_policy();
  const std::pair<int, double> table[] = {{9, 1.00}, {7, 1.00}, {6, 1.00}, {5, 0.95}, {4, 0.85}, {2, 0.85}};
  for (const auto& [rating, phi_c] : table) {
    INFO("superstructure " << rating);
    const ConditionSystemFactors f = condition_system_factors(bridge(rating), policy, model::ForceEffect::moment, {});
    CHECK(f.condition == Approx(phi_c));
    CHECK_THAT(f.condition_source, Catch::Contains("condition-factor table"));
  }
}

TEST_CASE("phi_c phi_s is held at the policy's lower limit of 0.85 (MBE 6A.4.2.1)", "[capacity]") {
  // A welded two-girder bridge: phi_s = 0.85 (MBE Table 6A.4.2.4-1, from
  // memory); condition 4: phi_c = 0.85; 0.85 x 0.85 = 0.7225 < 0.85 -> 0.85.
  model::Bridge b = bridge(4);
  b.materials.kind = model::MaterialKind::welded_plate_girder;
  b.girders[0].count = 2;
  const ConditionSystemFactors f = condition_system_factors(b, shipped_policy(), model::ForceEffect::moment, {});
  CHECK(f.condition == Approx(0.85));
  CHECK(f.system == Approx(0.85));
  CHECK_THAT(f.system_source, Catch::Contains("welded-two-girder"));
  CHECK(f.lower_limit == Approx(0.85));
  CHECK(f.lower_limit_applied);
  CHECK(f.product == Approx(0.85));
  CHECK_THAT(f.product_source, Catch::StartsWith("phi_c phi_s = 0.7225 raised to the lower limit 0.85"));
}

TEST_CASE("a product above the limit is kept as it is", "[capacity]") {
  const ConditionSystemFactors f =
      condition_system_factors(bridge(5), shipped_policy(), model::ForceEffect::moment, {});
  CHECK(f.product == Approx(0.95));
  CHECK_FALSE(f.lower_limit_applied);
}

TEST_CASE("phi_s is 1.0 for shear whatever the girder system (MBE 6A.4.2.4)", "[capacity]") {
  model::Bridge b = bridge(6);
  b.materials.kind = model::MaterialKind::welded_plate_girder;
  b.girders[0].count = 2;
  b.rating.system_factor = 0.80;
  const ConditionSystemFactors f = condition_system_factors(b, shipped_policy(), model::ForceEffect::shear, {});
  CHECK(f.system == 1.0);
  CHECK_THAT(f.system_source, Catch::Contains("for shear"));
}

TEST_CASE("factors given in the rating request override the tables", "[capacity]") {
  model::Bridge b = bridge(4);
  b.rating.condition_factor = 0.90;
  b.rating.system_factor = 0.95;
  const ConditionSystemFactors f = condition_system_factors(b, shipped_policy(), model::ForceEffect::moment, {});
  CHECK(f.condition == 0.90);
  CHECK(f.system == 0.95);
  CHECK_THAT(f.condition_source, Catch::StartsWith("rating.condition_factor given"));
  CHECK_THAT(f.system_source, Catch::StartsWith("rating.system_factor given"));
  CHECK(f.product == Approx(0.855));
}

TEST_CASE("rating as of an earlier date uses the older inspection's condition", "[capacity]") {
  model::Bridge b = bridge(6);
  b.inspections.push_back(inspection(2025, 4));
  const model::Policy policy = shipped_policy();
  CHECK(condition_system_factors(b, policy, model::ForceEffect::moment, {}).condition == Approx(0.85));
  CHECK(condition_system_factors(b, policy, model::ForceEffect::moment, CalendarDate{2022, 1, 1}).condition ==
        Approx(1.00));
}

TEST_CASE("with no inspection in force phi_c must be given", "[capacity]") {
  model::Bridge b = bridge(6);
  const Diagnostic e = test::first_error([&] {
    (void)condition_system_factors(b, shipped_policy(), model::ForceEffect::moment, CalendarDate{2010, 1, 1});
  });
  CHECK(e.field == "rating.condition_factor");
  CHECK(
      e.message ==
      "no inspection on or before 2010-01-01 to take the superstructure condition from; give rating.condition_factor");
}

}  // namespace
}  // namespace tenthpoint::capacity
