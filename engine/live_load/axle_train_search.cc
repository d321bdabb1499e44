#include "engine/live_load/axle_train_search.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <limits>
#include <map>
#include <utility>

namespace tenthpoint::live_load {
namespace {

constexpr Real kInfinity = std::numeric_limits<Real>::infinity();
// Values closer than this fraction of sum(w) * max|eta| are equal: the
// rounding of the incremental sweep is about 1e-13 of that scale.
constexpr Real kPruneTolerance = 1e-11;

enum class LinkChoice { at_min, at_max, free };

}  // namespace

bool TrainSearchOptions::is_valid(std::string* /*why*/) const { return true; }

AxleTrainSearch::AxleTrainSearch(AxleChain chain, const std::vector<Real>& knots, const TrainSearchOptions& options)
    : chain_(std::move(chain)) {
  assert(!chain_.weights.empty() && chain_.links.size() + 1 == chain_.weights.size());
  build_patterns(knots, TravelDirection::rightward);
  if (options.both_directions && !chain_.symmetric()) build_patterns(knots, TravelDirection::leftward);
  std::stable_partition(patterns_.begin(), patterns_.end(), [](const Pattern& p) { return p.clusters.size() == 1; });
  std::vector<bool> rigid(sweeps_.size(), false);
  std::vector<bool> clustered(sweeps_.size(), false);
  for (const Pattern& p : patterns_) {
    for (const Cluster& c : p.clusters) (p.clusters.size() == 1 ? rigid : clustered)[c.sweep] = true;
  }
  for (std::size_t s = 0; s < sweeps_.size(); ++s) {
    if (clustered[s] && !rigid[s]) cluster_sweeps_.push_back(s);
  }
}

void AxleTrainSearch::build_patterns(const std::vector<Real>& knots, TravelDirection direction) {
  std::vector<std::size_t> variable;
  for (std::size_t l = 0; l < chain_.links.size(); ++l) {
    if (chain_.links[l].variable()) variable.push_back(l);
  }
  // Sweeps are shared by every pattern (and both trains of a two-truck case)
  // whose cluster has the same weights and offsets.
  std::map<std::pair<std::vector<Real>, std::vector<Real>>, std::size_t> known;
  const Real step = direction == TravelDirection::rightward ? -1.0 : 1.0;

  std::vector<LinkChoice> choice(variable.size(), LinkChoice::at_min);
  for (;;) {
    Pattern pattern;
    pattern.direction = direction;
    pattern.link_values.resize(chain_.links.size());
    std::vector<bool> free_link(chain_.links.size(), false);
    for (std::size_t l = 0; l < chain_.links.size(); ++l) pattern.link_values[l] = chain_.links[l].min;
    for (std::size_t v = 0; v < variable.size(); ++v) {
      const std::size_t l = variable[v];
      if (choice[v] == LinkChoice::at_max) pattern.link_values[l] = chain_.links[l].max;
      if (choice[v] == LinkChoice::free) free_link[l] = true;
    }
    std::size_t first = 0;
    std::vector<Real> last_offsets;
    for (std::size_t a = 0; a < chain_.axle_count(); ++a) {
      const bool ends = a + 1 == chain_.axle_count() || free_link[a];
      if (!ends) continue;
      AxleGroup group;
      Real offset = 0.0;
      for (std::size_t i = first; i <= a; ++i) {
        group.weights.push_back(chain_.weights[i]);
        group.offsets.push_back(offset);
        if (i < a) offset += step * pattern.link_values[i];
      }
      last_offsets.push_back(offset);
      auto key = std::make_pair(group.weights, group.offsets);
      auto it = known.find(key);
      std::size_t sweep = 0;
      if (it == known.end()) {
        sweep = sweeps_.size();
        sweeps_.push_back(std::make_unique<TrainSweep>(std::move(group), knots));
        known.emplace(std::move(key), sweep);
      } else {
        sweep = it->second;
      }
      pattern.clusters.push_back(Cluster{sweep, first, a});
      first = a + 1;
    }
    for (std::size_t c = 0; c + 1 < pattern.clusters.size(); ++c) {
      const AxleLink& link = chain_.links[pattern.clusters[c].last_axle];
      const Real o = last_offsets[c];
      pattern.windows.push_back(direction == TravelDirection::rightward ? Window{o - link.max, o - link.min}
                                                                        : Window{o + link.min, o + link.max});
    }
    patterns_.push_back(std::move(pattern));

    // Next assignment (odometer over the choices; at_max only for bounded links).
    std::size_t v = 0;
    for (; v < variable.size(); ++v) {
      const bool bounded = chain_.links[variable[v]].bounded();
      if (choice[v] == LinkChoice::at_min) {
        choice[v] = bounded ? LinkChoice::at_max : LinkChoice::free;
        break;
      }
      if (choice[v] == LinkChoice::at_max) {
        choice[v] = LinkChoice::free;
        break;
      }
      choice[v] = LinkChoice::at_min;
    }
    if (v == variable.size()) break;
  }
}

ExtremePair<TrainExtreme> AxleTrainSearch::search(const EffectCurve& curve, AxleRule rule, TrainSearchScratch& scratch,
                                                  ExtremePair<bool> wanted) const {
  struct Best {
    Real value = 0.0;  // sign(extreme) * effect, >= 0
    const Pattern* pattern = nullptr;
    std::array<SweepCandidate, kMaxVariableLinks + 1> chosen{};  // one per cluster
  };
  ExtremePair<Best> best;
  scratch.memo.resize(sweeps_.size());
  scratch.kept.resize(sweeps_.size());
  scratch.cluster.resize(sweeps_.size());
  for (SweepScratch& c : scratch.cluster) c.bounds_sweep = nullptr;
  scratch.sweep.bounds_sweep = nullptr;
  Real weight_sum = 0.0;
  for (Real w : chain_.weights) weight_sum += std::abs(w);
  const Real margin = kPruneTolerance * weight_sum * curve.scale();
  auto own = [&](std::size_t sweep, Extreme x) {
    const SweepExtremes& e = scratch.memo[sweep];
    return sign_of(x) * (x == Extreme::maximum ? e.maximum.value : e.minimum.value);
  };

  // 1. Rigid patterns: every variable link at a bound, one sweep each; each
  // only has to beat the best of those before it.
  for (const Pattern& pattern : patterns_) {
    if (pattern.clusters.size() != 1) break;
    const std::size_t s = pattern.clusters[0].sweep;
    const ExtremePair<Real> known{best.maximum.value, -best.minimum.value};
    scratch.memo[s] = sweeps_[s]->extremes(curve, rule, scratch.sweep, known);
    for (Extreme x : kExtremes) {
      if (!wanted[x]) continue;
      const SweepCandidate& c = x == Extreme::maximum ? scratch.memo[s].maximum : scratch.memo[s].minimum;
      const Real v = sign_of(x) * c.value;
      if (v > best[x].value) {
        best[x].value = v;
        best[x].pattern = &pattern;
        best[x].chosen[0] = c;
      }
    }
  }

  // 2. Clusters of the other patterns: first each cluster's own extremes
  // (best bound first, cheap), then one more pass keeping the candidates that
  // could still lift a total above the best value given the other clusters'
  // own bests.
  for (std::size_t s : cluster_sweeps_) scratch.memo[s] = sweeps_[s]->extremes(curve, rule, scratch.cluster[s]);
  for (std::size_t s : cluster_sweeps_) {
    SweepKeep keep;
    bool any = false;
    for (Extreme x : kExtremes) {
      if (!wanted[x]) continue;
      Real floor = std::numeric_limits<Real>::infinity();
      for (const Pattern& pattern : patterns_) {
        if (pattern.clusters.size() == 1) continue;
        Real sum_own = 0.0;
        for (const Cluster& c : pattern.clusters) sum_own += own(c.sweep, x);
        // Even every cluster at its own best cannot beat what is known.
        if (sum_own <= best[x].value + margin) continue;
        for (const Cluster& c : pattern.clusters) {
          if (c.sweep == s) floor = std::min(floor, best[x].value - (sum_own - own(s, x)) - margin);
        }
      }
      const std::size_t e = x == Extreme::maximum ? 0 : 1;
      scratch.kept[s][e].clear();
      if (floor == std::numeric_limits<Real>::infinity()) continue;
      keep.list[e] = &scratch.kept[s][e];
      keep.floor[e] = floor;
      any = true;
    }
    if (any) (void)sweeps_[s]->candidates(curve, rule, keep, scratch.cluster[s]);
  }

  // 3. The patterns with free links: cut each cluster's kept candidates to
  // those that can still help, then pair them up.
  for (const Pattern& pattern : patterns_) {
    const std::size_t m = pattern.clusters.size();
    if (m == 1) continue;
    if (scratch.candidates.size() < m) {
      scratch.candidates.resize(m);
      scratch.values.resize(m);
      scratch.choice.resize(m);
    }
    for (Extreme x : kExtremes) {
      if (!wanted[x]) continue;
      const Real sign = sign_of(x);
      Real sum_own = 0.0;
      for (const Cluster& c : pattern.clusters) sum_own += own(c.sweep, x);
      // Even every cluster at its own best cannot beat what is known.
      if (sum_own <= best[x].value + margin) continue;
      bool feasible = true;
      for (std::size_t c = 0; c < m && feasible; ++c) {
        const std::size_t s = pattern.clusters[c].sweep;
        const Real needed = best[x].value - (sum_own - own(s, x)) - margin;
        auto& list = scratch.candidates[c];
        list.clear();
        for (const SweepCandidate& k : scratch.kept[s][x == Extreme::maximum ? 0 : 1]) {
          if (sign * k.value >= needed) list.push_back(k);
        }
        feasible = !list.empty();
      }
      if (!feasible) continue;

      // Dynamic programme from the rear cluster forwards: values[c][i] is the
      // best total of clusters c..m-1 with cluster c at its candidate i.
      constexpr Real kNone = -kInfinity;
      {
        const auto& last = scratch.candidates[m - 1];
        auto& v = scratch.values[m - 1];
        v.resize(last.size());
        for (std::size_t i = 0; i < last.size(); ++i) v[i] = sign * last[i].value;
      }
      for (std::size_t c = m - 1; c-- > 0;) {
        const auto& here = scratch.candidates[c];
        const auto& next = scratch.candidates[c + 1];
        const auto& next_value = scratch.values[c + 1];
        auto& v = scratch.values[c];
        auto& pick = scratch.choice[c];
        v.assign(here.size(), kNone);
        pick.assign(here.size(), 0);
        const Window& w = pattern.windows[c];
        // Sliding-window maximum over the next cluster's candidates (both
        // ends of the window move right as the candidate does).
        auto& dq = scratch.deque;
        dq.clear();
        std::size_t head = 0;
        std::size_t pushed = 0;
        for (std::size_t i = 0; i < here.size(); ++i) {
          const Real lo = here[i].lead + w.min - kStationTolerance;
          const Real hi = here[i].lead + w.max + kStationTolerance;
          while (pushed < next.size() && next[pushed].lead <= hi) {
            if (next_value[pushed] != kNone) {
              while (dq.size() > head && next_value[dq.back()] <= next_value[pushed]) dq.pop_back();
              dq.push_back(pushed);
            }
            ++pushed;
          }
          while (dq.size() > head && next[dq[head]].lead < lo) ++head;
          if (dq.size() > head) {
            v[i] = sign * here[i].value + next_value[dq[head]];
            pick[i] = dq[head];
          }
        }
      }
      const auto& first_values = scratch.values[0];
      const auto top =
          static_cast<std::size_t>(std::max_element(first_values.begin(), first_values.end()) - first_values.begin());
      if (first_values[top] == kNone || first_values[top] <= best[x].value) continue;
      best[x].value = first_values[top];
      best[x].pattern = &pattern;
      std::size_t i = top;
      for (std::size_t c = 0; c < m; ++c) {
        best[x].chosen[c] = scratch.candidates[c][i];
        if (c + 1 < m) i = scratch.choice[c][i];
      }
    }
  }

  ExtremePair<TrainExtreme> out;
  for (Extreme x : kExtremes) {
    // Values at the rounding level of the sweep are zero: nothing adverse.
    if (wanted[x] && best[x].pattern && best[x].value > margin) {
      out[x] = to_extreme(*best[x].pattern, best[x].chosen.data(), curve, rule, x);
    }
  }
  return out;
}

TrainExtreme AxleTrainSearch::to_extreme(const Pattern& pattern, const SweepCandidate* chosen, const EffectCurve& curve,
                                         AxleRule rule, Extreme extreme) const {
  TrainExtreme out;
  TrainPlacement placement;
  placement.direction = pattern.direction;
  placement.lead_station = chosen[0].lead;
  const Real sign = sign_of(extreme);
  const Real tiny = 1e-12 * curve.scale();
  Real exact = 0.0;
  std::size_t variable = 0;
  for (std::size_t c = 0; c < pattern.clusters.size(); ++c) {
    const Cluster& cluster = pattern.clusters[c];
    const TrainSweep& sweep = *sweeps_[cluster.sweep];
    const SweepCandidate& at = chosen[c];
    out.value += at.value;
    const std::vector<Real>& offsets = sweep.group().offsets;
    for (std::size_t a = 0; a < offsets.size(); ++a) {
      const std::size_t axle = cluster.first_axle + a;
      const Real x = at.lead + offsets[a];
      // The one-sided approach matters only for an axle standing at a jump.
      if (at.approach != Approach::exact) {
        for (Real d : curve.discontinuities()) {
          if (std::abs(x - d) <= kStationTolerance) placement.approach = at.approach;
        }
      }
      if (rule == AxleRule::drop_relieving) {
        // Evaluated afresh from the exact ordinates: which axles relieve, and
        // the value without the sweep's rounding.
        const Real eta = curve.ordinate(x, at.approach);
        if (sign * eta < -tiny) {
          placement.dropped |= std::uint64_t{1} << axle;
        } else {
          exact += chain_.weights[axle] * eta;
        }
      }
      if (axle == cluster.last_axle) break;
      if (chain_.links[axle].variable()) placement.variable_spacings[variable++] = pattern.link_values[axle];
    }
    if (c + 1 < pattern.clusters.size()) {
      const Real o = offsets.back();
      const Real next = chosen[c + 1].lead;
      placement.variable_spacings[variable++] =
          pattern.direction == TravelDirection::rightward ? at.lead + o - next : next - at.lead - o;
    }
  }
  if (rule == AxleRule::drop_relieving) out.value = exact;
  out.placement = placement;
  return out;
}

}  // namespace tenthpoint::live_load
