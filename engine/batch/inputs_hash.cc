#include "engine/batch/inputs_hash.h"

#include <algorithm>
#include <fstream>
#include <iterator>
#include <optional>
#include <string>

#include "engine/batch/sha256.h"
#include "engine/io/embedded_files.h"

namespace tenthpoint::batch {
namespace {

// engine/io/data_reference.cc labels shipped data "<shipped>/<folder>/<name>"
// for the embedded file "engine/data/<folder>/<name>".
constexpr std::string_view kShippedPrefix = "<shipped>/";

std::optional<std::string> dependency_bytes(const std::string& name) {
  if (name.rfind(kShippedPrefix, 0) == 0) {
    const std::string embedded = "engine/data/" + name.substr(kShippedPrefix.size());
    if (auto contents = io::embedded_file(embedded)) return std::string(*contents);
    return std::nullopt;
  }
  std::ifstream in(name, std::ios::binary);
  if (!in) return std::nullopt;
  std::string bytes((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
  if (in.bad()) return std::nullopt;
  return bytes;
}

}  // namespace

InputsHasher::InputsHasher(std::string engine_version) : engine_version_(std::move(engine_version)) {}

std::string InputsHasher::dependency_hash(const std::string& name) {
  // Held while reading: a dependency is read once per run, and the few
  // distinct policy files make contention negligible.
  const std::lock_guard lock(mutex_);
  if (auto it = dependency_hashes_.find(name); it != dependency_hashes_.end()) return it->second;
  const std::optional<std::string> bytes = dependency_bytes(name);
  std::string hash = bytes ? sha256_hex(*bytes) : std::string("unreadable");
  dependency_hashes_.emplace(name, hash);
  return hash;
}

std::string InputsHasher::inputs_hash(std::string_view bridge_bytes, std::vector<std::string> dependencies) {
  std::sort(dependencies.begin(), dependencies.end());
  dependencies.erase(std::unique(dependencies.begin(), dependencies.end()), dependencies.end());
  // Names are length-prefixed (a path may hold any byte but NUL) and hashes
  // have a fixed length, so no two different inputs serialise to the same
  // stream.
  Sha256 hash;
  hash.update("tenthpoint inputs 1\nengine ").update(engine_version_).update("\n");
  hash.update("bridge ").update(sha256_hex(bridge_bytes)).update("\n");
  for (const std::string& name : dependencies)
    hash.update("uses ")
        .update(std::to_string(name.size()))
        .update(" ")
        .update(name)
        .update(" ")
        .update(dependency_hash(name))
        .update("\n");
  return hash.hex();
}

}  // namespace tenthpoint::batch
