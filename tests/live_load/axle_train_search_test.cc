#include "engine/live_load/axle_train_search.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <deque>
#include <limits>
#include <random>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/core/errors.h"
#include "engine/live_load/axle_chain.h"
#include "engine/live_load/train_placement.h"
#include "tests/live_load/live_load_test_support.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::live_load;
using namespace tenthpoint::live_load::test;

namespace {

// Brute force: every lead position on a 0.01 ft grid, and for a chain with a
// variable link every value of that link on the same grid (both groups of
// axles stand on grid points), evaluated straight from the analysis curve
// with analysis::point_load_ordinate. Independent of the search except for
// the influence line itself.
constexpr Real kStep = 0.01 * units::kFoot;

struct BruteCurve {
  Real x0 = 0;  // m, station of grid point 0
  std::vector<Real> eta;

  [[nodiscard]] Real at(long j) const {
    return j < 0 || j >= static_cast<long>(eta.size()) ? 0.0 : eta[static_cast<std::size_t>(j)];
  }
};

BruteCurve sample(const analysis::PiecewiseCubic& curve, analysis::ShearSide side, Real section, Real margin) {
  BruteCurve out;
  out.x0 = curve.start() - margin;
  const auto n = static_cast<std::size_t>(std::ceil((curve.end() - curve.start() + 2 * margin) / kStep)) + 1;
  out.eta.resize(n);
  for (std::size_t j = 0; j < n; ++j) {
    out.eta[j] = analysis::point_load_ordinate(curve, side, section, out.x0 + static_cast<Real>(j) * kStep, 1e-9);
  }
  return out;
}

long steps(Real length) {
  const Real s = length / kStep;
  REQUIRE(std::abs(s - std::round(s)) < 1e-6);
  return static_cast<long>(std::round(s));
}

// Both extremes of a chain with at most one variable link, both
// directions: {max, -min}, each >= 0.
std::array<Real, 2> brute_extremes(const BruteCurve& c, const AxleChain& chain, bool drop) {
  std::size_t variable = chain.links.size();
  for (std::size_t l = 0; l < chain.links.size(); ++l) {
    if (chain.links[l].variable()) {
      REQUIRE(variable == chain.links.size());
      variable = l;
    }
  }
  const long n = static_cast<long>(c.eta.size());
  std::array<Real, 2> best{0.0, 0.0};
  std::vector<Real> A(static_cast<std::size_t>(n));
  std::vector<Real> B(static_cast<std::size_t>(n));
  for (int direction : {-1, 1}) {
    for (int k = 0; k < 2; ++k) {
      const Real sign = k == 0 ? 1.0 : -1.0;
      // Group A: axles 0..variable (or all); group B: the rest. Offsets in steps.
      auto group_values = [&](std::size_t first, std::size_t last, std::vector<Real>& g) {
        std::vector<long> offsets{0};
        for (std::size_t i = first; i < last; ++i) {
          offsets.push_back(offsets.back() + direction * steps(chain.links[i].min));
        }
        for (long j = 0; j < n; ++j) {
          Real sum = 0.0;
          for (std::size_t a = first; a <= last; ++a) {
            const Real eta = c.at(j + offsets[a - first]);
            if (drop && sign * eta < 0.0) continue;
            sum += chain.weights[a] * eta;
          }
          g[static_cast<std::size_t>(j)] = sign * sum;
        }
        return offsets.back();
      };
      const std::size_t a_end = variable == chain.links.size() ? chain.axle_count() - 1 : variable;
      const long a_last = group_values(0, a_end, A);
      if (variable == chain.links.size()) {
        best[k] = std::max(best[k], *std::max_element(A.begin(), A.end()));
        continue;
      }
      group_values(variable + 1, chain.axle_count() - 1, B);
      const AxleLink& link = chain.links[variable];
      const long s_min = steps(link.min);
      const long s_max = link.bounded() ? steps(link.max) : 4 * n;
      // jB - jA in [lo, hi].
      const long lo = direction < 0 ? a_last - s_max : a_last + s_min;
      const long hi = direction < 0 ? a_last - s_min : a_last + s_max;
      // Sliding-window maximum of B; outside the sampled grid every axle of
      // B is off the girder (the margin exceeds the group length), worth zero.
      std::deque<long> dq;
      long pushed = 0;
      for (long ja = 0; ja < n; ++ja) {
        const long wlo = ja + lo;
        const long whi = ja + hi;
        while (pushed < n && pushed <= whi) {
          while (!dq.empty() && B[static_cast<std::size_t>(dq.back())] <= B[static_cast<std::size_t>(pushed)]) {
            dq.pop_back();
          }
          dq.push_back(pushed++);
        }
        while (!dq.empty() && dq.front() < wlo) dq.pop_front();
        Real b = (wlo < 0 || whi >= n) ? 0.0 : -std::numeric_limits<Real>::infinity();
        if (!dq.empty()) b = std::max(b, B[static_cast<std::size_t>(dq.front())]);
        best[k] = std::max(best[k], A[static_cast<std::size_t>(ja)] + b);
      }
    }
  }
  return best;
}

struct TestChain {
  std::string name;
  AxleChain chain;
  AxleRule rule;
};

std::vector<TestChain> test_chains() {
  std::vector<TestChain> out;
  // HL-93 truck, 14 to 30 ft rear spacing, relieving axles dropped (LRFD
  // 3.6.1.2.2, 3.6.1.3.1); and the same without dropping.
  out.push_back(
      {"HL-93 truck", axle_chain(train_case("t", "HL93-TRUCK", true), hl93_truck()), AxleRule::drop_relieving});
  out.push_back(
      {"HL-93 truck, all axles", axle_chain(train_case("t", "HL93-TRUCK"), hl93_truck()), AxleRule::all_axles});
  // NRL with its variable first spacing; Type 3S2 fixed.
  out.push_back({"NRL", axle_chain(train_case("n", "NRL"), nrl()), AxleRule::all_axles});
  out.push_back({"Type 3S2", axle_chain(train_case("s", "TYPE-3S2"), type_3s2()), AxleRule::all_axles});
  // LRFD 3.6.1.3.1 two trucks, 90 %, gap >= 50 ft, rear spacing fixed at 14 ft.
  model::LoadCase two = train_case("two", "HL93-TRUCK", true);
  two.count = 2;
  two.train_factor = 0.9;
  two.gap = model::AxleSpacing{ft(50), std::numeric_limits<Real>::infinity()};
  two.fixed_variable_spacing = ft(14);
  out.push_back({"two HL-93 trucks", axle_chain(two, hl93_truck()), AxleRule::drop_relieving});
  return out;
}

// Short spans (20 to 50 ft) put the peaks of a pier-moment line 14 to 30 ft
// apart, where the free rear spacing of the HL-93 truck governs; long spans
// test the rest.
Girder random_girder(std::mt19937& rng, bool short_spans) {
  std::uniform_int_distribution<int> span_count(2, 5);
  std::uniform_real_distribution<Real> span_ft(short_spans ? 20.0 : 40.0, short_spans ? 50.0 : 160.0);
  std::uniform_real_distribution<Real> ei(0.5e10, 3.0e10);
  std::uniform_int_distribution<int> pieces(1, 3);
  std::vector<Real> spans;
  analysis::FlexuralRigidity rigidity;
  const int n = span_count(rng);
  for (int s = 0; s < n; ++s) {
    // Whole tenths of a foot, so section changes are not too close to nodes.
    const Real length = ft(std::round(span_ft(rng) * 10) / 10);
    spans.push_back(length);
    const int k = pieces(rng);
    for (int i = 0; i < k; ++i) rigidity.then_prismatic(length / k, ei(rng));
  }
  return make_girder(spans, rigidity);
}

}  // namespace

