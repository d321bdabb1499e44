// One finding about a user's input: an error that stops the record or a
// warning that lets it through. Readers collect every finding in a file
// rather than stopping at the first, so the engineer fixes them in one pass.
#pragma once

#include <string>
#include <vector>

#include "engine/core/source_location.h"

namespace tenthpoint {

enum class Severity { error, warning };

struct Diagnostic {
  Severity severity = Severity::error;
  SourceLocation where;
  std::string field;    // field path in the document, e.g. "geometry.spans[1]"
  std::string message;  // short, lower case, says what was expected

  // "file:line:col: error: geometry.spans[1]: must be positive (got -80)"
  [[nodiscard]] std::string to_string() const;
};

using Diagnostics = std::vector<Diagnostic>;

[[nodiscard]] bool has_errors(const Diagnostics& diagnostics);
[[nodiscard]] std::size_t count(const Diagnostics& diagnostics, Severity severity);
[[nodiscard]] const char* to_string(Severity severity);

}  // namespace tenthpoint
