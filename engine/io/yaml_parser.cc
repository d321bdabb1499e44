#include "engine/io/yaml_parser.h"

#include <charconv>
#include <cmath>
#include <map>
#include <sstream>

#include <fmt/format.h>
#include <yaml-cpp/eventhandler.h>
#include <yaml-cpp/exceptions.h>
#include <yaml-cpp/mark.h>
#include <yaml-cpp/parser.h>

namespace tenthpoint::io {
namespace {

// Thrown from inside the event handler to stop the parser at the first
// refusal; caught in parse_yaml and turned into one diagnostic.
struct Refusal {
  SourceLocation where;
  std::string message;
};

SourceLocation location(const std::string& file, const YAML::Mark& mark) {
  // yaml-cpp marks are 0-based; people count lines and columns from 1.
  return SourceLocation{file, mark.line + 1, mark.column + 1};
}

bool is_digits(std::string_view s, int base) {
  if (s.empty()) return false;
  for (char c : s) {
    const bool ok = base == 8    ? (c >= '0' && c <= '7')
                    : base == 16 ? ((c >= '0' && c <= '9') || (c >= 'a' && c <= 'f') || (c >= 'A' && c <= 'F'))
                                 : (c >= '0' && c <= '9');
    if (!ok) return false;
  }
  return true;
}

// YAML 1.2 core schema float: [-+]? ( . [0-9]+ | [0-9]+ ( . [0-9]* )? ) ( [eE] [-+]? [0-9]+ )?
bool is_core_float(std::string_view s) {
  std::size_t i = 0;
  if (i < s.size() && (s[i] == '+' || s[i] == '-')) ++i;
  std::size_t digits = 0;
  while (i < s.size() && s[i] >= '0' && s[i] <= '9') ++i, ++digits;
  if (i < s.size() && s[i] == '.') {
    ++i;
    while (i < s.size() && s[i] >= '0' && s[i] <= '9') ++i, ++digits;
  }
  if (digits == 0) return false;
  if (i < s.size() && (s[i] == 'e' || s[i] == 'E')) {
    ++i;
    if (i < s.size() && (s[i] == '+' || s[i] == '-')) ++i;
    std::size_t exponent = 0;
    while (i < s.size() && s[i] >= '0' && s[i] <= '9') ++i, ++exponent;
    if (exponent == 0) return false;
  }
  return i == s.size();
}

bool is_non_finite_spelling(std::string_view s) {
  if (!s.empty() && (s[0] == '+' || s[0] == '-')) s.remove_prefix(1);
  return s == ".inf" || s == ".Inf" || s == ".INF" || s == ".nan" || s == ".NaN" || s == ".NAN";
}

bool is_null_spelling(std::string_view s) { return s.empty() || s == "~" || s == "null" || s == "Null" || s == "NULL"; }

std::optional<bool> bool_spelling(std::string_view s) {
  if (s == "true" || s == "True" || s == "TRUE") return true;
  if (s == "false" || s == "False" || s == "FALSE") return false;
  return std::nullopt;
}

// Integer per the core schema; values beyond int64 fall back to a real.
bool resolve_integer(std::string_view s, YamlNode& node) {
  std::string_view digits = s;
  bool negative = false;
  int base = 10;
  if (digits.size() > 2 && digits[0] == '0' && (digits[1] == 'o' || digits[1] == 'x')) {
    base = digits[1] == 'o' ? 8 : 16;
    digits.remove_prefix(2);
  } else if (!digits.empty() && (digits[0] == '+' || digits[0] == '-')) {
    negative = digits[0] == '-';
    digits.remove_prefix(1);
  }
  if (!is_digits(digits, base)) return false;
  std::uint64_t magnitude = 0;
  auto [ptr, ec] = std::from_chars(digits.data(), digits.data() + digits.size(), magnitude, base);
  constexpr std::uint64_t kMax = static_cast<std::uint64_t>(INT64_MAX);
  if (ec != std::errc() || ptr != digits.data() + digits.size() || magnitude > kMax) {
    node.kind = YamlKind::real;
    node.real = std::strtod(std::string(s).c_str(), nullptr);
    return true;
  }
  node.kind = YamlKind::integer;
  node.integer = negative ? -static_cast<std::int64_t>(magnitude) : static_cast<std::int64_t>(magnitude);
  return true;
}

class TreeBuilder final : public YAML::EventHandler {
 public:
  TreeBuilder(const std::string& file, const YamlLimits& limits) : file_(file), limits_(limits) {}

  std::optional<YamlNode>& root() { return root_; }
  bool saw_document() const { return saw_document_; }

