// How the depth of a haunched (non-prismatic) segment changes between its end
// sections, as a share of the end-to-end change (see model::Taper):
//   linear      t = xi
//   parabolic   a parabola tangent to the girder at the shallow end, so the
//               change grows with the square of the distance from it:
//               shallow end at the start: t = xi^2;
//               shallow end at the end:   t = 1 - (1 - xi)^2,
// where xi in [0, 1] is the relative position from the segment's start. The
// depth is then d(xi) = (1 - t) d_start + t d_end; at mid-length a parabolic
// haunch has risen a quarter of the way from the shallow depth, a linear one
// half of the way.
#pragma once

#include "engine/core/numeric.h"
#include "engine/model/enums.h"

namespace tenthpoint::section {

class TaperLaw {
 public:
  // `shallow_at_start`: which end the parabola is tangent at (not used by a
  // linear taper).
  TaperLaw(model::Taper taper, bool shallow_at_start) : taper_(taper), shallow_at_start_(shallow_at_start) {}

  // t(xi), 0 at the start and 1 at the end, monotonic. Precondition: xi in [0, 1].
  [[nodiscard]] Real fraction(Real xi) const;

  [[nodiscard]] model::Taper taper() const { return taper_; }
  [[nodiscard]] bool shallow_at_start() const { return shallow_at_start_; }

 private:
  model::Taper taper_;
  bool shallow_at_start_;
};

}  // namespace tenthpoint::section
