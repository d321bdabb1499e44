#include "engine/io/bridge_reader.h"

#include <cmath>
#include <filesystem>
#include <utility>
#include <variant>

#include <catch2/catch.hpp>

#include "engine/core/errors.h"
#include "engine/io/inventory_listing.h"
#include "tests/io/diagnostic_search.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::io;
using tenthpoint::test::describe_all;
using tenthpoint::test::find_diagnostic;
using tenthpoint::test::source_path;

namespace {

using Flat = std::vector<std::pair<std::string, double>>;

void put(Flat& out, const std::string& name, double value) { out.emplace_back(name, value); }
void put(Flat& out, const std::string& name, const std::optional<double>& value) {
  out.emplace_back(name + (value ? "" : " (absent)"), value.value_or(0.0));
}

void put_elastic(Flat& out, const std::string& name, const model::ElasticSection& s) {
  put(out, name + ".area", s.area);
  put(out, name + ".inertia", s.inertia);
  put(out, name + ".s_top", s.section_modulus_top);
  put(out, name + ".s_bottom", s.section_modulus_bottom);
}

// Every number of a bridge, named, in a fixed order: two bridges read from
// equivalent files must flatten to the same list.
Flat flatten(const model::Bridge& b) {
  Flat out;
  put(out, "adtt", b.traffic.adtt);
  put(out, "width", b.traffic.clear_roadway_width);
  put(out, "lanes", b.traffic.lanes);
  put(out, "skew", b.geometry.skew);
  for (double s : b.geometry.span_lengths) put(out, "span", s);
  put(out, "fy", b.materials.steel->yield_strength);
  put(out, "fu", b.materials.steel->tensile_strength);
  put(out, "Es", b.materials.steel->modulus);
  put(out, "fc", b.materials.deck_concrete->compressive_strength);
  put(out, "Ec", b.materials.deck_concrete->modulus);
  put(out, "wc", b.materials.deck_concrete->unit_weight);
  for (const model::SectionDefinition& s : b.sections) {
    if (s.properties) put_elastic(out, s.id + ".noncomposite", s.properties->noncomposite);
    const auto* g = s.description ? std::get_if<model::SteelIGirder>(&*s.description) : nullptr;
    if (g != nullptr) {
      for (const model::Plate& p : {g->top_flange, g->web, g->bottom_flange}) {
        put(out, s.id + ".plate.width", p.width);
        put(out, s.id + ".plate.thickness", p.thickness);
      }
      if (g->bottom_cover_plate) put(out, s.id + ".cover.width", g->bottom_cover_plate->width);
      put(out, s.id + ".stiffeners", g->transverse_stiffener_spacing);
    }
    if (s.deck) {
      put(out, s.id + ".deck.thickness", s.deck->thickness);
      put(out, s.id + ".deck.width", s.deck->effective_width);
      put(out, s.id + ".deck.haunch", s.deck->haunch);
      for (const model::BarLayer& bar : s.deck->longitudinal_bars) {
        put(out, s.id + ".bar.area", bar.area);
        put(out, s.id + ".bar.depth", bar.depth);
      }
    }
  }
  for (const model::GirderLine& g : b.girders) {
    put(out, g.id + ".spacing", g.spacing);
    put(out, g.id + ".overhang", g.overhang);
    put(out, g.id + ".curb", g.curb_distance);
    for (const model::Segment& s : g.segments) {
      put(out, g.id + ".segment.start", s.start);
      put(out, g.id + ".segment.end", s.end);
    }
    for (double x : g.brace_stations) put(out, g.id + ".brace", x);
  }
  for (const model::DeadLoad& d : b.dead_loads) {
    if (const auto* u = std::get_if<model::UniformLoad>(&d.shape)) {
      put(out, d.description + ".w", u->intensity);
      put(out, d.description + ".start", u->start);
      put(out, d.description + ".end", u->end);
    } else if (const auto* p = std::get_if<model::PointLoad>(&d.shape)) {
      put(out, d.description + ".P", p->force);
      put(out, d.description + ".x", p->station);
    } else if (const auto* w = std::get_if<model::WearingSurface>(&d.shape)) {
      put(out, d.description + ".t", w->thickness);
      put(out, d.description + ".gamma", w->unit_weight);
      put(out, d.description + ".width", w->width);
    }
  }
  for (const model::GivenCapacity& c : b.capacity.given) {
    put(out, "given.end", c.end);
    put(out, "given.M+", c.moment_positive);
    put(out, "given.M-", c.moment_negative);
    put(out, "given.V", c.shear);
  }
  for (const model::Inspection& i : b.inspections)
    for (const model::SectionLoss& l : i.section_loss) {
      put(out, "loss.start", l.start);
      put(out, "loss.end", l.end);
      put(out, "loss.thickness", l.thickness_loss);
      put(out, "loss.percent", l.percent_loss);
    }
  for (const model::NamedPoint& p : b.points_of_interest) put(out, "poi", p.station);
  return out;
}

}  // namespace

