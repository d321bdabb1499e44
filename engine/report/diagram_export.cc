#include "engine/report/diagram_export.h"

#include <algorithm>
#include <cmath>
#include <optional>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "engine/core/csv_field.h"

#include "engine/analysis/result_table.h"

namespace tenthpoint::report {
namespace {

using units::Quantity;
using units::UnitSystem;

// Influence ordinates are effect per unit force: a moment line is a length,
// shear and reaction lines are dimensionless. Deflection lines (compliances)
// are not exported.
std::optional<Quantity> ordinate_quantity(const std::string& effect) {
  if (effect == "moment" || effect == "support_moment") return Quantity::length;
  if (effect == "deflection") return std::nullopt;
  return Quantity::dimensionless;
}

std::string ordinate_label(Quantity q, UnitSystem system) {
  if (q == Quantity::length)
    return fmt::format("{0}/{1}", units::label(Quantity::moment, system), units::label(Quantity::force, system));
  return "1";
}

// Every exported curve of a girder line, in the order of analysis::named_curves.
template <typename Visit>
void for_each_influence(const analysis::GirderLineAnalysis& g, Visit&& visit) {
  for (const analysis::NamedCurve& c : analysis::named_curves(g.live_influence)) {
    const std::optional<Quantity> q = ordinate_quantity(c.effect);
    if (q) visit(c, *q);
  }
}

// Round-off of the solve leaves values like -1e-13 where the exact answer is
// zero (a moment at a pin); written for people, those read as zero.
Real tidy(Real value, Real scale) {
  constexpr Real kRelative = 1e-10;  // far below any printed digit
  return std::abs(value) <= kRelative * scale ? 0.0 : value;
}

Real largest(const std::vector<Real>& values) {
  Real m = 0;
  for (Real v : values) m = std::max(m, std::abs(v));
  return m;
}

}  // namespace

std::string diagrams_csv(const std::vector<analysis::GirderLineAnalysis>& girders, UnitSystem system,
                         const DiagramExportOptions& options) {
  std::string out = "girder,kind,curve,point,point_station,x,value,unit\n";
  const auto len = [&](Real x) { return units::from_internal(x, Quantity::length, system); };
  for (const analysis::GirderLineAnalysis& g : girders) {
    for_each_influence(g, [&](const analysis::NamedCurve& c, Quantity q) {
      const analysis::SampledCurve s = c.curve->sample(options.interior_points);
      const Real scale = largest(s.values);
      const std::string unit = ordinate_label(q, system);
      for (std::size_t k = 0; k < s.stations.size(); ++k)
        out += fmt::format("{},influence,{},{},{:.6g},{:.6g},{:.9g},{}\n", csv_field(g.girder_id), c.effect,
                           csv_field(c.where), len(c.station), len(s.stations[k]),
                           units::from_internal(tidy(s.values[k], scale), q, system), unit);
    });
    for (const analysis::ComponentEffects& c : g.dead_loads) {
      const std::string component(model::to_string(c.component));
      const auto& points = g.live_influence.points;
      const Real m_scale = largest(c.effects.moment);
      const Real v_scale = std::max(largest(c.effects.shear_left), largest(c.effects.shear_right));
      for (std::size_t i = 0; i < points.size() && i < c.effects.moment.size(); ++i) {
        const std::string label = csv_field(points[i].label());
        const Real x = len(points[i].station);
        out +=
            fmt::format("{},dead_load,{} moment,{},{:.6g},{:.6g},{:.9g},{}\n", csv_field(g.girder_id), component, label,
                        x, x, units::from_internal(tidy(c.effects.moment[i], m_scale), Quantity::moment, system),
                        units::label(Quantity::moment, system));
        out += fmt::format("{},dead_load,{} shear_left,{},{:.6g},{:.6g},{:.9g},{}\n", csv_field(g.girder_id), component,
                           label, x, x,
                           units::from_internal(tidy(c.effects.shear_left[i], v_scale), Quantity::force, system),
                           units::label(Quantity::force, system));
        out += fmt::format("{},dead_load,{} shear_right,{},{:.6g},{:.6g},{:.9g},{}\n", csv_field(g.girder_id),
                           component, label, x, x,
                           units::from_internal(tidy(c.effects.shear_right[i], v_scale), Quantity::force, system),
                           units::label(Quantity::force, system));
      }
    }
  }
  return out;
}

std::string diagrams_json(const std::vector<analysis::GirderLineAnalysis>& girders, UnitSystem system,
                          const DiagramExportOptions& options) {
  using nlohmann::json;
  const auto len = [&](Real x) { return units::from_internal(x, Quantity::length, system); };
  json doc;
  doc["units"] = {{"system", std::string(units::to_string(system))},
                  {"station", std::string(units::label(Quantity::length, system))},
                  {"moment", std::string(units::label(Quantity::moment, system))},
                  {"force", std::string(units::label(Quantity::force, system))},
                  {"moment_influence", ordinate_label(Quantity::length, system)},
                  {"shear_influence", "1"}};
  doc["sign_convention"] =
      "moment positive sagging; shear is the resultant of the forces left of the cut, upward positive; "
      "reactions upward positive; influence ordinates are for a unit downward load";
  json lines = json::array();
  for (const analysis::GirderLineAnalysis& g : girders) {
    json girder;
    girder["girder"] = g.girder_id;
    json points = json::array();
    for (const analysis::AnalysisPoint& p : g.live_influence.points)
      points.push_back({{"station", len(p.station)}, {"span", p.span + 1}, {"label", p.label()}});
    girder["points"] = std::move(points);
    json curves = json::array();
    for_each_influence(g, [&](const analysis::NamedCurve& c, Quantity q) {
      const analysis::SampledCurve s = c.curve->sample(options.interior_points);
      const Real scale = largest(s.values);
      json xs = json::array(), ys = json::array();
      for (std::size_t k = 0; k < s.stations.size(); ++k) {
        xs.push_back(len(s.stations[k]));
        ys.push_back(units::from_internal(tidy(s.values[k], scale), q, system));
      }
      curves.push_back({{"curve", c.effect},
                        {"point", c.where},
                        {"point_station", len(c.station)},
                        {"x", std::move(xs)},
                        {"value", std::move(ys)}});
    });
    girder["influence_lines"] = std::move(curves);
    json dead = json::array();
    for (const analysis::ComponentEffects& c : g.dead_loads) {
      json m = json::array(), vl = json::array(), vr = json::array(), r = json::array();
      const Real m_scale = largest(c.effects.moment);
      const Real v_scale = std::max(largest(c.effects.shear_left), largest(c.effects.shear_right));
      for (Real v : c.effects.moment) m.push_back(units::from_internal(tidy(v, m_scale), Quantity::moment, system));
      for (Real v : c.effects.shear_left) vl.push_back(units::from_internal(tidy(v, v_scale), Quantity::force, system));
      for (Real v : c.effects.shear_right)
        vr.push_back(units::from_internal(tidy(v, v_scale), Quantity::force, system));
      for (Real v : c.effects.reactions) r.push_back(units::from_internal(v, Quantity::force, system));
      dead.push_back({{"component", std::string(model::to_string(c.component))},
                      {"moment", std::move(m)},
                      {"shear_left", std::move(vl)},
                      {"shear_right", std::move(vr)},
                      {"reactions", std::move(r)}});
    }
    girder["dead_loads"] = std::move(dead);
    lines.push_back(std::move(girder));
  }
  doc["girders"] = std::move(lines);
  return doc.dump(1) + "\n";
}

}  // namespace tenthpoint::report
