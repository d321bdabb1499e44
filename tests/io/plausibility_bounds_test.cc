#include "engine/io/plausibility_bounds.h"

#include <catch2/catch.hpp>

#include "engine/io/yaml_parser.h"
#include "tests/io/diagnostic_search.h"

using namespace tenthpoint;
using namespace tenthpoint::io;
using tenthpoint::test::describe_all;
using tenthpoint::test::find_diagnostic;

namespace {

Diagnostics check(std::string_view yaml, units::UnitSystem system) {
  const YamlParseResult parsed = parse_yaml(yaml, "inline.yaml");
  REQUIRE(parsed.root.has_value());
  Diagnostics out;
  check_plausibility(*parsed.root, system, out);
  return out;
}

}  // namespace

// The bounds are common practice (the span of values on highway girder
// bridges, widened); the unit factors are exact (NIST SP 811 B.8:
// 1 ksi = 6.894757 MPa, 1 ft = 12 in).
TEST_CASE("a yield stress typed in psi warns and names the slip", "[io][plausibility]") {
  const Diagnostics d = check("materials:\n  steel: {fy: 50000}\n", units::UnitSystem::us);
  REQUIRE(d.size() == 1);
  CHECK(d[0].severity == Severity::warning);
  CHECK(d[0].field == "materials.steel.fy");
  CHECK(d[0].message.find("looks like psi; expected ksi") != std::string::npos);
}

TEST_CASE("SI values in a US file and US values in an SI file are recognised", "[io][plausibility]") {
  // 345 MPa is Grade 50 steel; in a ksi file it reads as 345 ksi.
  CHECK(find_diagnostic(check("materials:\n  steel: {fy: 345}\n", units::UnitSystem::us), Severity::warning,
                        "looks like MPa; expected ksi") != nullptr);
  // 50 (ksi) in an MPa file is 50 MPa, below any structural steel.
  CHECK(find_diagnostic(check("materials:\n  steel: {fy: 50}\n", units::UnitSystem::si), Severity::warning,
                        "looks like ksi; expected MPa") != nullptr);
  // A 30 m span typed in millimetres.
  CHECK(find_diagnostic(check("geometry:\n  spans: [30000]\n", units::UnitSystem::si), Severity::warning,
                        "looks like millimetres; expected m") != nullptr);
  // 150 pcf typed in a kcf field.
  CHECK(find_diagnostic(check("materials:\n  deck_concrete: {fc: 4, unit_weight: 150}\n", units::UnitSystem::us),
                        Severity::warning, "looks like pcf") != nullptr);
}

TEST_CASE("plausible values draw no warning", "[io][plausibility]") {
  const Diagnostics d = check(
      "geometry:\n  spans: [70, 240]\nmaterials:\n  steel: {fy: 50, E: 29000}\n  deck_concrete: {fc: 4, unit_weight: "
      "0.150}\n"
      "girders:\n  - {spacing: 8.5}\n",
      units::UnitSystem::us);
  INFO(describe_all(d));
  CHECK(d.empty());
}

TEST_CASE("a span over 1000 ft warns", "[io][plausibility]") {
  // 30000 ft is neither feet nor inches of a real span; no slip is named.
  const Diagnostics d = check("geometry:\n  spans: [70, 30000]\n", units::UnitSystem::us);
  REQUIRE(d.size() == 1);
  CHECK(d[0].field == "geometry.spans[1]");
  CHECK(d[0].message.find("expected 3 to 1000 ft") != std::string::npos);
  CHECK(d[0].message.find("looks like") == std::string::npos);
}

TEST_CASE("section properties implying an absurd depth warn", "[io][plausibility]") {
  // W33x130: A = 38.3 in^2, I = 6710 in^4 (from memory of the AISC tables)
  // gives r = 13.2 in, a depth of 29 to 46 in: plausible. The same I typed
  // in mm^4-sized digits in a US file implies a depth of hundreds of feet.
  const char* good = "sections:\n  - properties:\n      noncomposite: {area: 38.3, inertia: 6710}\n";
  CHECK(check(good, units::UnitSystem::us).empty());
  const char* bad = "sections:\n  - properties:\n      noncomposite: {area: 38.3, inertia: 2792950000}\n";
  const Diagnostics d = check(bad, units::UnitSystem::us);
  REQUIRE(d.size() == 1);
  CHECK(d[0].message.find("implies a section about") != std::string::npos);
  CHECK(d[0].field == "sections[0].properties.noncomposite.inertia");
}

TEST_CASE("every plausibility bound has a reason and an ordered range", "[io][plausibility]") {
  for (const PlausibilityBound& b : plausibility_bounds()) {
    INFO(b.field);
    CHECK(b.low_us < b.high_us);
    CHECK_FALSE(b.reason.empty());
    CHECK_FALSE(b.what.empty());
  }
}
