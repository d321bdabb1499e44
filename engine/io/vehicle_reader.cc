#include "engine/io/vehicle_reader.h"

#include <algorithm>
#include <cmath>
#include <map>

#include <fmt/format.h>

#include "engine/io/data_reference.h"
#include "engine/io/field_reader.h"
#include "engine/io/name_suggestion.h"
#include "engine/io/quantity_format.h"
#include "engine/io/schema_validator.h"

namespace tenthpoint::io {
namespace {

using units::Quantity;

// A rating weight within this fraction of its truck's gross weight is taken
// as the same number (rounding in a source table, 0.5 %).
constexpr Real kWeightTolerance = 0.005;

class VehicleBuilder {
 public:
  VehicleBuilder(const YamlNode& root, const model::VehicleLibrary* known, Diagnostics& out)
      : root_(root),
        known_(known),
        out_(out),
        units_(units::parse_unit_system(root.find("units") ? root.find("units")->text : "")
                   .value_or(units::UnitSystem::us)) {}

  model::VehicleLibrary build() {
    const FieldReader r(root_, units_);
    model::VehicleLibrary library;
    library.id = r.text("id");
    library.name = r.text("name");
    library.source_file = root_.where.file;
    for (const FieldReader& t : r.items("axle_trains")) library.trains.push_back(read_train(t));
    check_unique(r.items("axle_trains"), "axle train");
    for (const FieldReader& m : r.items("load_models")) library.load_models.push_back(read_model(m, library));
    check_unique(r.items("load_models"), "load model");
    return library;
  }

 private:
  void error(const FieldReader& at, std::string_view key, std::string message) {
    out_.push_back(Diagnostic{Severity::error, at.where(key), at.field(key), std::move(message)});
  }
  void warning(const FieldReader& at, std::string_view key, std::string message) {
    out_.push_back(Diagnostic{Severity::warning, at.where(key), at.field(key), std::move(message)});
  }
  std::string length(Real value) const { return format_quantity(value, Quantity::length, units_); }

  void check_unique(const std::vector<FieldReader>& items, const char* what) {
    std::map<std::string, int> first_line;
    for (const FieldReader& item : items) {
      const std::string id = item.text("id");
      const auto [it, inserted] = first_line.emplace(id, item.where("id").line);
      if (!inserted)
        error(item, "id",
              fmt::format("{} id '{}' is already used (line {}); ids must be unique", what, id, it->second));
    }
  }

  model::AxleTrain read_train(const FieldReader& r) {
    model::AxleTrain train;
    train.id = r.text("id");
    train.name = r.text("name");
    train.source = r.text("source");
    train.where = r.where();
    train.axle_weights = r.quantities("axles", Quantity::force);
    for (const FieldReader& s : r.items("spacings")) {
      if (s.node().is_number()) {
        const Real value = s.as_quantity(Quantity::length);
        train.spacings.push_back(model::AxleSpacing{value, value});
        continue;
      }
      const std::vector<FieldReader> range = s.items();
      if (range.size() != 2) continue;  // the schema rules this out
      model::AxleSpacing spacing{range[0].as_quantity(Quantity::length), range[1].as_quantity(Quantity::length)};
      if (spacing.min > spacing.max)
        out_.push_back(Diagnostic{Severity::error, s.where(), s.field(),
                                  fmt::format("a variable spacing is [min, max]; got min {} above max {}",
                                              length(spacing.min), length(spacing.max))});
      train.spacings.push_back(spacing);
    }
    const std::size_t axles = train.axle_weights.size();
    if (train.spacings.size() + 1 != axles)
      error(r, "spacings",
            fmt::format("expected {} {} for {} {} (one between each pair of axles), got {}", axles - 1,
                        axles == 2 ? "spacing" : "spacings", axles, axles == 1 ? "axle" : "axles",
                        train.spacings.size()));
    return train;
  }

  const model::AxleTrain* find_train(const model::VehicleLibrary& library, const std::string& id) const {
    if (const model::AxleTrain* t = library.find_train(id)) return t;
    return known_ != nullptr ? known_->find_train(id) : nullptr;
  }

