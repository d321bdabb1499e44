// The engine against an independent general-purpose FE solver: CalculiX
// (ccx, Debian package calculix-ccx). Skipped with a warning when ccx is not
// installed, except under CI (env CI set), where a missing ccx fails.
#include <unistd.h>

#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>

#include <catch2/catch.hpp>

#include "engine/analysis/gauss_legendre_rule.h"
#include "engine/analysis/influence_lines.h"
#include "tests/analysis/calculix_deck.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;
using namespace tenthpoint::test;
namespace fs = std::filesystem;

namespace {

std::string find_on_path(const std::string& program) {
  const char* path = std::getenv("PATH");
  if (!path) return {};
  std::istringstream dirs(path);
  std::string dir;
  while (std::getline(dirs, dir, ':')) {
    const fs::path candidate = fs::path(dir.empty() ? "." : dir) / program;
    if (::access(candidate.c_str(), X_OK) == 0) return candidate.string();
  }
  return {};
}

// A private temporary directory, removed with everything in it.
struct TemporaryDirectory {
  fs::path path;
  TemporaryDirectory() {
    std::string pattern = (fs::temp_directory_path() / "tenthpoint-ccx-XXXXXX").string();
    if (::mkdtemp(pattern.data())) path = pattern;
  }
  ~TemporaryDirectory() {
    std::error_code ignored;
    if (!path.empty()) fs::remove_all(path, ignored);
  }
};

FlexuralRigidity three_span_haunched(Real ei) {
  // 30 + 40 + 30 m, parabolic haunches over both piers (depth x1.8 at the
  // pier, EI ~ depth^3), 6 m into the end spans and 8 m into the middle span.
  FlexuralRigidity r;
  r.then_prismatic(24.0, ei)
      .then_varying(6.0, cubic_depth_haunch(24.0, 30.0, ei, 1.8, 2))
      .then_varying(8.0, cubic_depth_haunch(38.0, 30.0, ei, 1.8, 2))
      .then_prismatic(24.0, ei)
      .then_varying(8.0, cubic_depth_haunch(62.0, 70.0, ei, 1.8, 2))
      .then_varying(6.0, cubic_depth_haunch(76.0, 70.0, ei, 1.8, 2))
      .then_prismatic(24.0, ei);
  return r;
}

}  // namespace

