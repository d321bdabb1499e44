#include "engine/analysis/girder_layout.h"

#include <algorithm>
#include <cassert>
#include <numeric>

namespace tenthpoint::analysis {

std::string_view to_string(SupportKind kind) {
  switch (kind) {
    case SupportKind::pin:
      return "pin";
    case SupportKind::roller:
      return "roller";
    case SupportKind::fixed:
      return "fixed";
    case SupportKind::free:
      return "free";
  }
  return "pin";
}

std::optional<SupportKind> parse_support_kind(std::string_view text) {
  for (SupportKind kind : {SupportKind::pin, SupportKind::roller, SupportKind::fixed, SupportKind::free}) {
    if (text == to_string(kind)) return kind;
  }
  return std::nullopt;
}

Real GirderLayout::length() const { return std::accumulate(span_lengths.begin(), span_lengths.end(), Real{0}); }

Real GirderLayout::support_station(std::size_t line) const {
  assert(line <= span_lengths.size());
  Real x = 0;
  for (std::size_t i = 0; i < line; ++i) x += span_lengths[i];
  return x;
}

std::size_t GirderLayout::span_at(Real station) const {
  assert(!span_lengths.empty());
  Real start = 0;
  for (std::size_t i = 0; i + 1 < span_lengths.size(); ++i) {
    start += span_lengths[i];
    if (station < start) return i;
  }
  return span_lengths.size() - 1;
}

GirderLayout with_hinges_at_supports(GirderLayout layout, const std::vector<std::size_t>& support_lines) {
  for (std::size_t line : support_lines) {
    assert(line <= layout.span_count());
    layout.hinge_stations.push_back(layout.support_station(line));
  }
  std::sort(layout.hinge_stations.begin(), layout.hinge_stations.end());
  return layout;
}

GirderLayout with_hinges_at_interior_supports(GirderLayout layout) {
  std::vector<std::size_t> lines;
  for (std::size_t line = 1; line < layout.span_count(); ++line) lines.push_back(line);
  return with_hinges_at_supports(std::move(layout), lines);
}

GirderLayout continuous_girder(std::string bridge_id, std::vector<Real> span_lengths, SupportKind kind) {
  GirderLayout layout;
  layout.bridge_id = std::move(bridge_id);
  layout.supports.assign(span_lengths.size() + 1, kind);
  layout.span_lengths = std::move(span_lengths);
  return layout;
}

}  // namespace tenthpoint::analysis
