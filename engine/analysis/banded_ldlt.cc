#include "engine/analysis/banded_ldlt.h"

#include <algorithm>
#include <cassert>
#include <cmath>

namespace tenthpoint::analysis {

BandedLdlt::BandedLdlt(std::size_t size, std::size_t half_bandwidth)
    : size_(size), band_(half_bandwidth), data_(size * (half_bandwidth + 1), 0.0) {}

void BandedLdlt::add(std::size_t row, std::size_t col, Real value) {
  assert(!factorized_);
  if (col > row) std::swap(row, col);
  assert(row < size_ && row - col <= band_);
  at(row, col) += value;
}

Real BandedLdlt::entry(std::size_t row, std::size_t col) const {
  if (col > row) std::swap(row, col);
  if (row - col > band_) return 0.0;
  return at(row, col);
}

// Row-by-row LDL^T (Golub & Van Loan, Matrix Computations, 4th ed., Alg. 4.1.2,
// restricted to the band as in Alg. 4.3.6): with w_j = L(i,j) D(j),
//   w_j = A(i,j) - sum_{k<j} w_k L(j,k),   L(i,j) = w_j / D(j),
//   D(i) = A(i,i) - sum_{j<i} w_j L(i,j).
FactorizationStatus BandedLdlt::factorize(Real pivot_tolerance) {
  assert(!factorized_);
  std::vector<Real> w(band_ + 1, 0.0);
  for (std::size_t i = 0; i < size_; ++i) {
    const std::size_t j0 = (i > band_) ? i - band_ : 0;
    const Real original_diagonal = at(i, i);
    Real diagonal = original_diagonal;
    for (std::size_t j = j0; j < i; ++j) {
      Real wj = at(i, j);
      const std::size_t k0 = std::max(j0, (j > band_) ? j - band_ : std::size_t{0});
      for (std::size_t k = k0; k < j; ++k) wj -= w[k - j0] * at(j, k);
      w[j - j0] = wj;
      const Real lij = wj / at(j, j);
      at(i, j) = lij;
      diagonal -= wj * lij;
    }
    const Real ratio = original_diagonal > 0.0 ? diagonal / original_diagonal : 0.0;
    if (!std::isfinite(diagonal) || !(original_diagonal > 0.0) || !(ratio > pivot_tolerance)) {
      return FactorizationStatus{false, i, ratio};
    }
    at(i, i) = diagonal;
  }
  inverse_pivots_.resize(size_);
  for (std::size_t i = 0; i < size_; ++i) inverse_pivots_[i] = 1.0 / at(i, i);
  factorized_ = true;
  return FactorizationStatus{true, 0, 1.0};
}

void BandedLdlt::solve_in_place(Real* x, std::size_t first_nonzero) const {
  assert(factorized_);
  const std::size_t width = band_ + 1;
  const Real* data = data_.data();
  // L y = b (row i of L sits at data[i * width + (k + band - i)])
  for (std::size_t i = first_nonzero; i < size_; ++i) {
    const std::size_t k0 = std::max(first_nonzero, (i > band_) ? i - band_ : std::size_t{0});
    const Real* row = data + i * width + band_ - i;
    Real sum = x[i];
    for (std::size_t k = k0; k < i; ++k) sum -= row[k] * x[k];
    x[i] = sum;
  }
  // D z = y, then L^T x = z column by column: subtract x[i] times column i
  // of L^T from the rows above, which keeps the inner loop contiguous.
  for (std::size_t i = first_nonzero; i < size_; ++i) x[i] *= inverse_pivots_[i];
  for (std::size_t i = size_; i-- > 0;) {
    const std::size_t k0 = (i > band_) ? i - band_ : std::size_t{0};
    const Real* row = data + i * width + band_ - i;
    const Real xi = x[i];
    for (std::size_t k = k0; k < i; ++k) x[k] -= row[k] * xi;
  }
}

Vector BandedLdlt::solve(const Vector& rhs) const {
  assert(static_cast<std::size_t>(rhs.size()) == size_);
  Vector x = rhs;
  solve_in_place(x.data());
  return x;
}

}  // namespace tenthpoint::analysis
