#include "engine/live_load/moving_load_envelope.h"

#include <algorithm>
#include <cmath>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/core/errors.h"
#include "engine/live_load/train_placement.h"
#include "tests/live_load/live_load_test_support.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::live_load;
using namespace tenthpoint::live_load::test;

namespace {

// The search is exact; what remains is rounding in the influence lines (a
// small stiffness solve) and in unit conversion.
constexpr Real kExact = 1e-9;

const CaseExtreme& value_of(const MovingLoadEnvelope& e, const std::string& case_id, EffectKey key) {
  for (const CaseEnvelope& c : e.cases) {
    if (c.case_id == case_id) {
      const auto& v = c.values.at(key);
      REQUIRE(v.has_value());
      return *v;
    }
  }
  FAIL("no case " << case_id);
  return *e.cases.front().values.at(key);
}

// Largest maximum moment over all analysis points of one case's train part.
Real largest_train_moment(const MovingLoadEnvelope& e, const std::string& case_id, std::size_t points) {
  Real best = 0;
  for (std::size_t p = 0; p < points; ++p) {
    best = std::max(best, value_of(e, case_id, {EffectKind::moment, p, Extreme::maximum}).train_value());
  }
  return best;
}

MovingLoadEnvelope hl93_on(const Girder& g) {
  return compute_moving_load_envelope(*g.prepared, hl93_model(), test_library());
}

}  // namespace

TEST_CASE("HL-93 on simple spans from 40 to 200 ft matches the resultant-rule closed forms", "[live_load][envelope]") {
  // Closed forms of project REFERENCE.md section 7 (statics of a simple span,
  // resultant rule): truck M = 72 (L/2 - 7/3)^2 / L - 112 kip-ft under the
  // middle axle at L/2 - 7/3 ft (all axles on the span, L >= 32.7 ft), end
  // shear 72 - 672/L; tandem M = 50 (L/2 - 1)^2 / L at L/2 - 1, V = 50 -
  // 100/L; LRFD lane M = 0.08 L^2 at midspan, V = 0.32 L at the end.
  for (Real L : {40.0, 50.0, 64.0, 80.0, 100.0, 125.0, 150.0, 175.0, 200.0}) {
    INFO("span " << L << " ft");
    const Girder g = prismatic_girder({L}, {L / 2 - 7.0 / 3.0, L / 2 - 1.0});
    const MovingLoadEnvelope e = hl93_on(g);
    const std::size_t truck_point = point_at(*g.prepared, ft(L / 2 - 7.0 / 3.0));
    const std::size_t tandem_point = point_at(*g.prepared, ft(L / 2 - 1.0));
    const std::size_t mid = point_at(*g.prepared, ft(L / 2));
    REQUIRE(truck_point < g.prepared->point_count());
    REQUIRE(tandem_point < g.prepared->point_count());

    const CaseExtreme& truck = value_of(e, "truck-and-lane", {EffectKind::moment, truck_point, Extreme::maximum});
    TP_CHECK_CLOSE(to_kip_ft(truck.train_value()), 72 * std::pow(L / 2 - 7.0 / 3.0, 2) / L - 112, kExact, 1.0);
    // The governing rear spacing on a simple span is the shortest, 14 ft.
    REQUIRE(truck.train->placement);
    TP_CHECK_CLOSE(truck.train->placement->variable_spacings[0], ft(14), kExact, 1.0);

    const CaseExtreme& tandem = value_of(e, "tandem-and-lane", {EffectKind::moment, tandem_point, Extreme::maximum});
    TP_CHECK_CLOSE(to_kip_ft(tandem.train_value()), 50 * std::pow(L / 2 - 1, 2) / L, kExact, 1.0);

    const CaseExtreme& lane = value_of(e, "truck-and-lane", {EffectKind::moment, mid, Extreme::maximum});
    TP_CHECK_CLOSE(to_kip_ft(lane.lane_value()), 0.08 * L * L, kExact, 1.0);

    const EffectKey end_shear{EffectKind::shear_right, 0, Extreme::maximum};
    TP_CHECK_CLOSE(to_kip(value_of(e, "truck-and-lane", end_shear).train_value()), 72 - 672 / L, kExact, 1.0);
    TP_CHECK_CLOSE(to_kip(value_of(e, "tandem-and-lane", end_shear).train_value()), 50 - 100 / L, kExact, 1.0);
    TP_CHECK_CLOSE(to_kip(value_of(e, "truck-and-lane", end_shear).lane_value()), 0.32 * L, kExact, 1.0);
    // The end reaction is the end shear: a load on the support goes straight
    // into it (statics).
    const EffectKey reaction{EffectKind::reaction, 0, Extreme::maximum};
    TP_CHECK_CLOSE(to_kip(value_of(e, "truck-and-lane", reaction).train_value()), 72 - 672 / L, kExact, 1.0);

    // A simple span has no negative moment region and no interior support:
    // the two-truck case applies nowhere.
    for (std::size_t p = 0; p < g.prepared->point_count(); ++p) {
      for (const CaseEnvelope& c : e.cases) {
        if (c.case_id == "two-trucks-and-lane") CHECK(!c.values.moment[p].minimum.has_value());
      }
    }
  }
}

