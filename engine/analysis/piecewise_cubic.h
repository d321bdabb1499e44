// PiecewiseCubic: a function of one variable made of cubic polynomial pieces
// between strictly increasing knots. It is the representation of every
// influence line and dead-load diagram in the engine, chosen so that
// downstream code can find critical load positions analytically (roots of the
// derivative), integrate exactly under distributed loads, and split areas at
// the zeros of the function.
//
// Contract:
//  - Piece i covers [knot(i), knot(i+1)] and is
//      p_i(x) = c0 + c1 t + c2 t^2 + c3 t^3,   t = x - knot(i)   (t in the unit of x).
//  - Pieces are independent, so the function may jump at a knot (the shear
//    influence line jumps by 1 at its own section). value(x) is right-continuous
//    inside the domain and takes the left limit at the last knot;
//    left_limit / right_limit give the one-sided values.
//  - Outside [start(), end()] the function is zero (for an influence line: a
//    load off the girder has no effect). left_limit(start()) and
//    right_limit(end()) are therefore 0.
//  - Knot vectors are immutable and shared between curves built on the same
//    mesh, so copying a curve is cheap and adding curves on one mesh needs no
//    re-knotting.
//  - An empty curve (default constructed) has no domain and is zero everywhere.
#pragma once

#include <array>
#include <cstddef>
#include <memory>
#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::analysis {

// One piece: p(x) = sum_k coefficients[k] * (x - start)^k on [start, end].
struct CubicPiece {
  Real start = 0;
  Real end = 0;
  std::array<Real, 4> coefficients{};

  [[nodiscard]] Real value(Real x) const;
  [[nodiscard]] Real derivative(Real x) const;
  // Exact integral of the polynomial over [a, b] (a, b need not lie in the piece).
  [[nodiscard]] Real integral(Real a, Real b) const;
  // Real zeros of the polynomial in the closed interval [start, end], ascending.
  // A polynomial that vanishes identically has no isolated zeros and yields none.
  [[nodiscard]] std::vector<Real> roots() const;

  // The cubic on [start, end] with the given end values and end slopes
  // (cubic Hermite interpolation); exact when the data come from a cubic.
  [[nodiscard]] static CubicPiece hermite(Real start, Real end, Real value_start, Real slope_start, Real value_end,
                                          Real slope_end);
};

// Stations and values of a sampled curve. Where the curve jumps at a knot the
// station appears twice: left limit first, then right limit.
struct SampledCurve {
  std::vector<Real> stations;
  std::vector<Real> values;
};

class PiecewiseCubic {
 public:
  using Coefficients = std::array<Real, 4>;

  PiecewiseCubic() = default;
  // Preconditions (asserted): at least two strictly increasing knots and
  // exactly one coefficient set per piece.
  PiecewiseCubic(std::vector<Real> knots, std::vector<Coefficients> coefficients);
  PiecewiseCubic(std::shared_ptr<const std::vector<Real>> knots, std::vector<Coefficients> coefficients);

  // The zero function on the given knots.
  [[nodiscard]] static PiecewiseCubic zero(std::shared_ptr<const std::vector<Real>> knots);

  [[nodiscard]] bool empty() const noexcept { return !knots_; }
  [[nodiscard]] Real start() const;
  [[nodiscard]] Real end() const;
  [[nodiscard]] std::size_t piece_count() const noexcept { return coefficients_.size(); }
  [[nodiscard]] const std::vector<Real>& knots() const;
  [[nodiscard]] const std::shared_ptr<const std::vector<Real>>& shared_knots() const noexcept { return knots_; }
  [[nodiscard]] const std::vector<Coefficients>& coefficients() const noexcept { return coefficients_; }
  [[nodiscard]] CubicPiece piece(std::size_t index) const;
  [[nodiscard]] std::vector<CubicPiece> pieces() const;

  // Index of the piece that value(x) uses; precondition: start() <= x <= end().
  [[nodiscard]] std::size_t piece_index(Real x) const;

  [[nodiscard]] Real value(Real x) const;
  [[nodiscard]] Real left_limit(Real x) const;
  [[nodiscard]] Real right_limit(Real x) const;
  [[nodiscard]] Real operator()(Real x) const { return value(x); }

  // First derivative (pieces of degree two), with the same knots.
  [[nodiscard]] PiecewiseCubic derivative() const;
  // Derivative value, right-continuous like value(); zero outside the domain.
  [[nodiscard]] Real slope(Real x) const;

  // Isolated real zeros of the pieces, ascending; a zero shared by two pieces
  // at a knot is reported once. Sign changes across a jump are not zeros.
  [[nodiscard]] std::vector<Real> roots() const;
  // Stationary points: zeros of the derivative pieces (candidate extremes;
  // the knots themselves are candidates too and are not included here).
  [[nodiscard]] std::vector<Real> stationary_points() const;

  // Exact integral over [a, b] (a <= b; parts outside the domain add zero).
  [[nodiscard]] Real integral(Real a, Real b) const;
  [[nodiscard]] Real integral() const;
  // Exact integrals of max(f, 0) and of min(f, 0) over [a, b], split at the
  // zeros of each piece; positive_area >= 0 >= negative_area and their sum is
  // integral(a, b).
  [[nodiscard]] Real positive_area(Real a, Real b) const;
  [[nodiscard]] Real negative_area(Real a, Real b) const;

  // Largest |value| at the knots (both one-sided limits) and stationary points.
  [[nodiscard]] Real max_abs() const;

  // Linear combinations. Curves on different knots are re-expressed on the
  // union of the knots; each is zero outside its own domain.
  [[nodiscard]] PiecewiseCubic scaled(Real factor) const;
  PiecewiseCubic& add_scaled(Real factor, const PiecewiseCubic& other);
  PiecewiseCubic& operator+=(const PiecewiseCubic& other) { return add_scaled(1.0, other); }
  PiecewiseCubic& operator-=(const PiecewiseCubic& other) { return add_scaled(-1.0, other); }
  PiecewiseCubic& operator*=(Real factor);
  friend PiecewiseCubic operator+(PiecewiseCubic a, const PiecewiseCubic& b) { return a += b; }
  friend PiecewiseCubic operator-(PiecewiseCubic a, const PiecewiseCubic& b) { return a -= b; }
  friend PiecewiseCubic operator*(Real factor, PiecewiseCubic a) { return a *= factor; }

  // Knots (both limits where the curve jumps) plus `interior_points` equally
  // spaced points inside every piece: a table a person can plot.
  [[nodiscard]] SampledCurve sample(int interior_points) const;

 private:
  [[nodiscard]] Real piece_value(std::size_t index, Real x) const;
  [[nodiscard]] PiecewiseCubic on_knots(const std::shared_ptr<const std::vector<Real>>& knots) const;

  std::shared_ptr<const std::vector<Real>> knots_;
  std::vector<Coefficients> coefficients_;
};

// True when both curves have the same knots and coefficients bit for bit
// (so -0.0 and 0.0 differ, and a NaN never matches): the test for reusing a
// result computed from one curve for the other. Two empty curves are
// identical.
[[nodiscard]] bool identical(const PiecewiseCubic& a, const PiecewiseCubic& b);

}  // namespace tenthpoint::analysis
