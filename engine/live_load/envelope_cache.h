// EnvelopeCache: the moving-load envelopes of one bridge's girder lines,
// computed once per distinct set of live-load influence lines.
//
// The girder lines of a bridge often share their live-load structure: an
// exterior girder with the interior girders' sections, spans and analysis
// points has the same short-term composite stiffness, so the same influence
// lines and the same envelopes; only the distribution factor, the dead loads
// and the capacities differ. The envelopes are the costly part of rating a
// girder line, so they are reused when the influence lines are identical bit
// for bit (analysis::identical), never when they are merely close. A reused
// envelope is therefore exactly the one compute_moving_load_envelopes would
// return.
//
// One cache serves one bridge, one list of load models and one vehicle
// library, all of which must outlive it; the references it returns stay valid
// for its lifetime. Failure: as compute_moving_load_envelopes.
#pragma once

#include <cstddef>
#include <memory>
#include <vector>

#include "engine/analysis/influence_lines.h"
#include "engine/live_load/moving_load_envelope.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::live_load {

class EnvelopeCache {
 public:
  EnvelopeCache(std::vector<const model::LoadModel*> models, const model::VehicleLibrary& library,
                const EnvelopeOptions& options = {});

  // The envelopes of every model, in the models' order, on `lines`.
  [[nodiscard]] const std::vector<MovingLoadEnvelope>& envelopes_for(const analysis::InfluenceLines& lines);

  // How many sets were computed and how many requests were answered by an
  // earlier one.
  [[nodiscard]] std::size_t computed() const { return entries_.size(); }
  [[nodiscard]] std::size_t reused() const { return reused_; }

 private:
  struct Entry {
    analysis::InfluenceLines lines;  // a copy: the caller's analysis may not outlive this entry
    std::vector<MovingLoadEnvelope> envelopes;
  };

  std::vector<const model::LoadModel*> models_;
  const model::VehicleLibrary* library_;
  EnvelopeOptions options_;
  std::vector<std::unique_ptr<Entry>> entries_;  // unique_ptr: returned references survive growth
  std::size_t reused_ = 0;
};

}  // namespace tenthpoint::live_load
