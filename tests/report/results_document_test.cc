// The per-bridge results document: it validates against
// schemas/results.schema.json, its numbers are in the bridge's own units,
// and its quantities round-trip to the rating they came from.
#include "engine/report/results_document.h"

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <limits>

#include <catch2/catch.hpp>

#include "engine/core/errors.h"
#include "engine/report/finite_numbers.h"
#include "tests/report/report_test_support.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using nlohmann::json;

namespace {

report::ResultsContext context() { return {"0.1.0", "abc123", "inventory/x.yaml", 7, "2026-12-01T02:00:00Z"}; }

// Tolerance of a number of the tables (all but "governing" and "postings"):
// they are rounded to report::kResultsSignificantDigits (7) significant
// digits, at most half a unit in the seventh digit, 5e-7 relative.
constexpr double kRounded = 1e-6;

// Visits every floating-point number below `node`.
template <typename Visit>
void each_float(const json& node, const Visit& visit) {
  if (node.is_number_float()) visit(node.get<double>());
  if (node.is_structured())
    for (const json& element : node) each_float(element, visit);
}

// Significant digits of a number as nlohmann writes it (shortest round trip):
// the digits of the mantissa without leading zeros, nor trailing zeros of an
// integer-valued mantissa such as "123456800.0".
int written_digits(double value) {
  std::string text = json(value).dump();
  text = text.substr(0, text.find_first_of("eE"));
  std::string digits;
  for (char c : text)
    if (c >= '0' && c <= '9') digits += c;
  digits.erase(0, digits.find_first_not_of('0'));
  digits.erase(digits.find_last_not_of('0') + 1);
  return static_cast<int>(digits.size());
}

const json& girder(const json& doc, const std::string& id) {
  for (const json& g : doc["girders"])
    if (g["girder_id"] == id) return g;
  FAIL("no girder " << id);
  return doc;
}

std::size_t point_at(const json& g, double span_fraction, std::size_t span = 1) {
  for (const json& p : g["points"])
    if (p["span"] == span && std::abs(p["span_fraction"].get<double>() - span_fraction) < 1e-9)
      return p["index"].get<std::size_t>();
  FAIL("no point at " << span_fraction);
  return 0;
}

const json& live_model(const json& g, const std::string& id) {
  for (const json& m : g["live_load"])
    if (m["load_model_id"] == id) return m;
  FAIL("no load model " << id);
  return g;
}

}  // namespace

TEST_CASE("every demo bridge's results document validates against its schema", "[report][results]") {
  for (const char* name : {"ev-0207-quarry-hill.yaml", "ev-0112-willow-run.yaml", "ev-0042-grange-hall.yaml",
                           "ev-0348-cedar-mill.yaml", "ev-0245-old-ferry.yaml"}) {
    INFO(name);
    const test::RatedDemo demo = test::rate_demo(name);
    const json doc = report::results_document(demo.bridge, demo.rating, context());
    CHECK(test::schema_violations(doc, "results.schema.json") == "");
    CHECK_FALSE(report::first_non_finite(doc).has_value());
    CHECK(doc["caution"] ==
          "Results support, and never replace, the judgment of a licensed engineer; factors and vehicles follow the "
          "configured policy; local codes govern.");
    REQUIRE(doc["girders"].size() == demo.rating.girders.size());
  }
}

