// Shared helpers for the section tests: US customary literals converted to
// internal SI, a few section descriptions used by several tests, and a way to
// capture the first diagnostic of an InputError.
#pragma once

#include <functional>
#include <string>

#include <catch2/catch.hpp>

#include "engine/core/errors.h"
#include "engine/core/units.h"
#include "engine/model/materials.h"
#include "engine/model/section.h"

namespace tenthpoint::section::test {

inline Real in(Real x) { return x * units::kInch; }
inline Real in2(Real x) { return x * units::kInch * units::kInch; }
inline Real in3(Real x) { return x * units::kInch * units::kInch * units::kInch; }
inline Real in4(Real x) { return x * units::kInch * units::kInch * units::kInch * units::kInch; }
inline Real ksi(Real x) { return x * units::kKsi; }
inline Real kcf(Real x) { return x * units::kKip / (units::kFoot * units::kFoot * units::kFoot); }

inline model::Plate plate(Real width_in, Real thickness_in) { return model::Plate{in(width_in), in(thickness_in)}; }

// W33x130 as plates: d = 33.1, bf = 11.5, tf = 0.855, tw = 0.580 in
// (AISC Steel Construction Manual, Table 1-1, from memory); web depth
// D = d - 2 tf = 31.39 in.
inline model::SteelIGirder w33x130() {
  model::SteelIGirder g;
  g.designation = "W33x130";
  g.top_flange = plate(11.5, 0.855);
  g.web = plate(31.39, 0.580);
  g.bottom_flange = plate(11.5, 0.855);
  return g;
}

// The positive-moment plate girder of the EV-0245 demo record: 14 x 3/4 top,
// 54 x 7/16 web, 16 x 1-1/4 bottom flange (inches).
inline model::SteelIGirder plate_girder_54() {
  model::SteelIGirder g;
  g.designation = "PG54";
  g.top_flange = plate(14.0, 0.75);
  g.web = plate(54.0, 0.4375);
  g.bottom_flange = plate(16.0, 1.25);
  return g;
}

// An 8 in slab, 108 in effective width, on a 2 in haunch; no bars.
inline model::DeckSlab slab_8in() { return model::DeckSlab{in(8.0), in(108.0), in(2.0), {}}; }

// Composite steel bridge materials with a given n.
inline model::Materials composite_steel(Real n) {
  model::Materials m;
  m.kind = model::MaterialKind::welded_plate_girder;
  m.composite = true;
  m.steel = model::Steel{ksi(36), ksi(58), ksi(29000)};
  m.deck_concrete = model::Concrete{ksi(4.0), std::nullopt, kcf(0.150)};
  m.modular_ratio = n;
  return m;
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

}  // namespace tenthpoint::section::test
