#include "engine/io/policy_reader.h"

#include <algorithm>
#include <filesystem>
#include <map>
#include <set>

#include <fmt/format.h>

#include "engine/io/data_reference.h"
#include "engine/io/field_reader.h"
#include "engine/io/name_suggestion.h"
#include "engine/io/schema_validator.h"
#include "engine/io/vehicle_reader.h"
#include "engine/io/yaml_merge.h"

namespace tenthpoint::io {
namespace {

using units::Quantity;

Diagnostic error_at(SourceLocation where, std::string field, std::string message) {
  return Diagnostic{Severity::error, std::move(where), std::move(field), std::move(message)};
}

void append(Diagnostics& to, const Diagnostics& from) { to.insert(to.end(), from.begin(), from.end()); }

// One policy file and everything it extends, merged.
struct Chain {
  std::optional<YamlNode> merged;
  std::vector<std::string> files;  // the policy first, then what it extends
  Diagnostics diagnostics;
};

class ChainLoader {
 public:
  explicit ChainLoader(const PolicyReadOptions& options) : options_(options) {}

  Chain load_parsed(YamlParseResult parsed, const std::string& label, int depth) {
    Chain chain;
    chain.diagnostics = std::move(parsed.diagnostics);
    if (!parsed.root) return chain;
    const YamlNode& root = *parsed.root;
    chain.files.push_back(label);
    const YamlMember* extends = root.find_member("extends");
    if (root.kind != YamlKind::mapping || extends == nullptr) {
      chain.merged = root;
      return chain;
    }
    if (extends->value.kind != YamlKind::string) {
      chain.diagnostics.push_back(error_at(extends->value.where, "extends",
                                           "expected the name of a shipped policy or a path to a policy file"));
      return chain;
    }
    if (depth + 1 >= options_.max_extends_depth) {
      chain.diagnostics.push_back(
          error_at(extends->value.where, "extends",
                   fmt::format("policies extend one another more than {} deep", options_.max_extends_depth)));
      return chain;
    }
    std::string why;
    const std::optional<DataReference> reference = resolve_policy_reference(extends->value.text, label, why);
    if (!reference) {
      chain.diagnostics.push_back(error_at(extends->value.where, "extends", why));
      return chain;
    }
    if (std::find(visiting_.begin(), visiting_.end(), reference->label) != visiting_.end()) {
      chain.diagnostics.push_back(
          error_at(extends->value.where, "extends",
                   fmt::format("policy '{}' extends itself (through {})", label, reference->label)));
      return chain;
    }
    if (!reference->shipped_contents && !std::filesystem::exists(reference->path)) {
      chain.diagnostics.push_back(
          error_at(extends->value.where, "extends", fmt::format("policy file not found: {}", reference->path)));
      return chain;
    }
    visiting_.push_back(label);
    Chain parent = load(*reference, depth + 1);
    visiting_.pop_back();
    append(chain.diagnostics, parent.diagnostics);
    if (!parent.merged) {
      chain.diagnostics.push_back(error_at(extends->value.where, "extends",
                                           fmt::format("the policy it extends ({}) cannot be read", reference->label)));
      return chain;
    }
    check_chain_rules(root, *parent.merged, chain.diagnostics);
    YamlNode overlay = root;
    overlay.members.erase(std::remove_if(overlay.members.begin(), overlay.members.end(),
                                         [](const YamlMember& m) { return m.key == "extends"; }),
                          overlay.members.end());
    chain.merged = merge_yaml(*parent.merged, overlay);
    chain.files.insert(chain.files.end(), parent.files.begin(), parent.files.end());
    return chain;
  }

  Chain load(const DataReference& reference, int depth) {
    if (reference.shipped_contents)
      return load_parsed(parse_yaml(*reference.shipped_contents, reference.label, options_.limits), reference.label,
                         depth);
    return load_parsed(parse_yaml_file(reference.path, options_.limits), reference.label, depth);
  }

