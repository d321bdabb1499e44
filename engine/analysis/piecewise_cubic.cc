#include "engine/analysis/piecewise_cubic.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <cstring>
#include <limits>

namespace tenthpoint::analysis {
namespace {

constexpr Real kEpsilon = std::numeric_limits<Real>::epsilon();

// Horner evaluation of sum c[k] t^k.
Real horner(const std::array<Real, 4>& c, Real t) { return ((c[3] * t + c[2]) * t + c[1]) * t + c[0]; }
Real horner_derivative(const std::array<Real, 4>& c, Real t) { return (3.0 * c[3] * t + 2.0 * c[2]) * t + c[1]; }

// Coefficients of the same polynomial about a new origin: p(t + shift).
std::array<Real, 4> taylor_shift(const std::array<Real, 4>& c, Real shift) {
  const Real d = shift;
  return {horner(c, d), horner_derivative(c, d), c[2] + 3.0 * c[3] * d, c[3]};
}

// Real zeros in (0, 1) of a + b s + c s^2, by the cancellation-free form of the
// quadratic formula, q = -(b + sgn(b) sqrt(b^2 - 4ac)) / 2, roots q/c and a/q
// (Press et al., Numerical Recipes, 3rd ed., eq. 5.6.4-5.6.5). It degrades
// gracefully to the linear case when c is negligible.
void quadratic_roots_in_unit(Real a, Real b, Real c, std::vector<Real>& out) {
  const Real scale = std::abs(a) + std::abs(b) + std::abs(c);
  if (scale == 0.0) return;
  auto keep = [&out](Real s) {
    if (std::isfinite(s) && s > 0.0 && s < 1.0) out.push_back(s);
  };
  if (std::abs(c) <= 4.0 * kEpsilon * scale) {
    if (b != 0.0) keep(-a / b);
    return;
  }
  const Real discriminant = b * b - 4.0 * c * a;
  if (discriminant < 0.0) return;
  const Real q = -0.5 * (b + std::copysign(std::sqrt(discriminant), b));
  keep(q / c);
  if (q != 0.0) keep(a / q);
}

// Zero of a continuous function that is monotone on [lo, hi] and changes sign
// there: Newton steps, replaced by bisection whenever a step leaves the
// shrinking bracket. Monotonicity (the bracket lies between stationary points)
// makes the root unique, so the iteration cannot jump to another one.
Real polish_monotone_root(const std::array<Real, 4>& q, Real lo, Real hi) {
  Real f_lo = horner(q, lo);
  Real s = 0.5 * (lo + hi);
  for (int iteration = 0; iteration < 200; ++iteration) {
    const Real f = horner(q, s);
    if (f == 0.0) return s;
    if ((f < 0.0) == (f_lo < 0.0)) {
      lo = s;
      f_lo = f;
    } else {
      hi = s;
    }
    const Real df = horner_derivative(q, s);
    Real next = (df != 0.0) ? s - f / df : 0.5 * (lo + hi);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (std::abs(next - s) <= 2.0 * kEpsilon * std::max(1.0, std::abs(s)) || hi - lo <= 4.0 * kEpsilon) return next;
    s = next;
  }
  return s;
}

// Zeros in [0, 1] of q0 + q1 s + q2 s^2 + q3 s^3. The interval is cut at the
// stationary points of the cubic into monotone sub-intervals; each holds at
// most one zero, found by a bracketed iteration. Values within a few ulps of
// the polynomial's scale count as zero, which also catches double roots at
// stationary points. This avoids Cardano's cancellation when the leading
// coefficient is small and treats quadratic and linear pieces alike.
std::vector<Real> cubic_roots_in_unit(const std::array<Real, 4>& q) {
  std::vector<Real> roots;
  const Real scale = std::abs(q[0]) + std::abs(q[1]) + std::abs(q[2]) + std::abs(q[3]);
  if (scale == 0.0) return roots;
  const Real tolerance = 64.0 * kEpsilon * scale;

  std::vector<Real> cuts{0.0};
  quadratic_roots_in_unit(q[1], 2.0 * q[2], 3.0 * q[3], cuts);
  cuts.push_back(1.0);
  std::sort(cuts.begin(), cuts.end());

  for (std::size_t i = 0; i < cuts.size(); ++i) {
    const Real s = cuts[i];
    const Real f = horner(q, s);
    if (std::abs(f) <= tolerance) {
      roots.push_back(s);
      continue;
    }
    if (i + 1 < cuts.size()) {
      const Real f_next = horner(q, cuts[i + 1]);
      if (std::abs(f_next) > tolerance && (f < 0.0) != (f_next < 0.0)) {
        roots.push_back(polish_monotone_root(q, s, cuts[i + 1]));
      }
    }
  }
  std::sort(roots.begin(), roots.end());
  roots.erase(std::unique(roots.begin(), roots.end(), [](Real a, Real b) { return std::abs(a - b) <= 1e-12; }),
              roots.end());
  return roots;
}

// Merges sorted root lists, dropping repeats closer than `tolerance`.
void append_unique(std::vector<Real>& all, const std::vector<Real>& more, Real tolerance) {
  for (Real r : more) {
    if (all.empty() || r - all.back() > tolerance) all.push_back(r);
  }
}

}  // namespace

// ---- CubicPiece -------------------------------------------------------------

Real CubicPiece::value(Real x) const { return horner(coefficients, x - start); }

Real CubicPiece::derivative(Real x) const { return horner_derivative(coefficients, x - start); }

Real CubicPiece::integral(Real a, Real b) const {
  auto antiderivative = [this](Real t) {
    const auto& c = coefficients;
    return t * (c[0] + t * (c[1] / 2.0 + t * (c[2] / 3.0 + t * c[3] / 4.0)));
  };
  return antiderivative(b - start) - antiderivative(a - start);
}

std::vector<Real> CubicPiece::roots() const {
  const Real h = end - start;
  assert(h > 0.0);
  // Normalise to s in [0, 1] so that the tolerance is independent of units.
  const std::array<Real, 4> q{coefficients[0], coefficients[1] * h, coefficients[2] * h * h,
                              coefficients[3] * h * h * h};
  std::vector<Real> out = cubic_roots_in_unit(q);
  for (Real& s : out) s = start + s * h;
  return out;
}

CubicPiece CubicPiece::hermite(Real start, Real end, Real value_start, Real slope_start, Real value_end,
                               Real slope_end) {
  const Real h = end - start;
  assert(h > 0.0);
  const Real secant = (value_end - value_start) / h;
  CubicPiece piece;
  piece.start = start;
  piece.end = end;
  piece.coefficients = {value_start, slope_start, (3.0 * secant - 2.0 * slope_start - slope_end) / h,
                        (slope_start + slope_end - 2.0 * secant) / (h * h)};
  return piece;
}

// ---- PiecewiseCubic ---------------------------------------------------------

PiecewiseCubic::PiecewiseCubic(std::vector<Real> knots, std::vector<Coefficients> coefficients)
    : PiecewiseCubic(std::make_shared<const std::vector<Real>>(std::move(knots)), std::move(coefficients)) {}

PiecewiseCubic::PiecewiseCubic(std::shared_ptr<const std::vector<Real>> knots, std::vector<Coefficients> coefficients)
    : knots_(std::move(knots)), coefficients_(std::move(coefficients)) {
  assert(knots_ && knots_->size() >= 2);
  assert(coefficients_.size() + 1 == knots_->size());
  assert(std::is_sorted(knots_->begin(), knots_->end()));
}

PiecewiseCubic PiecewiseCubic::zero(std::shared_ptr<const std::vector<Real>> knots) {
  assert(knots && knots->size() >= 2);
  const std::size_t pieces = knots->size() - 1;
  return PiecewiseCubic(std::move(knots), std::vector<Coefficients>(pieces, Coefficients{}));
}

Real PiecewiseCubic::start() const {
  assert(!empty());
  return knots_->front();
}

Real PiecewiseCubic::end() const {
  assert(!empty());
  return knots_->back();
}

const std::vector<Real>& PiecewiseCubic::knots() const {
  static const std::vector<Real> kNone;
  return knots_ ? *knots_ : kNone;
}

CubicPiece PiecewiseCubic::piece(std::size_t index) const {
  assert(index < coefficients_.size());
  return CubicPiece{(*knots_)[index], (*knots_)[index + 1], coefficients_[index]};
}

std::vector<CubicPiece> PiecewiseCubic::pieces() const {
  std::vector<CubicPiece> out;
  out.reserve(coefficients_.size());
  for (std::size_t i = 0; i < coefficients_.size(); ++i) out.push_back(piece(i));
  return out;
}

std::size_t PiecewiseCubic::piece_index(Real x) const {
  assert(!empty());
  const auto& k = *knots_;
  // upper_bound finds the first knot > x; the piece to its left holds x,
  // which makes value() right-continuous at interior knots.
  const auto it = std::upper_bound(k.begin(), k.end(), x);
  std::size_t index = (it == k.begin()) ? 0 : static_cast<std::size_t>(it - k.begin()) - 1;
  return std::min(index, coefficients_.size() - 1);
}

Real PiecewiseCubic::piece_value(std::size_t index, Real x) const {
  return horner(coefficients_[index], x - (*knots_)[index]);
}

Real PiecewiseCubic::value(Real x) const {
  if (empty() || x < start() || x > end()) return 0.0;
  return piece_value(piece_index(x), x);
}

Real PiecewiseCubic::left_limit(Real x) const {
  if (empty() || x <= start() || x > end()) return 0.0;
  const auto& k = *knots_;
  // The piece whose interval (k[i], k[i+1]] contains x.
  const auto it = std::lower_bound(k.begin(), k.end(), x);
  const std::size_t index = static_cast<std::size_t>(it - k.begin()) - 1;
  return piece_value(index, x);
}

Real PiecewiseCubic::right_limit(Real x) const {
  if (empty() || x < start() || x >= end()) return 0.0;
  return piece_value(piece_index(x), x);
}

PiecewiseCubic PiecewiseCubic::derivative() const {
  if (empty()) return {};
  std::vector<Coefficients> d(coefficients_.size());
  for (std::size_t i = 0; i < d.size(); ++i) {
    const auto& c = coefficients_[i];
    d[i] = {c[1], 2.0 * c[2], 3.0 * c[3], 0.0};
  }
  return PiecewiseCubic(knots_, std::move(d));
}

Real PiecewiseCubic::slope(Real x) const {
  if (empty() || x < start() || x > end()) return 0.0;
  const std::size_t index = piece_index(x);
  return horner_derivative(coefficients_[index], x - (*knots_)[index]);
}

std::vector<Real> PiecewiseCubic::roots() const {
  std::vector<Real> all;
  if (empty()) return all;
  const Real tolerance = 1e-12 * std::max(1.0, end() - start());
  for (std::size_t i = 0; i < coefficients_.size(); ++i) append_unique(all, piece(i).roots(), tolerance);
  return all;
}

std::vector<Real> PiecewiseCubic::stationary_points() const { return derivative().roots(); }

Real PiecewiseCubic::integral(Real a, Real b) const {
  assert(a <= b);
  if (empty()) return 0.0;
  a = std::max(a, start());
  b = std::min(b, end());
  if (a >= b) return 0.0;
  Real sum = 0.0;
  const auto& k = *knots_;
  for (std::size_t i = piece_index(a); i < coefficients_.size() && k[i] < b; ++i) {
    const Real lo = std::max(a, k[i]);
    const Real hi = std::min(b, k[i + 1]);
    if (hi > lo) sum += piece(i).integral(lo, hi);
  }
  return sum;
}

Real PiecewiseCubic::integral() const { return empty() ? 0.0 : integral(start(), end()); }

Real PiecewiseCubic::positive_area(Real a, Real b) const {
  assert(a <= b);
  if (empty()) return 0.0;
  a = std::max(a, start());
  b = std::min(b, end());
  Real sum = 0.0;
  const auto& k = *knots_;
  for (std::size_t i = 0; a < b && i < coefficients_.size(); ++i) {
    const Real lo = std::max(a, k[i]);
    const Real hi = std::min(b, k[i + 1]);
    if (hi <= lo) continue;
    const CubicPiece p = piece(i);
    std::vector<Real> cuts{lo};
    for (Real r : p.roots()) {
      if (r > lo && r < hi) cuts.push_back(r);
    }
    cuts.push_back(hi);
    for (std::size_t j = 0; j + 1 < cuts.size(); ++j) {
      // Between consecutive zeros the sign is constant; its value at the
      // midpoint decides whether the sub-interval is part of the positive area.
      const Real mid = 0.5 * (cuts[j] + cuts[j + 1]);
      if (p.value(mid) > 0.0) sum += p.integral(cuts[j], cuts[j + 1]);
    }
  }
  return sum;
}

Real PiecewiseCubic::negative_area(Real a, Real b) const { return integral(a, b) - positive_area(a, b); }

Real PiecewiseCubic::max_abs() const {
  if (empty()) return 0.0;
  Real best = 0.0;
  for (std::size_t i = 0; i < coefficients_.size(); ++i) {
    const CubicPiece p = piece(i);
    best = std::max({best, std::abs(p.value(p.start)), std::abs(p.value(p.end))});
  }
  for (Real x : stationary_points()) best = std::max(best, std::abs(value(x)));
  return best;
}

PiecewiseCubic PiecewiseCubic::scaled(Real factor) const {
  PiecewiseCubic copy = *this;
  copy *= factor;
  return copy;
}

PiecewiseCubic& PiecewiseCubic::operator*=(Real factor) {
  for (auto& c : coefficients_) {
    for (Real& v : c) v *= factor;
  }
  return *this;
}

PiecewiseCubic PiecewiseCubic::on_knots(const std::shared_ptr<const std::vector<Real>>& knots) const {
  const auto& k = *knots;
  std::vector<Coefficients> out(k.size() - 1, Coefficients{});
  if (!empty()) {
    for (std::size_t i = 0; i + 1 < k.size(); ++i) {
      const Real mid = 0.5 * (k[i] + k[i + 1]);
      if (mid < start() || mid > end()) continue;
      const std::size_t source = piece_index(mid);
      out[i] = taylor_shift(coefficients_[source], k[i] - (*knots_)[source]);
    }
  }
  return PiecewiseCubic(knots, std::move(out));
}

PiecewiseCubic& PiecewiseCubic::add_scaled(Real factor, const PiecewiseCubic& other) {
  if (other.empty()) return *this;
  if (empty()) {
    *this = other.scaled(factor);
    return *this;
  }
  if (knots_ != other.knots_ && *knots_ != *other.knots_) {
    // Union of both knot vectors; knots closer than a few ulps of the span are
    // one knot, so that re-knotting never creates sliver pieces.
    std::vector<Real> merged;
    merged.reserve(knots_->size() + other.knots_->size());
    std::merge(knots_->begin(), knots_->end(), other.knots_->begin(), other.knots_->end(), std::back_inserter(merged));
    const Real span = std::max(merged.back() - merged.front(), 1.0);
    merged.erase(
        std::unique(merged.begin(), merged.end(), [span](Real a, Real b) { return std::abs(a - b) <= 1e-13 * span; }),
        merged.end());
    auto shared = std::make_shared<const std::vector<Real>>(std::move(merged));
    PiecewiseCubic mine = on_knots(shared);
    const PiecewiseCubic theirs = other.on_knots(shared);
    *this = std::move(mine);
    return add_scaled(factor, theirs);
  }
  for (std::size_t i = 0; i < coefficients_.size(); ++i) {
    for (std::size_t k = 0; k < 4; ++k) coefficients_[i][k] += factor * other.coefficients_[i][k];
  }
  return *this;
}

SampledCurve PiecewiseCubic::sample(int interior_points) const {
  assert(interior_points >= 0);
  SampledCurve out;
  if (empty()) return out;
  const Real jump_tolerance = 1e-12 * std::max(1.0, max_abs());
  for (std::size_t i = 0; i < coefficients_.size(); ++i) {
    const CubicPiece p = piece(i);
    const Real start_value = p.value(p.start);
    const bool continues = !out.values.empty() && std::abs(out.values.back() - start_value) <= jump_tolerance;
    if (!continues) {
      out.stations.push_back(p.start);
      out.values.push_back(start_value);
    }
    for (int j = 1; j <= interior_points; ++j) {
      const Real x = p.start + (p.end - p.start) * static_cast<Real>(j) / static_cast<Real>(interior_points + 1);
      out.stations.push_back(x);
      out.values.push_back(p.value(x));
    }
    out.stations.push_back(p.end);
    out.values.push_back(p.value(p.end));
  }
  return out;
}

namespace {

// Bitwise equality of two arrays of Real; memcmp rather than ==, so that the
// signed zeros and NaNs that == would equate or separate are compared as
// stored.
bool same_bits(const Real* a, const Real* b, std::size_t count) {
  return count == 0 || std::memcmp(a, b, count * sizeof(Real)) == 0;
}

}  // namespace

bool identical(const PiecewiseCubic& a, const PiecewiseCubic& b) {
  if (a.empty() || b.empty()) return a.empty() && b.empty();
  const std::vector<Real>& ka = a.knots();
  const std::vector<Real>& kb = b.knots();
  if (ka.size() != kb.size() || a.piece_count() != b.piece_count()) return false;
  if (a.shared_knots() != b.shared_knots() && !same_bits(ka.data(), kb.data(), ka.size())) return false;
  static_assert(sizeof(PiecewiseCubic::Coefficients) == 4 * sizeof(Real));
  return same_bits(a.coefficients().front().data(), b.coefficients().front().data(), 4 * a.piece_count());
}

}  // namespace tenthpoint::analysis
