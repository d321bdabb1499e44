// The bridge-to-analysis builder: structural system per stage and the sharing
// of dead loads among girders, checked against closed forms.
#include "engine/analysis/girder_line_analysis.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

namespace {

constexpr Real kFt = units::kFoot;
constexpr Real kKip = units::kKip;
// Equilibrium of exact solutions is limited only by rounding of the solve.
constexpr double kExact = 1e-9;

model::ElasticSection prismatic(Real inertia) {
  model::ElasticSection s;
  s.area = 0.03;
  s.inertia = inertia;
  return s;
}

// Two equal 100 ft spans of precast girders made continuous for live load,
// one interior line of 3 girders and one exterior line of 2, with given
// properties so that only the builder is under test.
model::Bridge two_span_bridge(model::Continuity continuity) {
  model::Bridge b;
  b.identity.structure_id = "TEST-2SPAN";
  b.traffic.clear_roadway_width = 40 * kFt;
  b.geometry.span_lengths = {100 * kFt, 100 * kFt};
  b.geometry.supports = {model::SupportKind::pin, model::SupportKind::roller, model::SupportKind::roller};
  b.geometry.continuity = {continuity};
  b.materials.kind = model::MaterialKind::prestressed_concrete;
  b.materials.composite = true;
  // E only scales EI uniformly here, so its value does not change any result.
  b.materials.girder_concrete =
      model::Concrete{6.0 * units::kKsi, 5000 * units::kKsi, 0.150 * units::kKip / std::pow(kFt, 3)};
  b.materials.deck_concrete =
      model::Concrete{4.0 * units::kKsi, 3600 * units::kKsi, 0.150 * units::kKip / std::pow(kFt, 3)};
  model::SectionDefinition s;
  s.id = "S";
  s.properties = model::SectionProperties{prismatic(0.05), prismatic(0.12), prismatic(0.18), std::nullopt};
  b.sections.push_back(s);
  for (auto [id, pos, count] :
       {std::tuple{"INT", model::GirderPosition::interior, 3}, std::tuple{"EXT", model::GirderPosition::exterior, 2}}) {
    model::GirderLine g;
    g.id = id;
    g.position = pos;
    g.count = count;
    g.spacing = 8 * kFt;
    if (pos == model::GirderPosition::exterior) g.overhang = 4 * kFt;
    g.segments.push_back({0, 200 * kFt, "S", std::nullopt, std::nullopt, {}});
    b.girders.push_back(g);
  }
  return b;
}

model::DeadLoad load(model::DeadLoadComponent c, model::LoadScope scope, model::DistributionRule rule,
                     model::DeadLoadShape shape, std::vector<std::string> girders = {}) {
  model::DeadLoad d;
  d.component = c;
  d.description = "test";
  d.scope = scope;
  d.rule = rule;
  d.shape = shape;
  d.girders = std::move(girders);
  return d;
}

std::size_t point_at(const InfluenceLines& il, Real station) {
  for (std::size_t i = 0; i < il.points.size(); ++i)
    if (std::abs(il.points[i].station - station) < 1e-6) return i;
  FAIL("no analysis point at station " << station);
  return 0;
}

}  // namespace

TEST_CASE("cross-section dead loads are shared by the stated rule", "[analysis][builder]") {
  model::Bridge b = two_span_bridge(model::Continuity::continuous);
  const Real w = 1.0 * kKip / kFt;
  b.dead_loads = {
      load(model::DeadLoadComponent::dc2, model::LoadScope::cross_section, model::DistributionRule::equal,
           model::UniformLoad{w, {}, {}}),
      load(model::DeadLoadComponent::dc2, model::LoadScope::cross_section, model::DistributionRule::tributary_width,
           model::UniformLoad{w, {}, {}}),
      load(model::DeadLoadComponent::dc2, model::LoadScope::cross_section, model::DistributionRule::exterior_only,
           model::UniformLoad{w, {}, {}}),
  };
  const model::GirderLine& interior = b.girders[0];
  const model::GirderLine& exterior = b.girders[1];
  // Hand computation (common practice: tributary width = spacing inside,
  // spacing/2 + overhang outside): 5 girders; tributary widths 8, 8, 8 and
  // 8 ft at the exteriors (4 + 4); total 40 ft.
  const Real equal = w / 5;
  const Real tributary_int = w * 8.0 / 40.0;
  const Real tributary_ext = w * 8.0 / 40.0;
  TP_CHECK_CLOSE(girder_dead_loads(b, interior, model::DeadLoadComponent::dc2).uniform, equal + tributary_int, kExact,
                 1.0);
  TP_CHECK_CLOSE(girder_dead_loads(b, exterior, model::DeadLoadComponent::dc2).uniform, equal + tributary_ext + w / 2,
                 kExact, 1.0);
}

TEST_CASE("a wearing surface load is thickness times width times unit weight", "[analysis][builder]") {
  model::Bridge b = two_span_bridge(model::Continuity::continuous);
  const Real gamma = 0.140 * units::kKip / (kFt * kFt * kFt);  // 140 pcf bituminous overlay (common practice)
  b.dead_loads = {load(model::DeadLoadComponent::dw, model::LoadScope::cross_section, model::DistributionRule::equal,
                       model::WearingSurface{3 * units::kInch, gamma, std::nullopt, true})};
  // 3 in x 40 ft x 0.140 kcf = 1.40 kip/ft over 5 girders = 0.28 kip/ft.
  TP_CHECK_CLOSE(girder_dead_loads(b, b.girders[0], model::DeadLoadComponent::dw).uniform / (kKip / kFt), 0.28, kExact,
                 1.0);
}

