#include "engine/section/stiffness_profile.h"

#include <catch2/catch.hpp>

#include "tests/section/section_test_support.h"

namespace tenthpoint::section {
namespace {

// Three pieces: EI = 1 on [0, 2], EI(x) = 10 + x on [2, 5], EI = 3 on [5, 6].
// These tests check the lookup, so the expected values are the pieces' own
// definitions (no outside source is involved).
StiffnessProfile three_pieces() {
  StiffnessProfile p;
  p.pieces.push_back(StiffnessPiece{0.0, 2.0, 1.0});
  p.pieces.push_back(StiffnessPiece{2.0, 5.0, std::function<Real(Real)>([](Real x) { return 10.0 + x; })});
  p.pieces.push_back(StiffnessPiece{5.0, 6.0, 3.0});
  return p;
}

TEST_CASE("a stiffness profile evaluates constant and varying pieces", "[section]") {
  const StiffnessProfile p = three_pieces();
  CHECK(p.length() == 6.0);
  CHECK(p.at(1.0) == 1.0);
  CHECK(p.at(3.5) == 13.5);
  CHECK(p.at(6.0) == 3.0);
  CHECK(p.pieces[0].prismatic());
  CHECK_FALSE(p.pieces[1].prismatic());
}

TEST_CASE("at a section change the side picks the piece", "[section]") {
  const StiffnessProfile p = three_pieces();
  CHECK(p.at(2.0, Side::left) == 1.0);
  CHECK(p.at(2.0, Side::right) == 12.0);
  CHECK(p.at(5.0, Side::left) == 15.0);
  CHECK(p.at(5.0, Side::right) == 3.0);
  // The girder's ends have one piece each, whichever side is asked for.
  CHECK(p.at(0.0, Side::left) == 1.0);
  CHECK(p.at(6.0, Side::right) == 3.0);
}

TEST_CASE("a station off the girder is an input error", "[section]") {
  const StiffnessProfile p = three_pieces();
  const Diagnostic d = test::first_error([&] { (void)p.at(6.5); });
  CHECK(d.field == "station");
  CHECK(d.message == "6.5 m lies outside the girder, 0 m to 6 m");
}

}  // namespace
}  // namespace tenthpoint::section
