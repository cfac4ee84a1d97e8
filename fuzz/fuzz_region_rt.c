/* libFuzzer harness: region normaliser + RT minimiser.
 * The bytes choose an AdS3 background and up to 12 rows whose coordinates
 * span many orders of magnitude, often touching to the last ulp.
 * Oracles beyond "no crash":
 *  - failures name valid rows and the right reason (overlapping rows do
 *    meet, an empty row is empty to rounding, a reversed row is reversed);
 *  - a normalised region has strictly ascending points (in [0, L) on a
 *    circle) and keeps the total length of its rows;
 *  - the fast sweep and the cubic DP give the same S, never NaN;
 *  - the minimiser is a valid non-crossing pairing of the endpoints;
 *  - one interval gives the single-interval kernel (holent_interval);
 *  - on a circle S(A) = S(A^c) without a horizon (pure state, and thermal
 *    AdS at leading order), |S(A) - S(A^c)| <= S_BH with one (Araki-Lieb
 *    for the thermal state purified by the other side; common practice).
 * fuzz-core: holent_region holent_rt holent_interval holent_root holent_geo holent_vmath holent_status
 * fuzz-runs: 3000 (make check)
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <float.h>
#include <stdio.h>
#include <stdlib.h>
#include "fuzz_input.h"
#include "holent_region.h"
#include "holent_rt.h"
#include "holent_interval.h"

#define NR 12

static holent_rt_workspace *ws_dp, *ws_fast;
static holent_region *reg, *comp;

static int
make_bg (fuzz_in *in, holent_geo_bg *bg)
{
  holent_bulk bulk = (holent_bulk) fz_int (in, 0, 7);
  double L = fz_mag (in, -3, 6);
  double eps = L * fz_mag (in, -9, -2.5);
  double bl = L * fz_mag (in, -3, 1), br = bl * fz_mag (in, -0.5, 0.5);
  double alpha = 0.02 + 0.98 * fz_unit (in), c = fz_mag (in, -1, 4);
  if (bulk == HOLENT_BULK_BTZ || bulk == HOLENT_BULK_THERMAL_ADS
      || bulk == HOLENT_BULK_PLANAR_BTZ)
    br = bl;
  return holent_geo_bg_init (bg, bulk, L, eps, bl, br, alpha, c);
}

static void
make_rows (fuzz_in *in, const holent_geo_bg *bg, size_t n, double *a,
           double *b)
{
  double x = bg->circle ? bg->L * fz_unit (in)
                        : (fz_byte (in) & 1 ? -1 : 1) * fz_mag (in, -9, 12);
  for (size_t i = 0; i < n; i++)
    {
      unsigned kind = fz_byte (in) % 6;
      double w = (bg->circle ? bg->L : fmax (fabs (x), 1.0))
                 * fz_mag (in, -10, 0) * 0.5;
      double s = x;
      if (kind == 1)
        s = nextafter (x, INFINITY);
      else if (kind == 2)
        s = nextafter (x, -INFINITY);
      else if (kind == 3)
        s = x + fabs (x) * fz_mag (in, -15, -6);
      else if (kind == 4)
        s = x + fz_mag (in, -9, 12);
      else if (kind == 5)  /* a reversed or far row */
        s = (fz_byte (in) & 1 ? -1 : 1) * fz_mag (in, -9, 14);
      a[i] = s;
      b[i] = s + (fz_byte (in) == 0 ? -w : w);
      x = b[i];
    }
  for (size_t i = n; i > 1; i--)
    {
      size_t j = fz_byte (in) % i;
      double t = a[i - 1]; a[i - 1] = a[j]; a[j] = t;
      t = b[i - 1]; b[i - 1] = b[j]; b[j] = t;
    }
}

static double
scale_of (const holent_geo_bg *bg, double x, double y)
{
  return fmax (bg->circle ? bg->L : 0.0, fmax (fabs (x), fabs (y)));
}

