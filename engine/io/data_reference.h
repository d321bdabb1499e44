// How a policy names other data: a shipped item by bare name ("default",
// "aashto": no '/' and no '.') or a file by a path relative to the file that
// names it. Shipped items are compiled in (embedded_files.h) and located as
// "<shipped>/policy/default.yaml".
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace tenthpoint::io {

struct DataReference {
  std::string label;                                 // location label: the path, or "<shipped>/..."
  std::optional<std::string_view> shipped_contents;  // set exactly for shipped data
  std::string path;                                  // the file to read when not shipped
};

// True when `text` is a bare name (no '/', no '.'), i.e. refers to shipped data.
[[nodiscard]] bool is_shipped_name(std::string_view text);

// The policy or vehicle library `text` refers to from `from_file` (a path, or
// a shipped label). nullopt, with the reason in `why`, for an unknown shipped
// name or a path written in shipped data.
[[nodiscard]] std::optional<DataReference> resolve_policy_reference(std::string_view text, const std::string& from_file,
                                                                    std::string& why);
[[nodiscard]] std::optional<DataReference> resolve_vehicle_reference(std::string_view text,
                                                                     const std::string& from_file, std::string& why);

// Names of the shipped policies and vehicle libraries.
[[nodiscard]] std::vector<std::string> shipped_policy_names();
[[nodiscard]] std::vector<std::string> shipped_vehicle_library_names();

}  // namespace tenthpoint::io
