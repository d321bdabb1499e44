#include "engine/ledger/ledger.h"

#include <sys/vfs.h>

#include <algorithm>
#include <array>
#include <cmath>
#include <ctime>
#include <fstream>
#include <map>
#include <set>
#include <utility>

#include <fmt/format.h>

#include "engine/ledger/database.h"
#include "engine/ledger/ledger_schema.h"
#include "engine/ledger/statement.h"
#include "engine/ledger/transaction.h"

namespace tenthpoint::ledger {

using detail::Database;
using detail::Statement;
using detail::Transaction;

namespace {

// Every SQL text below is a constant. The column lists are shared through
// these macros so that the reader and the writers cannot drift apart; they
// are joined at compile time, never with run-time values.
#define TP_RESULT_COLUMNS                                                                                           \
  "r.id, r.run, r.structure_id, r.name, r.file, r.inputs_hash, r.status, r.reason, r.method, r.policy_id, "         \
  "r.policy_version, r.edition, r.vehicle_set, r.rating_date, r.inspection_date, r.weight_unit, r.recommendation, " \
  "r.recommendation_reason, r.rerate_by, r.post_by, r.warning_count, r.carried_from"
#define TP_GOVERNING_COLUMNS                                                                            \
  "r.id, g.load_model_id, g.name, g.category, g.level, g.rating_factor, g.rating_weight, g.girder_id, " \
  "g.station, g.point, g.effect, g.limit_state, g.screened_out"
#define TP_POSTING_COLUMNS "r.id, p.load_model_id, p.rating_factor, p.status, p.posted_weight, p.reason"
#define TP_RUN_COLUMNS                                                                                   \
  "id, started, COALESCE(finished, ''), engine_version, policy_versions, command, shard, batch, rated, " \
  "unchanged, failed"

constexpr const char* kInsertResult =
    "INSERT INTO results (run, structure_id, name, file, inputs_hash, status, reason, method, policy_id, "
    "policy_version, edition, vehicle_set, rating_date, inspection_date, weight_unit, recommendation, "
    "recommendation_reason, rerate_by, post_by, warning_count, governing_count, posting_count, carried_from, "
    "rows_of) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11, ?12, ?13, ?14, ?15, ?16, ?17, ?18, ?19, ?20, ?21, "
    "?22, ?23, ?24)";
constexpr const char* kInsertGoverning =
    "INSERT INTO governing (result, ordinal, load_model_id, name, category, level, rating_factor, rating_weight, "
    "girder_id, station, point, effect, limit_state, screened_out) "
    "VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11, ?12, ?13, ?14)";
constexpr const char* kInsertPosting =
    "INSERT INTO postings (result, ordinal, load_model_id, rating_factor, status, posted_weight, reason) "
    "VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7)";
// The bridge's earlier record in a run, and whether a later record shares its rows.
constexpr const char* kFindById = "SELECT id FROM results WHERE run = ?1 AND structure_id = ?2";
constexpr const char* kFindByFile = "SELECT id FROM results WHERE run = ?1 AND structure_id = '' AND file = ?2";
constexpr const char* kSharedRows = "SELECT run FROM results WHERE rows_of = ?1 LIMIT 1";
// Its own children go with it (ON DELETE CASCADE).
constexpr const char* kDeleteResult = "DELETE FROM results WHERE id = ?1";

std::string now_utc() {
  const std::time_t now = std::time(nullptr);
  std::tm utc{};
  ::gmtime_r(&now, &utc);
  return fmt::format("{:04}-{:02}-{:02}T{:02}:{:02}:{:02}Z", utc.tm_year + 1900, utc.tm_mon + 1, utc.tm_mday,
                     utc.tm_hour, utc.tm_min, utc.tm_sec);
}

// An SQLite database file begins with these 16 bytes
// (https://www.sqlite.org/fileformat.html, 1.3 "The Database Header").
bool has_sqlite_header(const std::filesystem::path& path) {
  std::ifstream in(path, std::ios::binary);
  std::array<char, 16> header{};
  if (!in.read(header.data(), header.size())) return false;
  return std::string_view(header.data(), header.size()) == std::string_view("SQLite format 3\0", 16);
}

// Network and cluster file systems, on which SQLite's shared-memory WAL index
// must not be used (https://www.sqlite.org/wal.html: "WAL does not work over a
// network filesystem"). Magic numbers from <linux/magic.h> and, for Lustre,
// GPFS, BeeGFS and PanFS, from their sources (common practice).
bool on_network_file_system(const std::filesystem::path& file) {
  std::filesystem::path dir = file.parent_path();
  if (dir.empty()) dir = ".";
  struct statfs fs {};
  if (::statfs(dir.c_str(), &fs) != 0) return false;
  constexpr std::array<unsigned long, 12> kNetwork{
      0x6969UL,      // NFS
      0x517BUL,      // SMB
      0xFF534D42UL,  // CIFS
      0xFE534D42UL,  // SMB2
      0x5346414FUL,  // AFS
      0x00C36400UL,  // Ceph
      0x65735546UL,  // FUSE (sshfs and many cluster clients)
      0x01021997UL,  // 9p
      0x0BD00BD0UL,  // Lustre
      0x47504653UL,  // GPFS
      0x19830326UL,  // BeeGFS
      0xAAD7AAEAUL,  // PanFS
  };
  const auto type = static_cast<unsigned long>(fs.f_type) & 0xFFFFFFFFUL;
  return std::find(kNetwork.begin(), kNetwork.end(), type) != kNetwork.end();
}

void check_finite(const Database& db, const BridgeRecord& r) {
  const auto fail = [&](const std::string& field) {
    throw LedgerError(db.path(), fmt::format("bridge '{}' ({}): {} is not a finite number; nothing of it was stored",
                                             r.structure_id, r.file, field));
  };
  for (const GoverningRow& g : r.governing) {
    const std::string where = fmt::format("governing {} {}", g.load_model_id, g.level);
    if (!std::isfinite(g.rating_factor)) fail(where + " rating_factor");
    if (g.rating_weight && !std::isfinite(*g.rating_weight)) fail(where + " rating_weight");
    if (!std::isfinite(g.station)) fail(where + " station");
  }
  for (const PostingRow& p : r.postings) {
    if (!std::isfinite(p.rating_factor)) fail(fmt::format("posting {} rating_factor", p.load_model_id));
    if (p.posted_weight && !std::isfinite(*p.posted_weight))
      fail(fmt::format("posting {} posted_weight", p.load_model_id));
  }
}

RunInfo read_run(const Statement& s) {
  RunInfo r;
  r.id = s.column_int(0);
  r.started = s.column_text(1);
  r.finished = s.column_text(2);
  r.engine_version = s.column_text(3);
  r.policy_versions = s.column_text(4);
  r.command = s.column_text(5);
  r.shard = s.column_text(6);
  r.batch = s.column_text(7);
  r.rated = static_cast<int>(s.column_int(8));
  r.unchanged = static_cast<int>(s.column_int(9));
  r.failed = static_cast<int>(s.column_int(10));
  return r;
}

struct StoredRecord {
  std::int64_t result_id = 0;
  RunId run = 0;
  BridgeRecord record;
};

StoredRecord read_result(const Statement& s, const Database& db) {
  StoredRecord out;
  out.result_id = s.column_int(0);
  out.run = s.column_int(1);
  BridgeRecord& r = out.record;
  r.structure_id = s.column_text(2);
  r.name = s.column_text(3);
  r.file = s.column_text(4);
  r.inputs_hash = s.column_text(5);
  const std::string status = s.column_text(6);
  const auto parsed = parse_bridge_status(status);
  // The schema's CHECK admits only the three spellings; anything else is a
  // file edited by hand.
  if (!parsed) throw LedgerError(db.path(), fmt::format("result {} has an unknown status '{}'", out.result_id, status));
  r.status = *parsed;
  r.reason = s.column_text(7);
  r.method = s.column_text(8);
  r.policy_id = s.column_text(9);
  r.policy_version = s.column_text(10);
  r.edition = s.column_text(11);
  r.vehicle_set = s.column_text(12);
  r.rating_date = s.column_text(13);
  r.inspection_date = s.column_optional_text(14);
  r.weight_unit = s.column_text(15);
  r.recommendation = s.column_text(16);
  r.recommendation_reason = s.column_text(17);
  r.rerate_by = s.column_optional_text(18);
  r.post_by = s.column_optional_text(19);
  r.warning_count = static_cast<int>(s.column_int(20));
  r.carried_from = s.column_optional_int(21);
  return out;
}

GoverningRow read_governing(const Statement& s) {
  GoverningRow g;
  g.load_model_id = s.column_text(1);
  g.name = s.column_text(2);
  g.category = s.column_text(3);
  g.level = s.column_text(4);
  g.rating_factor = s.column_double(5);
  g.rating_weight = s.column_optional_double(6);
  g.girder_id = s.column_text(7);
  g.station = s.column_double(8);
  g.point = s.column_text(9);
  g.effect = s.column_text(10);
  g.limit_state = s.column_text(11);
  g.screened_out = s.column_int(12) != 0;
  return g;
}

PostingRow read_posting(const Statement& s) {
  PostingRow p;
  p.load_model_id = s.column_text(1);
  p.rating_factor = s.column_double(2);
  p.status = s.column_text(3);
  p.posted_weight = s.column_optional_double(4);
  p.reason = s.column_text(5);
  return p;
}

// The three queries that load a set of records: results, then their
// governing rows and postings in order, all filtered the same way and bound
// by `bind`. Three queries rather than one per result keep a 10,000-bridge
// run at three statements.
struct RecordQueries {
  const char* results;
  const char* governing;
  const char* postings;
};

template <typename Bind>
std::vector<StoredRecord> load_records(Database& db, const RecordQueries& q, Bind bind) {
  std::vector<StoredRecord> out;
  std::map<std::int64_t, std::size_t> index;
  {
    Statement s(db, q.results);
    bind(s);
    while (s.step()) {
      out.push_back(read_result(s, db));
      index.emplace(out.back().result_id, out.size() - 1);
    }
  }
  if (out.empty()) return out;
  {
    Statement s(db, q.governing);
    bind(s);
    while (s.step()) {
      const auto it = index.find(s.column_int(0));
      if (it != index.end()) out[it->second].record.governing.push_back(read_governing(s));
    }
  }
  {
    Statement s(db, q.postings);
    bind(s);
    while (s.step()) {
      const auto it = index.find(s.column_int(0));
      if (it != index.end()) out[it->second].record.postings.push_back(read_posting(s));
    }
  }
  return out;
}

constexpr RecordQueries kRunRecords{
    "SELECT " TP_RESULT_COLUMNS " FROM results r WHERE r.run = ?1 ORDER BY r.structure_id, r.file, r.id",
    "SELECT " TP_GOVERNING_COLUMNS
    " FROM results r JOIN governing g ON g.result = COALESCE(r.rows_of, r.id) WHERE r.run = ?1 "
    "ORDER BY r.id, g.ordinal",
    "SELECT " TP_POSTING_COLUMNS
    " FROM results r JOIN postings p ON p.result = COALESCE(r.rows_of, r.id) WHERE r.run = ?1 "
    "ORDER BY r.id, p.ordinal"};

constexpr RecordQueries kBridgeRecords{
    "SELECT " TP_RESULT_COLUMNS " FROM results r WHERE r.structure_id = ?1 ORDER BY r.run, r.id",
    "SELECT " TP_GOVERNING_COLUMNS
    " FROM results r JOIN governing g ON g.result = COALESCE(r.rows_of, r.id) WHERE r.structure_id = ?1 "
    "ORDER BY r.id, g.ordinal",
    "SELECT " TP_POSTING_COLUMNS
    " FROM results r JOIN postings p ON p.result = COALESCE(r.rows_of, r.id) WHERE r.structure_id = ?1 "
    "ORDER BY r.id, p.ordinal"};

constexpr RecordQueries kOneRecord{
    "SELECT " TP_RESULT_COLUMNS " FROM results r WHERE r.id = ?1",
    "SELECT " TP_GOVERNING_COLUMNS
    " FROM results r JOIN governing g ON g.result = COALESCE(r.rows_of, r.id) WHERE r.id = ?1 ORDER BY g.ordinal",
    "SELECT " TP_POSTING_COLUMNS
    " FROM results r JOIN postings p ON p.result = COALESCE(r.rows_of, r.id) WHERE r.id = ?1 ORDER BY p.ordinal"};

// The fields of runs that merge joins: distinct entries in first-seen order.
void append_distinct(std::string& joined, const std::string& entries) {
  std::size_t start = 0;
  while (start <= entries.size()) {
    std::size_t end = entries.find("; ", start);
    if (end == std::string::npos) end = entries.size();
    const std::string entry = entries.substr(start, end - start);
    if (!entry.empty()) {
      bool present = false;
      std::size_t at = 0;
      while (at <= joined.size() && !present) {
        std::size_t stop = joined.find("; ", at);
        if (stop == std::string::npos) stop = joined.size();
        present = joined.compare(at, stop - at, entry) == 0 && stop - at == entry.size();
        at = stop + 2;
      }
      if (!present) joined += (joined.empty() ? "" : "; ") + entry;
    }
    start = end + 2;
  }
}

// One run standing for the shard runs of a batch.
RunInfo combine_runs(const std::vector<RunInfo>& parts) {
  RunInfo out = parts.front();
  out.shard.clear();
  out.engine_version.clear();
  out.policy_versions.clear();
  out.rated = out.unchanged = out.failed = 0;
  bool all_finished = true;
  for (const RunInfo& p : parts) {
    out.started = std::min(out.started, p.started);
    if (p.finished.empty()) all_finished = false;
    out.finished = std::max(out.finished, p.finished);
    append_distinct(out.engine_version, p.engine_version);
    append_distinct(out.policy_versions, p.policy_versions);
    out.rated += p.rated;
    out.unchanged += p.unchanged;
    out.failed += p.failed;
  }
  if (!all_finished) out.finished.clear();
  return out;
}

}  // namespace

struct Ledger::Impl {
  explicit Impl(Database database) : db(std::move(database)) {}

