// A cross-section assembled from parts of different materials, each
// transformed to one reference material by the ratio of moduli (the
// transformed-section method): a part of modulus E_part counts with its area
// multiplied by factor = E_part / E_reference.
//
// Heights are measured upward from a reference line chosen by the caller (the
// girder soffit throughout this module), in m. Areas are m^2, second moments
// m^4, all in reference-material units.
#pragma once

#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::section {

class TransformedSection {
 public:
  // A rectangle `width` across and `height` deep whose bottom edge is at
  // `bottom`. Precondition: width, height and factor positive.
  void add_rectangle(Real width, Real height, Real bottom, Real factor = 1);
  // A lumped area (a bar layer, a strand layer) at height `centroid`; its own
  // second moment is neglected. `factor` may be negative to remove concrete
  // displaced by a bar. Precondition: area >= 0.
  void add_area(Real area, Real centroid, Real factor = 1);
  // A part with known area, centroid height and second moment about its own
  // centroid (e.g. a precast girder from its tabulated gross properties).
  // Precondition: area > 0, own_inertia >= 0, factor > 0.
  void add_part(Real area, Real centroid, Real own_inertia, Real factor = 1);

  [[nodiscard]] bool empty() const { return parts_.empty(); }
  // Transformed area, m^2. Precondition: not empty.
  [[nodiscard]] Real area() const;
  // Height of the elastic neutral axis (the transformed centroid), m.
  // Precondition: area() > 0.
  [[nodiscard]] Real centroid() const;
  // Transformed second moment about the neutral axis, m^4.
  [[nodiscard]] Real inertia() const;

 private:
  struct Part {
    Real area;         // transformed, m^2
    Real centroid;     // m
    Real own_inertia;  // transformed, m^4, about the part's own centroid
  };
  std::vector<Part> parts_;
};

}  // namespace tenthpoint::section
