// GirderStability: whether a girder layout is a structure or a mechanism,
// decided by statics alone (before any stiffness is assembled).
//
// The hinges cut the girder into rigid parts, each with two rigid-body
// freedoms in the vertical plane (vertical translation and rotation; axial
// motion is irrelevant to a line girder). A part is held when it has a
// rotational restraint and a vertical one, or vertical restraints at two
// different stations. Its restraints are its supports (a support at a hinge
// holds both parts there) and, once a neighbour is held, the hinge joining
// them. Parts are marked held until nothing changes; any part left unheld can
// move as a mechanism. For a chain of parts this test is exact.
#pragma once

#include <string>

#include "engine/analysis/girder_layout.h"

namespace tenthpoint::analysis {

struct GirderStability {
  bool stable = false;
  // Restraints minus (2 + hinges): the degree of static indeterminacy when
  // stable; negative counts are always mechanisms.
  int degree_of_indeterminacy = 0;
  // Empty when stable; otherwise a sentence naming the loose part, e.g.
  // "the part of the girder from 30 m to 45 m (span 2) can move as a mechanism".
  std::string cause;
};

// Precondition: the layout's spans, supports and hinges are otherwise valid
// (LineGirderModel checks them first).
[[nodiscard]] GirderStability assess_stability(const GirderLayout& layout);

}  // namespace tenthpoint::analysis
