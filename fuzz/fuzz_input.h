/* fuzz_input.h: reading the fuzzer's bytes as bounded numbers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef FUZZ_INPUT_H
#define FUZZ_INPUT_H
#include <math.h>
#include <stddef.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>

/* An oracle of a harness: a failed one names itself and aborts, which
   libFuzzer reports with the input.  */
#define CHECK(c, ...) \
  do { if (!(c)) { fprintf (stderr, __VA_ARGS__); fprintf (stderr, "\n"); abort (); } } while (0)

typedef struct
{
  const uint8_t *p;
  size_t n;
} fuzz_in;

/* Next byte (0 once the input is used up).  */
static inline unsigned
fz_byte (fuzz_in *in)
{
  if (in->n == 0)
    return 0;
  in->n--;
  return *in->p++;
}

/* An integer in [lo, hi].  */
static inline int
fz_int (fuzz_in *in, int lo, int hi)
{
  unsigned v = fz_byte (in) | (fz_byte (in) << 8);
  return lo + (int) (v % (unsigned) (hi - lo + 1));
}

/* A number in [0, 1) with 32 bits.  */
static inline double
fz_unit (fuzz_in *in)
{
  uint32_t v = 0;
  for (int k = 0; k < 4; k++)
    v = (v << 8) | fz_byte (in);
  return v / 4294967296.0;
}

/* A positive number 10^e, e uniform in [elo, ehi].  */
static inline double
fz_mag (fuzz_in *in, double elo, double ehi)
{
  return pow (10.0, elo + (ehi - elo) * fz_unit (in));
}
#endif
