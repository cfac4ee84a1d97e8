#!/bin/bash
# SPDX-License-Identifier: GPL-3.0-or-later
# Runs every test of holent against the copy installed in PREFIX:
#  1. C unit tests of the core (tests/core/test_*.c) under
#     -fsanitize=address,undefined;
#  2. make dist twice into throwaway paths: the tarballs must agree byte
#     for byte (reproducible release);
#  3. every BIST block of every inst/*.m and every cross-check file
#     tests/*.m, with the installed package loaded.
# Prints "N passed, N failed" last and exits non-zero on any failure.
set -u
PREFIX=${1:?usage: run_all.sh PREFIX}
ROOT=$(cd "$(dirname "$0")/.." && pwd)
OCTAVE=${OCTAVE:-octave-cli}
BUILD=${BUILD:-$ROOT/build}
TESTS=${TESTS:-}
WORK="$BUILD/ctest"
selected () {
  [ -z "$TESTS" ] && return 0
  for w in $TESTS; do case "$1" in *"$w"*) return 0;; esac; done
  return 1
}
mkdir -p "$WORK"
pass=0; fail=0

GSL_CFLAGS=$(pkg-config --cflags gsl 2>/dev/null || gsl-config --cflags)
GSL_LIBS=$(pkg-config --libs gsl 2>/dev/null || gsl-config --libs)
echo "== C unit tests of the core (ASan + UBSan)"
for t in "$ROOT"/tests/core/test_*.c; do
  [ -e "$t" ] || continue
  name=$(basename "$t" .c)
  selected "$name" || continue
  if ! gcc -std=c11 -D_DEFAULT_SOURCE -g -O1 -Wall -Wextra -fopenmp \
       -fsanitize=address,undefined -fno-sanitize-recover=all \
       -fno-omit-frame-pointer -I"$ROOT/src/core" $GSL_CFLAGS \
       "$t" "$ROOT"/src/core/*.c -o "$WORK/$name" $GSL_LIBS -lm; then
    echo "FAIL $name: did not compile"; fail=$((fail + 1)); continue
  fi
  out=$(ASAN_OPTIONS=detect_leaks=1 UBSAN_OPTIONS=print_stacktrace=1 "$WORK/$name" 2>&1)
  rc=$?
  line=$(printf '%s\n' "$out" | grep -E '^[0-9]+ passed, [0-9]+ failed$' | tail -1)
  if [ $rc -ne 0 ] || [ -z "$line" ]; then
    printf '%s\n' "$out" | tail -30
    echo "FAIL $name (exit $rc)"
    fail=$((fail + 1))
    [ -n "$line" ] && pass=$((pass + ${line%% passed*}))
  else
    p=${line%% passed*}; f=${line#*, }; f=${f%% failed}
    pass=$((pass + p)); fail=$((fail + f))
    echo "$name: $line"
  fi
done

if selected fuzz && command -v "${CLANG:-clang}" > /dev/null; then
  echo "== libFuzzer harnesses (fuzz/, a short reproducible run each)"
  out=$(bash "$ROOT/fuzz/run.sh" "$BUILD/fuzz" 0 short 2>&1)
  printf '%s\n' "$out" | grep -E '^(fuzz|FAIL)' || printf '%s\n' "$out" | tail -20
  p=$(printf '%s\n' "$out" | grep -c '^fuzz .*: ok')
  f=$(printf '%s\n' "$out" | grep -c '^FAIL')
  pass=$((pass + p)); fail=$((fail + f))
fi

if selected dist; then
  echo "== make dist twice: the same bytes"
  if out=$(make -s --no-print-directory -C "$ROOT" dist-check 2>&1); then
    printf '%s\n' "$out"; pass=$((pass + 1))
  else
    printf '%s\n' "$out" | tail -20; echo "FAIL dist-check"; fail=$((fail + 1))
  fi
fi

echo "== Octave: BIST of inst/*.m and cross-checks in tests/"
res="$WORK/octave_result.txt"
rm -f "$res"
"$OCTAVE" --norc --no-history --quiet --eval "
  pkg ('prefix', '$PREFIX', '$PREFIX');
  pkg ('local_list', '$PREFIX/octave_packages');
  pkg load holent;
  addpath ('$ROOT/tests');
  run_tests ('$ROOT', '$res', '$TESTS');" 2>&1 | sed -u '/ignoring const execution_exception/d'
if [ -s "$res" ]; then
  read p f < "$res"
  pass=$((pass + p)); fail=$((fail + f))
else
  echo "FAIL: the Octave test run did not finish"; fail=$((fail + 1))
fi
echo "$pass passed, $fail failed"
[ "$fail" -eq 0 ]
