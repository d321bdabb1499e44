#include "engine/capacity/steel_plastic_moment.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <vector>

#include <fmt/format.h>

#include "engine/core/units.h"

namespace tenthpoint::capacity {
namespace {

using units::Quantity;

// A rectangle at uniform plastic stress; concrete carries compression only.
struct Block {
  Real bottom;
  Real top;
  Real force_per_height;  // stress x width, N/m
  bool concrete;
};

// A lumped bar layer at its yield force.
struct Lump {
  Real height;
  Real force;  // N
};

struct Stack {
  std::vector<Block> blocks;
  std::vector<Lump> lumps;

  // Compression minus tension with the PNA at y. Lumps exactly at y count as
  // compression when `lump_in_compression`, else as tension.
  [[nodiscard]] Real net(Real y, bool lump_in_compression) const {
    Real compression = 0;
    Real tension = 0;
    for (const Block& b : blocks) {
      compression += b.force_per_height * std::max(0.0, b.top - std::max(b.bottom, y));
      if (!b.concrete) tension += b.force_per_height * std::max(0.0, std::min(b.top, y) - b.bottom);
    }
    for (const Lump& l : lumps) {
      if (l.height > y || (l.height == y && lump_in_compression)) {
        compression += l.force;
      } else {
        tension += l.force;
      }
    }
    return compression - tension;
  }

  // The PNA height: net() is nonincreasing in y, positive at the soffit and
  // negative at the top of the deck.
  [[nodiscard]] Real neutral_axis() const {
    std::vector<Real> breaks;
    for (const Block& b : blocks) {
      breaks.push_back(b.bottom);
      breaks.push_back(b.top);
    }
    for (const Lump& l : lumps) breaks.push_back(l.height);
    std::sort(breaks.begin(), breaks.end());
    breaks.erase(std::unique(breaks.begin(), breaks.end()), breaks.end());
    for (std::size_t i = 0; i < breaks.size(); ++i) {
      // A lump at the break can carry the imbalance: the PNA is at the lump.
      if (net(breaks[i], true) >= 0 && net(breaks[i], false) <= 0) return breaks[i];
      if (i + 1 == breaks.size()) break;
      const Real low = net(breaks[i], false);      // just above breaks[i]
      const Real high = net(breaks[i + 1], true);  // just below breaks[i + 1]
      if (low > 0 && high < 0) return breaks[i] + (breaks[i + 1] - breaks[i]) * low / (low - high);
    }
    assert(false && "net force does not change sign over the section");
    return breaks.back();
  }

