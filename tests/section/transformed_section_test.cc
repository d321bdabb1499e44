#include "engine/section/transformed_section.h"

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

// Round-off of a few sums of products of O(1) numbers.
constexpr double kExact = 1e-12;

TEST_CASE("a single rectangle has the textbook b h^3 / 12 about its mid-height", "[section]") {
  TransformedSection s;
  s.add_rectangle(0.3, 0.5, 0.2);
  // Closed form: A = b h, ybar = bottom + h/2, I = b h^3 / 12 (any mechanics text).
  TP_CHECK_CLOSE(s.area(), 0.3 * 0.5, kExact, 1.0);
  TP_CHECK_CLOSE(s.centroid(), 0.2 + 0.25, kExact, 1.0);
  TP_CHECK_CLOSE(s.inertia(), 0.3 * 0.125 / 12, kExact, 1.0);
}

TEST_CASE("two stacked rectangles follow the parallel-axis theorem", "[section]") {
  TransformedSection s;
  s.add_rectangle(2.0, 1.0, 0.0);  // A = 2 at y = 0.5
  s.add_rectangle(1.0, 2.0, 1.0);  // A = 2 at y = 2.0
  // Hand computation: ybar = (2*0.5 + 2*2)/4 = 1.25;
  // I = 2/12 + 2*0.75^2 + 8/12 + 2*0.75^2 = 0.8333... + 2.25 = 3.08333...
  TP_CHECK_CLOSE(s.centroid(), 1.25, kExact, 1.0);
  TP_CHECK_CLOSE(s.inertia(), 2.0 / 12 + 8.0 / 12 + 4 * 0.5625, kExact, 1.0);
}

TEST_CASE("a transformation factor scales a part's area and inertia alike", "[section]") {
  TransformedSection plain;
  plain.add_rectangle(0.5, 0.2, 0.0);
  TransformedSection transformed;
  // Width / n is the transformed-section method: width 4.0 at factor 1/8.
  transformed.add_rectangle(4.0, 0.2, 0.0, 1.0 / 8.0);
  TP_CHECK_CLOSE(transformed.area(), plain.area(), kExact, 1.0);
  TP_CHECK_CLOSE(transformed.inertia(), plain.inertia(), kExact, 1.0);
}

TEST_CASE("a lumped area adds A d^2 and no own inertia", "[section]") {
  TransformedSection s;
  s.add_area(1.0, 1.0);
  s.add_area(1.0, -1.0);
  // Two unit areas 2 apart: centroid midway, I = 2 * 1 * 1^2.
  TP_CHECK_CLOSE(s.centroid(), 0.0, kExact, 1.0);
  TP_CHECK_CLOSE(s.inertia(), 2.0, kExact, 1.0);
}

}  // namespace
}  // namespace tenthpoint::section
