#include "engine/io/inventory_check.h"

#include <algorithm>
#include <array>
#include <map>

#include <fmt/format.h>

#include "engine/io/data_reference.h"
#include "engine/io/inventory_listing.h"
#include "engine/io/name_suggestion.h"
#include "engine/io/policy_reader.h"

namespace tenthpoint::io {
namespace {

constexpr std::array<std::pair<FileStatus, std::string_view>, 3> kFileStatus{
    {{FileStatus::valid, "valid"}, {FileStatus::warnings, "warnings"}, {FileStatus::errors, "errors"}}};

// Where a field of a bridge file is, found again by re-reading the file: only
// needed on the rare path that reports an inventory-level problem.
SourceLocation locate_field(const std::string& path, const YamlPath& field, const YamlLimits& limits) {
  YamlParseResult parsed = parse_yaml_file(path, limits);
  if (!parsed.root) return SourceLocation{path, 0, 0};
  return locate(*parsed.root, field);
}

YamlPath field_path(std::initializer_list<const char*> keys) {
  YamlPath path;
  for (const char* key : keys) path.push_back(YamlPathStep{key, std::nullopt});
  return path;
}

class PolicyCache {
 public:
  // The policy `bridge` uses, read once per file; nullptr when it has errors
  // (reported once, into `inventory`).
  const model::Policy* get(const model::Bridge& bridge, Diagnostics& inventory, std::string& label) {
    label = "default";
    if (!bridge.rating.policy.empty()) {
      std::string why;
      auto reference = resolve_policy_reference(bridge.rating.policy, bridge.source_file, why);
      label = reference ? reference->label : bridge.rating.policy;
    }
    auto it = cache_.find(label);
    if (it == cache_.end()) {
      PolicyReadResult read = read_policy_for_bridge(bridge);
      // A policy that cannot be found is the bridge's problem (reported in its
      // file by failure()); one with errors of its own is the inventory's,
      // reported once however many bridges use it.
      const bool about_the_reference =
          std::all_of(read.diagnostics.begin(), read.diagnostics.end(),
                      [&](const Diagnostic& d) { return d.where.file == bridge.source_file; });
      if (!about_the_reference) inventory.insert(inventory.end(), read.diagnostics.begin(), read.diagnostics.end());
      it = cache_.emplace(label, std::move(read)).first;
    }
    return it->second.policy ? &*it->second.policy : nullptr;
  }

  // The problem to report in the bridge's own file when its policy failed.
  std::string failure(const std::string& label) const {
    auto it = cache_.find(label);
    if (it != cache_.end() && it->second.diagnostics.size() == 1) return it->second.diagnostics.front().message;
    return fmt::format("policy {} has errors (listed with the inventory)", label);
  }

