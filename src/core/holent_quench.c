/* holent_quench.c: thin-shell AdS3-Vaidya geodesic lengths and entropies.
 * Derivation: doc/quench.md.
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include "holent_root.h"
#include "holent_quench.h"

int
holent_quench_init (holent_quench_bg *q, int circle, double L, double eps,
                    double beta, double c)
{
  if (q == NULL)
    return HOLENT_EINVAL;
  int st = holent_geo_bg_init (&q->vac,
                               circle ? HOLENT_BULK_GLOBAL_ADS
                                      : HOLENT_BULK_POINCARE,
                               L, eps, 1, 1, 1, c);
  if (st)
    return st;
  st = holent_geo_bg_init (&q->bh,
                           circle ? HOLENT_BULK_BTZ : HOLENT_BULK_PLANAR_BTZ,
                           L, eps, beta, beta, 1, c);
  if (st)
    return st;
  q->beta = beta;
  return HOLENT_SUCCESS;
}

int
holent_quench_make (holent_quench_bg *q, int circle, double L, double eps,
                    double beta, double c, double ell, holent_err *err)
{
  holent_tfd_bg side;
  holent_tfd_info info;
  int st = holent_tfd_make (&side, &info, circle, L, eps, beta, c, ell, 0,
                            0.0, 0, 0.0, 0, 0.0, err);
  if (st)
    return st;
  st = holent_quench_init (q, circle, L, eps, beta, c);
  if (st)
    return holent_err_set (err, HOLENT_EINCONSISTENT, -1, HOLENT_NOINDEX,
                           "the parameters give no quench (%s)",
                           holent_strerror (st));
  return HOLENT_SUCCESS;
}

typedef struct
{
  double S, C, lam, R;  /* sinh, cosh of R t; pi l/beta or R Phi/2; R */
  double gap;           /* circle: pi/2 - Phi/2 */
} cross_par;

/* Line: the root in [0, hi] of h(eta) - pi l/beta, h increasing in eta
   (doc/quench.md), h = asinh(S E) + S (1 - E^2)/(E (C + w)), E = e^-eta,
   w = sqrt(1 + S^2 E^2) (C - w written without cancellation); by
   Newton's method kept inside the bracket (bisection when a step leaves it): h'(eta) = S (1 - E^2)/(E (C
   + w)), the second term of h itself (doc/quench.md), so a step costs
   one evaluation.  Brent's method with a solver allocated per call was
   the whole cost of a quench scan.  */
static int
line_root (const cross_par *c, double hi, double x0, double *eta)
{
  double lo = 0.0, x = x0;
  if (!(x0 > 0.0 && x0 < hi))
    {
      /* Start where h = lam with asinh(S E) ~ S E and w ~ 1 (E small):
         S E + S/((C + 1) E) = lam.  */
      double a = c->S / (c->C + 1.0), D = c->lam * c->lam - 4.0 * c->S * a;
      x = fmin (hi, fmax (0.0, log ((c->lam + sqrt (fmax (0.0, D)))
                                     / (2.0 * a))));
    }
  for (int it = 0; it < 200; it++)
    {
      double E = exp (-x), SE = c->S * E, w = sqrt (1.0 + SE * SE);
      double d = c->S * (1.0 - E * E) / (E * (c->C + w));
      double h = asinh (SE) + d - c->lam;
      if (h > 0.0)
        hi = x;
      else
        lo = x;
      /* Converged when the Newton step itself is below the tolerance
         (tested before the bracket: at the root the step is 0 and would
         otherwise fall back to bisection).  */
      double step = h / d, nx = x - step;
      if (fabs (step) <= 1e-14 * fmax (1.0, x))
        {
          *eta = nx;
          return HOLENT_SUCCESS;
        }
      if (!(nx > lo && nx < hi))
        nx = 0.5 * (lo + hi);
      if (hi - lo <= 4e-16 * hi)
        {
          *eta = nx;
          return HOLENT_SUCCESS;
        }
      x = nx;
    }
  return HOLENT_ENOCONV;
}

/* Circle: G = C - cosh a - R tan(phi) sinh a, a = lam - R phi, written
   in d = Phi/2 - phi (a = R d) and gap = pi/2 - Phi/2, so that
   tan(phi) = 1/tan(gap + d) stays accurate near the half circle.  */
static double
circle_eq (double d, void *p)
{
  const cross_par *c = p;
  double a = c->R * d;
  return c->C - cosh (a) - c->R * sinh (a) / tan (c->gap + d);
}

static int
brent (double (*f) (double, void *), void *p, double lo, double hi,
       double *x)
{
  return holent_root_brent (f, p, lo, hi, 1e-15, 4e-16, 200, x);
}

/* sinh and cosh of 2 pi t/beta: once per time in a region scan.  */
static void
time_sc (const holent_quench_bg *q, double t, double sc[2])
{
  double Rt = 2.0 * M_PI * t / q->beta;
  sc[0] = sinh (Rt);
  sc[1] = cosh (Rt);
}

