// tenthpoint check: validate every bridge file of an inventory and summarise.
// Until the rating stages land this is also the main job of tools/demo: with
// --out it writes the check result and an inventory summary table.
#include <CLI/CLI.hpp>
#include <cstdio>
#include <string>
#include <vector>

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include "engine/core/csv_field.h"

#include "engine/cli/command.h"
#include "engine/cli/console.h"
#include "engine/core/atomic_file.h"
#include "engine/core/units.h"
#include "engine/io/inventory_check.h"

namespace tenthpoint::cli {
namespace {

nlohmann::json to_json(const Diagnostic& d) {
  return {{"severity", to_string(d.severity)}, {"file", d.where.file}, {"line", d.where.line},
          {"column", d.where.column},          {"field", d.field},     {"message", d.message}};
}

// One row per valid bridge: what an engineer scans to see the inventory.
std::string summary_csv(const std::vector<io::FileCheck>& files) {
  std::string out =
      "structure_id,name,file,units,spans,span_lengths,total_length,length_unit,material,composite,girders,"
      "method,latest_inspection,superstructure_condition,status\n";
  for (const io::FileCheck& f : files) {
    if (!f.bridge) {
      out +=
          fmt::format("{},,{},,,,,,,,,,,,{}\n", csv_field(f.structure_id), csv_field(f.path), io::to_string(f.status));
      continue;
    }
    const model::Bridge& b = *f.bridge;
    const auto len = [&](Real v) { return units::from_internal(v, units::Quantity::length, b.units); };
    std::string spans;
    for (Real s : b.geometry.span_lengths) spans += (spans.empty() ? "" : " ") + fmt::format("{:.6g}", len(s));
    const model::Inspection* latest = b.latest_inspection();
    out += fmt::format("{},{},{},{},{},{},{:.6g},{},{},{},{},{},{},{},{}\n", csv_field(b.identity.structure_id),
                       csv_field(b.identity.name), csv_field(f.path), units::to_string(b.units),
                       b.geometry.span_lengths.size(), spans, len(b.geometry.total_length()),
                       units::label(units::Quantity::length, b.units), model::to_string(b.materials.kind),
                       b.materials.composite ? "yes" : "no", b.girder_count(), model::to_string(b.rating.method),
                       latest ? latest->date.to_iso() : "",
                       latest ? std::to_string(latest->superstructure_condition) : "", io::to_string(f.status));
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
    const io::InventoryCheck result = io::check_inventory(paths_);
    const io::CheckTotals& t = result.totals;
    const bool ok = result.ok() && (!strict_ || t.warnings == 0) && t.files > 0;

    nlohmann::json doc;
    doc["bridges"] = t.files;
    doc["valid"] = t.valid;
    doc["with_warnings"] = t.with_warnings;
    doc["with_errors"] = t.with_errors;
    doc["inventory_diagnostics"] = nlohmann::json::array();
    for (const Diagnostic& d : result.inventory_diagnostics) doc["inventory_diagnostics"].push_back(to_json(d));
    doc["files"] = nlohmann::json::array();
    for (const io::FileCheck& f : result.files) {
      nlohmann::json entry{{"file", f.path},
                           {"structure_id", f.structure_id},
                           {"status", io::to_string(f.status)},
                           {"diagnostics", nlohmann::json::array()}};
      for (const Diagnostic& d : f.diagnostics) entry["diagnostics"].push_back(to_json(d));
      doc["files"].push_back(std::move(entry));
    }

    if (format_ == "json") {
      std::printf("%s\n", doc.dump(2).c_str());
    } else {
      print_diagnostics(result.inventory_diagnostics);
      for (const io::FileCheck& f : result.files) print_diagnostics(f.diagnostics);
      std::printf("%zu bridges: %zu valid, %zu valid with warnings, %zu with errors\n", t.files, t.valid,
                  t.with_warnings, t.with_errors);
      if (t.files == 0) std::printf("no bridge files found\n");
    }
    if (!out_.empty()) {
      const std::filesystem::path check_file = std::filesystem::path(out_) / "check.json";
      const std::filesystem::path summary_file = std::filesystem::path(out_) / "inventory-summary.csv";
      write_file_atomically(check_file, doc.dump(2) + "\n");
      write_file_atomically(summary_file, summary_csv(result.files));
      if (format_ == "text") std::printf("wrote %s and %s\n", check_file.c_str(), summary_file.c_str());
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