  Database db;
  // The per-bridge statements, prepared on first use and kept: a night's run
  // records thousands of bridges through them. Declared after `db`, so they
  // are finalized before it closes.
  std::optional<Statement> insert_result;
  std::optional<Statement> insert_governing;
  std::optional<Statement> insert_posting;
  std::optional<Statement> find_by_id;
  std::optional<Statement> find_by_file;
  std::optional<Statement> shared_rows;
  std::optional<Statement> delete_result;
  std::optional<Statement> run_exists;

  Statement& cached(std::optional<Statement>& slot, const char* sql) {
    if (slot)
      slot->reset();
    else
      slot.emplace(db, sql);
    return *slot;
  }

  void require_run(RunId run) {
    Statement& s = cached(run_exists, "SELECT 1 FROM runs WHERE id = ?1");
    s.bind(1, run);
    const bool found = s.step();
    s.reset();
    if (!found) throw LedgerError(db.path(), fmt::format("there is no run {} in this ledger", run));
  }

  // Removes the bridge's record in `run`, if any, inside the caller's
  // transaction. Refused when a later run shares its rows (it would have to
  // be rewritten, and a record of an older run is not what a rerun replaces).
  void remove_record(RunId run, const std::string& structure_id, const std::string& file) {
    Statement& find = structure_id.empty() ? cached(find_by_file, kFindByFile).bind(1, run).bind(2, file)
                                           : cached(find_by_id, kFindById).bind(1, run).bind(2, structure_id);
    if (!find.step()) return;
    const std::int64_t id = find.column_int(0);
    find.reset();
    Statement& shared = cached(shared_rows, kSharedRows).bind(1, id);
    if (shared.step())
      throw LedgerError(db.path(), fmt::format("cannot replace bridge '{}' in run {}: run {} carries its ratings "
                                               "forward; record it in a new run instead",
                                               structure_id.empty() ? file : structure_id, run, shared.column_int(0)));
    cached(delete_result, kDeleteResult).bind(1, id).run();
  }

