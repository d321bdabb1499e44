// Benchmark: every moving-load envelope of a three-span, 40-point girder
// under the whole shipped vehicle library (engine/data/vehicles/aashto.yaml),
// both directions of travel, variable spacings and gaps searched exactly.
// Target (issue 4): under 2 ms on one core. The same run builds the
// brute-force envelope sampled at 0.01 ft and reports the time ratio and how
// far the two differ. Plain std::chrono, median of batches; results go to
// stdout (this is a tool, not library code).
#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <memory>
#include <string>
#include <vector>

#include "engine/analysis/influence_lines.h"
#include "engine/analysis/line_girder_model.h"
#include "engine/core/units.h"
#include "engine/io/vehicle_reader.h"
#include "engine/live_load/moving_load_envelope.h"
#include "engine/live_load/prepared_influence_lines.h"
#include "tools/bench_live_load/sampled_envelope.h"

using namespace tenthpoint;
using namespace tenthpoint::live_load;

namespace {

// The girder of tools/bench_analysis: 30-40-30 m (98.4-131.2-98.4 ft), 31
// tenth points + 9 named points = 40 analysis points, EI stepped over the
// piers.
analysis::GirderLayout layout() {
  analysis::GirderLayout g = analysis::continuous_girder("BENCH-3", {30.0, 40.0, 30.0});
  g.named_points = {{"splice 1", 22.5},      {"cover plate 1", 26.0}, {"cover plate 2", 34.5},
                    {"splice 2", 45.0},      {"diaphragm", 51.0},     {"splice 3", 55.0},
                    {"cover plate 3", 65.5}, {"cover plate 4", 74.0}, {"splice 4", 77.5}};
  return g;
}

analysis::FlexuralRigidity rigidity() {
  analysis::FlexuralRigidity r;
  r.then_prismatic(26.0, 3.0e9)
      .then_prismatic(8.5, 5.0e9)
      .then_prismatic(31.0, 3.0e9)
      .then_prismatic(8.5, 5.0e9)
      .then_prismatic(26.0, 3.0e9);
  return r;
}

double sink = 0;  // keeps the optimiser from discarding the work

template <typename Work>
double median_microseconds(Work&& work, int batches, int per_batch) {
  std::vector<double> times;
  for (int b = 0; b < batches; ++b) {
    const auto start = std::chrono::steady_clock::now();
    for (int i = 0; i < per_batch; ++i) work();
    const auto stop = std::chrono::steady_clock::now();
    times.push_back(std::chrono::duration<double, std::micro>(stop - start).count() / per_batch);
  }
  std::sort(times.begin(), times.end());
  return times[times.size() / 2];
}

}  // namespace

int main() {
  const io::VehicleReadResult read = io::read_shipped_vehicles("aashto");
  if (!read.ok()) {
    std::fprintf(stderr, "cannot read the shipped vehicle library\n");
    return 1;
  }
  const model::VehicleLibrary& library = *read.library;
  std::vector<const model::LoadModel*> models;
  std::size_t case_count = 0;
  for (const model::LoadModel& m : library.load_models) {
    models.push_back(&m);
    case_count += m.cases.size();
  }

  const analysis::LineGirderModel girder(layout(), rigidity());
  const analysis::InfluenceLines lines = analysis::compute_influence_lines(girder);

  // Analytic: prepare the curves, then every envelope of every model.
  std::vector<MovingLoadEnvelope> envelopes;
  auto analytic = [&] {
    const PreparedInfluenceLines prepared(lines);
    envelopes = compute_moving_load_envelopes(prepared, models, library);
    sink += envelopes.front().cases.front().values.moment[5].maximum->total();
  };
  const double analytic_us = median_microseconds(analytic, 15, 20);
  const PreparedInfluenceLines prepared(lines);
  const double prepare_us = median_microseconds([&] { sink += PreparedInfluenceLines(lines).length(); }, 15, 50);

  // Brute force at 0.01 ft, once (it takes seconds).
  const Real step = 0.01 * units::kFoot;
  std::vector<bench::SampledEnvelope> sampled;
  const auto start = std::chrono::steady_clock::now();
  for (std::size_t m = 0; m < models.size(); ++m) {
    sampled.push_back(bench::sampled_envelope(prepared, *models[m], envelopes[m], step));
  }
  const double sampled_us = std::chrono::duration<double, std::micro>(std::chrono::steady_clock::now() - start).count();

  // Accuracy: analytic minus sampled, relative to the largest value of that
  // effect kind over the model (so near-zero values do not inflate it).
  double worst_above = 0;  // analytic above sampled: the sampling error
  double worst_below = 0;  // sampled above analytic: would mean the search missed something
  std::size_t compared = 0;
  for (std::size_t m = 0; m < models.size(); ++m) {
    for (std::size_t c = 0; c < envelopes[m].cases.size(); ++c) {
      for (EffectKind kind : kEffectKinds) {
        const auto& a = envelopes[m].cases[c].values.of(kind);
        const auto& s = sampled[m].cases[c].of(kind);
        double scale = 0;
        for (const auto& v : a) {
          for (Extreme x : kExtremes) {
            if (v[x]) scale = std::max(scale, std::abs(v[x]->total()));
          }
        }
        for (std::size_t i = 0; i < a.size(); ++i) {
          for (Extreme x : kExtremes) {
            if (!a[i][x] || scale == 0) continue;
            const double d = sign_of(x) * (a[i][x]->total() - s[i][x]) / scale;
            if (std::getenv("BENCH_VERBOSE") && d < -1e-9) {
              std::printf("%s %s %s %zu %s: analytic %.6g (train %.6g lane %.6g) sampled %.6g\n", models[m]->id.c_str(),
                          envelopes[m].cases[c].case_id.c_str(), std::string(to_string(kind)).c_str(), i,
                          std::string(to_string(x)).c_str(), a[i][x]->total(), a[i][x]->train_value(),
                          a[i][x]->lane_value(), s[i][x]);
            }
            worst_above = std::max(worst_above, d);
            worst_below = std::max(worst_below, -d);
            ++compared;
          }
        }
      }
    }
  }

  std::printf("girder: 3 spans 30-40-30 m, %zu analysis points, %zu mesh knots, %zu distinct influence lines\n",
              lines.points.size(), prepared.knots().size(), prepared.distinct_curve_count());
  std::printf("vehicles: %zu load models, %zu cases (shipped library 'aashto')\n", models.size(), case_count);
  std::printf("analytic, all envelopes (incl. preparing the curves): %10.1f us  (median of 15 batches x 20)\n",
              analytic_us);
  std::printf("  of which preparing the curves:                      %10.1f us\n", prepare_us);
  std::printf("sampled at 0.01 ft, all envelopes:                    %10.1f us  (one run)\n", sampled_us);
  std::printf("ratio sampled / analytic:                             %10.0f\n", sampled_us / analytic_us);
  std::printf("values compared: %zu\n", compared);
  std::printf("largest (analytic - sampled) / effect scale:  %.3e  (sampling error of the brute force)\n", worst_above);
  std::printf("largest (sampled - analytic) / effect scale:  %.3e  (must be rounding only)\n", worst_below);
  std::printf("(sink %g)\n", sink);
  return 0;
}
