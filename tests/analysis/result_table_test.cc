#include "engine/analysis/result_table.h"

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

TEST_CASE("influence lines and dead loads become plain labelled tables", "[analysis][result_table]") {
  // Simple span: statics gives the midspan triangle (peak L/4) and the
  // reactions wL/2 (textbook); the tables must carry exactly those numbers.
  const Real span = 10.0;
  const LineGirderModel model(continuous_girder("TAB-1", {span}), FlexuralRigidity::uniform(span, 1e9));
  const InfluenceLines lines = compute_influence_lines(model);
  const std::vector<NamedCurve> curves = named_curves(lines);
  // 11 points x (moment + one shear; the ends have distinct left/right shear) + 2 reactions.
  REQUIRE(curves.size() == 11 * 2 + 2 + 2);
  CHECK(curves.front().name == "moment at support 1 / span 1 0.0L");
  const auto mid =
      std::find_if(curves.begin(), curves.end(), [](const NamedCurve& c) { return c.name == "moment at span 1 0.5L"; });
  REQUIRE(mid != curves.end());
  const ResultTable sampled = sampled_table(*mid, 3);
  CHECK(sampled.columns == std::vector<std::string>{"station [m]", "moment at span 1 0.5L [m]"});
  CHECK(sampled.rows.size() == 10 * 4 + 1);  // knots once each (continuous) plus 3 per piece
  for (const auto& row : sampled.rows) {
    TP_CHECK_CLOSE(row[1], row[0] <= span / 2 ? row[0] / 2 : (span - row[0]) / 2, 1e-12, span);
  }
  const ResultTable pieces = piece_table(*mid);
  CHECK(pieces.rows.size() == 10);
  CHECK(pieces.columns.size() == 6);

  const DeadLoadEffects dl = solve_dead_load(model, DeadLoadCase("DC1").add_uniform(2.0e3));
  const ResultTable at_points = dead_load_point_table(model.analysis_points(), dl);
  CHECK(at_points.rows.size() == 11);
  CHECK(at_points.row_labels[5] == "span 1 0.5L");
  TP_CHECK_CLOSE(at_points.rows[5][3], 2.0e3 * span * span / 8, 1e-12, 1.0);
  const ResultTable reactions = dead_load_reaction_table(model.analysis_points(), dl);
  CHECK(reactions.row_labels == std::vector<std::string>{"support 1", "support 2"});
  TP_CHECK_CLOSE(reactions.rows[1][1], 2.0e3 * span / 2, 1e-12, 1.0);
}
