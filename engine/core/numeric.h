// The engine's one numeric vocabulary: the scalar type and the Eigen aliases.
// Every module uses these names instead of raw Eigen templates.
#pragma once

#include <Eigen/Core>
#include <Eigen/SparseCore>

namespace tenthpoint {

// All engine arithmetic is double precision; float never appears.
using Real = double;

using Vector = Eigen::Matrix<Real, Eigen::Dynamic, 1>;
using Matrix = Eigen::Matrix<Real, Eigen::Dynamic, Eigen::Dynamic>;
using SparseMatrix = Eigen::SparseMatrix<Real>;
using Triplet = Eigen::Triplet<Real>;
template <int N>
using FixedVector = Eigen::Matrix<Real, N, 1>;
template <int R, int C>
using FixedMatrix = Eigen::Matrix<Real, R, C>;

}  // namespace tenthpoint
