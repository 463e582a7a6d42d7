#!/usr/bin/env bash
# fourplat show: the labelled summary and its JSON form.
source "$(dirname "$0")/common.bash"

# The figure-eight knot 4_1 = N(5/2): determinant 5, crossing number 4, amphichiral
# (Rolfsen 1976, Appendix C — from memory); D(5/2) = N(-2/5) is the Hopf link b(2,1).
run show 5/2
expect_rc 0 "show 5/2"
expect_no_stderr "show 5/2"
for s in "fraction" "5/2" "twists (canonical)" "[1 1 2]" "crossing number" "connectivity" \
         "numerator closure" "denominator closure" "b(5,2)" "b(2,1)" "determinant" "amphichiral" \
         "3-colorable"; do
  expect_out_has "$s" "show 5/2 shows $s"
done

run show '[2 1 1 2]'
expect_rc 0 "show twists"
expect_out_has "twists (given)" "given twists shown"
expect_out_has "13/5" "[2 1 1 2] = 13/5"

# Unquoted twist sequences and sums are joined back into one tangle.
run show [2 2]
expect_rc 0 "show unquoted twists"
expect_out_has "5/2" "[2 2] = 5/2"

run show 5/2 --json
expect_rc 0 "show --json"
json_check 'len(rows) == 1 and row["fraction"] == "5/2" and row["crossing_number"] == 4' "show --json fraction"
json_check 'row["numerator"]["link"] == "b(5,2)" and row["numerator"]["amphichiral"] is True and row["numerator"]["determinant"] == 5' "show --json numerator"
json_check 'row["denominator"]["link"] == "b(2,1)" and row["denominator"]["components"] == 2' "show --json denominator"
json_check 'row["connectivity"] in ("[0]", "[1]", "[inf]") and row["canonical_twists"] == "[1 1 2]"' "show --json twists"

# The right-handed trefoil N([3]) = b(3,1): 3-colorable (det 3).
run show 3 --json
json_check 'row["numerator"]["three_colorable"] is True and row["numerator"]["kind"] == "torus"' "trefoil 3-colorable"

# A sum of three non-integer parts: not 2-bridge; det N(1/2 + 1/3 + 1/5) = |1·3·5 + 2·1·5 + 2·3·1| = 31.
run show '1/2 + 1/3 + 1/5' --json
expect_rc 0 "show sum"
json_check 'row["numerator"]["two_bridge"] is False and row["numerator"]["determinant"] == 31 and len(row["summands"]) == 3' "show sum json"
run show 1/2 + 1/3 + 1/5
expect_rc 0 "show unquoted sum"
expect_out_has "not a 2-bridge link" "show sum text"

# A sum of two: 2-bridge (Ernst–Sumners); det N(3/5 + 2/7) = 3·7 + 5·2 = 31.
run show '3/5 + 2/7' --json
json_check 'row["numerator"]["two_bridge"] is True and row["numerator"]["determinant"] == 31' "show two-part sum"

run show 3 5
expect_rc 2 "show with two tangles"
expect_one_error_line "show with two tangles"

finish
