#include "engine/ledger/ledger_error.h"

namespace tenthpoint::ledger {

LedgerError::LedgerError(std::filesystem::path file, const std::string& message)
    : std::runtime_error(file.string() + ": " + message), file_(std::move(file)), cause_(message) {}

}  // namespace tenthpoint::ledger
