// A calendar date (no time of day), as inspection and rating records use them.
#pragma once

#include <compare>
#include <optional>
#include <string>
#include <string_view>

namespace tenthpoint {

struct CalendarDate {
  int year = 1970;
  int month = 1;  // 1..12
  int day = 1;    // 1..31, valid for the month

  auto operator<=>(const CalendarDate&) const = default;

  // ISO 8601 "YYYY-MM-DD".
  [[nodiscard]] std::string to_iso() const;
  // SNBI form "YYYYMMDD".
  [[nodiscard]] std::string to_compact() const;
  // Days since 1970-01-01 (proleptic Gregorian), for deadline arithmetic.
  [[nodiscard]] long days_since_epoch() const;
  [[nodiscard]] static CalendarDate from_days_since_epoch(long days);
  [[nodiscard]] CalendarDate plus_days(long days) const;
};

// Parses "YYYY-MM-DD"; nullopt when malformed or not a real date.
[[nodiscard]] std::optional<CalendarDate> parse_calendar_date(std::string_view text);

}  // namespace tenthpoint
