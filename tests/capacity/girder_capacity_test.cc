#include "engine/capacity/girder_capacity.h"

#include <cmath>
#include <filesystem>
#include <string>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/io/bridge_reader.h"
#include "tests/capacity/capacity_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::capacity {
namespace {

using section::Side;
using test::ft;
using test::in;
using test::kip;
using test::kip_in;
using test::step;

// Hand values in kip and inch; only conversion round-off remains.
constexpr double kHand = 1e-9;

std::string inventory(const std::string& file) { return std::string(TENTHPOINT_SOURCE_DIR) + "/inventory/" + file; }

model::Bridge load(const std::string& file) { return io::load_bridge(inventory(file)); }

const model::GirderLine& girder(const model::Bridge& b, const std::string& id) {
  const model::GirderLine* g = b.find_girder(id);
  REQUIRE(g != nullptr);
  return *g;
}

bool finite_positive(double x) { return std::isfinite(x) && x > 0; }

// Every tenth point of every span, m.
std::vector<double> tenth_points(const model::Bridge& b) {
  std::vector<double> out;
  for (std::size_t span = 0; span < b.geometry.span_lengths.size(); ++span) {
    const double start = b.geometry.support_station(span);
    for (int k = 0; k <= 10; ++k) out.push_back(start + b.geometry.span_lengths[span] * k / 10.0);
  }
  return out;
}

TEST_CASE("every demo bridge has a capacity at every tenth point of every girder", "[capacity]") {
  // Common practice: a rating needs phi*Mn+, phi*Vn (and phi*Mn- where there
  // is negative-moment steel) at every analysis point. Computed values must
  // be finite and positive; given ones come from capacity.given.
  int bridges = 0;
  for (const auto& entry : std::filesystem::directory_iterator(std::string(TENTHPOINT_SOURCE_DIR) + "/inventory")) {
    if (entry.path().extension() != ".yaml") continue;
    const model::Bridge bridge = io::load_bridge(entry.path().string());
    ++bridges;
    const bool continuous = bridge.geometry.span_lengths.size() > 1;
    for (const model::GirderLine& line : bridge.girders) {
      const GirderCapacity capacity(bridge, line);
      for (const double x : tenth_points(bridge)) {
        for (const Side side : {Side::left, Side::right}) {
          INFO(bridge.identity.structure_id << " girder " << line.id << " at " << x << " m");
          const Resistance positive = capacity.flexure(x, MomentSign::positive, side);
          const Resistance negative = capacity.flexure(x, MomentSign::negative, side);
          const Resistance shear = capacity.shear(x, side);
          INFO(positive.reason << " | " << negative.reason << " | " << shear.reason);
          const ResistanceStatus expected = bridge.capacity.mode == model::CapacitySource::given
                                                ? ResistanceStatus::given
                                                : ResistanceStatus::computed;
          CHECK(positive.status == expected);
          CHECK(shear.status == expected);
          CHECK(finite_positive(positive.factored));
          CHECK(finite_positive(shear.factored));
          if (negative.available()) {
            CHECK(negative.status == expected);
            CHECK(finite_positive(negative.factored));
          } else {
            // Only a simple span without top steel (the slab strip) may lack it.
            CHECK_FALSE(continuous);
            CHECK_THAT(negative.reason, Catch::Contains("no tension reinforcement"));
          }
          if (model::is_steel(bridge.materials.kind) && bridge.capacity.mode == model::CapacitySource::computed) {
            const SteelServiceLimits service = capacity.steel_service(x, side);
            CHECK(service.status == ResistanceStatus::computed);
            CHECK(finite_positive(service.top_flange));
            CHECK(service.positive_moment.live_load.bottom.has_value());
          }
          if (bridge.materials.kind == model::MaterialKind::prestressed_concrete) {
            const PrestressedServiceLimits service = capacity.prestressed_service(x, side);
            CHECK(service.status == ResistanceStatus::computed);
            CHECK(finite_positive(service.effective_prestress));
            CHECK(service.prestress_bottom_stress < 0);
          }
        }
      }
    }
  }
  CHECK(bridges >= 14);
}

TEST_CASE("the Type IV demo girder's phi*Mn at midspan is the fps value worked by hand", "[capacity]") {
  // EV-0207 at 50 ft: the concrete_flexure test's hand calculation (LRFD
  // 5.6.3.1.1-1, -4; 5.6.3.2.2-1) through the section builder.
  const model::Bridge b = load("ev-0207-quarry-hill.yaml");
  const GirderCapacity capacity(b, girder(b, "G-INT"));
  const Resistance r = capacity.flexure(ft(50), MomentSign::positive);
  const double aps = 46 * 0.153;
  const double dp = 63.5 - (12 * 2.0 + 12 * 4.0 + 12 * 6.0 + 10 * 8.0) / 46.0;
  const double c = aps * 270 / (0.85 * 4 * 0.85 * 96 + 0.28 * aps * 270 / dp);
  const double mn = aps * 270 * (1 - 0.28 * c / dp) * (dp - 0.85 * c / 2);
  TP_CHECK_CLOSE(test::to_kip_in(r.nominal), mn, 1e-9, 1.0);
  CHECK(r.phi == Approx(1.0));
}

TEST_CASE("a non-composite rolled beam is braced at its diaphragms for lateral-torsional buckling", "[capacity]") {
  // EV-0077: W21x62, A36, braced at 0, 12 and 24 ft, so Lb = 12 ft at 6 ft.
  // Doubly symmetric: Dc = D/2; LRFD 6.10.8.2.3-2 with Cb = 1, by hand.
  const model::Bridge b = load("ev-0077-sawmill-road.yaml");
  const GirderCapacity capacity(b, girder(b, "B-INT"));
  CHECK(capacity.unbraced_length(ft(6)) == Approx(ft(12)));
  CHECK(capacity.unbraced_length(ft(12), Side::left) == Approx(ft(12)));
  const Resistance r = capacity.flexure(ft(6), MomentSign::positive);
  REQUIRE(r.flange_stress.has_value());
  const double rt = 8.24 / std::sqrt(12 * (1 + 9.88 * 0.40 / (3 * 8.24 * 0.615)));
  const double lp = rt * std::sqrt(29000 / 36.0);
  const double lr = 3.14159265358979323846 * rt * std::sqrt(29000 / 25.2);
  const double fnc = (1 - 0.3 * (144 - lp) / (lr - lp)) * 36;
  TP_CHECK_CLOSE(test::to_ksi(r.flange_stress->compression_flange), fnc, kHand, 1.0);
  CHECK(r.flange_stress->compression_flange_on_top);
  CHECK(r.article == "AASHTO LRFD 6.10.8.2.3");
}

// Mp of W33x130 under EV-0112's deck (102 x 7.5 in, 3 ksi, 1.5 in haunch)
// with a bottom flange tb thick: Table D6.1-1, PNA in the slab, by hand.
double w33_mp(double tb) {
  const double ps = 0.85 * 3 * 102 * 7.5;
  const double pc = 36 * 11.5 * 0.855;
  const double pw = 36 * 31.39 * 0.580;
  const double pt = 36 * 11.5 * tb;
  const double y = 7.5 * (pc + pw + pt) / ps;
  const double below = 7.5 - y + 1.5;
  return y * y * ps / 15 + pc * (below + 0.4275) + pw * (below + 0.855 + 15.695) +
         pt * (below + 0.855 + 31.39 + tb / 2);
}

TEST_CASE("50 percent bottom-flange loss lowers Mp to the hand value; the older inspection does not", "[capacity]") {
  // EV-0112 with a later inspection reporting 50 % loss of G-INT's bottom
  // flange from 30 to 40 ft: tb = 0.4275 in (area loss at constant width).
  model::Bridge b = load("ev-0112-willow-run.yaml");
  model::Inspection later = b.inspections.back();
  later.date = CalendarDate{2026, 4, 1};
  model::SectionLoss loss;
  loss.girder = "G-INT";
  loss.start = ft(30);
  loss.end = ft(40);
  loss.element = model::SectionElement::bottom_flange;
  loss.percent_loss = 50;
  later.section_loss = {loss};
  b.inspections.push_back(later);

  const GirderCapacity now(b, girder(b, "G-INT"));
  const Resistance reduced = now.flexure(ft(35), MomentSign::positive);
  TP_CHECK_CLOSE(test::to_kip_in(step(reduced.trace, "Mp")), w33_mp(0.855 * 0.5), kHand, 1.0);
  CHECK_THAT(reduced.warnings.back(),
             Catch::Contains("section reduced for 1 loss record(s) of the inspection of 2026-04-01"));
  // Outside the region the section is whole.
  const Resistance whole = now.flexure(ft(25), MomentSign::positive);
  TP_CHECK_CLOSE(test::to_kip_in(step(whole.trace, "Mp")), w33_mp(0.855), kHand, 1.0);
  CHECK(reduced.nominal < whole.nominal);

  // Rated as of 2025 the 2024 record is in force: no loss at 35 ft.
  CapacityOptions options;
  options.as_of = CalendarDate{2025, 1, 1};
  const GirderCapacity before(b, girder(b, "G-INT"), options);
  CHECK_FALSE(before.section_at(ft(35)).reduced());
  TP_CHECK_CLOSE(test::to_kip_in(step(before.flexure(ft(35), MomentSign::positive).trace, "Mp")), w33_mp(0.855), kHand,
                 1.0);
}

TEST_CASE("EV-0134 re-uses its 2019 section when rated as of 2020", "[capacity]") {
  const model::Bridge b = load("ev-0134-cooper-hollow.yaml");
  const GirderCapacity latest(b, girder(b, "B-EXT"));
  CapacityOptions options;
  options.as_of = CalendarDate{2020, 1, 1};
  const GirderCapacity older(b, girder(b, "B-EXT"), options);
  REQUIRE(older.inspection() != nullptr);
  CHECK(older.inspection()->date == CalendarDate{2019, 5, 8});
  CHECK(latest.section_at(ft(57)).reduced());
  CHECK_FALSE(older.section_at(ft(57)).reduced());
  // The 2025 losses (0.25 in of the 0.670 in flange, 0.15 in of the 0.520 in web) lower both resistances.
  CHECK(latest.flexure(ft(57), MomentSign::positive).nominal < older.flexure(ft(57), MomentSign::positive).nominal);
  CHECK(latest.shear(ft(57)).nominal < older.shear(ft(57)).nominal);
  const DeterioratedSection reduced = latest.section_at(ft(57));
  const model::Plate web = std::get<model::SteelIGirder>(*reduced.section.description).web;
  CHECK(test::to_in(web.thickness) == Approx(0.37));
}

TEST_CASE("web thickness loss lowers the riveted girder's end-panel shear to the hand value", "[capacity]") {
  // EV-0019 G-EXT at 1.5 ft: web 47 x 3/8 in less 0.15 in, stiffeners at
  // 36 in, Fy = 30 ksi; within one panel of the end: Vn = C Vp (6.10.9.3.3-1),
  // k = 5 + 5 / (do/D)^2, C by 6.10.9.3.2-6, Vp = 0.58 Fy D tw, by hand.
  const model::Bridge b = load("ev-0019-tanners-ford.yaml");
  const GirderCapacity capacity(b, girder(b, "G-EXT"));
  auto vn = [](double tw, double d_over_do, bool end_panel) {
    const double k = 5 + 5 * d_over_do * d_over_do;
    const double root2 = 29000 * k / 30;
    const double slenderness = 47 / tw;
    double c = 1.0;
    if (slenderness > 1.40 * std::sqrt(root2)) {
      c = 1.57 / (slenderness * slenderness) * root2;
    } else if (slenderness > 1.12 * std::sqrt(root2)) {
      c = 1.12 / slenderness * std::sqrt(root2);
    }
    const double vp = 0.58 * 30 * 47 * tw;
    const double ratio = 1 / d_over_do;
    return end_panel ? c * vp : vp * (c + 0.87 * (1 - c) / std::sqrt(1 + ratio * ratio));
  };
  const Resistance reduced = capacity.shear(ft(1.5));
  TP_CHECK_CLOSE(test::to_kip(reduced.nominal), vn(0.375 - 0.15, 47.0 / 36, true), kHand, 1.0);
  CHECK(reduced.article == "AASHTO LRFD 6.10.9.3.3");
  // 6 ft lies outside every loss of G-EXT: the whole 3/8 in web, interior panel.
  CHECK_FALSE(capacity.section_at(ft(6)).reduced());
  TP_CHECK_CLOSE(test::to_kip(capacity.shear(ft(6)).nominal), vn(0.375, 47.0 / 36, false), kHand, 1.0);
  // EV-0019 is rated by LFR: computed values say they are LRFD resistances.
  CHECK_THAT(reduced.warnings.back(), Catch::Contains("Load Factor Rating"));
}

TEST_CASE("bar loss lowers the slab strip's Mn to the hand value", "[capacity]") {
  // EV-0031: 12 in strip, h = 16.5, d = 14.44 in, As = 2.18 in^2, f'c = 3,
  // fy = 40 ksi; 10 % bar loss from 11 to 15 ft. Mn = As fy (d - a/2),
  // a = As fy / (0.85 f'c b) (LRFD 5.6.3.1.1-4, 5.6.3.2.3), by hand.
  const model::Bridge b = load("ev-0031-pasture-lane.yaml");
  const GirderCapacity capacity(b, girder(b, "STRIP"));
  auto mn = [](double as) { return as * 40 * (14.44 - as * 40 / (0.85 * 3 * 12) / 2); };
  TP_CHECK_CLOSE(test::to_kip_in(capacity.flexure(ft(13), MomentSign::positive).nominal), mn(2.18 * 0.9), kHand, 1.0);
  TP_CHECK_CLOSE(test::to_kip_in(capacity.flexure(ft(5), MomentSign::positive).nominal), mn(2.18), kHand, 1.0);
  // No top bars: negative moment has no resistance, and says so.
  const Resistance negative = capacity.flexure(ft(5), MomentSign::negative);
  CHECK(negative.status == ResistanceStatus::unavailable);
  CHECK_THAT(negative.reason, Catch::StartsWith("sections[SLAB-STRIP] negative moment: no tension reinforcement"));
}

TEST_CASE("an RC slab rated by LFR takes the Standard Specifications strength and shear", "[capacity][lfr]") {
  // EV-0031 (LFR): 12 in strip, d = 14.44 in, As = 2.18 in^2, f'c = 3 ksi,
  // fy = 40 ksi, no stirrups. Standard Specifications 8-17/8-18 with phi =
  // 0.90 (8.16.1.2.2) and 8-49, Vc = 2 sqrt(f'c) bw d (psi), phi = 0.85,
  // worked by hand (equation numbers from memory).
  const model::Bridge b = load("ev-0031-pasture-lane.yaml");
  REQUIRE(b.rating.method == model::RatingMethod::lfr);
  const GirderCapacity capacity(b, girder(b, "STRIP"));
  const Resistance m = capacity.flexure(ft(5), MomentSign::positive);
  REQUIRE(m.status == ResistanceStatus::computed);
  const double a = 2.18 * 40 / (0.85 * 3 * 12);
  TP_CHECK_CLOSE(test::to_kip_in(m.nominal), 2.18 * 40 * (14.44 - a / 2), kHand, 1.0);
  CHECK(m.phi == Approx(0.90));
  CHECK(m.article == "AASHTO Standard Specifications 8.16.3.2");
  const Resistance v = capacity.shear(ft(5));
  REQUIRE(v.status == ResistanceStatus::computed);
  const double vc = 2 * std::sqrt(3000.0) * 12 * 14.44 / 1000;  // kip
  TP_CHECK_CLOSE(test::to_kip(v.nominal), vc, kHand, 1.0);
  TP_CHECK_CLOSE(test::to_kip(v.factored), 0.85 * vc, kHand, 1.0);
  // Standard Specifications values carry no "LRFD used for LFR" warning.
  for (const std::string& w : m.warnings) CHECK_THAT(w, !Catch::Contains("Load Factor Rating"));
  for (const std::string& w : v.warnings) CHECK_THAT(w, !Catch::Contains("Load Factor Rating"));
}

TEST_CASE("the general shear procedure through the girder takes the demand at the section", "[capacity]") {
  // EV-0031 is rated by LFR, whose RC shear is Standard Specifications 8.16.6;
  // rated by LRFR here so that the LRFD 5.7.3.4.2 procedure applies.
  model::Bridge b = load("ev-0031-pasture-lane.yaml");
  b.rating.method = model::RatingMethod::lrfr;
  CapacityOptions options;
  options.shear_method = ConcreteShearMethod::general;
  const GirderCapacity capacity(b, girder(b, "STRIP"), options);
  CHECK(capacity.shear(ft(2)).status == ResistanceStatus::unavailable);
  const Resistance r = capacity.shear(ft(2), Side::right, ShearDemand{kip_in(300), kip(15), 0});
  REQUIRE(r.status == ResistanceStatus::computed);
  // No stirrups: beta by 5.7.3.4.2-2 and Vs = 0; Vn = Vc (hand check of eps_s):
  // dv = max(d - a/2, 0.9 d, 0.72 h); eps_s = (max(Mu, Vu dv)/dv + Vu) / (Es As).
  const double a = 2.18 * 40 / (0.85 * 3 * 12);
  const double dv = std::max({14.44 - a / 2, 0.9 * 14.44, 0.72 * 16.5});
  const double eps = (std::max(300.0, 15 * dv) / dv + 15) / (29000 * 2.18);
  CHECK(step(r.trace, "eps_s") == Approx(eps).epsilon(1e-9));
}

TEST_CASE("a section with only given properties cannot be computed and says what to give", "[capacity]") {
  model::Bridge b = load("ev-0042-grange-hall.yaml");
  b.capacity.mode = model::CapacitySource::computed;
  const GirderCapacity capacity(b, b.girders.front());
  const Resistance r = capacity.flexure(ft(10), MomentSign::positive);
  CHECK(r.status == ResistanceStatus::unavailable);
  CHECK_THAT(r.reason, Catch::Contains("has no description"));
  CHECK_THAT(r.reason, Catch::Contains("give capacity.given"));
}

TEST_CASE("given capacities warn where the inspection reports loss", "[capacity]") {
  model::Bridge b = load("ev-0058-harrow-lane.yaml");
  model::SectionLoss loss;
  loss.girder = "B-INT";
  loss.start = ft(0);
  loss.end = ft(4);
  loss.element = model::SectionElement::bars;
  loss.percent_loss = 15;
  b.inspections.back().section_loss = {loss};
  const GirderCapacity capacity(b, girder(b, "B-INT"));
  const Resistance r = capacity.shear(ft(2));
  CHECK(r.status == ResistanceStatus::given);
  TP_CHECK_CLOSE(test::to_kip(r.factored), 93.0, kHand, 1.0);  // the 1996 value, not reduced
  REQUIRE(r.warnings.size() == 1);
  CHECK_THAT(r.warnings[0], Catch::Contains("must judge whether the given value"));
  CHECK(capacity.shear(ft(20)).warnings.empty());
}

}  // namespace
}  // namespace tenthpoint::capacity
