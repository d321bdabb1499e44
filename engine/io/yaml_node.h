// A parsed YAML document as plain data, detached from the YAML library: every
// node keeps where it was written, so a reader can point at the exact line of
// a bad value. Scalars are resolved by the YAML 1.2 core schema (null, true /
// false, integers, finite floats); anything quoted is a string.
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/core/source_location.h"

namespace tenthpoint::io {

enum class YamlKind { null, boolean, integer, real, string, sequence, mapping };

[[nodiscard]] std::string_view to_string(YamlKind kind);
// The spelling of to_string, or nullopt.
[[nodiscard]] std::optional<YamlKind> parse_yaml_kind(std::string_view text);

struct YamlMember;

struct YamlNode {
  YamlKind kind = YamlKind::null;
  std::string text;  // scalars: the value as written (the string itself for strings)
  bool boolean = false;
  std::int64_t integer = 0;
  double real = 0;
  SourceLocation where;             // start of the node
  std::vector<YamlNode> items;      // sequence items
  std::vector<YamlMember> members;  // mapping members in file order

  [[nodiscard]] bool is_scalar() const;
  [[nodiscard]] bool is_number() const { return kind == YamlKind::integer || kind == YamlKind::real; }
  // The numeric value of an integer or real node; 0 for anything else.
  [[nodiscard]] double number() const;
  // The member value for `key`, or nullptr (also when this is not a mapping).
  [[nodiscard]] const YamlNode* find(std::string_view key) const;
  [[nodiscard]] const YamlMember* find_member(std::string_view key) const;
  [[nodiscard]] YamlNode* find_mutable(std::string_view key);
  // Number of nodes in this subtree, itself included.
  [[nodiscard]] std::size_t node_count() const;
};

struct YamlMember {
  std::string key;
  SourceLocation key_where;
  YamlNode value;
};

// A mapping key, a sequence index or nothing (the document root), for
// addressing a node from the root: {"geometry", "spans", 1}.
struct YamlPathStep {
  std::string key;  // used when index is empty
  std::optional<std::size_t> index;
};
using YamlPath = std::vector<YamlPathStep>;

// "geometry.spans[1]"; "" for the root.
[[nodiscard]] std::string to_string(const YamlPath& path);

// The node at `path` below `root`, or nullptr when the path leaves the tree.
[[nodiscard]] const YamlNode* find_node(const YamlNode& root, const YamlPath& path);

// Where a problem at `path` should point: the value for a scalar, the key of
// a collection (its line reads better than its first child's), and the
// deepest existing ancestor when the path leaves the document (a missing
// field is reported at the object that lacks it).
[[nodiscard]] SourceLocation locate(const YamlNode& root, const YamlPath& path);

// `path` extended by one key or one index.
[[nodiscard]] YamlPath with_key(YamlPath path, std::string key);
[[nodiscard]] YamlPath with_index(YamlPath path, std::size_t index);

}  // namespace tenthpoint::io
