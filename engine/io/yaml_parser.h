// YAML text to a YamlNode tree, refusing hostile input early with a clear
// diagnostic instead of a crash or a memory blow-up: oversized files, deep
// nesting, alias bombs, giant scalars, several documents in one file,
// duplicate keys, non-finite numbers and unknown tags. Syntax errors are
// reported as "file:line:col: error: yaml syntax: ...".
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>

#include "engine/core/diagnostic.h"
#include "engine/io/text_file.h"
#include "engine/io/yaml_node.h"

namespace tenthpoint::io {

struct YamlLimits {
  std::size_t max_file_bytes = kDefaultMaxFileBytes;
  // Collections nested deeper than this are refused; the bridge format needs
  // about 8 levels.
  int max_depth = 64;
  // Nodes in the document after aliases are expanded: what bounds an alias
  // ("billion laughs") bomb. A large bridge record has a few thousand nodes.
  std::size_t max_nodes = 200'000;
  // Aliases allowed in one file. A few are handy (a deck shared by sections);
  // more than this is not a hand-written record.
  std::size_t max_aliases = 64;
  // Longest scalar accepted before the schema's own per-field limits apply.
  std::size_t max_scalar_length = 65'536;
};

struct YamlParseResult {
  std::optional<YamlNode> root;  // set exactly when diagnostics hold no error
  Diagnostics diagnostics;
};

// Parses `text`, labelling locations with `file`. An empty document (no
// content besides comments and blank lines) is an error.
[[nodiscard]] YamlParseResult parse_yaml(std::string_view text, const std::string& file, const YamlLimits& limits = {});

// Reads `path` (see read_text_file for the refusals) and parses it.
[[nodiscard]] YamlParseResult parse_yaml_file(const std::string& path, const YamlLimits& limits = {});

}  // namespace tenthpoint::io
