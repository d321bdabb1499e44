#include "engine/capacity/steel_flange_flexure.h"

#include <algorithm>
#include <cassert>
#include <cmath>

#include <fmt/format.h>

#include "engine/capacity/web_load_shedding.h"
#include "engine/core/units.h"

namespace tenthpoint::capacity {

SteelFlangeFlexure steel_flange_flexure(const SteelFlangeFlexureInput& in, const ResistanceFactors& factors) {
  using units::Quantity;
  assert(in.steel_yield > 0 && in.steel_modulus > 0 && in.unbraced_length > 0 && in.moment_gradient_factor >= 1.0);
  SteelFlangeFlexure out;
  Resistance& r = out.resistance;
  CalculationTrace& t = r.trace;
  t.title = fmt::format("{}: steel flange flexure, compression flange at the {}", in.label,
                        in.compression_on_top ? "top" : "bottom");
  const Real e = in.steel_modulus;
  const Real fyc = in.steel_yield;
  const Real fyw = in.steel_yield;
  const Real d = in.girder.web.width;
  const Real tw = in.girder.web.thickness;

  const model::Plate& flange = in.compression_on_top ? in.girder.top_flange : in.girder.bottom_flange;
  const std::optional<model::Plate>& cover =
      in.compression_on_top ? in.girder.top_cover_plate : in.girder.bottom_cover_plate;
  const Real bfc = flange.width;
  Real afc = flange.width * flange.thickness;
  if (cover) {
    afc += cover->width * cover->thickness;
    t.add_note(
        "compression cover plate merged with its flange: one plate of the flange width and the combined area "
        "(common practice)");
  }
  const Real tfc = afc / bfc;
  t.add_input("Fyc", "compression flange yield strength", fyc, Quantity::stress);
  t.add_input("E", "steel modulus", e, Quantity::stress);
  t.add_input("bfc", "compression flange width", bfc, Quantity::section_length);
  t.add_input("tfc", "compression flange thickness", tfc, Quantity::section_length);
  t.add_input("D", "web depth", d, Quantity::section_length);
  t.add_input("tw", "web thickness", tw, Quantity::section_length);
  t.add_input("Dc", "web depth in compression (elastic)", in.web_compression_depth, Quantity::section_length);
  t.add_input("Lb", "unbraced length of the compression flange", in.unbraced_length, Quantity::length);
  t.add_input("Cb", "moment gradient modifier", in.moment_gradient_factor, Quantity::dimensionless);
  t.add_note("Rh = 1.0 (homogeneous girder); fl = 0 (no lateral flange bending)");
  if (in.moment_gradient_factor == 1.0) t.add_note("Cb = 1.0 (conservative; 6.10.8.2.3-7 not applied)");

  const WebLoadShedding shedding = web_load_shedding(in.web_compression_depth, tw, bfc, tfc, fyc, e, t);
  const Real rb = shedding.factor;
  out.load_shedding = rb;
  const Real fyr = t.add_step("Fyr", "compression flange stress at the onset of yielding",
                              "min(0.7 Fyc, Fyw), not less than 0.5 Fyc", std::max(std::min(0.7 * fyc, fyw), 0.5 * fyc),
                              Quantity::stress, "AASHTO LRFD 6.10.8.2.2");
  const Real full = rb * fyc;  // Rb Rh Fyc

  // Local buckling, 6.10.8.2.2.
  const Real lambda_f = t.add_step("lambda_f", "compression flange slenderness", "bfc / (2 tfc)", bfc / (2.0 * tfc),
                                   Quantity::dimensionless, "AASHTO LRFD 6.10.8.2.2-3");
  const Real lambda_pf = t.add_step("lambda_pf", "compact flange limit", "0.38 sqrt(E / Fyc)",
                                    0.38 * std::sqrt(e / fyc), Quantity::dimensionless, "AASHTO LRFD 6.10.8.2.2-4");
  const Real lambda_rf = t.add_step("lambda_rf", "noncompact flange limit", "0.56 sqrt(E / Fyr)",
                                    0.56 * std::sqrt(e / fyr), Quantity::dimensionless, "AASHTO LRFD 6.10.8.2.2-5");
  Real flb = 0;
  if (lambda_f <= lambda_pf) {
    flb = t.add_step("Fnc(FLB)", "local buckling resistance (compact flange)", "Rb Rh Fyc", full, Quantity::stress,
                     "AASHTO LRFD 6.10.8.2.2-1");
  } else {
    const Real inelastic = (1.0 - (1.0 - fyr / fyc) * (lambda_f - lambda_pf) / (lambda_rf - lambda_pf)) * full;
    if (lambda_f <= lambda_rf) {
      flb = t.add_step("Fnc(FLB)", "local buckling resistance (noncompact flange)",
                       "[1 - (1 - Fyr / (Rh Fyc)) (lambda_f - lambda_pf) / (lambda_rf - lambda_pf)] Rb Rh Fyc",
                       inelastic, Quantity::stress, "AASHTO LRFD 6.10.8.2.2-2");
    } else {
      const Real kc = t.add_step("kc", "flange local buckling coefficient", "4 / sqrt(D / tw), in [0.35, 0.76]",
                                 std::clamp(4.0 / std::sqrt(d / tw), 0.35, 0.76), Quantity::dimensionless,
                                 "AISC 360-16 Table B4.1b note [a]");
      const Real elastic =
          t.add_step("Fcr(FLB)", "elastic local buckling stress", "0.9 E kc / lambda_f^2 Rb",
                     0.9 * e * kc / (lambda_f * lambda_f) * rb, Quantity::stress, "AISC 360-16 Eq. F3-2");
      flb = t.add_step("Fnc(FLB)", "local buckling resistance (slender flange)", "min(6.10.8.2.2-2, Fcr)",
                       std::min(inelastic, elastic), Quantity::stress, "AASHTO LRFD 6.10.8.2.2-2; AISC 360-16 F3-2");
      r.warnings.push_back(fmt::format(
          "{}: slender compression flange (lambda_f = {:.2f} > lambda_rf = {:.2f}), beyond AASHTO LRFD 6.10.8.2.2; "
          "the elastic local buckling stress of AISC 360-16 Eq. F3-2 bounds Fnc",
          in.label, lambda_f, lambda_rf));
    }
  }
  out.local_buckling_stress = flb;

  // Lateral-torsional buckling, 6.10.8.2.3.
  const Real rt = t.add_step("rt", "radius of gyration of the compression flange and a third of the web in compression",
                             "bfc / sqrt(12 (1 + Dc tw / (3 bfc tfc)))",
                             bfc / std::sqrt(12.0 * (1.0 + in.web_compression_depth * tw / (3.0 * bfc * tfc))),
                             Quantity::section_length, "AASHTO LRFD 6.10.8.2.3-9");
  const Real lp = t.add_step("Lp", "limiting unbraced length for yielding", "1.0 rt sqrt(E / Fyc)",
                             rt * std::sqrt(e / fyc), Quantity::length, "AASHTO LRFD 6.10.8.2.3-4");
  const Real lr = t.add_step("Lr", "limiting unbraced length for inelastic buckling", "pi rt sqrt(E / Fyr)",
                             units::kPi * rt * std::sqrt(e / fyr), Quantity::length, "AASHTO LRFD 6.10.8.2.3-5");
  const Real lb = in.unbraced_length;
  const Real cb = in.moment_gradient_factor;
  Real ltb = 0;
  if (lb <= lp) {
    ltb = t.add_step("Fnc(LTB)", "lateral-torsional buckling resistance (Lb <= Lp)", "Rb Rh Fyc", full,
                     Quantity::stress, "AASHTO LRFD 6.10.8.2.3-1");
  } else if (lb <= lr) {
    ltb = t.add_step("Fnc(LTB)", "lateral-torsional buckling resistance (Lp < Lb <= Lr)",
                     "Cb [1 - (1 - Fyr / (Rh Fyc)) (Lb - Lp) / (Lr - Lp)] Rb Rh Fyc <= Rb Rh Fyc",
                     std::min(full, cb * (1.0 - (1.0 - fyr / fyc) * (lb - lp) / (lr - lp)) * full), Quantity::stress,
                     "AASHTO LRFD 6.10.8.2.3-2");
  } else {
    const Real fcr = t.add_step("Fcr", "elastic lateral-torsional buckling stress", "Cb Rb pi^2 E / (Lb / rt)^2",
                                cb * rb * units::kPi * units::kPi * e / ((lb / rt) * (lb / rt)), Quantity::stress,
                                "AASHTO LRFD 6.10.8.2.3-8");
    ltb = t.add_step("Fnc(LTB)", "lateral-torsional buckling resistance (Lb > Lr)", "Fcr <= Rb Rh Fyc",
                     std::min(fcr, full), Quantity::stress, "AASHTO LRFD 6.10.8.2.3-3");
  }
  out.lateral_torsional_stress = ltb;

  const Real fnc = t.add_step("Fnc", "nominal flexural resistance of the compression flange", "min(Fnc(FLB), Fnc(LTB))",
                              std::min(flb, ltb), Quantity::stress, "AASHTO LRFD 6.10.8.2.1");
  const Real fnt = t.add_step("Fnt", "nominal flexural resistance of the tension flange", "Rh Fyt", in.steel_yield,
                              Quantity::stress, "AASHTO LRFD 6.10.8.3-1");
  const Real phi = factors.steel_flexure;
  t.add_step("phi_f", "resistance factor for flexure", "phi_f", phi, Quantity::dimensionless,
             factors.source(ResistanceFactorId::steel_flexure));

  FlangeStressResistance stress;
  stress.compression_flange = fnc;
  stress.tension_flange = fnt;
  stress.phi = phi;
  stress.compression_flange_on_top = in.compression_on_top;
  stress.moduli = in.moduli;
  if (!in.compression_modulus || !in.tension_modulus) {
    const std::vector<std::string> warnings = r.warnings;
    CalculationTrace trace = t;
    r = Resistance::unavailable_because(fmt::format(
        "{}: the section moduli at the flanges are not known, so the 6.10.8 flange stresses cannot be expressed as a "
        "moment; give section moduli or the capacity in capacity.given",
        in.label));
    r.warnings = warnings;
    r.trace = trace;
    r.flange_stress = stress;
    return out;
  }
  const Real mn =
      t.add_step("Mn", "moment equivalent of the flange resistances on the live-load section", "min(Fnc S_c, Fnt S_t)",
                 std::min(fnc * *in.compression_modulus, fnt * *in.tension_modulus), Quantity::moment,
                 "AASHTO LRFD 6.10.8.1.1, 6.10.8.1.2");
  t.add_note(
      "the rating should use the flange-stress form (stage stresses M/S against phi_f Fn); Mn is its moment "
      "equivalent for a moment acting on the live-load section alone");
  t.add_step("phi Mn", "factored flexural resistance (moment equivalent)", "phi_f Mn", phi * mn, Quantity::moment,
             "AASHTO LRFD 1.3.2.1-1");
  r.status = ResistanceStatus::computed;
  r.nominal = mn;
  r.phi = phi;
  r.factored = phi * mn;
  r.article = flb <= ltb ? "AASHTO LRFD 6.10.8.2.2" : "AASHTO LRFD 6.10.8.2.3";
  r.flange_stress = stress;
  return out;
}

}  // namespace tenthpoint::capacity
