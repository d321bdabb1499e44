#include "engine/live_load/effect_table.h"

#include <array>
#include <utility>

namespace tenthpoint::live_load {
namespace {

constexpr std::array<std::pair<EffectKind, std::string_view>, 4> kKindNames{{
    {EffectKind::moment, "moment"},
    {EffectKind::shear_left, "shear_left"},
    {EffectKind::shear_right, "shear_right"},
    {EffectKind::reaction, "reaction"},
}};

constexpr std::array<std::pair<Extreme, std::string_view>, 2> kExtremeNames{{
    {Extreme::maximum, "maximum"},
    {Extreme::minimum, "minimum"},
}};

template <typename Table, typename Enum>
std::string_view name_in(const Table& table, Enum value) {
  for (const auto& [v, name] : table)
    if (v == value) return name;
  return "?";
}

template <typename Table>
auto value_in(const Table& table, std::string_view text) -> std::optional<typename Table::value_type::first_type> {
  for (const auto& [v, name] : table)
    if (name == text) return v;
  return std::nullopt;
}

}  // namespace

std::string_view to_string(EffectKind kind) { return name_in(kKindNames, kind); }
std::string_view to_string(Extreme extreme) { return name_in(kExtremeNames, extreme); }
std::optional<EffectKind> parse_effect_kind(std::string_view text) { return value_in(kKindNames, text); }
std::optional<Extreme> parse_extreme(std::string_view text) { return value_in(kExtremeNames, text); }

}  // namespace tenthpoint::live_load
