// A guard that no NaN or infinity reaches a result file (issue #8): walks a
// JSON document and reports the first number that is not finite by its JSON
// Pointer path (RFC 6901, e.g. "/girders/0/ratings/3/points/12/rating_factor").
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

}  // namespace tenthpoint::report
