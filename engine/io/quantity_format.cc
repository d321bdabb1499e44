#include "engine/io/quantity_format.h"

#include <fmt/format.h>

namespace tenthpoint::io {

std::string format_number(Real value) {
  // Six significant digits hide the last-bit noise of a unit round trip
  // (70 ft -> m -> ft) while keeping every digit a person typed.
  std::string text = fmt::format("{:.6g}", value);
  return text == "-0" ? "0" : text;
}

std::string format_quantity(Real value, units::Quantity quantity, units::UnitSystem system) {
  const std::string number = format_number(units::from_internal(value, quantity, system));
  const std::string_view label = units::label(quantity, system);
  return label.empty() ? number : fmt::format("{} {}", number, label);
}

}  // namespace tenthpoint::io
