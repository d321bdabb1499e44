#include "engine/capacity/given_capacity_lookup.h"

#include <algorithm>
#include <cmath>

#include <fmt/format.h>

namespace tenthpoint::capacity {
namespace {

using section::detail::kStationTolerance;

bool applies_to(const model::GivenCapacity& entry, const std::string& girder_id) {
  return entry.girders.empty() ||
         std::find(entry.girders.begin(), entry.girders.end(), girder_id) != entry.girders.end();
}

bool near(Real a, Real b) { return std::abs(a - b) <= kStationTolerance; }

}  // namespace

const model::GivenCapacity* find_given_capacity(const std::vector<model::GivenCapacity>& given,
                                                const std::string& girder_id, Real station, section::Side side) {
  const model::GivenCapacity* facing = nullptr;
  const model::GivenCapacity* touching = nullptr;
  for (const model::GivenCapacity& entry : given) {
    if (!applies_to(entry, girder_id)) continue;
    if (entry.end - entry.start <= kStationTolerance) {
      if (near(station, entry.start)) return &entry;  // tier 1
      continue;
    }
    if (station < entry.start - kStationTolerance || station > entry.end + kStationTolerance) continue;
    const bool at_start = near(station, entry.start);
    const bool at_end = near(station, entry.end);
    const bool faces =
        (!at_start && !at_end) || (at_start && side == section::Side::right) || (at_end && side == section::Side::left);
    if (faces) {
      if (facing == nullptr) facing = &entry;
    } else if (touching == nullptr) {
      touching = &entry;
    }
  }
  return facing != nullptr ? facing : touching;
}

Resistance given_resistance(const std::vector<model::GivenCapacity>& given, const std::string& girder_id, Real station,
                            section::Side side, model::ForceEffect effect, MomentSign sign,
                            const std::vector<model::SectionLoss>& losses_here) {
  const char* field = effect == model::ForceEffect::shear ? "shear"
                      : sign == MomentSign::positive      ? "moment_positive"
                                                          : "moment_negative";
  const model::GivenCapacity* entry = find_given_capacity(given, girder_id, station, side);
  if (entry == nullptr) {
    return Resistance::unavailable_because(
        fmt::format("no capacity.given region covers station {:.3f} m of girder {}; give one (capacity mode is given)",
                    station, girder_id));
  }
  const std::optional<Real>& value = effect == model::ForceEffect::shear ? entry->shear
                                     : sign == MomentSign::positive      ? entry->moment_positive
                                                                         : entry->moment_negative;
  if (!value) {
    return Resistance::unavailable_because(
        fmt::format("{}: the capacity.given region {:.3f} m to {:.3f} m has no {}; give it", entry->where.to_string(),
                    entry->start, entry->end, field));
  }
  Resistance r;
  r.status = ResistanceStatus::given;
  r.factored = *value;
  r.article = "given";
  r.reason = entry->source.empty() ? std::string("capacity.given (no source stated)") : entry->source;
  r.trace.title = fmt::format("given capacity, girder {}", girder_id);
  r.trace.add_step(field, fmt::format("given factored resistance for {:.3f} m to {:.3f} m", entry->start, entry->end),
                   "given", *value,
                   effect == model::ForceEffect::shear ? units::Quantity::force : units::Quantity::moment,
                   entry->where.to_string());
  for (const model::SectionLoss& loss : losses_here) {
    r.warnings.push_back(fmt::format(
        "given capacity not reduced for section loss: the inspection in force reports {} loss from {:.3f} m to "
        "{:.3f} m at this station; the engineer must judge whether the given value ({}) already reflects it",
        to_string(loss.element), loss.start, loss.end, r.reason));
  }
  return r;
}

}  // namespace tenthpoint::capacity
