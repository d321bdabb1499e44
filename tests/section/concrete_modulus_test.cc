#include "engine/section/concrete_modulus.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/section/section_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

using test::kcf;
using test::ksi;

TEST_CASE("Ec for 4 ksi concrete of 0.145 kcf follows AASHTO LRFD 9th ed. Eq. 5.4.2.4-1", "[section]") {
  // Hand computation: 120000 x 1.0 x 0.145^2 x 4^0.33 = 2523 x 1.580083 = 3986.55 ksi.
  const double ec = concrete_modulus(ksi(4.0), kcf(0.145), ConcreteModulusFormula::lrfd_9th);
  TP_CHECK_CLOSE(ec, ksi(120000.0 * 0.145 * 0.145 * std::pow(4.0, 0.33)), 1e-12, 0.0);
  TP_CHECK_CLOSE(ec, ksi(3986.55), 1e-6, 0.0);
}

TEST_CASE("Ec by the older 33000 wc^1.5 sqrt(f'c) form of LRFD 7th ed. Eq. 5.4.2.4-1", "[section]") {
  // Hand computation: 33000 x 0.145^1.5 x sqrt(4) = 33000 x 0.0552142 x 2 = 3644.1 ksi;
  // the familiar "about 3600 ksi for 4 ksi concrete" (from memory).
  const double ec = concrete_modulus(ksi(4.0), kcf(0.145), ConcreteModulusFormula::lrfd_7th);
  TP_CHECK_CLOSE(ec, ksi(33000.0 * std::pow(0.145, 1.5) * 2.0), 1e-12, 0.0);
  TP_CHECK_CLOSE(ec, ksi(3644.15), 1e-5, 0.0);
}

TEST_CASE("K1 scales Ec linearly", "[section]") {
  // LRFD 5.4.2.4: Ec is proportional to K1.
  const double base = concrete_modulus(ksi(5.0), kcf(0.150), ConcreteModulusFormula::lrfd_9th, 1.0);
  TP_CHECK_CLOSE(concrete_modulus(ksi(5.0), kcf(0.150), ConcreteModulusFormula::lrfd_9th, 0.9), 0.9 * base, 1e-12, 0.0);
}

TEST_CASE("Ec from SI inputs equals Ec from the same concrete in US inputs", "[section]") {
  // 4 ksi = 27.5790 MPa and 0.145 kcf = 22.7776 kN/m^3 (6 figures).
  const double us = concrete_modulus(ksi(4.0), kcf(0.145), ConcreteModulusFormula::lrfd_9th);
  const double si = concrete_modulus(units::to_internal(27.5790, units::Quantity::stress, units::UnitSystem::si),
                                     units::to_internal(22.7776, units::Quantity::unit_weight, units::UnitSystem::si),
                                     ConcreteModulusFormula::lrfd_9th);
  // Inputs typed to 6 figures: wc^2 doubles their relative error.
  TP_CHECK_CLOSE(si, us, 1e-5, 0.0);
}

TEST_CASE("a given concrete modulus wins over the formula", "[section]") {
  const model::Concrete c{ksi(4.0), ksi(3800.0), kcf(0.150)};
  CHECK(concrete_modulus(c, ConcreteModulusFormula::lrfd_9th, 1.0, "materials.deck_concrete") == ksi(3800.0));
}

TEST_CASE("a concrete with no unit weight is an input error naming the field", "[section]") {
  const model::Concrete c{ksi(4.0), std::nullopt, 0.0};
  const Diagnostic d = test::first_error(
      [&] { (void)concrete_modulus(c, ConcreteModulusFormula::lrfd_9th, 1.0, "materials.deck_concrete"); });
  CHECK(d.field == "materials.deck_concrete.unit_weight");
  CHECK(d.message == "must be positive (got 0)");
}

}  // namespace
}  // namespace tenthpoint::section
