#include "engine/io/name_suggestion.h"

#include <algorithm>
#include <cctype>

namespace tenthpoint::io {
namespace {

char fold(char c) { return static_cast<char>(std::tolower(static_cast<unsigned char>(c))); }

// Optimal string alignment distance (Damerau-Levenshtein without repeated
// edits of one substring): a swap of neighbours counts as one edit, which is
// the commonest typing slip.
std::size_t edit_distance(std::string_view a, std::string_view b) {
  const std::size_t n = a.size(), m = b.size();
  std::vector<std::vector<std::size_t>> d(n + 1, std::vector<std::size_t>(m + 1));
  for (std::size_t i = 0; i <= n; ++i) d[i][0] = i;
  for (std::size_t j = 0; j <= m; ++j) d[0][j] = j;
  for (std::size_t i = 1; i <= n; ++i) {
    for (std::size_t j = 1; j <= m; ++j) {
      const std::size_t cost = fold(a[i - 1]) == fold(b[j - 1]) ? 0 : 1;
      d[i][j] = std::min({d[i - 1][j] + 1, d[i][j - 1] + 1, d[i - 1][j - 1] + cost});
      if (i > 1 && j > 1 && fold(a[i - 1]) == fold(b[j - 2]) && fold(a[i - 2]) == fold(b[j - 1]))
        d[i][j] = std::min(d[i][j], d[i - 2][j - 2] + 1);
    }
  }
  return d[n][m];
}

}  // namespace

std::optional<std::string> nearest_name(std::string_view typed, const std::vector<std::string>& candidates) {
  // Names in the formats are short; a long typed string is not a typo of one.
  constexpr std::size_t kLongest = 64;
  if (typed.empty() || typed.size() > kLongest) return std::nullopt;
  const std::size_t allowed = std::max<std::size_t>(1, typed.size() / 3);
  std::optional<std::string> best;
  std::size_t best_distance = allowed + 1;
  for (const std::string& candidate : candidates) {
    if (candidate.size() > kLongest) continue;
    const std::size_t distance = edit_distance(typed, candidate);
    if (distance < best_distance) {
      best_distance = distance;
      best = candidate;
    }
  }
  return best;
}

std::string join_names(const std::vector<std::string>& names) {
  std::string out;
  for (const std::string& name : names) {
    if (!out.empty()) out += ", ";
    out += name;
  }
  return out;
}

}  // namespace tenthpoint::io
