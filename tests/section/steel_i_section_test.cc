#include "engine/section/steel_i_section.h"

#include <catch2/catch.hpp>

#include "engine/core/units.h"
#include "tests/section/section_test_support.h"
#include "tests/support/approx.h"

namespace tenthpoint::section {
namespace {

using test::in;
using test::in2;
using test::in3;
using test::in4;
using test::ksi;
using test::plate;

// Hand computations below are in inches and compared after conversion; the
// only differences are round-off in the conversions and sums.
constexpr double kHand = 1e-9;
// Plates leave out the four web-to-flange fillets of a rolled shape, which add
// about 1-2 % to A and Ix of these deep W-shapes (37.87 in^2 of plates against
// 38.3 in^2 tabulated for W33x130); 3 % bounds that with margin and still
// catches a wrong plate or a missing flange.
constexpr double kRolledShape = 0.03;

detail::SectionContext context(const char* id = "S1") {
  return detail::SectionContext{id, SourceLocation{"t.yaml", 3, 5}};
}

// Textbook transformed-section table: rows of (A, y, Io), in consistent units.
struct Row {
  double area, y, own;
};
struct HandResult {
  double area, centroid, inertia;
};
HandResult hand(std::initializer_list<Row> rows) {
  double a = 0, ay = 0, ay2_io = 0;
  for (const Row& r : rows) {
    a += r.area;
    ay += r.area * r.y;
    ay2_io += r.own + r.area * r.y * r.y;
  }
  const double ybar = ay / a;
  // I about the neutral axis = sum(Io + A y^2) - A ybar^2 (textbook form).
  return {a, ybar, ay2_io - a * ybar * ybar};
}

TEST_CASE("W-shapes built from plates match the tabulated A, Ix and Sx within the fillet allowance", "[section]") {
  struct Shape {
    const char* name;
    double d, bf, tf, tw;  // in
    double area, ix, sx;   // in^2, in^4, in^3
  };
  // AISC Steel Construction Manual, Table 1-1 (from memory).
  const Shape shapes[] = {
      {"W33x130", 33.1, 11.5, 0.855, 0.580, 38.3, 6710, 406},
      {"W36x150", 35.9, 12.0, 0.940, 0.625, 44.3, 9040, 504},
      {"W24x76", 23.9, 8.99, 0.680, 0.440, 22.4, 2100, 176},
  };
  for (const Shape& s : shapes) {
    INFO(s.name);
    model::SteelIGirder g;
    g.top_flange = plate(s.bf, s.tf);
    g.bottom_flange = plate(s.bf, s.tf);
    g.web = plate(s.d - 2 * s.tf, s.tw);
    const StageProperties p = SteelISection(g, context()).noncomposite(ksi(29000));
    TP_CHECK_CLOSE(p.area, in2(s.area), kRolledShape, 0.0);
    TP_CHECK_CLOSE(p.inertia, in4(s.ix), kRolledShape, 0.0);
    TP_CHECK_CLOSE(*p.section_modulus_top, in3(s.sx), kRolledShape, 0.0);
    TP_CHECK_CLOSE(*p.section_modulus_bottom, in3(s.sx), kRolledShape, 0.0);
    // Plates are below the tabulated values, never above: the fillets only add.
    CHECK(p.area < in2(s.area));
    CHECK(p.inertia < in4(s.ix));
    TP_CHECK_CLOSE(*p.girder_top, in(s.d), kHand, 0.0);
  }
}

TEST_CASE("a doubly symmetric girder has its neutral axis at mid-depth", "[section]") {
  const SteelISection s(test::w33x130(), context());
  const StageProperties p = s.noncomposite(ksi(29000));
  // Symmetry (common practice check): NA at d/2 = 16.55 in, S_top = S_bottom.
  TP_CHECK_CLOSE(*p.neutral_axis, in(33.1 / 2), kHand, 0.0);
  TP_CHECK_CLOSE(*p.section_modulus_top, *p.section_modulus_bottom, kHand, 0.0);
  TP_CHECK_CLOSE(p.flexural_rigidity(), ksi(29000) * p.inertia, kHand, 0.0);
}

TEST_CASE("swapping the flanges mirrors the neutral axis and keeps the inertia", "[section]") {
  model::SteelIGirder g = test::plate_girder_54();
  model::SteelIGirder swapped = g;
  std::swap(swapped.top_flange, swapped.bottom_flange);
  const StageProperties a = SteelISection(g, context()).noncomposite(ksi(29000));
  const StageProperties b = SteelISection(swapped, context()).noncomposite(ksi(29000));
  // Mirror symmetry about mid-depth: ybar' = d - ybar, I' = I, S_top' = S_bottom.
  TP_CHECK_CLOSE(*b.neutral_axis, *a.girder_top - *a.neutral_axis, kHand, 0.0);
  TP_CHECK_CLOSE(b.inertia, a.inertia, kHand, 0.0);
  TP_CHECK_CLOSE(*b.section_modulus_top, *a.section_modulus_bottom, kHand, 0.0);
}

TEST_CASE("the noncomposite plate girder matches a hand transformed-section table", "[section]") {
  const StageProperties p = SteelISection(test::plate_girder_54(), context()).noncomposite(ksi(29000));
  // Hand computation (inches): bottom flange 16 x 1.25, web 54 x 0.4375, top 14 x 0.75.
  const HandResult h = hand(
      {{20.0, 0.625, 16 * 1.953125 / 12}, {23.625, 28.25, 0.4375 * 157464.0 / 12}, {10.5, 55.625, 14 * 0.421875 / 12}});
  TP_CHECK_CLOSE(p.area, in2(h.area), kHand, 0.0);
  TP_CHECK_CLOSE(*p.neutral_axis, in(h.centroid), kHand, 0.0);
  TP_CHECK_CLOSE(p.inertia, in4(h.inertia), kHand, 0.0);
  // The same table evaluated once by hand to five figures: A = 54.125 in^2,
  // ybar = 23.353 in, I = 27577 in^4.
  TP_CHECK_CLOSE(p.inertia, in4(27577.3), 1e-5, 0.0);
}

TEST_CASE("the composite plate girder with an 8 in slab matches hand tables at n and 3n", "[section]") {
  const SteelISection s(test::plate_girder_54(), context());
  const model::DeckSlab deck = test::slab_8in();  // 108 in wide, 2 in haunch
  const double e = ksi(29000);
  // Steel top at 56.0 in; the 2 in haunch is ignored in stiffness but raises
  // the slab: soffit 58.0 in, slab centroid 62.0 in, top 66.0 in.
  const Row bottom{20.0, 0.625, 16 * 1.953125 / 12};
  const Row web{23.625, 28.25, 0.4375 * 157464.0 / 12};
  const Row top{10.5, 55.625, 14 * 0.421875 / 12};

  SECTION("short-term, n = 8: slab 108/8 = 13.5 in wide") {
    const StageProperties p = s.composite(deck, 8.0, e);
    const HandResult h = hand({bottom, web, top, {13.5 * 8, 62.0, 13.5 * 512.0 / 12}});
    TP_CHECK_CLOSE(p.area, in2(h.area), kHand, 0.0);
    TP_CHECK_CLOSE(*p.neutral_axis, in(h.centroid), kHand, 0.0);
    TP_CHECK_CLOSE(p.inertia, in4(h.inertia), kHand, 0.0);
    TP_CHECK_CLOSE(*p.section_modulus_bottom, in3(h.inertia / h.centroid), kHand, 0.0);
    TP_CHECK_CLOSE(*p.section_modulus_top, in3(h.inertia / (56.0 - h.centroid)), kHand, 0.0);
    TP_CHECK_CLOSE(*p.section_modulus_deck, in3(h.inertia / (66.0 - h.centroid)), kHand, 0.0);
    TP_CHECK_CLOSE(*p.deck_top, in(66.0), kHand, 0.0);
    CHECK(*p.deck_ratio == 8.0);
    // Evaluated once by hand: A = 162.125 in^2, ybar = 49.098 in, I = 82006 in^4.
    TP_CHECK_CLOSE(p.inertia, in4(82006.1), 1e-5, 0.0);
  }
  SECTION("long-term, 3n = 24: slab 108/24 = 4.5 in wide") {
    const StageProperties p = s.composite(deck, 24.0, e);
    const HandResult h = hand({bottom, web, top, {4.5 * 8, 62.0, 4.5 * 512.0 / 12}});
    TP_CHECK_CLOSE(p.area, in2(h.area), kHand, 0.0);
    TP_CHECK_CLOSE(*p.neutral_axis, in(h.centroid), kHand, 0.0);
    TP_CHECK_CLOSE(p.inertia, in4(h.inertia), kHand, 0.0);
    TP_CHECK_CLOSE(*p.section_modulus_deck, in3(h.inertia / (66.0 - h.centroid)), kHand, 0.0);
    // Evaluated once by hand: A = 90.125 in^2, ybar = 38.790 in, I = 60061 in^4.
    TP_CHECK_CLOSE(p.inertia, in4(60061.1), 1e-5, 0.0);
  }
}

TEST_CASE("the cracked negative section is the steel plus the deck bars", "[section]") {
  // W33x130 with the EV-0112 deck: 7.5 in slab on a 1.5 in haunch, bars
  // 3.4 in^2 at 2.5 in and 2.6 in^2 at 5.5 in below the deck top (LRFD 6.10.1.1.1c).
  const SteelISection s(test::w33x130(), context());
  const model::DeckSlab deck{in(7.5), in(102.0), in(1.5), {{in2(3.4), in(2.5)}, {in2(2.6), in(5.5)}}};
  const auto p = s.cracked_negative(deck, 1.0, ksi(29000));
  REQUIRE(p.has_value());
  // Deck top at 33.1 + 1.5 + 7.5 = 42.1 in; bars at 39.6 and 36.6 in.
  const HandResult h = hand({{11.5 * 0.855, 0.4275, 11.5 * 0.855 * 0.855 * 0.855 / 12},
                             {31.39 * 0.58, 0.855 + 15.695, 0.58 * 31.39 * 31.39 * 31.39 / 12},
                             {11.5 * 0.855, 33.1 - 0.4275, 11.5 * 0.855 * 0.855 * 0.855 / 12},
                             {3.4, 39.6, 0},
                             {2.6, 36.6, 0}});
  TP_CHECK_CLOSE(p->area, in2(h.area), kHand, 0.0);
  TP_CHECK_CLOSE(*p->neutral_axis, in(h.centroid), kHand, 0.0);
  TP_CHECK_CLOSE(p->inertia, in4(h.inertia), kHand, 0.0);
  CHECK_FALSE(p->section_modulus_deck.has_value());
  // Stress in the top bar layer: M / S with S = I / (39.6 - ybar).
  TP_CHECK_CLOSE(*p->section_modulus_at(in(39.6)), in3(h.inertia / (39.6 - h.centroid)), kHand, 0.0);
}

TEST_CASE("a deck without bars has no cracked negative section", "[section]") {
  const SteelISection s(test::w33x130(), context());
  CHECK_FALSE(s.cracked_negative(test::slab_8in(), 1.0, ksi(29000)).has_value());
}

TEST_CASE("a bottom cover plate lowers the neutral axis and hangs below the flange", "[section]") {
  model::SteelIGirder g = test::w33x130();
  g.bottom_cover_plate = plate(10.0, 0.75);
  const StageProperties p = SteelISection(g, context()).noncomposite(ksi(29000));
  // Hand computation (inches), soffit at the cover plate's bottom face:
  // cover 7.5 at 0.375; flanges 9.8325 at 1.1775 and 33.4225; web 18.2062 at 16.445+0.75.
  const HandResult h = hand({{7.5, 0.375, 10 * 0.421875 / 12},
                             {11.5 * 0.855, 0.75 + 0.4275, 11.5 * 0.855 * 0.855 * 0.855 / 12},
                             {31.39 * 0.58, 0.75 + 0.855 + 15.695, 0.58 * 31.39 * 31.39 * 31.39 / 12},
                             {11.5 * 0.855, 0.75 + 33.1 - 0.4275, 11.5 * 0.855 * 0.855 * 0.855 / 12}});
  TP_CHECK_CLOSE(*p.girder_top, in(33.85), kHand, 0.0);
  TP_CHECK_CLOSE(p.area, in2(h.area), kHand, 0.0);
  TP_CHECK_CLOSE(*p.neutral_axis, in(h.centroid), kHand, 0.0);
  TP_CHECK_CLOSE(p.inertia, in4(h.inertia), kHand, 0.0);
}

TEST_CASE("the same girder described in US and in SI units has the same properties", "[section]") {
  // SI literals are the inch values times 25.4 mm (exact).
  auto mm = [](double x) { return units::to_internal(x, units::Quantity::section_length, units::UnitSystem::si); };
  auto inches = [](double x) { return units::to_internal(x, units::Quantity::section_length, units::UnitSystem::us); };
  model::SteelIGirder us;
  us.top_flange = {inches(14.0), inches(0.75)};
  us.web = {inches(54.0), inches(0.4375)};
  us.bottom_flange = {inches(16.0), inches(1.25)};
  model::SteelIGirder si;
  si.top_flange = {mm(355.6), mm(19.05)};
  si.web = {mm(1371.6), mm(11.1125)};
  si.bottom_flange = {mm(406.4), mm(31.75)};
  const model::DeckSlab deck_us{inches(8.0), inches(108.0), inches(2.0), {}};
  const model::DeckSlab deck_si{mm(203.2), mm(2743.2), mm(50.8), {}};
  // E = 29000 ksi = 199948 MPa to 6 figures (29000 x 6.894757 MPa/ksi).
  const double e_us = units::to_internal(29000, units::Quantity::stress, units::UnitSystem::us);
  const double e_si = units::to_internal(199948.0, units::Quantity::stress, units::UnitSystem::si);
  const StageProperties a = SteelISection(us, context()).composite(deck_us, 8.0, e_us);
  const StageProperties b = SteelISection(si, context()).composite(deck_si, 8.0, e_si);
  // Lengths agree to round-off (25.4 mm per inch is exact).
  TP_CHECK_CLOSE(b.area, a.area, 1e-12, 0.0);
  TP_CHECK_CLOSE(b.inertia, a.inertia, 1e-12, 0.0);
  TP_CHECK_CLOSE(*b.neutral_axis, *a.neutral_axis, 1e-12, 0.0);
  TP_CHECK_CLOSE(*b.section_modulus_deck, *a.section_modulus_deck, 1e-12, 0.0);
  // The SI modulus was typed to 6 figures.
  TP_CHECK_CLOSE(b.flexural_rigidity(), a.flexural_rigidity(), 1e-6, 0.0);
}

TEST_CASE("a plate of zero thickness is an input error naming the field", "[section]") {
  model::SteelIGirder g = test::w33x130();
  g.web.thickness = 0;
  const Diagnostic d = test::first_error([&] { (void)SteelISection(g, context("G1")); });
  CHECK(d.field == "sections[G1].steel_i.web.thickness");
  CHECK(d.message == "must be positive (got 0)");
  CHECK(d.where.line == 3);
}

TEST_CASE("a deck bar outside the slab is an input error", "[section]") {
  const SteelISection s(test::w33x130(), context("G1"));
  const model::DeckSlab deck{in(7.5), in(102.0), in(1.5), {{in2(3.4), in(8.0)}}};
  const Diagnostic d = test::first_error([&] { (void)s.cracked_negative(deck, 1.0, ksi(29000)); });
  CHECK(d.field == "sections[G1].deck.bars[0].depth");
  CHECK(d.message.rfind("must lie within the slab thickness", 0) == 0);
}

}  // namespace
}  // namespace tenthpoint::section
