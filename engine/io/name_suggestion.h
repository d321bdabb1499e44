// "Did you mean ...?" for misspelt field names, enum values and ids.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace tenthpoint::io {

// The candidate closest to `typed` by edit distance (insertions, deletions,
// substitutions and swaps of neighbours, ignoring case), when it is close
// enough to be a plausible typo: at most a third of the typed length, and at
// least one edit allowed. Ties go to the earlier candidate.
[[nodiscard]] std::optional<std::string> nearest_name(std::string_view typed,
                                                      const std::vector<std::string>& candidates);

// Candidates joined for a message: "a, b, c".
[[nodiscard]] std::string join_names(const std::vector<std::string>& names);

}  // namespace tenthpoint::io
