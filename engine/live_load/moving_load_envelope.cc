#include "engine/live_load/moving_load_envelope.h"

#include <fmt/format.h>

#include <map>
#include <memory>
#include <stdexcept>
#include <utility>

#include "engine/core/errors.h"

namespace tenthpoint::live_load {
namespace {

// Searches keyed by the chain they move (weights and link ranges), so that
// identical chains of different models share their sweeps.
using ChainKey = std::pair<std::vector<Real>, std::vector<std::pair<Real, Real>>>;

ChainKey key_of(const AxleChain& chain) {
  ChainKey key;
  key.first = chain.weights;
  for (const AxleLink& l : chain.links) key.second.emplace_back(l.min, l.max);
  return key;
}

bool span_condition_holds(const model::SpanCondition& condition, Real span) {
  // Lengths equal to within the station tolerance count as equal, so that a
  // 200 ft span converted to metres is "not longer than 200 ft".
  if (condition.longer_than && !(span > *condition.longer_than + kStationTolerance)) return false;
  if (condition.not_longer_than && span > *condition.not_longer_than + kStationTolerance) return false;
  return true;
}

}  // namespace

bool EnvelopeOptions::is_valid(std::string* why) const { return search.is_valid(why); }

const CaseExtreme* MovingLoadEnvelope::governing_value(const EffectKey& key) const {
  const std::optional<std::size_t>& g = governing.at(key);
  if (!g) return nullptr;
  const std::optional<CaseExtreme>& v = cases[*g].values.at(key);
  return v ? &*v : nullptr;
}

bool case_applies(const model::LoadCase& load_case, const PreparedInfluenceLines& lines, const EffectKey& key) {
  const model::LoadEffect effect = lines.load_effect(key);
  if (!load_case.applies_to(effect)) return false;
  if (!span_condition_holds(load_case.spans, lines.condition_span_length(key.kind, key.index))) return false;
  // LRFD 3.6.1.3.1: the two-truck loading is for negative moment between the
  // points of contraflexure of a uniform load on all spans.
  if (load_case.between_contraflexure_points_only && effect == model::LoadEffect::negative_moment &&
      !lines.contraflexure().in_negative_region[key.index]) {
    return false;
  }
  return true;
}

std::vector<MovingLoadEnvelope> compute_moving_load_envelopes(const PreparedInfluenceLines& lines,
                                                              const std::vector<const model::LoadModel*>& models,
                                                              const model::VehicleLibrary& library,
                                                              const EnvelopeOptions& options) {
  std::string why;
  if (!options.is_valid(&why)) throw std::invalid_argument("envelope options: " + why);
  std::map<ChainKey, std::unique_ptr<AxleTrainSearch>> searches;
  // Train extremes per (search, rule), per distinct curve, with the extremes
  // they were computed for.
  std::map<std::pair<const AxleTrainSearch*, AxleRule>,
           std::vector<std::optional<std::pair<ExtremePair<TrainExtreme>, ExtremePair<bool>>>>>
      results;
  TrainSearchScratch scratch;
  std::vector<MovingLoadEnvelope> out;
  out.reserve(models.size());

  // Shear just left of a point is computed after shear just right, so that a
  // shared curve copies the value instead of searching again.
  constexpr EffectKind kOrder[] = {EffectKind::moment, EffectKind::shear_right, EffectKind::shear_left,
                                   EffectKind::reaction};

  for (const model::LoadModel* model : models) {
    MovingLoadEnvelope envelope;
    envelope.load_model_id = model->id;
    for (const model::LoadCase& load_case : model->cases) {
      CaseEnvelope result;
      result.case_id = load_case.id;
      result.axle_rule = load_case.drop_relieving_axles ? AxleRule::drop_relieving : AxleRule::all_axles;
      result.lane = load_case.lane;
      result.lane_concentrated = load_case.lane_concentrated;
      if (!load_case.train && !load_case.lane) {
        throw InputError(load_case.where, "train",
                         fmt::format("load case {} of {} has neither a train nor a lane", load_case.id, model->id));
      }
      if (load_case.lane_concentrated && !load_case.lane) {
        throw InputError(load_case.where, "lane_concentrated",
                         fmt::format("load case {}: concentrated lane loads need a lane", load_case.id));
      }
      const AxleTrainSearch* search = nullptr;
      if (load_case.train) {
        const model::AxleTrain* train = library.find_train(*load_case.train);
        if (!train) {
          throw InputError(load_case.where, "train",
                           fmt::format("load case {} names unknown train {}", load_case.id, *load_case.train));
        }
        AxleChain chain = axle_chain(load_case, *train);
        auto& slot = searches[key_of(chain)];
        if (!slot) slot = std::make_unique<AxleTrainSearch>(chain, lines.knots(), options.search);
        search = slot.get();
        result.chain = std::move(chain);
      }

      result.values = EffectTable<std::optional<CaseExtreme>>(lines.point_count(), lines.support_count());
      // The effects this case applies to, and which extremes; shear just left
      // of a point that shares its curve with shear just right is copied.
      struct Job {
        EffectKind kind;
        std::size_t index;
        ExtremePair<bool> wanted;
      };
      std::vector<Job> jobs;
      std::vector<std::pair<std::size_t, std::size_t>> copies;  // shear_left index <- shear_right index
      for (EffectKind kind : kOrder) {
        const std::size_t count = kind == EffectKind::reaction ? lines.support_count() : lines.point_count();
        for (std::size_t index = 0; index < count; ++index) {
          if (kind == EffectKind::shear_left &&
              lines.curve_index(EffectKind::shear_left, index) == lines.curve_index(EffectKind::shear_right, index)) {
            copies.emplace_back(index, index);
            continue;
          }
          ExtremePair<bool> wanted;
          for (Extreme x : kExtremes) wanted[x] = case_applies(load_case, lines, EffectKey{kind, index, x});
          if (wanted.maximum || wanted.minimum) jobs.push_back({kind, index, wanted});
        }
      }
      // Trains: reused when another model moves the same chain by the same
      // rule (the HL-93 and HS20 trucks).
      std::vector<ExtremePair<TrainExtreme>> trains(jobs.size());
      if (search) {
        auto& cache = results[{search, result.axle_rule}];
        cache.resize(lines.distinct_curve_count());
        std::vector<std::size_t> pending;
        for (std::size_t j = 0; j < jobs.size(); ++j) {
          const auto& hit = cache[lines.curve_index(jobs[j].kind, jobs[j].index)];
          const bool covered = hit && (!jobs[j].wanted.maximum || hit->second.maximum) &&
                               (!jobs[j].wanted.minimum || hit->second.minimum);
          if (covered) {
            trains[j] = hit->first;
          } else {
            pending.push_back(j);
          }
        }
        for (std::size_t j : pending) {
          const Job& job = jobs[j];
          trains[j] = search->search(lines.curve(job.kind, job.index), result.axle_rule, scratch, job.wanted);
          cache[lines.curve_index(job.kind, job.index)] = std::make_pair(trains[j], job.wanted);
        }
      }
      for (std::size_t j = 0; j < jobs.size(); ++j) {
        const Job& job = jobs[j];
        const EffectCurve& curve = lines.curve(job.kind, job.index);
        auto& slot = result.values.of(job.kind)[job.index];
        for (Extreme x : kExtremes) {
          if (!job.wanted[x]) continue;
          CaseExtreme value;
          if (search) value.train = trains[j][x];
          if (load_case.lane) {
            value.lane = lane_extreme(curve, job.kind, x, *load_case.lane, load_case.lane_concentrated);
          }
          slot[x] = std::move(value);
        }
      }
      for (const auto& [left, right] : copies) result.values.shear_left[left] = result.values.shear_right[right];
      envelope.cases.push_back(std::move(result));
    }

    envelope.governing = EffectTable<std::optional<std::size_t>>(lines.point_count(), lines.support_count());
    for (EffectKind kind : kEffectKinds) {
      auto& column = envelope.governing.of(kind);
      for (std::size_t index = 0; index < column.size(); ++index) {
        for (Extreme x : kExtremes) {
          const Real sign = sign_of(x);
          std::optional<std::size_t>& g = column[index][x];
          for (std::size_t c = 0; c < envelope.cases.size(); ++c) {
            const std::optional<CaseExtreme>& v = envelope.cases[c].values.of(kind)[index][x];
            if (!v) continue;
            if (!g || sign * v->total() > sign * envelope.cases[*g].values.of(kind)[index][x]->total()) g = c;
          }
        }
      }
    }
    out.push_back(std::move(envelope));
  }
  return out;
}

MovingLoadEnvelope compute_moving_load_envelope(const PreparedInfluenceLines& lines, const model::LoadModel& model,
                                                const model::VehicleLibrary& library, const EnvelopeOptions& options) {
  return std::move(compute_moving_load_envelopes(lines, {&model}, library, options).front());
}

}  // namespace tenthpoint::live_load
