// generate_inventory: writes a synthetic inventory of N bridge files for the
// batch benchmark (tools/bench_batch/run_bench), deterministic from a seed.
//
//   tenthpoint_generate_inventory --count N [--seed S] [--first K] DIR
//
// Each bridge is drawn from its own random stream (seed and index), so the
// first 1,000 bridges of a 10,000-bridge inventory are the 1,000-bridge
// inventory. The mix follows issue 6: 1-5 spans of 15-60 m (50-200 ft),
// 4-8 girders, rolled and plate steel, reinforced concrete T-beams and
// slabs, prestressed I-girders, LRFR and LFR, one or two inspections each,
// the full standard vehicle set of the policy. Files are modelled on the
// demo inventory (inventory/*.yaml) and validate against
// schemas/bridge.schema.json; the agency policy is written beside them
// (policies/synthetic-county.yaml, extending the shipped default).
//
// Sizes follow rules of thumb, not designs: span-to-depth ratios of about 25
// for steel and 20 for concrete (common practice), steel and slab weights
// from the plate areas, prestressed shapes from a small table of standard
// AASHTO and bulb-tee outlines (properties from memory). The structures are
// invented; ratings below 1.0 are expected and fine for a benchmark.
//
// This is a tool: it prints its usage and errors on stderr.
#include <algorithm>
#include <array>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <string>
#include <string_view>
#include <vector>

#include <fmt/format.h>

#include "engine/core/atomic_file.h"

namespace {

// splitmix64 (Steele, Lea and Flood 2014): a small generator whose output
// is the same on every platform, unlike the std:: distributions.
class Random {
 public:
  explicit Random(std::uint64_t seed) : state_(seed) {}
  std::uint64_t next() {
    std::uint64_t z = (state_ += 0x9E3779B97F4A7C15ULL);
    z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
    z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
    return z ^ (z >> 31);
  }
  double uniform() { return static_cast<double>(next() >> 11) * 0x1.0p-53; }
  double uniform(double lo, double hi) { return lo + (hi - lo) * uniform(); }
  int integer(int lo, int hi) { return lo + static_cast<int>(next() % static_cast<std::uint64_t>(hi - lo + 1)); }
  bool chance(double p) { return uniform() < p; }
  template <typename T, std::size_t N>
  const T& pick(const std::array<T, N>& items) {
    return items[next() % N];
  }

 private:
  std::uint64_t state_;
};

double round_to(double x, double step) { return std::round(x / step) * step; }
double ceil_to(double x, double step) { return std::ceil(x / step - 1e-9) * step; }

// A number as YAML: at most `decimals` places, trailing zeros dropped.
std::string num(double x, int decimals = 3) {
  std::string s = fmt::format("{:.{}f}", x, decimals);
  if (s.find('.') != std::string::npos) {
    while (s.back() == '0') s.pop_back();
    if (s.back() == '.') s.pop_back();
  }
  if (s == "-0") s = "0";
  return s;
}

// The quantities of a bridge file in its unit system. Designs are sized in
// US customary units; an SI file gets the converted values (factors exact
// by definition of the foot, inch and pound, or as in engine/core/units.h).
struct Units {
  bool si = false;
  std::string length(double ft) const { return si ? num(ft * 0.3048, 3) : num(ft, 3); }
  std::string section(double in) const { return si ? num(in * 25.4, 1) : num(in, 3); }
  std::string area(double in2) const { return si ? num(in2 * 645.16, 0) : num(in2, 3); }
  std::string inertia(double in4) const { return si ? fmt::format("{:.4e}", in4 * 416231.4256) : num(in4, 0); }
  std::string stress(double ksi) const { return si ? num(ksi * 6.894757, 0) : num(ksi, 2); }
  // A material grade: its own rounded metric value in SI (A709 Grade 345
  // for 50 ksi, 28 MPa for 4 ksi concrete), not the exact conversion.
  std::string grade(double ksi, double mpa) const { return si ? num(mpa, 0) : num(ksi, 2); }
  // Section dimensions for people, in the file's units.
  std::string depth_words(double in) const {
    return si ? fmt::format("{:.0f} mm", in * 25.4) : fmt::format("{:.0f} in", in);
  }
  std::string line_load(double kip_per_ft) const { return si ? num(kip_per_ft * 14.593903, 2) : num(kip_per_ft, 3); }
  std::string force(double kip) const { return si ? num(kip * 4.448222, 1) : num(kip, 2); }
  std::string unit_weight(double kcf) const { return si ? num(kcf * 157.087464, 1) : num(kcf, 3); }
};

enum class Type { rolled, plate, rc_tee, rc_slab, prestressed };

constexpr std::array<const char*, 40> kWords{
    "Alder",  "Birch",  "Bramble", "Cobble", "Crane",  "Dunlin",  "Elm",    "Fallow", "Fern",   "Flint",
    "Gorse",  "Hazel",  "Heron",   "Holly",  "Ivy",    "Juniper", "Kettle", "Larch",  "Linden", "Marsh",
    "Meadow", "Nettle", "Oak",     "Osprey", "Pebble", "Quail",   "Rowan",  "Rush",   "Sedge",  "Sorrel",
    "Tansy",  "Teal",   "Thistle", "Umber",  "Vetch",  "Willow",  "Wren",   "Yarrow", "Zinnia", "Bracken"};
constexpr std::array<const char*, 6> kRoads{"Road", "Lane", "Pike", "Avenue", "Trail", "Way"};
constexpr std::array<const char*, 6> kWaters{"Creek", "Brook", "Run", "River", "Branch", "Ditch"};
constexpr std::array<const char*, 5> kDistricts{"North", "South", "East", "West", "Central"};
constexpr std::array<const char*, 6> kInspectors{"A. Ferreira", "B. Holm",  "C. Nakamura",
                                                 "D. Osei",     "E. Quist", "F. Varela"};
constexpr std::array<const char*, 5> kNotes{"Routine inspection; no change since the previous record.",
                                            "Surface rust at the bearings; joints leaking at both abutments.",
                                            "Hairline cracks in the deck soffit; overlay worn in the wheel paths.",
                                            "Minor scour at the upstream pier nose; bearings in place.",
                                            "Paint system at end of life; no measurable loss found."};

// A prestressed girder outline: AASHTO Type III and IV and bulb-tees of the
// AASHTO-PCI family (height, web width in; area in^2; inertia in^4; yb in;
// from memory) with the longest simple span it is given here (ft).
struct PsShape {
  const char* name;
  double height, web, area, inertia, yb, max_span_ft;
};
constexpr std::array<PsShape, 5> kPsShapes{{{"AASHTO Type III", 45, 7, 560, 125390, 20.27, 80},
                                            {"AASHTO Type IV", 54, 8, 789, 260730, 24.73, 100},
                                            {"AASHTO-PCI BT-54", 54, 6, 659, 268077, 27.63, 110},
                                            {"AASHTO-PCI BT-63", 63, 6, 713, 392638, 32.12, 125},
                                            {"AASHTO-PCI BT-72", 72, 6, 767, 545894, 36.60, 150}}};

struct Segment {
  double start, end;  // ft
  std::string section;
  std::string end_section;  // haunch: section at the end
  const char* taper = nullptr;
};

// The bridge being drawn, in US customary units (ft, in, kip, ksi, kcf).
struct Draft {
  Units u;
  Type type = Type::rolled;
  bool lrfr = true;
  bool composite = true;
  int year = 1980;
  std::vector<double> spans;  // ft
  std::vector<std::string> continuity;
  double skew = 0;
  double spacing = 8;   // ft
  double overhang = 3;  // ft
  int girders = 5;
  double clear_width = 30;  // ft
  bool separate_exterior = false;
  bool haunched = false;
  double length() const {
    double l = 0;
    for (double s : spans) l += s;
    return l;
  }
  bool continuous_at(std::size_t support) const { return continuity[support - 1] != "hinge"; }
};

class Emitter {
 public:
  template <typename... Args>
  void line(fmt::format_string<Args...> f, Args&&... args) {
    fmt::format_to(std::back_inserter(text_), f, std::forward<Args>(args)...);
    text_ += '\n';
  }
  std::string& text() { return text_; }

