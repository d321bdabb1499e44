// Where a value came from in a user's file: path plus 1-based line and column.
// Every input error and warning carries one so an engineer can go straight to
// the offending line.
#pragma once

#include <string>

namespace tenthpoint {

struct SourceLocation {
  std::string file;  // path as given on the command line or in a list file
  int line = 0;      // 1-based; 0 when unknown (e.g. the file could not be read)
  int column = 0;    // 1-based; 0 when unknown

  // "file:line:column", dropping the parts that are unknown.
  [[nodiscard]] std::string to_string() const;
};

}  // namespace tenthpoint