  std::vector<std::string> train_ids(const model::VehicleLibrary& library) const {
    std::vector<std::string> ids;
    for (const model::AxleTrain& t : library.trains) ids.push_back(t.id);
    if (known_ != nullptr)
      for (const model::AxleTrain& t : known_->trains)
        if (std::find(ids.begin(), ids.end(), t.id) == ids.end()) ids.push_back(t.id);
    return ids;
  }

  model::LoadCase read_case(const FieldReader& r, const model::VehicleLibrary& library) {
    model::LoadCase c;
    c.id = r.text("id");
    c.train = r.optional_text("train");
    c.count = r.integer("count", 1);
    c.train_factor = r.number("train_factor", 1.0);
    if (r.has("gap")) {
      const FieldReader g = r.at("gap");
      const Real min = g.quantity("min", Quantity::length);
      const std::optional<Real> max = g.optional_quantity("max", Quantity::length);
      if (max && *max < min)
        error(g, "max", fmt::format("gap max ({}) is below its min ({})", length(*max), length(min)));
      // An open gap is bounded by the bridge, which the analysis knows; the
      // model stores infinity for "no upper limit".
      c.gap = model::AxleSpacing{min, max.value_or(std::numeric_limits<Real>::infinity())};
    }
    c.fixed_variable_spacing = r.optional_quantity("fixed_variable_spacing", Quantity::length);
    if (r.has("lane")) {
      const FieldReader l = r.at("lane");
      c.lane = model::LaneLoad{l.quantity("intensity", Quantity::line_load), l.number("factor", 1.0)};
    }
    if (r.has("lane_concentrated")) {
      const FieldReader l = r.at("lane_concentrated");
      c.lane_concentrated =
          model::LaneConcentratedLoads{l.quantity("moment", Quantity::force), l.quantity("shear", Quantity::force),
                                       l.boolean("second_load_for_negative_moment")};
    }
    for (const std::string& e : r.texts("effects"))
      if (auto effect = model::parse<model::LoadEffect>(e)) c.effects.push_back(*effect);
    c.between_contraflexure_points_only = r.boolean("between_contraflexure_points_only");
    if (r.has("spans")) {
      const FieldReader s = r.at("spans");
      c.spans.longer_than = s.optional_quantity("longer_than", Quantity::length);
      c.spans.not_longer_than = s.optional_quantity("not_longer_than", Quantity::length);
      if (c.spans.longer_than && c.spans.not_longer_than && *c.spans.not_longer_than <= *c.spans.longer_than)
        error(s, "not_longer_than", "no span is longer than longer_than and not longer than not_longer_than");
    }
    c.drop_relieving_axles = r.boolean("drop_relieving_axles");
    c.where = r.where();

    if (c.count > 1 && !c.gap) error(r, "count", fmt::format("{} trains need a gap between them; give gap", c.count));
    if (!c.train) return c;
    const model::AxleTrain* train = find_train(library, *c.train);
    if (train == nullptr) {
      const std::vector<std::string> known = train_ids(library);
      std::string message = fmt::format("unknown axle train '{}'", *c.train);
      if (auto suggestion = nearest_name(*c.train, known)) message += fmt::format(" (did you mean '{}'?)", *suggestion);
      error(r, "train", message + "; expected one of: " + join_names(known));
      return c;
    }
    if (c.fixed_variable_spacing) {
      const bool any_variable = std::any_of(train->spacings.begin(), train->spacings.end(),
                                            [](const model::AxleSpacing& s) { return s.variable(); });
      if (!any_variable)
        warning(r, "fixed_variable_spacing", fmt::format("train '{}' has no variable spacing to fix", train->id));
      for (const model::AxleSpacing& s : train->spacings)
        if (s.variable() && (*c.fixed_variable_spacing < s.min || *c.fixed_variable_spacing > s.max))
          warning(r, "fixed_variable_spacing",
                  fmt::format("{} is outside the train's variable spacing of {} to {}",
                              length(*c.fixed_variable_spacing), length(s.min), length(s.max)));
    }
    return c;
  }

