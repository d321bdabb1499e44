// Files compiled into the engine: the JSON Schemas of the input formats and
// the shipped data (default policy, AASHTO vehicle library). The build
// generates their contents from schemas/ and engine/data/ (see
// engine/io/embed_files.cmake), so a rating never depends on the working
// directory or an install location.
#pragma once

#include <optional>
#include <span>
#include <string_view>

namespace tenthpoint::io {

struct EmbeddedFile {
  std::string_view name;      // path relative to the source tree, e.g. "schemas/bridge.schema.json"
  std::string_view contents;  // the file's bytes
};

// Every embedded file, in the order the build lists them.
[[nodiscard]] std::span<const EmbeddedFile> embedded_files();

// The contents of the embedded file `name`, or nullopt when none has that name.
[[nodiscard]] std::optional<std::string_view> embedded_file(std::string_view name);

}  // namespace tenthpoint::io
