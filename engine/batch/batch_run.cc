#include "engine/batch/batch_run.h"

#include <atomic>
#include <cassert>
#include <chrono>
#include <filesystem>
#include <fstream>
#include <optional>
#include <set>
#include <thread>
#include <unordered_map>

#include <fmt/format.h>
#include <spdlog/spdlog.h>

#include "engine/batch/bounded_queue.h"
#include "engine/batch/bridge_job.h"
#include "engine/batch/dependency_index.h"
#include "engine/batch/inputs_hash.h"
#include "engine/batch/policy_cache.h"
#include "engine/batch/result_writer.h"
#include "engine/batch/utc_timestamp.h"
#include "engine/core/version.h"
#include "engine/io/bridge_reader.h"

namespace tenthpoint::batch {
namespace {

// Closes the queue and joins the workers however the writer leaves: a
// writer that throws must not leave workers blocked on a full queue.
class WorkerPool {
 public:
  explicit WorkerPool(BoundedQueue<BridgeOutcome>& queue) : queue_(queue) {}
  WorkerPool(const WorkerPool&) = delete;
  WorkerPool& operator=(const WorkerPool&) = delete;
  ~WorkerPool() { join(); }

  template <class Work>
  void start(int count, Work work) {
    for (int i = 0; i < count; ++i) threads_.emplace_back(work);
  }
  void join() {
    queue_.close();
    for (std::thread& t : threads_)
      if (t.joinable()) t.join();
    threads_.clear();
  }

