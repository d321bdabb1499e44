#include "engine/batch/policy_cache.h"

#include <algorithm>
#include <memory>
#include <thread>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/io/bridge_reader.h"

namespace batch = tenthpoint::batch;

// Reading a policy once per run instead of once per bridge is the point of
// the cache (issue #6 performance); that bridges naming the same file get
// the same policy is its contract (common practice for memoisation).
TEST_CASE("bridges that name the same policy share one read of it, across threads", "[batch][policy_cache]") {
  const auto a = tenthpoint::io::load_bridge("inventory/ev-0031-pasture-lane.yaml");
  const auto b = tenthpoint::io::load_bridge("inventory/ev-0019-tanners-ford.yaml");
  REQUIRE(a.rating.policy == b.rating.policy);
  batch::PolicyCache cache;
  std::vector<std::shared_ptr<const batch::CachedPolicy>> seen(8);
  std::vector<std::thread> threads;
  for (std::size_t i = 0; i < seen.size(); ++i)
    threads.emplace_back([&, i] { seen[i] = cache.policy_for(i % 2 == 0 ? a : b); });
  for (std::thread& t : threads) t.join();
  REQUIRE(seen[0]->read.ok());
  for (const auto& p : seen) CHECK(p == seen[0]);

  // The agency policy extends the shipped default and adds inline vehicles;
  // the default loads the shipped AASHTO library: all three are inputs.
  const std::vector<std::string>& deps = seen[0]->dependencies;
  CHECK(std::find(deps.begin(), deps.end(), "inventory/policies/eastvale.yaml") != deps.end());
  CHECK(std::find(deps.begin(), deps.end(), "<shipped>/policy/default.yaml") != deps.end());
  CHECK(std::find(deps.begin(), deps.end(), "<shipped>/vehicles/aashto.yaml") != deps.end());
}

TEST_CASE("a missing policy file is reported at each bridge that names it", "[batch][policy_cache]") {
  auto bridge = tenthpoint::io::load_bridge("inventory/ev-0112-willow-run.yaml");
  bridge.rating.policy = "policies/no-such-policy.yaml";
  batch::PolicyCache cache;
  const auto first = cache.policy_for(bridge);
  CHECK_FALSE(first->read.ok());
  REQUIRE_FALSE(first->read.diagnostics.empty());
  CHECK(first->read.diagnostics.front().where.file == "inventory/ev-0112-willow-run.yaml");
  CHECK_THAT(first->read.diagnostics.front().message, Catch::Contains("policy file not found"));
}
