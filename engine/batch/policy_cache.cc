#include "engine/batch/policy_cache.h"

#include <algorithm>
#include <filesystem>
#include <optional>

#include "engine/io/data_reference.h"

namespace tenthpoint::batch {
namespace {

std::shared_ptr<const CachedPolicy> read(const model::Bridge& bridge) {
  auto cached = std::make_shared<CachedPolicy>();
  cached->read = io::read_policy_for_bridge(bridge);
  if (cached->read.policy) cached->dependencies = policy_dependencies(*cached->read.policy);
  return cached;
}

}  // namespace

std::vector<std::string> policy_dependencies(const model::Policy& policy) {
  std::vector<std::string> files = policy.source_files;
  // A library's trains and load models remember the file they were read
  // from; inline vehicles name the policy file itself. A library whose every
  // vehicle was overridden contributes nothing to a rating and is not listed.
  for (const model::AxleTrain& train : policy.vehicles.trains) files.push_back(train.where.file);
  for (const model::LoadModel& load_model : policy.vehicles.load_models) files.push_back(load_model.where.file);
  files.erase(std::remove(files.begin(), files.end(), std::string()), files.end());
  std::sort(files.begin(), files.end());
  files.erase(std::unique(files.begin(), files.end()), files.end());
  return files;
}

std::shared_ptr<const CachedPolicy> PolicyCache::policy_for(const model::Bridge& bridge) {
  // The key is the reference resolved the way the reader resolves it, so
  // "../policies/eastvale.yaml" from two directories that meet in the same
  // file share one entry. A reference that does not resolve is not cached:
  // the reader reports it at the bridge's own line; nor is a missing policy
  // file, for the same reason.
  std::string why;
  const std::optional<io::DataReference> reference = io::resolve_policy_reference(
      bridge.rating.policy.empty() ? std::string_view("default") : std::string_view(bridge.rating.policy),
      bridge.source_file, why);
  if (!reference || (!reference->shipped_contents && !std::filesystem::exists(reference->path))) return read(bridge);
  std::shared_ptr<Entry> entry;
  {
    const std::lock_guard lock(mutex_);
    std::shared_ptr<Entry>& slot = entries_[reference->label];
    if (!slot) slot = std::make_shared<Entry>();
    entry = slot;
  }
  std::call_once(entry->once, [&] { entry->value = read(bridge); });
  return entry->value;
}

}  // namespace tenthpoint::batch
