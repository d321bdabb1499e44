// A guard that no NaN or infinity reaches a result file (issue #8): walks a
// JSON document and reports the first number that is not finite by its JSON
// Pointer path (RFC 6901, e.g. "/girders/0/ratings/3/points/12/rating_factor").
// The same walk can round the document's numbers to a number of significant
// digits, so a large result file carries no digits that mean nothing.
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include <nlohmann/json.hpp>

namespace tenthpoint::report {

// The path of the first non-finite number in `document` (depth first, in
// document order), or nullopt when every number is finite.
[[nodiscard]] std::optional<std::string> first_non_finite(const nlohmann::json& document);

// Throws ModelError naming `bridge_id` and the path of the first non-finite
// number of `document` (`what` names the document, e.g. "results.json").
void require_finite(const nlohmann::json& document, std::string_view bridge_id, std::string_view what);

// `value` rounded to `significant_digits` (1 to 17) significant decimal
// digits, half away from zero, as the double nearest that decimal (so that
// nlohmann's shortest round-trip output prints at most that many digits).
// Zero, NaN and infinity are returned as they are.
[[nodiscard]] double round_to_significant(double value, int significant_digits);

// Rounds every floating-point number of `document` in place with
// round_to_significant; integers, strings and the rest are left alone.
// Returns false when some number is not finite (those are left as they are;
// first_non_finite names the first one).
[[nodiscard]] bool round_numbers(nlohmann::json& document, int significant_digits);

}  // namespace tenthpoint::report
