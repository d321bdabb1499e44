// `tenthpoint check`: validate every bridge file of an inventory without
// rating it. Each file is read as a rating would read it (bridge_reader.h);
// then the inventory-wide rules are applied: structure ids are unique, and
// each bridge's policy reads cleanly and has the vehicle set and riding
// surface the bridge names. The result is plain data for the command-line
// front end to print as text or JSON.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/core/diagnostic.h"
#include "engine/io/bridge_reader.h"

namespace tenthpoint::io {

enum class FileStatus { valid, warnings, errors };

// "valid", "warnings", "errors"; and back.
[[nodiscard]] std::string_view to_string(FileStatus status);
[[nodiscard]] std::optional<FileStatus> parse_file_status(std::string_view text);

struct FileCheck {
  std::string path;
  std::string structure_id;  // empty when the file could not be read far enough
  FileStatus status = FileStatus::valid;
  Diagnostics diagnostics;  // in file order
  std::size_t errors = 0;
  std::size_t warnings = 0;
  std::optional<model::Bridge> bridge;  // the record, when it read without errors (for summaries)
};

struct CheckTotals {
  std::size_t files = 0;
  std::size_t valid = 0;          // no diagnostics at all
  std::size_t with_warnings = 0;  // warnings but no errors
  std::size_t with_errors = 0;
  std::size_t errors = 0;  // diagnostics over all files and the listing
  std::size_t warnings = 0;
};

struct InventoryCheck {
  std::vector<FileCheck> files;       // in listing order
  Diagnostics inventory_diagnostics;  // about the listing and shared policies, not one bridge
  CheckTotals totals;

  // True when no file and no inventory diagnostic is an error.
  [[nodiscard]] bool ok() const;
};

struct InventoryCheckOptions {
  BridgeReadOptions read;
  // Also read each bridge's policy and check the names the bridge takes from it.
  bool check_policies = true;
};

// `paths` as for list_inventory (directories, bridge files, list files).
[[nodiscard]] InventoryCheck check_inventory(const std::vector<std::string>& paths,
                                             const InventoryCheckOptions& options = {});

}  // namespace tenthpoint::io
