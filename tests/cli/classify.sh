#!/usr/bin/env bash
# fourplat classify: arguments and stdin, text and JSON lines, bad lines among good ones, both
# closures, big numbers, sums, and the word fast path against the exact path.
source "$(dirname "$0")/common.bash"

keys='all(all(k in r for k in ("input", "fraction", "closure", "p", "q", "components", "determinant", "crossing_number", "amphichiral", "canonical", "canonical_mirror")) for r in rows)'

# Knots of the table of Rolfsen, "Knots and Links" (1976), Appendix C (from memory), by their
# Conway notation: 3_1 "3" det 3, 4_1 "2 2" det 5, 5_2 "3 2" det 7, 6_1 "4 2" det 9,
# 6_2 "3 1 2" det 11, 6_3 "2 1 1 2" det 13, 7_7 "2 1 1 1 2" det 21; crossing numbers 3..7.
run classify --json '[3]' '[2 2]' '[3 2]' '[4 2]' '[3 1 2]' '[2 1 1 2]' '[2 1 1 1 2]'
expect_rc 0 "classify table knots"
expect_no_stderr "classify table knots"
json_check "$keys" "classify keys"
json_check '[r["determinant"] for r in rows] == [3, 5, 7, 9, 11, 13, 21]' "determinants (Rolfsen)"
json_check '[r["crossing_number"] for r in rows] == [3, 4, 5, 6, 6, 6, 7]' "crossing numbers (Rolfsen)"
json_check '[r["amphichiral"] for r in rows] == [False, True, False, False, False, True, False]' "amphichirality (of these only 4_1 and 6_3 — Rolfsen, from memory)"
json_check 'all(r["components"] == 1 and 0 <= r["q"] < r["p"] for r in rows)' "Schubert form"
json_check 'rows[0]["fraction"] == "3" and rows[1]["fraction"] == "5/2" and rows[0]["closure"] == "numerator"' "fractions"
json_check 'rows[0]["canonical"] == "b(3,1)" and rows[1]["canonical_mirror"] == "b(5,2)"' "canonical forms"

# Degenerate closures: N(0) the unlink b(0,1), N(inf) the unknot b(1,0).
run classify --json 0 inf 1/0
json_check '[(r["p"], r["q"], r["components"]) for r in rows] == [(0, 1, 2), (1, 0, 1), (1, 0, 1)]' "unlink and unknot"
json_check 'rows[1]["fraction"] == "1/0" and rows[1]["kind"] == "unknot" and rows[0]["kind"] == "unlink"' "kinds of degenerate closures"

# Denominator closure: D(F) = N(-1/F); D(7/3) = N(-3/7) = b(3, 2) ~ trefoil; D(n) is the unknot.
run classify --json --closure denominator 7/3 5
json_check 'rows[0]["closure"] == "denominator" and (rows[0]["p"], rows[0]["q"]) == (3, 2) and rows[1]["p"] == 1' "denominator closures"

# stdin: blank lines and comments skipped; a bad line reported in place; the rest processed.
printf '# a comment\n3\n\n   \n5/2\n3/x\n  [2 1 1 2]  \r\n7/3' >"$WORK/in.txt"
STDIN_FILE="$WORK/in.txt" run classify --json
expect_rc 2 "stdin with a bad line exits 2"
json_check 'len(rows) == 5' "one JSON line per non-blank input line"
json_check 'rows[2] == {"input": "3/x", "line": 6, "error": rows[2]["error"]} and "expected" in rows[2]["error"]' "error record"
json_check '[r.get("fraction") for r in rows] == ["3", "5/2", None, "13/5", "7/3"]' "lines around the bad one"
expect_one_error_line "JSON mode: one summary line on stderr"

STDIN_FILE="$WORK/in.txt" run classify
expect_rc 2 "stdin text mode with a bad line"
expect_one_error_line "text mode: the bad line on stderr"
expect_err_has "line 6" "text mode: line number"
CHECKS=$((CHECKS + 1))
[[ $(grep -c '' <<<"$OUT") == 4 ]] || fail "text mode: 4 result lines expected, got: $OUT"
expect_out_has "N(5/2) = b(5,2)" "text mode line"

