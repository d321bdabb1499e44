// Statement: one prepared SQL statement with its parameters bound by
// position, never spliced into the text (issue #8: every statement binds).
// Parameters are numbered from 1, result columns from 0, as in SQLite.
//
//   Statement s(db, "SELECT id FROM runs WHERE batch = ?1");
//   s.bind(1, batch);
//   while (s.step()) ids.push_back(s.column_int(0));
//
// A statement is reset (bindings cleared) by reset(), and may then be run
// again: the batch run's per-bridge inserts are prepared once and reused.
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

#include "engine/ledger/database.h"

struct sqlite3_stmt;

namespace tenthpoint::ledger::detail {

class Statement {
 public:
  // Prepares `sql` (constant text); throws LedgerError naming the file.
  Statement(Database& db, const char* sql);
  Statement(Statement&& other) noexcept;
  Statement& operator=(Statement&&) = delete;
  Statement(const Statement&) = delete;
  Statement& operator=(const Statement&) = delete;
  ~Statement();

  Statement& bind(int index, std::int64_t value);
  Statement& bind(int index, int value) { return bind(index, static_cast<std::int64_t>(value)); }
  Statement& bind(int index, bool value) { return bind(index, static_cast<std::int64_t>(value ? 1 : 0)); }
  // A NaN would be stored as NULL by SQLite; callers check finiteness first.
  Statement& bind(int index, double value);
  // The text is copied by SQLite (SQLITE_TRANSIENT), so temporaries are fine.
  Statement& bind(int index, std::string_view value);
  Statement& bind(int index, const std::string& value) { return bind(index, std::string_view(value)); }
  Statement& bind(int index, const char* value) { return bind(index, std::string_view(value)); }
  Statement& bind_null(int index);
  template <typename T>
  Statement& bind(int index, const std::optional<T>& value) {
    return value ? bind(index, *value) : bind_null(index);
  }

  // Advances: true when a row is ready, false when done. Throws LedgerError
  // on failure (constraint, busy after the timeout, I/O).
  bool step();
  // Steps to completion, for statements that return no rows.
  void run();
  // Makes the statement ready to run again with new bindings.
  void reset();

  [[nodiscard]] bool column_is_null(int column) const;
  [[nodiscard]] std::int64_t column_int(int column) const;
  [[nodiscard]] double column_double(int column) const;
  // NULL reads as "".
  [[nodiscard]] std::string column_text(int column) const;
  [[nodiscard]] std::optional<std::string> column_optional_text(int column) const;
  [[nodiscard]] std::optional<double> column_optional_double(int column) const;
  [[nodiscard]] std::optional<std::int64_t> column_optional_int(int column) const;

 private:
  Database* db_;
  sqlite3_stmt* statement_ = nullptr;
};

}  // namespace tenthpoint::ledger::detail
