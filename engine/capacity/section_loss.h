// Section loss found by inspection, applied to the section description at a
// station. The capacity stage uses the reduced section wherever a loss of
// the inspection in force covers the station.
//
// Where a loss applies (loss_covers): inside [start, end], ends included,
// except that at an end the side of the station matters as it does for
// section changes (section::Side): at `start` only the right side (the
// piece starting there) is in the region, at `end` only the left side -
// unless that end is the girder's own end, which has one side only. A loss
// with start == end is a point and applies from both sides. Stations are m
// along the girder; ends match within section::detail::kStationTolerance.
//
// What a loss does (apply_section_loss), by element and section kind:
//   steel_i   top_flange, bottom_flange, web: the plate's thickness less
//             thickness_loss, or times (1 - percent/100) (the width is
//             kept, so the area loss is the stated percent);
//             cover_plate: the same for every cover plate of the section (a
//             plate lost entirely is removed); bars: the deck's
//             longitudinal bars, percent only; deck: the deck thickness.
//   rc_beam   bars: every bar layer, top and bottom (percent only;
//             conservative for either sense of bending); deck: a separate
//             deck's thickness, or for a monolithic T-beam a loss of the top
//             surface (thickness_loss only): height and flange thickness
//             less the loss and bar depths (measured from the top) with them.
//   ps_girder strands: every strand layer's area per strand (percent only,
//             the same as losing that share of the strands); bars, deck: as
//             for steel.
// Several losses on one element apply one after another. A reduced section
// drops its given `properties`, so every stage property is recomputed from
// the reduced description. An element the section does not have (a cover
// plate outside the plated length, a deck on a section without one) is
// skipped with a warning. Throws InputError at the loss's location when the
// element does not belong to the section kind, when a bar or strand loss is
// given as a thickness, or when a plate or deck would lose all its thickness.
#pragma once

#include <string>
#include <vector>

#include "engine/core/numeric.h"
#include "engine/model/inspection.h"
#include "engine/model/section.h"
#include "engine/section/stiffness_profile.h"

namespace tenthpoint::capacity {

// True when `loss` applies at `station` from `side` on a girder of
// `girder_length` (m). The girder id is not compared.
[[nodiscard]] bool loss_covers(const model::SectionLoss& loss, Real station, section::Side side, Real girder_length);

// The losses of `inspection` on girder line `girder_id` that apply at the
// station, in the inspection's order.
[[nodiscard]] std::vector<model::SectionLoss> losses_at(const model::Inspection& inspection,
                                                        const std::string& girder_id, Real station, section::Side side,
                                                        Real girder_length);

struct DeterioratedSection {
  model::SectionDefinition section;         // the reduced section (or the original when nothing applied)
  std::vector<model::SectionLoss> applied;  // the losses that changed it
  std::vector<std::string> notes;           // what each applied loss did, in words
  std::vector<std::string> warnings;        // losses that found nothing to act on

  [[nodiscard]] bool reduced() const { return !applied.empty(); }
};

[[nodiscard]] DeterioratedSection apply_section_loss(const model::SectionDefinition& section,
                                                     const std::vector<model::SectionLoss>& losses);

}  // namespace tenthpoint::capacity
