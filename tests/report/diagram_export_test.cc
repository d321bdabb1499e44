#include "engine/report/diagram_export.h"

#include <cmath>

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include "tests/support/approx.h"

using namespace tenthpoint;

namespace {

// A 60 ft simple span of one prismatic girder, with a 1 kip/ft DC1 load.
model::Bridge simple_span() {
  model::Bridge b;
  b.identity.structure_id = "TEST-SIMPLE";
  b.units = units::UnitSystem::us;
  b.traffic.clear_roadway_width = 24 * units::kFoot;
  b.geometry.span_lengths = {60 * units::kFoot};
  b.geometry.supports = {model::SupportKind::pin, model::SupportKind::roller};
  b.materials.kind = model::MaterialKind::rolled_steel;
  b.materials.steel = model::Steel{36 * units::kKsi, std::nullopt, 29000 * units::kKsi};
  model::SectionDefinition s;
  s.id = "W";
  s.properties = model::SectionProperties{};
  s.properties->noncomposite.area = 0.02;
  s.properties->noncomposite.inertia = 0.003;
  b.sections.push_back(s);
  model::GirderLine g;
  g.id = "G1";
  g.count = 4;
  g.spacing = 7 * units::kFoot;
  g.segments.push_back({0, 60 * units::kFoot, "W", std::nullopt, std::nullopt, {}});
  b.girders.push_back(g);
  model::DeadLoad d;
  d.component = model::DeadLoadComponent::dc1;
  d.description = "beam and slab";
  d.shape = model::UniformLoad{1.0 * units::kKipPerFoot, {}, {}};
  b.dead_loads.push_back(d);
  return b;
}

}  // namespace

TEST_CASE("diagram data is written in the bridge file's units", "[report][diagrams]") {
  const model::Bridge b = simple_span();
  std::vector<analysis::GirderLineAnalysis> lines;
  lines.push_back(analysis::analyse_girder_line(b, b.girders[0]));
  const nlohmann::json doc = nlohmann::json::parse(report::diagrams_json(lines, units::UnitSystem::us));
  CHECK(doc["units"]["moment"] == "kip-ft");
  const auto& girder = doc["girders"][0];
  // Midspan is analysis point "span 1 0.5L" (station 30 ft).
  std::size_t mid = 0;
  for (std::size_t i = 0; i < girder["points"].size(); ++i)
    if (std::abs(girder["points"][i]["station"].get<double>() - 30.0) < 1e-9) mid = i;
  // Simple span under w = 1 kip/ft: M = wL^2/8 = 450 kip-ft (textbook closed form).
  const auto& dc1 = girder["dead_loads"][0];
  CHECK(dc1["component"] == "DC1");
  TP_CHECK_CLOSE(dc1["moment"][mid].get<double>(), 450.0, 1e-9, 1.0);
  // Its influence line peaks at L/4 = 15 kip-ft per kip under the section (textbook).
  for (const auto& curve : girder["influence_lines"]) {
    if (curve["curve"] != "moment" || std::abs(curve["point_station"].get<double>() - 30.0) > 1e-9) continue;
    double peak = 0;
    for (const auto& v : curve["value"]) peak = std::max(peak, v.get<double>());
    TP_CHECK_CLOSE(peak, 15.0, 1e-9, 1.0);
  }
  // The CSV carries the same number in the same unit.
  const std::string csv = report::diagrams_csv(lines, units::UnitSystem::us);
  CHECK(csv.rfind("girder,kind,curve,point,point_station,x,value,unit\n", 0) == 0);
  CHECK(csv.find(",dead_load,DC1 moment,span 1 0.5L,30,30,450,kip-ft\n") != std::string::npos);
}

TEST_CASE("the same diagrams in SI carry SI units and converted values", "[report][diagrams]") {
  const model::Bridge b = simple_span();
  std::vector<analysis::GirderLineAnalysis> lines;
  lines.push_back(analysis::analyse_girder_line(b, b.girders[0]));
  const nlohmann::json doc = nlohmann::json::parse(report::diagrams_json(lines, units::UnitSystem::si));
  CHECK(doc["units"]["moment"] == "kN-m");
  const auto& m = doc["girders"][0]["dead_loads"][0]["moment"];
  double peak = 0;
  for (const auto& v : m) peak = std::max(peak, v.get<double>());
  // 450 kip-ft x 1.3558179483 kN-m per kip-ft (NIST SP 811 B.8).
  TP_CHECK_CLOSE(peak, 450.0 * 1.3558179483314, 1e-9, 1.0);
}
