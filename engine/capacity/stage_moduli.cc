#include "engine/capacity/stage_moduli.h"

namespace tenthpoint::capacity {
namespace {

FibreModuli fibres(const section::StageProperties& p) {
  return FibreModuli{p.section_modulus_top, p.section_modulus_bottom};
}

}  // namespace

StageModuli uncracked_stage_moduli(const section::SectionStages& stages) {
  StageModuli out;
  out.dc1 = fibres(stages.noncomposite);
  if (!stages.composite) {
    out.dc2_dw = out.dc1;
    out.live_load = out.dc1;
    out.basis = "noncomposite section for every stage (non-composite bridge)";
    return out;
  }
  out.dc2_dw = fibres(stages.at(model::SectionStage::long_term_composite));
  out.live_load = fibres(stages.at(model::SectionStage::short_term_composite));
  out.basis = "noncomposite (DC1) / long-term composite (DC2, DW) / short-term composite (LL), AASHTO LRFD 6.10.1.1.1";
  return out;
}

StageModuli cracked_stage_moduli(const section::SectionStages& stages) {
  if (!stages.composite) return uncracked_stage_moduli(stages);
  StageModuli out;
  out.dc1 = fibres(stages.noncomposite);
  if (stages.cracked_negative) {
    out.dc2_dw = fibres(*stages.cracked_negative);
    out.live_load = out.dc2_dw;
    out.basis = "noncomposite (DC1) / steel plus deck bars (DC2, DW, LL), AASHTO LRFD 6.10.1.1.1c";
  } else {
    out.dc2_dw = out.dc1;
    out.live_load = out.dc1;
    out.basis = "steel section alone for every stage: the deck has no longitudinal bars (AASHTO LRFD 6.10.1.1.1c)";
  }
  return out;
}

}  // namespace tenthpoint::capacity
