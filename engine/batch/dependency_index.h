// DependencyIndex: which policy and vehicle files each bridge file used at
// its last rating, so that the nightly run can recompute a bridge's inputs
// hash (inputs_hash.h) from the bytes of its file and of those dependencies
// without parsing any YAML.
//
// It is a hint, never the authority: the ledger's stored inputs hash is.
// A stale or missing entry can only make the run rate a bridge it could have
// carried forward (the recomputed hash differs), never carry forward one
// that changed, because equal hashes imply equal bridge bytes and equal
// dependency contents whatever list produced them. So a lost or corrupt
// index costs one slower night (every bridge parsed once), not a wrong
// result.
//
// Kept as JSON next to the ledger (<ledger>.dependencies.json), written
// atomically at the end of a run. The distinct dependency lists are few (one
// per agency policy), so they are stored once and files refer to them.
#pragma once

#include <filesystem>
#include <map>
#include <string>
#include <vector>

namespace tenthpoint::batch {

class DependencyIndex {
 public:
  // Reads the index at `path`; an absent, unreadable or malformed file gives
  // an empty index (logged as a warning when it exists).
  [[nodiscard]] static DependencyIndex load(const std::filesystem::path& path);
  // The index file that goes with a ledger file.
  [[nodiscard]] static std::filesystem::path path_for_ledger(const std::filesystem::path& ledger);

  // The dependencies of `file` at its last rating, or nullptr when unknown.
  [[nodiscard]] const std::vector<std::string>* find(const std::string& file) const;
  void set(const std::string& file, std::vector<std::string> dependencies);
  [[nodiscard]] std::size_t size() const { return files_.size(); }

  // Writes the index atomically (engine/core/atomic_file.h); throws
  // std::runtime_error naming the path when it cannot.
  void save(const std::filesystem::path& path) const;

 private:
  std::map<std::string, std::vector<std::string>> files_;
};

}  // namespace tenthpoint::batch