 private:
  std::map<std::string, PolicyReadResult> cache_;
};

void check_against_policy(const model::Bridge& bridge, FileCheck& check, PolicyCache& policies, Diagnostics& inventory,
                          const YamlLimits& limits) {
  std::string label;
  const model::Policy* policy = policies.get(bridge, inventory, label);
  const model::RatingRequest& rating = bridge.rating;
  const auto report = [&](std::initializer_list<const char*> keys, std::string message) {
    const YamlPath path = field_path(keys);
    check.diagnostics.push_back(
        Diagnostic{Severity::error, locate_field(check.path, path, limits), to_string(path), std::move(message)});
  };
  if (policy == nullptr) return report({"rating", "policy"}, policies.failure(label));
  if (policy->find_set(rating.method, rating.vehicle_set) == nullptr) {
    std::vector<std::string> names;
    for (const model::VehicleSet& set : policy->vehicle_sets)
      if (set.method == rating.method) names.push_back(set.id);
    const std::string wanted = rating.vehicle_set.empty() ? "(the default)" : "'" + rating.vehicle_set + "'";
    std::string message =
        fmt::format("policy {} has no {} vehicle set {}", policy->id, model::to_string(rating.method), wanted);
    if (auto suggestion = nearest_name(rating.vehicle_set, names))
      message += fmt::format(" (did you mean '{}'?)", *suggestion);
    report({"rating", "vehicle_set"}, message + (names.empty() ? "" : "; expected one of: " + join_names(names)));
  }
  if (!policy->dynamic_allowance.for_surface(rating.riding_surface)) {
    std::vector<std::string> names;
    for (const auto& [name, value] : policy->dynamic_allowance.riding_surfaces) names.push_back(name);
    std::string message = fmt::format("policy {} has no riding surface '{}'", policy->id, rating.riding_surface);
    if (auto suggestion = nearest_name(rating.riding_surface, names))
      message += fmt::format(" (did you mean '{}'?)", *suggestion);
    report({"rating", "riding_surface"}, message + (names.empty() ? "" : "; expected one of: " + join_names(names)));
  }
}

void finish_file(FileCheck& check) {
  std::stable_sort(check.diagnostics.begin(), check.diagnostics.end(), [](const Diagnostic& a, const Diagnostic& b) {
    return std::tie(a.where.line, a.where.column) < std::tie(b.where.line, b.where.column);
  });
  check.errors = count(check.diagnostics, Severity::error);
  check.warnings = count(check.diagnostics, Severity::warning);
  check.status = check.errors > 0 ? FileStatus::errors : check.warnings > 0 ? FileStatus::warnings : FileStatus::valid;
}

}  // namespace

std::string_view to_string(FileStatus status) {
  for (const auto& [value, name] : kFileStatus)
    if (value == status) return name;
  return "errors";
}

std::optional<FileStatus> parse_file_status(std::string_view text) {
  for (const auto& [value, name] : kFileStatus)
    if (name == text) return value;
  return std::nullopt;
}

bool InventoryCheck::ok() const {
  return !has_errors(inventory_diagnostics) &&
         std::none_of(files.begin(), files.end(), [](const FileCheck& f) { return f.status == FileStatus::errors; });
}

InventoryCheck check_inventory(const std::vector<std::string>& paths, const InventoryCheckOptions& options) {
  InventoryCheck result;
  InventoryListing listing = list_inventory(paths);
  result.inventory_diagnostics = std::move(listing.diagnostics);
  std::map<std::string, std::string> structure_ids;  // id -> first file
  PolicyCache policies;
  for (const std::string& path : listing.files) {
    FileCheck check;
    check.path = path;
    BridgeReadResult read = read_bridge_file(path, options.read);
    check.diagnostics = std::move(read.diagnostics);
    if (read.bridge) {
      const model::Bridge& bridge = *read.bridge;
      check.structure_id = bridge.identity.structure_id;
      const auto [first, inserted] = structure_ids.emplace(bridge.identity.structure_id, path);
      if (!inserted) {
        const YamlPath id_path = field_path({"identity", "structure_id"});
        check.diagnostics.push_back(
            Diagnostic{Severity::error, locate_field(path, id_path, options.read.limits), to_string(id_path),
                       fmt::format("structure id '{}' is already used by {}; ids must be unique in an inventory",
                                   bridge.identity.structure_id, first->second)});
      }
      if (options.check_policies)
        check_against_policy(bridge, check, policies, result.inventory_diagnostics, options.read.limits);
    }
    finish_file(check);
    if (check.status != FileStatus::errors) check.bridge = std::move(read.bridge);
    result.files.push_back(std::move(check));
  }
  CheckTotals& t = result.totals;
  t.files = result.files.size();
  for (const FileCheck& f : result.files) {
    t.valid += f.status == FileStatus::valid;
    t.with_warnings += f.status == FileStatus::warnings;
    t.with_errors += f.status == FileStatus::errors;
    t.errors += f.errors;
    t.warnings += f.warnings;
  }
  t.errors += count(result.inventory_diagnostics, Severity::error);
  t.warnings += count(result.inventory_diagnostics, Severity::warning);
  return result;
}

}  // namespace tenthpoint::io
