#include "engine/section/tapered_section.h"

#include <algorithm>
#include <cassert>
#include <type_traits>

#include <fmt/format.h>

#include "engine/core/errors.h"
#include "engine/section/input_checks.h"
#include "engine/section/reinforced_concrete_section.h"
#include "engine/section/steel_i_section.h"

namespace tenthpoint::section {
namespace {

// (1 - t) a + t b, which returns a at t = 0 and b at t = 1 exactly (a + t (b -
// a) need not). A dimension equal at both ends is kept bit for bit.
Real mix(Real a, Real b, Real t) { return a == b ? a : (1 - t) * a + t * b; }

model::Plate mix(const model::Plate& a, const model::Plate& b, Real t) {
  return model::Plate{mix(a.width, b.width, t), mix(a.thickness, b.thickness, t)};
}

std::optional<model::Plate> mix(const std::optional<model::Plate>& a, const std::optional<model::Plate>& b, Real t) {
  assert(a.has_value() == b.has_value());
  if (!a) return std::nullopt;
  return mix(*a, *b, t);
}

std::vector<model::BarLayer> mix(const std::vector<model::BarLayer>& a, const std::vector<model::BarLayer>& b, Real t) {
  assert(a.size() == b.size());
  std::vector<model::BarLayer> out;
  for (std::size_t i = 0; i < a.size(); ++i) {
    out.push_back(model::BarLayer{mix(a[i].area, b[i].area, t), mix(a[i].depth, b[i].depth, t)});
  }
  return out;
}

// Fields that are not dimensions (designation, stiffeners, stirrups) come
// from `deeper`, the end with the larger controlling depth.
model::SteelIGirder mix(const model::SteelIGirder& a, const model::SteelIGirder& b, Real t,
                        const model::SteelIGirder& deeper) {
  model::SteelIGirder g = deeper;
  g.top_flange = mix(a.top_flange, b.top_flange, t);
  g.web = mix(a.web, b.web, t);
  g.bottom_flange = mix(a.bottom_flange, b.bottom_flange, t);
  g.top_cover_plate = mix(a.top_cover_plate, b.top_cover_plate, t);
  g.bottom_cover_plate = mix(a.bottom_cover_plate, b.bottom_cover_plate, t);
  return g;
}

model::ReinforcedConcreteBeam mix(const model::ReinforcedConcreteBeam& a, const model::ReinforcedConcreteBeam& b,
                                  Real t, const model::ReinforcedConcreteBeam& deeper) {
  model::ReinforcedConcreteBeam r = deeper;
  r.height = mix(a.height, b.height, t);
  r.web_width = mix(a.web_width, b.web_width, t);
  r.flange_width = mix(a.flange_width, b.flange_width, t);
  r.flange_thickness = mix(a.flange_thickness, b.flange_thickness, t);
  r.bottom_bars = mix(a.bottom_bars, b.bottom_bars, t);
  r.top_bars = mix(a.top_bars, b.top_bars, t);
  return r;
}

model::DeckSlab mix(const model::DeckSlab& a, const model::DeckSlab& b, Real t) {
  return model::DeckSlab{mix(a.thickness, b.thickness, t), mix(a.effective_width, b.effective_width, t),
                         mix(a.haunch, b.haunch, t), mix(a.longitudinal_bars, b.longitudinal_bars, t)};
}

Real controlling_depth_of(const model::SectionDescription& description) {
  if (const auto* steel = std::get_if<model::SteelIGirder>(&description)) return steel->web.width;
  return std::get<model::ReinforcedConcreteBeam>(description).height;
}

void scale(StageProperties& p, Real ratio) {
  if (ratio == 1) return;
  p.inertia *= ratio;
  for (std::optional<Real>* s : {&p.section_modulus_top, &p.section_modulus_bottom, &p.section_modulus_deck}) {
    if (*s) **s *= ratio;
  }
  p.source = PropertySource::scaled;
}

// The haunch carries a cracked section only when both ends have one and both
// descriptions can compute one.
bool has_cracked(const SectionStages& used_a, const SectionStages& used_b, const SectionStages& desc_a,
                 const SectionStages& desc_b) {
  return used_a.cracked_negative && used_b.cracked_negative && desc_a.cracked_negative && desc_b.cracked_negative;
}

}  // namespace

TaperedSection::TaperedSection(const model::SectionDefinition& start_section,
                               const model::SectionDefinition& end_section, model::Taper taper, Real start_station,
                               Real end_station, const model::Materials& materials, const SectionOptions& options,
                               SourceLocation where)
    : start_(start_section),
      end_(end_section),
      law_(taper, true),
      start_station_(start_station),
      end_station_(end_station),
      materials_(materials),
      options_(options),
      where_(std::move(where)) {
  auto fail = [&](const char* field, std::string message) { throw InputError(where_, field, std::move(message)); };
  const std::string pair = fmt::format("haunch from '{}' to '{}'", start_.id, end_.id);
  if (!(end_station_ > start_station_)) {
    fail("segment.end", fmt::format("{}: end {:g} m must be beyond start {:g} m", pair, end_station_, start_station_));
  }
  for (const model::SectionDefinition* s : {&start_, &end_}) {
    if (!s->description) {
      fail("segment.section",
           fmt::format("{}: section '{}' needs a steel_i or rc_beam description to vary its depth", pair, s->id));
    }
  }
  const model::SectionDescription& a = *start_.description;
  const model::SectionDescription& b = *end_.description;
  if (a.index() != b.index()) fail("segment.end_section", fmt::format("{}: the end sections differ in kind", pair));
  if (std::holds_alternative<model::PrestressedGirder>(a)) {
    fail("segment.section",
         fmt::format("{}: a precast girder's gross properties cannot be recomputed at another depth", pair));
  }
  if (const auto* sa = std::get_if<model::SteelIGirder>(&a)) {
    const auto& sb = std::get<model::SteelIGirder>(b);
    if (sa->top_cover_plate.has_value() != sb.top_cover_plate.has_value() ||
        sa->bottom_cover_plate.has_value() != sb.bottom_cover_plate.has_value()) {
      fail("segment.end_section", fmt::format("{}: a cover plate is present at one end only", pair));
    }
  } else {
    const auto& ra = std::get<model::ReinforcedConcreteBeam>(a);
    const auto& rb = std::get<model::ReinforcedConcreteBeam>(b);
    if ((ra.flange_thickness == 0) != (rb.flange_thickness == 0)) {
      fail("segment.end_section", fmt::format("{}: one end is a rectangle, the other a T-beam", pair));
    }
    if (ra.bottom_bars.size() != rb.bottom_bars.size() || ra.top_bars.size() != rb.top_bars.size()) {
      fail("segment.end_section", fmt::format("{}: the ends have different numbers of bar layers", pair));
    }
  }
  if (start_.deck.has_value() != end_.deck.has_value()) {
    fail("segment.end_section", fmt::format("{}: a deck is given at one end only", pair));
  }
  if (start_.deck && start_.deck->longitudinal_bars.size() != end_.deck->longitudinal_bars.size()) {
    fail("segment.end_section", fmt::format("{}: the decks have different numbers of bar layers", pair));
  }

  law_ = TaperLaw(taper, controlling_depth_of(a) <= controlling_depth_of(b));
  used_start_ = section_stages(start_, materials_, options_);
  used_end_ = section_stages(end_, materials_, options_);
  described_start_ = described_section_stages(start_, materials_, options_);
  described_end_ = described_section_stages(end_, materials_, options_);
  if (!has_cracked(used_start_, used_end_, described_start_, described_end_)) {
    used_start_.cracked_negative.reset();
    used_end_.cracked_negative.reset();
  }
}

Real TaperedSection::fraction(Real station) const {
  const Real length = end_station_ - start_station_;
  const Real xi = std::clamp((station - start_station_) / length, Real{0}, Real{1});
  return law_.fraction(xi);
}

model::SectionDefinition TaperedSection::section_at(Real station) const {
  const Real t = fraction(station);
  const bool end_deeper = law_.shallow_at_start();
  model::SectionDefinition s;
  s.id = fmt::format("{}..{}@{:.3f}m", start_.id, end_.id, station);
  s.where = where_;
  s.description = std::visit(
      [&](const auto& a) -> model::SectionDescription {
        using T = std::decay_t<decltype(a)>;
        if constexpr (std::is_same_v<T, model::PrestressedGirder>) {
          assert(false && "rejected in the constructor");
          return a;
        } else {
          const T& b = std::get<T>(*end_.description);
          return mix(a, b, t, end_deeper ? b : a);
        }
      },
      *start_.description);
  if (start_.deck) s.deck = mix(*start_.deck, *end_.deck, t);
  return s;
}

Real TaperedSection::controlling_depth(Real station) const {
  return controlling_depth_of(*section_at(station).description);
}

Real TaperedSection::girder_depth(Real station) const {
  const model::SectionDefinition s = section_at(station);
  if (const auto* steel = std::get_if<model::SteelIGirder>(&*s.description)) {
    return SteelISection(*steel, detail::SectionContext{s.id, s.where}).depth();
  }
  return std::get<model::ReinforcedConcreteBeam>(*s.description).height;
}

SectionStages TaperedSection::stages_at(Real station) const {
  const Real t = fraction(station);
  // The ends return the end sections' own properties, so a haunch meets its
  // prismatic neighbours without a round-off step in EI.
  if (t == 0) return used_start_;
  if (t == 1) return used_end_;
  SectionStages out = described_section_stages(section_at(station), materials_, options_);
  auto ratio = [](const StageProperties& used, const StageProperties& described) {
    return used.flexural_rigidity() / described.flexural_rigidity();
  };
  auto blended_ratio = [&](model::SectionStage stage) {
    const Real r0 = ratio(used_start_.at(stage), described_start_.at(stage));
    const Real r1 = ratio(used_end_.at(stage), described_end_.at(stage));
    return mix(r0, r1, t);
  };
  scale(out.noncomposite, blended_ratio(model::SectionStage::noncomposite));
  if (out.composite) {
    scale(*out.long_term, blended_ratio(model::SectionStage::long_term_composite));
    scale(*out.short_term, blended_ratio(model::SectionStage::short_term_composite));
  }
  if (used_start_.cracked_negative) {
    const Real r0 = ratio(*used_start_.cracked_negative, *described_start_.cracked_negative);
    const Real r1 = ratio(*used_end_.cracked_negative, *described_end_.cracked_negative);
    assert(out.cracked_negative);
    scale(*out.cracked_negative, mix(r0, r1, t));
  } else {
    out.cracked_negative.reset();
  }
  return out;
}

Real TaperedSection::flexural_rigidity(model::SectionStage stage, Real station) const {
  return stages_at(station).at(stage).flexural_rigidity();
}

std::optional<Real> TaperedSection::cracked_negative_rigidity(Real station) const {
  const SectionStages s = stages_at(station);
  if (!s.cracked_negative) return std::nullopt;
  return s.cracked_negative->flexural_rigidity();
}

}  // namespace tenthpoint::section
