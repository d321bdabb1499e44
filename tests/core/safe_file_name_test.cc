#include "engine/core/safe_file_name.h"

#include <catch2/catch.hpp>

using tenthpoint::safe_file_name;

// Path traversal through user-supplied names (OWASP "Path Traversal";
// common practice for any program that writes files named from input).
TEST_CASE("a name taken from input can never leave the output directory", "[core][safe_file_name]") {
  CHECK(safe_file_name("EV-0112") == "EV-0112");
  CHECK(safe_file_name("../../x") == "_._.._x");
  CHECK(safe_file_name("/etc/x") == "_etc_x");
  CHECK(safe_file_name("..") == "_.");
  CHECK(safe_file_name(".") == "_");
  CHECK(safe_file_name("") == "_");
  CHECK(safe_file_name("a\\b\nc") == "a_b_c");
  CHECK(safe_file_name("Brücke 7") == "Br__cke_7");
  CHECK(safe_file_name(std::string(300, 'a')).size() == 100);
  for (const char* hostile : {"../../x", "/etc/x", "..", "a/../../b", "~/x", "C:\\x"}) {
    const std::string name = safe_file_name(hostile);
    CHECK(name.find('/') == std::string::npos);
    CHECK(name.find('\\') == std::string::npos);
    CHECK(name != "..");
    CHECK(name.front() != '.');
  }
}
