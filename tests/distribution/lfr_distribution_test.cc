#include "engine/distribution/lfr_distribution.h"

#include <cmath>
#include <filesystem>

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/distribution/distribution_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::distribution {
namespace {

constexpr double kRoundTrip = 1e-9;  // ft -> m -> ft in the reader and back

TEST_CASE("LFR interior girder of EV-0263 at S = 8.5 ft carries S/5.5 = 1.545 wheel lines", "[distribution]") {
  // Std. Spec. 17th ed. Table 3.23.1 (from memory): concrete deck on steel
  // beams, two or more lanes, S/5.5.
  const auto bridge = test::load("ev-0263-ashby-flats.yaml");
  const auto result = lfr_distribution(bridge, *bridge.find_girder("G-INT"), test::options_for(bridge));
  CHECK(result.moment.method == FactorMethod::equation);
  TP_CHECK_CLOSE(result.moment_wheel_lines(), 8.5 / 5.5, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(result.moment_wheel_lines(), 1.545, 1e-3, 1.0);  // the rounded hand value
  TP_CHECK_CLOSE(result.moment.one_lane, 0.5 * 8.5 / 7.0, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(result.moment.value, 0.5 * 8.5 / 5.5, kRoundTrip, 1.0);  // lanes = wheel lines / 2
}

TEST_CASE("LFR exterior girder of EV-0263 by the lever rule", "[distribution]") {
  // Std. Spec. 3.23.2.3.1: de = 0.75 ft, wheels 1.25 and 7.25 ft inside the
  // exterior web, R = 0.5 (7.25 + 1.25) / 8.5 = 0.5 lanes = 1.0 wheel line.
  const auto bridge = test::load("ev-0263-ashby-flats.yaml");
  const auto result = lfr_distribution(bridge, *bridge.find_girder("G-EXT"), test::options_for(bridge));
  CHECK(result.moment.method == FactorMethod::lever_rule);
  TP_CHECK_CLOSE(result.moment.value, 0.5 * (7.25 + 1.25) / 8.5, kRoundTrip, 1.0);
  TP_CHECK_CLOSE(result.moment_wheel_lines(), 1.0, kRoundTrip, 1.0);
}

TEST_CASE("LFR beyond S = 14 ft uses the lever rule for two or more lanes and says so", "[distribution]") {
  auto bridge = test::load("ev-0263-ashby-flats.yaml");
  for (auto& g : bridge.girders) g.spacing = 15.0 * units::kFoot;
  const auto result = lfr_distribution(bridge, *bridge.find_girder("G-INT"), test::options_for(bridge));
  CHECK(result.moment.method == FactorMethod::lever_rule);
  REQUIRE(result.moment.warnings.size() == 2);
  CHECK(result.moment.warnings[0] ==
        "S = 15 ft exceeds 10 ft (concrete deck on steel or prestressed beams): one lane by the lever rule");
  // One truck, interior lever rule: 0.5 (1 + 9/15) = 0.8 lanes.
  TP_CHECK_CLOSE(result.moment.one_lane, 0.5 * (1 + 9.0 / 15), kRoundTrip, 1.0);
}

TEST_CASE("the EV-0031 slab strip: Std. Spec. 3.24.3.2 strip, and the file's override wins", "[distribution]") {
  // E = 4 + 0.06 x 28 = 5.68 ft (from memory); 1 ft strip / (2 E) = 0.0880 lanes.
  const auto bridge = test::load("ev-0031-pasture-lane.yaml");
  const auto result = lfr_distribution(bridge, *bridge.find_girder("STRIP"), test::options_for(bridge));
  CHECK(*result.moment.computed_method == FactorMethod::strip);
  TP_CHECK_CLOSE(*result.moment.computed_value, 1.0 / (2 * 5.68), kRoundTrip, 1.0);
  CHECK(result.moment.method == FactorMethod::override_value);
  CHECK(result.moment.value == Approx(0.088));
  CHECK(result.shear.override_reason.find("same strip width") == 0);
}

TEST_CASE("every girder line of every demo bridge gets finite, positive LFR factors", "[distribution]") {
  for (const auto& entry : std::filesystem::directory_iterator(std::string(TENTHPOINT_SOURCE_DIR) + "/inventory")) {
    if (entry.path().extension() != ".yaml") continue;
    const auto bridge = io::load_bridge(entry.path().string());
    const auto options = test::options_for(bridge);
    for (const auto& girder : bridge.girders) {
      const auto result = lfr_distribution(bridge, girder, options);
      INFO(bridge.identity.structure_id << " " << girder.id);
      CHECK(std::isfinite(result.moment.value));
      CHECK(result.moment.value > 0);
      CHECK(std::isfinite(result.shear.value));
      CHECK(result.shear.value > 0);
    }
  }
}

}  // namespace
}  // namespace tenthpoint::distribution