TEST_CASE("every demo bridge in inventory/ reads without errors", "[io][bridge][inventory]") {
  // Globbed at test time, so bridges added to the demo inventory are covered.
  const InventoryListing listing = list_inventory({source_path("inventory")});
  REQUIRE_FALSE(listing.files.empty());
  for (const std::string& file : listing.files) {
    const BridgeReadResult r = read_bridge_file(file);
    INFO(file << "\n" << describe_all(r.diagnostics));
    CHECK(r.ok());
    CHECK_FALSE(has_errors(r.diagnostics));
  }
}

// Round trip through the exact conversion factors of NIST SP 811 Appendix B:
// the SI twin was written from the US file to 12 significant digits, so the
// models agree to 1e-9 relative (the tolerance the readers promise, with
// three orders of margin over the written digits).
TEST_CASE("a US file and its SI twin read to the same internal model", "[io][bridge][units]") {
  const BridgeReadResult us = read_bridge_file(source_path("tests/data/good/two-span-us.yaml"));
  const BridgeReadResult si = read_bridge_file(source_path("tests/data/good/two-span-si.yaml"));
  INFO(describe_all(us.diagnostics) << describe_all(si.diagnostics));
  REQUIRE(us.ok());
  REQUIRE(si.ok());
  CHECK(us.bridge->units == units::UnitSystem::us);
  CHECK(si.bridge->units == units::UnitSystem::si);
  const Flat a = flatten(*us.bridge);
  const Flat b = flatten(*si.bridge);
  REQUIRE(a.size() == b.size());
  for (std::size_t i = 0; i < a.size(); ++i) {
    INFO(a[i].first << " vs " << b[i].first);
    CHECK(a[i].first == b[i].first);
    TP_CHECK_CLOSE(b[i].second, a[i].second, 1e-9, 1e-12);
  }
}

TEST_CASE("values are converted to SI as they are read", "[io][bridge][units]") {
  const BridgeReadResult r = read_bridge_file(source_path("tests/data/good/two-span-us.yaml"));
  REQUIRE(r.ok());
  const model::Bridge& b = *r.bridge;
  // 70 ft = 21.336 m; 36 ksi = 248.2113 MPa; 10 degrees = 0.174533 rad (NIST SP 811 B.8, exact factors).
  TP_CHECK_CLOSE(b.geometry.span_lengths[0], 21.336, 1e-12, 1.0);
  TP_CHECK_CLOSE(b.materials.steel->yield_strength, 248.211262554061e6, 1e-12, 1.0);
  TP_CHECK_CLOSE(b.geometry.skew, 10.0 * 3.14159265358979323846 / 180.0, 1e-12, 1.0);
  // 0.0625 in of web lost = 1.5875 mm.
  TP_CHECK_CLOSE(*b.inspections[0].section_loss[0].thickness_loss, 1.5875e-3, 1e-12, 1.0);
  // The haunched segment keeps both ends and its taper.
  const model::Segment& haunch = b.girders[1].segments[2];
  CHECK(haunch.end_section == std::optional<std::string>("W33x130"));
  CHECK(haunch.taper == model::Taper::parabolic);
  CHECK(b.capacity.mode == model::CapacitySource::given);
  REQUIRE(b.rating.as_of.has_value());
  CHECK(b.rating.as_of->to_iso() == "2024-06-30");
  CHECK(b.find_section("W33x130-CP")->properties.has_value());
}

