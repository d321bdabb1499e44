// Capacities along one girder line at any station, as the rating asks for
// them at every analysis point (left and right of section changes):
// factored flexural resistance for either sense of bending, factored shear
// resistance (taking the factored demand at the section where the method
// needs it), and the service-stress data of steel (Service II) and
// prestressed (Service III) girders.
//
// Source of a strength capacity (capacity.mode of the bridge file):
//  - given: the capacity.given region covering the station
//    (given_capacity_lookup.h), never reduced for section loss (a warning
//    says so where loss is reported);
//  - computed: from the section description at the station, reduced by the
//    section losses of the inspection in force (section_loss.h), by
//    material:
//      steel      composite positive flexure 6.10.7 (steel_composite_positive_flexure.h);
//                 negative, and non-composite either way, 6.10.8 (steel_flange_flexure.h)
//                 with Lb between brace points; shear 6.10.9 (steel_shear.h);
//      RC, PS     flexure 5.6.3 (concrete_flexure.h); shear 5.7.3 (concrete_shear.h),
//                 dv from the flexural calculation for the side in tension.
//    A section with no description, or with no tension steel on the side
//    asked for, gives an unavailable resistance naming the section and what
//    to give; never a made-up value.
// The inspection in force is Bridge::latest_inspection(as_of), with as_of
// from the options, else the bridge's rating.as_of, else the latest.
//
// Sections at a station: the segment holding it from `side`
// (section::Side); in a haunched segment the description blended by
// TaperedSection::section_at. Geometry (Dc, the PNA, moment equivalents)
// comes from the description; the stage section moduli reported for stress
// forms and service checks follow section_stages() (given properties win,
// as for the analysis) unless a loss applies, when every stage is recomputed
// from the reduced description.
//
// Brace points for Lb: the girder line's brace_stations plus the girder's
// two ends (taken as braced by end diaphragms or bearings; common practice).
// A stiffened web panel is an end panel (6.10.9.3.3) within one stiffener
// spacing of a girder end.
//
// A bridge rated by LFR takes the AASHTO Standard Specifications 17th ed.
// for concrete flexure (8.16.3 RC, 9.17 PS; lfr_concrete_flexure.h) and RC
// shear (8.16.6; lfr_concrete_shear.h). Steel (LRFD 6.10 with phi = 1.0,
// which gives Mp for compact composite positive flexure as 10.50.1.1 does)
// and prestressed shear keep the LRFD resistance with a warning saying so.
//
// Units internal SI: stations m, moments N*m (magnitudes), shears N.
//
// Shear memo: the rating asks for shear at each point about 2,600 times per
// girder line (load model x level x point x side x extreme), and only the
// demand (Mu, Vu) differs between those calls. shear() therefore keeps, per
// exact (station bit pattern, side, moment sign), the section state and the
// demand-independent concrete parts (member sections, and the flexural
// calculation that gives dv or d), so a repeated call only redoes the Vc/Vs
// step of LRFD 5.7.3.4.1/5.7.3.4.2 (or 8.16.6). Nothing is matched
// approximately, so the results are those of a fresh object. The memo is
// `mutable` and unsynchronised: a GirderCapacity is used by one thread at a
// time (rate_bridge makes one per girder line). Copies share no mutable data.
//
// Throws InputError for invalid options, segments that do not resolve
// (as GirderSectionProfile), missing materials, bad dimensions and bad loss
// records, each naming the field.
#pragma once

#include <cstdint>
#include <map>
#include <memory>
#include <optional>
#include <string>
#include <tuple>
#include <vector>

#include "engine/capacity/capacity_options.h"
#include "engine/capacity/concrete_shear.h"
#include "engine/capacity/prestressed_service_limits.h"
#include "engine/capacity/reinforced_service_limits.h"
#include "engine/capacity/resistance.h"
#include "engine/capacity/section_loss.h"
#include "engine/capacity/steel_service_limits.h"
#include "engine/model/bridge.h"
#include "engine/section/girder_section_profile.h"
#include "engine/section/stiffness_profile.h"
#include "engine/section/tapered_section.h"

