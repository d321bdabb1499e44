// File and directory names made from user data (a structure id, a girder
// id). Inventory files come from many hands, so a value that becomes a path
// component is reduced to a safe alphabet and can never climb out of the
// output directory or name an absolute path.
#pragma once

#include <string>
#include <string_view>

namespace tenthpoint {

// One path component: letters, digits, '-', '_' and '.' kept; every other
// character (path separators, spaces, control characters, non-ASCII bytes)
// becomes '_'; a leading '.' becomes '_' (no hidden files, no "." or "..");
// at most 100 characters; an empty result becomes "_".
[[nodiscard]] std::string safe_file_name(std::string_view text);

}  // namespace tenthpoint
