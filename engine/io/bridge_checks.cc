#include "engine/io/bridge_checks.h"

#include <algorithm>
#include <cmath>
#include <map>

#include <fmt/format.h>

#include "engine/io/name_suggestion.h"
#include "engine/io/quantity_format.h"

namespace tenthpoint::io::detail {
namespace {

using units::Quantity;

// Stations and segment ends are compared to a millionth of the girder
// length: far below any dimension that matters, far above the rounding of a
// unit conversion.
constexpr Real kRelativeTolerance = 1e-6;

YamlPath path_of(std::initializer_list<YamlPathStep> steps) { return YamlPath(steps); }
YamlPathStep key(std::string k) { return YamlPathStep{std::move(k), std::nullopt}; }
YamlPathStep index(std::size_t i) { return YamlPathStep{"", i}; }

// The bridge-file key of a section's description ("properties" when it has none).
const char* description_kind(const model::SectionDefinition& section) {
  if (!section.description) return "properties";
  if (std::holds_alternative<model::SteelIGirder>(*section.description)) return "steel_i";
  if (std::holds_alternative<model::ReinforcedConcreteBeam>(*section.description)) return "rc_beam";
  return "ps_girder";
}

class Checker {
 public:
  Checker(const model::Bridge& bridge, const YamlNode& root, Diagnostics& out)
      : bridge_(bridge), root_(root), out_(out) {
    length_ = bridge.geometry.total_length();
    tolerance_ = kRelativeTolerance * std::max(length_, Real{1});
    for (const model::SectionDefinition& s : bridge.sections) section_ids_.push_back(s.id);
    for (const model::GirderLine& g : bridge.girders) girder_ids_.push_back(g.id);
  }

  void run() {
    check_identity();
    check_supports();
    check_unique_ids();
    check_section_kinds();
    for (std::size_t i = 0; i < bridge_.girders.size(); ++i) check_girder(i);
    check_dead_loads();
    check_capacities();
    check_inspections();
    check_rating();
    for (std::size_t i = 0; i < bridge_.points_of_interest.size(); ++i)
      check_station(path_of({key("points_of_interest"), index(i), key("station")}),
                    bridge_.points_of_interest[i].station);
  }

 private:
  std::string length(Real value) const { return format_quantity(value, Quantity::length, bridge_.units); }

  void report(Severity severity, const YamlPath& path, std::string message) {
    out_.push_back(Diagnostic{severity, locate(root_, path), to_string(path), std::move(message)});
  }
  void error(const YamlPath& path, std::string message) { report(Severity::error, path, std::move(message)); }
  void warning(const YamlPath& path, std::string message) { report(Severity::warning, path, std::move(message)); }

  void check_station(const YamlPath& path, Real station) {
    if (station > length_ + tolerance_)
      error(path, fmt::format("station {} is beyond the end of the girder ({}, the sum of the spans)", length(station),
                              length(length_)));
  }

  void check_reference(const YamlPath& path, const std::string& id, const std::vector<std::string>& known,
                       const char* what) {
    if (std::find(known.begin(), known.end(), id) != known.end()) return;
    std::string message = fmt::format("unknown {} '{}'", what, id);
    if (auto suggestion = nearest_name(id, known)) message += fmt::format(" (did you mean '{}'?)", *suggestion);
    message += known.empty() ? "" : fmt::format("; expected one of: {}", join_names(known));
    error(path, std::move(message));
  }

  void check_identity() {
    const model::Identity& id = bridge_.identity;
    if (id.year_reconstructed && *id.year_reconstructed < id.year_built)
      error(
          path_of({key("identity"), key("year_reconstructed")}),
          fmt::format("year reconstructed ({}) is before the year built ({})", *id.year_reconstructed, id.year_built));
  }

