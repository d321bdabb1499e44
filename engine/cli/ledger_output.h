// What the ledger commands (history, changes) share: finding and opening the
// ledger a user means, a BridgeRecord as JSON, and a plain text table.
#pragma once

#include <CLI/CLI.hpp>
#include <optional>
#include <string>
#include <vector>

#include <nlohmann/json.hpp>

#include "engine/ledger/ledger.h"

namespace tenthpoint::cli {

struct LedgerLocation {
  std::string ledger;           // --ledger FILE; wins over --out
  std::string out = "reports";  // --out DIR: the ledger is <out>/ledger.sqlite

  [[nodiscard]] std::filesystem::path path() const;
};

// Declares --ledger and --out on `sub`.
void add_ledger_options(CLI::App* sub, LedgerLocation& location);

// Opens an existing ledger: a missing file is not created (these commands
// only read), and every failure is printed to stderr naming the file. Returns
// none after printing, and the caller exits with kExitUsage.
[[nodiscard]] std::optional<ledger::Ledger> open_existing_ledger(const LedgerLocation& location);

// A record as JSON: the stable document both commands write. Rating factors
// and weights as stored (weights in the record's weight_unit), stations in
// metres (station_m), dates ISO 8601, absent values null.
[[nodiscard]] nlohmann::json record_json(const ledger::BridgeRecord& record);

// Columns padded to their widest cell, two spaces apart; columns whose index
// is in `right` are right-aligned (numbers). Each line ends with '\n', without trailing spaces.
[[nodiscard]] std::string text_table(const std::vector<std::vector<std::string>>& rows,
                                     const std::vector<std::size_t>& right = {});

// A rating factor to two decimals, the precision ratings are reported in.
[[nodiscard]] std::string rating_text(double rating_factor);

}  // namespace tenthpoint::cli
