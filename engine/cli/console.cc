#include "engine/cli/console.h"

#include <cstdio>

namespace tenthpoint::cli {

void print_diagnostics(const Diagnostics& diagnostics) {
  for (const Diagnostic& d : diagnostics) std::fprintf(stderr, "%s\n", d.to_string().c_str());
}

}  // namespace tenthpoint::cli
