// Reads a rating policy (schemas/policy.schema.json) into model::Policy, or
// reports every problem in it.
//
// `extends` names the policy this one overrides: a shipped policy by bare
// name ("default") or a file path relative to the extending file. The chain
// is read from the root down and merged with the override semantics of
// yaml_merge.h (mappings merge key by key, a null removes a key, any other
// value replaces the inherited one whole), and the merged policy is checked
// against the schema; each problem is reported at the file and line that
// wrote it. Rules of a chain: every file uses the same units, an extending
// file gives its own id and version, no cycles, at most
// PolicyReadOptions::max_extends_depth files.
//
// Vehicle libraries (vehicles.libraries) resolve like `extends`, relative to
// the file that lists them; inline vehicles use the policy's units. Then the
// rules the schema cannot state are checked: vehicle sets name load models
// that exist and are rated with the set's method, condition-factor rows
// cover ratings 0 to 9 once each, ADTT rows increase, permit rows form a
// grid, screening names existing models.
#pragma once

#include <optional>
#include <string>
#include <string_view>

#include "engine/core/diagnostic.h"
#include "engine/io/yaml_parser.h"
#include "engine/model/bridge.h"
#include "engine/model/policy.h"

namespace tenthpoint::io {

struct PolicyReadOptions {
  YamlLimits limits;
  int max_extends_depth = 8;
};

struct PolicyReadResult {
  std::optional<model::Policy> policy;  // set exactly when diagnostics hold no error
  Diagnostics diagnostics;

  [[nodiscard]] bool ok() const { return policy.has_value(); }
};

[[nodiscard]] PolicyReadResult read_policy_file(const std::string& path, const PolicyReadOptions& options = {});
// Text in memory; `file` labels locations and anchors relative references.
[[nodiscard]] PolicyReadResult read_policy_text(std::string_view text, const std::string& file,
                                                const PolicyReadOptions& options = {});
// A policy compiled into the engine, by name ("default").
[[nodiscard]] PolicyReadResult read_shipped_policy(std::string_view name = "default",
                                                   const PolicyReadOptions& options = {});

// The policy a bridge asks for: rating.policy resolved against the bridge's
// file, or the shipped default when it names none.
[[nodiscard]] PolicyReadResult read_policy_for_bridge(const model::Bridge& bridge,
                                                      const PolicyReadOptions& options = {});

}  // namespace tenthpoint::io
