// CalculixDeck: writes a CalculiX (ccx) input deck for a straight girder on
// point supports and reads back its section forces, so that the engine can be
// checked against an independent general-purpose finite-element solver.
//
// The girder lies on the global x axis and bends in the x-z plane. It is
// meshed with ccx's two-node beam user element U1 (a Timoshenko beam that
// stays a true beam element: B31/B32 would be expanded into solid bricks),
// one *BEAM SECTION, SECTION=GENERAL per element carrying that element's
// second moment of area. The 1-direction is set to +z, the bending plane:
// with ccx 2.20 (Debian) bending about the other local axis gave unusable
// results in our trials, and RF output for U1 nodes was not usable either,
// so reactions are recovered from section forces. Shear deformation is made
// negligible with a large Timoshenko coefficient (set `shear_coefficient`);
// the element's shear output then loses accuracy, its moments do not.
//
// Each load node gets its own *STEP with a unit-direction downward force
// (OP=NEW), and *EL PRINT writes the section forces of the listed elements:
// for U1 the "stresses" columns are section forces at the element ends
// (integration point 1 at node 1, 2 at node 2); szz is minus the sagging
// moment and sxz the shear (resultant of forces on the left, upward).
#pragma once

#include <array>
#include <cstddef>
#include <string>
#include <vector>

namespace tenthpoint::test {

struct CalculixDeck {
  std::vector<double> stations;         // node x, m
  std::vector<double> element_inertia;  // per element (stations.size() - 1), m^4
  double youngs_modulus = 2.0e11;       // Pa
  double poisson_ratio = 0.3;
  double area = 1.0;                          // m^2 (axial and shear area)
  double shear_coefficient = 1.0e5;           // Timoshenko coefficient k in k G A
  std::vector<std::size_t> supported_nodes;   // 0-based, vertical restraint
  std::vector<std::size_t> load_nodes;        // 0-based, one step each
  double load = 1.0e3;                        // N, downward
  std::vector<std::size_t> printed_elements;  // 0-based

  [[nodiscard]] std::string write() const;
};

// Section forces of the printed elements in one step, both ends.
struct CalculixStep {
  // element (0-based) -> {end 1, end 2}
  std::vector<std::array<double, 2>> sagging_moment;  // N*m, indexed by element
  std::vector<std::array<double, 2>> shear;           // N
};

// Parses every "stresses" block of a ccx .dat file, one per step.
[[nodiscard]] std::vector<CalculixStep> parse_calculix_dat(const std::string& dat, std::size_t element_count);

}  // namespace tenthpoint::test
