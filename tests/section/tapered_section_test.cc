#include "engine/section/tapered_section.h"

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/section/section_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

using test::in;
using test::in2;
using test::in4;
using test::kcf;
using test::ksi;
using test::plate;

// A section recomputed at a depth and the same section built directly differ
// only by the round-off of blending equal dimensions: none, or a few ulps.
constexpr double kSame = 1e-12;

constexpr model::SectionStage kStages[] = {model::SectionStage::noncomposite, model::SectionStage::long_term_composite,
                                           model::SectionStage::short_term_composite};

Real ft(Real x) { return x * units::kFoot; }

// The EV-0245 pier haunch: 54 in web at the haunch start, 90 in at the pier,
// 18 x 1.5 flanges at both ends, 9/16 web.
model::SectionDefinition plate_girder(const char* id, double web_depth_in) {
  model::SectionDefinition s;
  s.id = id;
  model::SteelIGirder g;
  g.designation = id;
  g.top_flange = plate(18.0, 1.5);
  g.web = plate(web_depth_in, 0.5625);
  g.bottom_flange = plate(18.0, 1.5);
  s.description = g;
  s.deck = model::DeckSlab{in(8.0), in(108.0), in(2.0), {{in2(4.30), in(2.5)}, {in2(3.60), in(6.0)}}};
  return s;
}

TaperedSection haunch(model::Taper taper, const model::SectionDefinition& a, const model::SectionDefinition& b) {
  return TaperedSection(a, b, taper, ft(80), ft(110), test::composite_steel(8.0), SectionOptions{},
                        SourceLocation{"ev-0245.yaml", 60, 9});
}

TEST_CASE("at its ends a haunch has exactly the end sections' EI", "[section]") {
  const model::SectionDefinition shallow = plate_girder("PG54", 54.0);
  const model::SectionDefinition deep = plate_girder("PG90", 90.0);
  for (model::Taper taper : {model::Taper::linear, model::Taper::parabolic}) {
    const TaperedSection h = haunch(taper, shallow, deep);
    const SectionStages a = section_stages(shallow, test::composite_steel(8.0));
    const SectionStages b = section_stages(deep, test::composite_steel(8.0));
    for (model::SectionStage stage : kStages) {
      CHECK(h.flexural_rigidity(stage, ft(80)) == a.at(stage).flexural_rigidity());
      CHECK(h.flexural_rigidity(stage, ft(110)) == b.at(stage).flexural_rigidity());
    }
    CHECK(*h.cracked_negative_rigidity(ft(110)) == b.cracked_negative->flexural_rigidity());
  }
}

TEST_CASE("a parabolic haunch is a quarter of the way deeper at mid-length", "[section]") {
  const TaperedSection h = haunch(model::Taper::parabolic, plate_girder("PG54", 54.0), plate_girder("PG90", 90.0));
  // shallow + (deep - shallow) / 4 = 54 + 36 / 4 = 63 in (closed form of the
  // parabola tangent at the shallow end).
  TP_CHECK_CLOSE(h.controlling_depth(ft(95)), in(63.0), kSame, 0.0);
  TP_CHECK_CLOSE(h.girder_depth(ft(95)), in(66.0), kSame, 0.0);
  // The section is recomputed at that depth: EI equals that of a prismatic
  // 63 in web girder with the same plates and deck.
  const SectionStages direct = section_stages(plate_girder("PG63", 63.0), test::composite_steel(8.0));
  const SectionStages mid = h.stages_at(ft(95));
  for (model::SectionStage stage : kStages) {
    TP_CHECK_CLOSE(h.flexural_rigidity(stage, ft(95)), direct.at(stage).flexural_rigidity(), kSame, 0.0);
    TP_CHECK_CLOSE(*mid.at(stage).section_modulus_bottom, *direct.at(stage).section_modulus_bottom, kSame, 0.0);
  }
  CHECK(mid.short_term->source == PropertySource::computed);
}

