#include "engine/live_load/train_sweep.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <limits>
#include <utility>

namespace tenthpoint::live_load {
namespace {

// Bounds and thresholds within this fraction of sum(w) * max|eta| count as
// reached: the incremental polynomial carries rounding of about 1e-13 of
// that scale.
constexpr Real kTolerance = 1e-11;

struct Event {
  Real station;
  std::uint32_t axle;
  std::uint32_t knot;
};

// The moving-load polynomial f0 + f1 t + f2 t^2 + f3 t^3 about the current
// breakpoint, in four scalars so that the compiler keeps it in registers.
struct Poly {
  Real f0 = 0;
  Real f1 = 0;
  Real f2 = 0;
  Real f3 = 0;

  // The same polynomial about t = h.
  void shift(Real h) {
    const Real c3h = f3 * h;
    f0 += h * (f1 + h * (f2 + c3h));
    f1 += h * (2.0 * f2 + 3.0 * c3h);
    f2 += 3.0 * c3h;
  }
  void add(Real w, const detail::Cubic& j) {
    f0 += w * j[0];
    f1 += w * j[1];
    f2 += w * j[2];
    f3 += w * j[3];
  }
  // True when f' changes sign inside (0, h): f' is quadratic, so it does if
  // its end values differ in sign, or if its vertex -f2 / (3 f3) lies inside
  // with a value of the opposite sign (tested without dividing).
  [[nodiscard]] bool slope_changes_sign(Real h) const {
    const Real d0 = f1;
    const Real dh = f1 + h * (2.0 * f2 + 3.0 * f3 * h);
    if ((d0 > 0.0) != (dh > 0.0)) return true;
    if (f2 * f3 >= 0.0 || std::abs(f2) >= 3.0 * std::abs(f3) * h) return false;
    // f'(vertex) = f1 - f2^2 / (3 f3), with the sign of (3 f1 f3 - f2^2) * sign(f3).
    const Real vertex = (3.0 * f1 * f3 - f2 * f2) * (f3 > 0.0 ? 1.0 : -1.0);
    return (vertex > 0.0) != (d0 > 0.0);
  }
};

// The zeros of f' inside (0, h) and the values there.
template <typename Report>
void report_stationary(const Poly& f, Real h, Real x0, Report&& report) {
  const detail::Cubic c{f.f0, f.f1, f.f2, f.f3};
  Real t[2];
  const int n = detail::stationary_points_inside(c, h, t);
  for (int i = 0; i < n; ++i) report(SweepCandidate{x0 + t[i], Approach::exact, detail::horner(c, t[i])});
}

// Sign of the piece just right of local coordinate t: the sign on the part
// between its sign changes that holds t.
int sign_right_of(const EffectCurve& curve, std::size_t piece, Real t) {
  const Real* changes = curve.sign_changes(piece);
  const std::size_t n = curve.sign_change_count(piece);
  Real lo = 0.0;
  Real hi = curve.piece_length(piece);
  for (std::size_t r = 0; r < n; ++r) {
    if (changes[r] > t + kStationTolerance) {
      hi = changes[r];
      break;
    }
    lo = changes[r];
  }
  const Real v = detail::horner(curve.coefficients(piece), 0.5 * (lo + hi));
  return v > 0.0 ? 1 : (v < 0.0 ? -1 : 0);
}

}  // namespace

TrainSweep::TrainSweep(AxleGroup group, const std::vector<Real>& knots) : group_(std::move(group)), knots_(knots) {
  const std::size_t n = group_.weights.size();
  assert(n > 0 && group_.offsets.size() == n);
  assert(knots_.size() >= 2);
  for (Real w : group_.weights) weight_sum_ += std::abs(w);

  std::vector<Event> events;
  events.reserve(n * knots_.size());
  for (std::size_t i = 0; i < n; ++i) {
    for (std::size_t k = 0; k < knots_.size(); ++k) {
      events.push_back({knots_[k] - group_.offsets[i], static_cast<std::uint32_t>(i), static_cast<std::uint32_t>(k)});
    }
  }
  std::sort(events.begin(), events.end(), [](const Event& a, const Event& b) { return a.station < b.station; });
  crossings_.reserve(events.size());
  std::size_t e = 0;
  while (e < events.size()) {
    // Crossings closer than the station tolerance happen at one breakpoint:
    // a state where one of them has happened and the other not is not a
    // position any train can take.
    const Real at = events[e].station;
    crossing_begin_.push_back(static_cast<std::uint32_t>(crossings_.size()));
    breaks_.push_back(at);
    for (; e < events.size() && events[e].station - at <= kStationTolerance; ++e) {
      crossings_.push_back({group_.weights[events[e].axle], events[e].knot});
    }
  }
  crossing_begin_.push_back(static_cast<std::uint32_t>(crossings_.size()));

  // Blocks and the pieces each axle touches over them.
  const std::size_t last_break = breaks_.size() - 1;
  const auto pieces = static_cast<std::int32_t>(knots_.size() - 1);
  const Real front = knots_.front();
  const Real back = knots_.back();
  for (std::size_t a = 0; a < last_break; a += kBlockBreaks) {
    block_first_.push_back(static_cast<std::uint32_t>(a));
    const std::size_t b = std::min(a + kBlockBreaks, last_break);
    for (std::size_t i = 0; i < n; ++i) {
      const Real p0 = breaks_[a] + group_.offsets[i];
      const Real p1 = breaks_[b] + group_.offsets[i];
      Reach r;
      if (p1 > front + kStationTolerance && p0 < back - kStationTolerance) {
        // Just right of p0, and just left of p1 (snapped onto knots).
        const auto right_of = [&](Real x) {
          return static_cast<std::int32_t>(std::upper_bound(knots_.begin(), knots_.end(), x + kStationTolerance) -
                                           knots_.begin()) -
                 1;
        };
        const auto left_of = [&](Real x) {
          return static_cast<std::int32_t>(std::lower_bound(knots_.begin(), knots_.end(), x - kStationTolerance) -
                                           knots_.begin()) -
                 1;
        };
        r.start = p0 >= front - kStationTolerance ? std::min(right_of(p0), pieces - 1) : -1;
        r.first = r.start >= 0 ? r.start : 0;
        r.last = p1 <= back + kStationTolerance ? std::max(left_of(p1), std::int32_t{0}) : pieces - 1;
        r.partly_off = p0 < front + kStationTolerance || p1 > back - kStationTolerance;
        // The cells holding p0 (from the right) and p1 (from the left).
        constexpr auto cells = static_cast<Real>(EffectCurve::kCells);
        const auto cell_of = [&](std::int32_t k, Real x, bool from_right) {
          const auto piece = static_cast<std::size_t>(k);
          const Real f = (x - knots_[piece]) / (knots_[piece + 1] - knots_[piece]) * cells;
          const Real c = from_right ? std::floor(f + 1e-9) : std::ceil(f - 1e-9) - 1.0;
          const auto cell = static_cast<std::int32_t>(std::clamp(c, 0.0, cells - 1.0));
          return k * static_cast<std::int32_t>(EffectCurve::kCells) + cell;
        };
        r.first_cell = r.start >= 0 ? cell_of(r.first, p0, true) : 0;
        r.last_cell = p1 <= back + kStationTolerance ? cell_of(r.last, p1, false)
                                                     : pieces * static_cast<std::int32_t>(EffectCurve::kCells) - 1;
        r.last_cell = std::max(r.last_cell, r.first_cell);
      }
      reach_.push_back(r);
      BoundTerm t;
      if (r.first >= 0) {
        t.weight = group_.weights[i];
        const auto [a_slot, b_slot] =
            EffectCurve::cell_range_slots(static_cast<std::size_t>(r.first_cell), static_cast<std::size_t>(r.last_cell),
                                          static_cast<std::size_t>(pieces) * EffectCurve::kCells);
        t.slot_a = a_slot;
        t.slot_b = b_slot;
        t.partly_off = r.partly_off;
      }
      terms_.push_back(t);
    }
  }
}

void TrainSweep::bound_blocks(const EffectCurve& curve, AxleRule rule, SweepScratch& scratch) const {
  if (scratch.bounds_sweep == this && scratch.bounds_curve == &curve && scratch.bounds_rule == static_cast<int>(rule)) {
    return;
  }
  scratch.bounds_sweep = this;
  scratch.bounds_curve = &curve;
  scratch.bounds_rule = static_cast<int>(rule);
  const std::size_t blocks = block_count();
  const std::size_t n = axle_count();
  scratch.upper.resize(blocks);
  scratch.lower.resize(blocks);
  const Real* table_max = curve.cell_table_max();
  const Real* table_min = curve.cell_table_min();
  // An axle that is off the girder for part of the block, or whose ordinate
  // is clipped at zero, may contribute zero: the bound then includes zero.
  constexpr Real kNone = std::numeric_limits<Real>::infinity();
  const Real clip = rule == AxleRule::drop_relieving ? 0.0 : kNone;
  const BoundTerm* term = terms_.data();
  for (std::size_t j = 0; j < blocks; ++j) {
    Real up = 0.0;
    Real lo = 0.0;
    for (std::size_t i = 0; i < n; ++i, ++term) {
      const Real zero = term->partly_off ? 0.0 : clip;
      const Real hi = std::max(std::max(table_max[term->slot_a], table_max[term->slot_b]), -zero);
      const Real low = std::min(std::min(table_min[term->slot_a], table_min[term->slot_b]), zero);
      up += term->weight * hi;
      lo += term->weight * low;
    }
    scratch.upper[j] = up;
    scratch.lower[j] = lo;
  }
}

template <bool Clipped, typename Sink>
void TrainSweep::evaluate_block(const EffectCurve& curve, std::size_t j, Extreme which, SweepScratch& scratch,
                                Sink& sink) const {
  const std::size_t n = axle_count();
  const std::size_t a = block_first_[j];
  const std::size_t b = j + 1 < block_count() ? block_first_[j + 1] : breaks_.size() - 1;
  const Reach* reach = &reach_[j * n];
  const int wanted_sign = which == Extreme::maximum ? 1 : -1;
  auto report = [&](const SweepCandidate& c) {
    if (!Clipped || which == Extreme::maximum) sink.maximum(c);
    if (!Clipped || which == Extreme::minimum) sink.minimum(c);
  };

  // F just right of the block's first breakpoint, from the pieces under the
  // axles (the clipped line keeps an axle only where its sign is wanted).
  const Real x0 = breaks_[a];
  Poly f;
  for (std::size_t i = 0; i < n; ++i) {
    if (reach[i].start < 0) continue;
    const auto k = static_cast<std::size_t>(reach[i].start);
    const Real t = std::max(0.0, x0 + group_.offsets[i] - knots_[k]);
    if (Clipped && sign_right_of(curve, k, t) != wanted_sign) continue;
    const detail::Cubic c = detail::taylor_shift(curve.coefficients(k), t);
    f.add(group_.weights[i], c);
  }

  // Where an axle crosses a sign change of the curve, the clipped line kinks.
  auto& events = scratch.roots;
  events.clear();
  if constexpr (Clipped) {
    const Real x1 = breaks_[b];
    const std::vector<Real>& stations = curve.sign_change_stations();
    for (std::size_t i = 0; i < n; ++i) {
      if (reach[i].first < 0) continue;
      const Real lo = knots_[static_cast<std::size_t>(reach[i].first)];
      const Real hi = knots_[static_cast<std::size_t>(reach[i].last) + 1];
      const auto begin = std::lower_bound(stations.begin(), stations.end(), lo);
      for (auto it = begin; it != stations.end() && *it <= hi; ++it) {
        const Real x = *it - group_.offsets[i];
        if (x > x0 + kStationTolerance && x < x1) {
          events.push_back({x, group_.weights[i], static_cast<std::uint32_t>(it - stations.begin())});
        }
      }
    }
    std::sort(events.begin(), events.end(),
              [](const SweepScratch::RootEvent& p, const SweepScratch::RootEvent& q) { return p.station < q.station; });
  }

  Real origin = x0;
  auto advance = [&](Real x) {
    const Real h = x - origin;
    if (!(h > 0.0)) return;
    if (f.slope_changes_sign(h)) report_stationary(f, h, origin, report);
    f.shift(h);
    origin = x;
  };
  report(SweepCandidate{x0, Approach::from_right, f.f0});
  std::size_t next = 0;
  for (std::size_t m = a + 1; m <= b; ++m) {
    const Real x = breaks_[m];
    if constexpr (Clipped) {
      for (; next < events.size() && events[next].station < x; ++next) {
        // The clipped line is continuous at a sign change: one value there.
        advance(events[next].station);
        f.add(events[next].weight, curve.sign_change_jump(events[next].root, which));
        report(SweepCandidate{events[next].station, Approach::exact, f.f0});
      }
    }
    advance(x);
    report(SweepCandidate{x, Approach::from_left, f.f0});
    if (m == b) break;
    for (std::uint32_t c = crossing_begin_[m]; c < crossing_begin_[m + 1]; ++c) {
      if constexpr (Clipped) {
        f.add(crossings_[c].weight, curve.clipped_jump(crossings_[c].knot, which));
      } else {
        f.add(crossings_[c].weight, curve.jump(crossings_[c].knot));
      }
    }
    report(SweepCandidate{x, Approach::from_right, f.f0});
  }
}

SweepExtremes TrainSweep::extremes(const EffectCurve& curve, AxleRule rule, SweepScratch& scratch,
                                   ExtremePair<Real> known) const {
  struct Best {
    SweepExtremes out;
    void maximum(const SweepCandidate& c) {
      if (c.value > out.maximum.value) out.maximum = c;
    }
    void minimum(const SweepCandidate& c) {
      if (c.value < out.minimum.value) out.minimum = c;
    }
  } best;
  // Off the girder the effect is zero: the starting point of both.
  best.out.maximum = best.out.minimum = SweepCandidate{breaks_.front(), Approach::from_left, 0.0};
  const std::size_t blocks = block_count();
  if (blocks == 0) return best.out;
  bound_blocks(curve, rule, scratch);
  const Real margin = kTolerance * scale(curve);
  const bool clipped = rule == AxleRule::drop_relieving;
  // done[j]: bit 0 evaluated for the maximum, bit 1 for the minimum.
  scratch.done.assign(blocks, 0);
  auto& order = scratch.order;
  for (Extreme x : kExtremes) {
    const std::uint8_t bit = x == Extreme::maximum ? 1 : 2;
    const Real sign = sign_of(x);
    const std::vector<Real>& bound = x == Extreme::maximum ? scratch.upper : scratch.lower;
    auto reached = [&] {
      return std::max(sign * known[x],
                      sign * (x == Extreme::maximum ? best.out.maximum.value : best.out.minimum.value));
    };
    // The blocks whose bound beats what is known, best bound first: once the
    // best value is in hand, the others' bounds stop the search.
    order.clear();
    const Real start = reached() + margin;
    for (std::size_t j = 0; j < blocks; ++j) {
      if (!(scratch.done[j] & bit) && sign * bound[j] > start) order.push_back(static_cast<std::uint32_t>(j));
    }
    std::sort(order.begin(), order.end(),
              [&](std::uint32_t a, std::uint32_t b) { return sign * bound[a] > sign * bound[b]; });
    for (std::uint32_t j : order) {
      if (scratch.done[j] & bit) continue;
      if (!(sign * bound[j] > reached() + margin)) break;
      if (clipped) {
        evaluate_block<true>(curve, j, x, scratch, best);
        scratch.done[j] |= bit;
      } else {
        evaluate_block<false>(curve, j, x, scratch, best);
        scratch.done[j] = 3;
      }
    }
  }
  return best.out;
}

SweepExtremes TrainSweep::candidates(const EffectCurve& curve, AxleRule rule, const SweepKeep& keep,
                                     SweepScratch& scratch) const {
  const Real tolerance = kTolerance * scale(curve);
  struct Keep {
    SweepExtremes out;
    std::vector<SweepCandidate>* list[2];
    Real floor[2];
    void maximum(const SweepCandidate& c) {
      if (c.value > out.maximum.value) out.maximum = c;
      if (list[0] && c.value >= floor[0]) list[0]->push_back(c);
    }
    void minimum(const SweepCandidate& c) {
      if (c.value < out.minimum.value) out.minimum = c;
      if (list[1] && -c.value >= floor[1]) list[1]->push_back(c);
    }
  } sink{{}, {keep.list[0], keep.list[1]}, {keep.floor[0] - tolerance, keep.floor[1] - tolerance}};
  const SweepCandidate start{breaks_.front(), Approach::from_left, 0.0};
  const SweepCandidate end{breaks_.back(), Approach::from_right, 0.0};
  sink.out.maximum = sink.out.minimum = start;
  sink.maximum(start);
  sink.minimum(start);
  const std::size_t blocks = block_count();
  if (blocks > 0) {
    bound_blocks(curve, rule, scratch);
    for (std::size_t j = 0; j < blocks; ++j) {
      const bool need_max = keep.list[0] && scratch.upper[j] >= sink.floor[0];
      const bool need_min = keep.list[1] && -scratch.lower[j] >= sink.floor[1];
      if (rule == AxleRule::drop_relieving) {
        if (need_max) evaluate_block<true>(curve, j, Extreme::maximum, scratch, sink);
        if (need_min) evaluate_block<true>(curve, j, Extreme::minimum, scratch, sink);
      } else if (need_max || need_min) {
        evaluate_block<false>(curve, j, Extreme::maximum, scratch, sink);
      }
    }
  }
  // After the last breakpoint every axle is off the girder.
  sink.maximum(end);
  sink.minimum(end);
  return sink.out;
}

void TrainSweep::candidates(const EffectCurve& curve, AxleRule rule, Extreme extreme, Real threshold,
                            std::vector<SweepCandidate>& out, SweepScratch& scratch) const {
  out.clear();
  SweepKeep keep;
  const std::size_t e = extreme == Extreme::maximum ? 0 : 1;
  keep.list[e] = &out;
  keep.floor[e] = sign_of(extreme) * threshold;
  (void)candidates(curve, rule, keep, scratch);
}

}  // namespace tenthpoint::live_load