  void check_supports() {
    const std::size_t spans = bridge_.geometry.span_lengths.size();
    const model::Geometry& g = bridge_.geometry;
    if (g.supports.size() != spans + 1)
      error(path_of({key("geometry"), key("supports")}),
            fmt::format("expected {} supports for {} (one per span end), got {}", spans + 1,
                        spans == 1 ? "1 span" : fmt::format("{} spans", spans), g.supports.size()));
    const bool given = root_.find("geometry") != nullptr && root_.find("geometry")->find("continuity") != nullptr;
    if (spans > 1 && !given) {
      error(path_of({key("geometry")}),
            fmt::format("missing field 'continuity': {} spans need {} (one per interior support)", spans,
                        spans == 2 ? "1 entry" : fmt::format("{} entries", spans - 1)));
    } else if (given && g.continuity.size() + 1 != spans) {
      error(path_of({key("geometry"), key("continuity")}),
            spans == 1 ? std::string("a single span has no interior supports; leave continuity out")
                       : fmt::format("expected {} continuity {} for {} spans (one per interior support), got {}",
                                     spans - 1, spans == 2 ? "entry" : "entries", spans, g.continuity.size()));
    }
    // An internal hinge must lie strictly inside a span: one over a support
    // is written as `continuity: hinge` there.
    constexpr Real kTolerance = 1e-6;  // m; stations converted from feet carry round-off
    for (std::size_t i = 0; i < g.hinges.size(); ++i) {
      const Real x = g.hinges[i];
      const YamlPath where = path_of({key("geometry"), key("hinges"), index(i)});
      if (x <= kTolerance || x >= g.total_length() - kTolerance) {
        error(where,
              fmt::format("hinge at {} is not inside the girder (0 to {})", length(x), length(g.total_length())));
        continue;
      }
      for (std::size_t k = 1; k < spans; ++k)
        if (std::abs(x - g.support_station(k)) <= kTolerance)
          error(where, fmt::format("hinge at {} sits on support {}; write it as continuity: hinge for that support",
                                   length(x), k + 1));
    }
  }

  template <typename Item, typename IdOf>
  void check_unique(const char* list, const std::vector<Item>& items, IdOf id_of, const char* what) {
    std::map<std::string, std::size_t> first;
    for (std::size_t i = 0; i < items.size(); ++i) {
      const auto [it, inserted] = first.emplace(id_of(items[i]), i);
      if (inserted) continue;
      const YamlPath earlier = path_of({key(list), index(it->second), key("id")});
      error(path_of({key(list), index(i), key("id")}),
            fmt::format("{} id '{}' is already used by {}[{}] (line {}); ids must be unique", what, it->first, list,
                        it->second, locate(root_, earlier).line));
    }
  }

  void check_unique_ids() {
    check_unique(
        "sections", bridge_.sections, [](const model::SectionDefinition& s) { return s.id; }, "section");
    check_unique(
        "girders", bridge_.girders, [](const model::GirderLine& g) { return g.id; }, "girder");
  }

  // A section's description must be of the bridge's material: its capacity
  // is computed with that material's rules.
  void check_section_kinds() {
    const model::MaterialKind kind = bridge_.materials.kind;
    const char* expected = model::is_steel(kind)                              ? "steel_i"
                           : kind == model::MaterialKind::reinforced_concrete ? "rc_beam"
                                                                              : "ps_girder";
    for (std::size_t i = 0; i < bridge_.sections.size(); ++i) {
      const model::SectionDefinition& s = bridge_.sections[i];
      const std::string actual = description_kind(s);
      if (actual == "properties" || actual == expected) continue;
      error(path_of({key("sections"), index(i), key(actual)}),
            fmt::format("a {} description does not fit materials.kind {}; expected {}", actual, model::to_string(kind),
                        expected));
    }
  }

  void check_girder(std::size_t g) {
    const model::GirderLine& girder = bridge_.girders[g];
    const YamlPath base = path_of({key("girders"), index(g)});
    const auto segment_path = [&](std::size_t k, const char* field = nullptr) {
      YamlPath p = with_index(with_key(base, "segments"), k);
      return field ? with_key(p, field) : p;
    };
    for (std::size_t k = 0; k < girder.segments.size(); ++k) {
      const model::Segment& s = girder.segments[k];
      if (s.end <= s.start + tolerance_)
        error(segment_path(k, "end"),
              fmt::format("segment end ({}) must be after its start ({})", length(s.end), length(s.start)));
      if (k == 0 && std::abs(s.start) > tolerance_)
        error(segment_path(k, "start"),
              fmt::format("the first segment starts at {}; expected 0 (the first support), so that segments "
                          "cover the girder",
                          length(s.start)));
      if (k > 0) {
        const model::Segment& previous = girder.segments[k - 1];
        const Real step = s.start - previous.end;
        if (step > tolerance_)
          error(segment_path(k, "start"),
                fmt::format("gap of {} between segments[{}] (ends at {}) and segments[{}] (starts at {}); segments "
                            "must cover the girder without gaps",
                            length(step), k - 1, length(previous.end), k, length(s.start)));
        else if (step < -tolerance_)
          error(segment_path(k, "start"),
                fmt::format("overlap of {} between segments[{}] (ends at {}) and segments[{}] (starts at {}); "
                            "segments must not overlap",
                            length(-step), k - 1, length(previous.end), k, length(s.start)));
      }
      if (k + 1 == girder.segments.size() && std::abs(s.end - length_) > tolerance_)
        error(segment_path(k, "end"),
              fmt::format("the last segment ends at {}; expected {} (the end of the girder, the sum of the spans)",
                          length(s.end), length(length_)));
      check_segment_sections(s, segment_path(k));
    }
    for (std::size_t b = 0; b < girder.brace_stations.size(); ++b)
      check_station(with_index(with_key(base, "brace_stations"), b), girder.brace_stations[b]);
  }

