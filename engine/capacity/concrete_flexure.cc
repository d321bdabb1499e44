#include "engine/capacity/concrete_flexure.h"

#include <algorithm>
#include <cassert>

#include <fmt/format.h>

#include "engine/capacity/concrete_stress_block.h"
#include "engine/core/units.h"

namespace tenthpoint::capacity {
namespace {

using units::Quantity;

// The concrete crushing strain at nominal resistance, AASHTO LRFD 5.6.2.1.
constexpr Real kCrushingStrain = 0.003;

struct Resultant {
  Real area = 0;
  Real centroid = 0;  // m from the compression face
  Real shallowest = 0;
  Real deepest = 0;
};

Resultant resultant(const std::vector<ReinforcementLayer>& layers) {
  Resultant r;
  Real moment = 0;
  r.shallowest = layers.empty() ? 0 : layers.front().depth;
  for (const ReinforcementLayer& layer : layers) {
    r.area += layer.area;
    moment += layer.area * layer.depth;
    r.shallowest = std::min(r.shallowest, layer.depth);
    r.deepest = std::max(r.deepest, layer.depth);
  }
  r.centroid = r.area > 0 ? moment / r.area : 0;
  return r;
}

}  // namespace

ConcreteFlexure concrete_flexure(const ConcreteFlexureSection& s, const ResistanceFactors& factors) {
  assert(s.height > 0 && s.web_width > 0 && s.concrete_strength > 0);
  assert(s.flange_thickness == 0 || s.flange_width >= s.web_width);
  ConcreteFlexure out;
  const Resultant bars = resultant(s.bars);
  const Resultant strands = resultant(s.strands);
  if (bars.area <= 0 && strands.area <= 0) {
    out.resistance = Resistance::unavailable_because(
        fmt::format("{}: no tension reinforcement on this face, so AASHTO LRFD 5.6.3 gives no flexural resistance; "
                    "give the capacity in capacity.given",
                    s.label));
    return out;
  }
  const bool prestressed = strands.area > 0;
  assert(bars.area <= 0 || (s.bar_yield > 0 && s.bar_modulus > 0));
  assert(!prestressed || (s.strand_tensile_strength > 0 && s.strand_yield_strength > 0));

  CalculationTrace& t = out.resistance.trace;
  t.title = s.label;
  const bool flanged = s.flange_thickness > 0 && s.flange_width > s.web_width;
  t.add_input("h", "overall depth", s.height, Quantity::section_length);
  t.add_input("b", "compression flange width", flanged ? s.flange_width : s.web_width, Quantity::section_length);
  if (flanged) {
    t.add_input("hf", "compression flange thickness", s.flange_thickness, Quantity::section_length);
    t.add_input("bw", "web width", s.web_width, Quantity::section_length);
  }
  t.add_input("f'c", "concrete compressive strength", s.concrete_strength, Quantity::stress);
  if (bars.area > 0) {
    t.add_input("As", "tension reinforcement area", bars.area, Quantity::area);
    t.add_input("ds", "depth to the tension reinforcement centroid", bars.centroid, Quantity::section_length);
    t.add_input("fy", "reinforcement yield strength", s.bar_yield, Quantity::stress);
  }
  if (prestressed) {
    t.add_input("Aps", "bonded prestressing steel area", strands.area, Quantity::area);
    t.add_input("dp", "depth to the prestressing steel centroid", strands.centroid, Quantity::section_length);
    t.add_input("fpu", "specified tensile strength of the prestressing steel", s.strand_tensile_strength,
                Quantity::stress);
    t.add_input("fpy", "yield strength of the prestressing steel", s.strand_yield_strength, Quantity::stress);
  }
  t.add_note("compression reinforcement neglected (A's = 0), conservative");

  const ConcreteStressBlock block = concrete_stress_block(s.concrete_strength);
  const Real alpha1 = t.add_step("alpha1", "stress block factor", "0.85, less 0.02 per ksi above 10 ksi, >= 0.75",
                                 block.alpha1, Quantity::dimensionless, "AASHTO LRFD 5.6.2.2");
  const Real beta1 = t.add_step("beta1", "stress block depth factor", "0.85, less 0.05 per ksi above 4 ksi, >= 0.65",
                                block.beta1, Quantity::dimensionless, "AASHTO LRFD 5.6.2.2");
  const Real fc = s.concrete_strength;

  Real k = 0;
  Real strand_term = 0;  // k Aps fpu / dp
  if (prestressed) {
    k = t.add_step("k", "strand type factor", "2 (1.04 - fpy / fpu)",
                   2.0 * (1.04 - s.strand_yield_strength / s.strand_tensile_strength), Quantity::dimensionless,
                   "AASHTO LRFD 5.6.3.1.1-2");
    strand_term = k * strands.area * s.strand_tensile_strength / strands.centroid;
  }
  const Real pull = strands.area * s.strand_tensile_strength + bars.area * s.bar_yield;  // Aps fpu + As fy

  // Rectangular behaviour first (5.6.3.1.1-4), with b the flange width.
  const Real b = flanged ? s.flange_width : s.web_width;
  Real c = pull / (alpha1 * fc * beta1 * b + strand_term);
  Real a = beta1 * c;
  if (flanged && a > s.flange_thickness) {
    // T-section behaviour (5.6.3.1.1-3): the overhangs carry alpha1 f'c (b - bw) hf.
    out.t_section = true;
    t.add_note(
        fmt::format("rectangular trial gives a = {:.4g} m > hf: T-section behaviour (AASHTO LRFD 5.6.3.2.2)", a));
    c = t.add_step("c", "depth of the neutral axis",
                   prestressed ? "(Aps fpu + As fy - alpha1 f'c (b - bw) hf) / (alpha1 f'c beta1 bw + k Aps fpu / dp)"
                               : "(As fy - alpha1 f'c (b - bw) hf) / (alpha1 f'c beta1 bw)",
                   (pull - alpha1 * fc * (s.flange_width - s.web_width) * s.flange_thickness) /
                       (alpha1 * fc * beta1 * s.web_width + strand_term),
                   Quantity::section_length, "AASHTO LRFD 5.6.3.1.1-3");
  } else {
    c = t.add_step(
        "c", "depth of the neutral axis",
        prestressed ? "(Aps fpu + As fy) / (alpha1 f'c beta1 b + k Aps fpu / dp)" : "As fy / (alpha1 f'c beta1 b)", c,
        Quantity::section_length, "AASHTO LRFD 5.6.3.1.1-4");
  }
  a = t.add_step("a", "depth of the equivalent stress block", "beta1 c", beta1 * c, Quantity::section_length,
                 "AASHTO LRFD 5.6.2.2");
  out.neutral_axis_depth = c;
  out.block_depth = a;

  const Real extreme = std::max(bars.deepest, strands.deepest);  // dt
  if (c >= extreme) {
    out.resistance = Resistance::unavailable_because(fmt::format(
        "{}: the neutral axis (c = {:.4g} m) reaches the extreme tension steel; the section is over-reinforced and "
        "the assumptions of AASHTO LRFD 5.6.3 do not hold; give the capacity in capacity.given",
        s.label, c));
    return out;
  }

  Real fps = 0;
  if (prestressed) {
    fps = t.add_step("fps", "average stress in the prestressing steel", "fpu (1 - k c / dp)",
                     s.strand_tensile_strength * (1.0 - k * c / strands.centroid), Quantity::stress,
                     "AASHTO LRFD 5.6.3.1.1-1");
  }
  out.strand_stress = fps;
  if (bars.area > 0) {
    const Real shallow_strain = kCrushingStrain * (bars.shallowest - c) / c;
    if (shallow_strain < s.bar_yield / s.bar_modulus) {
      out.resistance.warnings.push_back(fmt::format(
          "{}: the shallowest tension bar layer has not yielded at nominal resistance (strain {:.5f} < fy/Es); "
          "fs = fy over-estimates Mn",
          s.label, shallow_strain));
    }
  }

  Real mn = strands.area * fps * (strands.centroid - a / 2) + bars.area * s.bar_yield * (bars.centroid - a / 2);
  if (out.t_section)
    mn += alpha1 * fc * (s.flange_width - s.web_width) * s.flange_thickness * (a / 2 - s.flange_thickness / 2);
  std::string mn_expression = prestressed ? "Aps fps (dp - a/2)" : "";
  if (bars.area > 0) mn_expression += prestressed ? " + As fy (ds - a/2)" : "As fy (ds - a/2)";
  if (out.t_section) mn_expression += " + alpha1 f'c (b - bw) hf (a/2 - hf/2)";
  mn = t.add_step("Mn", "nominal flexural resistance", mn_expression, mn, Quantity::moment,
                  out.t_section ? "AASHTO LRFD 5.6.3.2.2-1" : "AASHTO LRFD 5.6.3.2.2-1 with bw = b (5.6.3.2.3)");

  const Real eps_t = t.add_step("eps_t", "net tensile strain in the extreme tension steel", "0.003 (dt - c) / c",
                                kCrushingStrain * (extreme - c) / c, Quantity::dimensionless, "AASHTO LRFD 5.6.2.1");
  const Real eps_cl = compression_controlled_strain_limit(prestressed, s.bar_yield, s.bar_modulus);
  const Real eps_tl = tension_controlled_strain_limit(prestressed, s.bar_yield);
  const ResistanceFactorId tension_id =
      prestressed ? ResistanceFactorId::ps_tension_controlled : ResistanceFactorId::rc_tension_controlled;
  out.control = tension_control(eps_t, eps_cl, eps_tl, factors.get(tension_id), factors.compression_controlled);
  t.add_step("eps_cl", "compression-controlled strain limit", prestressed ? "0.002" : "fy / Es", eps_cl,
             Quantity::dimensionless, "AASHTO LRFD 5.6.2.1");
  t.add_step("eps_tl", "tension-controlled strain limit", "0.005", eps_tl, Quantity::dimensionless,
             "AASHTO LRFD 5.6.2.1");
  const Real phi =
      t.add_step("phi", fmt::format("resistance factor ({})", to_string(out.control.regime)),
                 "phi_c + (phi_t - phi_c)(eps_t - eps_cl)/(eps_tl - eps_cl), in [phi_c, phi_t]", out.control.phi,
                 Quantity::dimensionless, prestressed ? "AASHTO LRFD 5.5.4.2-1" : "AASHTO LRFD 5.5.4.2-2");
  t.add_note(fmt::format("phi_t = {:.2f} ({}); phi_c = {:.2f} ({})", factors.get(tension_id),
                         factors.source(tension_id), factors.compression_controlled,
                         factors.source(ResistanceFactorId::compression_controlled)));
  t.add_step("phi Mn", "factored flexural resistance", "phi Mn", phi * mn, Quantity::moment, "AASHTO LRFD 1.3.2.1-1");

  out.tension_force = strands.area * fps + bars.area * s.bar_yield;
  out.effective_depth =
      t.add_step("de", "effective depth of the tension steel", "(Aps fps dp + As fy ds) / (Aps fps + As fy)",
                 (strands.area * fps * strands.centroid + bars.area * s.bar_yield * bars.centroid) / out.tension_force,
                 Quantity::section_length, "AASHTO LRFD 5.7.2.8-2");
  out.shear_depth = t.add_step("dv", "effective shear depth", "max(Mn / (As fy + Aps fps), 0.9 de, 0.72 h)",
                               std::max({mn / out.tension_force, 0.9 * out.effective_depth, 0.72 * s.height}),
                               Quantity::section_length, "AASHTO LRFD 5.7.2.8");

  out.resistance.status = ResistanceStatus::computed;
  out.resistance.nominal = mn;
  out.resistance.phi = phi;
  out.resistance.factored = phi * mn;
  out.resistance.article = out.t_section ? "AASHTO LRFD 5.6.3.2.2" : "AASHTO LRFD 5.6.3.2.3";
  return out;
}

}  // namespace tenthpoint::capacity
