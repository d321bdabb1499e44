#include "engine/section/modular_ratios.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "tests/section/section_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

using test::kcf;
using test::ksi;

TEST_CASE("a given modular ratio is used as n and tripled for the long-term steel section", "[section]") {
  const ModularRatios r = modular_ratios(test::composite_steel(9.0));
  // LRFD 6.10.1.1.1b: long-term composite uses k n with k = 3 by default.
  CHECK(*r.short_term == 9.0);
  CHECK(*r.long_term == 27.0);
  CHECK(r.short_term_given);
  CHECK(r.girder_modulus == ksi(29000));
  CHECK_FALSE(r.deck_modulus.has_value());
}

TEST_CASE("a computed modular ratio is Es / Ec and is not rounded", "[section]") {
  model::Materials m = test::composite_steel(9.0);
  m.modular_ratio.reset();
  m.deck_concrete = model::Concrete{ksi(4.0), std::nullopt, kcf(0.145)};
  const ModularRatios r = modular_ratios(m);
  // Hand computation: Ec = 120000 x 0.145^2 x 4^0.33 = 3986.55 ksi (LRFD 5.4.2.4-1, 9th ed.);
  // n = 29000 / 3986.55 = 7.2745, kept unrounded (LRFD 6.10.1.1.1b).
  const double n = 29000.0 / (120000.0 * 0.145 * 0.145 * std::pow(4.0, 0.33));
  TP_CHECK_CLOSE(*r.short_term, n, 1e-12, 0.0);
  TP_CHECK_CLOSE(*r.short_term, 7.2745, 1e-4, 0.0);
  TP_CHECK_CLOSE(*r.long_term, 3 * n, 1e-12, 0.0);
  CHECK_FALSE(r.short_term_given);
}

TEST_CASE("the long-term factor k comes from the materials", "[section]") {
  model::Materials m = test::composite_steel(8.0);
  m.long_term_modular_factor = 2.0;
  CHECK(*modular_ratios(m).long_term == 16.0);
}

TEST_CASE("a concrete girder's deck is transformed by the plain ratio of moduli for every stage", "[section]") {
  model::Materials m;
  m.kind = model::MaterialKind::prestressed_concrete;
  m.composite = true;
  m.girder_concrete = model::Concrete{ksi(6.0), std::nullopt, kcf(0.150)};
  m.deck_concrete = model::Concrete{ksi(4.0), std::nullopt, kcf(0.150)};
  const ModularRatios r = modular_ratios(m);
  // Same wc: n = (6/4)^0.33 by LRFD 5.4.2.4-1 (9th ed.).
  TP_CHECK_CLOSE(*r.short_term, std::pow(1.5, 0.33), 1e-12, 0.0);
  CHECK(*r.long_term == *r.short_term);
}

TEST_CASE("deck bars on a steel girder without a reinforcement entry have the girder's modulus", "[section]") {
  CHECK(*modular_ratios(test::composite_steel(8.0)).bar_ratio == 1.0);
}

TEST_CASE("a non-composite bridge has no deck ratios", "[section]") {
  model::Materials m = test::composite_steel(8.0);
  m.composite = false;
  const ModularRatios r = modular_ratios(m);
  CHECK_FALSE(r.short_term.has_value());
  CHECK_FALSE(r.long_term.has_value());
}

TEST_CASE("missing materials are input errors naming the field", "[section]") {
  SECTION("a composite bridge with neither n nor a deck concrete") {
    model::Materials m = test::composite_steel(8.0);
    m.modular_ratio.reset();
    m.deck_concrete.reset();
    const Diagnostic d = test::first_error([&] { (void)modular_ratios(m); });
    CHECK(d.field == "materials.deck_concrete");
    CHECK(d.message == "required for a composite bridge without materials.modular_ratio");
  }
  SECTION("a steel girder without steel") {
    model::Materials m = test::composite_steel(8.0);
    m.steel.reset();
    const Diagnostic d = test::first_error([&] { (void)modular_ratios(m); });
    CHECK(d.field == "materials.steel");
    CHECK(d.message == "required for welded_plate_girder girders");
  }
  SECTION("an invalid K1 option") {
    SectionOptions o;
    o.aggregate_factor = 0;
    const Diagnostic d = test::first_error([&] { (void)modular_ratios(test::composite_steel(8.0), o); });
    CHECK(d.field == "section_options");
    CHECK(d.message == "aggregate_factor (K1) must be positive");
  }
}

}  // namespace
}  // namespace tenthpoint::section
