#include "engine/core/calendar_date.h"

#include <catch2/catch.hpp>

using namespace tenthpoint;

TEST_CASE("dates parse from ISO 8601 and reject impossible days", "[core][date]") {
  REQUIRE(parse_calendar_date("2024-02-29").has_value());  // leap year (Gregorian rule)
  CHECK_FALSE(parse_calendar_date("2023-02-29").has_value());
  CHECK_FALSE(parse_calendar_date("1900-02-29").has_value());  // century rule
  CHECK(parse_calendar_date("2000-02-29").has_value());        // 400-year rule
  CHECK_FALSE(parse_calendar_date("2024-13-01").has_value());
  CHECK_FALSE(parse_calendar_date("2024-1-01").has_value());
  CHECK_FALSE(parse_calendar_date("yesterday").has_value());
  CHECK(parse_calendar_date("2026-07-04")->to_compact() == "20260704");  // SNBI YYYYMMDD form
}

TEST_CASE("day arithmetic matches the Unix epoch count", "[core][date]") {
  // 2000-01-01 is day 10957 of the Unix epoch (common practice: POSIX time / 86400).
  CHECK(CalendarDate{2000, 1, 1}.days_since_epoch() == 10957);
  CHECK(CalendarDate{1970, 1, 1}.days_since_epoch() == 0);
  CHECK(CalendarDate{2026, 3, 1}.plus_days(-1) == CalendarDate{2026, 2, 28});
  CHECK(CalendarDate{2026, 10, 15}.plus_days(90) == CalendarDate{2027, 1, 13});
  for (long d = -800000; d < 800000; d += 997) CHECK(CalendarDate::from_days_since_epoch(d).days_since_epoch() == d);
}
