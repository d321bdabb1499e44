#include "engine/section/transformed_section.h"

#include <cassert>

namespace tenthpoint::section {

void TransformedSection::add_rectangle(Real width, Real height, Real bottom, Real factor) {
  assert(width > 0 && height > 0 && factor > 0);
  const Real area = factor * width * height;
  // b h^3 / 12 about the rectangle's own centroid.
  parts_.push_back(Part{area, bottom + height / 2, area * height * height / 12});
}

void TransformedSection::add_area(Real area, Real centroid, Real factor) {
  assert(area >= 0);
  parts_.push_back(Part{factor * area, centroid, 0});
}

void TransformedSection::add_part(Real area, Real centroid, Real own_inertia, Real factor) {
  assert(area > 0 && own_inertia >= 0 && factor > 0);
  parts_.push_back(Part{factor * area, centroid, factor * own_inertia});
}

Real TransformedSection::area() const {
  assert(!parts_.empty());
  Real sum = 0;
  for (const Part& p : parts_) sum += p.area;
  return sum;
}

Real TransformedSection::centroid() const {
  const Real total = area();
  assert(total > 0);
  Real first_moment = 0;
  for (const Part& p : parts_) first_moment += p.area * p.centroid;
  return first_moment / total;
}

Real TransformedSection::inertia() const {
  // Parallel-axis theorem about the neutral axis itself (not about the
  // reference line followed by A*ybar^2), which avoids cancellation between
  // two large numbers for deep composite sections.
  const Real neutral_axis = centroid();
  Real sum = 0;
  for (const Part& p : parts_) {
    const Real arm = p.centroid - neutral_axis;
    sum += p.own_inertia + p.area * arm * arm;
  }
  return sum;
}

}  // namespace tenthpoint::section
