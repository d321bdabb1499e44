#include "engine/batch/shard.h"

#include <charconv>

#include <fmt/format.h>

namespace tenthpoint::batch {
namespace {

std::optional<int> parse_count(std::string_view text) {
  int value = 0;
  const char* end = text.data() + text.size();
  const auto [ptr, ec] = std::from_chars(text.data(), end, value);
  if (text.empty() || ec != std::errc() || ptr != end) return std::nullopt;
  return value;
}

}  // namespace

std::string Shard::to_string() const { return fmt::format("{}/{}", index, count); }

std::string Shard::file_suffix() const { return fmt::format("shard-{}-of-{}", index, count); }

std::optional<Shard> parse_shard(std::string_view text, std::string& why) {
  const std::size_t slash = text.find('/');
  if (slash == std::string_view::npos) {
    why = fmt::format("'{}' is not K/N (shard K of N, K from 0 to N-1)", text);
    return std::nullopt;
  }
  const std::optional<int> index = parse_count(text.substr(0, slash));
  const std::optional<int> count = parse_count(text.substr(slash + 1));
  if (!index || !count) {
    why = fmt::format("'{}' is not K/N with whole numbers K and N (shard K of N, K from 0 to N-1)", text);
    return std::nullopt;
  }
  if (*count < 1) {
    why = fmt::format("'{}': the shard count must be at least 1", text);
    return std::nullopt;
  }
  if (*index < 0 || *index >= *count) {
    why = fmt::format("'{}': the shard index must be from 0 to {} (0-based, as SLURM_ARRAY_TASK_ID)", text, *count - 1);
    return std::nullopt;
  }
  return Shard{*index, *count};
}

std::uint64_t stable_hash(std::string_view bytes) {
  std::uint64_t hash = 14695981039346656037ull;
  for (const char c : bytes) {
    hash ^= static_cast<unsigned char>(c);
    hash *= 1099511628211ull;
  }
  return hash;
}

std::string shard_key(const std::filesystem::path& file, const std::filesystem::path& root) {
  namespace fs = std::filesystem;
  const fs::path absolute_file = fs::absolute(file).lexically_normal();
  const fs::path absolute_root = fs::absolute(root).lexically_normal();
  fs::path relative = absolute_file.lexically_relative(absolute_root);
  if (relative.empty()) relative = absolute_file;
  return relative.generic_string();
}

int shard_of(std::string_view key, int count) {
  return static_cast<int>(stable_hash(key) % static_cast<std::uint64_t>(count));
}

std::vector<std::string> select_shard(const std::vector<std::string>& files, const std::filesystem::path& root,
                                      const Shard& shard) {
  std::vector<std::string> out;
  for (const std::string& file : files)
    if (shard_of(shard_key(file, root), shard.count) == shard.index) out.push_back(file);
  return out;
}

}  // namespace tenthpoint::batch
