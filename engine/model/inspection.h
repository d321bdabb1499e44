// Inspection records: condition ratings on the NBI/SNBI 0-9 scale and measured
// section loss, which the capacity stage applies to the sections it touches.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "engine/core/calendar_date.h"
#include "engine/core/numeric.h"
#include "engine/core/source_location.h"
#include "engine/model/enums.h"

namespace tenthpoint::model {

// Loss of one element of one girder line over [start, end]. Exactly one of
// thickness_loss (m of plate lost, for steel elements) and percent_loss
// (0..100, of the element's area) is set.
struct SectionLoss {
  std::string girder;  // girder-line id
  Real start = 0;      // m
  Real end = 0;        // m
  SectionElement element = SectionElement::web;
  std::optional<Real> thickness_loss;
  std::optional<Real> percent_loss;
  std::string note;
  SourceLocation where;
};

struct Inspection {
  CalendarDate date;
  int deck_condition = 9;            // 0..9 (SNBI B.C.01)
  int superstructure_condition = 9;  // 0..9 (SNBI B.C.02)
  std::optional<int> substructure_condition;
  std::vector<SectionLoss> section_loss;
  std::string inspector;
  std::string notes;
  SourceLocation where;
};

}  // namespace tenthpoint::model