TEST_CASE("lanes are derived from the clear roadway width when omitted", "[io][bridge]") {
  // AASHTO LRFD 3.6.1.1.1: INT(30 / 12) = 2 design lanes.
  const BridgeReadResult r = read_bridge_file(source_path("tests/data/good/two-span-us.yaml"));
  REQUIRE(r.ok());
  CHECK(r.bridge->traffic.lanes == 2);
  CHECK(r.bridge->traffic.lanes_from_width);
}

namespace {

std::string minimal_bridge(std::string_view materials = "  steel: {fy: 50}\n") {
  return std::string(R"(format_version: 1
units: US
identity: {structure_id: T-1, name: Test, feature_carried: Road, feature_crossed: Creek, year_built: 1990, district: N}
traffic: {clear_roadway_width: 44.0}
geometry: {spans: [80.0], supports: [pin, roller]}
materials:
  kind: rolled_steel
  composite: false
)") + std::string(materials) +
         R"(sections:
  - id: S1
    properties:
      noncomposite: {area: 38.3, inertia: 6710}
girders:
  - {id: G1, position: interior, count: 5, spacing: 8.0, segments: [{start: 0, end: 80, section: S1}]}
dead_loads: []
capacity: {mode: computed}
rating: {method: LRFR}
)";
}

}  // namespace

TEST_CASE("moduli left out take the values the schema promises", "[io][bridge]") {
  const BridgeReadResult r = read_bridge_text(minimal_bridge(), "inline.yaml");
  INFO(describe_all(r.diagnostics));
  REQUIRE(r.ok());
  // AASHTO LRFD 6.4.1: Es = 29000 ksi = 199.948 GPa.
  TP_CHECK_CLOSE(r.bridge->materials.steel->modulus, 29000.0 * 6.894757293168361e6, 1e-12, 1.0);
  // LRFD 3.6.1.1.1: INT(44 / 12) = 3 lanes.
  CHECK(r.bridge->traffic.lanes == 3);
}

TEST_CASE("a file with three independent errors gets three diagnostics on three lines", "[io][bridge][errors]") {
  // Schema errors: the year, the support kind, the girder count.
  std::string text = minimal_bridge();
  text.replace(text.find("year_built: 1990"), 16, "year_built: 1700");
  text.replace(text.find("supports: [pin, roller]"), 23, "supports: [pin, rolller]");
  text.replace(text.find("count: 5"), 8, "count: 0");
  const BridgeReadResult r = read_bridge_text(text, "inline.yaml");
  INFO(describe_all(r.diagnostics));
  CHECK_FALSE(r.ok());
  REQUIRE(r.diagnostics.size() == 3);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "must be at least 1800 (got 1700)", 3) != nullptr);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "did you mean 'roller'?", 5) != nullptr);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "must be at least 1 (got 0)", 15) != nullptr);
  CHECK(r.diagnostics[1].field == "geometry.supports[1]");
}

TEST_CASE("three independent semantic errors are all reported", "[io][bridge][errors]") {
  // Rules beyond the schema: the support count, an unknown section, a station past the girder.
  std::string text = minimal_bridge();
  text.replace(text.find("supports: [pin, roller]"), 23, "supports: [pin, roller, roller]");
  text.replace(text.find("section: S1}"), 12, "section: S2}");
  text.replace(
      text.find("dead_loads: []"), 14,
      "dead_loads:\n  - {component: DC1, description: diaphragm, scope: per_girder, point: {force: 1, station: 90}}");
  const BridgeReadResult r = read_bridge_text(text, "inline.yaml");
  INFO(describe_all(r.diagnostics));
  CHECK_FALSE(r.ok());
  REQUIRE(count(r.diagnostics, Severity::error) == 3);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "expected 2 supports for 1 span (one per span end), got 3", 5));
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "unknown section 'S2' (did you mean 'S1'?)", 15));
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "station 90 ft is beyond the end of the girder (80 ft", 17));
}

