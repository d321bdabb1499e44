#include "engine/section/taper_law.h"

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

TEST_CASE("a linear taper is halfway at mid-length", "[section]") {
  const TaperLaw law(model::Taper::linear, true);
  // d = (1 - t) d0 + t d1 with t = xi: the average at mid-length (closed form).
  CHECK(law.fraction(0.0) == 0.0);
  CHECK(law.fraction(0.5) == 0.5);
  CHECK(law.fraction(1.0) == 1.0);
}

TEST_CASE("a parabolic haunch has risen a quarter of the way at mid-length, from either end", "[section]") {
  // Parabola tangent at the shallow end: d = shallow + (deep - shallow) s^2,
  // s = distance from the shallow end / length (closed form); s = 1/2 gives 1/4.
  const TaperLaw rising(model::Taper::parabolic, true);
  CHECK(rising.fraction(0.5) == 0.25);
  CHECK(rising.fraction(0.0) == 0.0);
  CHECK(rising.fraction(1.0) == 1.0);
  const TaperLaw falling(model::Taper::parabolic, false);
  // Shallow end at the segment's end: the depth there is the end depth, and
  // at mid-length d = end + (start - end) / 4, i.e. t = 3/4.
  CHECK(falling.fraction(0.5) == 0.75);
  CHECK(falling.fraction(0.0) == 0.0);
  CHECK(falling.fraction(1.0) == 1.0);
}

TEST_CASE("a parabolic haunch leaves the shallow end with zero slope", "[section]") {
  const TaperLaw rising(model::Taper::parabolic, true);
  const TaperLaw falling(model::Taper::parabolic, false);
  // Forward difference at the shallow end is O(h) for a parabola tangent there.
  const double h = 1e-4;
  TP_CHECK_CLOSE(rising.fraction(h) / h, 0.0, 1e-3, 1.0);
  TP_CHECK_CLOSE((1.0 - falling.fraction(1.0 - h)) / h, 0.0, 1e-3, 1.0);
  // And the slope at the deep end is 2 (d/dxi of xi^2 at 1).
  TP_CHECK_CLOSE((rising.fraction(1.0) - rising.fraction(1.0 - h)) / h, 2.0, 1e-3, 1.0);
}

}  // namespace
}  // namespace tenthpoint::section
