// An agency's rating policy as plain data: everything that varies by agency
// or by edition of the specifications (load factors, vehicle sets, dynamic
// allowance, condition and system factors, posting, screening, deadlines).
// The numbers come from policy files (the shipped default names the editions
// it follows); none are built into the engine. Internal SI: lengths m, line
// loads N/m, weights N.
#pragma once

#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/core/units.h"
#include "engine/model/enums.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::model {

enum class RatingLevel { inventory, operating };
enum class RoundingRule { down, nearest, up };
// How a factor is read between two rows of an ADTT table.
enum class RowInterpolation { interpolate, higher_row };
enum class PermitDistribution { one_lane, multiple_lanes };
// How emergency vehicles share the lanes: one EV alone in one lane, an EV in
// every loaded lane, or one EV with legal loads in the other lanes.
enum class EmergencyLanes { alone_in_one_lane, every_lane, with_legal_loads };

std::string_view to_string(RatingLevel v);
std::string_view to_string(RoundingRule v);
std::string_view to_string(RowInterpolation v);
std::string_view to_string(PermitDistribution v);
std::string_view to_string(EmergencyLanes v);
template <>
std::optional<RatingLevel> parse(std::string_view text);
template <>
std::optional<RoundingRule> parse(std::string_view text);
template <>
std::optional<RowInterpolation> parse(std::string_view text);
template <>
std::optional<PermitDistribution> parse(std::string_view text);
template <>
std::optional<EmergencyLanes> parse(std::string_view text);

struct LevelFactors {
  Real inventory = 0;
  Real operating = 0;

  [[nodiscard]] Real at(RatingLevel level) const { return level == RatingLevel::inventory ? inventory : operating; }
};

struct StrengthDeadLoadFactors {
  Real dc = 0;
  Real dw = 0;
  Real dw_field_measured = 0;  // wearing surface measured in the field
};

struct AdttRow {
  Real adtt = 0;  // trucks per day, one direction
  Real gamma_ll = 0;
};

struct LegalLoadFactors {
  std::vector<AdttRow> rows;  // increasing ADTT
  Real unknown_adtt = 0;
  RowInterpolation between_rows = RowInterpolation::interpolate;

  // gamma_LL for a bridge's ADTT (nullopt = unknown): the first row's factor
  // below the table, the last row's above it, and between rows per
  // `between_rows`. Precondition: rows is not empty.
  [[nodiscard]] Real gamma_ll(std::optional<Real> adtt) const;
};

struct PermitRow {
  Real adtt = 0;
  Real loading_ratio = 0;  // N/m: permit gross weight over its axle length
  Real gamma_ll = 0;
};

struct PermitType {
  std::string id;
  std::string name;
  PermitDistribution distribution = PermitDistribution::multiple_lanes;
  bool divide_out_multiple_presence = false;
  std::optional<Real> dynamic_allowance;  // replaces the standard IM when set
  std::vector<PermitRow> rows;
  std::vector<std::string> load_models;  // the permit vehicles rated as this type
};

// Which service limit states are rated (MBE Table 6A.4.2.2-1 and 6A.4.2.2;
// some checks are optional by agency). Defaults as stated.
struct ServiceChecks {
  bool service_ii_design_inventory = true;   // steel, design load at inventory
  bool service_ii_design_operating = true;   // steel, design load at operating
  bool service_ii_legal = true;              // steel, legal and specialized hauling loads, emergency vehicles
  bool service_ii_permit = true;             // steel, permits
  bool service_iii_design_inventory = true;  // prestressed concrete, design load at inventory
  bool service_iii_legal = false;            // prestressed concrete, legal loads (optional, MBE 6A.5.4.1)
  bool service_i_permit = true;              // concrete under permits
};

struct EmergencyFactors {
  Real gamma_ll = 0;
  EmergencyLanes lanes = EmergencyLanes::every_lane;
};

struct LrfrFactors {
  StrengthDeadLoadFactors strength_i;
  LevelFactors design;                    // Strength I gamma_LL, design-load rating
  LevelFactors service_ii;                // steel, design load
  std::optional<Real> service_ii_legal;   // steel, legal loads
  std::optional<Real> service_ii_permit;  // steel, permits
  Real service_iii = 0;                   // prestressed concrete, design load
  Real service_iii_refined_losses = 0;
  std::optional<Real> service_iii_legal;  // prestressed concrete, legal loads
  Real service_i_permit = 0;
  ServiceChecks service_checks;
  LegalLoadFactors legal;
  std::vector<PermitType> permit_types;
  EmergencyFactors emergency;
  std::vector<Real> multiple_presence;  // m for 1, 2, 3, ... lanes; the last for more

