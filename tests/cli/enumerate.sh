#!/usr/bin/env bash
# fourplat count, enumerate and family end to end: published counts, formula against the lists,
# shards, formats, filters, samples, errors, and an interrupt that leaves whole lines.
source "$(dirname "$0")/common.bash"

# ---- count ----
run count --crossings 3..12 --json
expect_rc 0 "count 3..12"
expect_no_stderr "count 3..12"
json_check 'all(all(k in r for k in ("crossings", "knots", "links", "knots_with_mirrors", "links_oriented")) for r in rows)' "count keys"
# Ernst–Sumners 1987, OEIS A018240: 2-bridge knots up to mirror image, n = 3 … 12.
json_check '[r["knots"] for r in rows] == [1, 1, 2, 3, 7, 12, 24, 45, 91, 176]' "knots (Ernst–Sumners 1987)"
# Rolfsen 1976, Appendix C (from memory): 7 crossings have 7 knots, 14 with mirrors.
json_check 'rows[4]["knots_with_mirrors"] == 14' "knots with mirrors at 7 crossings"
cp "$WORK/out" "$WORK/count_formula"

run count --crossings 0..16 --json --by-enumeration
expect_rc 0 "count by enumeration"
cp "$WORK/out" "$WORK/count_walk"
run count --crossings 0..16 --json
CHECKS=$((CHECKS + 1))
diff -q "$WORK/out" "$WORK/count_walk" >/dev/null || fail "count by formula differs from count by enumeration"

run count --crossings 10000 --json
expect_rc 0 "count 10000"
json_check 'isinstance(row["knots"], str) and len(row["knots"]) > 3000' "huge counts as decimal strings"
# Ernst–Sumners for n ≡ 0 (mod 4): (2^(n−3) + 2^((n−4)/2))/3.
json_check 'int(row["knots"]) == (2**9997 + 2**4998) // 3' "Ernst–Sumners at n = 10000"

run count --crossings 5
expect_rc 0 "count text"
expect_out_has "knots" "count text header"

# ---- enumerate: rows, counts, canonical forms ----
run enumerate --crossings 3..12 --knots
expect_rc 0 "enumerate knots 3..12"
json_check 'len(rows) == 1+1+2+3+7+12+24+45+91+176' "as many knots as Ernst–Sumners count"
json_check 'all(k in r for r in rows for k in ("p", "q", "canonical"))' "rows have p, q, canonical"
json_check 'all(r["canonical"] == "b(%d,%d)" % (r["p"], r["q"]) for r in rows)' "canonical is b(p,q)"
json_check 'len({(r["p"], r["q"]) for r in rows}) == len(rows)' "no duplicates"
# Schubert's theorem by hand: each row is the least q of {q, q⁻¹, −q, −q⁻¹} mod p.
json_check 'all(r["q"] == min(x % r["p"] for x in (r["q"], pow(r["q"], -1, r["p"]), -r["q"], -pow(r["q"], -1, r["p"]))) for r in rows)' "least q of the class up to mirror"

run enumerate --crossings 4 --fields canonical,fraction,twists,amphichiral
expect_rc 0 "enumerate 4"
# T(2,4) = b(4,1) and the figure-eight knot b(5,2) (amphichiral) — common practice.
json_check '[r["canonical"] for r in rows] == ["b(4,1)", "b(5,2)"]' "the classes of 4 crossings"
json_check '[r["amphichiral"] for r in rows] == [False, True]' "figure-eight amphichiral"
json_check '[r["twists"] for r in rows] == ["[4]", "[1 1 2]"]' "canonical twist sequences"

for flags in "" "--mirrors" "--links --oriented" "--knots --mirrors --oriented"; do
  # shellcheck disable=SC2086
  run enumerate --crossings 9 $flags --count
  n_list=$OUT
  case "$flags" in
    "") key='r["knots"] + r["links"]' ;;
    "--mirrors") key='r["knots_with_mirrors"] + r["links_with_mirrors"]' ;;
    "--links --oriented") key='r["links_oriented"]' ;;
    *) key='r["knots_with_mirrors"]' ;;
  esac
  run count --crossings 9 --json
  json_check "[$key for r in rows] == [$n_list]" "enumerate --crossings 9 $flags --count agrees with count"
done

# ---- shards: disjoint, complete, balanced ----
run enumerate --crossings 0..14
sort "$WORK/out" >"$WORK/whole"
: >"$WORK/parts"
for i in 1 2 3 4 5; do
  run enumerate --crossings 0..14 --shard "$i/5"
  expect_rc 0 "shard $i/5"
  wc -l <"$WORK/out" >>"$WORK/sizes"
  cat "$WORK/out" >>"$WORK/parts"
