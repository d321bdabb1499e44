#include "engine/io/schema_validator.h"

#include <algorithm>
#include <map>
#include <regex>
#include <set>
#include <stdexcept>

#include <fmt/format.h>
#include <nlohmann/json.hpp>
#include <valijson/adapters/nlohmann_json_adapter.hpp>
#include <valijson/schema.hpp>
#include <valijson/schema_parser.hpp>
#include <valijson/validation_results.hpp>
#include <valijson/validator.hpp>

#include "engine/io/detail/validation_messages.h"
#include "engine/io/embedded_files.h"

namespace tenthpoint::io {

using nlohmann::json;
using ojson = nlohmann::ordered_json;  // schemas for messages keep their declaration order

namespace {

json to_json(const YamlNode& node) {
  switch (node.kind) {
    case YamlKind::null:
      return nullptr;
    case YamlKind::boolean:
      return node.boolean;
    case YamlKind::integer:
      return node.integer;
    case YamlKind::real:
      return node.real;
    case YamlKind::string:
      return node.text;
    case YamlKind::sequence: {
      json out = json::array();
      for (const YamlNode& item : node.items) out.push_back(to_json(item));
      return out;
    }
    case YamlKind::mapping: {
      json out = json::object();
      for (const YamlMember& member : node.members) out[member.key] = to_json(member.value);
      return out;
    }
  }
  return nullptr;
}

// A copy of the schema without "pattern" keywords (checked separately, see
// the header) and without "format", collecting each pattern on the way.
// Walks keyword positions only, so a property named "pattern" survives.
json strip_patterns(const json& schema, std::set<std::string>& patterns) {
  if (!schema.is_object()) return schema;
  json out = json::object();
  for (auto it = schema.begin(); it != schema.end(); ++it) {
    const std::string& key = it.key();
    const json& value = it.value();
    if (key == "pattern" && value.is_string()) {
      patterns.insert(value.get<std::string>());
      continue;
    }
    // valijson checks "format" (date, time) with std::regex as well; the
    // formats do not use it, and it is dropped so that it never could.
    if (key == "format") continue;
    if ((key == "properties" || key == "definitions" || key == "patternProperties") && value.is_object()) {
      json map = json::object();
      for (auto p = value.begin(); p != value.end(); ++p) map[p.key()] = strip_patterns(p.value(), patterns);
      out[key] = std::move(map);
    } else if ((key == "allOf" || key == "anyOf" || key == "oneOf" || key == "items") && value.is_array()) {
      json list = json::array();
      for (const json& branch : value) list.push_back(strip_patterns(branch, patterns));
      out[key] = std::move(list);
    } else if (key == "dependencies" && value.is_object()) {
      json map = json::object();
      for (auto p = value.begin(); p != value.end(); ++p)
        map[p.key()] = p.value().is_object() ? strip_patterns(p.value(), patterns) : p.value();
      out[key] = std::move(map);
    } else if (key == "items" || key == "not" || key == "if" || key == "then" || key == "else" ||
               key == "additionalProperties" || key == "additionalItems" || key == "contains" ||
               key == "propertyNames") {
      out[key] = strip_patterns(value, patterns);
    } else {
      out[key] = value;
    }
  }
  return out;
}

// The parsed schema: the document as written (for messages) and valijson's
// compiled form of it without patterns.
struct SchemaData {
  ojson schema_document;  // as written, for messages
  valijson::Schema schema;
  std::map<std::string, std::regex> patterns;
  std::map<const ojson*, std::string> definition_names;

  explicit SchemaData(std::string_view text) {
    try {
      schema_document = ojson::parse(text);
    } catch (const ojson::exception& e) {
      throw std::invalid_argument(std::string("schema is not valid json: ") + e.what());
    }
    std::set<std::string> found;
    // valijson reads nlohmann::json (sorted keys); messages read the ordered copy.
    const json stripped = strip_patterns(json::parse(text), found);
    try {
      valijson::SchemaParser parser(valijson::SchemaParser::kDraft7);
      valijson::adapters::NlohmannJsonAdapter adapter(stripped);
      parser.populateSchema(adapter, schema);
      for (const std::string& pattern : found) patterns.emplace(pattern, std::regex(pattern, std::regex::ECMAScript));
    } catch (const std::exception& e) {
      throw std::invalid_argument(std::string("schema is not a valid draft-7 schema: ") + e.what());
    }
    if (auto definitions = schema_document.find("definitions"); definitions != schema_document.end())
      for (auto it = definitions->begin(); it != definitions->end(); ++it) definition_names[&it.value()] = it.key();
  }
};

}  // namespace

struct SchemaValidator::Impl : SchemaData {
  using SchemaData::SchemaData;
};

SchemaValidator::SchemaValidator(std::string_view schema_json) : impl_(std::make_unique<Impl>(schema_json)) {}
SchemaValidator::~SchemaValidator() = default;
SchemaValidator::SchemaValidator(SchemaValidator&&) noexcept = default;
SchemaValidator& SchemaValidator::operator=(SchemaValidator&&) noexcept = default;

Diagnostics SchemaValidator::validate(const YamlNode& document, const SchemaValidationOptions& options) const {
  const json instance = to_json(document);
  valijson::Validator validator(valijson::Validator::kStrongTypes);
  valijson::ValidationResults results;
  valijson::adapters::NlohmannJsonAdapter adapter(instance);
  validator.validate(impl_->schema, adapter, &results);

  std::vector<detail::RawValidationError> raw;
  for (const valijson::ValidationResults::Error& error : results)
    raw.push_back(detail::RawValidationError{detail::to_yaml_path(error.context, document), error.description});

  const detail::SchemaForMessages schema{impl_->schema_document, impl_->patterns, impl_->definition_names};
  Diagnostics out = detail::validation_messages(schema, document, raw);

  std::stable_sort(out.begin(), out.end(), [](const Diagnostic& a, const Diagnostic& b) {
    return std::tie(a.where.line, a.where.column) < std::tie(b.where.line, b.where.column);
  });
  out.erase(std::unique(out.begin(), out.end(),
                        [](const Diagnostic& a, const Diagnostic& b) {
                          return a.where.line == b.where.line && a.where.column == b.where.column &&
                                 a.field == b.field && a.message == b.message;
                        }),
            out.end());
  if (out.size() > options.max_diagnostics) {
    const std::size_t hidden = out.size() - options.max_diagnostics;
    out.resize(options.max_diagnostics);
    out.push_back(Diagnostic{Severity::error, SourceLocation{document.where.file, 0, 0}, "",
                             fmt::format("{} more problems not shown", hidden)});
  }
  return out;
}

const SchemaValidator& SchemaValidator::embedded(std::string_view name) {
  // One parse per schema per process; function-local statics initialise
  // thread-safely, so batch workers may share them.
  const auto load = [](std::string_view file) {
    auto text = embedded_file(file);
    if (!text) throw std::invalid_argument("no embedded schema " + std::string(file));
    return SchemaValidator(*text);
  };
  if (name == "bridge.schema.json") {
    static const SchemaValidator kBridge = load("schemas/bridge.schema.json");
    return kBridge;
  }
  if (name == "policy.schema.json") {
    static const SchemaValidator kPolicy = load("schemas/policy.schema.json");
    return kPolicy;
  }
  if (name == "vehicles.schema.json") {
    static const SchemaValidator kVehicles = load("schemas/vehicles.schema.json");
    return kVehicles;
  }
  throw std::invalid_argument("no embedded schema " + std::string(name));
}

}  // namespace tenthpoint::io