  [[nodiscard]] const PermitType* find_permit_type(std::string_view id) const;
  // The permit type whose load_models name `load_model_id`; nullptr if none.
  [[nodiscard]] const PermitType* find_permit_type_for(std::string_view load_model_id) const;
  // m for `lanes` loaded lanes (>= 1).
  [[nodiscard]] Real multiple_presence_for(int lanes) const;
};

// I = numerator / (L + offset) <= maximum, with L the span length.
struct ImpactFormula {
  Real numerator = 0;  // m
  Real offset = 0;     // m
  Real maximum = 0;

  [[nodiscard]] Real at(Real span_length) const;  // span_length in m
};

struct LfrFactors {
  Real a1 = 0;
  LevelFactors a2;
  ImpactFormula impact;
  std::vector<Real> multiple_lane_reduction;  // for 1, 2, 3, ... lanes; the last for more

  [[nodiscard]] Real lane_reduction_for(int lanes) const;
};

struct DynamicAllowance {
  Real standard = 0;                            // IM as a fraction
  std::map<std::string, Real> riding_surfaces;  // named options

  // IM for a riding-surface option; the standard one for "" and nullopt for
  // an unknown name.
  [[nodiscard]] std::optional<Real> for_surface(std::string_view name) const;
};

struct ConditionFactorRow {
  int from = 0;  // superstructure condition rating, inclusive
  int to = 9;
  Real phi_c = 1.0;
};

struct SystemFactorRule {
  std::string id;
  std::vector<MaterialKind> materials;  // empty = all
  std::optional<int> min_girders;
  std::optional<int> max_girders;
  std::optional<Real> max_spacing;  // m
  Real phi_s = 1.0;
  std::string source;
};

struct SystemFactorPolicy {
  Real standard = 1.0;
  Real shear = 1.0;
  std::vector<SystemFactorRule> rules;  // first match wins
};

struct PostingPolicy {
  Real closure_below = 0;
  Real posting_below = 0;
  Real equation_divisor = 0;  // d in (W / d)(RF - o)
  Real equation_offset = 0;   // o
  RoundingRule rounding = RoundingRule::down;
  Real increment = 0;                   // N (a weight)
  std::optional<Real> minimum_posting;  // N; a posting below it closes the bridge
  RatingLevel lfr_level = RatingLevel::operating;
  bool never_at_or_above_legal_weight = true;
};

struct ScreeningPolicy {
  Real design_operating_skips_legal = 0;
  Real nrl_skips = 0;
  std::vector<std::string> nrl_screens;  // load-model ids
  Real emergency_group_1_lfr_hs20_inventory = 0;
  Real emergency_group_1_lrfr_hl93_inventory = 0;
};

struct Deadlines {
  int rerate_after_capacity_loss_days = 0;
  int post_after_rating_days = 0;
};

struct VehicleSet {
  std::string id;
  RatingMethod method = RatingMethod::lrfr;
  std::vector<std::string> load_models;  // ids in the policy's vehicle library
};

struct Policy {
  std::string id;
  std::string version;
  std::string name;
  std::string edition;
  units::UnitSystem units = units::UnitSystem::us;
  // The files it was read from, the policy itself first, then what it extends.
  std::vector<std::string> source_files;
  std::optional<std::string> confidentiality_notice;

  VehicleLibrary vehicles;  // every library it loads plus its inline vehicles
  std::vector<VehicleSet> vehicle_sets;
  std::map<RatingMethod, std::string> default_sets;

  LrfrFactors lrfr;
  LfrFactors lfr;
  DynamicAllowance dynamic_allowance;
  std::vector<ConditionFactorRow> condition_factors;
  SystemFactorPolicy system_factor;
  Real minimum_condition_system_product = 0;
  PostingPolicy posting;
  ScreeningPolicy screening;
  Deadlines deadlines;

  // The set `set_id` for `method`; the method's default set when `set_id` is empty.
  [[nodiscard]] const VehicleSet* find_set(RatingMethod method, std::string_view set_id = "") const;
  // phi_c for a superstructure condition rating 0..9; nullopt outside the table.
  [[nodiscard]] std::optional<Real> condition_factor(int superstructure_rating) const;
};

}  // namespace tenthpoint::model