  model::LoadModel read_model(const FieldReader& r, const model::VehicleLibrary& library) {
    model::LoadModel m;
    m.id = r.text("id");
    m.name = r.text("name");
    m.category = r.enumeration("category", model::VehicleCategory::legal);
    for (const std::string& method : r.texts("methods"))
      if (auto parsed = model::parse<model::RatingMethod>(method)) m.methods.push_back(*parsed);
    m.rating_weight = r.optional_quantity("rating_weight", Quantity::weight_tons);
    m.source = r.text("source");
    m.where = r.where();
    for (const FieldReader& c : r.items("cases")) m.cases.push_back(read_case(c, library));
    check_rating_weight(r, m, library);
    return m;
  }

  // A one-truck model's W is its truck's weight; a mismatch is most likely a
  // typo in one of them.
  void check_rating_weight(const FieldReader& r, const model::LoadModel& m, const model::VehicleLibrary& library) {
    if (!m.rating_weight || m.cases.size() != 1) return;
    const model::LoadCase& c = m.cases.front();
    if (!c.train || c.count != 1 || c.train_factor != 1.0) return;
    const model::AxleTrain* train = find_train(library, *c.train);
    if (train == nullptr || train->axle_weights.empty()) return;
    const Real gross = train->gross_weight();
    if (std::abs(*m.rating_weight - gross) <= kWeightTolerance * gross) return;
    warning(r, "rating_weight",
            fmt::format("rating weight {} differs from the gross weight of train '{}' ({})",
                        format_quantity(*m.rating_weight, Quantity::weight_tons, units_), train->id,
                        format_quantity(gross, Quantity::weight_tons, units_)));
  }

  const YamlNode& root_;
  const model::VehicleLibrary* known_;
  Diagnostics& out_;
  units::UnitSystem units_;
};

void prefix_fields(Diagnostics& diagnostics, std::string_view prefix) {
  if (prefix.empty()) return;
  for (Diagnostic& d : diagnostics)
    d.field = d.field.empty() ? std::string(prefix) : fmt::format("{}.{}", prefix, d.field);
}

}  // namespace

namespace detail {

VehicleReadResult read_vehicle_document(const YamlNode& document, const model::VehicleLibrary* known,
                                        std::string_view field_prefix) {
  VehicleReadResult result;
  result.diagnostics = SchemaValidator::embedded("vehicles.schema.json").validate(document);
  if (!has_errors(result.diagnostics)) {
    model::VehicleLibrary library = VehicleBuilder(document, known, result.diagnostics).build();
    if (!has_errors(result.diagnostics)) result.library = std::move(library);
  }
  prefix_fields(result.diagnostics, field_prefix);
  std::stable_sort(result.diagnostics.begin(), result.diagnostics.end(), [](const Diagnostic& a, const Diagnostic& b) {
    return std::tie(a.where.line, a.where.column) < std::tie(b.where.line, b.where.column);
  });
  return result;
}

}  // namespace detail

VehicleReadResult read_vehicle_text(std::string_view text, const std::string& file, const VehicleReadOptions& options) {
  YamlParseResult parsed = parse_yaml(text, file, options.limits);
  if (!parsed.root) return VehicleReadResult{std::nullopt, std::move(parsed.diagnostics)};
  return detail::read_vehicle_document(*parsed.root);
}

VehicleReadResult read_vehicle_file(const std::string& path, const VehicleReadOptions& options) {
  YamlParseResult parsed = parse_yaml_file(path, options.limits);
  if (!parsed.root) return VehicleReadResult{std::nullopt, std::move(parsed.diagnostics)};
  return detail::read_vehicle_document(*parsed.root);
}

VehicleReadResult read_shipped_vehicles(std::string_view name, const VehicleReadOptions& options) {
  std::string why;
  const std::optional<DataReference> reference = resolve_vehicle_reference(name, "<shipped>/vehicles", why);
  if (!reference || !reference->shipped_contents)
    return VehicleReadResult{std::nullopt,
                             {Diagnostic{Severity::error, SourceLocation{std::string(name), 0, 0}, "",
                                         why.empty() ? "not a shipped vehicle library" : why}}};
  return read_vehicle_text(*reference->shipped_contents, reference->label, options);
}

}  // namespace tenthpoint::io