TEST_CASE("HL-93 on short simple spans from 20 to 30 ft matches the tandem, lane and two-axle closed forms",
          "[live_load][envelope]") {
  // REFERENCE.md section 7 closed forms valid on short spans: tandem M = 50
  // (L/2 - 1)^2 / L, V = 50 - 100/L; lane M = 0.08 L^2, V = 0.32 L; truck end
  // shear 72 - 672/L (all three axles on the span, L >= 28 ft). Below 32.7 ft
  // the front axle cannot join the 32 kip pair: by the resultant rule the pair
  // gives M = 64 (L/2 - 3.5)^2 / L under one axle at L/2 - 3.5 (both on the
  // span for L >= 21 ft; statics).
  for (Real L : {20.0, 24.0, 28.0, 30.0}) {
    INFO("span " << L << " ft");
    const Girder g = prismatic_girder({L}, {L / 2 - 1.0, L / 2 - 3.5});
    const MovingLoadEnvelope e = hl93_on(g);
    const std::size_t tandem_point = point_at(*g.prepared, ft(L / 2 - 1.0));
    const std::size_t mid = point_at(*g.prepared, ft(L / 2));
    TP_CHECK_CLOSE(
        to_kip_ft(value_of(e, "tandem-and-lane", {EffectKind::moment, tandem_point, Extreme::maximum}).train_value()),
        50 * std::pow(L / 2 - 1, 2) / L, kExact, 1.0);
    TP_CHECK_CLOSE(to_kip_ft(value_of(e, "tandem-and-lane", {EffectKind::moment, mid, Extreme::maximum}).lane_value()),
                   0.08 * L * L, kExact, 1.0);
    const EffectKey end_shear{EffectKind::shear_right, 0, Extreme::maximum};
    TP_CHECK_CLOSE(to_kip(value_of(e, "tandem-and-lane", end_shear).train_value()), 50 - 100 / L, kExact, 1.0);
    TP_CHECK_CLOSE(to_kip(value_of(e, "tandem-and-lane", end_shear).lane_value()), 0.32 * L, kExact, 1.0);
    if (L >= 28.0) {
      TP_CHECK_CLOSE(to_kip(value_of(e, "truck-and-lane", end_shear).train_value()), 72 - 672 / L, kExact, 1.0);
    }
    if (L >= 21.0 && L < 32.0) {
      const std::size_t pair_point = point_at(*g.prepared, ft(L / 2 - 3.5));
      TP_CHECK_CLOSE(
          to_kip_ft(value_of(e, "truck-and-lane", {EffectKind::moment, pair_point, Extreme::maximum}).train_value()),
          64 * std::pow(L / 2 - 3.5, 2) / L, kExact, 1.0);
    }
  }
}

