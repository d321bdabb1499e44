#include "engine/model/bridge.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <numeric>

namespace tenthpoint::model {

Real Geometry::total_length() const { return std::accumulate(span_lengths.begin(), span_lengths.end(), Real{0}); }

Real Geometry::support_station(std::size_t i) const {
  assert(i <= span_lengths.size());
  return std::accumulate(span_lengths.begin(), span_lengths.begin() + static_cast<std::ptrdiff_t>(i), Real{0});
}

const SectionDefinition* Bridge::find_section(const std::string& id) const {
  auto it = std::find_if(sections.begin(), sections.end(), [&](const SectionDefinition& s) { return s.id == id; });
  return it == sections.end() ? nullptr : &*it;
}

const GirderLine* Bridge::find_girder(const std::string& id) const {
  auto it = std::find_if(girders.begin(), girders.end(), [&](const GirderLine& g) { return g.id == id; });
  return it == girders.end() ? nullptr : &*it;
}

const Inspection* Bridge::latest_inspection(std::optional<CalendarDate> as_of) const {
  const Inspection* best = nullptr;
  for (const Inspection& record : inspections) {
    if (as_of && record.date > *as_of) continue;
    // Later date wins; on equal dates the later record in the file wins, so a
    // same-day correction supersedes the original entry.
    if (best == nullptr || record.date >= best->date) best = &record;
  }
  return best;
}

int Bridge::girder_count() const {
  return std::accumulate(girders.begin(), girders.end(), 0, [](int n, const GirderLine& g) { return n + g.count; });
}

int design_lanes_from_width(Real width) {
  const Real feet = width / units::kFoot;
  // LRFD 3.6.1.1.1: roadways from 20 to 24 ft wide have two design lanes.
  // A small tolerance keeps a width typed as 24.0 ft from rounding below 24.
  constexpr Real kTolerance = 1e-9;
  if (feet >= 20.0 - kTolerance && feet <= 24.0 + kTolerance) return 2;
  return std::max(1, static_cast<int>(std::floor(feet / 12.0 + kTolerance)));
}

}  // namespace tenthpoint::model