TEST_CASE("reactions and moments of a haunched three-span girder match CalculiX", "[analysis][calculix]") {
  const std::string ccx = find_on_path("ccx");
  if (ccx.empty()) {
    if (std::getenv("CI")) FAIL("ccx (Debian package calculix-ccx) is required under CI but is not on PATH");
    WARN("ccx not found on PATH: skipping the CalculiX comparison (apt-get install calculix-ccx)");
    return;
  }

  const Real e_modulus = 2.0e11;
  const Real ei = 3.0e9;
  const FlexuralRigidity rigidity = three_span_haunched(ei);
  const LineGirderModel model(continuous_girder("CCX-3", {30.0, 40.0, 30.0}), rigidity);
  const InfluenceLines lines = compute_influence_lines(model);

  // CalculiX mesh: 0.1 m elements, each given the harmonic mean of I(x) over
  // it (the exact rotational flexibility int dx / EI), so that the stepped
  // model converges to the smooth one as h^2. Measured while writing this
  // test: halving h to 0.05 m moves the pier moment by 1e-5 of its value.
  // U1 is a Timoshenko element; with the coefficient k = 1e8 its moments
  // agree with k = 1e10 to all 7 printed digits (Euler-Bernoulli limit). Its
  // shear output (sxz) is not used: it drifts with k, so reactions are taken
  // from the moments instead, as the jump in dM/dx across each support
  // (statics: no load lies within one element of a support).
  const int per_metre = 10;
  CalculixDeck deck;
  deck.youngs_modulus = e_modulus;
  deck.shear_coefficient = 1.0e8;
  const GaussLegendreRule rule(8);
  for (int i = 0; i <= 100 * per_metre; ++i) deck.stations.push_back(static_cast<Real>(i) / per_metre);
  for (std::size_t e = 0; e + 1 < deck.stations.size(); ++e) {
    const Real a = deck.stations[e];
    const Real b = deck.stations[e + 1];
    const Real flexibility = rule.integrate([&](Real x) { return 1.0 / rigidity.at(x); }, a, b);
    deck.element_inertia.push_back((b - a) / flexibility / e_modulus);
  }
  auto node_at = [&](Real x) { return static_cast<std::size_t>(std::lround(x * per_metre)); };
  deck.supported_nodes = {node_at(0), node_at(30), node_at(70), node_at(100)};
  // Load positions between the engine's nodes (tenth points), several on the
  // haunches, so that the comparison also covers the cubic interpolation.
  const std::vector<Real> loads{4.7,  12.3, 19.9, 26.1, 28.9, 31.3, 33.7, 41.3,
                                50.1, 58.7, 66.9, 71.3, 74.9, 83.3, 95.1};
  for (Real x : loads) deck.load_nodes.push_back(node_at(x));
  // Sections (moments) and the elements either side of each support.
  const std::vector<Real> sections{12.0, 27.0, 30.0, 34.0, 50.0, 66.0, 70.0, 88.0};
  for (Real s : sections) deck.printed_elements.push_back(node_at(s));
  for (std::size_t n : deck.supported_nodes) {
    if (n > 0) deck.printed_elements.push_back(n - 1);
    if (n + 1 < deck.stations.size()) deck.printed_elements.push_back(n);
  }

  TemporaryDirectory dir;
  REQUIRE_FALSE(dir.path.empty());
  {
    std::ofstream inp(dir.path / "girder.inp");
    inp << deck.write();
  }
  const std::string command = "cd '" + dir.path.string() + "' && '" + ccx + "' -i girder > ccx.log 2>&1";
  REQUIRE(std::system(command.c_str()) == 0);
  std::ifstream dat_file(dir.path / "girder.dat");
  REQUIRE(dat_file.good());
  std::stringstream dat;
  dat << dat_file.rdbuf();
  const std::vector<CalculixStep> steps = parse_calculix_dat(dat.str(), deck.element_inertia.size());
  REQUIRE(steps.size() == loads.size());

  // Tolerance 1e-4 of the largest magnitude of each effect over the load
  // positions: ten times the measured mesh effect above, and well above the
  // 7 printed digits of ccx (differenced once for the reactions).
  constexpr Real kTolerance = 1e-4;
  const std::size_t element_count = deck.element_inertia.size();
  for (std::size_t k = 0; k < deck.supported_nodes.size(); ++k) {
    const std::size_t n = deck.supported_nodes[k];
    std::vector<Real> ours;
    std::vector<Real> theirs;
    for (std::size_t j = 0; j < loads.size(); ++j) {
      const Real h = 1.0 / per_metre;
      const auto& m = steps[j].sagging_moment;
      const Real slope_right = n < element_count ? (m[n][1] - m[n][0]) / h : 0.0;
      const Real slope_left = n > 0 ? (m[n - 1][1] - m[n - 1][0]) / h : 0.0;
      theirs.push_back((slope_right - slope_left) / deck.load);
      ours.push_back(lines.support(k)->reaction.value(loads[j]));
    }
    Real scale = 0;
    for (Real v : theirs) scale = std::max(scale, std::abs(v));
    for (std::size_t j = 0; j < loads.size(); ++j) {
      INFO("reaction at support " << k + 1 << ", load at " << loads[j] << " m");
      TP_CHECK_CLOSE(ours[j], theirs[j], kTolerance, scale);
    }
  }
  for (Real s : sections) {
    std::size_t point = 0;
    while (std::abs(lines.points[point].station - s) > 1e-9) ++point;
    const std::size_t element = node_at(s);
    std::vector<Real> theirs;
    for (std::size_t j = 0; j < loads.size(); ++j) theirs.push_back(steps[j].sagging_moment[element][0] / deck.load);
    Real scale = 0;
    for (Real v : theirs) scale = std::max(scale, std::abs(v));
    for (std::size_t j = 0; j < loads.size(); ++j) {
      INFO("moment at " << s << " m, load at " << loads[j] << " m");
      TP_CHECK_CLOSE(lines.at_points[point].moment.value(loads[j]), theirs[j], kTolerance, scale);
    }
  }
}