TEST_CASE("precast spans made continuous carry DC1 as simple spans and DC2 as a continuous beam",
          "[analysis][builder]") {
  model::Bridge b = two_span_bridge(model::Continuity::simple_made_continuous);
  const Real w = 1.0 * kKip / kFt;
  b.dead_loads = {load(model::DeadLoadComponent::dc1, model::LoadScope::per_girder, model::DistributionRule::equal,
                       model::UniformLoad{w, {}, {}}),
                  load(model::DeadLoadComponent::dc2, model::LoadScope::per_girder, model::DistributionRule::equal,
                       model::UniformLoad{w, {}, {}})};
  const GirderLineAnalysis a = analyse_girder_line(b, b.girders[0]);
  const Real l = 100 * kFt;
  const std::size_t mid = point_at(a.live_influence, 0.5 * l);
  const std::size_t pier = point_at(a.live_influence, l);
  const auto& dc1 = a.component(model::DeadLoadComponent::dc1).effects;
  const auto& dc2 = a.component(model::DeadLoadComponent::dc2).effects;
  // Simple span: M = wl^2/8 at midspan, 0 over the pier (textbook closed form).
  TP_CHECK_CLOSE(dc1.moment[mid], w * l * l / 8, kExact, w * l * l);
  TP_CHECK_CLOSE(dc1.moment[pier], 0.0, kExact, w * l * l);
  // Two equal continuous spans: support moment -wl^2/8, centre reaction
  // 10wl/8 (AISC Steel Construction Manual, Table 3-23, case 29).
  TP_CHECK_CLOSE(dc2.moment[pier], -w * l * l / 8, kExact, w * l * l);
  TP_CHECK_CLOSE(dc2.reactions[1], 10 * w * l / 8, kExact, w * l);
  // DC1 as simple spans: the pier takes wl (one half span from each side).
  TP_CHECK_CLOSE(dc1.reactions[1], w * l, kExact, w * l);
}

TEST_CASE("points of interest and section-loss regions become analysis points", "[analysis][builder]") {
  model::Bridge b = two_span_bridge(model::Continuity::continuous);
  b.points_of_interest.push_back({37.0 * kFt, "splice", {}});
  model::Inspection insp;
  insp.date = CalendarDate{2025, 6, 1};
  insp.section_loss.push_back(
      {"EXT", 3.0 * kFt, 11.0 * kFt, model::SectionElement::web, 0.1 * units::kInch, std::nullopt, "", {}});
  b.inspections.push_back(insp);
  const GirderLayout ext = girder_layout(b, b.girders[1]);
  const GirderLayout in = girder_layout(b, b.girders[0]);
  CHECK(ext.named_points.size() == 3);  // splice + loss start + loss end
  CHECK(in.named_points.size() == 1);   // the loss is on the exterior line only
  const GirderLineAnalysis a = analyse_girder_line(b, b.girders[1]);
  point_at(a.live_influence, 3.0 * kFt);
  point_at(a.live_influence, 11.0 * kFt);
  point_at(a.live_influence, 37.0 * kFt);
}

TEST_CASE("hinges inside a span make a suspended span that statics alone settles", "[analysis][builder]") {
  // 50-100-50 ft with hinges 20 ft into the middle span from each pier: the
  // 60 ft suspended span is simply supported on the cantilever tips (a
  // statically determinate cantilever-suspended girder).
  model::Bridge b = two_span_bridge(model::Continuity::continuous);
  b.geometry.span_lengths = {50 * kFt, 100 * kFt, 50 * kFt};
  b.geometry.supports = {model::SupportKind::pin, model::SupportKind::roller, model::SupportKind::roller,
                         model::SupportKind::roller};
  b.geometry.continuity = {model::Continuity::continuous, model::Continuity::continuous};
  b.geometry.hinges = {70 * kFt, 130 * kFt};
  for (model::GirderLine& g : b.girders) g.segments = {{0, 200 * kFt, "S", std::nullopt, std::nullopt, {}}};
  const Real w = 1.0 * kKip / kFt;
  b.dead_loads = {load(model::DeadLoadComponent::dc2, model::LoadScope::per_girder, model::DistributionRule::equal,
                       model::UniformLoad{w, {}, {}})};
  const GirderLineAnalysis a = analyse_girder_line(b, b.girders[0]);
  const auto& dc2 = a.component(model::DeadLoadComponent::dc2).effects;
  const std::size_t hinge = point_at(a.live_influence, 70 * kFt);
  const std::size_t pier = point_at(a.live_influence, 50 * kFt);
  const std::size_t mid = point_at(a.live_influence, 100 * kFt);
  // Statics (textbook): hinge shear = w*60/2 = 30w; pier moment =
  // -(30w*20 + w*20^2/2) = -800w kip-ft; suspended-span centre w*60^2/8.
  const Real ft2 = kFt * kFt;
  TP_CHECK_CLOSE(dc2.moment[hinge], 0.0, kExact, w * 1e4 * ft2);
  TP_CHECK_CLOSE(dc2.moment[pier], -800 * w * ft2, kExact, w * 1e4 * ft2);
  TP_CHECK_CLOSE(dc2.moment[mid], w * 3600 * ft2 / 8, kExact, w * 1e4 * ft2);
  CHECK(a.live_model->degree_of_indeterminacy() == 0);
}