 private:
  // Numbers are converted with their own file's units, so a chain must agree
  // on them; and an extending policy is a different policy, so it must not
  // inherit the identity a rating records.
  static void check_chain_rules(const YamlNode& leaf, const YamlNode& base, Diagnostics& out) {
    const YamlNode* leaf_units = leaf.find("units");
    const YamlNode* base_units = base.find("units");
    if (leaf_units != nullptr && base_units != nullptr && leaf_units->text != base_units->text)
      out.push_back(error_at(leaf_units->where, "units",
                             fmt::format("units {} differ from the policy it extends ({}); an extending policy "
                                         "must use the same units",
                                         leaf_units->text, base_units->text)));
    for (const char* key : {"id", "version"})
      if (leaf.find(key) == nullptr)
        out.push_back(error_at(leaf.where, key,
                               fmt::format("missing field '{}': an extending policy gives its own {}", key, key)));
  }

  const PolicyReadOptions& options_;
  std::vector<std::string> visiting_;
};

class PolicyBuilder {
 public:
  PolicyBuilder(const YamlNode& root, Diagnostics& out)
      : root_(root),
        out_(out),
        units_(units::parse_unit_system(root.find("units") ? root.find("units")->text : "")
                   .value_or(units::UnitSystem::us)),
        r_(root, units_) {}

  model::Policy build() {
    model::Policy p;
    p.id = r_.text("id");
    p.version = r_.text("version");
    p.name = r_.text("name");
    p.edition = r_.text("edition");
    p.units = units_;
    p.confidentiality_notice = r_.optional_text("confidentiality_notice");
    read_vehicles(p);
    read_lrfr(p.lrfr, r_.at("lrfr"), p.vehicles);
    read_lfr(p.lfr, r_.at("lfr"));
    const FieldReader da = r_.at("dynamic_allowance");
    p.dynamic_allowance.standard = da.number("standard");
    for (const auto& [name, value] : da.at("riding_surfaces").members())
      p.dynamic_allowance.riding_surfaces[name] = value.node().number();
    read_condition_factors(p);
    read_system_factor(p.system_factor, r_.at("system_factor"));
    p.minimum_condition_system_product = r_.number("minimum_condition_system_product");
    read_posting(p.posting, r_.at("posting"));
    read_screening(p);
    const FieldReader d = r_.at("deadlines");
    p.deadlines = model::Deadlines{d.integer("rerate_after_capacity_loss_days"), d.integer("post_after_rating_days")};
    return p;
  }

 private:
  void error(const FieldReader& at, std::string_view key, std::string message) {
    out_.push_back(error_at(at.where(key), at.field(key), std::move(message)));
  }
  void error(const FieldReader& at, std::string message) {
    out_.push_back(error_at(at.where(), at.field(), std::move(message)));
  }

  void read_library(const FieldReader& item, model::VehicleLibrary& library) {
    const std::string& text = item.node().text;
    std::string why;
    const std::optional<DataReference> reference = resolve_vehicle_reference(text, item.node().where.file, why);
    if (!reference) return error(item, why);
    VehicleReadResult read;
    if (reference->shipped_contents) {
      read = read_vehicle_text(*reference->shipped_contents, reference->label);
    } else if (!std::filesystem::exists(reference->path)) {
      return error(item, fmt::format("vehicle library file not found: {}", reference->path));
    } else {
      read = read_vehicle_file(reference->path);
    }
    append(out_, read.diagnostics);
    if (!read.library) return error(item, fmt::format("vehicle library {} has errors", reference->label));
    library.merge(*read.library);
  }

