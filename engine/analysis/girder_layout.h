// GirderLayout: the geometry and boundary conditions of one line girder, in
// the plain form the analysis takes (a later builder converts the bridge model
// into it). Internal SI units only.
//
// Coordinates: station x in m, measured from the left end of the girder
// (support line 0); spans follow each other left to right.
//
// Supports: one per support line (span_lengths.size() + 1 of them). In a line
// girder only vertical translation and rotation in the vertical plane matter:
//   pin, roller  restrain vertical translation only (they are the same here);
//   fixed        restrains vertical translation and rotation;
//   free         restrains nothing (the tip of a cantilever, a removed bearing).
//
// Hinges: internal moment releases at given stations (0 < x < length). A hinge
// over a pin or roller support makes the spans either side act as simple spans
// there (precast girders before continuity). A hinge at a fixed support is
// meaningless and rejected when the model is built.
//
// Named points: extra analysis points that people care about ("splice",
// "cover-plate end"), reported with their labels.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::analysis {

enum class SupportKind { pin, roller, fixed, free };

// "pin", "roller", "fixed", "free" and the inverse (exact spelling).
[[nodiscard]] std::string_view to_string(SupportKind kind);
[[nodiscard]] std::optional<SupportKind> parse_support_kind(std::string_view text);

[[nodiscard]] inline bool restrains_vertical(SupportKind kind) { return kind != SupportKind::free; }
[[nodiscard]] inline bool restrains_rotation(SupportKind kind) { return kind == SupportKind::fixed; }

struct NamedPoint {
  std::string label;
  Real station = 0;  // m from the left end
};

struct GirderLayout {
  std::string bridge_id;              // named in every ModelError
  std::vector<Real> span_lengths;     // m, each > 0
  std::vector<SupportKind> supports;  // one per support line: span_lengths.size() + 1
  std::vector<Real> hinge_stations;   // m, strictly inside the girder
  std::vector<NamedPoint> named_points;

  [[nodiscard]] std::size_t span_count() const noexcept { return span_lengths.size(); }
  [[nodiscard]] Real length() const;                           // m, sum of the spans
  [[nodiscard]] Real support_station(std::size_t line) const;  // m; line in [0, span_count()]
  [[nodiscard]] Real span_start(std::size_t span) const { return support_station(span); }
  // Span that contains x; a station on an interior support belongs to the span
  // on its right, the right end to the last span. Precondition: 0 <= x <= length().
  [[nodiscard]] std::size_t span_at(Real station) const;
};

// The same layout with moment releases added over the given support lines
// (e.g. the interior piers of simple spans made continuous, for DC1).
[[nodiscard]] GirderLayout with_hinges_at_supports(GirderLayout layout, const std::vector<std::size_t>& support_lines);

// The same layout with hinges over every interior support line.
[[nodiscard]] GirderLayout with_hinges_at_interior_supports(GirderLayout layout);

// Equal spans on pins at every support line, the usual starting point of a test
// or a quick study.
[[nodiscard]] GirderLayout continuous_girder(std::string bridge_id, std::vector<Real> span_lengths,
                                             SupportKind kind = SupportKind::pin);

}  // namespace tenthpoint::analysis
