#include "engine/capacity/resistance.h"

#include <utility>

namespace tenthpoint::capacity {

std::string_view to_string(MomentSign sign) { return sign == MomentSign::positive ? "positive" : "negative"; }

std::string_view to_string(ResistanceStatus status) {
  switch (status) {
    case ResistanceStatus::computed:
      return "computed";
    case ResistanceStatus::given:
      return "given";
    case ResistanceStatus::unavailable:
      return "unavailable";
  }
  return "?";
}

Resistance Resistance::unavailable_because(std::string reason) {
  Resistance r;
  r.status = ResistanceStatus::unavailable;
  r.reason = std::move(reason);
  return r;
}

}  // namespace tenthpoint::capacity
