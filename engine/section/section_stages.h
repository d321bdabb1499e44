// The elastic properties of one section definition for every load stage the
// analysis needs (AASHTO LRFD 6.10.1.1.1, 3.3.2):
//   noncomposite  DC1: the girder alone;
//   long_term     DC2, DW: deck transformed by k*n (steel) or n (concrete);
//   short_term    live load: deck transformed by n;
//   cracked_negative (optional) steel girder plus deck bars, LRFD 6.10.1.1.1c.
// All stages are in the girder material's units; EI = modulus * inertia.
//
// Which properties are used, stage by stage:
//  1. a stage given in the section's `properties` is used as given (it wins
//     for stiffness, also when a description is present);
//  2. otherwise it is computed from the description (and the deck, for the
//     composite stages);
//  3. otherwise, for a stage the bridge needs (noncomposite always; long_term
//     and short_term when materials.composite), InputError names the section
//     and the stage. cracked_negative is optional and is left absent.
// On a non-composite bridge the deck is not structural, every stage is
// carried by the noncomposite section, and a given long_term or short_term
// stage is an InputError (it contradicts materials.composite).
#pragma once

#include <optional>

#include "engine/model/enums.h"
#include "engine/model/materials.h"
#include "engine/model/section.h"
#include "engine/section/section_options.h"
#include "engine/section/stage_properties.h"

namespace tenthpoint::section {

struct SectionStages {
  bool composite = false;
  StageProperties noncomposite;
  std::optional<StageProperties> long_term;         // set exactly when composite
  std::optional<StageProperties> short_term;        // set exactly when composite
  std::optional<StageProperties> cracked_negative;  // given, or computed for composite steel with deck bars

  // The section that carries `stage` (the noncomposite one for every stage of
  // a non-composite bridge).
  [[nodiscard]] const StageProperties& at(model::SectionStage stage) const;
};

// Properties by the rules above. Throws InputError for a missing stage, a
// description that does not match materials.kind, bad dimensions, or missing
// materials.
[[nodiscard]] SectionStages section_stages(const model::SectionDefinition& section, const model::Materials& materials,
                                           const SectionOptions& options = {});

// Properties computed from the description alone, ignoring any given
// `properties`. Throws InputError when the section has no description, or,
// on a composite bridge, no deck.
[[nodiscard]] SectionStages described_section_stages(const model::SectionDefinition& section,
                                                     const model::Materials& materials,
                                                     const SectionOptions& options = {});

}  // namespace tenthpoint::section
