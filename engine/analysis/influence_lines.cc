#include "engine/analysis/influence_lines.h"

#include <algorithm>
#include <array>
#include <cassert>
#include <cmath>
#include <cstring>

namespace tenthpoint::analysis {
namespace {

constexpr std::size_t kNone = LineGirderModel::kRestrained;

// A jump or kink that the element defining an effect adds to the influence
// state at one of its ends (the end forces' fixed-end part). For a unit load
// approaching an end of the element from inside, the fixed-end forces tend to
// (1 N up at that end, 0 elsewhere) and their derivatives with respect to the
// load position to (1 N*m at that end's moment, 0 elsewhere), whatever EI(x)
// is; so only these two numbers are needed.
struct EndTerm {
  std::size_t element = kNone;
  int end = 0;  // 0 = node 1, 1 = node 2
  Real value = 0;
  Real slope = 0;
};

class Builder {
 public:
  explicit Builder(const LineGirderModel& model)
      : model_(model), rhs_(model.free_dof_count(), 0.0), state_(model.dof_count(), 0.0) {}

  // Influence line of E = sum_i row_i . u_e(i) (+ end term), or of the
  // reaction at `imposed` when it is a restrained dof.
  PiecewiseCubic build(const std::vector<std::pair<std::size_t, ElementVector>>& rows, std::size_t imposed,
                       const EndTerm& term) {
    std::fill(rhs_.begin(), rhs_.end(), 0.0);
    std::size_t first = rhs_.size();
    for (const auto& [element, row] : rows) {
      const auto dofs = model_.element_dofs(element);
      for (std::size_t a = 0; a < 4; ++a) {
        const std::size_t f = model_.free_index(dofs[a]);
        if (f == kNone) continue;
        rhs_[f] += row(static_cast<Eigen::Index>(a));
        first = std::min(first, f);
      }
    }
    if (first < rhs_.size()) model_.stiffness().solve_in_place(rhs_.data(), first);

    // Influence state: -z on the free dofs, the imposed unit displacement for
    // a reaction, zero on the other restrained dofs.
    for (std::size_t d = 0; d < state_.size(); ++d) {
      const std::size_t f = model_.free_index(d);
      state_[d] = (f == kNone) ? 0.0 : -rhs_[f];
    }
    if (imposed != kNone) state_[imposed] = 1.0;

    const auto& elements = model_.elements();
    std::vector<PiecewiseCubic::Coefficients> coefficients(elements.size());
    for (std::size_t e = 0; e < elements.size(); ++e) {
      const auto dofs = model_.element_dofs(e);
      Real y0 = state_[dofs[0]];
      Real d0 = state_[dofs[1]];
      Real y1 = state_[dofs[2]];
      Real d1 = state_[dofs[3]];
      if (e == term.element) {
        if (term.end == 0) {
          y0 += term.value;
          d0 += term.slope;
        } else {
          y1 += term.value;
          d1 += term.slope;
        }
      }
      coefficients[e] = CubicPiece::hermite(elements[e].start, elements[e].end, y0, d0, y1, d1).coefficients;
    }
    return PiecewiseCubic(model_.knots(), std::move(coefficients));
  }

