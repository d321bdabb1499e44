#include "engine/batch/shard.h"

#include <map>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <catch2/catch.hpp>

namespace batch = tenthpoint::batch;

TEST_CASE("FNV-1a 64 reproduces the reference test vectors", "[batch][shard]") {
  // FNV reference test suite (Fowler/Noll/Vo, isthe.com/chongo/tech/comp/fnv),
  // values from memory: the offset basis for "", and "a", "foobar".
  CHECK(batch::stable_hash("") == 0xcbf29ce484222325ull);
  CHECK(batch::stable_hash("a") == 0xaf63dc4c8601ec8cull);
  CHECK(batch::stable_hash("foobar") == 0x85944171f73967e8ull);
}

TEST_CASE("--shard K/N is parsed, and bad values are refused with a reason", "[batch][shard]") {
  std::string why;
  const auto ok = batch::parse_shard("3/16", why);
  REQUIRE(ok);
  CHECK(ok->index == 3);
  CHECK(ok->count == 16);
  CHECK(ok->to_string() == "3/16");
  CHECK(ok->file_suffix() == "shard-3-of-16");
  CHECK(batch::parse_shard("0/1", why));

  // Slurm's SLURM_ARRAY_TASK_ID runs 0..N-1 for --array=0-(N-1): common practice.
  CHECK_FALSE(batch::parse_shard("3/2", why));
  CHECK_THAT(why, Catch::Contains("from 0 to 1"));
  CHECK_FALSE(batch::parse_shard("2/2", why));
  CHECK_FALSE(batch::parse_shard("a/b", why));
  CHECK_THAT(why, Catch::Contains("'a/b' is not K/N"));
  CHECK_FALSE(batch::parse_shard("0/0", why));
  CHECK_THAT(why, Catch::Contains("at least 1"));
  CHECK_FALSE(batch::parse_shard("-1/4", why));
  CHECK_FALSE(batch::parse_shard("1", why));
  CHECK_FALSE(batch::parse_shard("1/4x", why));
  CHECK_FALSE(batch::parse_shard("", why));
}

TEST_CASE("shards cover the inventory exactly once and a new bridge moves no other", "[batch][shard]") {
  // Deterministic sharding by a hash of the relative path: common practice
  // (the shard of a file must not depend on its position in the listing).
  std::vector<std::string> files;
  for (int i = 0; i < 400; ++i) files.push_back(fmt::format("inv/SYN-{:06}.yaml", i));
  constexpr int kShards = 4;
  std::map<std::string, int> shard_of_file;
  for (int k = 0; k < kShards; ++k) {
    const std::vector<std::string> part = batch::select_shard(files, "inv", batch::Shard{k, kShards});
    // A fair hash puts 100 +- a few sigma (sqrt(400 * 1/4 * 3/4) ~ 8.7) in each.
    CHECK(part.size() > 60);
    CHECK(part.size() < 140);
    for (const std::string& f : part) CHECK(shard_of_file.emplace(f, k).second);
  }
  CHECK(shard_of_file.size() == files.size());

  files.insert(files.begin(), "inv/AAA-new.yaml");
  for (int k = 0; k < kShards; ++k)
    for (const std::string& f : batch::select_shard(files, "inv", batch::Shard{k, kShards}))
      if (f != "inv/AAA-new.yaml") CHECK(shard_of_file.at(f) == k);
}

TEST_CASE("the shard key is the path relative to the inventory root, however the root is spelled", "[batch][shard]") {
  CHECK(batch::shard_key("inventory/ev-0019.yaml", "inventory") == "ev-0019.yaml");
  CHECK(batch::shard_key("inventory/./sub/../ev-0019.yaml", "inventory/") == "ev-0019.yaml");
  CHECK(batch::shard_key("/data/inv/x.yaml", "/data/inv") == "x.yaml");
}
