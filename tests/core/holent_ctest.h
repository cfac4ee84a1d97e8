/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_ctest.h: a minimal check framework for the core's unit tests.
 * Each test program ends with  return HT_DONE ();  which prints
 * "N passed, M failed" (parsed by tests/run_all.sh).  */
#ifndef HOLENT_CTEST_H
#define HOLENT_CTEST_H
#include <math.h>
#include <stdio.h>

static int ht_pass, ht_fail;

#define HT_CHECK(cond, ...)                                             \
  do {                                                                  \
    if (cond) ht_pass++;                                                \
    else {                                                              \
      ht_fail++;                                                        \
      fprintf (stderr, "%s:%d: check failed: ", __FILE__, __LINE__);    \
      fprintf (stderr, __VA_ARGS__);                                    \
      fprintf (stderr, "\n");                                           \
    }                                                                   \
  } while (0)

/* |a - b| <= tol * max(1, |b|) */
#define HT_CLOSE(a, b, tol)                                             \
  do {                                                                  \
    double ht_a_ = (a), ht_b_ = (b);                                    \
    double ht_s_ = fabs (ht_b_) > 1.0 ? fabs (ht_b_) : 1.0;             \
    HT_CHECK (fabs (ht_a_ - ht_b_) <= (tol) * ht_s_,                    \
              "%s = %.17g, expected %.17g", #a, ht_a_, ht_b_);          \
  } while (0)

#define HT_STATUS(expr, want)                                           \
  do {                                                                  \
    int ht_st_ = (expr);                                                \
    HT_CHECK (ht_st_ == (want), "%s returned %d, expected %d", #expr,   \
              ht_st_, (int) (want));                                    \
  } while (0)

#define HT_DONE() \
  (printf ("%d passed, %d failed\n", ht_pass, ht_fail), ht_fail != 0)

/* A poll (the core's holent_poll callback) that counts its calls in the
   int at CTX and asks to stop from the second call on.  */
static inline int
ht_stop_second (void *ctx, double done, double total)
{
  (void) done;
  (void) total;
  return ++*(int *) ctx >= 2;
}

#endif
