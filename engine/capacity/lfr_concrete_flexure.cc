#include "engine/capacity/lfr_concrete_flexure.h"

#include <algorithm>
#include <cassert>

#include <fmt/format.h>

#include "engine/core/units.h"

namespace tenthpoint::capacity {
namespace {

using units::Quantity;

// Standard Specifications 8.16.1.2.2 and 9.14 (from memory).
constexpr Real kPhiReinforced = 0.90;
constexpr Real kPhiPrestressed = 1.00;
constexpr Real kPsi = units::kKsi / 1000.0;

struct Resultant {
  Real area = 0;
  Real centroid = 0;  // m from the compression face
};

Resultant resultant(const std::vector<ReinforcementLayer>& layers) {
  Resultant r;
  Real moment = 0;
  for (const ReinforcementLayer& layer : layers) {
    r.area += layer.area;
    moment += layer.area * layer.depth;
  }
  r.centroid = r.area > 0 ? moment / r.area : 0;
  return r;
}

void finish(ConcreteFlexure& out, Real mn, Real phi, Real depth, Real tension, const std::string& article) {
  CalculationTrace& t = out.resistance.trace;
  t.add_step(
      "phi", "strength reduction factor", "", phi, Quantity::dimensionless,
      phi == kPhiReinforced ? "AASHTO Standard Specifications 8.16.1.2.2" : "AASHTO Standard Specifications 9.14");
  t.add_step("phi Mn", "design flexural strength", "phi Mn", phi * mn, Quantity::moment, article);
  out.tension_force = tension;
  out.effective_depth = depth;
  out.shear_depth = depth;
  out.resistance.status = ResistanceStatus::computed;
  out.resistance.nominal = mn;
  out.resistance.phi = phi;
  out.resistance.factored = phi * mn;
  out.resistance.article = article;
}

ConcreteFlexure reinforced(const ConcreteFlexureSection& s, const Resultant& bars) {
  ConcreteFlexure out;
  CalculationTrace& t = out.resistance.trace;
  const Real fc = s.concrete_strength;
  const Real fy = s.bar_yield;
  const Real d = bars.centroid;
  const bool flanged = s.flange_thickness > 0 && s.flange_width > s.web_width;
  const Real b = flanged ? s.flange_width : s.web_width;
  t.add_input("As", "tension reinforcement area", bars.area, Quantity::area);
  t.add_input("d", "depth to the tension reinforcement centroid", d, Quantity::section_length);
  t.add_input("fy", "reinforcement yield strength", fy, Quantity::stress);
  const Real beta1 =
      t.add_step("beta1", "stress block depth factor", "0.85, less 0.05 per 1000 psi above 4000 psi",
                 standard_spec_beta1(fc), Quantity::dimensionless, "AASHTO Standard Specifications 8.16.2.7");

  // 8.16.3.1.1: rho <= 0.75 rho_b, rho_b = (0.85 beta1 f'c / fy) 87000 / (87000 + fy) (psi).
  const Real fy_psi = fy / kPsi;
  const Real rho_b = 0.85 * beta1 * fc / fy * 87000.0 / (87000.0 + fy_psi);
  Real a =
      t.add_step("a", "depth of the stress block (rectangular trial)", "As fy / (0.85 f'c b)",
                 bars.area * fy / (0.85 * fc * b), Quantity::section_length, "AASHTO Standard Specifications 8-18");
  Real mn = 0;
  Real rho = bars.area / (b * d);
  if (flanged && a > s.flange_thickness) {
    out.t_section = true;
    const Real asf = t.add_step("Asf", "steel area balancing the flange overhangs", "0.85 f'c (b - bw) hf / fy",
                                0.85 * fc * (s.flange_width - s.web_width) * s.flange_thickness / fy, Quantity::area,
                                "AASHTO Standard Specifications 8-20");
    a = t.add_step("a", "depth of the stress block in the web", "(As - Asf) fy / (0.85 f'c bw)",
                   (bars.area - asf) * fy / (0.85 * fc * s.web_width), Quantity::section_length,
                   "AASHTO Standard Specifications 8-21");
    mn = t.add_step("Mn", "nominal flexural strength, flanged section", "(As - Asf) fy (d - a/2) + Asf fy (d - hf/2)",
                    (bars.area - asf) * fy * (d - a / 2) + asf * fy * (d - s.flange_thickness / 2), Quantity::moment,
                    "AASHTO Standard Specifications 8-19");
    // rho_b of a flanged section: (bw / b)(rho_b + rho_f), rho_f = Asf / (bw d) (8.16.3.3.1).
    rho = bars.area / (s.web_width * d);
    const Real limit = 0.75 * (rho_b + asf / (s.web_width * d));
    if (rho > limit)
      out.resistance.warnings.push_back(fmt::format(
          "{}: rho_w = {:.4f} exceeds 0.75 (rho_b + rho_f) = {:.4f} (Standard Specifications 8.16.3.3.1); the "
          "strength assumes yielded steel",
          s.label, rho, limit));
  } else {
    mn = t.add_step("Mn", "nominal flexural strength", "As fy (d - a/2)", bars.area * fy * (d - a / 2),
                    Quantity::moment, "AASHTO Standard Specifications 8-17");
    if (rho > 0.75 * rho_b)
      out.resistance.warnings.push_back(fmt::format(
          "{}: rho = {:.4f} exceeds 0.75 rho_b = {:.4f} (Standard Specifications 8.16.3.1.1); the strength assumes "
          "yielded steel",
          s.label, rho, 0.75 * rho_b));
  }
  out.block_depth = a;
  out.neutral_axis_depth = a / beta1;
  if (!(a < d)) {
    out.resistance = Resistance::unavailable_because(
        fmt::format("{}: the stress block (a = {:.4g} m) reaches the tension steel; Standard Specifications 8.16.3 "
                    "does not apply; give the capacity in capacity.given",
                    s.label, a));
    return out;
  }
  finish(out, mn, kPhiReinforced, d, bars.area * fy,
         out.t_section ? "AASHTO Standard Specifications 8.16.3.3" : "AASHTO Standard Specifications 8.16.3.2");
  return out;
}

ConcreteFlexure prestressed(const ConcreteFlexureSection& s, const Resultant& strands, bool bars_present) {
  ConcreteFlexure out;
  CalculationTrace& t = out.resistance.trace;
  const Real fc = s.concrete_strength;
  const Real fpu = s.strand_tensile_strength;
  const Real d = strands.centroid;
  const bool flanged = s.flange_thickness > 0 && s.flange_width > s.web_width;
  const Real b = flanged ? s.flange_width : s.web_width;
  t.add_input("Aps", "bonded prestressing steel area", strands.area, Quantity::area);
  t.add_input("d", "depth to the prestressing steel centroid", d, Quantity::section_length);
  t.add_input("f's", "ultimate strength of the prestressing steel", fpu, Quantity::stress);
  t.add_input("f*y", "yield strength of the prestressing steel", s.strand_yield_strength, Quantity::stress);
  if (bars_present) t.add_note("mild tension reinforcement beside the strands left out (conservative)");
  const Real beta1 = t.add_step("beta1", "stress block depth factor", "0.85, less 0.05 per 1000 psi above 4000 psi",
                                standard_spec_beta1(fc), Quantity::dimensionless,
                                "AASHTO Standard Specifications 8.16.2.7 (9.17 refers to it)");
  // 9.17.4 (from memory): gamma* = 0.28 for low-relaxation strand (f*y/f's
  // >= 0.90), 0.40 for stress-relieved strand (>= 0.85), 0.55 for bars.
  const Real ratio = s.strand_yield_strength / fpu;
  const Real gamma = t.add_step("gamma*", "prestressing steel type factor", "0.28 / 0.40 / 0.55 by f*y / f's",
                                ratio >= 0.90 ? 0.28 : (ratio >= 0.85 ? 0.40 : 0.55), Quantity::dimensionless,
                                "AASHTO Standard Specifications 9.17.4");
  const Real rho = t.add_step("rho*", "prestressing steel ratio", "Aps / (b d)", strands.area / (b * d),
                              Quantity::dimensionless, "AASHTO Standard Specifications 9.1.2");
  const Real fsu = t.add_step(
      "fsu*", "average stress in the prestressing steel at ultimate", "f's (1 - (gamma* / beta1) (rho* f's / f'c))",
      fpu * (1.0 - gamma / beta1 * (rho * fpu / fc)), Quantity::stress, "AASHTO Standard Specifications 9-17");
  out.strand_stress = fsu;
  Real mn = 0;
  std::string article;
  const Real omega_limit = 0.36 * beta1;  // 9.18.1
  const Real over_coefficient = 0.36 * beta1 - 0.08 * beta1 * beta1;
  if (!flanged || s.flange_thickness >= 1.4 * d * rho * fsu / fc) {
    // 9.17.2: the compression block stays within the flange.
    if (rho * fsu / fc <= omega_limit) {
      mn = t.add_step("Mn", "nominal flexural strength, rectangular section", "Aps fsu* d (1 - 0.6 rho* fsu* / f'c)",
                      strands.area * fsu * d * (1.0 - 0.6 * rho * fsu / fc), Quantity::moment,
                      "AASHTO Standard Specifications 9-13");
      article = "AASHTO Standard Specifications 9.17.2";
    } else {
      mn = t.add_step("Mn", "nominal flexural strength, over-reinforced", "(0.36 beta1 - 0.08 beta1^2) f'c b d^2",
                      over_coefficient * fc * b * d * d, Quantity::moment, "AASHTO Standard Specifications 9-20");
      article = "AASHTO Standard Specifications 9.18.1";
    }
    out.block_depth = strands.area * fsu / (0.85 * fc * b);
  } else {
    out.t_section = true;
    const Real overhang = 0.85 * fc * (s.flange_width - s.web_width) * s.flange_thickness;
    const Real asf = t.add_step("Asf", "steel area developing the flange overhangs", "0.85 f'c (b - b') hf / fsu*",
                                overhang / fsu, Quantity::area, "AASHTO Standard Specifications 9-15");
    const Real asr = t.add_step("Asr", "steel area developing the web", "Aps - Asf", strands.area - asf, Quantity::area,
                                "AASHTO Standard Specifications 9-16");
    const Real web_index = asr * fsu / (s.web_width * d * fc);
    if (web_index <= omega_limit) {
      mn = t.add_step("Mn", "nominal flexural strength, flanged section",
                      "Asr fsu* d (1 - 0.6 Asr fsu* / (b' d f'c)) + 0.85 f'c (b - b') hf (d - hf/2)",
                      asr * fsu * d * (1.0 - 0.6 * web_index) + overhang * (d - s.flange_thickness / 2),
                      Quantity::moment, "AASHTO Standard Specifications 9-14");
      article = "AASHTO Standard Specifications 9.17.3";
    } else {
      mn = t.add_step("Mn", "nominal flexural strength, over-reinforced flanged section",
                      "(0.36 beta1 - 0.08 beta1^2) f'c b' d^2 + 0.85 f'c (b - b') hf (d - hf/2)",
                      over_coefficient * fc * s.web_width * d * d + overhang * (d - s.flange_thickness / 2),
                      Quantity::moment, "AASHTO Standard Specifications 9-21");
      article = "AASHTO Standard Specifications 9.18.1";
    }
    out.block_depth = asr * fsu / (0.85 * fc * s.web_width);
  }
  out.neutral_axis_depth = out.block_depth / beta1;
  if (!(fsu > 0) || !(out.block_depth < d)) {
    out.resistance = Resistance::unavailable_because(
        fmt::format("{}: the compression block reaches the strands; Standard Specifications 9.17 does not apply; "
                    "give the capacity in capacity.given",
                    s.label));
    return out;
  }
  finish(out, mn, kPhiPrestressed, d, strands.area * fsu, article);
  return out;
}

}  // namespace

Real standard_spec_beta1(Real compressive_strength) {
  assert(compressive_strength > 0);
  const Real fc_psi = compressive_strength / kPsi;
  return std::clamp(0.85 - 0.05 * (fc_psi - 4000.0) / 1000.0, 0.65, 0.85);
}

ConcreteFlexure lfr_concrete_flexure(const ConcreteFlexureSection& s) {
  assert(s.height > 0 && s.web_width > 0 && s.concrete_strength > 0);
  const Resultant bars = resultant(s.bars);
  const Resultant strands = resultant(s.strands);
  if (bars.area <= 0 && strands.area <= 0) {
    ConcreteFlexure out;
    out.resistance = Resistance::unavailable_because(
        fmt::format("{}: no tension reinforcement on this face, so the Standard Specifications give no flexural "
                    "strength; give the capacity in capacity.given",
                    s.label));
    return out;
  }
  ConcreteFlexure out = strands.area > 0 ? prestressed(s, strands, bars.area > 0) : reinforced(s, bars);
  CalculationTrace& t = out.resistance.trace;
  t.title = s.label + " (Load Factor Rating: AASHTO Standard Specifications 17th ed.)";
  t.inputs.insert(t.inputs.begin(),
                  {{"f'c", "concrete compressive strength", "", s.concrete_strength, Quantity::stress, ""},
                   {"b", "compression flange width", "", s.flange_thickness > 0 ? s.flange_width : s.web_width,
                    Quantity::section_length, ""}});
  t.add_note("compression reinforcement neglected, conservative");
  return out;
}

}  // namespace tenthpoint::capacity
