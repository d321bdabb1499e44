// Dead loads by component (DC1, DC2, DW). A load is given per girder or for
// the whole cross-section, in which case its DistributionRule shares it out.
// Forces in N, line loads in N/m, stations in m.
#pragma once

#include <optional>
#include <string>
#include <variant>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/core/source_location.h"
#include "engine/model/enums.h"

namespace tenthpoint::model {

// A uniform line load; over the whole girder unless start/end are given.
struct UniformLoad {
  Real intensity = 0;  // N/m, downward positive
  std::optional<Real> start;
  std::optional<Real> end;
};

// A concentrated load (a diaphragm, a utility hanger).
struct PointLoad {
  Real force = 0;    // N, downward positive
  Real station = 0;  // m
};

// A wearing surface given by thickness; its line load is thickness x width x
// unit weight, over the whole girder. Whether it was measured in the field
// sets its Strength I load factor (MBE Table 6A.4.2.2-1).
struct WearingSurface {
  Real thickness = 0;         // m
  Real unit_weight = 0;       // N/m^3
  std::optional<Real> width;  // m; absent = the clear roadway width
  bool field_measured = false;
};

using DeadLoadShape = std::variant<UniformLoad, PointLoad, WearingSurface>;

struct DeadLoad {
  DeadLoadComponent component = DeadLoadComponent::dc1;
  std::string description;
  LoadScope scope = LoadScope::per_girder;
  DistributionRule rule = DistributionRule::equal;  // used when scope == cross_section
  std::vector<std::string> girders;                 // girder-line ids it applies to; empty = all
  DeadLoadShape shape;
  SourceLocation where;
};

}  // namespace tenthpoint::model
