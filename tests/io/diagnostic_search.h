// Test helpers for finding diagnostics by line and text, and for temporary
// files the tests write.
#pragma once

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <string>
#include <string_view>

#include <catch2/catch.hpp>

#include "engine/core/diagnostic.h"

namespace tenthpoint::test {

inline std::string source_path(std::string_view relative) {
  return std::string(TENTHPOINT_SOURCE_DIR) + "/" + std::string(relative);
}

// The first diagnostic of `severity` whose message contains `text` (and is
// on `line`, when line > 0), or nullptr.
inline const Diagnostic* find_diagnostic(const Diagnostics& diagnostics, Severity severity, std::string_view text,
                                         int line = 0) {
  auto it = std::find_if(diagnostics.begin(), diagnostics.end(), [&](const Diagnostic& d) {
    return d.severity == severity && d.message.find(text) != std::string::npos && (line <= 0 || d.where.line == line);
  });
  return it == diagnostics.end() ? nullptr : &*it;
}

inline std::string describe_all(const Diagnostics& diagnostics) {
  std::string out;
  for (const Diagnostic& d : diagnostics) out += d.to_string() + "\n";
  return out.empty() ? "(no diagnostics)" : out;
}

// A fresh directory under the build tree for one test, removed first if a
// previous run left it.
inline std::filesystem::path scratch_directory(std::string_view name) {
  const std::filesystem::path dir =
      std::filesystem::path(TENTHPOINT_BINARY_DIR) / "io_test_scratch" / std::string(name);
  std::filesystem::remove_all(dir);
  std::filesystem::create_directories(dir);
  return dir;
}

inline void write_file(const std::filesystem::path& path, std::string_view text) {
  std::filesystem::create_directories(path.parent_path());
  std::ofstream out(path, std::ios::binary);
  out << text;
}

inline std::string read_file(const std::string& path) {
  std::ifstream in(path, std::ios::binary);
  return std::string(std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>());
}

}  // namespace tenthpoint::test
