// AxleChain: every axle one load case puts in one lane, front to back, with
// the spacing between consecutive axles. A variable spacing (HL-93's 14 to
// 30 ft, AASHTO LRFD 3.6.1.2.2) is a range; the gap between the trains of a
// two-truck case (count = 2) is a link like any other, usually with no upper
// limit (HL-93: at least 50 ft, LRFD 3.6.1.3.1).
//
// Units: weights N (the case's train_factor applied), spacings m.
#pragma once

#include <cmath>
#include <cstddef>
#include <string>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::live_load {

// Axles per chain and variable links per chain that the search supports.
inline constexpr std::size_t kMaxChainAxles = 64;
inline constexpr std::size_t kMaxVariableLinks = 6;

struct AxleLink {
  Real min = 0;  // m, > 0 within a train, >= 0 for a gap
  Real max = 0;  // m, >= min; +infinity when there is no upper limit

  [[nodiscard]] bool variable() const { return max > min; }
  [[nodiscard]] bool bounded() const { return std::isfinite(max); }
};

struct AxleChain {
  std::string train_id;
  int train_count = 1;
  std::size_t axles_per_train = 0;
  std::vector<Real> weights;    // N, front axle of the first train first
  std::vector<AxleLink> links;  // weights.size() - 1; link i is between axle i and axle i + 1

  [[nodiscard]] std::size_t axle_count() const { return weights.size(); }
  [[nodiscard]] std::size_t variable_link_count() const;
  // True when the chain reads the same from the back (weights and links):
  // then travel in either direction gives the same extremes.
  [[nodiscard]] bool symmetric() const;
  // Index of the link between train t and train t + 1 (t < train_count - 1).
  [[nodiscard]] std::size_t gap_link(int t) const { return (static_cast<std::size_t>(t) + 1) * axles_per_train - 1; }
};

// The chain of `load_case` with `train` (the train the case names):
// train_factor applied to every axle, the case's fixed_variable_spacing
// replacing every variable spacing, `count` trains joined by the case's gap
// (a gap whose max is absent, not finite or below its min has no upper
// limit). Throws InputError at the case's location for a train without
// axles, a non-positive or non-finite weight, spacing or factor, a count
// below 1, count > 1 without a gap, more than kMaxChainAxles axles or more
// than kMaxVariableLinks variable links.
[[nodiscard]] AxleChain axle_chain(const model::LoadCase& load_case, const model::AxleTrain& train);

}  // namespace tenthpoint::live_load
