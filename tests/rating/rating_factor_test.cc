#include "engine/rating/rating_factor.h"

#include <catch2/catch.hpp>

#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::rating;

// Rounding of the published figures (three decimals) bounds the agreement.
constexpr double kThreeDecimals = 5e-4;

TEST_CASE("the LRFR rating factor reproduces the trade reference's arithmetic check", "[rating][rf]") {
  // ../shared/REFERENCE.md section 7 (closed form of MBE 6A.4.2.1-1):
  // phi = 1.0, phi_c = 0.95, phi_s = 1.0, Mn = 5000, DC = 1200, DW = 200,
  // LL+IM = 1500 kip-ft; inventory RF 1.124, operating RF 1.457.
  const double c = 1.0 * 0.95 * 1.0 * 5000.0;
  const RatingFactorResult inventory = lrfr_rating_factor(c, 1200, 1.25, 200, 1.50, 1500, 1.75);
  const RatingFactorResult operating = lrfr_rating_factor(c, 1200, 1.25, 200, 1.50, 1500, 1.35);
  REQUIRE(inventory.status == RatingStatus::rated);
  TP_CHECK_CLOSE(inventory.rating_factor, 1.124, kThreeDecimals, 1.0);
  TP_CHECK_CLOSE(operating.rating_factor, 1.457, kThreeDecimals, 1.0);
  // The exact values of the same expression: 2950 / 2625 and 2950 / 2025.
  TP_CHECK_CLOSE(inventory.rating_factor, 2950.0 / 2625.0, 1e-15, 1.0);
  TP_CHECK_CLOSE(operating.rating_factor, 2950.0 / 2025.0, 1e-15, 1.0);
  CHECK(inventory.permanent == Approx(1800.0));
  CHECK(inventory.terms.size() == 4);  // C, DC, DW, LL+IM: the traceable calculation
}

TEST_CASE("the LFR rating factor follows MBE 6B.4.1-1", "[rating][rf]") {
  // RF = (C - A1 D) / (A2 L (1 + I)) with A1 = 1.3, A2 = 2.17 / 1.3 (MBE 6B.4.1,
  // from memory): C = 4000, D = 1000, L(1+I) = 800 -> 2700/1736 and 2700/1040.
  TP_CHECK_CLOSE(lfr_rating_factor(4000, 1000, 1.3, 800, 2.17).rating_factor, 2700.0 / 1736.0, 1e-15, 1.0);
  TP_CHECK_CLOSE(lfr_rating_factor(4000, 1000, 1.3, 800, 1.3).rating_factor, 2700.0 / 1040.0, 1e-15, 1.0);
}

TEST_CASE("a point without adverse live load gets no rating factor rather than infinity", "[rating][rf]") {
  const RatingFactorResult r = lrfr_rating_factor(1000, 100, 1.25, 0, 1.5, 0.0, 1.75);
  CHECK(r.status == RatingStatus::no_live_load);
}

TEST_CASE("dead load above the capacity gives a negative rating factor, reported as such", "[rating][rf]") {
  // Common practice: a negative RF means the member fails under dead load alone.
  const RatingFactorResult r = lrfr_rating_factor(1000, 900, 1.25, 0, 1.5, 100, 1.75);
  REQUIRE(r.status == RatingStatus::rated);
  CHECK(r.rating_factor < 0);
  TP_CHECK_CLOSE(r.rating_factor, (1000 - 1125.0) / 175.0, 1e-15, 1.0);
}
