// The engine's two exception types. Broken internal invariants are asserts,
// not exceptions; these are for problems with what the user gave us.
//
//  - InputError: the input is wrong (a file, a field, a value). Carries every
//    diagnostic found, so a reader can report all problems in a file at once.
//  - ModelError: the input is well-formed but describes something the engine
//    cannot analyse (a mechanism, an unsupported span, EI of zero). Names the
//    bridge and the cause.
//
// The batch runner catches both per bridge, so one bad record never stops a run.
#pragma once

#include <stdexcept>
#include <string>

#include "engine/core/diagnostic.h"

namespace tenthpoint {

class InputError : public std::runtime_error {
 public:
  explicit InputError(Diagnostics diagnostics);
  InputError(SourceLocation where, std::string field, std::string message);

  [[nodiscard]] const Diagnostics& diagnostics() const noexcept { return diagnostics_; }

 private:
  Diagnostics diagnostics_;
};

class ModelError : public std::runtime_error {
 public:
  ModelError(std::string bridge_id, std::string cause);

  [[nodiscard]] const std::string& bridge_id() const noexcept { return bridge_id_; }
  [[nodiscard]] const std::string& cause() const noexcept { return cause_; }

 private:
  std::string bridge_id_;
  std::string cause_;
};

}  // namespace tenthpoint
