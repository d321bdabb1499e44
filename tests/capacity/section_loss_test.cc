#include "engine/capacity/section_loss.h"

#include <catch2/catch.hpp>

#include "tests/capacity/capacity_test_support.h"

namespace tenthpoint::capacity {
namespace {

using section::Side;
using test::in;
using test::in2;
using test::plate;

model::SectionLoss loss(model::SectionElement element, double start, double end, std::optional<double> thickness,
                        std::optional<double> percent) {
  model::SectionLoss l;
  l.girder = "G1";
  l.start = start;
  l.end = end;
  l.element = element;
  l.thickness_loss = thickness;
  l.percent_loss = percent;
  l.where = SourceLocation{"bridge.yaml", 40, 9};
  return l;
}

model::SectionDefinition steel_section() {
  model::SectionDefinition d;
  d.id = "W";
  model::SteelIGirder g;
  g.top_flange = plate(11.5, 0.855);
  g.web = plate(31.39, 0.580);
  g.bottom_flange = plate(11.5, 0.855);
  g.bottom_cover_plate = plate(10, 0.75);
  d.description = g;
  d.deck = model::DeckSlab{in(7.5), in(102), in(1.5), {model::BarLayer{in2(3.4), in(2.5)}}};
  d.properties = model::SectionProperties{};
  return d;
}

TEST_CASE("a loss region includes its ends from the side that faces into it", "[capacity]") {
  // Rule of section_loss.h (as section::Side at section changes; common practice).
  const model::SectionLoss l = loss(model::SectionElement::web, 3.0, 6.0, 0.001, std::nullopt);
  CHECK(loss_covers(l, 4.5, Side::left, 20.0));
  CHECK(loss_covers(l, 3.0, Side::right, 20.0));
  CHECK_FALSE(loss_covers(l, 3.0, Side::left, 20.0));
  CHECK(loss_covers(l, 6.0, Side::left, 20.0));
  CHECK_FALSE(loss_covers(l, 6.0, Side::right, 20.0));
  CHECK_FALSE(loss_covers(l, 7.0, Side::left, 20.0));
  // At the girder's own ends there is one side only.
  const model::SectionLoss start = loss(model::SectionElement::web, 0.0, 3.0, 0.001, std::nullopt);
  CHECK(loss_covers(start, 0.0, Side::left, 20.0));
  const model::SectionLoss end = loss(model::SectionElement::web, 17.0, 20.0, 0.001, std::nullopt);
  CHECK(loss_covers(end, 20.0, Side::right, 20.0));
  // A point loss applies from both sides.
  const model::SectionLoss point = loss(model::SectionElement::web, 5.0, 5.0, 0.001, std::nullopt);
  CHECK(loss_covers(point, 5.0, Side::left, 20.0));
  CHECK(loss_covers(point, 5.0, Side::right, 20.0));
}

TEST_CASE("losses_at keeps the girder line's losses that cover the station", "[capacity]") {
  model::Inspection inspection;
  inspection.section_loss = {loss(model::SectionElement::web, 0, 3, 0.001, std::nullopt),
                             loss(model::SectionElement::bottom_flange, 2, 4, std::nullopt, 10.0)};
  inspection.section_loss.push_back(inspection.section_loss[0]);
  inspection.section_loss.back().girder = "G2";
  CHECK(losses_at(inspection, "G1", 2.5, Side::right, 20).size() == 2);
  CHECK(losses_at(inspection, "G1", 1.0, Side::right, 20).size() == 1);
  CHECK(losses_at(inspection, "G2", 2.5, Side::right, 20).size() == 1);
  CHECK(losses_at(inspection, "G1", 10, Side::right, 20).empty());
}

TEST_CASE("plate losses reduce the plate thickness by the thickness or the percent given", "[capacity]") {
  const DeterioratedSection d =
      apply_section_loss(steel_section(), {loss(model::SectionElement::bottom_flange, 0, 3, std::nullopt, 50.0),
                                           loss(model::SectionElement::web, 0, 3, in(0.125), std::nullopt)});
  REQUIRE(d.reduced());
  const auto& g = std::get<model::SteelIGirder>(*d.section.description);
  // 50 % of the area of a plate of constant width is half its thickness.
  CHECK(g.bottom_flange.thickness == Approx(in(0.4275)));
  CHECK(g.web.thickness == Approx(in(0.455)));
  CHECK(g.top_flange.thickness == Approx(in(0.855)));  // untouched
  CHECK_FALSE(d.section.properties.has_value());       // recomputed from the description
  CHECK(d.applied.size() == 2);
}

TEST_CASE("cover-plate and deck-bar losses act on those parts", "[capacity]") {
  const DeterioratedSection d =
      apply_section_loss(steel_section(), {loss(model::SectionElement::cover_plate, 0, 3, std::nullopt, 15.0),
                                           loss(model::SectionElement::bars, 0, 3, std::nullopt, 20.0)});
  const auto& g = std::get<model::SteelIGirder>(*d.section.description);
  CHECK(g.bottom_cover_plate->thickness == Approx(in(0.75 * 0.85)));
  CHECK(d.section.deck->longitudinal_bars[0].area == Approx(in2(3.4 * 0.8)));
}

TEST_CASE("a loss the section has nothing for is skipped with a warning", "[capacity]") {
  model::SectionDefinition d = steel_section();
  std::get<model::SteelIGirder>(*d.description).bottom_cover_plate.reset();
  const DeterioratedSection out = apply_section_loss(d, {loss(model::SectionElement::cover_plate, 0, 3, 0.001, {})});
  CHECK_FALSE(out.reduced());
  REQUIRE(out.warnings.size() == 1);
  CHECK_THAT(out.warnings[0], Catch::Contains("has no cover plate; loss not applied"));
}

TEST_CASE("bad loss records are input errors at the loss's line", "[capacity]") {
  SECTION("strands on a steel girder") {
    const Diagnostic e = test::first_error(
        [] { (void)apply_section_loss(steel_section(), {loss(model::SectionElement::strands, 0, 3, {}, 10.0)}); });
    CHECK(e.where.line == 40);
    CHECK(e.field == "section_loss");
    CHECK_THAT(e.message, Catch::EndsWith("element strands does not belong to the steel section W"));
  }
  SECTION("a thickness loss that removes the whole web") {
    const Diagnostic e = test::first_error(
        [] { (void)apply_section_loss(steel_section(), {loss(model::SectionElement::web, 0, 3, in(0.6), {})}); });
    CHECK_THAT(e.message, Catch::Contains("leaves no web"));
  }
  SECTION("a bar loss given as a thickness") {
    const Diagnostic e = test::first_error(
        [] { (void)apply_section_loss(steel_section(), {loss(model::SectionElement::bars, 0, 3, in(0.1), {})}); });
    CHECK_THAT(e.message, Catch::Contains("bar loss must be given as percent_loss"));
  }
}

TEST_CASE("bar and strand losses scale the steel areas of concrete sections", "[capacity]") {
  model::SectionDefinition rc;
  rc.id = "RC";
  model::ReinforcedConcreteBeam beam;
  beam.height = in(39);
  beam.web_width = in(16);
  beam.flange_width = in(84);
  beam.flange_thickness = in(7);
  beam.bottom_bars = {model::BarLayer{in2(6.24), in(35.6)}};
  beam.top_bars = {model::BarLayer{in2(1.40), in(2.0)}};
  rc.description = beam;
  const DeterioratedSection d = apply_section_loss(rc, {loss(model::SectionElement::bars, 0, 3, {}, 25.0)});
  const auto& reduced = std::get<model::ReinforcedConcreteBeam>(*d.section.description);
  CHECK(reduced.bottom_bars[0].area == Approx(in2(6.24 * 0.75)));
  CHECK(reduced.top_bars[0].area == Approx(in2(1.40 * 0.75)));

  model::SectionDefinition ps;
  ps.id = "PS";
  model::PrestressedGirder girder;
  girder.strands = {model::StrandLayer{12, in2(0.153), in(2)}};
  ps.description = girder;
  const DeterioratedSection p =
      apply_section_loss(ps, {loss(model::SectionElement::strands, 0, 3, {}, 1.0 / 12 * 100)});
  // Losing 1 of 12 strands: 11/12 of the strand area (hand).
  CHECK(std::get<model::PrestressedGirder>(*p.section.description).strands[0].strand_area * 12 ==
        Approx(in2(0.153) * 11));
}

}  // namespace
}  // namespace tenthpoint::capacity
