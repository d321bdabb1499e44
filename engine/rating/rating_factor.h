// The rating-factor equations, as pure arithmetic on demands and capacities
// that the caller has already brought to one point, one effect and one limit
// state. Every input is a magnitude in the adverse sense of the effect (for
// negative moment, the hogging moments as positive numbers), in consistent
// internal units (N*m for moments, N for shears, Pa for stresses).
//
//  LRFR, MBE 6A.4.2.1-1:
//    RF = (C - gamma_DC DC - gamma_DW DW +/- gamma_P P) / (gamma_LL (LL + IM))
//    strength: C = phi_c phi_s phi R_n, with phi_c phi_s held to its floor by
//    the caller (see capacity); service: C = f_R, an allowable stress.
//  LFR, MBE 6B.4.1-1 (AASHTO Standard Specifications 17th ed.):
//    RF = (C - A1 D) / (A2 L (1 + I))
//
// A dead load that relieves the effect (its sign opposite to the live load's)
// is passed as a negative magnitude; the caller decides, per MBE 6A.4.2.1,
// whether a relieving load may be counted (common practice: take gamma = 1.0
// or 0.9 for relieving dead load, which the policy sets).
#pragma once

#include <string>
#include <vector>

#include "engine/core/numeric.h"

namespace tenthpoint::rating {

enum class RatingStatus {
  rated,         // a finite rating factor
  no_live_load,  // the live-load effect is zero here: no rating factor (not infinity)
};

// One term of the numerator or denominator, kept for the traceable calculation.
struct FactoredTerm {
  std::string name;  // "DC", "DW", "P", "LL+IM", "C"
  Real factor = 1;   // gamma (or A1, A2)
  Real value = 0;    // unfactored magnitude
};

struct RatingFactorResult {
  RatingStatus status = RatingStatus::rated;
  Real rating_factor = 0;  // meaningful when status == rated; may be negative (dead load exceeds capacity)
  Real capacity = 0;       // C
  Real permanent = 0;      // sum of factored permanent terms subtracted from C
  Real live = 0;           // factored live-load term
  std::vector<FactoredTerm> terms;
};

// Factored permanent effects: each term gamma * value is subtracted from C.
// Live load is gamma_LL * (LL + IM). Returns no_live_load when the factored
// live effect is below `kNoLiveLoad` of the capacity (a point the vehicle
// cannot load adversely, such as the negative moment at midspan of a simple
// span).
[[nodiscard]] RatingFactorResult rating_factor(Real capacity, const std::vector<FactoredTerm>& permanent,
                                               const FactoredTerm& live);

// MBE 6A.4.2.1-1 for the strength limit states, with the usual three
// permanent components. `capacity` is phi_c phi_s phi R_n.
[[nodiscard]] RatingFactorResult lrfr_rating_factor(Real capacity, Real dc, Real gamma_dc, Real dw, Real gamma_dw,
                                                    Real live_with_impact, Real gamma_ll, Real p = 0,
                                                    Real gamma_p = 1.0);

// MBE 6B.4.1-1. `live_with_impact` is L (1 + I).
[[nodiscard]] RatingFactorResult lfr_rating_factor(Real capacity, Real dead, Real a1, Real live_with_impact, Real a2);

}  // namespace tenthpoint::rating
