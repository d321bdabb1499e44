#include "engine/model/vehicle.h"

#include <algorithm>
#include <array>
#include <numeric>
#include <utility>

#include "engine/core/name_table.h"

namespace tenthpoint::model {
namespace {

constexpr NameTable<VehicleCategory, 6> kVehicleCategory{{
    {VehicleCategory::design, "design"},
    {VehicleCategory::legal, "legal"},
    {VehicleCategory::specialized_hauling, "specialized_hauling"},
    {VehicleCategory::permit, "permit"},
    {VehicleCategory::emergency, "emergency"},
    {VehicleCategory::lfr_design, "lfr_design"},
}};

constexpr NameTable<LoadEffect, 5> kLoadEffect{{
    {LoadEffect::positive_moment, "positive_moment"},
    {LoadEffect::negative_moment, "negative_moment"},
    {LoadEffect::shear, "shear"},
    {LoadEffect::end_reaction, "end_reaction"},
    {LoadEffect::interior_reaction, "interior_reaction"},
}};

}  // namespace

std::string_view to_string(VehicleCategory v) { return name_of(kVehicleCategory, v); }
std::string_view to_string(LoadEffect v) { return name_of(kLoadEffect, v); }
template <>
std::optional<VehicleCategory> parse(std::string_view t) {
  return value_of(kVehicleCategory, t);
}
template <>
std::optional<LoadEffect> parse(std::string_view t) {
  return value_of(kLoadEffect, t);
}

Real AxleTrain::gross_weight() const { return std::accumulate(axle_weights.begin(), axle_weights.end(), Real{0}); }

Real AxleTrain::shortest_length() const {
  return std::accumulate(spacings.begin(), spacings.end(), Real{0},
                         [](Real sum, const AxleSpacing& s) { return sum + s.min; });
}

bool LoadCase::applies_to(LoadEffect effect) const {
  return effects.empty() || std::find(effects.begin(), effects.end(), effect) != effects.end();
}

bool LoadModel::rated_with(RatingMethod method) const {
  return std::find(methods.begin(), methods.end(), method) != methods.end();
}

const AxleTrain* VehicleLibrary::find_train(std::string_view train_id) const {
  auto it = std::find_if(trains.begin(), trains.end(), [&](const AxleTrain& t) { return t.id == train_id; });
  return it == trains.end() ? nullptr : &*it;
}

const LoadModel* VehicleLibrary::find_load_model(std::string_view model_id) const {
  auto it = std::find_if(load_models.begin(), load_models.end(), [&](const LoadModel& m) { return m.id == model_id; });
  return it == load_models.end() ? nullptr : &*it;
}

void VehicleLibrary::merge(const VehicleLibrary& other) {
  for (const AxleTrain& train : other.trains) {
    auto it = std::find_if(trains.begin(), trains.end(), [&](const AxleTrain& t) { return t.id == train.id; });
    if (it != trains.end())
      *it = train;
    else
      trains.push_back(train);
  }
  for (const LoadModel& model : other.load_models) {
    auto it =
        std::find_if(load_models.begin(), load_models.end(), [&](const LoadModel& m) { return m.id == model.id; });
    if (it != load_models.end())
      *it = model;
    else
      load_models.push_back(model);
  }
}

}  // namespace tenthpoint::model
