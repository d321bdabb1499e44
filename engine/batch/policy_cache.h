// PolicyCache: each distinct rating policy of a run read once, not once per
// bridge. Bridges name their policy by a reference relative to their own
// file (rating.policy, or none for the shipped default); references that
// resolve to the same file share one read, with its vehicle libraries.
//
// Thread-safe: workers ask concurrently; the first to ask for a policy reads
// it while later askers for the same policy wait, and askers for other
// policies proceed. A policy with errors is cached too, so every bridge that
// uses it fails with the same diagnostics (file, line and field in the
// policy) without reading it again.
#pragma once

#include <map>
#include <memory>
#include <mutex>
#include <string>
#include <vector>

#include "engine/io/policy_reader.h"
#include "engine/model/bridge.h"

namespace tenthpoint::batch {

struct CachedPolicy {
  io::PolicyReadResult read;
  // The files the policy was built from, for the inputs hash: its `extends`
  // chain (Policy::source_files) and the vehicle libraries its vehicles came
  // from, each once, as paths or "<shipped>/..." labels. Empty when the
  // policy could not be read.
  std::vector<std::string> dependencies;
};

class PolicyCache {
 public:
  // The policy `bridge` asks for, read on first use. Never null.
  [[nodiscard]] std::shared_ptr<const CachedPolicy> policy_for(const model::Bridge& bridge);

 private:
  struct Entry {
    std::once_flag once;
    std::shared_ptr<const CachedPolicy> value;
  };
  std::mutex mutex_;
  std::map<std::string, std::shared_ptr<Entry>> entries_;  // by resolved policy label
};

// The files a policy was built from (see CachedPolicy::dependencies).
[[nodiscard]] std::vector<std::string> policy_dependencies(const model::Policy& policy);

}  // namespace tenthpoint::batch
