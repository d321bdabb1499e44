#include "engine/cli/run_progress.h"

#include <algorithm>
#include <cmath>
#include <string>

#include <fmt/format.h>

namespace tenthpoint::cli {
namespace {

std::string duration_text(double seconds) {
  const long s = std::lround(std::max(0.0, seconds));
  if (s >= 3600) return fmt::format("{}h{:02}m", s / 3600, (s / 60) % 60);
  if (s >= 60) return fmt::format("{}m{:02}s", s / 60, s % 60);
  return fmt::format("{}s", s);
}

}  // namespace

RunProgress::RunProgress(RunProgressOptions options, std::FILE* out) : options_(options), out_(out) {}

void RunProgress::started(const batch::BatchProgress& progress) {
  started_ = std::chrono::steady_clock::now();
  last_shown_ = started_;
  done_at_start_ = progress.done();
  last_logged_done_ = progress.done();
  if (options_.terminal)
    show(progress, false);
  else
    std::fprintf(out_, "tenthpoint: %d bridges: %d unchanged (carried forward), %d to check and rate\n", progress.total,
                 progress.unchanged, progress.total - progress.done());
}

void RunProgress::bridge_done(const ledger::BridgeRecord& record, const batch::BatchProgress& progress) {
  if (record.status == ledger::BridgeStatus::failed) {
    clear_line();
    std::fprintf(out_, "%s: failed: %s\n", record.file.c_str(), record.reason.c_str());
    show(progress, false);
    return;
  }
  const auto now = std::chrono::steady_clock::now();
  if (options_.terminal) {
    if (now - last_shown_ >= options_.redraw) show(progress, false);
  } else if (now - last_shown_ >= options_.log_every ||
             progress.done() - last_logged_done_ >= options_.log_every_bridges) {
    show(progress, false);
  }
}

void RunProgress::finish(const batch::BatchProgress& progress) {
  if (options_.terminal) {
    show(progress, true);
    if (bar_shown_) std::fputc('\n', out_);
    bar_shown_ = false;
  }
  std::fflush(out_);
}

void RunProgress::clear_line() {
  if (options_.terminal && bar_shown_) std::fputs("\r\033[K", out_);
  bar_shown_ = false;
}

void RunProgress::show(const batch::BatchProgress& progress, bool final) {
  const auto now = std::chrono::steady_clock::now();
  last_shown_ = now;
  const double seconds = std::chrono::duration<double>(now - started_).count();
  const int worked = progress.done() - done_at_start_;
  const double rate = seconds > 0 ? worked / seconds : 0.0;
  const int remaining = progress.total - progress.done();
  const std::string left = remaining == 0 ? std::string("done")
                           : rate > 0     ? duration_text(remaining / rate) + " left"
                                          : std::string("...");
  const std::string counts =
      fmt::format("rated {}, unchanged {}, failed {}", progress.rated, progress.unchanged, progress.failed);
  if (options_.terminal) {
    constexpr int kWidth = 24;
    const int filled = progress.total > 0 ? kWidth * progress.done() / progress.total : kWidth;
    const std::string bar = std::string(static_cast<std::size_t>(filled), '#') +
                            std::string(static_cast<std::size_t>(kWidth - filled), '.');
    std::fprintf(out_, "\r\033[K[%s] %d/%d  %s  %.1f/s  %s", bar.c_str(), progress.done(), progress.total,
                 counts.c_str(), rate, final ? ("done in " + duration_text(seconds)).c_str() : left.c_str());
    bar_shown_ = true;
  } else {
    last_logged_done_ = progress.done();
    std::fprintf(out_, "tenthpoint: %d/%d bridges (%s), %.1f bridges/s, %s\n", progress.done(), progress.total,
                 counts.c_str(), rate, left.c_str());
  }
  std::fflush(out_);
}

}  // namespace tenthpoint::cli
