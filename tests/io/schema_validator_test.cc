#include "engine/io/schema_validator.h"

#include <stdexcept>
#include <string>

#include <catch2/catch.hpp>

#include "engine/io/yaml_parser.h"
#include "tests/io/diagnostic_search.h"

using namespace tenthpoint;
using namespace tenthpoint::io;
using tenthpoint::test::describe_all;
using tenthpoint::test::find_diagnostic;

namespace {

Diagnostics check(const SchemaValidator& validator, std::string_view yaml) {
  const YamlParseResult parsed = parse_yaml(yaml, "inline.yaml");
  REQUIRE(parsed.root.has_value());
  return validator.validate(*parsed.root);
}

// Keywords whose draft-7 meaning differs from draft 4 or is easy to get
// wrong; each check below follows JSON Schema Validation, draft-07
// (draft-handrews-json-schema-validation-01), the section named beside it.
const char* const kDraft7Schema = R"({
  "$schema": "http://json-schema.org/draft-07/schema#",
  "type": "object",
  "additionalProperties": false,
  "properties": {
    "version": {"const": 1},
    "length": {"type": "number", "exclusiveMinimum": 0},
    "kind": {"enum": ["steel", "concrete"]},
    "steel": {"type": "object"},
    "end_section": {"type": "string"},
    "taper": {"type": "string"},
    "uniform": {"type": "number"},
    "point": {"type": "number"},
    "name": {"type": "string", "maxLength": 10, "pattern": "^[a-z]+$"}
  },
  "if": {"properties": {"kind": {"const": "steel"}}},
  "then": {"required": ["steel"]},
  "dependencies": {"end_section": ["taper"]},
  "oneOf": [{"required": ["uniform"]}, {"required": ["point"]}]
})";

}  // namespace

TEST_CASE("valijson applies the draft-7 keywords the formats rely on", "[io][schema]") {
  const SchemaValidator validator(kDraft7Schema);
  // A document meeting every rule validates clean.
  CHECK(check(validator, "version: 1\nlength: 2\nkind: concrete\nuniform: 3\n").empty());

  // 6.1.3 const: the value must equal the constant.
  CHECK(find_diagnostic(check(validator, "version: 2\nuniform: 1\n"), Severity::error, "expected 1 (got 2)", 1));
  // 6.2.5 exclusiveMinimum is a number in draft 7 (a boolean in draft 4): 0 fails, 0.001 passes.
  CHECK(
      find_diagnostic(check(validator, "length: 0\nuniform: 1\n"), Severity::error, "must be greater than 0 (got 0)"));
  CHECK(check(validator, "length: 0.001\nkind: concrete\nuniform: 1\n").empty());
  // 6.6.1-6.6.2 if/then: "then" applies only when "if" matches (and an "if"
  // on a property matches when the property is absent, so documents below
  // that leave kind out give it).
  CHECK(find_diagnostic(check(validator, "kind: steel\nuniform: 1\n"), Severity::error,
                        "missing field 'steel', required when kind is steel"));
  CHECK(check(validator, "kind: concrete\nuniform: 1\n").empty());
  // 6.5.7 dependencies (array form): a present key requires the others.
  CHECK(find_diagnostic(check(validator, "end_section: a\nuniform: 1\n"), Severity::error,
                        "missing field 'taper', required when 'end_section' is given", 1));
  // 6.7.3 oneOf: exactly one branch; none and two both fail.
  CHECK(
      find_diagnostic(check(validator, "version: 1\n"), Severity::error, "expected one of the fields: uniform, point"));
  CHECK(find_diagnostic(check(validator, "uniform: 1\npoint: 2\n"), Severity::error,
                        "give only one of: uniform, point (found uniform, point)"));
}

TEST_CASE("an unknown field names the allowed ones and the nearest for a typo", "[io][schema]") {
  const SchemaValidator validator(kDraft7Schema);
  const Diagnostics d = check(validator, "uniform: 1\nlenght: 3\nzzz: 4\n");
  INFO(describe_all(d));
  const Diagnostic* typo = find_diagnostic(d, Severity::error, "unknown field 'lenght' (did you mean 'length'?)", 2);
  REQUIRE(typo != nullptr);
  CHECK(typo->field == "lenght");
  CHECK(typo->message.find("expected one of: version, length, kind") != std::string::npos);
  // valijson names only the first stranger in an object; every one is reported.
  const Diagnostic* other = find_diagnostic(d, Severity::error, "unknown field 'zzz'", 3);
  REQUIRE(other != nullptr);
  CHECK(other->message.find("did you mean") == std::string::npos);
}

TEST_CASE("type, enum and pattern messages say what was expected", "[io][schema]") {
  const SchemaValidator validator(kDraft7Schema);
  const Diagnostics d = check(validator, "uniform: \"12\"\nkind: stel\nname: Bad1\n");
  INFO(describe_all(d));
  CHECK(find_diagnostic(d, Severity::error, "expected a number (got '12'); remove the quotes", 1));
  CHECK(find_diagnostic(d, Severity::error, "expected one of: steel, concrete (got 'stel'; did you mean 'steel'?)", 2));
  CHECK(find_diagnostic(d, Severity::error, "expected text matching ^[a-z]+$ (got 'Bad1')", 3));
}

// std::regex (valijson's engine) recurses per character and overflows the
// stack on long strings (about 3e4 characters with libstdc++); patterns are
// checked outside it, and a string too long for its field never reaches it.
TEST_CASE("a long string against a patterned field reports its length and does not crash", "[io][schema][hostile]") {
  const SchemaValidator validator(kDraft7Schema);
  const Diagnostics d = check(validator, "uniform: 1\nkind: concrete\nname: " + std::string(60000, 'a') + "\n");
  CHECK(find_diagnostic(d, Severity::error, "is too long (60000 characters; at most 10)", 3));
  CHECK(d.size() == 1);
}

TEST_CASE("a malformed schema is an invalid_argument, not a crash", "[io][schema]") {
  CHECK_THROWS_AS(SchemaValidator("{not json"), std::invalid_argument);
  CHECK_THROWS_AS(SchemaValidator::embedded("no-such.schema.json"), std::invalid_argument);
}

TEST_CASE("the embedded schemas parse", "[io][schema]") {
  CHECK_NOTHROW(SchemaValidator::embedded("bridge.schema.json"));
  CHECK_NOTHROW(SchemaValidator::embedded("policy.schema.json"));
  CHECK_NOTHROW(SchemaValidator::embedded("vehicles.schema.json"));
}

TEST_CASE("the number of diagnostics per document is capped with a summary line", "[io][schema][hostile]") {
  const SchemaValidator validator(
      R"({"type": "object", "properties": {"xs": {"type": "array", "items": {"type": "number"}}}})");
  std::string many = "xs: [";
  for (int i = 0; i < 500; ++i) many += (i ? ", a" : "a");
  many += "]\n";
  SchemaValidationOptions options;
  options.max_diagnostics = 20;
  const YamlParseResult parsed = parse_yaml(many, "inline.yaml");
  REQUIRE(parsed.root.has_value());
  const Diagnostics d = validator.validate(*parsed.root, options);
  CHECK(d.size() == 21);
  CHECK(d.back().message == "480 more problems not shown");
}
