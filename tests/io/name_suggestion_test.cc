#include "engine/io/name_suggestion.h"

#include <catch2/catch.hpp>

using namespace tenthpoint::io;

// Edit distance with adjacent transpositions (Damerau 1964, restricted to the
// "optimal string alignment" form): a swap of neighbours is one edit.
TEST_CASE("the nearest name catches the usual typing slips", "[io][names]") {
  const std::vector<std::string> fields{"spans", "supports", "continuity", "skew"};
  CHECK(nearest_name("spann", fields) == std::optional<std::string>("spans"));           // substitution
  CHECK(nearest_name("supprots", fields) == std::optional<std::string>("supports"));     // transposition
  CHECK(nearest_name("SKEW", fields) == std::optional<std::string>("skew"));             // case
  CHECK(nearest_name("contiuity", fields) == std::optional<std::string>("continuity"));  // deletion
  CHECK_FALSE(nearest_name("girders", fields).has_value());                              // not a typo of any
  CHECK_FALSE(nearest_name("", fields).has_value());
  CHECK(join_names(fields) == "spans, supports, continuity, skew");
}
