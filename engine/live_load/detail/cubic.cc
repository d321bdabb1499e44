#include "engine/live_load/detail/cubic.h"

#include <algorithm>

namespace tenthpoint::live_load::detail {
namespace {

// The zero of a cubic that is monotone on [lo, hi] and has f(lo), f(hi) of
// opposite signs. Newton from the midpoint, falling back to bisection when a
// step leaves the bracket; monotonicity makes the zero unique.
Real monotone_zero(const Cubic& c, Real lo, Real hi) {
  const bool rising = horner(c, lo) < 0.0;
  Real t = 0.5 * (lo + hi);
  for (int iteration = 0; iteration < 100; ++iteration) {
    const Real f = horner(c, t);
    if (f == 0.0) return t;
    if ((f < 0.0) == rising) {
      lo = t;
    } else {
      hi = t;
    }
    const Real df = horner_slope(c, t);
    Real next = df != 0.0 ? t - f / df : 0.5 * (lo + hi);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (std::abs(next - t) <= 4.0 * std::numeric_limits<Real>::epsilon() * std::max(std::abs(t), hi - lo) ||
        hi - lo <= 4.0 * std::numeric_limits<Real>::epsilon() * std::max(std::abs(lo), std::abs(hi))) {
      return next;
    }
    t = next;
  }
  return t;
}

}  // namespace

int sign_changes_inside(const Cubic& c, Real h, Real out[3]) {
  Real cuts[4];
  int n = 0;
  cuts[n++] = 0.0;
  Real stationary[2];
  const int s = stationary_points_inside(c, h, stationary);
  for (int i = 0; i < s; ++i) cuts[n++] = stationary[i];
  cuts[n++] = h;
  // Values this close to zero (relative to the size of the polynomial on the
  // interval) count as zero. A zero value at an interior stationary point is
  // a crossing only when the signs on either side differ; at the ends of the
  // interval the neighbouring piece decides, so nothing is reported there.
  const Real scale = std::abs(c[0]) + std::abs(c[1] * h) + std::abs(c[2] * h * h) + std::abs(c[3] * h * h * h);
  const Real tiny = 64.0 * std::numeric_limits<Real>::epsilon() * scale;
  int sign[4];
  for (int i = 0; i < n; ++i) {
    const Real f = horner(c, cuts[i]);
    sign[i] = std::abs(f) <= tiny ? 0 : (f > 0.0 ? 1 : -1);
  }
  int count = 0;
  for (int i = 0; i + 1 < n; ++i) {
    if (sign[i] != 0 && sign[i + 1] != 0 && sign[i] != sign[i + 1]) {
      out[count++] = monotone_zero(c, cuts[i], cuts[i + 1]);
    }
  }
  for (int i = 1; i + 1 < n; ++i) {
    if (sign[i] != 0) continue;
    int left = 0;
    for (int j = i - 1; j >= 0 && left == 0; --j) left = sign[j];
    int right = 0;
    for (int j = i + 1; j < n && right == 0; ++j) right = sign[j];
    if (left != 0 && right != 0 && left != right && count < 3) out[count++] = cuts[i];
  }
  std::sort(out, out + count);
  return count;
}

CubicRange range_on(const Cubic& c, Real h) {
  CubicRange r;
  const Real f0 = horner(c, 0.0);
  const Real f1 = horner(c, h);
  r.max = f0;
  r.argmax = 0.0;
  r.min = f0;
  r.argmin = 0.0;
  auto consider = [&r](Real t, Real f) {
    if (f > r.max) {
      r.max = f;
      r.argmax = t;
    }
    if (f < r.min) {
      r.min = f;
      r.argmin = t;
    }
  };
  consider(h, f1);
  Real stationary[2];
  const int s = stationary_points_inside(c, h, stationary);
  for (int i = 0; i < s; ++i) consider(stationary[i], horner(c, stationary[i]));
  return r;
}

}  // namespace tenthpoint::live_load::detail
