// The guard that keeps NaN and infinity out of result files (issue #8), and
// the rounding to significant digits done in the same walk.
#include "engine/report/finite_numbers.h"

#include <cmath>
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

TEST_CASE("numbers round to significant digits and print with no more digits", "[report]") {
  // Significant digits counted from the first nonzero digit, half away from
  // zero (common practice); nlohmann writes the shortest text that reads back.
  CHECK(json(report::round_to_significant(3194.523489, 7)).dump() == "3194.523");
  CHECK(json(report::round_to_significant(0.829749999, 7)).dump() == "0.82975");
  CHECK(json(report::round_to_significant(0.829749999, 4)).dump() == "0.8297");
  CHECK(json(report::round_to_significant(-1234.56789, 7)).dump() == "-1234.568");
  CHECK(json(report::round_to_significant(9.99999996, 7)).dump() == "10.0");
  CHECK(json(report::round_to_significant(123456789.0, 7)).dump() == "123456800.0");
  CHECK(json(report::round_to_significant(1.2345678901e-20, 7)).dump() == "1.234568e-20");
  CHECK(json(report::round_to_significant(6.02214076e23, 3)).dump() == "6.02e+23");
  CHECK(report::round_to_significant(0.0, 7) == 0.0);
  CHECK(std::isnan(report::round_to_significant(std::numeric_limits<double>::quiet_NaN(), 7)));

  json doc{{"a", {1.0 / 3.0, 123456789, "2.718281828"}}, {"b", {{"c", 2.0 / 3.0}}}};
  CHECK(report::round_numbers(doc, 7));
  CHECK(doc.dump() == R"({"a":[0.3333333,123456789,"2.718281828"],"b":{"c":0.6666667}})");
  doc["b"]["d"] = std::numeric_limits<double>::infinity();
  CHECK_FALSE(report::round_numbers(doc, 7));
  CHECK(report::first_non_finite(doc) == std::optional<std::string>("/b/d"));
}
