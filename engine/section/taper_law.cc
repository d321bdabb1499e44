#include "engine/section/taper_law.h"

#include <cassert>

namespace tenthpoint::section {

Real TaperLaw::fraction(Real xi) const {
  assert(xi >= 0 && xi <= 1);
  switch (taper_) {
    case model::Taper::linear:
      return xi;
    case model::Taper::parabolic: {
      // Zero slope at the shallow end: d'(shallow) = 0 makes the haunch meet
      // the prismatic girder beyond it without a kink.
      if (shallow_at_start_) return xi * xi;
      const Real from_end = 1 - xi;
      return 1 - from_end * from_end;
    }
  }
  return xi;
}

}  // namespace tenthpoint::section
