// lib/detail/smith.hpp — Smith normal form over Z of sparse integer matrices (exact, Integer),
// with the column transform kept so that solutions of M·x ≡ 0 (mod n) can be written down.
//
// Method: first eliminate with unit pivots (entries ±1) in a sparse, Markowitz-style order (the
// shortest row, then the column met by the fewest rows). A unit pivot at (r, j) is a unimodular
// step: the other rows lose column j by row operations, and row r then only fixes
// x_j = −pivot·Σ_{k≠j} r_k x_k, so SNF(M) = diag(1, SNF(M')) with M' the rest. Fox coloring
// matrices have entries 2, −1, −1 per row, so for the diagrams fourplat draws almost everything goes
// this way in linear time. The rows left without a unit entry form a small dense matrix, reduced
// by the classical algorithm (Smith 1861; e.g. Cohen, "A Course in Computational Algebraic Number
// Theory", Alg. 2.4.14): repeated division with the least entry as pivot, then forcing
// d_i | d_{i+1}.
// Counting (common practice, from the SNF M = U·D·V⁻¹ with U, V unimodular): the number of
// x ∈ (Z/n)^cols with M x ≡ 0 is n^{cols − rank} · Π_{i ≤ rank} gcd(n, d_i).
// Throws: DomainError for a modulus n ≤ 0.
#pragma once

#include <cstdint>
#include <utility>
#include <vector>

#include "fourplat/integer.hpp"

namespace fourplat::detail {

/// One sparse row: (column, non-zero value), any order (duplicates are summed).
using SparseRow = std::vector<std::pair<std::int64_t, Integer>>;

class SmithForm {
 public:
  /// The Smith form of the matrix with `cols` columns and these rows.
  SmithForm(std::int64_t cols, std::vector<SparseRow> rows);

  [[nodiscard]] std::int64_t cols() const noexcept { return cols_; }
  [[nodiscard]] std::int64_t rank() const noexcept {
    return units_ + static_cast<std::int64_t>(dense_factors_.size());
  }
  /// The non-zero invariant factors d1 | d2 | ... (all positive), units included.
  [[nodiscard]] std::vector<Integer> invariant_factors() const;
  /// The invariant factors other than 1.
  [[nodiscard]] const std::vector<Integer>& nontrivial_factors() const noexcept {
    return dense_factors_nonunit_;
  }
  /// Number of solutions of M·x ≡ 0 (mod n) in (Z/n)^cols. n ≥ 1.
  [[nodiscard]] Integer count_solutions_mod(const Integer& n) const;
  /// Generators of the group of solutions mod n, each a vector of `cols` residues in [0, n);
  /// one per invariant factor with gcd(n, d_i) > 1 and one per free column.
  [[nodiscard]] std::vector<std::vector<Integer>> solution_generators_mod(const Integer& n) const;

 private:
  struct Substitution {
    std::int64_t col;   // x_col = −pivot · Σ entries·x
    int pivot;          // ±1
    SparseRow rest;     // the pivot row without its pivot entry
  };
  std::int64_t cols_;
  std::int64_t units_ = 0;
  std::vector<Substitution> subs_;        // in elimination order
  std::vector<std::int64_t> dense_cols_;  // original index of each dense column
  std::vector<Integer> dense_factors_;    // non-zero diagonal of the dense part, d1 | d2 | ...
  std::vector<Integer> dense_factors_nonunit_;
  std::vector<std::vector<Integer>> v_;   // dense column transform: x_dense = V·y
};

}  // namespace fourplat::detail
