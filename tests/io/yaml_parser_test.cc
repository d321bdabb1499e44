#include "engine/io/yaml_parser.h"

#include <chrono>
#include <string>

#include <catch2/catch.hpp>

#include "tests/io/diagnostic_search.h"

using namespace tenthpoint;
using namespace tenthpoint::io;
using tenthpoint::test::describe_all;
using tenthpoint::test::find_diagnostic;

namespace {

const YamlNode& value_of(const YamlParseResult& result, std::string_view key) {
  REQUIRE(result.root.has_value());
  const YamlNode* node = result.root->find(key);
  REQUIRE(node != nullptr);
  return *node;
}

}  // namespace

// Scalar resolution follows the YAML 1.2.2 core schema (spec section 10.3.2):
// null, booleans, integers (decimal, 0o octal, 0x hex) and floats are
// recognised in plain scalars only; quoted scalars are strings; a date is not
// a core-schema type, so it stays a string.
TEST_CASE("plain scalars resolve by the YAML 1.2 core schema and quoted ones stay text", "[io][yaml]") {
  const YamlParseResult r = parse_yaml(
      "a: 70\nb: -3.5e2\nc: \"70\"\nd: true\ne: ~\nf: 2024-05-21\ng: 0x1F\nh: 0o17\ni: yes\nj: .5\nk: 'null'\n",
      "inline.yaml");
  INFO(describe_all(r.diagnostics));
  CHECK(value_of(r, "a").kind == YamlKind::integer);
  CHECK(value_of(r, "a").integer == 70);
  CHECK(value_of(r, "b").kind == YamlKind::real);
  CHECK(value_of(r, "b").real == -350.0);
  CHECK(value_of(r, "c").kind == YamlKind::string);
  CHECK(value_of(r, "d").kind == YamlKind::boolean);
  CHECK(value_of(r, "e").kind == YamlKind::null);
  CHECK(value_of(r, "f").kind == YamlKind::string);
  CHECK(value_of(r, "g").integer == 31);
  CHECK(value_of(r, "h").integer == 15);
  // "yes" is a YAML 1.1 boolean but only text under the 1.2 core schema.
  CHECK(value_of(r, "i").kind == YamlKind::string);
  CHECK(value_of(r, "j").real == 0.5);
  CHECK(value_of(r, "k").kind == YamlKind::string);
}

TEST_CASE("every node records its 1-based line and column", "[io][yaml]") {
  const YamlParseResult r = parse_yaml("geometry:\n  spans: [70.0, -80.0]\n", "inline.yaml");
  const YamlNode& spans = *value_of(r, "geometry").find("spans");
  REQUIRE(spans.items.size() == 2);
  CHECK(spans.items[1].where.file == "inline.yaml");
  CHECK(spans.items[1].where.line == 2);
  CHECK(spans.items[1].where.column == 17);
  CHECK(value_of(r, "geometry").find_member("spans")->key_where.column == 3);
}

TEST_CASE("a syntax error is reported as 'yaml syntax' at its line", "[io][yaml]") {
  const YamlParseResult r = parse_yaml("a: 1\nb: [1, 2\nc: 3\n", "inline.yaml");
  CHECK_FALSE(r.root.has_value());
  REQUIRE(r.diagnostics.size() == 1);
  CHECK(r.diagnostics[0].message.rfind("yaml syntax: ", 0) == 0);
  CHECK(r.diagnostics[0].where.line >= 2);
  CHECK(r.diagnostics[0].to_string().rfind("inline.yaml:", 0) == 0);
}

TEST_CASE("an empty file and a file of comments are clear errors", "[io][yaml]") {
  for (const char* text : {"", "# only a comment\n\n   \n"}) {
    const YamlParseResult r = parse_yaml(text, "inline.yaml");
    CHECK_FALSE(r.root.has_value());
    CHECK(find_diagnostic(r.diagnostics, Severity::error, "file is empty") != nullptr);
  }
}

TEST_CASE("binary and non-UTF-8 content is refused before parsing", "[io][yaml]") {
  const std::string binary("\x89PNG\r\n\x1a\n\0\0\0\rIHDR", 16);
  CHECK(find_diagnostic(parse_yaml(binary, "x.yaml").diagnostics, Severity::error, "not a text file") != nullptr);
  const YamlParseResult latin1 = parse_yaml("a: 1\nname: Caf\xe9\n", "x.yaml");
  const Diagnostic* d = find_diagnostic(latin1.diagnostics, Severity::error, "not UTF-8", 2);
  REQUIRE(d != nullptr);
  CHECK(d->where.column == 10);
}