TEST_CASE("the document's governing values are the rating's, in the bridge's units", "[report][results]") {
  const test::RatedDemo demo = test::rate_demo("ev-0112-willow-run.yaml");  // US, two spans, LRFR
  const json doc = report::results_document(demo.bridge, demo.rating, context());
  CHECK(doc["units"]["length"] == "ft");
  CHECK(doc["units"]["moment"] == "kip-ft");
  CHECK(doc["units"]["weight"] == "ton");
  CHECK(doc["run"]["id"] == 7);
  CHECK(doc["bridge"]["inputs_hash"] == "abc123");
  REQUIRE(doc["governing"].size() == demo.rating.governing.size());
  for (std::size_t i = 0; i < demo.rating.governing.size(); ++i) {
    const pipeline::GoverningRating& g = demo.rating.governing[i];
    const json& d = doc["governing"][i];
    INFO(g.load_model_id);
    CHECK(d["load_model_id"] == g.load_model_id);
    CHECK(d["rating_factor"].get<double>() == g.at.result.rating_factor);
    // 1 ft = 0.3048 m exactly (NIST SP 811 B.8).
    TP_CHECK_CLOSE(d["at"]["station"].get<double>() * 0.3048, g.at.station, 1e-12, 1.0);
    // A short ton is 2 kip (2000 lbf); 1 lbf = 4.4482216152605 N (NIST SP 811 B.8).
    if (g.rating_weight_rated)
      TP_CHECK_CLOSE(d["rating"].get<double>() * 2000 * 4.4482216152605, *g.rating_weight_rated, 1e-12, 1.0);
    // MBE 6A.4.2.1-1: RF = (C - factored permanent) / factored live, from the document's own numbers.
    const json& at = d["at"];
    TP_CHECK_CLOSE(
        (at["capacity"].get<double>() - at["permanent_factored"].get<double>()) / at["live_factored"].get<double>(),
        d["rating_factor"].get<double>(), 1e-9, 1.0);
  }
  CHECK(doc["recommendation"]["status"] == std::string(rating::to_string(demo.rating.recommendation)));
}

TEST_CASE("every rated point of the rating appears in the document", "[report][results]") {
  const test::RatedDemo demo = test::rate_demo("ev-0112-willow-run.yaml");
  const json doc = report::results_document(demo.bridge, demo.rating, context());
  for (std::size_t gi = 0; gi < demo.rating.girders.size(); ++gi) {
    const rating::GirderRating& g = demo.rating.girders[gi];
    const json& ratings = doc["girders"][gi]["ratings"];
    std::size_t k = 0;
    for (const rating::LoadModelRating& m : g.load_models)
      for (const rating::LevelRating& l : m.levels) {
        const json& level = ratings[k++];
        CHECK(level["load_model_id"] == m.load_model_id);
        const json& columns = level["points"];
        REQUIRE(columns["point"].size() == l.points.size());
        REQUIRE(columns["rating_factor"].size() == l.points.size());
        for (std::size_t p = 0; p < l.points.size(); ++p) {
          CHECK(columns["point"][p] == l.points[p].point);
          CHECK(columns["effect"][p] == std::string(rating::to_string(l.points[p].effect)));
          if (l.points[p].result.status == rating::RatingStatus::rated)
            TP_CHECK_CLOSE(columns["rating_factor"][p].get<double>(), l.points[p].result.rating_factor, kRounded, 0.0);
          else
            CHECK(columns["rating_factor"][p].is_null());
        }
      }
  }
}

