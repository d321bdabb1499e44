#include "engine/io/inventory_listing.h"

#include <algorithm>
#include <filesystem>
#include <set>
#include <sstream>
#include <system_error>

#include <fmt/format.h>

#include "engine/io/text_file.h"

namespace tenthpoint::io {
namespace {

namespace fs = std::filesystem;

class Lister {
 public:
  InventoryListing take() { return std::move(listing_); }

  void add_path(const std::string& path, const SourceLocation& from, bool allow_list_file) {
    std::error_code ec;
    const fs::file_status status = fs::status(path, ec);
    if (ec || !fs::exists(status)) return problem(Severity::error, from, path, "not found");
    if (fs::is_directory(status)) return add_directory(path, from);
    if (has_yaml_extension(path)) return add_file(path, from);
    if (!allow_list_file)
      return problem(Severity::error, from, path,
                     "list files cannot name other list files; expected a .yaml/.yml bridge file or a directory");
    add_list_file(path);
  }

 private:
  void problem(Severity severity, const SourceLocation& from, const std::string& path, const std::string& message) {
    SourceLocation where = from.file.empty() ? SourceLocation{path, 0, 0} : from;
    const std::string text = from.file.empty() ? message : fmt::format("{}: {}", path, message);
    listing_.diagnostics.push_back(Diagnostic{severity, std::move(where), "", text});
  }

  void add_file(const std::string& path, const SourceLocation& from) {
    std::error_code ec;
    const fs::path canonical = fs::weakly_canonical(path, ec);
    const std::string key = ec ? path : canonical.string();
    if (!seen_.insert(key).second) return problem(Severity::warning, from, path, "listed more than once; checked once");
    listing_.files.push_back(path);
  }

  void add_directory(const std::string& path, const SourceLocation& from) {
    std::vector<std::string> found;
    std::error_code ec;
    for (fs::directory_iterator it(path, ec), end; !ec && it != end; it.increment(ec)) {
      const fs::path entry = it->path();
      const std::string name = entry.filename().string();
      if (name.empty() || name[0] == '.') continue;
      std::error_code type_error;
      if (!it->is_regular_file(type_error) || !has_yaml_extension(name)) continue;
      found.push_back(entry.string());
    }
    if (ec) return problem(Severity::error, from, path, fmt::format("cannot read the directory ({})", ec.message()));
    std::sort(found.begin(), found.end());
    if (found.empty()) problem(Severity::warning, from, path, "directory holds no .yaml or .yml bridge files");
    for (const std::string& file : found) add_file(file, from);
  }

  void add_list_file(const std::string& path) {
    const TextFile list = read_text_file(path);
    if (!list.text) {
      listing_.diagnostics.insert(listing_.diagnostics.end(), list.diagnostics.begin(), list.diagnostics.end());
      return;
    }
    const fs::path base = fs::path(path).parent_path();
    std::istringstream lines(*list.text);
    std::string line;
    int number = 0;
    while (std::getline(lines, line)) {
      ++number;
      // A '#' at the start or after blanks begins a comment; one inside a
      // name (rare, but legal in paths) does not.
      std::size_t comment = std::string::npos;
      for (std::size_t i = 0; i < line.size(); ++i)
        if (line[i] == '#' && (i == 0 || line[i - 1] == ' ' || line[i - 1] == '\t')) {
          comment = i;
          break;
        }
      if (comment != std::string::npos) line.erase(comment);
      const auto first = line.find_first_not_of(" \t\r");
      if (first == std::string::npos) continue;
      const auto last = line.find_last_not_of(" \t\r");
      const std::string entry = line.substr(first, last - first + 1);
      const fs::path written(entry);
      const std::string resolved = (written.is_absolute() ? written : base / written).lexically_normal().string();
      add_path(resolved, SourceLocation{path, number, static_cast<int>(first) + 1}, false);
    }
  }

  InventoryListing listing_;
  std::set<std::string> seen_;
};

}  // namespace

bool has_yaml_extension(const std::string& path) {
  const std::string extension = fs::path(path).extension().string();
  return extension == ".yaml" || extension == ".yml";
}

InventoryListing list_inventory(const std::vector<std::string>& paths) {
  Lister lister;
  for (const std::string& path : paths) lister.add_path(path, SourceLocation{}, true);
  InventoryListing listing = lister.take();
  if (paths.empty())
    listing.diagnostics.push_back(Diagnostic{Severity::error, SourceLocation{}, "",
                                             "no inventory given; expected directories, bridge files or list files"});
  return listing;
}

}  // namespace tenthpoint::io
