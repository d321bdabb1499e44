#include "engine/analysis/line_girder_model.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <stdexcept>

#include <fmt/format.h>

#include "engine/analysis/gauss_legendre_rule.h"
#include "engine/analysis/girder_stability.h"
#include "engine/core/errors.h"

namespace tenthpoint::analysis {
namespace {

// What a station is, in order of precedence when several coincide: the
// merged point takes the station of the highest-ranked one.
enum class MarkKind { support, hinge, section_change, tenth_point, named, breakpoint };

struct Mark {
  Real station = 0;
  MarkKind kind = MarkKind::named;
  std::string label;
  std::size_t span = 0;
  int tenth = 0;
  std::size_t support = 0;
};

struct StationGroup {
  Real station = 0;
  std::vector<Mark> marks;
  [[nodiscard]] bool is_analysis_point() const {
    return std::any_of(marks.begin(), marks.end(), [](const Mark& m) { return m.kind != MarkKind::breakpoint; });
  }
};

[[noreturn]] void fail(const GirderLayout& layout, std::string cause) {
  throw ModelError(layout.bridge_id, std::move(cause));
}

void check_layout(const GirderLayout& layout, const ModelOptions& options) {
  if (layout.span_lengths.empty()) fail(layout, "the girder has no spans");
  for (std::size_t i = 0; i < layout.span_lengths.size(); ++i) {
    const Real l = layout.span_lengths[i];
    if (!std::isfinite(l) || l <= 10.0 * options.station_tolerance) {
      fail(layout, fmt::format("span {} has length {} m; spans must be finite and longer than {} m", i + 1, l,
                               10.0 * options.station_tolerance));
    }
  }
  if (layout.supports.size() != layout.span_lengths.size() + 1) {
    fail(layout, fmt::format("{} spans need {} support lines, {} given", layout.span_lengths.size(),
                             layout.span_lengths.size() + 1, layout.supports.size()));
  }
  const Real length = layout.length();
  std::vector<Real> hinges = layout.hinge_stations;
  std::sort(hinges.begin(), hinges.end());
  for (std::size_t i = 0; i < hinges.size(); ++i) {
    const Real x = hinges[i];
    if (!std::isfinite(x) || x <= options.station_tolerance || x >= length - options.station_tolerance) {
      fail(layout, fmt::format("hinge at {} m is not strictly inside the girder (0 to {} m)", x, length));
    }
    if (i > 0 && x - hinges[i - 1] <= options.station_tolerance) {
      fail(layout, fmt::format("two hinges at {} m", x));
    }
    for (std::size_t line = 0; line < layout.supports.size(); ++line) {
      if (layout.supports[line] == SupportKind::fixed &&
          std::abs(layout.support_station(line) - x) <= options.station_tolerance) {
        fail(layout, fmt::format("hinge at {} m coincides with fixed support {}", x, line + 1));
      }
    }
  }
  for (const NamedPoint& point : layout.named_points) {
    if (!std::isfinite(point.station) || point.station < -options.station_tolerance ||
        point.station > length + options.station_tolerance) {
      fail(layout, fmt::format("named point '{}' at {} m is outside the girder (0 to {} m)", point.label, point.station,
                               length));
    }
  }
}

void check_rigidity(const GirderLayout& layout, const FlexuralRigidity& rigidity, const ModelOptions& options) {
  const auto& segments = rigidity.segments;
  if (segments.empty()) fail(layout, "no flexural rigidity (EI) is given");
  const Real length = layout.length();
  const Real tolerance = options.station_tolerance;
  Real expected_start = 0.0;
  for (std::size_t i = 0; i < segments.size(); ++i) {
    const RigiditySegment& s = segments[i];
    if (!std::isfinite(s.start) || !std::isfinite(s.end) || std::abs(s.start - expected_start) > tolerance) {
      fail(layout, fmt::format("rigidity segment {} starts at {} m, but the previous one ends at {} m (segments "
                               "must follow each other without gaps or overlaps)",
                               i + 1, s.start, expected_start));
    }
    if (s.end - s.start <= tolerance) {
      fail(layout, fmt::format("rigidity segment {} from {} m to {} m is empty", i + 1, s.start, s.end));
    }
    if (s.is_prismatic() && !(std::isfinite(s.constant) && s.constant > 0.0)) {
      fail(layout, fmt::format("flexural rigidity must be positive and finite: EI = {} N*m^2 in segment {} ({} m "
                               "to {} m)",
                               s.constant, i + 1, s.start, s.end));
    }
    for (Real b : s.breakpoints) {
      if (!(b > s.start && b < s.end)) {
        fail(layout,
             fmt::format("breakpoint {} m lies outside rigidity segment {} ({} m to {} m)", b, i + 1, s.start, s.end));
      }
    }
    expected_start = s.end;
  }
  if (std::abs(expected_start - length) > tolerance) {
    fail(layout, fmt::format("rigidity segments end at {} m but the girder is {} m long", expected_start, length));
  }
}

Real checked_ei(const GirderLayout& layout, const RigiditySegment& segment, Real x) {
  const Real ei = segment.at(x);
  if (!(std::isfinite(ei) && ei > 0.0)) {
    fail(layout, fmt::format("flexural rigidity must be positive and finite: EI = {} N*m^2 at {} m", ei, x));
  }
  return ei;
}

// Number of equal sub-elements for a non-prismatic bay [a, b] in a span of
// length span_length. Hermite interpolation of a function u with
// u'' = M g (g = 1/EI, M linear inside an element, as it is for influence
// states, which carry only nodal loads) errs by at most h^4/384 max|u''''|
// with u'''' = M g'' + 2 M' g' (de Boor, A Practical Guide to Splines, 2001,
// ch. II eq. 8 for the Hermite error). Against the scale of the influence
// line, g_mean M L^2 / 8, and with |M'| <= 2 M / L over a span, the relative
// error is about h^4 (|g''| + 4 |g'| / L) / (48 g_mean L^2).
int subdivisions(const GirderLayout& layout, const RigiditySegment& segment, Real a, Real b, Real span_length,
                 const ModelOptions& options) {
  constexpr int kSamples = 64;
  const Real step = (b - a) / kSamples;
  std::vector<Real> g(kSamples + 1);
  for (int i = 0; i <= kSamples; ++i) {
    const Real x = (i == kSamples) ? b : a + step * i;
    g[static_cast<std::size_t>(i)] = 1.0 / checked_ei(layout, segment, x);
  }
  Real mean = 0.0;
  for (Real v : g) mean += v;
  mean /= static_cast<Real>(g.size());
  Real slope = 0.0;
  Real curvature = 0.0;
  for (std::size_t i = 1; i + 1 < g.size(); ++i) {
    slope = std::max(slope, std::abs(g[i + 1] - g[i - 1]) / (2.0 * step));
    curvature = std::max(curvature, std::abs(g[i + 1] - 2.0 * g[i] + g[i - 1]) / (step * step));
  }
  const Real demand = (curvature + 4.0 * slope / span_length) / (48.0 * mean * span_length * span_length);
  if (!(demand > 0.0)) return 1;
  const Real h = std::pow(options.interpolation_tolerance / demand, 0.25);
  const Real n = std::ceil((b - a) / h);
  return static_cast<int>(std::clamp(n, Real{1}, static_cast<Real>(options.max_elements_per_bay)));
}

std::string tenth_label(std::size_t span, int tenth) {
  return fmt::format("span {} {}.{}L", span + 1, tenth / 10, tenth % 10);
}

std::vector<Mark> collect_marks(const GirderLayout& layout, const FlexuralRigidity& rigidity) {
  std::vector<Mark> marks;
  for (std::size_t line = 0; line < layout.supports.size(); ++line) {
    Mark m;
    m.station = layout.support_station(line);
    m.kind = MarkKind::support;
    m.support = line;
    m.label = layout.supports[line] == SupportKind::free ? fmt::format("support {} (free)", line + 1)
                                                         : fmt::format("support {}", line + 1);
    marks.push_back(std::move(m));
  }
  for (Real x : layout.hinge_stations) marks.push_back(Mark{x, MarkKind::hinge, "hinge", 0, 0, 0});
  for (std::size_t i = 1; i < rigidity.segments.size(); ++i) {
    marks.push_back(Mark{rigidity.segments[i].start, MarkKind::section_change, "section change", 0, 0, 0});
  }
  for (std::size_t span = 0; span < layout.span_count(); ++span) {
    const Real start = layout.span_start(span);
    const Real l = layout.span_lengths[span];
    for (int k = 0; k <= 10; ++k) {
      const Real x = (k == 10) ? layout.span_start(span + 1) : start + l * static_cast<Real>(k) / 10.0;
      marks.push_back(Mark{x, MarkKind::tenth_point, tenth_label(span, k), span, k, 0});
    }
  }
  for (const NamedPoint& p : layout.named_points) marks.push_back(Mark{p.station, MarkKind::named, p.label, 0, 0, 0});
  for (const RigiditySegment& s : rigidity.segments) {
    for (Real b : s.breakpoints) marks.push_back(Mark{b, MarkKind::breakpoint, "", 0, 0, 0});
  }
  return marks;
}

std::vector<StationGroup> group_marks(std::vector<Mark> marks, Real tolerance, Real length) {
  std::stable_sort(marks.begin(), marks.end(), [](const Mark& a, const Mark& b) { return a.station < b.station; });
  std::vector<StationGroup> groups;
  for (Mark& m : marks) {
    if (groups.empty() || m.station - groups.back().marks.front().station > tolerance) {
      groups.push_back(StationGroup{});
    }
    groups.back().marks.push_back(std::move(m));
  }
  for (StationGroup& g : groups) {
    const auto best = std::min_element(g.marks.begin(), g.marks.end(), [](const Mark& a, const Mark& b) {
      return static_cast<int>(a.kind) < static_cast<int>(b.kind);
    });
    g.station = std::clamp(best->station, Real{0}, length);
  }
  return groups;
}

AnalysisPoint make_point(const GirderLayout& layout, const StationGroup& group) {
  AnalysisPoint point;
  point.station = group.station;
  point.span = layout.span_at(group.station);
  point.span_fraction =
      std::clamp((group.station - layout.span_start(point.span)) / layout.span_lengths[point.span], Real{0}, Real{1});
  for (const Mark& m : group.marks) {
    switch (m.kind) {
      case MarkKind::support:
        point.support = m.support;
        break;
      case MarkKind::hinge:
        point.hinge = true;
        break;
      case MarkKind::section_change:
        point.section_change = true;
        break;
      case MarkKind::tenth_point:
        if (m.span == point.span) point.tenth = m.tenth;
        break;
      case MarkKind::named:
      case MarkKind::breakpoint:
        break;
    }
    if (!m.label.empty() && std::find(point.labels.begin(), point.labels.end(), m.label) == point.labels.end()) {
      point.labels.push_back(m.label);
    }
  }
  return point;
}

}  // namespace

bool ModelOptions::is_valid(std::string* why) const {
  auto reject = [why](const char* reason) {
    if (why) *why = reason;
    return false;
  };
  if (!(interpolation_tolerance > 0.0 && interpolation_tolerance < 1.0)) {
    return reject("interpolation_tolerance must be in (0, 1)");
  }
  if (gauss_points < 2 || gauss_points > 64) return reject("gauss_points must be in [2, 64]");
  if (max_elements_per_bay < 1) return reject("max_elements_per_bay must be at least 1");
  if (!(station_tolerance > 0.0 && std::isfinite(station_tolerance))) {
    return reject("station_tolerance must be positive");
  }
  if (!(pivot_tolerance > 0.0 && pivot_tolerance < 1.0)) return reject("pivot_tolerance must be in (0, 1)");
  return true;
}

LineGirderModel::LineGirderModel(GirderLayout layout, const FlexuralRigidity& rigidity, ModelOptions options)
    : layout_(std::move(layout)), options_(options) {
  if (std::string why; !options_.is_valid(&why)) throw std::invalid_argument("ModelOptions: " + why);
  check_layout(layout_, options_);
  check_rigidity(layout_, rigidity, options_);
  length_ = layout_.length();

  const GirderStability stability = assess_stability(layout_);
  degree_of_indeterminacy_ = stability.degree_of_indeterminacy;
  if (options_.check_statics && !stability.stable) fail(layout_, stability.cause);

  // Key stations: analysis points and breakpoints.
  const std::vector<StationGroup> groups =
      group_marks(collect_marks(layout_, rigidity), options_.station_tolerance, length_);

  // Nodes: key stations, plus equal subdivisions of non-prismatic bays.
  struct PendingElement {
    Real start;
    Real end;
    std::size_t segment;
  };
  std::vector<PendingElement> pending;
  std::vector<Real> stations{groups.front().station};
  std::vector<std::optional<std::size_t>> group_of_node{0};
  std::unique_ptr<GaussLegendreRule> rule;
  for (std::size_t gi = 0; gi + 1 < groups.size(); ++gi) {
    const Real a = groups[gi].station;
    const Real b = groups[gi + 1].station;
    const std::size_t segment = rigidity.segment_at(0.5 * (a + b));
    const RigiditySegment& seg = rigidity.segments[segment];
    int n = 1;
    if (!seg.is_prismatic()) {
      const std::size_t span = layout_.span_at(0.5 * (a + b));
      n = subdivisions(layout_, seg, a, b, layout_.span_lengths[span], options_);
    }
    for (int k = 1; k <= n; ++k) {
      const Real x = (k == n) ? b : a + (b - a) * static_cast<Real>(k) / static_cast<Real>(n);
      pending.push_back(PendingElement{stations.back(), x, segment});
      stations.push_back(x);
      group_of_node.push_back(k == n ? std::optional<std::size_t>(gi + 1) : std::nullopt);
    }
  }

  // Analysis points and the nodes that carry them.
  nodes_.resize(stations.size());
  for (std::size_t n = 0; n < stations.size(); ++n) {
    nodes_[n].station = stations[n];
    if (!group_of_node[n]) continue;
    const StationGroup& group = groups[*group_of_node[n]];
    for (const Mark& m : group.marks) {
      if (m.kind == MarkKind::support) nodes_[n].support = m.support;
      if (m.kind == MarkKind::hinge) nodes_[n].hinge = true;
    }
    if (group.is_analysis_point()) {
      points_.push_back(make_point(layout_, group));
      point_nodes_.push_back(n);
    }
  }

  // Degrees of freedom, node by node: v, theta (left), theta (right) at hinges.
  std::vector<bool> restrained;
  for (MeshNode& node : nodes_) {
    const SupportKind kind = node.support ? layout_.supports[*node.support] : SupportKind::free;
    node.vertical_dof = restrained.size();
    restrained.push_back(restrains_vertical(kind));
    node.left_rotation_dof = restrained.size();
    restrained.push_back(restrains_rotation(kind));
    node.right_rotation_dof = node.left_rotation_dof;
    if (node.hinge) {
      node.right_rotation_dof = restrained.size();
      restrained.push_back(false);
    }
  }
  free_index_.assign(restrained.size(), kRestrained);
  std::size_t free_count = 0;
  for (std::size_t d = 0; d < restrained.size(); ++d) {
    if (!restrained[d]) free_index_[d] = free_count++;
  }

  // Element stiffness.
  elements_.reserve(pending.size());
  for (const PendingElement& p : pending) {
    const RigiditySegment& seg = rigidity.segments[p.segment];
    BeamElement element;
    element.start = p.start;
    element.end = p.end;
    element.prismatic = seg.is_prismatic();
    if (element.prismatic) {
      element.stiffness = prismatic_beam_stiffness(seg.constant, p.end - p.start);
    } else {
      if (!rule) rule = std::make_unique<GaussLegendreRule>(options_.gauss_points);
      Real smallest = 0.0;
      element.stiffness = flexibility_beam_stiffness(seg.varying, p.start, p.end, *rule, &smallest);
      if (!(std::isfinite(smallest) && smallest > 0.0)) {
        fail(layout_, fmt::format("flexural rigidity must be positive and finite: EI = {} N*m^2 between {} m and "
                                  "{} m",
                                  smallest, p.start, p.end));
      }
    }
    elements_.push_back(element);
  }

  // Assemble the free-dof stiffness in band storage.
  std::size_t band = 0;
  for (std::size_t e = 0; e < elements_.size(); ++e) {
    std::size_t lo = kRestrained;
    std::size_t hi = 0;
    for (std::size_t dof : element_dofs(e)) {
      const std::size_t f = free_index_[dof];
      if (f == kRestrained) continue;
      lo = std::min(lo, f);
      hi = std::max(hi, f);
    }
    if (lo != kRestrained) band = std::max(band, hi - lo);
  }
  if (free_count == 0) fail(layout_, "every degree of freedom is restrained; there is nothing to analyse");
  stiffness_ = BandedLdlt(free_count, band);
  for (std::size_t e = 0; e < elements_.size(); ++e) {
    const auto dofs = element_dofs(e);
    for (std::size_t a = 0; a < 4; ++a) {
      const std::size_t fa = free_index_[dofs[a]];
      if (fa == kRestrained) continue;
      for (std::size_t b = 0; b <= a; ++b) {
        const std::size_t fb = free_index_[dofs[b]];
        if (fb == kRestrained) continue;
        stiffness_.add(fa, fb, elements_[e].stiffness(static_cast<Eigen::Index>(a), static_cast<Eigen::Index>(b)));
      }
    }
  }
  const FactorizationStatus status = stiffness_.factorize(options_.pivot_tolerance);
  if (!status.ok) {
    std::size_t dof = 0;
    while (free_index_[dof] != status.failed_row) ++dof;
    const auto node = std::find_if(nodes_.begin(), nodes_.end(), [dof](const MeshNode& n) {
      return n.vertical_dof == dof || n.left_rotation_dof == dof || n.right_rotation_dof == dof;
    });
    assert(node != nodes_.end());
    fail(layout_,
         fmt::format("the stiffness matrix is singular at the {} of the node at {:.6g} m (pivot ratio "
                     "{:.3g}): the girder is a mechanism there, or its rigidities differ too much",
                     node->vertical_dof == dof ? "deflection" : "rotation", node->station, status.pivot_ratio));
  }

  knots_ = std::make_shared<const std::vector<Real>>(std::move(stations));
}

std::array<std::size_t, 4> LineGirderModel::element_dofs(std::size_t element) const {
  const MeshNode& left = nodes_[element];
  const MeshNode& right = nodes_[element + 1];
  return {left.vertical_dof, left.right_rotation_dof, right.vertical_dof, right.left_rotation_dof};
}

}  // namespace tenthpoint::analysis