  void OnDocumentStart(const YAML::Mark& mark) override {
    if (saw_document_)
      throw Refusal{location(file_, mark), "a second yaml document starts here; a file holds exactly one record"};
    saw_document_ = true;
  }
  void OnDocumentEnd() override {}

  void OnNull(const YAML::Mark& mark, YAML::anchor_t anchor) override {
    YamlNode node = start_node(mark);
    node.kind = YamlKind::null;
    finish(std::move(node), anchor);
  }

  void OnAlias(const YAML::Mark& mark, YAML::anchor_t anchor) override {
    if (++aliases_ > limits_.max_aliases)
      throw Refusal{location(file_, mark),
                    fmt::format("too many yaml aliases (more than {}); write the values out", limits_.max_aliases)};
    auto it = anchored_.find(anchor);
    if (it == anchored_.end()) throw Refusal{location(file_, mark), "yaml alias refers to a node that contains it"};
    node_count_ += it->second.node_count();
    check_node_count(mark);
    finish(it->second, 0);
  }

  void OnScalar(const YAML::Mark& mark, const std::string& tag, YAML::anchor_t anchor,
                const std::string& value) override {
    if (value.size() > limits_.max_scalar_length)
      throw Refusal{location(file_, mark), fmt::format("value is too long ({} characters; the limit is {})",
                                                       value.size(), limits_.max_scalar_length)};
    YamlNode node = start_node(mark);
    node.text = value;
    resolve_scalar(node, tag, mark);
    finish(std::move(node), anchor);
  }

  void OnSequenceStart(const YAML::Mark& mark, const std::string& tag, YAML::anchor_t anchor,
                       YAML::EmitterStyle::value) override {
    open(mark, tag, anchor, YamlKind::sequence);
  }
  void OnSequenceEnd() override { close(); }

  void OnMapStart(const YAML::Mark& mark, const std::string& tag, YAML::anchor_t anchor,
                  YAML::EmitterStyle::value) override {
    open(mark, tag, anchor, YamlKind::mapping);
  }
  void OnMapEnd() override {
    if (stack_.back().has_key)
      throw Refusal{stack_.back().key_where, "mapping key has no value"};  // not reachable with yaml-cpp; defensive
    close();
  }

 private:
  struct Frame {
    YamlNode node;
    YAML::anchor_t anchor = 0;
    bool has_key = false;  // mapping: a key was read and waits for its value
    std::string key;
    SourceLocation key_where;
    std::map<std::string, int> key_lines;  // keys read so far -> their line
  };

  YamlNode start_node(const YAML::Mark& mark) {
    ++node_count_;
    check_node_count(mark);
    YamlNode node;
    node.where = location(file_, mark);
    return node;
  }

  void check_node_count(const YAML::Mark& mark) const {
    if (node_count_ > limits_.max_nodes)
      throw Refusal{
          location(file_, mark),
          fmt::format("document is too large (more than {} values after expanding aliases)", limits_.max_nodes)};
  }

  void open(const YAML::Mark& mark, const std::string& tag, YAML::anchor_t anchor, YamlKind kind) {
    if (static_cast<int>(stack_.size()) >= limits_.max_depth)
      throw Refusal{location(file_, mark), fmt::format("nesting is too deep (more than {} levels)", limits_.max_depth)};
    const bool standard = tag == "?" || tag == "!" || tag.empty() ||
                          tag == (kind == YamlKind::mapping ? "tag:yaml.org,2002:map" : "tag:yaml.org,2002:seq");
    if (!standard) throw Refusal{location(file_, mark), fmt::format("unsupported yaml tag '{}'", tag)};
    Frame frame;
    frame.node = start_node(mark);
    frame.node.kind = kind;
    frame.anchor = anchor;
    stack_.push_back(std::move(frame));
  }

  void close() {
    Frame frame = std::move(stack_.back());
    stack_.pop_back();
    finish(std::move(frame.node), frame.anchor);
  }

