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
