// Flexural rigidity EI along a girder line for one load stage, as the
// analysis consumes it: ordered pieces [start, end] covering the girder
// without gap or overlap, each either prismatic (one EI) or varying (EI as a
// function of the station, for a haunched segment).
//
// Stations are m along the girder from the first support's bearing line
// (absolute, not relative to the piece); EI in N*m^2.
#pragma once

#include <functional>
#include <variant>
#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::section {

// Which side of a station to take where the section changes there (a cover
// plate end, a splice): `left` takes the piece ending at the station, `right`
// the piece starting at it. At the girder's ends the only piece is taken.
enum class Side { left, right };

struct StiffnessPiece {
  Real start = 0;  // m
  Real end = 0;    // m, > start
  // A constant EI, or EI(station) for station in [start, end].
  std::variant<Real, std::function<Real(Real)>> flexural_rigidity;

  [[nodiscard]] bool prismatic() const { return std::holds_alternative<Real>(flexural_rigidity); }
  // EI at `station`, N*m^2. Precondition: station in [start, end].
  [[nodiscard]] Real at(Real station) const;
};

struct StiffnessProfile {
  std::vector<StiffnessPiece> pieces;  // ordered by station, contiguous

  // Station of the last piece's end, m (0 when empty).
  [[nodiscard]] Real length() const { return pieces.empty() ? 0 : pieces.back().end; }
  // The piece holding `station`. Throws InputError when the station lies
  // outside [0, length()] (beyond a round-off tolerance).
  [[nodiscard]] const StiffnessPiece& piece_at(Real station, Side side = Side::right) const;
  // EI at `station`, N*m^2; same failure as piece_at.
  [[nodiscard]] Real at(Real station, Side side = Side::right) const;
};

namespace detail {
// Index of the piece holding `station` from `side`, where `boundaries` are
// the ordered stations start_0, end_0 = start_1, ..., end_last. Shared by the
// profiles of this module. Throws InputError outside [start_0, end_last]
// beyond kStationTolerance.
[[nodiscard]] std::size_t locate(const std::vector<Real>& boundaries, Real station, Side side);
// Tolerance for matching stations, m: stations converted from feet carry
// round-off of a few ulps; a micrometre is far below any real dimension.
inline constexpr Real kStationTolerance = 1e-6;
}  // namespace detail

}  // namespace tenthpoint::section