TEST_CASE("HS20 per-lane moment and shear at 100 ft agree with the Standard Specifications Appendix A",
          "[live_load][envelope]") {
  // AASHTO Standard Specifications 17th ed., Appendix A (maximum moments and
  // shears per lane for HS20 on simple spans), from memory via project
  // REFERENCE.md section 7: about 1524 kip-ft and 65.3 kip at 100 ft, truck
  // governing over the lane loading. The table rounds to 0.1.
  const Girder g = prismatic_girder({100}, {50 - 7.0 / 3.0});
  const MovingLoadEnvelope e = compute_moving_load_envelope(*g.prepared, hs20_model(), test_library());
  Real moment = 0;
  for (std::size_t p = 0; p < g.prepared->point_count(); ++p) {
    const CaseExtreme* v = e.governing_value({EffectKind::moment, p, Extreme::maximum});
    REQUIRE(v);
    moment = std::max(moment, v->total());
  }
  TP_CHECK_CLOSE(to_kip_ft(moment), 1524.0, 1e-4, 1.0);
  const CaseExtreme* shear = e.governing_value({EffectKind::shear_right, 0, Extreme::maximum});
  REQUIRE(shear);
  TP_CHECK_CLOSE(to_kip(shear->total()), 65.3, 1e-3, 1.0);
  CHECK(e.cases[*e.governing.shear_right[0].maximum].case_id == "truck");

  // The HS20 lane loading at midspan and at the end (REFERENCE.md section 7:
  // M = 0.08 L^2 + 4.5 L, V = 0.32 L + 26, the 18 kip and 26 kip loads at the
  // peak ordinates).
  const std::size_t mid = point_at(*g.prepared, ft(50));
  TP_CHECK_CLOSE(to_kip_ft(value_of(e, "lane", {EffectKind::moment, mid, Extreme::maximum}).total()), 800 + 450, kExact,
                 1.0);
  TP_CHECK_CLOSE(to_kip(value_of(e, "lane", {EffectKind::shear_right, 0, Extreme::maximum}).total()), 32 + 26, kExact,
                 1.0);
}

TEST_CASE("the tandem governs simple-span moment below the span where the closed forms cross",
          "[live_load][envelope]") {
  // Equating the closed forms 50 (L/2 - 1)^2 / L and 72 (L/2 - 7/3)^2 / L -
  // 112 gives 5.5 L^2 - 230 L + 342 = 0, L = (230 + sqrt(45376)) / 11 =
  // 40.274 ft (REFERENCE.md section 7 forms). Find the engine's crossover of
  // the largest train moments by bisection and compare.
  auto difference = [](Real L) {
    const Girder g = prismatic_girder({L}, {L / 2 - 7.0 / 3.0, L / 2 - 1.0});
    const MovingLoadEnvelope e = hl93_on(g);
    const std::size_t n = g.prepared->point_count();
    return largest_train_moment(e, "tandem-and-lane", n) - largest_train_moment(e, "truck-and-lane", n);
  };
  Real lo = 34.0;
  Real hi = 50.0;
  REQUIRE(difference(lo) > 0);  // tandem governs the shorter span
  REQUIRE(difference(hi) < 0);
  for (int i = 0; i < 40; ++i) {
    const Real mid = 0.5 * (lo + hi);
    (difference(mid) > 0 ? lo : hi) = mid;
  }
  TP_CHECK_CLOSE(0.5 * (lo + hi), (230 + std::sqrt(45376.0)) / 11, 1e-8, 1.0);
}

