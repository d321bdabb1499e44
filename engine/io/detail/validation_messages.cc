#include "engine/io/detail/validation_messages.h"

#include <algorithm>
#include <cctype>
#include <set>

#include <fmt/format.h>

#include "engine/io/detail/schema_navigator.h"
#include "engine/io/name_suggestion.h"

namespace tenthpoint::io::detail {

using ojson = nlohmann::ordered_json;
using Schemas = std::vector<const ojson*>;

namespace {

// Strings longer than this are never given to std::regex, whose recursive
// matcher overflows the stack somewhere above 10^4 characters.
constexpr std::size_t kLongestPatternSubject = 4096;

// How the schema's patterns read to a person, by the definition that holds them.
const std::map<std::string, std::string>& pattern_phrases() {
  static const std::map<std::string, std::string> kPhrases{
      {"id", "expected an id: letters, digits, '.', '_', '-' or spaces, starting with a letter or digit"},
      {"date", "expected a date written YYYY-MM-DD"},
  };
  return kPhrases;
}

std::string truncate(const std::string& text, std::size_t longest = 40) {
  if (text.size() <= longest) return text;
  return text.substr(0, longest) + "...";
}

// What the user wrote, for "(got ...)".
std::string describe(const YamlNode& node) {
  switch (node.kind) {
    case YamlKind::null:
      return "nothing";
    case YamlKind::boolean:
    case YamlKind::integer:
    case YamlKind::real:
      return node.text;
    case YamlKind::string:
      return "'" + truncate(node.text) + "'";
    case YamlKind::sequence:
      return "a list";
    case YamlKind::mapping:
      return "a mapping";
  }
  return "?";
}

std::string type_phrase(const std::string& type) {
  if (type == "number") return "a number";
  if (type == "integer") return "a whole number";
  if (type == "string") return "text";
  if (type == "boolean") return "true or false";
  if (type == "array") return "a list";
  if (type == "object") return "a mapping";
  if (type == "null") return "nothing";
  return type;
}

bool kind_matches_type(YamlKind kind, const std::string& type) {
  if (type == "number") return kind == YamlKind::integer || kind == YamlKind::real;
  if (type == "integer") return kind == YamlKind::integer;
  if (type == "string") return kind == YamlKind::string;
  if (type == "boolean") return kind == YamlKind::boolean;
  if (type == "array") return kind == YamlKind::sequence;
  if (type == "object") return kind == YamlKind::mapping;
  if (type == "null") return kind == YamlKind::null;
  return false;
}

std::string value_text(const ojson& value) { return value.is_string() ? value.get<std::string>() : value.dump(); }

std::string format_number(double value) { return fmt::format("{}", value); }

std::string plural(std::size_t n, const char* one, const char* many) {
  return fmt::format("{} {}", n, n == 1 ? one : many);
}

bool starts_with(const std::string& text, std::string_view prefix) { return text.rfind(prefix, 0) == 0; }

// The quoted name in a valijson message such as "Missing required property 'x'.".
std::string quoted_name(const std::string& message) {
  const std::size_t first = message.find('\'');
  const std::size_t last = message.rfind('\'');
  if (first == std::string::npos || last <= first) return "";
  return message.substr(first + 1, last - first - 1);
}

std::vector<std::string> string_list(const ojson& value) {
  std::vector<std::string> out;
  if (!value.is_array()) return out;
  for (const ojson& v : value)
    if (v.is_string()) out.push_back(v.get<std::string>());
  return out;
}

enum class Kind {
  propagation,
  any_of_none,
  one_of_none,
  one_of_many,
  negation,
  required,
  unknown_field,
  type,
  enumeration,
  constant,
  bound,
  item_count,
  string_length,
  dependency,
  other,
};

Kind classify(const std::string& message) {
  if (starts_with(message, "Failed to validate item #") || starts_with(message, "Cannot validate item #") ||
      starts_with(message, "Failed to validate against schema associated with") ||
      starts_with(message, "Failed to validate against additional properties schema") ||
      starts_with(message, "Failed to validate against dependent schema") ||
      starts_with(message, "Failed to validate against a conditional schema") ||
      starts_with(message, "Failed to validate against child schema"))
    return Kind::propagation;
  if (starts_with(message, "Failed to validate against any schemas allowed by anyOf")) return Kind::any_of_none;
  if (starts_with(message, "Failed to validate against any child schemas allowed by oneOf")) return Kind::one_of_none;
  if (starts_with(message, "Failed to validate against exactly one child schema")) return Kind::one_of_many;
  if (starts_with(message, "Target should not validate against schema specified in 'not'")) return Kind::negation;
  if (starts_with(message, "Missing required property")) return Kind::required;
  if (starts_with(message, "Object contains a property that could not be validated")) return Kind::unknown_field;
  if (starts_with(message, "Value type not permitted")) return Kind::type;
  if (starts_with(message, "Failed to match against any enum values")) return Kind::enumeration;
  if (starts_with(message, "Failed to match expected value set by 'const'")) return Kind::constant;
  if (starts_with(message, "Expected number")) return Kind::bound;
  if (starts_with(message, "Array should contain")) return Kind::item_count;
  if (starts_with(message, "String should be")) return Kind::string_length;
  if (starts_with(message, "Missing dependency")) return Kind::dependency;
  return Kind::other;
}

std::string lower_first(std::string text) {
  if (!text.empty()) text[0] = static_cast<char>(std::tolower(static_cast<unsigned char>(text[0])));
  if (!text.empty() && text.back() == '.') text.pop_back();
  return text;
}

// The branch groups of a oneOf / anyOf where every branch only lists
// required fields: {"oneOf": [{"required": ["a"]}, {"required": ["b"]}]}.
struct ChoiceGroup {
  std::vector<std::string> names;
  std::vector<const ojson*> branches;
};

std::optional<ChoiceGroup> required_choice(const ojson& combinator, const SchemaNavigator& navigator) {
  if (!combinator.is_array() || combinator.empty()) return std::nullopt;
  ChoiceGroup group;
  for (const ojson& branch : combinator) {
    const ojson& resolved = navigator.resolve(branch);
    if (!resolved.is_object() || resolved.size() != 1 || !resolved.contains("required")) return std::nullopt;
    for (const std::string& name : string_list(resolved["required"]))
      if (std::find(group.names.begin(), group.names.end(), name) == group.names.end()) group.names.push_back(name);
    group.branches.push_back(&resolved);
  }
  return group;
}

class MessageBuilder {
 public:
  MessageBuilder(const SchemaForMessages& impl, const YamlNode& root)
      : impl_(impl), root_(root), navigator_(impl.document) {}

