// BandedLdlt: LDL^T factorisation of a symmetric positive definite banded
// matrix, with many right-hand sides solved against one factorisation. The
// stiffness matrix of a line girder, numbered node by node along the girder,
// has a half-bandwidth of 3 or 4, so factorisation and each solve cost O(n).
//
// Without pivoting, LDL^T is backward stable for positive definite matrices.
// A pivot that is not positive, not finite, or smaller than
// `pivot_tolerance` times the original diagonal entry means the matrix is
// singular or nearly so (a mechanism, or rigidities of absurd contrast);
// factorize() then reports the row and the ratio instead of producing NaNs.
#pragma once

#include <cstddef>
#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::analysis {

struct FactorizationStatus {
  bool ok = false;
  std::size_t failed_row = 0;  // valid when !ok
  Real pivot_ratio = 0;        // pivot / original diagonal at failed_row
};

class BandedLdlt {
 public:
  BandedLdlt() = default;
  // An all-zero size x size matrix with the given half-bandwidth.
  BandedLdlt(std::size_t size, std::size_t half_bandwidth);

  [[nodiscard]] std::size_t size() const noexcept { return size_; }
  [[nodiscard]] std::size_t half_bandwidth() const noexcept { return band_; }

  // Adds value to entry (row, col) and, by symmetry, (col, row). Precondition:
  // |row - col| <= half_bandwidth and not yet factorised.
  void add(std::size_t row, std::size_t col, Real value);
  [[nodiscard]] Real entry(std::size_t row, std::size_t col) const;

  [[nodiscard]] FactorizationStatus factorize(Real pivot_tolerance);
  [[nodiscard]] bool factorized() const noexcept { return factorized_; }

  // Solves A x = b in place (b has size()). `first_nonzero` lets a sparse
  // right-hand side skip the leading zeros of the forward substitution.
  void solve_in_place(Real* rhs, std::size_t first_nonzero = 0) const;
  [[nodiscard]] Vector solve(const Vector& rhs) const;

 private:
  [[nodiscard]] Real& at(std::size_t row, std::size_t col) { return data_[row * (band_ + 1) + (col + band_ - row)]; }
  [[nodiscard]] Real at(std::size_t row, std::size_t col) const {
    return data_[row * (band_ + 1) + (col + band_ - row)];
  }

  std::size_t size_ = 0;
  std::size_t band_ = 0;
  // Row i holds columns i - band .. i; the diagonal is last. After
  // factorisation the strictly lower part is L (unit diagonal implied) and
  // the diagonal is D.
  std::vector<Real> data_;
  std::vector<Real> inverse_pivots_;  // 1 / D, filled by factorize()
  bool factorized_ = false;
};

}  // namespace tenthpoint::analysis
