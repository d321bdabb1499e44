#include "engine/capacity/section_loss.h"

#include <algorithm>
#include <cmath>
#include <type_traits>

#include <fmt/format.h>

#include "engine/core/errors.h"
#include "engine/core/units.h"

namespace tenthpoint::capacity {
namespace {

using section::detail::kStationTolerance;

std::string describe(const model::SectionLoss& loss) {
  const std::string amount = loss.thickness_loss ? fmt::format("{:.4g} mm thickness", *loss.thickness_loss * 1000.0)
                                                 : fmt::format("{:g} %", loss.percent_loss.value_or(0.0));
  return fmt::format("{} loss of {} on girder {} from {:.3f} m to {:.3f} m", to_string(loss.element), amount,
                     loss.girder, loss.start, loss.end);
}

[[noreturn]] void reject(const model::SectionLoss& loss, const std::string& message) {
  throw InputError(loss.where, "section_loss", fmt::format("{}: {}", describe(loss), message));
}

Real remaining_fraction(const model::SectionLoss& loss) {
  const Real percent = loss.percent_loss.value_or(0.0);
  if (!(percent >= 0 && percent <= 100)) reject(loss, "percent_loss must be 0 to 100");
  return 1.0 - percent / 100.0;
}

// A thickness after the loss; rejects a loss that leaves nothing.
Real reduced_thickness(const model::SectionLoss& loss, Real thickness, const char* what) {
  Real out = thickness;
  if (loss.thickness_loss) {
    if (!(*loss.thickness_loss >= 0)) reject(loss, "thickness_loss must not be negative");
    out = thickness - *loss.thickness_loss;
  } else {
    out = thickness * remaining_fraction(loss);
  }
  if (!(out > 0)) {
    reject(loss, fmt::format("leaves no {} (thickness {:.4g} mm); model the member as lost or give its capacity", what,
                             thickness * 1000.0));
  }
  return out;
}

Real area_fraction_only(const model::SectionLoss& loss, const char* what) {
  if (loss.thickness_loss) reject(loss, fmt::format("{} loss must be given as percent_loss", what));
  return remaining_fraction(loss);
}

void scale_bars(std::vector<model::BarLayer>& layers, Real fraction) {
  for (model::BarLayer& layer : layers) layer.area *= fraction;
  layers.erase(std::remove_if(layers.begin(), layers.end(), [](const model::BarLayer& l) { return !(l.area > 0); }),
               layers.end());
}

// Returns true when the loss changed the section.
bool apply_to_deck(DeterioratedSection& out, const model::SectionLoss& loss) {
  if (!out.section.deck) {
    out.warnings.push_back(fmt::format("{}: section {} has no deck; loss not applied", describe(loss), out.section.id));
    return false;
  }
  model::DeckSlab& deck = *out.section.deck;
  if (loss.element == model::SectionElement::bars) {
    if (deck.longitudinal_bars.empty()) {
      out.warnings.push_back(
          fmt::format("{}: the deck of section {} has no bars; loss not applied", describe(loss), out.section.id));
      return false;
    }
    scale_bars(deck.longitudinal_bars, area_fraction_only(loss, "bar"));
    out.notes.push_back(fmt::format("{}: deck bar areas reduced", describe(loss)));
    return true;
  }
  deck.thickness = reduced_thickness(loss, deck.thickness, "deck");
  for (model::BarLayer& layer : deck.longitudinal_bars) layer.depth = std::min(layer.depth, deck.thickness);
  out.notes.push_back(fmt::format("{}: deck thickness now {:.4g} mm", describe(loss), deck.thickness * 1000.0));
  return true;
}

bool apply_to_steel(DeterioratedSection& out, model::SteelIGirder& girder, const model::SectionLoss& loss) {
  using model::SectionElement;
  auto plate = [&](model::Plate& p, const char* what) {
    p.thickness = reduced_thickness(loss, p.thickness, what);
    out.notes.push_back(fmt::format("{}: {} thickness now {:.4g} mm", describe(loss), what, p.thickness * 1000.0));
    return true;
  };
  switch (loss.element) {
    case SectionElement::top_flange:
      return plate(girder.top_flange, "top flange");
    case SectionElement::bottom_flange:
      return plate(girder.bottom_flange, "bottom flange");
    case SectionElement::web: {
      // model::Plate stores the web depth as width and tw as thickness.
      return plate(girder.web, "web");
    }
    case SectionElement::cover_plate: {
      bool any = false;
      for (std::optional<model::Plate>* cover : {&girder.top_cover_plate, &girder.bottom_cover_plate}) {
        if (!*cover) continue;
        any = true;
        const Real remaining = loss.thickness_loss ? (*cover)->thickness - *loss.thickness_loss
                                                   : (*cover)->thickness * remaining_fraction(loss);
        if (remaining > 0) {
          (*cover)->thickness = remaining;
          out.notes.push_back(
              fmt::format("{}: cover plate thickness now {:.4g} mm", describe(loss), remaining * 1000.0));
        } else {
          cover->reset();
          out.notes.push_back(fmt::format("{}: cover plate lost entirely and removed", describe(loss)));
        }
      }
      if (!any) {
        out.warnings.push_back(
            fmt::format("{}: section {} has no cover plate; loss not applied", describe(loss), out.section.id));
      }
      return any;
    }
    case SectionElement::bars:
    case SectionElement::deck:
      return apply_to_deck(out, loss);
    case SectionElement::strands:
      break;
  }
  reject(loss, fmt::format("element strands does not belong to the steel section {}", out.section.id));
}

bool apply_to_rc(DeterioratedSection& out, model::ReinforcedConcreteBeam& beam, const model::SectionLoss& loss) {
  using model::SectionElement;
  if (loss.element == SectionElement::bars) {
    const Real fraction = area_fraction_only(loss, "bar");
    scale_bars(beam.bottom_bars, fraction);
    scale_bars(beam.top_bars, fraction);
    out.notes.push_back(
        fmt::format("{}: every bar layer reduced to {:g} % of its area", describe(loss), fraction * 100));
    return true;
  }
  if (loss.element == SectionElement::deck) {
    if (out.section.deck) return apply_to_deck(out, loss);
    if (!loss.thickness_loss) reject(loss, "deck loss of a monolithic rc_beam must be given as thickness_loss");
    const Real lost = *loss.thickness_loss;
    if (!(lost >= 0) || (beam.flange_thickness > 0 && lost >= beam.flange_thickness) || lost >= beam.height) {
      reject(loss, "leaves no flange; model the member as lost or give its capacity");
    }
    beam.height -= lost;
    if (beam.flange_thickness > 0) beam.flange_thickness -= lost;
    for (std::vector<model::BarLayer>* layers : {&beam.bottom_bars, &beam.top_bars}) {
      for (model::BarLayer& layer : *layers) {
        layer.depth -= lost;
        if (!(layer.depth > 0)) reject(loss, "removes the concrete over a bar layer; give the capacity instead");
      }
    }
    out.notes.push_back(
        fmt::format("{}: top surface lowered, height now {:.4g} mm", describe(loss), beam.height * 1000));
    return true;
  }
  reject(loss, fmt::format("element {} does not belong to the reinforced concrete section {}", to_string(loss.element),
                           out.section.id));
}

bool apply_to_ps(DeterioratedSection& out, model::PrestressedGirder& girder, const model::SectionLoss& loss) {
  using model::SectionElement;
  if (loss.element == SectionElement::strands) {
    const Real fraction = area_fraction_only(loss, "strand");
    for (model::StrandLayer& layer : girder.strands) layer.strand_area *= fraction;
    out.notes.push_back(fmt::format("{}: strand area reduced to {:g} % (as losing that share of the strands)",
                                    describe(loss), fraction * 100));
    return true;
  }
  if (loss.element == SectionElement::bars || loss.element == SectionElement::deck) return apply_to_deck(out, loss);
  reject(loss, fmt::format("element {} does not belong to the prestressed section {}", to_string(loss.element),
                           out.section.id));
}

}  // namespace

bool loss_covers(const model::SectionLoss& loss, Real station, section::Side side, Real girder_length) {
  if (loss.end - loss.start <= kStationTolerance) return std::abs(station - loss.start) <= kStationTolerance;
  if (station < loss.start - kStationTolerance || station > loss.end + kStationTolerance) return false;
  if (std::abs(station - loss.start) <= kStationTolerance) {
    return side == section::Side::right || std::abs(loss.start) <= kStationTolerance;
  }
  if (std::abs(station - loss.end) <= kStationTolerance) {
    return side == section::Side::left || std::abs(loss.end - girder_length) <= kStationTolerance;
  }
  return true;
}

std::vector<model::SectionLoss> losses_at(const model::Inspection& inspection, const std::string& girder_id,
                                          Real station, section::Side side, Real girder_length) {
  std::vector<model::SectionLoss> out;
  for (const model::SectionLoss& loss : inspection.section_loss) {
    if (loss.girder == girder_id && loss_covers(loss, station, side, girder_length)) out.push_back(loss);
  }
  return out;
}

DeterioratedSection apply_section_loss(const model::SectionDefinition& section,
                                       const std::vector<model::SectionLoss>& losses) {
  DeterioratedSection out;
  out.section = section;
  if (losses.empty()) return out;
  if (!section.description) {
    for (const model::SectionLoss& loss : losses) {
      out.warnings.push_back(
          fmt::format("{}: section {} has only given properties (no description), so the loss "
                      "cannot be applied",
                      describe(loss), section.id));
    }
    return out;
  }
  for (const model::SectionLoss& loss : losses) {
    if (loss.thickness_loss.has_value() == loss.percent_loss.has_value()) {
      reject(loss, "exactly one of thickness_loss and percent_loss must be given");
    }
    const bool changed = std::visit(
        [&](auto& d) {
          using T = std::decay_t<decltype(d)>;
          if constexpr (std::is_same_v<T, model::SteelIGirder>) {
            return apply_to_steel(out, d, loss);
          } else if constexpr (std::is_same_v<T, model::ReinforcedConcreteBeam>) {
            return apply_to_rc(out, d, loss);
          } else {
            return apply_to_ps(out, d, loss);
          }
        },
        *out.section.description);
    if (changed) out.applied.push_back(loss);
  }
  if (out.reduced() && out.section.properties) {
    out.section.properties.reset();
    out.notes.push_back("given section properties dropped: every stage is recomputed from the reduced description");
  }
  return out;
}

}  // namespace tenthpoint::capacity