TEST_CASE("the two-truck case governs the pier moment of two equal 100 ft spans, not the short-span pier reaction",
          "[live_load][envelope]") {
  // LRFD 3.6.1.3.1: 90 % of two trucks (>= 50 ft apart) plus 90 % lane for
  // negative moment between contraflexure points and interior reactions.
  {
    const Girder g = prismatic_girder({100, 100});
    const MovingLoadEnvelope e = hl93_on(g);
    const std::size_t pier = point_at(*g.prepared, ft(100));
    const EffectKey key{EffectKind::moment, pier, Extreme::minimum};
    const CaseExtreme& one = value_of(e, "truck-and-lane", key);
    const CaseExtreme& two = value_of(e, "two-trucks-and-lane", key);
    INFO("pier moment: one truck + lane " << to_kip_ft(one.total()) << " kip-ft, two trucks + lane "
                                          << to_kip_ft(two.total()) << " kip-ft");
    CHECK(two.total() < one.total());
    CHECK(e.cases[*e.governing.at(key)].case_id == "two-trucks-and-lane");
    REQUIRE(two.train->placement);
    const TrainPlacement& at = *two.train->placement;
    // The gap is the chain's only variable link (the rear spacing is fixed at
    // 14 ft for this case) and respects the 50 ft minimum.
    CHECK(at.variable_spacings[0] >= ft(50) - 1e-9);
    const std::vector<Real> s = placed_spacings(*e.cases[2].chain, at);
    TP_CHECK_CLOSE(s[1], ft(14), kExact, 1.0);
    TP_CHECK_CLOSE(s[4], ft(14), kExact, 1.0);
    TP_CHECK_CLOSE(placed_effect(g.prepared->curve(EffectKind::moment, pier), *e.cases[2].chain, at), two.train_value(),
                   kExact, 1.0);

    // The lane part of the pier moment: 0.9 x 0.64 klf over the negative area
    // of M_B, -l^2/8 (integral of the Mueller-Breslau closed form
    // -a (l^2 - a^2) / (4 l^2) over both spans, REFERENCE.md section 7).
    TP_CHECK_CLOSE(to_kip_ft(two.lane_value()), -0.9 * 0.64 * 100 * 100 / 8, kExact, 1.0);
    const std::size_t support_b = 1;
    const EffectKey rb{EffectKind::reaction, support_b, Extreme::maximum};
    INFO("pier reaction: one truck + lane " << to_kip(value_of(e, "truck-and-lane", rb).total())
                                            << " kip, two trucks + lane "
                                            << to_kip(value_of(e, "two-trucks-and-lane", rb).total()) << " kip");
    CHECK(e.cases[*e.governing.at(rb)].case_id == "two-trucks-and-lane");
  }
  {
    // Two 30 ft spans: a second truck at least 50 ft behind barely reaches
    // the girder, so the single truck governs the pier reaction.
    const Girder g = prismatic_girder({30, 30});
    const MovingLoadEnvelope e = hl93_on(g);
    const EffectKey rb{EffectKind::reaction, 1, Extreme::maximum};
    INFO("pier reaction: one truck + lane " << to_kip(value_of(e, "truck-and-lane", rb).total())
                                            << " kip, two trucks + lane "
                                            << to_kip(value_of(e, "two-trucks-and-lane", rb).total()) << " kip");
    CHECK(e.cases[*e.governing.at(rb)].case_id != "two-trucks-and-lane");
    CHECK(value_of(e, "truck-and-lane", rb).total() > value_of(e, "two-trucks-and-lane", rb).total());
  }
}

TEST_CASE("the two-truck case applies to negative moment only between the points of contraflexure",
          "[live_load][envelope]") {
  // Three equal spans under uniform load: contraflexure at 0.8 l from the
  // ends and 0.2764 l from the interior supports (AISC Manual Table 3-23,
  // three equal spans: R_A = 0.4 wl, M_B = -0.10 wl^2).
  const Girder g = prismatic_girder({100, 100, 100});
  const MovingLoadEnvelope e = hl93_on(g);
  const CaseEnvelope& two = e.cases[2];
  for (std::size_t p = 0; p < g.prepared->point_count(); ++p) {
    const Real x = g.prepared->points()[p].station / units::kFoot;
    const bool inside = (x > 80 + 1e-6 && x < 127.64) || (x > 172.36 && x < 220 - 1e-6);
    INFO("station " << x << " ft");
    CHECK(two.values.moment[p].minimum.has_value() == inside);
    CHECK(!two.values.moment[p].maximum.has_value());
    CHECK(!two.values.shear_right[p].maximum.has_value());
  }
  CHECK(two.values.reaction[1].maximum.has_value());
  CHECK(!two.values.reaction[0].maximum.has_value());
}

