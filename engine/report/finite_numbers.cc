#include "engine/report/finite_numbers.h"

#include <cmath>

#include <fmt/format.h>

#include "engine/core/errors.h"

namespace tenthpoint::report {
namespace {

// RFC 6901: "~" is written "~0" and "/" is written "~1" inside a token.
std::string pointer_token(std::string_view key) {
  std::string out;
  for (char c : key) {
    if (c == '~')
      out += "~0";
    else if (c == '/')
      out += "~1";
    else
      out += c;
  }
  return out;
}

bool find(const nlohmann::json& node, std::string& path) {
  if (node.is_number_float()) return !std::isfinite(node.get<double>());
  const std::size_t length = path.size();
  if (node.is_object()) {
    for (auto it = node.begin(); it != node.end(); ++it) {
      path += '/';
      path += pointer_token(it.key());
      if (find(it.value(), path)) return true;
      path.resize(length);
    }
  } else if (node.is_array()) {
    for (std::size_t i = 0; i < node.size(); ++i) {
      path += '/';
      path += std::to_string(i);
      if (find(node[i], path)) return true;
      path.resize(length);
    }
  }
  return false;
}

}  // namespace

std::optional<std::string> first_non_finite(const nlohmann::json& document) {
  std::string path;
  if (find(document, path)) return path.empty() ? std::string("/") : path;
  return std::nullopt;
}

void require_finite(const nlohmann::json& document, std::string_view bridge_id, std::string_view what) {
  if (const std::optional<std::string> path = first_non_finite(document))
    throw ModelError(std::string(bridge_id),
                     fmt::format("{}: the number at {} is not finite (NaN or infinity)", what, *path));
}

}  // namespace tenthpoint::report
