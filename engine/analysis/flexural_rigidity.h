// FlexuralRigidity: EI(x) along a girder, as contiguous segments that cover
// the girder from x = 0 to its length. Each segment is either prismatic (one
// EI) or non-prismatic (EI given as a function of station: linear or
// parabolic haunches, or whatever a section builder computes from geometry).
//
// Units: stations in m from the left end of the girder; EI in N*m^2.
// A function segment is called only at stations inside its own [start, end].
// Where EI(x) or its slope is discontinuous inside a function segment, list
// the stations in `breakpoints`: the mesh puts a node there, so that every
// element sees a smooth EI (Gauss quadrature and the cubic interpolation of
// influence lines both rely on it). Building several models of one layout
// with different rigidities (noncomposite, long-term and short-term
// composite) is the intended use.
//
// Validity (checked when a model is built, ModelError otherwise): segments in
// order, without gaps or overlaps, covering the whole girder; EI finite and
// > 0 everywhere it is sampled.
#pragma once

#include <functional>
#include <string>
#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::analysis {

struct RigiditySegment {
  Real start = 0;  // m
  Real end = 0;    // m
  // Used when `varying` is empty.
  Real constant = 0;  // N*m^2
  // EI at a station (m) -> N*m^2; empty for a prismatic segment.
  std::function<Real(Real)> varying;
  // Stations strictly inside (start, end) where `varying` is not smooth.
  std::vector<Real> breakpoints;

  [[nodiscard]] bool is_prismatic() const { return !varying; }
  [[nodiscard]] Real at(Real station) const { return varying ? varying(station) : constant; }
};

struct FlexuralRigidity {
  std::vector<RigiditySegment> segments;

  [[nodiscard]] static FlexuralRigidity uniform(Real length, Real ei);

  // Appends a segment that starts where the last one ended (or at 0).
  FlexuralRigidity& then_prismatic(Real length, Real ei);
  FlexuralRigidity& then_varying(Real length, std::function<Real(Real)> ei, std::vector<Real> breakpoints = {});

  [[nodiscard]] Real end() const { return segments.empty() ? 0.0 : segments.back().end; }
  // Index of the segment holding x (the first one when x is a shared end).
  [[nodiscard]] std::size_t segment_at(Real station) const;
  [[nodiscard]] Real at(Real station) const { return segments[segment_at(station)].at(station); }
};

// EI of a haunch between stations x0 and x1 whose depth varies from d0 to d1,
// with EI proportional to depth^3 (a web-dominated or solid rectangular
// section), EI = ei0 at depth d0. `shape` = 1 gives a straight (linear depth)
// haunch, 2 a parabolic one with its vertex (zero slope) at x0.
[[nodiscard]] std::function<Real(Real)> cubic_depth_haunch(Real x0, Real x1, Real ei0, Real depth_ratio, int shape);

}  // namespace tenthpoint::analysis
