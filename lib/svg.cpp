// SVG drawings of the standard diagram (fourplat/svg.hpp); the style is described, with
// pictures, in docs/drawing.md.
//
// Three steps:
//   1. layout    — place every crossing of the Diagram's twist boxes on a staircase and route the
//                  strand pieces ("links") between crossing corners, summands, closure arcs and
//                  loose ends as axis-parallel runs with rounded corners;
//   2. trace     — follow the strands through the crossings and cut them at under-passages: the
//                  pieces are the Fox arcs, checked one by one against Diagram::arcs();
//   3. render    — write the arcs, the crossing gaps, arrows, labels and color badges.
// Geometry is in layout units (a crossing is a unit square, y downwards) and is scaled to pixels
// only when written.
#include "fourplat/svg.hpp"

#include <algorithm>
#include <array>
#include <charconv>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <limits>
#include <map>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

#include "fourplat/error.hpp"

namespace fourplat {
namespace {

// ---------------------------------------------------------------------------------------------
// Plane geometry.
struct Pt {
  double x = 0, y = 0;
};
Pt operator+(Pt a, Pt b) { return {a.x + b.x, a.y + b.y}; }
Pt operator-(Pt a, Pt b) { return {a.x - b.x, a.y - b.y}; }
Pt operator*(double k, Pt a) { return {k * a.x, k * a.y}; }
double norm(Pt a) { return std::hypot(a.x, a.y); }
Pt unit_vec(Pt a) {
  const double n = norm(a);
  return n > 0 ? Pt{a.x / n, a.y / n} : Pt{1, 0};
}
Pt lerp(Pt a, Pt b, double t) { return a + t * (b - a); }

const Pt kLeft{-1, 0}, kRight{1, 0}, kUp{0, -1}, kDown{0, 1};
constexpr double kEps = 1e-9;

/// One cubic Bézier piece; straight pieces keep `line` so that they are written as "L".
struct Seg {
  Pt p0, p1, p2, p3;
  bool line = false;
};
using Path = std::vector<Seg>;

Seg line_seg(Pt a, Pt b) { return {a, lerp(a, b, 1.0 / 3), lerp(a, b, 2.0 / 3), b, true}; }
Pt eval(const Seg& s, double t) {
  const double u = 1 - t;
  return u * u * u * s.p0 + 3 * u * u * t * s.p1 + 3 * u * t * t * s.p2 + t * t * t * s.p3;
}
Pt deriv(const Seg& s, double t) {
  const double u = 1 - t;
  return 3 * u * u * (s.p1 - s.p0) + 6 * u * t * (s.p2 - s.p1) + 3 * t * t * (s.p3 - s.p2);
}
/// The piece of s over [t0, t1] (de Casteljau's subdivision).
Seg sub(const Seg& s, double t0, double t1) {
  auto right_of = [](const Seg& c, double t) {
    const Pt a = lerp(c.p0, c.p1, t), b = lerp(c.p1, c.p2, t), d = lerp(c.p2, c.p3, t);
    const Pt e = lerp(a, b, t), f = lerp(b, d, t);
    return Seg{lerp(e, f, t), f, d, c.p3, c.line};
  };
  auto left_of = [](const Seg& c, double t) {
    const Pt a = lerp(c.p0, c.p1, t), b = lerp(c.p1, c.p2, t), d = lerp(c.p2, c.p3, t);
    const Pt e = lerp(a, b, t), f = lerp(b, d, t);
    return Seg{c.p0, a, e, lerp(e, f, t), c.line};
  };
  const Seg r = right_of(s, t0);
  return t1 >= 1 ? r : left_of(r, (t1 - t0) / (1 - t0));
}
Seg reversed(const Seg& s) { return {s.p3, s.p2, s.p1, s.p0, s.line}; }
Path reversed(const Path& p) {
  Path r(p.rbegin(), p.rend());
  for (Seg& s : r) s = reversed(s);
  return r;
}
double length(const Seg& s) {
  if (s.line) return norm(s.p3 - s.p0);
  double len = 0;
  Pt prev = s.p0;
  for (int i = 1; i <= 16; ++i) {
    const Pt q = eval(s, i / 16.0);
    len += norm(q - prev);
    prev = q;
  }
  return len;
}
double length(const Path& p) {
  double len = 0;
  for (const Seg& s : p) len += length(s);
  return len;
}
/// The point at the fraction f of the path's length, with the unit tangent there.
std::pair<Pt, Pt> point_at(const Path& p, double f) {
  double want = f * length(p);
  for (std::size_t i = 0; i < p.size(); ++i) {
    const double l = length(p[i]);
    if (want <= l || i + 1 == p.size()) {
      const double t = l > 0 ? std::clamp(want / l, 0.0, 1.0) : 0.5;
      return {eval(p[i], t), unit_vec(deriv(p[i], t))};
    }
    want -= l;
  }
  return {{0, 0}, {1, 0}};
}

/// A route leaving `a` along `da` and arriving at `b` against `db` (b's outward direction): runs
/// parallel to the axes, the inner ones on the lines `lanes` (alternately x = lane and y = lane,
/// starting perpendicular to da), corners rounded to quarter circles of radius ≤ rmax (a run
/// between two corners is shared half and half).
Path ortho(Pt a, Pt da, Pt b, Pt db, const std::vector<double>& lanes, double rmax) {
  const bool first_h = std::abs(da.x) > 0.5, last_h = std::abs(db.x) > 0.5;
  if (lanes.empty() && first_h == last_h) return {line_seg(a, b)};
  const std::size_t runs = lanes.size() + 2;
  const bool runs_last_h = (runs - 1) % 2 == 0 ? first_h : !first_h;
  if (runs_last_h != last_h) throw std::logic_error("svg: inconsistent route");
  std::vector<double> fixed{first_h ? a.y : a.x};
  fixed.insert(fixed.end(), lanes.begin(), lanes.end());
  fixed.push_back(last_h ? b.y : b.x);
  std::vector<Pt> pts{a};
  for (std::size_t i = 0; i + 1 < runs; ++i) {
    const bool h = i % 2 == 0 ? first_h : !first_h;
    pts.push_back(h ? Pt{fixed[i + 1], fixed[i]} : Pt{fixed[i], fixed[i + 1]});
  }
  pts.push_back(b);
  constexpr double k = 0.5522847498;  // cubic approximation of a quarter circle
  Path out;
  Pt cur = a;
  for (std::size_t j = 1; j + 1 < pts.size(); ++j) {
    const double lin = norm(pts[j] - pts[j - 1]), lout = norm(pts[j + 1] - pts[j]);
    const double r = std::min({rmax, j == 1 ? lin : lin / 2, j + 2 == pts.size() ? lout : lout / 2});
    const Pt din = unit_vec(pts[j] - pts[j - 1]), dout = unit_vec(pts[j + 1] - pts[j]);
    const Pt s = pts[j] - r * din, e = pts[j] + r * dout;
    if (norm(s - cur) > kEps) out.push_back(line_seg(cur, s));
    if (r > kEps) out.push_back({s, s + k * r * din, e - k * r * dout, e, false});
    cur = e;
  }
  if (norm(b - cur) > kEps || out.empty()) out.push_back(line_seg(cur, b));
  return out;
}

// ---------------------------------------------------------------------------------------------
// Layout.
constexpr double kCurl = 0.35;    // control-point offset of a crossing's strands, along the box
constexpr double kBend = 0.7;     // the corner turning a strand from one box into the next
constexpr double kLane = 0.35;    // a route passes this far outside the box it runs along
constexpr double kTurn = 0.35;    // half-width of the U-turn of a seed end into the second box
constexpr double kMargin = 0.8;   // closure arcs and loose ends run this far outside the drawing

int ci(Corner c) { return static_cast<int>(c); }
int opposite(int k) { return 3 - k; }  // NW↔SE, NE↔SW: the two strands of a crossing
Pt corner_offset(int k) { return {(k == 1 || k == 3) ? 0.5 : -0.5, k >= 2 ? 0.5 : -0.5}; }

enum class NodeKind { corner, end, junction };
/// Where a link ends: a crossing corner, one of the four ends, or a junction that is merged away.
struct Node {
  NodeKind kind = NodeKind::junction;
  std::int64_t id = 0;  // crossing (corner) or junction number
  int sub = 0;          // corner of the crossing, or which end
  friend bool operator==(const Node&, const Node&) = default;
};
Node corner_node(std::int64_t c, int k) { return {NodeKind::corner, c, k}; }
Node end_node(int e) { return {NodeKind::end, 0, e}; }

/// A strand piece between two nodes (no crossing inside).
struct Link {
  Node a, b;
  Path path;             // from a to b
  std::vector<int> via;  // tangle ends it runs through, in the order from a to b
  bool loop = false;     // a crossingless closed loop (a and b meaningless)
};

struct XGeom {
  Pt c;
  bool vertical = false;
  bool over_nw_se = true;
};

/// A loose end of the tangle being built: where it is, which way it points out, what it is.
struct PortG {
  Pt p;
  Pt dir;
  Node node;
};

struct Layout {
  std::vector<XGeom> xs;
  std::vector<Link> links;
  std::array<PortG, 4> ends{};
  std::array<Pt, 4> tip{}, tip_dir{};  // open tangle: where each loose end stops
  std::int64_t junctions = 0;
  double x0 = 0, y0 = 0, x1 = 0, y1 = 0;  // bounding box
};

/// The strand of crossing x from corner k to the opposite corner: one cubic whose tangents run
/// along the box (horizontal in a row, vertical in a column), so consecutive crossings and the
/// routes entering a box join smoothly.
Seg strand(const XGeom& x, int k) {
  const Pt a = x.c + corner_offset(k), b = x.c + corner_offset(opposite(k));
  const Pt d = b - a;
  const Pt along = x.vertical ? Pt{0, d.y} : Pt{d.x, 0};
  return {a, a + kCurl * along, b - kCurl * along, b, false};
}

struct Box2 {
  double x0 = std::numeric_limits<double>::infinity(), y0 = x0;
  double x1 = -std::numeric_limits<double>::infinity(), y1 = x1;
  void add(Pt p) {
    x0 = std::min(x0, p.x);
    y0 = std::min(y0, p.y);
    x1 = std::max(x1, p.x);
    y1 = std::max(y1, p.y);
  }
  void add(const Path& p) {
    for (const Seg& s : p) {
      add(s.p0);
      add(s.p3);
      if (!s.line) add(eval(s, 0.5));
    }
  }
};

void add_link(Layout& L, Node a, Node b, Path p) { L.links.push_back({a, b, std::move(p), {}, false}); }

/// Lays out one summand (Diagram::summands()[s]) from the origin; returns its four loose ends.
std::array<PortG, 4> layout_summand(const Diagram& d, const Summand& sm, Layout& L) {
  const auto& boxes = d.boxes();
  const bool first_empty = sm.boxes == 0 || boxes[sm.first_box].crossings == 0;
  const double w = first_empty ? 1.0 : 0.0;  // the seed's length: 0 unless a box is empty
  auto junction = [&L] { return Node{NodeKind::junction, L.junctions++, 0}; };
  const Node j0a = junction(), j0b = junction(), j1a = junction(), j1b = junction();
  PortG NW, NE, SW, SE;
  if (!sm.seed_infinity) {  // seed [0]: NW–NE, SW–SE
    NW = {{0, 0}, kLeft, j0a};
    NE = {{w, 0}, kRight, j0b};
    SW = {{0, 1}, kLeft, j1a};
    SE = {{w, 1}, kRight, j1b};
    add_link(L, j0a, j0b, {line_seg(NW.p, NE.p)});
    add_link(L, j1a, j1b, {line_seg(SW.p, SE.p)});
  } else {  // seed [∞]: NW–SW, NE–SE
    NW = {{0, 0}, kUp, j0a};
    SW = {{0, w}, kDown, j0b};
    NE = {{1, 0}, kUp, j1a};
    SE = {{1, w}, kDown, j1b};
    add_link(L, j0a, j0b, {line_seg(NW.p, SW.p)});
    add_link(L, j1a, j1b, {line_seg(NE.p, SE.p)});
  }
  for (std::size_t bi = sm.first_box; bi < sm.first_box + sm.boxes; ++bi) {
    const TwistBox& box = boxes[bi];
    const std::int64_t k = box.crossings;
    if (k == 0) continue;  // an empty box: the strands run on
    const std::int64_t c0 = box.first_crossing, cl = c0 + k - 1;
    const bool positive = box.twists > 0;
    if (box.kind == BoxKind::horizontal) {  // T + [a]: a row to the right, twisting NE and SE
      // The row's bottom-left corner: straight on from SE when SE already points right (the
      // previous box was a row), else one rounded bend down-and-right from a column's foot. The
      // NE end then runs right, down beside the column (kLane from the row) and into the row.
      Pt bl = SE.dir.x > 0.5 ? SE.p : SE.p + Pt{kBend, kBend};
      if (NE.dir.y < -0.5) bl.x = std::max(bl.x, NE.p.x + 3 * kTurn + 0.15);
      const Pt tl = bl - Pt{0, 1};
      add_link(L, SE.node, corner_node(c0, ci(Corner::sw)), ortho(SE.p, SE.dir, bl, kLeft, {}, 1.0));
      std::vector<double> lanes;
      if (NE.dir.y < -0.5) lanes = {NE.p.y - kTurn, NE.p.x + 2 * kTurn};  // U-turn over the seed
      else if (std::abs(NE.p.y - tl.y) > kEps) lanes = {tl.x - kLane};
      add_link(L, NE.node, corner_node(c0, ci(Corner::nw)), ortho(NE.p, NE.dir, tl, kLeft, lanes, 1.0));
      for (std::int64_t i = 0; i < k; ++i) {
        L.xs[static_cast<std::size_t>(c0 + i)] = {tl + Pt{static_cast<double>(i) + 0.5, 0.5}, false, positive};
        if (i == 0) continue;
        const Pt q = tl + Pt{static_cast<double>(i), 0}, r = q + Pt{0, 1};
        add_link(L, corner_node(c0 + i - 1, ci(Corner::ne)), corner_node(c0 + i, ci(Corner::nw)), {line_seg(q, q)});
        add_link(L, corner_node(c0 + i - 1, ci(Corner::se)), corner_node(c0 + i, ci(Corner::sw)), {line_seg(r, r)});
      }
      NE = {tl + Pt{static_cast<double>(k), 0}, kRight, corner_node(cl, ci(Corner::ne))};
      SE = {bl + Pt{static_cast<double>(k), 0}, kRight, corner_node(cl, ci(Corner::se))};
    } else {  // T * 1/[a]: a column below, twisting SW and SE
      // Mirror image of the row case across the diagonal: SE bends down into the column's top
      // right corner, SW runs down, right under the row (kLane above the column) and down again.
      Pt tr = SE.dir.y > 0.5 ? SE.p : SE.p + Pt{kBend, kBend};
      if (SW.dir.x < -0.5) tr.y = std::max(tr.y, SW.p.y + 3 * kTurn + 0.15);
      const Pt tl = tr - Pt{1, 0};
      add_link(L, SE.node, corner_node(c0, ci(Corner::ne)), ortho(SE.p, SE.dir, tr, kUp, {}, 1.0));
      std::vector<double> lanes;
      if (SW.dir.x < -0.5) lanes = {SW.p.x - kTurn, SW.p.y + 2 * kTurn};  // U-turn under the seed
      else if (std::abs(SW.p.x - tl.x) > kEps) lanes = {tl.y - kLane};
      add_link(L, SW.node, corner_node(c0, ci(Corner::nw)), ortho(SW.p, SW.dir, tl, kUp, lanes, 1.0));
      for (std::int64_t i = 0; i < k; ++i) {
        L.xs[static_cast<std::size_t>(c0 + i)] = {tl + Pt{0.5, static_cast<double>(i) + 0.5}, true, positive};
        if (i == 0) continue;
        const Pt q = tl + Pt{0, static_cast<double>(i)}, r = q + Pt{1, 0};
        add_link(L, corner_node(c0 + i - 1, ci(Corner::sw)), corner_node(c0 + i, ci(Corner::nw)), {line_seg(q, q)});
        add_link(L, corner_node(c0 + i - 1, ci(Corner::se)), corner_node(c0 + i, ci(Corner::ne)), {line_seg(r, r)});
      }
      SW = {tl + Pt{0, static_cast<double>(k)}, kDown, corner_node(cl, ci(Corner::sw))};
      SE = {tr + Pt{0, static_cast<double>(k)}, kDown, corner_node(cl, ci(Corner::se))};
    }
  }
  return {NW, NE, SW, SE};
}

void translate(Path& p, Pt d) {
  for (Seg& s : p) {
    s.p0 = s.p0 + d;
    s.p1 = s.p1 + d;
    s.p2 = s.p2 + d;
    s.p3 = s.p3 + d;
  }
}

Box2 bbox(const Layout& L, std::size_t link_from, std::size_t x_from, std::size_t x_to) {
  Box2 b;
  for (std::size_t i = link_from; i < L.links.size(); ++i) b.add(L.links[i].path);
  for (std::size_t i = x_from; i < x_to; ++i) {
    b.add(L.xs[i].c - Pt{0.5, 0.5});
    b.add(L.xs[i].c + Pt{0.5, 0.5});
  }
  return b;
}

/// Merges every junction away: the two links meeting there become one, or a closed loop.
/// Junctions are the ends of the seeds [0] and [∞]; a seed strand may be empty (length 0) or, when
/// the first box has no twists, a short straight piece — either way it disappears into the links
/// of the boxes, sums and closures that meet it.
void merge_junctions(Layout& L) {
  for (std::int64_t j = 0; j < L.junctions; ++j) {
    const Node J{NodeKind::junction, j, 0};
    std::vector<std::size_t> at;
    for (std::size_t i = 0; i < L.links.size(); ++i) {
      if (L.links[i].loop) continue;
      if (L.links[i].a == J) at.push_back(i);
      if (L.links[i].b == J) at.push_back(i);
    }
    if (at.size() != 2) throw std::logic_error("svg: a junction is not met by two link ends");
    if (at[0] == at[1]) {
      L.links[at[0]].loop = true;
      continue;
    }
    auto flip = [](Link& l) {
      std::swap(l.a, l.b);
      l.path = reversed(l.path);
      std::reverse(l.via.begin(), l.via.end());
    };
    Link first = L.links[at[0]], second = L.links[at[1]];
    if (first.a == J) flip(first);    // now ends at J
    if (second.b == J) flip(second);  // now starts at J
    Link m{first.a, second.b, std::move(first.path), std::move(first.via), false};
    m.path.insert(m.path.end(), second.path.begin(), second.path.end());
    m.via.insert(m.via.end(), second.via.begin(), second.via.end());
    const std::size_t lo = std::min(at[0], at[1]), hi = std::max(at[0], at[1]);
    L.links[lo] = std::move(m);
    L.links.erase(L.links.begin() + static_cast<std::ptrdiff_t>(hi));
  }
}

/// The room labels need (so closure arcs pass outside them).
void reserve_labels(const Layout& L, Box2& b) {
  for (const XGeom& x : L.xs) b.add(x.vertical ? x.c - Pt{1.1, 0} : x.c - Pt{0, 0.95});
}

Layout layout(const Diagram& d, bool labels) {
  Layout L;
  L.xs.resize(d.crossings().size());
  std::array<PortG, 4> ends{};
  double right = 0;
  for (std::size_t s = 0; s < d.summands().size(); ++s) {
    const Summand& sm = d.summands()[s];
    const std::size_t link0 = L.links.size();
    const auto xa = static_cast<std::size_t>(sm.first_crossing), xb = xa + static_cast<std::size_t>(sm.crossings);
    std::array<PortG, 4> p = layout_summand(d, sm, L);
    if (s == 0) {
      ends = p;
      right = bbox(L, 0, 0, xb).x1;
      continue;
    }
    // T_acc + T_s: the new summand stands 2 units to the right, tops aligned.
    const Box2 b = bbox(L, link0, xa, xb);
    const Pt shift{right + 2.0 - b.x0, 0.0};
    for (std::size_t i = link0; i < L.links.size(); ++i) translate(L.links[i].path, shift);
    for (std::size_t c = xa; c < xb; ++c) L.xs[c].c = L.xs[c].c + shift;
    for (PortG& q : p) q.p = q.p + shift;
    const double lane = right + 1.0;
    const Box2 all = bbox(L, 0, 0, xb);
    {  // T_acc's NE to T_s's NW: over the top when either points up
      const PortG &a = ends[ci(Corner::ne)], &z = p[ci(Corner::nw)];
      std::vector<double> lanes;
      if (a.dir.y < -0.5) lanes.push_back(all.y0 - kLane);
      lanes.push_back(lane);
      if (z.dir.y < -0.5) lanes.push_back(all.y0 - kLane);
      add_link(L, a.node, z.node, ortho(a.p, a.dir, z.p, z.dir, lanes, 0.5));
    }
    {  // T_acc's SE to T_s's SW: under the bottom when either points down
      const PortG &a = ends[ci(Corner::se)], &z = p[ci(Corner::sw)];
      std::vector<double> lanes;
      if (a.dir.y > 0.5) lanes.push_back(all.y1 + kLane);
      lanes.push_back(lane);
      if (z.dir.y > 0.5) lanes.push_back(all.y1 + kLane);
      add_link(L, a.node, z.node, ortho(a.p, a.dir, z.p, z.dir, lanes, 0.5));
    }
    ends[ci(Corner::ne)] = p[ci(Corner::ne)];
    ends[ci(Corner::se)] = p[ci(Corner::se)];
    right = bbox(L, 0, 0, xb).x1;
  }
  L.ends = ends;
  Box2 b = bbox(L, 0, 0, L.xs.size());
  if (labels) reserve_labels(L, b);
  const double m = kMargin;
  const PortG &nw = ends[0], &ne = ends[1], &sw = ends[2], &se = ends[3];
  auto horiz = [](const PortG& q) { return std::abs(q.dir.x) > 0.5; };
  auto close = [&](const PortG& a, const PortG& z, const std::vector<double>& lanes, int va, int vz) {
    L.links.push_back({a.node, z.node, ortho(a.p, a.dir, z.p, z.dir, lanes, m), {va, vz}, false});
  };
  switch (d.closure()) {
    case DiagramClosure::numerator: {  // NW–NE over the top, SW–SE under the bottom
      std::vector<double> top, bottom;
      if (horiz(nw)) top.push_back(b.x0 - m);
      top.push_back(b.y0 - m);
      if (horiz(ne)) top.push_back(b.x1 + m);
      close(nw, ne, top, 0, 1);
      if (horiz(sw)) bottom.push_back(b.x0 - m);
      bottom.push_back(b.y1 + m);
      if (horiz(se)) bottom.push_back(b.x1 + m);
      close(sw, se, bottom, 2, 3);
      break;
    }
    case DiagramClosure::denominator: {  // NW–SW on the left, NE–SE on the right
      std::vector<double> left, rt;
      if (!horiz(nw)) left.push_back(b.y0 - m);
      left.push_back(b.x0 - m);
      if (!horiz(sw)) left.push_back(b.y1 + m);
      close(nw, sw, left, 0, 2);
      if (!horiz(ne)) rt.push_back(b.y0 - m);
      rt.push_back(b.x1 + m);
      if (!horiz(se)) rt.push_back(b.y1 + m);
      close(ne, se, rt, 1, 3);
      break;
    }
    case DiagramClosure::none:  // a short loose end at each of the four ends
      for (int e = 0; e < 4; ++e) {
        const PortG& q = ends[static_cast<std::size_t>(e)];
        L.tip[static_cast<std::size_t>(e)] = q.p + m * q.dir;
        L.tip_dir[static_cast<std::size_t>(e)] = q.dir;
        add_link(L, q.node, end_node(e), {line_seg(q.p, q.p + m * q.dir)});
      }
      break;
  }
  merge_junctions(L);
  Box2 all = bbox(L, 0, 0, L.xs.size());
  if (labels) reserve_labels(L, all);
  L.x0 = all.x0;
  L.y0 = all.y0;
  L.x1 = all.x1;
  L.y1 = all.y1;
  return L;
}

// ---------------------------------------------------------------------------------------------
// Tracing: the arcs as runs of oriented links, cut at under-passages.
struct Step {
  std::size_t link;
  bool forward;  // a → b
};
struct DrawnArc {
  std::vector<Step> steps;
  bool closed = false;  // a loop with no under-passage
};
struct Trace {
  std::vector<DrawnArc> arcs;
  std::vector<std::size_t> arc_of_link;
  std::vector<std::array<std::int64_t, 2>> at_corner;  // per crossing corner: link, which end
};

bool passes_over(const XGeom& x, int corner) { return ((corner == 0 || corner == 3) == x.over_nw_se); }

Trace trace(const Layout& L) {
  const std::size_t nl = L.links.size();
  Trace T;
  T.at_corner.assign(L.xs.size() * 4, {-1, -1});
  std::array<std::array<std::int64_t, 2>, 4> at_end{};
  at_end.fill({-1, -1});
  for (std::size_t i = 0; i < nl; ++i) {
    if (L.links[i].loop) continue;
    for (int side = 0; side < 2; ++side) {
      const Node& n = side == 0 ? L.links[i].a : L.links[i].b;
      const std::array<std::int64_t, 2> v{static_cast<std::int64_t>(i), side};
      if (n.kind == NodeKind::corner) T.at_corner[static_cast<std::size_t>(n.id * 4 + n.sub)] = v;
      else if (n.kind == NodeKind::end) at_end[static_cast<std::size_t>(n.sub)] = v;
      else throw std::logic_error("svg: a junction survived the merge");
    }
  }
  T.arc_of_link.assign(nl, 0);
  std::vector<char> used(nl, 0);
  // Walks a component from a link end; cut[i] says whether an arc ends after steps[i].
  auto walk = [&](std::size_t start, bool forward, std::vector<Step>& steps, std::vector<char>& cut) {
    std::size_t li = start;
    bool fw = forward;
    for (;;) {
      steps.push_back({li, fw});
      used[li] = 1;
      const Node& head = fw ? L.links[li].b : L.links[li].a;
      if (head.kind != NodeKind::corner) {
        cut.push_back(1);
        return false;  // reached a loose end
      }
      cut.push_back(passes_over(L.xs[static_cast<std::size_t>(head.id)], head.sub) ? 0 : 1);
      const auto nx = T.at_corner[static_cast<std::size_t>(head.id * 4 + opposite(head.sub))];
      li = static_cast<std::size_t>(nx[0]);
      fw = nx[1] == 0;
      if (li == start && fw == forward) return true;
    }
  };
  auto emit = [&](const std::vector<Step>& steps, const std::vector<char>& cut, bool closed) {
    const std::size_t n = steps.size();
    const bool any_cut = std::find(cut.begin(), cut.end(), 1) != cut.end();
    if (!any_cut) {  // a closed component passing over only
      for (const Step& s : steps) T.arc_of_link[s.link] = T.arcs.size();
      T.arcs.push_back({steps, true});
      return;
    }
    std::size_t start = 0;
    if (closed)
      while (!cut[(start + n - 1) % n]) ++start;
    DrawnArc cur;
    for (std::size_t r = 0; r < n; ++r) {
      const std::size_t i = (start + r) % n;
      cur.steps.push_back(steps[i]);
      T.arc_of_link[steps[i].link] = T.arcs.size();
      if (cut[i]) {
        T.arcs.push_back(std::move(cur));
        cur = {};
      }
    }
  };
  for (int e : {0, 2, 1, 3}) {  // open strands from their ends
    const auto s = at_end[static_cast<std::size_t>(e)];
    if (s[0] < 0 || used[static_cast<std::size_t>(s[0])]) continue;
    std::vector<Step> steps;
    std::vector<char> cut;
    walk(static_cast<std::size_t>(s[0]), s[1] == 0, steps, cut);
    emit(steps, cut, false);
  }
  for (std::size_t i = 0; i < nl; ++i) {
    if (used[i]) continue;
    if (L.links[i].loop) {
      used[i] = 1;
      T.arc_of_link[i] = T.arcs.size();
      T.arcs.push_back({{{i, true}}, true});
      continue;
    }
    std::vector<Step> steps;
    std::vector<char> cut;
    const bool closed = walk(i, true, steps, cut);
    emit(steps, cut, closed);
  }
  return T;
}

// ---------------------------------------------------------------------------------------------
// What the Diagram says about each drawn piece: its arc, its direction.
struct Annotation {
  std::vector<std::int64_t> diagram_arc;  // per drawn arc: index into Diagram::arcs()
  std::vector<int> link_dir;              // per link: +1 if oriented a → b, −1 if b → a, 0 none
  std::vector<std::pair<Pt, Pt>> loop_arrows;  // crossingless components: point, direction
};

[[noreturn]] void mismatch(const std::string& what) {
  throw std::logic_error("svg: the drawing disagrees with the diagram: " + what);
}

/// Checks every link against the Diagram's connectivity and maps drawn arcs to Diagram arcs.
/// The drawing is built independently of Diagram::build (from the boxes only), so agreement here
/// is a cross-check of both; a disagreement is a bug and throws std::logic_error. A drawn arc's
/// pieces carry PD edge labels at their crossing corners (Crossing::edge), and all labels of one
/// drawn arc must belong to one Diagram arc; crossingless pieces are matched through the ends
/// they pass (Diagram::end_arc).
Annotation annotate(const Diagram& d, const Layout& L, const Trace& T) {
  const auto& xs = d.crossings();
  auto port_of = [](const Node& n) {
    return n.kind == NodeKind::corner ? Port{n.id, static_cast<Corner>(n.sub)} : Port{-1, static_cast<Corner>(n.sub)};
  };
  // Connectivity: a link without closure arcs joins what Diagram::Crossing::neighbor joins; a
  // link through closure arcs leaves its corners towards the ends it runs through.
  for (const Link& l : L.links) {
    if (l.loop) continue;
    for (int side = 0; side < 2; ++side) {
      const Node& n = side == 0 ? l.a : l.b;
      if (n.kind != NodeKind::corner) continue;
      const Port want = l.via.empty() ? port_of(side == 0 ? l.b : l.a)
                                      : Port{-1, static_cast<Corner>(side == 0 ? l.via.front() : l.via.back())};
      if (xs[static_cast<std::size_t>(n.id)].neighbor[static_cast<std::size_t>(n.sub)] != want)
        mismatch("crossing " + std::to_string(n.id) + " corner " + std::to_string(n.sub));
    }
  }
  Annotation A;
  A.link_dir.assign(L.links.size(), 0);
  std::vector<std::int64_t> arc_of_edge(d.edges().size() + 1, -1);
  for (std::size_t a = 0; a < d.arcs().size(); ++a)
    for (std::int64_t e : d.arcs()[a].edges) arc_of_edge[static_cast<std::size_t>(e)] = static_cast<std::int64_t>(a);
  std::vector<char> taken(d.arcs().size(), 0);
  // Arcs without edges and not at an end (crossingless loops of sums), in order.
  std::vector<std::int64_t> free_loops;
  for (std::size_t a = 0; a < d.arcs().size(); ++a) {
    bool at_end = false;
    for (int e = 0; e < 4; ++e) at_end = at_end || d.end_arc(static_cast<Corner>(e)) == static_cast<std::int64_t>(a);
    if (d.arcs()[a].edges.empty() && !at_end) free_loops.push_back(static_cast<std::int64_t>(a));
  }
  std::size_t next_free = 0;
  for (const DrawnArc& arc : T.arcs) {
    std::int64_t which = -1;
    for (const Step& st : arc.steps) {
      const Link& l = L.links[st.link];
      std::int64_t here = -1;
      for (const Node* n : {&l.a, &l.b}) {
        if (l.loop || n->kind != NodeKind::corner) continue;
        const Crossing& x = xs[static_cast<std::size_t>(n->id)];
        const std::int64_t label = x.edge[static_cast<std::size_t>(n->sub)];
        here = arc_of_edge.at(static_cast<std::size_t>(label));
        const auto c = static_cast<Corner>(n->sub);
        const bool out = c == x.over_out || c == x.under_out;
        A.link_dir[st.link] = (n == &l.a) == out ? 1 : -1;
      }
      if (here < 0) {  // a crossingless piece: an end's arc, or a free loop
        if (!l.loop && l.a.kind == NodeKind::end) here = d.end_arc(static_cast<Corner>(l.a.sub));
        else if (!l.via.empty()) here = d.end_arc(static_cast<Corner>(l.via.front()));
        else if (next_free < free_loops.size()) here = free_loops[next_free++];
        else mismatch("a crossingless loop");
      }
      if (which >= 0 && here != which) mismatch("an arc runs into another");
      which = here;
    }
    if (which < 0 || taken[static_cast<std::size_t>(which)]) mismatch("arc " + std::to_string(which));
    taken[static_cast<std::size_t>(which)] = 1;
    A.diagram_arc.push_back(which);
  }
  if (A.diagram_arc.size() != d.arcs().size()) mismatch("the number of arcs");
  // Crossingless components: an arrow where the component enters the tangle (diagram.hpp's rule).
  for (const Component& cm : d.component_list()) {
    if (cm.edges > 0 || !cm.entry) continue;
    const PortG& q = L.ends[static_cast<std::size_t>(ci(*cm.entry))];
    A.loop_arrows.push_back({q.p - 0.45 * q.dir, -1.0 * q.dir});
  }
  for (const Edge& e : d.edges()) {  // open crossingless strands: from the entry end
    if (!e.tail.is_end() || !e.head.is_end()) continue;
    for (std::size_t i = 0; i < L.links.size(); ++i) {
      const Link& l = L.links[i];
      if (l.loop || l.a.kind != NodeKind::end || l.b.kind != NodeKind::end) continue;
      if (l.a.sub == ci(e.tail.corner)) A.link_dir[i] = 1;
      if (l.b.sub == ci(e.tail.corner)) A.link_dir[i] = -1;
    }
  }
  return A;
}

// ---------------------------------------------------------------------------------------------
// Rendering.
struct Style {
  const char* paper = "#ffffff";
  const char* ink = "#1f2430";        // plain strands, arrows, end names
  const char* label_ink = "#5b6170";  // crossing numbers
  const char* casing = "#6f6300";     // outline of the yellow class
  double stroke = 0.10;               // plain strand width
  double color_stroke = 0.14;         // coloured strand width
  double halo = 0.09;                 // paper on each side of an over-strand at a crossing
  double gap = 0.21;                  // an under-strand stops this far from the over-strand
  double margin = 0.7;                // paper around the drawing
};

/// Okabe & Ito's colour-blind-safe qualitative palette ("Color Universal Design", 2008),
/// reordered so that the three colours of a 3-coloring are the most distinct.
constexpr std::array<SvgSwatch, 8> kPalette{{{"#0072B2", "#ffffff", 0},
                                             {"#E69F00", "#000000", 0},
                                             {"#009E73", "#ffffff", 0},
                                             {"#D55E00", "#ffffff", 0},
                                             {"#CC79A7", "#000000", 0},
                                             {"#56B4E9", "#000000", 0},
                                             {"#F0E442", "#000000", 0},
                                             {"#000000", "#ffffff", 0}}};
/// Dash patterns for the classes 8–15 and 16–23, in coloured-stroke widths.
constexpr std::array<std::array<double, 2>, 3> kDash{{{0, 0}, {2.4, 1.3}, {0.01, 1.7}}};

std::string num(double v) {
  double r = std::round(v * 100.0) / 100.0;
  if (r == 0) r = 0;  // never "-0"
  char buf[40];
  const auto res = std::to_chars(buf, buf + sizeof buf, r, std::chars_format::fixed, 2);
  std::string s(buf, res.ptr);
  while (s.back() == '0') s.pop_back();
  if (s.back() == '.') s.pop_back();
  return s;
}

std::string xml_escape(const std::string& s) {
  std::string o;
  for (char c : s) {
    if (c == '&') o += "&amp;";
    else if (c == '<') o += "&lt;";
    else if (c == '>') o += "&gt;";
    else if (c == '"') o += "&quot;";
    else o += c;
  }
  return o;
}

/// Layout units to pixels.
class Writer {
 public:
  Writer(double ox, double oy, double s) : ox_(ox), oy_(oy), s_(s) {}
  [[nodiscard]] std::string x(double v) const { return num((v - ox_) * s_); }
  [[nodiscard]] std::string y(double v) const { return num((v - oy_) * s_); }
  [[nodiscard]] std::string len(double v) const { return num(v * s_); }
  [[nodiscard]] std::string pt(Pt p) const { return x(p.x) + " " + y(p.y); }
  [[nodiscard]] std::string d(const Path& p, bool close) const {
    if (p.empty()) return {};
    std::string out = "M" + pt(p.front().p0);
    for (const Seg& sg : p) out += sg.line ? "L" + pt(sg.p3) : "C" + pt(sg.p1) + " " + pt(sg.p2) + " " + pt(sg.p3);
    if (close) out += "Z";
    return out;
  }

