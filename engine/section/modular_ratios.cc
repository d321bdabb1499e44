#include "engine/section/modular_ratios.h"

#include <cmath>

#include <fmt/format.h>

#include "engine/core/errors.h"
#include "engine/model/enums.h"

namespace tenthpoint::section {
namespace {

[[noreturn]] void fail(const char* field, std::string message) {
  throw InputError(SourceLocation{}, field, std::move(message));
}

void require_positive(Real value, const char* field) {
  if (!(value > 0) || !std::isfinite(value)) fail(field, fmt::format("must be positive (got {:g})", value));
}

}  // namespace

ModularRatios modular_ratios(const model::Materials& materials, const SectionOptions& options) {
  std::string why;
  if (!options.is_valid(&why)) fail("section_options", why);
  ModularRatios out;
  const bool steel = model::is_steel(materials.kind);
  if (steel) {
    if (!materials.steel) fail("materials.steel", fmt::format("required for {} girders", to_string(materials.kind)));
    require_positive(materials.steel->modulus, "materials.steel.E");
    out.girder_modulus = materials.steel->modulus;
  } else {
    if (!materials.girder_concrete) {
      fail("materials.girder_concrete", fmt::format("required for {} girders", to_string(materials.kind)));
    }
    out.girder_modulus = concrete_modulus(*materials.girder_concrete, options.concrete_modulus_formula,
                                          options.aggregate_factor, "materials.girder_concrete");
  }

  if (materials.reinforcement) {
    require_positive(materials.reinforcement->modulus, "materials.reinforcement.E");
    out.bar_ratio = materials.reinforcement->modulus / out.girder_modulus;
  } else if (steel) {
    out.bar_ratio = 1.0;
  }

  if (!materials.composite) return out;

  if (materials.modular_ratio) {
    require_positive(*materials.modular_ratio, "materials.modular_ratio");
    out.short_term = *materials.modular_ratio;
    out.short_term_given = true;
  } else {
    if (!materials.deck_concrete) {
      fail("materials.deck_concrete", "required for a composite bridge without materials.modular_ratio");
    }
    out.deck_modulus = concrete_modulus(*materials.deck_concrete, options.concrete_modulus_formula,
                                        options.aggregate_factor, "materials.deck_concrete");
    // LRFD 6.10.1.1.1b: n = Es / Ec (for concrete girders, Ec_girder / Ec_deck).
    out.short_term = out.girder_modulus / *out.deck_modulus;
  }
  if (steel) {
    require_positive(materials.long_term_modular_factor, "materials.long_term_modular_factor");
    // LRFD 6.10.1.1.1b: long-term composite section transformed by k*n (k = 3).
    out.long_term = materials.long_term_modular_factor * *out.short_term;
  } else {
    out.long_term = out.short_term;
  }
  return out;
}

}  // namespace tenthpoint::section
