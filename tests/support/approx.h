// The one approximate-compare helper used by every test: a relative tolerance
// with an absolute floor, so that values near zero compare sensibly.
#pragma once

#include <algorithm>
#include <cmath>

#include <catch2/catch.hpp>

namespace tenthpoint::test {

// |actual - expected| <= rel * max(|expected|, scale), where `scale` is the
// magnitude that makes "near zero" meaningful for the quantity under test.
inline bool close(double actual, double expected, double rel, double scale = 1.0) {
  return std::abs(actual - expected) <= rel * std::max(std::abs(expected), scale);
}

// Catch matcher-style wrapper so failures print both numbers.
#define TP_CHECK_CLOSE(actual, expected, rel, scale)                             \
  do {                                                                           \
    const double tp_a_ = (actual);                                               \
    const double tp_e_ = (expected);                                             \
    INFO("actual " << tp_a_ << ", expected " << tp_e_ << ", rel tol " << (rel)); \
    CHECK(::tenthpoint::test::close(tp_a_, tp_e_, (rel), (scale)));              \
  } while (0)

}  // namespace tenthpoint::test
