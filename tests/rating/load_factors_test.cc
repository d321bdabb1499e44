#include "engine/rating/load_factors.h"

#include <catch2/catch.hpp>

#include "engine/core/errors.h"
#include "engine/io/policy_reader.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::rating;

namespace {
model::Policy default_policy() {
  const io::PolicyReadResult r = io::read_shipped_policy("default");
  REQUIRE(r.ok());
  return *r.policy;
}
}  // namespace

TEST_CASE("legal-load factors interpolate linearly in ADTT between the table's rows", "[rating][load_factors]") {
  // MBE Table 6A.4.4.2.3a-1 as in ../shared/REFERENCE.md section 3 (from
  // memory): 1.30 at ADTT <= 1000, 1.45 at ADTT >= 5000 or unknown.
  const model::LrfrFactors f = default_policy().lrfr;
  const auto legal = [&](std::optional<Real> adtt) {
    return live_load_factor(f, model::VehicleCategory::legal, model::RatingLevel::operating, LimitState::strength_i,
                            adtt)
        .gamma_ll;
  };
  CHECK(legal(500.0) == Approx(1.30));
  CHECK(legal(1000.0) == Approx(1.30));
  TP_CHECK_CLOSE(legal(3000.0), 1.375, 1e-12, 1.0);  // halfway: (1.30 + 1.45) / 2
  CHECK(legal(5000.0) == Approx(1.45));
  CHECK(legal(20000.0) == Approx(1.45));
  CHECK(legal(std::nullopt) == Approx(1.45));
}

TEST_CASE("design-load factors come from the policy by level and limit state", "[rating][load_factors]") {
  // MBE Table 6A.4.2.2-1 as in ../shared/REFERENCE.md section 3 (from memory).
  const model::LrfrFactors f = default_policy().lrfr;
  using model::RatingLevel;
  using model::VehicleCategory;
  CHECK(live_load_factor(f, VehicleCategory::design, RatingLevel::inventory, LimitState::strength_i, {}).gamma_ll ==
        Approx(1.75));
  CHECK(live_load_factor(f, VehicleCategory::design, RatingLevel::operating, LimitState::strength_i, {}).gamma_ll ==
        Approx(1.35));
  CHECK(live_load_factor(f, VehicleCategory::design, RatingLevel::inventory, LimitState::service_ii, {}).gamma_ll ==
        Approx(1.30));
  CHECK(live_load_factor(f, VehicleCategory::design, RatingLevel::operating, LimitState::service_ii, {}).gamma_ll ==
        Approx(1.00));
  CHECK(live_load_factor(f, VehicleCategory::design, RatingLevel::inventory, LimitState::service_iii, {}).gamma_ll ==
        Approx(0.80));
  CHECK(dead_load_factor_dw(f.strength_i, false) == Approx(1.50));
  CHECK(dead_load_factor_dw(f.strength_i, true) == Approx(1.25));
  CHECK(f.strength_i.dc == Approx(1.25));
}

TEST_CASE("a permit factor interpolates in ADTT and loading ratio and clamps at the table edges",
          "[rating][load_factors]") {
  model::PermitType p;
  p.id = "test";
  // A two-by-two table of invented round numbers (the test checks the
  // interpolation, not the values).
  p.rows = {{100, 10, 1.0}, {100, 40, 2.0}, {5000, 10, 3.0}, {5000, 40, 4.0}};
  CHECK(permit_live_load_factor(p, 100.0, 10, 5000).gamma_ll == Approx(1.0));
  CHECK(permit_live_load_factor(p, 5000.0, 40, 5000).gamma_ll == Approx(4.0));
  CHECK(permit_live_load_factor(p, 2550.0, 25, 5000).gamma_ll == Approx(2.5));
  CHECK(permit_live_load_factor(p, 1e6, 1e6, 5000).gamma_ll == Approx(4.0));
  CHECK(permit_live_load_factor(p, std::nullopt, 10, 5000).gamma_ll == Approx(3.0));
}

TEST_CASE("a case the policy has no factor for is an input error, never a guess", "[rating][load_factors]") {
  model::LrfrFactors f = default_policy().lrfr;
  f.legal.rows.clear();
  CHECK_THROWS_AS(
      live_load_factor(f, model::VehicleCategory::legal, model::RatingLevel::operating, LimitState::strength_i, 100.0),
      InputError);
  CHECK_THROWS_AS(
      live_load_factor(f, model::VehicleCategory::permit, model::RatingLevel::operating, LimitState::strength_i, 100.0),
      InputError);
}
