#include "engine/io/policy_reader.h"

#include <catch2/catch.hpp>

#include "engine/io/bridge_reader.h"
#include "tests/io/diagnostic_search.h"
#include "tests/support/approx.h"

using namespace tenthpoint;
using namespace tenthpoint::io;
using tenthpoint::test::describe_all;
using tenthpoint::test::find_diagnostic;
using tenthpoint::test::source_path;

namespace {

constexpr double kFoot = 0.3048;
constexpr double kTon = 2.0 * 4448.2216152605;

model::Policy shipped_default() {
  const PolicyReadResult r = read_shipped_policy("default");
  INFO(describe_all(r.diagnostics));
  REQUIRE(r.ok());
  return *r.policy;
}

model::Policy eastvale() {
  const PolicyReadResult r = read_policy_file(source_path("inventory/policies/eastvale.yaml"));
  INFO(describe_all(r.diagnostics));
  REQUIRE(r.ok());
  return *r.policy;
}

}  // namespace

TEST_CASE("the shipped default policy reads clean and names its edition", "[io][policy]") {
  const PolicyReadResult r = read_shipped_policy("default");
  INFO(describe_all(r.diagnostics));
  REQUIRE(r.ok());
  CHECK(r.diagnostics.empty());
  const model::Policy& p = *r.policy;
  CHECK(p.edition.find("AASHTO MBE 3rd ed. (2018) with interims through 2022") != std::string::npos);
  CHECK(p.edition.find("AASHTO LRFD 9th ed. (2020)") != std::string::npos);
  CHECK(p.source_files == std::vector<std::string>{"<shipped>/policy/default.yaml"});
  // The same file read from the source tree gives the same policy.
  CHECK(read_policy_file(source_path("engine/data/policy/default.yaml")).ok());
}

TEST_CASE("the default policy carries the reference's factors", "[io][policy]") {
  const model::Policy p = shipped_default();
  // MBE Table 6A.4.2.2-1 [M: the project reference].
  CHECK(p.lrfr.strength_i.dc == 1.25);
  CHECK(p.lrfr.strength_i.dw == 1.50);
  CHECK(p.lrfr.strength_i.dw_field_measured == 1.25);
  CHECK(p.lrfr.design.at(model::RatingLevel::inventory) == 1.75);
  CHECK(p.lrfr.design.at(model::RatingLevel::operating) == 1.35);
  CHECK(p.lrfr.service_ii.inventory == 1.30);
  CHECK(p.lrfr.service_iii == 0.80);
  // MBE 3rd ed. errata, Oct 2018 [C]: 1.0 with refined losses.
  CHECK(p.lrfr.service_iii_refined_losses == 1.00);
  // MBE 6B [M]: A1 = 1.3, A2 = 2.17 / 1.3.
  CHECK(p.lfr.a1 == 1.3);
  CHECK(p.lfr.a2.inventory == 2.17);
  // LRFD Table 3.6.1.1.2-1 [S]: m = 1.20, 1.00, 0.85, 0.65 (and 0.65 beyond four lanes).
  CHECK(p.lrfr.multiple_presence_for(1) == 1.20);
  CHECK(p.lrfr.multiple_presence_for(3) == 0.85);
  CHECK(p.lrfr.multiple_presence_for(6) == 0.65);
  // Standard Specifications 3.12.1 [M]: 90 % for three lanes, 75 % for four or more.
  CHECK(p.lfr.lane_reduction_for(3) == 0.90);
  CHECK(p.lfr.lane_reduction_for(5) == 0.75);
  // LRFD 3.6.2.1 [C]: IM 33 %; MBE C6A.4.4.3 [M]: 10 % smooth, 20 % minor deviations.
  CHECK(p.dynamic_allowance.for_surface("") == 0.33);
  CHECK(p.dynamic_allowance.for_surface("smooth") == 0.10);
  CHECK(p.dynamic_allowance.for_surface("minor_deviations") == 0.20);
  CHECK_FALSE(p.dynamic_allowance.for_surface("cobbles").has_value());
  // MBE 6A.8.3 [M]: posting (W / 0.7)(RF - 0.3); rounding down to 1 ton is common practice.
  CHECK(p.posting.equation_divisor == 0.7);
  CHECK(p.posting.equation_offset == 0.3);
  CHECK(p.posting.rounding == model::RoundingRule::down);
  TP_CHECK_CLOSE(p.posting.increment, 1.0 * kTon, 1e-12, 1.0);
  CHECK(p.minimum_condition_system_product == 0.85);
  CHECK(p.deadlines.rerate_after_capacity_loss_days == 90);
  CHECK(p.deadlines.post_after_rating_days == 30);
  CHECK(p.lrfr.permit_types.empty());
}

