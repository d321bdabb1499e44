#include "engine/io/text_file.h"

#include <array>
#include <filesystem>
#include <fstream>
#include <system_error>

#include <fmt/format.h>

namespace tenthpoint::io {
namespace {

Diagnostic file_error(const std::string& file, std::string message, int line = 0, int column = 0) {
  return Diagnostic{Severity::error, SourceLocation{file, line, column}, "", std::move(message)};
}

// Length of the UTF-8 sequence starting at text[i], or 0 when it is not a
// valid sequence (RFC 3629: no overlong forms, no surrogates, <= U+10FFFF).
std::size_t utf8_sequence_length(std::string_view text, std::size_t i) {
  const auto byte = [&](std::size_t k) { return static_cast<unsigned char>(text[k]); };
  const unsigned char b0 = byte(i);
  if (b0 < 0x80) return 1;
  std::size_t length = 0;
  unsigned char low = 0x80, high = 0xBF;
  if (b0 >= 0xC2 && b0 <= 0xDF) {
    length = 2;
  } else if (b0 >= 0xE0 && b0 <= 0xEF) {
    length = 3;
    if (b0 == 0xE0) low = 0xA0;
    if (b0 == 0xED) high = 0x9F;
  } else if (b0 >= 0xF0 && b0 <= 0xF4) {
    length = 4;
    if (b0 == 0xF0) low = 0x90;
    if (b0 == 0xF4) high = 0x8F;
  } else {
    return 0;
  }
  if (i + length > text.size()) return 0;
  for (std::size_t k = 1; k < length; ++k) {
    const unsigned char b = byte(i + k);
    const unsigned char lo = k == 1 ? low : 0x80;
    const unsigned char hi = k == 1 ? high : 0xBF;
    if (b < lo || b > hi) return 0;
  }
  return length;
}

}  // namespace

std::optional<Diagnostic> check_text(std::string_view text, const std::string& file) {
  // A NUL byte anywhere marks a binary file; say so rather than complain
  // about the first byte that happens not to be UTF-8.
  if (text.find('\0') != std::string_view::npos)
    return file_error(file, "not a text file (contains NUL bytes); expected a YAML text file");
  int line = 1, column = 1;
  for (std::size_t i = 0; i < text.size();) {
    const std::size_t length = utf8_sequence_length(text, i);
    if (length == 0)
      return file_error(file, "not UTF-8 text (invalid byte sequence); save the file as UTF-8", line, column);
    if (text[i] == '\n') {
      ++line;
      column = 1;
    } else {
      ++column;
    }
    i += length;
  }
  return std::nullopt;
}

TextFile read_text_file(const std::string& path, std::size_t max_bytes) {
  TextFile result;
  namespace fs = std::filesystem;
  std::error_code ec;
  const fs::file_status status = fs::status(path, ec);
  if (ec || !fs::exists(status)) {
    result.diagnostics.push_back(file_error(path, "file not found"));
    return result;
  }
  if (fs::is_directory(status)) {
    result.diagnostics.push_back(file_error(path, "is a directory; expected a file"));
    return result;
  }
  const std::uintmax_t size = fs::file_size(path, ec);
  if (!ec && size > max_bytes) {
    result.diagnostics.push_back(
        file_error(path, fmt::format("file is too large ({} bytes; the limit is {} bytes)", size, max_bytes)));
    return result;
  }
  std::ifstream in(path, std::ios::binary);
  if (!in) {
    result.diagnostics.push_back(file_error(path, "cannot open the file for reading"));
    return result;
  }
  // Read in chunks up to just past max_bytes, so a file that grows (or a
  // device that never ends) is still caught by the limit, without filling a
  // max_bytes buffer for every small bridge file of a nightly run.
  std::string text;
  if (!ec) text.reserve(static_cast<std::size_t>(size));
  std::array<char, 64 * 1024> chunk{};
  while (in && text.size() <= max_bytes) {
    in.read(chunk.data(), static_cast<std::streamsize>(chunk.size()));
    text.append(chunk.data(), static_cast<std::size_t>(in.gcount()));
  }
  if (text.size() > max_bytes) {
    result.diagnostics.push_back(file_error(path, fmt::format("file is too large (more than {} bytes)", max_bytes)));
    return result;
  }
  if (auto problem = check_text(text, path)) {
    result.diagnostics.push_back(std::move(*problem));
    return result;
  }
  result.text = std::move(text);
  return result;
}

}  // namespace tenthpoint::io
