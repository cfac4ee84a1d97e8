#!/bin/bash
# SPDX-License-Identifier: GPL-3.0-or-later
# A server of the parallel package's cluster mode on this machine, for the
# loopback test of parameter_scan (tests/check_scan_cluster.m).
#   loopback_pserver.sh start [SECONDS]  start octave-pserver without
#       authentication (ports 12501/12502), print its pid; a watchdog kills
#       it after SECONDS (default 300) whatever happens to the test.
#       Exit 2: no octave-pserver; 3: the ports are taken; 4: no start.
#   loopback_pserver.sh stop PID         stop it.
# octave-pserver refuses to run as root: as root it runs as nobody.
set -u
case "${1:-}" in
  start)
    bin=/usr/libexec/octave-pserver
    [ -x "$bin" ] || bin=$(command -v octave-pserver) || exit 2
    if (exec 3<>/dev/tcp/127.0.0.1/12502) 2>/dev/null; then exit 3; fi
    pidf=/tmp/.octave-$(hostname).pid
    rm -f "$pidf"
    run=()
    if [ "$(id -u)" = 0 ]; then
      run=(setpriv --reuid=nobody --regid=nogroup --clear-groups)
    fi
    # a server stopped less than a minute ago leaves its ports in
    # TIME_WAIT and the new one cannot bind them: retry for 90 s at most
    for _ in $(seq 18); do
      "${run[@]}" "$bin" --octave-binary "$(command -v octave-cli)" --no-auth \
        > /dev/null 2>&1 < /dev/null
      sleep 1
      if [ -s "$pidf" ] && kill -0 "$(cat "$pidf")" 2> /dev/null; then break; fi
      rm -f "$pidf"
      sleep 4
    done
    [ -s "$pidf" ] || exit 4
    pid=$(cat "$pidf")
    for _ in $(seq 50); do
      (exec 3<>/dev/tcp/127.0.0.1/12502) 2>/dev/null && break; sleep 0.2
    done
    ( sleep "${2:-300}"; kill "$pid" 2> /dev/null ) > /dev/null 2>&1 &
    echo "$pid"
    ;;
  stop)
    kill "${2:?pid}" 2> /dev/null
    rm -f "/tmp/.octave-$(hostname).pid"
    ;;
  *)
    echo "usage: $0 start [SECONDS] | stop PID" >&2; exit 1;;
esac
