#include "engine/capacity/resistance_factors.h"

#include <cmath>

#include <fmt/format.h>

namespace tenthpoint::capacity {

Real ResistanceFactors::get(ResistanceFactorId id) const {
  switch (id) {
    case ResistanceFactorId::steel_flexure:
      return steel_flexure;
    case ResistanceFactorId::steel_shear:
      return steel_shear;
    case ResistanceFactorId::rc_tension_controlled:
      return rc_tension_controlled;
    case ResistanceFactorId::ps_tension_controlled:
      return ps_tension_controlled;
    case ResistanceFactorId::compression_controlled:
      return compression_controlled;
    case ResistanceFactorId::concrete_shear:
      return concrete_shear;
  }
  return 0;
}

std::string ResistanceFactors::source(ResistanceFactorId id) const {
  const ResistanceFactorEntry& entry = default_resistance_factor(id);
  if (get(id) == entry.value) return std::string(entry.source);
  return fmt::format("overridden in the capacity options (default {:.2f}, {})", entry.value, entry.source);
}

bool ResistanceFactors::is_valid(std::string* why) const {
  auto fail = [&](std::string message) {
    if (why != nullptr) *why = std::move(message);
    return false;
  };
  for (const ResistanceFactorEntry& entry : kDefaultResistanceFactors) {
    const Real value = get(entry.id);
    if (!(value > 0 && value <= 1.0) || !std::isfinite(value)) {
      return fail(fmt::format("resistance factor for {} must be in (0, 1] (got {:g})", entry.name, value));
    }
  }
  if (compression_controlled > rc_tension_controlled || compression_controlled > ps_tension_controlled) {
    return fail("the compression-controlled resistance factor must not exceed the tension-controlled ones");
  }
  return true;
}

}  // namespace tenthpoint::capacity
