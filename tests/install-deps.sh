#!/bin/sh
# SPDX-License-Identifier: GPL-3.0-or-later
# Installs every Debian 12 package Twofold needs to build, run and test.
# Runs apt-get as root, through sudo when started by another user.
set -eu

packages="
  meson ninja-build pkg-config gcc gettext
  libglib2.0-dev libglib2.0-dev-bin libgtk-4-dev libadwaita-1-dev libgsl-dev
  libcairo2-dev libpango1.0-dev
  desktop-file-utils appstream libxml2-utils
  xvfb xauth dbus-x11 fonts-dejavu-core
  python3 python3-scipy python3-mpmath python3-numpy
  poppler-utils imagemagick
"

if [ "$(id -u)" -eq 0 ]; then
  as_root=""
else
  as_root="sudo"
fi

# shellcheck disable=SC2086
if dpkg-query -W -f='${Status}\n' $packages 2>/dev/null | grep -qv 'install ok installed' \
   || ! dpkg-query -W $packages >/dev/null 2>&1; then
  $as_root apt-get update -q
  # shellcheck disable=SC2086
  DEBIAN_FRONTEND=noninteractive $as_root apt-get install -y -q --no-install-recommends $packages
fi
