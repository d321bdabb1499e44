// Elastic properties of a cast-in-place reinforced concrete rectangle or
// T-beam: the gross section, the gross section with the bars transformed, and
// the cracked transformed section under positive moment (top in compression).
//
// Results are in concrete units (E = Ec of the girder concrete). Heights are m
// above the soffit; bar depths are m below the top of the beam, as in
// model::ReinforcedConcreteBeam. A beam with flange_thickness == 0 is a
// rectangle web_width wide (flange_width is then not used).
//
// Transformed-section method (textbook elastic theory): a bar of area A in
// tension counts as n*A; a bar in compressed concrete as (n-1)*A, because it
// displaces concrete that is already counted. n = Es / Ec.
#pragma once

#include <optional>

#include "engine/core/numeric.h"
#include "engine/model/section.h"
#include "engine/section/input_checks.h"
#include "engine/section/stage_properties.h"
#include "engine/section/transformed_section.h"

namespace tenthpoint::section {

// The cracked transformed section: concrete above the neutral axis plus the
// transformed bars. properties.neutral_axis = height - neutral_axis_depth.
struct CrackedSection {
  Real neutral_axis_depth = 0;  // m, c, below the top of the beam
  Real bar_ratio = 0;           // n = Es / Ec used
  StageProperties properties;   // area and I_cr transformed to concrete
};

class ReinforcedConcreteSection {
 public:
  // Throws InputError on non-positive dimensions, a flange thicker than the
  // beam or narrower than the web, or a bar layer outside the beam.
  ReinforcedConcreteSection(const model::ReinforcedConcreteBeam& beam, detail::SectionContext context);

  [[nodiscard]] Real height() const { return beam_.height; }
  [[nodiscard]] bool is_rectangle() const { return beam_.flange_thickness == 0; }
  // Gross concrete area, m^2 (bars not transformed, holes not deducted).
  [[nodiscard]] Real concrete_area() const { return gross().area(); }
  // The concrete outline as a transformed section (factor 1).
  [[nodiscard]] TransformedSection gross() const;

  // Gross concrete section.
  [[nodiscard]] StageProperties gross_properties(Real concrete_modulus) const;
  // Gross section with every bar layer added as (n - 1) * A. The bar-ratio
  // arguments below are n = Es / Ec; InputError unless n > 1.
  [[nodiscard]] StageProperties gross_transformed(Real concrete_modulus, Real bar_ratio) const;
  // Cracked transformed section under positive moment. Throws InputError
  // when the beam has no bottom bars (there is then no cracked section).
  [[nodiscard]] CrackedSection cracked_transformed(Real concrete_modulus, Real bar_ratio) const;
  // The gross (or, with bar_ratio, gross transformed) beam plus a separate
  // deck slab transformed by `deck_ratio` = E_beam / E_deck.
  [[nodiscard]] StageProperties composite(const model::DeckSlab& deck, Real deck_ratio, Real concrete_modulus,
                                          std::optional<Real> bar_ratio) const;

 private:
  void add_bars(TransformedSection& section, Real factor) const;
  void require_bar_ratio(Real bar_ratio) const;

  model::ReinforcedConcreteBeam beam_;
  detail::SectionContext context_;
};

}  // namespace tenthpoint::section
