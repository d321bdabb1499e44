// Shared helpers for the capacity tests: US customary literals converted to
// internal SI, so hand calculations can be written in the units the
// specifications use (in, ksi, kip) and compared after one conversion.
#pragma once

#include <functional>
#include <optional>
#include <string>
#include <utility>

#include <catch2/catch.hpp>

#include "engine/capacity/calculation_trace.h"
#include "engine/core/errors.h"
#include "engine/core/units.h"
#include "engine/model/materials.h"
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

// The EV-0207 Type IV girder: gross A = 789 in^2, I = 260,730 in^4, yb =
// 24.73 in (AASHTO-PCI shape table, from memory), 46 strands of 0.153 in^2
// at 2, 4, 6 and 8 in (12, 12, 12, 10 of them).
inline model::PrestressedGirder type_iv(std::optional<double> fpe_ksi) {
  model::PrestressedGirder g;
  g.shape = "AASHTO Type IV";
  g.height = in(54);
  g.web_width = in(8);
  g.area = in2(789);
  g.inertia = in2(260730) * in2(1);
  g.centroid_from_bottom = in(24.73);
  for (const auto& [count, height] : {std::pair{12, 2.0}, {12, 4.0}, {12, 6.0}, {10, 8.0}}) {
    g.strands.push_back(model::StrandLayer{count, in2(0.153), in(height)});
  }
  if (fpe_ksi) g.effective_prestress = ksi(*fpe_ksi);
  return g;
}

inline model::Materials ps_materials() {
  model::Materials m;
  m.kind = model::MaterialKind::prestressed_concrete;
  m.composite = true;
  m.girder_concrete = model::Concrete{ksi(6), std::nullopt, test::kcf(0.150)};
  m.deck_concrete = model::Concrete{ksi(4), std::nullopt, test::kcf(0.150)};
  m.reinforcement = model::Reinforcement{ksi(60), ksi(29000)};
  m.strand = model::PrestressingSteel{ksi(270), ksi(243), ksi(28500), true};
  return m;
}

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
