#!/usr/bin/env bash
# fourplat compare: tangles by Conway's theorem, closures by Schubert's; exit 0 whatever the answer.
source "$(dirname "$0")/common.bash"

keys='all(k in row for k in ("tangles_equal", "closures_equal", "closures_equal_up_to_mirror", "closures_equal_oriented"))'

# 7/2 and 7/4: different tangles; b(7,2) = b(7,4) since 2·4 ≡ 1 (mod 7) (Schubert 1956).
run compare 7/2 7/4 --json
expect_rc 0 "compare 7/2 7/4"
json_check "$keys" "compare keys"
json_check 'row["tangles_equal"] is False and row["closures_equal"] is True and row["closures_equal_up_to_mirror"] is True' "7/2 vs 7/4"

# Conway's theorem: [3 2] = 2 + 1/3 = 7/3.
run compare '[3 2]' 7/3 --json
json_check 'row["tangles_equal"] is True and row["closures_equal"] is True' "[3 2] vs 7/3"

# The two trefoils N(3), N(-3) are mirror images, not the same (the trefoil is chiral).
run compare 3 -3 --json
expect_rc 0 "compare trefoils (answer no: still exit 0)"
json_check 'row["tangles_equal"] is False and row["closures_equal"] is False and row["closures_equal_up_to_mirror"] is True' "trefoils"

# The figure-eight knot is amphichiral: N(5/2) = N(-5/2).
run compare 5/2 -5/2 --json
json_check 'row["closures_equal"] is True' "figure-eight amphichiral"

# Different determinants: different closures even for sums that are not 2-bridge.
run compare '1/2+1/3+1/5' '1/2+1/3+1/7' --json
json_check 'row["closures_equal"] is False and row["tangles_equal"] is None' "sums with different determinants"

# Denominator closures: D(3) = N(-1/3) is the unknot, and so is D(5).
run compare 3 5 --closure denominator --json
json_check 'row["closures_equal"] is True and row["closure"] == "denominator"' "D(3) = D(5) = unknot"

run compare 7/2 7/4
expect_rc 0 "compare text"
expect_out_has "tangles isotopic" "compare text labels"

run compare 7/2
expect_rc 2 "compare with one tangle"
expect_one_error_line "compare with one tangle"
run compare 7/2 x
expect_rc 2 "compare with a bad tangle"
expect_one_error_line "compare with a bad tangle"

finish
