// GirderCapacity memoises the demand-independent part of shear() per exact
// (station, side, moment sign). The reference here is the calculation of a
// freshly constructed GirderCapacity, which has no memo, and whose values are
// checked against hand calculations in girder_capacity_test.cc. Equality is
// exact: bit for bit on every number, character for character on every
// string of the resistance and its trace.
#include <cstring>
#include <filesystem>
#include <string>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/capacity/girder_capacity.h"
#include "engine/io/bridge_reader.h"
#include "tests/capacity/capacity_test_support.h"

namespace tenthpoint::capacity {
namespace {

using section::Side;
using test::kip;
using test::kip_in;

bool same_bits(double a, double b) { return std::memcmp(&a, &b, sizeof a) == 0; }

void check_same_step(const CalculationStep& a, const CalculationStep& b) {
  CHECK(a.symbol == b.symbol);
  CHECK(a.description == b.description);
  CHECK(a.expression == b.expression);
  CHECK(same_bits(a.value, b.value));
  CHECK(a.quantity == b.quantity);
  CHECK(a.reference == b.reference);
}

void check_same(const Resistance& memo, const Resistance& fresh) {
  CHECK(memo.status == fresh.status);
  CHECK(same_bits(memo.nominal, fresh.nominal));
  CHECK(same_bits(memo.phi, fresh.phi));
  CHECK(same_bits(memo.factored, fresh.factored));
  CHECK(memo.article == fresh.article);
  CHECK(memo.reason == fresh.reason);
  CHECK(memo.warnings == fresh.warnings);
  CHECK(memo.trace.title == fresh.trace.title);
  CHECK(memo.trace.notes == fresh.trace.notes);
  REQUIRE(memo.trace.inputs.size() == fresh.trace.inputs.size());
  for (std::size_t i = 0; i < memo.trace.inputs.size(); ++i)
    check_same_step(memo.trace.inputs[i], fresh.trace.inputs[i]);
  REQUIRE(memo.trace.steps.size() == fresh.trace.steps.size());
  for (std::size_t i = 0; i < memo.trace.steps.size(); ++i) check_same_step(memo.trace.steps[i], fresh.trace.steps[i]);
  CHECK(memo.flange_stress.has_value() == fresh.flange_stress.has_value());
}

// Demands of both moment signs, repeated at one station as the rating asks:
// the memo entry of one sign must not serve the other.
std::vector<std::optional<ShearDemand>> demands() {
  return {std::nullopt, ShearDemand{kip_in(300), kip(15), 0}, ShearDemand{-kip_in(4500), kip(120), 0},
          ShearDemand{kip_in(9000), kip(40), 0}, ShearDemand{kip_in(300), kip(15), 0}};
}

void check_bridge(const model::Bridge& bridge, const CapacityOptions& options) {
  INFO(bridge.source_file);
  for (const model::GirderLine& line : {bridge.girders.front(), bridge.girders.back()}) {
    const GirderCapacity memo(bridge, line, options);
    const Real length = memo.length();
    // Ends, a tenth point, a quarter point and midspan of the line: the
    // memo is asked twice for each (two passes), as the rating does.
    const std::vector<Real> stations = {0.0, 0.1 * length, 0.25 * length, 0.5 * length, length};
    for (int pass = 0; pass < 2; ++pass) {
      for (const Real x : stations) {
        for (const Side side : {Side::left, Side::right}) {
          // The rating asks only for the inner side at the girder's ends.
          if ((x == 0.0 && side == Side::left) || (x == length && side == Side::right)) continue;
          for (const std::optional<ShearDemand>& demand : demands()) {
            INFO("girder " << line.id << " at " << x << " m, pass " << pass);
            const GirderCapacity fresh(bridge, line, options);
            check_same(memo.shear(x, side, demand), fresh.shear(x, side, demand));
          }
        }
      }
    }
  }
}

TEST_CASE("memoised shear equals a fresh GirderCapacity's for every concrete demo bridge", "[capacity][memo]") {
  int concrete = 0;
  for (const auto& entry : std::filesystem::directory_iterator(std::string(TENTHPOINT_SOURCE_DIR) + "/inventory")) {
    if (entry.path().extension() != ".yaml") continue;
    const model::Bridge bridge = io::load_bridge(entry.path().string());
    if (model::is_steel(bridge.materials.kind)) continue;
    ++concrete;
    check_bridge(bridge, {});
  }
  CHECK(concrete >= 4);  // RC and PS, LRFR and LFR, in the demo inventory
}

TEST_CASE("memoised shear by the general procedure equals a fresh GirderCapacity's", "[capacity][memo]") {
  // LRFD 5.7.3.4.2: beta and theta depend on the demand, so only the section
  // and dv may be reused between demands.
  for (const char* file : {"ev-0031-pasture-lane.yaml", "ev-0207-quarry-hill.yaml"}) {
    model::Bridge bridge = io::load_bridge(std::string(TENTHPOINT_SOURCE_DIR) + "/inventory/" + file);
    bridge.rating.method = model::RatingMethod::lrfr;
    CapacityOptions options;
    options.shear_method = ConcreteShearMethod::general;
    check_bridge(bridge, options);
  }
}

TEST_CASE("memoised shear keeps the steel and given answers of a fresh GirderCapacity", "[capacity][memo]") {
  for (const char* file : {"ev-0134-cooper-hollow.yaml", "ev-0042-grange-hall.yaml"}) {
    const model::Bridge bridge = io::load_bridge(std::string(TENTHPOINT_SOURCE_DIR) + "/inventory/" + file);
    check_bridge(bridge, {});
  }
}

}  // namespace
}  // namespace tenthpoint::capacity
