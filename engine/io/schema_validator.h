// Checks a parsed YAML document against a JSON Schema (draft 7) and reports
// every violation as a Diagnostic at the offending line, with the field path
// ("geometry.spans[1]") and a short lower-case message saying what was
// expected. Nested noise from oneOf / anyOf / if-then is condensed into one
// message per problem; an unknown field names the allowed ones and the
// nearest match for a typo.
//
// Validation is done by valijson on a typed JSON copy of the document (YAML
// 1.2 core-schema types, so a quoted "36" is text, not a number). valijson's
// own yaml-cpp adapter is not used: it reports every node as a string (a
// mapping passes "type": "string"), it cannot tell "36" from 36, and in
// valijson 1.0 it does not compile against the validator (its array iterator
// lacks the operator-- that uniqueItems needs).
//
// The "pattern" keyword is checked here instead of by valijson, because
// std::regex (valijson's engine) overflows the stack on long strings. So a
// schema must not use "pattern" to choose between oneOf / anyOf branches:
// patterns are applied wherever a property can land. "format" is ignored
// for the same reason (valijson checks it with std::regex too).
#pragma once

#include <memory>
#include <string_view>

#include "engine/core/diagnostic.h"
#include "engine/io/yaml_node.h"

namespace tenthpoint::io {

struct SchemaValidationOptions {
  // Violations reported per document; the rest are summarised in one line, so
  // a hostile file cannot produce an unbounded report.
  std::size_t max_diagnostics = 100;
};

class SchemaValidator {
 public:
  // Parses `schema_json`. Throws std::invalid_argument when it is not a valid
  // draft-7 schema (for the embedded schemas, a build defect).
  explicit SchemaValidator(std::string_view schema_json);
  ~SchemaValidator();
  SchemaValidator(SchemaValidator&&) noexcept;
  SchemaValidator& operator=(SchemaValidator&&) noexcept;

  // Every violation in `document`, sorted by line. Empty when it conforms.
  [[nodiscard]] Diagnostics validate(const YamlNode& document, const SchemaValidationOptions& options = {}) const;

  // The embedded schema "schemas/<name>" (e.g. "bridge.schema.json"), parsed
  // once per process. Throws std::invalid_argument for an unknown name.
  [[nodiscard]] static const SchemaValidator& embedded(std::string_view name);

 private:
  struct Impl;
  std::unique_ptr<Impl> impl_;
};

}  // namespace tenthpoint::io
