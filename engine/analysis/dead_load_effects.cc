#include "engine/analysis/dead_load_effects.h"

#include <algorithm>
#include <cassert>
#include <cmath>

namespace tenthpoint::analysis {
namespace {

constexpr std::size_t kNone = LineGirderModel::kRestrained;

// A concentrated load closer than this to a station counts as standing on it.
Real coincidence_tolerance(Real length) { return 1e-9 * std::max(length, Real{1}); }

// Element that takes a concentrated load at x: the one with start <= x < end
// (so a load on a node belongs to the element on its right), the last one at
// the right end of the girder.
std::size_t element_holding(const std::vector<BeamElement>& elements, Real x) {
  const auto it = std::upper_bound(elements.begin(), elements.end(), x,
                                   [](Real value, const BeamElement& e) { return value < e.end; });
  return it == elements.end() ? elements.size() - 1 : static_cast<std::size_t>(it - elements.begin());
}

DeadLoadEffects empty_effects(const std::string& name, std::size_t points, std::size_t supports) {
  DeadLoadEffects out;
  out.case_name = name;
  out.moment.assign(points, 0.0);
  out.shear_left.assign(points, 0.0);
  out.shear_right.assign(points, 0.0);
  out.reactions.assign(supports, 0.0);
  out.support_moments.assign(supports, 0.0);
  return out;
}

}  // namespace

DeadLoadEffects solve_dead_load(const LineGirderModel& model, const DeadLoadCase& load_case) {
  const Real length = model.length();
  const Real snap = coincidence_tolerance(length);
  DeadLoadCase loads = load_case.normalized(model.bridge_id(), length, model.options().station_tolerance);
  const auto& elements = model.elements();
  const auto& nodes = model.nodes();
  // Concentrated loads within `snap` of a node stand on it.
  for (ConcentratedLoad& c : loads.concentrated) {
    for (const MeshNode& n : nodes) {
      if (std::abs(n.station - c.station) <= snap) c.station = n.station;
    }
  }

  // Fixed-end forces of every element (upward on the element, positive): the
  // consistent nodal loads, int w N dx and P N(t), which for a prismatic
  // element are the exact fixed-end reactions.
  std::vector<ElementVector> fixed_end(elements.size(), ElementVector::Zero());
  std::vector<Real> point_at_start(elements.size(), 0.0);  // loads at t = 0 of each element
  for (std::size_t e = 0; e < elements.size(); ++e) {
    const BeamElement& el = elements[e];
    for (const DistributedLoad& d : loads.distributed) {
      const Real lo = std::max(d.start, el.start);
      const Real hi = std::min(d.end, el.end);
      if (hi > lo) fixed_end[e] += d.intensity * hermite_shape_integral(lo - el.start, hi - el.start, el.length());
    }
  }
  for (const ConcentratedLoad& c : loads.concentrated) {
    const std::size_t e = element_holding(elements, c.station);
    const BeamElement& el = elements[e];
    fixed_end[e] += c.force * hermite_shape(c.station - el.start, el.length());
    if (c.station == el.start) point_at_start[e] += c.force;
  }

  Vector rhs = Vector::Zero(static_cast<Eigen::Index>(model.free_dof_count()));
  for (std::size_t e = 0; e < elements.size(); ++e) {
    const auto dofs = model.element_dofs(e);
    for (std::size_t a = 0; a < 4; ++a) {
      const std::size_t f = model.free_index(dofs[a]);
      if (f != kNone) rhs(static_cast<Eigen::Index>(f)) -= fixed_end[e](static_cast<Eigen::Index>(a));
    }
  }
  const Vector u_free = model.stiffness().solve(rhs);

  std::vector<ElementVector> end_forces(elements.size());
  for (std::size_t e = 0; e < elements.size(); ++e) {
    const auto dofs = model.element_dofs(e);
    ElementVector u = ElementVector::Zero();
    for (std::size_t a = 0; a < 4; ++a) {
      const std::size_t f = model.free_index(dofs[a]);
      if (f != kNone) u(static_cast<Eigen::Index>(a)) = u_free(static_cast<Eigen::Index>(f));
    }
    end_forces[e] = elements[e].stiffness * u + fixed_end[e];
  }

  const auto& points = model.analysis_points();
  DeadLoadEffects out = empty_effects(load_case.name, points.size(), model.layout().supports.size());
  for (std::size_t p = 0; p < points.size(); ++p) {
    const std::size_t n = model.point_node(p);
    const bool has_right = n < elements.size();
    const bool has_left = n > 0;
    // Same relations as for influence lines: M = -m1(R) = m2(L),
    // V+ = f1(R) less a load standing on the node, V- = -f2(L).
    out.moment[p] = has_right ? -end_forces[n](1) : end_forces[n - 1](3);
    out.shear_right[p] = has_right ? end_forces[n](0) - point_at_start[n] : 0.0;
    out.shear_left[p] = has_left ? -end_forces[n - 1](2) : 0.0;
    if (!has_right) {
      // A load standing on the right end of the girder sits at t = L of the
      // last element: it is to the right of the cut just left of the end.
      for (const ConcentratedLoad& c : loads.concentrated) {
        if (c.station == elements.back().end) out.shear_left[p] += c.force;
      }
    }
  }
  // Reactions: node equilibrium, the support carries the sum of the end
  // forces of the elements meeting there.
  for (std::size_t n = 0; n < nodes.size(); ++n) {
    if (!nodes[n].support) continue;
    const std::size_t line = *nodes[n].support;
    const SupportKind kind = model.layout().supports[line];
    Real force = 0.0;
    Real moment = 0.0;
    if (n > 0) {
      force += end_forces[n - 1](2);
      moment += end_forces[n - 1](3);
    }
    if (n < elements.size()) {
      force += end_forces[n](0);
      moment += end_forces[n](1);
    }
    if (restrains_vertical(kind)) out.reactions[line] = force;
    if (restrains_rotation(kind)) out.support_moments[line] = moment;
  }

  // Diagrams by statics inside each element, from its left-end forces:
  // V(x) = V(a+) - w (x - a), M(x) = M(a) + V(a+) (x - a) - w (x - a)^2 / 2
  // between breakpoints, V dropping by P at each concentrated load.
  std::vector<Real> knots;
  std::vector<PiecewiseCubic::Coefficients> moment_pieces;
  std::vector<PiecewiseCubic::Coefficients> shear_pieces;
  for (std::size_t e = 0; e < elements.size(); ++e) {
    const BeamElement& el = elements[e];
    std::vector<Real> cuts{el.start, el.end};
    for (const DistributedLoad& d : loads.distributed) {
      for (Real x : {d.start, d.end}) {
        if (x > el.start + snap && x < el.end - snap) cuts.push_back(x);
      }
    }
    for (const ConcentratedLoad& c : loads.concentrated) {
      if (c.station > el.start && c.station < el.end) cuts.push_back(c.station);
    }
    std::sort(cuts.begin(), cuts.end());
    cuts.erase(std::unique(cuts.begin(), cuts.end()), cuts.end());

    Real shear = end_forces[e](0);
    Real moment = -end_forces[e](1);
    for (std::size_t j = 0; j + 1 < cuts.size(); ++j) {
      const Real a = cuts[j];
      const Real b = cuts[j + 1];
      for (const ConcentratedLoad& c : loads.concentrated) {
        if (c.station == a && element_holding(elements, a) == e) shear -= c.force;
      }
      const Real mid = 0.5 * (a + b);
      Real w = 0.0;
      for (const DistributedLoad& d : loads.distributed) {
        if (d.start <= mid && mid <= d.end) w += d.intensity;
      }
      knots.push_back(a);
      moment_pieces.push_back({moment, shear, -0.5 * w, 0.0});
      shear_pieces.push_back({shear, -w, 0.0, 0.0});
      const Real h = b - a;
      moment += shear * h - 0.5 * w * h * h;
      shear -= w * h;
    }
  }
  knots.push_back(elements.back().end);
  auto shared = std::make_shared<const std::vector<Real>>(std::move(knots));
  out.moment_diagram = PiecewiseCubic(shared, std::move(moment_pieces));
  out.shear_diagram = PiecewiseCubic(shared, std::move(shear_pieces));
  return out;
}

DeadLoadEffects dead_load_from_influence_lines(const InfluenceLines& lines, const DeadLoadCase& load_case) {
  const Real tolerance = coincidence_tolerance(lines.length);
  const DeadLoadCase loads = load_case.normalized(lines.bridge_id, lines.length, 1e-3);
  DeadLoadEffects out = empty_effects(load_case.name, lines.points.size(), lines.support_lines);

  auto effect = [&](const PiecewiseCubic& curve, ShearSide side, Real section) {
    Real sum = 0.0;
    for (const DistributedLoad& d : loads.distributed) sum += d.intensity * curve.integral(d.start, d.end);
    for (const ConcentratedLoad& c : loads.concentrated) {
      sum += c.force * point_load_ordinate(curve, side, section, c.station, tolerance);
    }
    return sum;
  };
  for (std::size_t p = 0; p < lines.points.size(); ++p) {
    const PointInfluenceLines& il = lines.at_points[p];
    const Real x = lines.points[p].station;
    out.moment[p] = effect(il.moment, ShearSide::none, x);
    out.shear_left[p] = effect(il.shear_left, ShearSide::left, x);
    out.shear_right[p] = effect(il.shear_right, ShearSide::right, x);
  }
  for (const SupportInfluenceLines& s : lines.supports) {
    out.reactions[s.support_line] = effect(s.reaction, ShearSide::none, s.station);
    if (!s.moment.empty()) out.support_moments[s.support_line] = effect(s.moment, ShearSide::none, s.station);
  }
  return out;
}

}  // namespace tenthpoint::analysis
