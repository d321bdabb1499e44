#include <array>
#include <utility>

#include "engine/core/name_table.h"
#include "engine/model/enums.h"
#include "engine/model/given_capacity.h"

namespace tenthpoint::model {
namespace {

constexpr NameTable<SupportKind, 3> kSupportKind{
    {{SupportKind::pin, "pin"}, {SupportKind::roller, "roller"}, {SupportKind::fixed, "fixed"}}};
constexpr NameTable<Continuity, 3> kContinuity{{{Continuity::continuous, "continuous"},
                                                {Continuity::hinge, "hinge"},
                                                {Continuity::simple_made_continuous, "simple_made_continuous"}}};
constexpr NameTable<GirderPosition, 2> kGirderPosition{
    {{GirderPosition::interior, "interior"}, {GirderPosition::exterior, "exterior"}}};
constexpr NameTable<MaterialKind, 5> kMaterialKind{{{MaterialKind::rolled_steel, "rolled_steel"},
                                                    {MaterialKind::welded_plate_girder, "welded_plate_girder"},
                                                    {MaterialKind::riveted_plate_girder, "riveted_plate_girder"},
                                                    {MaterialKind::reinforced_concrete, "reinforced_concrete"},
                                                    {MaterialKind::prestressed_concrete, "prestressed_concrete"}}};
constexpr NameTable<RatingMethod, 2> kRatingMethod{{{RatingMethod::lrfr, "LRFR"}, {RatingMethod::lfr, "LFR"}}};
constexpr NameTable<DeadLoadComponent, 3> kDeadLoadComponent{
    {{DeadLoadComponent::dc1, "DC1"}, {DeadLoadComponent::dc2, "DC2"}, {DeadLoadComponent::dw, "DW"}}};
constexpr NameTable<SectionStage, 3> kSectionStage{{{SectionStage::noncomposite, "noncomposite"},
                                                    {SectionStage::long_term_composite, "long_term"},
                                                    {SectionStage::short_term_composite, "short_term"}}};
constexpr NameTable<Taper, 2> kTaper{{{Taper::linear, "linear"}, {Taper::parabolic, "parabolic"}}};
constexpr NameTable<LoadScope, 2> kLoadScope{
    {{LoadScope::per_girder, "per_girder"}, {LoadScope::cross_section, "cross_section"}}};
constexpr NameTable<DistributionRule, 3> kDistributionRule{{{DistributionRule::equal, "equal"},
                                                            {DistributionRule::tributary_width, "tributary_width"},
                                                            {DistributionRule::exterior_only, "exterior_only"}}};
constexpr NameTable<SectionElement, 7> kSectionElement{{{SectionElement::top_flange, "top_flange"},
                                                        {SectionElement::bottom_flange, "bottom_flange"},
                                                        {SectionElement::web, "web"},
                                                        {SectionElement::cover_plate, "cover_plate"},
                                                        {SectionElement::bars, "bars"},
                                                        {SectionElement::strands, "strands"},
                                                        {SectionElement::deck, "deck"}}};

constexpr NameTable<ForceEffect, 2> kForceEffect{{{ForceEffect::moment, "moment"}, {ForceEffect::shear, "shear"}}};
constexpr NameTable<CapacitySource, 2> kCapacitySource{
    {{CapacitySource::given, "given"}, {CapacitySource::computed, "computed"}}};

}  // namespace

std::string_view to_string(SupportKind v) { return name_of(kSupportKind, v); }
std::string_view to_string(Continuity v) { return name_of(kContinuity, v); }
std::string_view to_string(GirderPosition v) { return name_of(kGirderPosition, v); }
std::string_view to_string(MaterialKind v) { return name_of(kMaterialKind, v); }
std::string_view to_string(RatingMethod v) { return name_of(kRatingMethod, v); }
std::string_view to_string(DeadLoadComponent v) { return name_of(kDeadLoadComponent, v); }
std::string_view to_string(SectionStage v) { return name_of(kSectionStage, v); }
std::string_view to_string(Taper v) { return name_of(kTaper, v); }
std::string_view to_string(LoadScope v) { return name_of(kLoadScope, v); }
std::string_view to_string(DistributionRule v) { return name_of(kDistributionRule, v); }
std::string_view to_string(SectionElement v) { return name_of(kSectionElement, v); }
std::string_view to_string(ForceEffect v) { return name_of(kForceEffect, v); }
std::string_view to_string(CapacitySource v) { return name_of(kCapacitySource, v); }

template <>
std::optional<SupportKind> parse(std::string_view t) {
  return value_of(kSupportKind, t);
}
template <>
std::optional<Continuity> parse(std::string_view t) {
  return value_of(kContinuity, t);
}
template <>
std::optional<GirderPosition> parse(std::string_view t) {
  return value_of(kGirderPosition, t);
}
template <>
std::optional<MaterialKind> parse(std::string_view t) {
  return value_of(kMaterialKind, t);
}
template <>
std::optional<RatingMethod> parse(std::string_view t) {
  return value_of(kRatingMethod, t);
}
template <>
std::optional<DeadLoadComponent> parse(std::string_view t) {
  return value_of(kDeadLoadComponent, t);
}
template <>
std::optional<SectionStage> parse(std::string_view t) {
  return value_of(kSectionStage, t);
}
template <>
std::optional<Taper> parse(std::string_view t) {
  return value_of(kTaper, t);
}
template <>
std::optional<LoadScope> parse(std::string_view t) {
  return value_of(kLoadScope, t);
}
template <>
std::optional<DistributionRule> parse(std::string_view t) {
  return value_of(kDistributionRule, t);
}
template <>
std::optional<SectionElement> parse(std::string_view t) {
  return value_of(kSectionElement, t);
}
template <>
std::optional<ForceEffect> parse(std::string_view t) {
  return value_of(kForceEffect, t);
}
template <>
std::optional<CapacitySource> parse(std::string_view t) {
  return value_of(kCapacitySource, t);
}

bool is_steel(MaterialKind kind) {
  return kind == MaterialKind::rolled_steel || kind == MaterialKind::welded_plate_girder ||
         kind == MaterialKind::riveted_plate_girder;
}

}  // namespace tenthpoint::model
