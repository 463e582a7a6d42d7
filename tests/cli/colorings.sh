#!/usr/bin/env bash
# fourplat colorings (and its agreement with fourplat diagram): counts against Fox's formula,
# witnesses checked crossing by crossing on the arcs that `diagram --json` exports.
source "$(dirname "$0")/common.bash"

# The trefoil has 9 Fox 3-colorings (Fox 1962; n·gcd(n, det) — common practice).
run colorings '[3]' --modulus 3 --json
expect_rc 0 "trefoil 3-colorings"
json_check 'row["count"] == 9 and row["colorable"] is True and len(row["coloring"]) == row["arcs"] == 3' "trefoil: 9 colorings, 3 arcs"
json_check 'sorted(row["coloring"]) == [0, 1, 2] and row["modulus"] == 3' "trefoil witness uses all three colors"

# The figure-eight knot (det 5): not 3-colorable, 25 five-colorings.
run colorings 5/2 --modulus 3 --json
json_check 'row["count"] == 3 and row["coloring"] is None and row["colorable"] is False' "figure-eight not 3-colorable"
run colorings 5/2 -n 5 --json
json_check 'row["count"] == 25 and row["coloring"] is not None' "figure-eight 5-colorable"

# The unlink N(0): n² colorings (one free color per component).
run colorings 0 -n 4 --json
json_check 'row["count"] == 16' "unlink: n^2 colorings"

# Text mode.
run colorings '[3]' -n 3
expect_rc 0 "text mode"
expect_out_has "9 Fox 3-colorings" "text count"
expect_out_has "witness on the 3 arcs" "text witness"

# Bad moduli and tangles: exit 2, one line.
for bad in 0 -3 x ''; do
  run colorings 3 --modulus "$bad"
  expect_rc 2 "modulus '$bad'"
  expect_one_error_line "modulus '$bad'"
done
run colorings 3
expect_rc 2 "missing --modulus"
expect_one_error_line "missing --modulus"

# Witness against the diagram: for each tangle, closure and modulus, the coloring of
# `colorings --json` satisfies Fox's rule 2·over ≡ under_in + under_out (mod n) at every
# crossing of the PD code of `diagram --json` (X[i,j,k,l]: under-strand i → k, over j and l).
check_fox() {  # TANGLE CLOSURE N EXTRA...
  local tangle=$1 closure=$2 n=$3
  shift 3
  "$TOOL" colorings "$tangle" --closure "$closure" -n "$n" --json "$@" >"$WORK/c.json" 2>"$WORK/err" || { fail "colorings $tangle $closure $n: $(cat "$WORK/err")"; return; }
  "$TOOL" diagram "$tangle" --closure "$closure" --json "$@" >"$WORK/d.json" 2>"$WORK/err" || { fail "diagram $tangle $closure: $(cat "$WORK/err")"; return; }
  CHECKS=$((CHECKS + 1))
  python3 - "$WORK/c.json" "$WORK/d.json" <<'PY' || fail "Fox's rule on the exported diagram: $tangle $closure mod $n"
import json, sys, math
c = json.load(open(sys.argv[1])); d = json.load(open(sys.argv[2]))
n = c["modulus"]
arc_of = {}
for a, edges in enumerate(d["arcs"]):
    for e in edges:
        arc_of[e] = a
assert c["arcs"] == len(d["arcs"]), "arc counts differ"
det = int(c["determinant"])
if c["link"] is not None:  # 2-bridge: n·gcd(n, det); a Montesinos link need not be (H₁ not cyclic)
    expected = n * math.gcd(n, det)
    assert c["count"] == expected, f"count {c['count']} != n*gcd(n,det) = {expected}"
col = c["coloring"]
assert (col is None) == (c["count"] == n), "a witness exactly when there are non-constant colorings"
if col is None:
    sys.exit(0)
assert len(col) == len(d["arcs"])
assert len(set(col)) > 1, "witness is constant"
for x in d["pd"]:
    i, j, k, l = x
    over = col[arc_of[j]]
    assert col[arc_of[l]] == over, "over-arc changes color"
    assert (2 * over - col[arc_of[i]] - col[arc_of[k]]) % n == 0, f"Fox's rule fails at {x}"
PY
}
for t in '[3]' '[2 2]' '[2 1 1 2]' '[3 1 4 1 5]' '17/7' '[2 -3 4]' '3/5 + 2/7' '1/3 + 1/3 + 1/3'; do
  for closure in numerator denominator; do
    for n in 3 13; do check_fox "$t" "$closure" "$n"; done
  done
done
check_fox '[2 1 1 2]' numerator 13 --canonical

# 1/3 + 1/3 + 1/3 closes to a Montesinos link (not 2-bridge), det |3·(1·3·3)| = 27: its
# colorings come from the Smith form, and three twist regions of 3 crossings give more
# 3-colorings than the cyclic formula 3·gcd(3, 27) = 9 (the double cover's H₁ is not cyclic).
run colorings '1/3 + 1/3 + 1/3' -n 3 --json
json_check 'row["link"] is None and row["determinant"] == 27 and row["count"] > 9' "Montesinos 3-colorings by Smith form"

finish
