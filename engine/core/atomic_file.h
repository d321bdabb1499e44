// Writing output files so that a reader never sees half a file: the content
// goes to a temporary file in the same directory, is flushed to disk, and is
// then renamed over the target (rename is atomic within one file system,
// POSIX rename(2)). A run killed part-way leaves either the old file or the
// new one, never a torn mix.
#pragma once

#include <filesystem>
#include <string_view>

namespace tenthpoint {

// Writes `content` to `path` atomically, creating parent directories.
// Throws std::runtime_error naming the path and the OS error on failure; the
// previous file, if any, is left untouched.
void write_file_atomically(const std::filesystem::path& path, std::string_view content);

}  // namespace tenthpoint