 private:
  std::string text_;
};

std::string list(const std::vector<std::string>& items) {
  std::string s = "[";
  for (std::size_t i = 0; i < items.size(); ++i) s += (i ? ", " : "") + items[i];
  return s + "]";
}

// Span lengths: one drawn length, interior spans up to 30 % longer, each in
// the type's range and within 15-60 m; rounded to 1 ft or 0.5 m.
std::vector<double> draw_spans(Random& r, const Draft& d, int count, double lo_ft, double hi_ft) {
  const double base = r.uniform(lo_ft, hi_ft);
  std::vector<double> spans;
  for (int i = 0; i < count; ++i) {
    const bool interior = i > 0 && i < count - 1;
    double s = base * (interior ? r.uniform(1.0, 1.3) : r.uniform(0.9, 1.05));
    s = std::clamp(s, std::max(lo_ft, 15.0 / 0.3048), std::min(hi_ft, 60.0 / 0.3048));
    spans.push_back(d.u.si ? round_to(s * 0.3048, 0.5) / 0.3048 : round_to(s, 1.0));
  }
  return spans;
}

// A station rounded to 0.5 ft or 0.1 m so that it prints exactly.
double station(const Draft& d, double ft) { return d.u.si ? round_to(ft * 0.3048, 0.1) / 0.3048 : round_to(ft, 0.5); }

// Support stations along the girder (ft), first abutment to last.
std::vector<double> support_stations(const Draft& d) {
  std::vector<double> s{0.0};
  for (double span : d.spans) s.push_back(s.back() + span);
  return s;
}

// Segments: a positive-region section along each span and a support-region
// section either side of every continuous interior support (a fraction of
// the adjacent span), with haunches over the piers when the draft has them.
// Simple spans of rolled steel get a cover-plated middle.
std::vector<Segment> layout_segments(const Draft& d, const std::string& suffix, double pier_fraction) {
  const std::vector<double> at = support_stations(d);
  std::vector<Segment> out;
  const auto add = [&](double a, double b, const std::string& s, const std::string& e = {}, const char* t = nullptr) {
    if (b <= a) return;
    if (!out.empty() && e.empty() && out.back().end_section.empty() && out.back().section == s)
      out.back().end = b;
    else
      out.push_back({a, b, s, e, t});
  };
  for (std::size_t i = 0; i < d.spans.size(); ++i) {
    const double a = at[i], b = at[i + 1], l = d.spans[i];
    const bool left = i > 0 && d.continuous_at(i);
    const bool right = i + 1 < d.spans.size() && d.continuous_at(i + 1);
    const double x0 = left ? station(d, a + pier_fraction * l) : a;
    const double x1 = right ? station(d, b - pier_fraction * l) : b;
    if (left) {
      if (d.haunched)
        add(a, x0, "PIER" + suffix, "HAUNCH" + suffix, d.type == Type::plate ? "parabolic" : "linear");
      else
        add(a, x0, "PIER" + suffix);
    }
    if (!left && !right && d.type == Type::rolled) {
      const double c0 = station(d, a + 0.2 * l), c1 = station(d, b - 0.2 * l);
      add(x0, c0, "POS" + suffix);
      add(c0, c1, "POS-CP" + suffix);
      add(c1, x1, "POS" + suffix);
    } else {
      add(x0, x1, "POS" + suffix);
    }
    if (right) {
      if (d.haunched)
        add(x1, b, "HAUNCH" + suffix, "PIER" + suffix, d.type == Type::plate ? "parabolic" : "linear");
      else
        add(x1, b, "PIER" + suffix);
    }
  }
  return out;
}

struct SteelPlates {
  double top_w, top_t, web_d, web_t, bot_w, bot_t;
  double area() const { return top_w * top_t + web_d * web_t + bot_w * bot_t; }
};

void emit_deck(Emitter& e, const Units& u, double width_in, double slab_in, double top_bars, double bottom_bars) {
  e.line("    deck: {{thickness: {}, effective_width: {}, haunch: {},", u.section(slab_in), u.section(width_in),
         u.section(1.5));
  e.line("           bars: [{{area: {}, depth: {}}}, {{area: {}, depth: {}}}]}}", u.area(top_bars), u.section(2.5),
         u.area(bottom_bars), u.section(slab_in - 2.0));
}

void emit_steel(Emitter& e, const Units& u, const std::string& id, const std::string& designation, const SteelPlates& p,
                double cover_w, double cover_t, double stiffeners_in) {
  e.line("  - id: {}", id);
  e.line("    steel_i:");
  e.line("      designation: {}", designation);
  e.line("      top_flange: {{width: {}, thickness: {}}}", u.section(p.top_w), u.section(p.top_t));
  e.line("      web: {{depth: {}, thickness: {}}}", u.section(p.web_d), u.section(p.web_t));
  e.line("      bottom_flange: {{width: {}, thickness: {}}}", u.section(p.bot_w), u.section(p.bot_t));
  if (cover_t > 0)
    e.line("      bottom_cover_plate: {{width: {}, thickness: {}}}", u.section(cover_w), u.section(cover_t));
  if (stiffeners_in > 0) e.line("      transverse_stiffener_spacing: {}", u.section(stiffeners_in));
}

struct Weights {
  double interior_dc1 = 0;  // kip/ft per girder, the girder and its slab
  double exterior_dc1 = 0;
  double pier_extra = 0;  // kip/ft over the support regions (heavier plates, cover plates)
  std::string pier_extra_what;
};

constexpr double kSteelKcf = 0.490;     // unit weight of steel (common practice)
constexpr double kConcreteKcf = 0.150;  // normal-weight reinforced concrete (common practice)

// Sections of a steel bridge (rolled beams or welded plate girders); returns
// the dead loads they imply.
Weights emit_steel_sections(Emitter& e, Random& r, const Draft& d, double slab_in,
                            const std::vector<std::string>& suffixes) {
  const double longest = *std::max_element(d.spans.begin(), d.spans.end());
  const bool continuous = d.spans.size() > 1 && d.continuity.front() != "hinge";
  SteelPlates pos{};
  double cover_t = 0;
  double stiffeners = 0;
  std::string what;
  if (d.type == Type::rolled) {
    // Rolled beam depth about span/22 (span/26 when continuous), from a
    // ladder of nominal depths.
    constexpr std::array<double, 8> kDepths{21, 24, 27, 30, 33, 36, 40, 44};
    const double want = longest * 12.0 / (continuous ? 26.0 : 22.0);
    double depth = kDepths.back();
    for (double x : kDepths)
      if (x >= want) {
        depth = x;
        break;
      }
    const double bf = std::clamp(round_to(0.33 * depth, 0.25), 8.0, 16.0);
    const double tf = round_to(bf / 15.0 + 0.05, 0.005);
    pos = {bf, tf, depth - 2 * tf, round_to(depth / 55.0, 0.005), bf, tf};
    cover_t = round_to(tf * r.uniform(0.8, 1.2), 0.125);
    what = fmt::format("rolled beam {} deep", d.u.depth_words(depth));
  } else {
    const double web = std::clamp(round_to(longest * 12.0 / 25.0, 6.0), 36.0, 96.0);
    const double tw = std::max(0.4375, ceil_to(web / 140.0, 0.0625));
    const double scale = longest / 150.0;
    pos = {round_to(12.0 + 4 * scale, 1.0), ceil_to(0.625 + 0.25 * scale, 0.125), web, tw,
           round_to(14.0 + 5 * scale, 1.0), ceil_to(0.875 + 0.6 * scale, 0.125)};
    stiffeners = round_to(1.5 * web, 6.0);
    what = fmt::format("welded plate girder, {} web", d.u.depth_words(web));
  }
  Weights w;
  const double girder_kip_ft = pos.area() / 144.0 * kSteelKcf * 1.10;  // +10 % details (common practice)
  const double slab_kip_ft = slab_in / 12.0 * kConcreteKcf;
  w.interior_dc1 = girder_kip_ft + slab_kip_ft * d.spacing + 0.03;
  w.exterior_dc1 = girder_kip_ft + slab_kip_ft * (d.spacing / 2 + d.overhang) + 0.03;
  for (std::size_t k = 0; k < suffixes.size(); ++k) {
    const std::string& sfx = suffixes[k];
    const double width = k == 0 ? d.spacing * 12.0 : std::min(d.spacing * 12.0, (d.spacing / 2 + d.overhang) * 12.0);
    const double deck_bars = 0.006 * slab_in * width;
    if (d.type == Type::rolled) {
      emit_steel(e, d.u, "POS" + sfx, what, pos, 0, 0, 0);
      if (d.composite) emit_deck(e, d.u, width, slab_in, deck_bars / 2, deck_bars / 2);
      emit_steel(e, d.u, (continuous ? "PIER" : "POS-CP") + sfx, what + " with a bottom cover plate", pos,
                 pos.bot_w - 1.0, cover_t, 0);
      if (d.composite) emit_deck(e, d.u, width, slab_in, deck_bars * 0.75, deck_bars * 0.5);
      w.pier_extra = (pos.bot_w - 1.0) * cover_t / 144.0 * kSteelKcf;
      w.pier_extra_what = "bottom cover plates";
    } else {
      emit_steel(e, d.u, "POS" + sfx, what + ", positive region", pos, 0, 0, stiffeners);
      if (d.composite) emit_deck(e, d.u, width, slab_in, deck_bars / 2, deck_bars / 2);
      SteelPlates pier = pos;
      pier.top_w = pier.bot_w = pos.bot_w + 2.0;
      pier.top_t = pier.bot_t = ceil_to(pos.bot_t * 1.4, 0.125);
      pier.web_t = pos.web_t + 0.0625;
      if (d.haunched) {
        // The haunch starts with the pier flanges on the positive web depth
        // and deepens to about 1.6 times it over the support (as EV-0245).
        emit_steel(e, d.u, "HAUNCH" + sfx, what + ", haunch start", pier, 0, 0, stiffeners);
        if (d.composite) emit_deck(e, d.u, width, slab_in, deck_bars * 0.75, deck_bars * 0.5);
        pier.web_d = round_to(pos.web_d * 1.6, 1.0);
      }
      emit_steel(e, d.u, "PIER" + sfx, what + ", support region", pier, 0, 0, stiffeners);
      if (d.composite) emit_deck(e, d.u, width, slab_in, deck_bars * 0.75, deck_bars * 0.5);
      w.pier_extra = (pier.area() - pos.area()) / 144.0 * kSteelKcf * (d.haunched ? 0.8 : 1.0);
      w.pier_extra_what = "heavier support-region plates";
    }
  }
  return w;
}

Weights emit_rc_tee_sections(Emitter& e, Random& r, const Draft& d, double slab_in,
                             const std::vector<std::string>& suffixes) {
  const double longest = *std::max_element(d.spans.begin(), d.spans.end());
  const double height = std::max(30.0, round_to(longest * 12.0 / 16.0, 1.0));
  const double web = r.chance(0.5) ? 16.0 : 18.0;
  const double d1 = height - 3.5;
  // Steel ratio about 1.2 % of the web area (common practice for T-beams).
  const double bottom = round_to(0.012 * web * d1, 0.01);
  const double top = round_to(0.010 * web * d1, 0.01);
  Weights w;
  const double stem = web * (height - slab_in) / 144.0 * kConcreteKcf;
  const double slab = slab_in / 12.0 * kConcreteKcf;
  w.interior_dc1 = stem + slab * d.spacing;
  w.exterior_dc1 = stem + slab * (d.spacing / 2 + d.overhang);
  for (std::size_t k = 0; k < suffixes.size(); ++k) {
    const std::string& sfx = suffixes[k];
    const double flange = k == 0 ? d.spacing * 12.0 : std::min(d.spacing * 12.0, (d.spacing / 2 + d.overhang) * 12.0);
    const auto beam = [&](const std::string& id, double h, double bot, double top_area, double stirrup_spacing) {
      e.line("  - id: {}", id);
      e.line("    rc_beam:");
      e.line("      height: {}", d.u.section(h));
      e.line("      web_width: {}", d.u.section(web));
      e.line("      flange_width: {}", d.u.section(flange));
      e.line("      flange_thickness: {}", d.u.section(slab_in));
      e.line("      bottom_bars: [{{area: {}, depth: {}}}, {{area: {}, depth: {}}}]", d.u.area(bot * 0.6),
             d.u.section(h - 3.5), d.u.area(bot * 0.4), d.u.section(h - 6.5));
      e.line("      top_bars: [{{area: {}, depth: {}}}]", d.u.area(top_area), d.u.section(2.5));
      e.line("      stirrups: {{area: {}, spacing: {}}}", d.u.area(0.40), d.u.section(stirrup_spacing));
    };
    beam("POS" + sfx, height, bottom, 1.4, 16.0);
    if (d.haunched) {
      beam("HAUNCH" + sfx, height, bottom * 0.35, top, 10.0);
      beam("PIER" + sfx, round_to(height * 1.4, 1.0), bottom * 0.35, top, 10.0);
    } else {
      beam("PIER" + sfx, height, bottom * 0.35, top, 10.0);
    }
  }
  if (d.haunched) {
    w.pier_extra = web * height * 0.2 / 144.0 * kConcreteKcf;
    w.pier_extra_what = "haunch concrete below the stem line";
  }
  return w;
}

Weights emit_rc_slab_sections(Emitter& e, const Draft& d) {
  const double longest = *std::max_element(d.spans.begin(), d.spans.end());
  // LRFD Table 2.5.2.6.3-1 minimum depth of a continuous slab,
  // (S + 10)/30 ft, rounded up (from memory).
  const double height = ceil_to((longest + 10.0) / 30.0 * 12.0, 0.5);
  const double strip = d.spacing * 12.0;
  const double bottom = round_to(0.0075 * strip * (height - 1.5), 0.01);
  const auto slab = [&](const std::string& id, double top) {
    e.line("  - id: {}", id);
    e.line("    rc_beam:");
    e.line("      height: {}", d.u.section(height));
    e.line("      web_width: {}", d.u.section(strip));
    e.line("      flange_width: {}", d.u.section(strip));
    e.line("      flange_thickness: 0");
    e.line("      bottom_bars: [{{area: {}, depth: {}}}]", d.u.area(bottom), d.u.section(height - 1.5));
    e.line("      top_bars: [{{area: {}, depth: {}}}]", d.u.area(top), d.u.section(2.0));
  };
  slab("POS", round_to(0.0015 * strip * height, 0.01));
  slab("PIER", round_to(0.006 * strip * (height - 2.0), 0.01));
  Weights w;
  w.interior_dc1 = w.exterior_dc1 = height / 12.0 * d.spacing * kConcreteKcf;
  return w;
}

Weights emit_ps_sections(Emitter& e, Random& r, const Draft& d, double slab_in,
                         const std::vector<std::string>& suffixes) {
  const double longest = *std::max_element(d.spans.begin(), d.spans.end());
  const PsShape* shape = &kPsShapes.back();
  for (const PsShape& s : kPsShapes)
    if (s.max_span_ft >= longest) {
      shape = &s;
      break;
    }
  // Strand count from the moment demand ~ L^2 S / (girder + deck depth),
  // scaled to about 40 strands for a 120 ft BT-72 at 8 ft (common practice).
  const int strands = std::clamp(
      2 * static_cast<int>(std::ceil(0.0139 * longest * longest * d.spacing / (shape->height + slab_in))), 12, 72);
  const bool given_fpe = r.chance(0.5);
  Weights w;
  const double girder = shape->area / 144.0 * kConcreteKcf;
  const double slab = slab_in / 12.0 * kConcreteKcf;
  w.interior_dc1 = girder + slab * d.spacing + 0.03;
  w.exterior_dc1 = girder + slab * (d.spacing / 2 + d.overhang) + 0.03;
  for (std::size_t k = 0; k < suffixes.size(); ++k) {
    const std::string& sfx = suffixes[k];
    const double width = k == 0 ? d.spacing * 12.0 : std::min(d.spacing * 12.0, (d.spacing / 2 + d.overhang) * 12.0);
    const auto girder_section = [&](const std::string& id, double stirrup_spacing, double deck_top) {
      e.line("  - id: {}", id);
      e.line("    ps_girder:");
      e.line("      shape: {}", shape->name);
      e.line("      height: {}", d.u.section(shape->height));
      e.line("      web_width: {}", d.u.section(shape->web));
      e.line("      area: {}", d.u.area(shape->area));
      e.line("      inertia: {}", d.u.inertia(shape->inertia));
      e.line("      yb: {}", d.u.section(shape->yb));
      e.line("      strands:");
      int left = strands;
      for (int layer = 0; left > 0; ++layer) {
        const int n = std::min(left, 12);
        e.line("        - {{count: {}, area: {}, height: {}}}", n, d.u.area(0.153), d.u.section(2.0 + 2.0 * layer));
        left -= n;
      }
      if (given_fpe) e.line("      effective_prestress: {}", d.u.grade(160, 1100));
      e.line("      stirrups: {{area: {}, spacing: {}}}", d.u.area(0.40), d.u.section(stirrup_spacing));
      emit_deck(e, d.u, width, slab_in, deck_top, 0.003 * slab_in * width);
    };
    const double light = 0.003 * slab_in * width;
    girder_section("POS" + sfx, 18.0, light);
    // Over a support made continuous the deck carries the continuity bars.
    girder_section("PIER" + sfx, 12.0, 0.012 * slab_in * width);
  }
  return w;
}

void emit_policy(const std::filesystem::path& dir) {
  tenthpoint::write_file_atomically(dir / "policies" / "synthetic-county.yaml",
                                    R"(# Synthetic county load rating policy for the batch benchmark
# (tools/bench_batch). Invented agency; it extends the shipped default and
# changes only the posting threshold, so every rating uses the default's
# full standard vehicle sets.
format_version: 1
units: US
extends: default
id: synthetic-county
version: "bench-1"
name: Synthetic county load rating policy (benchmark inventory)
edition: tenthpoint default with the synthetic county's posting rule

posting:
  minimum_posting: 3.0           # tons
)");
}

// One bridge file; `index` numbers it (SYN-000123).
std::string bridge_file(std::uint64_t seed, long index) {
  Random r(seed * 0x2545F4914F6CDD1DULL + static_cast<std::uint64_t>(index) + 1);
  for (int i = 0; i < 4; ++i) r.next();
  Draft d;
  d.u.si = r.chance(0.3);
  d.lrfr = r.chance(0.6);
  const double t = r.uniform();
  d.type = t < 0.22   ? Type::rolled
           : t < 0.44 ? Type::plate
           : t < 0.60 ? Type::rc_tee
           : t < 0.70 ? Type::rc_slab
                      : Type::prestressed;
  const double u = r.uniform();
  int spans = u < 0.35 ? 1 : u < 0.60 ? 2 : u < 0.85 ? 3 : u < 0.93 ? 4 : 5;
  // Span ranges per type (ft), all inside 15-60 m.
  double lo = 50, hi = 197;
  switch (d.type) {
    case Type::rolled:
      lo = 50, hi = 100;
      break;
    case Type::plate:
      lo = 80, hi = 197;
      break;
    case Type::rc_tee:
      lo = 50, hi = 80;
      break;
    case Type::rc_slab:
      lo = 50, hi = 60;
      break;
    case Type::prestressed:
      lo = 60, hi = 150;
      break;
  }
  d.spans = draw_spans(r, d, spans, lo, hi);
  const char* interior_joint = "continuous";
  if (d.type == Type::prestressed) interior_joint = r.chance(0.7) ? "simple_made_continuous" : "hinge";
  if (d.type == Type::rolled && r.chance(0.2)) interior_joint = "hinge";
  d.continuity.assign(d.spans.size() - 1, interior_joint);
  d.haunched = (d.type == Type::plate || d.type == Type::rc_tee) && spans > 1 && r.chance(0.3);
  d.year = d.type == Type::prestressed ? r.integer(1975, 2015)
           : d.type == Type::rc_tee    ? r.integer(1935, 1975)
                                       : r.integer(1950, 2010);
  d.composite = d.type == Type::prestressed || d.type == Type::plate ||
                (d.type == Type::rolled && (d.year >= 1965 || r.chance(0.5)));
  if (d.type == Type::rc_tee || d.type == Type::rc_slab) d.composite = false;
  d.skew = r.chance(0.6) ? 0.0 : round_to(r.uniform(5, 35), 5.0);
  d.girders = r.integer(4, 8);
  const bool slab = d.type == Type::rc_slab;
  if (slab) {
    d.spacing = round_to(r.uniform(4.0, 9.0), 0.5);  // strip width, ft
    d.overhang = 0;
    d.clear_width = d.spacing * d.girders - 3.0;
  } else {
    d.spacing = round_to(d.type == Type::rc_tee ? r.uniform(6.0, 8.0) : r.uniform(6.5, 10.0), 0.5);
    d.overhang = round_to(r.uniform(2.0, 3.5), 0.25);
    d.clear_width = d.spacing * (d.girders - 1) + 2 * d.overhang - 3.0;
  }
  if (d.u.si) {
    // Metric drawings give spacings and overhangs in round metres.
    d.spacing = round_to(d.spacing * 0.3048, 0.05) / 0.3048;
    d.overhang = round_to(d.overhang * 0.3048, 0.05) / 0.3048;
    d.clear_width = slab ? d.spacing * d.girders - 3.0 : d.spacing * (d.girders - 1) + 2 * d.overhang - 3.0;
  }
  if (d.clear_width < 20.0) {
    d.spacing += (20.0 - d.clear_width) / (slab ? d.girders : d.girders - 1);
    d.spacing = d.u.si ? ceil_to(d.spacing * 0.3048, 0.05) / 0.3048 : ceil_to(d.spacing, 0.5);
    d.clear_width = slab ? d.spacing * d.girders - 3.0 : d.spacing * (d.girders - 1) + 2 * d.overhang - 3.0;
  }
  // Separate exterior sections (a narrower effective flange) for half of
  // the girder bridges; the rest use one section set for every line, as
  // EV-0112 does.
  d.separate_exterior = !slab && r.chance(0.5);
  const double slab_in = d.type == Type::rc_tee ? 7.0 : round_to(r.uniform(7.5, 9.0), 0.5);

  const std::string id = fmt::format("SYN-{:06d}", index);
  const std::string carried = fmt::format("{} {}", r.pick(kWords), r.pick(kRoads));
  const std::string crossed = fmt::format("{} {}", r.pick(kWords), r.pick(kWaters));
  Emitter e;
  e.line("# Synthetic benchmark bridge (tools/bench_batch/generate_inventory, seed {}).", seed);
  e.line("# Invented record; it describes no real structure.");
  e.line("format_version: 1");
  e.line("units: {}", d.u.si ? "SI" : "US");
  e.line("");
  e.line("identity:");
  e.line("  structure_id: {}", id);
  e.line("  name: {} Bridge", carried);
  e.line("  feature_carried: {}", carried);
  e.line("  feature_crossed: {}", crossed);
  e.line("  year_built: {}", d.year);
  e.line("  district: {}", r.pick(kDistricts));
  e.line("  owner: Synthetic County Road Department");
  e.line("");
  e.line("traffic:");
  e.line("  adtt: {}", r.integer(20, 3000));
  e.line("  clear_roadway_width: {}", d.u.length(d.clear_width));
  e.line("");
  e.line("geometry:");
  e.line("  skew: {}", num(d.skew));
  std::vector<std::string> spans_text, supports;
  for (double s : d.spans) spans_text.push_back(d.u.length(s));
  for (std::size_t i = 0; i <= d.spans.size(); ++i) supports.emplace_back(i == 0 ? "pin" : "roller");
  e.line("  spans: {}", list(spans_text));
  e.line("  supports: {}", list(supports));
  if (!d.continuity.empty()) e.line("  continuity: {}", list(d.continuity));
  e.line("");

  e.line("materials:");
  switch (d.type) {
    case Type::rolled:
    case Type::plate: {
      const bool grade50 = d.year >= 1990 || r.chance(0.2);
      e.line("  kind: {}", d.type == Type::rolled ? "rolled_steel" : "welded_plate_girder");
      e.line("  composite: {}", d.composite ? "true" : "false");
      e.line("  steel: {{fy: {}, fu: {}, E: {}}}", grade50 ? d.u.grade(50, 345) : d.u.grade(36, 250),
             grade50 ? d.u.grade(65, 450) : d.u.grade(58, 400), d.u.grade(29000, 200000));
      if (d.composite) {
        e.line("  deck_concrete: {{fc: {}, unit_weight: {}}}", r.chance(0.5) ? d.u.grade(3, 21) : d.u.grade(4, 28),
               d.u.unit_weight(0.150));
        e.line("  reinforcement: {{fy: {}}}", d.u.grade(60, 420));
      }
      break;
    }
    case Type::rc_tee:
    case Type::rc_slab:
      e.line("  kind: reinforced_concrete");
      e.line("  composite: false");
      e.line("  girder_concrete: {{fc: {}, unit_weight: {}}}", d.year < 1960 ? d.u.grade(3, 21) : d.u.grade(4, 28),
             d.u.unit_weight(0.150));
      e.line("  reinforcement: {{fy: {}}}", d.year < 1965 ? d.u.grade(40, 280) : d.u.grade(60, 420));
      break;
    case Type::prestressed:
      e.line("  kind: prestressed_concrete");
      e.line("  composite: true");
      e.line("  girder_concrete: {{fc: {}, unit_weight: {}}}", r.chance(0.5) ? d.u.grade(6, 41) : d.u.grade(7, 48),
             d.u.unit_weight(0.150));
      e.line("  deck_concrete: {{fc: {}, unit_weight: {}}}", d.u.grade(4, 28), d.u.unit_weight(0.150));
      e.line("  reinforcement: {{fy: {}}}", d.u.grade(60, 420));
      e.line("  strand: {{fpu: {}, fpy: {}, E: {}, low_relaxation: true}}", d.u.grade(270, 1860), d.u.grade(243, 1675),
             d.u.grade(28500, 196500));
      break;
  }
  e.line("");

  e.line("sections:");
  std::vector<std::string> suffixes{""};
  if (d.separate_exterior) suffixes.emplace_back("-X");
  Weights w;
  switch (d.type) {
    case Type::rolled:
    case Type::plate:
      w = emit_steel_sections(e, r, d, slab_in, suffixes);
      break;
    case Type::rc_tee:
      w = emit_rc_tee_sections(e, r, d, slab_in, suffixes);
      break;
    case Type::rc_slab:
      w = emit_rc_slab_sections(e, d);
      break;
    case Type::prestressed:
      w = emit_ps_sections(e, r, d, slab_in, suffixes);
      break;
  }
  e.line("");

  const double pier_fraction = d.type == Type::prestressed ? 0.1 : 0.15;
  const std::vector<double> at = support_stations(d);
  std::vector<std::string> braces;
  if (d.type == Type::rolled || d.type == Type::plate) {
    // Cross-frames at about 20-25 ft and at every support (common practice).
    for (std::size_t i = 0; i < d.spans.size(); ++i) {
      const int bays = std::max(2, static_cast<int>(std::ceil(d.spans[i] / 25.0)));
      for (int k = 0; k < bays; ++k) braces.push_back(d.u.length(station(d, at[i] + d.spans[i] * k / bays)));
    }
  } else if (!slab) {
    for (std::size_t i = 0; i < d.spans.size(); ++i) {
      braces.push_back(d.u.length(at[i]));
      braces.push_back(d.u.length(station(d, at[i] + d.spans[i] / 2)));
    }
  }
  if (!slab) braces.push_back(d.u.length(at.back()));
  const auto girder_line = [&](const std::string& gid, bool exterior, int count, const std::string& suffix) {
    e.line("  - id: {}", gid);
    e.line("    position: {}", exterior ? "exterior" : "interior");
    e.line("    count: {}", count);
    e.line("    spacing: {}", d.u.length(d.spacing));
    if (exterior) {
      e.line("    overhang: {}", d.u.length(d.overhang));
      e.line("    curb_distance: {}", d.u.length(d.overhang - 1.5));
    }
    if (!braces.empty()) e.line("    brace_stations: {}", list(braces));
    e.line("    segments:");
    for (const Segment& s : layout_segments(d, suffix, pier_fraction)) {
      if (s.end_section.empty())
        e.line("      - {{start: {}, end: {}, section: {}}}", d.u.length(s.start), d.u.length(s.end), s.section);
      else
        e.line("      - {{start: {}, end: {}, section: {}, end_section: {}, taper: {}}}", d.u.length(s.start),
               d.u.length(s.end), s.section, s.end_section, s.taper);
    }
  };
  e.line("girders:");
  if (slab) {
    girder_line("STRIP", false, d.girders, "");
  } else {
    girder_line("G-INT", false, d.girders - 2, "");
    girder_line("G-EXT", true, 2, d.separate_exterior ? "-X" : "");
  }
  e.line("");

  e.line("dead_loads:");
  if (slab) {
    e.line("  - component: DC1");
    e.line("    description: slab self weight per strip");
    e.line("    scope: per_girder");
    e.line("    uniform: {{intensity: {}}}", d.u.line_load(w.interior_dc1));
  } else {
    e.line("  - component: DC1");
    e.line("    description: girder, slab over the bay and haunch");
    e.line("    scope: per_girder");
    e.line("    girders: [G-INT]");
    e.line("    uniform: {{intensity: {}}}", d.u.line_load(w.interior_dc1));
    e.line("  - component: DC1");
    e.line("    description: girder, slab over half a bay and the overhang");
    e.line("    scope: per_girder");
    e.line("    girders: [G-EXT]");
    e.line("    uniform: {{intensity: {}}}", d.u.line_load(w.exterior_dc1));
  }
  if (w.pier_extra > 0.001) {
    for (const Segment& s : layout_segments(d, "", pier_fraction)) {
      const bool heavy =
          s.section.rfind("PIER", 0) == 0 || s.section.rfind("POS-CP", 0) == 0 || s.section.rfind("HAUNCH", 0) == 0;
      if (!heavy) continue;
      e.line("  - component: DC1");
      e.line("    description: {}", w.pier_extra_what);
      e.line("    scope: per_girder");
      e.line("    uniform: {{intensity: {}, start: {}, end: {}}}", d.u.line_load(w.pier_extra), d.u.length(s.start),
             d.u.length(s.end));
    }
  }
  if (!slab && r.chance(0.5)) {
    for (std::size_t i = 0; i < d.spans.size(); ++i) {
      e.line("  - component: DC1");
      e.line("    description: midspan diaphragm, span {}", i + 1);
      e.line("    scope: per_girder");
      e.line("    point: {{force: {}, station: {}}}", d.u.force(round_to(0.12 * d.spacing, 0.05)),
             d.u.length(station(d, at[i] + d.spans[i] / 2)));
    }
  }
  e.line("  - component: DC2");
  e.line("    description: two concrete barriers");
  e.line("    scope: cross_section");
  e.line("    distribution: equal");
  e.line("    uniform: {{intensity: {}}}", d.u.line_load(round_to(r.uniform(0.6, 1.0), 0.05)));
  e.line("  - component: DW");
  e.line("    description: bituminous overlay");
  e.line("    scope: cross_section");
  e.line("    distribution: {}", r.chance(0.8) ? "equal" : "tributary_width");
  e.line("    wearing_surface: {{thickness: {}, unit_weight: {}, field_measured: {}}}",
         d.u.section(round_to(r.uniform(1.0, 3.5), 0.25)), d.u.unit_weight(0.140), r.chance(0.5) ? "true" : "false");
  e.line("");
  e.line("capacity:");
  e.line("  mode: computed");
  e.line("");

  e.line("inspections:");
  const int inspections = r.chance(0.3) ? 2 : 1;
  int year = r.integer(2019, 2025 - (inspections - 1) * 2);
  int superstructure = r.integer(5, 8);
  for (int k = 0; k < inspections; ++k) {
    const bool last = k + 1 == inspections;
    e.line("  - date: {}-{:02d}-{:02d}", year, r.integer(3, 11), r.integer(1, 28));
    e.line("    deck: {}", std::clamp(superstructure + r.integer(-1, 1), 3, 9));
    e.line("    superstructure: {}", superstructure);
    e.line("    substructure: {}", std::clamp(superstructure + r.integer(-1, 1), 3, 9));
    e.line("    inspector: {}", r.pick(kInspectors));
    e.line("    notes: {}", r.pick(kNotes));
    if (last && r.chance(0.3)) {
      // Loss at the first bearing of one girder line, as the demo records.
      const std::string g = slab ? "STRIP" : (r.chance(0.7) ? "G-EXT" : "G-INT");
      const double end = station(d, std::min(4.0, d.spans.front() / 10));
      e.line("    section_loss:");
      if (d.type == Type::rolled || d.type == Type::plate)
        e.line("      - {{girder: {}, start: 0, end: {}, element: web, thickness_loss: {}}}", g, d.u.length(end),
               d.u.section(0.0625));
      else if (d.type == Type::prestressed)
        e.line("      - {{girder: {}, start: 0, end: {}, element: strands, percent_loss: {}}}", g, d.u.length(end), 5);
      else
        e.line("      - {{girder: {}, start: 0, end: {}, element: bars, percent_loss: {}}}", g, d.u.length(end), 10);
    }
    year += r.integer(2, 3);
    superstructure = std::max(3, superstructure - r.integer(0, 1));
  }
  e.line("");
  e.line("rating:");
  e.line("  method: {}", d.lrfr ? "LRFR" : "LFR");
  e.line("  vehicle_set: standard");
  e.line("  policy: policies/synthetic-county.yaml");
  if (r.chance(0.3)) {
    e.line("");
    e.line("points_of_interest:");
    e.line("  - {{station: {}, label: field splice}}", d.u.length(station(d, d.spans.front() * 0.7)));
  }
  return std::move(e.text());
}

int usage() {
  std::fprintf(stderr, "usage: tenthpoint_generate_inventory --count N [--seed S] [--first K] DIR\n");
  return 2;
}

}  // namespace

