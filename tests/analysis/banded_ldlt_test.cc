#include "engine/analysis/banded_ldlt.h"

#include <random>

#include <Eigen/Dense>
#include <catch2/catch.hpp>

#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::analysis;

TEST_CASE("banded LDLT solves like a dense factorisation", "[analysis][banded_ldlt]") {
  // Reference: Eigen's dense LDLT on the same matrix (an independent solver).
  const std::size_t n = 60;
  const std::size_t band = 4;
  std::mt19937 random(7);
  std::uniform_real_distribution<Real> uniform(-1.0, 1.0);
  Matrix dense = Matrix::Zero(n, n);
  BandedLdlt banded(n, band);
  for (std::size_t i = 0; i < n; ++i) {
    for (std::size_t j = (i > band ? i - band : 0); j < i; ++j) {
      const Real v = uniform(random);
      dense(i, j) = dense(j, i) = v;
      banded.add(i, j, v);
    }
    dense(i, i) = 10.0 + uniform(random);  // diagonally dominant: positive definite
    banded.add(i, i, dense(i, i));
  }
  CHECK(banded.entry(3, 1) == dense(3, 1));
  CHECK(banded.entry(1, 3) == dense(1, 3));
  CHECK(banded.entry(9, 1) == 0.0);
  REQUIRE(banded.factorize(1e-13).ok);
  Vector b(n);
  for (std::size_t i = 0; i < n; ++i) b(static_cast<Eigen::Index>(i)) = uniform(random);
  const Vector x = banded.solve(b);
  const Vector reference = dense.ldlt().solve(b);
  for (std::size_t i = 0; i < n; ++i) {
    TP_CHECK_CLOSE(x(static_cast<Eigen::Index>(i)), reference(static_cast<Eigen::Index>(i)), 1e-12, 1.0);
  }
  // A right-hand side with leading zeros may skip them.
  Vector sparse = Vector::Zero(n);
  sparse(40) = 1.0;
  Vector y = sparse;
  banded.solve_in_place(y.data(), 40);
  const Vector y_ref = dense.ldlt().solve(sparse);
  for (std::size_t i = 0; i < n; ++i) {
    TP_CHECK_CLOSE(y(static_cast<Eigen::Index>(i)), y_ref(static_cast<Eigen::Index>(i)), 1e-12, 1.0);
  }
}

TEST_CASE("a singular banded matrix is reported at its first vanishing pivot", "[analysis][banded_ldlt]") {
  // [1 1 0; 1 1 0; 0 0 1] is singular: the second pivot is 1 - 1 = 0.
  BandedLdlt m(3, 1);
  m.add(0, 0, 1.0);
  m.add(1, 0, 1.0);
  m.add(1, 1, 1.0);
  m.add(2, 2, 1.0);
  const FactorizationStatus status = m.factorize(1e-13);
  CHECK_FALSE(status.ok);
  CHECK(status.failed_row == 1);
  CHECK(status.pivot_ratio == 0.0);
  // An indefinite matrix fails too (negative pivot), never a NaN.
  BandedLdlt indefinite(2, 1);
  indefinite.add(0, 0, 1.0);
  indefinite.add(1, 0, 2.0);
  indefinite.add(1, 1, 1.0);
  CHECK_FALSE(indefinite.factorize(1e-13).ok);
}
