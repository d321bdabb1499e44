#include "engine/core/safe_file_name.h"

namespace tenthpoint {

std::string safe_file_name(std::string_view text) {
  constexpr std::size_t kMaxLength = 100;  // well under NAME_MAX (255) with room for suffixes
  std::string out;
  out.reserve(std::min(text.size(), kMaxLength));
  for (char c : text) {
    if (out.size() == kMaxLength) break;
    const bool safe =
        (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '-' || c == '_' || c == '.';
    out += safe ? c : '_';
  }
  if (out.empty()) return "_";
  if (out.front() == '.') out.front() = '_';
  return out;
}

}  // namespace tenthpoint
