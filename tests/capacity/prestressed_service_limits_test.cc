#include "engine/capacity/prestressed_service_limits.h"

#include <cmath>

#include <catch2/catch.hpp>

#include "engine/capacity/prestress_losses.h"
#include "engine/section/section_stages.h"
#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::capacity {
namespace {

using test::in;
using test::in2;
using test::ksi;
using test::ps_materials;
using test::step;
using test::type_iv;

// Hand values in kip and inch; only conversion round-off remains.
constexpr double kHand = 1e-9;

section::SectionStages stages_of(const model::PrestressedGirder& g) {
  model::SectionDefinition d;
  d.id = "IV";
  d.description = g;
  d.deck = model::DeckSlab{in(8), in(96), in(1.5), {}};
  return section::section_stages(d, ps_materials());
}

const double kAps = 46 * 0.153;
const double kEcc = 24.73 - (12 * 2.0 + 12 * 4.0 + 12 * 6.0 + 10 * 8.0) / 46.0;

TEST_CASE("the Service III allowable tension is 0.19 sqrt(f'c) <= 0.6 ksi (LRFD Table 5.9.2.3.2b-1)", "[capacity]") {
  // LRFD Table 5.9.2.3.2b-1, not worse than moderate corrosion (from memory):
  // 0.19 sqrt(6) = 0.465 ksi; severe: 0.0948 sqrt(6) = 0.232 ksi.
  const model::PrestressedGirder g = type_iv(158.0);
  const PrestressedServiceLimits moderate =
      prestressed_service_limits("IV", g, ps_materials(), stages_of(g), {}, {}, 1.0);
  TP_CHECK_CLOSE(test::to_ksi(moderate.allowable_tension), 0.19 * std::sqrt(6.0), kHand, 1.0);

  PrestressedServiceOptions severe;
  severe.exposure = CorrosionExposure::severe;
  const PrestressedServiceLimits harsh =
      prestressed_service_limits("IV", g, ps_materials(), stages_of(g), severe, {}, 1.0);
  TP_CHECK_CLOSE(test::to_ksi(harsh.allowable_tension), 0.0948 * std::sqrt(6.0), kHand, 1.0);

  // 12 ksi concrete: 0.19 sqrt(12) = 0.658 ksi, held at 0.6 ksi.
  model::Materials strong = ps_materials();
  strong.girder_concrete->compressive_strength = ksi(12);
  const PrestressedServiceLimits capped = prestressed_service_limits("IV", g, strong, stages_of(g), {}, {}, 1.0);
  CHECK(test::to_ksi(capped.allowable_tension) == Approx(0.6));
}

TEST_CASE("the bottom-fibre prestress stress is -(P/A + P e / Sb) on the gross section", "[capacity]") {
  // fpe = 158 ksi (given); P = Aps fpe; Sb = I / yb; by hand (elastic
  // stresses of a prestressed section, any textbook).
  const model::PrestressedGirder g = type_iv(158.0);
  const PrestressedServiceLimits s = prestressed_service_limits("IV", g, ps_materials(), stages_of(g), {}, {}, 1.0);
  REQUIRE(s.status == ResistanceStatus::computed);
  CHECK_FALSE(s.effective_prestress_estimated);
  const double p = kAps * 158;
  const double sb = 260730 / 24.73;
  TP_CHECK_CLOSE(test::to_kip(s.prestress_force), p, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_in(s.eccentricity), kEcc, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_ksi(s.prestress_bottom_stress), -(p / 789 + p * kEcc / sb), kHand, 1.0);
  // The moduli the rating uses at the bottom fibre: noncomposite for DC1 is
  // the gross I / yb.
  REQUIRE(s.moduli.dc1.bottom.has_value());
  TP_CHECK_CLOSE(*s.moduli.dc1.bottom / test::in3(1), sb, 1e-9, 1.0);
  REQUIRE(s.moduli.live_load.bottom.has_value());
  CHECK(*s.moduli.live_load.bottom > *s.moduli.dc1.bottom);  // the composite section is stiffer
}

TEST_CASE("without a given fpe the service limits use the loss estimate and say so", "[capacity]") {
  const model::PrestressedGirder g = type_iv(std::nullopt);
  const PrestressLosses losses =
      approximate_prestress_losses(g, *ps_materials().girder_concrete, *ps_materials().strand, PrestressLossOptions{},
                                   section::ConcreteModulusFormula::lrfd_9th, 1.0);
  // The service limits use the estimate and say so.
  const PrestressedServiceLimits s = prestressed_service_limits("IV", g, ps_materials(), stages_of(g), {}, {}, 1.0);
  CHECK(s.effective_prestress_estimated);
  TP_CHECK_CLOSE(test::to_ksi(s.effective_prestress), test::to_ksi(losses.effective_prestress), 1e-9, 1.0);
  REQUIRE(s.warnings.size() == 1);
  CHECK_THAT(s.warnings[0], Catch::Contains("estimated"));
}

TEST_CASE("a section without strands has nothing to check at Service III", "[capacity]") {
  model::PrestressedGirder g = type_iv(158.0);
  const section::SectionStages stages = stages_of(g);
  g.strands.clear();
  const PrestressedServiceLimits s = prestressed_service_limits("IV", g, ps_materials(), stages, {}, {}, 1.0);
  CHECK(s.status == ResistanceStatus::unavailable);
  CHECK(s.reason == "IV: no bonded strands at this section, so there is no prestress to check");
}

}  // namespace
}  // namespace tenthpoint::capacity
