// Transaction: BEGIN IMMEDIATE on construction, COMMIT by commit(), and
// ROLLBACK when it goes out of scope uncommitted (an exception, an early
// return). SQLite makes a committed transaction all-or-nothing even if the
// process is killed during the commit (https://www.sqlite.org/atomiccommit.html),
// which is what gives the ledger whole bridges only.
//
// IMMEDIATE takes the write lock at BEGIN rather than at the first write, so
// two writers wait for each other (busy_timeout) instead of one failing with
// a deadlock when both try to upgrade a read lock.
#pragma once

#include "engine/ledger/database.h"

namespace tenthpoint::ledger::detail {

class Transaction {
 public:
  explicit Transaction(Database& db);
  Transaction(const Transaction&) = delete;
  Transaction& operator=(const Transaction&) = delete;
  ~Transaction();

  void commit();

 private:
  Database& db_;
  bool open_ = true;
};

}  // namespace tenthpoint::ledger::detail
