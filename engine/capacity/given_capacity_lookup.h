// Capacities given in the bridge file (capacity.given): the region that
// covers a station of a girder line, and its value as a Resistance.
//
// Which region applies at a station (entries whose `girders` list is empty
// or names the girder line):
//  1. a point entry (start == end) at the station;
//  2. else a region the station lies inside, or on whose boundary it lies
//     from the facing side (the start of a region seen from the right, its
//     end seen from the left), as section::Side works at section changes;
//  3. else a region that merely touches the station at a boundary (ends are
//     inclusive: a station at the girder's end, or next to a gap, still gets
//     the region that ends there).
// In each tier the first entry in file order wins. Stations match within
// section::detail::kStationTolerance.
//
// Rule on deterioration: a given capacity is never reduced for section loss.
// When the inspection in force reports loss at the station, the result
// carries a warning that the engineer must judge whether the given value
// already reflects that loss.
#pragma once

#include <string>
#include <vector>

#include "engine/capacity/resistance.h"
#include "engine/model/enums.h"
#include "engine/model/given_capacity.h"
#include "engine/model/inspection.h"
#include "engine/section/stiffness_profile.h"

namespace tenthpoint::capacity {

// The entry that applies, or nullptr when none covers the station.
[[nodiscard]] const model::GivenCapacity* find_given_capacity(const std::vector<model::GivenCapacity>& given,
                                                              const std::string& girder_id, Real station,
                                                              section::Side side);

// The given phi*Mn+ / phi*Mn- (effect moment, by sign) or phi*Vn at the
// station, status given; unavailable, naming what to add, when no region
// covers the station or the region lacks the value. `losses_here` are the
// section losses of the inspection in force at the station (for the warning).
[[nodiscard]] Resistance given_resistance(const std::vector<model::GivenCapacity>& given, const std::string& girder_id,
                                          Real station, section::Side side, model::ForceEffect effect, MomentSign sign,
                                          const std::vector<model::SectionLoss>& losses_here);

}  // namespace tenthpoint::capacity
