// Input checks shared by the section computations. Each check throws
// tenthpoint::InputError at the section's source location, with a field path
// of the form "sections[<id>].<field>", so a bad dimension is reported against
// the section that holds it instead of surfacing later as a NaN or a zero EI.
#pragma once

#include <string>
#include <string_view>

#include "engine/core/numeric.h"
#include "engine/core/source_location.h"

namespace tenthpoint::section::detail {

// Where a section's values came from: its id and its place in the user's file.
struct SectionContext {
  std::string id;
  SourceLocation where;

  // "sections[<id>].<field>"
  [[nodiscard]] std::string field(std::string_view path) const;
  // Throws InputError(where, field(path), message).
  [[noreturn]] void fail(std::string_view path, std::string message) const;
  // Throws unless value > 0 (and finite). `value` in internal units.
  void require_positive(Real value, std::string_view path) const;
  // Throws unless value >= 0 (and finite).
  void require_nonnegative(Real value, std::string_view path) const;
};

}  // namespace tenthpoint::section::detail
