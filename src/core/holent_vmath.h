/* holent_vmath.h: regulated geodesic lengths for many arcs at once, one
 * loop per bulk family with no per-element branch, so the compiler can
 * call the vector forms of log, sin and expm1 (glibc's libmvec on x86_64;
 * the scalar libm elsewhere).  SPDX-License-Identifier: GPL-3.0-or-later */
#ifndef HOLENT_VMATH_H
#define HOLENT_VMATH_H

#include <stddef.h>
#include "holent_geo.h"

/* Loops that gain from wider vectors where the CPU has them: an AVX2
   clone picked at load time (GCC on x86-64 ELF, not the sanitizer
   builds).  */
#if defined(__GNUC__) && !defined(__clang__) && defined(__x86_64__) \
    && !defined(__SANITIZE_ADDRESS__) && defined(__ELF__)
#define HOLENT_VM_CLONES __attribute__ ((target_clones ("avx2", "default")))
#else
#define HOLENT_VM_CLONES
#endif

/* len[i] = regulated length of the geodesic over the arc arc[i], for arcs
   that holent_geo_arc_length accepts (not checked here).  Agrees with
   holent_geo_len_unchecked to a few ulps (log sinh x is evaluated as
   x - log 2 + log(-expm1(-2x)); with two temperatures the two logs are
   one, of the product of the expm1 terms).  len may alias arc.  */
void holent_vmath_arc_lengths (const holent_geo_bg *bg, size_t n,
                               const double *arc, double *len);

/* The same for ascending arcs: in the BTZ family the lengths of arcs with
   k arc >= 19 (both k) are pref + sum (k arc - log 2) without a call, the
   very value of the kernel (there log(-expm1(-2x)) is exactly 0 in libm
   and libmvec; tests/core/test_vmath.c checks it).  */
void holent_vmath_arc_lengths_sorted (const holent_geo_bg *bg, size_t n,
                                      const double *arc, double *len);

/* holent_geo_point_lengths (same arguments, statuses and results), with
   the lengths evaluated in blocks by the kernel above.  */
int holent_vmath_point_lengths (const holent_geo_bg *bg, size_t n,
                                const double *x1, const double *x2,
                                holent_geo_class cls, double *len,
                                size_t *bad);

#endif /* HOLENT_VMATH_H */