TEST_CASE("the exact search is never below a 0.01 ft brute force and above it by no more than the sampling bound",
          "[live_load][search][brute_force]") {
  std::mt19937 rng(20240611);
  const std::vector<TestChain> chains = test_chains();
  TrainSearchScratch scratch;
  int compared = 0;
  for (int trial = 0; trial < 6; ++trial) {
    const Girder g = random_girder(rng, trial % 2 == 1);
    const PreparedInfluenceLines& lines = *g.prepared;
    std::vector<AxleTrainSearch> searches;
    for (const TestChain& c : chains) searches.emplace_back(c.chain, lines.knots());

    // Every moment, the right shear at every point, the left shear at the
    // supports, every reaction.
    std::vector<EffectKey> effects;
    for (std::size_t p = 0; p < lines.point_count(); ++p) {
      effects.push_back({EffectKind::moment, p, Extreme::maximum});
      effects.push_back({EffectKind::shear_right, p, Extreme::maximum});
      if (lines.points()[p].support) effects.push_back({EffectKind::shear_left, p, Extreme::maximum});
    }
    for (std::size_t s = 0; s < lines.support_count(); ++s)
      effects.push_back({EffectKind::reaction, s, Extreme::maximum});

    const Real margin = ft(150);  // longer than any chain here but the two-truck one, whose rear truck may leave
    for (const EffectKey& key : effects) {
      const EffectCurve& curve = lines.curve(key.kind, key.index);
      const analysis::ShearSide side = key.kind == EffectKind::shear_left    ? analysis::ShearSide::left
                                       : key.kind == EffectKind::shear_right ? analysis::ShearSide::right
                                                                             : analysis::ShearSide::none;
      const Real section =
          key.kind == EffectKind::reaction ? lines.support_station(key.index) : lines.points()[key.index].station;
      const BruteCurve brute = sample(curve.curve(), side, section, margin);
      const Real slope = curve.curve().derivative().max_abs();
      for (std::size_t c = 0; c < chains.size(); ++c) {
        const TestChain& chain = chains[c];
        const ExtremePair<TrainExtreme> exact = searches[c].search(curve, chain.rule, scratch);
        Real weight = 0;
        for (Real w : chain.chain.weights) weight += w;
        // Every group stands within one step of the optimum on its adverse
        // side, so each axle's ordinate is off by at most step x max slope;
        // doubled for the two groups of a variable link.
        const Real bound = 2.0 * kStep * weight * slope;
        const Real rounding = 1e-9 * weight * curve.scale();
        const std::array<Real, 2> sampled_both =
            brute_extremes(brute, chain.chain, chain.rule == AxleRule::drop_relieving);
        for (Extreme x : kExtremes) {
          const Real sign = sign_of(x);
          const Real analytic = sign * exact[x].value;
          const Real sampled = sampled_both[x == Extreme::maximum ? 0 : 1];
          INFO(chain.name << ", " << to_string(key.kind) << " " << key.index << " " << to_string(x) << ": analytic "
                          << analytic << ", sampled " << sampled << ", bound " << bound);
          CHECK(analytic >= sampled - rounding);
          CHECK(analytic - sampled <= bound + rounding);
          if (exact[x].placement) {
            // The recorded placement reproduces the value from the exact
            // ordinates, and respects every spacing range.
            TP_CHECK_CLOSE(sign * placed_effect(curve, chain.chain, *exact[x].placement), analytic, 1e-9,
                           weight * curve.scale());
            const std::vector<Real> s = placed_spacings(chain.chain, *exact[x].placement);
            for (std::size_t l = 0; l < s.size(); ++l) {
              CHECK(s[l] >= chain.chain.links[l].min - 1e-9);
              CHECK(s[l] <= chain.chain.links[l].max + 1e-9);
            }
          }
          ++compared;
        }
      }
    }
  }
  CHECK(compared > 1000);
}

