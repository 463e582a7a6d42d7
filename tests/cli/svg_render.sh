#!/usr/bin/env bash
# Browser check of the SVG drawings: `fourplat diagram TANGLE --format svg` rendered to PNG by
# headless Chromium (Debian's chromium package), then the PNG is read back (python3, zlib only):
# it must have the window's size, the drawing must be there (enough ink, spread over the picture,
# nothing outside the SVG's own width × height) and a coloring overlay must show its colours.
# Usage: svg_render.sh path/to/fourplat
set -euo pipefail
tool=${1:?usage: svg_render.sh path/to/fourplat}

browser=$(command -v chromium || command -v chromium-browser || true)
if [[ -z "$browser" ]]; then
  echo "skipped: chromium not installed"
  exit 0
fi
if ! "$tool" --help 2>/dev/null | grep -qE '^[[:space:]]+diagram[[:space:]]'; then
  echo "skipped: this build of the tool has no diagram command"
  exit 0
fi

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
# Headless Chromium keeps part of the window for itself: give it room below the drawing.
pad=200
fail=0

# render NAME TANGLE COLORS [diagram options...]: COLORS is how many palette hues must show.
render() {
  local name=$1 tangle=$2 colors=$3
  shift 3
  local svg=$work/$name.svg png=$work/$name.png
  "$tool" diagram "$tangle" --format svg "$@" >"$svg"
  local w h
  w=$(grep -o -m1 '<svg [^>]*' "$svg" | grep -o ' width="[0-9.]*"' | grep -o '[0-9.]*')
  h=$(grep -o -m1 '<svg [^>]*' "$svg" | grep -o ' height="[0-9.]*"' | grep -o '[0-9.]*')
  w=${w%.*}
  h=${h%.*}
  timeout 120 "$browser" --headless --no-sandbox --disable-gpu --disable-quic --no-first-run \
    --disable-background-networking --disable-component-update --disable-sync \
    --user-data-dir="$work/profile-$name" --hide-scrollbars --screenshot="$png" \
    --window-size="$w,$((h + pad))" "file://$svg" >/dev/null 2>&1 || true
  if ! python3 - "$png" "$w" "$((h + pad))" "$h" "$colors" <<'PY'; then
import struct, sys, zlib

path, width, height, drawn_h, colors = sys.argv[1], *map(int, sys.argv[2:])
try:
    data = open(path, "rb").read()
except OSError:
    sys.exit(f"no screenshot written ({path})")
if data[:8] != b"\x89PNG\r\n\x1a\n":
    sys.exit("not a PNG file")
pos, idat = 8, b""
while pos < len(data):
    n, kind = struct.unpack(">I4s", data[pos:pos + 8])
    body = data[pos + 8:pos + 8 + n]
    pos += 12 + n
    if kind == b"IHDR":
        w, h, depth, ctype = struct.unpack(">IIBB", body[:10])
    elif kind == b"IDAT":
        idat += body
if (w, h) != (width, height):
    sys.exit(f"PNG is {w}x{h}, expected {width}x{height}")
if depth != 8 or ctype not in (2, 6):
    sys.exit(f"unexpected PNG format (depth {depth}, colour type {ctype})")
bpp = 3 if ctype == 2 else 4
raw, stride = zlib.decompress(idat), w * bpp
prev, rows, i = bytearray(stride), [], 0
for _ in range(h):  # undo the PNG row filters
    f, line = raw[i], bytearray(raw[i + 1:i + 1 + stride])
    i += 1 + stride
    for x in range(stride):
        a = line[x - bpp] if x >= bpp else 0
        b = prev[x]
        c = prev[x - bpp] if x >= bpp else 0
        if f == 1: line[x] = (line[x] + a) & 255
        elif f == 2: line[x] = (line[x] + b) & 255
        elif f == 3: line[x] = (line[x] + (a + b) // 2) & 255
        elif f == 4:
            p = a + b - c
            pa, pb, pc = abs(p - a), abs(p - b), abs(p - c)
            line[x] = (line[x] + (a if pa <= pb and pa <= pc else b if pb <= pc else c)) & 255
    rows.append(line)
    prev = line
# Okabe–Ito hues of the first classes (docs/drawing.md).
palette = [(0x00, 0x72, 0xB2), (0xE6, 0x9F, 0x00), (0x00, 0x9E, 0x73), (0xD5, 0x5E, 0x00),
           (0xCC, 0x79, 0xA7), (0x56, 0xB4, 0xE9), (0xF0, 0xE4, 0x42), (0x00, 0x00, 0x00)]
ink, xs, ys, seen = 0, [], [], set()
for y, line in enumerate(rows):
    for x in range(w):
        r, g, b = line[x * bpp:x * bpp + 3]
        if r + g + b > 700:
            continue
        ink += 1
        xs.append(x)
        ys.append(y)
        for k, (pr, pg, pb) in enumerate(palette[:7]):
            if abs(r - pr) + abs(g - pg) + abs(b - pb) < 40:
                seen.add(k)
if ink < 0.004 * w * drawn_h:
    sys.exit(f"blank: only {ink} dark pixels")
if max(ys) >= drawn_h:
    sys.exit(f"ink below the drawing (row {max(ys)} of {drawn_h})")
if max(xs) - min(xs) < 0.5 * w or max(ys) - min(ys) < 0.5 * drawn_h:
    sys.exit(f"the drawing covers only x {min(xs)}..{max(xs)}, y {min(ys)}..{max(ys)} of {w}x{drawn_h}")
if len(seen) < colors:
    sys.exit(f"expected {colors} palette colours, saw {sorted(seen)}")
print(f"ok: {w}x{h}, {ink} dark pixels, palette colours {sorted(seen)}")
PY
    echo "FAIL: $name ($tangle $*)" >&2
    fail=1
  else
    echo "  $name: rendered"
  fi
}

render trefoil '[3]' 0
render ten '[2 2 2 2 2]' 0 --closure denominator
render trefoil-3 '[3]' 3 --coloring 3
render forty-11 '[3 1 4 1 5 9 2 6 5 3 1]' 7 --coloring 11
render tangle '[3 2 1 4]' 0 --closure none
exit $fail
