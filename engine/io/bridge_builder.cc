#include "engine/io/bridge_builder.h"

#include <fmt/format.h>

#include "engine/io/field_reader.h"

namespace tenthpoint::io::detail {
namespace {

using units::Quantity;
using units::UnitSystem;

// Moduli the schema promises when a file leaves E out. US: 29000 ksi for
// structural and reinforcing steel (AASHTO LRFD 6.4.1, 5.4.3.2) and 28500 ksi
// for strand (5.4.4.2). SI: 200000 MPa for steel and the model's strand
// default, 196500 MPa (28500 ksi rounded); note: LRFD's SI edition gives
// 197000 MPa for strand.
Real default_steel_modulus(UnitSystem system) {
  return system == UnitSystem::us ? units::to_internal(29000.0, Quantity::stress, system) : 200.0e9;
}
Real default_strand_modulus(UnitSystem system) {
  return system == UnitSystem::us ? units::to_internal(28500.0, Quantity::stress, system) : 196.5e9;
}

std::optional<CalendarDate> read_date(const FieldReader& reader, std::string_view key, Diagnostics& diagnostics) {
  const std::optional<std::string> text = reader.optional_text(key);
  if (!text) return std::nullopt;
  if (auto date = parse_calendar_date(*text)) return date;
  diagnostics.push_back(
      Diagnostic{Severity::error, reader.where(key), reader.field(key),
                 fmt::format("'{}' is not a calendar date; expected a real date as YYYY-MM-DD", *text)});
  return std::nullopt;
}

model::Identity read_identity(const FieldReader& r) {
  model::Identity identity;
  identity.structure_id = r.text("structure_id");
  identity.name = r.text("name");
  identity.feature_carried = r.text("feature_carried");
  identity.feature_crossed = r.text("feature_crossed");
  identity.year_built = r.integer("year_built");
  identity.year_reconstructed = r.optional_integer("year_reconstructed");
  identity.district = r.text("district");
  identity.owner = r.text("owner");
  return identity;
}

model::Traffic read_traffic(const FieldReader& r) {
  model::Traffic traffic;
  traffic.adtt = r.optional_number("adtt");
  traffic.clear_roadway_width = r.quantity("clear_roadway_width", Quantity::length);
  if (auto lanes = r.optional_integer("lanes")) {
    traffic.lanes = *lanes;
  } else {
    traffic.lanes = model::design_lanes_from_width(traffic.clear_roadway_width);
    traffic.lanes_from_width = true;
  }
  return traffic;
}

model::Geometry read_geometry(const FieldReader& r) {
  model::Geometry geometry;
  geometry.skew = r.optional_quantity("skew", Quantity::angle).value_or(0.0);
  geometry.span_lengths = r.quantities("spans", Quantity::length);
  for (const std::string& s : r.texts("supports"))
    geometry.supports.push_back(model::parse<model::SupportKind>(s).value_or(model::SupportKind::roller));
  for (const std::string& c : r.texts("continuity"))
    geometry.continuity.push_back(model::parse<model::Continuity>(c).value_or(model::Continuity::continuous));
  geometry.hinges = r.quantities("hinges", Quantity::length);
  geometry.where = r.where();
  return geometry;
}

model::Steel read_steel(const FieldReader& r) {
  model::Steel steel;
  steel.yield_strength = r.quantity("fy", Quantity::stress);
  steel.tensile_strength = r.optional_quantity("fu", Quantity::stress);
  steel.modulus = r.optional_quantity("E", Quantity::stress).value_or(default_steel_modulus(r.units()));
  return steel;
}

model::Concrete read_concrete(const FieldReader& r) {
  model::Concrete concrete;
  concrete.compressive_strength = r.quantity("fc", Quantity::stress);
  concrete.modulus = r.optional_quantity("E", Quantity::stress);
  concrete.unit_weight = r.quantity("unit_weight", Quantity::unit_weight);
  return concrete;
}

model::Materials read_materials(const FieldReader& r) {
  model::Materials materials;
  materials.kind = r.enumeration("kind", model::MaterialKind::rolled_steel);
  materials.composite = r.boolean("composite");
  if (r.has("steel")) materials.steel = read_steel(r.at("steel"));
  if (r.has("girder_concrete")) materials.girder_concrete = read_concrete(r.at("girder_concrete"));
  if (r.has("deck_concrete")) materials.deck_concrete = read_concrete(r.at("deck_concrete"));
  if (r.has("reinforcement")) {
    const FieldReader bars = r.at("reinforcement");
    materials.reinforcement =
        model::Reinforcement{bars.quantity("fy", Quantity::stress),
                             bars.optional_quantity("E", Quantity::stress).value_or(default_steel_modulus(r.units()))};
  }
  if (r.has("strand")) {
    const FieldReader s = r.at("strand");
    model::PrestressingSteel strand;
    strand.tensile_strength = s.quantity("fpu", Quantity::stress);
    strand.yield_strength = s.optional_quantity("fpy", Quantity::stress);
    strand.modulus = s.optional_quantity("E", Quantity::stress).value_or(default_strand_modulus(r.units()));
    strand.low_relaxation = s.boolean("low_relaxation", true);
    materials.strand = strand;
  }
  materials.modular_ratio = r.optional_number("modular_ratio");
  materials.long_term_modular_factor = r.number("long_term_modular_factor", 3.0);
  return materials;
}

model::ElasticSection read_elastic(const FieldReader& r) {
  model::ElasticSection s;
  s.area = r.quantity("area", Quantity::area);
  s.inertia = r.quantity("inertia", Quantity::inertia);
  s.section_modulus_top = r.optional_quantity("section_modulus_top", Quantity::section_modulus);
  s.section_modulus_bottom = r.optional_quantity("section_modulus_bottom", Quantity::section_modulus);
  s.section_modulus_deck = r.optional_quantity("section_modulus_deck", Quantity::section_modulus);
  return s;
}

model::SectionProperties read_properties(const FieldReader& r) {
  model::SectionProperties p;
  p.noncomposite = read_elastic(r.at("noncomposite"));
  if (r.has("long_term")) p.long_term = read_elastic(r.at("long_term"));
  if (r.has("short_term")) p.short_term = read_elastic(r.at("short_term"));
  if (r.has("cracked_negative")) p.cracked_negative = read_elastic(r.at("cracked_negative"));
  return p;
}

model::Plate read_plate(const FieldReader& r, std::string_view width_key = "width") {
  return model::Plate{r.quantity(width_key, Quantity::section_length),
                      r.quantity("thickness", Quantity::section_length)};
}

std::vector<model::BarLayer> read_bar_layers(const std::vector<FieldReader>& layers) {
  std::vector<model::BarLayer> out;
  for (const FieldReader& layer : layers)
    out.push_back(
        model::BarLayer{layer.quantity("area", Quantity::area), layer.quantity("depth", Quantity::section_length)});
  return out;
}

model::SteelIGirder read_steel_i(const FieldReader& r) {
  model::SteelIGirder g;
  g.designation = r.text("designation");
  g.top_flange = read_plate(r.at("top_flange"));
  g.web = read_plate(r.at("web"), "depth");
  g.bottom_flange = read_plate(r.at("bottom_flange"));
  if (r.has("top_cover_plate")) g.top_cover_plate = read_plate(r.at("top_cover_plate"));
  if (r.has("bottom_cover_plate")) g.bottom_cover_plate = read_plate(r.at("bottom_cover_plate"));
  g.longitudinally_stiffened = r.boolean("longitudinally_stiffened");
  g.transverse_stiffener_spacing = r.optional_quantity("transverse_stiffener_spacing", Quantity::section_length);
  return g;
}

model::ReinforcedConcreteBeam read_rc_beam(const FieldReader& r) {
  model::ReinforcedConcreteBeam b;
  b.height = r.quantity("height", Quantity::section_length);
  b.web_width = r.quantity("web_width", Quantity::section_length);
  // A rectangle unless a flange is described (schema: b = bw, hf = 0 when omitted).
  b.flange_width = r.optional_quantity("flange_width", Quantity::section_length).value_or(b.web_width);
  b.flange_thickness = r.optional_quantity("flange_thickness", Quantity::section_length).value_or(0.0);
  b.bottom_bars = read_bar_layers(r.items("bottom_bars"));
  b.top_bars = read_bar_layers(r.items("top_bars"));
  if (r.has("stirrups")) {
    b.stirrup_area = r.at("stirrups").quantity("area", Quantity::area);
    b.stirrup_spacing = r.at("stirrups").quantity("spacing", Quantity::section_length);
  }
  return b;
}

model::PrestressedGirder read_ps_girder(const FieldReader& r) {
  model::PrestressedGirder g;
  g.shape = r.text("shape");
  g.height = r.quantity("height", Quantity::section_length);
  g.web_width = r.quantity("web_width", Quantity::section_length);
  g.area = r.quantity("area", Quantity::area);
  g.inertia = r.quantity("inertia", Quantity::inertia);
  g.centroid_from_bottom = r.quantity("yb", Quantity::section_length);
  for (const FieldReader& layer : r.items("strands"))
    g.strands.push_back(model::StrandLayer{layer.integer("count"), layer.quantity("area", Quantity::area),
                                           layer.quantity("height", Quantity::section_length)});
  g.effective_prestress = r.optional_quantity("effective_prestress", Quantity::stress);
  if (r.has("stirrups")) {
    g.stirrup_area = r.at("stirrups").quantity("area", Quantity::area);
    g.stirrup_spacing = r.at("stirrups").quantity("spacing", Quantity::section_length);
  }
  return g;
}

model::SectionDefinition read_section(const FieldReader& r) {
  model::SectionDefinition s;
  s.id = r.text("id");
  if (r.has("properties")) s.properties = read_properties(r.at("properties"));
  if (r.has("steel_i")) s.description = read_steel_i(r.at("steel_i"));
  if (r.has("rc_beam")) s.description = read_rc_beam(r.at("rc_beam"));
  if (r.has("ps_girder")) s.description = read_ps_girder(r.at("ps_girder"));
  if (r.has("deck")) {
    const FieldReader d = r.at("deck");
    s.deck = model::DeckSlab{
        d.quantity("thickness", Quantity::section_length), d.quantity("effective_width", Quantity::section_length),
        d.optional_quantity("haunch", Quantity::section_length).value_or(0.0), read_bar_layers(d.items("bars"))};
  }
  s.where = r.where();
  return s;
}

model::GirderLine read_girder(const FieldReader& r) {
  model::GirderLine g;
  g.id = r.text("id");
  g.position = r.enumeration("position", model::GirderPosition::interior);
  g.count = r.integer("count", 1);
  g.spacing = r.quantity("spacing", Quantity::length);
  g.overhang = r.optional_quantity("overhang", Quantity::length);
  g.curb_distance = r.optional_quantity("curb_distance", Quantity::length);
  for (const FieldReader& s : r.items("segments")) {
    model::Segment segment;
    segment.start = s.quantity("start", Quantity::length);
    segment.end = s.quantity("end", Quantity::length);
    segment.section = s.text("section");
    segment.end_section = s.optional_text("end_section");
    segment.taper = s.optional_enumeration<model::Taper>("taper");
    segment.where = s.where();
    g.segments.push_back(std::move(segment));
  }
  g.brace_stations = r.quantities("brace_stations", Quantity::length);
  g.where = r.where();
  return g;
}

model::DeadLoad read_dead_load(const FieldReader& r) {
  model::DeadLoad load;
  load.component = r.enumeration("component", model::DeadLoadComponent::dc1);
  load.description = r.text("description");
  load.scope = r.enumeration("scope", model::LoadScope::per_girder);
  load.rule = r.enumeration("distribution", model::DistributionRule::equal);
  load.girders = r.texts("girders");
  if (r.has("uniform")) {
    const FieldReader u = r.at("uniform");
    load.shape =
        model::UniformLoad{u.quantity("intensity", Quantity::line_load), u.optional_quantity("start", Quantity::length),
                           u.optional_quantity("end", Quantity::length)};
  } else if (r.has("point")) {
    const FieldReader p = r.at("point");
    load.shape = model::PointLoad{p.quantity("force", Quantity::force), p.quantity("station", Quantity::length)};
  } else if (r.has("wearing_surface")) {
    const FieldReader w = r.at("wearing_surface");
    load.shape = model::WearingSurface{w.quantity("thickness", Quantity::section_length),
                                       w.quantity("unit_weight", Quantity::unit_weight),
                                       w.optional_quantity("width", Quantity::length), w.boolean("field_measured")};
  }
  load.where = r.where();
  return load;
}

model::CapacityInput read_capacity(const FieldReader& r) {
  model::CapacityInput capacity;
  capacity.mode = r.enumeration("mode", model::CapacitySource::computed);
  for (const FieldReader& g : r.items("given")) {
    model::GivenCapacity given;
    given.girders = g.texts("girders");
    given.start = g.quantity("start", Quantity::length);
    given.end = g.quantity("end", Quantity::length);
    given.moment_positive = g.optional_quantity("moment_positive", Quantity::moment);
    given.moment_negative = g.optional_quantity("moment_negative", Quantity::moment);
    given.shear = g.optional_quantity("shear", Quantity::force);
    given.source = g.text("source");
    given.where = g.where();
    capacity.given.push_back(std::move(given));
  }
  return capacity;
}

model::Inspection read_inspection(const FieldReader& r, Diagnostics& diagnostics) {
  model::Inspection inspection;
  inspection.date = read_date(r, "date", diagnostics).value_or(CalendarDate{});
  inspection.deck_condition = r.integer("deck");
  inspection.superstructure_condition = r.integer("superstructure");
  inspection.substructure_condition = r.optional_integer("substructure");
  inspection.inspector = r.text("inspector");
  inspection.notes = r.text("notes");
  for (const FieldReader& l : r.items("section_loss")) {
    model::SectionLoss loss;
    loss.girder = l.text("girder");
    loss.start = l.quantity("start", Quantity::length);
    loss.end = l.quantity("end", Quantity::length);
    loss.element = l.enumeration("element", model::SectionElement::web);
    loss.thickness_loss = l.optional_quantity("thickness_loss", Quantity::section_length);
    loss.percent_loss = l.optional_number("percent_loss");
    loss.note = l.text("note");
    loss.where = l.where();
    inspection.section_loss.push_back(std::move(loss));
  }
  inspection.where = r.where();
  return inspection;
}

model::RatingRequest read_rating(const FieldReader& r, Diagnostics& diagnostics) {
  model::RatingRequest rating;
  rating.method = r.enumeration("method", model::RatingMethod::lrfr);
  rating.vehicle_set = r.text("vehicle_set");
  rating.policy = r.text("policy");
  rating.riding_surface = r.text("riding_surface");
  rating.condition_factor = r.optional_number("condition_factor");
  rating.system_factor = r.optional_number("system_factor");
  rating.as_of = read_date(r, "as_of", diagnostics);
  for (const FieldReader& o : r.items("distribution_overrides")) {
    model::DistributionOverride override_;
    override_.girder = o.text("girder");
    override_.effect = o.enumeration("effect", model::ForceEffect::moment);
    override_.value = o.number("value");
    override_.reason = o.text("reason");
    override_.where = o.where();
    rating.distribution_overrides.push_back(std::move(override_));
  }
  rating.where = r.where();
  return rating;
}

}  // namespace

model::Bridge build_bridge(const YamlNode& root, Diagnostics& diagnostics) {
  const UnitSystem system =
      units::parse_unit_system(root.find("units") != nullptr ? root.find("units")->text : "").value_or(UnitSystem::us);
  const FieldReader r(root, system);
  model::Bridge bridge;
  bridge.source_file = root.where.file;
  bridge.units = system;
  bridge.format_version = r.integer("format_version", 1);
  bridge.identity = read_identity(r.at("identity"));
  bridge.traffic = read_traffic(r.at("traffic"));
  bridge.geometry = read_geometry(r.at("geometry"));
  bridge.materials = read_materials(r.at("materials"));
  for (const FieldReader& s : r.items("sections")) bridge.sections.push_back(read_section(s));
  for (const FieldReader& g : r.items("girders")) bridge.girders.push_back(read_girder(g));
  for (const FieldReader& d : r.items("dead_loads")) bridge.dead_loads.push_back(read_dead_load(d));
  bridge.capacity = read_capacity(r.at("capacity"));
  for (const FieldReader& i : r.items("inspections")) bridge.inspections.push_back(read_inspection(i, diagnostics));
  bridge.rating = read_rating(r.at("rating"), diagnostics);
  for (const FieldReader& p : r.items("points_of_interest"))
    bridge.points_of_interest.push_back(
        model::NamedPoint{p.quantity("station", Quantity::length), p.text("label"), p.where()});
  bridge.notes = r.text("notes");
  return bridge;
}

}  // namespace tenthpoint::io::detail