TEST_CASE("a simple span's envelopes and dead loads match the closed forms", "[report][results]") {
  // EV-0207: one 100 ft simple span, US units, LRFR (inventory/ev-0207-quarry-hill.yaml).
  const test::RatedDemo demo = test::rate_demo("ev-0207-quarry-hill.yaml");
  const json doc = report::results_document(demo.bridge, demo.rating, context());
  const json& g = girder(doc, "G-INT");
  const std::size_t mid = point_at(g, 0.5);
  const std::size_t end = point_at(g, 0.0);
  const double L = 100.0;

  // Statics of a simple span (closed form): w L^2 / 8 + P L / 4 at midspan
  // and w L / 2 + P / 2 at the end, with the file's 1.65 kip/ft and 2.4 kip.
  const json& dc1 = g["dead_load"][0];
  REQUIRE(dc1["component"] == "DC1");
  // Tolerance: the document's rounding (kRounded); the analysis itself solves
  // the stiffness model in double precision, far closer.
  TP_CHECK_CLOSE(dc1["moment"][mid].get<double>(), 1.65 * L * L / 8 + 2.4 * L / 4, kRounded, 1.0);
  TP_CHECK_CLOSE(dc1["shear_right"][end].get<double>(), 1.65 * L / 2 + 2.4 / 2, kRounded, 1.0);

  // HL-93 per lane, static (influence-line closed forms, REFERENCE.md section 7):
  // design truck at midspan with the 32 kip axle at the apex and the 14 ft
  // spacing: 18 L - 280 kip-ft; lane 0.64 L^2 / 8; end shear 72 - 672 / L and 0.32 L.
  const json& hl93 = live_model(g, "HL93");
  const json& m = hl93["moment"]["maximum"];
  TP_CHECK_CLOSE(m["train"][mid].get<double>(), 18 * L - 280, kRounded, 1.0);
  TP_CHECK_CLOSE(m["lane"][mid].get<double>(), 0.08 * L * L, kRounded, 1.0);
  TP_CHECK_CLOSE(m["combined"][mid].get<double>(), 18 * L - 280 + 0.08 * L * L, kRounded, 1.0);
  REQUIRE(m["case"][mid].is_number_integer());
  const json& governing_case = hl93["cases"][m["case"][mid].get<std::size_t>()];
  // The variable rear spacing takes its 14 ft minimum at midspan (LRFD 3.6.1.2.2).
  REQUIRE(governing_case["variable_links"].size() == 1);
  CHECK(governing_case["variable_links"][0]["kind"] == "spacing");
  REQUIRE(m["variable_links"][mid].size() == 1);
  TP_CHECK_CLOSE(m["variable_links"][mid][0].get<double>(), 14.0, kRounded, 1.0);
  CHECK(m["direction"][mid].is_string());
  const json& v = hl93["shear_right"]["maximum"];
  TP_CHECK_CLOSE(v["train"][end].get<double>(), 72 - 672 / L, kRounded, 1.0);
  TP_CHECK_CLOSE(v["lane"][end].get<double>(), 0.32 * L, kRounded, 1.0);

  // Distributed: g [(1 + IM) train + lane] with the document's own g and IM (LRFD 3.6.2.1: no IM on the lane).
  const double dist = g["distribution"]["at_points"]["positive_moment"][mid].get<double>();
  const double im = g["impact"]["positive_moment"][mid].get<double>();
  TP_CHECK_CLOSE(m["distributed"][mid].get<double>(), dist * ((1 + im) * (18 * L - 280) + 0.08 * L * L), kRounded, 1.0);
  CHECK_FALSE(g["impact"]["applies_to_lane"].get<bool>());

  // The positive-moment capacity at midspan is the one the rating used there.
  const json& cap = g["capacities"][mid]["positive_moment"];
  REQUIRE(cap.is_object());
  CHECK_FALSE(cap["article"].get<std::string>().empty());
}

TEST_CASE("an SI bridge's document is in kN, kN-m, m and tonnes", "[report][results]") {
  const test::RatedDemo demo = test::rate_demo("ev-0348-cedar-mill.yaml");
  const json doc = report::results_document(demo.bridge, demo.rating, context());
  CHECK(doc["units"]["system"] == "SI");
  CHECK(doc["units"]["length"] == "m");
  CHECK(doc["units"]["moment"] == "kN-m");
  CHECK(doc["units"]["force"] == "kN");
  CHECK(doc["units"]["weight"] == "tonne");
  const pipeline::GirderLineDetail& d = demo.rating.details.front();
  const json& g = doc["girders"][0];
  for (std::size_t i = 0; i < d.points.size(); ++i) {
    CHECK(g["points"][i]["station"].get<double>() == Approx(d.points[i].station));
    // 1 kN-m = 1000 N*m (SI).
    CHECK(g["dead_load"][0]["moment"][i].get<double>() * 1000 == Approx(d.dead_loads[0].moment[i]).margin(1e-6));
  }
  for (std::size_t i = 0; i < demo.rating.postings.size(); ++i)
    // A tonne-force is 9.80665 kN (standard gravity, CGPM 1901).
    CHECK(doc["postings"][i]["vehicle_weight"].get<double>() * 9806.65 ==
          Approx(demo.rating.postings[i].rating_weight));
}

TEST_CASE("a NaN in a rating is refused with the bridge and the JSON path", "[report][results]") {
  test::RatedDemo demo = test::rate_demo("ev-0207-quarry-hill.yaml");
  REQUIRE_FALSE(demo.rating.governing.empty());
  demo.rating.governing[0].at.result.capacity = std::numeric_limits<double>::quiet_NaN();
  try {
    (void)report::results_document(demo.bridge, demo.rating, context());
    FAIL("no error");
  } catch (const ModelError& e) {
    CHECK(e.bridge_id() == "EV-0207");
    CHECK(e.cause() == "results.json: the number at /governing/0/at/capacity is not finite (NaN or infinity)");
  }
}