  void check_segment_sections(const model::Segment& s, const YamlPath& path) {
    check_reference(with_key(path, "section"), s.section, section_ids_, "section");
    if (!s.end_section) return;
    check_reference(with_key(path, "end_section"), *s.end_section, section_ids_, "section");
    const model::SectionDefinition* start = bridge_.find_section(s.section);
    const model::SectionDefinition* end = bridge_.find_section(*s.end_section);
    if (start == nullptr || end == nullptr) return;
    // A haunch varies the depth of a described shape; given properties
    // cannot be interpolated meaningfully, nor can a precast shape vary.
    for (const model::SectionDefinition* section : {start, end}) {
      const std::string kind = description_kind(*section);
      if (kind == "steel_i" || kind == "rc_beam") continue;
      error(with_key(path, section == start ? "section" : "end_section"),
            kind == "properties"
                ? fmt::format("section '{}' gives properties only; a haunched segment (with end_section) needs "
                              "described sections (steel_i or rc_beam)",
                              section->id)
                : fmt::format("section '{}' is a ps_girder; a haunched segment (with end_section) needs described "
                              "sections (steel_i or rc_beam)",
                              section->id));
      return;
    }
    if (std::string(description_kind(*start)) != description_kind(*end))
      error(with_key(path, "end_section"),
            fmt::format("end_section '{}' is {} but section '{}' is {}; both ends of a haunched segment must be "
                        "described the same way",
                        end->id, description_kind(*end), start->id, description_kind(*start)));
  }

  void check_girder_list(const YamlPath& list_path, const std::vector<std::string>& girders) {
    for (std::size_t j = 0; j < girders.size(); ++j)
      check_reference(with_index(list_path, j), girders[j], girder_ids_, "girder");
  }

  void check_dead_loads() {
    for (std::size_t i = 0; i < bridge_.dead_loads.size(); ++i) {
      const model::DeadLoad& load = bridge_.dead_loads[i];
      const YamlPath base = path_of({key("dead_loads"), index(i)});
      check_girder_list(with_key(base, "girders"), load.girders);
      if (load.scope == model::LoadScope::cross_section && !load.girders.empty())
        warning(with_key(base, "girders"),
                "girders is ignored for a cross_section load; its distribution shares it among all girders");
      if (const auto* u = std::get_if<model::UniformLoad>(&load.shape)) {
        const YamlPath shape = with_key(base, "uniform");
        if (u->start) check_station(with_key(shape, "start"), *u->start);
        if (u->end) check_station(with_key(shape, "end"), *u->end);
        if (u->start && u->end && *u->end <= *u->start + tolerance_)
          error(with_key(shape, "end"),
                fmt::format("a partial uniform load must end after it starts (start {}, end {})", length(*u->start),
                            length(*u->end)));
      } else if (const auto* p = std::get_if<model::PointLoad>(&load.shape)) {
        check_station(with_key(with_key(base, "point"), "station"), p->station);
      }
    }
  }

  void check_capacities() {
    const model::CapacityInput& capacity = bridge_.capacity;
    for (std::size_t i = 0; i < capacity.given.size(); ++i) {
      const model::GivenCapacity& given = capacity.given[i];
      const YamlPath base = path_of({key("capacity"), key("given"), index(i)});
      check_girder_list(with_key(base, "girders"), given.girders);
      check_station(with_key(base, "start"), given.start);
      check_station(with_key(base, "end"), given.end);
      if (given.end < given.start - tolerance_)
        error(with_key(base, "end"),
              fmt::format("end ({}) is before start ({})", length(given.end), length(given.start)));
    }
    if (capacity.mode == model::CapacitySource::computed && !capacity.given.empty())
      warning(path_of({key("capacity"), key("given")}), "given capacities are ignored when mode is computed");
    if (capacity.mode == model::CapacitySource::given) check_capacity_coverage();
  }

