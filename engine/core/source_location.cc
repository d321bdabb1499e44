#include "engine/core/source_location.h"

#include <fmt/format.h>

namespace tenthpoint {

std::string SourceLocation::to_string() const {
  if (line <= 0) return file;
  if (column <= 0) return fmt::format("{}:{}", file, line);
  return fmt::format("{}:{}:{}", file, line, column);
}

}  // namespace tenthpoint