 private:
  double ox_, oy_, s_;
};

/// The drawn piece of one step: its link with the half-strands at both ends, cut back at an
/// under-passage that ends the arc.
Path step_path(const Layout& L, const Step& st, bool trim_tail, bool trim_head, const Style& S) {
  const Link& l = L.links[st.link];
  const Node& tail = st.forward ? l.a : l.b;
  const Node& head = st.forward ? l.b : l.a;
  auto half = [&](const Node& n, bool trimmed) {  // from corner n.sub to the centre
    const Seg s = strand(L.xs[static_cast<std::size_t>(n.id)], n.sub);
    return sub(s, 0, trimmed ? 0.5 - S.gap / norm(deriv(s, 0.5)) : 0.5);
  };
  Path out;
  if (!l.loop && tail.kind == NodeKind::corner) out.push_back(reversed(half(tail, trim_tail)));
  for (const Seg& s : st.forward ? l.path : reversed(l.path))
    if (length(s) > kEps) out.push_back(s);
  if (!l.loop && head.kind == NodeKind::corner) out.push_back(half(head, trim_head));
  return out;
}

std::string twists_text(const TwistSequence& t) {
  std::string s = "[";
  for (std::size_t i = 0; i < t.twists.size(); ++i) s += (i ? " " : "") + to_string(t.twists[i]);
  return s + "]";
}

std::string default_title(const Diagram& d) {
  std::string what;
  for (std::size_t s = 0; s < d.summands().size(); ++s) what += (s ? " + " : "") + twists_text(d.summands()[s].twists);
  const std::string tangle = (d.summands().size() > 1 ? "the tangle sum " : "the tangle ") + what;
  switch (d.closure()) {
    case DiagramClosure::numerator: return "Numerator closure of " + tangle;
    case DiagramClosure::denominator: return "Denominator closure of " + tangle;
    case DiagramClosure::none: break;
  }
  return "The tangle " + what;
}

}  // namespace

SvgSwatch svg_swatch(std::int64_t color_class) noexcept {
  const std::int64_t k = color_class < 0 ? 0 : color_class;
  SvgSwatch s = kPalette[static_cast<std::size_t>(k % 8)];
  s.dash = static_cast<int>((k / 8) % 3);
  return s;
}

std::string svg(const Diagram& d, const SvgOptions& o) {
  if (d.crossing_count() > max_svg_crossings)
    throw LimitError("diagram too large to draw: " + std::to_string(d.crossing_count()) + " crossings (at most " +
                     std::to_string(max_svg_crossings) + ")");
  for (double v : {o.unit, o.max_width, o.max_height})
    if (!std::isfinite(v) || v <= 0) throw DomainError("svg: sizes must be positive and finite");
  const bool colored = !o.coloring.empty();
  std::vector<std::int64_t> klass;  // colour class of every Diagram arc
  if (colored) {
    if (o.modulus < 1) throw DomainError("svg: a coloring needs a modulus n >= 1");
    if (o.coloring.size() != d.arcs().size())
      throw DomainError("svg: the coloring has " + std::to_string(o.coloring.size()) + " colors but the diagram has " +
                        std::to_string(d.arcs().size()) + " arcs");
    for (std::size_t a = 0; a < o.coloring.size(); ++a)
      if (o.coloring[a] < 0 || o.coloring[a] >= o.modulus)
        throw DomainError("svg: color " + to_string(o.coloring[a]) + " of arc " + std::to_string(a) +
                          " is not in 0.." + to_string(o.modulus - 1));
    for (std::size_t c = 0; c < d.crossings().size(); ++c) {  // Fox's rule: 2·over ≡ in + out
      const Crossing& x = d.crossings()[c];
      const Integer lhs = 2 * o.coloring[static_cast<std::size_t>(x.over_arc)];
      const Integer rhs = o.coloring[static_cast<std::size_t>(x.under_in_arc)] +
                          o.coloring[static_cast<std::size_t>(x.under_out_arc)];
      if (mod_floor(lhs - rhs, o.modulus) != 0)
        throw DomainError("svg: the coloring breaks Fox's rule at crossing " + std::to_string(c + 1));
    }
    // Classes: the colour itself when n ≤ 24 (the same colour number always looks the same);
    // otherwise the rank among the colours used.
    std::map<Integer, std::int64_t> rank;
    for (const Integer& c : o.coloring) rank.emplace(c, 0);
    std::int64_t r = 0;
    for (auto& [c, k] : rank) k = r++;
    for (const Integer& c : o.coloring)
      klass.push_back(o.modulus <= 24 ? c.convert_to<std::int64_t>() : rank[c]);
  }

  Style S;
  const Layout L = layout(d, o.crossing_numbers);
  const Trace T = trace(L);
  const Annotation A = annotate(d, L, T);
  const bool names = o.end_names && !d.is_closed();

  double x0 = L.x0, x1 = L.x1;
  if (names) {  // room for the end names beside the loose ends
    for (int e = 0; e < 4; ++e) {
      const Pt t = L.tip[static_cast<std::size_t>(e)], dir = L.tip_dir[static_cast<std::size_t>(e)];
      if (dir.x < -0.5) x0 = std::min(x0, t.x - 0.95);
      if (dir.x > 0.5) x1 = std::max(x1, t.x + 0.95);
    }
  }
  const double y0 = L.y0 - (names ? 0.5 : 0), y1 = L.y1 + (names ? 0.5 : 0);
  const double w_u = x1 - x0 + 2 * S.margin, h_u = y1 - y0 + 2 * S.margin;
  const double s = std::min({o.unit, o.max_width / w_u, o.max_height / h_u});
  const Writer W(x0 - S.margin, y0 - S.margin, s);
  const std::string wpx = num(std::ceil(w_u * s - 1e-6)), hpx = num(std::ceil(h_u * s - 1e-6));
  const double font = std::max(0.30, 9.0 / s);  // never below 9 px
  // Small drawings keep strokes of at least 1.5 px (2 px coloured) and gaps to match.
  S.stroke = std::max(S.stroke, 1.5 / s);
  S.color_stroke = std::max(S.color_stroke, 2.0 / s);
  S.halo = std::max(S.halo, 1.2 / s);
  S.gap = std::max(S.gap, 1.9 * (colored ? S.color_stroke : S.stroke));

  std::vector<std::int64_t> arc_class(T.arcs.size(), -1);
  if (colored)
    for (std::size_t a = 0; a < T.arcs.size(); ++a) arc_class[a] = klass[static_cast<std::size_t>(A.diagram_arc[a])];
  auto stroke_attrs = [&](std::int64_t cls, bool dashes) {
    if (cls < 0) return std::string(" stroke=\"") + S.ink + "\" stroke-width=\"" + W.len(S.stroke) + "\"";
    const SvgSwatch sw = svg_swatch(cls);
    std::string a = std::string(" stroke=\"") + sw.stroke + "\" stroke-width=\"" + W.len(S.color_stroke) + "\"";
    if (dashes && sw.dash > 0) {
      const auto& p = kDash[static_cast<std::size_t>(sw.dash)];
      a += " stroke-dasharray=\"" + W.len(p[0] * S.color_stroke) + " " + W.len(p[1] * S.color_stroke) + "\"";
    }
    return a;
  };

  std::string out;
  out.reserve(1024 + 600 * L.xs.size());
  out += "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n";
  out += "<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"" + wpx + "\" height=\"" + hpx +
         "\" viewBox=\"0 0 " + wpx + " " + hpx + "\" role=\"img\" aria-labelledby=\"title\">\n";
  out += "<title id=\"title\">" + xml_escape(o.title.empty() ? default_title(d) : o.title) + "</title>\n";
  out += "<rect class=\"paper\" width=\"" + wpx + "\" height=\"" + hpx + "\" fill=\"" + S.paper + "\"/>\n";

  // The arcs, each one path from an under-passage to the next.
  std::vector<std::vector<Path>> pieces(T.arcs.size());
  out += "<g class=\"arcs\" fill=\"none\" stroke-linecap=\"round\" stroke-linejoin=\"round\">\n";
  for (std::size_t a = 0; a < T.arcs.size(); ++a) {
    const DrawnArc& arc = T.arcs[a];
    Path whole;
    for (std::size_t i = 0; i < arc.steps.size(); ++i) {
      const bool first = i == 0 && !arc.closed, last = i + 1 == arc.steps.size() && !arc.closed;
      Path p = step_path(L, arc.steps[i], first, last, S);
      whole.insert(whole.end(), p.begin(), p.end());
      pieces[a].push_back(std::move(p));
    }
    const std::int64_t cls = arc_class[a];
    const std::string dd = W.d(whole, arc.closed);
    if (cls >= 0 && cls % 8 == 6)  // yellow: a dark casing keeps it visible on white paper
      out += "<path class=\"casing\" d=\"" + dd + "\" stroke=\"" + S.casing + "\" stroke-width=\"" +
             W.len(S.color_stroke + 0.05) + "\"/>\n";
    out += "<path class=\"arc\" data-arc=\"" + std::to_string(A.diagram_arc[a]) + "\"";
    if (colored) out += " data-color=\"" + to_string(o.coloring[static_cast<std::size_t>(A.diagram_arc[a])]) + "\"";
    out += " d=\"" + dd + "\"" + stroke_attrs(cls, true) + "/>\n";
  }
  out += "</g>\n";

  // Crossings: a paper halo under the middle of each over-strand, then that piece again on top.
  out += "<g class=\"crossings\" fill=\"none\" stroke-linecap=\"butt\">\n";
  for (std::size_t c = 0; c < L.xs.size(); ++c) {
    const XGeom& x = L.xs[c];
    const int oc = x.over_nw_se ? 0 : 1;
    const Seg over = strand(x, oc);
    const double dt = (S.gap + 0.06) / norm(deriv(over, 0.5));
    const Path mid{sub(over, 0.5 - dt, 0.5 + dt)};
    const auto li = T.at_corner[c * 4 + static_cast<std::size_t>(oc)][0];
    const std::int64_t cls = arc_class[T.arc_of_link[static_cast<std::size_t>(li)]];
    const double sw = cls < 0 ? S.stroke : S.color_stroke;
    out += "<g class=\"crossing\" data-crossing=\"" + std::to_string(c + 1) + "\"><path class=\"gap\" d=\"" +
           W.d(mid, false) + "\" stroke=\"" + S.paper + "\" stroke-width=\"" + W.len(sw + 2 * S.halo) + "\"/><path d=\"" +
           W.d(mid, false) + "\"" + stroke_attrs(cls, false) + "/></g>\n";
  }
  out += "</g>\n";

  // Where each arc's colour badge goes: the middle of its longest piece.
  std::vector<std::size_t> badge_piece(T.arcs.size(), 0);
  for (std::size_t a = 0; a < T.arcs.size(); ++a) {
    double best = -1;
    for (std::size_t i = 0; i < pieces[a].size(); ++i) {
      const double l = length(pieces[a][i]);
      if (l > best + 1e-6) {
        best = l;
        badge_piece[a] = i;
      }
    }
  }

  // Orientation arrows, one on every edge, in the middle.
  if (o.arrows) {
    auto arrow = [&](Pt p, Pt u, const char* fill) {
      const Pt n{-u.y, u.x};
      const double a = std::max(colored ? 0.27 : 0.23, 5.0 / s), b = 0.68 * a;  // half-length, half-width
      const Pt tip = p + a * u, l = p - a * u + b * n, r = p - a * u - b * n, back = p - 0.4 * a * u;
      return "<path d=\"M" + W.pt(tip) + "L" + W.pt(l) + "L" + W.pt(back) + "L" + W.pt(r) + "Z\" fill=\"" + fill +
             "\"/>\n";
    };
    std::string arrows;
    for (std::size_t a = 0; a < T.arcs.size(); ++a) {
      const char* fill = arc_class[a] < 0 ? S.ink : svg_swatch(arc_class[a]).stroke;
      for (std::size_t i = 0; i < T.arcs[a].steps.size(); ++i) {
        const Step& st = T.arcs[a].steps[i];
        const int dir = A.link_dir[st.link] * (st.forward ? 1 : -1);
        if (dir == 0 || pieces[a][i].empty()) continue;
        const bool under_badge = colored && o.color_numbers && i == badge_piece[a];
        const auto [p, u] = point_at(pieces[a][i], under_badge ? (dir > 0 ? 0.75 : 0.25) : 0.5);
        arrows += arrow(p, dir > 0 ? u : -1.0 * u, fill);
      }
    }
    for (const auto& [p, u] : A.loop_arrows) arrows += arrow(p, u, S.ink);
    out += "<g class=\"arrows\" stroke=\"none\">\n" + arrows + "</g>\n";
  }

  const std::string font_family = "font-family=\"Helvetica, Arial, sans-serif\"";
  if (o.crossing_numbers && !L.xs.empty()) {  // above a row's crossing, left of a column's
    out += "<g class=\"crossing-numbers\" " + font_family + " font-size=\"" + W.len(font) + "\" fill=\"" + S.label_ink +
           "\">\n";
    for (std::size_t c = 0; c < L.xs.size(); ++c) {
      const XGeom& x = L.xs[c];
      if (x.vertical)
        out += "<text x=\"" + W.x(x.c.x - 0.6) + "\" y=\"" + W.y(x.c.y + 0.35 * font) + "\" text-anchor=\"end\">";
      else
        out += "<text x=\"" + W.x(x.c.x) + "\" y=\"" + W.y(x.c.y - 0.62) + "\" text-anchor=\"middle\">";
      out += std::to_string(c + 1) + "</text>\n";
    }
    out += "</g>\n";
  }
  if (names) {
    out += "<g class=\"end-names\" " + font_family + " font-size=\"" + W.len(1.05 * font) +
           "\" font-weight=\"bold\" fill=\"" + S.ink + "\">\n";
    for (Corner e : {Corner::nw, Corner::ne, Corner::sw, Corner::se}) {
      const Pt t = L.tip[static_cast<std::size_t>(ci(e))], dir = L.tip_dir[static_cast<std::size_t>(ci(e))];
      const char* anchor = dir.x < -0.5 ? "end" : dir.x > 0.5 ? "start" : "middle";
      const Pt at = t + 0.12 * dir + Pt{0, dir.y > 0.5 ? 0.3 : dir.y < -0.5 ? -0.05 : 0.36 * font};
      out += "<text x=\"" + W.x(at.x) + "\" y=\"" + W.y(at.y) + "\" text-anchor=\"" + anchor + "\">" + to_string(e) +
             "</text>\n";
    }
    out += "</g>\n";
  }
  if (colored && o.color_numbers) {  // on the longest piece of every arc: its colour number
    out += "<g class=\"color-numbers\" " + font_family + " font-size=\"" + W.len(0.9 * font) +
           "\" font-weight=\"bold\" text-anchor=\"middle\">\n";
    for (std::size_t a = 0; a < T.arcs.size(); ++a) {
      if (pieces[a].empty() || pieces[a][badge_piece[a]].empty()) continue;
      const Pt p = point_at(pieces[a][badge_piece[a]], 0.5).first;
      const std::string text = to_string(o.coloring[static_cast<std::size_t>(A.diagram_arc[a])]);
      const SvgSwatch sw = svg_swatch(arc_class[a]);
      const double r = std::max(0.2, 6.0 / s) * (text.size() > 1 ? 1.0 + 0.28 * static_cast<double>(text.size() - 1) : 1.0);
      out += "<g class=\"badge\" data-arc=\"" + std::to_string(A.diagram_arc[a]) + "\"><circle cx=\"" + W.x(p.x) +
             "\" cy=\"" + W.y(p.y) + "\" r=\"" + W.len(r) + "\" fill=\"" + sw.stroke + "\" stroke=\"" + S.paper +
             "\" stroke-width=\"" + W.len(0.04) + "\"/><text x=\"" + W.x(p.x) + "\" y=\"" + W.y(p.y + 0.31 * font) +
             "\" fill=\"" + sw.text + "\">" + text + "</text></g>\n";
    }
    out += "</g>\n";
  }
  out += "</svg>\n";
  return out;
}

}  // namespace fourplat
