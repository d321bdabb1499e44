#include "engine/section/section_stages.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "engine/section/reinforced_concrete_section.h"
#include "engine/section/steel_i_section.h"
#include "tests/section/section_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

using test::in;
using test::in2;
using test::in3;
using test::in4;
using test::kcf;
using test::ksi;

constexpr double kHand = 1e-9;

// The EV-0112 interior-girder section: W33x130 under a 7.5 in deck, 102 in
// effective width, 1.5 in haunch, two bar layers; n = 9 given.
model::SectionDefinition willow_run_section() {
  model::SectionDefinition s;
  s.id = "W33x130";
  s.where = SourceLocation{"ev-0112.yaml", 40, 5};
  s.description = test::w33x130();
  s.deck = model::DeckSlab{in(7.5), in(102.0), in(1.5), {{in2(3.4), in(2.5)}, {in2(2.6), in(5.5)}}};
  return s;
}

model::Materials willow_run_materials() {
  model::Materials m = test::composite_steel(9.0);
  m.kind = model::MaterialKind::rolled_steel;
  return m;
}

TEST_CASE("a composite steel section gets all stages from its description", "[section]") {
  const SectionStages s = section_stages(willow_run_section(), willow_run_materials());
  const SteelISection steel(test::w33x130(), detail::SectionContext{"W33x130", {}});
  const model::DeckSlab deck = *willow_run_section().deck;
  REQUIRE(s.composite);
  CHECK(s.noncomposite.inertia == steel.noncomposite(ksi(29000)).inertia);
  // LRFD 6.10.1.1.1b: n = 9 for live load, 3n = 27 for DC2 and DW.
  CHECK(s.short_term->inertia == steel.composite(deck, 9.0, ksi(29000)).inertia);
  CHECK(s.long_term->inertia == steel.composite(deck, 27.0, ksi(29000)).inertia);
  REQUIRE(s.cracked_negative.has_value());
  CHECK(s.cracked_negative->inertia == steel.cracked_negative(deck, 1.0, ksi(29000))->inertia);
  CHECK(&s.at(model::SectionStage::noncomposite) == &s.noncomposite);
  CHECK(&s.at(model::SectionStage::long_term_composite) == &*s.long_term);
  CHECK(&s.at(model::SectionStage::short_term_composite) == &*s.short_term);
  CHECK(s.noncomposite.source == PropertySource::computed);
  // The composite section is stiffer at n than at 3n, and both beat steel alone.
  CHECK(s.short_term->inertia > s.long_term->inertia);
  CHECK(s.long_term->inertia > s.noncomposite.inertia);
}

TEST_CASE("the Willow Run short-term section matches a hand table", "[section]") {
  const SectionStages s = section_stages(willow_run_section(), willow_run_materials());
  // Hand table (inches): W33x130 plates (A = 37.8712, ybar = 16.55,
  // I = 6607.749) plus the slab 102/9 wide x 7.5 at 33.1 + 1.5 + 3.75 = 38.35.
  const double steel_i = 2 * (11.5 * 0.855 * 0.855 * 0.855 / 12 + 11.5 * 0.855 * (16.55 - 0.4275) * (16.55 - 0.4275)) +
                         0.58 * 31.39 * 31.39 * 31.39 / 12;
  const double as = 2 * 11.5 * 0.855 + 31.39 * 0.58;
  const double w = 102.0 / 9.0;
  const double slab = w * 7.5;
  const double a = as + slab;
  const double ybar = (as * 16.55 + slab * 38.35) / a;
  const double i = steel_i + as * (16.55 - ybar) * (16.55 - ybar) + w * 7.5 * 7.5 * 7.5 / 12 +
                   slab * (38.35 - ybar) * (38.35 - ybar);
  TP_CHECK_CLOSE(s.short_term->inertia, in4(i), kHand, 0.0);
  TP_CHECK_CLOSE(*s.short_term->neutral_axis, in(ybar), kHand, 0.0);
  TP_CHECK_CLOSE(*s.short_term->section_modulus_deck, in3(i / (42.1 - ybar)), kHand, 0.0);
}

TEST_CASE("given properties win stage by stage and the description fills the rest", "[section]") {
  model::SectionDefinition def = willow_run_section();
  model::SectionProperties given;
  given.noncomposite = model::ElasticSection{in2(38.3), in4(6710), in3(406), in3(406), std::nullopt};
  given.short_term = model::ElasticSection{in2(100.0), in4(17000), std::nullopt, in3(700), std::nullopt};
  def.properties = given;
  const SectionStages s = section_stages(def, willow_run_materials());
  CHECK(s.noncomposite.source == PropertySource::given);
  CHECK(s.noncomposite.inertia == in4(6710));
  CHECK(s.noncomposite.modulus == ksi(29000));
  CHECK(s.short_term->source == PropertySource::given);
  CHECK(s.short_term->inertia == in4(17000));
  // The neutral axis of a given stage follows from S_bottom = I / y_bottom.
  TP_CHECK_CLOSE(*s.short_term->neutral_axis, in(17000.0 / 700.0), kHand, 0.0);
  CHECK(s.long_term->source == PropertySource::computed);
  CHECK(s.cracked_negative->source == PropertySource::computed);
  const SectionStages described = described_section_stages(def, willow_run_materials());
  CHECK(s.long_term->inertia == described.long_term->inertia);
  CHECK(described.noncomposite.source == PropertySource::computed);
}

