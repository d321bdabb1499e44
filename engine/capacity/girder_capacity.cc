#include "engine/capacity/girder_capacity.h"

#include <algorithm>
#include <bit>
#include <cassert>
#include <cmath>
#include <type_traits>
#include <utility>
#include <variant>

#include <fmt/format.h>

#include "engine/capacity/concrete_flexure.h"
#include "engine/capacity/concrete_section_builder.h"
#include "engine/capacity/given_capacity_lookup.h"
#include "engine/capacity/lfr_concrete_flexure.h"
#include "engine/capacity/lfr_concrete_shear.h"
#include "engine/capacity/stage_moduli.h"
#include "engine/capacity/steel_composite_positive_flexure.h"
#include "engine/capacity/steel_flange_flexure.h"
#include "engine/capacity/steel_shear.h"
#include "engine/core/errors.h"
#include "engine/section/concrete_modulus.h"

namespace tenthpoint::capacity {
namespace {

using section::detail::kStationTolerance;

const char* side_name(section::Side side) { return side == section::Side::left ? "left" : "right"; }

CapacityOptions checked(const CapacityOptions& options) {
  std::string why;
  if (!options.is_valid(&why)) throw InputError(SourceLocation{}, "capacity options", why);
  return options;
}

// Heights above the soffit of the web's bottom and top edges.
struct WebEdges {
  Real bottom = 0;
  Real top = 0;
};

WebEdges web_edges(const model::SteelIGirder& g) {
  WebEdges e;
  e.bottom = g.bottom_flange.thickness + (g.bottom_cover_plate ? g.bottom_cover_plate->thickness : 0.0);
  e.top = e.bottom + g.web.width;
  return e;
}

}  // namespace

struct GirderCapacity::State {
  DeterioratedSection deteriorated;
  std::string label;
  std::optional<section::SectionStages> described;  // from the (reduced) description: geometry
  std::optional<section::SectionStages> analysis;   // stage moduli for stresses
};

// What shear() needs before the demand: the state, and for a concrete
// description the member sections for the moment sign and the flexural
// calculation giving dv (LRFD) or d (LFR, RC).
struct GirderCapacity::ShearBasis {
  State state;
  std::optional<ConcreteMemberSections> member;
  std::optional<ConcreteFlexure> flexure;
};

GirderCapacity::GirderCapacity(const model::Bridge& bridge, const model::GirderLine& girder,
                               const CapacityOptions& options)
    : source_file_(bridge.source_file),
      method_(bridge.rating.method),
      materials_(bridge.materials),
      sections_(bridge.sections),
      capacity_(bridge.capacity),
      girder_(girder),
      options_(checked(options)),
      profile_(bridge, girder, options_.section) {
  const std::optional<CalendarDate> as_of = options_.as_of ? options_.as_of : bridge.rating.as_of;
  if (const model::Inspection* record = bridge.latest_inspection(as_of)) inspection_ = *record;

  boundaries_.push_back(girder.segments.front().start);
  for (const model::Segment& segment : girder.segments) {
    boundaries_.push_back(segment.end);
    if (segment.prismatic()) {
      tapered_.push_back(nullptr);
      continue;
    }
    // Haunched segments: the blended description at any station (the
    // profile has already checked both ends).
    tapered_.push_back(std::make_shared<const section::TaperedSection>(
        *bridge.find_section(segment.section), *bridge.find_section(*segment.end_section), *segment.taper,
        segment.start, segment.end, materials_, options_.section, segment.where));
  }

  brace_points_ = girder.brace_stations;
  brace_points_.push_back(0.0);
  brace_points_.push_back(profile_.length());
  std::sort(brace_points_.begin(), brace_points_.end());
  std::vector<Real> unique;
  for (Real x : brace_points_) {
    if (x < -kStationTolerance || x > profile_.length() + kStationTolerance) continue;
    if (unique.empty() || x - unique.back() > kStationTolerance) unique.push_back(x);
  }
  brace_points_ = unique;
}

std::vector<model::SectionLoss> GirderCapacity::losses_here(Real station, section::Side side) const {
  if (!inspection_) return {};
  return losses_at(*inspection_, girder_.id, station, side, profile_.length());
}

DeterioratedSection GirderCapacity::section_at(Real station, section::Side side) const {
  const std::size_t index = section::detail::locate(boundaries_, station, side);
  model::SectionDefinition definition;
  if (tapered_[index]) {
    definition = tapered_[index]->section_at(station);
  } else {
    const std::string& id = girder_.segments[index].section;
    const auto it =
        std::find_if(sections_.begin(), sections_.end(), [&](const model::SectionDefinition& s) { return s.id == id; });
    assert(it != sections_.end());  // the profile resolved every segment
    definition = *it;
  }
  return apply_section_loss(definition, losses_here(station, side));
}

Real GirderCapacity::unbraced_length(Real station, section::Side side) const {
  const std::size_t panel = section::detail::locate(brace_points_, station, side);
  return brace_points_[panel + 1] - brace_points_[panel];
}

GirderCapacity::State GirderCapacity::state_at(Real station, section::Side side) const {
  State s;
  s.deteriorated = section_at(station, side);
  s.label = fmt::format("girder {} at {:.3f} m ({} side), section {}", girder_.id, station, side_name(side),
                        s.deteriorated.section.id);
  if (!s.deteriorated.section.description) return s;
  s.described = section::described_section_stages(s.deteriorated.section, materials_, options_.section);
  s.analysis = s.deteriorated.reduced() ? s.described : profile_.stages_at(station, side);
  return s;
}

void GirderCapacity::finish(Resistance& r, const State& state) const {
  for (const std::string& note : state.deteriorated.notes) r.trace.add_note(note);
  r.warnings.insert(r.warnings.end(), state.deteriorated.warnings.begin(), state.deteriorated.warnings.end());
  if (state.deteriorated.reduced()) {
    r.warnings.push_back(fmt::format("{}: section reduced for {} loss record(s) of the inspection of {}", state.label,
                                     state.deteriorated.applied.size(), inspection_->date.to_iso()));
  }
  // Load Factor Rating: concrete flexure and RC shear follow the Standard
  // Specifications (lfr_concrete_*.h). What still comes from AASHTO LRFD is
  // said, case by case.
  if (r.status == ResistanceStatus::computed && method_ == model::RatingMethod::lfr &&
      r.article.rfind("AASHTO Standard Specifications", 0) != 0) {
    if (model::is_steel(materials_.kind)) {
      r.warnings.push_back(
          "steel resistances follow AASHTO LRFD 6.10 (phi = 1.0, as load factor design); for a compact composite "
          "section in positive flexure both it and Standard Specifications 10.50.1.1 give Mp, otherwise Standard "
          "Specifications 10.48/10.50 (ductility reduction, lateral-torsional buckling, 10.48.8 shear) are not "
          "implemented for Load Factor Rating");
    } else {
      r.warnings.push_back(
          "prestressed concrete shear follows AASHTO LRFD 5.7.3; Standard Specifications 9.20 (Vci, Vcw) is not "
          "implemented for Load Factor Rating");
    }
  }
}

Resistance GirderCapacity::steel_flexure(const State& s, MomentSign sign, Real station, section::Side side) const {
  const auto& girder = std::get<model::SteelIGirder>(*s.deteriorated.section.description);
  if (!materials_.steel) {
    throw InputError(SourceLocation{source_file_, 0, 0}, "materials.steel", "missing; needed for steel flexure");
  }
  const model::Steel& steel = *materials_.steel;
  const section::SectionStages& described = *s.described;
  const section::SectionStages& analysis = *s.analysis;
  const std::string label = fmt::format("{} {} moment", s.label, to_string(sign));

  if (materials_.composite && sign == MomentSign::positive) {
    if (!materials_.deck_concrete) {
      throw InputError(SourceLocation{source_file_, 0, 0}, "materials.deck_concrete",
                       "missing; needed for composite flexure");
    }
    CompositePositiveFlexureInput in;
    in.label = label;
    in.girder = girder;
    in.deck = *s.deteriorated.section.deck;
    in.steel_yield = steel.yield_strength;
    in.steel_modulus = steel.modulus;
    in.deck_strength = materials_.deck_concrete->compressive_strength;
    in.include_deck_bars = options_.include_deck_bars_in_plastic_moment;
    if (in.include_deck_bars) {
      in.deck_bar_yield = materials_.reinforcement ? materials_.reinforcement->yield_strength : steel.yield_strength;
    }
    in.stages = described;
    CompositePositiveFlexure out = composite_positive_flexure(in, options_.resistance);
    if (out.resistance.flange_stress) out.resistance.flange_stress->moduli = uncracked_stage_moduli(analysis);
    return out.resistance;
  }

  SteelFlangeFlexureInput in;
  in.label = label;
  in.girder = girder;
  in.steel_yield = steel.yield_strength;
  in.steel_modulus = steel.modulus;
  in.compression_on_top = sign == MomentSign::positive;
  in.unbraced_length = unbraced_length(station, side);
  in.moment_gradient_factor = options_.moment_gradient_factor;
  // The live-load section: steel plus deck bars in negative flexure of a
  // composite girder (6.10.1.1.1c), else the steel alone.
  const bool cracked = materials_.composite && described.cracked_negative.has_value();
  const section::StageProperties& live = cracked ? *described.cracked_negative : described.noncomposite;
  assert(live.neutral_axis);
  const WebEdges web = web_edges(girder);
  in.web_compression_depth = std::clamp(
      in.compression_on_top ? web.top - *live.neutral_axis : *live.neutral_axis - web.bottom, 0.0, girder.web.width);
  in.compression_modulus = in.compression_on_top ? live.section_modulus_top : live.section_modulus_bottom;
  in.tension_modulus = in.compression_on_top ? live.section_modulus_bottom : live.section_modulus_top;
  in.moduli = materials_.composite ? cracked_stage_moduli(analysis) : uncracked_stage_moduli(analysis);
  Resistance r = steel_flange_flexure(in, options_.resistance).resistance;
  r.trace.add_note(cracked
                       ? "Dc and the moment equivalent on the steel plus deck bars (AASHTO LRFD D6.3.1, 6.10.1.1.1c)"
                       : "Dc and the moment equivalent on the steel section");
  return r;
}

Resistance GirderCapacity::flexure(Real station, MomentSign sign, section::Side side) const {
  if (capacity_.mode == model::CapacitySource::given) {
    return given_resistance(capacity_.given, girder_.id, station, side, model::ForceEffect::moment, sign,
                            losses_here(station, side));
  }
  const State s = state_at(station, side);
  if (!s.deteriorated.section.description) {
    Resistance r = Resistance::unavailable_because(fmt::format(
        "{}: the section has no description (steel_i, rc_beam or ps_girder), so its capacity cannot be computed; "
        "give capacity.given for this region",
        s.label));
    finish(r, s);
    return r;
  }
  Resistance r = std::visit(
      [&](const auto& d) -> Resistance {
        using T = std::decay_t<decltype(d)>;
        if constexpr (std::is_same_v<T, model::SteelIGirder>) {
          return steel_flexure(s, sign, station, side);
        } else {
          const ConcreteMemberSections member =
              std::is_same_v<T, model::ReinforcedConcreteBeam>
                  ? reinforced_concrete_sections(s.deteriorated.section, materials_, sign, options_.density_factor,
                                                 source_file_)
                  : prestressed_sections(s.deteriorated.section, materials_, sign, options_.density_factor,
                                         source_file_);
          ConcreteFlexure f = method_ == model::RatingMethod::lfr
                                  ? lfr_concrete_flexure(member.flexure)
                                  : concrete_flexure(member.flexure, options_.resistance);
          for (const std::string& note : member.notes) f.resistance.trace.add_note(note);
          f.resistance.warnings.insert(f.resistance.warnings.end(), member.warnings.begin(), member.warnings.end());
          return f.resistance;
        }
      },
      *s.deteriorated.section.description);
  finish(r, s);
  return r;
}

const GirderCapacity::ShearBasis& GirderCapacity::shear_basis(Real station, section::Side side, MomentSign sign) const {
  // Exact key: the bit pattern, so that neither a nearby station nor -0.0
  // for 0.0 (which would print differently in the label) can match.
  const ShearKey key{std::bit_cast<std::uint64_t>(station), static_cast<int>(side), static_cast<int>(sign)};
  if (const auto it = shear_memo_.find(key); it != shear_memo_.end()) return *it->second;
  auto basis = std::make_shared<ShearBasis>();
  basis->state = state_at(station, side);
  const model::SectionDefinition& section = basis->state.deteriorated.section;
  if (section.description && !std::holds_alternative<model::SteelIGirder>(*section.description)) {
    const bool rc = std::holds_alternative<model::ReinforcedConcreteBeam>(*section.description);
    basis->member = rc ? reinforced_concrete_sections(section, materials_, sign, options_.density_factor, source_file_)
                       : prestressed_sections(section, materials_, sign, options_.density_factor, source_file_);
    // d for Standard Specifications 8.16.6 from 8.16.3 (LFR, RC); else dv
    // from the LRFD flexural calculation (5.7.2.8).
    basis->flexure = method_ == model::RatingMethod::lfr && rc
                         ? lfr_concrete_flexure(basis->member->flexure)
                         : concrete_flexure(basis->member->flexure, options_.resistance);
  }
  // Inserted only once complete: a builder that throws leaves no entry, so
  // the next call throws the same error.
  return *shear_memo_.emplace(key, std::move(basis)).first->second;
}

Resistance GirderCapacity::shear(Real station, section::Side side, const std::optional<ShearDemand>& demand,
                                 MomentSign sign) const {
  if (capacity_.mode == model::CapacitySource::given) {
    return given_resistance(capacity_.given, girder_.id, station, side, model::ForceEffect::shear, MomentSign::positive,
                            losses_here(station, side));
  }
  if (demand) sign = demand->moment < 0 ? MomentSign::negative : MomentSign::positive;
  const ShearBasis& basis = shear_basis(station, side, sign);
  const State& s = basis.state;
  if (!s.deteriorated.section.description) {
    Resistance r = Resistance::unavailable_because(fmt::format(
        "{}: the section has no description, so its shear capacity cannot be computed; give capacity.given", s.label));
    finish(r, s);
    return r;
  }
  Resistance r = std::visit(
      [&](const auto& d) -> Resistance {
        using T = std::decay_t<decltype(d)>;
        if constexpr (std::is_same_v<T, model::SteelIGirder>) {
          if (!materials_.steel) {
            throw InputError(SourceLocation{source_file_, 0, 0}, "materials.steel", "missing; needed for steel shear");
          }
          SteelShearInput in;
          in.label = s.label;
          in.web_depth = d.web.width;
          in.web_thickness = d.web.thickness;
          in.web_yield = materials_.steel->yield_strength;
          in.modulus = materials_.steel->modulus;
          in.stiffener_spacing = d.transverse_stiffener_spacing;
          if (in.stiffener_spacing) {
            const Real spacing = *in.stiffener_spacing;
            in.end_panel =
                station <= spacing + kStationTolerance || station >= profile_.length() - spacing - kStationTolerance;
          }
          in.compression_flange_area = d.top_flange.width * d.top_flange.thickness;
          in.tension_flange_area = d.bottom_flange.width * d.bottom_flange.thickness;
          Resistance out = steel_shear(in, options_.resistance);
          if (in.end_panel) out.trace.add_note("end panel: within one stiffener spacing of a girder end");
          return out;
        } else {
          const ConcreteMemberSections& member = *basis.member;
          const ConcreteFlexure& f = *basis.flexure;
          if (method_ == model::RatingMethod::lfr && std::is_same_v<T, model::ReinforcedConcreteBeam>) {
            // Standard Specifications 8.16.6 with d from 8.16.3.
            if (!f.resistance.available()) {
              return Resistance::unavailable_because(
                  fmt::format("{}: d for Standard Specifications 8.16.6 needs the flexural calculation, which "
                              "failed: {}",
                              s.label, f.resistance.reason));
            }
            Resistance out = lfr_concrete_shear(member.shear, f.effective_depth);
            out.trace.add_note(fmt::format("d from the {} moment flexural calculation", to_string(sign)));
            return out;
          }
          if (!f.resistance.available()) {
            return Resistance::unavailable_because(
                fmt::format("{}: dv (AASHTO LRFD 5.7.2.8) needs the flexural calculation, which failed: {}", s.label,
                            f.resistance.reason));
          }
          Resistance out = concrete_shear(member.shear, f.shear_depth, demand, options_.shear_method,
                                          options_.aggregate_size, options_.resistance);
          out.trace.add_note(fmt::format("dv from the {} moment flexural calculation", to_string(sign)));
          return out;
        }
      },
      *s.deteriorated.section.description);
  finish(r, s);
  return r;
}

SteelServiceLimits GirderCapacity::steel_service(Real station, section::Side side) const {
  SteelServiceLimits out;
  if (!model::is_steel(materials_.kind)) {
    out.status = ResistanceStatus::unavailable;
    out.reason = fmt::format("girder {}: Service II flange limits apply to steel girders only", girder_.id);
    return out;
  }
  const State s = state_at(station, side);
  if (!s.analysis) {
    out.status = ResistanceStatus::unavailable;
    out.reason = fmt::format("{}: no section description to take the stage moduli from", s.label);
    return out;
  }
  if (!materials_.steel) {
    throw InputError(SourceLocation{source_file_, 0, 0}, "materials.steel", "missing; needed for Service II");
  }
  out = steel_service_limits(materials_.steel->yield_strength, *s.analysis, options_.service_ii_uncracked_negative);
  out.warnings = s.deteriorated.warnings;
  for (const std::string& note : s.deteriorated.notes) out.trace.add_note(note);
  return out;
}

PrestressedServiceLimits GirderCapacity::prestressed_service(Real station, section::Side side) const {
  PrestressedServiceLimits out;
  if (materials_.kind != model::MaterialKind::prestressed_concrete) {
    out.status = ResistanceStatus::unavailable;
    out.reason = fmt::format("girder {}: Service III tension applies to prestressed girders only", girder_.id);
    return out;
  }
  const State s = state_at(station, side);
  if (!s.analysis) {
    out.status = ResistanceStatus::unavailable;
    out.reason = fmt::format("{}: no section description to take the strands from", s.label);
    return out;
  }
  const auto& girder = std::get<model::PrestressedGirder>(*s.deteriorated.section.description);
  out = prestressed_service_limits(s.label, girder, materials_, *s.analysis, options_.prestressed_service,
                                   options_.section, options_.density_factor);
  out.warnings.insert(out.warnings.end(), s.deteriorated.warnings.begin(), s.deteriorated.warnings.end());
  for (const std::string& note : s.deteriorated.notes) out.trace.add_note(note);
  return out;
}

ReinforcedServiceLimits GirderCapacity::reinforced_service(Real station, MomentSign sign, section::Side side) const {
  ReinforcedServiceLimits out;
  if (materials_.kind != model::MaterialKind::reinforced_concrete) {
    out.status = ResistanceStatus::unavailable;
    out.reason = fmt::format("girder {}: the Service I steel stress applies to reinforced concrete only", girder_.id);
    return out;
  }
  const State s = state_at(station, side);
  if (!s.deteriorated.section.description) {
    out.status = ResistanceStatus::unavailable;
    out.reason = fmt::format("{}: no section description to take the bars from", s.label);
    return out;
  }
  const ConcreteMemberSections member =
      reinforced_concrete_sections(s.deteriorated.section, materials_, sign, options_.density_factor, source_file_);
  // The compression concrete is the beam's (girder_concrete), which the
  // builder has required.
  const Real ec = section::concrete_modulus(*materials_.girder_concrete, options_.section.concrete_modulus_formula,
                                            options_.section.aggregate_factor, "materials.girder_concrete");
  out = reinforced_service_limits(member.flexure, ec);
  for (const std::string& note : s.deteriorated.notes) out.trace.add_note(note);
  return out;
}

}  // namespace tenthpoint::capacity