  // With given capacities, every girder needs one at each point the rating
  // looks at; the tenth points of every span are the points it always uses.
  void check_capacity_coverage() {
    const model::Geometry& geometry = bridge_.geometry;
    for (const model::GirderLine& girder : bridge_.girders) {
      std::vector<Real> uncovered;
      for (std::size_t span = 0; span < geometry.span_lengths.size(); ++span) {
        for (int tenth = 0; tenth <= 10; ++tenth) {
          const Real x = geometry.support_station(span) + geometry.span_lengths[span] * tenth / 10.0;
          const bool covered = std::any_of(
              bridge_.capacity.given.begin(), bridge_.capacity.given.end(), [&](const model::GivenCapacity& c) {
                const bool applies =
                    c.girders.empty() || std::find(c.girders.begin(), c.girders.end(), girder.id) != c.girders.end();
                return applies && x >= c.start - tolerance_ && x <= c.end + tolerance_;
              });
          if (!covered && (uncovered.empty() || std::abs(uncovered.back() - x) > tolerance_)) uncovered.push_back(x);
        }
      }
      if (uncovered.empty()) continue;
      std::string stations;
      for (std::size_t k = 0; k < uncovered.size() && k < 5; ++k)
        stations +=
            (k == 0 ? "" : ", ") + format_number(units::from_internal(uncovered[k], Quantity::length, bridge_.units));
      if (uncovered.size() > 5) stations += ", ...";
      warning(path_of({key("capacity"), key("given")}),
              fmt::format("girder '{}' has no given capacity at {} of its tenth points (stations {} {}); those "
                          "points cannot be rated",
                          girder.id, uncovered.size(), stations, units::label(Quantity::length, bridge_.units)));
    }
  }

  void check_inspections() {
    for (std::size_t i = 0; i < bridge_.inspections.size(); ++i) {
      const model::Inspection& inspection = bridge_.inspections[i];
      for (std::size_t j = 0; j < inspection.section_loss.size(); ++j) {
        const model::SectionLoss& loss = inspection.section_loss[j];
        const YamlPath base = path_of({key("inspections"), index(i), key("section_loss"), index(j)});
        check_reference(with_key(base, "girder"), loss.girder, girder_ids_, "girder");
        check_station(with_key(base, "start"), loss.start);
        check_station(with_key(base, "end"), loss.end);
        if (loss.end < loss.start - tolerance_)
          error(with_key(base, "end"),
                fmt::format("end ({}) is before start ({})", length(loss.end), length(loss.start)));
        const bool plate =
            loss.element == model::SectionElement::top_flange || loss.element == model::SectionElement::bottom_flange ||
            loss.element == model::SectionElement::web || loss.element == model::SectionElement::cover_plate ||
            loss.element == model::SectionElement::deck;
        if (loss.thickness_loss && !plate)
          error(with_key(base, "thickness_loss"),
                fmt::format("thickness_loss applies to plates, webs and the deck; give percent_loss for {}",
                            model::to_string(loss.element)));
      }
    }
  }

  void check_rating() {
    const auto& overrides = bridge_.rating.distribution_overrides;
    for (std::size_t i = 0; i < overrides.size(); ++i) {
      const YamlPath base = path_of({key("rating"), key("distribution_overrides"), index(i)});
      check_reference(with_key(base, "girder"), overrides[i].girder, girder_ids_, "girder");
      for (std::size_t j = 0; j < i; ++j)
        if (overrides[j].girder == overrides[i].girder && overrides[j].effect == overrides[i].effect)
          error(base, fmt::format("a second {} override for girder '{}' (the first is distribution_overrides[{}])",
                                  model::to_string(overrides[i].effect), overrides[i].girder, j));
    }
  }

  const model::Bridge& bridge_;
  const YamlNode& root_;
  Diagnostics& out_;
  Real length_ = 0;
  Real tolerance_ = 0;
  std::vector<std::string> section_ids_;
  std::vector<std::string> girder_ids_;
};

}  // namespace

void check_bridge(const model::Bridge& bridge, const YamlNode& root, Diagnostics& diagnostics) {
  Checker(bridge, root, diagnostics).run();
}

}  // namespace tenthpoint::io::detail
