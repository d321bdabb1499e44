// bench_rate_bridge: the in-process cost of rating one bridge, over an
// inventory (typically one written by tenthpoint_generate_inventory).
//
//   tenthpoint_bench_rate_bridge [--digest FILE] [--date YYYY-MM-DD] PATH...
//
// For every bridge file: io::load_bridge (YAML, schema, checks, model), the
// policy (read once per policy file and kept, as a batch run does), and
// pipeline::rate_bridge. It prints the wall and CPU time of each part per
// bridge, and the peak resident set size. With --digest it writes every
// governing rating factor at full precision, one line per bridge, so that two
// builds can be compared for identical results (diff the files).
//
// This is a tool: it prints to stdout; nothing here is asserted.
#include <sys/resource.h>

#include <chrono>
#include <cstdio>
#include <ctime>
#include <filesystem>
#include <map>
#include <string>
#include <vector>

#include <fmt/format.h>

#include "engine/core/atomic_file.h"
#include "engine/core/calendar_date.h"
#include "engine/core/errors.h"
#include "engine/io/bridge_reader.h"
#include "engine/io/inventory_listing.h"
#include "engine/io/policy_reader.h"
#include "engine/pipeline/bridge_rating.h"

using namespace tenthpoint;

namespace {

struct Clock {
  std::chrono::steady_clock::time_point wall = std::chrono::steady_clock::now();
  std::clock_t cpu = std::clock();
};

struct Total {
  double wall_s = 0;
  double cpu_s = 0;
  void add(const Clock& since) {
    wall_s += std::chrono::duration<double>(std::chrono::steady_clock::now() - since.wall).count();
    cpu_s += static_cast<double>(std::clock() - since.cpu) / CLOCKS_PER_SEC;
  }
};

long peak_rss_kib() {
  rusage usage{};
  getrusage(RUSAGE_SELF, &usage);
  return usage.ru_maxrss;  // KiB on Linux
}

}  // namespace

int main(int argc, char** argv) {
  std::vector<std::string> paths;
  std::string digest_path;
  CalendarDate date{2026, 1, 15};
  for (int i = 1; i < argc; ++i) {
    const std::string a = argv[i];
    if (a == "--digest" && i + 1 < argc) {
      digest_path = argv[++i];
    } else if (a == "--date" && i + 1 < argc) {
      const auto parsed = parse_calendar_date(argv[++i]);
      if (!parsed) {
        std::fprintf(stderr, "bench_rate_bridge: --date: '%s' is not YYYY-MM-DD\n", argv[i]);
        return 2;
      }
      date = *parsed;
    } else if (!a.empty() && a[0] == '-') {
      std::fprintf(stderr, "usage: tenthpoint_bench_rate_bridge [--digest FILE] [--date YYYY-MM-DD] PATH...\n");
      return 2;
    } else {
      paths.push_back(a);
    }
  }
  const io::InventoryListing listing = io::list_inventory(paths);
  if (listing.files.empty()) {
    std::fprintf(stderr, "bench_rate_bridge: no bridge files\n");
    return 2;
  }

  std::map<std::string, model::Policy> policies;  // by resolved policy file
  Total load, policy, rate;
  std::string digest;
  int rated = 0, failed = 0;
  std::size_t girder_lines = 0;
  const Clock start;
  for (const std::string& file : listing.files) {
    try {
      Clock t;
      const model::Bridge bridge = io::load_bridge(file);
      load.add(t);
      t = Clock{};
      const std::string key =
          bridge.rating.policy.empty()
              ? std::string("(shipped default)")
              : (std::filesystem::path(file).parent_path() / bridge.rating.policy).lexically_normal().string();
      auto it = policies.find(key);
      if (it == policies.end()) {
        io::PolicyReadResult read = io::read_policy_for_bridge(bridge);
        if (!read.ok()) throw InputError(read.diagnostics);
        it = policies.emplace(key, std::move(*read.policy)).first;
      }
      policy.add(t);
      t = Clock{};
      const pipeline::BridgeRating r = pipeline::rate_bridge(bridge, it->second, date);
      rate.add(t);
      girder_lines += r.girders.size();
      ++rated;
      if (!digest_path.empty()) {
        digest += r.bridge_id;
        for (const pipeline::GoverningRating& g : r.governing)
          digest +=
              fmt::format(" {}:{}:{:.17g}", g.load_model_id, model::to_string(g.level), g.at.result.rating_factor);
        digest += fmt::format(" {}\n", rating::to_string(r.recommendation));
      }
    } catch (const InputError& e) {
      ++failed;
      std::fprintf(stderr, "%s: failed: %s\n", file.c_str(), e.what());
    } catch (const ModelError& e) {
      ++failed;
      std::fprintf(stderr, "%s: failed: %s\n", file.c_str(), e.what());
    }
  }
  Total all;
  all.add(start);
  if (!digest_path.empty()) write_file_atomically(digest_path, digest);

  const double n = rated > 0 ? rated : 1;
  std::printf("bridges rated %d, failed %d, girder lines %zu\n", rated, failed, girder_lines);
  std::printf("%-28s %10s %10s %14s\n", "part", "wall s", "CPU s", "CPU ms/bridge");
  const auto row = [&](const char* name, const Total& t) {
    std::printf("%-28s %10.3f %10.3f %14.3f\n", name, t.wall_s, t.cpu_s, 1e3 * t.cpu_s / n);
  };
  row("load_bridge (read, check)", load);
  row("policy (once per file)", policy);
  row("rate_bridge", rate);
  row("all", all);
  std::printf("peak RSS %.1f MiB\n", static_cast<double>(peak_rss_kib()) / 1024.0);
  return failed == 0 ? 0 : 1;
}
