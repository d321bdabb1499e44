// Shared by the report tests: rating a demo bridge, and validating a JSON
// document against one of the project's schemas with the engine's own
// SchemaValidator (engine/io/schema_validator.h), which reads a YamlNode
// tree, so the document is converted to one first.
#pragma once

#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include "engine/io/bridge_reader.h"
#include "engine/io/policy_reader.h"
#include "engine/io/schema_validator.h"
#include "engine/pipeline/bridge_rating.h"

namespace tenthpoint::test {

inline io::YamlNode to_yaml_node(const nlohmann::json& j) {
  io::YamlNode n;
  if (j.is_null()) {
    n.kind = io::YamlKind::null;
  } else if (j.is_boolean()) {
    n.kind = io::YamlKind::boolean;
    n.boolean = j.get<bool>();
  } else if (j.is_number_integer()) {
    n.kind = io::YamlKind::integer;
    n.integer = j.get<std::int64_t>();
  } else if (j.is_number()) {
    n.kind = io::YamlKind::real;
    n.real = j.get<double>();
  } else if (j.is_string()) {
    n.kind = io::YamlKind::string;
    n.text = j.get<std::string>();
  } else if (j.is_array()) {
    n.kind = io::YamlKind::sequence;
    for (const nlohmann::json& item : j) n.items.push_back(to_yaml_node(item));
  } else {
    n.kind = io::YamlKind::mapping;
    for (auto it = j.begin(); it != j.end(); ++it) n.members.push_back({it.key(), {}, to_yaml_node(it.value())});
  }
  return n;
}

inline std::string read_text(const std::filesystem::path& path) {
  std::ifstream in(path, std::ios::binary);
  REQUIRE(in.good());
  std::ostringstream s;
  s << in.rdbuf();
  return s.str();
}

// Every violation of `document` against schemas/<schema>, one per line; empty when it conforms.
inline std::string schema_violations(const nlohmann::json& document, const std::string& schema) {
  const io::SchemaValidator validator(read_text(std::string(TENTHPOINT_SOURCE_DIR) + "/schemas/" + schema));
  std::string out;
  for (const Diagnostic& d : validator.validate(to_yaml_node(document))) out += d.field + ": " + d.message + "\n";
  return out;
}

inline std::string demo_file(const std::string& name) {
  return std::string(TENTHPOINT_SOURCE_DIR) + "/inventory/" + name;
}

struct RatedDemo {
  model::Bridge bridge;
  pipeline::BridgeRating rating;
};

// Rated on 2026-12-01 with the policy the bridge names (as tests/pipeline).
inline RatedDemo rate_demo(const std::string& name) {
  RatedDemo r{io::load_bridge(demo_file(name)), {}};
  const io::PolicyReadResult policy = io::read_policy_for_bridge(r.bridge);
  REQUIRE(policy.ok());
  r.rating = pipeline::rate_bridge(r.bridge, *policy.policy, CalendarDate{2026, 12, 1});
  return r;
}

}  // namespace tenthpoint::test
