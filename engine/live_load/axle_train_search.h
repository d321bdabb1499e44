// AxleTrainSearch: the exact extremes of one axle chain (variable spacings
// and gaps included) over any influence line of a girder line, in both
// directions of travel.
//
// Why it is exact. Cut the chain at its variable links into rigid groups
// g = 0..m-1 with lead stations y_g. The effect is separable,
//   F = sum_g A_g(y_g),   A_g = the group's own moving-load function,
// subject to each variable link lying in [min, max], which bounds the
// differences y_{g+1} - y_g. At an optimum every variable link is either at
// a bound or strictly inside its range. Links at a bound merge their groups
// into a larger rigid cluster; between clusters the links are free, so each
// cluster must sit at a local extreme of its own function: a breakpoint (one
// of its one-sided values) or a zero of its derivative. Hence: for every
// assignment of {min, max, free} to the variable links, take the candidates
// of every cluster (TrainSweep) and pick the best feasible combination by a
// dynamic programme along the chain with sliding-window maxima. The overall
// best of these is the exact extreme; no spacing is sampled. A cluster that
// is off the girder is represented by its zero-valued candidates where it
// has just left or not yet reached the girder; an off cluster elsewhere is
// equivalent to one of those or to a link at a bound, which another
// assignment covers.
//
// Order of work, which keeps it fast: the rigid patterns (every link at a
// bound) come first and give a best value; then each cluster of the other
// patterns is swept once, keeping its own best and only the candidates that
// could still lift a total above that best value given what the other
// clusters can contribute at most (their weight times the peak ordinate);
// the programme then uses the clusters' bests to cut the lists further.
//
// Values are those of the exact polynomials, to rounding of about 1e-13 of
// sum(w) x max|ordinate|; with relieving axles dropped they are evaluated
// afresh from the exact ordinates at the placement found. Units as
// TrainSweep.
#pragma once

#include <array>
#include <cstddef>
#include <memory>
#include <optional>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/live_load/axle_chain.h"
#include "engine/live_load/effect_curve.h"
#include "engine/live_load/effect_table.h"
#include "engine/live_load/train_placement.h"
#include "engine/live_load/train_sweep.h"

namespace tenthpoint::live_load {

struct TrainSearchOptions {
  // Run the chain in both directions. A symmetric chain (AxleChain::symmetric)
  // is run one way only, since the other gives the same values.
  bool both_directions = true;

  [[nodiscard]] bool is_valid(std::string* why) const;
};

// An extreme of the axle chain alone (static, one lane, no dynamic allowance).
struct TrainExtreme {
  Real value = 0;  // N x ordinate unit; 0 when no position is adverse
  // Absent when the chain produces nothing adverse anywhere (value 0).
  std::optional<TrainPlacement> placement;
};

// Scratch space for searches; reuse one per thread across calls.
struct TrainSearchScratch {
  SweepScratch sweep;
  // One per sweep of a free-link pattern's clusters, so that their block
  // bounds survive from the first pass to the second (valid within one
  // search call only).
  std::vector<SweepScratch> cluster;
  // Per sweep: both extremes of the cluster alone, and the candidates kept
  // for each extreme.
  std::vector<SweepExtremes> memo;
  std::vector<std::array<std::vector<SweepCandidate>, 2>> kept;
  std::vector<std::vector<SweepCandidate>> candidates;
  std::vector<std::vector<Real>> values;
  std::vector<std::vector<std::size_t>> choice;
  std::vector<std::size_t> deque;
};

class AxleTrainSearch {
 public:
  // `knots`: the mesh knots shared by every curve the search will be used on.
  AxleTrainSearch(AxleChain chain, const std::vector<Real>& knots, const TrainSearchOptions& options = {});

  [[nodiscard]] const AxleChain& chain() const { return chain_; }

  // The extremes of the chain over `curve` (built on the constructor's
  // knots); an extreme not `wanted` is left at its default (zero, no
  // placement).
  [[nodiscard]] ExtremePair<TrainExtreme> search(const EffectCurve& curve, AxleRule rule, TrainSearchScratch& scratch,
                                                 ExtremePair<bool> wanted = {true, true}) const;

 private:
  struct Cluster {
    std::size_t sweep = 0;       // into sweeps_
    std::size_t first_axle = 0;  // chain index of its lead axle
    std::size_t last_axle = 0;
  };
  // Lead station of cluster c + 1 minus that of cluster c lies in [min, max].
  struct Window {
    Real min = 0;
    Real max = 0;
  };
  struct Pattern {
    TravelDirection direction = TravelDirection::rightward;
    std::vector<Cluster> clusters;
    std::vector<Window> windows;    // clusters.size() - 1
    std::vector<Real> link_values;  // per chain link: its value inside a cluster (unused between clusters)
  };

  void build_patterns(const std::vector<Real>& knots, TravelDirection direction);
  [[nodiscard]] TrainExtreme to_extreme(const Pattern& pattern, const SweepCandidate* chosen, const EffectCurve& curve,
                                        AxleRule rule, Extreme extreme) const;

  AxleChain chain_;
  std::vector<std::unique_ptr<TrainSweep>> sweeps_;
  std::vector<Pattern> patterns_;            // single-cluster patterns first
  std::vector<std::size_t> cluster_sweeps_;  // sweeps of clusters of the other patterns
};

}  // namespace tenthpoint::live_load
