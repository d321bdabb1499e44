// Database: one open SQLite connection, closed when the object goes. SQLite
// stays inside the ledger module: this header only forward-declares its
// handle, and <sqlite3.h> is included by the ledger's .cc files alone.
//
// exec() is for the engine's constant statements (schema, PRAGMAs,
// BEGIN/COMMIT); anything that carries a value goes through a Statement with
// bound parameters (statement.h), never through text built at run time.
#pragma once

#include <cstdint>
#include <filesystem>
#include <string>

struct sqlite3;

namespace tenthpoint::ledger::detail {

class Database {
 public:
  enum class Mode { read_write_create, read_write };

  // Opens `path`; throws LedgerError naming it when SQLite cannot.
  Database(std::filesystem::path path, Mode mode);
  Database(Database&& other) noexcept;
  Database& operator=(Database&& other) noexcept;
  Database(const Database&) = delete;
  Database& operator=(const Database&) = delete;
  ~Database();

  // Runs constant SQL (one or more statements without parameters).
  void exec(const char* sql);

  [[nodiscard]] std::int64_t last_insert_rowid() const;
  [[nodiscard]] int changes() const;
  [[nodiscard]] const std::filesystem::path& path() const noexcept { return path_; }
  [[nodiscard]] sqlite3* handle() const noexcept { return db_; }

  // Throws LedgerError with the file, `what` and SQLite's message for `code`.
  [[noreturn]] void fail(int code, const std::string& what) const;

 private:
  std::filesystem::path path_;
  sqlite3* db_ = nullptr;
};

}  // namespace tenthpoint::ledger::detail