 private:
  const LineGirderModel& model_;
  std::vector<Real> rhs_;
  std::vector<Real> state_;
};

ElementVector row_of(const BeamElement& element, int local, Real factor) {
  return factor * element.stiffness.row(local).transpose();
}

}  // namespace

const SupportInfluenceLines* InfluenceLines::support(std::size_t support_line) const {
  for (const SupportInfluenceLines& s : supports) {
    if (s.support_line == support_line) return &s;
  }
  return nullptr;
}

Real point_load_ordinate(const PiecewiseCubic& curve, ShearSide side, Real section, Real x, Real tolerance) {
  if (side == ShearSide::none || std::abs(x - section) > tolerance) return curve.value(x);
  // A cut beyond either end of the girder carries nothing.
  if (curve.empty() || (side == ShearSide::left && section <= curve.start() + tolerance) ||
      (side == ShearSide::right && section >= curve.end() - tolerance)) {
    return 0.0;
  }
  return side == ShearSide::right ? curve.right_limit(section) - 1.0 : curve.left_limit(section) + 1.0;
}

// Element end forces are f = k u + (fixed-end forces). At a node with an
// element R to its right and L to its left (nodes and elements alternate):
//   M  = -m1(R) = +m2(L)  (sagging moment: clockwise on a left face),
//   V+ = +f1(R)           (shear just right: upward on the left face of R),
//   V- = -f2(L)           (shear just left: downward on the right face of L).
// The fixed-end parts give the end terms: a unit value at the near end for
// shears, a unit slope at the near end for moments.
InfluenceLines compute_influence_lines(const LineGirderModel& model, const InfluenceLineOptions& options) {
  InfluenceLines out;
  out.bridge_id = model.bridge_id();
  out.length = model.length();
  out.points = model.analysis_points();
  out.support_lines = model.layout().supports.size();
  out.at_points.resize(out.points.size());

  const auto& elements = model.elements();
  const auto& nodes = model.nodes();
  const std::size_t element_count = elements.size();
  Builder builder(model);
  const PiecewiseCubic zero = PiecewiseCubic::zero(model.knots());

  for (std::size_t p = 0; p < out.points.size(); ++p) {
    const std::size_t n = model.point_node(p);
    const bool has_right = n < element_count;
    const bool has_left = n > 0;
    PointInfluenceLines& lines = out.at_points[p];

    if (has_right) {
      lines.moment = builder.build({{n, row_of(elements[n], 1, -1.0)}}, kNone, EndTerm{n, 0, 0.0, -1.0});
    } else {
      lines.moment = builder.build({{n - 1, row_of(elements[n - 1], 3, 1.0)}}, kNone, EndTerm{n - 1, 1, 0.0, 1.0});
    }

    lines.shear_right =
        has_right ? builder.build({{n, row_of(elements[n], 0, 1.0)}}, kNone, EndTerm{n, 0, 1.0, 0.0}) : zero;
    const bool vertical_free = model.free_index(nodes[n].vertical_dof) != kNone;
    if (!has_left) {
      lines.shear_left = zero;
    } else if (has_right && vertical_free) {
      lines.shear_left = lines.shear_right;  // no external force at the node: the same function
    } else {
      lines.shear_left =
          builder.build({{n - 1, row_of(elements[n - 1], 2, -1.0)}}, kNone, EndTerm{n - 1, 1, -1.0, 0.0});
    }

    if (options.deflections) {
      if (vertical_free) {
        // Downward deflection -v: c = -e_v, expressed through an element row.
        ElementVector unit = ElementVector::Zero();
        const std::size_t element = has_right ? n : n - 1;
        unit(has_right ? 0 : 2) = -1.0;
        lines.deflection = builder.build({{element, unit}}, kNone, EndTerm{});
      } else {
        lines.deflection = zero;
      }
    }
  }

  // Reactions: impose a unit displacement of the restrained dof; the free
  // dofs follow from K_ff z = K_fr e_r, the state being -z there.
  for (std::size_t n = 0; n < nodes.size(); ++n) {
    if (!nodes[n].support) continue;
    const std::size_t line = *nodes[n].support;
    const SupportKind kind = model.layout().supports[line];
    if (!restrains_vertical(kind)) continue;
    SupportInfluenceLines s;
    s.support_line = line;
    s.station = nodes[n].station;
    auto reaction_for = [&](int local_left, int local_right, std::size_t dof) {
      std::vector<std::pair<std::size_t, ElementVector>> rows;
      if (n > 0) rows.emplace_back(n - 1, ElementVector(elements[n - 1].stiffness.col(local_left)));
      if (n < element_count) rows.emplace_back(n, ElementVector(elements[n].stiffness.col(local_right)));
      return builder.build(rows, dof, EndTerm{});
    };
    s.reaction = reaction_for(2, 0, nodes[n].vertical_dof);
    if (restrains_rotation(kind)) s.moment = reaction_for(3, 1, nodes[n].left_rotation_dof);
    out.supports.push_back(std::move(s));
  }
  return out;
}

bool identical(const InfluenceLines& a, const InfluenceLines& b) {
  // Reals are compared by their bits (as identical() on curves does), so a
  // signed zero or a NaN never passes for its look-alike.
  const auto same = [](Real x, Real y) { return std::memcmp(&x, &y, sizeof(Real)) == 0; };
  const auto same_point = [&](const AnalysisPoint& p, const AnalysisPoint& q) {
    return same(p.station, q.station) && p.span == q.span && same(p.span_fraction, q.span_fraction) &&
           p.support == q.support && p.tenth == q.tenth && p.hinge == q.hinge && p.section_change == q.section_change &&
           p.labels == q.labels;
  };
  if (a.bridge_id != b.bridge_id || !same(a.length, b.length) || a.support_lines != b.support_lines ||
      a.points.size() != b.points.size() || a.at_points.size() != b.at_points.size() ||
      a.supports.size() != b.supports.size())
    return false;
  for (std::size_t i = 0; i < a.points.size(); ++i)
    if (!same_point(a.points[i], b.points[i])) return false;
  for (std::size_t i = 0; i < a.at_points.size(); ++i) {
    const PointInfluenceLines& p = a.at_points[i];
    const PointInfluenceLines& q = b.at_points[i];
    if (!identical(p.moment, q.moment) || !identical(p.shear_left, q.shear_left) ||
        !identical(p.shear_right, q.shear_right) || !identical(p.deflection, q.deflection))
      return false;
  }
  for (std::size_t i = 0; i < a.supports.size(); ++i) {
    const SupportInfluenceLines& p = a.supports[i];
    const SupportInfluenceLines& q = b.supports[i];
    if (p.support_line != q.support_line || !same(p.station, q.station) || !identical(p.reaction, q.reaction) ||
        !identical(p.moment, q.moment))
      return false;
  }
  return true;
}

}  // namespace tenthpoint::analysis