TEST_CASE("a symmetric bridge gives mirror-image envelopes", "[live_load][envelope]") {
  // Mirror symmetry (statics): moment at x equals moment at L - x; shear
  // changes sign, so the maximum left of a point is minus the minimum right of
  // its mirror; reactions pair up.
  std::vector<Real> spans{ft(70), ft(110), ft(70)};
  const Real total = ft(250);
  analysis::FlexuralRigidity ei;
  ei.then_prismatic(ft(55), 1.0e10).then_prismatic(ft(30), 2.5e10).then_prismatic(ft(80), 1.4e10);
  ei.then_prismatic(ft(30), 2.5e10).then_prismatic(ft(55), 1.0e10);
  REQUIRE(std::abs(ei.end() - total) < 1e-9);
  const Girder g = make_girder(spans, ei);
  const PreparedInfluenceLines& lines = *g.prepared;
  const model::LoadModel hl93 = hl93_model();
  const model::LoadModel semi = single_train_model("3S2", "TYPE-3S2");
  const model::LoadModel notional = single_train_model("NRL", "NRL");
  const std::vector<MovingLoadEnvelope> all =
      compute_moving_load_envelopes(lines, {&hl93, &semi, &notional}, test_library());
  for (const MovingLoadEnvelope& e : all) {
    for (std::size_t p = 0; p < lines.point_count(); ++p) {
      const std::size_t q = point_at(lines, total - lines.points()[p].station);
      REQUIRE(q < lines.point_count());
      for (std::size_t c = 0; c < e.cases.size(); ++c) {
        const auto& v = e.cases[c].values;
        INFO(e.load_model_id << " case " << e.cases[c].case_id << " point " << p);
        for (Extreme x : kExtremes) {
          REQUIRE(v.moment[p][x].has_value() == v.moment[q][x].has_value());
          if (v.moment[p][x]) TP_CHECK_CLOSE(v.moment[p][x]->total(), v.moment[q][x]->total(), kExact, 1e3);
        }
        if (v.shear_left[p].maximum) {
          TP_CHECK_CLOSE(v.shear_left[p].maximum->total(), -v.shear_right[q].minimum->total(), kExact, 1e3);
          TP_CHECK_CLOSE(v.shear_left[p].minimum->total(), -v.shear_right[q].maximum->total(), kExact, 1e3);
        }
      }
    }
    for (std::size_t s = 0; s < 2; ++s) {
      const auto& a = e.governing_value({EffectKind::reaction, s, Extreme::maximum});
      const auto& b = e.governing_value({EffectKind::reaction, 3 - s, Extreme::maximum});
      REQUIRE(a);
      REQUIRE(b);
      TP_CHECK_CLOSE(a->total(), b->total(), kExact, 1e3);
    }
  }
}

TEST_CASE("relieving axles are dropped where the case says and recorded", "[live_load][envelope]") {
  // LRFD 3.6.1.3.1: axles that do not contribute to the extreme are left
  // out. Moment at 0.4 l of span 1 of two 100 ft spans: the front axle over
  // span 2 would relieve it (negative ordinate, Mueller-Breslau).
  const Girder g = prismatic_girder({100, 100});
  const MovingLoadEnvelope e = hl93_on(g);
  const std::size_t pier = point_at(*g.prepared, ft(100));
  const EffectCurve& curve = g.prepared->curve(EffectKind::moment, pier);
  const CaseExtreme& v = value_of(e, "truck-and-lane", {EffectKind::moment, pier, Extreme::maximum});
  // The pier moment influence line is never positive: every axle relieves,
  // nothing stands anywhere adversely.
  CHECK(v.train_value() == 0.0);
  CHECK(!v.train->placement);
  CHECK(v.lane_value() == 0.0);
  CHECK(curve.positive_area() == 0.0);

  for (const CaseEnvelope& c : e.cases) CHECK(c.axle_rule == AxleRule::drop_relieving);
  for (std::size_t p = 0; p < g.prepared->point_count(); ++p) {
    const CaseExtreme& m = value_of(e, "truck-and-lane", {EffectKind::moment, p, Extreme::minimum});
    if (!m.train->placement) continue;
    const TrainPlacement& at = *m.train->placement;
    const std::vector<Real> x = axle_stations(*e.cases[0].chain, at);
    const EffectCurve& c = g.prepared->curve(EffectKind::moment, p);
    for (std::size_t a = 0; a < x.size(); ++a) {
      const Real eta = c.ordinate(x[a], at.approach);
      if (at.is_dropped(a))
        CHECK(eta > 0.0);
      else
        CHECK(eta <= 1e-12);
    }
    TP_CHECK_CLOSE(placed_effect(c, *e.cases[0].chain, at), m.train_value(), kExact, 1e3);
  }
}

