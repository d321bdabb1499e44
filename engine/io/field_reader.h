// Typed, unit-converting access to the fields of a schema-validated YAML
// mapping, for the readers that build model structs. Every bare number is
// converted from the file's unit system to internal SI as it is read (see
// engine/core/units.h); every value knows its location and field path, for
// the semantic checks that follow.
//
// Preconditions: the document has passed its schema, so a field that is
// present has the schema's type. Accessors for absent optional fields return
// nullopt or the given default; asking for an absent required field, or for
// the wrong type, is a broken invariant (assert) and yields a default.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/core/source_location.h"
#include "engine/core/units.h"
#include "engine/io/yaml_node.h"
#include "engine/model/enums.h"

namespace tenthpoint::io {

class FieldReader {
 public:
  FieldReader(const YamlNode& node, units::UnitSystem units, YamlPath path = {})
      : node_(&node), units_(units), path_(std::move(path)) {}

  [[nodiscard]] const YamlNode& node() const { return *node_; }
  [[nodiscard]] const YamlPath& path() const { return path_; }
  [[nodiscard]] units::UnitSystem units() const { return units_; }
  [[nodiscard]] SourceLocation where() const { return node_->where; }
  // Location of `key`'s value (or of this mapping when the key is absent).
  [[nodiscard]] SourceLocation where(std::string_view key) const;
  // "geometry.spans" for key "spans" below "geometry".
  [[nodiscard]] std::string field(std::string_view key) const;
  [[nodiscard]] std::string field() const { return to_string(path_); }

  [[nodiscard]] bool has(std::string_view key) const;
  // The member `key` (an empty mapping reader when absent).
  [[nodiscard]] FieldReader at(std::string_view key) const;
  // The items of the sequence `key`; empty when absent.
  [[nodiscard]] std::vector<FieldReader> items(std::string_view key) const;
  // The items of this node, when it is a sequence.
  [[nodiscard]] std::vector<FieldReader> items() const;
  // Members of this mapping as (key, reader) pairs, in file order.
  [[nodiscard]] std::vector<std::pair<std::string, FieldReader>> members() const;

  // A number of `quantity`, converted to internal units.
  [[nodiscard]] Real quantity(std::string_view key, units::Quantity quantity) const;
  [[nodiscard]] std::optional<Real> optional_quantity(std::string_view key, units::Quantity quantity) const;
  [[nodiscard]] std::vector<Real> quantities(std::string_view key, units::Quantity quantity) const;
  // This node as a number of `quantity`.
  [[nodiscard]] Real as_quantity(units::Quantity quantity) const;

  [[nodiscard]] Real number(std::string_view key, Real fallback = 0) const;
  [[nodiscard]] std::optional<Real> optional_number(std::string_view key) const;
  [[nodiscard]] int integer(std::string_view key, int fallback = 0) const;
  [[nodiscard]] std::optional<int> optional_integer(std::string_view key) const;
  [[nodiscard]] bool boolean(std::string_view key, bool fallback = false) const;
  [[nodiscard]] std::string text(std::string_view key, std::string fallback = "") const;
  [[nodiscard]] std::optional<std::string> optional_text(std::string_view key) const;
  [[nodiscard]] std::vector<std::string> texts(std::string_view key) const;

  // An enum by its file spelling (model::parse); `fallback` when absent or
  // not a known spelling (the schema's enum rules the second case out).
  template <typename Enum>
  [[nodiscard]] Enum enumeration(std::string_view key, Enum fallback) const {
    if (auto text = optional_text(key))
      if (auto value = model::parse<Enum>(*text)) return *value;
    return fallback;
  }
  template <typename Enum>
  [[nodiscard]] std::optional<Enum> optional_enumeration(std::string_view key) const {
    if (auto text = optional_text(key)) return model::parse<Enum>(*text);
    return std::nullopt;
  }

 private:
  const YamlNode* find(std::string_view key) const { return node_->find(key); }

  const YamlNode* node_;
  units::UnitSystem units_;
  YamlPath path_;
};

}  // namespace tenthpoint::io
