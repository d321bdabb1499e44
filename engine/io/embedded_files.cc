#include "engine/io/embedded_files.h"

namespace tenthpoint::io {

std::optional<std::string_view> embedded_file(std::string_view name) {
  for (const EmbeddedFile& file : embedded_files())
    if (file.name == name) return file.contents;
  return std::nullopt;
}

}  // namespace tenthpoint::io