  Diagnostics build(const std::vector<RawValidationError>& raw) {
    plan_combinators(raw);
    for (const RawValidationError& error : raw) translate(error);
    emit_missing();
    check_patterns(root_, {}, navigator_.expand(impl_.document));
    return std::move(out_);
  }

 private:
  struct Suppression {
    std::string field;  // path string
    Kind kind;
    std::string name;  // for required: the property; empty = any
  };

  void emit(const YamlPath& path, std::string message, std::optional<SourceLocation> where = std::nullopt) {
    out_.push_back(
        Diagnostic{Severity::error, where ? *where : locate(root_, path), to_string(path), std::move(message)});
  }

  const YamlNode* node_at(const YamlPath& path) const { return find_node(root_, path); }

  bool suppressed(const RawValidationError& error, Kind kind) const {
    const std::string field = to_string(error.path);
    const std::string name = kind == Kind::required ? quoted_name(error.message) : "";
    return std::any_of(suppressions_.begin(), suppressions_.end(), [&](const Suppression& s) {
      return s.field == field && s.kind == kind && (s.name.empty() || s.name == name);
    });
  }

  // oneOf / anyOf / not failures: decide the one message to show and which
  // branch errors it replaces.
  void plan_combinators(const std::vector<RawValidationError>& raw) {
    for (const RawValidationError& error : raw) {
      const Kind kind = classify(error.message);
      if (kind != Kind::any_of_none && kind != Kind::one_of_none && kind != Kind::one_of_many) continue;
      const Schemas schemas = navigator_.at(error.path);
      const char* keyword = kind == Kind::any_of_none ? "anyOf" : "oneOf";
      const YamlNode* node = node_at(error.path);
      for (const ojson* schema : schemas) {
        auto it = schema->find(keyword);
        if (it == schema->end()) continue;
        if (auto group = required_choice(*it, navigator_)) {
          plan_required_choice(error.path, kind, *group, schemas, node);
        } else {
          plan_type_choice(error.path, kind, *it, node);
        }
      }
    }
  }

