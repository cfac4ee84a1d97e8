/* libFuzzer harness: two-sided regions of the thermofield double (line or
 * circle, with or without a shock) and the curves drawn from their
 * minimiser.  The bytes choose the background, up to three intervals a
 * side with endpoint times, a shift, and a sampling tolerance; then one
 * more call of the surface sampler on raw, possibly absurd, numbers.
 * Oracles beyond "no crash":
 *  - every status is one the core defines, and a success leaves finite
 *    numbers: S, the minimiser's endpoints, every sample except the one
 *    all-NaN row that splits a bridge through a shock;
 *  - the minimiser is a perfect matching of its endpoints, windings only
 *    on bridges of a circle;
 *  - each drawn curve starts and ends on the Kruskal boundary points
 *    X_K = -+cosh(2 pi t/beta), T_K = sinh(2 pi t/beta) of its endpoints
 *    (common practice: the boundary of the two-sided BTZ in Kruskal
 *    coordinates), x on the endpoint's (lifted on a circle) coordinate;
 *  - a bridge through a shock has exactly one NaN row, others none;
 *  - the line's runner-up is never below the minimum.
 * fuzz-core: holent_tfd holent_surface holent_rt holent_region holent_interval holent_root holent_geo holent_hrt holent_vmath holent_status holent_bcft holent_quench holent_hd_bg holent_strip holent_ball holent_slab holent_ode holent_hd_size holent_bg3 holent_thermo
 * fuzz-runs: 1500 (make check)
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <stdio.h>
#include <stdlib.h>
#include "fuzz_input.h"
#include "holent_tfd.h"
#include "holent_surface.h"

#define NI 3

static holent_tfd_workspace *tw;
static holent_surface_workspace *sw;

static int
valid_status (int st)
{
  return st >= 0 && st <= HOLENT_ETIMELIKE
         && holent_strerror (st) != NULL;
}

/* A curve just sampled: finite but for the NaN rows (all three NaN),
   their number returned.  */
static size_t
curve_rows (const holent_curve *c)
{
  size_t nan_rows = 0;
  CHECK (c->n >= 2, "a curve of %zu samples", c->n);
  for (size_t i = 0; i < c->n; i++)
    {
      if (isnan (c->x[i]))
        {
          CHECK (isnan (c->y[i]) && isnan (c->t[i]) && i > 0 && i + 1 < c->n,
                 "a partial NaN row at %zu", i);
          nan_rows++;
          continue;
        }
      CHECK (isfinite (c->x[i]) && isfinite (c->y[i]) && isfinite (c->t[i]),
             "a non-finite sample at %zu of %zu", i, c->n);
    }
  return nan_rows;
}

static void
side_rows (fuzz_in *in, double L, size_t n, double *a, double *b,
           double *ta, double *tb)
{
  double x = L * fz_unit (in);
  for (size_t i = 0; i < n; i++)
    {
      double w = L * (0.002 + 0.3 * fz_unit (in));
      a[i] = x;
      b[i] = x + w;
      /* times below half the width keep each row spacelike; a few go
         beyond, to meet the refusal */
      double tm = (fz_byte (in) % 8 == 0 ? 2.0 : 0.45) * w;
      ta[i] = tm * (2.0 * fz_unit (in) - 1.0);
      tb[i] = tm * (2.0 * fz_unit (in) - 1.0);
      x = b[i] + L * (0.002 + 0.2 * fz_unit (in));
    }
}