  // Inline vehicles are a vehicles document without its header; one is made
  // up around them (in the policy's units) so the vehicle schema and rules
  // apply unchanged and report at the policy's own lines.
  void read_inline(const FieldReader& inline_vehicles, model::VehicleLibrary& library) {
    const YamlNode& node = inline_vehicles.node();
    YamlNode document;
    document.kind = YamlKind::mapping;
    document.where = node.where;
    const auto scalar = [&](YamlKind kind, std::string text) {
      YamlNode value;
      value.kind = kind;
      value.text = text;
      value.integer = kind == YamlKind::integer ? std::stoll(text) : 0;
      value.where = node.where;
      return value;
    };
    document.members.push_back({"format_version", node.where, scalar(YamlKind::integer, "1")});
    document.members.push_back({"units", node.where, scalar(YamlKind::string, std::string(units::to_string(units_)))});
    document.members.push_back({"id", node.where, scalar(YamlKind::string, "inline")});
    document.members.push_back({"name", node.where, scalar(YamlKind::string, "inline vehicles")});
    for (const char* key : {"axle_trains", "load_models"}) {
      const YamlMember* member = node.find_member(key);
      YamlNode empty;
      empty.kind = YamlKind::sequence;
      empty.where = node.where;
      document.members.push_back({key, member ? member->key_where : node.where, member ? member->value : empty});
    }
    VehicleReadResult read = detail::read_vehicle_document(document, &library, inline_vehicles.field());
    append(out_, read.diagnostics);
    if (read.library) library.merge(*read.library);
  }

  void read_vehicles(model::Policy& p) {
    const FieldReader v = r_.at("vehicles");
    for (const FieldReader& item : v.items("libraries")) read_library(item, p.vehicles);
    if (v.has("inline")) read_inline(v.at("inline"), p.vehicles);
    for (const auto& [method_name, method_sets] : v.at("sets").members()) {
      const model::RatingMethod method =
          model::parse<model::RatingMethod>(method_name).value_or(model::RatingMethod::lrfr);
      std::vector<std::string> set_ids;
      for (const auto& [set_id, list] : method_sets.at("sets").members()) {
        set_ids.push_back(set_id);
        model::VehicleSet set{set_id, method, {}};
        const std::vector<FieldReader> items = list.items();
        for (const FieldReader& item : items) {
          const std::string& id = item.node().text;
          set.load_models.push_back(id);
          check_set_member(item, id, method, p.vehicles);
        }
        p.vehicle_sets.push_back(std::move(set));
      }
      const std::string default_set = method_sets.text("default");
      p.default_sets[method] = default_set;
      if (std::find(set_ids.begin(), set_ids.end(), default_set) == set_ids.end()) {
        std::string message = fmt::format("default set '{}' is not one of the {} sets", default_set, method_name);
        if (auto suggestion = nearest_name(default_set, set_ids))
          message += fmt::format(" (did you mean '{}'?)", *suggestion);
        error(method_sets, "default", message + (set_ids.empty() ? "" : "; expected one of: " + join_names(set_ids)));
      }
    }
  }

  void check_set_member(const FieldReader& item, const std::string& id, model::RatingMethod method,
                        const model::VehicleLibrary& library) {
    const model::LoadModel* found = library.find_load_model(id);
    if (found == nullptr) {
      std::vector<std::string> known;
      for (const model::LoadModel& m : library.load_models) known.push_back(m.id);
      std::string message = fmt::format("unknown load model '{}'", id);
      if (auto suggestion = nearest_name(id, known)) message += fmt::format(" (did you mean '{}'?)", *suggestion);
      return error(item, message + "; the policy's vehicles are: " + join_names(known));
    }
    if (!found->rated_with(method)) {
      std::vector<std::string> methods;
      for (model::RatingMethod m : found->methods) methods.emplace_back(model::to_string(m));
      error(item, fmt::format("load model '{}' is not rated with {} (its methods: {})", id, model::to_string(method),
                              join_names(methods)));
    }
  }

  static model::LevelFactors levels(const FieldReader& r) {
    return model::LevelFactors{r.number("inventory"), r.number("operating")};
  }

