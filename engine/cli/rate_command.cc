// tenthpoint rate: rate bridges and print (or write) their governing rating
// factors, ratings in tons and posting recommendation. One bridge that
// cannot be rated never stops the others: it is reported as failed with its
// reason and the exit code says so.
#include <CLI/CLI.hpp>
#include <cstdio>
#include <ctime>
#include <map>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "engine/cli/command.h"
#include "engine/cli/console.h"
#include "engine/core/atomic_file.h"
#include "engine/core/errors.h"
#include "engine/core/safe_file_name.h"
#include "engine/io/bridge_reader.h"
#include "engine/io/inventory_listing.h"
#include "engine/io/policy_reader.h"
#include "engine/pipeline/bridge_rating.h"

namespace tenthpoint::cli {
namespace {

using units::Quantity;

CalendarDate today() {
  const std::time_t now = std::time(nullptr);
  std::tm utc{};
  ::gmtime_r(&now, &utc);
  return CalendarDate{utc.tm_year + 1900, utc.tm_mon + 1, utc.tm_mday};
}

Real tons(Real weight, units::UnitSystem system) { return units::from_internal(weight, Quantity::weight_tons, system); }

Quantity effect_quantity(rating::RatedEffect e) {
  return e == rating::RatedEffect::shear ? Quantity::force : Quantity::moment;
}

nlohmann::json to_json(const pipeline::BridgeRating& r, const model::Bridge& b) {
  using nlohmann::json;
  const units::UnitSystem u = b.units;
  json doc{{"structure_id", r.bridge_id},
           {"name", b.identity.name},
           {"method", std::string(model::to_string(r.method))},
           {"policy", {{"id", r.policy_id}, {"version", r.policy_version}, {"edition", r.edition}}},
           {"vehicle_set", r.vehicle_set},
           {"rating_date", r.rating_date.to_iso()},
           {"inspection_date", r.inspection_date ? json(r.inspection_date->to_iso()) : json(nullptr)},
           {"units",
            {{"length", std::string(units::label(Quantity::length, u))},
             {"moment", std::string(units::label(Quantity::moment, u))},
             {"force", std::string(units::label(Quantity::force, u))},
             {"weight", std::string(units::label(Quantity::weight_tons, u))}}},
           {"caution",
            "Results support, and never replace, the judgment of a licensed engineer; factors and vehicles follow the "
            "configured policy; local codes govern."}};
  json governing = json::array();
  for (const pipeline::GoverningRating& g : r.governing) {
    const rating::PointRating& p = g.at;
    const Quantity q = effect_quantity(p.effect);
    governing.push_back({{"load_model", g.load_model_id},
                         {"category", std::string(model::to_string(g.category))},
                         {"level", std::string(model::to_string(g.level))},
                         {"rating_factor", p.result.rating_factor},
                         {"rating_tons", g.rating_weight_rated ? json(tons(*g.rating_weight_rated, u)) : json(nullptr)},
                         {"girder", g.girder_id},
                         {"station", units::from_internal(p.station, Quantity::length, u)},
                         {"point", p.label},
                         {"effect", std::string(rating::to_string(p.effect))},
                         {"side", p.side},
                         {"limit_state", std::string(rating::to_string(p.limit_state))},
                         {"capacity", units::from_internal(p.result.capacity, q, u)},
                         {"permanent_factored", units::from_internal(p.result.permanent, q, u)},
                         {"live_factored", units::from_internal(p.result.live, q, u)},
                         {"capacity_factor", p.capacity_factor},
                         {"distribution_factor", p.distribution},
                         {"impact", p.impact},
                         {"gamma_ll", p.gamma_ll},
                         {"governing_case", p.case_id},
                         {"screened_out", g.screened_out},
                         {"screening_reason", g.screening_reason}});
  }
  doc["governing"] = std::move(governing);
  doc["screening"] = r.screening;
  json postings = json::array();
  for (const pipeline::VehiclePosting& p : r.postings)
    postings.push_back(
        {{"load_model", p.load_model_id},
         {"rating_factor", p.rating_factor},
         {"status", std::string(rating::to_string(p.decision.status))},
         {"posted_weight",
          p.decision.status == rating::PostingStatus::post ? json(tons(p.decision.posted_weight, u)) : json(nullptr)},
         {"reason", p.decision.reason}});
  doc["postings"] = std::move(postings);
  doc["recommendation"] = {{"status", std::string(rating::to_string(r.recommendation))},
                           {"reason", r.recommendation_reason}};
  doc["deadlines"] = {{"rerate_by", r.deadlines.rerate_by ? json(r.deadlines.rerate_by->to_iso()) : json(nullptr)},
                      {"post_by", r.deadlines.post_by ? json(r.deadlines.post_by->to_iso()) : json(nullptr)}};
  doc["warnings"] = r.warnings;
  return doc;
}

void print_summary(const pipeline::BridgeRating& r, const model::Bridge& b) {
  std::printf("%s  %s  (%s, policy %s %s)\n", r.bridge_id.c_str(), b.identity.name.c_str(),
              std::string(model::to_string(r.method)).c_str(), r.policy_id.c_str(), r.policy_version.c_str());
  for (const pipeline::GoverningRating& g : r.governing) {
    const std::string weight = g.rating_weight_rated ? fmt::format("{:7.1f} {}", tons(*g.rating_weight_rated, b.units),
                                                                   units::label(Quantity::weight_tons, b.units))
                                                     : std::string(9, ' ');
    std::printf("  %-10s %-9s RF %6.2f %s  %s, %s, %s%s\n", g.load_model_id.c_str(),
                std::string(model::to_string(g.level)).c_str(), g.at.result.rating_factor, weight.c_str(),
                g.girder_id.c_str(), g.at.label.c_str(), std::string(rating::to_string(g.at.effect)).c_str(),
                g.screened_out ? "  [screened out]" : "");
  }
  for (const std::string& s : r.screening) std::printf("  screening: %s\n", s.c_str());
  std::printf("  recommendation: %s (%s)\n", std::string(rating::to_string(r.recommendation)).c_str(),
              r.recommendation_reason.c_str());
  for (const pipeline::VehiclePosting& p : r.postings)
    if (p.decision.status != rating::PostingStatus::none)
      std::printf("    %s: %s\n", p.load_model_id.c_str(), p.decision.reason.c_str());
  if (r.deadlines.rerate_by) std::printf("  re-rate by %s\n", r.deadlines.rerate_by->to_iso().c_str());
  if (r.deadlines.post_by) std::printf("  post by %s\n", r.deadlines.post_by->to_iso().c_str());
}

class RateCommand final : public Command {
 public:
  CLI::App* declare(CLI::App& app) override {
    CLI::App* sub = app.add_subcommand("rate", "Rate bridges: governing rating factors, ratings in tons, posting");
    sub->add_option("inventory", paths_, "Inventory directories, list files or bridge files")->required();
    sub->add_option("--bridge", bridge_id_, "Rate only the bridge with this structure id");
    sub->add_option("--out", out_, "Write <out>/<structure id>/rating.json for every bridge rated");
    sub->add_option("--format", format_, "text or json")->check(CLI::IsMember({"text", "json"}))->capture_default_str();
    sub->add_option("--date", date_, "Rating date YYYY-MM-DD (default: today, UTC)");
    return sub;
  }

