// PD codes: parsing, validation and fraction-free invariants (include/fourplat/pd.hpp).
#include "fourplat/pd.hpp"

#include <algorithm>
#include <cctype>
#include <numeric>
#include <string>

#include "detail/smith.hpp"
#include "fourplat/error.hpp"

namespace fourplat {

// ---- Parsing ----

namespace {

class Cursor {
 public:
  explicit Cursor(std::string_view t) : t_(t) {}
  /// Skips spaces, tabs, carriage returns and comments (not new lines when `keep_newlines`).
  void skip(bool keep_newlines = false) {
    while (i_ < t_.size()) {
      const char c = t_[i_];
      if (c == '#') {
        while (i_ < t_.size() && t_[i_] != '\n') ++i_;
      } else if (c == ' ' || c == '\t' || c == '\r' || (c == '\n' && !keep_newlines)) {
        ++i_;
      } else {
        break;
      }
    }
  }
  [[nodiscard]] bool done() const { return i_ >= t_.size(); }
  [[nodiscard]] char peek() const { return done() ? '\0' : t_[i_]; }
  [[nodiscard]] std::size_t pos() const { return i_; }
  void advance() { ++i_; }
  void expect(char c, const char* what) {
    skip();
    if (peek() != c)
      throw ParseError(i_, std::string("expected ") + what + (done() ? ", found the end of the input"
                                                                      : std::string(", found '") + peek() + "'"));
    ++i_;
  }
  /// A positive decimal label.
  std::int64_t label() {
    skip();
    const std::size_t start = i_;
    if (peek() == '-' || peek() == '+') {
      if (peek() == '-') throw ParseError(i_, "expected a positive edge label, found a minus sign");
      ++i_;
    }
    if (!std::isdigit(static_cast<unsigned char>(peek())))
      throw ParseError(i_, std::string("expected an edge label (a positive integer)") +
                               (done() ? ", found the end of the input" : std::string(", found '") + peek() + "'"));
    std::int64_t v = 0;
    while (std::isdigit(static_cast<unsigned char>(peek()))) {
      if (v > (std::int64_t{1} << 58)) throw ParseError(start, "edge label too large");
      v = v * 10 + (peek() - '0');
      ++i_;
    }
    if (v == 0) throw ParseError(start, "edge labels start at 1, found 0");
    return v;
  }