TEST_CASE("a symmetric chain is run one way and a variable one both ways", "[live_load][search]") {
  const Girder g = prismatic_girder({60, 90});
  const AxleChain tandem = axle_chain(train_case("t", "HL93-TANDEM"), hl93_tandem());
  const AxleChain truck = axle_chain(train_case("t", "HL93-TRUCK"), hl93_truck());
  CHECK(tandem.symmetric());
  CHECK(!truck.symmetric());
  // Moment at 0.4 of the 60 ft span: the truck's best direction there puts
  // its heavy rear axles nearer the pier or the abutment; the search reports
  // which, and running the other way alone gives no more (LRFD 3.6.1.3.1
  // asks for the extreme over both).
  TrainSearchScratch scratch;
  const std::size_t p = point_at(*g.prepared, ft(24));
  const EffectCurve& curve = g.prepared->curve(EffectKind::moment, p);
  const AxleTrainSearch both(truck, g.prepared->knots());
  TrainSearchOptions one_way;
  one_way.both_directions = false;
  const AxleTrainSearch right_only(truck, g.prepared->knots(), one_way);
  const Real best = both.search(curve, AxleRule::all_axles, scratch).maximum.value;
  CHECK(best >= right_only.search(curve, AxleRule::all_axles, scratch).maximum.value);
}

TEST_CASE("bad load cases are input errors with the field named", "[live_load][search]") {
  model::LoadCase c = train_case("two", "HL93-TRUCK");
  c.count = 2;
  c.where = SourceLocation{"lib.yaml", 40, 9};
  try {
    (void)axle_chain(c, hl93_truck());
    FAIL("expected an InputError");
  } catch (const InputError& e) {
    CHECK(e.diagnostics()[0].field == "gap");
    CHECK(e.diagnostics()[0].message == "load case two: a case with more than one train needs a gap");
    CHECK(e.diagnostics()[0].where.line == 40);
  }
  model::LoadCase f = train_case("f", "HL93-TRUCK");
  f.train_factor = 0;
  CHECK_THROWS_AS(axle_chain(f, hl93_truck()), InputError);
}
