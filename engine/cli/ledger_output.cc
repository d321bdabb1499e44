#include "engine/cli/ledger_output.h"

#include <algorithm>
#include <cstdio>

#include <fmt/format.h>

namespace tenthpoint::cli {

std::filesystem::path LedgerLocation::path() const {
  return ledger.empty() ? std::filesystem::path(out) / "ledger.sqlite" : std::filesystem::path(ledger);
}

void add_ledger_options(CLI::App* sub, LedgerLocation& location) {
  sub->add_option("--ledger", location.ledger, "Ledger file (default: <out>/ledger.sqlite)");
  sub->add_option("--out", location.out, "Output directory of the runs")->capture_default_str();
}

std::optional<ledger::Ledger> open_existing_ledger(const LedgerLocation& location) {
  const std::filesystem::path path = location.path();
  std::error_code ec;
  if (!std::filesystem::is_regular_file(path, ec)) {
    std::fprintf(stderr, "tenthpoint: no ledger at %s; a run of `tenthpoint rate` writes one (or give --ledger FILE)\n",
                 path.string().c_str());
    return std::nullopt;
  }
  try {
    return ledger::Ledger::open(path);
  } catch (const ledger::LedgerError& e) {
    std::fprintf(stderr, "tenthpoint: %s\n", e.what());
    return std::nullopt;
  }
}

nlohmann::json record_json(const ledger::BridgeRecord& r) {
  using nlohmann::json;
  const auto optional_text = [](const std::optional<std::string>& v) { return v ? json(*v) : json(nullptr); };
  const auto optional_number = [](const std::optional<double>& v) { return v ? json(*v) : json(nullptr); };
  json governing = json::array();
  for (const ledger::GoverningRow& g : r.governing)
    governing.push_back({{"load_model", g.load_model_id},
                         {"name", g.name},
                         {"category", g.category},
                         {"level", g.level},
                         {"rating_factor", g.rating_factor},
                         {"rating_weight", optional_number(g.rating_weight)},
                         {"girder", g.girder_id},
                         {"station_m", g.station},
                         {"point", g.point},
                         {"effect", g.effect},
                         {"limit_state", g.limit_state},
                         {"screened_out", g.screened_out}});
  json postings = json::array();
  for (const ledger::PostingRow& p : r.postings)
    postings.push_back({{"load_model", p.load_model_id},
                        {"rating_factor", p.rating_factor},
                        {"status", p.status},
                        {"posted_weight", optional_number(p.posted_weight)},
                        {"reason", p.reason}});
  return json{{"structure_id", r.structure_id},
              {"name", r.name},
              {"file", r.file},
              {"inputs_hash", r.inputs_hash},
              {"status", std::string(ledger::to_string(r.status))},
              {"reason", r.reason},
              {"carried_from_run", r.carried_from ? json(*r.carried_from) : json(nullptr)},
              {"method", r.method},
              {"policy", {{"id", r.policy_id}, {"version", r.policy_version}, {"edition", r.edition}}},
              {"vehicle_set", r.vehicle_set},
              {"rating_date", r.rating_date},
              {"inspection_date", optional_text(r.inspection_date)},
              {"weight_unit", r.weight_unit},
              {"governing", std::move(governing)},
              {"postings", std::move(postings)},
              {"recommendation", {{"status", r.recommendation}, {"reason", r.recommendation_reason}}},
              {"deadlines", {{"rerate_by", optional_text(r.rerate_by)}, {"post_by", optional_text(r.post_by)}}},
              {"warning_count", r.warning_count}};
}

std::string text_table(const std::vector<std::vector<std::string>>& rows, const std::vector<std::size_t>& right) {
  std::vector<std::size_t> width;
  for (const auto& row : rows)
    for (std::size_t c = 0; c < row.size(); ++c) {
      if (width.size() <= c) width.resize(c + 1, 0);
      width[c] = std::max(width[c], row[c].size());
    }
  std::string out;
  for (const auto& row : rows) {
    std::string line;
    for (std::size_t c = 0; c < row.size(); ++c) {
      const bool last = c + 1 == row.size();
      const bool align_right = std::find(right.begin(), right.end(), c) != right.end();
      if (c > 0) line += "  ";
      if (align_right)
        line += fmt::format("{:>{}}", row[c], width[c]);
      else
        line += last ? row[c] : fmt::format("{:<{}}", row[c], width[c]);
    }
    line.erase(line.find_last_not_of(' ') + 1);
    out += line + '\n';
  }
  return out;
}

std::string rating_text(double rating_factor) { return fmt::format("{:.2f}", rating_factor); }

}  // namespace tenthpoint::cli
