#!/bin/sh
# SPDX-License-Identifier: GPL-3.0-or-later
# Installs what is needed, builds Twofold and opens it on the demo analysis, uninstalled.
set -eu
top=$(cd "$(dirname "$0")/.." && pwd)
cd "$top"
./tests/install-deps.sh
[ -d _build ] || meson setup _build
meson compile -C _build
GSETTINGS_SCHEMA_DIR="$top/_build/data" exec "$top/_build/app/twofold" \
  "$top/data/demo/seed-germination.twofold"
