#include "engine/distribution/dynamic_allowance.h"

#include <catch2/catch.hpp>

#include "engine/core/errors.h"
#include "engine/core/units.h"
#include "tests/distribution/distribution_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::distribution {
namespace {

constexpr double kRoundTrip = 1e-9;  // ft -> m in the reader and the policy

model::Policy policy_for(const model::Bridge& bridge) {
  auto read = io::read_policy_for_bridge(bridge);
  REQUIRE(read.ok());
  return *read.policy;
}

TEST_CASE("LRFR IM is the policy's standard 0.33 unless a riding surface is named", "[distribution]") {
  // LRFD 3.6.2.1: IM = 33 %; MBE C6A.4.4.3 (from memory): 10 % for a smooth surface.
  auto bridge = test::load("ev-0112-willow-run.yaml");
  const auto policy = policy_for(bridge);
  CHECK(lrfr_dynamic_allowance(bridge, policy).fraction == Approx(0.33));
  bridge.rating.riding_surface = "smooth";
  CHECK(lrfr_dynamic_allowance(bridge, policy).fraction == Approx(0.10));
  bridge.rating.riding_surface = "glassy";
  CHECK_THROWS_AS(lrfr_dynamic_allowance(bridge, policy), InputError);
}

TEST_CASE("LFR impact 50/(L+125): 0.2222 for the 100 ft span of EV-0207", "[distribution]") {
  // Std. Spec. 3.8.2.1 (from memory): 50 / (100 + 125) = 0.2222.
  const auto bridge = test::load("ev-0207-quarry-hill.yaml");
  const auto im = lfr_impact_positive_moment(bridge, policy_for(bridge), 0);
  TP_CHECK_CLOSE(im.fraction, 50.0 / 225.0, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(im.length / units::kFoot, 100.0, kRoundTrip, 1.0);
}

TEST_CASE("LFR impact is capped at 0.30 for the 40 ft spans of EV-0058; negative moment uses the mean span",
          "[distribution]") {
  const auto bridge = test::load("ev-0058-harrow-lane.yaml");  // 40, 50, 40 ft
  const auto policy = policy_for(bridge);
  // 50 / (40 + 125) = 0.303 > 0.30.
  CHECK(lfr_impact_positive_moment(bridge, policy, 0).fraction == Approx(0.30));
  // Std. Spec. 3.8.2.2 (from memory): (40 + 50)/2 = 45 ft, 50 / 170 = 0.2941.
  TP_CHECK_CLOSE(lfr_impact_negative_moment(bridge, policy, 1).fraction, 50.0 / 170.0, kRoundTrip, 1.0);
}

TEST_CASE("LFR impact for shear takes the loaded length from the point to the far support", "[distribution]") {
  const auto bridge = test::load("ev-0112-willow-run.yaml");  // 2 x 70 ft
  const auto policy = policy_for(bridge);
  // At the end: L = 70 ft, 50/195. At 20 ft: L = 70 - 20 = 50 ft, 50/175.
  TP_CHECK_CLOSE(lfr_impact_shear(bridge, policy, 0.0).fraction, 50.0 / 195.0, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(lfr_impact_shear(bridge, policy, 20 * units::kFoot).fraction, 50.0 / 175.0, kRoundTrip, 1.0);
  // At 100 ft in span 2 the far support is the abutment at 140 ft: L = 40 ft,
  // 50 / 165 = 0.303, capped at 0.30.
  CHECK(lfr_impact_shear(bridge, policy, 100 * units::kFoot).fraction == Approx(0.30));
}

}  // namespace
}  // namespace tenthpoint::distribution
