#!/bin/sh
# SPDX-License-Identifier: GPL-3.0-or-later
# Installs what is needed, builds Twofold from scratch with warnings as errors, and runs
# every test headless (the window tests run under Xvfb). The README's test command.
set -eu
top=$(cd "$(dirname "$0")/.." && pwd)
cd "$top"
./tests/install-deps.sh
build=${TF_BUILD_DIR:-_build-check}
rm -rf "$build"
meson setup "$build" --werror "$@"
meson compile -C "$build"
meson test -C "$build" --print-errorlogs --num-processes 2
