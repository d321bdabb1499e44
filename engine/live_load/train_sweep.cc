#include "engine/live_load/train_sweep.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <utility>

namespace tenthpoint::live_load {
namespace {

// Groups are at most this many axles: the relieving-axle record is a 64-bit
// mask, and the cut buffer of an evaluated interval is sized by it.
constexpr std::size_t kMaxAxles = 64;

// A bound has to beat the best value by this fraction of sum(w) * max|eta|
// before its interval is evaluated; it absorbs the rounding of the O(1)
// bound updates. Values are therefore exact to this relative tolerance.
constexpr Real kPruneTolerance = 1e-12;

struct Event {
  Real station;
  std::uint32_t axle;
  std::uint32_t knot;
};

}  // namespace

TrainSweep::TrainSweep(AxleGroup group, const std::vector<Real>& knots) : group_(std::move(group)), knots_(knots) {
  const std::size_t n = group_.weights.size();
  assert(n > 0 && n <= kMaxAxles && group_.offsets.size() == n);
  assert(knots_.size() >= 2 && knots_.size() < 32767);
  const std::size_t last_knot = knots_.size() - 1;
  for (Real w : group_.weights) weight_sum_ += std::abs(w);

  std::vector<Event> events;
  events.reserve(n * knots_.size());
  for (std::size_t i = 0; i < n; ++i) {
    for (std::size_t k = 0; k < knots_.size(); ++k) {
      events.push_back({knots_[k] - group_.offsets[i], static_cast<std::uint32_t>(i), static_cast<std::uint32_t>(k)});
    }
  }
  std::sort(events.begin(), events.end(), [](const Event& a, const Event& b) { return a.station < b.station; });

  std::vector<std::int16_t> state(n, -1);
  std::size_t e = 0;
  while (e < events.size()) {
    // Crossings closer than the station tolerance happen at one breakpoint:
    // a state where one of them has happened and the other not is not a
    // position any train can take.
    const Real at = events[e].station;
    change_begin_.push_back(static_cast<std::uint32_t>(changes_.size()));
    breaks_.push_back(at);
    for (; e < events.size() && events[e].station - at <= kStationTolerance; ++e) {
      const Event& ev = events[e];
      const std::int16_t to = ev.knot < last_knot ? static_cast<std::int16_t>(ev.knot) : std::int16_t{-1};
      changes_.push_back({ev.axle, state[ev.axle], to});
      state[ev.axle] = to;
    }
    if (e < events.size()) pieces_.insert(pieces_.end(), state.begin(), state.end());
  }
  change_begin_.push_back(static_cast<std::uint32_t>(changes_.size()));
}

void TrainSweep::bounds(const EffectCurve& curve, AxleRule rule, SweepScratch& scratch) const {
  const std::size_t intervals = interval_count();
  scratch.upper.resize(intervals);
  scratch.lower.resize(intervals);
  const bool clip = rule == AxleRule::drop_relieving;
  auto high = [&](std::int32_t k) {
    if (k < 0) return 0.0;
    const Real v = curve.piece_max(static_cast<std::size_t>(k));
    return clip ? std::max(v, 0.0) : v;
  };
  auto low = [&](std::int32_t k) {
    if (k < 0) return 0.0;
    const Real v = curve.piece_min(static_cast<std::size_t>(k));
    return clip ? std::min(v, 0.0) : v;
  };
  Real up = 0.0;
  Real lo = 0.0;
  for (std::size_t j = 0; j < intervals; ++j) {
    for (std::uint32_t c = change_begin_[j]; c < change_begin_[j + 1]; ++c) {
      const Change& ch = changes_[c];
      const Real w = group_.weights[ch.axle];
      up += w * (high(ch.to) - high(ch.from));
      lo += w * (low(ch.to) - low(ch.from));
    }
    scratch.upper[j] = up;
    scratch.lower[j] = lo;
  }
}

template <typename Sink>
void TrainSweep::evaluate_interval(const EffectCurve& curve, AxleRule rule, Extreme extreme, std::size_t j,
                                   Sink&& sink) const {
  const std::size_t n = axle_count();
  const std::int16_t* pc = &pieces_[j * n];
  const Real x0 = breaks_[j];
  const Real x1 = breaks_[j + 1];
  const auto interval = static_cast<std::uint32_t>(j);

  // F on [u0, u1] as one cubic in tau = x - u0, then its candidates: the
  // one-sided values at the ends and the zeros of F' inside.
  auto emit = [&](Real u0, Real u1, const detail::Cubic& f) {
    const Real h = u1 - u0;
    sink(SweepCandidate{u0, u0 == x0 ? Approach::from_right : Approach::exact, f[0], interval});
    Real stationary[2];
    const int s = detail::stationary_points_inside(f, h, stationary);
    for (int i = 0; i < s; ++i) {
      sink(SweepCandidate{u0 + stationary[i], Approach::exact, detail::horner(f, stationary[i]), interval});
    }
    sink(SweepCandidate{u1, u1 == x1 ? Approach::from_left : Approach::exact, detail::horner(f, h), interval});
  };
  auto add_axle = [&](detail::Cubic& f, std::size_t i, Real u0) {
    const auto k = static_cast<std::size_t>(pc[i]);
    const detail::Cubic shifted = detail::taylor_shift(curve.coefficients(k), u0 + group_.offsets[i] - knots_[k]);
    const Real w = group_.weights[i];
    for (int m = 0; m < 4; ++m) f[static_cast<std::size_t>(m)] += w * shifted[static_cast<std::size_t>(m)];
  };

  if (rule == AxleRule::all_axles) {
    detail::Cubic f{};
    for (std::size_t i = 0; i < n; ++i) {
      if (pc[i] >= 0) add_axle(f, i, x0);
    }
    emit(x0, x1, f);
    return;
  }

  // Clipped lines: cut the interval where any axle's ordinate changes sign;
  // between cuts each axle either counts in full or not at all.
  Real cuts[3 * kMaxAxles + 2];
  std::size_t count = 0;
  cuts[count++] = x0;
  for (std::size_t i = 0; i < n; ++i) {
    if (pc[i] < 0) continue;
    const auto k = static_cast<std::size_t>(pc[i]);
    const Real* roots = curve.sign_changes(k);
    for (std::size_t r = 0; r < curve.sign_change_count(k); ++r) {
      const Real u = knots_[k] + roots[r] - group_.offsets[i];
      if (u > x0 + kStationTolerance && u < x1 - kStationTolerance) cuts[count++] = u;
    }
  }
  cuts[count++] = x1;
  std::sort(cuts + 1, cuts + count - 1);
  const Real sign = sign_of(extreme);
  for (std::size_t c = 0; c + 1 < count; ++c) {
    const Real u0 = cuts[c];
    const Real u1 = cuts[c + 1];
    if (u1 - u0 <= 0.0) continue;
    const Real mid = 0.5 * (u0 + u1);
    detail::Cubic f{};
    for (std::size_t i = 0; i < n; ++i) {
      if (pc[i] < 0) continue;
      const auto k = static_cast<std::size_t>(pc[i]);
      const Real eta = detail::horner(curve.coefficients(k), mid + group_.offsets[i] - knots_[k]);
      if (sign * eta > 0.0) add_axle(f, i, u0);
    }
    emit(u0, u1, f);
  }
}

SweepExtremes TrainSweep::extremes(const EffectCurve& curve, AxleRule rule, SweepScratch& scratch) const {
  SweepExtremes best;
  best.minimum = best.maximum = SweepCandidate{breaks_.front(), Approach::from_left, 0.0, SweepCandidate::kOff};
  const std::size_t intervals = interval_count();
  if (intervals == 0) return best;
  bounds(curve, rule, scratch);
  const Real margin = kPruneTolerance * weight_sum_ * curve.scale();

  auto take_max = [&best](const SweepCandidate& c) {
    if (c.value > best.maximum.value) best.maximum = c;
  };
  auto take_min = [&best](const SweepCandidate& c) {
    if (c.value < best.minimum.value) best.minimum = c;
  };
  auto take_both = [&](const SweepCandidate& c) {
    take_max(c);
    take_min(c);
  };

  // Evaluate the most promising intervals first, so that the bound prunes
  // nearly everything else.
  const auto top =
      static_cast<std::size_t>(std::max_element(scratch.upper.begin(), scratch.upper.end()) - scratch.upper.begin());
  const auto bottom =
      static_cast<std::size_t>(std::min_element(scratch.lower.begin(), scratch.lower.end()) - scratch.lower.begin());
  if (scratch.upper[top] > margin) evaluate_interval(curve, rule, Extreme::maximum, top, take_max);
  if (scratch.lower[bottom] < -margin) evaluate_interval(curve, rule, Extreme::minimum, bottom, take_min);

  for (std::size_t j = 0; j < intervals; ++j) {
    const bool need_max = scratch.upper[j] > best.maximum.value + margin;
    const bool need_min = scratch.lower[j] < best.minimum.value - margin;
    if (!need_max && !need_min) continue;
    if (rule == AxleRule::all_axles) {
      evaluate_interval(curve, rule, Extreme::maximum, j, take_both);
    } else {
      if (need_max) evaluate_interval(curve, rule, Extreme::maximum, j, take_max);
      if (need_min) evaluate_interval(curve, rule, Extreme::minimum, j, take_min);
    }
  }
  return best;
}

void TrainSweep::candidates(const EffectCurve& curve, AxleRule rule, Extreme extreme, Real threshold,
                            std::vector<SweepCandidate>& out, SweepScratch& scratch) const {
  out.clear();
  const std::size_t intervals = interval_count();
  if (intervals == 0) return;
  bounds(curve, rule, scratch);
  const Real sign = sign_of(extreme);
  const Real margin = kPruneTolerance * weight_sum_ * curve.scale();
  const Real floor = sign * threshold - margin;
  // The group just before it comes onto the girder and just after it has
  // left: zero, and the ends of the runs where it is off the girder.
  const bool zero_counts = 0.0 >= floor;
  if (zero_counts) out.push_back(SweepCandidate{breaks_.front(), Approach::from_left, 0.0, SweepCandidate::kOff});
  const std::vector<Real>& bound = extreme == Extreme::maximum ? scratch.upper : scratch.lower;
  auto keep = [&](const SweepCandidate& c) {
    if (sign * c.value >= floor) out.push_back(c);
  };
  for (std::size_t j = 0; j < intervals; ++j) {
    if (sign * bound[j] < floor) continue;
    evaluate_interval(curve, rule, extreme, j, keep);
  }
  if (zero_counts) out.push_back(SweepCandidate{breaks_.back(), Approach::from_right, 0.0, SweepCandidate::kOff});
}

Real TrainSweep::axle_ordinate(const EffectCurve& curve, const SweepCandidate& candidate, std::size_t axle) const {
  if (candidate.interval == SweepCandidate::kOff) return 0.0;
  const int k = piece(candidate.interval, axle);
  if (k < 0) return 0.0;
  const auto piece_index = static_cast<std::size_t>(k);
  const Real t =
      std::clamp(candidate.lead + group_.offsets[axle] - knots_[piece_index], 0.0, curve.piece_length(piece_index));
  return detail::horner(curve.coefficients(piece_index), t);
}

}  // namespace tenthpoint::live_load
