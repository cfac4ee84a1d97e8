#!/bin/bash
# SPDX-License-Identifier: GPL-3.0-or-later
# interrupt_session.sh LOCAL_LIST SETUP LONG AFTER [DELAY]
# Starts an interactive octave-cli (commands from a pipe), loads holent
# from LOCAL_LIST and runs SETUP (which must print a line starting with
# READY), then LONG; DELAY seconds later (default 3) it sends SIGINT to
# octave-cli, as Ctrl-C does, and measures how long the prompt takes to
# come back (the command after LONG prints BACK <seconds since LONG
# began>).  LONG may hold several commands, one a line: each gets its own
# SIGINT and BACK line, in turn.  Then AFTER runs in the same session.
# Prints LATENCY <seconds> (one number per command of LONG) and the
# session's output.  Used by tests/check_interrupt.m.
set -u
list=$1; setup=$2; long=$3; after=$4; delay=${5:-3}
oct=${OCTAVE:-octave-cli}
dir=$(mktemp -d)
pid=
cleanup () {
  [ -n "$pid" ] && kill -KILL "$pid" 2>/dev/null
  rm -rf "$dir"
}
trap cleanup EXIT
mkfifo "$dir/in"
"$oct" --norc --no-history --quiet -i < "$dir/in" > "$dir/out" 2>&1 &
pid=$!
exec 3> "$dir/in"
# wait until PATTERN shows in the output (on at least $3 lines, default
# 1), at most $2 seconds
wait_for () {
  local k=0
  while [ "$(grep -c "$1" "$dir/out")" -lt "${3:-1}" ]; do
    sleep 0.02; k=$((k + 1))
    if [ $k -gt $(($2 * 50)) ]; then
      echo "TIMEOUT waiting for $1"; cat "$dir/out"; exit 1
    fi
  done
}
echo "pkg ('local_list', '$list'); pkg load holent; $setup" >&3
wait_for 'READY [0-9]' 300
lat=
k=0
while IFS= read -r one; do
  [ -n "$one" ] || continue
  k=$((k + 1))
  echo "t0__ = tic (); $one" >&3
  echo 'printf ("BACK %.3f\n", toc (t0__));' >&3
  sleep "$delay"
  t1=$(date +%s.%N)
  kill -INT "$pid"
  wait_for 'BACK [0-9]' 120 $k
  t2=$(date +%s.%N)
  lat="$lat $(awk -v a="$t1" -v b="$t2" 'BEGIN { printf "%.3f", b - a }')"
done <<< "$long"
echo "$after" >&3
echo 'printf ("AFTER-DONE\n");' >&3
wait_for 'AFTER-DONE' 60
echo 'exit' >&3
exec 3>&-
wait "$pid"
pid=
echo "LATENCY$lat"
cat "$dir/out"
