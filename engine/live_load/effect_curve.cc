#include "engine/live_load/effect_curve.h"

#include <algorithm>
#include <array>
#include <cassert>
#include <cmath>
#include <utility>

namespace tenthpoint::live_load {
namespace {

constexpr std::array<std::pair<Approach, std::string_view>, 3> kApproachNames{{
    {Approach::exact, "exact"},
    {Approach::from_left, "from_left"},
    {Approach::from_right, "from_right"},
}};

// Exact integral of the cubic over [a, b] in local coordinates.
Real integral(const detail::Cubic& c, Real a, Real b) {
  auto antiderivative = [&c](Real t) { return t * (c[0] + t * (c[1] / 2.0 + t * (c[2] / 3.0 + t * c[3] / 4.0))); };
  return antiderivative(b) - antiderivative(a);
}

void extend(std::vector<Interval>& regions, Real a, Real b) {
  if (!regions.empty() && std::abs(regions.back().end - a) <= kStationTolerance) {
    regions.back().end = b;
  } else {
    regions.push_back({a, b});
  }
}

}  // namespace

std::string_view to_string(Approach approach) {
  for (const auto& [value, name] : kApproachNames)
    if (value == approach) return name;
  return "?";
}

std::optional<Approach> parse_approach(std::string_view text) {
  for (const auto& [value, name] : kApproachNames)
    if (name == text) return value;
  return std::nullopt;
}

EffectCurve::EffectCurve(analysis::PiecewiseCubic curve, analysis::ShearSide side, Real section,
                         const std::vector<Real>& span_boundaries)
    : curve_(std::move(curve)), side_(side), section_(section) {
  assert(!curve_.empty());
  assert(span_boundaries.size() >= 2);
  const std::vector<Real>& k = curve_.knots();
  const std::size_t pieces = curve_.piece_count();
  lengths_.resize(pieces);
  piece_max_.resize(pieces);
  piece_min_.resize(pieces);
  change_begin_.assign(pieces + 1, 0);
  const std::size_t spans = span_boundaries.size() - 1;
  span_max_.assign(spans, OrdinatePeak{});
  span_min_.assign(spans, OrdinatePeak{});

  std::size_t span = 0;
  for (std::size_t i = 0; i < pieces; ++i) {
    const detail::Cubic& c = curve_.coefficients()[i];
    const Real h = k[i + 1] - k[i];
    lengths_[i] = h;
    const detail::CubicRange range = detail::range_on(c, h);
    piece_max_[i] = range.max;
    piece_min_[i] = range.min;
    scale_ = std::max({scale_, std::abs(range.max), std::abs(range.min)});

    // The extreme of a closed piece at one of its ends is the one-sided limit
    // from inside the piece: from the right at its start, from the left at
    // its end.
    auto peak_of = [&](Real value, Real t) {
      OrdinatePeak p{value, k[i] + t, Approach::exact};
      if (t == 0.0) {
        p.approach = Approach::from_right;
        p.station = k[i];
      } else if (t == h) {
        p.approach = Approach::from_left;
        p.station = k[i + 1];
      }
      return p;
    };
    while (span + 1 < spans && k[i] >= span_boundaries[span + 1] - kStationTolerance) ++span;
    if (range.max > max_.value) max_ = peak_of(range.max, range.argmax);
    if (range.min < min_.value) min_ = peak_of(range.min, range.argmin);
    if (range.max > span_max_[span].value) span_max_[span] = peak_of(range.max, range.argmax);
    if (range.min < span_min_[span].value) span_min_[span] = peak_of(range.min, range.argmin);

    Real roots[3];
    const int n = detail::sign_changes_inside(c, h, roots);
    for (int r = 0; r < n; ++r) changes_.push_back(roots[r]);
    change_begin_[i + 1] = static_cast<std::uint32_t>(changes_.size());
  }

  // Cell extremes (ends of each cell and the piece's stationary points inside
  // it), then sparse tables for range extremes over runs of cells.
  cell_count_ = pieces * kCells;
  std::vector<Real> cell_max(cell_count_);
  std::vector<Real> cell_min(cell_count_);
  for (std::size_t i = 0; i < pieces; ++i) {
    const detail::Cubic& c = curve_.coefficients()[i];
    const Real h = lengths_[i];
    Real stationary[2];
    const int ns = detail::stationary_points_inside(c, h, stationary);
    Real previous = detail::horner(c, 0.0);
    for (std::size_t j = 0; j < kCells; ++j) {
      const Real a = h * static_cast<Real>(j) / kCells;
      const Real b = j + 1 == kCells ? h : h * static_cast<Real>(j + 1) / kCells;
      const Real end = detail::horner(c, b);
      Real hi = std::max(previous, end);
      Real lo = std::min(previous, end);
      for (int r = 0; r < ns; ++r) {
        if (stationary[r] >= a && stationary[r] <= b) {
          const Real v = detail::horner(c, stationary[r]);
          hi = std::max(hi, v);
          lo = std::min(lo, v);
        }
      }
      cell_max[i * kCells + j] = hi;
      cell_min[i * kCells + j] = lo;
      previous = end;
    }
  }
  level_.assign(cell_count_ + 1, 0);
  for (std::size_t c = 2; c <= cell_count_; ++c) level_[c] = static_cast<std::uint8_t>(level_[c / 2] + 1);
  const std::size_t levels = std::min(static_cast<std::size_t>(level_[cell_count_]) + 1, kCellLevels);
  table_max_.assign(levels * cell_count_, 0.0);
  table_min_.assign(levels * cell_count_, 0.0);
  std::copy(cell_max.begin(), cell_max.end(), table_max_.begin());
  std::copy(cell_min.begin(), cell_min.end(), table_min_.begin());
  for (std::size_t l = 1; l < levels; ++l) {
    const std::size_t half = std::size_t{1} << (l - 1);
    const std::size_t n = cell_count_;
    for (std::size_t i = 0; i + (std::size_t{1} << l) <= n; ++i) {
      table_max_[l * n + i] = std::max(table_max_[(l - 1) * n + i], table_max_[(l - 1) * n + i + half]);
      table_min_[l * n + i] = std::min(table_min_[(l - 1) * n + i], table_min_[(l - 1) * n + i + half]);
    }
  }

  // Areas and loaded regions: between consecutive sign changes the sign is
  // constant, decided at the midpoint; pieces that vanish identically load
  // nothing.
  const Real zero = 1e-14 * std::max(scale_, 1e-300);
  for (std::size_t i = 0; i < pieces; ++i) {
    const detail::Cubic& c = curve_.coefficients()[i];
    Real cuts[5];
    int n = 0;
    cuts[n++] = 0.0;
    for (std::size_t r = 0; r < sign_change_count(i); ++r) cuts[n++] = sign_changes(i)[r];
    cuts[n++] = lengths_[i];
    for (int j = 0; j + 1 < n; ++j) {
      const Real mid = detail::horner(c, 0.5 * (cuts[j] + cuts[j + 1]));
      if (std::abs(mid) <= zero) continue;
      const Real part = integral(c, cuts[j], cuts[j + 1]);
      if (mid > 0.0) {
        positive_area_ += part;
        extend(positive_regions_, k[i] + cuts[j], k[i] + cuts[j + 1]);
      } else {
        negative_area_ += part;
        extend(negative_regions_, k[i] + cuts[j], k[i] + cuts[j + 1]);
      }
    }
  }

  const Real jump = 1e-12 * std::max(scale_, 1e-300);
  for (std::size_t i = 0; i < k.size(); ++i) {
    const Real left = i == 0 ? 0.0 : detail::horner(curve_.coefficients()[i - 1], lengths_[i - 1]);
    const Real right = i == pieces ? 0.0 : curve_.coefficients()[i][0];
    if (std::abs(right - left) > jump) discontinuities_.push_back(k[i]);
  }
  auto exact_if_continuous = [this](OrdinatePeak& p) {
    if (std::find(discontinuities_.begin(), discontinuities_.end(), p.station) == discontinuities_.end()) {
      p.approach = Approach::exact;
    }
  };
  exact_if_continuous(max_);
  exact_if_continuous(min_);
  for (OrdinatePeak& p : span_max_) exact_if_continuous(p);
  for (OrdinatePeak& p : span_min_) exact_if_continuous(p);

  // Jumps for the moving-load sweep. The sign of a piece next to one of its
  // ends, or next to one of its sign changes, is the sign at the midpoint of
  // the part between them.
  auto sign_between = [this, zero](std::size_t i, Real a, Real b) {
    const Real v = detail::horner(curve_.coefficients()[i], 0.5 * (a + b));
    return std::abs(v) <= zero ? 0 : (v > 0.0 ? 1 : -1);
  };
  auto first_cut = [this](std::size_t i) { return sign_change_count(i) ? sign_changes(i)[0] : lengths_[i]; };
  auto last_cut = [this](std::size_t i) {
    return sign_change_count(i) ? sign_changes(i)[sign_change_count(i) - 1] : 0.0;
  };
  jumps_.resize(k.size());
  positive_jumps_.resize(k.size());
  negative_jumps_.resize(k.size());
  for (std::size_t i = 0; i < k.size(); ++i) {
    detail::Cubic right{};
    detail::Cubic left{};
    int right_sign = 0;
    int left_sign = 0;
    if (i < pieces) {
      right = curve_.coefficients()[i];
      right_sign = sign_between(i, 0.0, first_cut(i));
    }
    if (i > 0) {
      left = detail::taylor_shift(curve_.coefficients()[i - 1], lengths_[i - 1]);
      left_sign = sign_between(i - 1, last_cut(i - 1), lengths_[i - 1]);
    }
    for (std::size_t m = 0; m < 4; ++m) {
      jumps_[i][m] = right[m] - left[m];
      positive_jumps_[i][m] = (right_sign > 0 ? right[m] : 0.0) - (left_sign > 0 ? left[m] : 0.0);
      negative_jumps_[i][m] = (right_sign < 0 ? right[m] : 0.0) - (left_sign < 0 ? left[m] : 0.0);
    }
  }
  for (std::size_t i = 0; i < pieces; ++i) {
    const std::size_t n = sign_change_count(i);
    for (std::size_t r = 0; r < n; ++r) {
      const Real t = sign_changes(i)[r];
      const Real before = r == 0 ? 0.0 : sign_changes(i)[r - 1];
      const Real after = r + 1 == n ? lengths_[i] : sign_changes(i)[r + 1];
      detail::Cubic e = detail::taylor_shift(curve_.coefficients()[i], t);
      e[0] = 0.0;  // the value at a sign change is zero; only the slope switches
      const bool rising = sign_between(i, t, after) > 0 || sign_between(i, before, t) < 0;
      detail::Cubic on = e;
      detail::Cubic off = e;
      for (Real& c : off) c = -c;
      root_stations_.push_back(k[i] + t);
      root_positive_jumps_.push_back(rising ? on : off);
      root_negative_jumps_.push_back(rising ? off : on);
    }
  }
}

std::pair<std::uint32_t, std::uint32_t> EffectCurve::cell_range_slots(std::size_t first, std::size_t last,
                                                                      std::size_t cell_count) {
  // floor(log2(count)) without the table (this runs once per sweep layout).
  assert(last >= first && last - first + 1 <= kLongestCellRange);
  std::size_t level = 0;
  while ((std::size_t{2} << level) <= last - first + 1 && level + 1 < kCellLevels) ++level;
  return {static_cast<std::uint32_t>(level * cell_count + first),
          static_cast<std::uint32_t>(level * cell_count + last + 1 - (std::size_t{1} << level))};
}

Real EffectCurve::ordinate(Real x, Approach approach) const {
  const std::vector<Real>& k = curve_.knots();
  if (x < k.front() - kStationTolerance || x > k.back() + kStationTolerance) return 0.0;
  // Snap a station within tolerance of a knot onto it, so that a load
  // computed as knot - offset + offset takes the intended one-sided limit.
  const auto it = std::lower_bound(k.begin(), k.end(), x);
  if (it != k.end() && *it - x <= kStationTolerance) x = *it;
  if (it != k.begin() && x - *(it - 1) <= kStationTolerance) x = *(it - 1);
  switch (approach) {
    case Approach::from_left:
      return curve_.left_limit(x);
    case Approach::from_right:
      return curve_.right_limit(x);
    case Approach::exact:
      break;
  }
  return analysis::point_load_ordinate(curve_, side_, section_, x, kStationTolerance);
}

}  // namespace tenthpoint::live_load
