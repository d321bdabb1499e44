// Internal to engine/io: finds the parts of a JSON Schema that constrain a
// given place in a document, so validation messages can say what was
// expected (the allowed field names, the enum values, the bounds). Only the
// keywords our schemas use are followed: $ref (local), properties, items,
// allOf / anyOf / oneOf, if / then / else.
#pragma once

#include <string>
#include <vector>

#include <nlohmann/json.hpp>

#include "engine/io/yaml_node.h"

namespace tenthpoint::io::detail {

class SchemaNavigator {
 public:
  // `root` must outlive the navigator.
  explicit SchemaNavigator(const nlohmann::ordered_json& root) : root_(root) {}

  // Follows local "$ref" chains ("#/definitions/x"); returns `schema` itself
  // when it has no $ref. A dangling ref resolves to an empty schema.
  [[nodiscard]] const nlohmann::ordered_json& resolve(const nlohmann::ordered_json& schema) const;

  // `schema` resolved, plus (recursively) the branches of its allOf, anyOf,
  // oneOf, then and else: everything that may constrain the same value.
  [[nodiscard]] std::vector<const nlohmann::ordered_json*> expand(const nlohmann::ordered_json& schema) const;

  // The subschemas (expanded) for the value at `path` below the root.
  [[nodiscard]] std::vector<const nlohmann::ordered_json*> at(const YamlPath& path) const;

  // The subschemas (expanded) for one step below values constrained by `parents`.
  [[nodiscard]] std::vector<const nlohmann::ordered_json*> step(
      const std::vector<const nlohmann::ordered_json*>& parents, const YamlPathStep& step) const;

  // Property names the subschemas declare, in declaration order, without repeats.
  [[nodiscard]] static std::vector<std::string> property_names(
      const std::vector<const nlohmann::ordered_json*>& schemas);

  // True when some subschema leaves extra properties open (no
  // "additionalProperties": false).
  [[nodiscard]] static bool allows_extra_properties(const std::vector<const nlohmann::ordered_json*>& schemas);

 private:
  void expand_into(const nlohmann::ordered_json& schema, std::vector<const nlohmann::ordered_json*>& out,
                   int depth) const;

  const nlohmann::ordered_json& root_;
};

}  // namespace tenthpoint::io::detail
