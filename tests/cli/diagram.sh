#!/usr/bin/env bash
# fourplat diagram and fourplat pd: codes out, PD in, the same invariants both ways.
source "$(dirname "$0")/common.bash"

# The right-handed trefoil N([3]): three crossings, writhe +3 (docs/conventions.md), DT code
# 4 6 2 (common practice).
run diagram '[3]' --json
expect_rc 0 "diagram --json"
json_check 'all(k in row for k in ("pd", "components", "crossings", "writhe", "arcs"))' "diagram keys"
json_check 'row["crossings"] == 3 and row["writhe"] == 3 and row["components"] == 1 and len(row["pd"]) == 3 and all(len(x) == 4 for x in row["pd"])' "trefoil diagram"
json_check 'sorted(e for a in row["arcs"] for e in a) == list(range(1, 7))' "arcs cover the edges once"
run diagram '[3]' --format dt
expect_out_has "4 6 2" "trefoil DT code"
run diagram '[3]'
expect_out_has "X[" "PD text"
run diagram '[3]' --format gauss
expect_out_has "signs: + + +" "Gauss signs"

# Crossingless closures are reported as such.
run diagram 0
expect_rc 0 "unlink diagram"
expect_out_has "two-component unlink" "N(0) named"
run diagram inf --format dt
expect_out_has "the unknot" "N(inf) named"

# A DT code of a link is an error (exit 2, one line).
run diagram 2 --format dt
expect_rc 2 "DT of a link"
expect_one_error_line "DT of a link"

# The open tangle.
run diagram '[3 2]' --closure none --json
json_check 'row["closure"] == "none" and row["crossings"] == 5 and row["components"] == 2' "open tangle"

# -o FILE, and SVG output is XML with an <svg> root.
run diagram '[2 1 2]' --format svg --coloring 2 -o "$WORK/k.svg"
expect_rc 0 "svg to a file"
CHECKS=$((CHECKS + 1))
python3 -c 'import sys, xml.dom.minidom as m; d = m.parse(sys.argv[1]); assert d.documentElement.tagName == "svg"' "$WORK/k.svg" || fail "svg is not well-formed XML with an svg root"
run diagram '[2 1 2]' --format svg --coloring 3
expect_rc 2 "svg coloring that does not exist"
expect_one_error_line "svg coloring that does not exist"
run diagram '[3]' --format svg --json
expect_rc 2 "--json with svg"

# PD out -> PD in: the same components, writhe and determinant; colorings by Smith form agree
# with n·gcd(n, det).
for t in '[3]' '[2 2]' '[2 1 1 2]' '[3 1 4 1 5]' '[2 2 2]' '12/5' '3/5 + 2/7' '1/2 + 1/3 + 1/5'; do
  for closure in numerator denominator; do
    "$TOOL" diagram "$t" --closure "$closure" --json >"$WORK/d.json"
    "$TOOL" diagram "$t" --closure "$closure" >"$WORK/d.pd"
    "$TOOL" classify "$t" --closure "$closure" --json >"$WORK/c.json"
    if grep -q '^#' "$WORK/d.pd"; then continue; fi  # crossingless: nothing to read back
    STDIN_FILE="$WORK/d.pd" run pd - --modulus 3 --json
    expect_rc 0 "pd - for $t $closure"
    CHECKS=$((CHECKS + 1))
    python3 - "$WORK/out" "$WORK/d.json" "$WORK/c.json" <<'PY' || fail "PD round trip: $t $closure"
import json, sys, math
p = json.load(open(sys.argv[1])); d = json.load(open(sys.argv[2])); c = json.load(open(sys.argv[3]))
assert p["components"] == d["components"] == c["components"], (p["components"], d["components"], c["components"])
assert p["writhe"] == d["writhe"], (p["writhe"], d["writhe"])
assert p["determinant"] == c["determinant"], (p["determinant"], c["determinant"])
assert p["colorings"] == 3 * math.gcd(3, c["determinant"]), p["colorings"]
PY
  done
done

# pd: the three input forms, and bad input.
printf 'X[4,2,5,1] X[2,6,3,5] X[6,4,1,3]\n' >"$WORK/a.pd"
printf '[[4,2,5,1],[2,6,3,5],[6,4,1,3]]\n' >"$WORK/b.pd"
printf '# trefoil\n4 2 5 1\n2,6,3,5\n6 4 1 3\n' >"$WORK/c.pd"
for f in a b c; do
  run pd "$WORK/$f.pd" --json --modulus 3
  expect_rc 0 "pd form $f"
  json_check 'row["components"] == 1 and row["determinant"] == 3 and row["colorings"] == 9 and row["writhe"] in (3, -3)' "pd form $f: trefoil"
done
run pd "$WORK/a.pd"
expect_out_has "determinant" "pd text"
printf 'X[1,2,3]\n' >"$WORK/bad.pd"
run pd "$WORK/bad.pd"
expect_rc 2 "malformed PD"
expect_one_error_line "malformed PD"
printf 'X[1,2,3,4]\n' >"$WORK/bad2.pd"
run pd "$WORK/bad2.pd"
expect_rc 2 "invalid PD"
expect_one_error_line "invalid PD"
run pd "$WORK/no-such-file.pd"
expect_rc 2 "missing file"
expect_one_error_line "missing file"

finish
