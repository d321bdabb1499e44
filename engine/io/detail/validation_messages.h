// Internal to engine/io: turns valijson's raw errors into the diagnostics a
// person reads. valijson says where (a context path) and which constraint
// failed, in its own words and with nested noise from oneOf / anyOf / if-then;
// the schema says what was expected. This joins the two: each message names
// the allowed fields (and the nearest one for a typo), the enum values, the
// bounds, or the one field of a choice, located at the offending key or value.
#pragma once

#include <map>
#include <regex>
#include <string>
#include <vector>

#include <nlohmann/json.hpp>

#include "engine/core/diagnostic.h"
#include "engine/io/yaml_node.h"

namespace tenthpoint::io::detail {

// One valijson error with its context as a document path.
struct RawValidationError {
  YamlPath path;
  std::string message;  // valijson's description
};

// What the messages need of a schema: the document as written (declaration
// order kept), its patterns compiled (checked here, see schema_validator.h)
// and the definition each patterned subschema came from.
struct SchemaForMessages {
  const nlohmann::ordered_json& document;
  const std::map<std::string, std::regex>& patterns;
  const std::map<const nlohmann::ordered_json*, std::string>& definition_names;
};

// valijson's context ["<root>", "[geometry]", "[spans]", "[1]"] as a path,
// using the document to tell an index from a key that looks like a number.
[[nodiscard]] YamlPath to_yaml_path(const std::vector<std::string>& context, const YamlNode& root);

// The diagnostics for `raw` (valijson's errors for `root`), plus those of the
// schema's patterns, unsorted.
[[nodiscard]] Diagnostics validation_messages(const SchemaForMessages& schema, const YamlNode& root,
                                              const std::vector<RawValidationError>& raw);

}  // namespace tenthpoint::io::detail
