#include "engine/core/atomic_file.h"

#include <unistd.h>

#include <fstream>
#include <sstream>

#include <catch2/catch.hpp>

namespace fs = std::filesystem;

namespace {
std::string slurp(const fs::path& p) {
  std::ifstream in(p);
  std::stringstream ss;
  ss << in.rdbuf();
  return ss.str();
}
}  // namespace

TEST_CASE("an atomic write replaces the file whole and leaves no temporary behind", "[core][atomic_file]") {
  const fs::path dir = fs::temp_directory_path() / ("tp-atomic-" + std::to_string(::getpid()));
  fs::remove_all(dir);
  const fs::path target = dir / "sub" / "summary.csv";
  tenthpoint::write_file_atomically(target, "first\n");
  CHECK(slurp(target) == "first\n");
  tenthpoint::write_file_atomically(target, "second, longer content\n");
  CHECK(slurp(target) == "second, longer content\n");
  std::size_t entries = 0;
  for ([[maybe_unused]] const auto& e : fs::directory_iterator(target.parent_path())) ++entries;
  CHECK(entries == 1);  // common practice: the temporary is renamed, not copied
  fs::remove_all(dir);
}

TEST_CASE("an atomic write into an unwritable place fails loudly and keeps the old file", "[core][atomic_file]") {
  CHECK_THROWS_WITH(tenthpoint::write_file_atomically("/proc/tenthpoint-no/such.csv", "x"), Catch::Contains("cannot"));
}
