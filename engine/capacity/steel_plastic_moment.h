// Plastic moment Mp of a composite steel I-girder in positive flexure,
// AASHTO LRFD Appendix D6.1: the steel yields at Fy in tension below the
// plastic neutral axis (PNA) and in compression above it; the slab above the
// PNA carries 0.85 f'c, the slab below it nothing.
//
// Table D6.1-1 tabulates the closed forms for a PNA in the web, the top
// flange or the slab of a girder with two flanges. This solves the same
// equilibrium for any stack of rectangles (cover plates, plates reduced by
// section loss) exactly: the net force is piecewise linear in the PNA
// height, so the PNA is found by bracketing and one linear interpolation,
// and Mp is the sum of each part's force times its lever arm about the PNA.
// The haunch concrete is left out (its width is not in the model; common
// practice). The deck's longitudinal bars are left out unless asked for
// (common practice; Table D6.1-1 includes them as Prt, Prb).
//
// Heights are m above the steel soffit; forces N; moments N*m; stresses Pa.
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include "engine/capacity/calculation_trace.h"
#include "engine/core/numeric.h"
#include "engine/model/section.h"

namespace tenthpoint::capacity {

enum class PlasticNeutralAxisLocation { slab, haunch, top_flange, web, bottom_flange };

[[nodiscard]] std::string_view to_string(PlasticNeutralAxisLocation location);

struct CompositePlasticMoment {
  Real plastic_moment = 0;  // Mp, N*m
  Real neutral_axis = 0;    // PNA height above the soffit, m
  PlasticNeutralAxisLocation location = PlasticNeutralAxisLocation::slab;
  Real total_depth = 0;            // Dt, m: top of deck to soffit (LRFD 6.10.7.3)
  Real depth_to_neutral_axis = 0;  // Dp, m: top of deck to the PNA (LRFD 6.10.7.3)
  Real web_compression_depth = 0;  // Dcp, m: web in compression at Mp (LRFD D6.3.2)
  Real slab_force = 0;             // Ps = 0.85 f'c beff ts, N
  Real steel_force = 0;            // Fy times the steel area, N
  CalculationTrace trace;
};

// Preconditions: positive plate dimensions, deck thickness and width, Fy
// and f'c; deck_bar_yield set when include_deck_bars and the deck has bars.
[[nodiscard]] CompositePlasticMoment composite_plastic_moment(const model::SteelIGirder& girder,
                                                              const model::DeckSlab& deck, Real steel_yield,
                                                              Real deck_strength, bool include_deck_bars,
                                                              std::optional<Real> deck_bar_yield);

}  // namespace tenthpoint::capacity
