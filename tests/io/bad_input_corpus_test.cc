// The bad-input corpus, tests/data/bad/: every file must fail (or warn) with
// the expected message at the expected line, and none may crash. The table
// below is the corpus's expectation list; a file added to the folder without
// a row here fails the last test.
#include <filesystem>
#include <set>
#include <string>

#include <catch2/catch.hpp>

#include "engine/io/bridge_reader.h"
#include "tests/io/diagnostic_search.h"

using namespace tenthpoint;
using namespace tenthpoint::io;
using tenthpoint::test::describe_all;
using tenthpoint::test::find_diagnostic;
using tenthpoint::test::source_path;

namespace {

struct Expectation {
  const char* file;
  Severity severity;
  int line;             // 0: the file as a whole (no line)
  const char* message;  // a substring of the diagnostic's message
  bool reads;           // the bridge still reads (warnings only)
};

// Errors are contradictions or unreadable input; warnings are legal values
// that look like a unit slip (the engineer decides), so those files still read.
constexpr Expectation kCorpus[] = {
    {"wrong-type.yaml", Severity::error, 30, "expected a whole number (got 'four')", false},
    {"missing-field.yaml", Severity::error, 13, "missing field 'supports'", false},
    {"unknown-field.yaml", Severity::error, 14,
     "unknown field 'spann' (did you mean 'spans'?); expected one of: skew, spans, supports, continuity", false},
    {"negative-span.yaml", Severity::error, 14, "must be greater than 0 (got -70.0)", false},
    {"segment-gap.yaml", Severity::error, 34,
     "gap of 2 ft between segments[0] (ends at 70 ft) and segments[1] (starts at 72 ft)", false},
    {"segment-overlap.yaml", Severity::error, 34,
     "overlap of 4 ft between segments[0] (ends at 70 ft) and segments[1] (starts at 66 ft)", false},
    {"support-count.yaml", Severity::error, 15, "expected 3 supports for 2 spans (one per span end), got 2", false},
    {"continuity-count.yaml", Severity::error, 16,
     "expected 1 continuity entry for 2 spans (one per interior support), got 2", false},
    {"station-outside.yaml", Severity::error, 43, "station 150 ft is beyond the end of the girder (140 ft", false},
    {"condition-12.yaml", Severity::error, 49, "must be at most 9 (got 12)", false},
    {"date-invalid.yaml", Severity::error, 47, "'2024-02-30' is not a calendar date", false},
    {"unknown-section.yaml", Severity::error, 34, "unknown section 'W33x13O' (did you mean 'W33x130'?)", false},
    {"haunch-properties-only.yaml", Severity::error, 40, "section 'P1' gives properties only; a haunched segment",
     false},
    {"three-errors.yaml", Severity::error, 9, "must be at least 1800 (got 1600)", false},
    {"fy-in-psi.yaml", Severity::warning, 20, "50000 ksi is implausible for yield stress Fy; expected 20 to 120 ksi",
     true},
    {"fy-in-psi.yaml", Severity::warning, 20, "looks like psi; expected ksi", true},
    {"span-in-inches.yaml", Severity::warning, 14, "1440.0 ft is implausible for span length; expected 3 to 1000 ft",
     true},
    {"span-in-inches.yaml", Severity::warning, 14, "looks like inches; expected ft", true},
    {"yaml-syntax.yaml", Severity::error, 6, "yaml syntax: end of sequence flow not found", false},
    {"empty.yaml", Severity::error, 0, "file is empty", false},
    {"comments-only.yaml", Severity::error, 0, "file is empty", false},
    {"plain-text.yaml", Severity::error, 1, "expected a mapping of fields at the top of the file (got 'This file is",
     false},
    {"json-array.yaml", Severity::error, 1, "expected a mapping of fields at the top of the file (got a list)", false},
    {"binary.yaml", Severity::error, 0, "not a text file (contains NUL bytes)", false},
    {"latin1.yaml", Severity::error, 5, "not UTF-8 text", false},
    {"alias-bomb.yaml", Severity::error, 7, "document is too large (more than 200000 values after expanding aliases)",
     false},
    {"alias-doubling.yaml", Severity::error, 17,
     "document is too large (more than 200000 values after expanding aliases)", false},
    {"deep-nesting.yaml", Severity::error, 3, "nesting is too deep (more than 64 levels)", false},
    {"duplicate-key.yaml", Severity::error, 20, "duplicate key 'composite' (first given at line 19)", false},
    {"two-documents.yaml", Severity::error, 52, "a second yaml document starts here", false},
};

}  // namespace

TEST_CASE("every corpus file fails with the expected message at the expected line", "[io][corpus]") {
  for (const Expectation& e : kCorpus) {
    const std::string path = source_path(std::string("tests/data/bad/") + e.file);
    const BridgeReadResult r = read_bridge_file(path);
    INFO(e.file << "\n" << describe_all(r.diagnostics));
    const Diagnostic* d = find_diagnostic(r.diagnostics, e.severity, e.message, e.line);
    CHECK(d != nullptr);
    if (d != nullptr && e.line == 0) CHECK(d->where.line == 0);
    if (d != nullptr) CHECK(d->where.file == path);
    CHECK(r.ok() == e.reads);
  }
}

TEST_CASE("the three-errors file yields exactly three errors on three lines", "[io][corpus]") {
  const BridgeReadResult r = read_bridge_file(source_path("tests/data/bad/three-errors.yaml"));
  INFO(describe_all(r.diagnostics));
  REQUIRE(r.diagnostics.size() == 3);
  CHECK(r.diagnostics[0].where.line == 9);
  CHECK(r.diagnostics[1].where.line == 18);
  CHECK(r.diagnostics[1].message.find("did you mean 'rolled_steel'?") != std::string::npos);
  CHECK(r.diagnostics[2].where.line == 48);
  CHECK(r.diagnostics[2].message == "expected a whole number (got 'ten')");
}

TEST_CASE("a file past the size limit is refused unread", "[io][corpus][hostile]") {
  // Generated here rather than kept in the corpus: 5 MiB of valid-looking YAML.
  const std::filesystem::path dir = test::scratch_directory("huge");
  const std::filesystem::path huge = dir / "huge.yaml";
  std::string text = "notes: |\n";
  while (text.size() < 5u * 1024 * 1024) text += "  a line of notes that goes on and on to fill the file\n";
  test::write_file(huge, text);
  const BridgeReadResult r = read_bridge_file(huge.string());
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "file is too large") != nullptr);
  CHECK_FALSE(r.ok());
}

TEST_CASE("an id too long for the schema is reported without crashing the pattern check", "[io][corpus][hostile]") {
  std::string text = test::read_file(source_path("tests/data/bad/wrong-type.yaml"));
  text.replace(text.find("structure_id: T-BAD"), 19, "structure_id: " + std::string(40000, 'A'));
  const BridgeReadResult r = read_bridge_text(text, "long-id.yaml");
  CHECK(find_diagnostic(r.diagnostics, Severity::error, "is too long (40000 characters; at most 64)", 5) != nullptr);
}

TEST_CASE("every file in the corpus folder has an expectation", "[io][corpus]") {
  std::set<std::string> listed;
  for (const Expectation& e : kCorpus) listed.insert(e.file);
  for (const auto& entry : std::filesystem::directory_iterator(source_path("tests/data/bad"))) {
    const std::string name = entry.path().filename().string();
    INFO(name);
    CHECK(listed.count(name) == 1);
  }
}
