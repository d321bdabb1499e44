#include "engine/core/errors.h"

#include <fmt/format.h>

namespace tenthpoint {
namespace {

std::string summarise(const Diagnostics& diagnostics) {
  std::string out;
  for (const Diagnostic& d : diagnostics) {
    if (d.severity != Severity::error) continue;
    if (!out.empty()) out += '\n';
    out += d.to_string();
  }
  return out.empty() ? std::string("invalid input") : out;
}

}  // namespace

InputError::InputError(Diagnostics diagnostics)
    : std::runtime_error(summarise(diagnostics)), diagnostics_(std::move(diagnostics)) {}

InputError::InputError(SourceLocation where, std::string field, std::string message)
    : InputError(Diagnostics{Diagnostic{Severity::error, std::move(where), std::move(field), std::move(message)}}) {}

ModelError::ModelError(std::string bridge_id, std::string cause)
    : std::runtime_error(fmt::format("bridge {}: {}", bridge_id, cause)),
      bridge_id_(std::move(bridge_id)),
      cause_(std::move(cause)) {}

}  // namespace tenthpoint