TEST_CASE("bad YAML inline is reported with its line", "[io][bridge][errors]") {
  const BridgeReadResult r =
      read_bridge_text("format_version: 1\nunits: US\nidentity:\n  name: [unclosed\n", "inline.yaml");
  CHECK_FALSE(r.ok());
  REQUIRE(r.diagnostics.size() == 1);
  CHECK(r.diagnostics[0].message.rfind("yaml syntax:", 0) == 0);
  CHECK(r.diagnostics[0].where.file == "inline.yaml");
  CHECK(r.diagnostics[0].where.line >= 4);
}

TEST_CASE("load_bridge throws InputError holding every diagnostic", "[io][bridge][errors]") {
  const std::string path = source_path("tests/data/bad/three-errors.yaml");
  try {
    (void)load_bridge(path);
    FAIL("expected InputError");
  } catch (const InputError& e) {
    CHECK(e.diagnostics().size() == 3);
    CHECK(std::string(e.what()).find("three-errors.yaml:9:15: error: identity.year_built:") != std::string::npos);
  }
  Diagnostics warnings;
  const model::Bridge bridge = load_bridge(source_path("tests/data/bad/fy-in-psi.yaml"), &warnings);
  CHECK(bridge.identity.structure_id == "T-BAD");
  CHECK(count(warnings, Severity::warning) == 1);
}

TEST_CASE("given capacities that miss part of a girder draw a warning", "[io][bridge]") {
  std::string text = minimal_bridge();
  text.replace(text.find("capacity: {mode: computed}"), 26,
               "capacity:\n  mode: given\n  given: [{start: 0, end: 60, moment_positive: 1000, source: test}]");
  const BridgeReadResult r = read_bridge_text(text, "inline.yaml");
  INFO(describe_all(r.diagnostics));
  CHECK(r.ok());
  // Tenth points of the 80 ft span past 60 ft: 64, 72 and 80 ft.
  CHECK(find_diagnostic(r.diagnostics, Severity::warning,
                        "girder 'G1' has no given capacity at 3 of its tenth points (stations 64, 72, 80 ft)") !=
        nullptr);
}

TEST_CASE("a single span with continuity entries and a multi-span without them are errors", "[io][bridge]") {
  std::string one = minimal_bridge();
  one.replace(one.find("supports: [pin, roller]}"), 24, "supports: [pin, roller], continuity: [continuous]}");
  CHECK(find_diagnostic(read_bridge_text(one, "x.yaml").diagnostics, Severity::error, "leave continuity out") !=
        nullptr);

  std::string two = minimal_bridge();
  two.replace(two.find("spans: [80.0], supports: [pin, roller]"), 38,
              "spans: [40.0, 40.0], supports: [pin, roller, roller]");
  CHECK(find_diagnostic(read_bridge_text(two, "x.yaml").diagnostics, Severity::error,
                        "missing field 'continuity': 2 spans need 1 entry") != nullptr);
}

TEST_CASE("hinges inside spans are read in the file's units and must not sit on a support", "[io][bridge]") {
  std::string text = minimal_bridge();
  text.replace(text.find("spans: [80.0], supports: [pin, roller]"), 38,
               "spans: [40.0, 40.0], supports: [pin, roller, roller], continuity: [continuous], hinges: [52.0]");
  text.replace(text.find("end: 80"), 7, "end: 80");
  const BridgeReadResult good = read_bridge_text(text, "x.yaml");
  REQUIRE(good.ok());
  REQUIRE(good.bridge->geometry.hinges.size() == 1);
  CHECK(good.bridge->geometry.hinges[0] == Approx(52.0 * 0.3048).epsilon(1e-12));  // ft to m, exact definition

  std::string on_support = text;
  on_support.replace(on_support.find("hinges: [52.0]"), 14, "hinges: [40.0]");
  const BridgeReadResult bad = read_bridge_text(on_support, "x.yaml");
  const Diagnostic* d = find_diagnostic(bad.diagnostics, Severity::error, "sits on support 2");
  REQUIRE(d != nullptr);
  CHECK(d->field == "geometry.hinges[0]");
  CHECK(d->where.line == 5);
}
