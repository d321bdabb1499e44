#include "engine/core/calendar_date.h"

#include <charconv>

#include <fmt/format.h>

namespace tenthpoint {
namespace {

bool is_leap(int y) { return (y % 4 == 0 && y % 100 != 0) || y % 400 == 0; }

int days_in_month(int y, int m) {
  static constexpr int kDays[] = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
  return (m == 2 && is_leap(y)) ? 29 : kDays[m - 1];
}

bool parse_int(std::string_view s, int& out) {
  const auto* end = s.data() + s.size();
  auto [ptr, ec] = std::from_chars(s.data(), end, out);
  return ec == std::errc() && ptr == end;
}

}  // namespace

std::string CalendarDate::to_iso() const { return fmt::format("{:04d}-{:02d}-{:02d}", year, month, day); }
std::string CalendarDate::to_compact() const { return fmt::format("{:04d}{:02d}{:02d}", year, month, day); }

// Civil-from-days and days-from-civil after H. Hinnant, "chrono-Compatible
// Low-Level Date Algorithms" (2013), valid over the whole proleptic calendar.
long CalendarDate::days_since_epoch() const {
  const int y = month <= 2 ? year - 1 : year;
  const long era = (y >= 0 ? y : y - 399) / 400;
  const long yoe = y - era * 400;
  const long doy = (153 * (month + (month > 2 ? -3 : 9)) + 2) / 5 + day - 1;
  const long doe = yoe * 365 + yoe / 4 - yoe / 100 + doy;
  return era * 146097 + doe - 719468;
}

CalendarDate CalendarDate::from_days_since_epoch(long z) {
  z += 719468;
  const long era = (z >= 0 ? z : z - 146096) / 146097;
  const long doe = z - era * 146097;
  const long yoe = (doe - doe / 1460 + doe / 36524 - doe / 146096) / 365;
  const long doy = doe - (365 * yoe + yoe / 4 - yoe / 100);
  const long mp = (5 * doy + 2) / 153;
  const int d = static_cast<int>(doy - (153 * mp + 2) / 5 + 1);
  const int m = static_cast<int>(mp < 10 ? mp + 3 : mp - 9);
  const int y = static_cast<int>(yoe + era * 400 + (m <= 2 ? 1 : 0));
  return CalendarDate{y, m, d};
}

CalendarDate CalendarDate::plus_days(long days) const { return from_days_since_epoch(days_since_epoch() + days); }

std::optional<CalendarDate> parse_calendar_date(std::string_view text) {
  if (text.size() != 10 || text[4] != '-' || text[7] != '-') return std::nullopt;
  CalendarDate d;
  if (!parse_int(text.substr(0, 4), d.year) || !parse_int(text.substr(5, 2), d.month) ||
      !parse_int(text.substr(8, 2), d.day))
    return std::nullopt;
  if (d.month < 1 || d.month > 12 || d.day < 1 || d.day > days_in_month(d.year, d.month)) return std::nullopt;
  return d;
}

}  // namespace tenthpoint
