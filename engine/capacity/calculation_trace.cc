#include "engine/capacity/calculation_trace.h"

#include <utility>

namespace tenthpoint::capacity {

void CalculationTrace::add_input(std::string symbol, std::string description, Real value, units::Quantity quantity) {
  inputs.push_back(CalculationStep{std::move(symbol), std::move(description), "", value, quantity, ""});
}

Real CalculationTrace::add_step(std::string symbol, std::string description, std::string expression, Real value,
                                units::Quantity quantity, std::string reference) {
  steps.push_back(CalculationStep{std::move(symbol), std::move(description), std::move(expression), value, quantity,
                                  std::move(reference)});
  return value;
}

void CalculationTrace::add_note(std::string note) { notes.push_back(std::move(note)); }

void CalculationTrace::append(const CalculationTrace& other) {
  inputs.insert(inputs.end(), other.inputs.begin(), other.inputs.end());
  steps.insert(steps.end(), other.steps.begin(), other.steps.end());
  notes.insert(notes.end(), other.notes.begin(), other.notes.end());
}

const CalculationStep* CalculationTrace::find(std::string_view symbol) const {
  for (auto it = steps.rbegin(); it != steps.rend(); ++it)
    if (it->symbol == symbol) return &*it;
  for (auto it = inputs.rbegin(); it != inputs.rend(); ++it)
    if (it->symbol == symbol) return &*it;
  return nullptr;
}

}  // namespace tenthpoint::capacity