  [[nodiscard]] Real moment_about(Real y) const {
    Real m = 0;
    for (const Block& b : blocks) {
      // Integral of |y' - y| over the part above y (compression) ...
      const Real from = std::max(b.bottom, y);
      if (b.top > from) m += b.force_per_height * ((b.top - y) * (b.top - y) - (from - y) * (from - y)) / 2;
      // ... and, for steel, the part below y (tension).
      const Real to = std::min(b.top, y);
      if (!b.concrete && to > b.bottom) {
        m += b.force_per_height * ((y - b.bottom) * (y - b.bottom) - (y - to) * (y - to)) / 2;
      }
    }
    for (const Lump& l : lumps) m += l.force * std::abs(l.height - y);
    return m;
  }
};

}  // namespace

std::string_view to_string(PlasticNeutralAxisLocation location) {
  switch (location) {
    case PlasticNeutralAxisLocation::slab:
      return "slab";
    case PlasticNeutralAxisLocation::haunch:
      return "haunch";
    case PlasticNeutralAxisLocation::top_flange:
      return "top flange";
    case PlasticNeutralAxisLocation::web:
      return "web";
    case PlasticNeutralAxisLocation::bottom_flange:
      return "bottom flange";
  }
  return "?";
}

CompositePlasticMoment composite_plastic_moment(const model::SteelIGirder& girder, const model::DeckSlab& deck,
                                                Real steel_yield, Real deck_strength, bool include_deck_bars,
                                                std::optional<Real> deck_bar_yield) {
  assert(steel_yield > 0 && deck_strength > 0 && deck.thickness > 0 && deck.effective_width > 0);
  CompositePlasticMoment out;
  CalculationTrace& t = out.trace;
  t.title = "plastic moment of the composite section";
  Stack stack;
  Real level = 0;
  Real bottom_force = 0;
  Real top_force = 0;
  auto add_plate = [&](const model::Plate& p, Real* force) {
    stack.blocks.push_back(Block{level, level + p.thickness, steel_yield * p.width, false});
    *force += steel_yield * p.width * p.thickness;
    level += p.thickness;
  };
  if (girder.bottom_cover_plate) add_plate(*girder.bottom_cover_plate, &bottom_force);
  add_plate(girder.bottom_flange, &bottom_force);
  const Real web_bottom = level;
  stack.blocks.push_back(Block{level, level + girder.web.width, steel_yield * girder.web.thickness, false});
  const Real web_force = steel_yield * girder.web.thickness * girder.web.width;
  level += girder.web.width;
  const Real web_top = level;
  add_plate(girder.top_flange, &top_force);
  if (girder.top_cover_plate) add_plate(*girder.top_cover_plate, &top_force);
  const Real girder_top = level;
  const Real slab_bottom = girder_top + deck.haunch;
  const Real slab_top = slab_bottom + deck.thickness;
  // Appendix D6.1: the slab at 0.85 f'c over its effective width.
  stack.blocks.push_back(Block{slab_bottom, slab_top, 0.85 * deck_strength * deck.effective_width, true});

  t.add_input("Fy", "steel yield strength", steel_yield, Quantity::stress);
  t.add_input("f'c", "deck concrete strength", deck_strength, Quantity::stress);
  t.add_input("beff", "effective deck width", deck.effective_width, Quantity::section_length);
  t.add_input("ts", "structural deck thickness", deck.thickness, Quantity::section_length);
  t.add_input("haunch", "haunch depth (concrete left out)", deck.haunch, Quantity::section_length);
  t.add_input("D", "web depth", girder.web.width, Quantity::section_length);
  t.add_input("tw", "web thickness", girder.web.thickness, Quantity::section_length);
  out.slab_force =
      t.add_step("Ps", "plastic force in the slab", "0.85 f'c beff ts",
                 0.85 * deck_strength * deck.effective_width * deck.thickness, Quantity::force, "AASHTO LRFD D6.1");
  t.add_step("Pc", "plastic force in the top flange (and top cover plate)", "Fy Afc", top_force, Quantity::force,
             "AASHTO LRFD D6.1");
  t.add_step("Pw", "plastic force in the web", "Fyw D tw", web_force, Quantity::force, "AASHTO LRFD D6.1");
  t.add_step("Pt", "plastic force in the bottom flange (and bottom cover plate)", "Fy Aft", bottom_force,
             Quantity::force, "AASHTO LRFD D6.1");
  out.steel_force = top_force + web_force + bottom_force;

  if (include_deck_bars && !deck.longitudinal_bars.empty()) {
    assert(deck_bar_yield && *deck_bar_yield > 0);
    Real bar_force = 0;
    for (const model::BarLayer& layer : deck.longitudinal_bars) {
      stack.lumps.push_back(Lump{slab_top - layer.depth, *deck_bar_yield * layer.area});
      bar_force += *deck_bar_yield * layer.area;
    }
    t.add_step("Pr", "plastic force in the deck bars", "Fyr Ar", bar_force, Quantity::force, "AASHTO LRFD D6.1");
  } else {
    t.add_note("deck longitudinal bars left out of Mp (common practice; conservative for a PNA in the slab)");
  }
  t.add_note("haunch concrete left out of Mp (its width is not in the model; common practice)");

  const Real y = stack.neutral_axis();
  out.neutral_axis = y;
  constexpr Real kOnBoundary = 1e-12;
  if (y >= slab_bottom - kOnBoundary) {
    out.location = PlasticNeutralAxisLocation::slab;
  } else if (y > girder_top + kOnBoundary) {
    out.location = PlasticNeutralAxisLocation::haunch;
  } else if (y >= web_top - kOnBoundary) {
    out.location = PlasticNeutralAxisLocation::top_flange;
  } else if (y > web_bottom + kOnBoundary) {
    out.location = PlasticNeutralAxisLocation::web;
  } else {
    out.location = PlasticNeutralAxisLocation::bottom_flange;
  }
  t.add_step("y_pna",
             fmt::format("height of the plastic neutral axis above the soffit (in the {})", to_string(out.location)),
             "compression = tension (Table D6.1-1 equilibrium)", y, Quantity::section_length, "AASHTO LRFD D6.1");
  out.plastic_moment = t.add_step("Mp", "plastic moment", "sum of plastic forces x distance to the PNA",
                                  stack.moment_about(y), Quantity::moment, "AASHTO LRFD D6.1, Table D6.1-1");
  out.total_depth = t.add_step("Dt", "total depth of the composite section", "deck top to soffit", slab_top,
                               Quantity::section_length, "AASHTO LRFD 6.10.7.3");
  out.depth_to_neutral_axis = t.add_step("Dp", "deck top to the plastic neutral axis", "Dt - y_pna", slab_top - y,
                                         Quantity::section_length, "AASHTO LRFD 6.10.7.3");
  out.web_compression_depth =
      t.add_step("Dcp", "depth of the web in compression at Mp", "web top - y_pna, in [0, D]",
                 std::clamp(web_top - y, 0.0, girder.web.width), Quantity::section_length, "AASHTO LRFD D6.3.2");
  return out;
}

}  // namespace tenthpoint::capacity
