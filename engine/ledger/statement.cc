#include "engine/ledger/statement.h"

#include <sqlite3.h>

#include <utility>

#include "engine/ledger/ledger_error.h"

namespace tenthpoint::ledger::detail {

Statement::Statement(Database& db, const char* sql) : db_(&db) {
  // PERSISTENT: these statements are kept for many runs (SQLite docs, sqlite3_prepare_v3).
  const int rc = sqlite3_prepare_v3(db.handle(), sql, -1, SQLITE_PREPARE_PERSISTENT, &statement_, nullptr);
  if (rc != SQLITE_OK) db.fail(rc, "cannot prepare a ledger statement");
}

Statement::Statement(Statement&& other) noexcept
    : db_(other.db_), statement_(std::exchange(other.statement_, nullptr)) {}

Statement::~Statement() { sqlite3_finalize(statement_); }

Statement& Statement::bind(int index, std::int64_t value) {
  const int rc = sqlite3_bind_int64(statement_, index, value);
  if (rc != SQLITE_OK) db_->fail(rc, "cannot bind a ledger parameter");
  return *this;
}

Statement& Statement::bind(int index, double value) {
  const int rc = sqlite3_bind_double(statement_, index, value);
  if (rc != SQLITE_OK) db_->fail(rc, "cannot bind a ledger parameter");
  return *this;
}

Statement& Statement::bind(int index, std::string_view value) {
  const int rc = sqlite3_bind_text64(statement_, index, value.data(), value.size(), SQLITE_TRANSIENT, SQLITE_UTF8);
  if (rc != SQLITE_OK) db_->fail(rc, "cannot bind a ledger parameter");
  return *this;
}

Statement& Statement::bind_null(int index) {
  const int rc = sqlite3_bind_null(statement_, index);
  if (rc != SQLITE_OK) db_->fail(rc, "cannot bind a ledger parameter");
  return *this;
}

bool Statement::step() {
  const int rc = sqlite3_step(statement_);
  if (rc == SQLITE_ROW) return true;
  if (rc == SQLITE_DONE) return false;
  // Reset before throwing so that the connection's locks are let go; the
  // error text is read first because reset keeps it but a later call may not.
  const std::string message = sqlite3_errmsg(db_->handle());
  sqlite3_reset(statement_);
  throw LedgerError(db_->path(), "ledger statement failed: " + message);
}

void Statement::run() {
  while (step()) {
  }
}

void Statement::reset() {
  sqlite3_reset(statement_);
  sqlite3_clear_bindings(statement_);
}

bool Statement::column_is_null(int column) const { return sqlite3_column_type(statement_, column) == SQLITE_NULL; }

std::int64_t Statement::column_int(int column) const { return sqlite3_column_int64(statement_, column); }

double Statement::column_double(int column) const { return sqlite3_column_double(statement_, column); }

std::string Statement::column_text(int column) const {
  const auto* text = sqlite3_column_text(statement_, column);
  if (text == nullptr) return {};
  return std::string(reinterpret_cast<const char*>(text),
                     static_cast<std::size_t>(sqlite3_column_bytes(statement_, column)));
}

std::optional<std::string> Statement::column_optional_text(int column) const {
  if (column_is_null(column)) return std::nullopt;
  return column_text(column);
}

std::optional<double> Statement::column_optional_double(int column) const {
  if (column_is_null(column)) return std::nullopt;
  return column_double(column);
}

std::optional<std::int64_t> Statement::column_optional_int(int column) const {
  if (column_is_null(column)) return std::nullopt;
  return column_int(column);
}

}  // namespace tenthpoint::ledger::detail
