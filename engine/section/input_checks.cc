#include "engine/section/input_checks.h"

#include <cmath>

#include <fmt/format.h>

#include "engine/core/errors.h"

namespace tenthpoint::section::detail {

std::string SectionContext::field(std::string_view path) const { return fmt::format("sections[{}].{}", id, path); }

void SectionContext::fail(std::string_view path, std::string message) const {
  throw InputError(where, field(path), std::move(message));
}

void SectionContext::require_positive(Real value, std::string_view path) const {
  // !(value > 0) also rejects NaN, which must never reach the arithmetic.
  if (!(value > 0) || !std::isfinite(value)) fail(path, fmt::format("must be positive (got {:g})", value));
}

void SectionContext::require_nonnegative(Real value, std::string_view path) const {
  if (!(value >= 0) || !std::isfinite(value)) fail(path, fmt::format("must not be negative (got {:g})", value));
}

}  // namespace tenthpoint::section::detail
