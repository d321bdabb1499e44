#include "engine/batch/bounded_queue.h"

#include <atomic>
#include <thread>
#include <vector>

#include <catch2/catch.hpp>

using tenthpoint::batch::BoundedQueue;

TEST_CASE("a bounded queue delivers every item of several producers once", "[batch][queue]") {
  // Producer/consumer semantics of a bounded buffer: common practice.
  BoundedQueue<int> queue(3);
  constexpr int kProducers = 4;
  constexpr int kEach = 500;
  std::atomic<int> refused{0};  // Catch2 assertions are not thread-safe: count here, check below
  std::vector<std::thread> producers;
  for (int p = 0; p < kProducers; ++p)
    producers.emplace_back([&, p] {
      for (int i = 0; i < kEach; ++i)
        if (!queue.push(p * kEach + i)) ++refused;
    });
  std::vector<int> seen(kProducers * kEach, 0);
  for (int n = 0; n < kProducers * kEach; ++n) {
    const auto item = queue.pop();
    REQUIRE(item);
    ++seen[static_cast<std::size_t>(*item)];
  }
  for (std::thread& t : producers) t.join();
  CHECK(refused == 0);
  for (int count : seen) CHECK(count == 1);
}

TEST_CASE("closing a bounded queue releases a blocked producer and drains what is left", "[batch][queue]") {
  BoundedQueue<int> queue(1);
  REQUIRE(queue.push(1));
  std::atomic<bool> refused{false};
  std::thread blocked([&] { refused = !queue.push(2); });  // blocks: the queue is full
  queue.close();
  blocked.join();
  CHECK(refused);
  CHECK(queue.pop() == 1);
  CHECK_FALSE(queue.pop().has_value());
  CHECK_FALSE(queue.push(3));
}
