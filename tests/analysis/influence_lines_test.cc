#include "engine/analysis/influence_lines.h"

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

TEST_CASE("smoke", "[analysis]") {
  const Real l = 30.48;
  LineGirderModel model(continuous_girder("B1", {l, l}), FlexuralRigidity::uniform(2 * l, 1e9));
  const InfluenceLines il = compute_influence_lines(model);
  const auto* rb = il.support(1);
  REQUIRE(rb);
  const Real a = 0.6 * l;
  CHECK(rb->reaction.value(a) == Approx(a / l + a * (l * l - a * a) / (2 * l * l * l)));
}
