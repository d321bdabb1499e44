#include "engine/batch/dependency_index.h"

#include <filesystem>
#include <fstream>
#include <string>

#include <unistd.h>
#include <catch2/catch.hpp>

namespace fs = std::filesystem;
using tenthpoint::batch::DependencyIndex;

// The index is a cache of what the last run learned: a round trip must be
// exact and a damaged file must read as empty, never as wrong (common
// practice for caches; see dependency_index.h).
TEST_CASE("the dependency index round-trips and shares identical lists", "[batch][dependency_index]") {
  const fs::path dir = fs::temp_directory_path() / ("tp-deps-" + std::to_string(::getpid()));
  fs::create_directories(dir);
  const fs::path path = DependencyIndex::path_for_ledger(dir / "ledger.sqlite");
  CHECK(path.filename() == "ledger.sqlite.dependencies.json");

  DependencyIndex index;
  index.set("inv/a.yaml", {"<shipped>/policy/default.yaml", "inv/policies/eastvale.yaml"});
  index.set("inv/b.yaml", {"<shipped>/policy/default.yaml", "inv/policies/eastvale.yaml"});
  index.set("inv/c.yaml", {"<shipped>/policy/default.yaml", "<shipped>/vehicles/aashto.yaml"});
  index.save(path);

  const DependencyIndex read = DependencyIndex::load(path);
  CHECK(read.size() == 3);
  REQUIRE(read.find("inv/b.yaml") != nullptr);
  CHECK(*read.find("inv/b.yaml") ==
        std::vector<std::string>{"<shipped>/policy/default.yaml", "inv/policies/eastvale.yaml"});
  CHECK(read.find("inv/c.yaml")->at(1) == "<shipped>/vehicles/aashto.yaml");
  CHECK(read.find("inv/d.yaml") == nullptr);

  std::ofstream(path) << "{\"format\": \"tenthpoint dependency index\", \"version\": 1, \"files\": {\"x\": 7}, "
                         "\"dependency_sets\": []}";
  CHECK(DependencyIndex::load(path).size() == 0);
  std::ofstream(path) << "not json";
  CHECK(DependencyIndex::load(path).size() == 0);
  CHECK(DependencyIndex::load(dir / "absent.json").size() == 0);
  fs::remove_all(dir);
}