  void plan_required_choice(const YamlPath& path, Kind kind, const ChoiceGroup& group, const Schemas& schemas,
                            const YamlNode* node) {
    const std::string field = to_string(path);
    // Fields required outright stay reported even when a branch names them too.
    std::set<std::string> required_outright;
    for (const ojson* schema : schemas) {
      if (std::find(group.branches.begin(), group.branches.end(), schema) != group.branches.end()) continue;
      if (auto it = schema->find("required"); it != schema->end())
        for (const std::string& name : string_list(*it)) required_outright.insert(name);
    }
    for (const std::string& name : group.names)
      if (!required_outright.count(name)) suppressions_.push_back({field, Kind::required, name});
    if (kind == Kind::one_of_many) {
      std::vector<std::string> present;
      for (const std::string& name : group.names)
        if (node != nullptr && node->find(name) != nullptr) present.push_back(name);
      planned_.push_back(
          {path, fmt::format("give only one of: {} (found {})", join_names(group.names), join_names(present))});
    } else if (kind == Kind::one_of_none) {
      planned_.push_back({path, fmt::format("expected one of the fields: {}", join_names(group.names))});
    } else {
      planned_.push_back({path, fmt::format("expected at least one of the fields: {}", join_names(group.names))});
    }
  }

  // A oneOf / anyOf over different types (a number, or a [min, max] list):
  // when the value has none of the types say so once; otherwise the errors
  // inside the branch of the value's type are the useful ones.
  void plan_type_choice(const YamlPath& path, Kind kind, const ojson& combinator, const YamlNode* node) {
    std::vector<std::string> types;
    bool matches_a_type = false;
    for (const ojson& branch : combinator) {
      const ojson& resolved = navigator_.resolve(branch);
      auto type = resolved.find("type");
      if (type == resolved.end() || !type->is_string()) return;
      types.push_back(type_phrase(type->get<std::string>()));
      if (node != nullptr && kind_matches_type(node->kind, type->get<std::string>())) matches_a_type = true;
    }
    const std::string field = to_string(path);
    suppressions_.push_back({field, Kind::type, ""});
    if (kind == Kind::one_of_many) {
      planned_.push_back({path, "matches more than one allowed form"});
    } else if (!matches_a_type && node != nullptr) {
      std::string expected;
      for (std::size_t i = 0; i < types.size(); ++i) expected += (i == 0 ? "" : " or ") + types[i];
      planned_.push_back({path, fmt::format("expected {} (got {})", expected, describe(*node))});
    }
  }

