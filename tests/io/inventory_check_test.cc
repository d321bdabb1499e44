#include "engine/io/inventory_check.h"

#include <catch2/catch.hpp>

#include "tests/io/diagnostic_search.h"

using namespace tenthpoint;
using namespace tenthpoint::io;
using tenthpoint::test::describe_all;
using tenthpoint::test::find_diagnostic;
using tenthpoint::test::source_path;

namespace fs = std::filesystem;

TEST_CASE("the demo inventory checks without errors, policies included", "[io][check]") {
  const InventoryCheck check = check_inventory({source_path("inventory")});
  INFO(describe_all(check.inventory_diagnostics));
  CHECK(check.ok());
  CHECK(check.totals.files == check.files.size());
  CHECK(check.totals.files >= 1);
  CHECK(check.totals.valid + check.totals.with_warnings == check.totals.files);
  CHECK(check.totals.errors == 0);
  for (const FileCheck& f : check.files) {
    INFO(f.path << "\n" << describe_all(f.diagnostics));
    CHECK(f.status != FileStatus::errors);
    CHECK_FALSE(f.structure_id.empty());
  }
}

TEST_CASE("per-file status, duplicate structure ids and policy names are checked", "[io][check]") {
  const fs::path dir = test::scratch_directory("check");
  const std::string good = test::read_file(source_path("tests/data/good/two-span-us.yaml"));
  test::write_file(dir / "a-good.yaml", good);
  test::write_file(dir / "b-same-id.yaml", good);
  test::write_file(dir / "c-warning.yaml", test::read_file(source_path("tests/data/bad/fy-in-psi.yaml")));
  test::write_file(dir / "d-broken.yaml", "format_version: [\n");
  std::string odd_set = good;
  odd_set.replace(odd_set.find("structure_id: T-0001"), 20, "structure_id: T-0002");
  odd_set.replace(odd_set.find("vehicle_set: standard"), 21, "vehicle_set: standrd");
  test::write_file(dir / "e-odd-set.yaml", odd_set);

  const InventoryCheck check = check_inventory({dir.string()});
  REQUIRE(check.files.size() == 5);
  CHECK_FALSE(check.ok());
  CHECK(check.files[0].status == FileStatus::valid);
  CHECK(check.files[0].structure_id == "T-0001");

  INFO(describe_all(check.files[1].diagnostics));
  CHECK(check.files[1].status == FileStatus::errors);
  const Diagnostic* duplicate =
      find_diagnostic(check.files[1].diagnostics, Severity::error, "structure id 'T-0001' is already used by", 9);
  REQUIRE(duplicate != nullptr);
  CHECK(duplicate->field == "identity.structure_id");

  CHECK(check.files[2].status == FileStatus::warnings);
  CHECK(check.files[2].warnings == 1);
  CHECK(check.files[3].status == FileStatus::errors);
  CHECK(check.files[3].structure_id.empty());
  CHECK(find_diagnostic(check.files[4].diagnostics, Severity::error,
                        "policy tenthpoint-default has no LRFR vehicle set 'standrd' (did you mean 'standard'?)") !=
        nullptr);

  CHECK(check.totals.files == 5);
  CHECK(check.totals.valid == 1);
  CHECK(check.totals.with_warnings == 1);
  CHECK(check.totals.with_errors == 3);
  CHECK(check.totals.errors == check.files[1].errors + check.files[3].errors + check.files[4].errors);
}

TEST_CASE("file statuses have one spelling each way", "[io][check]") {
  for (FileStatus s : {FileStatus::valid, FileStatus::warnings, FileStatus::errors})
    CHECK(parse_file_status(to_string(s)) == s);
  CHECK_FALSE(parse_file_status("ok").has_value());
}
