#include "engine/io/field_reader.h"

#include <cassert>
#include <cmath>

namespace tenthpoint::io {
namespace {

const YamlNode& empty_mapping() {
  static const YamlNode kEmpty = [] {
    YamlNode node;
    node.kind = YamlKind::mapping;
    return node;
  }();
  return kEmpty;
}

}  // namespace

SourceLocation FieldReader::where(std::string_view key) const {
  const YamlMember* member = node_->find_member(key);
  if (member == nullptr) return node_->where;
  return member->value.is_scalar() ? member->value.where : member->key_where;
}

std::string FieldReader::field(std::string_view key) const { return to_string(with_key(path_, std::string(key))); }

bool FieldReader::has(std::string_view key) const {
  const YamlNode* value = find(key);
  return value != nullptr && value->kind != YamlKind::null;
}

FieldReader FieldReader::at(std::string_view key) const {
  const YamlNode* value = find(key);
  return FieldReader(value != nullptr ? *value : empty_mapping(), units_, with_key(path_, std::string(key)));
}

std::vector<FieldReader> FieldReader::items(std::string_view key) const {
  const YamlNode* value = find(key);
  if (value == nullptr) return {};
  return FieldReader(*value, units_, with_key(path_, std::string(key))).items();
}

std::vector<FieldReader> FieldReader::items() const {
  std::vector<FieldReader> out;
  if (node_->kind != YamlKind::sequence) return out;
  out.reserve(node_->items.size());
  for (std::size_t i = 0; i < node_->items.size(); ++i) out.emplace_back(node_->items[i], units_, with_index(path_, i));
  return out;
}

std::vector<std::pair<std::string, FieldReader>> FieldReader::members() const {
  std::vector<std::pair<std::string, FieldReader>> out;
  for (const YamlMember& member : node_->members)
    out.emplace_back(member.key, FieldReader(member.value, units_, with_key(path_, member.key)));
  return out;
}

Real FieldReader::as_quantity(units::Quantity quantity) const {
  assert(node_->is_number());
  return units::to_internal(node_->number(), quantity, units_);
}

Real FieldReader::quantity(std::string_view key, units::Quantity quantity) const {
  return optional_quantity(key, quantity).value_or(0.0);
}

std::optional<Real> FieldReader::optional_quantity(std::string_view key, units::Quantity quantity) const {
  const YamlNode* value = find(key);
  if (value == nullptr || !value->is_number()) return std::nullopt;
  return units::to_internal(value->number(), quantity, units_);
}

std::vector<Real> FieldReader::quantities(std::string_view key, units::Quantity quantity) const {
  std::vector<Real> out;
  for (const FieldReader& item : items(key))
    if (item.node().is_number()) out.push_back(item.as_quantity(quantity));
  return out;
}

Real FieldReader::number(std::string_view key, Real fallback) const { return optional_number(key).value_or(fallback); }

std::optional<Real> FieldReader::optional_number(std::string_view key) const {
  const YamlNode* value = find(key);
  if (value == nullptr || !value->is_number()) return std::nullopt;
  return value->number();
}

int FieldReader::integer(std::string_view key, int fallback) const { return optional_integer(key).value_or(fallback); }

std::optional<int> FieldReader::optional_integer(std::string_view key) const {
  const YamlNode* value = find(key);
  if (value == nullptr || value->kind != YamlKind::integer) return std::nullopt;
  return static_cast<int>(value->integer);
}

bool FieldReader::boolean(std::string_view key, bool fallback) const {
  const YamlNode* value = find(key);
  if (value == nullptr || value->kind != YamlKind::boolean) return fallback;
  return value->boolean;
}

std::string FieldReader::text(std::string_view key, std::string fallback) const {
  return optional_text(key).value_or(std::move(fallback));
}

std::optional<std::string> FieldReader::optional_text(std::string_view key) const {
  const YamlNode* value = find(key);
  if (value == nullptr || value->kind != YamlKind::string) return std::nullopt;
  return value->text;
}

std::vector<std::string> FieldReader::texts(std::string_view key) const {
  std::vector<std::string> out;
  for (const FieldReader& item : items(key))
    if (item.node().kind == YamlKind::string) out.push_back(item.node().text);
  return out;
}

}  // namespace tenthpoint::io
