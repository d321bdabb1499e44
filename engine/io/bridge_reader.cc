#include "engine/io/bridge_reader.h"

#include <algorithm>

#include "engine/core/errors.h"
#include "engine/io/bridge_builder.h"
#include "engine/io/bridge_checks.h"
#include "engine/io/plausibility_bounds.h"

namespace tenthpoint::io {
namespace {

void sort_by_location(Diagnostics& diagnostics) {
  std::stable_sort(diagnostics.begin(), diagnostics.end(), [](const Diagnostic& a, const Diagnostic& b) {
    return std::tie(a.where.line, a.where.column) < std::tie(b.where.line, b.where.column);
  });
}

BridgeReadResult read_parsed(YamlParseResult parsed, const BridgeReadOptions& options) {
  BridgeReadResult result;
  result.diagnostics = std::move(parsed.diagnostics);
  if (!parsed.root) return result;
  const YamlNode& root = *parsed.root;

  Diagnostics schema = SchemaValidator::embedded("bridge.schema.json").validate(root, options.validation);
  if (has_errors(schema)) {
    result.diagnostics.insert(result.diagnostics.end(), schema.begin(), schema.end());
    return result;
  }

  Diagnostics found;
  model::Bridge bridge = detail::build_bridge(root, found);
  detail::check_bridge(bridge, root, found);
  if (options.plausibility_warnings) check_plausibility(root, bridge.units, found);
  sort_by_location(found);
  result.diagnostics.insert(result.diagnostics.end(), found.begin(), found.end());
  if (!has_errors(result.diagnostics)) result.bridge = std::move(bridge);
  return result;
}

}  // namespace

BridgeReadResult read_bridge_file(const std::string& path, const BridgeReadOptions& options) {
  return read_parsed(parse_yaml_file(path, options.limits), options);
}

BridgeReadResult read_bridge_text(std::string_view text, const std::string& file, const BridgeReadOptions& options) {
  return read_parsed(parse_yaml(text, file, options.limits), options);
}

model::Bridge load_bridge(const std::string& path, Diagnostics* warnings, const BridgeReadOptions& options) {
  BridgeReadResult result = read_bridge_file(path, options);
  if (!result.ok()) throw InputError(std::move(result.diagnostics));
  if (warnings != nullptr) warnings->insert(warnings->end(), result.diagnostics.begin(), result.diagnostics.end());
  return std::move(*result.bridge);
}

}  // namespace tenthpoint::io
