#include "engine/section/girder_section_profile.h"

#include <cmath>
#include <map>
#include <type_traits>

#include <fmt/format.h>

#include "engine/core/errors.h"
#include "engine/section/steel_i_section.h"

namespace tenthpoint::section {
namespace {

std::optional<Real> depth_of(const model::SectionDefinition& section) {
  if (!section.description) return std::nullopt;
  return std::visit(
      [&](const auto& d) -> Real {
        using T = std::decay_t<decltype(d)>;
        if constexpr (std::is_same_v<T, model::SteelIGirder>) {
          return SteelISection(d, detail::SectionContext{section.id, section.where}).depth();
        } else {
          return d.height;
        }
      },
      *section.description);
}

}  // namespace

GirderSectionProfile::GirderSectionProfile(const model::Bridge& bridge, const model::GirderLine& girder,
                                           const SectionOptions& options)
    : girder_id_(girder.id) {
  const std::string field = fmt::format("girders[{}].segments", girder.id);
  if (girder.segments.empty()) throw InputError(girder.where, field, "a girder line needs at least one segment");
  const Real total = bridge.geometry.total_length();

  std::map<std::string, SectionStages> resolved;
  auto find = [&](const std::string& id, const model::Segment& segment) -> const model::SectionDefinition& {
    const model::SectionDefinition* s = bridge.find_section(id);
    if (s == nullptr) throw InputError(segment.where, field, fmt::format("unknown section '{}'", id));
    return *s;
  };

  Real expected_start = 0;
  for (std::size_t i = 0; i < girder.segments.size(); ++i) {
    const model::Segment& segment = girder.segments[i];
    const std::string at = fmt::format("{}[{}]", field, i);
    if (std::abs(segment.start - expected_start) > detail::kStationTolerance) {
      throw InputError(segment.where, at + ".start",
                       fmt::format("must be {:g} m to follow the previous segment without gap or overlap (got {:g} m)",
                                   expected_start, segment.start));
    }
    if (!(segment.end > segment.start + detail::kStationTolerance)) {
      throw InputError(segment.where, at + ".end",
                       fmt::format("must be beyond the start {:g} m (got {:g} m)", segment.start, segment.end));
    }
    if (segment.end_section.has_value() != segment.taper.has_value()) {
      throw InputError(segment.where, at, "end_section and taper must be given together");
    }
    const model::SectionDefinition& start_section = find(segment.section, segment);
    Piece piece;
    if (segment.prismatic()) {
      auto it = resolved.find(start_section.id);
      if (it == resolved.end()) {
        it = resolved.emplace(start_section.id, section_stages(start_section, bridge.materials, options)).first;
      }
      piece.prismatic = it->second;
      piece.prismatic_depth = depth_of(start_section);
    } else {
      const model::SectionDefinition& end_section = find(*segment.end_section, segment);
      piece.tapered = std::make_shared<const TaperedSection>(start_section, end_section, *segment.taper, segment.start,
                                                             segment.end, bridge.materials, options, segment.where);
    }
    if (boundaries_.empty()) boundaries_.push_back(segment.start);
    boundaries_.push_back(segment.end);
    pieces_.push_back(std::move(piece));
    expected_start = segment.end;
  }
  if (std::abs(boundaries_.back() - total) > detail::kStationTolerance) {
    throw InputError(girder.segments.back().where, fmt::format("{}[{}].end", field, girder.segments.size() - 1),
                     fmt::format("must be the girder length {:g} m (got {:g} m)", total, boundaries_.back()));
  }
}

StiffnessProfile GirderSectionProfile::stiffness(model::SectionStage stage) const {
  StiffnessProfile profile;
  for (std::size_t i = 0; i < pieces_.size(); ++i) {
    StiffnessPiece p;
    p.start = boundaries_[i];
    p.end = boundaries_[i + 1];
    if (pieces_[i].prismatic) {
      p.flexural_rigidity = pieces_[i].prismatic->at(stage).flexural_rigidity();
    } else {
      std::shared_ptr<const TaperedSection> tapered = pieces_[i].tapered;
      p.flexural_rigidity = std::function<Real(Real)>(
          [tapered, stage](Real station) { return tapered->flexural_rigidity(stage, station); });
    }
    profile.pieces.push_back(std::move(p));
  }
  return profile;
}

std::optional<StiffnessProfile> GirderSectionProfile::cracked_negative_stiffness() const {
  StiffnessProfile profile;
  for (std::size_t i = 0; i < pieces_.size(); ++i) {
    StiffnessPiece p;
    p.start = boundaries_[i];
    p.end = boundaries_[i + 1];
    if (pieces_[i].prismatic) {
      if (!pieces_[i].prismatic->cracked_negative) return std::nullopt;
      p.flexural_rigidity = pieces_[i].prismatic->cracked_negative->flexural_rigidity();
    } else {
      std::shared_ptr<const TaperedSection> tapered = pieces_[i].tapered;
      if (!tapered->cracked_negative_rigidity(tapered->start_station())) return std::nullopt;
      // Both ends have a cracked section, so every interior station has one.
      p.flexural_rigidity =
          std::function<Real(Real)>([tapered](Real station) { return *tapered->cracked_negative_rigidity(station); });
    }
    profile.pieces.push_back(std::move(p));
  }
  return profile;
}

const GirderSectionProfile::Piece& GirderSectionProfile::piece_at(Real station, Side side) const {
  return pieces_[detail::locate(boundaries_, station, side)];
}

SectionStages GirderSectionProfile::stages_at(Real station, Side side) const {
  const Piece& piece = piece_at(station, side);
  if (piece.prismatic) return *piece.prismatic;
  return piece.tapered->stages_at(station);
}

StageProperties GirderSectionProfile::stage_at(model::SectionStage stage, Real station, Side side) const {
  return stages_at(station, side).at(stage);
}

std::optional<Real> GirderSectionProfile::girder_depth(Real station, Side side) const {
  const Piece& piece = piece_at(station, side);
  if (piece.prismatic) return piece.prismatic_depth;
  return piece.tapered->girder_depth(station);
}

}  // namespace tenthpoint::section
