// The section of a haunched (non-prismatic) segment at any station, for
// EI(x) and for stresses along it.
//
// At a station the section is recomputed exactly from a description blended
// between the two end sections by the taper law's share t (taper_law.h):
// every dimension (web depth D and plates of a steel girder; height, widths,
// flange thickness and bar layers of an RC beam; and the deck's thickness,
// width and haunch) is (1 - t) * start + t * end, and a dimension equal at both
// ends is taken as it is. So the web depth (steel_i) or the height (rc_beam)
// follows the taper, and plates that are the same at both ends keep their
// size. Both ends must have a description of the same kind, steel_i or
// rc_beam, with the same cover plates and the same number of bar layers.
//
// Given properties: an end section's stage properties (given or computed, by
// the rules of section_stages.h) are met exactly at that end. In between, the
// properties computed from the blended description are scaled (inertia and
// section moduli, not area) by (1 - t) r_start + t r_end, where r is the ratio
// of the end's used EI to the EI its description gives; with no given
// properties r = 1 and nothing is scaled.
//
// Stations are m along the girder (not relative to the segment).
#pragma once

#include <optional>

#include "engine/core/numeric.h"
#include "engine/core/source_location.h"
#include "engine/model/enums.h"
#include "engine/model/materials.h"
#include "engine/model/section.h"
#include "engine/section/section_options.h"
#include "engine/section/section_stages.h"
#include "engine/section/taper_law.h"

namespace tenthpoint::section {

class TaperedSection {
 public:
  // Throws InputError (at `where`, the segment's location) when an end has no
  // description, the ends differ in kind or layout, the kind is ps_girder
  // (gross precast properties cannot be recomputed at another depth), only
  // one end has a deck, or start_station >= end_station; and whatever
  // section_stages throws for either end.
  TaperedSection(const model::SectionDefinition& start_section, const model::SectionDefinition& end_section,
                 model::Taper taper, Real start_station, Real end_station, const model::Materials& materials,
                 const SectionOptions& options, SourceLocation where);

  [[nodiscard]] Real start_station() const { return start_station_; }
  [[nodiscard]] Real end_station() const { return end_station_; }
  [[nodiscard]] const TaperLaw& law() const { return law_; }

  // The share t of the start-to-end change reached at `station` (0 at the
  // start, 1 at the end). Precondition: station within the segment (a
  // round-off overshoot is clamped).
  [[nodiscard]] Real fraction(Real station) const;
  // The blended description (and deck) at `station`; no given properties.
  [[nodiscard]] model::SectionDefinition section_at(Real station) const;
  // The controlling depth: web depth D for steel_i, height h for rc_beam, m.
  [[nodiscard]] Real controlling_depth(Real station) const;
  // The girder's overall depth (steel soffit to top of top plate; h), m.
  [[nodiscard]] Real girder_depth(Real station) const;

  // Stage properties at `station`, by the rules in the file comment. At the
  // ends exactly the end sections' properties.
  [[nodiscard]] SectionStages stages_at(Real station) const;
  // EI of `stage` at `station`, N*m^2.
  [[nodiscard]] Real flexural_rigidity(model::SectionStage stage, Real station) const;
  // EI of the cracked negative section, when both ends have one.
  [[nodiscard]] std::optional<Real> cracked_negative_rigidity(Real station) const;

 private:
  model::SectionDefinition start_;
  model::SectionDefinition end_;
  TaperLaw law_;
  Real start_station_;
  Real end_station_;
  model::Materials materials_;
  SectionOptions options_;
  SourceLocation where_;
  SectionStages used_start_;  // the end stages as section_stages gives them
  SectionStages used_end_;
  SectionStages described_start_;  // the end stages from the descriptions alone
  SectionStages described_end_;
};

}  // namespace tenthpoint::section