  void read_lrfr(model::LrfrFactors& f, const FieldReader& r, const model::VehicleLibrary& library) {
    const FieldReader s = r.at("strength_i");
    f.strength_i = model::StrengthDeadLoadFactors{s.number("dc"), s.number("dw"), s.number("dw_field_measured")};
    f.design = levels(r.at("design"));
    f.service_ii = levels(r.at("service_ii"));
    f.service_ii_legal = r.at("service_ii").optional_number("legal");
    f.service_ii_permit = r.at("service_ii").optional_number("permit");
    f.service_iii = r.at("service_iii").number("standard");
    f.service_iii_refined_losses = r.at("service_iii").number("refined_losses");
    f.service_iii_legal = r.at("service_iii").optional_number("legal");
    f.service_i_permit = r.number("service_i_permit");
    if (r.has("service_checks")) {
      const FieldReader c = r.at("service_checks");
      model::ServiceChecks& k = f.service_checks;
      k.service_ii_design_inventory = c.boolean("service_ii_design_inventory", k.service_ii_design_inventory);
      k.service_ii_design_operating = c.boolean("service_ii_design_operating", k.service_ii_design_operating);
      k.service_ii_legal = c.boolean("service_ii_legal", k.service_ii_legal);
      k.service_ii_permit = c.boolean("service_ii_permit", k.service_ii_permit);
      k.service_iii_design_inventory = c.boolean("service_iii_design_inventory", k.service_iii_design_inventory);
      k.service_iii_legal = c.boolean("service_iii_legal", k.service_iii_legal);
      k.service_i_permit = c.boolean("service_i_permit", k.service_i_permit);
    }
    const FieldReader legal = r.at("legal");
    const std::vector<FieldReader> rows = legal.items("adtt_table");
    for (std::size_t i = 0; i < rows.size(); ++i) {
      f.legal.rows.push_back(model::AdttRow{rows[i].number("adtt"), rows[i].number("gamma_ll")});
      if (i > 0 && f.legal.rows[i].adtt <= f.legal.rows[i - 1].adtt)
        error(rows[i], "adtt",
              fmt::format("ADTT rows must increase; {} follows {}", f.legal.rows[i].adtt, f.legal.rows[i - 1].adtt));
    }
    f.legal.unknown_adtt = legal.number("unknown_adtt");
    f.legal.between_rows = legal.enumeration("between_rows", model::RowInterpolation::interpolate);
    std::map<std::string, std::string> permit_of;  // load model -> permit type
    for (const auto& [id, type] : r.at("permit_types").members()) {
      f.permit_types.push_back(read_permit_type(id, type));
      if (!type.has("load_models")) continue;
      for (const FieldReader& item : type.items("load_models")) {
        const std::string& vehicle = item.node().text;
        f.permit_types.back().load_models.push_back(vehicle);
        const model::LoadModel* found = library.find_load_model(vehicle);
        if (found == nullptr) {
          std::vector<std::string> known;
          for (const model::LoadModel& m : library.load_models) known.push_back(m.id);
          std::string message = fmt::format("unknown load model '{}'", vehicle);
          if (auto suggestion = nearest_name(vehicle, known))
            message += fmt::format(" (did you mean '{}'?)", *suggestion);
          error(item, message);
        } else if (found->category != model::VehicleCategory::permit) {
          error(item,
                fmt::format("load model '{}' is a {} load, not a permit", vehicle, model::to_string(found->category)));
        }
        if (const auto [it, inserted] = permit_of.emplace(vehicle, id); !inserted)
          error(item, fmt::format("load model '{}' is already rated as permit type '{}'", vehicle, it->second));
      }
    }
    const FieldReader ev = r.at("emergency");
    f.emergency =
        model::EmergencyFactors{ev.number("gamma_ll"), ev.enumeration("lanes", model::EmergencyLanes::every_lane)};
    for (const FieldReader& m : r.items("multiple_presence")) f.multiple_presence.push_back(m.node().number());
  }