done
sort "$WORK/parts" >"$WORK/parts_sorted"
CHECKS=$((CHECKS + 1))
cmp -s "$WORK/whole" "$WORK/parts_sorted" || fail "the union of the 5 shards is not the whole list"
CHECKS=$((CHECKS + 1))
[[ -z "$(uniq -d "$WORK/parts_sorted")" ]] || fail "shards overlap"
CHECKS=$((CHECKS + 1))
read -r -d '' -a sizes <"$WORK/sizes"
[[ $(( ${sizes[0]} - ${sizes[4]} )) -le 1 && $(( ${sizes[4]} - ${sizes[0]} )) -le 1 ]] || fail "shards unbalanced: ${sizes[*]}"

# ---- formats and filters ----
run enumerate --crossings 6 --format csv --fields p,q,canonical,amphichiral
expect_rc 0 "csv"
expect_out_has 'p,q,canonical,amphichiral' "csv header"
expect_out_has '13,5,"b(13,5)",true' "csv row of 6_3 = b(13,5), amphichiral (Rolfsen, from memory)"
run enumerate --crossings 6 --format table
expect_rc 0 "table"
expect_out_has "crossing_number" "table header"
run enumerate --crossings 3..10 --knots --colorable 3 --fields p
json_check 'rows and all(r["p"] % 3 == 0 for r in rows)' "--colorable 3 keeps 3 | det"
run enumerate --crossings 3..10 --det-divisible-by 5 --fields p
json_check 'rows and all(r["p"] % 5 == 0 for r in rows)' "--det-divisible-by"
run enumerate --crossings 8 --knots --amphichiral --fields canonical
# 8_3, 8_9, 8_12 are the amphichiral 2-bridge knots of 8 crossings (Rolfsen, from memory).
json_check 'len(rows) == 3' "three amphichiral 2-bridge knots of 8 crossings"
run enumerate --tangles --crossings 3 --fields fraction,tangle_crossings
json_check 'len(rows) == 8 and all(r["tangle_crossings"] == 3 for r in rows)' "2^3 rational tangles of 3 crossings"
run enumerate --list-fields
expect_out_has "colorings" "--list-fields"

# ---- families ----
run family twist --range 1..6 --fields crossing_number,determinant
# Twist knots 3_1, 4_1, 5_2, 6_1, 7_2, 8_1 (Rolfsen, from memory).
json_check '[r["determinant"] for r in rows] == [3, 5, 7, 9, 11, 13]' "twist knot determinants"
json_check '[r["crossing_number"] for r in rows] == [3, 4, 5, 6, 7, 8]' "twist knot crossing numbers"
run family torus --range 2..7 --fields canonical,components
json_check '[r["canonical"] for r in rows] == ["b(%d,1)" % n for n in range(2, 8)]' "T(2,n) = b(n,1)"
run family double-twist --a 2..3 --b 2 --fields fraction
json_check '[r["fraction"] for r in rows] == ["5/2", "7/3"]' "[a b] = (ab+1)/a"
run family pattern '[1..3 1 1..3]' --unique --fields twists
json_check 'len(rows) == 6' "pattern with --unique"
run family sample --crossings 12 --knots --samples 50 --seed 3 --fields canonical
expect_rc 0 "sample"
cp "$WORK/out" "$WORK/sample_a"
run family sample --crossings 12 --knots --samples 50 --seed 3 --fields canonical
CHECKS=$((CHECKS + 1))
cmp -s "$WORK/out" "$WORK/sample_a" || fail "the same seed gives different samples"
run enumerate --crossings 12 --knots --fields canonical
sort -u "$WORK/out" >"$WORK/all12"
CHECKS=$((CHECKS + 1))
[[ -z "$(sort -u "$WORK/sample_a" | comm -23 - "$WORK/all12")" ]] || fail "a sample is not in the list"
run family tangles --crossings 9 --samples 20 --fields tangle_crossings
json_check 'len(rows) == 20 and all(r["tangle_crossings"] == 9 for r in rows)' "random tangles"

# ---- errors: one line, status 2 ----
for args in "enumerate" "enumerate --crossings 95" "enumerate --crossings 5..3" "enumerate --crossings 5 --shard 0/3" \
            "enumerate --crossings 5 --fields nosuch" "enumerate --crossings 5 --knots --links" \
            "count --crossings x" "family sample --crossings 3 --links" "family pattern [1..x]"; do
  # shellcheck disable=SC2086
  run $args
  expect_rc 2 "$args"
  expect_one_error_line "$args"
done

# ---- Ctrl-C leaves complete lines ----
"$TOOL" enumerate --crossings 28 >"$WORK/int" 2>"$WORK/int_err" &
pid=$!
sleep 0.5
kill -INT "$pid"
wait "$pid"
rc=$?
CHECKS=$((CHECKS + 1))
[[ "$rc" == 130 || "$rc" == 0 ]] || fail "interrupted enumerate exited with $rc"
CHECKS=$((CHECKS + 1))
if [[ -s "$WORK/int" && "$(tail -c 1 "$WORK/int" | od -An -c | tr -d ' ')" != '\n' ]]; then
  fail "interrupted output ends in a partial line"
fi
OUT="$(cat "$WORK/int")"
cp "$WORK/int" "$WORK/out"
[[ -s "$WORK/out" ]] && json_check 'all("canonical" in r for r in rows)' "every interrupted line parses"

finish