static void
check_failure (int st, const holent_region *r, const holent_geo_bg *bg,
               size_t n, const double *a, const double *b)
{
  size_t i = r->bad[0], j = r->bad[1];
  switch (st)
    {
    case HOLENT_EOVERLAP:
      CHECK (i < j && j < n, "overlap rows %zu %zu of %zu", i, j, n);
      if (!bg->circle)
        {
          double meet = fmin (b[i], b[j]) - fmax (a[i], a[j]);
          double tol = 2 * HOLENT_REGION_ULPS * DBL_EPSILON
                       * fmax (scale_of (bg, a[i], b[i]), scale_of (bg, a[j], b[j]));
          CHECK (meet > -tol, "rows %zu, %zu reported overlapping do not meet", i, j);
        }
      break;
    case HOLENT_EEMPTY:
      {
        CHECK (i < n, "empty row %zu of %zu", i, n);
        double d = b[i] - a[i], tol = 2 * HOLENT_REGION_ULPS * DBL_EPSILON
                                      * scale_of (bg, a[i], b[i]);
        if (bg->circle)
          d = fmin (fabs (fmod (d, bg->L)), bg->L - fabs (fmod (d, bg->L)));
        CHECK (fabs (d) <= tol, "row %zu reported empty has length %g", i, d);
        break;
      }
    case HOLENT_EDOM:
      CHECK (i < n, "domain row %zu of %zu", i, n);
      CHECK (bg->circle ? b[i] - a[i] > bg->L : b[i] < a[i],
             "row %zu reported reversed or too long is not", i);
      break;
    case HOLENT_EINVAL:
      CHECK (i < n && !isfinite (b[i] - a[i]), "invalid row %zu", i);
      break;
    default:
      CHECK (0, "unexpected status %d", st);
    }
}

static void
check_pairs (const size_t *pairs, size_t m)
{
  size_t N = 2 * m;
  unsigned char seen[2 * NR] = { 0 };
  for (size_t k = 0; k < m; k++)
    {
      size_t i = pairs[2 * k], j = pairs[2 * k + 1];
      CHECK (i < j && j < N && !seen[i] && !seen[j] && (j - i) % 2 == 1,
             "bad pair (%zu, %zu)", i, j);
      seen[i] = seen[j] = 1;
      for (size_t l = 0; l < k; l++)
        {
          size_t p = pairs[2 * l], q = pairs[2 * l + 1];
          CHECK (!((p < i && i < q && q < j) || (i < p && p < j && j < q)),
                 "pairs (%zu, %zu) and (%zu, %zu) cross", p, q, i, j);
        }
    }
}

static double
entropy (const holent_geo_bg *bg, const holent_region *r, size_t *pairs)
{
  holent_rt_result dp, fast;
  int st = holent_rt_entropy_method (ws_dp, bg, r, HOLENT_RT_DP, &dp, pairs, NULL);
  CHECK (st == HOLENT_SUCCESS, "DP failed with %d on a normalised region", st);
  CHECK (isfinite (dp.S) && isfinite (dp.length), "S = %g", dp.S);
  st = holent_rt_entropy_method (ws_fast, bg, r, HOLENT_RT_FAST, &fast, NULL, NULL);
  CHECK (st == HOLENT_SUCCESS || st == HOLENT_EUNSUP, "fast failed with %d", st);
  if (st == HOLENT_SUCCESS)
    CHECK (fabs (fast.S - dp.S) <= 1e-12 * fmax (1.0, fabs (dp.S)),
           "fast S = %.17g, DP S = %.17g", fast.S, dp.S);
  return dp.S;
}

