#!/bin/bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Make sure the Debian packages holent builds and tests with are present.
# As root, install what is missing; otherwise print the command and stop.
set -u
need=()
command -v octave-cli >/dev/null 2>&1 || need+=(octave)
command -v mkoctfile >/dev/null 2>&1 || need+=(liboctave-dev)
if ! { pkg-config --exists gsl 2>/dev/null || command -v gsl-config >/dev/null 2>&1; }; then
  need+=(libgsl-dev)
fi
command -v pkg-config >/dev/null 2>&1 || need+=(pkg-config)
command -v gcc >/dev/null 2>&1 || need+=(gcc)
command -v make >/dev/null 2>&1 || need+=(make)
[ ${#need[@]} -eq 0 ] && exit 0
cmd="apt-get update && apt-get install -y ${need[*]}"
if [ "$(id -u)" -eq 0 ] && command -v apt-get >/dev/null 2>&1; then
  echo "holent: installing missing packages: ${need[*]}"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq && apt-get install -y -qq "${need[@]}" || exit 1
else
  echo "holent: missing packages: ${need[*]}" >&2
  echo "holent: as root, run:  $cmd" >&2
  exit 1
fi
