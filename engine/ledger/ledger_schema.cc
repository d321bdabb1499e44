#include "engine/ledger/ledger_schema.h"

#include <array>

#include <fmt/format.h>

#include "engine/ledger/ledger_error.h"
#include "engine/ledger/statement.h"
#include "engine/ledger/transaction.h"

namespace tenthpoint::ledger::detail {
namespace {

// Each step takes a file from version i to i + 1 and ends by setting both
// PRAGMAs (constants, so no value is spliced into SQL text). Columns are not
// declared STRICT so that SQLite older than 3.37 can still read the file.
constexpr const char* kStepTo1 = R"sql(
CREATE TABLE runs (
  id              INTEGER PRIMARY KEY,
  started         TEXT    NOT NULL,
  finished        TEXT,
  engine_version  TEXT    NOT NULL,
  policy_versions TEXT    NOT NULL,
  command         TEXT    NOT NULL,
  shard           TEXT    NOT NULL,
  batch           TEXT    NOT NULL,
  rated           INTEGER NOT NULL DEFAULT 0,
  unchanged       INTEGER NOT NULL DEFAULT 0,
  failed          INTEGER NOT NULL DEFAULT 0
);
CREATE INDEX runs_batch ON runs(batch) WHERE batch <> '';

CREATE TABLE results (
  id                    INTEGER PRIMARY KEY,
  run                   INTEGER NOT NULL REFERENCES runs(id),
  structure_id          TEXT    NOT NULL,
  name                  TEXT    NOT NULL,
  file                  TEXT    NOT NULL,
  inputs_hash           TEXT    NOT NULL,
  status                TEXT    NOT NULL CHECK (status IN ('rated', 'unchanged', 'failed')),
  reason                TEXT    NOT NULL,
  method                TEXT    NOT NULL,
  policy_id             TEXT    NOT NULL,
  policy_version        TEXT    NOT NULL,
  edition               TEXT    NOT NULL,
  vehicle_set           TEXT    NOT NULL,
  rating_date           TEXT    NOT NULL,
  inspection_date       TEXT,
  weight_unit           TEXT    NOT NULL,
  recommendation        TEXT    NOT NULL,
  recommendation_reason TEXT    NOT NULL,
  rerate_by             TEXT,
  post_by               TEXT,
  warning_count         INTEGER NOT NULL,
  governing_count       INTEGER NOT NULL,
  posting_count         INTEGER NOT NULL,
  carried_from          INTEGER REFERENCES runs(id),
  rows_of               INTEGER REFERENCES results(id)
);
CREATE INDEX results_structure_run ON results(structure_id, run);
CREATE INDEX results_file_run ON results(file, run);
CREATE INDEX results_run ON results(run);
CREATE UNIQUE INDEX results_one_per_run ON results(run, structure_id) WHERE structure_id <> '';
CREATE INDEX results_rows_of ON results(rows_of) WHERE rows_of IS NOT NULL;

CREATE TABLE governing (
  result        INTEGER NOT NULL REFERENCES results(id) ON DELETE CASCADE,
  ordinal       INTEGER NOT NULL,
  load_model_id TEXT    NOT NULL,
  name          TEXT    NOT NULL,
  category      TEXT    NOT NULL,
  level         TEXT    NOT NULL,
  rating_factor REAL    NOT NULL,
  rating_weight REAL,
  girder_id     TEXT    NOT NULL,
  station       REAL    NOT NULL,
  point         TEXT    NOT NULL,
  effect        TEXT    NOT NULL,
  limit_state   TEXT    NOT NULL,
  screened_out  INTEGER NOT NULL,
  PRIMARY KEY (result, ordinal)
) WITHOUT ROWID;

CREATE TABLE postings (
  result        INTEGER NOT NULL REFERENCES results(id) ON DELETE CASCADE,
  ordinal       INTEGER NOT NULL,
  load_model_id TEXT    NOT NULL,
  rating_factor REAL    NOT NULL,
  status        TEXT    NOT NULL,
  posted_weight REAL,
  reason        TEXT    NOT NULL,
  PRIMARY KEY (result, ordinal)
) WITHOUT ROWID;

-- Each result with its governing rows and postings, wherever they are kept,
-- for people and programs reading the file with SQL.
CREATE VIEW result_governing AS
  SELECT r.id AS result_id, r.run, r.structure_id, g.ordinal, g.load_model_id, g.name, g.category, g.level,
         g.rating_factor, g.rating_weight, g.girder_id, g.station, g.point, g.effect, g.limit_state, g.screened_out
  FROM results r JOIN governing g ON g.result = COALESCE(r.rows_of, r.id);
CREATE VIEW result_postings AS
  SELECT r.id AS result_id, r.run, r.structure_id, p.ordinal, p.load_model_id, p.rating_factor, p.status,
         p.posted_weight, p.reason
  FROM results r JOIN postings p ON p.result = COALESCE(r.rows_of, r.id);

PRAGMA application_id = 1414548551;
PRAGMA user_version = 1;
)sql";

// Append kStepTo2 here (and nothing else changes) to add version 2.
constexpr std::array kSteps{kStepTo1};

}  // namespace

int latest_schema_version() { return static_cast<int>(kSteps.size()); }

SchemaState read_schema_state(Database& db) {
  SchemaState state;
  {
    Statement s(db, "PRAGMA user_version");
    if (s.step()) state.user_version = static_cast<int>(s.column_int(0));
  }
  {
    Statement s(db, "PRAGMA application_id");
    if (s.step()) state.application_id = static_cast<std::int32_t>(s.column_int(0));
  }
  {
    Statement s(db, "SELECT count(*) FROM sqlite_master");
    if (s.step()) state.object_count = static_cast<int>(s.column_int(0));
  }
  return state;
}

void check_schema_state(const Database& db, const SchemaState& state) {
  if (state.user_version == 0 && state.application_id == 0 && state.object_count == 0) return;  // new file
  if (state.application_id != kLedgerApplicationId)
    throw LedgerError(db.path(), "is an SQLite database but not a tenthpoint ledger (its application id is " +
                                     fmt::format("{:#010x}", static_cast<std::uint32_t>(state.application_id)) +
                                     ", a ledger's is " + fmt::format("{:#010x}", kLedgerApplicationId) + ")");
  if (state.user_version > latest_schema_version())
    throw LedgerError(db.path(),
                      fmt::format("was written by a newer engine (ledger schema version {}; this engine knows "
                                  "versions up to {}); use that engine or a newer one",
                                  state.user_version, latest_schema_version()));
}

void migrate(Database& db) {
  if (read_schema_state(db).user_version == latest_schema_version()) return;  // the usual case: no write lock
  for (;;) {
    Transaction transaction(db);
    const SchemaState state = read_schema_state(db);
    check_schema_state(db, state);
    if (state.user_version >= latest_schema_version()) return;  // another process migrated it meanwhile
    db.exec(kSteps[static_cast<std::size_t>(state.user_version)]);
    transaction.commit();
  }
}

}  // namespace tenthpoint::ledger::detail
