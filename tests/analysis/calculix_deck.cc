#include "tests/analysis/calculix_deck.h"

#include <sstream>

#include <fmt/format.h>

namespace tenthpoint::test {

std::string CalculixDeck::write() const {
  std::string out;
  out += "** tenthpoint analysis check: girder on point supports, U1 beam elements\n";
  out += "*NODE, NSET=NALL\n";
  for (std::size_t i = 0; i < stations.size(); ++i) out += fmt::format("{}, {:.17g}, 0, 0\n", i + 1, stations[i]);
  out += "*ELEMENT, TYPE=U1, ELSET=EALL\n";
  for (std::size_t e = 0; e + 1 < stations.size(); ++e) out += fmt::format("{}, {}, {}\n", e + 1, e + 1, e + 2);
  out += "*USER ELEMENT, TYPE=U1, NODES=2, INTEGRATION POINTS=2, MAXDOF=6\n";
  for (std::size_t e = 0; e < element_inertia.size(); ++e) out += fmt::format("*ELSET, ELSET=E{}\n{}\n", e + 1, e + 1);
  out += "*ELSET, ELSET=EOUT\n";
  for (std::size_t e : printed_elements) out += fmt::format("{}\n", e + 1);
  out += "*NSET, NSET=SUPPORTS\n";
  for (std::size_t n : supported_nodes) out += fmt::format("{}\n", n + 1);
  // Plane bending in x-z: restrain y, torsion and rotation about z
  // everywhere, axial motion at one node, z at the supports.
  out += "*BOUNDARY\nNALL, 2, 2\nNALL, 4, 4\nNALL, 6, 6\n1, 1, 1\nSUPPORTS, 3, 3\n";
  out += fmt::format("*MATERIAL, NAME=STEEL\n*ELASTIC\n{:.17g}, {:.17g}\n", youngs_modulus, poisson_ratio);
  for (std::size_t e = 0; e < element_inertia.size(); ++e) {
    out += fmt::format("*BEAM SECTION, ELSET=E{}, MATERIAL=STEEL, SECTION=GENERAL\n", e + 1);
    out += fmt::format("{:.17g}, {:.17g}, 0., {:.17g}, {:.17g}\n0., 0., 1.\n", area, element_inertia[e],
                       element_inertia[e], shear_coefficient);
  }
  for (std::size_t n : load_nodes) {
    out += "*STEP\n*STATIC\n*CLOAD, OP=NEW\n";
    out += fmt::format("{}, 3, {:.17g}\n", n + 1, -load);
    out += "*EL PRINT, ELSET=EOUT\nS\n*END STEP\n";
  }
  return out;
}

std::vector<CalculixStep> parse_calculix_dat(const std::string& dat, std::size_t element_count) {
  std::vector<CalculixStep> steps;
  std::istringstream in(dat);
  std::string line;
  bool in_block = false;
  while (std::getline(in, line)) {
    if (line.find("stresses") != std::string::npos) {
      steps.push_back(CalculixStep{std::vector<std::array<double, 2>>(element_count, {0.0, 0.0}),
                                   std::vector<std::array<double, 2>>(element_count, {0.0, 0.0})});
      in_block = true;
      continue;
    }
    if (!in_block) continue;
    std::istringstream fields(line);
    long element = 0;
    int point = 0;
    double s[6];
    if (!(fields >> element >> point >> s[0] >> s[1] >> s[2] >> s[3] >> s[4] >> s[5])) {
      if (!steps.back().shear.empty() && line.find_first_not_of(" \t\r") != std::string::npos) in_block = false;
      continue;
    }
    if (element < 1 || static_cast<std::size_t>(element) > element_count || point < 1 || point > 2) continue;
    const auto e = static_cast<std::size_t>(element - 1);
    const auto p = static_cast<std::size_t>(point - 1);
    steps.back().sagging_moment[e][p] = -s[2];
    steps.back().shear[e][p] = s[4];
  }
  return steps;
}

}  // namespace tenthpoint::test
