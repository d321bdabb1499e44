// Shard: one of N deterministic parts of an inventory, so that a cluster
// scheduler can spread a large inventory over many nodes (a Slurm job array
// gives task K of N; see tools/slurm/).
//
// A bridge file belongs to shard stable_hash(key) mod N, where the key is the
// file's path relative to the inventory root (the directory given on the
// command line, or the directory of the list or bridge file given). The hash
// is FNV-1a, 64-bit, over the key's bytes with '/' separators: the same on
// every machine and in every release, and independent of the file's position
// in the listing, so adding a bridge never moves another between shards.
#pragma once

#include <cstdint>
#include <filesystem>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace tenthpoint::batch {

struct Shard {
  int index = 0;  // K, 0-based (as SLURM_ARRAY_TASK_ID with --array=0-(N-1))
  int count = 1;  // N >= 1

  // "K/N", as given on the command line.
  [[nodiscard]] std::string to_string() const;
  // "shard-K-of-N", for file names of a shard's ledger and summary.
  [[nodiscard]] std::string file_suffix() const;
};

// Parses "K/N". On failure returns nullopt with a short reason in `why`
// (e.g. "shard index 3 is not below the shard count 2").
[[nodiscard]] std::optional<Shard> parse_shard(std::string_view text, std::string& why);

// FNV-1a 64-bit (Fowler, Noll, Vo; offset basis 14695981039346656037,
// prime 1099511628211).
[[nodiscard]] std::uint64_t stable_hash(std::string_view bytes);

// The key of `file` under `root`: the lexically normal path of the one
// relative to the other (both made absolute first), with '/' separators.
[[nodiscard]] std::string shard_key(const std::filesystem::path& file, const std::filesystem::path& root);

// The shard index of a key among `count` shards.
[[nodiscard]] int shard_of(std::string_view key, int count);

// The files of `files` in `shard`, in their listed order.
[[nodiscard]] std::vector<std::string> select_shard(const std::vector<std::string>& files,
                                                    const std::filesystem::path& root, const Shard& shard);

}  // namespace tenthpoint::batch
