#include "engine/rating/rating_factor.h"

#include <cmath>

namespace tenthpoint::rating {
namespace {

// A live-load effect this small against the capacity gives a rating factor
// above 1e9: no vehicle can govern there, and writing a number would only
// mislead. Reported as "no live load" instead.
constexpr Real kNoLiveLoad = 1e-9;

}  // namespace

RatingFactorResult rating_factor(Real capacity, const std::vector<FactoredTerm>& permanent, const FactoredTerm& live) {
  RatingFactorResult r;
  r.capacity = capacity;
  r.terms = permanent;
  r.terms.insert(r.terms.begin(), FactoredTerm{"C", 1.0, capacity});
  r.terms.push_back(live);
  for (const FactoredTerm& t : permanent) r.permanent += t.factor * t.value;
  r.live = live.factor * live.value;
  if (!(r.live > kNoLiveLoad * std::max(std::abs(capacity), Real{1}))) {
    r.status = RatingStatus::no_live_load;
    return r;
  }
  // MBE 6A.4.2.1-1 (and 6B.4.1-1): capacity left after factored permanent
  // effects, over the factored live-load effect.
  r.rating_factor = (capacity - r.permanent) / r.live;
  return r;
}

RatingFactorResult lrfr_rating_factor(Real capacity, Real dc, Real gamma_dc, Real dw, Real gamma_dw,
                                      Real live_with_impact, Real gamma_ll, Real p, Real gamma_p) {
  std::vector<FactoredTerm> permanent{{"DC", gamma_dc, dc}, {"DW", gamma_dw, dw}};
  if (p != 0) permanent.push_back({"P", gamma_p, p});
  return rating_factor(capacity, permanent, {"LL+IM", gamma_ll, live_with_impact});
}

RatingFactorResult lfr_rating_factor(Real capacity, Real dead, Real a1, Real live_with_impact, Real a2) {
  return rating_factor(capacity, {{"D", a1, dead}}, {"L(1+I)", a2, live_with_impact});
}

}  // namespace tenthpoint::rating
