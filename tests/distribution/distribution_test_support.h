// Shared by the distribution tests: the demo inventory and the options its
// policy implies.
#pragma once

#include <string>

#include <catch2/catch.hpp>

#include "engine/distribution/distribution_options.h"
#include "engine/io/bridge_reader.h"
#include "engine/io/policy_reader.h"
#include "engine/model/bridge.h"

namespace tenthpoint::distribution::test {

inline std::string inventory(const std::string& file) {
  return std::string(TENTHPOINT_SOURCE_DIR) + "/inventory/" + file;
}

inline model::Bridge load(const std::string& file) { return io::load_bridge(inventory(file)); }

inline DistributionOptions options_for(const model::Bridge& bridge) {
  const auto policy = io::read_policy_for_bridge(bridge);
  REQUIRE(policy.ok());
  return DistributionOptions::from_policy(*policy.policy);
}

}  // namespace tenthpoint::distribution::test
