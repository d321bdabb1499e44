// Shared helpers for the capacity tests: US customary literals converted to
// internal SI, so hand calculations can be written in the units the
// specifications use (in, ksi, kip) and compared after one conversion.
#pragma once

#include <functional>
#include <string>

#include <catch2/catch.hpp>

#include "engine/capacity/calculation_trace.h"
#include "engine/core/errors.h"
#include "engine/core/units.h"
#include "engine/model/section.h"

namespace tenthpoint::capacity::test {

inline Real in(Real x) { return x * units::kInch; }
inline Real in2(Real x) { return x * units::kInch * units::kInch; }
inline Real in3(Real x) { return x * units::kInch * units::kInch * units::kInch; }
inline Real ft(Real x) { return x * units::kFoot; }
inline Real ksi(Real x) { return x * units::kKsi; }
inline Real kip(Real x) { return x * units::kKip; }
inline Real kip_in(Real x) { return x * units::kKip * units::kInch; }
inline Real kcf(Real x) { return x * units::kKip / (units::kFoot * units::kFoot * units::kFoot); }

// Back to US units for readable failure messages.
inline Real to_in(Real x) { return x / units::kInch; }
inline Real to_ksi(Real x) { return x / units::kKsi; }
inline Real to_kip(Real x) { return x / units::kKip; }
inline Real to_kip_in(Real x) { return x / (units::kKip * units::kInch); }

inline model::Plate plate(Real width_in, Real thickness_in) { return model::Plate{in(width_in), in(thickness_in)}; }

// The value of a traced step; fails the test when the step is missing.
inline Real step(const CalculationTrace& trace, const std::string& symbol) {
  const CalculationStep* s = trace.find(symbol);
  INFO("step " << symbol);
  REQUIRE(s != nullptr);
  return s->value;
}

// Runs `f`, which must throw InputError, and returns its first diagnostic.
inline Diagnostic first_error(const std::function<void()>& f) {
  try {
    f();
  } catch (const InputError& e) {
    REQUIRE(!e.diagnostics().empty());
    return e.diagnostics().front();
  }
  FAIL("expected an InputError");
  return {};
}

}  // namespace tenthpoint::capacity::test
