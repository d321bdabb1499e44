#include "engine/core/diagnostic.h"

#include <algorithm>

#include <fmt/format.h>

namespace tenthpoint {

const char* to_string(Severity severity) {
  switch (severity) {
    case Severity::error:
      return "error";
    case Severity::warning:
      return "warning";
  }
  return "error";
}

std::string Diagnostic::to_string() const {
  std::string out = fmt::format("{}: {}: ", where.to_string(), tenthpoint::to_string(severity));
  if (!field.empty()) out += field + ": ";
  out += message;
  return out;
}

bool has_errors(const Diagnostics& diagnostics) {
  return std::any_of(diagnostics.begin(), diagnostics.end(),
                     [](const Diagnostic& d) { return d.severity == Severity::error; });
}

std::size_t count(const Diagnostics& diagnostics, Severity severity) {
  return static_cast<std::size_t>(std::count_if(diagnostics.begin(), diagnostics.end(),
                                                [&](const Diagnostic& d) { return d.severity == severity; }));
}

}  // namespace tenthpoint
