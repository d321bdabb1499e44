#include "engine/section/stiffness_profile.h"

#include <algorithm>
#include <cassert>
#include <cmath>

#include <fmt/format.h>

#include "engine/core/errors.h"

namespace tenthpoint::section {

namespace detail {

std::size_t locate(const std::vector<Real>& boundaries, Real station, Side side) {
  assert(boundaries.size() >= 2);
  const Real first = boundaries.front();
  const Real last = boundaries.back();
  if (station < first - kStationTolerance || station > last + kStationTolerance) {
    throw InputError(SourceLocation{}, "station",
                     fmt::format("{:g} m lies outside the girder, {:g} m to {:g} m", station, first, last));
  }
  const std::size_t pieces = boundaries.size() - 1;
  // A station within tolerance of an interior boundary is on it; `side`
  // picks the piece.
  for (std::size_t i = 1; i < pieces; ++i) {
    if (std::abs(station - boundaries[i]) <= kStationTolerance) return side == Side::left ? i - 1 : i;
  }
  const auto it = std::upper_bound(boundaries.begin() + 1, boundaries.end() - 1, station);
  return static_cast<std::size_t>(it - boundaries.begin()) - 1;
}

}  // namespace detail

Real StiffnessPiece::at(Real station) const {
  if (const Real* constant = std::get_if<Real>(&flexural_rigidity)) return *constant;
  return std::get<std::function<Real(Real)>>(flexural_rigidity)(std::clamp(station, start, end));
}

const StiffnessPiece& StiffnessProfile::piece_at(Real station, Side side) const {
  assert(!pieces.empty());
  std::vector<Real> boundaries;
  boundaries.push_back(pieces.front().start);
  for (const StiffnessPiece& p : pieces) boundaries.push_back(p.end);
  return pieces[detail::locate(boundaries, station, side)];
}

Real StiffnessProfile::at(Real station, Side side) const { return piece_at(station, side).at(station); }

}  // namespace tenthpoint::section