 private:
  std::string_view t_;
  std::size_t i_ = 0;
};

/// Four labels separated by commas and/or spaces, closed by `close` (or by the end of a line).
std::array<std::int64_t, 4> four_labels(Cursor& c, char close) {
  std::array<std::int64_t, 4> x{};
  for (std::size_t k = 0; k < 4; ++k) {
    if (k > 0) {
      c.skip(close == '\n');
      if (c.peek() == ',') c.advance();
    }
    if (close == '\n') {
      c.skip(true);
      if (c.peek() == '\n' || c.done())
        throw ParseError(c.pos(), "expected 4 labels on this line, found " + std::to_string(k));
    }
    x[k] = c.label();
  }
  if (close != '\n') {
    c.skip();
    if (c.peek() == ',')
      throw ParseError(c.pos(), "a crossing has exactly 4 labels; found a fifth");
    c.expect(close, close == ']' ? "']' after the 4 labels of a crossing" : "end of crossing");
  }
  return x;
}

}  // namespace

PdCode parse_pd(std::string_view text) {
  Cursor c(text);
  PdCode pd;
  c.skip();
  if (c.done()) throw ParseError(c.pos(), "empty PD code: expected X[i,j,k,l] items, [[i,j,k,l],...] or 4 labels a line");
  if (c.peek() == '[') {  // [[a,b,c,d], ...]
    c.advance();
    c.skip();
    while (c.peek() != ']') {
      if (!pd.empty()) {
        c.expect(',', "',' or ']' between crossings");
        c.skip();
      }
      c.expect('[', "'[' opening a crossing");
      pd.push_back(four_labels(c, ']'));
      c.skip();
      if (c.done()) throw ParseError(c.pos(), "expected ']' closing the list, found the end of the input");
    }
    c.advance();
  } else if (c.peek() == 'X' || c.peek() == 'x') {  // X[a,b,c,d] X[...] ...
    while (!c.done()) {
      if (c.peek() != 'X' && c.peek() != 'x')
        throw ParseError(c.pos(), std::string("expected 'X[' starting a crossing, found '") + c.peek() + "'");
      c.advance();
      if (c.peek() != '[') throw ParseError(c.pos(), "expected '[' right after X");
      c.advance();
      pd.push_back(four_labels(c, ']'));
      c.skip();
      if (c.peek() == ',') {
        c.advance();
        c.skip();
      }
    }
  } else {  // lines of four labels
    while (!c.done()) {
      pd.push_back(four_labels(c, '\n'));
      c.skip(true);
      if (c.peek() == ',') {
        c.advance();
        c.skip(true);
      }
      if (!c.done() && c.peek() != '\n')
        throw ParseError(c.pos(), "expected the end of the line after 4 labels (one crossing a line)");
      c.skip();
    }
  }
  c.skip();
  if (!c.done()) throw ParseError(c.pos(), std::string("unexpected '") + c.peek() + "' after the PD code");
  if (pd.empty()) throw ParseError(c.pos(), "empty PD code: no crossing given");
  return pd;
}

// ---- Validation and invariants ----

namespace {

std::string show(const PdCode& pd, std::size_t x) {
  const auto& r = pd[x];
  return "crossing " + std::to_string(x + 1) + " (X[" + std::to_string(r[0]) + "," + std::to_string(r[1]) +
         "," + std::to_string(r[2]) + "," + std::to_string(r[3]) + "])";
}

struct Slot {
  std::int64_t x = -1;
  int p = 0;
  friend bool operator==(const Slot&, const Slot&) = default;
};

std::int64_t find(std::vector<std::int64_t>& parent, std::int64_t a) {
  while (parent[static_cast<std::size_t>(a)] != a) {
    parent[static_cast<std::size_t>(a)] = parent[static_cast<std::size_t>(parent[static_cast<std::size_t>(a)])];
    a = parent[static_cast<std::size_t>(a)];
  }
  return a;
}

}  // namespace

PdDiagram::PdDiagram(PdCode code) : code_(std::move(code)) {
  const auto c = static_cast<std::int64_t>(code_.size());
  if (c == 0) throw DomainError("empty PD code: a diagram with no crossing has no PD code");
  const std::int64_t E = 2 * c;
  auto L = [](std::int64_t label) { return static_cast<std::size_t>(label); };

  // 1. Every label in 1..2c, exactly twice.
  std::vector<std::array<Slot, 2>> slots(static_cast<std::size_t>(E + 1));
  std::vector<int> uses(static_cast<std::size_t>(E + 1), 0);
  for (std::int64_t x = 0; x < c; ++x)
    for (int p = 0; p < 4; ++p) {
      const std::int64_t e = code_[static_cast<std::size_t>(x)][static_cast<std::size_t>(p)];
      if (e < 1 || e > E)
        throw DomainError(show(code_, static_cast<std::size_t>(x)) + ": label " + std::to_string(e) +
                          " is outside 1.." + std::to_string(E) + " (a PD code with " + std::to_string(c) +
                          " crossings has the edges 1.." + std::to_string(E) + ")");
      if (uses[L(e)] == 2)
        throw DomainError(show(code_, static_cast<std::size_t>(x)) + ": label " + std::to_string(e) +
                          " appears a third time (each edge joins exactly two crossing slots)");
      slots[L(e)][static_cast<std::size_t>(uses[L(e)]++)] = Slot{x, p};
    }
  for (std::int64_t e = 1; e <= E; ++e)
    if (uses[L(e)] != 2)
      throw DomainError("label " + std::to_string(e) + " appears " + std::to_string(uses[L(e)]) +
                        " time(s); each edge label must appear exactly twice");
  auto label_at = [&](Slot s) { return code_[static_cast<std::size_t>(s.x)][static_cast<std::size_t>(s.p)]; };
  auto other = [&](std::int64_t e, Slot s) { return slots[L(e)][0] == s ? slots[L(e)][1] : slots[L(e)][0]; };
  auto through = [](Slot s) { return Slot{s.x, (s.p + 2) % 4}; };

  // 2. Components: follow each strand straight through the crossings; orient by the labels.
  std::vector<Slot> head(static_cast<std::size_t>(E + 1));
  std::vector<int> comp_of(static_cast<std::size_t>(E + 1), -1);
  struct Comp {
    std::int64_t first, size;
  };
  std::vector<Comp> comps;
  std::vector<std::int64_t> seq;
  std::vector<Slot> heads;
  for (std::int64_t e0 = 1; e0 <= E; ++e0) {
    if (comp_of[L(e0)] >= 0) continue;
    seq.clear();
    heads.clear();
    std::int64_t e = e0;
    Slot h = slots[L(e0)][0];
    do {
      seq.push_back(e);
      heads.push_back(h);
      comp_of[L(e)] = 0;  // provisional mark
      const Slot t = through(h);
      e = label_at(t);
      h = other(e, t);
    } while (!(e == e0 && h == slots[L(e0)][0]));
    const auto m = static_cast<std::int64_t>(seq.size());
    const std::int64_t lo = *std::min_element(seq.begin(), seq.end());
    const std::int64_t hi = *std::max_element(seq.begin(), seq.end());
    if (hi - lo + 1 != m)
      throw DomainError("the component through edge " + std::to_string(e0) + " has the labels " +
                        std::to_string(lo) + ".." + std::to_string(hi) + " but only " + std::to_string(m) +
                        " edges: labels must be consecutive along each component");
    auto next = [&](std::int64_t v) { return v == hi ? lo : v + 1; };
    auto prev = [&](std::int64_t v) { return v == lo ? hi : v - 1; };
    bool fwd = true, bwd = true;
    std::size_t bad = 0;
    for (std::size_t k = 0; k < seq.size(); ++k) {
      const std::int64_t a = seq[k], b = seq[(k + 1) % seq.size()];
      if (b != next(a) && fwd) { fwd = false; bad = k; }
      if (b != prev(a)) bwd = false;
    }
    if (!fwd && !bwd)
      throw DomainError("labels do not run consecutively along the component through edge " +
                        std::to_string(e0) + ": edge " + std::to_string(seq[bad]) + " is followed by edge " +
                        std::to_string(seq[(bad + 1) % seq.size()]));
    bool forward = fwd && !bwd;
    if (fwd && bwd) {  // one or two edges: the labels do not fix the direction
      std::optional<bool> decided;
      for (const Slot& s : heads)
        if (s.p == 0 || s.p == 2) { decided = s.p == 0; break; }
      forward = decided.value_or(heads[0].p == 1);
    }
    for (std::size_t k = 0; k < seq.size(); ++k) {
      const std::int64_t v = seq[k];
      comp_of[L(v)] = static_cast<int>(comps.size());
      // Forward: the walk's head slots. Backward: each edge enters where the walk left it.
      head[L(v)] = forward ? heads[k] : other(v, heads[k]);
    }
    comps.push_back(Comp{lo, m});
  }
  // Order components by their first label.
  std::vector<std::size_t> order(comps.size());
  std::iota(order.begin(), order.end(), 0);
  std::sort(order.begin(), order.end(), [&](std::size_t a, std::size_t b) { return comps[a].first < comps[b].first; });
  std::vector<int> rank(comps.size());
  for (std::size_t k = 0; k < order.size(); ++k) {
    rank[order[k]] = static_cast<int>(k);
    component_first_.push_back(comps[order[k]].first);
    component_size_.push_back(comps[order[k]].size);
  }
  for (std::int64_t e = 1; e <= E; ++e) comp_of[L(e)] = rank[static_cast<std::size_t>(comp_of[L(e)])];

  // The under-strand must enter at i and leave at k.
  for (std::int64_t x = 0; x < c; ++x) {
    const std::int64_t i = code_[static_cast<std::size_t>(x)][0];
    if (!(head[L(i)] == Slot{x, 0}))
      throw DomainError(show(code_, static_cast<std::size_t>(x)) + ": along its component the under-strand runs from " +
                        std::to_string(code_[static_cast<std::size_t>(x)][2]) + " to " + std::to_string(i) +
                        ", but i (the first label) must be the incoming under-edge");
  }

  // 3. Planarity: faces are the orbits of (x, p) → (other end of its edge, turned by one slot).
  {
    std::vector<char> seen(static_cast<std::size_t>(4 * c), 0);
    std::int64_t faces = 0;
    for (std::int64_t d0 = 0; d0 < 4 * c; ++d0) {
      if (seen[static_cast<std::size_t>(d0)]) continue;
      ++faces;
      std::int64_t d = d0;
      while (!seen[static_cast<std::size_t>(d)]) {
        seen[static_cast<std::size_t>(d)] = 1;
        const Slot s{d / 4, static_cast<int>(d % 4)};
        const Slot o = other(label_at(s), s);
        d = 4 * o.x + (o.p + 1) % 4;
      }
    }
    std::vector<std::int64_t> parent(static_cast<std::size_t>(c));
    std::iota(parent.begin(), parent.end(), 0);
    for (std::int64_t e = 1; e <= E; ++e) {
      const std::int64_t a = find(parent, slots[L(e)][0].x), b = find(parent, slots[L(e)][1].x);
      if (a != b) parent[static_cast<std::size_t>(a)] = b;
    }
    for (std::int64_t x = 0; x < c; ++x) pieces_ += find(parent, x) == x ? 1 : 0;
    if (faces != c + 2 * pieces_)
      throw DomainError("not a planar diagram: tracing the faces gives F = " + std::to_string(faces) +
                        ", but Euler's formula V - E + F = 2 (per connected piece) with V = " + std::to_string(c) +
                        " crossings and E = " + std::to_string(E) + " edges in " + std::to_string(pieces_) +
                        " piece(s) needs F = " + std::to_string(c + 2 * pieces_));
  }

  // 4. Arcs: one starts at every edge that leaves an under-passage (label k of some crossing).
  std::vector<char> starts(static_cast<std::size_t>(E + 1), 0);
  for (std::int64_t x = 0; x < c; ++x) starts[L(code_[static_cast<std::size_t>(x)][2])] = 1;
  std::vector<std::int64_t> arc_of(static_cast<std::size_t>(E + 1), -1);
  for (std::size_t k = 0; k < component_first_.size(); ++k) {
    const std::int64_t lo = component_first_[k], m = component_size_[k];
    bool any = false;
    for (std::int64_t v = lo; v < lo + m; ++v) any = any || starts[L(v)];
    if (!any) {
      std::vector<std::int64_t> a;
      for (std::int64_t v = lo; v < lo + m; ++v) {
        a.push_back(v);
        arc_of[L(v)] = static_cast<std::int64_t>(arcs_.size());
      }
      arcs_.push_back(std::move(a));
      continue;
    }
    for (std::int64_t v0 = lo; v0 < lo + m; ++v0) {
      if (!starts[L(v0)]) continue;
      std::vector<std::int64_t> a;
      std::int64_t v = v0;
      for (;;) {
        a.push_back(v);
        arc_of[L(v)] = static_cast<std::int64_t>(arcs_.size());
        if (head[L(v)].p == 0) break;  // enters an under-passage
        v = v + 1 == lo + m ? lo : v + 1;
      }
      arcs_.push_back(std::move(a));
    }
  }

  // 5. Orientation and signs of the crossings.
  for (std::int64_t x = 0; x < c; ++x) {
    const auto& r = code_[static_cast<std::size_t>(x)];
    PdCrossing pc;
    pc.labels = r;
    pc.over_j_to_l = head[L(r[1])] == Slot{x, 1};
    pc.sign = pc.over_j_to_l ? -1 : 1;  // over W→E (l → j) across an under-strand S→N is positive
    pc.over_component = comp_of[L(r[1])];
    pc.under_component = comp_of[L(r[0])];
    pc.over_arc = arc_of[L(r[1])];
    pc.under_in_arc = arc_of[L(r[0])];
    pc.under_out_arc = arc_of[L(r[2])];
    writhe_ += pc.sign;
    crossings_.push_back(pc);
  }
}

const detail::SmithForm& PdDiagram::smith() const {
  if (!smith_) {  // the coloring matrix: 2·over − under_in − under_out per crossing
    std::vector<detail::SparseRow> rows;
    rows.reserve(crossings_.size());
    for (const auto& pc : crossings_)
      rows.push_back({{pc.over_arc, Integer(2)}, {pc.under_in_arc, Integer(-1)}, {pc.under_out_arc, Integer(-1)}});
    smith_ = std::make_unique<detail::SmithForm>(static_cast<std::int64_t>(arcs_.size()), std::move(rows));
  }
  return *smith_;
}

PdDiagram::~PdDiagram() = default;
PdDiagram::PdDiagram(PdDiagram&&) noexcept = default;
PdDiagram& PdDiagram::operator=(PdDiagram&&) noexcept = default;

std::vector<int> PdDiagram::signs() const {
  std::vector<int> s;
  for (const auto& x : crossings_) s.push_back(x.sign);
  return s;
}

std::int64_t PdDiagram::linking_number(int i, int j) const {
  if (i < 0 || j < 0 || i >= components() || j >= components() || i == j)
    throw DomainError("linking number needs two different components (0.." + std::to_string(components() - 1) + ")");
  std::int64_t sum = 0;
  for (const auto& x : crossings_)
    if ((x.over_component == i && x.under_component == j) || (x.over_component == j && x.under_component == i))
      sum += x.sign;
  return sum / 2;
}

std::optional<std::int64_t> PdDiagram::linking_number() const {
  if (components() != 2) return std::nullopt;
  return linking_number(0, 1);
}

Integer PdDiagram::determinant() const {
  if (smith().rank() != smith().cols() - 1) return Integer(0);
  Integer d = 1;
  for (const auto& f : smith().nontrivial_factors()) d *= f;
  return d;
}

std::vector<Integer> PdDiagram::invariant_factors() const { return smith().nontrivial_factors(); }

Integer PdDiagram::coloring_count(const Integer& n) const { return smith().count_solutions_mod(n); }

std::optional<std::vector<Integer>> PdDiagram::coloring_witness(const Integer& n) const {
  for (auto& x : smith().solution_generators_mod(n)) {
    const Integer shift = x[0];
    bool constant = true;
    for (auto& v : x) {
      v = mod_floor(v - shift, n);  // constants are colorings: start the witness at color 0
      if (v != 0) constant = false;
    }
    if (!constant) return x;
  }
  return std::nullopt;
}

}  // namespace fourplat
