#include "engine/io/inventory_listing.h"

#include <catch2/catch.hpp>

#include "tests/io/diagnostic_search.h"

using namespace tenthpoint;
using namespace tenthpoint::io;
using tenthpoint::test::describe_all;
using tenthpoint::test::find_diagnostic;

namespace fs = std::filesystem;

// The listing rules are this project's contract (inventory_listing.h).
TEST_CASE("a directory lists its yaml files sorted, without subdirectories or hidden files", "[io][inventory]") {
  const fs::path dir = test::scratch_directory("listing-dir");
  for (const char* name : {"b.yaml", "a.yml", "c.txt", ".hidden.yaml", "policies/p.yaml"})
    test::write_file(dir / name, "x: 1\n");
  const InventoryListing listing = list_inventory({dir.string()});
  INFO(describe_all(listing.diagnostics));
  CHECK(listing.diagnostics.empty());
  CHECK(listing.files == std::vector<std::string>{(dir / "a.yml").string(), (dir / "b.yaml").string()});
}

TEST_CASE("the demo inventory lists its bridges but not its policies", "[io][inventory]") {
  const InventoryListing listing = list_inventory({test::source_path("inventory")});
  REQUIRE_FALSE(listing.files.empty());
  for (const std::string& file : listing.files) CHECK(file.find("policies") == std::string::npos);
  CHECK(std::is_sorted(listing.files.begin(), listing.files.end()));
}

TEST_CASE("a list file names bridges relative to itself, with comments and blank lines", "[io][inventory]") {
  const fs::path dir = test::scratch_directory("listing-file");
  test::write_file(dir / "bridges/one.yaml", "x: 1\n");
  test::write_file(dir / "bridges/two.yaml", "x: 1\n");
  test::write_file(
      dir / "lists/district.txt",
      "# North district\n\n../bridges/two.yaml   # the long one\n../bridges/one.yaml\n  ../bridges/gone.yaml\n"
      "../bridges/one.yaml\n");
  const InventoryListing listing = list_inventory({(dir / "lists/district.txt").string()});
  INFO(describe_all(listing.diagnostics));
  REQUIRE(listing.files.size() == 2);
  CHECK(listing.files[0] == (dir / "bridges/two.yaml").lexically_normal().string());
  CHECK(listing.files[1] == (dir / "bridges/one.yaml").lexically_normal().string());
  const Diagnostic* missing = find_diagnostic(listing.diagnostics, Severity::error, "gone.yaml: not found", 5);
  REQUIRE(missing != nullptr);
  CHECK(missing->where.column == 3);
  CHECK(missing->where.file == (dir / "lists/district.txt").string());
  CHECK(find_diagnostic(listing.diagnostics, Severity::warning, "listed more than once", 6) != nullptr);
}

TEST_CASE("missing paths and nested list files are diagnostics", "[io][inventory]") {
  const fs::path dir = test::scratch_directory("listing-missing");
  test::write_file(dir / "outer.txt", "inner.txt\n");
  test::write_file(dir / "inner.txt", "x.yaml\n");
  const InventoryListing listing = list_inventory({(dir / "nowhere").string(), (dir / "outer.txt").string()});
  CHECK(listing.files.empty());
  CHECK(find_diagnostic(listing.diagnostics, Severity::error, "not found") != nullptr);
  CHECK(find_diagnostic(listing.diagnostics, Severity::error, "list files cannot name other list files", 1) != nullptr);
  CHECK(find_diagnostic(list_inventory({}).diagnostics, Severity::error, "no inventory given") != nullptr);
}
