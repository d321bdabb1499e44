#include "engine/live_load/envelope_cache.h"

#include <utility>

#include "engine/live_load/prepared_influence_lines.h"

namespace tenthpoint::live_load {

EnvelopeCache::EnvelopeCache(std::vector<const model::LoadModel*> models, const model::VehicleLibrary& library,
                             const EnvelopeOptions& options)
    : models_(std::move(models)), library_(&library), options_(options) {}

const std::vector<MovingLoadEnvelope>& EnvelopeCache::envelopes_for(const analysis::InfluenceLines& lines) {
  // A bridge has a handful of girder lines, so a linear scan is enough; the
  // comparison stops at the first differing curve and costs far less than
  // one envelope.
  for (const std::unique_ptr<Entry>& entry : entries_)
    if (analysis::identical(entry->lines, lines)) {
      ++reused_;
      return entry->envelopes;
    }
  auto entry = std::make_unique<Entry>();
  entry->envelopes = compute_moving_load_envelopes(PreparedInfluenceLines(lines), models_, *library_, options_);
  entry->lines = lines;
  entries_.push_back(std::move(entry));
  return entries_.back()->envelopes;
}

}  // namespace tenthpoint::live_load
