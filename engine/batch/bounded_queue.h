// BoundedQueue: a blocking multi-producer queue with a fixed capacity, the
// channel from the rating workers to the one writer of a run. The capacity
// bounds the results in flight, so a 10,000-bridge run holds a few ratings
// in memory at a time however fast the workers are against the disk.
//
// close() wakes everyone: push() then refuses (returns false) and pop()
// drains what is left, then returns nullopt. The writer closes the queue when
// it stops early (an unwritable output directory), which stops the workers.
#pragma once

#include <cassert>
#include <condition_variable>
#include <cstddef>
#include <deque>
#include <mutex>
#include <optional>

namespace tenthpoint::batch {

template <class T>
class BoundedQueue {
 public:
  explicit BoundedQueue(std::size_t capacity) : capacity_(capacity) { assert(capacity > 0); }

  // Blocks while full; false (and `value` dropped) once closed.
  bool push(T value) {
    std::unique_lock lock(mutex_);
    not_full_.wait(lock, [&] { return closed_ || items_.size() < capacity_; });
    if (closed_) return false;
    items_.push_back(std::move(value));
    not_empty_.notify_one();
    return true;
  }

  // Blocks while empty and open; nullopt once closed and drained.
  std::optional<T> pop() {
    std::unique_lock lock(mutex_);
    not_empty_.wait(lock, [&] { return closed_ || !items_.empty(); });
    if (items_.empty()) return std::nullopt;
    T value = std::move(items_.front());
    items_.pop_front();
    not_full_.notify_one();
    return value;
  }

  void close() {
    const std::lock_guard lock(mutex_);
    closed_ = true;
    not_full_.notify_all();
    not_empty_.notify_all();
  }

  [[nodiscard]] std::size_t capacity() const { return capacity_; }

 private:
  const std::size_t capacity_;
  std::mutex mutex_;
  std::condition_variable not_full_;
  std::condition_variable not_empty_;
  std::deque<T> items_;
  bool closed_ = false;
};

}  // namespace tenthpoint::batch
