// TrainSweep: the exact extremes of a rigid group of axles (fixed spacings)
// moving over one influence line.
//
// With the lead axle at station x and axle i at x + offset_i, the effect
//   F(x) = sum_i w_i * eta(x + offset_i)
// is a piecewise cubic in x whose breakpoints are the positions where some
// axle reaches a knot of eta (x = knot_k - offset_i). The sweep builds that
// breakpoint list once per group and knot vector (it is the same for every
// influence line of a girder line, which all share the mesh knots), then,
// per curve, evaluates F exactly where an extreme can be: both one-sided
// limits at every breakpoint (the sup next to a jump of a shear line is such
// a limit) and the zeros of F' inside every interval. Nothing is sampled.
//
// Pruning, which keeps this fast without giving up exactness: on an interval
// every axle stays on one piece, so sum_i w_i * (largest value of its piece)
// bounds F there from above (and the smallest values from below). The bound
// is updated in O(1) per breakpoint; only intervals whose bound can beat the
// best value found so far are evaluated.
//
// Relieving axles (AxleRule::drop_relieving, AASHTO LRFD 3.6.1.3.1): an axle
// whose ordinate has the sign opposite to the extreme sought contributes
// zero, i.e. the maximum uses max(eta, 0) and the minimum min(eta, 0) per
// axle. Those clipped lines are still piecewise cubic, with extra kinks where
// eta changes sign; an evaluated interval is cut there.
//
// Units: stations and offsets m, weights N, effects N x ordinate unit.
// A train entirely off the girder gives zero, so the maximum is never below
// zero and the minimum never above it.
#pragma once

#include <cstddef>
#include <cstdint>
#include <limits>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/live_load/effect_curve.h"
#include "engine/live_load/effect_table.h"

namespace tenthpoint::live_load {

enum class AxleRule { all_axles, drop_relieving };

// A rigid set of axles: station of axle i = lead station + offsets[i].
struct AxleGroup {
  std::vector<Real> weights;  // N, > 0
  std::vector<Real> offsets;  // m; offsets[0] = 0 for the lead axle
};

// One place where an extreme can be.
struct SweepCandidate {
  static constexpr std::uint32_t kOff = std::numeric_limits<std::uint32_t>::max();

  Real lead = 0;  // m, lead-axle station
  Approach approach = Approach::exact;
  Real value = 0;                 // F there, exact
  std::uint32_t interval = kOff;  // interval of the sweep holding it; kOff: the group is off the girder
};

struct SweepExtremes {
  SweepCandidate maximum;  // value >= 0
  SweepCandidate minimum;  // value <= 0
};

// Work arrays reused between calls (one per thread).
struct SweepScratch {
  std::vector<Real> upper;
  std::vector<Real> lower;
};

class TrainSweep {
 public:
  // Precondition: weights and offsets of equal, non-zero size; knots strictly
  // increasing, at least two, fewer than 32767.
  TrainSweep(AxleGroup group, const std::vector<Real>& knots);

  [[nodiscard]] const AxleGroup& group() const { return group_; }
  [[nodiscard]] std::size_t axle_count() const { return group_.weights.size(); }
  // Breakpoints of F (lead stations, m), ascending; intervals lie between
  // consecutive breakpoints.
  [[nodiscard]] const std::vector<Real>& breakpoints() const { return breaks_; }
  [[nodiscard]] std::size_t interval_count() const { return breaks_.empty() ? 0 : breaks_.size() - 1; }
  // Piece of `curve` under axle `axle` throughout interval `interval` (-1:
  // the axle is off the girder).
  [[nodiscard]] int piece(std::size_t interval, std::size_t axle) const {
    return pieces_[interval * axle_count() + axle];
  }

  // Both extremes over every lead position. `curve` must be built on the
  // knots given to the constructor.
  [[nodiscard]] SweepExtremes extremes(const EffectCurve& curve, AxleRule rule, SweepScratch& scratch) const;

  // Every candidate of `extreme` whose value could reach `threshold`
  // (sign(extreme) * value >= sign(extreme) * threshold, give or take
  // rounding), ascending in lead station. Besides interior extremes this
  // includes the one-sided values at breakpoints, among them the zero values
  // where the group has just come onto or gone off the girder.
  void candidates(const EffectCurve& curve, AxleRule rule, Extreme extreme, Real threshold,
                  std::vector<SweepCandidate>& out, SweepScratch& scratch) const;

  // Ordinate under axle `axle` for the lead axle at `candidate` (its interval
  // fixes the pieces and so the one-sided limits).
  [[nodiscard]] Real axle_ordinate(const EffectCurve& curve, const SweepCandidate& candidate, std::size_t axle) const;

 private:
  struct Change {
    std::uint32_t axle;
    std::int32_t from;
    std::int32_t to;
  };

  void bounds(const EffectCurve& curve, AxleRule rule, SweepScratch& scratch) const;
  // Calls sink(candidate) for every candidate of interval j; for
  // drop_relieving the curve is clipped for `extreme`.
  template <typename Sink>
  void evaluate_interval(const EffectCurve& curve, AxleRule rule, Extreme extreme, std::size_t j, Sink&& sink) const;

  AxleGroup group_;
  std::vector<Real> knots_;
  std::vector<Real> breaks_;
  std::vector<std::int16_t> pieces_;         // interval-major, axle_count() per interval
  std::vector<std::uint32_t> change_begin_;  // per breakpoint, into changes_
  std::vector<Change> changes_;
  Real weight_sum_ = 0;
};

}  // namespace tenthpoint::live_load
