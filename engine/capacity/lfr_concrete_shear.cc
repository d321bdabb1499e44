#include "engine/capacity/lfr_concrete_shear.h"

#include <algorithm>
#include <cassert>
#include <cmath>

#include "engine/core/units.h"

namespace tenthpoint::capacity {
namespace {

using units::Quantity;

constexpr Real kPsi = units::kKsi / 1000.0;
constexpr Real kPhiShear = 0.85;  // Standard Specifications 8.16.1.2.2 (from memory)

}  // namespace

Resistance lfr_concrete_shear(const ConcreteShearSection& s, Real d) {
  assert(s.web_width > 0 && s.concrete_strength > 0 && d > 0);
  Resistance r;
  CalculationTrace& t = r.trace;
  t.title = s.label + " shear (Load Factor Rating: AASHTO Standard Specifications 17th ed.)";
  t.add_input("bw", "web width", s.web_width, Quantity::section_length);
  t.add_input("d", "depth to the flexural tension steel", d, Quantity::section_length);
  t.add_input("f'c", "concrete compressive strength", s.concrete_strength, Quantity::stress);
  // The formulas hold in psi and in: sqrt(f'c [psi]) psi is a stress, so
  // 2 sqrt(f'c) becomes 2 sqrt(f'c / psi) psi in any consistent units.
  const Real root = s.density_factor * std::sqrt(s.concrete_strength / kPsi) * kPsi;
  const Real vc = t.add_step("Vc", "shear carried by the concrete", "2 sqrt(f'c) bw d (psi)",
                             2.0 * root * s.web_width * d, Quantity::force, "AASHTO Standard Specifications 8-49");
  Real vs = 0;
  if (s.stirrup_area && s.stirrup_spacing && *s.stirrup_spacing > 0) {
    t.add_input("Av", "stirrup area per set", *s.stirrup_area, Quantity::area);
    t.add_input("s", "stirrup spacing", *s.stirrup_spacing, Quantity::section_length);
    t.add_input("fy", "stirrup yield strength", s.stirrup_yield, Quantity::stress);
    vs = t.add_step("Vs", "shear carried by the stirrups", "Av fy d / s, <= 8 sqrt(f'c) bw d",
                    std::min(*s.stirrup_area * s.stirrup_yield * d / *s.stirrup_spacing, 8.0 * root * s.web_width * d),
                    Quantity::force, "AASHTO Standard Specifications 8-53, 8.16.6.3.9");
  } else {
    t.add_note("no stirrups: Vs = 0");
  }
  const Real vn = t.add_step("Vn", "nominal shear strength", "Vc + Vs", vc + vs, Quantity::force,
                             "AASHTO Standard Specifications 8-46");
  t.add_step("phi", "strength reduction factor, shear", "", kPhiShear, Quantity::dimensionless,
             "AASHTO Standard Specifications 8.16.1.2.2");
  t.add_step("phi Vn", "design shear strength", "phi Vn", kPhiShear * vn, Quantity::force,
             "AASHTO Standard Specifications 8.16.6.1");
  r.status = ResistanceStatus::computed;
  r.nominal = vn;
  r.phi = kPhiShear;
  r.factored = kPhiShear * vn;
  r.article = "AASHTO Standard Specifications 8.16.6";
  return r;
}

}  // namespace tenthpoint::capacity
