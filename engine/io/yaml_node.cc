#include "engine/io/yaml_node.h"

#include <array>
#include <utility>

namespace tenthpoint::io {
namespace {

constexpr std::array<std::pair<YamlKind, std::string_view>, 7> kYamlKind{{{YamlKind::null, "null"},
                                                                          {YamlKind::boolean, "boolean"},
                                                                          {YamlKind::integer, "integer"},
                                                                          {YamlKind::real, "real"},
                                                                          {YamlKind::string, "string"},
                                                                          {YamlKind::sequence, "sequence"},
                                                                          {YamlKind::mapping, "mapping"}}};

}  // namespace

std::string_view to_string(YamlKind kind) {
  for (const auto& [value, name] : kYamlKind)
    if (value == kind) return name;
  return "?";
}

std::optional<YamlKind> parse_yaml_kind(std::string_view text) {
  for (const auto& [value, name] : kYamlKind)
    if (name == text) return value;
  return std::nullopt;
}

bool YamlNode::is_scalar() const { return kind != YamlKind::sequence && kind != YamlKind::mapping; }

double YamlNode::number() const {
  if (kind == YamlKind::integer) return static_cast<double>(integer);
  if (kind == YamlKind::real) return real;
  return 0.0;
}

const YamlMember* YamlNode::find_member(std::string_view key) const {
  if (kind != YamlKind::mapping) return nullptr;
  for (const YamlMember& member : members)
    if (member.key == key) return &member;
  return nullptr;
}

const YamlNode* YamlNode::find(std::string_view key) const {
  const YamlMember* member = find_member(key);
  return member == nullptr ? nullptr : &member->value;
}

YamlNode* YamlNode::find_mutable(std::string_view key) {
  if (kind != YamlKind::mapping) return nullptr;
  for (YamlMember& member : members)
    if (member.key == key) return &member.value;
  return nullptr;
}

std::size_t YamlNode::node_count() const {
  std::size_t n = 1;
  for (const YamlNode& item : items) n += item.node_count();
  for (const YamlMember& member : members) n += member.value.node_count();
  return n;
}

std::string to_string(const YamlPath& path) {
  std::string out;
  for (const YamlPathStep& step : path) {
    if (step.index) {
      out += '[' + std::to_string(*step.index) + ']';
    } else {
      if (!out.empty()) out += '.';
      out += step.key;
    }
  }
  return out;
}

const YamlNode* find_node(const YamlNode& root, const YamlPath& path) {
  const YamlNode* node = &root;
  for (const YamlPathStep& step : path) {
    if (step.index) {
      if (node->kind != YamlKind::sequence || *step.index >= node->items.size()) return nullptr;
      node = &node->items[*step.index];
    } else {
      node = node->find(step.key);
      if (node == nullptr) return nullptr;
    }
  }
  return node;
}

SourceLocation locate(const YamlNode& root, const YamlPath& path) {
  const YamlNode* node = &root;
  SourceLocation best = root.where;
  for (const YamlPathStep& step : path) {
    if (step.index) {
      if (node->kind != YamlKind::sequence || *step.index >= node->items.size()) return best;
      node = &node->items[*step.index];
      best = node->where;
    } else {
      const YamlMember* member = node->find_member(step.key);
      if (member == nullptr) return best;
      node = &member->value;
      best = node->is_scalar() ? node->where : member->key_where;
    }
  }
  return best;
}

YamlPath with_key(YamlPath path, std::string key) {
  path.push_back(YamlPathStep{std::move(key), std::nullopt});
  return path;
}

YamlPath with_index(YamlPath path, std::size_t index) {
  path.push_back(YamlPathStep{"", index});
  return path;
}

}  // namespace tenthpoint::io
