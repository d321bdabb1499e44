#include "engine/distribution/lrfd_distribution.h"

#include <cmath>
#include <filesystem>

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/distribution/distribution_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::distribution {
namespace {

// The engine converts the file's inches to metres and back; 1e-9 covers that
// round trip, far below the 4 digits a factor is reported to.
constexpr double kRoundTrip = 1e-9;

// EV-0112 by hand: W33x130 from its plates (bf 11.5, tf 0.855, D 31.39,
// tw 0.580 in), I of an I-shape as the outer rectangle less the two voids
// (textbook closed form); 7.5 in deck on a 1.5 in haunch; n = 9 (the file).
struct WillowRunHand {
  double depth = 31.39 + 2 * 0.855;                                                            // 33.10 in
  double area = 2 * 11.5 * 0.855 + 31.39 * 0.580;                                              // 37.87 in^2
  double inertia = 11.5 * std::pow(depth, 3) / 12 - (11.5 - 0.580) * std::pow(31.39, 3) / 12;  // 6608 in^4
  double eg = depth / 2 + 1.5 + 7.5 / 2;                                                       // 21.80 in
  double kg = 9.0 * (inertia + area * eg * eg);                                                // 2.21e5 in^4
  double ratio = kg / (12.0 * 70.0 * std::pow(7.5, 3));
  double s = 8.5, l = 70.0;
  // LRFD Table 4.6.2.2.2b-1.
  double moment_one = 0.06 + std::pow(s / 14, 0.4) * std::pow(s / l, 0.3) * std::pow(ratio, 0.1);
  double moment_multi = 0.075 + std::pow(s / 9.5, 0.6) * std::pow(s / l, 0.2) * std::pow(ratio, 0.1);
  // LRFD Table 4.6.2.2.3a-1.
  double shear_one = 0.36 + s / 25;
  double shear_multi = 0.2 + s / 12 - std::pow(s / 35, 2);
  // LRFD Table 4.6.2.2.3c-1 at 10 degrees; the moment reduction is nil below 30.
  double shear_skew = 1 + 0.2 * std::pow(1 / ratio, 0.3) * std::tan(10 * units::kDegree);
};

TEST_CASE("EV-0112 interior girder: the LRFD equations with Kg from the W33x130 and the deck", "[distribution]") {
  const auto bridge = test::load("ev-0112-willow-run.yaml");
  const auto options = test::options_for(bridge);
  const auto result = lrfd_distribution(bridge, *bridge.find_girder("G-INT"), options);
  const WillowRunHand hand;

  const auto* pos = result.find(FactorRegion::positive_moment, 0);
  REQUIRE(pos != nullptr);
  CHECK(pos->method == FactorMethod::equation);
  TP_CHECK_CLOSE(*pos->trace.kg_in4, hand.kg, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(*pos->trace.eg_in, hand.eg, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(pos->one_lane, hand.moment_one, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(*pos->multi_lane, hand.moment_multi, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(pos->value, hand.moment_multi, kRoundTrip, 1.0);  // two lanes govern, about 0.660
  CHECK(pos->trace.skew_factor == 1.0);
  CHECK(pos->warnings.empty());

  // Negative moment over the pier: L = (70 + 70)/2 and Kg the mean of the two
  // positive sections, so the same numbers here.
  const auto* neg = result.find(FactorRegion::negative_moment, 1);
  REQUIRE(neg != nullptr);
  TP_CHECK_CLOSE(neg->value, hand.moment_multi, kRoundTrip, 1.0);

  const auto* shear = result.find(FactorRegion::shear, 1);
  REQUIRE(shear != nullptr);
  TP_CHECK_CLOSE(shear->one_lane, hand.shear_one * hand.shear_skew, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(*shear->multi_lane, hand.shear_multi * hand.shear_skew, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(shear->trace.skew_factor, hand.shear_skew, kRoundTrip, 1.0);
}

TEST_CASE("EV-0112 exterior girder: lever rule, e times the interior, and the rigid-body check", "[distribution]") {
  const auto bridge = test::load("ev-0112-willow-run.yaml");
  const auto result = lrfd_distribution(bridge, *bridge.find_girder("G-EXT"), test::options_for(bridge));
  const WillowRunHand hand;
  // Lever rule (LRFD 4.6.2.2.2d): 1.2 x 0.5 (7.75 + 1.75) / 8.5 = 0.6706.
  const double lever_one = 1.2 * 0.5 * 9.5 / 8.5;
  // Rigid body (LRFD 4.6.2.2.2d-1), five girders, X_ext = 17 ft, sum x^2 = 722.5:
  // one lane 1.2 (0.2 + 17 x 13.25 / 722.5) = 0.6141; two lanes
  // 1.0 (0.4 + 17 x 14.5 / 722.5) = 0.7412.
  const double rigid_two = 0.4 + 17.0 * 14.5 / 722.5;

  const auto* pos = result.find(FactorRegion::positive_moment, 0);
  REQUIRE(pos != nullptr);
  TP_CHECK_CLOSE(*pos->lever_one_lane, lever_one, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(*pos->equation_one_lane, lever_one, kRoundTrip, 1.0);
  // e = 0.77 + de/9.1 (LRFD Table 4.6.2.2.2d-1).
  TP_CHECK_CLOSE(*pos->trace.exterior_correction, 0.77 + 1.25 / 9.1, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(*pos->equation_multi_lane, (0.77 + 1.25 / 9.1) * hand.moment_multi, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(*pos->rigid_body, rigid_two, kRoundTrip, 1.0);
  CHECK(pos->method == FactorMethod::rigid_body);
  TP_CHECK_CLOSE(pos->value, rigid_two, kRoundTrip, 1.0);
  CHECK(pos->multiple_presence_one_lane == 1.2);

  const auto* shear = result.find(FactorRegion::shear, 0);
  REQUIRE(shear != nullptr);
  // e = 0.6 + de/10 (LRFD Table 4.6.2.2.3b-1); rigid body governs, then the skew correction.
  TP_CHECK_CLOSE(*shear->equation_multi_lane, (0.6 + 0.125) * hand.shear_multi, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(shear->value, rigid_two * hand.shear_skew, kRoundTrip, 1.0);
}

TEST_CASE("a spacing outside the range of applicability falls back to the lever rule with a warning",
          "[distribution]") {
  auto bridge = test::load("ev-0112-willow-run.yaml");
  for (auto& g : bridge.girders) g.spacing = 18.0 * units::kFoot;
  const auto result = lrfd_distribution(bridge, *bridge.find_girder("G-INT"), test::options_for(bridge));
  const auto* pos = result.find(FactorRegion::positive_moment, 0);
  REQUIRE(pos != nullptr);
  CHECK(pos->method == FactorMethod::lever_rule);
  REQUIRE(pos->warnings.size() == 1);
  CHECK(pos->warnings[0] ==
        "S = 18 ft is outside 3.5 to 16 ft, the range of applicability of LRFD 4.6.2.2; the lever rule is used");
  // Interior lever rule by hand (see lever_rule_test): one truck 1.2 x 0.8333,
  // two trucks 1.0 x 0.5 x 52/18 = 1.444 govern.
  TP_CHECK_CLOSE(pos->one_lane, 1.2 * 0.5 * (1 + 12.0 / 18), kRoundTrip, 1.0);
  TP_CHECK_CLOSE(pos->value, 0.5 * 52.0 / 18, kRoundTrip, 1.0);
}

TEST_CASE("an override in the bridge file wins and is recorded with its reason", "[distribution]") {
  auto bridge = test::load("ev-0112-willow-run.yaml");
  bridge.rating.distribution_overrides.push_back({"G-INT", model::ForceEffect::moment, 0.55, "refined analysis", {}});
  const auto result = lrfd_distribution(bridge, *bridge.find_girder("G-INT"), test::options_for(bridge));
  const auto* pos = result.find(FactorRegion::positive_moment, 0);
  REQUIRE(pos != nullptr);
  CHECK(pos->value == 0.55);
  CHECK(pos->method == FactorMethod::override_value);
  CHECK(pos->override_reason == "refined analysis");
  TP_CHECK_CLOSE(*pos->computed_value, WillowRunHand{}.moment_multi, kRoundTrip, 1.0);
  CHECK(*pos->computed_method == FactorMethod::equation);
  CHECK(result.find(FactorRegion::negative_moment, 1)->value == 0.55);
  CHECK(result.find(FactorRegion::shear, 0)->method != FactorMethod::override_value);
}

TEST_CASE("the EV-0031 slab strip: LRFD 4.6.2.3 strips, and the file's override wins", "[distribution]") {
  const auto bridge = test::load("ev-0031-pasture-lane.yaml");
  const auto result = lrfd_distribution(bridge, *bridge.find_girder("STRIP"), test::options_for(bridge));
  const auto* pos = result.find(FactorRegion::positive_moment, 0);
  REQUIRE(pos != nullptr);
  // L1 = 28 ft, W = 29 strips x 1 ft, W1 = 29 ft (LRFD 4.6.2.3):
  // E1 = 10 + 5 sqrt(28 x 29) = 152.5 in; E = 84 + 1.44 sqrt(28 x 29) = 125.0 in <= 12 x 29 / 2.
  const double root = std::sqrt(28.0 * 29.0);
  TP_CHECK_CLOSE(*pos->trace.strip_one_lane_in, 10 + 5 * root, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(*pos->trace.strip_multi_lane_in, 84 + 1.44 * root, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(*pos->computed_value, 12.0 / (84 + 1.44 * root), kRoundTrip, 1.0);  // 0.0960 lanes per strip
  CHECK(*pos->computed_method == FactorMethod::strip);
  CHECK(pos->method == FactorMethod::override_value);
  CHECK(pos->value == Approx(0.088));
}

TEST_CASE("every girder line of every demo bridge gets finite, positive LRFD factors", "[distribution]") {
  for (const auto& entry : std::filesystem::directory_iterator(std::string(TENTHPOINT_SOURCE_DIR) + "/inventory")) {
    if (entry.path().extension() != ".yaml") continue;
    const auto bridge = io::load_bridge(entry.path().string());
    const auto options = test::options_for(bridge);
    for (const auto& girder : bridge.girders) {
      const auto result = lrfd_distribution(bridge, girder, options);
      INFO(bridge.identity.structure_id << " " << girder.id);
      CHECK(result.factors.size() >= 2 * bridge.geometry.span_lengths.size());
      for (const auto& f : result.factors) {
        INFO(to_string(f.region) << " " << f.index);
        CHECK(std::isfinite(f.value));
        CHECK(f.value > 0);
      }
    }
  }
}

}  // namespace
}  // namespace tenthpoint::distribution
