// Printing diagnostics for a person at a terminal (or a log reading them).
#pragma once

#include "engine/core/diagnostic.h"

namespace tenthpoint::cli {

// Every diagnostic on stderr, one line each: "file:line:col: error: field: message".
void print_diagnostics(const Diagnostics& diagnostics);

}  // namespace tenthpoint::cli