TEST_CASE("a linear haunch has the average depth at mid-length", "[section]") {
  const TaperedSection h = haunch(model::Taper::linear, plate_girder("PG54", 54.0), plate_girder("PG90", 90.0));
  TP_CHECK_CLOSE(h.controlling_depth(ft(95)), in(72.0), kSame, 0.0);
  const SectionStages direct = section_stages(plate_girder("PG72", 72.0), test::composite_steel(8.0));
  TP_CHECK_CLOSE(h.flexural_rigidity(model::SectionStage::short_term_composite, ft(95)),
                 direct.short_term->flexural_rigidity(), kSame, 0.0);
}

TEST_CASE("a parabolic haunch deep at its start is tangent at its end", "[section]") {
  const TaperedSection h = haunch(model::Taper::parabolic, plate_girder("PG90", 90.0), plate_girder("PG54", 54.0));
  CHECK_FALSE(h.law().shallow_at_start());
  TP_CHECK_CLOSE(h.controlling_depth(ft(95)), in(63.0), kSame, 0.0);
  // 3 ft from the shallow end of a 30 ft haunch: s = 0.1, d = 54 + 36 x 0.01 in.
  TP_CHECK_CLOSE(h.controlling_depth(ft(107)), in(54.36), kSame, 0.0);
}

TEST_CASE("plates that differ between the ends are interpolated with the depth", "[section]") {
  model::SectionDefinition a = plate_girder("A", 54.0);
  std::get<model::SteelIGirder>(*a.description).bottom_flange = plate(16.0, 1.0);
  const TaperedSection h = haunch(model::Taper::linear, a, plate_girder("B", 90.0));
  const model::SteelIGirder mid = std::get<model::SteelIGirder>(*h.section_at(ft(95)).description);
  // Halfway: (16 + 18) / 2 = 17 in wide, (1.0 + 1.5) / 2 = 1.25 in thick.
  TP_CHECK_CLOSE(mid.bottom_flange.width, in(17.0), kSame, 0.0);
  TP_CHECK_CLOSE(mid.bottom_flange.thickness, in(1.25), kSame, 0.0);
  // Equal plates are kept as they are.
  CHECK(mid.top_flange.width == in(18.0));
}

TEST_CASE("given end properties are met at the ends and blended in between", "[section]") {
  model::SectionDefinition a = plate_girder("PG54", 54.0);
  const SectionStages described = described_section_stages(a, test::composite_steel(8.0));
  // The file gives a short-term inertia 10 % above the description's.
  model::SectionProperties given;
  given.noncomposite = described.noncomposite.to_elastic_section();
  given.long_term = described.long_term->to_elastic_section();
  given.short_term = described.short_term->to_elastic_section();
  given.short_term->inertia *= 1.1;
  a.properties = given;
  const model::SectionDefinition b = plate_girder("PG90", 90.0);
  const TaperedSection h = haunch(model::Taper::parabolic, a, b);
  const model::SectionStage st = model::SectionStage::short_term_composite;
  CHECK(h.flexural_rigidity(st, ft(80)) == ksi(29000) * given.short_term->inertia);
  // At mid-length t = 1/4, so the ratio is 0.75 x 1.1 + 0.25 x 1.0 = 1.075
  // times the EI recomputed at a 63 in web (hand computation of the rule).
  const SectionStages direct = section_stages(plate_girder("PG63", 63.0), test::composite_steel(8.0));
  TP_CHECK_CLOSE(h.flexural_rigidity(st, ft(95)), 1.075 * direct.short_term->flexural_rigidity(), kSame, 0.0);
  CHECK(h.stages_at(ft(95)).short_term->source == PropertySource::scaled);
  // Stages with no given difference are not scaled.
  TP_CHECK_CLOSE(h.flexural_rigidity(model::SectionStage::noncomposite, ft(95)),
                 direct.noncomposite.flexural_rigidity(), kSame, 0.0);
}