  // Writes one record inside the caller's transaction, replacing the
  // bridge's earlier record in the same run. With `rows_of`, the record
  // shares that result's governing and posting rows (identical to its own,
  // the caller guarantees) instead of writing them again.
  void insert_record(RunId run, const BridgeRecord& r, std::optional<std::int64_t> rows_of = std::nullopt) {
    remove_record(run, r.structure_id, r.file);

    Statement& s = cached(insert_result, kInsertResult);
    s.bind(1, run)
        .bind(2, r.structure_id)
        .bind(3, r.name)
        .bind(4, r.file)
        .bind(5, r.inputs_hash)
        .bind(6, to_string(r.status))
        .bind(7, r.reason)
        .bind(8, r.method)
        .bind(9, r.policy_id)
        .bind(10, r.policy_version)
        .bind(11, r.edition)
        .bind(12, r.vehicle_set)
        .bind(13, r.rating_date)
        .bind(14, r.inspection_date)
        .bind(15, r.weight_unit)
        .bind(16, r.recommendation)
        .bind(17, r.recommendation_reason)
        .bind(18, r.rerate_by)
        .bind(19, r.post_by)
        .bind(20, r.warning_count)
        .bind(21, static_cast<std::int64_t>(r.governing.size()))
        .bind(22, static_cast<std::int64_t>(r.postings.size()))
        .bind(23, r.carried_from)
        .bind(24, rows_of)
        .run();
    if (rows_of) return;
    const std::int64_t id = db.last_insert_rowid();

    std::int64_t ordinal = 0;
    for (const GoverningRow& g : r.governing) {
      cached(insert_governing, kInsertGoverning)
          .bind(1, id)
          .bind(2, ordinal++)
          .bind(3, g.load_model_id)
          .bind(4, g.name)
          .bind(5, g.category)
          .bind(6, g.level)
          .bind(7, g.rating_factor)
          .bind(8, g.rating_weight)
          .bind(9, g.girder_id)
          .bind(10, g.station)
          .bind(11, g.point)
          .bind(12, g.effect)
          .bind(13, g.limit_state)
          .bind(14, g.screened_out)
          .run();
    }
    ordinal = 0;
    for (const PostingRow& p : r.postings) {
      cached(insert_posting, kInsertPosting)
          .bind(1, id)
          .bind(2, ordinal++)
          .bind(3, p.load_model_id)
          .bind(4, p.rating_factor)
          .bind(5, p.status)
          .bind(6, p.posted_weight)
          .bind(7, p.reason)
          .run();
    }
  }

