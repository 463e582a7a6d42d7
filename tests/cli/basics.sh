#!/usr/bin/env bash
# The tool as a whole: help, version, exit statuses and the one-line error format.
source "$(dirname "$0")/common.bash"

run --help
expect_rc 0 "--help"
expect_out_has "Examples:" "--help teaches by example"
for cmd in show classify compare colorings; do expect_out_has "$cmd" "--help lists $cmd"; done

for cmd in show classify compare; do
  run "$cmd" --help
  expect_rc 0 "$cmd --help"
  expect_out_has "Examples:" "$cmd --help has examples"
done

run --version
expect_rc 0 "--version"
# The version the tool prints is the project's (CMakeLists.txt: project(fourplat VERSION x.y.z)).
if [[ -n "${FOURPLAT_SOURCE_DIR:-}" ]]; then
  version=$(sed -n 's/^project(fourplat VERSION \([0-9.]*\).*/\1/p' "$FOURPLAT_SOURCE_DIR/CMakeLists.txt")
  expect_out_has "fourplat $version" "--version matches CMakeLists.txt"
fi

run
expect_rc 2 "no command"
expect_one_error_line "no command"

run frobnicate
expect_rc 2 "unknown command"
expect_one_error_line "unknown command"

run classify --no-such-option 3
expect_rc 2 "unknown option"
expect_one_error_line "unknown option"
expect_err_has "classify --help" "unknown option names the command's help"

run classify --closure sideways 3
expect_rc 2 "bad --closure value"
expect_one_error_line "bad --closure value"

run show 3/x
expect_rc 2 "bad tangle"
expect_one_error_line "bad tangle"
expect_err_has "at character 3" "bad tangle: position"
expect_err_has "expected" "bad tangle: what was expected"

run show 0/0
expect_rc 2 "0/0"
expect_one_error_line "0/0"
expect_err_has "0/0" "0/0 named"

# A multi-line input still gives a one-line error.
run show $'3/x\ny'
expect_rc 2 "newline in a tangle"
expect_one_error_line "newline in a tangle"

# Negative fractions are arguments, not options.
run show -5/2
expect_rc 0 "negative fraction argument"
expect_out_has "b(5,3)" "N(-5/2) = b(5,3)"

# A huge argument is reported briefly, not echoed in full.
big="$(printf '1%.0s' $(seq 1 5000))x"
run show "$big"
expect_rc 2 "huge bad tangle"
expect_one_error_line "huge bad tangle"
CHECKS=$((CHECKS + 1))
(( ${#ERR} < 400 )) || fail "huge bad tangle: error line is ${#ERR} characters long"

# Every command the tool lists is documented in the tool guide and the manual page, and every key
# that classify --json prints is in the guide.
if [[ -n "${FOURPLAT_SOURCE_DIR:-}" ]]; then
  run --help
  commands=$(sed -n '/^Subcommands:/,$p' <<<"$OUT" | sed -n 's/^  \([a-z]*\)  .*/\1/p')
  CHECKS=$((CHECKS + 1))
  [[ $(wc -w <<<"$commands") -ge 7 ]] || fail "--help lists too few commands: $commands"
  for cmd in $commands; do
    CHECKS=$((CHECKS + 1))
    grep -q "^## .*$cmd" "$FOURPLAT_SOURCE_DIR/docs/tool.md" || fail "docs/tool.md has no section for '$cmd'"
    CHECKS=$((CHECKS + 1))
    grep -q "^\\.B[RI]* \"*$cmd" "$FOURPLAT_SOURCE_DIR/docs/fourplat.1" || fail "docs/fourplat.1 does not list '$cmd'"
  done
  run classify --json 3 '1/2 + 1/3 + 1/5'
  for key in $(python3 -c 'import json, sys; print(" ".join(sorted({k for l in sys.stdin if l.strip() for k in json.loads(l)})))' <<<"$OUT"); do
    CHECKS=$((CHECKS + 1))
    grep -q "\`$key\`" "$FOURPLAT_SOURCE_DIR/docs/tool.md" || fail "docs/tool.md does not document the classify key '$key'"
  done
fi

finish
