#include "engine/live_load/envelope_cache.h"

#include <cmath>
#include <vector>

#include <catch2/catch.hpp>

#include "tests/live_load/live_load_test_support.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::live_load;
using namespace tenthpoint::live_load::test;

namespace {

// As moving_load_envelope_test.cc: the search is exact, what remains is
// rounding in the influence lines and in unit conversion.
constexpr Real kExact = 1e-9;

// Every value of two envelopes, compared exactly (==): a reused envelope
// must be the one a fresh computation gives, not one close to it.
void require_same_values(const MovingLoadEnvelope& a, const MovingLoadEnvelope& b, std::size_t points) {
  REQUIRE(a.load_model_id == b.load_model_id);
  REQUIRE(a.cases.size() == b.cases.size());
  for (std::size_t c = 0; c < a.cases.size(); ++c)
    for (EffectKind kind : {EffectKind::moment, EffectKind::shear_left, EffectKind::shear_right})
      for (std::size_t p = 0; p < points; ++p)
        for (Extreme e : kExtremes) {
          const auto& x = a.cases[c].values.at({kind, p, e});
          const auto& y = b.cases[c].values.at({kind, p, e});
          REQUIRE(x.has_value() == y.has_value());
          if (x) {
            CHECK(x->train_value() == y->train_value());
            CHECK(x->lane_value() == y->lane_value());
          }
        }
}

}  // namespace

TEST_CASE("a girder line with the same spans and stiffness reuses the first line's envelopes unchanged",
          "[live_load][envelope_cache]") {
  const model::LoadModel hl93 = hl93_model();
  const model::LoadModel hs20 = hs20_model();
  const model::VehicleLibrary library = test_library();
  // Two girder lines built separately from the same inputs, as an interior
  // and an exterior girder with one section are.
  const Real L = 64.0;
  const Girder interior = prismatic_girder({L}, {L / 2 - 1.0});
  const Girder exterior = prismatic_girder({L}, {L / 2 - 1.0});

  EnvelopeCache cache({&hl93, &hs20}, library);
  const std::vector<MovingLoadEnvelope>& first = cache.envelopes_for(interior.lines);
  const std::vector<MovingLoadEnvelope>& second = cache.envelopes_for(exterior.lines);
  CHECK(cache.computed() == 1);
  CHECK(cache.reused() == 1);
  CHECK(&first == &second);

  // The shared envelopes are exactly those computed for the second line alone.
  const std::vector<MovingLoadEnvelope> fresh =
      compute_moving_load_envelopes(*exterior.prepared, {&hl93, &hs20}, library);
  REQUIRE(fresh.size() == 2);
  for (std::size_t m = 0; m < fresh.size(); ++m)
    require_same_values(second[m], fresh[m], exterior.prepared->point_count());

  // And they are right: the HL-93 tandem on a simple span, 50 (L/2 - 1)^2 / L
  // kip-ft at L/2 - 1 ft (resultant rule, project REFERENCE.md section 7).
  const std::size_t tandem_point = point_at(*exterior.prepared, ft(L / 2 - 1.0));
  REQUIRE(tandem_point < exterior.prepared->point_count());
  for (const CaseEnvelope& c : second[0].cases)
    if (c.case_id == "tandem-and-lane") {
      const auto& v = c.values.at({EffectKind::moment, tandem_point, Extreme::maximum});
      REQUIRE(v.has_value());
      TP_CHECK_CLOSE(to_kip_ft(v->train_value()), 50 * std::pow(L / 2 - 1, 2) / L, kExact, 1.0);
    }
}

TEST_CASE("a girder line whose stiffness differs only by rounding gets envelopes of its own",
          "[live_load][envelope_cache]") {
  const model::LoadModel hl93 = hl93_model();
  const model::VehicleLibrary library = test_library();
  // Two continuous spans of 100 ft; the second line's span 2 is stiffer by
  // one part in 10^12. Its influence lines are equal to rounding, not bit for
  // bit, so the cache must not hand it the first line's envelopes.
  const Real l = ft(100);
  const auto girder = [&](Real ei_span_2) {
    analysis::FlexuralRigidity rigidity;
    rigidity.then_prismatic(l, 2.0e10).then_prismatic(l, ei_span_2);
    return make_girder({l, l}, rigidity);
  };
  const Girder a = girder(2.0e10);
  const Girder b = girder(2.0e10 * (1 + 1e-12));
  EnvelopeCache cache({&hl93}, library);
  const std::vector<MovingLoadEnvelope>& ea = cache.envelopes_for(a.lines);
  const std::vector<MovingLoadEnvelope>& eb = cache.envelopes_for(b.lines);
  CHECK(cache.computed() == 2);
  CHECK(cache.reused() == 0);
  CHECK(&ea != &eb);
  // Asking again for the first line finds it.
  CHECK(&cache.envelopes_for(a.lines) == &ea);
  CHECK(cache.reused() == 1);
  // Equal spans and near-equal stiffness: the two envelopes agree to rounding.
  const std::size_t mid = point_at(*a.prepared, l / 2);
  for (std::size_t c = 0; c < ea[0].cases.size(); ++c) {
    const auto& x = ea[0].cases[c].values.at({EffectKind::moment, mid, Extreme::maximum});
    const auto& y = eb[0].cases[c].values.at({EffectKind::moment, mid, Extreme::maximum});
    REQUIRE(x.has_value() == y.has_value());
    if (x) TP_CHECK_CLOSE(y->total(), x->total(), kExact, 1.0);
  }
}
