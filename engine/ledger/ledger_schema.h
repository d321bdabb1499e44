// LedgerSchema: the tables of a ledger file and the migrations that bring an
// older file up to date. The schema version is PRAGMA user_version; the file
// is marked as a ledger by PRAGMA application_id, so that another program's
// SQLite file is refused instead of being "migrated".
//
// Version 1 (tables; every date ISO 8601, every count an integer):
//   runs       one row per run: id, started, finished (NULL while running or
//              when killed), engine_version, policy_versions, command, shard,
//              batch, rated/unchanged/failed counts
//   results    one row per bridge per run: the BridgeRecord's scalar fields,
//              carried_from (for unchanged: the run that computed the values),
//              rows_of (NULL: the governing and posting rows are this
//              result's own; else the result whose rows they are, which an
//              unchanged record shares instead of copying them every night)
//              and governing_count/posting_count, the number of child rows
//              the bridge was written with, so a partial bridge is detectable
//   governing  one row per governing load model and level (result, ordinal)
//   postings   one row per posted vehicle (result, ordinal)
//   views result_governing and result_postings: each result with its rows,
//              following rows_of, for reading the file with plain SQL
// Indexes: results(structure_id, run) for history and carrying forward,
// results(rows_of) for the foreign key,
// results(file, run) for the incremental check, results(run) for a run's
// results, and a partial unique index (run, structure_id) for non-empty ids:
// one record per bridge per run.
//
// To add version 2, append its step to the list in ledger_schema.cc; older
// files then migrate through every step in order, each in its own
// transaction together with its user_version.
#pragma once

#include <cstdint>

#include "engine/ledger/database.h"

namespace tenthpoint::ledger::detail {

// "TPLG" as a big-endian 32-bit integer.
inline constexpr std::int32_t kLedgerApplicationId = 0x54504C47;

// The newest schema version this engine writes and reads.
[[nodiscard]] int latest_schema_version();

struct SchemaState {
  int user_version = 0;
  std::int32_t application_id = 0;
  int object_count = 0;  // rows of sqlite_master: tables, indexes, ...
};

[[nodiscard]] SchemaState read_schema_state(Database& db);

// Throws LedgerError naming the file when `state` is not a ledger this
// engine can use: another application's database, or a newer schema.
void check_schema_state(const Database& db, const SchemaState& state);

// Brings the file to latest_schema_version(); creates the schema of a new
// (empty) file. Re-checks the state inside the write transaction, so two
// processes opening one new file at once migrate it once.
void migrate(Database& db);

}  // namespace tenthpoint::ledger::detail
