#include "engine/io/data_reference.h"

#include <filesystem>

#include <fmt/format.h>

#include "engine/io/embedded_files.h"
#include "engine/io/name_suggestion.h"

namespace tenthpoint::io {
namespace {

constexpr std::string_view kShippedPrefix = "<shipped>/";

// Shipped items live in the source tree under engine/data/<folder>/<name>.yaml.
std::vector<std::string> shipped_names(std::string_view folder) {
  std::vector<std::string> names;
  const std::string prefix = fmt::format("engine/data/{}/", folder);
  for (const EmbeddedFile& file : embedded_files()) {
    if (file.name.rfind(prefix, 0) != 0) continue;
    std::string name(file.name.substr(prefix.size()));
    if (name.size() > 5 && name.substr(name.size() - 5) == ".yaml") names.push_back(name.substr(0, name.size() - 5));
  }
  return names;
}

std::optional<DataReference> resolve(std::string_view text, const std::string& from_file, std::string_view folder,
                                     const char* what, std::string& why) {
  if (is_shipped_name(text)) {
    const std::string embedded = fmt::format("engine/data/{}/{}.yaml", folder, text);
    if (auto contents = embedded_file(embedded))
      return DataReference{fmt::format("{}{}/{}.yaml", kShippedPrefix, folder, text), contents, ""};
    const std::vector<std::string> known = shipped_names(folder);
    why = fmt::format("no shipped {} is named '{}'", what, text);
    if (auto suggestion = nearest_name(text, known)) why += fmt::format(" (did you mean '{}'?)", *suggestion);
    why += fmt::format("; shipped: {}; a file path needs a '/' or an extension", join_names(known));
    return std::nullopt;
  }
  if (from_file.rfind(kShippedPrefix, 0) == 0) {
    why = "shipped data can refer to shipped data only";
    return std::nullopt;
  }
  namespace fs = std::filesystem;
  const fs::path written(text);
  const fs::path resolved = written.is_absolute() ? written : fs::path(from_file).parent_path() / written;
  const std::string path = resolved.lexically_normal().string();
  return DataReference{path, std::nullopt, path};
}

}  // namespace

bool is_shipped_name(std::string_view text) {
  return !text.empty() && text.find('/') == std::string_view::npos && text.find('\\') == std::string_view::npos &&
         text.find('.') == std::string_view::npos;
}

std::optional<DataReference> resolve_policy_reference(std::string_view text, const std::string& from_file,
                                                      std::string& why) {
  return resolve(text, from_file, "policy", "policy", why);
}

std::optional<DataReference> resolve_vehicle_reference(std::string_view text, const std::string& from_file,
                                                       std::string& why) {
  return resolve(text, from_file, "vehicles", "vehicle library", why);
}

std::vector<std::string> shipped_policy_names() { return shipped_names("policy"); }
std::vector<std::string> shipped_vehicle_library_names() { return shipped_names("vehicles"); }

}  // namespace tenthpoint::io
