#include "engine/section/girder_section_profile.h"

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/section/section_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

using test::in;
using test::in2;
using test::plate;

Real ft(Real x) { return x * units::kFoot; }

model::Segment segment(double start_ft, double end_ft, const char* section, const char* end_section = nullptr,
                       std::optional<model::Taper> taper = std::nullopt) {
  model::Segment s;
  s.start = ft(start_ft);
  s.end = ft(end_ft);
  s.section = section;
  if (end_section != nullptr) s.end_section = end_section;
  s.taper = taper;
  s.where = SourceLocation{"b.yaml", 90, 9};
  return s;
}

// The EV-0112 record in code: 2 x 70 ft, W33x130 with a 10 x 3/4 bottom cover
// plate over the pier from 54 to 86 ft; n = 9.
model::Bridge willow_run() {
  model::Bridge b;
  b.identity.structure_id = "EV-0112";
  b.geometry.span_lengths = {ft(70), ft(70)};
  b.materials = test::composite_steel(9.0);
  b.materials.kind = model::MaterialKind::rolled_steel;
  const model::DeckSlab deck{in(7.5), in(102.0), in(1.5), {{in2(3.4), in(2.5)}, {in2(2.6), in(5.5)}}};
  model::SectionDefinition plain{"W33x130", std::nullopt, test::w33x130(), deck, {}};
  model::SteelIGirder cp = test::w33x130();
  cp.bottom_cover_plate = plate(10.0, 0.75);
  model::SectionDefinition covered{"W33x130-CP", std::nullopt, cp, deck, {}};
  b.sections = {plain, covered};
  model::GirderLine g;
  g.id = "G-INT";
  g.segments = {segment(0, 54, "W33x130"), segment(54, 86, "W33x130-CP"), segment(86, 140, "W33x130")};
  b.girders = {g};
  return b;
}

TEST_CASE("a prismatic girder line gives one constant EI piece per segment", "[section]") {
  const model::Bridge b = willow_run();
  const GirderSectionProfile profile(b, b.girders[0]);
  const SectionStages plain = section_stages(b.sections[0], b.materials);
  const SectionStages covered = section_stages(b.sections[1], b.materials);
  TP_CHECK_CLOSE(profile.length(), ft(140), 1e-15, 1.0);
  for (model::SectionStage stage : {model::SectionStage::noncomposite, model::SectionStage::long_term_composite,
                                    model::SectionStage::short_term_composite}) {
    const StiffnessProfile ei = profile.stiffness(stage);
    REQUIRE(ei.pieces.size() == 3);
    CHECK(ei.pieces[0].prismatic());
    CHECK(ei.pieces[0].at(ft(10)) == plain.at(stage).flexural_rigidity());
    CHECK(ei.pieces[1].at(ft(70)) == covered.at(stage).flexural_rigidity());
    // The cover plate end at 54 ft: the plain beam on the left, the plated one on the right.
    CHECK(ei.at(ft(54), Side::left) == plain.at(stage).flexural_rigidity());
    CHECK(ei.at(ft(54), Side::right) == covered.at(stage).flexural_rigidity());
  }
  const std::optional<StiffnessProfile> cracked = profile.cracked_negative_stiffness();
  REQUIRE(cracked.has_value());
  CHECK(cracked->at(ft(70)) == covered.cracked_negative->flexural_rigidity());
  // Depths: 33.1 in, and 33.85 in with the cover plate.
  TP_CHECK_CLOSE(*profile.girder_depth(ft(10)), in(33.1), 1e-12, 0.0);
  TP_CHECK_CLOSE(*profile.girder_depth(ft(54), Side::right), in(33.85), 1e-12, 0.0);
  CHECK(*profile.stage_at(model::SectionStage::short_term_composite, ft(70)).section_modulus_bottom ==
        *covered.short_term->section_modulus_bottom);
}

