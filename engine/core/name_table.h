// NameTable: the one place an enum's file spelling is written down. Each enum
// of the formats keeps a constexpr table of (value, spelling) pairs; its
// to_string and parse functions look the value or the text up in it, so the
// two can never disagree.
#pragma once

#include <array>
#include <optional>
#include <string_view>
#include <utility>

namespace tenthpoint {

template <typename Enum, std::size_t N>
using NameTable = std::array<std::pair<Enum, std::string_view>, N>;

// The spelling of `value`; "?" for a value missing from the table (a broken
// invariant that the enum tests catch).
template <typename Enum, std::size_t N>
[[nodiscard]] constexpr std::string_view name_of(const NameTable<Enum, N>& table, Enum value) {
  for (const auto& [v, name] : table)
    if (v == value) return name;
  return "?";
}

// The value spelled exactly `text`, or nullopt.
template <typename Enum, std::size_t N>
[[nodiscard]] constexpr std::optional<Enum> value_of(const NameTable<Enum, N>& table, std::string_view text) {
  for (const auto& [v, name] : table)
    if (name == text) return v;
  return std::nullopt;
}

}  // namespace tenthpoint
