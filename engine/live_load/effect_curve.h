// EffectCurve: one influence line made ready for moving and distributed
// loads. It keeps the exact piecewise cubic from engine/analysis and adds
// what the searches ask of it many times: per-piece value ranges (bounds for
// pruning), the sign changes inside each piece (where a relieving axle is
// dropped or a lane patch ends), the exact positive and negative areas, the
// loaded regions, and the extreme ordinates, overall and per span.
//
// Units: stations m; ordinates in the effect per unit load (m for moments,
// dimensionless for shears and reactions); areas ordinate x m.
//
// One-sided values. A shear influence line jumps at its own section (and a
// reaction or end shear at the end of the girder). A load "just left" of a
// station takes the left limit there, "just right" the right limit; an
// extreme next to a jump is such a limit (an axle an infinitesimal distance to
// one side of the section), recorded with its Approach.
#pragma once

#include <algorithm>
#include <cstddef>
#include <cstdint>
#include <string_view>
#include <utility>
#include <vector>

#include "engine/analysis/influence_lines.h"
#include "engine/analysis/piecewise_cubic.h"
#include "engine/core/numeric.h"
#include "engine/live_load/detail/cubic.h"
#include "engine/live_load/effect_table.h"

namespace tenthpoint::live_load {

// How a load stands at a station: exactly there, or an infinitesimal
// distance to its left or right (a one-sided limit at a jump).
enum class Approach { exact, from_left, from_right };

[[nodiscard]] std::string_view to_string(Approach approach);  // "exact", "from_left", "from_right"
[[nodiscard]] std::optional<Approach> parse_approach(std::string_view text);

// Stations closer than this are one station (m): a breakpoint of a moving
// load and a knot it reaches, two simultaneous knot crossings.
inline constexpr Real kStationTolerance = 1.0e-9;

struct Interval {
  Real start = 0;  // m
  Real end = 0;    // m
};

// An extreme ordinate and where a unit load produces it.
struct OrdinatePeak {
  Real value = 0;    // ordinate (0 when the curve never has that sign)
  Real station = 0;  // m
  Approach approach = Approach::exact;
};

class EffectCurve {
 public:
  // `side` and `section` as analysis::point_load_ordinate: the cut of a shear
  // curve (ShearSide::none for moments and reactions). `span_boundaries` are
  // the support stations, ascending, first = start of the girder, last = end
  // (m). Precondition: `curve` is not empty.
  EffectCurve(analysis::PiecewiseCubic curve, analysis::ShearSide side, Real section,
              const std::vector<Real>& span_boundaries);

  [[nodiscard]] const analysis::PiecewiseCubic& curve() const { return curve_; }
  [[nodiscard]] const std::vector<Real>& knots() const { return curve_.knots(); }
  [[nodiscard]] std::size_t piece_count() const { return curve_.piece_count(); }
  [[nodiscard]] const detail::Cubic& coefficients(std::size_t piece) const { return curve_.coefficients()[piece]; }
  [[nodiscard]] Real piece_length(std::size_t piece) const { return lengths_[piece]; }
  // Largest and smallest value of a piece on its closed interval (the
  // one-sided limits at its ends included).
  [[nodiscard]] Real piece_max(std::size_t piece) const { return piece_max_[piece]; }
  [[nodiscard]] Real piece_min(std::size_t piece) const { return piece_min_[piece]; }
  // Each piece is cut into kCells equal cells for bounding moving loads
  // tightly; cell c of piece k is index k * kCells + c.
  static constexpr std::size_t kCells = 4;
  // Ranges of up to 2 x 2^(kCellLevels - 1) cells are answered in O(1).
  static constexpr std::size_t kCellLevels = 6;
  static constexpr std::size_t kLongestCellRange = std::size_t{1} << kCellLevels;
  // Largest and smallest value over the cells first..last (inclusive), in
  // O(1) (a sparse table over the cells). Precondition: at most
  // kLongestCellRange cells.
  [[nodiscard]] Real cell_range_max(std::size_t first, std::size_t last) const {
    const std::size_t level = std::min<std::size_t>(level_[last - first + 1], kCellLevels - 1);
    const std::size_t n = cell_count_;
    return std::max(table_max_[level * n + first], table_max_[level * n + last + 1 - (std::size_t{1} << level)]);
  }
  [[nodiscard]] Real cell_range_min(std::size_t first, std::size_t last) const {
    const std::size_t level = std::min<std::size_t>(level_[last - first + 1], kCellLevels - 1);
    const std::size_t n = cell_count_;
    return std::min(table_min_[level * n + first], table_min_[level * n + last + 1 - (std::size_t{1} << level)]);
  }
  // The two table slots whose extremes make up cells first..last: the same
  // for every curve on the same knots, so callers may compute them once.
  [[nodiscard]] static std::pair<std::uint32_t, std::uint32_t> cell_range_slots(std::size_t first, std::size_t last,
                                                                                std::size_t cell_count);
  [[nodiscard]] const Real* cell_table_max() const { return table_max_.data(); }
  [[nodiscard]] const Real* cell_table_min() const { return table_min_.data(); }
  // Sign changes strictly inside a piece, as local coordinates t from the
  // piece start (m), ascending.
  [[nodiscard]] const Real* sign_changes(std::size_t piece) const { return &changes_[change_begin_[piece]]; }
  [[nodiscard]] std::size_t sign_change_count(std::size_t piece) const {
    return change_begin_[piece + 1] - change_begin_[piece];
  }

