#include "engine/rating/posting.h"

#include <cmath>

#include <fmt/format.h>

namespace tenthpoint::rating {
namespace {

Real rounded(Real weight, const model::PostingPolicy& policy) {
  if (policy.increment <= 0) return weight;
  const Real steps = weight / policy.increment;
  // A hair of tolerance so 12.999999999 tons from round-off still rounds to 13.
  constexpr Real kTolerance = 1e-9;
  switch (policy.rounding) {
    case model::RoundingRule::down:
      return std::floor(steps + kTolerance) * policy.increment;
    case model::RoundingRule::nearest:
      return std::round(steps) * policy.increment;
    case model::RoundingRule::up:
      return std::ceil(steps - kTolerance) * policy.increment;
  }
  return weight;
}

}  // namespace

std::string_view to_string(PostingStatus status) {
  switch (status) {
    case PostingStatus::none:
      return "none";
    case PostingStatus::post:
      return "post";
    case PostingStatus::close:
      return "close";
  }
  return "none";
}

PostingDecision posting_for(Real rating_factor, Real vehicle_weight, const model::PostingPolicy& policy, Real tons) {
  PostingDecision d;
  if (rating_factor >= policy.posting_below) {
    d.reason = fmt::format("RF {:.2f} >= {:.2f}: no posting needed (MBE 6A.8.3)", rating_factor, policy.posting_below);
    return d;
  }
  if (rating_factor < policy.closure_below) {
    d.status = PostingStatus::close;
    d.reason = fmt::format("RF {:.2f} < {:.2f}: consider closing the bridge (MBE 6A.8.3)", rating_factor,
                           policy.closure_below);
    return d;
  }
  // MBE 6A.8.3: safe posting load = (W / 0.7)(RF - 0.3), with the policy's
  // divisor and offset.
  d.safe_load = vehicle_weight / policy.equation_divisor * (rating_factor - policy.equation_offset);
  Real posted = rounded(d.safe_load, policy);
  if (policy.never_at_or_above_legal_weight && posted >= vehicle_weight) {
    // The rounding took the posting up to the legal weight: post one
    // increment below it instead, so a sign never permits the full legal load.
    posted = policy.increment > 0 ? rounded(vehicle_weight - policy.increment, policy) : vehicle_weight;
  }
  if (policy.minimum_posting && posted < *policy.minimum_posting) {
    d.status = PostingStatus::close;
    d.reason = fmt::format("safe load {:.1f} t is below the policy's minimum posting {:.1f} t: close the bridge",
                           d.safe_load / tons, *policy.minimum_posting / tons);
    return d;
  }
  d.status = PostingStatus::post;
  d.posted_weight = posted;
  d.reason =
      fmt::format("RF {:.2f}: safe load (W/{:g})(RF - {:g}) = {:.2f} t, posted at {:g} t (MBE 6A.8.3, rounded {})",
                  rating_factor, policy.equation_divisor, policy.equation_offset, d.safe_load / tons, posted / tons,
                  model::to_string(policy.rounding));
  return d;
}

}  // namespace tenthpoint::rating
