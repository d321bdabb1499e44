// Resistance factors phi by material and force effect. The defaults live in
// one table with their sources (AASHTO LRFD 9th ed., 2020); an agency or an
// engineer overrides any of them through ResistanceFactors, which
// CapacityOptions carries. The condition and system factors phi_c and phi_s
// of the rating are not here (see condition_system_factors.h).
#pragma once

#include <array>
#include <string>
#include <string_view>

#include "engine/core/numeric.h"

namespace tenthpoint::capacity {

enum class ResistanceFactorId {
  steel_flexure,
  steel_shear,
  rc_tension_controlled,   // nonprestressed concrete, tension-controlled flexure
  ps_tension_controlled,   // prestressed concrete (bonded strands), tension-controlled flexure
  compression_controlled,  // concrete flexure, compression-controlled limit of the transition
  concrete_shear,          // normal-weight concrete, shear and torsion
};

struct ResistanceFactorEntry {
  ResistanceFactorId id;
  std::string_view name;
  Real value;
  std::string_view source;
};

// The shipped defaults. LRFD 5.5.4.2 and 6.5.4.2 are from memory (REFERENCE.md
// has no entry for them); they match the values the project brief states.
inline constexpr std::array<ResistanceFactorEntry, 6> kDefaultResistanceFactors{{
    {ResistanceFactorId::steel_flexure, "steel flexure", 1.00, "AASHTO LRFD 6.5.4.2 (phi_f)"},
    {ResistanceFactorId::steel_shear, "steel shear", 1.00, "AASHTO LRFD 6.5.4.2 (phi_v)"},
    {ResistanceFactorId::rc_tension_controlled, "reinforced concrete flexure, tension-controlled", 0.90,
     "AASHTO LRFD 5.5.4.2"},
    {ResistanceFactorId::ps_tension_controlled, "prestressed concrete flexure, tension-controlled", 1.00,
     "AASHTO LRFD 5.5.4.2"},
    {ResistanceFactorId::compression_controlled, "concrete flexure, compression-controlled", 0.75,
     "AASHTO LRFD 5.5.4.2"},
    {ResistanceFactorId::concrete_shear, "concrete shear, normal weight", 0.90, "AASHTO LRFD 5.5.4.2"},
}};

[[nodiscard]] constexpr const ResistanceFactorEntry& default_resistance_factor(ResistanceFactorId id) {
  for (const ResistanceFactorEntry& entry : kDefaultResistanceFactors)
    if (entry.id == id) return entry;
  return kDefaultResistanceFactors[0];  // unreachable: every id has a row
}

struct ResistanceFactors {
  Real steel_flexure = default_resistance_factor(ResistanceFactorId::steel_flexure).value;
  Real steel_shear = default_resistance_factor(ResistanceFactorId::steel_shear).value;
  Real rc_tension_controlled = default_resistance_factor(ResistanceFactorId::rc_tension_controlled).value;
  Real ps_tension_controlled = default_resistance_factor(ResistanceFactorId::ps_tension_controlled).value;
  Real compression_controlled = default_resistance_factor(ResistanceFactorId::compression_controlled).value;
  Real concrete_shear = default_resistance_factor(ResistanceFactorId::concrete_shear).value;

  [[nodiscard]] Real get(ResistanceFactorId id) const;
  // The default's source, or "overridden in the capacity options (default
  // <value>, <source>)" when the value differs from the table.
  [[nodiscard]] std::string source(ResistanceFactorId id) const;
  // Every factor in (0, 1.0], and compression_controlled not above either
  // tension-controlled factor; otherwise false with the reason in *why.
  [[nodiscard]] bool is_valid(std::string* why) const;
};

}  // namespace tenthpoint::capacity
