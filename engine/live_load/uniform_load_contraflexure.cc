#include "engine/live_load/uniform_load_contraflexure.h"

#include <algorithm>
#include <cmath>
#include <memory>

#include "engine/live_load/detail/cubic.h"

namespace tenthpoint::live_load {

UniformLoadContraflexure uniform_load_contraflexure(const analysis::InfluenceLines& lines) {
  UniformLoadContraflexure out;
  const Real length = lines.length;
  struct Support {
    Real station;
    Real reaction;
    Real moment;
  };
  std::vector<Support> supports;
  for (const analysis::SupportInfluenceLines& s : lines.supports) {
    supports.push_back({s.station, s.reaction.integral(), s.moment.empty() ? 0.0 : s.moment.integral()});
  }
  std::sort(supports.begin(), supports.end(), [](const Support& a, const Support& b) { return a.station < b.station; });

  std::vector<Real> knots{0.0};
  for (const Support& s : supports) {
    if (s.station > knots.back() + kStationTolerance && s.station < length - kStationTolerance) {
      knots.push_back(s.station);
    }
  }
  knots.push_back(length);

  // Piece j in t = x - knots[j]: the supports at or left of knots[j] act on
  // the free body left of x.
  std::vector<analysis::PiecewiseCubic::Coefficients> pieces;
  for (std::size_t j = 0; j + 1 < knots.size(); ++j) {
    const Real a = knots[j];
    Real c0 = -0.5 * a * a;
    Real c1 = -a;
    for (const Support& s : supports) {
      if (s.station > a + kStationTolerance) break;
      c0 += s.reaction * (a - s.station) - s.moment;
      c1 += s.reaction;
    }
    pieces.push_back({c0, c1, -0.5, 0.0});
  }
  out.moment = analysis::PiecewiseCubic(knots, pieces);

  Real scale = 0.0;
  for (std::size_t j = 0; j < pieces.size(); ++j) {
    const detail::CubicRange r = detail::range_on(pieces[j], knots[j + 1] - knots[j]);
    scale = std::max({scale, std::abs(r.max), std::abs(r.min)});
  }
  // The diagram comes from integrated reactions, so it is exact to rounding
  // of order 1e-13 of its scale; a point of contraflexure that coincides with
  // an analysis point (0.8 l of an end span of three equal spans) must not
  // fall to either side by that rounding.
  const Real zero = 1e-9 * std::max(scale, 1e-300);

  // Negative regions and their ends: split each piece at its sign changes and
  // classify the parts at their midpoints.
  for (std::size_t j = 0; j < pieces.size(); ++j) {
    const Real h = knots[j + 1] - knots[j];
    Real cuts[5];
    int n = 0;
    cuts[n++] = 0.0;
    Real roots[3];
    const int r = detail::sign_changes_inside(pieces[j], h, roots);
    for (int i = 0; i < r; ++i) cuts[n++] = roots[i];
    cuts[n++] = h;
    for (int i = 0; i + 1 < n; ++i) {
      if (detail::horner(pieces[j], 0.5 * (cuts[i] + cuts[i + 1])) >= -zero) continue;
      const Real a = knots[j] + cuts[i];
      const Real b = knots[j] + cuts[i + 1];
      if (!out.negative_regions.empty() && std::abs(out.negative_regions.back().end - a) <= kStationTolerance) {
        out.negative_regions.back().end = b;
      } else {
        out.negative_regions.push_back({a, b});
      }
    }
  }
  for (const Interval& region : out.negative_regions) {
    for (Real end : {region.start, region.end}) {
      if (end > kStationTolerance && end < length - kStationTolerance) out.stations.push_back(end);
    }
  }

  for (const analysis::AnalysisPoint& p : lines.points) {
    const Real m = out.moment.value(p.station);
    out.point_moments.push_back(m);
    out.in_negative_region.push_back(m < -zero);
  }
  return out;
}

}  // namespace tenthpoint::live_load
