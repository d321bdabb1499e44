// One CSV field written per RFC 4180: quoted when it holds a comma, a quote
// or a line break, with inner quotes doubled. Shared by every CSV writer.
#pragma once

#include <string>
#include <string_view>

namespace tenthpoint {

[[nodiscard]] inline std::string csv_field(std::string_view text) {
  if (text.find_first_of(",\"\r\n") == std::string_view::npos) return std::string(text);
  std::string out = "\"";
  for (char c : text) {
    if (c == '"') out += '"';
    out += c;
  }
  return out + "\"";
}

}  // namespace tenthpoint
