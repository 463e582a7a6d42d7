# Shared helpers of the end-to-end tests in tests/cli/*.sh (sourced, not run by CTest itself).
# Each test script gets the tool's path as $1, runs it, and exits non-zero after printing every
# check that failed.
set -u
TOOL="${1:?usage: $0 PATH_TO_FOURPLAT}"
FAILS=0
CHECKS=0
WORK="$(mktemp -d)"
trap 'rm -rf "$WORK"' EXIT

fail() { echo "FAIL: $*" >&2; FAILS=$((FAILS + 1)); }

# run ARGS... — runs the tool; sets OUT, ERR, RC (stdin from $STDIN_FILE when set).
run() {
  if [[ -n "${STDIN_FILE:-}" ]]; then
    "$TOOL" "$@" <"$STDIN_FILE" >"$WORK/out" 2>"$WORK/err"
  else
    "$TOOL" "$@" </dev/null >"$WORK/out" 2>"$WORK/err"
  fi
  RC=$?
  OUT="$(cat "$WORK/out")"
  ERR="$(cat "$WORK/err")"
}

# expect_rc N DESCRIPTION
expect_rc() {
  CHECKS=$((CHECKS + 1))
  [[ "$RC" == "$1" ]] || fail "$2: exit status $RC, expected $1 (stderr: $ERR)"
}
# expect_out_has TEXT DESCRIPTION
expect_out_has() {
  CHECKS=$((CHECKS + 1))
  grep -qF -- "$1" <<<"$OUT" || fail "$2: stdout lacks '$1'; stdout was: $OUT"
}
expect_err_has() {
  CHECKS=$((CHECKS + 1))
  grep -qF -- "$1" <<<"$ERR" || fail "$2: stderr lacks '$1'; stderr was: $ERR"
}
# expect_one_error_line DESCRIPTION — stderr is exactly one line starting with "fourplat: "
expect_one_error_line() {
  CHECKS=$((CHECKS + 1))
  local n
  n=$(printf '%s' "$ERR" | grep -c '')
  if [[ "$n" != 1 || "$ERR" != "fourplat: "* ]]; then
    fail "$1: stderr should be one line 'fourplat: ...', was ($n lines): $ERR"
  fi
}
expect_no_stderr() {
  CHECKS=$((CHECKS + 1))
  [[ -z "$ERR" ]] || fail "$1: unexpected stderr: $ERR"
}

# json_check PYTHON_EXPRESSION DESCRIPTION — evaluates the expression with `rows` = the list of
# JSON objects on stdout (one per line; every line must parse) and `row` = rows[0].
json_check() {
  CHECKS=$((CHECKS + 1))
  local msg
  if ! msg=$(OUT_FILE="$WORK/out" python3 - "$1" <<'PY' 2>&1
import json, os, sys
lines = [l for l in open(os.environ["OUT_FILE"], encoding="utf-8").read().split("\n") if l != ""]
rows = [json.loads(l) for l in lines]
row = rows[0] if rows else None
ok = eval(sys.argv[1])
if not ok:
    print("rows:", json.dumps(rows)[:2000])
    sys.exit(1)
PY
  ); then
    fail "$2: JSON check '$1' failed: $msg"
  fi
}

finish() {
  if [[ "$FAILS" != 0 ]]; then
    echo "$(basename "$0"): $FAILS of $CHECKS checks failed" >&2
    exit 1
  fi
  echo "$(basename "$0"): all $CHECKS checks passed"
}
