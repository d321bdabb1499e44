// Deadlines a rating sets (23 CFR 650.313, 2022 NBIS; the number of days is
// the policy's): re-rate within N days of an inspection that found a change
// reducing capacity, and post within M days of a rating that calls for it.
#pragma once

#include <optional>

#include "engine/core/calendar_date.h"
#include "engine/model/policy.h"

namespace tenthpoint::rating {

struct RatingDeadlines {
  std::optional<CalendarDate> rerate_by;  // set when the inspection reduced capacity
  std::optional<CalendarDate> post_by;    // set when the rating calls for posting or closure
};

// `inspection_date` is the date of the inspection the rating used;
// `capacity_reduced` whether it recorded a change that reduces capacity
// (worse condition or new section loss than the record before it);
// `rating_date` the date of this rating; `needs_posting` whether the
// recommendation is to post or close.
[[nodiscard]] RatingDeadlines rating_deadlines(const model::Deadlines& policy,
                                               std::optional<CalendarDate> inspection_date, bool capacity_reduced,
                                               CalendarDate rating_date, bool needs_posting);

}  // namespace tenthpoint::rating