TEST_CASE("service limit-state ratings are written as stresses", "[report][results]") {
  // EV-0207 is prestressed concrete: Service III is rated (MBE Table 6A.4.2.2-1, from memory).
  const test::RatedDemo demo = test::rate_demo("ev-0207-quarry-hill.yaml");
  const json doc = report::results_document(demo.bridge, demo.rating, context());
  CHECK(doc["units"]["stress"] == "ksi");
  // 1 ksi = 1000 lbf / in^2 = 4448.2216152605 N / (0.0254 m)^2 (NIST SP 811 B.8).
  const double ksi = 4448.2216152605 / (0.0254 * 0.0254);
  std::size_t service = 0;
  for (std::size_t gi = 0; gi < demo.rating.girders.size(); ++gi) {
    std::size_t k = 0;
    for (const rating::LoadModelRating& m : demo.rating.girders[gi].load_models)
      for (const rating::LevelRating& l : m.levels) {
        const json& rows = doc["girders"][gi]["ratings"][k++]["points"];
        for (std::size_t p = 0; p < l.points.size(); ++p) {
          if (l.points[p].limit_state != rating::LimitState::service_iii) continue;
          ++service;
          CHECK(rows["limit_state"][p] == "Service III");
          TP_CHECK_CLOSE(rows["capacity"][p].get<double>() * ksi, l.points[p].result.capacity, kRounded, 1.0);
          CHECK_FALSE(rows["fibre"][p].get<std::string>().empty());
        }
      }
  }
  CHECK(service > 0);
}

TEST_CASE("the tables keep seven significant digits and the governing rating factors every digit",
          "[report][results]") {
  // EV-0112: two continuous spans, so stations, envelopes and ratings have
  // long decimal expansions (inventory/ev-0112-willow-run.yaml).
  const test::RatedDemo demo = test::rate_demo("ev-0112-willow-run.yaml");
  const json doc = report::results_document(demo.bridge, demo.rating, context());
  // Each number is the double nearest its 7-digit decimal (C's %.6e and
  // strtod round correctly, C11 7.21.6.1 and 7.22.1.3). nlohmann writes it
  // with Grisu2, which finds the shortest text for all but about one double in
  // a thousand (Loitsch 2010, from memory); those few are written with up to
  // 17 digits, still reading back as the rounded value.
  std::size_t numbers = 0, long_texts = 0;
  each_float(doc["girders"], [&](double v) {
    ++numbers;
    char text[40];
    std::snprintf(text, sizeof text, "%.*e", report::kResultsSignificantDigits - 1, v);
    INFO(json(v).dump());
    CHECK(std::strtod(text, nullptr) == v);
    if (written_digits(v) > report::kResultsSignificantDigits) ++long_texts;
  });
  CHECK(numbers > 1000);
  CHECK(long_texts * 100 < numbers);

  // Rounding happened: some tabled rating factor differs from the engine's.
  std::size_t differ = 0;
  const json& ratings = doc["girders"][0]["ratings"];
  std::size_t k = 0;
  for (const rating::LoadModelRating& m : demo.rating.girders[0].load_models)
    for (const rating::LevelRating& l : m.levels) {
      const json& column = ratings[k++]["points"]["rating_factor"];
      for (std::size_t p = 0; p < l.points.size(); ++p)
        if (column[p].is_number() && column[p].get<double>() != l.points[p].result.rating_factor) ++differ;
    }
  CHECK(differ > 0);

  // The governing section is the engine's own value, bit for bit, as the
  // ledger and summary hold it.
  REQUIRE(doc["governing"].size() == demo.rating.governing.size());
  for (std::size_t i = 0; i < demo.rating.governing.size(); ++i) {
    const rating::RatingFactorResult& r = demo.rating.governing[i].at.result;
    if (r.status != rating::RatingStatus::rated) continue;
    CHECK(doc["governing"][i]["rating_factor"].get<double>() == r.rating_factor);
    CHECK(doc["governing"][i]["at"]["rating_factor"].get<double>() == r.rating_factor);
  }
  for (std::size_t i = 0; i < demo.rating.postings.size(); ++i)
    CHECK(doc["postings"][i]["rating_factor"].get<double>() == demo.rating.postings[i].rating_factor);
}
