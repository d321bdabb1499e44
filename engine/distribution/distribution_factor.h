// The live-load distribution factor of one girder line for one effect and
// region, with the method used, the one-lane and multi-lane values and every
// intermediate value, so that a report can show the calculation. Factors are
// lanes per girder (LRFD) or wheel lines and lanes per girder (LFR), with
// the multiple-presence factor (LRFD) or lane reduction (LFR) included.
// Intermediate values are in the US units the equations use (ft, in, in^4),
// because that is how a reviewer checks them by hand.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/model/enums.h"

namespace tenthpoint::distribution {

// How the factor in use was found.
//  equation: the empirical equations of LRFD 4.6.2.2 (or LFR S/D);
//  lever_rule: statics with hinges at the adjacent girders;
//  lesser_of: Nb = 3, the lesser of the equation and the lever rule;
//  rigid_body: the LRFD 4.6.2.2.2d-1 rigid-body reaction governed;
//  strip: the equivalent strip width of a slab bridge (LRFD 4.6.2.3);
//  override: a value given in the bridge file's distribution_overrides.
enum class FactorMethod { equation, lever_rule, lesser_of, rigid_body, strip, override_value };

// positive_moment and shear are per span; negative_moment per interior support.
enum class FactorRegion { positive_moment, negative_moment, shear };

[[nodiscard]] std::string_view to_string(FactorMethod method);
[[nodiscard]] std::string_view to_string(FactorRegion region);

struct FactorTrace {
  Real spacing_ft = 0;              // S
  Real span_ft = 0;                 // L for this effect and region
  std::optional<Real> slab_in;      // ts
  std::optional<Real> kg_in4;       // Kg
  std::optional<Real> eg_in;        // eg
  std::optional<Real> inertia_in4;  // I of the noncomposite girder
  std::optional<Real> area_in2;     // A of the noncomposite girder
  std::optional<Real> modular_ratio;
  std::optional<Real> curb_ft;              // de
  std::optional<Real> exterior_correction;  // e
  Real skew_degrees = 0;
  std::optional<Real> skew_c1;            // moment only
  Real skew_factor = 1.0;                 // applied to the one- and multi-lane values
  std::optional<Real> strip_one_lane_in;  // E, slab bridges
  std::optional<Real> strip_multi_lane_in;
  int girders = 0;         // Nb
  int lanes = 0;           // design lanes
  std::string section_id;  // section Kg was taken from
};

struct DistributionFactor {
  model::ForceEffect effect = model::ForceEffect::moment;
  FactorRegion region = FactorRegion::positive_moment;
  int index = 0;  // span index (positive moment, shear) or support index (negative moment), from 0

  Real value = 0;  // the governing factor in use
  FactorMethod method = FactorMethod::equation;
  Real one_lane = 0;                    // of the computed method, skew applied
  std::optional<Real> multi_lane;       // absent when only one lane fits
  Real multiple_presence_one_lane = 0;  // m applied with the lever rule (or 1 where inside the equation)
  Real multiple_presence_multi_lane = 0;

  // The candidates, for the report.
  std::optional<Real> equation_one_lane, equation_multi_lane;
  std::optional<Real> lever_one_lane, lever_multi_lane;
  std::optional<Real> rigid_body;

  // With an override: the computed factor it replaced and the reason given.
  std::optional<Real> computed_value;
  std::optional<FactorMethod> computed_method;
  std::string override_reason;

  FactorTrace trace;
  std::vector<std::string> warnings;
};

struct GirderLineFactors {
  std::string girder;
  model::GirderPosition position = model::GirderPosition::interior;
  std::vector<DistributionFactor> factors;

  // The factor for a region at a span (or support) index; nullptr if none.
  [[nodiscard]] const DistributionFactor* find(FactorRegion region, int index) const;
  // Every warning of every factor, prefixed by its region and index.
  [[nodiscard]] std::vector<std::string> all_warnings() const;
};

}  // namespace tenthpoint::distribution
