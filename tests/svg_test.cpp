// Tests of the SVG drawings (fourplat/svg.hpp). The drawing is read back as XML by a strict
// checker written here (and by libxml2's xmllint when it is installed) and its geometry is checked
// against the diagram and against outside facts: Fox's rule read off the picture alone, the
// crossing [1]'s over-strand direction, crossing numbers from a published knot table.
#include "fourplat/svg.hpp"

#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <map>
#include <set>
#include <sstream>
#include <string>
#include <vector>

#include <unistd.h>

#include "fourplat/coloring.hpp"
#include "fourplat/diagram.hpp"
#include "fourplat/error.hpp"
#include "testing.hpp"

namespace fourplat {
namespace {

// ---- A strict little XML reader: well-formedness, and the elements for the checks below. ----
struct Element {
  std::string name;
  std::map<std::string, std::string> attrs;
  std::string text;
  int parent = -1;
};

/// Parses the document or fails the test with the offending position. Accepts exactly: an XML
/// declaration, one root element, properly nested and closed elements, quoted attributes without
/// duplicates, the five predefined entities and numeric character references.
std::vector<Element> parse_xml(const std::string& s, std::string& error) {
  std::vector<Element> out;
  std::vector<int> open;
  std::size_t i = 0;
  bool root_seen = false;
  auto fail = [&](const std::string& what) {
    error = "at byte " + std::to_string(i) + ": " + what;
    return std::vector<Element>{};
  };
  auto is_name_start = [](char c) { return std::isalpha(static_cast<unsigned char>(c)) || c == '_' || c == ':'; };
  auto is_name = [&](char c) {
    return is_name_start(c) || std::isdigit(static_cast<unsigned char>(c)) || c == '-' || c == '.';
  };
  auto check_entities = [&](const std::string& t) {
    for (std::size_t k = 0; k < t.size(); ++k) {
      if (t[k] == '<') return false;
      if (t[k] != '&') continue;
      const std::size_t semi = t.find(';', k);
      if (semi == std::string::npos) return false;
      const std::string ent = t.substr(k + 1, semi - k - 1);
      static const std::set<std::string> known{"amp", "lt", "gt", "quot", "apos"};
      if (!known.count(ent) && !(ent.size() > 1 && ent[0] == '#')) return false;
      k = semi;
    }
    return true;
  };
  if (s.rfind("<?xml version=\"1.0\"", 0) != 0) return fail("no XML declaration");
  i = s.find("?>");
  if (i == std::string::npos) return fail("unterminated declaration");
  i += 2;
  while (i < s.size()) {
    if (s[i] != '<') {
      const std::size_t lt = s.find('<', i);
      const std::string t = s.substr(i, lt == std::string::npos ? std::string::npos : lt - i);
      if (open.empty()) {
        if (t.find_first_not_of(" \n\r\t") != std::string::npos) return fail("text outside the root");
      } else {
        if (!check_entities(t)) return fail("bad character data");
        out[static_cast<std::size_t>(open.back())].text += t;
      }
      if (lt == std::string::npos) break;
      i = lt;
      continue;
    }
    if (s.compare(i, 2, "</") == 0) {
      std::size_t k = i + 2;
      while (k < s.size() && is_name(s[k])) ++k;
      const std::string name = s.substr(i + 2, k - i - 2);
      if (k >= s.size() || s[k] != '>') return fail("bad end tag");
      if (open.empty() || out[static_cast<std::size_t>(open.back())].name != name) return fail("mismatched </" + name + ">");
      open.pop_back();
      i = k + 1;
      continue;
    }
    // start tag
    if (open.empty() && root_seen) return fail("a second root element");
    std::size_t k = i + 1;
    if (k >= s.size() || !is_name_start(s[k])) return fail("bad tag name");
    while (k < s.size() && is_name(s[k])) ++k;
    Element e;
    e.name = s.substr(i + 1, k - i - 1);
    e.parent = open.empty() ? -1 : open.back();
    for (;;) {
      const std::size_t ws = k;
      while (k < s.size() && std::isspace(static_cast<unsigned char>(s[k]))) ++k;
      if (k >= s.size()) return fail("unterminated tag");
      if (s[k] == '>' || s.compare(k, 2, "/>") == 0) break;
      if (k == ws) return fail("attributes must be separated by spaces");
      const std::size_t a0 = k;
      if (!is_name_start(s[k])) return fail("bad attribute name");
      while (k < s.size() && is_name(s[k])) ++k;
      const std::string an = s.substr(a0, k - a0);
      if (k + 1 >= s.size() || s[k] != '=' || s[k + 1] != '"') return fail("attribute " + an + " not quoted");
      const std::size_t v0 = k + 2, v1 = s.find('"', v0);
      if (v1 == std::string::npos) return fail("unterminated attribute value");
      const std::string val = s.substr(v0, v1 - v0);
      if (!check_entities(val)) return fail("bad attribute value for " + an);
      if (!e.attrs.emplace(an, val).second) return fail("duplicate attribute " + an);
      k = v1 + 1;
    }
    const bool empty = s[k] == '/';
    out.push_back(std::move(e));
    root_seen = true;
    if (!empty) open.push_back(static_cast<int>(out.size()) - 1);
    i = k + (empty ? 2 : 1);
  }
  if (!open.empty()) return fail("unclosed <" + out[static_cast<std::size_t>(open.back())].name + ">");
  if (!root_seen) return fail("no root element");
  return out;
}

std::vector<Element> parse_ok(const std::string& svg_text) {
  std::string error;
  auto doc = parse_xml(svg_text, error);
  EXPECT_TRUE(error.empty()) << error;
  return doc;
}

bool has_class(const Element& e, const std::string& c) {
  const auto it = e.attrs.find("class");
  return it != e.attrs.end() && it->second == c;
}

std::vector<const Element*> by_class(const std::vector<Element>& doc, const std::string& c) {
  std::vector<const Element*> r;
  for (const Element& e : doc)
    if (has_class(e, c)) r.push_back(&e);
  return r;
}

// Path data as written by svg(): M, L, C with absolute coordinates, optional Z.
struct PathInfo {
  std::vector<std::pair<double, double>> points;  // every coordinate pair, in order
  bool closed = false;
};
PathInfo parse_path(const std::string& d) {
  PathInfo p;
  std::string t;
  for (char c : d) {
    if (c == 'M' || c == 'L' || c == 'C') t += ' ';
    else if (c == 'Z') p.closed = true;
    else t += c;
  }
  std::istringstream in(t);
  double x, y;
  while (in >> x >> y) p.points.emplace_back(x, y);
  return p;
}

Diagram twists(std::vector<long> t, DiagramClosure c) {
  TwistSequence s;
  for (long v : t) s.twists.emplace_back(v);
  return Diagram::of_twists(s, c);
}

/// The centre of every crossing's gap element (the gap path is symmetric about the centre).
std::vector<std::pair<double, double>> gap_centres(const std::vector<Element>& doc) {
  std::vector<std::pair<double, double>> r;
  for (const Element* g : by_class(doc, "gap")) {
    const PathInfo p = parse_path(g->attrs.at("d"));
    r.emplace_back((p.points.front().first + p.points.back().first) / 2,
                   (p.points.front().second + p.points.back().second) / 2);
  }
  return r;
}

double stroke_width(const std::vector<Element>& doc) {
  return std::stod(by_class(doc, "arc").front()->attrs.at("stroke-width"));
}

/// For every crossing, the arcs with an end within reach of its centre (the under-arcs): the
/// drawing's own evidence that the under-strand is cut there.
std::vector<std::vector<std::size_t>> arc_ends_at_crossings(const std::vector<Element>& doc) {
  const auto arcs = by_class(doc, "arc");
  const auto centres = gap_centres(doc);
  // A crossing is one unit wide and the strand is 1/10 of a unit: the gap reaches ~2.5 widths.
  const double reach = 3.2 * stroke_width(doc);
  std::vector<std::vector<std::size_t>> r(centres.size());
  for (std::size_t a = 0; a < arcs.size(); ++a) {
    const PathInfo p = parse_path(arcs[a]->attrs.at("d"));
    if (p.closed) continue;
    for (const auto& q : {p.points.front(), p.points.back()})
      for (std::size_t c = 0; c < centres.size(); ++c) {
        const double dist = std::hypot(q.first - centres[c].first, q.second - centres[c].second);
        if (dist >= reach) continue;
        // cut back from the over-strand: the gap is visible
        EXPECT_GT(dist, 1.5 * stroke_width(doc)) << "arc " << a << " at crossing " << c + 1;
        r[c].push_back(a);
      }
  }
  return r;
}

// ---- Well-formed XML ----

TEST(Svg, WellFormedForEveryClosureAndOption) {
  for (DiagramClosure c : {DiagramClosure::numerator, DiagramClosure::denominator, DiagramClosure::none}) {
    for (int mask = 0; mask < 8; ++mask) {
      SvgOptions o;
      o.arrows = mask & 1;
      o.crossing_numbers = mask & 2;
      o.end_names = mask & 4;
      o.title = "a <title> & \"quotes\"";  // must be escaped
      const std::string s = svg(twists({2, 1, 2}, c), o);
      std::string error;
      parse_xml(s, error);
      EXPECT_TRUE(error.empty()) << error << "\n" << s;
      EXPECT_EQ(s.back(), '\n');
    }
  }
}

TEST(Svg, XmllintAcceptsTheDrawings) {
  if (std::system("command -v xmllint >/dev/null 2>&1") != 0) GTEST_SKIP() << "xmllint not installed";
  const auto dir = std::filesystem::temp_directory_path();
  int k = 0;
  for (const auto& [t, n] : std::vector<std::pair<std::vector<long>, long>>{{{3}, 3}, {{2, 2}, 5}, {{3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 1}, 11}}) {
    const Diagram d = twists(t, DiagramClosure::numerator);
    SvgOptions o;
    o.arrows = o.crossing_numbers = true;
    o.coloring = *coloring_witness(d, Integer(n));
    o.modulus = n;
    const auto file = dir / ("fourplat_svg_test_" + std::to_string(::getpid()) + "_" + std::to_string(k++) + ".svg");
    std::ofstream(file) << svg(d, o);
    const std::string cmd = "xmllint --noout '" + file.string() + "'";
    EXPECT_EQ(std::system(cmd.c_str()), 0) << cmd;
    std::filesystem::remove(file);
  }
}

// A checker that accepts everything is worthless: it must reject broken documents.
TEST(Svg, XmlCheckerRejectsBrokenDocuments) {
  const std::string head = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n";
  for (const std::string& bad : {head + "<svg><g></svg>", head + "<svg a=\"1\" a=\"2\"/>", head + "<svg a=1/>",
                                head + "<svg>&nope;</svg>", head + "<svg/><svg/>", head + "<svg>a < b</svg>",
                                std::string("<svg/>"), head + "<svg x=\"1\"y=\"2\"/>"}) {
    std::string error;
    parse_xml(bad, error);
    EXPECT_FALSE(error.empty()) << bad;
  }
  std::string error;
  parse_xml(head + "<svg a=\"&amp;&#38;\"><g>t &lt; u</g><p/></svg>\n", error);
  EXPECT_TRUE(error.empty()) << error;
}

// ---- Crossings, arcs, gaps ----

TEST(Svg, OneGapPerCrossingAndTwoArcEndsAtEach) {
  auto& g = testing::rng();
  const int runs = testing::iterations(150);
  for (int r = 0; r < runs; ++r) {
    std::vector<long> t;
    const int len = std::uniform_int_distribution<int>(1, 6)(g);
    for (int i = 0; i < len; ++i) t.push_back(std::uniform_int_distribution<long>(-4, 4)(g));
    const auto c = static_cast<DiagramClosure>(std::uniform_int_distribution<int>(0, 2)(g));
    // Every third case a sum of two or three such sequences.
    std::vector<TwistSequence> parts(r % 3 == 0 ? 2 + r % 2 : 1);
    std::ostringstream what;
    for (std::size_t p = 0; p < parts.size(); ++p) {
      if (p > 0) {
        t.assign(static_cast<std::size_t>(std::uniform_int_distribution<int>(1, 4)(g)), 0);
        for (long& v : t) v = std::uniform_int_distribution<long>(-3, 3)(g);
        what << "+ ";
      }
      for (long v : t) {
        parts[p].twists.emplace_back(v);
        what << v << ' ';
      }
    }
    what << "closure " << to_string(c);
    const Diagram d = Diagram::of_sum(parts, c);
    SvgOptions o;
    o.crossing_numbers = r % 2 == 1;  // labels move the closure arcs outwards
    o.arrows = r % 4 == 1;
    std::string s;
    ASSERT_NO_THROW(s = svg(d, o)) << what.str();
    const auto doc = parse_ok(s);
    EXPECT_EQ(static_cast<std::int64_t>(by_class(doc, "gap").size()), d.crossing_count()) << what.str();
    EXPECT_EQ(by_class(doc, "arc").size(), d.arcs().size()) << what.str();
    if (c != DiagramClosure::none) {  // closed: every arc end sits at a crossing, two at each
      for (const auto& ends : arc_ends_at_crossings(doc)) EXPECT_EQ(ends.size(), 2u) << what.str();
    }
  }
}

TEST(Svg, CrossingCountOfKnotTableEntries) {
  // Rolfsen, "Knots and Links" (1976), Appendix C (from memory): 3_1 = b(3,1), 4_1 = b(5,2),
  // 5_2 = b(7,3), 6_1 = b(9,2), 7_4 = b(15,4), with 3, 4, 5, 6 and 7 crossings. The canonical
  // diagram is reduced alternating, so it shows exactly that many crossings (Kauffman, Murasugi,
  // Thistlethwaite 1987).
  for (const auto& [p, q, n] : std::vector<std::tuple<int, int, int>>{{3, 1, 3}, {5, 2, 4}, {7, 3, 5}, {9, 2, 6}, {15, 4, 7}}) {
    const auto doc = parse_ok(svg(Diagram::of_fraction(Fraction(Integer(p), Integer(q)))));
    EXPECT_EQ(static_cast<int>(by_class(doc, "gap").size()), n) << p << "/" << q;
  }
}

TEST(Svg, OverStrandOfAPositiveTwistRunsNorthWestToSouthEast) {
  // The crossing [1] has its over-strand NW→SE (docs/conventions.md); [−1] is its mirror. In SVG
  // coordinates (y down) NW→SE means Δx·Δy > 0 along the over-strand piece.
  for (long sign : {1L, -1L}) {
    for (const auto& t : std::vector<std::vector<long>>{{3}, {2, 3}, {1, 1, 1}}) {
      std::vector<long> u;
      for (long v : t) u.push_back(sign * v);
      const auto doc = parse_ok(svg(twists(u, DiagramClosure::none)));
      for (const Element& e : doc) {
        if (e.name != "path" || e.parent < 0 || !has_class(doc[static_cast<std::size_t>(e.parent)], "crossing") ||
            has_class(e, "gap"))
          continue;
        const PathInfo p = parse_path(e.attrs.at("d"));
        const double dx = p.points.back().first - p.points.front().first;
        const double dy = p.points.back().second - p.points.front().second;
        EXPECT_GT(static_cast<double>(sign) * dx * dy, 0) << "sign " << sign;
      }
    }
  }
}

TEST(Svg, CrossinglessDiagrams) {
  // [0] and [∞] = [0 0]: N([0]) and D([∞]) are two-component unlinks (two closed loops), D([0])
  // and N([∞]) the unknot (one loop); open, two strands.
  const std::vector<std::tuple<std::vector<long>, DiagramClosure, std::size_t, bool>> cases{
      {{0}, DiagramClosure::numerator, 2, true},   {{0}, DiagramClosure::denominator, 1, true},
      {{0, 0}, DiagramClosure::numerator, 1, true}, {{0, 0}, DiagramClosure::denominator, 2, true},
      {{0}, DiagramClosure::none, 2, false},       {{0, 0}, DiagramClosure::none, 2, false}};
  for (const auto& [t, c, loops, closed] : cases) {
    SvgOptions o;
    o.arrows = true;
    const auto doc = parse_ok(svg(twists(t, c), o));
    const auto arcs = by_class(doc, "arc");
    ASSERT_EQ(arcs.size(), loops) << to_string(c);
    for (const Element* a : arcs) EXPECT_EQ(parse_path(a->attrs.at("d")).closed, closed);
    EXPECT_TRUE(by_class(doc, "gap").empty());
    EXPECT_FALSE(by_class(doc, "arrows").empty());
  }
}

TEST(Svg, SumsSideBySide) {
  std::vector<TwistSequence> parts(2);
  parts[0].twists = {Integer(3)};
  parts[1].twists = {Integer(2), Integer(1)};
  for (DiagramClosure c : {DiagramClosure::numerator, DiagramClosure::denominator, DiagramClosure::none}) {
    const Diagram d = Diagram::of_sum(parts, c);
    const auto doc = parse_ok(svg(d));
    EXPECT_EQ(by_class(doc, "gap").size(), 6u);
    EXPECT_EQ(by_class(doc, "arc").size(), d.arcs().size());
    // The second summand's crossings lie to the right of the first one's.
    const auto g = gap_centres(doc);
    double right0 = -1e9, left1 = 1e9;
    for (std::size_t i = 0; i < 3; ++i) right0 = std::max(right0, g[i].first);
    for (std::size_t i = 3; i < 6; ++i) left1 = std::min(left1, g[i].first);
    EXPECT_LT(right0, left1);
  }
  // [∞] + [∞] closes up a loop that passes no end of the sum.
  std::vector<TwistSequence> inf(2);
  inf[0].twists = inf[1].twists = {Integer(0), Integer(0)};
  EXPECT_NO_THROW(parse_ok(svg(Diagram::of_sum(inf, DiagramClosure::numerator))));
}

// ---- The coloring overlay ----

TEST(Svg, OverlayShowsExactlyTheWitnessAndObeysFoxRule) {
  // Fox's rule (2·over ≡ under + under mod n) checked on the picture alone: the under-arcs at a
  // crossing are the arcs whose ends lie at its gap, their colours are read from the drawing, the
  // over colour from the stroke of the crossing's over-strand.
  struct Case {
    std::vector<long> t;
    long n;
  };
  for (const Case& k : std::vector<Case>{{{3}, 3},  // the trefoil b(3,1): 3-colorable
                                         {{2, 1, 2}, 4},     // b(8,3), det 8: a 4-coloring
                                         {{2, 2}, 5},        // figure-eight b(5,2): 5-colorable
                                         {{3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 1}, 3},
                                         {{3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 1}, 11}}) {
    const Diagram d = twists(k.t, DiagramClosure::numerator);
    const auto w = coloring_witness(d, Integer(k.n));
    if (!w) continue;
    SvgOptions o;
    o.coloring = *w;
    o.modulus = k.n;
    const auto doc = parse_ok(svg(d, o));
    const auto arcs = by_class(doc, "arc");
    ASSERT_EQ(arcs.size(), w->size());
    std::multiset<std::string> drawn, want;
    std::set<std::string> strokes, want_strokes;
    for (const Element* a : arcs) {
      drawn.insert(a->attrs.at("data-color"));
      strokes.insert(a->attrs.at("stroke"));
      // aligned with Diagram::arcs(): data-arc names the arc, data-color its colour
      EXPECT_EQ(a->attrs.at("data-color"), to_string((*w)[std::stoul(a->attrs.at("data-arc"))]));
    }
    for (const Integer& c : *w) {
      want.insert(to_string(c));
      want_strokes.insert(svg_swatch(c.convert_to<std::int64_t>()).stroke);
    }
    EXPECT_EQ(drawn, want);
    EXPECT_EQ(strokes, want_strokes);
    // Badges carry the same numbers.
    std::multiset<std::string> badges;
    for (const Element& e : doc)
      if (e.name == "text" && e.parent >= 0 && has_class(doc[static_cast<std::size_t>(e.parent)], "badge")) badges.insert(e.text);
    EXPECT_EQ(badges, want);
    // Fox's rule from the picture.
    std::map<std::string, long> value_of_stroke;
    for (long c = 0; c < k.n; ++c) value_of_stroke[svg_swatch(c).stroke] = c;  // n ≤ 8: one hue each
    const auto ends = arc_ends_at_crossings(doc);
    std::size_t c = 0;
    for (const Element& e : doc) {
      if (!has_class(e, "crossing")) continue;
      ASSERT_EQ(ends[c].size(), 2u);
      const long u1 = std::stol(arcs[ends[c][0]]->attrs.at("data-color"));
      const long u2 = std::stol(arcs[ends[c][1]]->attrs.at("data-color"));
      // the over-strand piece is the crossing group's second path
      const Element* over = nullptr;
      for (const Element& f : doc)
        if (f.parent == &e - doc.data() && !has_class(f, "gap")) over = &f;
      ASSERT_NE(over, nullptr);
      if (k.n <= 8) {
        const long ov = value_of_stroke.at(over->attrs.at("stroke"));
        EXPECT_EQ(((2 * ov - u1 - u2) % k.n + k.n) % k.n, 0) << "crossing " << c + 1;
      }
      ++c;
    }
  }
}

TEST(Svg, PaletteIsDistinctForTwelveClassesAndCycles) {
  // Okabe & Ito (2008): 8 hues; classes 8..15 repeat them dashed, 16..23 dotted.
  std::set<std::pair<std::string, int>> styles;
  for (std::int64_t k = 0; k < 24; ++k) {
    const SvgSwatch s = svg_swatch(k);
    styles.insert({s.stroke, s.dash});
    EXPECT_EQ(s.dash, static_cast<int>(k / 8));
  }
  EXPECT_EQ(styles.size(), 24u);
  EXPECT_STREQ(svg_swatch(0).stroke, "#0072B2");
  EXPECT_STREQ(svg_swatch(24).stroke, svg_swatch(0).stroke);
}

TEST(Svg, DashedClassesBeyondEight) {
  const Diagram d = twists({3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 1}, DiagramClosure::numerator);  // det 362769 = 3·11·...
  SvgOptions o;
  o.coloring = *coloring_witness(d, Integer(11));
  o.modulus = 11;
  const auto doc = parse_ok(svg(d, o));
  for (const Element* a : by_class(doc, "arc")) {
    const long c = std::stol(a->attrs.at("data-color"));
    EXPECT_EQ(a->attrs.count("stroke-dasharray") == 1, c >= 8) << c;
  }
}

// ---- Options ----

TEST(Svg, InconsistentOptionsAreDomainErrors) {
  const Diagram d = twists({3}, DiagramClosure::numerator);
  const std::vector<Integer> good{Integer(0), Integer(1), Integer(2)};
  auto with = [&](std::vector<Integer> c, long n) {
    SvgOptions o;
    o.coloring = std::move(c);
    o.modulus = n;
    return o;
  };
  EXPECT_NO_THROW((void)svg(d, with(*coloring_witness(d, Integer(3)), 3)));
  EXPECT_THROW((void)svg(d, with({Integer(0), Integer(1)}, 3)), DomainError);  // length ≠ arcs
  EXPECT_THROW((void)svg(d, with(*coloring_witness(d, Integer(3)), 0)), DomainError);  // no modulus
  EXPECT_THROW((void)svg(d, with({Integer(0), Integer(1), Integer(3)}, 3)), DomainError);  // out of range
  EXPECT_THROW((void)svg(d, with({Integer(0), Integer(-1), Integer(2)}, 3)), DomainError);
  EXPECT_THROW((void)svg(d, with({Integer(0), Integer(0), Integer(1)}, 3)), DomainError);  // not a coloring
  try {
    (void)svg(d, with({Integer(0), Integer(1)}, 3));
  } catch (const DomainError& e) {
    EXPECT_NE(std::string(e.what()).find("3 arcs"), std::string::npos) << e.what();
  }
  SvgOptions o;
  o.unit = 0;
  EXPECT_THROW((void)svg(d, o), DomainError);
  o.unit = NAN;
  EXPECT_THROW((void)svg(d, o), DomainError);
  TwistSequence big;
  big.twists = {Integer(max_svg_crossings + 1)};
  EXPECT_THROW((void)svg(Diagram::of_twists(big)), LimitError);
}

TEST(Svg, DeterministicBytes) {
  const Diagram d = twists({3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 1}, DiagramClosure::numerator);
  SvgOptions o;
  o.arrows = o.crossing_numbers = true;
  o.coloring = *coloring_witness(d, Integer(3));
  o.modulus = 3;
  const std::string a = svg(d, o);
  const std::string b = svg(twists({3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 1}, DiagramClosure::numerator), o);
  EXPECT_EQ(a, b);
  EXPECT_EQ(a, svg(d, o));
  // Fixed precision: no exponent, at most two decimals in any number.
  for (std::size_t i = 0; i + 3 < a.size(); ++i) {
    if (a[i] != '.' || !std::isdigit(static_cast<unsigned char>(a[i + 1]))) continue;
    std::size_t k = i + 1;
    while (k < a.size() && std::isdigit(static_cast<unsigned char>(a[k]))) ++k;
    EXPECT_LE(k - i - 1, 2u) << a.substr(i > 10 ? i - 10 : 0, 30);
  }
  EXPECT_EQ(a.find("e+"), std::string::npos);
  EXPECT_EQ(a.find("-0 "), std::string::npos);
}

TEST(Svg, FitsThePageAndStaysLegibleUpToSixtyCrossings) {
  // Worst case for space: the Fibonacci-like sequence [1 1 ... 1 2] (every box one crossing).
  for (int n : {1, 3, 10, 40, 60}) {
    std::vector<long> t(static_cast<std::size_t>(n > 1 ? n - 1 : 1), 1);
    if (n > 1) t.back() = 2;
    const auto doc = parse_ok(svg(twists(t, DiagramClosure::numerator)));
    const Element& root = doc.front();
    const double w = std::stod(root.attrs.at("width")), h = std::stod(root.attrs.at("height"));
    EXPECT_EQ(root.attrs.at("viewBox"), "0 0 " + root.attrs.at("width") + " " + root.attrs.at("height"));
    EXPECT_LE(w, 960);
    EXPECT_LE(h, 1280);
    // Crossings at least 12 px apart, and every one inside the page.
    const auto g = gap_centres(doc);
    ASSERT_EQ(static_cast<int>(g.size()), n);
    for (std::size_t i = 0; i < g.size(); ++i) {
      EXPECT_GT(g[i].first, 0);
      EXPECT_LT(g[i].first, w);
      EXPECT_GT(g[i].second, 0);
      EXPECT_LT(g[i].second, h);
      for (std::size_t j = i + 1; j < g.size(); ++j)
        EXPECT_GE(std::hypot(g[i].first - g[j].first, g[i].second - g[j].second), 12.0) << n;
    }
  }
  SvgOptions small;
  small.max_width = 200;
  small.max_height = 100;
  const auto doc = parse_ok(svg(twists({5, 4, 3}, DiagramClosure::numerator), small));
  EXPECT_LE(std::stod(doc.front().attrs.at("width")), 200);
  EXPECT_LE(std::stod(doc.front().attrs.at("height")), 100);
}

TEST(Svg, LabelsAndArrows) {
  SvgOptions o;
  o.arrows = o.crossing_numbers = o.end_names = true;
  const Diagram open = twists({3, 2, 1, 4}, DiagramClosure::none);
  const auto doc = parse_ok(svg(open, o));
  std::set<std::string> names, numbers;
  for (const Element& e : doc) {
    if (e.parent < 0 || e.name != "text") continue;
    if (has_class(doc[static_cast<std::size_t>(e.parent)], "end-names")) names.insert(e.text);
    if (has_class(doc[static_cast<std::size_t>(e.parent)], "crossing-numbers")) numbers.insert(e.text);
  }
  EXPECT_EQ(names, (std::set<std::string>{"NW", "NE", "SW", "SE"}));
  EXPECT_EQ(numbers.size(), 10u);
  EXPECT_TRUE(numbers.count("1") && numbers.count("10"));
  // One arrow per edge.
  std::size_t arrows = 0;
  for (const Element& e : doc)
    if (e.parent >= 0 && has_class(doc[static_cast<std::size_t>(e.parent)], "arrows")) ++arrows;
  EXPECT_EQ(arrows, open.edges().size());
  // End names only on the open tangle.
  const auto closed = parse_ok(svg(twists({3, 2, 1, 4}, DiagramClosure::numerator), o));
  EXPECT_TRUE(by_class(closed, "end-names").empty());
}

}  // namespace
}  // namespace fourplat
