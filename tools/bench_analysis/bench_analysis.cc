// Benchmark: build a line-girder model and every influence line of it.
// Target (issue 3): a three-span girder with about 40 analysis points in
// under 0.2 ms on one core. Plain std::chrono, many repetitions, median of
// batches; results go to stdout (this is a tool, not library code).
#include <algorithm>
#include <chrono>
#include <cstdio>
#include <vector>

#include "engine/analysis/influence_lines.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

namespace {

GirderLayout layout() {
  GirderLayout g = continuous_girder("BENCH-3", {30.0, 40.0, 30.0});
  // 31 tenth points + 9 named points = 40 analysis points.
  g.named_points = {{"splice 1", 22.5},      {"cover plate 1", 26.0}, {"cover plate 2", 34.5},
                    {"splice 2", 45.0},      {"diaphragm", 51.0},     {"splice 3", 55.0},
                    {"cover plate 3", 65.5}, {"cover plate 4", 74.0}, {"splice 4", 77.5}};
  return g;
}

FlexuralRigidity prismatic_steps() {
  FlexuralRigidity r;
  r.then_prismatic(26.0, 3.0e9)
      .then_prismatic(8.5, 5.0e9)
      .then_prismatic(31.0, 3.0e9)
      .then_prismatic(8.5, 5.0e9)
      .then_prismatic(26.0, 3.0e9);
  return r;
}

FlexuralRigidity haunched() {
  FlexuralRigidity r;
  const Real ei = 3.0e9;
  r.then_prismatic(24.0, ei)
      .then_varying(6.0, cubic_depth_haunch(24.0, 30.0, ei, 1.8, 2))
      .then_varying(8.0, cubic_depth_haunch(38.0, 30.0, ei, 1.8, 2))
      .then_prismatic(24.0, ei)
      .then_varying(8.0, cubic_depth_haunch(62.0, 70.0, ei, 1.8, 2))
      .then_varying(6.0, cubic_depth_haunch(76.0, 70.0, ei, 1.8, 2))
      .then_prismatic(24.0, ei);
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

void report(const char* name, const FlexuralRigidity& rigidity) {
  const GirderLayout g = layout();
  const LineGirderModel probe(g, rigidity);
  const InfluenceLines lines = compute_influence_lines(probe);
  std::size_t curves = lines.supports.size();
  for (const auto& p : lines.at_points) curves += (p.shear_left.coefficients() == p.shear_right.coefficients()) ? 2 : 3;
  const double build = median_microseconds(
      [&] {
        const LineGirderModel model(g, rigidity);
        sink += static_cast<double>(model.stiffness().size());
      },
      21, 200);
  const double total = median_microseconds(
      [&] {
        const LineGirderModel model(g, rigidity);
        const InfluenceLines il = compute_influence_lines(model);
        sink += il.at_points[5].moment.value(12.3);
      },
      21, 200);
  std::printf("%-26s %3zu points %4zu elements %4zu dofs %4zu curves: model %8.1f us, model + all ILs %8.1f us\n", name,
              lines.points.size(), probe.elements().size(), probe.free_dof_count(), curves, build, total);
}

}  // namespace

int main() {
  report("prismatic (stepped) 3-span", prismatic_steps());
  report("haunched 3-span", haunched());
  return sink == 0 ? 1 : 0;
}
