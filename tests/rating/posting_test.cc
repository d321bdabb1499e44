#include "engine/rating/posting.h"

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "engine/io/policy_reader.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::rating;

namespace {

constexpr Real kTon = units::kShortTon;

model::PostingPolicy default_posting() {
  const io::PolicyReadResult r = io::read_shipped_policy("default");
  REQUIRE(r.ok());
  return r.policy->posting;
}

// The MBE 6A.8.3 equation without rounding, to test its end points.
model::PostingPolicy unrounded() {
  model::PostingPolicy p = default_posting();
  p.increment = 0;
  p.never_at_or_above_legal_weight = false;
  return p;
}

}  // namespace

TEST_CASE("the posting equation gives W at RF 1.0 and zero at RF 0.3", "[rating][posting]") {
  // MBE 6A.8.3: safe load = (W / 0.7)(RF - 0.3); at RF = 1.0 it is W, at 0.3 it is 0.
  model::PostingPolicy p = unrounded();
  p.posting_below = 1.0 + 1e-9;  // evaluate the equation at RF = 1.0 itself
  const PostingDecision at_one = posting_for(1.0, 25 * kTon, p, kTon);
  TP_CHECK_CLOSE(at_one.safe_load, 25 * kTon, 1e-12, kTon);
  const PostingDecision at_closure = posting_for(0.3, 25 * kTon, p, kTon);
  CHECK(at_closure.status == PostingStatus::post);
  TP_CHECK_CLOSE(at_closure.safe_load, 0.0, 1e-12, kTon);
}

TEST_CASE("the trade reference's posting check: Type 3 at RF 0.65 posts at 12.5 t before rounding",
          "[rating][posting]") {
  // ../shared/REFERENCE.md section 7: W = 25 t, RF = 0.65 -> 25/0.7 x 0.35 = 12.5 t.
  const PostingDecision d = posting_for(0.65, 25 * kTon, default_posting(), kTon);
  REQUIRE(d.status == PostingStatus::post);
  TP_CHECK_CLOSE(d.safe_load / kTon, 12.5, 1e-12, 1.0);
  // The default policy rounds down to the whole ton (common practice, no source).
  CHECK(d.posted_weight / kTon == Approx(12.0));
}

TEST_CASE("no posting at RF 1.0 and above, closure below 0.3", "[rating][posting]") {
  CHECK(posting_for(1.0, 36 * kTon, default_posting(), kTon).status == PostingStatus::none);
  CHECK(posting_for(1.7, 36 * kTon, default_posting(), kTon).status == PostingStatus::none);
  CHECK(posting_for(0.29, 36 * kTon, default_posting(), kTon).status == PostingStatus::close);
}

TEST_CASE("a posting never reaches the legal weight and a policy minimum closes instead", "[rating][posting]") {
  model::PostingPolicy p = default_posting();
  p.rounding = model::RoundingRule::up;
  // RF 0.999 of a 25 t truck: (25/0.7)(0.699) = 24.96 t, rounded up to 25 t =
  // the legal weight, so the sign says 24 t (common practice, no source).
  const PostingDecision d = posting_for(0.999, 25 * kTon, p, kTon);
  REQUIRE(d.status == PostingStatus::post);
  CHECK(d.posted_weight / kTon == Approx(24.0));
  // The Eastvale policy's 3-ton minimum: RF 0.35 of a 25 t truck is 1.79 t.
  p.minimum_posting = 3 * kTon;
  CHECK(posting_for(0.35, 25 * kTon, p, kTon).status == PostingStatus::close);
}
