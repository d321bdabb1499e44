// Shared by the ledger tests: sample records, scratch files and a raw SQLite
// view of a ledger file, so that checks read the file independently of the
// Ledger class under test.
#pragma once

#include <sqlite3.h>
#include <unistd.h>

#include <filesystem>
#include <string>
#include <vector>

#include <catch2/catch.hpp>

#include "engine/ledger/bridge_record.h"

namespace tenthpoint::ledger::test {

// A fresh directory under the system temp directory, removed first.
inline std::filesystem::path scratch_dir(const std::string& name) {
  const auto dir = std::filesystem::temp_directory_path() / ("tp-ledger-" + name + "-" + std::to_string(::getpid()));
  std::filesystem::remove_all(dir);
  std::filesystem::create_directories(dir);
  return dir;
}

// A record with every field set, optional ones included; the numbers are
// arbitrary but distinct, so a column mix-up shows.
inline BridgeRecord full_record(const std::string& id, double inventory_rf = 0.87) {
  BridgeRecord r;
  r.structure_id = id;
  r.name = "Mill Race Road over Eastvale Creek";
  r.file = "inventory/" + id + ".yaml";
  r.inputs_hash = std::string(64, 'a');
  r.status = BridgeStatus::rated;
  r.reason = "";
  r.method = "lrfr";
  r.policy_id = "eastvale-county";
  r.policy_version = "2026.1";
  r.edition = "MBE 3rd ed. 2018, 2022 interims";
  r.vehicle_set = "legal";
  r.rating_date = "2026-11-30";
  r.inspection_date = "2026-06-14";
  r.weight_unit = "ton";
  r.governing.push_back(GoverningRow{"HL-93", "HL-93 design load", "design", "inventory", inventory_rf, std::nullopt,
                                     "G2", 12.192, "span 1 @ 0.4", "positive_moment", "Strength I", false});
  r.governing.push_back(GoverningRow{"HL-93", "HL-93 design load", "design", "operating", inventory_rf * 1.3,
                                     std::nullopt, "G2", 12.192, "span 1 @ 0.4", "positive_moment", "Strength I",
                                     false});
  r.governing.push_back(GoverningRow{"TYPE-3", "AASHTO Type 3", "legal", "operating", 1.42, 35.5, "G1", 3.048,
                                     "span 1 @ 0.1", "shear", "Strength I", true});
  r.postings.push_back(PostingRow{"TYPE-3", 1.42, "none", std::nullopt, "RF >= 1.0"});
  r.postings.push_back(PostingRow{"TYPE-3S2", 0.81, "post", 29.0, "RF 0.81 < 1.0: post 29 ton"});
  r.recommendation = "post";
  r.recommendation_reason = "TYPE-3S2 RF 0.81";
  r.rerate_by = "2031-11-30";
  r.post_by = "2027-01-29";
  r.warning_count = 2;
  return r;
}

// The same bridge with every optional field unset and no child rows.
inline BridgeRecord bare_record(const std::string& id) {
  BridgeRecord r;
  r.structure_id = id;
  r.file = "inventory/" + id + ".yaml";
  r.status = BridgeStatus::failed;
  r.reason = "inventory/" + id + ".yaml:7: geometry.spans[0]: must be greater than 0";
  return r;
}

// A raw read-only connection for independent checks.
class RawDatabase {
 public:
  explicit RawDatabase(const std::filesystem::path& path) {
    REQUIRE(sqlite3_open_v2(path.c_str(), &db_, SQLITE_OPEN_READWRITE, nullptr) == SQLITE_OK);
  }
  RawDatabase(const RawDatabase&) = delete;
  RawDatabase& operator=(const RawDatabase&) = delete;
  ~RawDatabase() { sqlite3_close(db_); }

  // The rows of a constant query, each column as text ("" for NULL).
  std::vector<std::vector<std::string>> rows(const char* sql) const {
    sqlite3_stmt* s = nullptr;
    REQUIRE(sqlite3_prepare_v2(db_, sql, -1, &s, nullptr) == SQLITE_OK);
    std::vector<std::vector<std::string>> out;
    int rc = SQLITE_OK;
    while ((rc = sqlite3_step(s)) == SQLITE_ROW) {
      std::vector<std::string> row;
      for (int c = 0; c < sqlite3_column_count(s); ++c) {
        const auto* text = sqlite3_column_text(s, c);
        row.emplace_back(text != nullptr ? reinterpret_cast<const char*>(text) : "");
      }
      out.push_back(std::move(row));
    }
    const bool done = rc == SQLITE_DONE;
    sqlite3_finalize(s);
    REQUIRE(done);
    return out;
  }
  std::string value(const char* sql) const {
    const auto r = rows(sql);
    REQUIRE(!r.empty());
    return r.front().front();
  }
  void exec(const char* sql) { REQUIRE(sqlite3_exec(db_, sql, nullptr, nullptr, nullptr) == SQLITE_OK); }

 private:
  sqlite3* db_ = nullptr;
};

// Results whose stored child-row counts do not match the rows present (their
// own, or those of the result they share through rows_of): a partial
// bridge. Zero for a ledger of whole bridges.
inline constexpr const char* kPartialBridges =
    "SELECT count(*) FROM results r WHERE r.governing_count <> (SELECT count(*) FROM governing g WHERE g.result = "
    "COALESCE(r.rows_of, r.id)) OR r.posting_count <> (SELECT count(*) FROM postings p WHERE p.result = "
    "COALESCE(r.rows_of, r.id))";

}  // namespace tenthpoint::ledger::test
