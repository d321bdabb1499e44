#include "engine/capacity/given_capacity_lookup.h"

#include <catch2/catch.hpp>

#include "tests/capacity/capacity_test_support.h"

namespace tenthpoint::capacity {
namespace {

using section::Side;

model::GivenCapacity region(double start, double end, double m_pos, std::vector<std::string> girders = {}) {
  model::GivenCapacity g;
  g.girders = std::move(girders);
  g.start = start;
  g.end = end;
  g.moment_positive = m_pos;
  g.shear = m_pos / 10;
  g.source = "1994 rating";
  g.where = SourceLocation{"b.yaml", 12, 7};
  return g;
}

// The lookup rules are those stated in given_capacity_lookup.h (common
// practice for partitioned regions; no external source).
TEST_CASE("a station on a shared boundary takes the region on the side asked for", "[capacity]") {
  const std::vector<model::GivenCapacity> given = {region(0, 10, 1.0), region(10, 30, 2.0)};
  CHECK(find_given_capacity(given, "G", 10, Side::left)->moment_positive == 1.0);
  CHECK(find_given_capacity(given, "G", 10, Side::right)->moment_positive == 2.0);
  CHECK(find_given_capacity(given, "G", 5, Side::left)->moment_positive == 1.0);
  // Ends are inclusive: the girder's start seen from the left, its end from the right.
  CHECK(find_given_capacity(given, "G", 0, Side::left)->moment_positive == 1.0);
  CHECK(find_given_capacity(given, "G", 30, Side::right)->moment_positive == 2.0);
  CHECK(find_given_capacity(given, "G", 31, Side::right) == nullptr);
}

TEST_CASE("a point entry wins at its station and the girder filter applies", "[capacity]") {
  const std::vector<model::GivenCapacity> given = {region(0, 30, 1.0), region(15, 15, 9.0),
                                                   region(0, 30, 5.0, {"EXT"})};
  CHECK(find_given_capacity(given, "G", 15, Side::left)->moment_positive == 9.0);
  CHECK(find_given_capacity(given, "G", 14, Side::left)->moment_positive == 1.0);
  const std::vector<model::GivenCapacity> exterior_first = {region(0, 30, 5.0, {"EXT"}), region(0, 30, 1.0)};
  CHECK(find_given_capacity(exterior_first, "EXT", 3, Side::left)->moment_positive == 5.0);
  CHECK(find_given_capacity(exterior_first, "INT", 3, Side::left)->moment_positive == 1.0);
}

TEST_CASE("a given resistance carries its source, and loss at the station raises the judgment warning", "[capacity]") {
  const std::vector<model::GivenCapacity> given = {region(0, 30, 1.0e6)};
  model::SectionLoss loss;
  loss.element = model::SectionElement::web;
  loss.start = 0;
  loss.end = 3;
  const Resistance r =
      given_resistance(given, "G", 1.0, Side::right, model::ForceEffect::moment, MomentSign::positive, {loss});
  CHECK(r.status == ResistanceStatus::given);
  CHECK(r.factored == 1.0e6);
  CHECK(r.reason == "1994 rating");
  REQUIRE(r.warnings.size() == 1);
  CHECK_THAT(r.warnings[0], Catch::StartsWith("given capacity not reduced for section loss"));
  CHECK_THAT(r.warnings[0], Catch::Contains("must judge whether the given value (1994 rating) already reflects it"));
  // Shear from the same region.
  CHECK(given_resistance(given, "G", 1.0, Side::right, model::ForceEffect::shear, MomentSign::positive, {}).factored ==
        1.0e5);
}

TEST_CASE("a missing given value is unavailable and names the field to give", "[capacity]") {
  const std::vector<model::GivenCapacity> given = {region(0, 30, 1.0)};
  const Resistance negative =
      given_resistance(given, "G", 1.0, Side::right, model::ForceEffect::moment, MomentSign::negative, {});
  CHECK(negative.status == ResistanceStatus::unavailable);
  CHECK(negative.reason ==
        "b.yaml:12:7: the capacity.given region 0.000 m to 30.000 m has no moment_negative; give it");
  const Resistance outside =
      given_resistance(given, "G", 40.0, Side::right, model::ForceEffect::shear, MomentSign::positive, {});
  CHECK(outside.reason ==
        "no capacity.given region covers station 40.000 m of girder G; give one (capacity mode is given)");
}

}  // namespace
}  // namespace tenthpoint::capacity
