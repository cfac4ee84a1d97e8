/* libFuzzer harness: the tabulated-spline background of AdS_{d+1}.
 * The bytes choose d, a grid on [0, zmax] (uniform or stretched, with
 * zmax below, at or beyond the horizon zh) and samples of
 * f = 1 - (z/zh)^d, perturbed by a few ulps, with the sample nearest the
 * horizon sometimes moved to within rounding of it (the cases of the
 * issue-10 report: a sample at 1 - eps/2, tiny values of either sign).
 * Oracles beyond "no crash":
 *  - a failure names a valid sample;
 *  - a horizon is found exactly when the grid reaches the true one (the
 *    horizon of the analytic f, located to the accuracy of a cubic
 *    spline through the samples);
 *  - f evaluates to within spline accuracy of the analytic f on [0,
 *    zmax], never NaN, and f(zh) = 0;
 *  - a strip of width well inside the reach gets a finite entropy that
 *    agrees with the analytic black brane of the same zh (common
 *    practice: the same metric), and its turning point lies below zh.
 * fuzz-core: holent_hd_bg holent_root holent_strip holent_hd_size holent_status
 * fuzz-runs: 200 (make check)
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <float.h>
#include <stdio.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include "fuzz_input.h"
#include "holent_hd_bg.h"
#include "holent_strip.h"

#define NZ 700

static holent_strip_workspace *sw;

int
LLVMFuzzerTestOneInput (const uint8_t *data, size_t size)
{
  fuzz_in in = { data, size };
  static double z[NZ], f[NZ];
  if (sw == NULL)
    {
      gsl_set_error_handler_off ();  /* as every gateway does */
      sw = holent_strip_workspace_alloc ();
    }
  int d = fz_int (&in, 3, 6);
  size_t n = (size_t) fz_int (&in, 40, NZ);
  double zh = fz_mag (&in, -3, 3);
  unsigned where = fz_byte (&in) % 4;
  double zmax = where == 0 ? zh * (0.3 + 0.65 * fz_unit (&in))   /* no horizon */
                : where == 1 ? zh                                  /* ends on it */
                : zh * (1.0 + 0.6 * fz_unit (&in));                /* straddles  */
  double stretch = fz_byte (&in) < 128 ? 1.0 : 1.0 + fz_unit (&in);
  for (size_t i = 0; i < n; i++)
    z[i] = zmax * pow ((double) i / (double) (n - 1), stretch);
  z[n - 1] = zmax;
  for (size_t i = 0; i < n; i++)
    f[i] = 1.0 - pow (z[i] / zh, d);
  /* the sample nearest the horizon, within rounding of it */
  size_t k = 0;
  for (size_t i = 0; i < n; i++)
    if (fabs (z[i] - zh) < fabs (z[k] - zh))
      k = i;
  unsigned pert = fz_byte (&in) % 6;
  if (where != 0 && k > 0 && k + 1 < n)
    {
      if (pert == 1)
        z[k] = zh * (1 - DBL_EPSILON / 2), f[k] = 1.0 - pow (z[k] / zh, d);
      else if (pert == 2)
        z[k] = zh, f[k] = 0.0;
      else if (pert == 3)
        z[k] = zh, f[k] = (fz_byte (&in) & 1 ? 1 : -1) * fz_int (&in, 1, 8) * DBL_EPSILON;
      else if (pert == 4)
        z[k] = nextafter (zh, fz_byte (&in) & 1 ? INFINITY : 0), f[k] = 1.0 - pow (z[k] / zh, d);
    }
  if (pert == 5)  /* ulp noise everywhere but at 0 */
    for (size_t i = 1; i < n; i++)
      f[i] += (fz_int (&in, 0, 8) - 4) * DBL_EPSILON * fmax (fabs (f[i]), 1e-300);
  if (!(z[k] > z[k - (k > 0)] || k == 0) || (k + 1 < n && !(z[k + 1] > z[k])))
    return 0;  /* the perturbation broke the ordering of a coarse grid */

  holent_hd_bg bg;
  size_t bad = (size_t) -1;
  int st = holent_hd_bg_tabulated (&bg, d, n, z, f, 0.0, 1.0, 1.0, 1e-3 * zh, &bad);
#ifdef FUZZ_KNOWN_HORIZON_DEFECT
  /* issue 10 item 3, fixed by issue 14: a table with a sample within
     rounding of the horizon may still be refused or fail in the strip
     (cleanly, with a status); see tests/check_tabulated_horizon.m */
  int known = where != 0 && pert != 0;
#else
  int known = 0;
#endif
  if (st != HOLENT_SUCCESS)
    {
      CHECK (bad == (size_t) -1 || bad < n, "bad sample %zu of %zu", bad, n);
      if (known)
        return 0;
      CHECK (where == 0 ? 0 : 1, "no horizon in the table, yet status %d", st);
      CHECK (0, "status %d (bad %zu) for samples of 1 - (z/zh)^%d, zmax/zh = %.17g, pert %u",
             st, bad, d, zmax / zh, pert);
    }
  double h = zmax / (double) (n - 1) * stretch;
  double acc = 1e-6 + 50.0 * pow (h / zh * d, 4);  /* cubic spline */
  if (where == 0)
    CHECK (!isfinite (bg.zh), "a horizon %g in a table below it", bg.zh);
  else
    {
      CHECK (isfinite (bg.zh) && fabs (bg.zh - zh) <= acc * zh,
             "horizon %.17g, expected %.17g", bg.zh, zh);
      double fz;
      CHECK (holent_hd_bg_f (&bg, bg.zh, &fz, NULL) == HOLENT_SUCCESS
             && fabs (fz) <= 1e-9, "f(zh) = %g", fz);
    }
  for (int j = 1; j < 20; j++)
    {
      double x = (isfinite (bg.zh) ? bg.zh : zmax) * j / 20.0, fx;
      CHECK (holent_hd_bg_f (&bg, x, &fx, NULL) == HOLENT_SUCCESS && !isnan (fx),
             "f(%g) failed", x);
      CHECK (fabs (fx - (1 - pow (x / zh, d))) <= acc, "f(%g) = %.17g, analytic %.17g",
             x, fx, 1 - pow (x / zh, d));
    }
  if (where != 0)
    {
      holent_hd_bg brane;
      holent_hd_bg_init (&brane, d, HOLENT_HD_BRANE, zh, 1.0, 1.0, 1e-3 * zh);
      double l = zh * (0.05 + 0.5 * fz_unit (&in)), S, Sb, zs, zsb;
      st = holent_strip_entropy (&bg, sw, 1.0, 1, &l, &S, NULL, NULL, &zs, NULL, NULL);
      if (st != HOLENT_SUCCESS && known)
        {
          holent_hd_bg_free (&bg);
          return 0;
        }
      CHECK (st == HOLENT_SUCCESS, "strip of width %g zh: status %d", l / zh, st);
      CHECK (holent_strip_entropy (&brane, sw, 1.0, 1, &l, &Sb, NULL, NULL, &zsb, NULL, NULL)
             == HOLENT_SUCCESS, "analytic strip");
      CHECK (isfinite (S) && zs < bg.zh && fabs (S - Sb) <= 1e-3 * fabs (Sb) + acc,
             "strip S %.17g, analytic %.17g (zstar %g, %g)", S, Sb, zs, zsb);
    }
  holent_hd_bg_free (&bg);
  return 0;
}
