#include "engine/live_load/prepared_influence_lines.h"

#include <algorithm>
#include <cmath>

#include "engine/core/errors.h"

namespace tenthpoint::live_load {

PreparedInfluenceLines::PreparedInfluenceLines(const analysis::InfluenceLines& lines)
    : bridge_id_(lines.bridge_id), length_(lines.length), points_(lines.points) {
  if (lines.at_points.empty() || lines.at_points.size() != lines.points.size() || lines.supports.empty()) {
    throw ModelError(bridge_id_, "live load needs influence lines at every analysis point and support");
  }
  const analysis::PiecewiseCubic& first = lines.at_points.front().moment;
  if (first.empty()) throw ModelError(bridge_id_, "an influence line is empty");
  knots_ = first.knots();
  auto check_knots = [&](const analysis::PiecewiseCubic& c) {
    if (c.empty() || (c.shared_knots() != first.shared_knots() && c.knots() != knots_)) {
      throw ModelError(bridge_id_, "influence lines of one girder line must share the mesh knots");
    }
  };

  for (const analysis::AnalysisPoint& p : points_) {
    if (p.support) span_boundaries_.push_back(p.station);
  }
  std::sort(span_boundaries_.begin(), span_boundaries_.end());
  if (span_boundaries_.size() < 2) throw ModelError(bridge_id_, "live load needs the support lines as analysis points");
  support_line_count_ = lines.support_lines;

  auto add = [&](const analysis::PiecewiseCubic& c, analysis::ShearSide side, Real section) {
    check_knots(c);
    curves_.emplace_back(c, side, section, span_boundaries_);
    return curves_.size() - 1;
  };
  for (std::size_t p = 0; p < points_.size(); ++p) {
    const analysis::PointInfluenceLines& at = lines.at_points[p];
    const Real s = points_[p].station;
    moment_.push_back(add(at.moment, analysis::ShearSide::none, s));
    shear_right_.push_back(add(at.shear_right, analysis::ShearSide::right, s));
    // The two cuts see the same function except at a support, where they
    // differ by the reaction.
    const bool same = !points_[p].support && at.shear_left.coefficients() == at.shear_right.coefficients();
    shear_left_.push_back(same ? shear_right_.back() : add(at.shear_left, analysis::ShearSide::left, s));
  }
  for (const analysis::SupportInfluenceLines& s : lines.supports) {
    support_lines_.push_back(s.support_line);
    support_stations_.push_back(s.station);
    reaction_.push_back(add(s.reaction, analysis::ShearSide::none, s.station));
  }
  contraflexure_ = uniform_load_contraflexure(lines);
}

std::size_t PreparedInfluenceLines::curve_index(EffectKind kind, std::size_t index) const {
  switch (kind) {
    case EffectKind::moment:
      return moment_[index];
    case EffectKind::shear_left:
      return shear_left_[index];
    case EffectKind::shear_right:
      return shear_right_[index];
    case EffectKind::reaction:
      break;
  }
  return reaction_[index];
}

model::LoadEffect PreparedInfluenceLines::load_effect(const EffectKey& key) const {
  switch (key.kind) {
    case EffectKind::moment:
      return key.extreme == Extreme::maximum ? model::LoadEffect::positive_moment : model::LoadEffect::negative_moment;
    case EffectKind::shear_left:
    case EffectKind::shear_right:
      return model::LoadEffect::shear;
    case EffectKind::reaction:
      break;
  }
  const std::size_t line = support_lines_[key.index];
  return line == 0 || line + 1 == support_line_count_ ? model::LoadEffect::end_reaction
                                                      : model::LoadEffect::interior_reaction;
}

std::vector<std::size_t> PreparedInfluenceLines::spans_at_support_line(std::size_t support_line) const {
  std::vector<std::size_t> out;
  if (support_line > 0) out.push_back(support_line - 1);
  if (support_line < span_count()) out.push_back(support_line);
  return out;
}

Real PreparedInfluenceLines::condition_span_length(EffectKind kind, std::size_t index) const {
  std::optional<std::size_t> line;
  if (kind == EffectKind::reaction) {
    line = support_lines_[index];
  } else if (points_[index].support) {
    line = points_[index].support;
  }
  if (!line) return span_length(points_[index].span);
  Real longest = 0.0;
  for (std::size_t s : spans_at_support_line(*line)) longest = std::max(longest, span_length(s));
  return longest;
}

}  // namespace tenthpoint::live_load