  RunId insert_run(const RunInfo& info) {
    Statement s(db,
                "INSERT INTO runs (started, finished, engine_version, policy_versions, command, shard, batch, rated, "
                "unchanged, failed) VALUES (?1, NULLIF(?2, ''), ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10)");
    s.bind(1, info.started.empty() ? now_utc() : info.started)
        .bind(2, info.finished)
        .bind(3, info.engine_version)
        .bind(4, info.policy_versions)
        .bind(5, info.command)
        .bind(6, info.shard)
        .bind(7, info.batch)
        .bind(8, info.rated)
        .bind(9, info.unchanged)
        .bind(10, info.failed)
        .run();
    return db.last_insert_rowid();
  }

  void update_run(const RunInfo& info) {
    Statement s(db,
                "UPDATE runs SET started = ?2, finished = NULLIF(?3, ''), engine_version = ?4, policy_versions = ?5, "
                "command = ?6, shard = ?7, batch = ?8, rated = ?9, unchanged = ?10, failed = ?11 WHERE id = ?1");
    s.bind(1, info.id)
        .bind(2, info.started)
        .bind(3, info.finished)
        .bind(4, info.engine_version)
        .bind(5, info.policy_versions)
        .bind(6, info.command)
        .bind(7, info.shard)
        .bind(8, info.batch)
        .bind(9, info.rated)
        .bind(10, info.unchanged)
        .bind(11, info.failed)
        .run();
  }
};

Ledger::Ledger(std::unique_ptr<Impl> impl) : impl_(std::move(impl)) {}
Ledger::Ledger(Ledger&&) noexcept = default;
Ledger& Ledger::operator=(Ledger&&) noexcept = default;
Ledger::~Ledger() = default;

Ledger Ledger::open(const std::filesystem::path& path) {
  std::error_code ec;
  if (std::filesystem::exists(path, ec) && std::filesystem::file_size(path, ec) > 0 && !has_sqlite_header(path))
    throw LedgerError(path, "is not a tenthpoint ledger (not an SQLite database file)");
  if (std::filesystem::is_directory(path, ec)) throw LedgerError(path, "is a directory, not a ledger file");
  // The ledger lives in the output directory, which a first run creates.
  if (path.has_parent_path() && !std::filesystem::exists(path.parent_path(), ec)) {
    std::filesystem::create_directories(path.parent_path(), ec);
    if (ec) throw LedgerError(path, "cannot create its directory: " + ec.message());
  }

  Database db(path, Database::Mode::read_write_create);
  // Wait up to 10 s for another writer (a merge, a second run on the same
  // ledger) instead of failing at once; a bridge's transaction takes
  // milliseconds, so waiting longer only hides a stuck process.
  db.exec("PRAGMA busy_timeout = 10000");
  // Refuse another application's file, or a newer schema, before changing
  // anything in it (the journal mode below is persistent).
  detail::check_schema_state(db, detail::read_schema_state(db));

  // Journal: WAL. Kill safety is the same in either journal mode (a commit is
  // atomic when the process dies at any instruction, atomiccommit.html), so
  // the choice is speed and sharing. In rollback (DELETE) mode every commit
  // syncs the journal and the database, about 20 ms per bridge on this
  // machine's ext4, over three minutes for 10,000 bridges; in WAL mode with
  // synchronous=NORMAL a commit appends to the log without a sync, 0.1 ms.
  // WAL keeps its index in shared memory, which must not live on a network
  // file system (wal.html); shards on a cluster each write their own file
  // from one process, so on such a file system the ledger takes an exclusive
  // lock first, which makes SQLite keep the index in the process's heap
  // (wal.html, "Use of WAL Without Shared-Memory"). Other readers then wait
  // for the run to end; on a local disk they read while it writes.
  if (on_network_file_system(path)) db.exec("PRAGMA locking_mode = EXCLUSIVE");
  {
    Statement journal(db, "PRAGMA journal_mode = WAL");
    journal.run();
  }
  // synchronous=NORMAL in WAL mode: a commit survives a killed process (the
  // log is in the OS's cache); a power cut may lose the last commits but
  // never corrupts the file (https://www.sqlite.org/pragma.html#pragma_synchronous).
  // A lost bridge has no record, so the next run rates it again.
  db.exec("PRAGMA synchronous = NORMAL");
  db.exec("PRAGMA foreign_keys = ON");
  // 32 MiB of page cache (the default is 2 MiB): a night's transactions of
  // thousands of rows then stay in memory instead of spilling mid-way and
  // being read back; small beside the batch run's 500 MB budget.
  db.exec("PRAGMA cache_size = -32768");
  detail::migrate(db);
  return Ledger(std::make_unique<Impl>(std::move(db)));
}

const std::filesystem::path& Ledger::path() const { return impl_->db.path(); }

RunId Ledger::begin_run(const RunInfo& info) {
  RunInfo stored = info;
  stored.finished.clear();
  stored.rated = stored.unchanged = stored.failed = 0;
  return impl_->insert_run(stored);
}

void Ledger::record_bridge(RunId run, const BridgeRecord& record) {
  check_finite(impl_->db, record);
  Transaction transaction(impl_->db);
  impl_->require_run(run);
  impl_->insert_record(run, record);
  transaction.commit();
}

void Ledger::carry_forward(RunId run, const std::vector<std::string>& structure_ids) {
  if (structure_ids.empty()) return;
  Database& db = impl_->db;
  Transaction transaction(db);
  impl_->require_run(run);
  // One prepared statement per step, reused for every bridge, all inside one
  // transaction: a night with 10,000 unchanged bridges costs one commit. The
  // copy is one results row sharing its source's governing and posting rows
  // (rows_of), so an unchanged night does not write the inventory's ratings
  // again: the ledger grows by what changed.
  Statement source(db,
                   "SELECT COALESCE(rows_of, id), COALESCE(carried_from, run), id FROM results WHERE "
                   "structure_id = ?1 AND status IN ('rated', 'unchanged') AND run < ?2 ORDER BY run DESC LIMIT 1");
  Statement copy(db,
                 "INSERT INTO results (run, structure_id, name, file, inputs_hash, status, reason, method, policy_id, "
                 "policy_version, edition, vehicle_set, rating_date, inspection_date, weight_unit, recommendation, "
                 "recommendation_reason, rerate_by, post_by, warning_count, governing_count, posting_count, "
                 "carried_from, rows_of) "
                 "SELECT ?1, structure_id, name, file, inputs_hash, 'unchanged', reason, method, policy_id, "
                 "policy_version, edition, vehicle_set, rating_date, inspection_date, weight_unit, recommendation, "
                 "recommendation_reason, rerate_by, post_by, warning_count, governing_count, posting_count, ?3, ?4 "
                 "FROM results WHERE id = ?2");
  for (const std::string& id : structure_ids) {
    source.reset();
    source.bind(1, id).bind(2, run);
    if (!source.step())
      throw LedgerError(db.path(), fmt::format("cannot carry bridge '{}' forward into run {}: it has no successful "
                                               "rating in an earlier run; nothing was carried",
                                               id, run));
    const std::int64_t rows = source.column_int(0);
    const RunId computed_in = source.column_int(1);
    const std::int64_t from = source.column_int(2);
    source.reset();

    impl_->remove_record(run, id, "");
    copy.reset();
    copy.bind(1, run).bind(2, from).bind(3, computed_in).bind(4, rows).run();
  }
  transaction.commit();
}

void Ledger::finish_run(RunId run, const RunInfo& counts_and_finish_time) {
  Statement s(impl_->db, "UPDATE runs SET finished = ?2, rated = ?3, unchanged = ?4, failed = ?5 WHERE id = ?1");
  const RunInfo& c = counts_and_finish_time;
  s.bind(1, run).bind(2, c.finished.empty() ? now_utc() : c.finished).bind(3, c.rated).bind(4, c.unchanged);
  s.bind(5, c.failed).run();
  if (impl_->db.changes() == 0)
    throw LedgerError(impl_->db.path(), fmt::format("there is no run {} in this ledger", run));
}

std::optional<Ledger::LastInputs> Ledger::last_inputs(const std::string& file) const {
  Statement s(impl_->db,
              "SELECT structure_id, inputs_hash FROM results WHERE file = ?1 AND status IN ('rated', 'unchanged') "
              "ORDER BY run DESC LIMIT 1");
  s.bind(1, file);
  if (!s.step()) return std::nullopt;
  return LastInputs{s.column_text(0), s.column_text(1)};
}

std::vector<std::pair<std::string, Ledger::LastInputs>> Ledger::all_last_inputs() const {
  // One pass over the (file, run) index. With max() in an aggregate query the
  // bare columns come from the row holding the maximum
  // (https://www.sqlite.org/lang_select.html#bare_columns_in_an_aggregate_query).
  Statement s(impl_->db,
              "SELECT file, structure_id, inputs_hash, max(run) FROM results WHERE status IN ('rated', 'unchanged') "
              "GROUP BY file ORDER BY file");
  std::vector<std::pair<std::string, LastInputs>> out;
  while (s.step()) out.push_back({s.column_text(0), LastInputs{s.column_text(1), s.column_text(2)}});
  return out;
}

std::optional<RunInfo> Ledger::run(RunId id) const {
  Statement s(impl_->db, "SELECT " TP_RUN_COLUMNS " FROM runs WHERE id = ?1");
  s.bind(1, id);
  if (!s.step()) return std::nullopt;
  return read_run(s);
}

std::optional<RunInfo> Ledger::latest_run() const {
  Statement s(impl_->db, "SELECT " TP_RUN_COLUMNS " FROM runs ORDER BY id DESC LIMIT 1");
  if (!s.step()) return std::nullopt;
  return read_run(s);
}

std::optional<RunInfo> Ledger::latest_finished_run() const {
  Statement s(impl_->db, "SELECT " TP_RUN_COLUMNS " FROM runs WHERE finished IS NOT NULL ORDER BY id DESC LIMIT 1");
  if (!s.step()) return std::nullopt;
  return read_run(s);
}

std::vector<RunInfo> Ledger::runs() const {
  Statement s(impl_->db, "SELECT " TP_RUN_COLUMNS " FROM runs ORDER BY id");
  std::vector<RunInfo> out;
  while (s.step()) out.push_back(read_run(s));
  return out;
}

std::vector<BridgeRecord> Ledger::run_results(RunId run) const {
  std::vector<BridgeRecord> out;
  for (StoredRecord& s : load_records(impl_->db, kRunRecords, [&](Statement& st) { st.bind(1, run); }))
    out.push_back(std::move(s.record));
  return out;
}

std::optional<BridgeRecord> Ledger::previous_record(const std::string& structure_id,
                                                    std::optional<RunId> before_run) const {
  Statement find(impl_->db,
                 "SELECT id FROM results WHERE structure_id = ?1 AND (?2 IS NULL OR run < ?2) "
                 "ORDER BY run DESC LIMIT 1");
  find.bind(1, structure_id).bind(2, before_run);
  if (!find.step()) return std::nullopt;
  const std::int64_t id = find.column_int(0);
  auto records = load_records(impl_->db, kOneRecord, [&](Statement& st) { st.bind(1, id); });
  if (records.empty()) return std::nullopt;
  return std::move(records.front().record);
}

std::vector<HistoryEntry> Ledger::history(const std::string& structure_id) const {
  std::map<RunId, std::string> started;
  for (const RunInfo& r : runs()) started.emplace(r.id, r.started);
  std::vector<HistoryEntry> out;
  for (StoredRecord& s : load_records(impl_->db, kBridgeRecords, [&](Statement& st) { st.bind(1, structure_id); }))
    out.push_back(HistoryEntry{s.run, started[s.run], std::move(s.record)});
  return out;
}

ChangeReport Ledger::changes(RunId from, RunId to, double threshold) const {
  const auto from_run = run(from);
  if (!from_run) throw LedgerError(impl_->db.path(), fmt::format("there is no run {} in this ledger", from));
  const auto to_run = run(to);
  if (!to_run) throw LedgerError(impl_->db.path(), fmt::format("there is no run {} in this ledger", to));
  ChangeReport report =
      compare_records(run_results(from), run_results(to), threshold, std::string_view(to_run->started).substr(0, 10));
  report.from = from;
  report.to = to;
  return report;
}

void Ledger::merge(const std::vector<std::filesystem::path>& shards) {
  Database& db = impl_->db;
  struct ShardRun {
    std::size_t shard = 0;
    RunInfo info;
  };
  std::vector<Ledger> opened;
  std::vector<ShardRun> shard_runs;
  for (std::size_t i = 0; i < shards.size(); ++i) {
    std::error_code ec;
    if (!std::filesystem::is_regular_file(shards[i], ec))
      throw LedgerError(shards[i], "no such shard ledger; nothing was merged");
    if (std::filesystem::equivalent(shards[i], db.path(), ec))
      throw LedgerError(shards[i], "is the ledger being merged into; nothing was merged");
    opened.push_back(Ledger::open(shards[i]));
    for (RunInfo& r : opened.back().runs()) shard_runs.push_back({i, std::move(r)});
  }
  // Renumbered in the order they started, so run ids stay chronological.
  std::stable_sort(shard_runs.begin(), shard_runs.end(),
                   [](const ShardRun& a, const ShardRun& b) { return a.info.started < b.info.started; });

  Transaction transaction(db);
  std::map<std::pair<std::size_t, RunId>, RunId> target;  // (shard, its run) -> run here
  std::map<std::string, RunId> batch_run;                 // batch -> run here
  std::map<std::string, std::vector<RunInfo>> batch_parts;
  for (const ShardRun& sr : shard_runs) {
    if (sr.info.batch.empty()) {
      target[{sr.shard, sr.info.id}] = impl_->insert_run(sr.info);
      continue;
    }
    auto found = batch_run.find(sr.info.batch);
    if (found == batch_run.end()) {
      std::vector<RunInfo> parts;
      Statement existing(db, "SELECT " TP_RUN_COLUMNS " FROM runs WHERE batch = ?1 ORDER BY id LIMIT 1");
      existing.bind(1, sr.info.batch);
      RunId id = 0;
      if (existing.step()) {
        parts.push_back(read_run(existing));
        id = parts.back().id;
      } else {
        id = impl_->insert_run(sr.info);
      }
      found = batch_run.emplace(sr.info.batch, id).first;
      batch_parts[sr.info.batch] = std::move(parts);
    }
    batch_parts[sr.info.batch].push_back(sr.info);
    target[{sr.shard, sr.info.id}] = found->second;
  }
  for (const auto& [batch, parts] : batch_parts) {
    RunInfo combined = combine_runs(parts);
    combined.id = batch_run.at(batch);
    impl_->update_run(combined);
  }

  // Copy the records. Within a batch a bridge may come from one shard only.
  std::map<std::pair<RunId, std::string>, std::size_t> origin;  // (run here, bridge key) -> shard
  Statement already(db,
                    "SELECT 1 FROM results WHERE run = ?1 AND ((?2 <> '' AND structure_id = ?2) OR "
                    "(?2 = '' AND structure_id = '' AND file = ?3))");
  Statement carried_rows(db,
                         "SELECT COALESCE(rows_of, id) FROM results WHERE run = ?1 AND structure_id = ?2 AND "
                         "status = 'rated'");
  for (const ShardRun& sr : shard_runs) {
    const RunId here = target.at({sr.shard, sr.info.id});
    for (BridgeRecord& record : opened[sr.shard].run_results(sr.info.id)) {
      if (record.carried_from) {
        const auto mapped = target.find({sr.shard, *record.carried_from});
        record.carried_from = mapped == target.end() ? std::nullopt : std::optional<RunId>(mapped->second);
      }
      if (!sr.info.batch.empty()) {
        const std::string key = record.structure_id.empty() ? "file " + record.file : record.structure_id;
        const std::string shown = record.structure_id.empty() ? record.file : record.structure_id;
        const auto [it, fresh] = origin.emplace(std::pair{here, key}, sr.shard);
        if (!fresh)
          throw LedgerError(shards[sr.shard], fmt::format("bridge '{}' of batch '{}' is also in {}; nothing was merged",
                                                          shown, sr.info.batch, shards[it->second].string()));
        already.reset();
        already.bind(1, here).bind(2, record.structure_id).bind(3, record.file);
        if (already.step())
          throw LedgerError(
              shards[sr.shard],
              fmt::format("bridge '{}' of batch '{}' is already in {} (merged before?); nothing was merged", shown,
                          sr.info.batch, db.path().string()));
        already.reset();
      }
      check_finite(db, record);
      // A carried record shares the rows of the record it carries, when
      // that one is here already (merged in this call or before).
      std::optional<std::int64_t> rows_of;
      if (record.status == BridgeStatus::unchanged && record.carried_from && !record.structure_id.empty()) {
        carried_rows.reset();
        carried_rows.bind(1, *record.carried_from).bind(2, record.structure_id);
        if (carried_rows.step()) rows_of = carried_rows.column_int(0);
        carried_rows.reset();
      }
      impl_->insert_record(here, record, rows_of);
    }
  }
  transaction.commit();
}

bool Ledger::integrity_ok() const {
  Statement s(impl_->db, "PRAGMA integrity_check");
  std::vector<std::string> rows;
  while (s.step()) rows.push_back(s.column_text(0));
  return rows.size() == 1 && rows.front() == "ok";
}

}  // namespace tenthpoint::ledger
