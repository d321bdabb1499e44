// Shared helpers for the live-load tests: US customary units, the vehicles
// and load models as the specifications define them (each with its article),
// and line girders with their influence lines.
#pragma once

#include <cmath>
#include <limits>
#include <memory>
#include <string>
#include <vector>

#include "engine/analysis/flexural_rigidity.h"
#include "engine/analysis/girder_layout.h"
#include "engine/analysis/influence_lines.h"
#include "engine/analysis/line_girder_model.h"
#include "engine/core/units.h"
#include "engine/live_load/prepared_influence_lines.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::live_load::test {

inline Real ft(Real x) { return x * units::kFoot; }
inline Real kip(Real x) { return x * units::kKip; }
inline Real kip_ft(Real x) { return x * units::kKipFoot; }
inline Real klf(Real x) { return x * units::kKipPerFoot; }
inline Real to_kip(Real n) { return n / units::kKip; }
inline Real to_kip_ft(Real nm) { return nm / units::kKipFoot; }

inline model::AxleTrain train(std::string id, std::vector<Real> kips, std::vector<model::AxleSpacing> spacings_ft) {
  model::AxleTrain t;
  t.id = std::move(id);
  t.name = t.id;
  for (Real w : kips) t.axle_weights.push_back(kip(w));
  for (const model::AxleSpacing& s : spacings_ft) t.spacings.push_back({ft(s.min), ft(s.max)});
  return t;
}

// AASHTO LRFD 3.6.1.2.2: 8, 32, 32 kip; 14 ft, then 14 to 30 ft.
inline model::AxleTrain hl93_truck() { return train("HL93-TRUCK", {8, 32, 32}, {{14, 14}, {14, 30}}); }
// AASHTO LRFD 3.6.1.2.3: two 25 kip axles 4 ft apart.
inline model::AxleTrain hl93_tandem() { return train("HL93-TANDEM", {25, 25}, {{4, 4}}); }
// AASHTO Standard Specifications 17th ed. 3.7.4 (HS20-44): the same axles
// with the 14 to 30 ft rear spacing.
inline model::AxleTrain hs20_truck() { return train("HS20-TRUCK", {8, 32, 32}, {{14, 14}, {14, 30}}); }
// Project REFERENCE.md section 4 (MBE 6A.4.4.2.1, from memory): Type 3S2 and
// the notional rating load with its first spacing taken as 6 to 14 ft (as the
// shipped library has it).
inline model::AxleTrain type_3s2() {
  return train("TYPE-3S2", {10, 15.5, 15.5, 15.5, 15.5}, {{11, 11}, {4, 4}, {22, 22}, {4, 4}});
}
inline model::AxleTrain nrl() {
  return train("NRL", {6, 8, 8, 17, 17, 8, 8, 8}, {{6, 14}, {4, 4}, {4, 4}, {4, 4}, {4, 4}, {4, 4}, {4, 4}});
}

inline model::LoadCase train_case(std::string id, std::string train_id, bool drop = false) {
  model::LoadCase c;
  c.id = std::move(id);
  c.train = std::move(train_id);
  c.drop_relieving_axles = drop;
  return c;
}

// AASHTO LRFD 3.6.1.3.1 with 3.6.1.2.4 (0.64 klf lane): truck + lane, tandem
// + lane, and for negative moment between contraflexure points and interior
// reactions 90 % of two trucks (>= 50 ft apart, 14 ft rear spacing) + 90 %
// of the lane.
inline model::LoadModel hl93_model() {
  model::LoadModel m;
  m.id = "HL93";
  m.name = "HL-93";
  m.category = model::VehicleCategory::design;
  model::LoadCase truck = train_case("truck-and-lane", "HL93-TRUCK", true);
  truck.lane = model::LaneLoad{klf(0.64), 1.0};
  model::LoadCase tandem = train_case("tandem-and-lane", "HL93-TANDEM", true);
  tandem.lane = model::LaneLoad{klf(0.64), 1.0};
  model::LoadCase two = train_case("two-trucks-and-lane", "HL93-TRUCK", true);
  two.count = 2;
  two.train_factor = 0.90;
  two.gap = model::AxleSpacing{ft(50), std::numeric_limits<Real>::infinity()};
  two.fixed_variable_spacing = ft(14);
  two.lane = model::LaneLoad{klf(0.64), 0.90};
  two.effects = {model::LoadEffect::negative_moment, model::LoadEffect::interior_reaction};
  two.between_contraflexure_points_only = true;
  m.cases = {truck, tandem, two};
  return m;
}

// AASHTO Standard Specifications 17th ed. 3.7 (HS20-44 truck) and 3.7.1.2
// (lane: 0.64 klf plus 18 kip for moment or 26 kip for shear; a second 18
// kip load in another span for negative moment, from memory).
inline model::LoadModel hs20_model() {
  model::LoadModel m;
  m.id = "HS20";
  m.name = "HS20-44";
  m.category = model::VehicleCategory::lfr_design;
  model::LoadCase truck = train_case("truck", "HS20-TRUCK", true);
  model::LoadCase lane;
  lane.id = "lane";
  lane.lane = model::LaneLoad{klf(0.64), 1.0};
  lane.lane_concentrated = model::LaneConcentratedLoads{kip(18), kip(26), true};
  m.cases = {truck, lane};
  return m;
}

inline model::LoadModel single_train_model(std::string id, std::string train_id, bool drop = false) {
  model::LoadModel m;
  m.id = id;
  m.name = id;
  m.cases = {train_case("truck", std::move(train_id), drop)};
  return m;
}

inline model::VehicleLibrary test_library() {
  model::VehicleLibrary lib;
  lib.id = "test";
  lib.trains = {hl93_truck(), hl93_tandem(), hs20_truck(), type_3s2(), nrl()};
  return lib;
}

// A line girder and its influence lines, kept together.
struct Girder {
  std::unique_ptr<analysis::LineGirderModel> model;
  analysis::InfluenceLines lines;
  std::unique_ptr<PreparedInfluenceLines> prepared;
};

inline Girder make_girder(const std::vector<Real>& spans_m, const analysis::FlexuralRigidity& rigidity,
                          std::vector<Real> named_stations_m = {}, std::vector<Real> hinges = {}) {
  Girder g;
  analysis::GirderLayout layout = analysis::continuous_girder("LL-TEST", spans_m);
  layout.hinge_stations = std::move(hinges);
  for (Real s : named_stations_m) layout.named_points.push_back({"named", s});
  g.model = std::make_unique<analysis::LineGirderModel>(layout, rigidity);
  g.lines = analysis::compute_influence_lines(*g.model);
  g.prepared = std::make_unique<PreparedInfluenceLines>(g.lines);
  return g;
}

// Prismatic girder of the given spans (ft), EI of a large steel girder, with
// extra analysis points at the given stations (ft).
inline Girder prismatic_girder(const std::vector<Real>& spans_ft, const std::vector<Real>& named_ft = {}) {
  std::vector<Real> spans;
  Real total = 0;
  for (Real s : spans_ft) {
    spans.push_back(ft(s));
    total += ft(s);
  }
  std::vector<Real> named;
  for (Real s : named_ft) named.push_back(ft(s));
  return make_girder(spans, analysis::FlexuralRigidity::uniform(total, 2.0e10), named);
}

inline std::size_t point_at(const PreparedInfluenceLines& lines, Real station_m) {
  for (std::size_t p = 0; p < lines.point_count(); ++p) {
    if (std::abs(lines.points()[p].station - station_m) < 1e-6) return p;
  }
  return lines.point_count();
}

}  // namespace tenthpoint::live_load::test