  // Rows are interpolated in ADTT and loading ratio, which needs a full grid.
  model::PermitType read_permit_type(const std::string& id, const FieldReader& r) {
    model::PermitType type;
    type.id = id;
    type.name = r.text("name");
    type.distribution = r.enumeration("distribution", model::PermitDistribution::multiple_lanes);
    type.divide_out_multiple_presence = r.boolean("divide_out_multiple_presence");
    type.dynamic_allowance = r.optional_number("dynamic_allowance");
    std::set<std::pair<Real, Real>> cells;
    std::set<Real> adtts, ratios;
    for (const FieldReader& row : r.items("rows")) {
      model::PermitRow parsed{row.number("adtt"), row.quantity("loading_ratio", Quantity::line_load),
                              row.number("gamma_ll")};
      if (!cells.emplace(parsed.adtt, parsed.loading_ratio).second)
        error(row, "a second row for the same ADTT and loading ratio");
      adtts.insert(parsed.adtt);
      ratios.insert(parsed.loading_ratio);
      type.rows.push_back(parsed);
    }
    if (cells.size() != adtts.size() * ratios.size())
      error(r, "rows",
            fmt::format("rows must form a grid: every one of the {} ADTT values with every one of the {} loading "
                        "ratios ({} rows), got {}",
                        adtts.size(), ratios.size(), adtts.size() * ratios.size(), cells.size()));
    return type;
  }

  void read_lfr(model::LfrFactors& f, const FieldReader& r) {
    f.a1 = r.number("a1");
    f.a2 = levels(r.at("a2"));
    const FieldReader i = r.at("impact");
    f.impact = model::ImpactFormula{i.quantity("numerator", Quantity::length), i.quantity("offset", Quantity::length),
                                    i.number("maximum")};
    for (const FieldReader& m : r.items("multiple_lane_reduction"))
      f.multiple_lane_reduction.push_back(m.node().number());
  }

  void read_condition_factors(model::Policy& p) {
    const std::vector<FieldReader> rows = r_.items("condition_factor");
    std::vector<int> covered(10, 0);
    for (const FieldReader& row : rows) {
      model::ConditionFactorRow parsed{row.integer("from"), row.integer("to"), row.number("phi_c")};
      if (parsed.from > parsed.to) error(row, "to", fmt::format("to ({}) is below from ({})", parsed.to, parsed.from));
      for (int rating = parsed.from; rating <= parsed.to && rating <= 9; ++rating) ++covered[rating];
      p.condition_factors.push_back(parsed);
    }
    std::vector<std::string> missing, repeated;
    for (int rating = 0; rating <= 9; ++rating) {
      if (covered[rating] == 0) missing.push_back(std::to_string(rating));
      if (covered[rating] > 1) repeated.push_back(std::to_string(rating));
    }
    if (!missing.empty())
      error(r_, "condition_factor", "rows must cover condition ratings 0 to 9; missing " + join_names(missing));
    if (!repeated.empty())
      error(r_, "condition_factor", "each condition rating must be in one row only; repeated " + join_names(repeated));
  }

  void read_system_factor(model::SystemFactorPolicy& s, const FieldReader& r) {
    s.standard = r.number("standard");
    s.shear = r.number("shear");
    for (const FieldReader& rule : r.items("rules")) {
      model::SystemFactorRule parsed;
      parsed.id = rule.text("id");
      for (const std::string& m : rule.texts("materials"))
        if (auto kind = model::parse<model::MaterialKind>(m)) parsed.materials.push_back(*kind);
      parsed.min_girders = rule.optional_integer("min_girders");
      parsed.max_girders = rule.optional_integer("max_girders");
      parsed.max_spacing = rule.optional_quantity("max_spacing", Quantity::length);
      parsed.phi_s = rule.number("phi_s");
      parsed.source = rule.text("source");
      if (parsed.min_girders && parsed.max_girders && *parsed.min_girders > *parsed.max_girders)
        error(rule, "max_girders", "max_girders is below min_girders");
      s.rules.push_back(std::move(parsed));
    }
  }

