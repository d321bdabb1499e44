// Rating whole bridges: every demo bridge rates end to end, and the
// screening and posting rules of the policy act on the governing values.
#include "engine/pipeline/bridge_rating.h"

#include <cmath>
#include <filesystem>

#include <catch2/catch.hpp>

#include "engine/io/bridge_reader.h"
#include "engine/io/policy_reader.h"

using namespace tenthpoint;

namespace {

std::vector<std::string> demo_files() {
  std::vector<std::string> files;
  for (const auto& e : std::filesystem::directory_iterator(std::string(TENTHPOINT_SOURCE_DIR) + "/inventory"))
    if (e.path().extension() == ".yaml") files.push_back(e.path().string());
  std::sort(files.begin(), files.end());
  return files;
}

pipeline::BridgeRating rate(const std::string& file) {
  const model::Bridge bridge = io::load_bridge(file);
  const io::PolicyReadResult policy = io::read_policy_for_bridge(bridge);
  REQUIRE(policy.ok());
  return pipeline::rate_bridge(bridge, *policy.policy, CalendarDate{2026, 12, 1});
}

}  // namespace

TEST_CASE("every demo bridge rates end to end with finite governing rating factors", "[pipeline]") {
  const std::vector<std::string> files = demo_files();
  REQUIRE(files.size() >= 12);
  for (const std::string& file : files) {
    INFO(file);
    const pipeline::BridgeRating r = rate(file);
    REQUIRE_FALSE(r.governing.empty());
    for (const pipeline::GoverningRating& g : r.governing) {
      INFO(g.load_model_id << " " << model::to_string(g.level));
      CHECK(std::isfinite(g.at.result.rating_factor));
      CHECK(g.at.distribution > 0);
      // Common practice: a rating factor above 50 or below zero signals bad input.
      CHECK(g.at.result.rating_factor < 50);
    }
    // The design load is always rated at both levels (MBE 6A.4.3; 6B.4).
    const char* design = r.method == model::RatingMethod::lrfr ? "HL93" : "HS20";
    const pipeline::GoverningRating* inventory = r.find(design, model::RatingLevel::inventory);
    const pipeline::GoverningRating* operating = r.find(design, model::RatingLevel::operating);
    REQUIRE(inventory != nullptr);
    REQUIRE(operating != nullptr);
    // Same demand and capacity, smaller live-load factor: operating >= inventory.
    CHECK(operating->at.result.rating_factor >= inventory->at.result.rating_factor);
    if (r.method == model::RatingMethod::lrfr) {
      // 1.75 / 1.35 is the ratio of the MBE Table 6A.4.2.2-1 factors (from memory)
      // when inventory and operating govern at the same point.
      if (operating->at.point == inventory->at.point && operating->at.effect == inventory->at.effect &&
          operating->girder_id == inventory->girder_id && operating->at.side == inventory->at.side)
        CHECK(operating->at.result.rating_factor / inventory->at.result.rating_factor == Approx(1.75 / 1.35));
    }
  }
}

TEST_CASE("screened-out vehicles never post and the recommendation follows the legal loads", "[pipeline]") {
  for (const std::string& file : demo_files()) {
    INFO(file);
    const pipeline::BridgeRating r = rate(file);
    rating::PostingStatus worst = rating::PostingStatus::none;
    for (const pipeline::VehiclePosting& p : r.postings) {
      const pipeline::GoverningRating* g = r.find(p.load_model_id, model::RatingLevel::operating);
      REQUIRE(g != nullptr);
      CHECK_FALSE(g->screened_out);
      if (g->category == model::VehicleCategory::emergency) continue;
      if (p.decision.status == rating::PostingStatus::close) worst = rating::PostingStatus::close;
      if (p.decision.status == rating::PostingStatus::post && worst == rating::PostingStatus::none)
        worst = rating::PostingStatus::post;
    }
    CHECK(r.recommendation == worst);
    // A posting or closure sets the posting deadline (23 CFR 650.313 via the policy).
    CHECK(r.deadlines.post_by.has_value() == (r.recommendation != rating::PostingStatus::none));
  }
}