TEST_CASE("an RC haunch moves the bottom bars with the soffit", "[section]") {
  // EV-0058: 39 in at the haunch start to 57 in at the pier, linear;
  // bottom bars 3.12 in^2 at 35.6 and 53.6 in, top bars 8.00 at 2.5 in.
  auto beam = [](const char* id, double h, double d) {
    model::SectionDefinition s;
    s.id = id;
    model::ReinforcedConcreteBeam b;
    b.height = in(h);
    b.web_width = in(16.0);
    b.flange_width = in(84.0);
    b.flange_thickness = in(7.0);
    b.bottom_bars = {{in2(3.12), in(d)}};
    b.top_bars = {{in2(8.00), in(2.5)}};
    s.description = b;
    return s;
  };
  model::Materials m;
  m.kind = model::MaterialKind::reinforced_concrete;
  m.girder_concrete = model::Concrete{ksi(3.0), std::nullopt, kcf(0.150)};
  m.reinforcement = model::Reinforcement{ksi(40), ksi(29000)};
  const TaperedSection h(beam("START", 39.0, 35.6), beam("PIER", 57.0, 53.6), model::Taper::linear, ft(34), ft(40), m,
                         SectionOptions{}, SourceLocation{});
  const model::ReinforcedConcreteBeam mid = std::get<model::ReinforcedConcreteBeam>(*h.section_at(ft(37)).description);
  TP_CHECK_CLOSE(mid.height, in(48.0), kSame, 0.0);
  TP_CHECK_CLOSE(mid.bottom_bars[0].depth, in(44.6), kSame, 0.0);
  CHECK(mid.top_bars[0].depth == in(2.5));
  const SectionStages direct = section_stages(beam("MID", 48.0, 44.6), m);
  TP_CHECK_CLOSE(h.flexural_rigidity(model::SectionStage::noncomposite, ft(37)),
                 direct.noncomposite.flexural_rigidity(), kSame, 0.0);
}

TEST_CASE("haunches that cannot be interpolated are input errors at the segment", "[section]") {
  const model::SectionDefinition deep = plate_girder("PG90", 90.0);
  SECTION("a cover plate at one end only") {
    model::SectionDefinition a = plate_girder("CP", 54.0);
    std::get<model::SteelIGirder>(*a.description).bottom_cover_plate = plate(14.0, 1.0);
    const Diagnostic d = test::first_error([&] { (void)haunch(model::Taper::linear, a, deep); });
    CHECK(d.field == "segment.end_section");
    CHECK(d.message == "haunch from 'CP' to 'PG90': a cover plate is present at one end only");
    CHECK(d.where.line == 60);
  }
  SECTION("an end with properties only") {
    model::SectionDefinition a;
    a.id = "GIVEN";
    a.properties = model::SectionProperties{};
    const Diagnostic d = test::first_error([&] { (void)haunch(model::Taper::linear, a, deep); });
    CHECK(d.message ==
          "haunch from 'GIVEN' to 'PG90': section 'GIVEN' needs a steel_i or rc_beam description to vary its depth");
  }
  SECTION("a precast girder") {
    model::SectionDefinition a;
    a.id = "PS";
    a.description = model::PrestressedGirder{};
    model::SectionDefinition b = a;
    b.id = "PS2";
    const Diagnostic d = test::first_error([&] { (void)haunch(model::Taper::linear, a, b); });
    CHECK(d.message ==
          "haunch from 'PS' to 'PS2': a precast girder's gross properties cannot be recomputed at "
          "another depth");
  }
  SECTION("a deck at one end only") {
    model::SectionDefinition a = plate_girder("ND", 54.0);
    a.deck.reset();
    const Diagnostic d = test::first_error([&] { (void)haunch(model::Taper::linear, a, deep); });
    CHECK(d.message == "haunch from 'ND' to 'PG90': a deck is given at one end only");
  }
}

}  // namespace
}  // namespace tenthpoint::section