int
LLVMFuzzerTestOneInput (const uint8_t *data, size_t size)
{
  fuzz_in in = { data, size };
  if (tw == NULL)
    {
      tw = holent_tfd_workspace_alloc (2 * NI);
      sw = holent_surface_workspace_alloc ();
      CHECK (tw && sw, "alloc");
    }
  int circle = fz_byte (&in) & 1;
  double beta = fz_mag (&in, -2, 2), L = beta * fz_mag (&in, -1.5, 1.5);
  double eps = fz_mag (&in, -8, -2) * (circle ? L : beta);
  double alpha = fz_byte (&in) % 3 == 0 ? 0.0 : fz_mag (&in, -3, 3);
  holent_tfd_bg b;
  int st = holent_tfd_init (&b, circle, circle ? L : 0.0, eps, beta, 1.0,
                            alpha);
  CHECK (valid_status (st), "init status %d", st);
  if (st)
    return 0;
  double span = circle ? L : 4.0 * beta;
  double la[NI], lb[NI], lta[NI], ltb[NI], ra[NI], rb[NI], rta[NI], rtb[NI];
  size_t nl = (size_t) fz_int (&in, 0, NI), nr = (size_t) fz_int (&in, 1, NI);
  side_rows (&in, span, nl, la, lb, lta, ltb);
  side_rows (&in, span, nr, ra, rb, rta, rtb);
  holent_tfd_side left = { nl, la, lb, lta, ltb };
  holent_tfd_side right = { nr, ra, rb, rta, rtb };
  double dt = beta * (fz_byte (&in) % 4 == 0 ? fz_mag (&in, -1, 2)
                                             : 2.0 * fz_unit (&in) - 1.0);
  double tol = fz_mag (&in, -6, -2);
  holent_rt_result res;
  size_t ncross;
  int bad_side;
  size_t bad_row;
  st = holent_tfd_entropy (tw, &b, &left, &right, dt, &res, &ncross,
                           &bad_side, &bad_row);
  CHECK (valid_status (st), "entropy status %d", st);
  if (st == HOLENT_SUCCESS)
    {
      CHECK (isfinite (res.S), "S = %g", res.S);
      holent_tfd_config cf;
      CHECK (holent_tfd_minimiser (tw, &cf) == HOLENT_SUCCESS, "minimiser");
      CHECK (cf.npts % 2 == 0, "odd endpoints");
      int used[4 * NI] = { 0 };
      CHECK (cf.npts <= 4 * NI, "%zu endpoints", cf.npts);
      const double R = 2.0 * M_PI / beta;
      for (size_t k = 0; k < cf.npts / 2; k++)
        {
          size_t i = cf.pairs[2 * k], j = cf.pairs[2 * k + 1];
          CHECK (i < cf.npts && j < cf.npts && !used[i] && !used[j] && i != j,
                 "pair %zu: %zu %zu", k, i, j);
          used[i] = used[j] = 1;
          int bridge = cf.side[i] != cf.side[j];
          CHECK (cf.winding[k] == 0 || (bridge && circle),
                 "winding %ld off a circle's bridge", cf.winding[k]);
          if (!bridge && cf.x[j] < cf.x[i])
            {
              size_t q = i;
              i = j;
              j = q;
            }
          st = holent_surface_tfd_winding (sw, &b, cf.x[i], cf.t[i],
                                           cf.side[i], cf.x[j], cf.t[j],
                                           cf.side[j], cf.arcs[k],
                                           cf.winding[k], tol);
          CHECK (valid_status (st), "surface status %d", st);
          if (st)
            {
              /* only the overflow of late times, never a wrong answer */
              CHECK (st == HOLENT_ERANGE || st == HOLENT_ETOOBIG,
                     "surface of the minimiser refused: %d", st);
              continue;
            }
          const holent_curve *c = &sw->cur;
          size_t nan_rows = curve_rows (c);
          CHECK (nan_rows == (size_t) (bridge && alpha > 0.0),
                 "%zu NaN rows", nan_rows);
          /* in either order: on a circle a geodesic within a side may
             run from its second endpoint over the arc it subtends */
          int ok[2] = { 1, 1 };
          for (int o = 0; o < 2; o++)
            for (int q = 0; q < 2; q++)
              {
                size_t ep = (q ^ o) ? j : i, row = q ? c->n - 1 : 0;
                double t = cf.t[ep];
                double X = (cf.side[ep] ? 1 : -1) * cosh (R * t);
                double T = sinh (R * t), sc = fmax (1.0, cosh (R * t));
                /* x: the endpoint's, up to the lift by whole circles */
                double d = c->t[row] - cf.x[ep];
                if (circle)
                  d = remainder (d, L);
                if (!(fabs (c->x[row] - X) <= 1e-12 * sc
                      && fabs (c->y[row] - T) <= 1e-12 * sc
                      && fabs (d) <= 1e-9 * fmax (1.0, fabs (cf.x[ep]))))
                  ok[o] = 0;
              }
          CHECK (ok[0] || ok[1], "ends (%g, %g, %g), (%g, %g, %g) are not "
                 "the boundary points of the pair", c->x[0], c->y[0],
                 c->t[0], c->x[c->n - 1], c->y[c->n - 1], c->t[c->n - 1]);
        }
      if (cf.horizon)
        CHECK (holent_surface_tfd_horizon (sw, &b, 0.0, L) == HOLENT_SUCCESS,
               "horizon");
      /* the runner-up (line): never below the minimum */
      size_t rp[4 * NI];
      double Sr;
      st = holent_surface_tfd_runner_up (sw, &b, cf.npts, cf.x, cf.t, cf.side,
                                         cf.pairs, rp, &Sr);
      CHECK (valid_status (st), "runner-up status %d", st);
      CHECK (st != HOLENT_EUNSUP || circle, "runner-up refused on the line");
      if (st == HOLENT_SUCCESS)
        CHECK (isfinite (Sr) && Sr >= res.S - 1e-12 * (1.0 + fabs (res.S)),
               "runner-up %.17g below the minimum %.17g", Sr, res.S);
    }
  /* raw numbers, sides and windings */
  double xa = (fz_byte (&in) & 1 ? -1 : 1) * fz_mag (&in, -12, 12);
  double xb = (fz_byte (&in) & 1 ? -1 : 1) * fz_mag (&in, -12, 12);
  double ta = (fz_byte (&in) & 1 ? -1 : 1) * fz_mag (&in, -12, 3);
  double tb = (fz_byte (&in) & 1 ? -1 : 1) * fz_mag (&in, -12, 3);
  unsigned k = fz_byte (&in);
  if (k % 7 == 0)
    xb = NAN;
  else if (k % 7 == 1)
    tb = INFINITY;
  else if (k % 7 == 2)
    xb = xa;
  int sa = fz_byte (&in) % 3, sb = fz_byte (&in) % 2;   /* sa = 2: invalid */
  long wd = (long) fz_int (&in, -3, 3);
  double arc = fz_byte (&in) % 2 ? NAN : fabs (xb - xa);
  st = holent_surface_tfd_winding (sw, &b, xa, ta, sa, xb, tb, sb, arc, wd,
                                   tol);
  CHECK (valid_status (st), "raw surface status %d", st);
  if (st == HOLENT_SUCCESS)
    curve_rows (&sw->cur);
  return 0;
}
