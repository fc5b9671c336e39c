#!/usr/bin/env bash
# Remakes the app icon's PNGs from assets/web/icon.svg (our own drawing).
# Needs ImageMagick and its SVG delegate:
#   apt-get install -y --no-install-recommends imagemagick librsvg2-bin
# The PNGs are committed; the build does not run this.
set -euo pipefail
cd "$(dirname "$0")/web"
for size in 192 512; do
  convert -background none -density 96 icon.svg -resize "${size}x${size}" "icon-${size}.png"
done
echo "wrote $(pwd)/icon-192.png and icon-512.png"
