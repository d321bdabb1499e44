#include "engine/io/yaml_merge.h"

#include <catch2/catch.hpp>

#include "engine/io/yaml_parser.h"

using namespace tenthpoint;
using namespace tenthpoint::io;

namespace {

YamlNode parse(std::string_view text, const std::string& file) {
  YamlParseResult r = parse_yaml(text, file);
  REQUIRE(r.root.has_value());
  return *r.root;
}

}  // namespace

// The override rules are this project's contract (yaml_merge.h).
TEST_CASE("mappings merge key by key, null removes, lists and scalars replace", "[io][merge]") {
  const YamlNode base = parse("a: {x: 1, y: 2}\nlist: [1, 2, 3]\ngone: 5\nkeep: 7\n", "base.yaml");
  const YamlNode overlay = parse("a: {y: 20, z: 30}\nlist: [9]\ngone: null\nnew: 1\n", "leaf.yaml");
  const YamlNode merged = merge_yaml(base, overlay);
  const YamlNode& a = *merged.find("a");
  CHECK(a.find("x")->integer == 1);
  CHECK(a.find("y")->integer == 20);
  CHECK(a.find("z")->integer == 30);
  CHECK(merged.find("list")->items.size() == 1);
  CHECK(merged.find("gone") == nullptr);
  CHECK(merged.find("keep")->integer == 7);
  CHECK(merged.find("new")->integer == 1);
  // Each value keeps the file and line that wrote it.
  CHECK(a.find("x")->where.file == "base.yaml");
  CHECK(a.find("y")->where.file == "leaf.yaml");
  CHECK(merged.find("keep")->where.line == 4);
  // Keys only in the base come first, in base order; new keys follow.
  CHECK(merged.members.back().key == "new");
}

TEST_CASE("a scalar over a mapping replaces it, and so does a mapping over a scalar", "[io][merge]") {
  const YamlNode merged = merge_yaml(parse("a: {x: 1}\nb: 2\n", "base.yaml"), parse("a: 3\nb: {y: 4}\n", "leaf.yaml"));
  CHECK(merged.find("a")->integer == 3);
  CHECK(merged.find("b")->find("y")->integer == 4);
}
