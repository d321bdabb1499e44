// The sections along one girder line, resolved once: per-stage stiffness
// profiles for the analysis, and the section depth and stage properties
// (section moduli for stresses) at any station.
//
// Prismatic segments use their section's stage properties (section_stages.h);
// haunched segments vary by tapered_section.h. Stations are m along the
// girder; `Side` chooses the segment at a section change.
#pragma once

#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/model/bridge.h"
#include "engine/model/enums.h"
#include "engine/model/girder_line.h"
#include "engine/section/section_options.h"
#include "engine/section/section_stages.h"
#include "engine/section/stiffness_profile.h"
#include "engine/section/tapered_section.h"

namespace tenthpoint::section {

class GirderSectionProfile {
 public:
  // Throws InputError (at the segment's location) when the segments do not
  // cover [0, bridge.geometry.total_length()] in order without gap or
  // overlap (to kStationTolerance), name an unknown section, set only one of
  // end_section and taper, or when a section's properties cannot be resolved.
  GirderSectionProfile(const model::Bridge& bridge, const model::GirderLine& girder,
                       const SectionOptions& options = {});

  [[nodiscard]] const std::string& girder_id() const { return girder_id_; }
  [[nodiscard]] Real length() const { return boundaries_.back(); }  // m

  // EI along the girder for `stage`, one piece per segment.
  [[nodiscard]] StiffnessProfile stiffness(model::SectionStage stage) const;
  // EI of the cracked negative section (LRFD 6.10.1.1.1c) along the girder;
  // absent unless every segment has one.
  [[nodiscard]] std::optional<StiffnessProfile> cracked_negative_stiffness() const;

  // All stage properties of the section at `station`.
  [[nodiscard]] SectionStages stages_at(Real station, Side side = Side::right) const;
  // One stage's properties at `station` (section moduli for stresses).
  [[nodiscard]] StageProperties stage_at(model::SectionStage stage, Real station, Side side = Side::right) const;
  // Overall girder depth at `station`, m (steel soffit to top plate; RC or
  // precast height); absent for a section given by properties only.
  [[nodiscard]] std::optional<Real> girder_depth(Real station, Side side = Side::right) const;

 private:
  struct Piece {
    std::optional<SectionStages> prismatic;         // set for a prismatic segment
    std::shared_ptr<const TaperedSection> tapered;  // set for a haunched segment
    std::optional<Real> prismatic_depth;            // m, when the section has a description
  };

  const Piece& piece_at(Real station, Side side) const;

  std::string girder_id_;
  std::vector<Real> boundaries_;  // segment stations: start_0, end_0, ..., end_last
  std::vector<Piece> pieces_;
};

}  // namespace tenthpoint::section
