// Turns a concrete section definition (a reinforced concrete beam or a
// precast prestressed girder, with its deck) into the inputs of
// concrete_flexure.h and concrete_shear.h for one sense of bending. The
// section is described from the compression face:
//
// Reinforced concrete beam (bar depths from the beam top):
//  - positive: compression at the top, b = flange width and hf the flange
//    thickness (a rectangle web_width wide when hf = 0), bottom bars in
//    tension;
//  - negative: compression at the soffit over the web width, top bars in
//    tension at h - depth.
//  A composite deck on an RC beam (rare) becomes the compression flange in
//  positive bending over the beam's web width, and its bars join the top
//  bars in negative bending.
// Prestressed girder:
//  - positive, composite: the deck is the compression flange (b = effective
//    width, hf = structural thickness, f'c of the deck); below the deck the
//    compression is carried over the girder's web width only: the haunch
//    and the precast top flange are left out because the model does not
//    hold their widths (conservative). Strands at deck top - height.
//  - positive, non-composite: a rectangle of the web width at the girder's
//    f'c (conservative, same reason; a warning says so).
//  - negative (a girder made continuous): the deck bars in tension, the
//    girder soffit in compression over the web width (the bottom flange is
//    not in the model; conservative), strands in the compression zone left
//    out, nonprestressed phi.
//  - fpy = 0.9 fpu (low relaxation) or 0.85 fpu (stress relieved) when not
//    given (LRFD Table 5.4.4.1-1, from memory).
// Shear: bv = the web width (for a box, the sum of its webs as the file
// gives it), f'c of the girder, stirrups with the reinforcement's fy, the
// steel on the tension side for eps_s.
#pragma once

#include <string>
#include <vector>

#include "engine/capacity/concrete_flexure.h"
#include "engine/capacity/concrete_shear.h"
#include "engine/capacity/resistance.h"
#include "engine/model/materials.h"
#include "engine/model/section.h"

namespace tenthpoint::capacity {

struct ConcreteMemberSections {
  ConcreteFlexureSection flexure;
  ConcreteShearSection shear;
  std::vector<std::string> warnings;
  std::vector<std::string> notes;
};

// Precondition: section.description holds a ReinforcedConcreteBeam (for the
// first) or a PrestressedGirder (for the second). Throws InputError naming
// the section for bad dimensions, and naming the materials field (at
// `file`) when the girder concrete, the reinforcement (for bars or
// stirrups), the strand, or the deck concrete of a composite bridge is
// missing.
[[nodiscard]] ConcreteMemberSections reinforced_concrete_sections(const model::SectionDefinition& section,
                                                                  const model::Materials& materials, MomentSign sign,
                                                                  Real density_factor, const std::string& file);
[[nodiscard]] ConcreteMemberSections prestressed_sections(const model::SectionDefinition& section,
                                                          const model::Materials& materials, MomentSign sign,
                                                          Real density_factor, const std::string& file);

}  // namespace tenthpoint::capacity
