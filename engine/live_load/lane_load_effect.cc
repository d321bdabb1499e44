#include "engine/live_load/lane_load_effect.h"

#include <cmath>

namespace tenthpoint::live_load {

LaneExtreme lane_extreme(const EffectCurve& curve, EffectKind kind, Extreme extreme, const model::LaneLoad& lane,
                         const std::optional<model::LaneConcentratedLoads>& concentrated) {
  LaneExtreme out;
  const Real sign = sign_of(extreme);
  out.uniform = lane.intensity * lane.factor * curve.area(extreme);
  if (concentrated) {
    const Real force = lane.factor * (kind == EffectKind::moment ? concentrated->moment : concentrated->shear);
    const OrdinatePeak& peak = curve.peak(extreme);
    if (force > 0.0 && sign * peak.value > 0.0) {
      out.loads[out.load_count++] = PlacedLoad{force, peak.station, peak.approach};
      out.concentrated += force * peak.value;
      if (kind == EffectKind::moment && extreme == Extreme::minimum && concentrated->second_load_for_negative_moment &&
          curve.span_count() > 1) {
        // The first load's span: the one whose own extreme is the overall one.
        std::size_t first_span = 0;
        for (std::size_t s = 0; s < curve.span_count(); ++s) {
          if (curve.span_peak(s, extreme).value == peak.value && curve.span_peak(s, extreme).station == peak.station) {
            first_span = s;
            break;
          }
        }
        std::optional<std::size_t> other;
        for (std::size_t s = 0; s < curve.span_count(); ++s) {
          if (s == first_span) continue;
          if (sign * curve.span_peak(s, extreme).value <= 0.0) continue;
          if (!other || sign * curve.span_peak(s, extreme).value > sign * curve.span_peak(*other, extreme).value) {
            other = s;
          }
        }
        if (other) {
          const OrdinatePeak& second = curve.span_peak(*other, extreme);
          out.loads[out.load_count++] = PlacedLoad{force, second.station, second.approach};
          out.concentrated += force * second.value;
        }
      }
    }
  }
  out.value = out.uniform + out.concentrated;
  return out;
}

}  // namespace tenthpoint::live_load
