// RunProgress: how a nightly run shows its progress on stderr. On a terminal,
// one line redrawn in place (a bar, bridges done, rated/unchanged/failed, the
// rate and the time left); off a terminal (a scheduler's log file), a plain
// line every few seconds or every so many bridges. Failed bridges are printed
// as they happen either way ("file: failed: reason"), above the bar.
#pragma once

#include <chrono>
#include <cstdio>

#include "engine/batch/batch_run.h"

namespace tenthpoint::cli {

struct RunProgressOptions {
  bool terminal = false;                  // redraw one line in place
  std::chrono::milliseconds redraw{100};  // terminal: at most this often
  std::chrono::seconds log_every{10};     // off a terminal: at least this often...
  int log_every_bridges = 500;            // ...or after this many bridges
};

class RunProgress final : public batch::BatchObserver {
 public:
  explicit RunProgress(RunProgressOptions options, std::FILE* out = stderr);

  void started(const batch::BatchProgress& progress) override;
  void bridge_done(const ledger::BridgeRecord& record, const batch::BatchProgress& progress) override;
  // Leaves the terminal on a fresh line after the last redraw.
  void finish(const batch::BatchProgress& progress);

 private:
  void show(const batch::BatchProgress& progress, bool final);
  void clear_line();

  RunProgressOptions options_;
  std::FILE* out_;
  bool bar_shown_ = false;
  int done_at_start_ = 0;  // carried forward before the workers started
  std::chrono::steady_clock::time_point started_;
  std::chrono::steady_clock::time_point last_shown_;
  int last_logged_done_ = 0;
};

}  // namespace tenthpoint::cli