  int run() override {
    CalendarDate rating_date = today();
    if (!date_.empty()) {
      const auto parsed = parse_calendar_date(date_);
      if (!parsed) {
        std::fprintf(stderr, "tenthpoint: --date: '%s' is not a date; expected YYYY-MM-DD\n", date_.c_str());
        return kExitUsage;
      }
      rating_date = *parsed;
    }
    const io::InventoryListing listing = io::list_inventory(paths_);
    print_diagnostics(listing.diagnostics);
    int rated = 0, failed = 0;
    nlohmann::json all = nlohmann::json::array();
    for (const std::string& file : listing.files) {
      Diagnostics warnings;
      try {
        const model::Bridge bridge = io::load_bridge(file, &warnings);
        if (!bridge_id_.empty() && bridge.identity.structure_id != bridge_id_) continue;
        const io::PolicyReadResult policy = io::read_policy_for_bridge(bridge);
        if (!policy.ok()) throw InputError(policy.diagnostics);
        const pipeline::BridgeRating result = pipeline::rate_bridge(bridge, *policy.policy, rating_date);
        const nlohmann::json doc = to_json(result, bridge);
        if (format_ == "text") print_summary(result, bridge);
        all.push_back(doc);
        if (!out_.empty())
          write_file_atomically(
              std::filesystem::path(out_) / safe_file_name(bridge.identity.structure_id) / "rating.json",
              doc.dump(1) + "\n");
        ++rated;
      } catch (const InputError& e) {
        ++failed;
        std::fprintf(stderr, "%s: failed: input\n", file.c_str());
        print_diagnostics(e.diagnostics());
        all.push_back({{"file", file}, {"status", "failed"}, {"reason", e.what()}});
      } catch (const ModelError& e) {
        ++failed;
        std::fprintf(stderr, "%s: failed: %s\n", file.c_str(), e.what());
        all.push_back({{"file", file}, {"status", "failed"}, {"reason", e.what()}});
      }
    }
    if (format_ == "json") std::printf("%s\n", all.dump(1).c_str());
    if (rated == 0 && failed == 0) {
      std::fprintf(stderr, "tenthpoint: no bridge %s\n",
                   bridge_id_.empty() ? "files found" : fmt::format("with structure id '{}'", bridge_id_).c_str());
      return kExitFindings;
    }
    if (format_ == "text") std::printf("%d bridges rated, %d failed\n", rated, failed);
    return failed == 0 && !has_errors(listing.diagnostics) ? kExitOk : kExitFindings;
  }

 private:
  std::vector<std::string> paths_;
  std::string bridge_id_;
  std::string out_;
  std::string format_ = "text";
  std::string date_;
};

}  // namespace

std::unique_ptr<Command> make_rate_command() { return std::make_unique<RateCommand>(); }

}  // namespace tenthpoint::cli
