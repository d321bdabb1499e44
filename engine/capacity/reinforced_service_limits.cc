#include "engine/capacity/reinforced_service_limits.h"

#include <cassert>
#include <cmath>

#include <fmt/format.h>

namespace tenthpoint::capacity {

ReinforcedServiceLimits reinforced_service_limits(const ConcreteFlexureSection& s, Real ec) {
  using units::Quantity;
  ReinforcedServiceLimits out;
  Real as = 0;
  Real moment = 0;
  for (const ReinforcementLayer& layer : s.bars) {
    as += layer.area;
    moment += layer.area * layer.depth;
  }
  if (!(as > 0)) {
    out.status = ResistanceStatus::unavailable;
    out.reason = fmt::format("{}: no tension bars on this face, so there is no steel stress to check", s.label);
    return out;
  }
  assert(ec > 0 && s.bar_modulus > 0 && s.bar_yield > 0);
  CalculationTrace& t = out.trace;
  t.title = fmt::format("{}: Service I steel stress under permits (cracked section)", s.label);
  const Real d = moment / as;
  t.add_input("As", "tension reinforcement area", as, Quantity::area);
  t.add_input("d", "depth to the tension reinforcement centroid", d, Quantity::section_length);
  const Real n = t.add_step("n", "modular ratio", "Es / Ec", s.bar_modulus / ec, Quantity::dimensionless,
                            "AASHTO LRFD 5.6.1 (transformed section)");
  const bool flanged = s.flange_thickness > 0 && s.flange_width > s.web_width;
  const Real b = flanged ? s.flange_width : s.web_width;
  const Real nas = n * as;
  // Rectangle of width b: b kd^2 / 2 + n As kd - n As d = 0.
  Real kd = (-nas + std::sqrt(nas * nas + 2 * b * nas * d)) / b;
  Real icr = 0;
  if (flanged && kd > s.flange_thickness) {
    // bw kd^2 / 2 + ((b - bw) hf + n As) kd - ((b - bw) hf^2 / 2 + n As d) = 0.
    const Real bw = s.web_width;
    const Real hf = s.flange_thickness;
    const Real p = (b - bw) * hf + nas;
    const Real q = (b - bw) * hf * hf / 2 + nas * d;
    kd = (-p + std::sqrt(p * p + 2 * bw * q)) / bw;
    icr = bw * kd * kd * kd / 3 + (b - bw) * (hf * hf * hf / 12 + hf * (kd - hf / 2) * (kd - hf / 2)) +
          nas * (d - kd) * (d - kd);
    t.add_note("the neutral axis lies below the flange: T-section cracked properties");
  } else {
    icr = b * kd * kd * kd / 3 + nas * (d - kd) * (d - kd);
  }
  out.modular_ratio = n;
  out.neutral_axis_depth =
      t.add_step("kd", "neutral axis depth, cracked section", "first moments of the transformed areas balance", kd,
                 Quantity::section_length, "elastic cracked section (textbook)");
  out.cracked_inertia = t.add_step("Icr", "cracked moment of inertia (concrete units)",
                                   "b kd^3 / 3 (+ flange overhangs) + n As (d - kd)^2", icr, Quantity::inertia,
                                   "elastic cracked section (textbook)");
  out.steel_section_modulus = t.add_step("Ss", "steel stress section modulus", "Icr / (n (d - kd))",
                                         icr / (n * (d - kd)), Quantity::section_modulus, "fs = n M (d - kd) / Icr");
  out.allowable_stress = t.add_step("fR", "allowable steel stress under permits", "0.9 fy", 0.9 * s.bar_yield,
                                    Quantity::stress, "MBE 6A.5.4.2.2b (from memory)");
  t.add_note("tension layers lumped at their centroid; compression bars neglected");
  return out;
}

}  // namespace tenthpoint::capacity