TEST_CASE("the legal-load factor interpolates in ADTT and uses its unknown value", "[io][policy]") {
  const model::Policy p = shipped_default();
  // MBE Table 6A.4.4.2.3a-1 [M]: 1.30 at ADTT <= 1000, 1.45 at >= 5000 or unknown.
  CHECK(p.lrfr.legal.gamma_ll(std::nullopt) == 1.45);
  CHECK(p.lrfr.legal.gamma_ll(100.0) == 1.30);
  CHECK(p.lrfr.legal.gamma_ll(9000.0) == 1.45);
  // Linear interpolation halfway between the rows (closed form): 1.30 + 0.5 x 0.15 = 1.375.
  TP_CHECK_CLOSE(p.lrfr.legal.gamma_ll(3000.0), 1.375, 1e-12, 1.0);
}

TEST_CASE("the LFR impact formula is 50 / (L + 125) capped at 0.30", "[io][policy]") {
  const model::Policy p = shipped_default();
  // Standard Specifications 3.8.2.1 [M], L in ft: at 100 ft, 50 / 225 = 0.2222.
  TP_CHECK_CLOSE(p.lfr.impact.at(100 * kFoot), 50.0 / 225.0, 1e-12, 1.0);
  // At 20 ft the formula gives 50 / 145 = 0.345, above the 0.30 cap.
  CHECK(p.lfr.impact.at(20 * kFoot) == 0.30);
}

TEST_CASE("condition factors follow the superstructure rating", "[io][policy]") {
  const model::Policy p = shipped_default();
  // MBE 6A.4.2.3 and its commentary [M]: >= 6 -> 1.00, 5 -> 0.95, <= 4 -> 0.85.
  CHECK(p.condition_factor(9) == 1.00);
  CHECK(p.condition_factor(6) == 1.00);
  CHECK(p.condition_factor(5) == 0.95);
  CHECK(p.condition_factor(4) == 0.85);
  CHECK(p.condition_factor(0) == 0.85);
  CHECK_FALSE(p.condition_factor(10).has_value());
}

TEST_CASE("the vehicle sets name load models of the library for their method", "[io][policy]") {
  const model::Policy p = shipped_default();
  const model::VehicleSet* lrfr = p.find_set(model::RatingMethod::lrfr);
  REQUIRE(lrfr != nullptr);
  CHECK(lrfr->id == "standard");
  CHECK(lrfr->load_models.front() == "HL93");
  const model::VehicleSet* lfr = p.find_set(model::RatingMethod::lfr, "standard");
  REQUIRE(lfr != nullptr);
  CHECK(lfr->load_models.front() == "HS20");
  CHECK(p.find_set(model::RatingMethod::lfr, "emergency") == nullptr);
  for (const model::VehicleSet& set : p.vehicle_sets)
    for (const std::string& id : set.load_models) {
      INFO(set.id << ": " << id);
      REQUIRE(p.vehicles.find_load_model(id) != nullptr);
      CHECK(p.vehicles.find_load_model(id)->rated_with(set.method));
    }
}

