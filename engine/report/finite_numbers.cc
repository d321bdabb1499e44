#include "engine/report/finite_numbers.h"

#include <array>
#include <cmath>
#include <cstdio>
#include <cstdlib>

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

// 10^0 .. 10^22: every one is exactly representable in binary64, so scaling
// by them and rounding the quotient or product once gives the double nearest
// the rounded decimal.
constexpr std::array<double, 23> kPowersOfTen{1e0,  1e1,  1e2,  1e3,  1e4,  1e5,  1e6,  1e7,  1e8,  1e9,  1e10, 1e11,
                                              1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

}  // namespace

double round_to_significant(double value, int significant_digits) {
  if (value == 0 || !std::isfinite(value)) return value;
  // Decimal places kept: digits - 1 - (decimal exponent of the leading digit).
  const int exponent = static_cast<int>(std::floor(std::log10(std::abs(value))));
  const int shift = significant_digits - 1 - exponent;
  if (shift >= 0 && shift < static_cast<int>(kPowersOfTen.size()))
    return std::round(value * kPowersOfTen[static_cast<std::size_t>(shift)]) /
           kPowersOfTen[static_cast<std::size_t>(shift)];
  if (shift < 0 && -shift < static_cast<int>(kPowersOfTen.size()))
    return std::round(value / kPowersOfTen[static_cast<std::size_t>(-shift)]) *
           kPowersOfTen[static_cast<std::size_t>(-shift)];
  // Beyond 10^+-22 (round-off residues such as 1e-17) no power of ten is
  // exact: let the C library round the decimal text, correctly but slowly.
  std::array<char, 40> text{};
  std::snprintf(text.data(), text.size(), "%.*e", significant_digits - 1, value);
  return std::strtod(text.data(), nullptr);
}

bool round_numbers(nlohmann::json& document, int significant_digits) {
  if (document.is_number_float()) {
    double& value = document.get_ref<double&>();
    if (!std::isfinite(value)) return false;
    value = round_to_significant(value, significant_digits);
    return true;
  }
  bool finite = true;
  if (document.is_structured())
    for (nlohmann::json& element : document) finite = round_numbers(element, significant_digits) && finite;
  return finite;
}

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
