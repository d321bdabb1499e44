#include "engine/section/concrete_modulus.h"

#include <cmath>
#include <string>

#include <fmt/format.h>

#include "engine/core/errors.h"
#include "engine/core/units.h"

namespace tenthpoint::section {
namespace {

// The unit LRFD writes wc in: kip per cubic foot.
constexpr Real kKipPerCubicFoot = units::kKip / (units::kFoot * units::kFoot * units::kFoot);

void require_positive(Real value, const std::string& field) {
  if (!(value > 0) || !std::isfinite(value)) {
    throw InputError(SourceLocation{}, field, fmt::format("must be positive (got {:g})", value));
  }
}

}  // namespace

Real concrete_modulus(Real compressive_strength, Real unit_weight, ConcreteModulusFormula formula, Real k1,
                      const char* field) {
  require_positive(compressive_strength, fmt::format("{}.fc", field));
  require_positive(unit_weight, fmt::format("{}.unit_weight", field));
  require_positive(k1, "section_options.aggregate_factor");
  const Real fc_ksi = compressive_strength / units::kKsi;
  const Real wc_kcf = unit_weight / kKipPerCubicFoot;
  Real ec_ksi = 0;
  switch (formula) {
    case ConcreteModulusFormula::lrfd_9th:
      // AASHTO LRFD 9th ed. Eq. 5.4.2.4-1.
      ec_ksi = 120000.0 * k1 * wc_kcf * wc_kcf * std::pow(fc_ksi, 0.33);
      break;
    case ConcreteModulusFormula::lrfd_7th:
      // AASHTO LRFD 7th ed. Eq. 5.4.2.4-1.
      ec_ksi = 33000.0 * k1 * std::pow(wc_kcf, 1.5) * std::sqrt(fc_ksi);
      break;
  }
  return ec_ksi * units::kKsi;
}

Real concrete_modulus(const model::Concrete& concrete, ConcreteModulusFormula formula, Real k1, const char* field) {
  if (concrete.modulus) {
    require_positive(*concrete.modulus, fmt::format("{}.E", field));
    return *concrete.modulus;
  }
  return concrete_modulus(concrete.compressive_strength, concrete.unit_weight, formula, k1, field);
}

}  // namespace tenthpoint::section
