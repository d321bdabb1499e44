#include "engine/ledger/database.h"

#include <sqlite3.h>

#include <utility>

#include <fmt/format.h>

#include "engine/ledger/ledger_error.h"

namespace tenthpoint::ledger::detail {

Database::Database(std::filesystem::path path, Mode mode) : path_(std::move(path)) {
  const int flags = SQLITE_OPEN_READWRITE | (mode == Mode::read_write_create ? SQLITE_OPEN_CREATE : 0) |
                    SQLITE_OPEN_NOMUTEX | SQLITE_OPEN_EXRESCODE;
  const int rc = sqlite3_open_v2(path_.c_str(), &db_, flags, nullptr);
  if (rc != SQLITE_OK) {
    // sqlite3_open_v2 hands back a handle even on failure, for its message.
    const std::string message = db_ != nullptr ? sqlite3_errmsg(db_) : sqlite3_errstr(rc);
    sqlite3_close(db_);
    db_ = nullptr;
    throw LedgerError(path_, fmt::format("cannot open the ledger: {}", message));
  }
  sqlite3_extended_result_codes(db_, 1);
}

Database::Database(Database&& other) noexcept : path_(std::move(other.path_)), db_(std::exchange(other.db_, nullptr)) {}

Database& Database::operator=(Database&& other) noexcept {
  if (this != &other) {
    sqlite3_close(db_);
    path_ = std::move(other.path_);
    db_ = std::exchange(other.db_, nullptr);
  }
  return *this;
}

Database::~Database() {
  // sqlite3_close (not _v2) refuses while statements are alive; every
  // Statement is owned by something destroyed before its Database.
  sqlite3_close(db_);
}

void Database::exec(const char* sql) {
  char* error = nullptr;
  const int rc = sqlite3_exec(db_, sql, nullptr, nullptr, &error);
  if (rc != SQLITE_OK) {
    const std::string message = error != nullptr ? error : sqlite3_errstr(rc);
    sqlite3_free(error);
    throw LedgerError(path_, message);
  }
}

std::int64_t Database::last_insert_rowid() const { return sqlite3_last_insert_rowid(db_); }

int Database::changes() const { return sqlite3_changes(db_); }

void Database::fail(int code, const std::string& what) const {
  // sqlite3_errmsg describes the most recent failure on this connection,
  // which is the one being reported; fall back to the code's text.
  const char* message = db_ != nullptr && sqlite3_errcode(db_) == code ? sqlite3_errmsg(db_) : sqlite3_errstr(code);
  throw LedgerError(path_, fmt::format("{}: {}", what, message));
}

}  // namespace tenthpoint::ledger::detail
