#include "engine/capacity/steel_service_limits.h"

#include <cassert>

namespace tenthpoint::capacity {

SteelServiceLimits steel_service_limits(Real fyf, const section::SectionStages& stages, bool uncracked_negative) {
  using units::Quantity;
  assert(fyf > 0);
  SteelServiceLimits out;
  CalculationTrace& t = out.trace;
  t.title = "Service II flange stress limits";
  t.add_input("Fyf", "flange yield strength", fyf, Quantity::stress);
  t.add_note("Rh = 1.0 (homogeneous girder); fl = 0 (no lateral flange bending)");
  if (stages.composite) {
    out.top_flange = t.add_step("fR,top", "top flange limit, composite section", "0.95 Rh Fyf", 0.95 * fyf,
                                Quantity::stress, "AASHTO LRFD 6.10.4.2.2-1");
    out.bottom_flange = t.add_step("fR,bottom", "bottom flange limit, composite section", "0.95 Rh Fyf", 0.95 * fyf,
                                   Quantity::stress, "AASHTO LRFD 6.10.4.2.2-2");
  } else {
    out.top_flange = t.add_step("fR,top", "flange limit, non-composite section", "0.80 Rh Fyf", 0.80 * fyf,
                                Quantity::stress, "AASHTO LRFD 6.10.4.2.2-3");
    out.bottom_flange = t.add_step("fR,bottom", "flange limit, non-composite section", "0.80 Rh Fyf", 0.80 * fyf,
                                   Quantity::stress, "AASHTO LRFD 6.10.4.2.2-3");
  }
  out.positive_moment = uncracked_stage_moduli(stages);
  out.negative_moment = uncracked_negative ? uncracked_stage_moduli(stages) : cracked_stage_moduli(stages);
  if (stages.composite) {
    t.add_note(uncracked_negative ? "negative flexure: deck taken as effective (AASHTO LRFD 6.10.4.2.1, from memory)"
                                  : "negative flexure: cracked section (steel plus deck bars) for DC2, DW and LL");
  }
  t.add_note("web bend-buckling (AASHTO LRFD 6.10.4.2.2-4) not checked");
  return out;
}

}  // namespace tenthpoint::capacity
