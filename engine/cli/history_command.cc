// tenthpoint history: one bridge's ratings over time, from the ledger. Each
// run that has a record of the bridge is one line (oldest first); the
// governing rating factors of the runs that computed them are set side by
// side, so a drop after an inspection shows at a glance; the latest record's
// governing cases and postings follow.
#include <CLI/CLI.hpp>
#include <cstdio>
#include <map>
#include <set>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "engine/cli/command.h"
#include "engine/cli/ledger_output.h"
#include "engine/ledger/ledger.h"

namespace tenthpoint::cli {
namespace {

std::string or_dash(const std::optional<std::string>& text) { return text && !text->empty() ? *text : "-"; }
std::string or_dash(const std::string& text) { return text.empty() ? "-" : text; }

std::string history_text(const std::string& id, const std::vector<ledger::HistoryEntry>& entries,
                         const std::filesystem::path& ledger_path) {
  const ledger::BridgeRecord& latest = entries.back().record;
  std::string out = fmt::format("{}  {}\nledger {}: {} run{} with a record of this bridge\n\n", id,
                                latest.name.empty() ? "(no name recorded)" : latest.name, ledger_path.string(),
                                entries.size(), entries.size() == 1 ? "" : "s");

  std::vector<std::vector<std::string>> runs{
      {"run", "started", "status", "method", "policy", "recommendation", "rerate by", "post by", "note"}};
  for (const ledger::HistoryEntry& e : entries) {
    const ledger::BridgeRecord& r = e.record;
    std::string note;
    if (r.status == ledger::BridgeStatus::failed) note = r.reason;
    if (r.carried_from) note = fmt::format("inputs unchanged: ratings of run {}", *r.carried_from);
    runs.push_back({std::to_string(e.run), e.run_started, std::string(ledger::to_string(r.status)), or_dash(r.method),
                    r.policy_id.empty() ? "-" : r.policy_id + " " + r.policy_version, or_dash(r.recommendation),
                    or_dash(r.rerate_by), or_dash(r.post_by), note});
  }
  out += text_table(runs, {0});

  // Rating factors side by side: the runs that computed a rating (rated, or
  // failed to), and the latest run whatever it was. Carried runs repeat the
  // values of the run they carry, so they add no column of their own.
  std::vector<const ledger::HistoryEntry*> columns;
  for (const ledger::HistoryEntry& e : entries)
    if (e.record.status != ledger::BridgeStatus::unchanged || &e == &entries.back()) columns.push_back(&e);
  std::vector<std::pair<std::string, std::string>> keys;  // load model, level, in first-seen order
  std::set<std::pair<std::string, std::string>> seen;
  for (const auto* e : columns)
    for (const ledger::GoverningRow& g : e->record.governing)
      if (seen.insert({g.load_model_id, g.level}).second) keys.emplace_back(g.load_model_id, g.level);
  if (!keys.empty()) {
    std::vector<std::vector<std::string>> table;
    std::vector<std::string> header{"rating factor", ""};
    for (const auto* e : columns) header.push_back(fmt::format("run {}", e->run));
    table.push_back(header);
    bool any_screened = false;
    for (const auto& [model, level] : keys) {
      std::vector<std::string> row{model, level};
      for (const auto* e : columns) {
        std::string cell = "-";
        for (const ledger::GoverningRow& g : e->record.governing)
          if (g.load_model_id == model && g.level == level) {
            cell = rating_text(g.rating_factor) + (g.screened_out ? "*" : " ");
            any_screened = any_screened || g.screened_out;
          }
        row.push_back(cell == "-" ? "- " : cell);
      }
      table.push_back(row);
    }
    std::vector<std::size_t> right;
    for (std::size_t c = 2; c < header.size(); ++c) right.push_back(c);
    out += "\n" + text_table(table, right);
    if (any_screened) out += "* screened out (does not govern the posting)\n";
  }

  if (!latest.governing.empty()) {
    out += fmt::format("\ngoverning cases in run {}:\n", entries.back().run);
    std::vector<std::vector<std::string>> table;
    for (const ledger::GoverningRow& g : latest.governing)
      table.push_back({"  " + g.load_model_id, g.level, "RF " + rating_text(g.rating_factor),
                       g.rating_weight ? fmt::format("{:.1f} {}", *g.rating_weight, latest.weight_unit) : "",
                       g.girder_id, g.point, g.effect, g.limit_state});
    out += text_table(table, {2, 3});
  }
  if (!latest.postings.empty()) {
    out += fmt::format("\npostings in run {}:\n", entries.back().run);
    std::vector<std::vector<std::string>> table;
    for (const ledger::PostingRow& p : latest.postings)
      table.push_back({"  " + p.load_model_id, "RF " + rating_text(p.rating_factor), p.status,
                       p.posted_weight ? fmt::format("{:.1f} {}", *p.posted_weight, latest.weight_unit) : "",
                       p.reason});
    out += text_table(table, {1, 3});
  }
  if (!latest.recommendation.empty())
    out += fmt::format("\nrecommendation: {}{}\n", latest.recommendation,
                       latest.recommendation_reason.empty() ? "" : " (" + latest.recommendation_reason + ")");
  return out;
}

class HistoryCommand final : public Command {
 public:
  CLI::App* declare(CLI::App& app) override {
    CLI::App* sub = app.add_subcommand(
        "history",
        "Show one bridge's ratings over time from the ledger (exit 0; 1 when the ledger has no record of it)");
    sub->add_option("structure_id", structure_id_, "Structure id of the bridge")->required();
    add_ledger_options(sub, location_);
    sub->add_option("--format", format_, "text or json")->check(CLI::IsMember({"text", "json"}))->capture_default_str();
    return sub;
  }

  int run() override {
    std::optional<ledger::Ledger> ledger = open_existing_ledger(location_);
    if (!ledger) return kExitUsage;
    const std::vector<ledger::HistoryEntry> entries = ledger->history(structure_id_);
    if (format_ == "json") {
      nlohmann::json doc{{"ledger", location_.path().string()}, {"structure_id", structure_id_}};
      nlohmann::json list = nlohmann::json::array();
      for (const ledger::HistoryEntry& e : entries)
        list.push_back({{"run", e.run}, {"run_started", e.run_started}, {"record", record_json(e.record)}});
      doc["entries"] = std::move(list);
      std::printf("%s\n", doc.dump(2).c_str());
    } else if (!entries.empty()) {
      const std::string text = history_text(structure_id_, entries, location_.path());
      std::fwrite(text.data(), 1, text.size(), stdout);
    }
    if (entries.empty()) {
      std::fprintf(stderr, "tenthpoint: the ledger %s has no record of structure '%s'\n",
                   location_.path().string().c_str(), structure_id_.c_str());
      return kExitFindings;
    }
    return kExitOk;
  }

 private:
  std::string structure_id_;
  LedgerLocation location_;
  std::string format_ = "text";
};

}  // namespace

std::unique_ptr<Command> make_history_command() { return std::make_unique<HistoryCommand>(); }

}  // namespace tenthpoint::cli