static int quench_len (const holent_quench_bg *q, double l, double t,
                       const double sc[2], double eta0, double *len,
                       double *eta, double *xh);

int
holent_quench_length (const holent_quench_bg *q, double l, double t,
                      double *len, double *eta)
{
  double sc[2];
  if (q == NULL || len == NULL || isnan (l) || !isfinite (t))
    return HOLENT_EINVAL;
  time_sc (q, t, sc);
  return quench_len (q, l, t, sc, -1.0, len, eta, NULL);
}

int
holent_quench_crossing (const holent_quench_bg *q, double l, double t,
                        double *eta, double *xc, double *rc)
{
  double sc[2], len, e, xh = 0.0;
  if (q == NULL || eta == NULL || xc == NULL || rc == NULL || isnan (l)
      || !isfinite (t))
    return HOLENT_EINVAL;
  time_sc (q, t, sc);
  int st = quench_len (q, l, t, sc, -1.0, &len, &e, &xh);
  if (st)
    return st;
  *eta = e;
  *xc = e > 0.0 ? xh : 0.0;
  /* the vacuum chord: y = x r (line) or r sin x (circle) = sinh(eta) */
  *rc = e > 0.0 ? sinh (e) / (q->vac.circle ? sin (xh) : xh) : 0.0;
  return HOLENT_SUCCESS;
}

/* eta0 > 0: the crossing's eta at a nearby time, where the line's
   Newton iteration starts.  */
static int
quench_len (const holent_quench_bg *q, double l, double t, const double sc[2],
            double eta0, double *len, double *eta, double *xh)
{
  double e = 0.0;
  int circle = q->vac.circle;
  double L = q->vac.L;
  if (!(l > 0.0) || !isfinite (l) || (circle && !(l < L)))
    return HOLENT_EDOM;
  if (circle && l > 0.5 * L)
    l = L - l;
  if (t <= 0.0)
    {
      if (eta)
        *eta = -1.0;
      return holent_geo_arc_length (&q->vac, l, len);
    }
  if (t >= 0.5 * l)
    {
      if (eta)
        *eta = 0.0;
      return holent_geo_arc_length (&q->bh, l, len);
    }
  cross_par c = { sc[0], sc[1], M_PI * l / q->beta,
                  circle ? L / q->beta : 0.0, 0.0 };
  int st;
  if (!circle)
    {
      /* Bracket: h(0) = R t < pi l/beta, and h >= 3 S/(8 C E) once
         E <= 1/2, so E = 3 S/(8 C lam) is above the root.  */
      double hi = fmax (M_LN2, log (8.0 * c.C * c.lam / (3.0 * c.S)));
      st = line_root (&c, hi, eta0, &e);
      /* sinh(R (l/2 - x)) = S e^-eta, R = 2 pi/beta */
      if (!st && xh)
        *xh = 0.5 * l - asinh (c.S * exp (-e)) * q->beta / (2.0 * M_PI);
    }
  else
    {
      /* G < 0 at phi = 0 (t < l/2) and G -> C - 1 > 0 as phi -> Phi/2
         < pi/2.  Scan for the first sign change from the top, where the
         crossing lies near the tip.  At l = L/2 (Phi/2 = pi/2) the
         crossing sits at phi = pi/2 exactly, where G's elimination of
         e^-eta is 0/0; the r equation alone gives e^-eta =
         (C - 1)/(R S) there (doc/quench.md).  */
      double top = M_PI * l / L, E;
      c.gap = M_PI_2 - top;
      if (c.gap <= 1e-300)
        {
          E = (c.C - 1.0) / (c.R * c.S);
          if (xh)
            *xh = M_PI_2;
        }
      else
        {
          /* G(d = top) = C - cosh(lam) < 0; halve d until G > 0 (G -> C -
             1 > 0 as d -> 0), then bracket.  */
          double lo = top, hi = top, d;
          int k = 0;
          while (circle_eq (lo, &c) <= 0.0)
            {
              hi = lo;
              lo *= 0.5;
              if (++k > 2000 || lo == 0.0)
                return HOLENT_ENOCONV;
            }
          st = brent (circle_eq, &c, lo, hi, &d);
          if (st)
            return st;
          E = sinh (c.R * d) / (c.S * sin (c.gap + d));
          if (xh)
            *xh = top - d;
        }
      /* Small black holes (L/beta < 1) can leave no crossing with
         e^-eta <= 1: not covered.  */
      if (!(E > 0.0 && E <= 1.0 + 1e-12))
        return HOLENT_ENOCONV;
      e = -log (fmin (E, 1.0));
      st = HOLENT_SUCCESS;
    }
  if (st)
    return st;
  if (eta)
    *eta = e;
  /* 2 log((beta/(pi eps)) S cosh(eta)), cosh(eta) in log form.  */
  double lc = e + log1p (exp (-2.0 * e)) - M_LN2;
  *len = q->bh.pref + 2.0 * (log (c.S) + lc);
  return HOLENT_SUCCESS;
}

