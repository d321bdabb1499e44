// EffectTable: one value per force effect of a girder line and per extreme,
// the shape every live-load result in this module takes.
//
// Effects (their units and signs are those of analysis::InfluenceLines):
//   moment       at every analysis point, N*m, sagging positive;
//   shear_left   at every analysis point, on a cut just left of it, N;
//   shear_right  at every analysis point, on a cut just right of it, N;
//                (shear: resultant of the forces left of the cut, upward positive)
//   reaction     at every restrained support line, in the order of
//                InfluenceLines::supports, N, upward on the girder positive.
// Each effect has a maximum (most positive) and a minimum (most negative).
#pragma once

#include <cstddef>
#include <optional>
#include <string_view>
#include <vector>

namespace tenthpoint::live_load {

enum class EffectKind { moment, shear_left, shear_right, reaction };
enum class Extreme { maximum, minimum };

// File and report spellings: "moment", "shear_left", "shear_right",
// "reaction"; "maximum", "minimum".
[[nodiscard]] std::string_view to_string(EffectKind kind);
[[nodiscard]] std::string_view to_string(Extreme extreme);
[[nodiscard]] std::optional<EffectKind> parse_effect_kind(std::string_view text);
[[nodiscard]] std::optional<Extreme> parse_extreme(std::string_view text);

// +1 for the maximum, -1 for the minimum: the factor that turns "most
// adverse" into "largest".
[[nodiscard]] inline double sign_of(Extreme extreme) { return extreme == Extreme::maximum ? 1.0 : -1.0; }

inline constexpr EffectKind kEffectKinds[] = {EffectKind::moment, EffectKind::shear_left, EffectKind::shear_right,
                                              EffectKind::reaction};
inline constexpr Extreme kExtremes[] = {Extreme::maximum, Extreme::minimum};

// One effect and one extreme: `index` is the analysis point (moment, shears)
// or the entry of InfluenceLines::supports (reaction).
struct EffectKey {
  EffectKind kind = EffectKind::moment;
  std::size_t index = 0;
  Extreme extreme = Extreme::maximum;
};

template <typename T>
struct ExtremePair {
  T maximum{};
  T minimum{};

  [[nodiscard]] T& operator[](Extreme e) { return e == Extreme::maximum ? maximum : minimum; }
  [[nodiscard]] const T& operator[](Extreme e) const { return e == Extreme::maximum ? maximum : minimum; }
};

template <typename T>
struct EffectTable {
  std::vector<ExtremePair<T>> moment;       // per analysis point
  std::vector<ExtremePair<T>> shear_left;   // per analysis point
  std::vector<ExtremePair<T>> shear_right;  // per analysis point
  std::vector<ExtremePair<T>> reaction;     // per restrained support

  EffectTable() = default;
  EffectTable(std::size_t points, std::size_t supports)
      : moment(points), shear_left(points), shear_right(points), reaction(supports) {}

  [[nodiscard]] std::vector<ExtremePair<T>>& of(EffectKind kind) {
    switch (kind) {
      case EffectKind::moment:
        return moment;
      case EffectKind::shear_left:
        return shear_left;
      case EffectKind::shear_right:
        return shear_right;
      case EffectKind::reaction:
        break;
    }
    return reaction;
  }
  [[nodiscard]] const std::vector<ExtremePair<T>>& of(EffectKind kind) const {
    return const_cast<EffectTable*>(this)->of(kind);
  }
  [[nodiscard]] T& at(const EffectKey& key) { return of(key.kind)[key.index][key.extreme]; }
  [[nodiscard]] const T& at(const EffectKey& key) const { return of(key.kind)[key.index][key.extreme]; }
};

}  // namespace tenthpoint::live_load
