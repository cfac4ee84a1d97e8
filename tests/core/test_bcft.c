/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_bcft: every error path; log g against GSL's
 * arctanh (Takayanagi 2011, PRL 107, 101602); brane-ending lengths against
 * a GSL Brent minimisation of the hyperbolic distance over the landing
 * point on the brane; the dynamic programme against a brute-force
 * enumeration of every non-crossing configuration; the Page-curve
 * reduction against a brute force over two-sided configurations, and its
 * minimiser and runner-up at a time (the island and no-island classes)
 * against that brute force split by geodesics through the bridge.  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_min.h>
#include <gsl/gsl_sys.h>
#include "holent_ctest.h"
#include "holent_bcft.h"

static void
test_init (void)
{
  holent_bcft_bg bg;
  int bad;
  HT_STATUS (holent_bcft_bg_init (NULL, 0, 1, 1e-3, INFINITY, 0, 0, 1, 0, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_bcft_bg_init (&bg, 7, 1, 1e-3, INFINITY, 0, 0, 1, 0, &bad), HOLENT_EINVAL);
  HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-3, INFINITY, 0, 0, 1, 9, &bad), HOLENT_EINVAL);
  HT_CHECK (bad == 6, "bad %d", bad);
  HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, NAN, INFINITY, 0, 0, 1, 0, &bad), HOLENT_EINVAL);
  HT_CHECK (bad == 1, "bad %d", bad);
  HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-3, INFINITY, 1.0, 0, 1, 0, &bad), HOLENT_EDOM);
  HT_CHECK (bad == 3, "bad %d", bad);
  HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-3, INFINITY, -1.0, 0, 1, 0, &bad), HOLENT_EDOM);
  HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 0.0, INFINITY, 0.2, 0, 1, 0, &bad), HOLENT_EDOM);
  HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-3, -1, 0.2, 0, 1, 0, &bad), HOLENT_EDOM);
  HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-3, 1, 0.2, 0, -1, 0, &bad), HOLENT_EDOM);
  HT_CHECK (bad == 5, "bad %d", bad);
  HT_STATUS (holent_bcft_bg_init (&bg, 1, -1, 1e-3, 1, 0.2, 0.2, 1, 0, &bad), HOLENT_EDOM);
  HT_CHECK (bad == 0, "bad %d", bad);
  HT_STATUS (holent_bcft_bg_init (&bg, 1, 1, 1e-3, 1, 0.2, 1.5, 1, 0, &bad), HOLENT_EDOM);
  HT_CHECK (bad == 4, "bad %d", bad);
  /* unequal tensions: only the BTZ saddle */
  HT_STATUS (holent_bcft_bg_init (&bg, 1, 1, 1e-3, INFINITY, 0.2, 0.3, 1, 0, &bad), HOLENT_EUNSUP);
  HT_STATUS (holent_bcft_bg_init (&bg, 1, 1, 1e-3, 10, 0.2, 0.3, 1, HOLENT_BCFT_THERMAL_ADS, &bad), HOLENT_EUNSUP);
  HT_STATUS (holent_bcft_bg_init (&bg, 1, 1, 1e-3, 10, 0.2, 0.3, 1, 0, &bad), HOLENT_SUCCESS);
  HT_CHECK (bg.btz, "unequal tensions use BTZ");
  /* BTZ forced at zero temperature; branes that would meet */
  HT_STATUS (holent_bcft_bg_init (&bg, 1, 1, 1e-3, INFINITY, 0.2, 0.2, 1, HOLENT_BCFT_BTZ, &bad), HOLENT_EDOM);
  HT_STATUS (holent_bcft_bg_init (&bg, 1, 1, 1e-3, 10, -0.9, -0.9, 1, HOLENT_BCFT_BTZ, &bad), HOLENT_EDOM);
  /* TFD: finite beta, non-negative tension */
  HT_STATUS (holent_bcft_bg_init (&bg, 2, 1, 1e-3, INFINITY, 0.2, 0, 1, 0, &bad), HOLENT_EDOM);
  HT_STATUS (holent_bcft_bg_init (&bg, 2, 1, 1e-3, 1, -0.2, 0, 1, 0, &bad), HOLENT_EDOM);
  HT_STATUS (holent_bcft_bg_init (&bg, 2, NAN, 1e-3, 1, 0.2, 0, 1, 0, &bad), HOLENT_EINVAL);

  /* log g = (c/6) arctanh T (Takayanagi 2011), GSL's gsl_atanh */
  for (double T = -0.95; T < 0.96; T += 0.05)
    {
      HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-3, INFINITY, T, 0, 12, 0, &bad), HOLENT_SUCCESS);
      HT_CLOSE (bg.log_g[0], 2.0 * gsl_atanh (T), 1e-14);
    }
  HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-3, INFINITY, 0.0, 0, 12, 0, &bad), HOLENT_SUCCESS);
  HT_CHECK (bg.log_g[0] == 0.0, "log g at T = 0");

  /* Hawking-Page with boundary entropy: the free energies
     -pi c l/(6 beta) - log g0 g1 and -pi c beta/(24 l) cross at beta_c */
  HT_STATUS (holent_bcft_bg_init (&bg, 1, 3, 1e-3, 5, 0.4, 0.4, 2, 0, &bad), HOLENT_SUCCESS);
  {
    double bc = bg.beta_c, l = 3, c = 2;
    HT_CLOSE (M_PI * c * l / (6 * bc) + 2 * bg.log_g[0], M_PI * c * bc / (24 * l), 1e-13);
  }
  HT_STATUS (holent_bcft_bg_init (&bg, 1, 3, 1e-3, INFINITY, 0, 0, 2, 0, &bad), HOLENT_SUCCESS);
  HT_CLOSE (bg.beta_c, 6.0, 1e-14);   /* beta_c = 2 l without tension */
}