  void resolve_scalar(YamlNode& node, const std::string& tag, const YAML::Mark& mark) const {
    const std::string_view text = node.text;
    if (tag == "!" || tag == "tag:yaml.org,2002:str") {
      node.kind = YamlKind::string;
      return;
    }
    const bool plain = tag == "?";
    const bool want_null = tag == "tag:yaml.org,2002:null", want_bool = tag == "tag:yaml.org,2002:bool";
    const bool want_int = tag == "tag:yaml.org,2002:int", want_float = tag == "tag:yaml.org,2002:float";
    if (!plain && !want_null && !want_bool && !want_int && !want_float)
      throw Refusal{location(file_, mark), fmt::format("unsupported yaml tag '{}'", tag)};
    if ((plain || want_null) && is_null_spelling(text)) {
      node.kind = YamlKind::null;
      return;
    }
    if (plain || want_bool) {
      if (auto b = bool_spelling(text)) {
        node.kind = YamlKind::boolean;
        node.boolean = *b;
        return;
      }
    }
    if (plain || want_int || want_float) {
      if (is_non_finite_spelling(text))
        throw Refusal{location(file_, mark), fmt::format("'{}' is not a finite number", node.text)};
      if ((plain || want_int) && resolve_integer(text, node)) return;
      if ((plain || want_float) && is_core_float(text)) {
        node.kind = YamlKind::real;
        node.real = std::strtod(node.text.c_str(), nullptr);
        if (!std::isfinite(node.real))
          throw Refusal{location(file_, mark), fmt::format("'{}' is too large to be a number", node.text)};
        return;
      }
    }
    if (!plain) throw Refusal{location(file_, mark), fmt::format("'{}' does not fit its tag '{}'", node.text, tag)};
    node.kind = YamlKind::string;
  }

  // Attaches a completed node to its parent (as a key, a value or an item) or
  // makes it the root; remembers anchored nodes for later aliases.
  void finish(YamlNode node, YAML::anchor_t anchor) {
    if (anchor != 0) anchored_[anchor] = node;
    if (stack_.empty()) {
      root_ = std::move(node);
      return;
    }
    Frame& parent = stack_.back();
    if (parent.node.kind == YamlKind::sequence) {
      parent.node.items.push_back(std::move(node));
      return;
    }
    if (!parent.has_key) {
      if (!node.is_scalar() || node.kind == YamlKind::null)
        throw Refusal{node.where, "mapping keys must be plain names"};
      if (node.text == "<<")
        throw Refusal{node.where, "yaml merge keys ('<<') are not supported; write the fields out"};
      // A set per mapping keeps the duplicate check linear: a hostile file may
      // hold a mapping with a hundred thousand keys.
      const auto [first, inserted] = parent.key_lines.emplace(node.text, node.where.line);
      if (!inserted)
        throw Refusal{node.where, fmt::format("duplicate key '{}' (first given at line {})", node.text, first->second)};
      parent.has_key = true;
      parent.key = node.text;
      parent.key_where = node.where;
      return;
    }
    parent.node.members.push_back(YamlMember{std::move(parent.key), parent.key_where, std::move(node)});
    parent.has_key = false;
    parent.key.clear();
  }

  const std::string& file_;
  const YamlLimits& limits_;
  std::vector<Frame> stack_;
  std::map<YAML::anchor_t, YamlNode> anchored_;
  std::optional<YamlNode> root_;
  std::size_t node_count_ = 0;
  std::size_t aliases_ = 0;
  bool saw_document_ = false;
};

Diagnostic error_at(SourceLocation where, std::string message) {
  return Diagnostic{Severity::error, std::move(where), "", std::move(message)};
}

}  // namespace

YamlParseResult parse_yaml(std::string_view text, const std::string& file, const YamlLimits& limits) {
  YamlParseResult result;
  if (text.size() > limits.max_file_bytes) {
    result.diagnostics.push_back(error_at(
        SourceLocation{file, 0, 0},
        fmt::format("file is too large ({} bytes; the limit is {} bytes)", text.size(), limits.max_file_bytes)));
    return result;
  }
  if (auto problem = check_text(text, file)) {
    result.diagnostics.push_back(std::move(*problem));
    return result;
  }
  std::istringstream stream{std::string(text)};
  TreeBuilder builder(file, limits);
  try {
    YAML::Parser parser(stream);
    while (parser.HandleNextDocument(builder)) {
    }
  } catch (const Refusal& refusal) {
    result.diagnostics.push_back(error_at(refusal.where, refusal.message));
    return result;
  } catch (const YAML::ParserException& e) {
    result.diagnostics.push_back(error_at(location(file, e.mark), "yaml syntax: " + e.msg));
    return result;
  } catch (const YAML::Exception& e) {
    result.diagnostics.push_back(error_at(location(file, e.mark), "yaml: " + e.msg));
    return result;
  }
  if (!builder.root() || builder.root()->kind == YamlKind::null) {
    result.diagnostics.push_back(
        error_at(SourceLocation{file, 0, 0}, "file is empty (no yaml content besides comments and blank lines)"));
    return result;
  }
  result.root = std::move(builder.root());
  return result;
}

YamlParseResult parse_yaml_file(const std::string& path, const YamlLimits& limits) {
  TextFile file = read_text_file(path, limits.max_file_bytes);
  if (!file.text) return YamlParseResult{std::nullopt, std::move(file.diagnostics)};
  return parse_yaml(*file.text, path, limits);
}

}  // namespace tenthpoint::io
