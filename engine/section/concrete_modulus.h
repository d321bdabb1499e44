// Modulus of elasticity of concrete, AASHTO LRFD 5.4.2.4. The specification's
// formulas are written in US units (f'c in ksi, wc in kcf, Ec in ksi); these
// functions take and return internal SI (Pa, N/m^3) and convert on the way in
// and out, so a file in either unit system gives the same modulus.
#pragma once

#include "engine/core/numeric.h"
#include "engine/model/materials.h"

namespace tenthpoint::section {

enum class ConcreteModulusFormula {
  // AASHTO LRFD 9th ed. (2020), Eq. 5.4.2.4-1: Ec = 120000 K1 wc^2.0 f'c^0.33.
  lrfd_9th,
  // The form of the 7th ed. (2014) and earlier, Eq. 5.4.2.4-1:
  // Ec = 33000 K1 wc^1.5 sqrt(f'c); offered for re-creating older ratings.
  lrfd_7th,
};

// Ec [Pa] from f'c [Pa] and the concrete unit weight wc [N/m^3]. `k1` is the
// aggregate correction factor K1 (1.0 unless determined by physical test).
// wc is used as given; LRFD calibrates the 9th-ed. form for wc from 0.090 to
// 0.155 kcf and f'c up to 15 ksi, which is not enforced here.
// Throws InputError (field `field`) when f'c, wc or k1 is not positive.
[[nodiscard]] Real concrete_modulus(Real compressive_strength, Real unit_weight, ConcreteModulusFormula formula,
                                    Real k1 = 1.0, const char* field = "concrete");

// The modulus of `concrete`: its given modulus when present, else the formula.
[[nodiscard]] Real concrete_modulus(const model::Concrete& concrete, ConcreteModulusFormula formula, Real k1,
                                    const char* field);

}  // namespace tenthpoint::section