printf '3\n5\n' >"$WORK/good.txt"
STDIN_FILE="$WORK/good.txt" run classify
expect_rc 0 "all good lines"
expect_no_stderr "all good lines"

# Big numbers: JSON numbers while they fit int64, decimal strings beyond (2^63 - 1 and 2^63).
run classify --json 9223372036854775807/2 9223372036854775808/3 '[1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1 1]'
expect_rc 0 "big numbers"
json_check 'rows[0]["p"] == 9223372036854775807 and rows[0]["q"] == 2' "p = 2^63 - 1 is a number"
json_check 'rows[1]["p"] == "9223372036854775808" and rows[1]["determinant"] == "9223372036854775808"' "p = 2^63 is a string"
# [1 1 ... 1] with 100 ones is F(101)/F(100) (Fibonacci; OEIS A000045); crossing number 100.
json_check 'rows[2]["p"] == "573147844013817084101" and rows[2]["crossing_number"] == 100' "Fibonacci tangle"

# Sums: two parts close to a 2-bridge link, three or more parts are reported as not 2-bridge.
run classify --json '3/5 + 2/7' '1/2 + 1/3 + 1/5' '[2 1] + 3'
json_check 'rows[0]["two_bridge"] is True and rows[0]["determinant"] == 31 and rows[0]["fraction"] is None' "two-part sum"
json_check 'rows[1]["two_bridge"] is False and rows[1]["determinant"] == 31 and rows[1]["p"] is None and rows[1]["components"] == 1' "three-part sum"
json_check 'rows[2]["fraction"] == "9/2" and rows[2]["summands"] == ["3/2", "3"]' "a sum with an integer part is rational"

# Unquoted: words inside brackets and around '+' form one tangle.
run classify --json [2 1 1 2] 3/5 + 2/7 17/7
json_check '[r["input"] for r in rows] == ["[2 1 1 2]", "3/5 + 2/7", "17/7"]' "word grouping"

# JSON strings are escaped and stay valid UTF-8 whatever the input bytes.
printf '"\\\t\xff\n' >"$WORK/weird.txt"
STDIN_FILE="$WORK/weird.txt" run classify --json
expect_rc 2 "weird bytes"
json_check 'len(rows) == 1 and "error" in row and row["input"] == "\"\\\t\ufffd"' "escaped input"

# The word fast path and the exact path print the same bytes (random fractions around 2^62,
# small ones, negatives; both closures).
python3 - >"$WORK/random.txt" <<'PY'
import random
r = random.Random(20261201)
for i in range(3000):
    bits = r.choice([3, 10, 31, 62, 63, 64, 70])
    p = r.randrange(-2**bits, 2**bits); q = r.randrange(-2**bits, 2**bits) or 1
    print(f"{p}/{q}" if r.random() < 0.9 else f"{p}")
PY
for closure in numerator denominator; do
  for mode in --json ""; do
    STDIN_FILE="$WORK/random.txt" run classify $mode --closure $closure
    cp "$WORK/out" "$WORK/fast"
    STDIN_FILE="$WORK/random.txt" run classify $mode --closure $closure --no-fast-path
    CHECKS=$((CHECKS + 1))
    cmp -s "$WORK/fast" "$WORK/out" || fail "fast and exact paths differ ($closure $mode): $(diff "$WORK/fast" "$WORK/out" | head -5)"
  done
done

# Streaming: the answer to line 1 comes out while the input is still open (a FIFO kept open).
mkfifo "$WORK/fifo"
( printf '3\n'; sleep 20 ) >"$WORK/fifo" &
writer=$!
"$TOOL" classify --json <"$WORK/fifo" >"$WORK/stream" 2>/dev/null &
reader=$!
CHECKS=$((CHECKS + 1))
for _ in $(seq 1 100); do [[ -s "$WORK/stream" ]] && break; sleep 0.1; done
grep -q '"fraction":"3"' "$WORK/stream" || fail "streaming: no output for line 1 while the input is open"
kill "$writer" 2>/dev/null
wait "$writer" 2>/dev/null
wait "$reader"

finish
