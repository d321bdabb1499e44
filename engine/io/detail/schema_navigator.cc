#include "engine/io/detail/schema_navigator.h"

#include <algorithm>

namespace tenthpoint::io::detail {
namespace {

const nlohmann::ordered_json& empty_schema() {
  static const nlohmann::ordered_json kEmpty = nlohmann::ordered_json::object();
  return kEmpty;
}

// Schemas here are ours and shallow; the bound only stops a cyclic $ref.
constexpr int kMaxExpansionDepth = 32;

}  // namespace

const nlohmann::ordered_json& SchemaNavigator::resolve(const nlohmann::ordered_json& schema) const {
  const nlohmann::ordered_json* current = &schema;
  for (int hops = 0; hops < kMaxExpansionDepth; ++hops) {
    if (!current->is_object()) return *current;
    auto ref = current->find("$ref");
    if (ref == current->end() || !ref->is_string()) return *current;
    const std::string& target = ref->get_ref<const std::string&>();
    if (target.rfind("#/", 0) != 0) return empty_schema();
    const nlohmann::ordered_json::json_pointer pointer(target.substr(1));
    if (!root_.contains(pointer)) return empty_schema();
    current = &root_.at(pointer);
  }
  return empty_schema();
}

void SchemaNavigator::expand_into(const nlohmann::ordered_json& schema, std::vector<const nlohmann::ordered_json*>& out,
                                  int depth) const {
  if (depth > kMaxExpansionDepth) return;
  const nlohmann::ordered_json& resolved = resolve(schema);
  if (!resolved.is_object()) return;
  if (std::find(out.begin(), out.end(), &resolved) != out.end()) return;
  out.push_back(&resolved);
  for (const char* keyword : {"allOf", "anyOf", "oneOf"}) {
    auto it = resolved.find(keyword);
    if (it == resolved.end() || !it->is_array()) continue;
    for (const nlohmann::ordered_json& branch : *it) expand_into(branch, out, depth + 1);
  }
  for (const char* keyword : {"then", "else"}) {
    auto it = resolved.find(keyword);
    if (it != resolved.end()) expand_into(*it, out, depth + 1);
  }
}

std::vector<const nlohmann::ordered_json*> SchemaNavigator::expand(const nlohmann::ordered_json& schema) const {
  std::vector<const nlohmann::ordered_json*> out;
  expand_into(schema, out, 0);
  return out;
}

std::vector<const nlohmann::ordered_json*> SchemaNavigator::step(
    const std::vector<const nlohmann::ordered_json*>& parents, const YamlPathStep& step) const {
  std::vector<const nlohmann::ordered_json*> out;
  for (const nlohmann::ordered_json* parent : parents) {
    const nlohmann::ordered_json* child = nullptr;
    if (step.index) {
      auto items = parent->find("items");
      if (items != parent->end() && items->is_object()) child = &*items;
      if (items != parent->end() && items->is_array() && *step.index < items->size()) child = &(*items)[*step.index];
    } else {
      auto properties = parent->find("properties");
      if (properties != parent->end() && properties->is_object()) {
        auto it = properties->find(step.key);
        if (it != properties->end()) child = &*it;
      }
      if (child == nullptr) {
        auto additional = parent->find("additionalProperties");
        if (additional != parent->end() && additional->is_object()) child = &*additional;
      }
    }
    if (child == nullptr) continue;
    for (const nlohmann::ordered_json* s : expand(*child))
      if (std::find(out.begin(), out.end(), s) == out.end()) out.push_back(s);
  }
  return out;
}

std::vector<const nlohmann::ordered_json*> SchemaNavigator::at(const YamlPath& path) const {
  std::vector<const nlohmann::ordered_json*> current = expand(root_);
  for (const YamlPathStep& s : path) current = step(current, s);
  return current;
}

std::vector<std::string> SchemaNavigator::property_names(const std::vector<const nlohmann::ordered_json*>& schemas) {
  std::vector<std::string> names;
  for (const nlohmann::ordered_json* schema : schemas) {
    auto properties = schema->find("properties");
    if (properties == schema->end() || !properties->is_object()) continue;
    for (auto it = properties->begin(); it != properties->end(); ++it)
      if (std::find(names.begin(), names.end(), it.key()) == names.end()) names.push_back(it.key());
  }
  return names;
}

bool SchemaNavigator::allows_extra_properties(const std::vector<const nlohmann::ordered_json*>& schemas) {
  bool any_closed = false;
  for (const nlohmann::ordered_json* schema : schemas) {
    auto additional = schema->find("additionalProperties");
    if (additional != schema->end() && additional->is_boolean() && !additional->get<bool>()) any_closed = true;
  }
  return !any_closed;
}

}  // namespace tenthpoint::io::detail
