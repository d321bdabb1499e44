#include "engine/batch/dependency_index.h"

#include <fstream>
#include <iterator>

#include <spdlog/spdlog.h>
#include <nlohmann/json.hpp>

#include "engine/core/atomic_file.h"

namespace tenthpoint::batch {
namespace {

constexpr const char* kFormat = "tenthpoint dependency index";
constexpr int kVersion = 1;

}  // namespace

std::filesystem::path DependencyIndex::path_for_ledger(const std::filesystem::path& ledger) {
  std::filesystem::path path = ledger;
  path += ".dependencies.json";
  return path;
}

DependencyIndex DependencyIndex::load(const std::filesystem::path& path) {
  DependencyIndex index;
  std::ifstream in(path, std::ios::binary);
  if (!in) return index;
  const std::string text((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
  const nlohmann::json doc = nlohmann::json::parse(text, nullptr, /*allow_exceptions=*/false);
  const auto ignored = [&](const char* why) {
    spdlog::warn("{}: {}; ignored (every bridge is parsed once to rebuild it)", path.string(), why);
    return DependencyIndex{};
  };
  if (doc.is_discarded() || !doc.is_object()) return ignored("not a JSON object");
  if (doc.value("format", "") != kFormat || doc.value("version", 0) != kVersion)
    return ignored("not a dependency index of this engine");
  const nlohmann::json& sets = doc["dependency_sets"];
  const nlohmann::json& files = doc["files"];
  if (!sets.is_array() || !files.is_object()) return ignored("malformed");
  std::vector<std::vector<std::string>> lists;
  for (const nlohmann::json& set : sets) {
    if (!set.is_array()) return ignored("malformed dependency set");
    std::vector<std::string> list;
    for (const nlohmann::json& name : set) {
      if (!name.is_string()) return ignored("malformed dependency set");
      list.push_back(name.get<std::string>());
    }
    lists.push_back(std::move(list));
  }
  for (const auto& [file, set] : files.items()) {
    if (!set.is_number_unsigned() || set.get<std::size_t>() >= lists.size()) return ignored("malformed file entry");
    index.files_.emplace(file, lists[set.get<std::size_t>()]);
  }
  return index;
}

const std::vector<std::string>* DependencyIndex::find(const std::string& file) const {
  const auto it = files_.find(file);
  return it == files_.end() ? nullptr : &it->second;
}

void DependencyIndex::set(const std::string& file, std::vector<std::string> dependencies) {
  files_[file] = std::move(dependencies);
}

void DependencyIndex::save(const std::filesystem::path& path) const {
  std::map<std::vector<std::string>, std::size_t> set_numbers;
  nlohmann::json sets = nlohmann::json::array();
  nlohmann::json files = nlohmann::json::object();
  for (const auto& [file, list] : files_) {
    auto [it, added] = set_numbers.emplace(list, set_numbers.size());
    if (added) sets.push_back(list);
    files[file] = it->second;
  }
  const nlohmann::json doc{{"format", kFormat}, {"version", kVersion}, {"dependency_sets", sets}, {"files", files}};
  write_file_atomically(path, doc.dump() + "\n");
}

}  // namespace tenthpoint::batch
