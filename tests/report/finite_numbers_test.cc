// The guard that keeps NaN and infinity out of result files (issue #8).
#include "engine/report/finite_numbers.h"

#include <limits>

#include <catch2/catch.hpp>

#include "engine/core/errors.h"

using namespace tenthpoint;
using nlohmann::json;

TEST_CASE("finite documents pass and the first non-finite number is named by its JSON pointer", "[report]") {
  json doc{{"a", {1, 2.5, nullptr, "x"}}, {"b", {{"c", 0.0}}}};
  CHECK_FALSE(report::first_non_finite(doc).has_value());
  doc["b"]["d/e"] = std::numeric_limits<double>::infinity();
  // RFC 6901 section 3: "/" inside a key is written "~1".
  CHECK(report::first_non_finite(doc) == std::optional<std::string>("/b/d~1e"));
  doc["a"][1] = std::numeric_limits<double>::quiet_NaN();
  CHECK(report::first_non_finite(doc) == std::optional<std::string>("/a/1"));
  CHECK_THROWS_AS(report::require_finite(doc, "EV-1", "summary.json"), ModelError);
}
