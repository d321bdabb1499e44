#include "engine/io/plausibility_bounds.h"

#include <array>
#include <cmath>

#include <fmt/format.h>

#include "engine/io/quantity_format.h"

namespace tenthpoint::io {
namespace {

using units::Quantity;
using units::UnitSystem;

// Every range is "common practice" (the span of values in service on highway
// girder bridges), widened generously: a warning should mean "look again".
constexpr std::array<PlausibilityBound, 22> kBounds{{
    {"geometry.spans[]", "span length", Quantity::length, 3.0, 1000.0,
     "girder spans run from culvert size to a few hundred feet; none reaches 1000 ft"},
    {"traffic.clear_roadway_width", "clear roadway width", Quantity::length, 8.0, 200.0,
     "one narrow lane to a very wide urban deck"},
    {"girders[].spacing", "girder spacing", Quantity::length, 1.0, 20.0,
     "adjacent boxes to widely spaced plate girders; LRFD's distribution equations stop at 16 ft"},
    {"girders[].overhang", "deck overhang", Quantity::length, -5.0, 12.0, "overhangs rarely exceed about 6 ft"},
    {"materials.steel.fy", "yield stress Fy", Quantity::stress, 20.0, 120.0,
     "early structural steels of about 26 ksi to ASTM A709 Grade 100"},
    {"materials.steel.fu", "tensile strength Fu", Quantity::stress, 40.0, 140.0,
     "tensile strengths of bridge steels, about 50 to 110 ksi"},
    {"materials.steel.E", "steel modulus E", Quantity::stress, 25000.0, 31000.0,
     "all structural steels have about 29000 ksi, AASHTO LRFD 6.4.1"},
    {"materials.reinforcement.fy", "reinforcement yield fy", Quantity::stress, 30.0, 100.0,
     "structural grade 33 ksi bars to ASTM A1035 Grade 100"},
    {"materials.reinforcement.E", "reinforcement modulus E", Quantity::stress, 25000.0, 31000.0,
     "reinforcing bars have about 29000 ksi, AASHTO LRFD 5.4.3.2"},
    {"materials.strand.fpu", "strand tensile strength fpu", Quantity::stress, 150.0, 300.0,
     "stress-relieved and low-relaxation strand, 250 and 270 ksi grades"},
    {"materials.girder_concrete.fc", "concrete strength f'c", Quantity::stress, 2.0, 15.0,
     "old cast-in-place concrete of about 2.5 ksi to high-strength precast"},
    {"materials.deck_concrete.fc", "deck concrete strength f'c", Quantity::stress, 2.0, 15.0,
     "old cast-in-place concrete of about 2.5 ksi to high-strength precast"},
    {"materials.girder_concrete.unit_weight", "concrete unit weight", Quantity::unit_weight, 0.09, 0.165,
     "lightweight concrete of about 0.11 kcf to normal-weight reinforced concrete of about 0.15 kcf"},
    {"materials.deck_concrete.unit_weight", "deck concrete unit weight", Quantity::unit_weight, 0.09, 0.165,
     "lightweight concrete of about 0.11 kcf to normal-weight reinforced concrete of about 0.15 kcf"},
    {"sections[].deck.thickness", "deck thickness", Quantity::section_length, 4.0, 16.0,
     "cast-in-place decks are about 6 to 9 in thick"},
    {"sections[].steel_i.web.depth", "web depth", Quantity::section_length, 4.0, 200.0,
     "small rolled beams to deep plate girders"},
    {"sections[].steel_i.top_flange.thickness", "flange thickness", Quantity::section_length, 0.15, 6.0,
     "rolled and plate flanges"},
    {"sections[].steel_i.bottom_flange.thickness", "flange thickness", Quantity::section_length, 0.15, 6.0,
     "rolled and plate flanges"},
    {"sections[].rc_beam.height", "beam height", Quantity::section_length, 6.0, 120.0,
     "slabs and T-beams of highway bridges"},
    {"dead_loads[].uniform.intensity", "uniform dead load", Quantity::line_load, 0.001, 40.0,
     "a light utility to the deck and barriers of a whole cross-section"},
    {"dead_loads[].wearing_surface.thickness", "wearing surface thickness", Quantity::section_length, 0.25, 12.0,
     "thin overlays to several layers of bituminous paving"},
    {"dead_loads[].wearing_surface.unit_weight", "wearing surface unit weight", Quantity::unit_weight, 0.08, 0.165,
     "bituminous paving weighs about 0.14 kcf, concrete about 0.15 kcf"},
}};

struct UnitSlip {
  Real factor;  // multiply the typed number by this to read it in the expected unit
  const char* looks_like;
};

// Unit slips worth naming, per quantity and unit system. Factors follow from
// the exact definitions in engine/core/units.h (1 in = 25.4 mm, 1 ksi =
// 6.894757 MPa).
std::vector<UnitSlip> slips(Quantity quantity, UnitSystem system) {
  constexpr Real kMpaPerKsi = units::kKsi / units::kMegapascal;
  const bool us = system == UnitSystem::us;
  switch (quantity) {
    case Quantity::length:
      return us ? std::vector<UnitSlip>{{1.0 / 12.0, "inches; expected ft"},
                                        {1.0 / units::kFoot, "metres; expected ft"}}
                : std::vector<UnitSlip>{{1.0e-3, "millimetres; expected m"}, {units::kFoot, "feet; expected m"}};
    case Quantity::section_length:
      return us ? std::vector<UnitSlip>{{12.0, "feet; expected in"}, {1.0 / 25.4, "millimetres; expected in"}}
                : std::vector<UnitSlip>{{25.4, "inches; expected mm"}, {1000.0, "metres; expected mm"}};
    case Quantity::stress:
      return us ? std::vector<UnitSlip>{{1.0e-3, "psi; expected ksi"}, {1.0 / kMpaPerKsi, "MPa; expected ksi"}}
                : std::vector<UnitSlip>{
                      {kMpaPerKsi, "ksi; expected MPa"}, {1.0e-3, "kPa; expected MPa"}, {1.0e-6, "Pa; expected MPa"}};
    case Quantity::line_load:
      return us ? std::vector<UnitSlip>{{1.0e-3, "lb/ft; expected kip/ft"}}
                : std::vector<UnitSlip>{{1.0e-3, "N/m; expected kN/m"}};
    case Quantity::unit_weight:
      // 1 kg/m^3 of mass weighs 9.80665e-3 kN/m^3 (standard gravity).
      return us ? std::vector<UnitSlip>{{1.0e-3, "pcf (lb/ft^3); expected kcf"}}
                : std::vector<UnitSlip>{{9.80665e-3, "a density in kg/m^3; expected a unit weight in kN/m^3"}};
    default:
      return {};
  }
}

std::vector<std::string> split_pattern(std::string_view pattern) {
  std::vector<std::string> tokens;
  std::string current;
  for (char c : pattern) {
    if (c == '.') {
      if (!current.empty()) tokens.push_back(current);
      current.clear();
    } else if (c == '[') {
      if (!current.empty()) tokens.push_back(current);
      current.clear();
      tokens.emplace_back("[]");
    } else if (c != ']') {
      current += c;
    }
  }
  if (!current.empty()) tokens.push_back(current);
  return tokens;
}

// Calls `visit(path, node)` for every node matching the pattern tokens.
template <typename Visit>
void match(const YamlNode& node, const std::vector<std::string>& tokens, std::size_t i, YamlPath& path, Visit&& visit) {
  if (i == tokens.size()) {
    visit(path, node);
    return;
  }
  if (tokens[i] == "[]") {
    for (std::size_t k = 0; k < node.items.size(); ++k) {
      path.push_back(YamlPathStep{"", k});
      match(node.items[k], tokens, i + 1, path, visit);
      path.pop_back();
    }
    return;
  }
  if (const YamlNode* next = node.find(tokens[i])) {
    path.push_back(YamlPathStep{tokens[i], std::nullopt});
    match(*next, tokens, i + 1, path, visit);
    path.pop_back();
  }
}

void check_bound(const PlausibilityBound& bound, const YamlNode& root, UnitSystem system, Diagnostics& out) {
  const Real low = units::to_internal(bound.low_us, bound.quantity, UnitSystem::us);
  const Real high = units::to_internal(bound.high_us, bound.quantity, UnitSystem::us);
  YamlPath path;
  match(root, split_pattern(bound.field), 0, path, [&](const YamlPath& at, const YamlNode& node) {
    if (!node.is_number()) return;
    const Real typed = node.number();
    const Real value = units::to_internal(typed, bound.quantity, system);
    if (value >= low && value <= high) return;
    std::string message = fmt::format("{} {} is implausible for {}; expected {} to {} ({})", node.text,
                                      units::label(bound.quantity, system), bound.what,
                                      format_number(units::from_internal(low, bound.quantity, system)),
                                      format_quantity(high, bound.quantity, system), bound.reason);
    for (const UnitSlip& slip : slips(bound.quantity, system)) {
      const Real corrected = units::to_internal(typed * slip.factor, bound.quantity, system);
      if (corrected >= low && corrected <= high) {
        message += fmt::format("; looks like {}", slip.looks_like);
        break;
      }
    }
    out.push_back(Diagnostic{Severity::warning, node.where, to_string(at), std::move(message)});
  });
}

// Given properties: the radius of gyration r = sqrt(I/A) of a girder section
// is about 0.3 to 0.45 of its depth (0.29 for a solid rectangle, about 0.42
// for a wide-flange beam; common practice), so I and A imply a depth. One far
// outside 4 in to 30 ft points at a unit slip in I or A.
void check_implied_depth(const YamlNode& root, UnitSystem system, Diagnostics& out) {
  const Real shallowest = units::to_internal(4.0, Quantity::section_length, UnitSystem::us);
  const Real deepest = units::to_internal(30.0, Quantity::length, UnitSystem::us);
  YamlPath path;
  match(root, split_pattern("sections[].properties"), 0, path, [&](const YamlPath& at, const YamlNode& properties) {
    for (const YamlMember& stage : properties.members) {
      const YamlNode* area = stage.value.find("area");
      const YamlNode* inertia = stage.value.find("inertia");
      if (area == nullptr || inertia == nullptr || !area->is_number() || !inertia->is_number()) continue;
      const Real a = units::to_internal(area->number(), Quantity::area, system);
      const Real i = units::to_internal(inertia->number(), Quantity::inertia, system);
      if (a <= 0 || i <= 0) continue;
      const Real r = std::sqrt(i / a);
      const Real depth_low = r / 0.45, depth_high = r / 0.29;
      if (depth_high >= shallowest && depth_low <= deepest) continue;
      out.push_back(Diagnostic{
          Severity::warning, inertia->where, to_string(with_key(with_key(at, stage.key), "inertia")),
          fmt::format("inertia {} {} with area {} {} implies a section about {} deep; check the units of both "
                      "(expected {} and {})",
                      inertia->text, units::label(Quantity::inertia, system), area->text,
                      units::label(Quantity::area, system),
                      format_quantity(std::sqrt(depth_low * depth_high), Quantity::section_length, system),
                      units::label(Quantity::inertia, system), units::label(Quantity::area, system))});
    }
  });
}

}  // namespace

std::span<const PlausibilityBound> plausibility_bounds() { return kBounds; }

void check_plausibility(const YamlNode& root, UnitSystem system, Diagnostics& diagnostics) {
  for (const PlausibilityBound& bound : kBounds) check_bound(bound, root, system, diagnostics);
  check_implied_depth(root, system, diagnostics);
}

}  // namespace tenthpoint::io
