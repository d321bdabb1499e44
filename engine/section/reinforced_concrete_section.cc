#include "engine/section/reinforced_concrete_section.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <vector>

#include <fmt/format.h>

#include "engine/section/deck_layout.h"

namespace tenthpoint::section {
namespace {

struct TransformedBar {
  Real area;   // m^2, steel
  Real depth;  // m below the top
};

// The outline as the compression zone sees it: a flange b x hf over a web bw.
// A rectangle is a "flange" as deep as the beam.
struct Outline {
  Real flange_width;
  Real flange_thickness;
  Real web_width;
};

// First moment about a neutral axis at depth c of the concrete above it,
// m^3 (positive).
Real concrete_first_moment(const Outline& o, Real c) {
  if (c <= o.flange_thickness) return o.flange_width * c * c / 2;
  const Real hf = o.flange_thickness;
  return o.flange_width * hf * (c - hf / 2) + o.web_width * (c - hf) * (c - hf) / 2;
}

// Transformed-area multiplier of a bar when the neutral axis is at depth c:
// (n - 1) in compressed concrete, n in tension.
Real bar_factor(Real depth, Real c, Real n) { return depth < c ? n - 1 : n; }

// f(c): first moment of the transformed cracked section about an axis at
// depth c, compression positive. It is continuous and strictly increasing in
// c, so the neutral axis is its one root in (0, h).
Real first_moment(const Outline& o, const std::vector<TransformedBar>& bars, Real n, Real c) {
  Real f = concrete_first_moment(o, c);
  for (const TransformedBar& b : bars) f += bar_factor(b.depth, c, n) * b.area * (c - b.depth);
  return f;
}

// Root of f on [lo, hi], where f is one quadratic alpha c^2 + beta c + gamma
// (no breakpoint inside). The breakpoints are the flange soffit and the bars.
Real solve_on_interval(const Outline& o, const std::vector<TransformedBar>& bars, Real n, Real lo, Real hi) {
  const Real mid = (lo + hi) / 2;
  Real alpha = 0;
  Real beta = 0;
  Real gamma = 0;
  if (mid <= o.flange_thickness) {
    alpha = o.flange_width / 2;
  } else {
    const Real hf = o.flange_thickness;
    alpha = o.web_width / 2;
    beta = (o.flange_width - o.web_width) * hf;
    gamma = -(o.flange_width - o.web_width) * hf * hf / 2;
  }
  for (const TransformedBar& b : bars) {
    const Real m = bar_factor(b.depth, mid, n);
    beta += m * b.area;
    gamma -= m * b.area * b.depth;
  }
  // f is increasing on the interval, so the root is the larger one; the
  // second form avoids cancellation when beta > 0.
  const Real discriminant = std::max(Real{0}, beta * beta - 4 * alpha * gamma);
  const Real root =
      beta > 0 ? -2 * gamma / (beta + std::sqrt(discriminant)) : (-beta + std::sqrt(discriminant)) / (2 * alpha);
  return std::clamp(root, lo, hi);
}

}  // namespace

ReinforcedConcreteSection::ReinforcedConcreteSection(const model::ReinforcedConcreteBeam& beam,
                                                     detail::SectionContext context)
    : beam_(beam), context_(std::move(context)) {
  context_.require_positive(beam.height, "rc_beam.height");
  context_.require_positive(beam.web_width, "rc_beam.web_width");
  context_.require_nonnegative(beam.flange_thickness, "rc_beam.flange_thickness");
  if (beam.flange_thickness > 0) {
    if (!(beam.flange_thickness < beam.height)) {
      context_.fail("rc_beam.flange_thickness", fmt::format("must be less than the height {:g} m (got {:g} m)",
                                                            beam.height, beam.flange_thickness));
    }
    if (!(beam.flange_width >= beam.web_width)) {
      context_.fail("rc_beam.flange_width", fmt::format("must be at least the web width {:g} m (got {:g} m)",
                                                        beam.web_width, beam.flange_width));
    }
  }
  auto check_layers = [&](const std::vector<model::BarLayer>& layers, const char* name) {
    for (std::size_t i = 0; i < layers.size(); ++i) {
      context_.require_positive(layers[i].area, fmt::format("rc_beam.{}[{}].area", name, i));
      if (!(layers[i].depth > 0 && layers[i].depth < beam.height)) {
        context_.fail(
            fmt::format("rc_beam.{}[{}].depth", name, i),
            fmt::format("must lie inside the beam, between 0 and {:g} m (got {:g} m)", beam.height, layers[i].depth));
      }
    }
  };
  check_layers(beam.bottom_bars, "bottom_bars");
  check_layers(beam.top_bars, "top_bars");
}

TransformedSection ReinforcedConcreteSection::gross() const {
  TransformedSection s;
  if (is_rectangle()) {
    s.add_rectangle(beam_.web_width, beam_.height, 0);
  } else {
    const Real web_height = beam_.height - beam_.flange_thickness;
    s.add_rectangle(beam_.web_width, web_height, 0);
    s.add_rectangle(beam_.flange_width, beam_.flange_thickness, web_height);
  }
  return s;
}

void ReinforcedConcreteSection::add_bars(TransformedSection& section, Real factor) const {
  for (const model::BarLayer& b : beam_.bottom_bars) section.add_area(b.area, beam_.height - b.depth, factor);
  for (const model::BarLayer& b : beam_.top_bars) section.add_area(b.area, beam_.height - b.depth, factor);
}

void ReinforcedConcreteSection::require_bar_ratio(Real bar_ratio) const {
  // Es / Ec is near 8 for ordinary concrete; at or below 1 the (n - 1) rule
  // would remove area, which means the moduli in the file are wrong.
  if (!(bar_ratio > 1) || !std::isfinite(bar_ratio)) {
    context_.fail("rc_beam",
                  fmt::format("bar modular ratio Es/Ec must exceed 1 (got {:g}); check materials", bar_ratio));
  }
}

StageProperties ReinforcedConcreteSection::gross_properties(Real concrete_modulus) const {
  return StageProperties::from_transformed(gross(), concrete_modulus, beam_.height);
}

StageProperties ReinforcedConcreteSection::gross_transformed(Real concrete_modulus, Real bar_ratio) const {
  require_bar_ratio(bar_ratio);
  TransformedSection s = gross();
  // Uncracked: every bar sits in concrete already counted, hence n - 1.
  add_bars(s, bar_ratio - 1);
  return StageProperties::from_transformed(s, concrete_modulus, beam_.height);
}

CrackedSection ReinforcedConcreteSection::cracked_transformed(Real concrete_modulus, Real bar_ratio) const {
  require_bar_ratio(bar_ratio);
  if (beam_.bottom_bars.empty()) context_.fail("rc_beam.bottom_bars", "a cracked section needs tension bars");
  const Outline outline = is_rectangle() ? Outline{beam_.web_width, beam_.height, beam_.web_width}
                                         : Outline{beam_.flange_width, beam_.flange_thickness, beam_.web_width};
  std::vector<TransformedBar> bars;
  for (const model::BarLayer& b : beam_.bottom_bars) bars.push_back({b.area, b.depth});
  for (const model::BarLayer& b : beam_.top_bars) bars.push_back({b.area, b.depth});

  // f(0) < 0 (only tension bars) and f(h) > 0 (all concrete compressed), so
  // the root lies between two consecutive breakpoints of the piecewise
  // quadratic f; find them, then solve that quadratic in closed form.
  std::vector<Real> breaks{0, beam_.height};
  if (outline.flange_thickness < beam_.height) breaks.push_back(outline.flange_thickness);
  for (const TransformedBar& b : bars) breaks.push_back(b.depth);
  std::sort(breaks.begin(), breaks.end());
  breaks.erase(std::unique(breaks.begin(), breaks.end()), breaks.end());
  Real c = beam_.height;
  for (std::size_t i = 0; i + 1 < breaks.size(); ++i) {
    if (first_moment(outline, bars, bar_ratio, breaks[i + 1]) >= 0) {
      c = solve_on_interval(outline, bars, bar_ratio, breaks[i], breaks[i + 1]);
      break;
    }
  }

  // I_cr about the neutral axis: the compressed concrete as rectangles plus
  // the bars at n or (n - 1).
  TransformedSection s;
  const Real top = beam_.height;
  if (c <= outline.flange_thickness) {
    s.add_rectangle(outline.flange_width, c, top - c);
  } else {
    s.add_rectangle(outline.flange_width, outline.flange_thickness, top - outline.flange_thickness);
    s.add_rectangle(outline.web_width, c - outline.flange_thickness, top - c);
  }
  for (const TransformedBar& b : bars) s.add_area(b.area, top - b.depth, bar_factor(b.depth, c, bar_ratio));
  // The centroid of this section is the neutral axis found above.
  assert(std::abs(s.centroid() - (top - c)) <= 1e-9 * top);

  CrackedSection out;
  out.neutral_axis_depth = c;
  out.bar_ratio = bar_ratio;
  out.properties = StageProperties::from_transformed(s, concrete_modulus, top);
  return out;
}

StageProperties ReinforcedConcreteSection::composite(const model::DeckSlab& deck, Real deck_ratio,
                                                     Real concrete_modulus, std::optional<Real> bar_ratio) const {
  const DeckLayout layout(deck, beam_.height, context_);
  TransformedSection s = gross();
  if (bar_ratio) {
    require_bar_ratio(*bar_ratio);
    add_bars(s, *bar_ratio - 1);
  }
  layout.add_concrete(s, deck_ratio);
  return StageProperties::from_transformed(s, concrete_modulus, beam_.height, layout.top(), deck_ratio);
}

}  // namespace tenthpoint::section
