// The headline values of one ledger record, as the summary and the SNBI
// export both report them: the governing design-load rating at the
// inventory and at the operating level, and the controlling legal load.
//
//   inventory / operating  the smallest rating factor of the design loads
//                          (category design or lfr_design) at that level;
//   legal                  the smallest operating rating factor of the legal
//                          loads (categories legal and specialized_hauling),
//                          screened-out ones included: the factor was
//                          computed, and the screening only decides whether
//                          it is needed for posting (MBE 6A.4.3).
// Each is nullptr when the record has no such row (a failed bridge).
#pragma once

#include "engine/ledger/bridge_record.h"

namespace tenthpoint::report {

struct RecordHeadline {
  const ledger::GoverningRow* inventory = nullptr;
  const ledger::GoverningRow* operating = nullptr;
  const ledger::GoverningRow* legal = nullptr;
};

[[nodiscard]] RecordHeadline record_headline(const ledger::BridgeRecord& record);

[[nodiscard]] bool is_design_category(std::string_view category);
[[nodiscard]] bool is_legal_category(std::string_view category);

}  // namespace tenthpoint::report
