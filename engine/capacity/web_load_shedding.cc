#include "engine/capacity/web_load_shedding.h"

#include <algorithm>
#include <cassert>
#include <cmath>

#include "engine/core/units.h"

namespace tenthpoint::capacity {

WebLoadShedding web_load_shedding(Real dc, Real tw, Real bfc, Real tfc, Real fyc, Real e, CalculationTrace& t) {
  assert(dc >= 0 && tw > 0 && bfc > 0 && tfc > 0 && fyc > 0 && e > 0);
  using units::Quantity;
  WebLoadShedding out;
  out.web_slenderness = 2.0 * dc / tw;
  out.slenderness_limit = t.add_step("lambda_rw", "limiting slenderness of a noncompact web", "5.7 sqrt(E / Fyc)",
                                     5.7 * std::sqrt(e / fyc), Quantity::dimensionless, "AASHTO LRFD 6.10.1.10.2-4");
  t.add_step("2Dc/tw", "web slenderness in bending", "2 Dc / tw", out.web_slenderness, Quantity::dimensionless,
             "AASHTO LRFD 6.10.1.10.2");
  out.area_ratio = 2.0 * dc * tw / (bfc * tfc);
  if (out.web_slenderness <= out.slenderness_limit) {
    out.factor = t.add_step("Rb", "web load-shedding factor", "1.0 (2 Dc / tw <= lambda_rw)", 1.0,
                            Quantity::dimensionless, "AASHTO LRFD 6.10.1.10.2-2");
    return out;
  }
  t.add_step("awc", "web to compression-flange area ratio", "2 Dc tw / (bfc tfc)", out.area_ratio,
             Quantity::dimensionless, "AASHTO LRFD 6.10.1.10.2-5");
  const Real rb =
      1.0 - out.area_ratio / (1200.0 + 300.0 * out.area_ratio) * (out.web_slenderness - out.slenderness_limit);
  out.factor = t.add_step("Rb", "web load-shedding factor", "1 - awc / (1200 + 300 awc) (2 Dc / tw - lambda_rw)",
                          std::min(1.0, rb), Quantity::dimensionless, "AASHTO LRFD 6.10.1.10.2-3");
  return out;
}

}  // namespace tenthpoint::capacity
