// LedgerError: the ledger file cannot be used as asked. The message starts
// with the file, so a user who keeps several ledgers (one per shard, say)
// knows which one: "reports/ledger.sqlite: written by a newer engine ...".
#pragma once

#include <filesystem>
#include <stdexcept>
#include <string>

namespace tenthpoint::ledger {

class LedgerError : public std::runtime_error {
 public:
  LedgerError(std::filesystem::path file, const std::string& message);

  [[nodiscard]] const std::filesystem::path& file() const noexcept { return file_; }
  // The message without the file name in front.
  [[nodiscard]] const std::string& cause() const noexcept { return cause_; }

 private:
  std::filesystem::path file_;
  std::string cause_;
};

}  // namespace tenthpoint::ledger