int
LLVMFuzzerTestOneInput (const uint8_t *data, size_t size)
{
  fuzz_in in = { data, size };
  holent_geo_bg bg;
  double a[NR], b[NR];
  size_t pairs[2 * NR];
  if (ws_dp == NULL)
    {
      ws_dp = holent_rt_workspace_alloc_dp (NR);
      ws_fast = holent_rt_workspace_alloc (NR);
      reg = holent_region_alloc (NR);
      comp = holent_region_alloc (NR);
    }
  if (make_bg (&in, &bg) != HOLENT_SUCCESS)
    return 0;
  size_t n = (size_t) fz_int (&in, 1, NR);
  make_rows (&in, &bg, n, a, b);
  int st = holent_region_set (reg, bg.circle, bg.L, n, a, b);
  if (st != HOLENT_SUCCESS)
    {
      check_failure (st, reg, &bg, n, a, b);
      return 0;
    }
  /* the normalised region */
  double top = bg.circle ? bg.L : 0.0, total = 0.0, rows = 0.0;
  for (size_t i = 0; i < n; i++)
    {
      top = fmax (top, fmax (fabs (a[i]), fabs (b[i])));
      double d = b[i] - a[i];
      rows += bg.circle ? d - bg.L * floor (d / bg.L) : d;
    }
  if (reg->whole)
    total = bg.L;
  for (size_t k = 0; k < reg->n; k++)
    {
      CHECK (reg->len[k] > 0, "length %g", reg->len[k]);
      total += reg->len[k];
    }
  for (size_t k = 0; k + 1 < 2 * reg->n; k++)
    CHECK (reg->pts[k] < reg->pts[k + 1], "points not ascending at %zu", k);
  if (bg.circle && reg->n > 0)
    CHECK (reg->pts[0] >= 0 && reg->pts[2 * reg->n - 1] < bg.L, "points outside [0, L)");
  CHECK (fabs (total - rows) <= 4 * HOLENT_REGION_ULPS * DBL_EPSILON * top * (n + 1),
         "total length %.17g, rows %.17g", total, rows);
  if (!bg.circle && top > 1e6 * bg.eps / DBL_EPSILON)
    return 0;  /* the cutoff is below the resolution of the coordinates */

  double S = entropy (&bg, reg, pairs);
  check_pairs (pairs, reg->n);
  if (reg->n == 1)
    {
      double S1;
      st = holent_interval_entropy (&bg, 1, reg->len, &S1, NULL, NULL, NULL);
      CHECK (st == HOLENT_SUCCESS, "single interval failed %d", st);
      /* on a circle log sin(pi l/L) near l = L is only as good as the
         rounding of pi l/L: allow c eps L/(L - l) */
      double cond = bg.circle ? bg.L / fmin (reg->len[0], bg.L - reg->len[0]) : 1.0;
      CHECK (fabs (S1 - S) <= 1e-11 * fmax (1.0, fabs (S)) + 4 * bg.c * DBL_EPSILON * cond,
             "one interval: RT %.17g, kernel %.17g", S, S1);
    }
  if (bg.circle && !reg->whole)
    {
      /* the complement: the gaps between the intervals */
      size_t m = reg->n;
      for (size_t k = 0; k < m; k++)
        {
          a[k] = reg->start[k] + reg->len[k];
          b[k] = reg->start[(k + 1) % m] + (k + 1 == m ? bg.L : 0.0);
        }
      st = holent_region_set (comp, 1, bg.L, m, a, b);
      if (st != HOLENT_SUCCESS)
        return 0;  /* a gap at the resolution of the coordinates */
      double Sc = entropy (&bg, comp, pairs);
      /* lengths of arcs next to L are only as good as L - arc: allow
         c eps L/(smallest interval or gap) per geodesic */
      double dmin = bg.L;
      for (size_t k = 0; k < m; k++)
        dmin = fmin (dmin, fmin (reg->len[k], b[k] - a[k]));
      double tol = 1e-10 * fmax (1.0, fmax (fabs (S), fabs (Sc)))
                   + 4 * (double) m * bg.c * DBL_EPSILON * bg.L / dmin;
      if (bg.horizon)
        CHECK (fabs (S - Sc) <= bg.S_BH + tol, "|S(A) - S(Ac)| = %g > S_BH = %g",
               fabs (S - Sc), bg.S_BH);
      else
        CHECK (fabs (S - Sc) <= tol, "S(A) = %.17g != S(Ac) = %.17g", S, Sc);
    }
  return 0;
}
