#include "engine/report/results_document.h"

#include <algorithm>
#include <map>
#include <tuple>
#include <utility>

#include "engine/core/units.h"
#include "engine/report/finite_numbers.h"

namespace tenthpoint::report {
namespace {

using nlohmann::json;
using units::Quantity;

// An empty array with room for `n` entries: the columns have one entry per
// point or rating, so reserving spares the regrowth of every column.
json column(std::size_t n) {
  json out = json::array();
  out.get_ref<json::array_t&>().reserve(n);
  return out;
}

// Converts internal SI values to the bridge's own units.
struct UserUnits {
  units::UnitSystem system;

  [[nodiscard]] double operator()(Real value, Quantity q) const { return units::from_internal(value, q, system); }
  [[nodiscard]] json array(const std::vector<Real>& values, Quantity q) const {
    json out = column(values.size());
    for (Real v : values) out.push_back((*this)(v, q));
    return out;
  }
  [[nodiscard]] json optional(const std::optional<Real>& value, Quantity q) const {
    return value ? json((*this)(*value, q)) : json(nullptr);
  }
  [[nodiscard]] std::string label(Quantity q) const { return std::string(units::label(q, system)); }
};

std::string str(std::string_view s) { return std::string(s); }

json optional_date(const std::optional<CalendarDate>& date) { return date ? json(date->to_iso()) : json(nullptr); }

json plain_array(const std::vector<Real>& values) {
  json out = column(values.size());
  for (Real v : values) out.push_back(v);
  return out;
}

bool is_service(rating::LimitState state) {
  return state == rating::LimitState::service_i || state == rating::LimitState::service_ii ||
         state == rating::LimitState::service_iii;
}

// The quantity of a rating's capacity and terms: a moment or a force for the
// strength limit states, a stress for the service ones (C = fR, MBE 6A.4.2.1).
Quantity rating_quantity(const rating::PointRating& p) {
  if (is_service(p.limit_state)) return Quantity::stress;
  return p.effect == rating::RatedEffect::shear ? Quantity::force : Quantity::moment;
}

json units_table(const UserUnits& u) {
  return {{"system", str(units::to_string(u.system))},
          {"length", u.label(Quantity::length)},
          {"moment", u.label(Quantity::moment)},
          {"force", u.label(Quantity::force)},
          {"line_load", u.label(Quantity::line_load)},
          {"stress", u.label(Quantity::stress)},
          {"angle", u.label(Quantity::angle)},
          // Posting signs read in short tons (US) or tonnes (SI).
          {"weight", u.system == units::UnitSystem::us ? "ton" : "tonne"},
          {"factors", "dimensionless"}};
}

json inputs_echo(const model::Bridge& b, const pipeline::BridgeRating& r, const UserUnits& u) {
  json spans = json::array();
  for (Real s : b.geometry.span_lengths) spans.push_back(u(s, Quantity::length));
  json supports = json::array();
  for (model::SupportKind s : b.geometry.supports) supports.push_back(str(model::to_string(s)));
  json continuity = json::array();
  for (model::Continuity c : b.geometry.continuity) continuity.push_back(str(model::to_string(c)));
  json girders = json::array();
  for (const model::GirderLine& g : b.girders)
    girders.push_back({{"girder_id", g.id},
                       {"position", str(model::to_string(g.position))},
                       {"count", g.count},
                       {"spacing", u(g.spacing, Quantity::length)}});
  const model::Inspection* inspection = b.latest_inspection(b.rating.as_of);
  json inspection_json = nullptr;
  if (inspection != nullptr)
    inspection_json = {{"date", inspection->date.to_iso()},
                       {"deck_condition", inspection->deck_condition},
                       {"superstructure_condition", inspection->superstructure_condition},
                       {"section_loss_records", inspection->section_loss.size()}};
  return {{"method", str(model::to_string(r.method))},
          {"policy", {{"id", r.policy_id}, {"version", r.policy_version}, {"edition", r.edition}}},
          {"vehicle_set", r.vehicle_set},
          {"rating_date", r.rating_date.to_iso()},
          {"as_of", optional_date(b.rating.as_of)},
          {"material", str(model::to_string(b.materials.kind))},
          {"composite", b.materials.composite},
          {"adtt", b.traffic.adtt ? json(*b.traffic.adtt) : json(nullptr)},
          {"lanes", b.traffic.lanes},
          {"clear_roadway_width", u(b.traffic.clear_roadway_width, Quantity::length)},
          {"skew", u(b.geometry.skew, Quantity::angle)},
          {"spans", std::move(spans)},
          {"supports", std::move(supports)},
          {"continuity", std::move(continuity)},
          {"girders", std::move(girders)},
          {"inspection", std::move(inspection_json)}};
}

json points_json(const std::vector<analysis::AnalysisPoint>& points, const UserUnits& u) {
  json out = json::array();
  for (std::size_t i = 0; i < points.size(); ++i) {
    const analysis::AnalysisPoint& p = points[i];
    // Spans and supports are numbered from 1 for people, as in the labels.
    out.push_back({{"index", i},
                   {"station", u(p.station, Quantity::length)},
                   {"span", p.span + 1},
                   {"span_fraction", p.span_fraction},
                   {"support", p.support ? json(*p.support + 1) : json(nullptr)},
                   {"label", p.label()}});
  }
  return out;
}

json dead_loads_json(const pipeline::GirderLineDetail& d, const UserUnits& u) {
  json out = json::array();
  for (const pipeline::ComponentAtPoints& c : d.dead_loads)
    out.push_back({{"component", str(model::to_string(c.component))},
                   {"moment", u.array(c.moment, Quantity::moment)},
                   {"shear_left", u.array(c.shear_left, Quantity::force)},
                   {"shear_right", u.array(c.shear_right, Quantity::force)}});
  return out;
}

json distribution_json(const distribution::GirderLineFactors* factors, const pipeline::GirderLineDetail& d) {
  json list = json::array();
  if (factors != nullptr)
    for (const distribution::DistributionFactor& f : factors->factors) {
      json warnings = json::array();
      for (const std::string& w : f.warnings) warnings.push_back(w);
      list.push_back({{"region", str(distribution::to_string(f.region))},
                      // span (positive moment, shear) or support (negative moment), from 1
                      {"number", f.index + 1},
                      {"value", f.value},
                      {"method", str(distribution::to_string(f.method))},
                      {"one_lane", f.one_lane},
                      {"multi_lane", f.multi_lane ? json(*f.multi_lane) : json(nullptr)},
                      {"warnings", std::move(warnings)}});
    }
  return {{"factors", std::move(list)},
          {"at_points",
           {{"positive_moment", plain_array(d.distribution.moment_positive)},
            {"negative_moment", plain_array(d.distribution.moment_negative)},
            {"shear", plain_array(d.distribution.shear)}}}};
}

json impact_json(const pipeline::GirderLineDetail& d) {
  return {{"positive_moment", plain_array(d.impact.positive_moment)},
          {"negative_moment", plain_array(d.impact.negative_moment)},
          {"shear", plain_array(d.impact.shear)},
          {"applies_to_lane", d.impact.applies_to_lane}};
}

// The variable links of a chain in chain order, as TrainPlacement's
// variable_spacings holds their values: a link between two trains is a gap,
// the others axle spacings.
json variable_links(const live_load::AxleChain& chain) {
  json out = json::array();
  for (std::size_t link = 0; link < chain.links.size(); ++link) {
    if (!chain.links[link].variable()) continue;
    const bool gap = chain.axles_per_train > 0 && (link + 1) % chain.axles_per_train == 0;
    out.push_back({{"link", link + 1}, {"kind", gap ? "gap" : "spacing"}});
  }
  return out;
}

// One extreme of one effect as columns, one entry per analysis point (a
// table of arrays, not an array of objects: the document stays small and
// quick to build for a nightly run of many bridges).
json envelope_columns(const pipeline::LoadModelEnvelope& m,
                      const std::vector<live_load::ExtremePair<pipeline::EnvelopeEntry>>& values,
                      live_load::Extreme extreme, Quantity q, const UserUnits& u) {
  const std::size_t n = values.size();
  json cases = column(n), train = column(n), lane = column(n), combined = column(n);
  json distributed = column(n), distributed_case = column(n);
  json direction = column(n), lead = column(n), approach = column(n), links = column(n), dropped = column(n);
  for (const auto& pair : values) {
    const pipeline::EnvelopeEntry& e = pair[extreme];
    const pipeline::EnvelopeCase* c = e.static_case >= 0 ? &m.cases[static_cast<std::size_t>(e.static_case)] : nullptr;
    const live_load::AxleChain* chain = c && c->chain ? &*c->chain : nullptr;
    cases.push_back(e.static_case >= 0 ? json(e.static_case) : json(nullptr));
    train.push_back(u(e.train, q));
    lane.push_back(u(e.lane, q));
    combined.push_back(u(e.total, q));
    distributed.push_back(u(e.distributed, q));
    distributed_case.push_back(e.distributed_case >= 0 ? json(e.distributed_case) : json(nullptr));
    if (!e.placement || chain == nullptr) {
      for (json* column : {&direction, &lead, &approach, &links, &dropped}) column->push_back(nullptr);
      continue;
    }
    const live_load::TrainPlacement& p = *e.placement;
    direction.push_back(str(live_load::to_string(p.direction)));
    lead.push_back(u(p.lead_station, Quantity::length));
    approach.push_back(str(live_load::to_string(p.approach)));
    json v = json::array();
    const std::size_t variable = std::min(chain->variable_link_count(), live_load::kMaxVariableLinks);
    for (std::size_t i = 0; i < variable; ++i) v.push_back(u(p.variable_spacings[i], Quantity::length));
    links.push_back(std::move(v));
    json d = json::array();
    for (std::size_t axle = 0; axle < chain->axle_count(); ++axle)
      if (p.is_dropped(axle)) d.push_back(axle + 1);
    dropped.push_back(std::move(d));
  }
  return {{"case", std::move(cases)},
          {"train", std::move(train)},
          {"lane", std::move(lane)},
          {"combined", std::move(combined)},
          {"distributed", std::move(distributed)},
          {"distributed_case", std::move(distributed_case)},
          {"direction", std::move(direction)},
          {"lead_axle_station", std::move(lead)},
          {"approach", std::move(approach)},
          {"variable_links", std::move(links)},
          {"dropped_axles", std::move(dropped)}};
}

json envelope_entries(const pipeline::LoadModelEnvelope& m,
                      const std::vector<live_load::ExtremePair<pipeline::EnvelopeEntry>>& values, Quantity q,
                      const UserUnits& u) {
  return {{"maximum", envelope_columns(m, values, live_load::Extreme::maximum, q, u)},
          {"minimum", envelope_columns(m, values, live_load::Extreme::minimum, q, u)}};
}

const rating::LoadModelRating* find_model(const rating::GirderRating& g, const std::string& id) {
  for (const rating::LoadModelRating& m : g.load_models)
    if (m.load_model_id == id) return &m;
  return nullptr;
}

json live_load_json(const pipeline::GirderLineDetail& d, const rating::GirderRating* girder, const UserUnits& u) {
  json out = json::array();
  for (const pipeline::LoadModelEnvelope& m : d.envelopes) {
    json cases = json::array();
    for (const pipeline::EnvelopeCase& c : m.cases) {
      json axles = json::array();
      json spacings = json::array();
      if (c.chain) {
        for (Real w : c.chain->weights) axles.push_back(u(w, Quantity::force));
        for (const live_load::AxleLink& l : c.chain->links)
          spacings.push_back({{"min", u(l.min, Quantity::length)},
                              {"max", l.bounded() ? json(u(l.max, Quantity::length)) : json(nullptr)}});
      }
      cases.push_back({{"case_id", c.case_id},
                       {"train", c.chain ? json(c.chain->train_id) : json(nullptr)},
                       {"trains", c.chain ? c.chain->train_count : 0},
                       {"axle_weights", std::move(axles)},
                       {"axle_spacings", std::move(spacings)},
                       {"variable_links", c.chain ? variable_links(*c.chain) : json::array()},
                       {"lane", c.has_lane}});
    }
    const rating::LoadModelRating* rated = girder ? find_model(*girder, m.load_model_id) : nullptr;
    out.push_back({{"load_model_id", m.load_model_id},
                   {"name", rated ? rated->name : std::string()},
                   {"category", rated ? str(model::to_string(rated->category)) : std::string()},
                   {"cases", std::move(cases)},
                   {"moment", envelope_entries(m, m.moment, Quantity::moment, u)},
                   {"shear_left", envelope_entries(m, m.shear_left, Quantity::force, u)},
                   {"shear_right", envelope_entries(m, m.shear_right, Quantity::force, u)}});
  }
  return out;
}

// Capacities at every point, from the ratings (rate_girder_line computes them
// once per point). For concrete shear by the general procedure the
// resistance depends on the demand, so it differs between load models: the
// smallest is shown here, and every rating row carries its own C.
json capacities_json(const rating::GirderRating& g, std::size_t point_count, const UserUnits& u) {
  struct Found {
    Real resistance = 0;
    Real capacity_factor = 1;
    std::string article;
  };
  // (point, slot) -> smallest resistance; slot 0 M+, 1 M-, 2 V left, 3 V right.
  std::map<std::pair<std::size_t, int>, Found> found;
  for (const rating::LoadModelRating& m : g.load_models)
    for (const rating::LevelRating& l : m.levels)
      for (const rating::PointRating& p : l.points) {
        if (is_service(p.limit_state)) continue;  // an allowable stress, not a resistance
        const int slot = p.effect == rating::RatedEffect::positive_moment   ? 0
                         : p.effect == rating::RatedEffect::negative_moment ? 1
                         : p.side == "left"                                 ? 2
                                                                            : 3;
        auto [it, inserted] = found.try_emplace({p.point, slot});
        if (inserted || p.resistance < it->second.resistance)
          it->second = {p.resistance, p.capacity_factor, p.resistance_article};
      }
  json out = json::array();
  const char* names[] = {"positive_moment", "negative_moment", "shear_left", "shear_right"};
  for (std::size_t i = 0; i < point_count; ++i) {
    json row{{"point", i}};
    for (int slot = 0; slot < 4; ++slot) {
      auto it = found.find({i, slot});
      row[names[slot]] = it == found.end()
                             ? json(nullptr)
                             : json{{"phi_rn", u(it->second.resistance, slot < 2 ? Quantity::moment : Quantity::force)},
                                    {"capacity_factor", it->second.capacity_factor},
                                    {"article", it->second.article}};
    }
    out.push_back(std::move(row));
  }
  return out;
}

json terms_json(const rating::RatingFactorResult& r, Quantity q, const UserUnits& u) {
  json out = json::array();
  for (const rating::FactoredTerm& t : r.terms)
    out.push_back({{"name", t.name}, {"factor", t.factor}, {"value", u(t.value, q)}});
  return out;
}

json rating_factor_value(const rating::RatingFactorResult& r) {
  return r.status == rating::RatingStatus::rated ? json(r.rating_factor) : json(nullptr);
}

json point_rating_json(const rating::PointRating& p, const UserUnits& u) {
  const Quantity q = rating_quantity(p);
  json row{{"point", p.point},
           {"effect", str(rating::to_string(p.effect))},
           {"side", p.side},
           {"limit_state", str(rating::to_string(p.limit_state))},
           {"rating_factor", rating_factor_value(p.result)},
           {"capacity", u(p.result.capacity, q)},
           {"permanent_factored", u(p.result.permanent, q)},
           {"live_factored", u(p.result.live, q)},
           {"distribution", p.distribution},
           {"impact", p.impact},
           {"gamma_ll", p.gamma_ll},
           {"case", p.case_id},
           // Service limit states: the flange or fibre whose stress is rated.
           {"fibre", p.fibre},
           {"station", u(p.station, Quantity::length)},
           {"label", p.label},
           {"level", str(model::to_string(p.level))},
           {"resistance", u(p.resistance, q)},
           {"resistance_article", p.resistance_article},
           {"capacity_factor", p.capacity_factor},
           {"terms", terms_json(p.result, q, u)}};
  return row;
}

// Every rated point of one load model and level as columns, one entry per
// rating (see envelope_columns for why columns).
json rating_columns(const std::vector<rating::PointRating>& points, const UserUnits& u) {
  const std::size_t n = points.size();
  json point = column(n), effect = column(n), side = column(n), limit_state = column(n), fibre = column(n),
       rf = column(n), capacity = column(n), permanent = column(n), live = column(n), distribution = column(n),
       impact = column(n), gamma = column(n), load_case = column(n);
  for (const rating::PointRating& p : points) {
    const Quantity q = rating_quantity(p);
    point.push_back(p.point);
    effect.push_back(str(rating::to_string(p.effect)));
    side.push_back(p.side);
    limit_state.push_back(str(rating::to_string(p.limit_state)));
    fibre.push_back(p.fibre);
    rf.push_back(rating_factor_value(p.result));
    capacity.push_back(u(p.result.capacity, q));
    permanent.push_back(u(p.result.permanent, q));
    live.push_back(u(p.result.live, q));
    distribution.push_back(p.distribution);
    impact.push_back(p.impact);
    gamma.push_back(p.gamma_ll);
    load_case.push_back(p.case_id);
  }
  return {{"point", std::move(point)},        {"effect", std::move(effect)},
          {"side", std::move(side)},          {"limit_state", std::move(limit_state)},
          {"fibre", std::move(fibre)},        {"rating_factor", std::move(rf)},
          {"capacity", std::move(capacity)},  {"permanent_factored", std::move(permanent)},
          {"live_factored", std::move(live)}, {"distribution", std::move(distribution)},
          {"impact", std::move(impact)},      {"gamma_ll", std::move(gamma)},
          {"case", std::move(load_case)}};
}

json ratings_json(const rating::GirderRating& g, const UserUnits& u) {
  json out = json::array();
  for (const rating::LoadModelRating& m : g.load_models)
    for (const rating::LevelRating& l : m.levels) {
      json points = rating_columns(l.points, u);
      json factors = json::array();
      for (const rating::LimitStateFactor& f : l.factors)
        factors.push_back(
            {{"limit_state", str(rating::to_string(f.limit_state))}, {"gamma_ll", f.gamma_ll}, {"source", f.source}});
      out.push_back({{"load_model_id", m.load_model_id},
                     {"level", str(model::to_string(l.level))},
                     {"permit_type", m.permit_type},
                     {"factors", std::move(factors)},
                     {"factor_source", l.factor_source},
                     {"points", std::move(points)},
                     {"governing", l.governing ? point_rating_json(*l.governing, u) : json(nullptr)}});
    }
  return out;
}

json strings(const std::vector<std::string>& list) {
  json out = json::array();
  for (const std::string& s : list) out.push_back(s);
  return out;
}

json governing_json(const pipeline::BridgeRating& r, const UserUnits& u) {
  json out = json::array();
  for (const pipeline::GoverningRating& g : r.governing) {
    const rating::PointRating& p = g.at;
    out.push_back({{"load_model_id", g.load_model_id},
                   {"name", g.name},
                   {"category", str(model::to_string(g.category))},
                   {"level", str(model::to_string(g.level))},
                   {"rating_factor", rating_factor_value(p.result)},
                   {"vehicle_weight", u.optional(g.rating_weight, Quantity::weight_tons)},
                   {"rating", u.optional(g.rating_weight_rated, Quantity::weight_tons)},
                   {"girder_id", g.girder_id},
                   {"at", point_rating_json(p, u)},
                   {"screened_out", g.screened_out},
                   {"screening_reason", g.screening_reason}});
  }
  return out;
}

json postings_json(const pipeline::BridgeRating& r, const UserUnits& u) {
  json out = json::array();
  for (const pipeline::VehiclePosting& p : r.postings) {
    const bool posted = p.decision.status == rating::PostingStatus::post;
    out.push_back({{"load_model_id", p.load_model_id},
                   {"name", p.name},
                   {"rating_factor", p.rating_factor},
                   {"vehicle_weight", u(p.rating_weight, Quantity::weight_tons)},
                   {"status", str(rating::to_string(p.decision.status))},
                   {"safe_load", posted ? json(u(p.decision.safe_load, Quantity::weight_tons)) : json(nullptr)},
                   {"posted_weight", posted ? json(u(p.decision.posted_weight, Quantity::weight_tons)) : json(nullptr)},
                   {"reason", p.decision.reason}});
  }
  return out;
}

}  // namespace

json results_document(const model::Bridge& bridge, const pipeline::BridgeRating& rating,
                      const ResultsContext& context) {
  const UserUnits u{bridge.units};
  json girders = json::array();
  for (std::size_t i = 0; i < rating.girders.size(); ++i) {
    const rating::GirderRating& g = rating.girders[i];
    const model::GirderLine* line = bridge.find_girder(g.girder_id);
    const pipeline::GirderLineDetail empty{};
    const pipeline::GirderLineDetail& d = i < rating.details.size() ? rating.details[i] : empty;
    const distribution::GirderLineFactors* factors = i < rating.distribution.size() ? &rating.distribution[i] : nullptr;
    girders.push_back({{"girder_id", g.girder_id},
                       {"position", line ? str(model::to_string(line->position)) : std::string("interior")},
                       {"count", g.girder_count},
                       {"points", points_json(d.points, u)},
                       {"dead_load", dead_loads_json(d, u)},
                       {"distribution", distribution_json(factors, d)},
                       {"impact", impact_json(d)},
                       {"live_load", live_load_json(d, &g, u)},
                       {"capacities", capacities_json(g, d.points.size(), u)},
                       {"ratings", ratings_json(g, u)},
                       {"warnings", strings(g.warnings)}});
  }

  json doc{{"format", kResultsFormat},
           {"format_version", kResultsFormatVersion},
           {"engine_version", context.engine_version},
           {"run", {{"id", context.run_id ? json(*context.run_id) : json(nullptr)}, {"time", context.run_time}}},
           {"caution", kCaution},
           {"units", units_table(u)},
           {"bridge",
            {{"structure_id", rating.bridge_id},
             {"name", bridge.identity.name},
             {"feature_carried", bridge.identity.feature_carried},
             {"feature_crossed", bridge.identity.feature_crossed},
             {"year_built", bridge.identity.year_built},
             {"district", bridge.identity.district},
             {"owner", bridge.identity.owner},
             {"file", context.source_file},
             {"inputs_hash", context.inputs_hash}}},
           {"inputs", inputs_echo(bridge, rating, u)},
           {"girders", std::move(girders)},
           {"governing", governing_json(rating, u)},
           {"screening", strings(rating.screening)},
           {"postings", postings_json(rating, u)},
           {"recommendation",
            {{"status", str(rating::to_string(rating.recommendation))}, {"reason", rating.recommendation_reason}}},
           {"deadlines",
            {{"rerate_by", optional_date(rating.deadlines.rerate_by)},
             {"post_by", optional_date(rating.deadlines.post_by)}}},
           {"warnings", strings(rating.warnings)}};
  // One walk rounds the numbers and checks that each is finite; the path of
  // a non-finite one is looked for only when there is one.
  bool finite = true;
  for (auto it = doc.begin(); it != doc.end(); ++it) {
    const bool exact = it.key() == "governing" || it.key() == "postings";
    finite =
        (exact ? !first_non_finite(it.value()).has_value() : round_numbers(it.value(), kResultsSignificantDigits)) &&
        finite;
  }
  if (!finite) require_finite(doc, rating.bridge_id, "results.json");
  return doc;
}

}  // namespace tenthpoint::report
