#include "engine/capacity/concrete_shear.h"

#include <algorithm>
#include <cassert>
#include <cmath>

#include <fmt/format.h>

#include "engine/core/units.h"

namespace tenthpoint::capacity {
namespace {

using units::Quantity;

// The US-unit coefficient 0.0316 = 1/sqrt(1000): sqrt(f'c) in ksi of the
// forms written with sqrt(f'c) in psi (LRFD 5.7.3.3-3, 5.7.2.5-1).
constexpr Real kRootCoefficient = 0.0316;
// Upper bound on eps_s in the general procedure, LRFD 5.7.3.4.2.
constexpr Real kMaxStrain = 6.0e-3;
// LRFD 5.7.3.4.1 permits beta = 2.0 for sections no deeper than 16 in
// without minimum transverse reinforcement.
constexpr Real kShallowSection = 16.0 * units::kInch;

}  // namespace

std::string_view to_string(ConcreteShearMethod method) {
  return method == ConcreteShearMethod::simplified ? "simplified" : "general";
}

Resistance concrete_shear(const ConcreteShearSection& s, Real dv, const std::optional<ShearDemand>& demand,
                          ConcreteShearMethod method, Real aggregate_size, const ResistanceFactors& factors) {
  assert(s.web_width > 0 && s.height > 0 && s.concrete_strength > 0 && dv > 0 && aggregate_size > 0);
  Resistance r;
  CalculationTrace& t = r.trace;
  t.title = fmt::format("{}: shear, {} procedure", s.label, to_string(method));

  const bool stirrups = s.stirrup_area && s.stirrup_spacing && *s.stirrup_area > 0 && *s.stirrup_spacing > 0;
  const Real fc_ksi = s.concrete_strength / units::kKsi;
  const Real bv_in = s.web_width / units::kInch;
  const Real dv_in = dv / units::kInch;
  t.add_input("bv", "effective web width", s.web_width, Quantity::section_length);
  t.add_input("dv", "effective shear depth (LRFD 5.7.2.8)", dv, Quantity::section_length);
  t.add_input("f'c", "concrete compressive strength", s.concrete_strength, Quantity::stress);
  t.add_input("lambda", "concrete density modification factor", s.density_factor, Quantity::dimensionless);

  Real av_min = 0;
  if (stirrups) {
    assert(s.stirrup_yield > 0);
    t.add_input("Av", "transverse reinforcement area per set", *s.stirrup_area, Quantity::area);
    t.add_input("s", "stirrup spacing", *s.stirrup_spacing, Quantity::section_length);
    t.add_input("fy", "stirrup yield strength", s.stirrup_yield, Quantity::stress);
    // 5.7.2.5-1 in ksi and in: Av,min = 0.0316 lambda sqrt(f'c) bv s / fy.
    av_min = t.add_step("Av,min", "minimum transverse reinforcement", "0.0316 lambda sqrt(f'c) bv s / fy (ksi, in)",
                        kRootCoefficient * s.density_factor * std::sqrt(fc_ksi) * bv_in *
                            (*s.stirrup_spacing / units::kInch) / (s.stirrup_yield / units::kKsi) * units::kInch *
                            units::kInch,
                        Quantity::area, "AASHTO LRFD 5.7.2.5-1");
  } else {
    t.add_note("no transverse reinforcement: Vs = 0");
  }
  const bool minimum_steel = stirrups && *s.stirrup_area >= av_min;

  Real beta = 2.0;
  Real theta_deg = 45.0;
  if (method == ConcreteShearMethod::simplified) {
    t.add_step("beta", "factor for the tensile stress in cracked concrete", "2.0", beta, Quantity::dimensionless,
               "AASHTO LRFD 5.7.3.4.1");
    t.add_step("theta", "angle of the diagonal compression", "45 degrees", theta_deg * units::kDegree, Quantity::angle,
               "AASHTO LRFD 5.7.3.4.1");
    if (s.prestressed) {
      r.warnings.push_back(fmt::format(
          "{}: the simplified procedure of AASHTO LRFD 5.7.3.4.1 is written for nonprestressed sections; beta = 2, "
          "theta = 45 degrees on a prestressed web ignores the prestress (conservative)",
          s.label));
    }
    if (!minimum_steel && s.height > kShallowSection) {
      r.warnings.push_back(fmt::format(
          "{}: beta = 2.0 (AASHTO LRFD 5.7.3.4.1) applies to sections with at least the minimum transverse "
          "reinforcement (5.7.2.5) or no deeper than 16 in; this one has neither, consider the general procedure",
          s.label));
    }
  } else {
    if (!demand) {
      return Resistance::unavailable_because(fmt::format(
          "{}: the general shear procedure (AASHTO LRFD 5.7.3.4.2) needs the factored Mu and Vu at the section",
          s.label));
    }
    const Real denominator = s.bar_modulus * s.bar_area + s.strand_modulus * s.strand_area;
    if (!(denominator > 0)) {
      return Resistance::unavailable_because(fmt::format(
          "{}: no longitudinal steel on the flexural tension side, so eps_s of AASHTO LRFD 5.7.3.4.2-4 is undefined",
          s.label));
    }
    const Real vu = std::abs(demand->shear);
    t.add_input("Mu", "factored moment at the section", demand->moment, Quantity::moment);
    t.add_input("Vu", "factored shear at the section", demand->shear, Quantity::force);
    t.add_input("Nu", "factored axial force, tension positive", demand->axial, Quantity::force);
    // 5.7.3.4.2: |Mu| not less than |Vu - Vp| dv; Vp = 0 (straight strands).
    const Real mu = t.add_step("|Mu|", "moment used for eps_s", "max(|Mu|, |Vu - Vp| dv)",
                               std::max(std::abs(demand->moment), vu * dv), Quantity::moment, "AASHTO LRFD 5.7.3.4.2");
    const Real fpo = 0.7 * s.strand_tensile_strength;
    if (s.strand_area > 0) {
      t.add_step("fpo", "locked-in strand stress", "0.7 fpu", fpo, Quantity::stress, "AASHTO LRFD 5.7.3.4.2");
    }
    Real eps_s = (mu / dv + 0.5 * demand->axial + vu - s.strand_area * fpo) / denominator;
    eps_s = t.add_step("eps_s", "net longitudinal tensile strain at the centroid of the tension steel",
                       "(|Mu|/dv + 0.5 Nu + |Vu - Vp| - Aps fpo) / (Es As + Ep Aps)", eps_s, Quantity::dimensionless,
                       "AASHTO LRFD 5.7.3.4.2-4");
    if (eps_s < 0) {
      t.add_note("eps_s < 0 taken as 0 (permitted by AASHTO LRFD 5.7.3.4.2; conservative)");
      eps_s = t.add_step("eps_s", "strain used", "0", 0.0, Quantity::dimensionless, "AASHTO LRFD 5.7.3.4.2");
    } else if (eps_s > kMaxStrain) {
      eps_s = t.add_step("eps_s", "strain used", "6.0e-3 (upper limit)", kMaxStrain, Quantity::dimensionless,
                         "AASHTO LRFD 5.7.3.4.2");
    }
    if (minimum_steel) {
      beta = t.add_step("beta", "factor for the tensile stress in cracked concrete", "4.8 / (1 + 750 eps_s)",
                        4.8 / (1.0 + 750.0 * eps_s), Quantity::dimensionless, "AASHTO LRFD 5.7.3.4.2-1");
    } else {
      // 5.7.3.4.2-7 in inches; sx = dv (no distributed longitudinal crack-control bars in the model).
      const Real ag_in = aggregate_size / units::kInch;
      t.add_input("ag", "maximum aggregate size", aggregate_size, Quantity::section_length);
      const Real sxe_in = std::clamp(dv_in * 1.38 / (ag_in + 0.63), 12.0, 80.0);
      t.add_step("sxe", "equivalent crack spacing parameter", "sx 1.38 / (ag + 0.63), sx = dv, 12 in <= sxe <= 80 in",
                 sxe_in * units::kInch, Quantity::section_length, "AASHTO LRFD 5.7.3.4.2-7");
      beta = t.add_step("beta", "factor for the tensile stress in cracked concrete",
                        "4.8 / (1 + 750 eps_s) x 51 / (39 + sxe)", 4.8 / (1.0 + 750.0 * eps_s) * 51.0 / (39.0 + sxe_in),
                        Quantity::dimensionless, "AASHTO LRFD 5.7.3.4.2-2");
    }
    theta_deg = 29.0 + 3500.0 * eps_s;
    t.add_step("theta", "angle of the diagonal compression", "29 + 3500 eps_s (degrees)", theta_deg * units::kDegree,
               Quantity::angle, "AASHTO LRFD 5.7.3.4.2-3");
  }

  // 5.7.3.3-3 in kip, ksi, in: Vc = 0.0316 beta lambda sqrt(f'c) bv dv.
  const Real vc =
      t.add_step("Vc", "nominal shear resistance of the concrete", "0.0316 beta lambda sqrt(f'c) bv dv (ksi, in)",
                 kRootCoefficient * beta * s.density_factor * std::sqrt(fc_ksi) * bv_in * dv_in * units::kKip,
                 Quantity::force, "AASHTO LRFD 5.7.3.3-3");
  Real vs = 0;
  if (stirrups) {
    const Real theta = theta_deg * units::kDegree;
    vs = t.add_step("Vs", "shear resistance of the stirrups (alpha = 90 degrees)", "Av fy dv cot(theta) / s",
                    *s.stirrup_area * s.stirrup_yield * dv / std::tan(theta) / *s.stirrup_spacing, Quantity::force,
                    "AASHTO LRFD 5.7.3.3-4");
  }
  const Real vp = 0;
  t.add_note("Vp = 0: straight strands only (no draped profile in the model)");
  const Real limit =
      t.add_step("Vn,max", "upper limit on the nominal shear resistance", "0.25 f'c bv dv + Vp",
                 0.25 * s.concrete_strength * s.web_width * dv + vp, Quantity::force, "AASHTO LRFD 5.7.3.3-2");
  const Real vn = t.add_step("Vn", "nominal shear resistance", "min(Vc + Vs + Vp, 0.25 f'c bv dv + Vp)",
                             std::min(vc + vs + vp, limit), Quantity::force, "AASHTO LRFD 5.7.3.3-1, -2");
  const Real phi = factors.concrete_shear;
  t.add_step("phi", "resistance factor for shear", "phi_v", phi, Quantity::dimensionless,
             factors.source(ResistanceFactorId::concrete_shear));
  t.add_step("phi Vn", "factored shear resistance", "phi Vn", phi * vn, Quantity::force, "AASHTO LRFD 1.3.2.1-1");

  r.status = ResistanceStatus::computed;
  r.nominal = vn;
  r.phi = phi;
  r.factored = phi * vn;
  r.article =
      method == ConcreteShearMethod::simplified ? "AASHTO LRFD 5.7.3.3, 5.7.3.4.1" : "AASHTO LRFD 5.7.3.3, 5.7.3.4.2";
  return r;
}

}  // namespace tenthpoint::capacity
