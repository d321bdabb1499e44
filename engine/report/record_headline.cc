#include "engine/report/record_headline.h"

namespace tenthpoint::report {

bool is_design_category(std::string_view category) { return category == "design" || category == "lfr_design"; }
bool is_legal_category(std::string_view category) { return category == "legal" || category == "specialized_hauling"; }

RecordHeadline record_headline(const ledger::BridgeRecord& record) {
  RecordHeadline h;
  const auto keep_smaller = [](const ledger::GoverningRow*& slot, const ledger::GoverningRow& row) {
    if (slot == nullptr || row.rating_factor < slot->rating_factor) slot = &row;
  };
  for (const ledger::GoverningRow& row : record.governing) {
    if (is_design_category(row.category)) {
      if (row.level == "inventory") keep_smaller(h.inventory, row);
      if (row.level == "operating") keep_smaller(h.operating, row);
    } else if (is_legal_category(row.category) && row.level == "operating") {
      keep_smaller(h.legal, row);
    }
  }
  return h;
}

}  // namespace tenthpoint::report