  // Jump of the curve at knot k as a cubic in t = x - knot_k: the right
  // piece minus the left piece expanded about the knot (zero outside the
  // girder). A moving axle crossing the knot adds its weight times this to
  // the moving-load polynomial.
  [[nodiscard]] const detail::Cubic& jump(std::size_t knot) const { return jumps_[knot]; }
  // The same for the clipped curve max(f, 0) (maximum) or min(f, 0)
  // (minimum), which the relieving-axle rule uses.
  [[nodiscard]] const detail::Cubic& clipped_jump(std::size_t knot, Extreme e) const {
    return e == Extreme::maximum ? positive_jumps_[knot] : negative_jumps_[knot];
  }
  // Sign changes of the curve inside pieces, ascending (m), and the jump of
  // the clipped curves there (a kink: zero value, the piece's slope and
  // curvature switched on or off).
  [[nodiscard]] const std::vector<Real>& sign_change_stations() const { return root_stations_; }
  [[nodiscard]] const detail::Cubic& sign_change_jump(std::size_t root, Extreme e) const {
    return e == Extreme::maximum ? root_positive_jumps_[root] : root_negative_jumps_[root];
  }

  // Ordinate for a unit load at x approached as stated; zero off the girder.
  // `exact` follows analysis::point_load_ordinate (a load exactly at the
  // section of a shear curve is on the far side of the cut).
  [[nodiscard]] Real ordinate(Real x, Approach approach) const;

  // Exact integrals of max(f, 0) and min(f, 0) over the girder (m x ordinate).
  [[nodiscard]] Real positive_area() const { return positive_area_; }
  [[nodiscard]] Real negative_area() const { return negative_area_; }
  [[nodiscard]] Real area(Extreme e) const { return e == Extreme::maximum ? positive_area_ : negative_area_; }
  // Where the curve is positive (maximum) or negative (minimum): the parts a
  // lane load covers for that extreme, ascending and disjoint.
  [[nodiscard]] const std::vector<Interval>& regions(Extreme e) const {
    return e == Extreme::maximum ? positive_regions_ : negative_regions_;
  }

  // Largest (maximum) or smallest (minimum) ordinate over the girder, and
  // over one span (0-based; spans as given by span_boundaries).
  [[nodiscard]] const OrdinatePeak& peak(Extreme e) const { return e == Extreme::maximum ? max_ : min_; }
  [[nodiscard]] const OrdinatePeak& span_peak(std::size_t span, Extreme e) const {
    return e == Extreme::maximum ? span_max_[span] : span_min_[span];
  }
  [[nodiscard]] std::size_t span_count() const { return span_max_.size(); }
  // Largest |ordinate|: the scale against which "zero" is judged.
  [[nodiscard]] Real scale() const { return scale_; }
  // Stations where the curve jumps (left limit != right limit), ascending.
  [[nodiscard]] const std::vector<Real>& discontinuities() const { return discontinuities_; }

 private:
  analysis::PiecewiseCubic curve_;
  analysis::ShearSide side_ = analysis::ShearSide::none;
  Real section_ = 0;
  std::vector<Real> lengths_;
  std::vector<Real> piece_max_;
  std::vector<Real> piece_min_;
  std::size_t cell_count_ = 0;
  std::vector<Real> table_max_;  // level-major: level l holds the extremes of 2^l cells from each start
  std::vector<Real> table_min_;
  std::vector<std::uint8_t> level_;  // floor(log2(count)) for count = 0..cells
  std::vector<std::uint32_t> change_begin_;
  std::vector<Real> changes_;
  Real positive_area_ = 0;
  Real negative_area_ = 0;
  std::vector<Interval> positive_regions_;
  std::vector<Interval> negative_regions_;
  OrdinatePeak max_;
  OrdinatePeak min_;
  std::vector<OrdinatePeak> span_max_;
  std::vector<OrdinatePeak> span_min_;
  Real scale_ = 0;
  std::vector<Real> discontinuities_;
  std::vector<detail::Cubic> jumps_;
  std::vector<detail::Cubic> positive_jumps_;
  std::vector<detail::Cubic> negative_jumps_;
  std::vector<Real> root_stations_;
  std::vector<detail::Cubic> root_positive_jumps_;
  std::vector<detail::Cubic> root_negative_jumps_;
};

}  // namespace tenthpoint::live_load