  void translate(const RawValidationError& error) {
    const Kind kind = classify(error.message);
    if (kind == Kind::propagation) return;
    if (kind == Kind::any_of_none || kind == Kind::one_of_none || kind == Kind::one_of_many) {
      for (auto it = planned_.begin(); it != planned_.end(); ++it) {
        if (to_string(it->path) == to_string(error.path)) {
          emit(it->path, it->message);
          planned_.erase(it);
          return;
        }
      }
      return;  // a branch-level error explains it
    }
    if (suppressed(error, kind)) return;
    const YamlNode* node = node_at(error.path);
    const Schemas schemas = navigator_.at(error.path);
    switch (kind) {
      case Kind::required:
        return missing_field(error.path, quoted_name(error.message), schemas, node);
      case Kind::unknown_field:
        return unknown_fields(error.path, schemas, node);
      case Kind::negation:
        return exclusive_fields(error.path, schemas, node);
      case Kind::dependency:
        return missing_dependency(error.path, quoted_name(error.message), schemas, node);
      default:
        break;
    }
    if (node == nullptr) return emit(error.path, lower_first(error.message));
    switch (kind) {
      case Kind::type:
        return wrong_type(error.path, schemas, *node);
      case Kind::enumeration:
        return not_in_enum(error.path, schemas, *node);
      case Kind::constant:
        return not_const(error.path, schemas, *node);
      case Kind::bound:
        return out_of_bounds(error, schemas, *node);
      case Kind::item_count:
        return wrong_item_count(error, schemas, *node);
      case Kind::string_length:
        return wrong_length(error, schemas, *node);
      default:
        return emit(error.path, lower_first(error.message));
    }
  }

  // "when kind is rolled_steel" for a field that an if/then requires.
  std::string required_because(const std::string& name, const Schemas& schemas, const YamlNode* node) const {
    if (node == nullptr) return "";
    for (const ojson* schema : schemas) {
      for (const ojson* conditional : navigator_.expand(*schema)) {
        auto if_schema = conditional->find("if");
        auto then_schema = conditional->find("then");
        if (if_schema == conditional->end() || then_schema == conditional->end()) continue;
        const ojson& then_resolved = navigator_.resolve(*then_schema);
        const auto required = string_list(then_resolved.value("required", ojson::array()));
        if (std::find(required.begin(), required.end(), name) == required.end()) continue;
        auto properties = if_schema->find("properties");
        if (properties == if_schema->end() || !properties->is_object()) continue;
        std::string because;
        for (auto p = properties->begin(); p != properties->end(); ++p) {
          const YamlNode* value = node->find(p.key());
          if (value == nullptr) continue;
          if (!because.empty()) because += " and ";
          because += fmt::format("{} is {}", p.key(), value->is_scalar() ? value->text : describe(*value));
        }
        if (!because.empty()) return ", required when " + because;
      }
    }
    return "";
  }

  // Missing fields are gathered per object and reported together, so a
  // nearly empty file reads as one line rather than a dozen.
  void missing_field(const YamlPath& path, const std::string& name, const Schemas& schemas, const YamlNode* node) {
    const std::string because = required_because(name, schemas, node);
    if (!because.empty())
      return emit(with_key(path, name), fmt::format("missing field '{}'{}", name, because), locate(root_, path));
    auto it = std::find_if(missing_.begin(), missing_.end(),
                           [&](const Missing& m) { return to_string(m.path) == to_string(path); });
    if (it == missing_.end()) it = missing_.insert(missing_.end(), Missing{path, {}});
    if (std::find(it->names.begin(), it->names.end(), name) == it->names.end()) it->names.push_back(name);
  }

  // valijson reports missing fields alphabetically; the schema's own order
  // (its "required" lists) reads more naturally.
  static void order_as_required(std::vector<std::string>& names, const Schemas& schemas) {
    std::vector<std::string> order;
    for (const ojson* schema : schemas)
      for (const std::string& name : string_list(schema->value("required", ojson::array()))) order.push_back(name);
    const auto rank = [&](const std::string& name) {
      return static_cast<std::size_t>(std::find(order.begin(), order.end(), name) - order.begin());
    };
    std::stable_sort(names.begin(), names.end(),
                     [&](const std::string& a, const std::string& b) { return rank(a) < rank(b); });
  }

