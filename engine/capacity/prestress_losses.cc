#include "engine/capacity/prestress_losses.h"

#include <cassert>
#include <cmath>

#include <fmt/format.h>

#include "engine/core/units.h"

namespace tenthpoint::capacity {

bool PrestressLossOptions::is_valid(std::string* why) const {
  auto fail = [&](std::string message) {
    if (why != nullptr) *why = std::move(message);
    return false;
  };
  if (!(relative_humidity >= 0 && relative_humidity <= 100)) return fail("relative humidity must be 0 to 100 percent");
  if (!(transfer_strength_ratio > 0 && transfer_strength_ratio <= 1.0)) {
    return fail("transfer strength ratio f'ci/f'c must be in (0, 1]");
  }
  if (jacking_ratio && !(*jacking_ratio > 0 && *jacking_ratio < 1.0)) return fail("jacking ratio must be in (0, 1)");
  return true;
}

PrestressLosses approximate_prestress_losses(const model::PrestressedGirder& girder, const model::Concrete& concrete,
                                             const model::PrestressingSteel& strand,
                                             const PrestressLossOptions& options,
                                             section::ConcreteModulusFormula formula, Real k1) {
  using units::Quantity;
  PrestressLosses out;
  CalculationTrace& t = out.trace;
  t.title = "prestress losses, approximate method";

  Real aps = 0;
  Real moment = 0;
  for (const model::StrandLayer& layer : girder.strands) {
    aps += layer.count * layer.strand_area;
    moment += layer.count * layer.strand_area * layer.height_from_bottom;
  }
  assert(aps > 0 && girder.area > 0 && girder.inertia > 0 && strand.tensile_strength > 0);
  const Real eccentricity = girder.centroid_from_bottom - moment / aps;
  t.add_input("Aps", "bonded strand area", aps, Quantity::area);
  t.add_input("Ag", "gross precast area", girder.area, Quantity::area);
  t.add_input("Ig", "gross precast second moment", girder.inertia, Quantity::inertia);
  t.add_input("e", "strand eccentricity below the precast centroid", eccentricity, Quantity::section_length);
  t.add_input("fpu", "strand tensile strength", strand.tensile_strength, Quantity::stress);
  t.add_input("Ep", "strand modulus", strand.modulus, Quantity::stress);
  t.add_input("H", "relative humidity, percent", options.relative_humidity, Quantity::dimensionless);

  const Real jacking_ratio = options.jacking_ratio.value_or(strand.low_relaxation ? 0.75 : 0.70);
  t.add_note(options.jacking_ratio ? "jacking stress ratio as given in the options"
                                   : "jacking stress at the limit of AASHTO LRFD Table 5.9.2.2-1 (from memory): "
                                     "0.75 fpu low-relaxation, 0.70 fpu stress-relieved");
  const Real fpj = t.add_step("fpj", "strand stress before transfer", "ratio x fpu",
                              jacking_ratio * strand.tensile_strength, Quantity::stress, "AASHTO LRFD Table 5.9.2.2-1");
  out.jacking_stress = fpj;

  const Real fci = t.add_step("f'ci", "girder concrete strength at transfer (assumed)", "ratio x f'c",
                              options.transfer_strength_ratio * concrete.compressive_strength, Quantity::stress,
                              "assumption; the model holds no transfer strength");
  const Real eci =
      t.add_step("Eci", "girder concrete modulus at transfer", "AASHTO LRFD 5.4.2.4 from f'ci",
                 section::concrete_modulus(fci, concrete.unit_weight, formula, k1, "materials.girder_concrete"),
                 Quantity::stress, "AASHTO LRFD 5.4.2.4");

  // fcgp = Aps (fpj - dES) (1/A + e^2/I), dES = (Ep/Eci) fcgp: linear in dES.
  const Real stiffness = 1.0 / girder.area + eccentricity * eccentricity / girder.inertia;
  const Real n = strand.modulus / eci;
  const Real des =
      t.add_step("dfpES", "elastic shortening loss", "(Ep / Eci) fcgp, fcgp = Aps (fpj - dfpES)(1/Ag + e^2/Ig)",
                 n * aps * fpj * stiffness / (1.0 + n * aps * stiffness), Quantity::stress, "AASHTO LRFD 5.9.3.2.3a-1");
  t.add_note("fcgp without the girder self-weight moment (conservative: larger loss)");

  const Real h = options.relative_humidity;
  const Real gamma_h = t.add_step("gamma_h", "humidity correction factor", "1.7 - 0.01 H", 1.7 - 0.01 * h,
                                  Quantity::dimensionless, "AASHTO LRFD 5.9.3.3-2");
  const Real fci_ksi = fci / units::kKsi;
  const Real gamma_st = t.add_step("gamma_st", "concrete strength correction factor", "5 / (1 + f'ci) (ksi)",
                                   5.0 / (1.0 + fci_ksi), Quantity::dimensionless, "AASHTO LRFD 5.9.3.3-3");
  const Real relaxation_ksi = strand.low_relaxation ? 2.4 : 10.0;
  t.add_step("dfpR", "relaxation loss",
             strand.low_relaxation ? "2.4 ksi (low relaxation)" : "10.0 ksi (stress relieved)",
             relaxation_ksi * units::kKsi, Quantity::stress, "AASHTO LRFD 5.9.3.3 (from memory)");
  const Real fpi_ksi = fpj / units::kKsi;
  const Real lt_ksi =
      10.0 * fpi_ksi * aps / girder.area * gamma_h * gamma_st + 12.0 * gamma_h * gamma_st + relaxation_ksi;
  const Real dlt =
      t.add_step("dfpLT", "long-term losses", "10.0 fpi Aps / Ag gamma_h gamma_st + 12.0 gamma_h gamma_st + dfpR (ksi)",
                 lt_ksi * units::kKsi, Quantity::stress, "AASHTO LRFD 5.9.3.3-1");
  out.elastic_shortening = des;
  out.long_term = dlt;
  out.effective_prestress = t.add_step("fpe", "effective prestress after all losses", "fpj - dfpES - dfpLT",
                                       fpj - des - dlt, Quantity::stress, "AASHTO LRFD 5.9.3.1");
  t.add_note(
      "approximate method of AASHTO LRFD 5.9.3.3, meant for standard precast pretensioned members under "
      "average exposure");
  return out;
}

}  // namespace tenthpoint::capacity