/* hyperbolic distance of the slice, by embedding (common practice) */
typedef struct
{
  const holent_bcft_bg *bg;
  double x, z;   /* boundary point at the cutoff */
  int end;
} dist_ctx;

/* The constructor of ads3_background's states: options, Brown-Henneaux
   (Brown and Henneaux 1986, Commun. Math. Phys. 104, 207), reasons.  */
static holent_bcft_spec
spec0 (holent_bcft_kind kind)
{
  holent_bcft_spec sp = { kind, NAN, NAN, NAN, NAN, NAN, NAN, NAN,
                          NULL, 0, 0, 0, HOLENT_BCFT_DOMINANT };
  return sp;
}

static void
test_make (void)
{
  holent_bcft_bg bg;
  holent_err err;
  holent_bcft_spec sp = spec0 (HOLENT_BCFT_HALF_LINE);
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_SUCCESS);
  HT_CHECK (bg.eps == 1e-6 && bg.c == 1.0 && bg.ell == 1.0 && bg.pure, "defaults");
  HT_CHECK (strcmp (holent_bcft_bulk_name (&bg), "poincare") == 0, "bulk");
  sp.G = 0.75;
  sp.ell = 2.0;
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_SUCCESS);
  HT_CLOSE (bg.c, 4.0, 1e-15);
  sp.c = 3.0;
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_EINCONSISTENT);
  HT_CHECK (strstr (err.reason, "Brown-Henneaux") != NULL, "%s", err.reason);
  sp = spec0 (HOLENT_BCFT_INTERVAL);
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_EOPTION);
  HT_CHECK (strstr (err.reason, "'length'") != NULL, "%s", err.reason);
  sp.length = 2.0;
  double v[3] = { 0.1, 0.2, 0.3 };
  sp.values = v;
  sp.nvalues = 3;
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_ESIZE);
  sp.nvalues = 2;
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_EUNSUP);
  HT_CHECK (strstr (err.reason, "unequal tensions") != NULL, "%s", err.reason);
  sp.T = 2.0;
  sp.is_log_g = 1;
  sp.c = 6.0;
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_SUCCESS);
  HT_CLOSE (bg.beta, 0.5, 1e-15);
  HT_CLOSE (bg.log_g[1], 0.2, 1e-14);    /* log g returned as given */
  HT_CHECK (strcmp (holent_bcft_saddle_name (&bg), "btz") == 0, "saddle");
  sp.beta = 1.0;
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_EOPTION);
  sp = spec0 (HOLENT_BCFT_HALF_LINE);
  sp.beta = INFINITY;      /* a given beta is finite */
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_EDOM);
  sp = spec0 (HOLENT_BCFT_TFD);
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_EOPTION);
  HT_CHECK (strstr (err.reason, "needs 'beta'") != NULL, "%s", err.reason);
  sp.beta = 1.0;
  sp.has_saddle = 1;
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_EOPTION);
  sp.has_saddle = 0;
  v[0] = -0.1;
  sp.values = v;
  sp.nvalues = 1;
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_EDOM);
  HT_CHECK (strstr (err.reason, "[0, 1/ell)") != NULL, "%s", err.reason);
  v[0] = NAN;
  HT_STATUS (holent_bcft_bg_make (&bg, &sp, &err), HOLENT_ENAN);
  HT_STATUS (holent_bcft_bg_make (NULL, &sp, &err), HOLENT_EINVAL);
  holent_bcft_kind k;
  holent_bcft_saddle sd;
  HT_STATUS (holent_bcft_kind_of ("bcft_tfd", "interval", &k, &err), HOLENT_EBOUNDARY);
  HT_STATUS (holent_bcft_kind_of ("bcft", "interval", &k, &err), HOLENT_SUCCESS);
  HT_CHECK (k == HOLENT_BCFT_INTERVAL, "kind");
  HT_STATUS (holent_bcft_kind_of ("vacuum", "line", &k, &err), HOLENT_EBACKGROUND);
  HT_STATUS (holent_bcft_saddle_of ("", &sd, &err), HOLENT_SUCCESS);
  HT_STATUS (holent_bcft_saddle_of ("hot", &sd, &err), HOLENT_EOPTION);
}

static double
brane_x_of_z (const holent_bcft_bg *bg, double z, int end)
{
  double sh = sinh (bg->rho[end]);
  if (!bg->btz)
    return -z * sh;
  double off = bg->zh * asinh (-sh * z / bg->zh);
  return end ? bg->length - off : off;
}

static double
slice_dist (const holent_bcft_bg *bg, double x1, double z1, double x2, double z2)
{
  if (!bg->btz)
    return acosh (1 + ((x1 - x2) * (x1 - x2) + (z1 - z2) * (z1 - z2)) / (2 * z1 * z2));
  /* planar BTZ: T0 = cosh(x/zh) zh/z, X1 = sinh(x/zh) zh/z,
     X2 = sqrt(zh^2/z^2 - 1) (Banados, Henneaux, Teitelboim, Zanelli 1993) */
  double zh = bg->zh;
  double ch = (zh / z1) * (zh / z2) * cosh ((x1 - x2) / zh)
              - sqrt (zh * zh / (z1 * z1) - 1) * sqrt (zh * zh / (z2 * z2) - 1);
  return acosh (ch);
}

static double
fdist (double q, void *p)
{
  dist_ctx *c = p;
  /* BTZ: the landing point may sit exponentially close to the horizon */
  double z = c->bg->btz ? c->bg->zh * tanh (q) : q;
  return slice_dist (c->bg, c->x, c->z, brane_x_of_z (c->bg, z, c->end), z);
}

