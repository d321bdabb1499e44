#include "engine/io/yaml_merge.h"

#include <algorithm>

namespace tenthpoint::io {

YamlNode merge_yaml(const YamlNode& base, const YamlNode& overlay) {
  if (base.kind != YamlKind::mapping || overlay.kind != YamlKind::mapping) return overlay;
  YamlNode merged = base;
  // The merged mapping is located where the overlay wrote it: the extending
  // file is where a person looks first.
  merged.where = overlay.where;
  for (const YamlMember& member : overlay.members) {
    auto existing = std::find_if(merged.members.begin(), merged.members.end(),
                                 [&](const YamlMember& m) { return m.key == member.key; });
    if (member.value.kind == YamlKind::null) {
      if (existing != merged.members.end()) merged.members.erase(existing);
      continue;
    }
    if (existing == merged.members.end()) {
      merged.members.push_back(member);
      continue;
    }
    existing->value = merge_yaml(existing->value, member.value);
    existing->key_where = member.key_where;
  }
  return merged;
}

}  // namespace tenthpoint::io