TEST_CASE("a haunched segment gives a varying EI piece that meets its neighbours", "[section]") {
  // EV-0245-like: 110 + 140 + 110 ft, parabolic haunches 80-110 and 110-140 ft.
  model::Bridge b;
  b.geometry.span_lengths = {ft(110), ft(140), ft(110)};
  b.materials = test::composite_steel(8.0);
  auto pg = [](const char* id, double web) {
    model::SteelIGirder g;
    g.top_flange = plate(18.0, 1.5);
    g.web = plate(web, 0.5625);
    g.bottom_flange = plate(18.0, 1.5);
    return model::SectionDefinition{id, std::nullopt, g, test::slab_8in(), {}};
  };
  b.sections = {pg("PG54", 54.0), pg("PG90", 90.0)};
  model::GirderLine g;
  g.id = "G";
  g.segments = {segment(0, 80, "PG54"),
                segment(80, 110, "PG54", "PG90", model::Taper::parabolic),
                segment(110, 140, "PG90", "PG54", model::Taper::parabolic),
                segment(140, 220, "PG54"),
                segment(220, 250, "PG54", "PG90", model::Taper::parabolic),
                segment(250, 280, "PG90", "PG54", model::Taper::parabolic),
                segment(280, 360, "PG54")};
  b.girders = {g};
  const GirderSectionProfile profile(b, b.girders[0]);
  const StiffnessProfile ei = profile.stiffness(model::SectionStage::short_term_composite);
  REQUIRE(ei.pieces.size() == 7);
  CHECK_FALSE(ei.pieces[1].prismatic());
  const double shallow = section_stages(b.sections[0], b.materials).short_term->flexural_rigidity();
  const double deep = section_stages(b.sections[1], b.materials).short_term->flexural_rigidity();
  // Continuity of EI at the haunch ends (the ends are the end sections exactly).
  CHECK(ei.at(ft(80), Side::left) == shallow);
  CHECK(ei.at(ft(80), Side::right) == shallow);
  CHECK(ei.at(ft(110), Side::left) == deep);
  CHECK(ei.at(ft(110), Side::right) == deep);
  // Mid-haunch: a 63 in web (parabola, a quarter of the way), so EI lies between.
  const double mid = ei.at(ft(95));
  CHECK(mid > shallow);
  CHECK(mid < deep);
  TP_CHECK_CLOSE(*profile.girder_depth(ft(95)), in(66.0), 1e-12, 0.0);
  // Symmetric haunches about the pier give equal EI at mirrored stations.
  TP_CHECK_CLOSE(ei.at(ft(100)), ei.at(ft(120)), 1e-12, 0.0);
}

TEST_CASE("a girder line with one deck without bars has no cracked negative profile", "[section]") {
  model::Bridge b = willow_run();
  b.sections[1].deck->longitudinal_bars.clear();
  const GirderSectionProfile profile(b, b.girders[0]);
  CHECK_FALSE(profile.cracked_negative_stiffness().has_value());
  CHECK_FALSE(profile.stages_at(ft(70)).cracked_negative.has_value());
}

TEST_CASE("a station beyond the girder is an input error", "[section]") {
  const model::Bridge b = willow_run();
  const GirderSectionProfile profile(b, b.girders[0]);
  const Diagnostic d = test::first_error([&] { (void)profile.girder_depth(ft(141)); });
  CHECK(d.field == "station");
}

TEST_CASE("segments that leave a gap are an input error at the segment", "[section]") {
  model::Bridge b = willow_run();
  b.girders[0].segments[1].start = ft(55);
  const Diagnostic d = test::first_error([&] { (void)GirderSectionProfile(b, b.girders[0]); });
  CHECK(d.field == "girders[G-INT].segments[1].start");
  CHECK(d.message.rfind("must be 16.4592 m to follow the previous segment without gap or overlap", 0) == 0);
  CHECK(d.where.line == 90);
}

TEST_CASE("segments short of the girder length are an input error", "[section]") {
  model::Bridge b = willow_run();
  b.girders[0].segments[2].end = ft(139);
  const Diagnostic d = test::first_error([&] { (void)GirderSectionProfile(b, b.girders[0]); });
  CHECK(d.field == "girders[G-INT].segments[2].end");
  CHECK(d.message.rfind("must be the girder length 42.672 m", 0) == 0);
}

TEST_CASE("an unknown section id is an input error", "[section]") {
  model::Bridge b = willow_run();
  b.girders[0].segments[1].section = "W33x131";
  const Diagnostic d = test::first_error([&] { (void)GirderSectionProfile(b, b.girders[0]); });
  CHECK(d.field == "girders[G-INT].segments");
  CHECK(d.message == "unknown section 'W33x131'");
}

}  // namespace
}  // namespace tenthpoint::section
