#include "engine/batch/inputs_hash.h"

#include <filesystem>
#include <fstream>
#include <string>

#include <unistd.h>
#include <catch2/catch.hpp>

#include "engine/batch/sha256.h"
#include "engine/io/embedded_files.h"

namespace fs = std::filesystem;
using tenthpoint::batch::InputsHasher;

namespace {

void write(const fs::path& p, const std::string& text) {
  std::ofstream out(p, std::ios::binary);
  out << text;
}

}  // namespace

// What the inputs hash must tell apart is set by issue #6 (the bridge file,
// the policy and vehicle files it uses, the engine version); that equal
// inputs give equal hashes and any changed byte a different one is the
// SHA-256 property (FIPS 180-4): common practice for change detection.
TEST_CASE("the inputs hash changes with the bridge bytes, a dependency's bytes and the engine version",
          "[batch][inputs_hash]") {
  const fs::path dir = fs::temp_directory_path() / ("tp-hash-" + std::to_string(::getpid()));
  fs::create_directories(dir);
  const std::string policy = (dir / "policy.yaml").string();
  write(policy, "id: a\n");

  InputsHasher hasher("1.0");
  const std::string base = hasher.inputs_hash("bridge: 1\n", {policy, "<shipped>/policy/default.yaml"});
  CHECK(base.size() == 64);
  CHECK(hasher.inputs_hash("bridge: 1\n", {"<shipped>/policy/default.yaml", policy, policy}) == base);
  CHECK(hasher.inputs_hash("bridge: 2\n", {policy, "<shipped>/policy/default.yaml"}) != base);
  CHECK(hasher.inputs_hash("bridge: 1\n", {policy}) != base);
  CHECK(InputsHasher("1.1").inputs_hash("bridge: 1\n", {policy, "<shipped>/policy/default.yaml"}) != base);

  // A changed policy file is seen by a new run's hasher (one per run; a run
  // reads each dependency once).
  write(policy, "id: b\n");
  CHECK(InputsHasher("1.0").inputs_hash("bridge: 1\n", {policy, "<shipped>/policy/default.yaml"}) != base);
  CHECK(hasher.inputs_hash("bridge: 1\n", {policy, "<shipped>/policy/default.yaml"}) == base);
  fs::remove_all(dir);
}

TEST_CASE("shipped data is hashed by its embedded bytes and a missing file by a marker", "[batch][inputs_hash]") {
  InputsHasher hasher("1.0");
  const auto embedded = tenthpoint::io::embedded_file("engine/data/policy/default.yaml");
  REQUIRE(embedded);
  CHECK(hasher.dependency_hash("<shipped>/policy/default.yaml") == tenthpoint::batch::sha256_hex(*embedded));
  CHECK(hasher.dependency_hash("no/such/policy.yaml") == "unreadable");
}
