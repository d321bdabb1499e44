#include "engine/capacity/steel_shear.h"

#include <cassert>
#include <cmath>

#include <fmt/format.h>

#include "engine/core/units.h"

namespace tenthpoint::capacity {

Resistance steel_shear(const SteelShearInput& in, const ResistanceFactors& factors) {
  using units::Quantity;
  assert(in.web_depth > 0 && in.web_thickness > 0 && in.web_yield > 0 && in.modulus > 0);
  Resistance r;
  CalculationTrace& t = r.trace;
  t.title = fmt::format("{}: steel web shear", in.label);
  const Real d = in.web_depth;
  const Real tw = in.web_thickness;
  t.add_input("D", "web depth", d, Quantity::section_length);
  t.add_input("tw", "web thickness", tw, Quantity::section_length);
  t.add_input("Fyw", "web yield strength", in.web_yield, Quantity::stress);
  t.add_input("E", "steel modulus", in.modulus, Quantity::stress);

  bool stiffened = false;
  Real ratio = 0;  // do / D
  if (in.stiffener_spacing) {
    t.add_input("do", "transverse stiffener spacing", *in.stiffener_spacing, Quantity::section_length);
    ratio = *in.stiffener_spacing / d;
    stiffened = *in.stiffener_spacing <= 3.0 * d;
    if (!stiffened) {
      t.add_note("do > 3 D: the web is taken as unstiffened (AASHTO LRFD 6.10.9.1)");
    }
  } else {
    t.add_note("no transverse stiffeners: unstiffened web (AASHTO LRFD 6.10.9.2)");
  }

  const Real vp = t.add_step("Vp", "plastic shear force", "0.58 Fyw D tw", 0.58 * in.web_yield * d * tw,
                             Quantity::force, "AASHTO LRFD 6.10.9.2-2");
  const Real k = stiffened
                     ? t.add_step("k", "shear-buckling coefficient", "5 + 5 / (do / D)^2", 5.0 + 5.0 / (ratio * ratio),
                                  Quantity::dimensionless, "AASHTO LRFD 6.10.9.3.2-7")
                     : t.add_step("k", "shear-buckling coefficient", "5 (unstiffened)", 5.0, Quantity::dimensionless,
                                  "AASHTO LRFD 6.10.9.2");
  const Real slenderness =
      t.add_step("D/tw", "web slenderness", "D / tw", d / tw, Quantity::dimensionless, "AASHTO LRFD 6.10.9.3.2");
  const Real root = std::sqrt(in.modulus * k / in.web_yield);
  Real c = 0;
  if (slenderness <= 1.12 * root) {
    c = t.add_step("C", "shear-buckling to shear-yield ratio", "1.0 (D/tw <= 1.12 sqrt(E k / Fyw))", 1.0,
                   Quantity::dimensionless, "AASHTO LRFD 6.10.9.3.2-4");
  } else if (slenderness <= 1.40 * root) {
    c = t.add_step("C", "shear-buckling to shear-yield ratio", "1.12 / (D/tw) sqrt(E k / Fyw)",
                   1.12 / slenderness * root, Quantity::dimensionless, "AASHTO LRFD 6.10.9.3.2-5");
  } else {
    c = t.add_step("C", "shear-buckling to shear-yield ratio", "1.57 / (D/tw)^2 (E k / Fyw)",
                   1.57 / (slenderness * slenderness) * root * root, Quantity::dimensionless,
                   "AASHTO LRFD 6.10.9.3.2-6");
  }
  if (!stiffened && slenderness > 150.0) {
    r.warnings.push_back(
        fmt::format("{}: unstiffened web with D/tw = {:.1f} > 150 (AASHTO LRFD 6.10.2.1.1)", in.label, slenderness));
  }

  Real vn = 0;
  if (!stiffened) {
    vn = t.add_step("Vn", "nominal shear resistance (unstiffened web)", "C Vp", c * vp, Quantity::force,
                    "AASHTO LRFD 6.10.9.2-1");
    r.article = "AASHTO LRFD 6.10.9.2";
  } else if (in.end_panel) {
    vn = t.add_step("Vn", "nominal shear resistance (end panel, no tension field)", "C Vp", c * vp, Quantity::force,
                    "AASHTO LRFD 6.10.9.3.3-1");
    r.article = "AASHTO LRFD 6.10.9.3.3";
  } else {
    assert(in.compression_flange_area > 0 && in.tension_flange_area > 0);
    const Real flange_ratio = t.add_step("2Dtw/(Af)", "web to flange area ratio", "2 D tw / (bfc tfc + bft tft)",
                                         2.0 * d * tw / (in.compression_flange_area + in.tension_flange_area),
                                         Quantity::dimensionless, "AASHTO LRFD 6.10.9.3.2-1");
    const Real root_term = std::sqrt(1.0 + ratio * ratio);
    if (flange_ratio <= 2.5) {
      vn = t.add_step("Vn", "nominal shear resistance (interior panel, tension field)",
                      "Vp [C + 0.87 (1 - C) / sqrt(1 + (do/D)^2)]", vp * (c + 0.87 * (1.0 - c) / root_term),
                      Quantity::force, "AASHTO LRFD 6.10.9.3.2-2");
    } else {
      vn = t.add_step("Vn", "nominal shear resistance (interior panel, reduced tension field)",
                      "Vp [C + 0.87 (1 - C) / (sqrt(1 + (do/D)^2) + do/D)]",
                      vp * (c + 0.87 * (1.0 - c) / (root_term + ratio)), Quantity::force, "AASHTO LRFD 6.10.9.3.2-8");
    }
    t.add_note("flange areas are the flange plates alone (cover plates left out, conservative)");
    r.article = "AASHTO LRFD 6.10.9.3.2";
  }
  const Real phi = factors.steel_shear;
  t.add_step("phi_v", "resistance factor for shear", "phi_v", phi, Quantity::dimensionless,
             factors.source(ResistanceFactorId::steel_shear));
  t.add_step("phi Vn", "factored shear resistance", "phi_v Vn", phi * vn, Quantity::force, "AASHTO LRFD 6.10.9.1-1");
  r.status = ResistanceStatus::computed;
  r.nominal = vn;
  r.phi = phi;
  r.factored = phi * vn;
  return r;
}

}  // namespace tenthpoint::capacity
