// InputsHasher: the fingerprint of everything a bridge's rating depends on,
// so that the nightly run can tell an unchanged bridge without rating it.
//
// A bridge's inputs hash is the hex SHA-256 (sha256.h) over, in order: a
// format tag, the engine version, the SHA-256 of the bridge file's bytes,
// and for each dependency (policy files of the `extends` chain and vehicle
// libraries, named as in model::Policy::source_files and the vehicles'
// locations), sorted by name, its name and the SHA-256 of its bytes. Shipped
// data ("<shipped>/policy/default.yaml") is hashed by its embedded bytes, so
// a new engine with a changed default policy reruns its bridges even with
// the version unchanged.
//
// Equal hashes mean equal bridge bytes, equal dependency contents and the
// same engine, hence the same rating: a run may carry an old result forward
// on equality alone, whatever the source of the dependency list it used.
//
// Thread-safe: workers hash concurrently; each dependency file is read and
// hashed once per InputsHasher (one per run), so a 10,000-bridge run reads
// the agency policy once.
#pragma once

#include <map>
#include <mutex>
#include <string>
#include <string_view>
#include <vector>

namespace tenthpoint::batch {

class InputsHasher {
 public:
  explicit InputsHasher(std::string engine_version);

  // SHA-256 of one dependency's bytes (a file path, or a "<shipped>/..."
  // label of data compiled into the engine). A file that cannot be read
  // hashes to "unreadable", so the bridge is rated and fails with the
  // reader's own message rather than being carried forward.
  [[nodiscard]] std::string dependency_hash(const std::string& name);

  // The inputs hash of a bridge file's bytes with its dependencies (any
  // order; duplicates count once).
  [[nodiscard]] std::string inputs_hash(std::string_view bridge_bytes, std::vector<std::string> dependencies);

  [[nodiscard]] const std::string& engine_version() const { return engine_version_; }

 private:
  std::string engine_version_;
  std::mutex mutex_;
  std::map<std::string, std::string, std::less<>> dependency_hashes_;
};

}  // namespace tenthpoint::batch
