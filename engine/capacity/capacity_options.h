// Choices the capacity stage leaves to the engineer or the agency. Defaults
// are stated beside each field; checked once by is_valid before any
// capacity is computed (GirderCapacity's constructor does it).
#pragma once

#include <optional>
#include <string>

#include "engine/capacity/concrete_shear.h"
#include "engine/capacity/prestressed_service_limits.h"
#include "engine/capacity/resistance_factors.h"
#include "engine/core/calendar_date.h"
#include "engine/core/numeric.h"
#include "engine/core/units.h"
#include "engine/section/section_options.h"

namespace tenthpoint::capacity {

struct CapacityOptions {
  ResistanceFactors resistance;  // phi by material and effect (defaults: resistance_factors.h)
  // Concrete shear: the simplified procedure (LRFD 5.7.3.4.1) needs no
  // demand; the general procedure (5.7.3.4.2) needs Mu and Vu at the section.
  ConcreteShearMethod shear_method = ConcreteShearMethod::simplified;
  // ag for sxe (LRFD 5.7.3.4.2-7) where a web has less than the minimum
  // stirrups: 3/4 in (common practice for bridge concrete).
  Real aggregate_size = 0.75 * units::kInch;
  // lambda, LRFD 5.4.2.8: 1.0 for normal-weight concrete.
  Real density_factor = 1.0;
  // Cb of LRFD 6.10.8.2.3: 1.0 (conservative) unless the engineer sets it.
  Real moment_gradient_factor = 1.0;
  // Deck bars in Mp (LRFD D6.1): left out by default (common practice).
  bool include_deck_bars_in_plastic_moment = false;
  // Service II stresses in negative flexure on the uncracked composite
  // sections (LRFD 6.10.4.2.1, from memory); false = cracked section.
  bool service_ii_uncracked_negative = true;
  PrestressedServiceOptions prestressed_service;
  section::SectionOptions section;  // Ec formula and K1, as the section stage uses them
  // Rate with the inspection in force on this date; absent = the bridge's
  // rating.as_of, and absent there too = the latest inspection.
  std::optional<CalendarDate> as_of;

  [[nodiscard]] bool is_valid(std::string* why) const;
};

}  // namespace tenthpoint::capacity