TEST_CASE("the Eastvale policy extends the default and overrides what it states", "[io][policy][extends]") {
  const model::Policy p = eastvale();
  CHECK(p.id == "eastvale-county");
  CHECK(p.version == "2025.1");
  REQUIRE(p.source_files.size() == 2);
  CHECK(p.source_files[1] == "<shipped>/policy/default.yaml");
  // A scalar in a mapping overrides; its sibling is inherited.
  CHECK(p.deadlines.rerate_after_capacity_loss_days == 60);
  CHECK(p.deadlines.post_after_rating_days == 30);
  // Mappings merge key by key: the default's riding surfaces stay, the new one joins.
  CHECK(p.dynamic_allowance.for_surface("smooth") == 0.10);
  CHECK(p.dynamic_allowance.for_surface("rough_approach") == 0.33);
  // A list replaces the inherited list whole.
  const model::VehicleSet* standard = p.find_set(model::RatingMethod::lrfr, "standard");
  REQUIRE(standard != nullptr);
  CHECK(standard->load_models.back() == "EVC-LOG5");
  CHECK(standard->load_models.size() == 13);
  // Sets the agency did not mention are inherited, and so is the default set name.
  CHECK(p.find_set(model::RatingMethod::lrfr, "design") != nullptr);
  CHECK(p.find_set(model::RatingMethod::lrfr)->id == "standard");
  // Inline vehicles join the shipped library.
  REQUIRE(p.vehicles.find_load_model("EVC-LOG5") != nullptr);
  CHECK(p.vehicles.find_load_model("HL93") != nullptr);
  TP_CHECK_CLOSE(p.vehicles.find_train("EVC-LOG5")->gross_weight(), 40.0 * kTon, 1e-12, 1.0);
  // Posting rules: the agency adds a minimum, keeps the default rounding.
  REQUIRE(p.posting.minimum_posting.has_value());
  TP_CHECK_CLOSE(*p.posting.minimum_posting, 3.0 * kTon, 1e-12, 1.0);
  CHECK(p.posting.rounding == model::RoundingRule::down);
  REQUIRE(p.confidentiality_notice.has_value());
  CHECK(p.confidentiality_notice->find("Eastvale County Road Commission") == 0);
  const model::PermitType* routine = p.lrfr.find_permit_type("routine");
  REQUIRE(routine != nullptr);
  CHECK(routine->rows.size() == 6);
  CHECK(p.lrfr.find_permit_type("single-trip-escorted")->dynamic_allowance == 0.0);
}

namespace {

PolicyReadResult read_pair(const std::string& base, const std::string& leaf, std::string_view name) {
  const std::filesystem::path dir = test::scratch_directory(name);
  test::write_file(dir / "base.yaml", base);
  test::write_file(dir / "leaf.yaml", leaf);
  return read_policy_file((dir / "leaf.yaml").string());
}

std::string default_text() { return test::read_file(source_path("engine/data/policy/default.yaml")); }

}  // namespace

TEST_CASE("override semantics: null removes, lists replace, mappings merge", "[io][policy][extends]") {
  const PolicyReadResult r = read_pair(default_text(), R"(format_version: 1
units: US
extends: base.yaml
id: leaf
version: "1"
dynamic_allowance:
  riding_surfaces:
    minor_deviations: null
lrfr:
  multiple_presence: [1.0]
vehicles:
  sets:
    LRFR:
      sets:
        emergency: null
)",
                                       "override-semantics");
  INFO(describe_all(r.diagnostics));
  REQUIRE(r.ok());
  const model::Policy& p = *r.policy;
  CHECK_FALSE(p.dynamic_allowance.for_surface("minor_deviations").has_value());
  CHECK(p.dynamic_allowance.for_surface("smooth") == 0.10);
  CHECK(p.lrfr.multiple_presence == std::vector<double>{1.0});
  CHECK(p.find_set(model::RatingMethod::lrfr, "emergency") == nullptr);
  CHECK(p.find_set(model::RatingMethod::lrfr, "legal") != nullptr);
  CHECK(p.lrfr.design.inventory == 1.75);  // untouched, inherited
}

