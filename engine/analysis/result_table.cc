#include "engine/analysis/result_table.h"

#include <fmt/format.h>

namespace tenthpoint::analysis {

std::vector<NamedCurve> named_curves(const InfluenceLines& lines) {
  std::vector<NamedCurve> out;
  for (std::size_t p = 0; p < lines.points.size(); ++p) {
    const std::string where = lines.points[p].label();
    const Real x = lines.points[p].station;
    const PointInfluenceLines& il = lines.at_points[p];
    out.push_back({"moment at " + where, "m", &il.moment, "moment", where, x});
    if (il.shear_left.shared_knots() == il.shear_right.shared_knots() &&
        il.shear_left.coefficients() == il.shear_right.coefficients()) {
      out.push_back({"shear at " + where, "N/N", &il.shear_right, "shear", where, x});
    } else {
      out.push_back({"shear left of " + where, "N/N", &il.shear_left, "shear_left", where, x});
      out.push_back({"shear right of " + where, "N/N", &il.shear_right, "shear_right", where, x});
    }
    if (!il.deflection.empty())
      out.push_back({"deflection at " + where, "m/N", &il.deflection, "deflection", where, x});
  }
  for (const SupportInfluenceLines& s : lines.supports) {
    const std::string where = fmt::format("support {}", s.support_line + 1);
    out.push_back({"reaction at " + where, "N/N", &s.reaction, "reaction", where, s.station});
    if (!s.moment.empty())
      out.push_back({"moment at " + where, "N*m/N", &s.moment, "support_moment", where, s.station});
  }
  return out;
}

ResultTable sampled_table(const NamedCurve& curve, int interior_points) {
  ResultTable table;
  table.title = curve.name;
  table.columns = {"station [m]", fmt::format("{} [{}]", curve.name, curve.unit)};
  const SampledCurve samples = curve.curve->sample(interior_points);
  for (std::size_t i = 0; i < samples.stations.size(); ++i)
    table.rows.push_back({samples.stations[i], samples.values[i]});
  return table;
}

ResultTable piece_table(const NamedCurve& curve) {
  ResultTable table;
  table.title = curve.name + " (pieces)";
  table.columns = {"start [m]", "end [m]", "c0", "c1", "c2", "c3"};
  for (const CubicPiece& p : curve.curve->pieces()) {
    table.rows.push_back({p.start, p.end, p.coefficients[0], p.coefficients[1], p.coefficients[2], p.coefficients[3]});
  }
  return table;
}

ResultTable dead_load_point_table(const std::vector<AnalysisPoint>& points, const DeadLoadEffects& effects) {
  ResultTable table;
  table.title = effects.case_name + " at analysis points";
  table.columns = {"station [m]", "span", "span fraction", "moment [N*m]", "shear left [N]", "shear right [N]"};
  for (std::size_t p = 0; p < points.size(); ++p) {
    table.row_labels.push_back(points[p].label());
    table.rows.push_back({points[p].station, static_cast<Real>(points[p].span + 1), points[p].span_fraction,
                          effects.moment[p], effects.shear_left[p], effects.shear_right[p]});
  }
  return table;
}

ResultTable dead_load_reaction_table(const std::vector<AnalysisPoint>& points, const DeadLoadEffects& effects) {
  ResultTable table;
  table.title = effects.case_name + " reactions";
  table.columns = {"station [m]", "reaction [N]", "support moment [N*m]"};
  for (const AnalysisPoint& p : points) {
    if (!p.support) continue;
    table.row_labels.push_back(fmt::format("support {}", *p.support + 1));
    table.rows.push_back({p.station, effects.reactions[*p.support], effects.support_moments[*p.support]});
  }
  return table;
}

}  // namespace tenthpoint::analysis
