#include "engine/core/atomic_file.h"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#include <cstring>
#include <stdexcept>
#include <string>

#include <fmt/format.h>

namespace tenthpoint {
namespace {

[[noreturn]] void fail(const std::filesystem::path& path, const char* what) {
  throw std::runtime_error(fmt::format("cannot write {}: {}: {}", path.string(), what, std::strerror(errno)));
}

}  // namespace

void write_file_atomically(const std::filesystem::path& path, std::string_view content) {
  const std::filesystem::path parent = path.has_parent_path() ? path.parent_path() : std::filesystem::path(".");
  std::error_code ec;
  std::filesystem::create_directories(parent, ec);
  if (ec) throw std::runtime_error(fmt::format("cannot create directory {}: {}", parent.string(), ec.message()));

  std::string temp = (parent / ("." + path.filename().string() + ".XXXXXX")).string();
  const int fd = ::mkstemp(temp.data());
  if (fd < 0) fail(path, "mkstemp");

  const char* data = content.data();
  std::size_t left = content.size();
  while (left > 0) {
    const ssize_t n = ::write(fd, data, left);
    if (n < 0) {
      if (errno == EINTR) continue;
      ::close(fd);
      ::unlink(temp.c_str());
      fail(path, "write");
    }
    data += n;
    left -= static_cast<std::size_t>(n);
  }
  // fsync before rename: otherwise a power loss can leave the new name
  // pointing at an empty file on some file systems (ext4 data=writeback).
  if (::fsync(fd) != 0 || ::fchmod(fd, 0644) != 0) {
    ::close(fd);
    ::unlink(temp.c_str());
    fail(path, "fsync");
  }
  ::close(fd);
  if (::rename(temp.c_str(), path.c_str()) != 0) {
    ::unlink(temp.c_str());
    fail(path, "rename");
  }
}

}  // namespace tenthpoint
