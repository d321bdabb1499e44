// summarize_rating: the ledger record of a rated demo bridge carries the
// rating's governing values, postings and dates, in the posting unit.
#include "engine/pipeline/rating_summary.h"

#include <catch2/catch.hpp>

#include "engine/io/bridge_reader.h"
#include "engine/io/policy_reader.h"

using namespace tenthpoint;

namespace {

struct Rated {
  model::Bridge bridge;
  pipeline::BridgeRating rating;
};

Rated rate(const std::string& name) {
  Rated r{io::load_bridge(std::string(TENTHPOINT_SOURCE_DIR) + "/inventory/" + name), {}};
  const io::PolicyReadResult policy = io::read_policy_for_bridge(r.bridge);
  REQUIRE(policy.ok());
  r.rating = pipeline::rate_bridge(r.bridge, *policy.policy, CalendarDate{2026, 12, 1});
  return r;
}

}  // namespace

TEST_CASE("a US bridge's record holds its governing rows with ratings in short tons", "[pipeline][summary]") {
  const Rated r = rate("ev-0112-willow-run.yaml");
  const ledger::BridgeRecord rec = pipeline::summarize_rating(r.bridge, r.rating);
  CHECK(rec.structure_id == "EV-0112");
  CHECK(rec.name == r.bridge.identity.name);
  CHECK(rec.method == "LRFR");  // model::to_string(RatingMethod)
  CHECK(rec.rating_date == "2026-12-01");
  CHECK(rec.weight_unit == "ton");
  CHECK(rec.status == ledger::BridgeStatus::rated);
  CHECK(rec.file.empty());  // set by the batch run
  REQUIRE(rec.governing.size() == r.rating.governing.size());
  for (std::size_t i = 0; i < rec.governing.size(); ++i) {
    const pipeline::GoverningRating& g = r.rating.governing[i];
    const ledger::GoverningRow& row = rec.governing[i];
    CHECK(row.load_model_id == g.load_model_id);
    CHECK(row.rating_factor == g.at.result.rating_factor);
    CHECK(row.station == g.at.station);
    CHECK(row.girder_id == g.girder_id);
    // A short ton is 2000 lbf, 1 lbf = 4.4482216152605 N (NIST SP 811 B.8).
    if (g.rating_weight_rated)
      CHECK(*row.rating_weight == Approx(*g.rating_weight_rated / (2000 * 4.4482216152605)).epsilon(1e-12));
    else
      CHECK_FALSE(row.rating_weight.has_value());
  }
  CHECK(rec.recommendation == std::string(rating::to_string(r.rating.recommendation)));
  CHECK(rec.warning_count == static_cast<int>(r.rating.warnings.size()));
}

TEST_CASE("an SI bridge's postings are in tonnes-force", "[pipeline][summary]") {
  const Rated r = rate("ev-0415-county-road-9.yaml");
  const ledger::BridgeRecord rec = pipeline::summarize_rating(r.bridge, r.rating);
  CHECK(rec.weight_unit == "tonne");
  REQUIRE(rec.postings.size() == r.rating.postings.size());
  for (std::size_t i = 0; i < rec.postings.size(); ++i) {
    const pipeline::VehiclePosting& p = r.rating.postings[i];
    CHECK(rec.postings[i].status == std::string(rating::to_string(p.decision.status)));
    // 1 tonne-force = 9.80665 kN (standard gravity, CGPM 1901).
    if (p.decision.status == rating::PostingStatus::post)
      CHECK(*rec.postings[i].posted_weight == Approx(p.decision.posted_weight / 9806.65));
    else
      CHECK_FALSE(rec.postings[i].posted_weight.has_value());
  }
}
