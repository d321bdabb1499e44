// Nominal and factored flexural resistance of a concrete section with bonded
// reinforcement, AASHTO LRFD 5.6.3, rectangular stress block (5.6.2.2):
// reinforced concrete rectangles and T-beams, and prestressed girders whose
// compression flange is the composite deck. One solver serves both: the
// section is described from its compression face, so negative moment is the
// same calculation with the section turned over (see
// concrete_section_builder.h).
//
// Assumptions (stated in every trace): mild tension steel at fs = fy (a
// warning when the shallowest layer has not yielded); bonded strands with
// fps from 5.6.3.1.1-1; compression reinforcement neglected (A's = 0,
// conservative); T-section behaviour when a > hf (5.6.3.2.2).
//
// Units internal SI: lengths m from the compression face, areas m^2,
// stresses Pa, moments N*m.
#pragma once

#include <string>
#include <vector>

#include "engine/capacity/resistance.h"
#include "engine/capacity/resistance_factors.h"
#include "engine/capacity/tension_control.h"
#include "engine/core/numeric.h"

namespace tenthpoint::capacity {

struct ReinforcementLayer {
  Real area = 0;   // m^2, total of the layer
  Real depth = 0;  // m, from the compression face to the layer centroid
};

struct ConcreteFlexureSection {
  std::string label;                        // names the section and sign in messages
  Real height = 0;                          // h, m, compression face to the far face
  Real flange_width = 0;                    // b, m, compression flange (== web_width for a rectangle)
  Real flange_thickness = 0;                // hf, m; 0 = a rectangle web_width wide
  Real web_width = 0;                       // bw, m
  Real concrete_strength = 0;               // f'c of the concrete in compression, Pa
  std::vector<ReinforcementLayer> bars;     // mild steel in tension
  Real bar_yield = 0;                       // fy, Pa (needed when bars is not empty)
  Real bar_modulus = 0;                     // Es, Pa
  std::vector<ReinforcementLayer> strands;  // bonded prestressing steel in tension
  Real strand_tensile_strength = 0;         // fpu, Pa (needed when strands is not empty)
  Real strand_yield_strength = 0;           // fpy, Pa
};

struct ConcreteFlexure {
  Resistance resistance;        // phi*Mn; unavailable without tension steel
  bool t_section = false;       // a > hf: flange overhangs and web share the compression
  Real neutral_axis_depth = 0;  // c, m
  Real block_depth = 0;         // a = beta1 c, m
  Real strand_stress = 0;       // fps, Pa (0 without strands)
  Real tension_force = 0;       // As fy + Aps fps, N
  Real effective_depth = 0;     // de, m, LRFD 5.7.2.8-2
  Real shear_depth = 0;         // dv, m, LRFD 5.7.2.8
  TensionControl control;       // eps_t and phi
};

// Preconditions: height, widths (flange_width >= web_width when
// flange_thickness > 0), f'c and the strengths of present steel positive,
// every layer depth in (0, height]. A section without tension steel gives an
// unavailable resistance naming `label`.
[[nodiscard]] ConcreteFlexure concrete_flexure(const ConcreteFlexureSection& section, const ResistanceFactors& factors);

}  // namespace tenthpoint::capacity
