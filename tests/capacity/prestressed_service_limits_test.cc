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
using test::step;

// Hand values in kip and inch; only conversion round-off remains.
constexpr double kHand = 1e-9;

// The EV-0207 Type IV girder: gross A = 789 in^2, I = 260,730 in^4, yb =
// 24.73 in (AASHTO-PCI shape table, from memory), 46 strands of 0.153 in^2
// at 2, 4, 6 and 8 in (12, 12, 12, 10 of them).
model::PrestressedGirder type_iv(std::optional<double> fpe_ksi) {
  model::PrestressedGirder g;
  g.shape = "AASHTO Type IV";
  g.height = in(54);
  g.web_width = in(8);
  g.area = in2(789);
  g.inertia = in2(260730) * in2(1);
  g.centroid_from_bottom = in(24.73);
  for (const auto& [count, height] : {std::pair{12, 2.0}, {12, 4.0}, {12, 6.0}, {10, 8.0}}) {
    g.strands.push_back(model::StrandLayer{count, in2(0.153), in(height)});
  }
  if (fpe_ksi) g.effective_prestress = ksi(*fpe_ksi);
  return g;
}

model::Materials ps_materials() {
  model::Materials m;
  m.kind = model::MaterialKind::prestressed_concrete;
  m.composite = true;
  m.girder_concrete = model::Concrete{ksi(6), std::nullopt, test::kcf(0.150)};
  m.deck_concrete = model::Concrete{ksi(4), std::nullopt, test::kcf(0.150)};
  m.reinforcement = model::Reinforcement{ksi(60), ksi(29000)};
  m.strand = model::PrestressingSteel{ksi(270), ksi(243), ksi(28500), true};
  return m;
}

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

TEST_CASE("without a given fpe the losses follow LRFD 5.9.3.2.3a and 5.9.3.3 worked by hand", "[capacity]") {
  // Assumptions of prestress_losses.h: fpj = 0.75 fpu; f'ci = 0.75 f'c =
  // 4.5 ksi; Eci = 120000 K1 wc^2 f'ci^0.33 (LRFD 5.4.2.4-1, 9th ed.);
  // H = 40 %. By hand:
  // dES = (Ep/Eci) Aps fpj K / (1 + (Ep/Eci) Aps K), K = 1/Ag + e^2/Ig (5.9.3.2.3a-1, Mg left out);
  // dLT = 10 fpi Aps/Ag gamma_h gamma_st + 12 gamma_h gamma_st + 2.4 (5.9.3.3-1, -2, -3).
  const model::PrestressedGirder g = type_iv(std::nullopt);
  const PrestressLosses losses =
      approximate_prestress_losses(g, *ps_materials().girder_concrete, *ps_materials().strand, PrestressLossOptions{},
                                   section::ConcreteModulusFormula::lrfd_9th, 1.0);
  const double fpj = 0.75 * 270;
  const double fci = 0.75 * 6;
  const double eci = 120000 * 0.150 * 0.150 * std::pow(fci, 0.33);
  const double n = 28500 / eci;
  const double k = 1 / 789.0 + kEcc * kEcc / 260730;
  const double des = n * kAps * fpj * k / (1 + n * kAps * k);
  const double gamma_h = 1.7 - 0.01 * 40;
  const double gamma_st = 5 / (1 + fci);
  const double dlt = 10 * fpj * kAps / 789 * gamma_h * gamma_st + 12 * gamma_h * gamma_st + 2.4;
  TP_CHECK_CLOSE(test::to_ksi(step(losses.trace, "Eci")), eci, 1e-9, 1.0);
  TP_CHECK_CLOSE(test::to_ksi(losses.elastic_shortening), des, 1e-9, 1.0);
  TP_CHECK_CLOSE(test::to_ksi(losses.long_term), dlt, 1e-9, 1.0);
  TP_CHECK_CLOSE(test::to_ksi(losses.effective_prestress), fpj - des - dlt, 1e-9, 1.0);
  // A plausible range for a Type IV girder (common practice: 15 to 30 % total loss).
  CHECK((fpj - des - dlt) / fpj > 0.65);
  CHECK((fpj - des - dlt) / fpj < 0.85);

  // The service limits use the estimate and say so.
  const PrestressedServiceLimits s = prestressed_service_limits("IV", g, ps_materials(), stages_of(g), {}, {}, 1.0);
  CHECK(s.effective_prestress_estimated);
  TP_CHECK_CLOSE(test::to_ksi(s.effective_prestress), fpj - des - dlt, 1e-9, 1.0);
  REQUIRE(s.warnings.size() == 1);
  CHECK_THAT(s.warnings[0], Catch::Contains("estimated"));
}

TEST_CASE("a higher humidity lowers the long-term loss through gamma_h", "[capacity]") {
  PrestressLossOptions humid;
  humid.relative_humidity = 70;
  const model::PrestressedGirder g = type_iv(std::nullopt);
  const PrestressLosses dry = approximate_prestress_losses(g, *ps_materials().girder_concrete, *ps_materials().strand,
                                                           {}, section::ConcreteModulusFormula::lrfd_9th, 1.0);
  const PrestressLosses wet = approximate_prestress_losses(g, *ps_materials().girder_concrete, *ps_materials().strand,
                                                           humid, section::ConcreteModulusFormula::lrfd_9th, 1.0);
  // gamma_h 1.3 -> 1.0 (5.9.3.3-2): the creep and shrinkage terms scale by 1.0/1.3 (hand).
  const double ratio = (test::to_ksi(wet.long_term) - 2.4) / (test::to_ksi(dry.long_term) - 2.4);
  CHECK(ratio == Approx(1.0 / 1.3).epsilon(1e-9));
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