static double
min_dist (const holent_bcft_bg *bg, double x, int end, double zmax, double zguess,
          double *zmin)
{
  dist_ctx ctx = { bg, x, bg->eps, end };
  gsl_function F = { fdist, &ctx };
  /* a coarse scan brackets the minimum, Brent refines it */
  (void) zguess;
  if (bg->btz)
    zmax = 40.0;
  double lo0 = 1e-6 * zmax, r = pow (zmax / lo0, 1.0 / 400), zb = lo0, fb = INFINITY;
  for (double z = lo0; z <= zmax; z *= r)
    if (fdist (z, &ctx) < fb)
      {
        fb = fdist (z, &ctx);
        zb = z;
      }
  double lo = zb / r, hi = zb * r > zmax ? zmax : zb * r;
  gsl_min_fminimizer *s = gsl_min_fminimizer_alloc (gsl_min_fminimizer_brent);
  if (gsl_min_fminimizer_set (s, &F, zb, lo, hi) != GSL_SUCCESS)
    {
      gsl_min_fminimizer_free (s);
      return NAN;
    }
  for (int it = 0; it < 200; it++)
    {
      gsl_min_fminimizer_iterate (s);
      lo = gsl_min_fminimizer_x_lower (s);
      hi = gsl_min_fminimizer_x_upper (s);
      if (gsl_min_test_interval (lo, hi, 1e-13, 0) == GSL_SUCCESS)
        break;
    }
  *zmin = gsl_min_fminimizer_x_minimum (s);
  if (bg->btz)
    *zmin = bg->zh * tanh (*zmin);
  double v = gsl_min_fminimizer_f_minimum (s);
  gsl_min_fminimizer_free (s);
  return v;
}

