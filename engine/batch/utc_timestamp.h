// The time of a run as the ledger records it: ISO 8601 in UTC to the second,
// e.g. "2026-12-01T02:00:00Z" (RunInfo::started, RunInfo::finished).
#pragma once

#include <chrono>
#include <string>

namespace tenthpoint::batch {

[[nodiscard]] std::string utc_timestamp(std::chrono::system_clock::time_point when = std::chrono::system_clock::now());

}  // namespace tenthpoint::batch