  // A missing field that an unknown field's suggestion already names is the
  // same slip seen twice ("spann" for "spans"); report it once.
  void emit_missing() {
    for (Missing& m : missing_) {
      const std::string field = to_string(m.path);
      std::erase_if(m.names, [&](const std::string& name) {
        return std::find(suggested_.begin(), suggested_.end(), std::pair<std::string, std::string>{field, name}) !=
               suggested_.end();
      });
      if (m.names.empty()) continue;
      order_as_required(m.names, navigator_.at(m.path));
      if (m.names.size() == 1) {
        emit(with_key(m.path, m.names.front()), fmt::format("missing field '{}'", m.names.front()),
             locate(root_, m.path));
      } else {
        emit(m.path, fmt::format("missing fields: {}", join_names(m.names)));
      }
    }
  }

  void unknown_fields(const YamlPath& path, const Schemas& schemas, const YamlNode* node) {
    if (node == nullptr || node->kind != YamlKind::mapping || SchemaNavigator::allows_extra_properties(schemas)) return;
    const std::vector<std::string> allowed = SchemaNavigator::property_names(schemas);
    // valijson names only the first stranger in an object; report them all.
    for (const YamlMember& member : node->members) {
      if (std::find(allowed.begin(), allowed.end(), member.key) != allowed.end()) continue;
      std::string message = fmt::format("unknown field '{}'", truncate(member.key));
      if (auto suggestion = nearest_name(member.key, allowed)) {
        message += fmt::format(" (did you mean '{}'?)", *suggestion);
        suggested_.push_back({to_string(path), *suggestion});
      }
      message += allowed.empty() ? "; no fields are allowed here" : "; expected one of: " + join_names(allowed);
      emit(with_key(path, member.key), std::move(message), member.key_where);
    }
  }

  void exclusive_fields(const YamlPath& path, const Schemas& schemas, const YamlNode* node) {
    std::vector<std::string> names;
    for (const ojson* schema : schemas) {
      auto negated = schema->find("not");
      if (negated == schema->end()) continue;
      for (const ojson* part : navigator_.expand(*negated))
        for (const std::string& name : string_list(part->value("required", ojson::array())))
          if (std::find(names.begin(), names.end(), name) == names.end()) names.push_back(name);
    }
    if (names.empty() || node == nullptr) return emit(path, "this combination of fields is not allowed");
    std::vector<std::string> present;
    for (const std::string& name : names)
      if (node->find(name) != nullptr) present.push_back(name);
    emit(path, fmt::format("give only one of: {} (found {})", join_names(names), join_names(present)));
  }

  void missing_dependency(const YamlPath& path, const std::string& name, const Schemas& schemas, const YamlNode* node) {
    for (const ojson* schema : schemas) {
      auto dependencies = schema->find("dependencies");
      if (dependencies == schema->end() || !dependencies->is_object() || node == nullptr) continue;
      for (auto it = dependencies->begin(); it != dependencies->end(); ++it) {
        const auto needed = string_list(it.value());
        const YamlMember* trigger = node->find_member(it.key());
        if (trigger == nullptr || std::find(needed.begin(), needed.end(), name) == needed.end()) continue;
        return emit(with_key(path, name),
                    fmt::format("missing field '{}', required when '{}' is given", name, it.key()), trigger->key_where);
      }
    }
    emit(with_key(path, name), fmt::format("missing field '{}'", name), locate(root_, path));
  }

  void wrong_type(const YamlPath& path, const Schemas& schemas, const YamlNode& node) {
    std::vector<std::string> types;
    for (const ojson* schema : schemas) {
      auto type = schema->find("type");
      if (type == schema->end()) continue;
      const auto names = type->is_array() ? string_list(*type) : std::vector<std::string>{value_text(*type)};
      for (const std::string& name : names) {
        const std::string phrase = type_phrase(name);
        if (std::find(types.begin(), types.end(), phrase) == types.end()) types.push_back(phrase);
      }
    }
    std::string expected;
    for (std::size_t i = 0; i < types.size(); ++i) expected += (i == 0 ? "" : " or ") + types[i];
    if (expected.empty()) expected = "another kind of value";
    if (path.empty())
      return emit(path, fmt::format("expected a mapping of fields at the top of the file (got {})", describe(node)));
    std::string message = fmt::format("expected {} (got {})", expected, describe(node));
    if (node.kind != YamlKind::string && std::find(types.begin(), types.end(), "text") != types.end())
      message += "; put quotes around it to make it text";
    const bool wants_number = std::find(types.begin(), types.end(), "a number") != types.end() ||
                              std::find(types.begin(), types.end(), "a whole number") != types.end();
    if (node.kind == YamlKind::string && wants_number && !node.text.empty()) {
      char* end = nullptr;
      std::strtod(node.text.c_str(), &end);
      if (end == node.text.c_str() + node.text.size()) message += "; remove the quotes to make it a number";
    }
    emit(path, std::move(message));
  }