TEST_CASE("a bad policy reports each problem at its file and line", "[io][policy][errors]") {
  const PolicyReadResult r = read_pair(default_text(), R"(format_version: 1
units: US
extends: base.yaml
id: leaf
version: "1"
lrfr:
  desing: {inventory: 1.75, operating: 1.35}
deadlines:
  post_after_rating_days: thirty
)",
                                       "bad-leaf");
  INFO(describe_all(r.diagnostics));
  CHECK_FALSE(r.ok());
  const Diagnostic* typo =
      find_diagnostic(r.diagnostics, Severity::error, "unknown field 'desing' (did you mean 'design'?)", 7);
  REQUIRE(typo != nullptr);
  CHECK(typo->where.file.find("leaf.yaml") != std::string::npos);
  CHECK(typo->field == "lrfr.desing");
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "expected a whole number (got 'thirty')", 9) != nullptr);
}

TEST_CASE("semantic rules of a policy are checked after the merge", "[io][policy][errors]") {
  const PolicyReadResult r = read_pair(default_text(), R"(format_version: 1
units: US
extends: base.yaml
id: leaf
version: "1"
vehicles:
  sets:
    LRFR:
      default: everything
      sets:
        standard: [HL93, HS20, TYPE-33]
condition_factor:
  - {from: 5, to: 9, phi_c: 1.0}
  - {from: 0, to: 3, phi_c: 0.85}
)",
                                       "semantic-leaf");
  INFO(describe_all(r.diagnostics));
  CHECK_FALSE(r.ok());
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "default set 'everything' is not one of the LRFR sets", 9) !=
        nullptr);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "load model 'HS20' is not rated with LRFR (its methods: LFR)",
                        11) != nullptr);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "unknown load model 'TYPE-33' (did you mean 'TYPE-3'?)", 11) !=
        nullptr);
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "rows must cover condition ratings 0 to 9; missing 4", 12) !=
        nullptr);
}

TEST_CASE("an extends chain must agree on units, give its own id and not loop", "[io][policy][errors]") {
  const std::string leaf_si = "format_version: 1\nunits: SI\nextends: base.yaml\nid: leaf\nversion: \"1\"\n";
  CHECK(find_diagnostic(read_pair(default_text(), leaf_si, "units").diagnostics, Severity::error,
                        "units SI differ from the policy it extends (US)", 2) != nullptr);

  const std::string no_id = "format_version: 1\nunits: US\nextends: base.yaml\n";
  const PolicyReadResult anonymous = read_pair(default_text(), no_id, "no-id");
  CHECK(find_diagnostic(anonymous.diagnostics, Severity::error, "an extending policy gives its own id") != nullptr);
  CHECK(find_diagnostic(anonymous.diagnostics, Severity::error, "an extending policy gives its own version") !=
        nullptr);

  const std::string loop = "format_version: 1\nunits: US\nextends: leaf.yaml\nid: a\nversion: \"1\"\n";
  const std::string leaf = "format_version: 1\nunits: US\nextends: base.yaml\nid: b\nversion: \"1\"\n";
  CHECK(find_diagnostic(read_pair(loop, leaf, "loop").diagnostics, Severity::error, "extends itself") != nullptr);

  const std::string missing = "format_version: 1\nunits: US\nextends: nowhere.yaml\nid: a\nversion: \"1\"\n";
  CHECK(find_diagnostic(read_pair(default_text(), missing, "missing").diagnostics, Severity::error,
                        "policy file not found", 3) != nullptr);
  const std::string unknown = "format_version: 1\nunits: US\nextends: defualt\nid: a\nversion: \"1\"\n";
  CHECK(find_diagnostic(read_pair(default_text(), unknown, "unknown").diagnostics, Severity::error,
                        "no shipped policy is named 'defualt' (did you mean 'default'?)", 3) != nullptr);
}

TEST_CASE("a bridge's policy is its rating.policy or the shipped default", "[io][policy]") {
  const BridgeReadResult willow = read_bridge_file(source_path("inventory/ev-0112-willow-run.yaml"));
  REQUIRE(willow.ok());
  const PolicyReadResult policy = read_policy_for_bridge(*willow.bridge);
  REQUIRE(policy.ok());
  CHECK(policy.policy->id == (willow.bridge->rating.policy.empty() ? "tenthpoint-default" : "eastvale-county"));
}
