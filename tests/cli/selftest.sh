#!/usr/bin/env bash
# fourplat selftest passes on this build, and says so in its last line.
source "$(dirname "$0")/common.bash"
run selftest
expect_rc 0 "selftest"
expect_out_has " 0 failed" "selftest summary"
run selftest --quiet
expect_rc 0 "selftest --quiet"
CHECKS=$((CHECKS + 1))
[[ $(grep -c '' <<<"$OUT") == 1 ]] || fail "selftest --quiet prints only the summary: $OUT"
finish
