// An agency's inventory as a list of bridge files. Each path given is one of:
//  - a directory: its *.yaml and *.yml files, not recursive, sorted by name
//    (subdirectories such as inventory/policies hold no bridges; hidden
//    files are skipped);
//  - a bridge file: a path ending in .yaml or .yml;
//  - a list file: any other file, one bridge file or directory per line,
//    relative to the list file; '#' starts a comment, blank lines are
//    ignored, list files do not nest.
// Missing paths and unreadable lists are diagnostics; a file reached twice
// is checked once (with a warning).
#pragma once

#include <string>
#include <vector>

#include "engine/core/diagnostic.h"

namespace tenthpoint::io {

struct InventoryListing {
  std::vector<std::string> files;  // bridge files in order, each once
  Diagnostics diagnostics;
};

[[nodiscard]] InventoryListing list_inventory(const std::vector<std::string>& paths);

// True for a path ending in .yaml or .yml (a bridge file, not a list file).
[[nodiscard]] bool has_yaml_extension(const std::string& path);

}  // namespace tenthpoint::io
