// The plain in-memory model of one bridge record, as the reader builds it
// from a validated bridge file. Everything is in internal SI units (see
// engine/core/units.h); `units` remembers what the file used so results can be
// written back in the same system.
//
// Stations run along the girder from the centreline of bearing at the first
// support (station 0) to the last support (station total_length()).
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "engine/core/calendar_date.h"
#include "engine/core/numeric.h"
#include "engine/core/source_location.h"
#include "engine/core/units.h"
#include "engine/model/dead_load.h"
#include "engine/model/enums.h"
#include "engine/model/girder_line.h"
#include "engine/model/given_capacity.h"
#include "engine/model/inspection.h"
#include "engine/model/materials.h"
#include "engine/model/rating_request.h"
#include "engine/model/section.h"

namespace tenthpoint::model {

struct Identity {
  std::string structure_id;  // the agency's structure number; unique in an inventory
  std::string name;
  std::string feature_carried;
  std::string feature_crossed;
  int year_built = 0;
  std::optional<int> year_reconstructed;
  std::string district;
  std::string owner;
};

struct Traffic {
  std::optional<Real> adtt;       // trucks per day in one direction; absent = unknown
  Real clear_roadway_width = 0;   // m, curb to curb
  int lanes = 1;                  // design lanes
  bool lanes_from_width = false;  // true when lanes was derived (LRFD 3.6.1.1.1)
};

struct Geometry {
  Real skew = 0;                       // rad, 0 = square
  std::vector<Real> span_lengths;      // m, centre to centre of bearings
  std::vector<SupportKind> supports;   // one per support line: span_lengths.size() + 1
  std::vector<Continuity> continuity;  // one per interior support: span_lengths.size() - 1
  std::vector<Real> hinges;            // m, internal hinges strictly inside spans (cantilever-suspended spans)
  SourceLocation where;

  [[nodiscard]] Real total_length() const;
  // Station of support line i (0 .. span count), m.
  [[nodiscard]] Real support_station(std::size_t i) const;
};

// A point where the engineer wants results besides the automatic ones
// (tenth points, section changes, supports): a splice, a cover-plate end, a
// region of section loss.
struct NamedPoint {
  Real station = 0;  // m
  std::string label;
  SourceLocation where;
};

struct Bridge {
  std::string source_file;
  units::UnitSystem units = units::UnitSystem::us;
  int format_version = 1;

  Identity identity;
  Traffic traffic;
  Geometry geometry;
  Materials materials;
  std::vector<SectionDefinition> sections;
  std::vector<GirderLine> girders;
  std::vector<DeadLoad> dead_loads;
  CapacityInput capacity;
  std::vector<Inspection> inspections;  // in file order; see latest_inspection()
  RatingRequest rating;
  std::vector<NamedPoint> points_of_interest;
  std::string notes;

  [[nodiscard]] const SectionDefinition* find_section(const std::string& id) const;
  [[nodiscard]] const GirderLine* find_girder(const std::string& id) const;
  // The inspection in force on `as_of` (the latest dated on or before it), or
  // the latest of all when as_of is absent; nullptr when there is none.
  [[nodiscard]] const Inspection* latest_inspection(std::optional<CalendarDate> as_of = std::nullopt) const;
  // Total number of girders in the cross-section (sum of girder-line counts).
  [[nodiscard]] int girder_count() const;
};

// Design lanes from the clear roadway width, AASHTO LRFD 3.6.1.1.1:
// INT(w / 12 ft), with roadways 20 to 24 ft wide carrying two lanes. Never
// less than one. `width` in m.
[[nodiscard]] int design_lanes_from_width(Real width);

}  // namespace tenthpoint::model
