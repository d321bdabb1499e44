#include "tools/bench_live_load/sampled_envelope.h"

#include <algorithm>
#include <array>
#include <cassert>
#include <cmath>
#include <deque>
#include <limits>
#include <stdexcept>

namespace tenthpoint::bench {
namespace {

using namespace tenthpoint::live_load;

constexpr Real kNaN = std::numeric_limits<Real>::quiet_NaN();

struct Grid {
  Real x0 = 0;
  Real step = 0;
  std::vector<Real> eta;

  [[nodiscard]] Real at(long j) const {
    return j < 0 || j >= static_cast<long>(eta.size()) ? 0.0 : eta[static_cast<std::size_t>(j)];
  }
};

long steps(Real length, Real step) { return static_cast<long>(std::llround(length / step)); }

// {max, -min} of the chain, both directions, each >= 0.
std::array<Real, 2> train_extremes(const Grid& c, const AxleChain& chain, bool drop) {
  std::size_t variable = chain.links.size();
  for (std::size_t l = 0; l < chain.links.size(); ++l) {
    if (!chain.links[l].variable()) continue;
    if (variable != chain.links.size()) throw std::runtime_error("sampled envelope: more than one variable link");
    variable = l;
  }
  const long n = static_cast<long>(c.eta.size());
  std::array<Real, 2> best{0.0, 0.0};
  std::vector<Real> a(static_cast<std::size_t>(n));
  std::vector<Real> b(static_cast<std::size_t>(n));
  std::deque<long> dq;
  for (int direction : {-1, 1}) {
    for (int k = 0; k < 2; ++k) {
      const Real sign = k == 0 ? 1.0 : -1.0;
      auto group = [&](std::size_t first, std::size_t last, std::vector<Real>& g) {
        std::vector<long> offsets{0};
        for (std::size_t i = first; i < last; ++i) {
          offsets.push_back(offsets.back() + direction * steps(chain.links[i].min, c.step));
        }
        for (long j = 0; j < n; ++j) {
          Real sum = 0.0;
          for (std::size_t i = first; i <= last; ++i) {
            const Real eta = c.at(j + offsets[i - first]);
            if (drop && sign * eta < 0.0) continue;
            sum += chain.weights[i] * eta;
          }
          g[static_cast<std::size_t>(j)] = sign * sum;
        }
        return offsets.back();
      };
      const std::size_t a_end = variable == chain.links.size() ? chain.axle_count() - 1 : variable;
      const long a_last = group(0, a_end, a);
      if (variable == chain.links.size()) {
        best[static_cast<std::size_t>(k)] =
            std::max(best[static_cast<std::size_t>(k)], *std::max_element(a.begin(), a.end()));
        continue;
      }
      group(variable + 1, chain.axle_count() - 1, b);
      const AxleLink& link = chain.links[variable];
      const long s_min = steps(link.min, c.step);
      const long s_max = link.bounded() ? steps(link.max, c.step) : 4 * n;
      const long lo = direction < 0 ? a_last - s_max : a_last + s_min;
      const long hi = direction < 0 ? a_last - s_min : a_last + s_max;
      dq.clear();
      long pushed = 0;
      for (long ja = 0; ja < n; ++ja) {
        const long wlo = ja + lo;
        const long whi = ja + hi;
        while (pushed < n && pushed <= whi) {
          while (!dq.empty() && b[static_cast<std::size_t>(dq.back())] <= b[static_cast<std::size_t>(pushed)]) {
            dq.pop_back();
          }
          dq.push_back(pushed++);
        }
        while (!dq.empty() && dq.front() < wlo) dq.pop_front();
        Real rear = (wlo < 0 || whi >= n) ? 0.0 : -std::numeric_limits<Real>::infinity();
        if (!dq.empty()) rear = std::max(rear, b[static_cast<std::size_t>(dq.front())]);
        best[static_cast<std::size_t>(k)] =
            std::max(best[static_cast<std::size_t>(k)], a[static_cast<std::size_t>(ja)] + rear);
      }
    }
  }
  return best;
}

Real lane_value(const Grid& c, const PreparedInfluenceLines& lines, EffectKind kind, Extreme extreme,
                const model::LaneLoad& lane, const std::optional<model::LaneConcentratedLoads>& concentrated) {
  const Real sign = sign_of(extreme);
  Real area = 0.0;
  for (std::size_t j = 0; j + 1 < c.eta.size(); ++j) {
    area += 0.5 * c.step * (std::max(sign * c.eta[j], 0.0) + std::max(sign * c.eta[j + 1], 0.0));
  }
  Real value = sign * lane.intensity * lane.factor * area;
  if (concentrated) {
    const Real force = lane.factor * (kind == EffectKind::moment ? concentrated->moment : concentrated->shear);
    const std::vector<Real>& bounds = lines.span_boundaries();
    std::vector<Real> span_peak(bounds.size() - 1, 0.0);
    for (std::size_t j = 0; j < c.eta.size(); ++j) {
      const Real x = c.x0 + static_cast<Real>(j) * c.step;
      for (std::size_t s = 0; s + 1 < bounds.size(); ++s) {
        if (x >= bounds[s] && x <= bounds[s + 1]) span_peak[s] = std::max(span_peak[s], sign * c.eta[j]);
      }
    }
    const auto first =
        static_cast<std::size_t>(std::max_element(span_peak.begin(), span_peak.end()) - span_peak.begin());
    value += sign * force * span_peak[first];
    if (kind == EffectKind::moment && extreme == Extreme::minimum && concentrated->second_load_for_negative_moment &&
        span_peak.size() > 1) {
      Real second = 0.0;
      for (std::size_t s = 0; s < span_peak.size(); ++s) {
        if (s != first) second = std::max(second, span_peak[s]);
      }
      value += sign * force * second;
    }
  }
  return value;
}

}  // namespace

SampledEnvelope sampled_envelope(const PreparedInfluenceLines& lines, const model::LoadModel& model,
                                 const MovingLoadEnvelope& analytic, Real step) {
  SampledEnvelope out;
  for (std::size_t c = 0; c < model.cases.size(); ++c) {
    const CaseEnvelope& ce = analytic.cases[c];
    SampledCaseValues values{EffectTable<Real>(lines.point_count(), lines.support_count()),
                             EffectTable<Real>(lines.point_count(), lines.support_count())};
    for (EffectKind kind : kEffectKinds) {
      for (auto& pair : values.train.of(kind)) pair.maximum = pair.minimum = kNaN;
      for (auto& pair : values.lane.of(kind)) pair.maximum = pair.minimum = kNaN;
    }
    Real chain_length = 0.0;
    if (ce.chain) {
      for (const AxleLink& l : ce.chain->links) chain_length += l.bounded() ? l.max : l.min;
    }
    const Real margin = step * std::ceil((chain_length + 1.0) / step);
    for (EffectKind kind : kEffectKinds) {
      const std::size_t count = kind == EffectKind::reaction ? lines.support_count() : lines.point_count();
      for (std::size_t index = 0; index < count; ++index) {
        const auto& applies = ce.values.of(kind)[index];
        if (!applies.maximum && !applies.minimum) continue;
        const analysis::PiecewiseCubic& curve = lines.curve(kind, index).curve();
        const analysis::ShearSide side = kind == EffectKind::shear_left    ? analysis::ShearSide::left
                                         : kind == EffectKind::shear_right ? analysis::ShearSide::right
                                                                           : analysis::ShearSide::none;
        const Real section =
            kind == EffectKind::reaction ? lines.support_station(index) : lines.points()[index].station;
        Grid grid;
        grid.step = step;
        grid.x0 = curve.start() - margin;
        const auto n = static_cast<std::size_t>(std::ceil((curve.end() - curve.start() + 2 * margin) / step)) + 1;
        grid.eta.resize(n);
        for (std::size_t j = 0; j < n; ++j) {
          grid.eta[j] =
              analysis::point_load_ordinate(curve, side, section, grid.x0 + static_cast<Real>(j) * step, 1e-9);
        }
        std::array<Real, 2> train{0.0, 0.0};
        if (ce.chain) train = train_extremes(grid, *ce.chain, ce.axle_rule == AxleRule::drop_relieving);
        for (Extreme x : kExtremes) {
          if (!applies[x]) continue;
          values.train.of(kind)[index][x] = x == Extreme::maximum ? train[0] : -train[1];
          values.lane.of(kind)[index][x] =
              ce.lane ? lane_value(grid, lines, kind, x, *ce.lane, ce.lane_concentrated) : 0.0;
        }
      }
    }
    out.cases.push_back(std::move(values));
  }
  return out;
}

}  // namespace tenthpoint::bench