static void
test_brane_lengths (void)
{
  holent_bcft_bg bg;
  double len, xb, zb, zmin;
  const double Ts[] = { -0.7, -0.2, 0.0, 0.3, 0.8 };
  for (int k = 0; k < 5; k++)
    {
      /* zero temperature half line */
      HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-7, INFINITY, Ts[k], 0, 1, 0, NULL), HOLENT_SUCCESS);
      for (double x = 0.3; x < 10; x *= 3)
        {
          HT_STATUS (holent_bcft_brane_length (&bg, x, 0, &len, &xb, &zb), HOLENT_SUCCESS);
          double d = min_dist (&bg, x, 0, 10 * x, x * 0.7, &zmin);
          HT_CLOSE (len, d, 1e-9);
          HT_CLOSE (zb, zmin, 1e-5);
          HT_CLOSE (xb, brane_x_of_z (&bg, zb, 0), 1e-14);
        }
      /* finite temperature half line, planar BTZ */
      HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-7, 2.0, Ts[k], 0, 1, 0, NULL), HOLENT_SUCCESS);
      for (double x = 0.1; x < 3; x *= 2.5)
        {
          HT_STATUS (holent_bcft_brane_length (&bg, x, 0, &len, &xb, &zb), HOLENT_SUCCESS);
          double d = min_dist (&bg, x, 0, bg.zh * (1 - 1e-12), zb * 0.9, &zmin);
          HT_CLOSE (len, d, 1e-9);
          HT_CLOSE (zb, zmin, 1e-5);
        }
      /* interval, BTZ saddle: the brane at the far end */
      HT_STATUS (holent_bcft_bg_init (&bg, 1, 4.0, 1e-7, 1.0, 0.1, Ts[k], 1, HOLENT_BCFT_BTZ, NULL), HOLENT_SUCCESS);
      HT_STATUS (holent_bcft_brane_length (&bg, 3.2, 1, &len, &xb, &zb), HOLENT_SUCCESS);
      HT_CLOSE (len, min_dist (&bg, 3.2, 1, bg.zh * (1 - 1e-12), zb * 0.9, &zmin), 1e-9);
    }
  /* errors */
  HT_STATUS (holent_bcft_bg_init (&bg, 0, 1, 1e-7, INFINITY, 0.3, 0, 1, 0, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_bcft_brane_length (&bg, 0.0, 0, &len, NULL, NULL), HOLENT_EDOM);
  HT_STATUS (holent_bcft_brane_length (&bg, -1.0, 0, &len, NULL, NULL), HOLENT_EDOM);
  HT_STATUS (holent_bcft_brane_length (&bg, NAN, 0, &len, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_bcft_brane_length (&bg, 1.0, 1, &len, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_bcft_brane_length (&bg, 1.0, 0, NULL, NULL, NULL), HOLENT_EINVAL);
  HT_STATUS (holent_bcft_pair_length (&bg, 1.0, 1.0, &len), HOLENT_ECOINCIDE);
  HT_STATUS (holent_bcft_pair_length (&bg, 0.0, 1.0, &len), HOLENT_EDOM);
  HT_STATUS (holent_bcft_pair_length (&bg, 2.0, 1.0, &len), HOLENT_SUCCESS);
  HT_CLOSE (len, 2 * log (1.0 / 1e-7), 1e-14);
}

/* ---- brute force over configurations ---- */
typedef struct
{
  int N;
  double pc[16][16];   /* pair cost, i < j */
  double lc[16], rc[16];
  int c0;
  double hlen;
  int stack[16], sp, assign[16], label[16];
  double best, second;   /* the two least values (ties counted twice) */
} brute;

static void
brute_rec (brute *B, int i, double acc)
{
  if (i == B->N)
    {
      if (B->sp)
        return;
      int nl = 0, seenR = 0;
      for (int k = 0; k < B->N; k++)
        if (B->assign[k] < 0)
          {
            if (B->label[k] == 0)
              {
                if (seenR)
                  return;
                nl++;
              }
            else
              seenR = 1;
          }
      if (B->c0 ^ (nl & 1))
        acc += B->hlen;
      if (acc < B->best)
        {
          B->second = B->best;
          B->best = acc;
        }
      else if (acc < B->second)
        B->second = acc;
      return;
    }
  /* open a pair */
  B->stack[B->sp++] = i;
  B->assign[i] = 1;
  brute_rec (B, i + 1, acc);
  B->sp--;
  /* close the innermost open pair */
  if (B->sp)
    {
      int j = B->stack[--B->sp];
      B->assign[i] = 1;
      brute_rec (B, i + 1, acc + B->pc[j][i]);
      B->stack[B->sp++] = j;
    }
  else
    {
      /* a single: to the left or right end */
      B->assign[i] = -1;
      B->label[i] = 0;
      brute_rec (B, i + 1, acc + B->lc[i]);
      B->label[i] = 1;
      if (isfinite (B->rc[i]))
        brute_rec (B, i + 1, acc + B->rc[i]);
    }
}

static void
test_dp_brute (void)
{
  holent_bcft_workspace *w = holent_bcft_workspace_alloc (6);
  holent_bcft_bg bgs[4];
  HT_STATUS (holent_bcft_bg_init (bgs + 0, 0, 1, 1e-3, INFINITY, -0.4, 0, 1, 0, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_bcft_bg_init (bgs + 1, 0, 1, 1e-3, 1.5, 0.6, 0, 1, 0, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_bcft_bg_init (bgs + 2, 1, 5, 1e-3, INFINITY, 0.3, 0.3, 1, 0, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_bcft_bg_init (bgs + 3, 1, 5, 1e-3, 1.2, 0.5, -0.3, 1, 0, NULL), HOLENT_SUCCESS);
  srand (12345);
  for (int trial = 0; trial < 400; trial++)
    {
      const holent_bcft_bg *bg = bgs + trial % 4;
      double L = isfinite (bg->length) ? bg->length : 6.0;
      int n = 1 + rand () % 4;
      double cuts[8];
      for (int k = 0; k < 2 * n; k++)
        cuts[k] = L * (rand () + 1.0) / (RAND_MAX + 2.0);
      for (int i = 1; i < 2 * n; i++)   /* insertion sort */
        for (int j = i; j > 0 && cuts[j] < cuts[j - 1]; j--)
          {
            double t = cuts[j]; cuts[j] = cuts[j - 1]; cuts[j - 1] = t;
          }
      if (trial % 5 == 0)
        cuts[0] = 0.0;             /* adjacent to the boundary */
      if (trial % 7 == 0 && isfinite (bg->length))
        cuts[2 * n - 1] = L;
      double a[4], b[4];
      for (int k = 0; k < n; k++)
        {
          a[n - 1 - k] = cuts[2 * k];   /* rows out of order */
          b[n - 1 - k] = cuts[2 * k + 1];
        }
      holent_bcft_result r;
      holent_err err;
      int st = holent_bcft_entropy (w, bg, (size_t) n, a, b, &r, &err, NULL);
      HT_STATUS (st, HOLENT_SUCCESS);
      if (st)
        continue;
      brute B;
      memset (&B, 0, sizeof B);
      B.N = (int) r.m;
      for (int i = 0; i < B.N; i++)
        {
          double len;
          for (int j = i + 1; j < B.N; j++)
            holent_bcft_pair_length (bg, r.pts[i], r.pts[j], B.pc[i] + j);
          holent_bcft_brane_length (bg, r.pts[i], 0, &len, NULL, NULL);
          B.lc[i] = len;
          B.rc[i] = INFINITY;
          if (bg->kind == HOLENT_BCFT_INTERVAL && bg->btz)
            {
              holent_bcft_brane_length (bg, r.pts[i], 1, &len, NULL, NULL);
              B.rc[i] = len;
            }
        }
      B.c0 = cuts[0] == 0.0;
      B.hlen = bg->btz && bg->kind == HOLENT_BCFT_INTERVAL ? 6.0 * bg->S_H / bg->c : 0.0;
      B.best = INFINITY;
      brute_rec (&B, 0, 0.0);
      double Sb = bg->c / 6.0 * B.best;
      HT_CLOSE (r.S, Sb, 1e-12);
      /* the reported configuration adds up to S */
      double sum = 0, len;
      for (size_t q = 0; q < r.npairs; q++)
        {
          holent_bcft_pair_length (bg, r.pts[r.pairs[2 * q]], r.pts[r.pairs[2 * q + 1]], &len);
          sum += len;
        }
      for (size_t q = 0; q < r.nbrane; q++)
        {
          holent_bcft_brane_length (bg, r.pts[r.brane[q]], r.brane_end[q], &len, NULL, NULL);
          sum += len;
        }
      HT_CLOSE (r.length, sum, 1e-12);
      HT_CHECK (2 * r.npairs + r.nbrane == r.m, "every endpoint used once");
      /* the runner-up: the second least value of the brute force, where
         an unbounded horizon (half line) is no candidate */
      brute B2 = B;
      if (bg->btz && bg->kind != HOLENT_BCFT_INTERVAL)
        B2.hlen = INFINITY;
      B2.best = B2.second = INFINITY;
      brute_rec (&B2, 0, 0.0);
      st = holent_bcft_runner_up (w, bg, &r);
      if (isfinite (B2.second))
        {
          HT_STATUS (st, HOLENT_SUCCESS);
          HT_CLOSE (r.S, bg->c / 6.0 * B2.second, 1e-12);
          HT_CHECK (2 * r.npairs + r.nbrane == r.m, "runner-up uses every endpoint");
        }
      else
        HT_STATUS (st, HOLENT_EDOM);
    }
  {
    holent_bcft_result r;
    HT_STATUS (holent_bcft_runner_up (NULL, bgs, &r), HOLENT_EINVAL);
    memset (&r, 0, sizeof r);
    HT_STATUS (holent_bcft_runner_up (w, bgs, &r), HOLENT_EINVAL);
    /* 9 intervals: 18 endpoints, beyond the brute force */
    holent_bcft_workspace *w9 = holent_bcft_workspace_alloc (9);
    double a9[9], b9[9];
    holent_err e9;
    for (int k = 0; k < 9; k++)
      {
        a9[k] = 1.0 + k;
        b9[k] = 1.5 + k;
      }
    HT_STATUS (holent_bcft_entropy (w9, bgs, 9, a9, b9, &r, &e9, NULL), HOLENT_SUCCESS);
    HT_STATUS (holent_bcft_runner_up (w9, bgs, &r), HOLENT_ETOOBIG);
    holent_bcft_workspace_free (w9);
  }
  /* errors */
  holent_bcft_result r;
  holent_err err;
  double a[3] = { 1, 2, 0.5 }, b[3] = { 1.5, 3, 1.2 };
  HT_STATUS (holent_bcft_entropy (w, bgs, 3, a, b, &r, &err, NULL), HOLENT_EOVERLAP);
  HT_CHECK (err.index == 0 || err.index == 2, "bad %zu", err.index);
  a[2] = -0.5;
  HT_STATUS (holent_bcft_entropy (w, bgs, 3, a, b, &r, &err, NULL), HOLENT_EDOM);
  HT_CHECK (err.index == 2, "bad %zu", err.index);
  HT_CHECK (strstr (err.reason, "half line") != NULL, "reason %s", err.reason);
  a[2] = NAN;
  HT_STATUS (holent_bcft_entropy (w, bgs, 3, a, b, &r, &err, NULL), HOLENT_ENAN);
  a[2] = 4; b[2] = 4;
  HT_STATUS (holent_bcft_entropy (w, bgs, 3, a, b, &r, &err, NULL), HOLENT_EEMPTY);
  b[2] = INFINITY;
  HT_STATUS (holent_bcft_entropy (w, bgs, 3, a, b, &r, &err, NULL), HOLENT_EDOM);
  b[2] = 9;
  HT_STATUS (holent_bcft_entropy (w, bgs + 2, 3, a, b, &r, &err, NULL), HOLENT_EDOM);  /* past length 5 */
  HT_STATUS (holent_bcft_entropy (w, bgs, 0, a, b, &r, &err, NULL), HOLENT_EEMPTY);
  HT_STATUS (holent_bcft_entropy (w, bgs, 7, a, b, &r, &err, NULL), HOLENT_ETOOBIG);
  HT_STATUS (holent_bcft_entropy (NULL, bgs, 3, a, b, &r, &err, NULL), HOLENT_EINVAL);
  /* touching rows merge; the whole interval in the BTZ saddle is the horizon */
  double a2[2] = { 0, 2 }, b2[2] = { 2, 5 };
  HT_STATUS (holent_bcft_entropy (w, bgs + 3, 2, a2, b2, &r, &err, NULL), HOLENT_SUCCESS);
  HT_CHECK (r.n == 1 && r.m == 0 && r.horizon, "whole interval");
  HT_CLOSE (r.S, bgs[3].S_H, 1e-14);
  HT_STATUS (holent_bcft_entropy (w, bgs + 2, 2, a2, b2, &r, &err, NULL), HOLENT_SUCCESS);
  HT_CHECK (r.S == 0.0, "whole interval, pure state");
  HT_CHECK (holent_bcft_workspace_alloc (0) == NULL, "alloc 0");
  HT_CHECK (holent_bcft_workspace_alloc (HOLENT_BCFT_MMAX) == NULL, "alloc too big");
  holent_bcft_workspace_free (w);
}

/* A random radiation region of n (<= 3) rows [a, b] in (0, 4), the last
   reaching Inf when INF; xs gets its finite endpoints ascending.  */
static void
random_radiation (int n, int inf, double *a, double *b, double *xs)
{
  double cuts[6];
  for (int k = 0; k < 2 * n; k++)
    cuts[k] = 4.0 * (rand () + 1.0) / (RAND_MAX + 2.0);
  for (int i = 1; i < 2 * n; i++)
    for (int j = i; j > 0 && cuts[j] < cuts[j - 1]; j--)
      {
        double t = cuts[j]; cuts[j] = cuts[j - 1]; cuts[j - 1] = t;
      }
  for (int k = 0; k < n; k++)
    {
      a[k] = cuts[2 * k];
      b[k] = cuts[2 * k + 1];
    }
  if (inf)
    b[n - 1] = INFINITY;
  memcpy (xs, cuts, (size_t) (inf ? 2 * n - 1 : 2 * n) * sizeof *xs);
}

/* Costs of the 2 m points of a two-sided region at time t: the left
   points xs ascending, then the right ones descending (around the
   boundary circle of a Cauchy slice, the brane on the arc from the last
   back to the first): pairs within a side, through the bridge, and to
   the brane.  */
static void
two_sided_costs (const holent_bcft_bg *bg, const double *xs, int m, double t,
                 double pc[][16], double *lc)
{
  for (int i = 0; i < 2 * m; i++)
    {
      int si = i >= m;
      double xi = si ? xs[2 * m - 1 - i] : xs[i];
      for (int j = i + 1; j < 2 * m; j++)
        {
          int sj = j >= m;
          double xj = sj ? xs[2 * m - 1 - j] : xs[j];
          if (si == sj)
            holent_bcft_pair_length (bg, xi, xj, pc[i] + j);
          else
            holent_tfd_cross_length (&bg->tfd, xi, t, xj, t, pc[i] + j);
        }
      holent_bcft_brane_length (bg, xi, 0, lc + i, NULL, NULL);
    }
}

/* two-sided brute force: left points ascending then right descending;
   every single ends on the brane (the wrap-around arc) */
static void
test_page_brute (void)
{
  holent_bcft_workspace *w = holent_bcft_workspace_alloc (4);
  holent_bcft_bg bg;
  HT_STATUS (holent_bcft_bg_init (&bg, 2, 0, 1e-4, 2.0, 0.4, 0, 3, 0, NULL), HOLENT_SUCCESS);
  holent_bcft_page pg;
  srand (99);
  for (int trial = 0; trial < 60; trial++)
    {
      int n = 1 + rand () % 2;
      double a[2], b[2], xs[4];
      random_radiation (n, trial % 3 == 0, a, b, xs);
      HT_STATUS (holent_bcft_page_prepare (w, &bg, (size_t) n, a, b, &pg, NULL, NULL), HOLENT_SUCCESS);
      int m = (int) pg.m;
      const double ts[] = { 0.0, 0.3, 1.0, 2.5, -0.7 };
      for (int it = 0; it < 5; it++)
        {
          brute B;
          memset (&B, 0, sizeof B);
          B.N = 2 * m;
          two_sided_costs (&bg, xs, m, ts[it], B.pc, B.lc);
          for (int i = 0; i < B.N; i++)
            B.rc[i] = INFINITY;
          B.best = INFINITY;
          brute_rec (&B, 0, 0.0);
          double S, kb, nb;
          HT_STATUS (holent_bcft_page_eval (w, &bg, 1, ts + it, &S, &kb, &nb, NULL, NULL), HOLENT_SUCCESS);
          HT_CLOSE (S, bg.c / 6.0 * B.best, 1e-12);
        }
    }
  double a = 1.0, b = INFINITY, t = NAN, S;
  HT_STATUS (holent_bcft_page_prepare (w, &bg, 1, &a, &b, &pg, NULL, NULL), HOLENT_SUCCESS);
  /* [b, Inf): Page time from cosh(2 pi t/beta) = e^rho sinh(2 pi b/beta) */
  HT_CLOSE (pg.page_time, bg.beta / (2 * M_PI) * acosh (exp (bg.rho[0]) * sinh (2 * M_PI * a / bg.beta)), 1e-12);
  HT_CHECK (pg.n_island == 1, "one island edge");
  {
    /* the two phases agree at the Page time */
    double Sp, Sn, kb;
    HT_STATUS (holent_bcft_page_eval (w, &bg, 1, &pg.page_time, &Sp, &kb, NULL, &Sn, NULL), HOLENT_SUCCESS);
    HT_CLOSE (Sn, pg.S_island, 1e-12);
    HT_CHECK (kb == 0, "island at the Page time");
  }
  /* profile: errors and the tensionless brane at x = 0 */
  double xp;
  HT_STATUS (holent_bcft_brane_x (&bg, 0, -1.0, &xp), HOLENT_EDOM);
  HT_STATUS (holent_bcft_brane_x (&bg, 1, 0.1, &xp), HOLENT_EINVAL);
  HT_STATUS (holent_bcft_brane_x (&bg, 0, 5.0, &xp), HOLENT_SUCCESS);  /* behind the horizon */
  HT_STATUS (holent_bcft_tension_of_log_g (0.0, 3.0, &xp), HOLENT_SUCCESS);
  HT_CHECK (xp == 0.0, "log g = 0 is T = 0");
  HT_STATUS (holent_bcft_tension_of_log_g (100.0, 3.0, &xp), HOLENT_EDOM);
  HT_STATUS (holent_bcft_tension_of_log_g (NAN, 3.0, &xp), HOLENT_EINVAL);
  HT_STATUS (holent_bcft_tension_of_log_g (0.1, 0.0, &xp), HOLENT_EDOM);
  HT_STATUS (holent_bcft_tension_of_log_g (0.1, 3.0, &xp), HOLENT_SUCCESS);
  HT_CLOSE (2 * gsl_atanh (xp) * 3.0 / 12, 0.1, 1e-14);
  HT_STATUS (holent_bcft_page_eval (w, &bg, 1, &t, &S, NULL, NULL, NULL, NULL), HOLENT_ENAN);
  {
    double a0 = 0.0, b0 = 2.0;   /* a radiation region touching x = 0 */
    HT_STATUS (holent_bcft_page_prepare (w, &bg, 1, &a0, &b0, &pg, NULL, NULL), HOLENT_EDOM);
  }
  holent_bcft_bg hl;
  HT_STATUS (holent_bcft_bg_init (&hl, 0, 1, 1e-4, 2.0, 0.4, 0, 3, 0, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_bcft_page_prepare (w, &hl, 1, &a, &b, &pg, NULL, NULL), HOLENT_EUNSUP);
  holent_bcft_result r;
  b = 3;
  HT_STATUS (holent_bcft_entropy (w, &bg, 1, &a, &b, &r, NULL, NULL), HOLENT_EUNSUP);
  holent_bcft_workspace_free (w);
}

/* ---- two-sided configurations at a time: the two classes ---- */

/* Points 0..N-1 around the boundary circle of a Cauchy slice (left side
   ascending, right side descending; the brane on the arc from N-1 back to
   0): every non-crossing set of geodesics, each point paired or ending on
   the brane outside every pair.  best[0] the least total without a pair
   across the sides (through the bridge), best[1] with at least one.  */
typedef struct
{
  int N, m;
  double pc[16][16], lc[16];
  int stack[16], sp;
  double best[2];
} brute2;

static void
brute2_rec (brute2 *B, int i, double acc, int ncross)
{
  if (i == B->N)
    {
      int c = ncross > 0;
      if (!B->sp && acc < B->best[c])
        B->best[c] = acc;
      return;
    }
  B->stack[B->sp++] = i;                      /* open a pair */
  brute2_rec (B, i + 1, acc, ncross);
  B->sp--;
  if (B->sp)                                  /* close the innermost */
    {
      int j = B->stack[--B->sp];
      brute2_rec (B, i + 1, acc + B->pc[j][i],
                  ncross + ((j < B->m) != (i < B->m)));
      B->stack[B->sp++] = j;
    }
  else                                        /* to the brane */
    brute2_rec (B, i + 1, acc + B->lc[i], ncross);
}

/* Length of a configuration of holent_bcft_page_configuration, from the
   lengths of its parts: both sides' pairs and brane endings, and each
   bridge geodesic (x, t) left to (x, t) right.  */
static double
conf_length (const holent_bcft_bg *bg, const holent_bcft_result *r, double t)
{
  double sum = 0.0, len;
  for (size_t q = 0; q < r->npairs; q++)
    {
      holent_bcft_pair_length (bg, r->pts[r->pairs[2 * q]], r->pts[r->pairs[2 * q + 1]], &len);
      sum += 2 * len;
    }
  for (size_t q = 0; q < r->nbrane; q++)
    {
      double xb, zb;
      holent_bcft_brane_length (bg, r->pts[r->brane[q]], 0, &len, &xb, &zb);
      HT_CHECK (xb == r->brane_x[q] && zb == r->brane_z[q], "landing point %zu", q);
      sum += 2 * len;
    }
  for (size_t q = 0; q < r->nbridge; q++)
    {
      double x = r->pts[r->bridge[q]];
      holent_tfd_cross_length (&bg->tfd, x, t, x, t, &len);
      sum += len;
    }
  return sum;
}

static void
test_page_configuration (void)
{
  holent_bcft_workspace *w = holent_bcft_workspace_alloc (3);
  holent_bcft_bg bg, hl;
  holent_bcft_page pg;
  holent_bcft_result r0, r1;
  holent_err err;
  HT_STATUS (holent_bcft_bg_init (&bg, 2, 0, 1e-4, 2.0, 0.4, 0, 3, 0, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_bcft_bg_init (&hl, 0, 1, 1e-4, 2.0, 0.4, 0, 3, 0, NULL), HOLENT_SUCCESS);
  /* not prepared */
  HT_STATUS (holent_bcft_page_configuration (w, &bg, 0.0, 0, &r0, &err), HOLENT_EINVAL);
  srand (4242);
  for (int trial = 0; trial < 80; trial++)
    {
      int n = 1 + rand () % 3;
      double a[3], b[3], xs[6];
      random_radiation (n, trial % 2 == 0, a, b, xs);
      HT_STATUS (holent_bcft_page_prepare (w, &bg, (size_t) n, a, b, &pg, NULL, NULL), HOLENT_SUCCESS);
      int m = (int) pg.m;
      double ts[6] = { 0.0, 0.4, 1.5, 4.0, -0.9, pg.page_time + 1e-3 };
      for (int it = 0; it < 6; it++)
        {
          double t = ts[it];
          brute2 B;
          memset (&B, 0, sizeof B);
          B.N = 2 * m;
          B.m = m;
          two_sided_costs (&bg, xs, m, t, B.pc, B.lc);
          B.best[0] = B.best[1] = INFINITY;
          brute2_rec (&B, 0, 0.0, 0);
          HT_STATUS (holent_bcft_page_configuration (w, &bg, t, 0, &r0, &err), HOLENT_SUCCESS);
          HT_STATUS (holent_bcft_page_configuration (w, &bg, t, 1, &r1, &err), HOLENT_SUCCESS);
          /* the minimiser is the lesser class, the runner-up the other
             (ties to the island class, no bridge geodesic) */
          int c = B.best[1] < B.best[0];
          HT_CHECK ((r0.nbridge > 0) == c && (r1.nbridge > 0) == !c,
                    "classes %zu %zu at t = %g", r0.nbridge, r1.nbridge, t);
          HT_CLOSE (r0.S, bg.c / 6.0 * B.best[c], 1e-12);
          HT_CLOSE (r1.S, bg.c / 6.0 * B.best[!c], 1e-12);
          /* the page curve's two branches */
          double S, Sn, kb;
          HT_STATUS (holent_bcft_page_eval (w, &bg, 1, &t, &S, &kb, NULL, &Sn, NULL), HOLENT_SUCCESS);
          HT_CLOSE (r0.S, S, 1e-12);
          HT_CLOSE (r1.S, kb > 0 ? pg.S_island : Sn, 1e-12);
          HT_CHECK ((double) r0.nbridge == kb, "bridges %zu vs %g", r0.nbridge, kb);
          /* each configuration adds up to its value, every endpoint once */
          HT_STATUS (holent_bcft_page_configuration (w, &bg, t, 0, &r0, &err), HOLENT_SUCCESS);
          HT_CLOSE (r0.length, conf_length (&bg, &r0, t), 1e-12);
          HT_CHECK (2 * r0.npairs + r0.nbrane + r0.nbridge == r0.m, "endpoints used once");
          HT_STATUS (holent_bcft_page_configuration (w, &bg, t, 1, &r1, &err), HOLENT_SUCCESS);
          HT_CLOSE (r1.length, conf_length (&bg, &r1, t), 1e-12);
          HT_CHECK (2 * r1.npairs + r1.nbrane + r1.nbridge == r1.m, "endpoints used once");
          HT_CLOSE (r1.S, bg.c / 6.0 * r1.length, 1e-14);
        }
    }
  /* [b, Inf): the Hartman-Maldacena geodesic before the Page time, the
     island after; they swap there */
  double a = 1.0, b = INFINITY, t;
  HT_STATUS (holent_bcft_page_prepare (w, &bg, 1, &a, &b, &pg, NULL, NULL), HOLENT_SUCCESS);
  t = 0.5 * pg.page_time;
  HT_STATUS (holent_bcft_page_configuration (w, &bg, t, 0, &r0, &err), HOLENT_SUCCESS);
  HT_CHECK (r0.nbridge == 1 && r0.nbrane == 0, "before: bridge");
  HT_CLOSE (r0.S, bg.c / 3.0 * log (bg.beta / (M_PI * bg.eps) * cosh (2 * M_PI * t / bg.beta)), 1e-12);
  HT_STATUS (holent_bcft_page_configuration (w, &bg, t, 1, &r1, &err), HOLENT_SUCCESS);
  HT_CHECK (r1.nbridge == 0 && r1.nbrane == 1, "before: the island is the runner-up");
  t = 2.0 * pg.page_time;
  HT_STATUS (holent_bcft_page_configuration (w, &bg, t, 0, &r0, &err), HOLENT_SUCCESS);
  HT_CHECK (r0.nbridge == 0 && r0.nbrane == 1, "after: island");
  HT_CLOSE (r0.S, pg.S_island, 1e-12);
  /* errors */
  HT_STATUS (holent_bcft_page_configuration (NULL, &bg, 0.0, 0, &r0, &err), HOLENT_EINVAL);
  HT_STATUS (holent_bcft_page_configuration (w, &bg, 0.0, 0, NULL, &err), HOLENT_EINVAL);
  HT_STATUS (holent_bcft_page_configuration (w, &hl, 0.0, 0, &r0, &err), HOLENT_EUNSUP);
  t = NAN;
  HT_STATUS (holent_bcft_page_configuration (w, &bg, t, 0, &r0, &err), HOLENT_ENAN);
  HT_CHECK (err.arg == 0, "names t");
  HT_STATUS (holent_bcft_page_configuration (w, &bg, INFINITY, 1, &r0, &err), HOLENT_EDOM);
  /* the island wins at any late time; its competitor's bridge overflows */
  HT_STATUS (holent_bcft_page_configuration (w, &bg, -1e308, 0, &r0, &err), HOLENT_SUCCESS);
  HT_CHECK (r0.nbridge == 0, "island at t = -1e308");
  HT_STATUS (holent_bcft_page_configuration (w, &bg, -1e308, 1, &r0, &err), HOLENT_ERANGE);
  HT_CHECK (err.arg == 0, "names t");
  /* a one-sided entropy on w leaves it unprepared for the page */
  double a1 = 0.5, b1 = 2.0;
  HT_STATUS (holent_bcft_entropy (w, &hl, 1, &a1, &b1, &r0, NULL, NULL), HOLENT_SUCCESS);
  HT_STATUS (holent_bcft_page_configuration (w, &bg, 0.0, 0, &r0, &err), HOLENT_EINVAL);
  holent_bcft_workspace_free (w);
}

/* a poll that stops after a given number of calls */
static int
stop_after (void *ctx, double done, double total)
{
  int *left = ctx;
  (void) done;
  (void) total;
  return --*left < 0;
}

static void
test_poll (void)
{
  holent_bcft_workspace *w = holent_bcft_workspace_alloc (400);
  holent_bcft_bg bg;
  HT_STATUS (holent_bcft_bg_init (&bg, 1, 1000, 1e-3, 50, 0.3, 0.2, 1, 0, NULL), HOLENT_SUCCESS);
  double a[400], b[400];
  for (int k = 0; k < 400; k++)
    {
      a[k] = 1 + 2.4 * k;
      b[k] = a[k] + 1.1 + 0.5 * sin (k);
    }
  holent_bcft_result r;
  int left = 0;
  holent_poll p = { stop_after, &left };
  HT_STATUS (holent_bcft_entropy (w, &bg, 400, a, b, &r, NULL, &p), HOLENT_EINTR);
  left = 1000000;
  HT_STATUS (holent_bcft_entropy (w, &bg, 400, a, b, &r, NULL, &p), HOLENT_SUCCESS);
  HT_CHECK (left < 1000000, "the poll was called");
  double S = r.S;
  HT_STATUS (holent_bcft_entropy (w, &bg, 400, a, b, &r, NULL, NULL), HOLENT_SUCCESS);
  HT_CHECK (r.S == S, "same result without a poll");
  holent_bcft_bg tfd;
  holent_bcft_page pg;
  HT_STATUS (holent_bcft_bg_init (&tfd, 2, 0, 1e-3, 50, 0.3, 0, 1, 0, NULL), HOLENT_SUCCESS);
  left = 0;
  HT_STATUS (holent_bcft_page_prepare (w, &tfd, 400, a, b, &pg, NULL, &p), HOLENT_EINTR);
  holent_bcft_workspace_free (w);
}

int
main (void)
{
  gsl_set_error_handler_off ();
  test_make ();
  test_init ();
  test_brane_lengths ();
  test_dp_brute ();
  test_page_brute ();
  test_page_configuration ();
  test_poll ();
  return HT_DONE ();
}
