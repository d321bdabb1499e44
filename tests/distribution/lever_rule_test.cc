#include "engine/distribution/lever_rule.h"

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/support/approx.h"

namespace tenthpoint::distribution {
namespace {

// Statics is exact up to rounding.
constexpr double kTight = 1e-12;

Real ft(Real x) { return x * units::kFoot; }

DistributionOptions lrfd_options() {
  DistributionOptions o;
  o.multiple_presence = {1.20, 1.00, 0.85, 0.65};  // LRFD Table 3.6.1.1.2-1 (REFERENCE.md §1 [S])
  return o;
}

TEST_CASE("the exterior lever rule for S = 8.5 ft and de = 1.25 ft is statics of the wheels about the hinge",
          "[distribution]") {
  // Hand computation (LRFD 4.6.2.2.2d lever rule; wheel 2 ft from the barrier
  // face, LRFD 3.6.1.3.1): the outer wheel is 2 - 1.25 = 0.75 ft inside the
  // exterior web, the inner one 6.75 ft; R = 0.5 (7.75 + 1.75) / 8.5 = 0.5588.
  const auto rule = exterior_lever_rule(ft(8.5), ft(1.25), 2, lrfd_options());
  REQUIRE(rule.reaction_by_trucks.size() == 2);
  TP_CHECK_CLOSE(rule.reaction_by_trucks[0], 0.5 * (7.75 + 1.75) / 8.5, kTight, 1.0);
  // The second truck's nearest wheel is 6.75 + 4 = 10.75 ft out, past the hinge.
  TP_CHECK_CLOSE(rule.reaction_by_trucks[1], 0.5 * (7.75 + 1.75) / 8.5, kTight, 1.0);
  const auto f = apply_lane_factors(rule.reaction_by_trucks, {1.20, 1.00});
  TP_CHECK_CLOSE(f.one_lane, 1.2 * 0.5 * 9.5 / 8.5, kTight, 1.0);  // 0.6706
  REQUIRE(f.multi_lane);
  TP_CHECK_CLOSE(*f.multi_lane, 0.5 * 9.5 / 8.5, kTight, 1.0);
  CHECK(f.multi_lane_trucks == 2);
}

TEST_CASE("a wheel on the overhang gives the exterior girder more than its wheel", "[distribution]") {
  // de = 3 ft: outer wheel 1 ft outboard of the web, R = 0.5 (9 + 3) / 8 = 0.75.
  const auto rule = exterior_lever_rule(ft(8.0), ft(3.0), 1, lrfd_options());
  TP_CHECK_CLOSE(rule.reaction_by_trucks[0], 0.5 * (9.0 + 3.0) / 8.0, kTight, 1.0);
}

TEST_CASE("the interior lever rule for S = 18 ft packs two trucks about the girder", "[distribution]") {
  // One truck: a wheel on the girder and one 6 ft away, 0.5 (1 + 12/18).
  // Two trucks, wheels at -6, 0, 4, 10 ft: 0.5 (12 + 18 + 14 + 8) / 18.
  const auto rule = interior_lever_rule(ft(18), ft(18), 2, lrfd_options());
  TP_CHECK_CLOSE(rule.reaction_by_trucks[0], 0.5 * (1.0 + 12.0 / 18.0), kTight, 1.0);
  TP_CHECK_CLOSE(rule.reaction_by_trucks[1], 0.5 * 52.0 / 18.0, kTight, 1.0);
}

TEST_CASE("the rigid-body reaction of five girders at 8.5 ft follows LRFD 4.6.2.2.2d-1", "[distribution]") {
  // X_ext = 17 ft, sum x^2 = 2 (17^2 + 8.5^2) = 722.5 ft^2. Barrier face
  // 18.25 ft from the centroid; truck 1's resultant 18.25 - 2 - 3 = 13.25 ft,
  // truck 2's 12 ft further in, 1.25 ft.
  const auto rule = rigid_body_reaction(5, ft(8.5), ft(1.25), 2, lrfd_options());
  TP_CHECK_CLOSE(rule.reaction_by_trucks[0], 1.0 / 5 + 17.0 * 13.25 / 722.5, 1e-12, 1.0);
  TP_CHECK_CLOSE(rule.reaction_by_trucks[1], 2.0 / 5 + 17.0 * (13.25 + 1.25) / 722.5, 1e-12, 1.0);
}

TEST_CASE("options without multiple presence factors are refused", "[distribution]") {
  DistributionOptions o;
  std::string why;
  CHECK_FALSE(o.is_valid(&why));
  CHECK(why == "multiple_presence is empty: take it from the policy");
  CHECK(lrfd_options().is_valid(&why));
}

}  // namespace
}  // namespace tenthpoint::distribution
