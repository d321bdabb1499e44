// Reading a user's text file defensively: a size cap before anything is read,
// and a refusal of content that is not text (NUL bytes, invalid UTF-8), each
// with a diagnostic that names the file. Nothing here knows about YAML.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>

#include "engine/core/diagnostic.h"

namespace tenthpoint::io {

// Larger inputs are refused unread; no real bridge, policy or vehicle file
// comes near this (the demo bridge is about 5 KiB).
inline constexpr std::size_t kDefaultMaxFileBytes = 4 * 1024 * 1024;

struct TextFile {
  std::optional<std::string> text;  // set when the file was read and is text
  Diagnostics diagnostics;          // why it was not, when it was not
};

// Reads `path` whole. Errors: missing or unreadable file, a directory, more
// than `max_bytes` bytes, a NUL byte, bytes that are not UTF-8.
[[nodiscard]] TextFile read_text_file(const std::string& path, std::size_t max_bytes = kDefaultMaxFileBytes);

// The first problem that makes `text` not plain UTF-8 text, as a diagnostic
// located in `file`, or nullopt for good text. A leading byte-order mark is
// allowed.
[[nodiscard]] std::optional<Diagnostic> check_text(std::string_view text, const std::string& file);

}  // namespace tenthpoint::io