TEST_CASE("duplicate keys, merge keys, second documents and unknown tags are refused", "[io][yaml]") {
  // YAML 1.2.2 section 3.2.1.1: the keys of a mapping are unique.
  CHECK(find_diagnostic(parse_yaml("a: 1\nb: 2\na: 3\n", "x.yaml").diagnostics, Severity::error,
                        "duplicate key 'a' (first given at line 1)", 3) != nullptr);
  CHECK(find_diagnostic(parse_yaml("base: &b {x: 1}\nc:\n  <<: *b\n", "x.yaml").diagnostics, Severity::error,
                        "merge keys") != nullptr);
  CHECK(find_diagnostic(parse_yaml("a: 1\n---\nb: 2\n", "x.yaml").diagnostics, Severity::error, "second yaml document",
                        2) != nullptr);
  CHECK(find_diagnostic(parse_yaml("a: !custom 1\n", "x.yaml").diagnostics, Severity::error, "unsupported yaml tag") !=
        nullptr);
  CHECK(find_diagnostic(parse_yaml("a: .inf\n", "x.yaml").diagnostics, Severity::error, "not a finite number") !=
        nullptr);
}

TEST_CASE("a few aliases are fine and copy the anchored value", "[io][yaml]") {
  const YamlParseResult r = parse_yaml("deck: &d {thickness: 7.5}\nother: *d\n", "x.yaml");
  INFO(describe_all(r.diagnostics));
  REQUIRE(r.root.has_value());
  CHECK(value_of(r, "other").find("thickness")->real == 7.5);
}

// The classic exponential-expansion ("billion laughs") attack: each level
// repeats the previous one, so a few hundred bytes name 9^9 values.
TEST_CASE("an alias bomb is refused quickly instead of expanding", "[io][yaml][hostile]") {
  std::string bomb = "a: &a [x, x, x, x, x, x, x, x, x]\n";
  std::string previous = "a";
  for (const char* name : {"b", "c", "d", "e", "f", "g", "h", "i"}) {
    bomb += std::string(name) + ": &" + name + " [";
    for (int k = 0; k < 9; ++k) bomb += (k ? ", *" : "*") + previous;
    bomb += "]\n";
    previous = name;
  }
  const auto started = std::chrono::steady_clock::now();
  const YamlParseResult r = parse_yaml(bomb, "x.yaml");
  const auto elapsed = std::chrono::steady_clock::now() - started;
  CHECK_FALSE(r.root.has_value());
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "after expanding aliases") != nullptr);
  // Generous: refusing must not depend on expanding first (the full bomb
  // would take minutes and gigabytes).
  CHECK(elapsed < std::chrono::seconds(5));

  YamlLimits few;
  few.max_aliases = 2;
  CHECK(find_diagnostic(parse_yaml("a: &a 1\nb: [*a, *a, *a]\n", "x.yaml", few).diagnostics, Severity::error,
                        "too many yaml aliases") != nullptr);
}

TEST_CASE("deep nesting, long values and oversized text are refused with their limit", "[io][yaml][hostile]") {
  const std::string deep = "a: " + std::string(500, '[') + std::string(500, ']') + "\n";
  CHECK(find_diagnostic(parse_yaml(deep, "x.yaml").diagnostics, Severity::error, "nesting is too deep") != nullptr);

  YamlLimits limits;
  const std::string long_value = "a: " + std::string(limits.max_scalar_length + 1, 'x') + "\n";
  CHECK(find_diagnostic(parse_yaml(long_value, "x.yaml").diagnostics, Severity::error, "value is too long") != nullptr);

  limits.max_file_bytes = 100;
  CHECK(find_diagnostic(parse_yaml(std::string(200, '#'), "x.yaml", limits).diagnostics, Severity::error,
                        "file is too large") != nullptr);
}

TEST_CASE("a missing file and a directory are reported, not thrown", "[io][yaml]") {
  CHECK(find_diagnostic(parse_yaml_file("/nonexistent/bridge.yaml").diagnostics, Severity::error, "file not found") !=
        nullptr);
  CHECK(find_diagnostic(parse_yaml_file(TENTHPOINT_SOURCE_DIR).diagnostics, Severity::error, "is a directory") !=
        nullptr);
}
