#include "engine/rating/deadlines.h"

namespace tenthpoint::rating {

RatingDeadlines rating_deadlines(const model::Deadlines& policy, std::optional<CalendarDate> inspection_date,
                                 bool capacity_reduced, CalendarDate rating_date, bool needs_posting) {
  RatingDeadlines d;
  if (capacity_reduced && inspection_date)
    d.rerate_by = inspection_date->plus_days(policy.rerate_after_capacity_loss_days);
  if (needs_posting) d.post_by = rating_date.plus_days(policy.post_after_rating_days);
  return d;
}

}  // namespace tenthpoint::rating
