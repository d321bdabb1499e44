// Cross-sections along a girder line: given elastic properties, a geometric
// description to compute them (and later the capacity) from, or both. When
// both are given, the given properties drive the stiffness and the
// description drives the capacity.
//
// Units are internal SI: lengths m, areas m^2, section moduli m^3, second
// moments m^4. Depths of layers are measured down from the top of the girder
// (steel or precast top), not from the top of the deck, unless stated.
#pragma once

#include <optional>
#include <string>
#include <variant>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/core/source_location.h"

namespace tenthpoint::model {

// Elastic properties of one stage's section, transformed to the girder
// material for composite stages. Section moduli are positive magnitudes.
struct ElasticSection {
  Real area = 0;                               // m^2
  Real inertia = 0;                            // m^4, about the stage's neutral axis
  std::optional<Real> section_modulus_top;     // m^3, top of girder
  std::optional<Real> section_modulus_bottom;  // m^3, bottom of girder
  std::optional<Real> section_modulus_deck;    // m^3, top of deck (composite stages only)
};

// Properties per load stage (AASHTO LRFD 6.10.1.1.1b): the noncomposite
// girder for DC1, the composite section with the deck transformed by 3n for
// long-term loads (DC2, DW), and by n for live load. `cracked_negative` is the
// optional stiffness over negative-moment regions (girder plus deck bars).
struct SectionProperties {
  ElasticSection noncomposite;
  std::optional<ElasticSection> long_term;
  std::optional<ElasticSection> short_term;
  std::optional<ElasticSection> cracked_negative;
};

// A rectangular plate: `width` across, `thickness` through. For a web the
// width is the web depth D and the thickness tw.
struct Plate {
  Real width = 0;      // m
  Real thickness = 0;  // m
};

// Rolled or built-up steel I-girder (AASHTO LRFD 6.10 notation).
struct SteelIGirder {
  std::string designation;  // e.g. "W36x150"; informational only
  Plate top_flange;
  Plate web;  // width = web depth D between flanges
  Plate bottom_flange;
  std::optional<Plate> top_cover_plate;
  std::optional<Plate> bottom_cover_plate;
  bool longitudinally_stiffened = false;
  std::optional<Real> transverse_stiffener_spacing;  // m; absent = unstiffened web
};

// A layer of longitudinal bars, strands or deck reinforcement.
struct BarLayer {
  Real area = 0;   // m^2, total steel area of the layer
  Real depth = 0;  // m, from the top of the member to the layer centroid
};

// Cast-in-place reinforced concrete rectangle or T-beam (AASHTO LRFD 5.6.3).
// A rectangle has flange_width == web_width and flange_thickness == 0. For a
// slab bridge the "beam" is the design strip (width per lane or unit width).
struct ReinforcedConcreteBeam {
  Real height = 0;            // m, h: total depth including the flange
  Real web_width = 0;         // m, bw
  Real flange_width = 0;      // m, b (effective flange width)
  Real flange_thickness = 0;  // m, hf
  std::vector<BarLayer> bottom_bars;
  std::vector<BarLayer> top_bars;
  std::optional<Real> stirrup_area;     // m^2, Av per stirrup set
  std::optional<Real> stirrup_spacing;  // m, s
};

struct StrandLayer {
  int count = 0;
  Real strand_area = 0;         // m^2 per strand
  Real height_from_bottom = 0;  // m, layer centroid above the girder soffit
};

// Precast prestressed girder. The precast shape's gross properties are given
// (standard shapes are tabulated by their owners); the composite stages are
// computed with the deck.
struct PrestressedGirder {
  std::string shape;              // e.g. "AASHTO Type III"
  Real height = 0;                // m
  Real web_width = 0;             // m
  Real area = 0;                  // m^2, gross precast section
  Real inertia = 0;               // m^4, gross precast section
  Real centroid_from_bottom = 0;  // m, yb
  std::vector<StrandLayer> strands;
  std::optional<Real> effective_prestress;  // Pa, fpe after all losses; absent = estimate (LRFD 5.9.3.3)
  std::optional<Real> stirrup_area;         // m^2
  std::optional<Real> stirrup_spacing;      // m
};

using SectionDescription = std::variant<SteelIGirder, ReinforcedConcreteBeam, PrestressedGirder>;

// The cast-in-place deck acting with the girder.
struct DeckSlab {
  Real thickness = 0;                       // m, structural thickness (wearing surface excluded)
  Real effective_width = 0;                 // m, AASHTO LRFD 4.6.2.6
  Real haunch = 0;                          // m, concrete between girder top and deck soffit
  std::vector<BarLayer> longitudinal_bars;  // depth measured from the top of the deck
};

struct SectionDefinition {
  std::string id;
  std::optional<SectionProperties> properties;
  std::optional<SectionDescription> description;
  std::optional<DeckSlab> deck;
  SourceLocation where;
};

}  // namespace tenthpoint::model