TEST_CASE("a stage missing for a section with no description is an input error naming the stage", "[section]") {
  model::SectionDefinition def;
  def.id = "G7";
  def.where = SourceLocation{"b.yaml", 12, 5};
  def.properties = model::SectionProperties{};
  def.properties->noncomposite = model::ElasticSection{in2(38.3), in4(6710), std::nullopt, std::nullopt, std::nullopt};
  def.properties->short_term = model::ElasticSection{in2(100.0), in4(17000), std::nullopt, std::nullopt, std::nullopt};
  const Diagnostic d = test::first_error([&] { (void)section_stages(def, willow_run_materials()); });
  CHECK(d.field == "sections[G7].properties.long_term");
  CHECK(d.message == "missing, and the section has no description to compute it from");
  CHECK(d.where.line == 12);
}

TEST_CASE("a stage missing for a described section without a deck is an input error", "[section]") {
  model::SectionDefinition def = willow_run_section();
  def.deck.reset();
  def.properties = model::SectionProperties{};
  def.properties->noncomposite = model::ElasticSection{in2(38.3), in4(6710), std::nullopt, std::nullopt, std::nullopt};
  Diagnostic d = test::first_error([&] { (void)section_stages(def, willow_run_materials()); });
  CHECK(d.field == "sections[W33x130].properties.long_term");
  CHECK(d.message == "missing, and the section has no deck to compute it from");
  def.properties.reset();
  d = test::first_error([&] { (void)section_stages(def, willow_run_materials()); });
  CHECK(d.field == "sections[W33x130].deck");
  CHECK(d.message == "needed to compute the composite stages (materials.composite is true)");
}

TEST_CASE("on a non-composite bridge every stage is the noncomposite section", "[section]") {
  model::Materials m = willow_run_materials();
  m.composite = false;
  const SectionStages s = section_stages(willow_run_section(), m);
  CHECK_FALSE(s.composite);
  CHECK_FALSE(s.cracked_negative.has_value());
  CHECK(&s.at(model::SectionStage::short_term_composite) == &s.noncomposite);
  CHECK(&s.at(model::SectionStage::long_term_composite) == &s.noncomposite);
}

TEST_CASE("composite properties given for a non-composite bridge are an input error", "[section]") {
  model::Materials m = willow_run_materials();
  m.composite = false;
  model::SectionDefinition def = willow_run_section();
  def.properties = model::SectionProperties{};
  def.properties->noncomposite = model::ElasticSection{in2(38.3), in4(6710), std::nullopt, std::nullopt, std::nullopt};
  def.properties->long_term = def.properties->noncomposite;
  const Diagnostic d = test::first_error([&] { (void)section_stages(def, m); });
  CHECK(d.field == "sections[W33x130].properties.long_term");
  CHECK(d.message == "given for a non-composite bridge (materials.composite is false)");
}

TEST_CASE("a description of another material kind is an input error", "[section]") {
  model::Materials m = willow_run_materials();
  m.kind = model::MaterialKind::reinforced_concrete;
  const Diagnostic d = test::first_error([&] { (void)section_stages(willow_run_section(), m); });
  CHECK(d.field == "sections[W33x130].steel_i");
  CHECK(d.message == "does not match materials.kind reinforced_concrete");
}

TEST_CASE("a non-positive given inertia is an input error", "[section]") {
  model::SectionDefinition def = willow_run_section();
  def.properties = model::SectionProperties{};
  def.properties->noncomposite = model::ElasticSection{in2(38.3), 0.0, std::nullopt, std::nullopt, std::nullopt};
  const Diagnostic d = test::first_error([&] { (void)section_stages(def, willow_run_materials()); });
  CHECK(d.field == "sections[W33x130].properties.noncomposite.inertia");
}

TEST_CASE("an RC beam's stiffness is the gross section unless the bars are asked for", "[section]") {
  model::Materials m;
  m.kind = model::MaterialKind::reinforced_concrete;
  m.girder_concrete = model::Concrete{ksi(3.0), std::nullopt, kcf(0.150)};
  m.reinforcement = model::Reinforcement{ksi(40), ksi(29000)};
  model::SectionDefinition def;
  def.id = "TB";
  model::ReinforcedConcreteBeam beam;
  beam.height = in(39.0);
  beam.web_width = in(16.0);
  beam.flange_width = in(84.0);
  beam.flange_thickness = in(7.0);
  beam.bottom_bars = {{in2(9.36), in(34.7)}};
  def.description = beam;
  const ReinforcedConcreteSection rc(beam, detail::SectionContext{"TB", {}});
  // Ec = 120000 x 0.150^2 x 3^0.33 ksi (LRFD 5.4.2.4-1, 9th ed.), n = 29000 / Ec.
  const double ec = ksi(120000.0 * 0.150 * 0.150 * std::pow(3.0, 0.33));
  const SectionStages gross = section_stages(def, m);
  TP_CHECK_CLOSE(gross.noncomposite.modulus, ec, 1e-12, 0.0);
  CHECK(gross.noncomposite.inertia == rc.gross_properties(ec).inertia);
  SectionOptions options;
  options.transform_rc_bars = true;
  const SectionStages transformed = section_stages(def, m, options);
  TP_CHECK_CLOSE(transformed.noncomposite.inertia, rc.gross_transformed(ec, ksi(29000) / ec).inertia, 1e-12, 0.0);
}

}  // namespace
}  // namespace tenthpoint::section
