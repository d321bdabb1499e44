#include "engine/ledger/transaction.h"

#include <sqlite3.h>

namespace tenthpoint::ledger::detail {

Transaction::Transaction(Database& db) : db_(db) { db_.exec("BEGIN IMMEDIATE"); }

Transaction::~Transaction() {
  // A failed COMMIT may already have rolled back (SQLite leaves autocommit
  // mode on then); ROLLBACK only while a transaction is still open.
  if (open_ && sqlite3_get_autocommit(db_.handle()) == 0)
    sqlite3_exec(db_.handle(), "ROLLBACK", nullptr, nullptr, nullptr);
}

void Transaction::commit() {
  db_.exec("COMMIT");
  open_ = false;
}

}  // namespace tenthpoint::ledger::detail