int main(int argc, char** argv) {
  long count = -1, first = 1;
  std::uint64_t seed = 1;
  std::string dir;
  for (int i = 1; i < argc; ++i) {
    const std::string_view a = argv[i];
    const auto value = [&]() -> const char* { return i + 1 < argc ? argv[++i] : nullptr; };
    if (a == "--count" || a == "--seed" || a == "--first") {
      const char* v = value();
      if (v == nullptr) return usage();
      char* end = nullptr;
      const unsigned long long n = std::strtoull(v, &end, 10);
      if (*end != '\0' || *v == '-') {
        std::fprintf(stderr, "generate_inventory: %s needs a non-negative integer, got '%s'\n", argv[i - 1], v);
        return 2;
      }
      if (a == "--count") count = static_cast<long>(n);
      if (a == "--seed") seed = n;
      if (a == "--first") first = static_cast<long>(n);
    } else if (!a.empty() && a[0] == '-') {
      return usage();
    } else {
      dir = a;
    }
  }
  if (count < 0 || dir.empty()) return usage();
  try {
    const std::filesystem::path out(dir);
    emit_policy(out);
    for (long i = first; i < first + count; ++i)
      tenthpoint::write_file_atomically(out / fmt::format("syn-{:06d}.yaml", i), bridge_file(seed, i));
  } catch (const std::exception& e) {
    std::fprintf(stderr, "generate_inventory: %s\n", e.what());
    return 1;
  }
  return 0;
}
