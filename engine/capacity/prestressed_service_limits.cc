#include "engine/capacity/prestressed_service_limits.h"

#include <algorithm>
#include <cmath>

#include <fmt/format.h>

#include "engine/core/errors.h"
#include "engine/core/units.h"

namespace tenthpoint::capacity {

bool PrestressedServiceOptions::is_valid(std::string* why) const {
  if (allowable_tension && !(*allowable_tension >= 0 && std::isfinite(*allowable_tension))) {
    if (why != nullptr) *why = "allowable Service III tension must not be negative";
    return false;
  }
  return losses.is_valid(why);
}

PrestressedServiceLimits prestressed_service_limits(const std::string& label, const model::PrestressedGirder& girder,
                                                    const model::Materials& materials,
                                                    const section::SectionStages& stages,
                                                    const PrestressedServiceOptions& options,
                                                    const section::SectionOptions& section_options,
                                                    Real density_factor) {
  using units::Quantity;
  PrestressedServiceLimits out;
  CalculationTrace& t = out.trace;
  t.title = fmt::format("{}: Service III tension at the bottom fibre", label);
  if (!materials.girder_concrete) throw InputError(SourceLocation{}, "materials.girder_concrete", "missing");
  if (!materials.strand) throw InputError(SourceLocation{}, "materials.strand", "missing");
  const model::Concrete& concrete = *materials.girder_concrete;

  Real aps = 0;
  Real moment = 0;
  for (const model::StrandLayer& layer : girder.strands) {
    aps += layer.count * layer.strand_area;
    moment += layer.count * layer.strand_area * layer.height_from_bottom;
  }
  if (!(aps > 0)) {
    out.status = ResistanceStatus::unavailable;
    out.reason = fmt::format("{}: no bonded strands at this section, so there is no prestress to check", label);
    return out;
  }

  const Real fc_ksi = concrete.compressive_strength / units::kKsi;
  if (options.allowable_tension) {
    out.allowable_tension = t.add_step("fR", "allowable tension (given in the options)", "given",
                                       *options.allowable_tension, Quantity::stress, "capacity options");
  } else if (options.exposure == CorrosionExposure::moderate) {
    out.allowable_tension =
        t.add_step("fR", "allowable tension, not worse than moderate corrosion", "0.19 lambda sqrt(f'c) <= 0.6 ksi",
                   std::min(0.19 * density_factor * std::sqrt(fc_ksi), 0.6) * units::kKsi, Quantity::stress,
                   "AASHTO LRFD Table 5.9.2.3.2b-1; MBE 6A.5.4.2.2b (from memory)");
  } else {
    out.allowable_tension =
        t.add_step("fR", "allowable tension, severe corrosion", "0.0948 lambda sqrt(f'c) <= 0.3 ksi",
                   std::min(0.0948 * density_factor * std::sqrt(fc_ksi), 0.3) * units::kKsi, Quantity::stress,
                   "AASHTO LRFD Table 5.9.2.3.2b-1 (from memory)");
  }

  if (girder.effective_prestress) {
    out.effective_prestress = t.add_step("fpe", "effective prestress (given in the bridge file)", "given",
                                         *girder.effective_prestress, Quantity::stress, "bridge file");
  } else {
    const PrestressLosses losses =
        approximate_prestress_losses(girder, concrete, *materials.strand, options.losses,
                                     section_options.concrete_modulus_formula, section_options.aggregate_factor);
    t.append(losses.trace);
    out.effective_prestress = losses.effective_prestress;
    out.effective_prestress_estimated = true;
    out.warnings.push_back(fmt::format(
        "{}: effective prestress not given; estimated at {:.1f} ksi by the approximate method of AASHTO LRFD 5.9.3.3 "
        "with stated assumptions (see the trace)",
        label, out.effective_prestress / units::kKsi));
  }
  out.prestress_force = t.add_step("P", "effective prestress force", "Aps fpe", aps * out.effective_prestress,
                                   Quantity::force, "AASHTO LRFD 5.9.2.2");
  out.eccentricity = t.add_step("e", "strand eccentricity below the precast centroid", "yb - strand centroid height",
                                girder.centroid_from_bottom - moment / aps, Quantity::section_length, "statics");
  const Real sb = girder.inertia / girder.centroid_from_bottom;
  t.add_input("Ag", "gross precast area", girder.area, Quantity::area);
  t.add_input("Sb", "gross precast section modulus at the bottom fibre", sb, Quantity::section_modulus);
  out.prestress_bottom_stress =
      t.add_step("fP", "bottom-fibre stress from prestress, tension positive", "-(P / Ag + P e / Sb)",
                 -(out.prestress_force / girder.area + out.prestress_force * out.eccentricity / sb), Quantity::stress,
                 "elastic stress (gross precast section)");
  out.moduli = uncracked_stage_moduli(stages);
  t.add_note("RF = (fR - fD - fP) / fL with fD, fL = M / S_bottom of each stage's section (tension positive)");
  return out;
}

}  // namespace tenthpoint::capacity
