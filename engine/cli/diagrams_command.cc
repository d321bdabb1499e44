// tenthpoint diagrams: influence lines and dead-load diagrams of a bridge's
// girder lines as data (CSV or JSON), for plotting and for checking by hand.
#include <CLI/CLI.hpp>
#include <cstdio>
#include <string>
#include <vector>

#include <fmt/format.h>

#include "engine/analysis/girder_line_analysis.h"
#include "engine/cli/command.h"
#include "engine/cli/console.h"
#include "engine/core/atomic_file.h"
#include "engine/core/errors.h"
#include "engine/core/safe_file_name.h"
#include "engine/io/bridge_reader.h"
#include "engine/report/diagram_export.h"

namespace tenthpoint::cli {
namespace {

class DiagramsCommand final : public Command {
 public:
  CLI::App* declare(CLI::App& app) override {
    CLI::App* sub = app.add_subcommand("diagrams", "Write influence lines and dead-load diagrams of a bridge as data");
    sub->add_option("bridge", bridge_, "Bridge file")->required()->check(CLI::ExistingFile);
    sub->add_option("--girder", girders_, "Girder-line id (repeatable); all girder lines when omitted");
    sub->add_option("--format", format_, "csv or json")->check(CLI::IsMember({"csv", "json"}))->capture_default_str();
    sub->add_option("--out", out_, "Output directory; the data goes to standard output when omitted");
    sub->add_option("--samples", samples_, "Points written inside each cubic piece besides its knots")
        ->check(CLI::Range(0, 200))
        ->capture_default_str();
    return sub;
  }

  int run() override {
    Diagnostics warnings;
    model::Bridge bridge;
    try {
      bridge = io::load_bridge(bridge_, &warnings);
    } catch (const InputError& e) {
      print_diagnostics(e.diagnostics());
      return kExitFindings;
    }
    print_diagnostics(warnings);

    std::vector<analysis::GirderLineAnalysis> lines;
    try {
      for (const model::GirderLine& girder : bridge.girders) {
        if (!girders_.empty() && std::find(girders_.begin(), girders_.end(), girder.id) == girders_.end()) continue;
        lines.push_back(analysis::analyse_girder_line(bridge, girder));
      }
    } catch (const InputError& e) {
      print_diagnostics(e.diagnostics());
      return kExitFindings;
    } catch (const ModelError& e) {
      std::fprintf(stderr, "%s: error: %s\n", bridge_.c_str(), e.what());
      return kExitFindings;
    }
    if (lines.empty()) {
      std::fprintf(stderr, "%s: error: no girder line matches --girder\n", bridge_.c_str());
      return kExitFindings;
    }

    report::DiagramExportOptions options;
    options.interior_points = samples_;
    const std::string text = format_ == "json" ? report::diagrams_json(lines, bridge.units, options)
                                               : report::diagrams_csv(lines, bridge.units, options);
    if (out_.empty()) {
      std::fwrite(text.data(), 1, text.size(), stdout);
      return kExitOk;
    }
    const std::filesystem::path path = std::filesystem::path(out_) / safe_file_name(bridge.identity.structure_id) /
                                       fmt::format("diagrams.{}", format_);
    write_file_atomically(path, text);
    std::printf("%s\n", path.c_str());
    return kExitOk;
  }

 private:
  std::string bridge_;
  std::vector<std::string> girders_;
  std::string format_ = "csv";
  std::string out_;
  int samples_ = 8;
};

}  // namespace

std::unique_ptr<Command> make_diagrams_command() { return std::make_unique<DiagramsCommand>(); }

}  // namespace tenthpoint::cli