namespace tenthpoint::capacity {

class GirderCapacity {
 public:
  GirderCapacity(const model::Bridge& bridge, const model::GirderLine& girder, const CapacityOptions& options = {});

  [[nodiscard]] const std::string& girder_id() const { return girder_.id; }
  [[nodiscard]] Real length() const { return profile_.length(); }
  [[nodiscard]] model::CapacitySource mode() const { return capacity_.mode; }
  // The inspection in force, or nullptr when the bridge has none on or before as_of.
  [[nodiscard]] const model::Inspection* inspection() const { return inspection_ ? &*inspection_ : nullptr; }

  // The (reduced) section at a station.
  [[nodiscard]] DeterioratedSection section_at(Real station, section::Side side = section::Side::right) const;
  // Unbraced length of the compression flange at a station, m.
  [[nodiscard]] Real unbraced_length(Real station, section::Side side = section::Side::right) const;

  // phi*Mn for `sign` at the station.
  [[nodiscard]] Resistance flexure(Real station, MomentSign sign, section::Side side = section::Side::right) const;
  // phi*Vn at the station. For concrete, the demand's moment sign (or `sign`
  // without a demand) picks the flexural tension side for dv and eps_s; the
  // general procedure needs the demand.
  [[nodiscard]] Resistance shear(Real station, section::Side side = section::Side::right,
                                 const std::optional<ShearDemand>& demand = std::nullopt,
                                 MomentSign sign = MomentSign::positive) const;
  // Service II limits; unavailable for a bridge that is not steel or a
  // section without a description.
  [[nodiscard]] SteelServiceLimits steel_service(Real station, section::Side side = section::Side::right) const;
  // Service III data; unavailable for a bridge that is not prestressed or a
  // section without a description.
  [[nodiscard]] PrestressedServiceLimits prestressed_service(Real station,
                                                             section::Side side = section::Side::right) const;
  // Service I steel-stress data for permits on reinforced concrete, for
  // `sign`; unavailable for a bridge that is not reinforced concrete or a
  // section without a description or without tension bars on that face.
  [[nodiscard]] ReinforcedServiceLimits reinforced_service(Real station, MomentSign sign,
                                                           section::Side side = section::Side::right) const;

 private:
  struct State;
  struct ShearBasis;
  [[nodiscard]] State state_at(Real station, section::Side side) const;
  // The memoised demand-independent part of shear() (see "Shear memo").
  [[nodiscard]] const ShearBasis& shear_basis(Real station, section::Side side, MomentSign sign) const;
  [[nodiscard]] std::vector<model::SectionLoss> losses_here(Real station, section::Side side) const;
  [[nodiscard]] Resistance steel_flexure(const State& state, MomentSign sign, Real station, section::Side side) const;
  void finish(Resistance& r, const State& state) const;

  std::string source_file_;
  model::RatingMethod method_;
  model::Materials materials_;
  std::vector<model::SectionDefinition> sections_;
  model::CapacityInput capacity_;
  model::GirderLine girder_;
  std::optional<model::Inspection> inspection_;
  CapacityOptions options_;
  section::GirderSectionProfile profile_;
  std::vector<Real> boundaries_;                                         // segment stations
  std::vector<std::shared_ptr<const section::TaperedSection>> tapered_;  // per segment; null when prismatic
  std::vector<Real> brace_points_;
  // Key: the station's bit pattern, side and moment sign. Entries are
  // immutable once made; shared_ptr keeps the class copyable.
  using ShearKey = std::tuple<std::uint64_t, int, int>;
  mutable std::map<ShearKey, std::shared_ptr<const ShearBasis>> shear_memo_;
};

}  // namespace tenthpoint::capacity
