// TrainSweep: the exact extremes of a rigid group of axles (fixed spacings)
// moving over one influence line.
//
// With the lead axle at station x and axle i at x + offset_i, the effect
//   F(x) = sum_i w_i * eta(x + offset_i)
// is a piecewise cubic in x whose breakpoints are the positions where some
// axle reaches a knot of eta (x = knot_k - offset_i). The sweep builds that
// breakpoint list once per group and knot vector (it is the same for every
// influence line of a girder line, which all share the mesh knots).
// Candidates for an extreme are both one-sided values of F at every
// breakpoint (the sup next to a jump of a shear line is such a limit) and
// the zeros of F' inside every interval. Nothing is sampled.
//
// Evaluation. Along a run of breakpoints F is carried as one cubic about the
// current breakpoint: moving to the next is a Taylor shift, and an axle
// crossing knot k adds w_i times the curve's jump there (EffectCurve::jump),
// so each interval costs O(1) whatever the number of axles. The values are
// those of the exact polynomial, to rounding of about 1e-13 of
// sum(w) x max|eta|.
//
// Pruning. The breakpoints are cut into blocks of kBlockBreaks. Over a block
// each axle stays on a known, short run of pieces, so
//   sum_i w_i * (largest value on the pieces axle i touches)
// bounds F from above there (and the smallest values from below). Blocks are
// evaluated best bound first, and the search stops when no bound left can
// beat the best value found (by more than 1e-11 of sum(w) x max|eta|): the
// result is the exact extreme, usually after evaluating a tenth of the
// breakpoints.
//
// Relieving axles (AxleRule::drop_relieving, AASHTO LRFD 3.6.1.3.1): an axle
// whose ordinate has the sign opposite to the extreme sought contributes
// zero, i.e. the maximum uses max(eta, 0) and the minimum min(eta, 0) per
// axle. Those clipped lines are piecewise cubic too, with extra kinks where
// eta changes sign: the evaluation adds those crossings as events, with the
// clipped jumps of EffectCurve, and the bounds use the clipped piece ranges.
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
  Real lead = 0;  // m, lead-axle station
  Approach approach = Approach::exact;
  Real value = 0;  // F there
};

struct SweepExtremes {
  SweepCandidate maximum;  // value >= 0
  SweepCandidate minimum;  // value <= 0
};

// Work space reused between calls (one per thread).
struct SweepScratch {
  struct RootEvent {
    Real station;
    Real weight;
    std::uint32_t root;
  };
  std::vector<RootEvent> roots;
  std::vector<Real> upper;  // per block
  std::vector<Real> lower;  // per block
  std::vector<std::uint8_t> done;
  std::vector<std::uint32_t> order;
  // What upper/lower were last computed for, so a second pass over the same
  // sweep and curve reuses them.
  const void* bounds_sweep = nullptr;
  const EffectCurve* bounds_curve = nullptr;
  int bounds_rule = -1;
};

// What to keep from a sweep besides the extremes: for each extreme (index 0
// maximum, 1 minimum) whose list is set, every candidate with
// sign * value >= floor - tolerance, ascending in station: local extremes of
// that sign inside intervals and one-sided values at breakpoints, among them
// the zero values where the group has just come onto or gone off the girder.
struct SweepKeep {
  std::vector<SweepCandidate>* list[2] = {nullptr, nullptr};
  Real floor[2] = {0.0, 0.0};
};

class TrainSweep {
 public:
  // Breakpoints per block of the pruning bound. An axle crosses at most this
  // many knots in a block, so it touches at most kBlockBreaks + 1 pieces.
  static constexpr std::size_t kBlockBreaks = 12;
  static_assert((kBlockBreaks + 1) * EffectCurve::kCells <= EffectCurve::kLongestCellRange);

  // Precondition: weights and offsets of equal, non-zero size; knots strictly
  // increasing, at least two.
  TrainSweep(AxleGroup group, const std::vector<Real>& knots);

  [[nodiscard]] const AxleGroup& group() const { return group_; }
  [[nodiscard]] std::size_t axle_count() const { return group_.weights.size(); }
  // Breakpoints of F (lead stations, m), ascending.
  [[nodiscard]] const std::vector<Real>& breakpoints() const { return breaks_; }
  [[nodiscard]] Real weight_sum() const { return weight_sum_; }
  // sum(w) x max|eta|: the scale of F, against which "zero" is judged.
  [[nodiscard]] Real scale(const EffectCurve& curve) const { return weight_sum_ * curve.scale(); }

  // Both extremes over every lead position. `curve` must be built on the
  // knots given to the constructor. With `known` (values already reached
  // elsewhere, maximum >= 0 >= minimum) an extreme that cannot beat its
  // known value is not searched for: the one returned is then exact only if
  // it beats the known one, and never beats it otherwise.
  [[nodiscard]] SweepExtremes extremes(const EffectCurve& curve, AxleRule rule, SweepScratch& scratch,
                                       ExtremePair<Real> known = {0.0, 0.0}) const;

  // The candidates asked for by `keep`, evaluating only the blocks that can
  // hold one. The extremes returned are over those blocks only: never above
  // the true ones, and equal to them wherever they reach the floors.
  SweepExtremes candidates(const EffectCurve& curve, AxleRule rule, const SweepKeep& keep, SweepScratch& scratch) const;

  // Convenience: the candidates of one extreme reaching `threshold`.
  void candidates(const EffectCurve& curve, AxleRule rule, Extreme extreme, Real threshold,
                  std::vector<SweepCandidate>& out, SweepScratch& scratch) const;

 private:
  struct Crossing {
    Real weight;
    std::uint32_t knot;
  };
  // The pieces axle i touches over block j, the one it stands on at the
  // block's first breakpoint (just right of it), and the bounding cells it
  // touches (EffectCurve::kCells per piece); -1 where it is off.
  struct Reach {
    std::int32_t first = -1;
    std::int32_t last = -1;
    std::int32_t start = -1;
    std::int32_t first_cell = -1;
    std::int32_t last_cell = -1;
    bool partly_off = false;
  };
  // What the bound needs per block and axle, precomputed: the axle's weight
  // (0 when it is off the girder throughout the block), the two cell-table
  // slots, and whether it leaves or enters the girder in the block.
  struct BoundTerm {
    Real weight = 0;
    std::uint32_t slot_a = 0;
    std::uint32_t slot_b = 0;
    bool partly_off = false;
  };

  [[nodiscard]] std::size_t block_count() const { return block_first_.size(); }
  void bound_blocks(const EffectCurve& curve, AxleRule rule, SweepScratch& scratch) const;
  // Evaluates block j, reporting every candidate to sink.maximum/minimum;
  // `which` (clipped rule only) is the extreme whose clipped line is swept.
  template <bool Clipped, typename Sink>
  void evaluate_block(const EffectCurve& curve, std::size_t j, Extreme which, SweepScratch& scratch, Sink& sink) const;

  AxleGroup group_;
  std::vector<Real> knots_;
  std::vector<Real> breaks_;
  std::vector<std::uint32_t> crossing_begin_;  // per breakpoint, into crossings_; one extra at the end
  std::vector<Crossing> crossings_;
  std::vector<std::uint32_t> block_first_;  // first breakpoint of each block; it ends at the next one's
  std::vector<Reach> reach_;                // block-major, axle_count() per block
  std::vector<BoundTerm> terms_;            // parallel to reach_
  Real weight_sum_ = 0;
};

}  // namespace tenthpoint::live_load
