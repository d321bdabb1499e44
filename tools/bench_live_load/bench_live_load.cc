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
#include <ctime>
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

struct Timing {
  double wall_us = 0;  // median over batches, per call
  double cpu_us = 0;   // process CPU time, median over batches, per call
};

// Wall time and process CPU time: on a shared machine the wall clock also
// counts time spent waiting for the processor, the CPU clock does not.
template <typename Work>
Timing median_microseconds(Work&& work, int batches, int per_batch) {
  std::vector<double> wall;
  std::vector<double> cpu;
  for (int b = 0; b < batches; ++b) {
    const auto start = std::chrono::steady_clock::now();
    const std::clock_t cpu_start = std::clock();
    for (int i = 0; i < per_batch; ++i) work();
    const std::clock_t cpu_stop = std::clock();
    const auto stop = std::chrono::steady_clock::now();
    wall.push_back(std::chrono::duration<double, std::micro>(stop - start).count() / per_batch);
    cpu.push_back(1e6 * static_cast<double>(cpu_stop - cpu_start) / CLOCKS_PER_SEC / per_batch);
  }
  std::sort(wall.begin(), wall.end());
  std::sort(cpu.begin(), cpu.end());
  return {wall[wall.size() / 2], cpu[cpu.size() / 2]};
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
  const Timing analytic_time = median_microseconds(analytic, 15, 20);
  const PreparedInfluenceLines prepared(lines);
  const Timing prepare_time = median_microseconds([&] { sink += PreparedInfluenceLines(lines).length(); }, 15, 50);

  // Brute force at 0.01 ft, once (it takes seconds).
  const Real step = 0.01 * units::kFoot;
  std::vector<bench::SampledEnvelope> sampled;
  const auto start = std::chrono::steady_clock::now();
  for (std::size_t m = 0; m < models.size(); ++m) {
    sampled.push_back(bench::sampled_envelope(prepared, *models[m], envelopes[m], step));
  }
  const double sampled_us = std::chrono::duration<double, std::micro>(std::chrono::steady_clock::now() - start).count();

  // Accuracy, train and lane parts apart: analytic minus sampled, relative to
  // the largest value of that part and effect kind over the case (so that
  // near-zero values do not inflate it).
  struct Accuracy {
    double above = 0;  // analytic above sampled: the sampling error of the brute force
    double below = 0;  // sampled above analytic
    std::size_t compared = 0;
  };
  Accuracy train_accuracy;
  Accuracy lane_accuracy;
  auto compare = [](Accuracy& acc, auto part, const auto& analytic_column, const auto& sampled_column) {
    double scale = 0;
    for (const auto& v : analytic_column) {
      for (Extreme x : kExtremes) {
        if (v[x]) scale = std::max(scale, std::abs(part(*v[x])));
      }
    }
    for (std::size_t i = 0; i < analytic_column.size(); ++i) {
      for (Extreme x : kExtremes) {
        if (!analytic_column[i][x] || scale == 0) continue;
        const double d = sign_of(x) * (part(*analytic_column[i][x]) - sampled_column[i][x]) / scale;
        acc.above = std::max(acc.above, d);
        acc.below = std::max(acc.below, -d);
        ++acc.compared;
      }
    }
  };
  for (std::size_t m = 0; m < models.size(); ++m) {
    for (std::size_t c = 0; c < envelopes[m].cases.size(); ++c) {
      for (EffectKind kind : kEffectKinds) {
        const auto& a = envelopes[m].cases[c].values.of(kind);
        compare(
            train_accuracy, [](const CaseExtreme& v) { return v.train_value(); }, a,
            sampled[m].cases[c].train.of(kind));
        compare(
            lane_accuracy, [](const CaseExtreme& v) { return v.lane_value(); }, a, sampled[m].cases[c].lane.of(kind));
      }
    }
  }

  std::printf("girder: 3 spans 30-40-30 m, %zu analysis points, %zu mesh knots, %zu distinct influence lines\n",
              lines.points.size(), prepared.knots().size(), prepared.distinct_curve_count());
  std::printf("vehicles: %zu load models, %zu cases (shipped library 'aashto')\n", models.size(), case_count);
  std::printf("analytic, all envelopes (incl. preparing the curves): %9.1f us wall, %9.1f us CPU (median of 15 x 20)\n",
              analytic_time.wall_us, analytic_time.cpu_us);
  std::printf("  of which preparing the curves:                      %9.1f us wall, %9.1f us CPU\n",
              prepare_time.wall_us, prepare_time.cpu_us);
  std::printf("sampled at 0.01 ft, all envelopes:                    %9.1f us wall (one run)\n", sampled_us);
  std::printf("ratio sampled / analytic (wall):                      %9.0f\n", sampled_us / analytic_time.wall_us);
  std::printf(
      "train parts: %zu values; (analytic - sampled) / scale up to %.2e, (sampled - analytic) / scale up to "
      "%.2e\n",
      train_accuracy.compared, train_accuracy.above, train_accuracy.below);
  std::printf(
      "lane parts:  %zu values; (analytic - sampled) / scale up to %.2e, (sampled - analytic) / scale up to "
      "%.2e\n",
      lane_accuracy.compared, lane_accuracy.above, lane_accuracy.below);
  std::printf("(sink %g)\n", sink);
  return 0;
}
