// Load posting from legal-load rating factors, MBE 6A.8.3, with the agency's
// rules (engine/model/policy.h PostingPolicy):
//   RF >= posting_below (1.0)            no posting;
//   closure_below <= RF < posting_below  post the safe load
//                                        (W / divisor) (RF - offset), rounded
//                                        by the policy, never at or above W
//                                        when the policy says so;
//   RF < closure_below (0.3), or a safe load below the policy's minimum
//                                        posting: consider closing the bridge.
// Weights are in N (a weight, not a mass); the caller converts to tons or
// tonnes for people.
#pragma once

#include <string>

#include "engine/core/numeric.h"
#include "engine/model/policy.h"

namespace tenthpoint::rating {

enum class PostingStatus { none, post, close };

[[nodiscard]] std::string_view to_string(PostingStatus status);

struct PostingDecision {
  PostingStatus status = PostingStatus::none;
  Real safe_load = 0;      // N, before rounding; (W / d)(RF - o) when status == post
  Real posted_weight = 0;  // N, after the policy's rounding; 0 unless status == post
  std::string reason;      // one sentence a person can read, naming the rule applied
};

// `rating_factor` is the governing legal-load RF of one vehicle,
// `vehicle_weight` its W (N). `tons` is the weight of one posting unit in N
// (2 kip for US tons, 9.80665 kN for tonnes), used only for the rounding
// increment and the wording of `reason`.
[[nodiscard]] PostingDecision posting_for(Real rating_factor, Real vehicle_weight, const model::PostingPolicy& policy,
                                          Real tons);

}  // namespace tenthpoint::rating
