// PreparedInfluenceLines: every influence line of one girder line as an
// EffectCurve, with what the load cases ask about each effect: the span it
// belongs to (for span conditions), its AASHTO effect class (positive or
// negative moment, shear, end or interior reaction) and whether it lies
// between the points of contraflexure of a uniform load.
//
// Built once per girder line and shared by every load model. Away from the
// supports shear_left and shear_right are the same function (see
// analysis/influence_lines.h), so they share one curve.
//
// Failure: ModelError (naming the bridge) when the influence lines are empty
// or do not all share the mesh knots.
#pragma once

#include <cstddef>
#include <memory>
#include <string>
#include <vector>

#include "engine/analysis/analysis_point.h"
#include "engine/analysis/influence_lines.h"
#include "engine/core/numeric.h"
#include "engine/live_load/effect_curve.h"
#include "engine/live_load/effect_table.h"
#include "engine/live_load/uniform_load_contraflexure.h"
#include "engine/model/vehicle.h"

namespace tenthpoint::live_load {

class PreparedInfluenceLines {
 public:
  explicit PreparedInfluenceLines(const analysis::InfluenceLines& lines);

  [[nodiscard]] const std::string& bridge_id() const { return bridge_id_; }
  [[nodiscard]] Real length() const { return length_; }
  [[nodiscard]] const std::vector<Real>& knots() const { return knots_; }
  [[nodiscard]] const std::vector<analysis::AnalysisPoint>& points() const { return points_; }
  [[nodiscard]] std::size_t point_count() const { return points_.size(); }
  // Restrained supports, in the order of InfluenceLines::supports.
  [[nodiscard]] std::size_t support_count() const { return support_lines_.size(); }
  [[nodiscard]] std::size_t support_line(std::size_t support) const { return support_lines_[support]; }
  [[nodiscard]] Real support_station(std::size_t support) const { return support_stations_[support]; }
  // Stations of every support line (restrained or free), ascending; the
  // spans lie between consecutive ones.
  [[nodiscard]] const std::vector<Real>& span_boundaries() const { return span_boundaries_; }
  [[nodiscard]] std::size_t span_count() const { return span_boundaries_.size() - 1; }
  [[nodiscard]] Real span_length(std::size_t span) const { return span_boundaries_[span + 1] - span_boundaries_[span]; }

  [[nodiscard]] const EffectCurve& curve(EffectKind kind, std::size_t index) const {
    return curves_[curve_index(kind, index)];
  }
  // Index of the distinct curve behind an effect; equal indices mean equal
  // functions (and so equal envelopes).
  [[nodiscard]] std::size_t curve_index(EffectKind kind, std::size_t index) const;
  [[nodiscard]] std::size_t distinct_curve_count() const { return curves_.size(); }
  [[nodiscard]] const EffectCurve& distinct_curve(std::size_t i) const { return curves_[i]; }

  // The AASHTO class of an effect and extreme: moment maximum is positive
  // moment and minimum negative moment; both shears are shear; a reaction at
  // the first or last support line is an end reaction, elsewhere interior.
  [[nodiscard]] model::LoadEffect load_effect(const EffectKey& key) const;
  // The span length a SpanCondition is tested against (model/vehicle.h): the
  // span holding the point; at a support (and for a reaction) the longer of
  // the adjacent spans, m.
  [[nodiscard]] Real condition_span_length(EffectKind kind, std::size_t index) const;
  // Spans adjacent to a support line (one at a girder end, two inside).
  [[nodiscard]] std::vector<std::size_t> spans_at_support_line(std::size_t support_line) const;
  // Span holding an analysis point (AnalysisPoint::span).
  [[nodiscard]] std::size_t point_span(std::size_t point) const { return points_[point].span; }

  [[nodiscard]] const UniformLoadContraflexure& contraflexure() const { return contraflexure_; }

 private:
  std::string bridge_id_;
  Real length_ = 0;
  std::vector<Real> knots_;
  std::vector<analysis::AnalysisPoint> points_;
  std::vector<std::size_t> support_lines_;
  std::vector<Real> support_stations_;
  std::size_t support_line_count_ = 0;
  std::vector<Real> span_boundaries_;
  std::vector<EffectCurve> curves_;
  std::vector<std::size_t> moment_;       // per point, into curves_
  std::vector<std::size_t> shear_left_;   // per point
  std::vector<std::size_t> shear_right_;  // per point
  std::vector<std::size_t> reaction_;     // per support
  UniformLoadContraflexure contraflexure_;
};

}  // namespace tenthpoint::live_load
