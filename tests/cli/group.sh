#!/usr/bin/env bash
# End-to-end test of `fourplat group`. Expected classes follow Schubert's theorem (Schubert 1956,
# as stated by Kauffman–Lambropoulou, Enseign. Math. 49 (2003)): b(7,2) ≅ b(7,4) since 2·4 ≡ 1
# (mod 7); b(7,3) is b(7,4)'s mirror image since 3 ≡ −4 (mod 7), so it joins only up to mirror.
set -u
tool=$1
fail=0
check() {  # check NAME EXPECTED ACTUAL
  if [[ "$2" != "$3" ]]; then echo "FAIL $1: expected [$2], got [$3]"; fail=1; else echo "ok   $1"; fi
}
out=$("$tool" group 7/2 7/4 7/3 | head -n 1)
check "unoriented: three inputs, two classes" "3 inputs in 2 classes" "$out"
out=$("$tool" group --up-to-mirror 7/2 7/4 7/3 | head -n 1)
check "up to mirror: one class" "3 inputs in 1 class up to mirror image" "$out"
# Trefoil (det 3) is 3-colorable, the figure-eight (det 5) is not (common practice: 3 | det).
out=$(printf '# notebook\n[3]\n\n5/2\n' | "$tool" group --colorable 3 --json | tr -d ' ')
check "json: trefoil flagged" "1" "$(grep -c '"class":"b(3,1)".*"colorable":true' <<<"$out")"
check "json: figure-eight not flagged" "1" "$(grep -c '"class":"b(5,2)".*"colorable":false' <<<"$out")"
check "json: line numbers kept" "1" "$(grep -c '"line":4' <<<"$out")"
# Oriented classes: the Hopf link's two orientations b(2,1) and b(2,3) differ (Schubert mod 2p).
out=$("$tool" group --oriented 2/1 2/3 | head -n 1)
check "oriented: two Hopf orientations" "2 inputs in 2 oriented classes" "$out"
# Bad input: one line on stderr, exit 2, the good inputs still grouped.
err=$("$tool" group 7/2 'x/3' 2>&1 >/dev/null); rc=$?
check "bad input exit status" "2" "$rc"
check "bad input one stderr line" "1" "$(wc -l <<<"$err" | tr -d ' ')"
"$tool" group --up-to-mirror --oriented 3 2>/dev/null; rc=$?
check "conflicting options exit status" "2" "$rc"
exit $fail
