#!/bin/bash
# SPDX-License-Identifier: GPL-3.0-or-later
# fuzz/run.sh OUT SECONDS [short]: build the libFuzzer harnesses
# fuzz/fuzz_*.c with clang (-fsanitize=fuzzer,address,undefined) against
# the core modules each names ("fuzz-core:"), and run each for SECONDS
# seconds on its corpus OUT/corpus_<name>, which grows from run to run.
# With "short" (make check): from a fixed seed and an empty corpus, the
# number of inputs the harness names ("fuzz-runs:"), so the run is
# reproducible and takes a second or two.  A failing input is left in
# OUT as crash-*.  Prints "fuzz <name>: ok" or "FAIL fuzz <name>"
# per harness; exits non-zero when one fails.
set -u
OUT=${1:?usage: run.sh OUT SECONDS [short]}
SECS=${2:-60}
SHORT=${3:-}
ROOT=$(cd "$(dirname "$0")/.." && pwd)
CLANG=${CLANG:-clang}
if ! command -v "$CLANG" > /dev/null; then
  echo "fuzz: $CLANG not found (apt-get install clang)"; exit 2
fi
mkdir -p "$OUT"
GSL_CFLAGS=$(pkg-config --cflags gsl 2>/dev/null || gsl-config --cflags)
GSL_LIBS=$(pkg-config --libs gsl 2>/dev/null || gsl-config --libs)
# libmvec for the vectorised kernels, when the core uses it
MVEC=$(grep -q 'MVEC' "$ROOT/src/Makefile" && echo -lmvec)
# The tabulated horizon fix is owned by issue 14: until it lands, tables
# with a sample within rounding of the horizon may fail cleanly (status,
# no crash); FUZZ_STRICT=1 checks them too.
EXTRA=""
[ "${FUZZ_STRICT:-0}" = 1 ] || EXTRA="-DFUZZ_KNOWN_HORIZON_DEFECT"
# Core objects once, instrumented for the fuzzer; each harness names the
# modules it links in a line "fuzz-core: holent_a holent_b ...".
FLAGS="-std=c11 -D_DEFAULT_SOURCE -g -O1 $EXTRA -fno-sanitize-recover=all"
mkdir -p "$OUT/obj"
newest_h=$(ls -t "$ROOT"/src/core/*.h "$ROOT"/fuzz/*.h | head -1)
fail=0
for src in "$ROOT"/fuzz/fuzz_*.c; do
  name=$(basename "$src" .c)
  exe="$OUT/$name"
  mods=$(sed -n 's/.*fuzz-core: *//p' "$src" | head -1)
  objs=""
  ok=1
  for m in $mods; do
    o="$OUT/obj/$m.o"
    if [ ! -e "$o" ] || [ "$ROOT/src/core/$m.c" -nt "$o" ] || [ "$newest_h" -nt "$o" ]; then
      "$CLANG" $FLAGS -fsanitize=fuzzer-no-link,address,undefined -I"$ROOT/src/core" \
        $GSL_CFLAGS -c "$ROOT/src/core/$m.c" -o "$o" >> "$OUT/$name.build.log" 2>&1 || ok=0
    fi
    objs="$objs $o"
  done
  if [ $ok = 0 ] || ! "$CLANG" $FLAGS -fsanitize=fuzzer,address,undefined \
       -I"$ROOT/fuzz" -I"$ROOT/src/core" $GSL_CFLAGS "$src" $objs -o "$exe" \
       $GSL_LIBS $MVEC -lm >> "$OUT/$name.build.log" 2>&1; then
    tail -20 "$OUT/$name.build.log"; echo "FAIL fuzz $name: did not build"
    fail=1; continue
  fi
  corpus="corpus_$name"
  if [ -n "$SHORT" ]; then
    corpus="short_$name"
    rm -rf "$OUT/$corpus"
    args="-seed=1 -runs=$(sed -n 's/.*fuzz-runs: *\([0-9]*\).*/\1/p' "$src" | head -1)"
  else
    args="-max_total_time=$SECS"
  fi
  mkdir -p "$OUT/$corpus"
  if (cd "$OUT" && ASAN_OPTIONS=detect_leaks=1 "$exe" $args -timeout=20 \
        -rss_limit_mb=2048 -print_final_stats=1 "$corpus" \
        > "$name.log" 2>&1); then
    runs=$(grep -o 'stat::number_of_executed_units: *[0-9]*' "$OUT/$name.log" | grep -o '[0-9]*$')
    echo "fuzz $name: ok (${runs:-?} inputs)"
  else
    grep -v '^    #' "$OUT/$name.log" | tail -15
    echo "FAIL fuzz $name (log $OUT/$name.log)"
    fail=1
  fi
done
exit $fail
