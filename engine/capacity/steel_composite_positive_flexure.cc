#include "engine/capacity/steel_composite_positive_flexure.h"

#include <algorithm>
#include <cassert>
#include <cmath>

#include <fmt/format.h>

#include "engine/capacity/web_load_shedding.h"
#include "engine/core/units.h"

namespace tenthpoint::capacity {
namespace {

using units::Quantity;

// AASHTO LRFD 6.10.6.2.2: compact composite sections need Fyf <= 70 ksi.
constexpr Real kCompactYieldLimit = 70.0 * units::kKsi;
// AASHTO LRFD 6.10.2.1.1: webs without longitudinal stiffeners, D/tw <= 150.
constexpr Real kWebProportionLimit = 150.0;

}  // namespace

CompositePositiveFlexure composite_positive_flexure(const CompositePositiveFlexureInput& in,
                                                    const ResistanceFactors& factors) {
  assert(in.stages.composite && in.stages.short_term);
  CompositePositiveFlexure out;
  out.plastic = composite_plastic_moment(in.girder, in.deck, in.steel_yield, in.deck_strength, in.include_deck_bars,
                                         in.deck_bar_yield);
  Resistance& r = out.resistance;
  CalculationTrace& t = r.trace;
  t.title = fmt::format("{}: composite steel girder, positive flexure", in.label);
  t.append(out.plastic.trace);
  t.add_input("E", "steel modulus", in.steel_modulus, Quantity::stress);

  const Real d = in.girder.web.width;
  const Real tw = in.girder.web.thickness;
  const Real web_ratio =
      t.add_step("D/tw", "web slenderness", "D / tw", d / tw, Quantity::dimensionless, "AASHTO LRFD 6.10.2.1.1");
  const Real compact_limit = t.add_step("3.76 sqrt(E/Fyc)", "compact web limit", "3.76 sqrt(E / Fyc)",
                                        3.76 * std::sqrt(in.steel_modulus / in.steel_yield), Quantity::dimensionless,
                                        "AASHTO LRFD 6.10.6.2.2-1");
  const Real web_compact_ratio =
      t.add_step("2Dcp/tw", "web slenderness at the plastic moment", "2 Dcp / tw",
                 2.0 * out.plastic.web_compression_depth / tw, Quantity::dimensionless, "AASHTO LRFD 6.10.6.2.2-1");
  out.compact =
      in.steel_yield <= kCompactYieldLimit && web_ratio <= kWebProportionLimit && web_compact_ratio <= compact_limit;
  t.add_note(out.compact ? "compact section (AASHTO LRFD 6.10.6.2.2)" : "noncompact section (AASHTO LRFD 6.10.6.2.2)");
  if (web_ratio > kWebProportionLimit) {
    r.warnings.push_back(
        fmt::format("{}: D/tw = {:.1f} exceeds the 150 of AASHTO LRFD 6.10.2.1.1", in.label, web_ratio));
  }

  const Real dp = out.plastic.depth_to_neutral_axis;
  const Real dt = out.plastic.total_depth;
  const Real ductility_limit = t.add_step("0.42 Dt", "ductility limit on Dp", "0.42 Dt", 0.42 * dt,
                                          Quantity::section_length, "AASHTO LRFD 6.10.7.3-1");
  out.ductile = dp <= ductility_limit;
  if (!out.ductile) {
    r.warnings.push_back(fmt::format(
        "{}: Dp = {:.4g} m exceeds 0.42 Dt = {:.4g} m, so the section fails the ductility requirement of AASHTO LRFD "
        "6.10.7.3; Mn is reported as computed and the engineer must judge it",
        in.label, dp, ductility_limit));
  }

  const Real phi = factors.steel_flexure;
  const std::string phi_source = factors.source(ResistanceFactorId::steel_flexure);
  if (out.compact) {
    const Real mp = out.plastic.plastic_moment;
    Real mn = 0;
    if (dp <= 0.1 * dt) {
      mn = t.add_step("Mn", "nominal flexural resistance (Dp <= 0.1 Dt)", "Mp", mp, Quantity::moment,
                      "AASHTO LRFD 6.10.7.1.2-1");
      r.article = "AASHTO LRFD 6.10.7.1.2-1";
    } else {
      mn = t.add_step("Mn", "nominal flexural resistance (Dp > 0.1 Dt)", "Mp (1.07 - 0.7 Dp / Dt)",
                      mp * (1.07 - 0.7 * dp / dt), Quantity::moment, "AASHTO LRFD 6.10.7.1.2-2");
      r.article = "AASHTO LRFD 6.10.7.1.2-2";
    }
    t.add_note(
        "the continuous-span limit Mn <= 1.3 Rh My (AASHTO LRFD 6.10.7.1.2-3) is not applied: My needs the "
        "stage dead-load moments (D6.2.2)");
    t.add_step("phi_f", "resistance factor for flexure", "phi_f", phi, Quantity::dimensionless, phi_source);
    t.add_step("phi Mn", "factored flexural resistance", "phi_f Mn", phi * mn, Quantity::moment,
               "AASHTO LRFD 6.10.7.1.1-1");
    r.status = ResistanceStatus::computed;
    r.nominal = mn;
    r.phi = phi;
    r.factored = phi * mn;
    return out;
  }

  // Noncompact: flange stresses, 6.10.7.2.
  Real rb = 1.0;
  if (web_ratio <= kWebProportionLimit) {
    rb = t.add_step("Rb", "web load-shedding factor", "1.0 (composite, positive flexure, D/tw <= 150)", 1.0,
                    Quantity::dimensionless, "AASHTO LRFD 6.10.1.10.2");
  } else {
    // Dc from the short-term composite section's elastic neutral axis
    // (a stand-in for the stage-summed stresses of D6.3.1).
    const section::StageProperties& st = *in.stages.short_term;
    assert(st.neutral_axis);
    const Real web_top = st.girder_top.value_or(0) - in.girder.top_flange.thickness -
                         (in.girder.top_cover_plate ? in.girder.top_cover_plate->thickness : 0.0);
    const Real dc = std::clamp(web_top - *st.neutral_axis, 0.0, d);
    t.add_step("Dc", "web depth in compression (short-term composite section)", "web top - neutral axis", dc,
               Quantity::section_length, "AASHTO LRFD D6.3.1");
    rb = web_load_shedding(dc, tw, in.girder.top_flange.width, in.girder.top_flange.thickness, in.steel_yield,
                           in.steel_modulus, t)
             .factor;
  }
  const Real fnc = t.add_step("Fnc", "nominal stress of the compression flange", "Rb Rh Fyc", rb * in.steel_yield,
                              Quantity::stress, "AASHTO LRFD 6.10.7.2.2-1");
  const Real fnt = t.add_step("Fnt", "nominal stress of the tension flange", "Rh Fyt", in.steel_yield, Quantity::stress,
                              "AASHTO LRFD 6.10.7.2.2-2");
  t.add_note("Rh = 1.0: flanges and web of one steel (homogeneous, AASHTO LRFD 6.10.1.10.1)");
  const section::StageProperties& st = *in.stages.short_term;
  if (!st.section_modulus_top || !st.section_modulus_bottom) {
    r = Resistance::unavailable_because(
        fmt::format("{}: the short-term composite section moduli are not known, so the noncompact resistance "
                    "(AASHTO LRFD 6.10.7.2) cannot be expressed; give the capacity in capacity.given",
                    in.label));
    return out;
  }
  const Real mn = t.add_step("Mn", "moment equivalent of the flange stresses on the short-term section",
                             "min(Fnc S_top, Fnt S_bottom)",
                             std::min(fnc * *st.section_modulus_top, fnt * *st.section_modulus_bottom),
                             Quantity::moment, "AASHTO LRFD 6.10.7.2.1");
  t.add_note(
      "the rating should use the flange-stress form (stage stresses against phi_f Fn); Mn here is its "
      "moment equivalent for a section under live load alone");
  t.add_step("phi_f", "resistance factor for flexure", "phi_f", phi, Quantity::dimensionless, phi_source);
  r.status = ResistanceStatus::computed;
  r.nominal = mn;
  r.phi = phi;
  r.factored = phi * mn;
  r.article = "AASHTO LRFD 6.10.7.2";
  FlangeStressResistance stress;
  stress.compression_flange = fnc;
  stress.tension_flange = fnt;
  stress.phi = phi;
  stress.compression_flange_on_top = true;
  stress.moduli = uncracked_stage_moduli(in.stages);
  r.flange_stress = stress;
  return out;
}

}  // namespace tenthpoint::capacity
