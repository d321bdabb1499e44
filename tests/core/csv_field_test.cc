#include "engine/core/csv_field.h"

#include <catch2/catch.hpp>

// RFC 4180, section 2, rules 6 and 7: fields with commas, quotes or line
// breaks are enclosed in quotes, and a quote inside is doubled.
TEST_CASE("csv fields are quoted only when they must be, with inner quotes doubled", "[core][csv]") {
  CHECK(tenthpoint::csv_field("EV-0112") == "EV-0112");
  CHECK(tenthpoint::csv_field("support 2 / span 1 1.0L") == "support 2 / span 1 1.0L");
  CHECK(tenthpoint::csv_field("Tanner's Ford, east") == "\"Tanner's Ford, east\"");
  CHECK(tenthpoint::csv_field("the \"old\" bridge") == "\"the \"\"old\"\" bridge\"");
  CHECK(tenthpoint::csv_field("two\nlines") == "\"two\nlines\"");
}
