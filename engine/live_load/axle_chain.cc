#include "engine/live_load/axle_chain.h"

#include <fmt/format.h>

#include <limits>

#include "engine/core/errors.h"

namespace tenthpoint::live_load {
namespace {

bool positive(Real v) { return std::isfinite(v) && v > 0.0; }

}  // namespace

std::size_t AxleChain::variable_link_count() const {
  std::size_t n = 0;
  for (const AxleLink& l : links) n += l.variable() ? 1 : 0;
  return n;
}

bool AxleChain::symmetric() const {
  const std::size_t n = weights.size();
  for (std::size_t i = 0; i < n; ++i) {
    if (weights[i] != weights[n - 1 - i]) return false;
  }
  const std::size_t m = links.size();
  for (std::size_t i = 0; i < m; ++i) {
    if (links[i].min != links[m - 1 - i].min || links[i].max != links[m - 1 - i].max) return false;
  }
  return true;
}

AxleChain axle_chain(const model::LoadCase& load_case, const model::AxleTrain& train) {
  const auto fail = [&](const std::string& field, const std::string& message) {
    throw InputError(load_case.where, field, fmt::format("load case {}: {}", load_case.id, message));
  };
  if (train.axle_weights.empty()) fail("train", fmt::format("train {} has no axles", train.id));
  if (train.spacings.size() + 1 != train.axle_weights.size()) {
    fail("train", fmt::format("train {} needs one spacing fewer than axles", train.id));
  }
  if (!positive(load_case.train_factor)) fail("train_factor", "must be positive");
  if (load_case.count < 1) fail("count", "must be at least 1");
  if (load_case.count > 1 && !load_case.gap) fail("gap", "a case with more than one train needs a gap");
  if (load_case.fixed_variable_spacing && !positive(*load_case.fixed_variable_spacing)) {
    fail("fixed_variable_spacing", "must be positive");
  }

  AxleChain chain;
  chain.train_id = train.id;
  chain.train_count = load_case.count;
  chain.axles_per_train = train.axle_weights.size();
  std::vector<AxleLink> one_train;
  for (const model::AxleSpacing& s : train.spacings) {
    if (!positive(s.min) || !(s.max >= s.min) || !std::isfinite(s.max)) {
      fail("train", fmt::format("train {} has a spacing that is not a positive range", train.id));
    }
    AxleLink link{s.min, s.max};
    if (link.variable() && load_case.fixed_variable_spacing) {
      link.min = link.max = *load_case.fixed_variable_spacing;
    }
    one_train.push_back(link);
  }
  AxleLink gap{};
  if (load_case.gap) {
    gap.min = load_case.gap->min;
    gap.max = load_case.gap->max;
    if (!std::isfinite(gap.max) || gap.max < gap.min) gap.max = std::numeric_limits<Real>::infinity();
    if (!std::isfinite(gap.min) || gap.min < 0.0) fail("gap", "the least gap must not be negative");
  }
  for (int t = 0; t < load_case.count; ++t) {
    if (t > 0) chain.links.push_back(gap);
    for (Real w : train.axle_weights) {
      if (!positive(w)) fail("train", fmt::format("train {} has an axle weight that is not positive", train.id));
      chain.weights.push_back(w * load_case.train_factor);
    }
    chain.links.insert(chain.links.end(), one_train.begin(), one_train.end());
  }
  if (chain.axle_count() > kMaxChainAxles) {
    fail("count", fmt::format("more than {} axles in one lane", kMaxChainAxles));
  }
  if (chain.variable_link_count() > kMaxVariableLinks) {
    fail("train", fmt::format("more than {} variable spacings in one lane", kMaxVariableLinks));
  }
  return chain;
}

}  // namespace tenthpoint::live_load
