// tenthpoint check: validate every bridge file of an inventory and summarise.
// Until the rating stages land this is also the main job of tools/demo: with
// --out it writes the check result and an inventory summary table.
#include <CLI/CLI.hpp>
#include <cstdio>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "engine/cli/command.h"
#include "engine/cli/console.h"
#include "engine/core/atomic_file.h"
#include "engine/core/units.h"
#include "engine/io/bridge_reader.h"
#include "engine/io/inventory_listing.h"

namespace tenthpoint::cli {
namespace {

struct FileOutcome {
  std::string file;
  Diagnostics diagnostics;
  std::optional<model::Bridge> bridge;

  [[nodiscard]] const char* status() const {
    if (!bridge) return "errors";
    return count(diagnostics, Severity::warning) > 0 ? "warnings" : "valid";
  }
};

nlohmann::json to_json(const Diagnostic& d) {
  return {{"severity", to_string(d.severity)}, {"file", d.where.file}, {"line", d.where.line},
          {"column", d.where.column},          {"field", d.field},      {"message", d.message}};
}

std::string csv_field(const std::string& text) {
  if (text.find_first_of(",\"\n") == std::string::npos) return text;
  std::string out = "\"";
  for (char c : text) out += c == '"' ? std::string("\"\"") : std::string(1, c);
  return out + "\"";
}

// One row per valid bridge: what an engineer scans to see the inventory.
std::string summary_csv(const std::vector<FileOutcome>& outcomes) {
  std::string out =
      "structure_id,name,file,units,spans,span_lengths,total_length,length_unit,material,composite,girders,"
      "method,latest_inspection,superstructure_condition,status\n";
  for (const FileOutcome& o : outcomes) {
    if (!o.bridge) {
      out += fmt::format(",,{},,,,,,,,,,,,errors\n", csv_field(o.file));
      continue;
    }
    const model::Bridge& b = *o.bridge;
    const auto len = [&](Real v) { return units::from_internal(v, units::Quantity::length, b.units); };
    std::string spans;
    for (Real s : b.geometry.span_lengths) spans += (spans.empty() ? "" : " ") + fmt::format("{:.6g}", len(s));
    const model::Inspection* latest = b.latest_inspection();
    out += fmt::format("{},{},{},{},{},{},{:.6g},{},{},{},{},{},{},{},{}\n", csv_field(b.identity.structure_id),
                       csv_field(b.identity.name), csv_field(o.file), units::to_string(b.units),
                       b.geometry.span_lengths.size(), spans, len(b.geometry.total_length()),
                       units::label(units::Quantity::length, b.units), model::to_string(b.materials.kind),
                       b.materials.composite ? "yes" : "no", b.girder_count(), model::to_string(b.rating.method),
                       latest ? latest->date.to_iso() : "", latest ? std::to_string(latest->superstructure_condition) : "",
                       o.status());
  }
  return out;
}

class CheckCommand final : public Command {
 public:
  CLI::App* declare(CLI::App& app) override {
    CLI::App* sub = app.add_subcommand("check", "Validate the bridge files of an inventory and summarise them");
    sub->add_option("inventory", paths_, "Inventory directories, list files or bridge files")->required();
    sub->add_option("--format", format_, "text or json")->check(CLI::IsMember({"text", "json"}))->capture_default_str();
    sub->add_option("--out", out_, "Also write check.json and inventory-summary.csv into this directory");
    sub->add_flag("--strict", strict_, "Count warnings as failures");
    return sub;
  }

  int run() override {
    const io::InventoryListing listing = io::list_inventory(paths_);
    std::vector<FileOutcome> outcomes;
    outcomes.reserve(listing.files.size());
    for (const std::string& file : listing.files) {
      io::BridgeReadResult read = io::read_bridge_file(file);
      outcomes.push_back({file, std::move(read.diagnostics), std::move(read.bridge)});
    }

    std::size_t valid = 0, warned = 0, failed = 0;
    for (const FileOutcome& o : outcomes) {
      const std::string status = o.status();
      if (status == "valid") ++valid;
      else if (status == "warnings") ++warned;
      else ++failed;
    }
    const bool listing_failed = has_errors(listing.diagnostics);
    const bool ok = !listing_failed && failed == 0 && (!strict_ || warned == 0) && !outcomes.empty();

    nlohmann::json doc;
    doc["bridges"] = outcomes.size();
    doc["valid"] = valid;
    doc["with_warnings"] = warned;
    doc["with_errors"] = failed;
    doc["inventory_diagnostics"] = nlohmann::json::array();
    for (const Diagnostic& d : listing.diagnostics) doc["inventory_diagnostics"].push_back(to_json(d));
    doc["files"] = nlohmann::json::array();
    for (const FileOutcome& o : outcomes) {
      nlohmann::json f{{"file", o.file}, {"status", o.status()}, {"diagnostics", nlohmann::json::array()}};
      if (o.bridge) f["structure_id"] = o.bridge->identity.structure_id;
      for (const Diagnostic& d : o.diagnostics) f["diagnostics"].push_back(to_json(d));
      doc["files"].push_back(std::move(f));
    }

    if (format_ == "json") {
      std::printf("%s\n", doc.dump(2).c_str());
    } else {
      print_diagnostics(listing.diagnostics);
      for (const FileOutcome& o : outcomes) print_diagnostics(o.diagnostics);
      std::printf("%zu bridges: %zu valid, %zu valid with warnings, %zu with errors\n", outcomes.size(), valid, warned,
                  failed);
      if (outcomes.empty()) std::printf("no bridge files found\n");
    }
    if (!out_.empty()) {
      write_file_atomically(std::filesystem::path(out_) / "check.json", doc.dump(2) + "\n");
      write_file_atomically(std::filesystem::path(out_) / "inventory-summary.csv", summary_csv(outcomes));
      if (format_ == "text") std::printf("wrote %s/check.json and %s/inventory-summary.csv\n", out_.c_str(), out_.c_str());
    }
    return ok ? kExitOk : kExitFindings;
  }

 private:
  std::vector<std::string> paths_;
  std::string format_ = "text";
  std::string out_;
  bool strict_ = false;
};

}  // namespace

std::unique_ptr<Command> make_check_command() { return std::make_unique<CheckCommand>(); }

}  // namespace tenthpoint::cli