  void read_posting(model::PostingPolicy& p, const FieldReader& r) {
    p.closure_below = r.number("closure_below");
    p.posting_below = r.number("posting_below");
    p.equation_divisor = r.at("equation").number("divisor");
    p.equation_offset = r.at("equation").number("offset");
    p.rounding = r.at("rounding").enumeration("rule", model::RoundingRule::down);
    p.increment = r.at("rounding").quantity("increment", Quantity::weight_tons);
    p.minimum_posting = r.optional_quantity("minimum_posting", Quantity::weight_tons);
    p.lfr_level = r.enumeration("lfr_level", model::RatingLevel::operating);
    p.never_at_or_above_legal_weight = r.boolean("never_at_or_above_legal_weight", true);
    if (p.closure_below >= p.posting_below)
      error(r, "closure_below",
            fmt::format("closure_below ({}) must be below posting_below ({})", p.closure_below, p.posting_below));
  }

  void read_screening(model::Policy& p) {
    const FieldReader s = r_.at("screening");
    p.screening.design_operating_skips_legal = s.number("design_operating_skips_legal");
    p.screening.nrl_skips = s.number("nrl_skips");
    for (const FieldReader& item : s.items("nrl_screens")) {
      p.screening.nrl_screens.push_back(item.node().text);
      if (p.vehicles.find_load_model(item.node().text) == nullptr)
        error(item, fmt::format("unknown load model '{}'", item.node().text));
    }
    const FieldReader ev = s.at("emergency_group_1");
    p.screening.emergency_group_1_lfr_hs20_inventory = ev.number("lfr_hs20_inventory");
    p.screening.emergency_group_1_lrfr_hl93_inventory = ev.number("lrfr_hl93_inventory");
  }

  const YamlNode& root_;
  Diagnostics& out_;
  units::UnitSystem units_;
  FieldReader r_;
};

PolicyReadResult finish(Chain chain) {
  PolicyReadResult result;
  result.diagnostics = std::move(chain.diagnostics);
  if (!chain.merged || has_errors(result.diagnostics)) return result;
  Diagnostics schema = SchemaValidator::embedded("policy.schema.json").validate(*chain.merged);
  append(result.diagnostics, schema);
  if (has_errors(schema)) return result;
  model::Policy policy = PolicyBuilder(*chain.merged, result.diagnostics).build();
  policy.source_files = chain.files;
  if (!has_errors(result.diagnostics)) result.policy = std::move(policy);
  return result;
}

}  // namespace

PolicyReadResult read_policy_text(std::string_view text, const std::string& file, const PolicyReadOptions& options) {
  ChainLoader loader(options);
  return finish(loader.load_parsed(parse_yaml(text, file, options.limits), file, 0));
}

PolicyReadResult read_policy_file(const std::string& path, const PolicyReadOptions& options) {
  ChainLoader loader(options);
  return finish(loader.load_parsed(parse_yaml_file(path, options.limits), path, 0));
}

PolicyReadResult read_shipped_policy(std::string_view name, const PolicyReadOptions& options) {
  std::string why;
  const std::optional<DataReference> reference = resolve_policy_reference(name, "<shipped>/policy", why);
  if (!reference || !reference->shipped_contents)
    return PolicyReadResult{std::nullopt, {error_at(SourceLocation{std::string(name), 0, 0}, "", why)}};
  ChainLoader loader(options);
  return finish(loader.load(*reference, 0));
}

PolicyReadResult read_policy_for_bridge(const model::Bridge& bridge, const PolicyReadOptions& options) {
  if (bridge.rating.policy.empty()) return read_shipped_policy("default", options);
  std::string why;
  const std::optional<DataReference> reference =
      resolve_policy_reference(bridge.rating.policy, bridge.source_file, why);
  if (!reference) return PolicyReadResult{std::nullopt, {error_at(bridge.rating.where, "rating.policy", why)}};
  if (!reference->shipped_contents && !std::filesystem::exists(reference->path))
    return PolicyReadResult{
        std::nullopt,
        {error_at(bridge.rating.where, "rating.policy", fmt::format("policy file not found: {}", reference->path))}};
  ChainLoader loader(options);
  return finish(loader.load(*reference, 0));
}

}  // namespace tenthpoint::io
