// A capacity's calculation as plain data, so a report can print every step:
// "Mn = As fy (d - a/2) = 2596 kip-in (AASHTO LRFD 5.6.3.2.2-1)".
//
// Values are in internal SI units; `quantity` names the kind of value so a
// report converts it to the user's units (units::from_internal). Strains,
// ratios and factors are dimensionless. Nothing here formats or prints.
#pragma once

#include <string>
#include <string_view>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/core/units.h"

namespace tenthpoint::capacity {

struct CalculationStep {
  std::string symbol;       // e.g. "a", "Mn", "lambda_f"
  std::string description;  // e.g. "depth of the equivalent stress block"
  std::string expression;   // e.g. "As fy / (alpha1 f'c b)"; empty for an input
  Real value = 0;           // internal SI units of `quantity`
  units::Quantity quantity = units::Quantity::dimensionless;
  std::string reference;  // e.g. "AASHTO LRFD 5.6.3.1.1-4"; empty for an input
};

struct CalculationTrace {
  std::string title;                    // e.g. "reinforced concrete flexure, positive moment"
  std::vector<CalculationStep> inputs;  // the values the calculation starts from
  std::vector<CalculationStep> steps;   // intermediate and final values, in order
  std::vector<std::string> notes;       // assumptions and limits applied, in words

  void add_input(std::string symbol, std::string description, Real value, units::Quantity quantity);
  // Records a step and returns `value`, so a formula can be written once.
  Real add_step(std::string symbol, std::string description, std::string expression, Real value,
                units::Quantity quantity, std::string reference);
  void add_note(std::string note);
  // Appends another trace's inputs, steps and notes (a sub-calculation).
  void append(const CalculationTrace& other);

  // The last step (or, failing that, input) with `symbol`; nullptr when none.
  [[nodiscard]] const CalculationStep* find(std::string_view symbol) const;
};

}  // namespace tenthpoint::capacity
