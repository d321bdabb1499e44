// LineGirderModel: the direct-stiffness model of one line girder in one stage
// (one set of rigidities), factorised once and ready for many load cases and
// influence lines.
//
// Mesh. Nodes sit at every analysis point (tenth points, supports, hinges,
// section changes, named points), at the breakpoints of non-prismatic
// segments, and inside non-prismatic bays where subdivision is needed.
// Elements join consecutive nodes: element e runs from node e to node e + 1.
// Each node has a vertical deflection and a rotation; a hinge node has two
// rotations (one per side), which is the moment release. Supports restrain
// the deflection (pin, roller, fixed) and the rotation (fixed).
//
// Exactness. Prismatic elements use the closed-form Hermite stiffness, which
// is exact for Euler-Bernoulli beams. Non-prismatic elements use the inverse
// of their flexibility, integrated by Gauss-Legendre quadrature of 1/EI(x)
// with the weights (L - x)^k: their stiffness, and therefore every nodal
// value of every influence line, is exact to quadrature error. What is not
// exact inside a non-prismatic element is the shape between its nodes (the
// true influence line there is not a cubic); such bays are cut into n equal
// sub-elements, n chosen from the variation of 1/EI so that the cubic
// (Hermite) interpolation error of influence lines, relative to their largest
// ordinate, stays below ModelOptions::interpolation_tolerance. The bound used
// is |error| <= h^4/384 max|(M/EI)''| with the influence-line scale
// (1/EI) M L^2 / 8; tests check the outcome against a fine reference.
//
// Failure. A layout or rigidity the engine cannot analyse (mechanism,
// unsupported part, EI <= 0 or not finite, segments that do not cover the
// girder, stations outside it) throws tenthpoint::ModelError naming the
// bridge and the cause. Mechanisms are caught by statics first
// (GirderStability) and, as a second line, by the pivots of the
// factorisation. Invalid options throw std::invalid_argument.
#pragma once

#include <array>
#include <cstddef>
#include <limits>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "engine/analysis/analysis_point.h"
#include "engine/analysis/banded_ldlt.h"
#include "engine/analysis/beam_element.h"
#include "engine/analysis/flexural_rigidity.h"
#include "engine/analysis/girder_layout.h"
#include "engine/core/numeric.h"

namespace tenthpoint::analysis {

struct ModelOptions {
  // Target relative error of the cubic interpolation of influence lines
  // inside non-prismatic bays (the engine promises 1e-6; 1e-7 leaves margin).
  Real interpolation_tolerance = 1.0e-7;
  // Gauss-Legendre points per non-prismatic element.
  int gauss_points = 8;
  // Cap on the sub-elements of one non-prismatic bay.
  int max_elements_per_bay = 400;
  // Stations closer than this (m) are one analysis point / node. Very short
  // elements beside long ones cost accuracy (the stiffness contrast grows as
  // (long/short)^3), so do not set this much smaller.
  Real station_tolerance = 1.0e-3;
  // A factorisation pivot below this fraction of its diagonal entry is
  // treated as singular.
  Real pivot_tolerance = 1.0e-13;
  // Run the statics test before assembling (the pivot test always runs).
  bool check_statics = true;

  [[nodiscard]] bool is_valid(std::string* why) const;
};

struct MeshNode {
  Real station = 0;  // m
  std::size_t vertical_dof = 0;
  std::size_t left_rotation_dof = 0;   // rotation seen by the element ending here
  std::size_t right_rotation_dof = 0;  // rotation seen by the element starting here
  std::optional<std::size_t> support;  // support line at this node
  bool hinge = false;
};

class LineGirderModel {
 public:
  static constexpr std::size_t kRestrained = std::numeric_limits<std::size_t>::max();

  LineGirderModel(GirderLayout layout, const FlexuralRigidity& rigidity, ModelOptions options = {});

  [[nodiscard]] const GirderLayout& layout() const noexcept { return layout_; }
  [[nodiscard]] const std::string& bridge_id() const noexcept { return layout_.bridge_id; }
  [[nodiscard]] const ModelOptions& options() const noexcept { return options_; }
  [[nodiscard]] Real length() const noexcept { return length_; }
  [[nodiscard]] int degree_of_indeterminacy() const noexcept { return degree_of_indeterminacy_; }

  [[nodiscard]] const std::vector<AnalysisPoint>& analysis_points() const noexcept { return points_; }
  // Node index of an analysis point.
  [[nodiscard]] std::size_t point_node(std::size_t point) const { return point_nodes_[point]; }

  [[nodiscard]] const std::vector<MeshNode>& nodes() const noexcept { return nodes_; }
  [[nodiscard]] const std::vector<BeamElement>& elements() const noexcept { return elements_; }
  // Node stations, shared by every curve built on this mesh.
  [[nodiscard]] const std::shared_ptr<const std::vector<Real>>& knots() const noexcept { return knots_; }

  // Degrees of freedom: all of them (restrained included), numbered node by node.
  [[nodiscard]] std::size_t dof_count() const noexcept { return free_index_.size(); }
  [[nodiscard]] std::size_t free_dof_count() const noexcept { return stiffness_.size(); }
  // Position of a dof in the free system, or kRestrained.
  [[nodiscard]] std::size_t free_index(std::size_t dof) const { return free_index_[dof]; }
  // (v1, theta1, v2, theta2) of an element as global dofs.
  [[nodiscard]] std::array<std::size_t, 4> element_dofs(std::size_t element) const;

  // The factorised stiffness of the free dofs.
  [[nodiscard]] const BandedLdlt& stiffness() const noexcept { return stiffness_; }

 private:
  GirderLayout layout_;
  ModelOptions options_;
  Real length_ = 0;
  int degree_of_indeterminacy_ = 0;
  std::vector<AnalysisPoint> points_;
  std::vector<std::size_t> point_nodes_;
  std::vector<MeshNode> nodes_;
  std::vector<BeamElement> elements_;
  std::shared_ptr<const std::vector<Real>> knots_;
  std::vector<std::size_t> free_index_;
  BandedLdlt stiffness_;
};

}  // namespace tenthpoint::analysis