 private:
  BoundedQueue<BridgeOutcome>& queue_;
  std::vector<std::thread> threads_;
};

// A file's bytes, exactly as io::read_text_file returns them for a good text
// file (so the hash agrees with the worker's), without its validation: a
// file that is not good text was never rated, so its hash cannot match and
// the worker reports it. Reads only the file's size, not the reader's cap.
std::optional<std::string> file_bytes(const std::string& path, std::size_t max_bytes) {
  std::error_code ec;
  const std::uintmax_t size = std::filesystem::file_size(path, ec);
  if (ec || size > max_bytes) return std::nullopt;
  std::ifstream in(path, std::ios::binary);
  if (!in) return std::nullopt;
  std::string bytes(static_cast<std::size_t>(size), '\0');
  in.read(bytes.data(), static_cast<std::streamsize>(bytes.size()));
  if (static_cast<std::size_t>(in.gcount()) != bytes.size() || in.peek() != std::char_traits<char>::eof())
    return std::nullopt;  // changed while read: let the worker read it properly
  return bytes;
}

void count_into(BatchProgress& progress, ledger::BridgeStatus status) {
  switch (status) {
    case ledger::BridgeStatus::rated:
      ++progress.rated;
      break;
    case ledger::BridgeStatus::unchanged:
      ++progress.unchanged;
      break;
    case ledger::BridgeStatus::failed:
      ++progress.failed;
      break;
  }
}

}  // namespace

bool BatchOptions::is_valid(std::string* why) const {
  if (jobs < 1) {
    if (why != nullptr) *why = fmt::format("jobs must be at least 1 (got {})", jobs);
    return false;
  }
  if (out_dir.empty()) {
    if (why != nullptr) *why = "no output directory";
    return false;
  }
  return true;
}

std::string policy_versions(const std::vector<ledger::BridgeRecord>& records) {
  std::set<std::string> distinct;
  for (const ledger::BridgeRecord& r : records)
    if (!r.policy_id.empty()) distinct.insert(r.policy_id + " " + r.policy_version);
  std::string out;
  for (const std::string& p : distinct) out += (out.empty() ? "" : "; ") + p;
  return out;
}

ledger::RunInfo run_batch(ledger::Ledger& ledger, ledger::RunInfo info, const std::vector<std::string>& files,
                          const BatchOptions& options, BatchObserver* observer) {
  [[maybe_unused]] std::string why;
  assert(options.is_valid(&why));
  const auto start = std::chrono::steady_clock::now();
  const auto elapsed = [&] { return std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count(); };

  if (info.started.empty()) info.started = utc_timestamp();
  if (info.engine_version.empty()) info.engine_version = kEngineVersion;
  info.id = ledger.begin_run(info);

  InputsHasher hasher(info.engine_version);
  PolicyCache policies;
  DependencyIndex index =
      options.dependency_index.empty() ? DependencyIndex{} : DependencyIndex::load(options.dependency_index);
  ResultWriter writer(ledger, info.id, options.out_dir, &index);
  BatchProgress progress;
  progress.total = static_cast<int>(files.size());

  // 1. The cheap incremental check: one ledger query, then bytes and hashes.
  std::unordered_map<std::string, ledger::Ledger::LastInputs> last;
  for (auto& [file, inputs] : ledger.all_last_inputs()) last.emplace(std::move(file), std::move(inputs));
  std::vector<BridgeJob> jobs;
  std::vector<std::string> unchanged;
  const io::BridgeReadOptions read_options;
  for (const std::string& file : files) {
    BridgeJob job{file, std::nullopt, options.all};
    const auto it = last.find(file);
    if (it != last.end()) job.last_inputs_hash = it->second.inputs_hash;
    const std::vector<std::string>* dependencies = index.find(file);
    if (!options.all && job.last_inputs_hash && dependencies != nullptr) {
      const std::optional<std::string> bytes = file_bytes(file, read_options.limits.max_file_bytes);
      if (bytes && hasher.inputs_hash(*bytes, *dependencies) == *job.last_inputs_hash &&
          writer.claim(it->second.structure_id, file)) {
        unchanged.push_back(it->second.structure_id);
        continue;
      }
    }
    jobs.push_back(std::move(job));
  }
  if (!unchanged.empty()) ledger.carry_forward(info.id, unchanged);
  progress.unchanged = static_cast<int>(unchanged.size());
  progress.elapsed_seconds = elapsed();
  spdlog::info("run {}: {} bridge files, {} unchanged, {} to rate on {} thread{}", info.id, files.size(),
               unchanged.size(), jobs.size(), options.jobs, options.jobs == 1 ? "" : "s");
  if (observer != nullptr) observer->started(progress);

  // 2 and 3. Workers rate; this thread writes.
  if (!jobs.empty()) {
    const JobContext context{&policies, &hasher, options.rating_date, info.id, info.started, false};
    const std::size_t capacity =
        options.queue_capacity > 0 ? options.queue_capacity : 2 * static_cast<std::size_t>(options.jobs);
    BoundedQueue<BridgeOutcome> queue(capacity);
    std::atomic<std::size_t> next{0};
    WorkerPool pool(queue);
    pool.start(std::min<int>(options.jobs, static_cast<int>(jobs.size())), [&] {
      for (std::size_t i = next++; i < jobs.size(); i = next++)
        if (!queue.push(run_bridge_job(jobs[i], context))) return;
    });
    for (std::size_t received = 0; received < jobs.size(); ++received) {
      std::optional<BridgeOutcome> outcome = queue.pop();
      assert(outcome.has_value());  // the queue closes only here, after the last outcome
      const ledger::BridgeRecord& record = writer.write(*outcome);
      count_into(progress, record.status);
      if (record.status == ledger::BridgeStatus::failed) spdlog::warn("{}: failed: {}", record.file, record.reason);
      progress.elapsed_seconds = elapsed();
      if (observer != nullptr) observer->bridge_done(record, progress);
    }
    pool.join();
  }

  // 4. Finish.
  if (!options.dependency_index.empty()) {
    try {
      index.save(options.dependency_index);
    } catch (const std::exception& e) {
      // A hint only (see dependency_index.h): the next run is slower, not wrong.
      spdlog::warn("{}", e.what());
    }
  }
  info.rated = progress.rated;
  info.unchanged = progress.unchanged;
  info.failed = progress.failed;
  info.policy_versions = policy_versions(ledger.run_results(info.id));
  info.finished = utc_timestamp();
  ledger.finish_run(info.id, info);
  spdlog::info("run {} finished: {} rated, {} unchanged, {} failed in {:.1f} s", info.id, info.rated, info.unchanged,
               info.failed, elapsed());
  return info;
}

}  // namespace tenthpoint::batch
