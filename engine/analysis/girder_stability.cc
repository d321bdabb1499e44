#include "engine/analysis/girder_stability.h"

#include <algorithm>
#include <cmath>
#include <vector>

#include <fmt/format.h>

namespace tenthpoint::analysis {
namespace {

struct Part {
  Real start = 0;
  Real end = 0;
  std::vector<Real> vertical_stations;
  bool rotation_restrained = false;
  bool held = false;
};

bool is_held(const Part& part, Real tolerance) {
  if (part.vertical_stations.empty()) return false;
  if (part.rotation_restrained) return true;
  const auto [lo, hi] = std::minmax_element(part.vertical_stations.begin(), part.vertical_stations.end());
  return *hi - *lo > tolerance;
}

std::string describe_spans(const GirderLayout& layout, Real start, Real end) {
  const std::size_t first = layout.span_at(start);
  std::size_t last = layout.span_at(end);
  if (last > first && std::abs(end - layout.span_start(last)) < 1e-9) --last;
  if (first == last) return fmt::format("span {}", first + 1);
  return fmt::format("spans {} to {}", first + 1, last + 1);
}

}  // namespace

GirderStability assess_stability(const GirderLayout& layout) {
  GirderStability result;
  const Real length = layout.length();
  const Real tolerance = 1e-9 * std::max(length, Real{1});

  std::vector<Real> hinges = layout.hinge_stations;
  std::sort(hinges.begin(), hinges.end());

  int restraints = 0;
  for (SupportKind kind : layout.supports) {
    restraints += (restrains_vertical(kind) ? 1 : 0) + (restrains_rotation(kind) ? 1 : 0);
  }
  result.degree_of_indeterminacy = restraints - 2 - static_cast<int>(hinges.size());

  std::vector<Part> parts(hinges.size() + 1);
  for (std::size_t i = 0; i < parts.size(); ++i) {
    parts[i].start = (i == 0) ? 0.0 : hinges[i - 1];
    parts[i].end = (i == hinges.size()) ? length : hinges[i];
  }
  for (std::size_t line = 0; line < layout.supports.size(); ++line) {
    const SupportKind kind = layout.supports[line];
    const Real x = layout.support_station(line);
    for (Part& part : parts) {
      if (x < part.start - tolerance || x > part.end + tolerance) continue;
      if (restrains_vertical(kind)) part.vertical_stations.push_back(x);
      if (restrains_rotation(kind)) part.rotation_restrained = true;
    }
  }

  for (bool changed = true; changed;) {
    changed = false;
    for (std::size_t i = 0; i < parts.size(); ++i) {
      Part& part = parts[i];
      if (part.held) continue;
      if (is_held(part, tolerance)) {
        part.held = true;
        changed = true;
        // A held part fixes the hinge points it shares with its neighbours.
        if (i > 0) parts[i - 1].vertical_stations.push_back(part.start);
        if (i + 1 < parts.size()) parts[i + 1].vertical_stations.push_back(part.end);
      }
    }
  }

  for (const Part& part : parts) {
    if (part.held) continue;
    result.stable = false;
    if (restraints == 0) {
      result.cause = "the girder has no supports";
    } else {
      result.cause = fmt::format("the part of the girder from {:.6g} m to {:.6g} m ({}) can move as a mechanism",
                                 part.start, part.end, describe_spans(layout, part.start, part.end));
    }
    return result;
  }
  result.stable = true;
  return result;
}

}  // namespace tenthpoint::analysis