/* One chord of a scan: its arc, its two static lengths and the last
   crossing (eta, or -1 when none was solved).  */
typedef struct
{
  double arc, vac, bh, eta;
} q_chord;

struct holent_quench_scan
{
  size_t cap;      /* chords held: 2 nmax x nmax (row s, pair t) */
  q_chord *ch;
};

holent_quench_scan *
holent_quench_scan_alloc (size_t nmax)
{
  if (nmax == 0 || nmax > HOLENT_QUENCH_SCAN_NMAX)
    return NULL;
  holent_quench_scan *s = malloc (sizeof *s);
  if (s == NULL)
    return NULL;
  s->cap = 2 * nmax * nmax;
  s->ch = malloc (s->cap * sizeof *s->ch);
  if (s->ch == NULL)
    {
      free (s);
      return NULL;
    }
  for (size_t k = 0; k < s->cap; k++)
    s->ch[k].arc = NAN;
  return s;
}

void
holent_quench_scan_free (holent_quench_scan *s)
{
  if (s == NULL)
    return;
  free (s->ch);
  free (s);
}

typedef struct
{
  const holent_quench_bg *q;
  double t, sc[2];
  q_chord *ch;     /* NULL: no scan */
  size_t N, K;     /* endpoints, pairs per row */
} q_ctx;

/* A chord met at an earlier time keeps its static lengths; the slot is
   keyed by the DP's (row, pair) and checked against the arc, so a
   different region only costs a recomputation.  Each slot is written by
   the one call that owns it (fill_weights visits each (row, pair) once),
   so threads never share one.  */
static int
q_cost (void *vctx, size_t i, size_t j, double arc, double *len)
{
  const q_ctx *c = vctx;
  if (c->ch == NULL)
    return quench_len (c->q, arc, c->t, c->sc, -1.0, len, NULL, NULL);
  q_chord *h = c->ch + i * c->K + ((j + c->N - i - 1) % c->N) / 2;
  /* on a circle the shorter arc (quench_len does the same) */
  double l = c->q->vac.circle && arc > 0.5 * c->q->vac.L
             ? c->q->vac.L - arc : arc;
  int st;
  if (h->arc != arc)
    {
      h->arc = arc;
      h->eta = -1.0;
      h->vac = h->bh = NAN;
      st = quench_len (c->q, arc, -1.0, c->sc, -1.0, &h->vac, NULL, NULL);
      if (st == HOLENT_SUCCESS)
        st = holent_geo_arc_length (&c->q->bh, l, &h->bh);
      if (st)
        {
          h->arc = NAN;
          return st;
        }
    }
  if (c->t <= 0.0)
    {
      *len = h->vac;
      return HOLENT_SUCCESS;
    }
  if (c->t >= 0.5 * l)
    {
      *len = h->bh;
      return HOLENT_SUCCESS;
    }
  double e;
  st = quench_len (c->q, arc, c->t, c->sc, h->eta, len, &e, NULL);
  h->eta = st == HOLENT_SUCCESS ? e : -1.0;
  return st;
}

int
holent_quench_points_length (const holent_quench_bg *q, double x1, double x2,
                             double t, double *len)
{
  if (q == NULL || len == NULL)
    return HOLENT_EINVAL;
  if (!isfinite (x1) || !isfinite (x2) || !isfinite (x2 - x1))
    return HOLENT_EINVAL;
  double d = x2 - x1;
  if (q->vac.circle)
    {
      d = fmod (d, q->vac.L);
      if (d < 0.0)
        d += q->vac.L;
    }
  if (d == 0.0)
    return HOLENT_ECOINCIDE;
  return holent_quench_length (q, fabs (d), t, len, NULL);
}

int
holent_quench_entropy_scan (holent_rt_workspace *w,
                            const holent_quench_bg *q,
                            const holent_region *r, double t,
                            holent_quench_scan *scan, holent_rt_result *res,
                            size_t *pairs, double *arcs)
{
  if (q == NULL || r == NULL || !isfinite (t))
    return HOLENT_EINVAL;
  q_ctx c = { q, t, { 0.0, 0.0 }, NULL, 2 * r->n, r->n };
  if (scan != NULL && 2 * r->n * r->n <= scan->cap)
    c.ch = scan->ch;
  time_sc (q, t, c.sc);
  /* The vacuum background sets the candidates: on the circle the state
     is pure (no horizon term) and each chord has the geodesic over its
     shorter arc.  */
  return holent_rt_entropy_cost (w, &q->vac, r, q_cost, &c, res, pairs,
                                 arcs);
}

int
holent_quench_entropy (holent_rt_workspace *w, const holent_quench_bg *q,
                       const holent_region *r, double t,
                       holent_rt_result *res, size_t *pairs, double *arcs)
{
  return holent_quench_entropy_scan (w, q, r, t, NULL, res, pairs, arcs);
}
