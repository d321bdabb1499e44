// The closed vocabularies of the bridge format. Each enum has exactly one
// to_string and one parse function (enum_names.cc), shared by the reader, the
// reports and the ledger, so a spelling lives in one place. The spellings are
// the ones used in bridge and policy files (lower snake case).
#pragma once

#include <optional>
#include <string_view>

namespace tenthpoint::model {

// Restraint at a support line of a line girder. In a line-girder model a pin
// and a roller both restrain vertical translation only (axial is not
// modelled); `fixed` also restrains rotation (integral or frame abutments).
enum class SupportKind { pin, roller, fixed };

// How the girder passes over an interior support.
//  continuous: one continuous member for every load stage;
//  hinge: a moment release at the support for every stage;
//  simple_made_continuous: simple spans for DC1 (precast girders erected as
//    simple spans), continuous for DC2, DW and live load.
enum class Continuity { continuous, hinge, simple_made_continuous };

enum class GirderPosition { interior, exterior };

enum class MaterialKind {
  rolled_steel,
  welded_plate_girder,
  riveted_plate_girder,
  reinforced_concrete,
  prestressed_concrete,
};

enum class RatingMethod { lrfr, lfr };

// Dead-load components of AASHTO LRFD 3.3.2: DC1 acts on the noncomposite
// section, DC2 (barriers, sidewalks placed after the deck cures) and DW
// (wearing surface, utilities) on the long-term composite section.
enum class DeadLoadComponent { dc1, dc2, dw };

// The section (and so the stiffness) that carries a load stage.
enum class SectionStage { noncomposite, long_term_composite, short_term_composite };

// How a non-prismatic segment's depth varies between its end sections.
//  linear: straight taper;
//  parabolic: a parabola tangent to the girder at the shallow end (the usual
//    haunch over a pier), so the depth grows with the square of the distance
//    from the shallow end.
enum class Taper { linear, parabolic };

// Whether a dead load is given per girder or for the whole cross-section;
// cross-section loads are shared out by their DistributionRule.
enum class LoadScope { per_girder, cross_section };
enum class DistributionRule { equal, tributary_width, exterior_only };

// Part of a section that inspection can report as lost.
enum class SectionElement { top_flange, bottom_flange, web, cover_plate, bars, strands, deck };

// The force effect a distribution factor or capacity applies to.
enum class ForceEffect { moment, shear };

std::string_view to_string(SupportKind v);
std::string_view to_string(Continuity v);
std::string_view to_string(GirderPosition v);
std::string_view to_string(MaterialKind v);
std::string_view to_string(RatingMethod v);
std::string_view to_string(DeadLoadComponent v);
std::string_view to_string(SectionStage v);
std::string_view to_string(Taper v);
std::string_view to_string(LoadScope v);
std::string_view to_string(DistributionRule v);
std::string_view to_string(SectionElement v);
std::string_view to_string(ForceEffect v);

// Parsers: the exact file spelling, or nullopt. Instantiated for each enum above.
template <typename Enum>
std::optional<Enum> parse(std::string_view text);

// True for the three steel kinds.
[[nodiscard]] bool is_steel(MaterialKind kind);

}  // namespace tenthpoint::model
