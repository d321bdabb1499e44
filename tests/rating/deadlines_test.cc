#include "engine/rating/deadlines.h"

#include <catch2/catch.hpp>

using namespace tenthpoint;
using namespace tenthpoint::rating;

TEST_CASE("deadlines follow the policy's day counts from the inspection and the rating", "[rating][deadlines]") {
  // 23 CFR 650.313 (2022 NBIS) as the default policy gives it: re-rate within
  // 90 days of an inspection that reduced capacity, post within 30 days.
  model::Deadlines policy{90, 30};
  const RatingDeadlines d = rating_deadlines(policy, CalendarDate{2025, 10, 2}, true, CalendarDate{2025, 11, 20}, true);
  REQUIRE(d.rerate_by.has_value());
  CHECK(*d.rerate_by == CalendarDate{2025, 12, 31});
  REQUIRE(d.post_by.has_value());
  CHECK(*d.post_by == CalendarDate{2025, 12, 20});
  const RatingDeadlines none =
      rating_deadlines(policy, CalendarDate{2025, 10, 2}, false, CalendarDate{2025, 11, 20}, false);
  CHECK_FALSE(none.rerate_by.has_value());
  CHECK_FALSE(none.post_by.has_value());
}