  void not_in_enum(const YamlPath& path, const Schemas& schemas, const YamlNode& node) {
    for (const ojson* schema : schemas) {
      auto values = schema->find("enum");
      if (values == schema->end() || !values->is_array()) continue;
      std::vector<std::string> names;
      for (const ojson& v : *values) names.push_back(value_text(v));
      std::string got = describe(node);
      if (node.kind == YamlKind::string)
        if (auto suggestion = nearest_name(node.text, names)) got += fmt::format("; did you mean '{}'?", *suggestion);
      return emit(path, fmt::format("expected one of: {} (got {})", join_names(names), got));
    }
    emit(path, fmt::format("value {} is not one of the allowed values", describe(node)));
  }

  void not_const(const YamlPath& path, const Schemas& schemas, const YamlNode& node) {
    for (const ojson* schema : schemas)
      if (auto c = schema->find("const"); c != schema->end())
        return emit(path, fmt::format("expected {} (got {})", value_text(*c), describe(node)));
    emit(path, fmt::format("value {} is not the required value", describe(node)));
  }

  void out_of_bounds(const RawValidationError& error, const Schemas& schemas, const YamlNode& node) {
    const double value = node.number();
    for (const ojson* schema : schemas) {
      const auto bound = [&](const char* keyword) -> std::optional<double> {
        auto it = schema->find(keyword);
        if (it == schema->end() || !it->is_number()) return std::nullopt;
        return it->get<double>();
      };
      if (auto b = bound("exclusiveMinimum"); b && !(value > *b))
        return emit(error.path, fmt::format("must be greater than {} (got {})", format_number(*b), node.text));
      if (auto b = bound("minimum"); b && !(value >= *b))
        return emit(error.path, fmt::format("must be at least {} (got {})", format_number(*b), node.text));
      if (auto b = bound("exclusiveMaximum"); b && !(value < *b))
        return emit(error.path, fmt::format("must be less than {} (got {})", format_number(*b), node.text));
      if (auto b = bound("maximum"); b && !(value <= *b))
        return emit(error.path, fmt::format("must be at most {} (got {})", format_number(*b), node.text));
    }
    emit(error.path, lower_first(error.message));
  }

  void wrong_item_count(const RawValidationError& error, const Schemas& schemas, const YamlNode& node) {
    const std::size_t n = node.items.size();
    for (const ojson* schema : schemas) {
      if (auto it = schema->find("minItems"); it != schema->end() && it->is_number() && n < it->get<std::size_t>())
        return emit(error.path,
                    fmt::format("expected at least {} (got {})", plural(it->get<std::size_t>(), "item", "items"), n));
      if (auto it = schema->find("maxItems"); it != schema->end() && it->is_number() && n > it->get<std::size_t>())
        return emit(error.path,
                    fmt::format("expected at most {} (got {})", plural(it->get<std::size_t>(), "item", "items"), n));
    }
    emit(error.path, lower_first(error.message));
  }

