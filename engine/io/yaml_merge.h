// Override semantics for documents that extend one another (policies):
//  - a mapping in the overlay merges into the base's mapping key by key,
//    recursively; keys only in the base are kept, keys only in the overlay
//    are added after them;
//  - an overlay key whose value is null removes the key from the result;
//  - any other overlay value (a scalar or a list) replaces the base's value
//    whole: lists are never concatenated or merged item by item.
// Every node keeps the location it was written at, so a merged document
// still reports problems in the file and line that caused them.
#pragma once

#include "engine/io/yaml_node.h"

namespace tenthpoint::io {

[[nodiscard]] YamlNode merge_yaml(const YamlNode& base, const YamlNode& overlay);

}  // namespace tenthpoint::io
