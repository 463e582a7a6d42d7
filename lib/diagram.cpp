// The standard diagram of a twist sequence or a sum of them (include/fourplat/diagram.hpp).
//
// Construction works on "ports": the four corners of every crossing, the tangle's four outer ends
// and, per summand, four seed tokens standing for the ends of the seed [0] or [∞] (the two seed
// arcs join them in pairs). Each port has one external link (what it is glued to) and one
// internal connection (straight through its crossing, along its seed arc, along a closure arc);
// a component of the diagram is an alternating walk ext, int, ext, ... over these. Everything is
// linear in the number of crossings.
#include "fourplat/diagram.hpp"

#include <algorithm>
#include <numeric>
#include <string>
#include <utility>

#include "fourplat/algebraic.hpp"
#include "fourplat/error.hpp"

namespace fourplat {

namespace {

constexpr std::size_t ci(Corner c) noexcept { return static_cast<std::size_t>(c); }
constexpr Corner opposite(Corner c) noexcept { return static_cast<Corner>(3 - static_cast<int>(c)); }
/// Counterclockwise successor around a crossing: NE → NW → SW → SE → NE.
constexpr Corner ccw_next(Corner c) noexcept {
  switch (c) {
    case Corner::ne: return Corner::nw;
    case Corner::nw: return Corner::sw;
    case Corner::sw: return Corner::se;
    case Corner::se: return Corner::ne;
  }
  return Corner::nw;
}
/// Position of a corner in the plane (x to the right, y up).
constexpr int cx(Corner c) noexcept { return (c == Corner::ne || c == Corner::se) ? 1 : -1; }
constexpr int cy(Corner c) noexcept { return (c == Corner::nw || c == Corner::ne) ? 1 : -1; }

/// Port numbering: 4c + corner for crossing c; then the 4 outer ends; then 4 seed tokens per
/// summand.
struct PortSpace {
  std::int64_t n = 0;  // crossings
  [[nodiscard]] std::int64_t corner(std::int64_t c, Corner k) const { return 4 * c + static_cast<std::int64_t>(k); }
  [[nodiscard]] std::int64_t end(Corner k) const { return 4 * n + static_cast<std::int64_t>(k); }
  [[nodiscard]] std::int64_t seed(std::size_t s, Corner k) const {
    return 4 * n + 4 + 4 * static_cast<std::int64_t>(s) + static_cast<std::int64_t>(k);
  }
  [[nodiscard]] bool is_corner(std::int64_t p) const { return p < 4 * n; }
  [[nodiscard]] bool is_end(std::int64_t p) const { return p >= 4 * n && p < 4 * n + 4; }
  [[nodiscard]] bool is_seed(std::int64_t p) const { return p >= 4 * n + 4; }
};

std::int64_t checked_twist(const Integer& a) {
  const auto w = to_int64(a);
  if (!w || *w > Diagram::max_crossings || *w < -Diagram::max_crossings)
    throw LimitError("twist " + to_string(a) + " is too large for a diagram (at most " +
                     std::to_string(Diagram::max_crossings) + " crossings)");
  return *w;
}

}  // namespace

const char* to_string(Corner c) noexcept {
  switch (c) {
    case Corner::nw: return "NW";
    case Corner::ne: return "NE";
    case Corner::sw: return "SW";
    case Corner::se: return "SE";
  }
  return "?";
}

const char* to_string(DiagramClosure c) noexcept {
  switch (c) {
    case DiagramClosure::numerator: return "numerator";
    case DiagramClosure::denominator: return "denominator";
    case DiagramClosure::none: return "none";
  }
  return "?";
}

Diagram Diagram::of_twists(const TwistSequence& twists, DiagramClosure closure) {
  Diagram d;
  d.build(std::span<const TwistSequence>(&twists, 1), closure);
  return d;
}

Diagram Diagram::of_fraction(const Fraction& f, DiagramClosure closure) {
  return of_twists(canonical_twists(f), closure);
}

Diagram Diagram::of_tangle(const RationalTangle& t, DiagramClosure closure) {
  return of_twists(t.twists(), closure);
}

Diagram Diagram::of_sum(std::span<const TwistSequence> summands, DiagramClosure closure) {
  Diagram d;
  d.build(summands, closure);
  return d;
}

Diagram Diagram::of_sum(const TangleSum& sum, DiagramClosure closure) {
  std::vector<TwistSequence> parts;
  parts.reserve(sum.summands().size());
  for (const auto& t : sum.summands()) parts.push_back(t.twists());
  return of_sum(parts, closure);
}

void Diagram::build(std::span<const TwistSequence> summands, DiagramClosure closure) {
  if (summands.empty()) throw DomainError("a diagram needs at least one tangle");
  closure_ = closure;

  // Boxes and crossing count first (so the port space is known).
  std::int64_t total = 0;
  for (std::size_t s = 0; s < summands.size(); ++s) {
    const auto& seq = summands[s].twists;
    if (seq.empty()) throw DomainError("empty twist sequence: a tangle needs at least one twist");
    Summand sm;
    sm.twists = summands[s];
    sm.seed_infinity = seq.size() % 2 == 0;  // a1 vertical exactly when n is even
    sm.first_box = boxes_.size();
    sm.boxes = seq.size();
    sm.first_crossing = total;
    for (std::size_t i = 0; i < seq.size(); ++i) {
      TwistBox b;
      b.summand = static_cast<int>(s);
      b.position = i;
      b.kind = (seq.size() - 1 - i) % 2 == 0 ? BoxKind::horizontal : BoxKind::vertical;
      b.twists = checked_twist(seq[i]);
      b.first_crossing = total;
      b.crossings = b.twists < 0 ? -b.twists : b.twists;
      total += b.crossings;
      if (total > max_crossings)
        throw LimitError("diagram too large: more than " + std::to_string(max_crossings) +
                         " crossings");
      boxes_.push_back(b);
    }
    sm.crossings = total - sm.first_crossing;
    summands_.push_back(std::move(sm));
  }

  const PortSpace ps{total};
  const std::int64_t nports = 4 * total + 4 + 4 * static_cast<std::int64_t>(summands_.size());
  std::vector<std::int64_t> ext(static_cast<std::size_t>(nports), -1);
  auto link = [&](std::int64_t a, std::int64_t b) {
    ext[static_cast<std::size_t>(a)] = b;
    ext[static_cast<std::size_t>(b)] = a;
  };

  crossings_.resize(static_cast<std::size_t>(total));
  std::array<std::int64_t, 4> acc{};  // the accumulated sum's current ends
  for (std::size_t s = 0; s < summands_.size(); ++s) {
    std::array<std::int64_t, 4> cur{ps.seed(s, Corner::nw), ps.seed(s, Corner::ne),
                                    ps.seed(s, Corner::sw), ps.seed(s, Corner::se)};
    for (std::size_t bi = summands_[s].first_box; bi < summands_[s].first_box + summands_[s].boxes; ++bi) {
      const TwistBox& b = boxes_[bi];
      for (std::int64_t k = 0; k < b.crossings; ++k) {
        const std::int64_t c = b.first_crossing + k;
        Crossing& x = crossings_[static_cast<std::size_t>(c)];
        x.box = bi;
        x.index_in_box = k;
        x.summand = b.summand;
        x.kind = b.kind;
        x.over_nw_se = b.twists > 0;
        if (b.kind == BoxKind::horizontal) {  // T + [±1]: twist the NE and SE ends
          link(cur[ci(Corner::ne)], ps.corner(c, Corner::nw));
          link(cur[ci(Corner::se)], ps.corner(c, Corner::sw));
          cur[ci(Corner::ne)] = ps.corner(c, Corner::ne);
          cur[ci(Corner::se)] = ps.corner(c, Corner::se);
        } else {  // T * 1/[±1]: twist the SW and SE ends
          link(cur[ci(Corner::sw)], ps.corner(c, Corner::nw));
          link(cur[ci(Corner::se)], ps.corner(c, Corner::ne));
          cur[ci(Corner::sw)] = ps.corner(c, Corner::sw);
          cur[ci(Corner::se)] = ps.corner(c, Corner::se);
        }
      }
    }
    if (s == 0) {
      acc = cur;
    } else {  // T_acc + T_s: glue NE–NW and SE–SW
      link(acc[ci(Corner::ne)], cur[ci(Corner::nw)]);
      link(acc[ci(Corner::se)], cur[ci(Corner::sw)]);
      acc[ci(Corner::ne)] = cur[ci(Corner::ne)];
      acc[ci(Corner::se)] = cur[ci(Corner::se)];
    }
  }
  for (Corner e : {Corner::nw, Corner::ne, Corner::sw, Corner::se}) link(acc[ci(e)], ps.end(e));

  // Internal connection of a port (−1: none, an end of the open tangle).
  auto internal = [&](std::int64_t p) -> std::int64_t {
    if (ps.is_corner(p)) return ps.corner(p / 4, opposite(static_cast<Corner>(p % 4)));
    if (ps.is_seed(p)) {
      const std::int64_t base = p - (p - ps.seed(0, Corner::nw)) % 4;
      const auto k = static_cast<Corner>((p - ps.seed(0, Corner::nw)) % 4);
      const bool inf = summands_[static_cast<std::size_t>((base - ps.seed(0, Corner::nw)) / 4)].seed_infinity;
      Corner partner;
      if (inf)  // [∞]: NW–SW, NE–SE
        partner = k == Corner::nw ? Corner::sw : k == Corner::sw ? Corner::nw : k == Corner::ne ? Corner::se : Corner::ne;
      else      // [0]: NW–NE, SW–SE
        partner = k == Corner::nw ? Corner::ne : k == Corner::ne ? Corner::nw : k == Corner::sw ? Corner::se : Corner::sw;
      return base + static_cast<std::int64_t>(partner);
    }
    const auto e = static_cast<Corner>(p - ps.end(Corner::nw));
    switch (closure_) {
      case DiagramClosure::numerator:  // NW–NE, SW–SE
        return ps.end(e == Corner::nw ? Corner::ne : e == Corner::ne ? Corner::nw : e == Corner::sw ? Corner::se : Corner::sw);
      case DiagramClosure::denominator:  // NW–SW, NE–SE
        return ps.end(e == Corner::nw ? Corner::sw : e == Corner::sw ? Corner::nw : e == Corner::ne ? Corner::se : Corner::ne);
      case DiagramClosure::none: return -1;
    }
    return -1;
  };
  auto to_port = [&](std::int64_t p) -> Port {
    if (ps.is_corner(p)) return Port{p / 4, static_cast<Corner>(p % 4)};
    return Port{-1, static_cast<Corner>(p - ps.end(Corner::nw))};
  };
  // The external neighbour with seed arcs skipped (for the open tangle's connectivity).
  auto resolve = [&](std::int64_t p) -> std::int64_t {
    std::int64_t q = ext[static_cast<std::size_t>(p)];
    while (ps.is_seed(q)) q = ext[static_cast<std::size_t>(internal(q))];
    return q;
  };
  for (std::int64_t c = 0; c < total; ++c)
    for (Corner k : {Corner::nw, Corner::ne, Corner::sw, Corner::se})
      crossings_[static_cast<std::size_t>(c)].neighbor[ci(k)] = to_port(resolve(ps.corner(c, k)));
  for (Corner e : {Corner::nw, Corner::ne, Corner::sw, Corner::se})
    end_neighbor_[ci(e)] = to_port(resolve(ps.end(e)));

  // ---- Walk the components. ----
  std::vector<char> seen(static_cast<std::size_t>(nports), 0);
  struct Pass {
    std::int64_t crossing;
    Corner in;
  };
  std::vector<Pass> passes;           // of the current component
  std::vector<std::vector<Corner>> via_between;  // ends met before pass k (index k), and after the last
  std::vector<std::int64_t> end_component_edge(4, -1);  // per end: edge index within its component
  std::array<int, 4> end_component{-1, -1, -1, -1};

  auto walk = [&](std::int64_t start, bool ext_first, std::optional<Corner> entry) {
    passes.clear();
    via_between.assign(1, {});
    const int comp = static_cast<int>(components_.size());
    std::array<int, 4> end_slot{-1, -1, -1, -1};  // which between-slot each end fell in
    std::optional<Corner> exit;
    std::int64_t p = start;
    bool do_ext = ext_first;
    auto visit_end = [&](std::int64_t q) {
      const auto e = static_cast<Corner>(q - ps.end(Corner::nw));
      end_component[ci(e)] = comp;
      end_slot[ci(e)] = static_cast<int>(via_between.size()) - 1;
      via_between.back().push_back(e);
    };
    if (ps.is_end(p)) visit_end(p);
    seen[static_cast<std::size_t>(p)] = 1;
    for (;;) {
      std::int64_t q;
      if (do_ext) {
        q = ext[static_cast<std::size_t>(p)];
      } else {
        q = internal(p);
        if (q < 0) {  // the open tangle's strand leaves at this end
          exit = static_cast<Corner>(p - ps.end(Corner::nw));
          break;
        }
        if (ps.is_corner(p)) {
          passes.push_back(Pass{p / 4, static_cast<Corner>(p % 4)});
          via_between.emplace_back();
        }
      }
      do_ext = !do_ext;
      if (q == start && do_ext == ext_first) break;
      if (ps.is_end(q)) visit_end(q);
      seen[static_cast<std::size_t>(q)] = 1;
      p = q;
    }

    Component cm;
    cm.entry = entry;
    cm.exit = exit;
    cm.first_edge = static_cast<std::int64_t>(edges_.size()) + 1;
    const bool closed = !exit.has_value();
    const std::size_t m = passes.size();
    if (m == 0 && closed) {  // a crossingless loop
      cm.edges = 0;
      components_.push_back(cm);
      for (int k = 0; k < 4; ++k)
        if (end_slot[static_cast<std::size_t>(k)] >= 0) end_component_edge[static_cast<std::size_t>(k)] = -1;
      return;
    }
    // Edges. Closed: edge 0 runs from the last pass to the first (slots m and 0); edge k from pass
    // k−1 to pass k. Open: edge 0 from the entry end to pass 0, edge m from pass m−1 to the exit.
    const std::size_t ne = closed ? m : m + 1;
    const std::int64_t base = static_cast<std::int64_t>(edges_.size());
    for (std::size_t k = 0; k < ne; ++k) {
      Edge e;
      e.label = base + static_cast<std::int64_t>(k) + 1;
      e.component = comp;
      if (k == 0) {
        if (closed) {
          const Pass& last = passes[m - 1];
          e.tail = Port{last.crossing, opposite(last.in)};
          e.via = via_between[m];
          e.via.insert(e.via.end(), via_between[0].begin(), via_between[0].end());
        } else {
          e.tail = Port{-1, *entry};
        }
      } else {
        const Pass& prev = passes[k - 1];
        e.tail = Port{prev.crossing, opposite(prev.in)};
        if (!closed && k == m) e.head = Port{-1, *exit};
        if (closed || k < m) e.via = via_between[k];
      }
      if (k < m) e.head = Port{passes[k].crossing, passes[k].in};
      else e.head = Port{-1, *exit};
      if (!closed) e.via.clear();  // an open strand passes no end in its interior
      edges_.push_back(std::move(e));
    }
    for (std::size_t k = 0; k < 4; ++k) {
      const int slot = end_slot[k];
      if (slot < 0) continue;
      std::int64_t idx;
      if (closed) idx = static_cast<std::size_t>(slot) == m ? 0 : slot;
      else idx = slot;  // the entry end is in slot 0 (edge 0), the exit end in slot m (edge m)
      end_component_edge[k] = base + idx;
    }
    // Crossing records.
    for (std::size_t k = 0; k < m; ++k) {
      Crossing& x = crossings_[static_cast<std::size_t>(passes[k].crossing)];
      const Corner in = passes[k].in;
      const bool over = x.over_nw_se ? (in == Corner::nw || in == Corner::se)
                                     : (in == Corner::ne || in == Corner::sw);
      const std::int64_t in_label = base + static_cast<std::int64_t>(k) + 1;
      const std::int64_t out_label = closed ? base + static_cast<std::int64_t>((k + 1) % m) + 1
                                            : base + static_cast<std::int64_t>(k + 1) + 1;
      x.edge[ci(in)] = in_label;
      x.edge[ci(opposite(in))] = out_label;
      if (over) {
        x.over_in = in;
        x.over_out = opposite(in);
        x.over_component = comp;
      } else {
        x.under_in = in;
        x.under_out = opposite(in);
        x.under_component = comp;
      }
    }
    cm.edges = static_cast<std::int64_t>(ne);
    components_.push_back(cm);
  };

  for (Corner e : {Corner::nw, Corner::sw, Corner::ne, Corner::se})
    if (!seen[static_cast<std::size_t>(ps.end(e))]) walk(ps.end(e), true, e);
  for (std::int64_t c = 0; c < total; ++c)
    for (Corner k : {Corner::nw, Corner::ne})
      if (!seen[static_cast<std::size_t>(ps.corner(c, k))]) walk(ps.corner(c, k), false, std::nullopt);
  for (std::int64_t p = ps.seed(0, Corner::nw); p < nports; ++p)
    if (!seen[static_cast<std::size_t>(p)]) walk(p, true, std::nullopt);  // crossingless loops

  // ---- Signs and writhe. ----
  writhe_ = 0;
  for (Crossing& x : crossings_) {
    const int ox = cx(x.over_out) - cx(x.over_in), oy = cy(x.over_out) - cy(x.over_in);
    const int ux = cx(x.under_out) - cx(x.under_in), uy = cy(x.under_out) - cy(x.under_in);
    x.sign = ox * uy - oy * ux > 0 ? 1 : -1;
    writhe_ += x.sign;
  }

  // ---- Arcs: an arc starts at every edge leaving an under-passage (or leaving an end). ----
  std::vector<std::int64_t> edge_arc(edges_.size(), -1);
  auto starts_arc = [&](const Edge& e) {
    if (e.tail.is_end()) return true;
    return crossings_[static_cast<std::size_t>(e.tail.crossing)].under_out == e.tail.corner;
  };
  auto ends_arc = [&](const Edge& e) {
    if (e.head.is_end()) return true;
    return crossings_[static_cast<std::size_t>(e.head.crossing)].under_in == e.head.corner;
  };
  std::vector<std::int64_t> component_arc(components_.size(), -1);
  for (std::size_t ci2 = 0; ci2 < components_.size(); ++ci2) {
    const Component& cm = components_[ci2];
    const int comp = static_cast<int>(ci2);
    if (cm.edges == 0) {
      component_arc[ci2] = static_cast<std::int64_t>(arcs_.size());
      arcs_.push_back(Arc{comp, {}});
      continue;
    }
    const std::int64_t first = cm.first_edge - 1, count = cm.edges;
    bool any_start = false;
    for (std::int64_t k = 0; k < count; ++k)
      if (starts_arc(edges_[static_cast<std::size_t>(first + k)])) { any_start = true; break; }
    if (!any_start) {  // no under-passage: one arc with every edge
      Arc a{comp, {}};
      for (std::int64_t k = 0; k < count; ++k) {
        a.edges.push_back(first + k + 1);
        edge_arc[static_cast<std::size_t>(first + k)] = static_cast<std::int64_t>(arcs_.size());
      }
      component_arc[ci2] = static_cast<std::int64_t>(arcs_.size());
      arcs_.push_back(std::move(a));
      continue;
    }
    for (std::int64_t k = 0; k < count; ++k) {
      if (!starts_arc(edges_[static_cast<std::size_t>(first + k)])) continue;
      Arc a{comp, {}};
      const auto id = static_cast<std::int64_t>(arcs_.size());
      std::int64_t j = k;
      for (;;) {
        const Edge& e = edges_[static_cast<std::size_t>(first + j)];
        a.edges.push_back(e.label);
        edge_arc[static_cast<std::size_t>(first + j)] = id;
        if (ends_arc(e)) break;
        j = (j + 1) % count;
      }
      arcs_.push_back(std::move(a));
    }
  }
  for (Crossing& x : crossings_) {
    x.over_arc = edge_arc[static_cast<std::size_t>(x.edge[ci(x.over_in)] - 1)];
    x.under_in_arc = edge_arc[static_cast<std::size_t>(x.edge[ci(x.under_in)] - 1)];
    x.under_out_arc = edge_arc[static_cast<std::size_t>(x.edge[ci(x.under_out)] - 1)];
  }
  for (std::size_t k = 0; k < 4; ++k) {
    if (end_component[k] < 0) continue;
    end_arc_[k] = end_component_edge[k] >= 0
                      ? edge_arc[static_cast<std::size_t>(end_component_edge[k])]
                      : component_arc[static_cast<std::size_t>(end_component[k])];
  }
}

int Diagram::crossingless_components() const noexcept {
  return static_cast<int>(std::count_if(components_.begin(), components_.end(),
                                        [](const Component& c) { return c.edges == 0; }));
}

std::int64_t Diagram::linking_number(int i, int j) const {
  if (i < 0 || j < 0 || i >= components() || j >= components() || i == j)
    throw DomainError("linking number needs two different components (0.." +
                      std::to_string(components() - 1) + ")");
  std::int64_t sum = 0;
  for (const Crossing& x : crossings_)
    if ((x.over_component == i && x.under_component == j) ||
        (x.over_component == j && x.under_component == i))
      sum += x.sign;
  return sum / 2;
}

std::optional<std::int64_t> Diagram::linking_number() const {
  if (components() != 2) return std::nullopt;
  return linking_number(0, 1);
}

bool Diagram::is_alternating() const {
  for (const Component& cm : components_) {
    if (cm.edges == 0) continue;
    std::vector<char> over;
    for (std::int64_t k = 0; k < cm.edges; ++k) {
      const Edge& e = edges_[static_cast<std::size_t>(cm.first_edge - 1 + k)];
      if (e.head.is_end()) continue;
      over.push_back(crossings_[static_cast<std::size_t>(e.head.crossing)].over_in == e.head.corner);
    }
    const bool closed = !cm.exit.has_value();
    for (std::size_t k = 0; k + 1 < over.size(); ++k)
      if (over[k] == over[k + 1]) return false;
    if (closed && over.size() > 1 && over.front() == over.back()) return false;
    if (closed && over.size() == 1) return false;
  }
  return true;
}

PdCode Diagram::pd_code() const {
  PdCode pd;
  pd.reserve(crossings_.size());
  for (const Crossing& x : crossings_) {
    std::array<std::int64_t, 4> row{};
    Corner k = x.under_in;
    for (std::size_t i = 0; i < 4; ++i) {
      row[i] = x.edge[ci(k)];
      k = ccw_next(k);
    }
    pd.push_back(row);
  }
  return pd;
}

std::vector<int> Diagram::signs() const {
  std::vector<int> s;
  s.reserve(crossings_.size());
  for (const Crossing& x : crossings_) s.push_back(x.sign);
  return s;
}

std::vector<std::int64_t> Diagram::dt_code() const {
  if (!is_closed()) throw DomainError("a DT code needs a closed diagram (numerator or denominator closure)");
  if (components() != 1)
    throw DomainError("a DT code describes a knot; this closure has " + std::to_string(components()) +
                      " components");
  const auto n = crossings_.size();
  std::vector<std::int64_t> dt(n, 0);
  for (const Crossing& x : crossings_) {
    const std::int64_t over_label = x.edge[ci(x.over_in)], under_label = x.edge[ci(x.under_in)];
    if ((over_label + under_label) % 2 == 0)
      throw Error("internal error: DT labels of one crossing have the same parity");
    const std::int64_t odd = over_label % 2 == 1 ? over_label : under_label;
    const std::int64_t even = odd == over_label ? under_label : over_label;
    dt[static_cast<std::size_t>((odd - 1) / 2)] = even == over_label ? -even : even;
  }
  return dt;
}

GaussCode Diagram::gauss_code() const {
  GaussCode g;
  g.signs = signs();
  for (const Component& cm : components_) {
    std::vector<std::int64_t> seq;
    for (std::int64_t k = 0; k < cm.edges; ++k) {
      const Edge& e = edges_[static_cast<std::size_t>(cm.first_edge - 1 + k)];
      if (e.head.is_end()) continue;
      const Crossing& x = crossings_[static_cast<std::size_t>(e.head.crossing)];
      const std::int64_t id = e.head.crossing + 1;
      seq.push_back(x.over_in == e.head.corner ? id : -id);
    }
    g.components.push_back(std::move(seq));
  }
  return g;
}

// ---- Coloring fraction (Kauffman–Lambropoulou 2004, second proof of Conway's theorem). ----

namespace {

/// End colors (NW, NE, SW, SE) of one summand's integer Fox coloring whose seed arcs carry 0 and
/// 1, propagated box by box: each new crossing receives two known colors on the corners glued to
/// the tangle and Fox's rule 2·over = under + under' gives the other two.
std::array<Integer, 4> summand_end_colors(const Diagram& d, const Summand& s) {
  std::array<Integer, 4> col;  // indexed by Corner
  if (s.seed_infinity) col = {Integer(0), Integer(1), Integer(0), Integer(1)};  // NW=SW, NE=SE
  else col = {Integer(0), Integer(0), Integer(1), Integer(1)};                  // NW=NE, SW=SE
  for (std::size_t bi = s.first_box; bi < s.first_box + s.boxes; ++bi) {
    const TwistBox& b = d.boxes()[bi];
    const bool pos = b.twists > 0;
    // In a horizontal box the glued corners are NW (from NE) and SW (from SE); in a vertical box
    // NW (from SW) and NE (from SE). Over-strand NW–SE for positive twists, NE–SW for negative.
    Integer& first = b.kind == BoxKind::horizontal ? col[ci(Corner::ne)] : col[ci(Corner::sw)];
    Integer& second = col[ci(Corner::se)];
    for (std::int64_t k = 0; k < b.crossings; ++k) {
      // Glued colors: g1 at the crossing's NW, g2 at its SW (horizontal) or NE (vertical).
      Integer g1 = first, g2 = second;
      Integer out_first, out_second;  // the new NE & SE (horizontal) or SW & SE (vertical)
      if (b.kind == BoxKind::horizontal) {
        if (pos) { out_second = g1; out_first = 2 * g1 - g2; }   // over NW–SE: SE = NW, NE = 2NW − SW
        else { out_first = g2; out_second = 2 * g2 - g1; }       // over NE–SW: NE = SW, SE = 2SW − NW
      } else {
        if (pos) { out_second = g1; out_first = 2 * g1 - g2; }   // over NW–SE: SE = NW, SW = 2NW − NE
        else { out_first = g2; out_second = 2 * g2 - g1; }       // over NE–SW: SW = NE, SE = 2NE − NW
      }
      first = std::move(out_first);
      second = std::move(out_second);
    }
  }
  return col;
}

}  // namespace

EndColors end_colors(const Diagram& d) {
  // The accumulated sum's generic coloring, normalised to NW = 0. Gluing the next summand, whose
  // own generic coloring h has ends (0, b, c, e) (h's NW is its seed color 0), to the current
  // (0, B, C, D): a multiple β of the current coloring and δ of h must agree on the glued
  // ends, βB = γ and βD = γ + δc (γ a constant shift); see the header for the cases.
  std::array<Integer, 4> acc = summand_end_colors(d, d.summands()[0]);
  for (std::size_t s = 1; s < d.summands().size(); ++s) {
    const auto h = summand_end_colors(d, d.summands()[s]);
    const Integer& b = h[ci(Corner::ne)];
    const Integer& c = h[ci(Corner::sw)];
    const Integer& e = h[ci(Corner::se)];
    const Integer B = acc[ci(Corner::ne)], C = acc[ci(Corner::sw)], D = acc[ci(Corner::se)];
    if (c != 0) {  // β = c, δ = D − B
      acc = {Integer(0), B * c + (D - B) * b, C * c, B * c + (D - B) * e};
    } else if (D != B) {  // β = 0: the left part is constant, the new summand carries the coloring
      acc = {Integer(0), b, Integer(0), e};
    } else {
      throw DomainError("the colorings of this sum do not determine its end colors (summand " +
                        std::to_string(s + 1) + " cannot be glued generically)");
    }
    Integer g = gcd(gcd(acc[1], acc[2]), acc[3]);
    if (g > 1)
      for (auto& v : acc) v /= g;
  }
  return EndColors{acc[0], acc[1], acc[2], acc[3]};
}

Fraction coloring_fraction(const Diagram& d) {
  const EndColors e = end_colors(d);
  const Integer num = e.nw - e.ne, den = e.sw - e.nw;
  if (num == 0 && den == 0) throw DomainError("the tangle's end colors are all equal: no coloring fraction");
  return Fraction(num, den);
}

std::string to_string(const PdCode& pd) {
  std::string s;
  for (const auto& x : pd) {
    if (!s.empty()) s += ' ';
    s += "X[" + std::to_string(x[0]) + ',' + std::to_string(x[1]) + ',' + std::to_string(x[2]) +
         ',' + std::to_string(x[3]) + ']';
  }
  return s;
}

}  // namespace fourplat