  void wrong_length(const RawValidationError& error, const Schemas& schemas, const YamlNode& node) {
    // JSON Schema counts characters (code points), not bytes.
    std::size_t n = 0;
    for (unsigned char c : node.text)
      if ((c & 0xC0) != 0x80) ++n;
    for (const ojson* schema : schemas) {
      if (auto it = schema->find("minLength"); it != schema->end() && it->is_number() && n < it->get<std::size_t>())
        return emit(error.path, it->get<std::size_t>() == 1
                                    ? std::string("must not be empty")
                                    : fmt::format("must be at least {} long",
                                                  plural(it->get<std::size_t>(), "character", "characters")));
      if (auto it = schema->find("maxLength"); it != schema->end() && it->is_number() && n > it->get<std::size_t>())
        return emit(error.path, fmt::format("is too long ({} characters; at most {})", n, it->get<std::size_t>()));
    }
    emit(error.path, lower_first(error.message));
  }

  void check_patterns(const YamlNode& node, const YamlPath& path, const Schemas& schemas) {
    if (node.kind == YamlKind::string) {
      for (const ojson* schema : schemas) {
        auto pattern = schema->find("pattern");
        if (pattern == schema->end() || !pattern->is_string()) continue;
        const auto max_length = schema->find("maxLength");
        if (max_length != schema->end() && max_length->is_number() && node.text.size() > max_length->get<std::size_t>())
          continue;  // already reported as too long
        if (node.text.size() > kLongestPatternSubject) continue;
        const auto compiled = impl_.patterns.find(pattern->get<std::string>());
        if (compiled == impl_.patterns.end() || std::regex_search(node.text, compiled->second)) continue;
        std::string expected;
        if (auto name = impl_.definition_names.find(schema); name != impl_.definition_names.end())
          if (auto phrase = pattern_phrases().find(name->second); phrase != pattern_phrases().end())
            expected = phrase->second;
        if (expected.empty()) expected = fmt::format("expected text matching {}", pattern->get<std::string>());
        emit(path, fmt::format("{} (got {})", expected, describe(node)));
      }
      return;
    }
    if (node.kind == YamlKind::sequence) {
      for (std::size_t i = 0; i < node.items.size(); ++i) {
        YamlPath next = path;
        next.push_back(YamlPathStep{"", i});
        check_patterns(node.items[i], next, navigator_.step(schemas, next.back()));
      }
    } else if (node.kind == YamlKind::mapping) {
      for (const YamlMember& member : node.members) {
        YamlPath next = with_key(path, member.key);
        check_patterns(member.value, next, navigator_.step(schemas, next.back()));
      }
    }
  }

  struct Missing {
    YamlPath path;
    std::vector<std::string> names;
  };

  struct Planned {
    YamlPath path;
    std::string message;
  };

  const SchemaForMessages& impl_;
  const YamlNode& root_;
  SchemaNavigator navigator_;
  std::vector<Suppression> suppressions_;
  std::vector<Planned> planned_;
  std::vector<Missing> missing_;
  std::vector<std::pair<std::string, std::string>> suggested_;  // (object path, suggested field name)
  Diagnostics out_;
};

}  // namespace

// valijson's context ["<root>", "[geometry]", "[spans]", "[1]"] as a path,
// using the document to tell an index from a key that looks like a number.
YamlPath to_yaml_path(const std::vector<std::string>& context, const YamlNode& root) {
  YamlPath path;
  const YamlNode* node = &root;
  for (const std::string& element : context) {
    if (element == "<root>" || element.size() < 2) continue;
    const std::string inner = element.substr(1, element.size() - 2);
    YamlPathStep step;
    if (node != nullptr && node->kind == YamlKind::sequence) {
      step.index = static_cast<std::size_t>(std::strtoull(inner.c_str(), nullptr, 10));
      node = *step.index < node->items.size() ? &node->items[*step.index] : nullptr;
    } else {
      step.key = inner;
      node = node != nullptr ? node->find(inner) : nullptr;
    }
    path.push_back(std::move(step));
  }
  return path;
}

Diagnostics validation_messages(const SchemaForMessages& schema, const YamlNode& root,
                                const std::vector<RawValidationError>& raw) {
  return MessageBuilder(schema, root).build(raw);
}

}  // namespace tenthpoint::io::detail