TEST_CASE("the LFR lane loading puts a second concentrated load in the other span for negative moment",
          "[live_load][envelope]") {
  // Two equal spans l = 100 ft, M_B(a) = -a (l^2 - a^2) / (4 l^2)
  // (Mueller-Breslau, REFERENCE.md section 7): peak -l / (6 sqrt 3) at
  // a = l / sqrt 3 in each span, negative area -l^2 / 8. HS20 lane:
  // 0.64 l^2 / 8 + 2 x 18 x l / (6 sqrt 3), negative.
  const Girder g = prismatic_girder({100, 100});
  const MovingLoadEnvelope e = compute_moving_load_envelope(*g.prepared, hs20_model(), test_library());
  const std::size_t pier = point_at(*g.prepared, ft(100));
  const CaseExtreme& v = value_of(e, "lane", {EffectKind::moment, pier, Extreme::minimum});
  const Real l = 100;
  TP_CHECK_CLOSE(to_kip_ft(v.total()), -(0.64 * l * l / 8 + 36 * l / (6 * std::sqrt(3.0))), 1e-8, 1.0);
  REQUIRE(v.lane->load_count == 2);
  // Each load at its span's peak; the peak stands between mesh nodes, so this
  // also checks the stationary-point search of the curve (exact cubic).
  TP_CHECK_CLOSE(v.lane->loads[0].station + v.lane->loads[1].station, ft(200), 1e-9, 1.0);
  TP_CHECK_CLOSE(std::min(v.lane->loads[0].station, v.lane->loads[1].station), ft(l / std::sqrt(3.0)), 1e-9, 1.0);
}

TEST_CASE("span conditions and effect filters select the cases", "[live_load][envelope]") {
  // MBE 6A.4.4.2.1 lane-type legal load (project REFERENCE.md section 3): the
  // 0.75 x truck + 0.2 klf case for spans over 200 ft only.
  model::LoadModel m;
  m.id = "LANE-LEGAL";
  model::LoadCase long_span = train_case("long-span", "TYPE-3S2");
  long_span.train_factor = 0.75;
  long_span.lane = model::LaneLoad{klf(0.2), 1.0};
  long_span.spans.longer_than = ft(200);
  long_span.effects = {model::LoadEffect::positive_moment, model::LoadEffect::shear, model::LoadEffect::end_reaction};
  m.cases = {long_span};
  const Girder g = prismatic_girder({150, 220});
  const MovingLoadEnvelope e = compute_moving_load_envelope(*g.prepared, m, test_library());
  for (std::size_t p = 0; p < g.prepared->point_count(); ++p) {
    const analysis::AnalysisPoint& pt = g.prepared->points()[p];
    // At the pier the longer adjacent span (220 ft) decides.
    const bool long_enough = pt.span == 1 || pt.support == std::size_t{1};
    INFO("point " << pt.label());
    CHECK(e.cases[0].values.moment[p].maximum.has_value() == long_enough);
    CHECK(!e.cases[0].values.moment[p].minimum.has_value());
    CHECK(e.cases[0].values.shear_right[p].maximum.has_value() == long_enough);
  }
  CHECK(!e.cases[0].values.reaction[0].maximum.has_value());  // end support of the 150 ft span
  CHECK(!e.cases[0].values.reaction[1].maximum.has_value());  // interior: not in the effect list
  CHECK(e.cases[0].values.reaction[2].maximum.has_value());
}

TEST_CASE("a case naming an unknown train is an input error at the case", "[live_load][envelope]") {
  const Girder g = prismatic_girder({60});
  model::LoadModel m = single_train_model("X", "NO-SUCH-TRAIN");
  m.cases[0].where = SourceLocation{"vehicles.yaml", 12, 7};
  try {
    (void)compute_moving_load_envelope(*g.prepared, m, test_library());
    FAIL("expected an InputError");
  } catch (const InputError& error) {
    REQUIRE(error.diagnostics().size() == 1);
    CHECK(error.diagnostics()[0].where.line == 12);
    CHECK(error.diagnostics()[0].field == "train");
    CHECK(error.diagnostics()[0].message == "load case truck names unknown train NO-SUCH-TRAIN");
  }
}
