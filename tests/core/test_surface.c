/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_surface: error paths, the Poincare semicircle, the
   horizon circle, the runner-up of two intervals, a vacuum profile, the
   two pieces of a bridge geodesic through a shock wave.  */
#include <math.h>
#include "holent_ctest.h"
#include "holent_surface.h"

/* Kruskal embedding of BTZ (R in boundary units; common practice, see
   doc/tfd_shock.md): the bulk point of the picture (X_K, T_K, x) and the
   null ray of a boundary point on side s (0 left).  */
static void
kr_embed (double R, double XK, double TK, double x, double X[4])
{
  double u = TK - XK, v = TK + XK, d = 1 + u * v;
  X[0] = (1 - u * v) / d * cosh (R * x);
  X[1] = (1 - u * v) / d * sinh (R * x);
  X[2] = (v - u) / d;
  X[3] = (v + u) / d;
}

static void
kr_ray (double R, double x, double t, int s, double X[4])
{
  X[0] = cosh (R * x);
  X[1] = sinh (R * x);
  X[2] = (s ? 1 : -1) * cosh (R * t);
  X[3] = sinh (R * t);
}

static double
kr_dot (const double *X, const double *Y)
{
  return -X[0] * Y[0] + X[1] * Y[1] + X[2] * Y[2] - X[3] * Y[3];
}

/* A bridge geodesic through the shock of *ts from (xL, tL) on the left to
   (xR, tR) on the right (xRl: xR lifted to the shortest winding on a
   circle, or to xR + wd L when wd is not NOWIND, drawn by
   holent_surface_tfd_winding): two pieces split by one NaN row, each from its crossing on
   u = 0 (X_K = T_K, the same x, the left one alpha/2 further along X_K
   and T_K) to its boundary point; every sample lies on the geodesic from
   its crossing P to the boundary ray Q, i.e. in the plane of P and Q in
   R^{2,2} (the residual of X = a P + b Q, P.P = -1, Q.Q = 0, is zero); the
   embedding distances acosh(-X.Y) from the crossings to the cutoff
   points (Fefferman-Graham, as test_tfd.c) add up to the bridge length.
   Coordinates x in boundary units, R x the bulk angle (both pictures).  */
#define NOWIND (-1000L)
static void
shock_pieces (holent_surface_workspace *w, const holent_tfd_bg *ts,
              double xL, double tL, double xR, double tR, double xRl, long wd)
{
  const double R = 2 * M_PI / ts->beta;
  for (int dir = 0; dir < 2; dir++)
    {
      if (wd != NOWIND)
        HT_STATUS (dir ? holent_surface_tfd_winding (w, ts, xR, tR, 1, xL, tL, 0, NAN, wd, 1e-5)
                       : holent_surface_tfd_winding (w, ts, xL, tL, 0, xR, tR, 1, NAN, wd, 1e-5), 0);
      else if (dir == 0)
        HT_STATUS (holent_surface_tfd (w, ts, xL, tL, 0, xR, tR, 1, NAN, 1e-5), 0);
      else   /* from the right point: the same curve reversed */
        HT_STATUS (holent_surface_tfd (w, ts, xR, tR, 1, xL, tL, 0, NAN, 1e-5), 0);
      const holent_curve *c = &w->cur;
      size_t nnan = 0, k = 0;
      for (size_t i = 0; i < c->n; i++)
        if (isnan (c->x[i]))
          {
            nnan++;
            k = i;
          }
      HT_CHECK (nnan == 1 && isnan (c->y[k]) && isnan (c->t[k]) && k > 2
                && k + 3 < c->n, "one NaN row, got %zu", nnan);
      if (nnan != 1)
        continue;
      /* the lift is taken by the second point: from the right one, the
         left point moves by -(xRl - xR) */
      const double xl = dir ? xL + (xR - xRl) : xL, xr = dir ? xR : xRl;
      size_t l0 = dir ? c->n - 1 : 0, lc = dir ? k + 1 : k - 1;
      size_t r0 = dir ? 0 : c->n - 1, rc = dir ? k - 1 : k + 1;
      HT_CLOSE (c->x[l0], -cosh (R * tL), 1e-15);
      HT_CLOSE (c->y[l0], sinh (R * tL), 1e-15);
      HT_CLOSE (c->t[l0], xl, 1e-15);
      HT_CLOSE (c->x[r0], cosh (R * tR), 1e-15);
      HT_CLOSE (c->t[r0], xr, 1e-15);
      HT_CHECK (c->x[lc] == c->y[lc] && c->x[rc] == c->y[rc], "crossings on u = 0");
      HT_CLOSE (c->x[lc] - c->x[rc], 0.5 * ts->alpha, 1e-14);
      HT_CLOSE (c->t[lc], c->t[rc], 0);
      double worst = 0, len = 0, ref;
      /* x measured from the crossing: no cancellation in the products */
      const double x0 = c->t[lc], rho = ts->beta / (2 * M_PI * ts->side.eps)
                                        + M_PI * ts->side.eps / (2 * ts->beta);
      const double q = sqrt ((rho - 1) / (rho + 1));
      for (int side = 0; side < 2; side++)
        {
          size_t a = side ? rc : lc, e = side ? r0 : l0;
          double P[4], Q[4], X[4], B[4], t = side ? tR : tL;
          kr_embed (R, c->x[a], c->y[a], c->t[a] - x0, P);
          kr_ray (R, (side ? xr : xl) - x0, t, side, Q);
          /* the cutoff point: u v = -q^2 on the boundary point's ray */
          double u = side ? -exp (-R * t) * q : exp (R * t) * q;
          double v = side ? exp (R * t) * q : -exp (-R * t) * q;
          kr_embed (R, 0.5 * (v - u), 0.5 * (v + u), (side ? xr : xl) - x0, B);
          len += acosh (-kr_dot (P, B));
          double pq = kr_dot (P, Q);
          for (size_t i = a; i != e; i = (i < e) ? i + 1 : i - 1)
            {
              kr_embed (R, c->x[i], c->y[i], c->t[i] - x0, X);
              /* X.Q = -a' ... : a = -(X.Q)/(-pq) from X.Q = a P.Q, then
                 X.P = -a + b P.Q */
              double ca = kr_dot (X, Q) / pq, cb = (kr_dot (X, P) + ca) / pq;
              double nx = 0, res = 0;
              for (int j = 0; j < 4; j++)
                {
                  double rj = X[j] - ca * P[j] - cb * Q[j];
                  res += rj * rj;
                  nx += X[j] * X[j];
                }
              double rel = sqrt (res / nx);
              worst = rel > worst ? rel : worst;
            }
        }
      HT_CHECK (worst < 1e-10, "samples off the geodesic by %g", worst);
      HT_STATUS (wd == NOWIND ? holent_tfd_cross_length (ts, xL, tL, xR, tR, &ref)
                 : holent_tfd_cross_length_winding (ts, xL, tL, xR, tR, wd, &ref), 0);
      HT_CLOSE (len, ref, 1e-11);
    }
}

int
main (void)
{
  holent_geo_bg bg, bc, bb;
  holent_surface_workspace *w = holent_surface_workspace_alloc ();
  HT_CHECK (w != NULL, "alloc");
  HT_STATUS (holent_geo_bg_init (&bg, HOLENT_BULK_POINCARE, 0, 1e-6, 0, 0, 1, 1), 0);
  HT_STATUS (holent_geo_bg_init (&bc, HOLENT_BULK_GLOBAL_ADS, 2 * M_PI, 1e-6, 0, 0, 1, 1), 0);
  HT_STATUS (holent_geo_bg_init (&bb, HOLENT_BULK_BTZ, 2 * M_PI, 1e-6, 1, 1, 1, 1), 0);

  /* errors */
  HT_STATUS (holent_surface_geodesic (NULL, &bg, 0, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_surface_geodesic (w, &bg, NAN, 1, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_surface_geodesic (w, &bg, 0, 0, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_geodesic (w, &bg, 0, 1, 0), HOLENT_EDOM);
  HT_STATUS (holent_surface_geodesic (w, &bg, 0, INFINITY, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_geodesic (w, &bc, 1, 0.5, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_geodesic (w, &bc, 0, 2 * M_PI, 1e-3), HOLENT_EDOM);
  double depth;
  HT_STATUS (holent_surface_horizon (w, &bc, 0, 1, 1e-3, &depth), HOLENT_EUNSUP);
  HT_STATUS (holent_surface_horizon (w, &bb, 0, 1, -1, &depth), HOLENT_EDOM);
  HT_STATUS (holent_surface_horizon (w, &bb, 0, 1, 1e-3, NULL), HOLENT_EINVAL);

  /* Poincare: semicircle through the endpoints */
  HT_STATUS (holent_surface_geodesic (w, &bg, 1, 3, 1e-5), 0);
  double worst = 0;
  for (size_t i = 0; i < w->cur.n; i++)
    {
      double e = fabs (hypot (w->cur.x[i] - 2, w->cur.y[i]) - 1);
      worst = e > worst ? e : worst;
    }
  HT_CHECK (worst < 1e-13, "semicircle off by %g", worst);
  HT_CLOSE (w->cur.x[0], 1, 0);
  HT_CLOSE (w->cur.x[w->cur.n - 1], 3, 0);

  /* BTZ horizon: closed circle of radius r+/(1 + sqrt(1 + r+^2)) */
  HT_STATUS (holent_surface_horizon (w, &bb, 0, 1, 1e-4, &depth), 0);
  double rp = 2 * M_PI;
  HT_CLOSE (depth, rp / (1 + sqrt (1 + rp * rp)), 1e-15);
  HT_CLOSE (w->cur.x[0], w->cur.x[w->cur.n - 1], 0);

  /* runner-up of two close intervals on a line: the disconnected pair */
  holent_region *r = holent_region_alloc (4);
  double a[2] = { 0, 1.2 }, b[2] = { 1, 2.2 };
  HT_STATUS (holent_region_set (r, 0, 0, 2, a, b), 0);
  size_t pmin[4] = { 0, 3, 1, 2 }, pr[4];
  double amin[2] = { 2.2, 0.2 }, arcs[2], S;
  int hor;
  HT_STATUS (holent_surface_runner_up (w, &bg, r, pmin, amin, 0, pr, arcs, &hor, &S), 0);
  HT_CHECK (pr[0] == 0 && pr[1] == 1 && pr[2] == 2 && pr[3] == 3, "pairs");
  HT_CLOSE (S, (2 * log (1 / 1e-6) + 2 * log (1 / 1e-6)) / 6, 1e-12);
  HT_STATUS (holent_surface_runner_up (w, &bc, r, pmin, amin, 0, pr, arcs, &hor, &S), HOLENT_EINVAL);
  HT_STATUS (holent_region_set (r, 0, 0, 1, a, b), 0);
  size_t p1[2] = { 0, 1 };
  double a1[1] = { 1 };
  HT_STATUS (holent_surface_runner_up (w, &bg, r, p1, a1, 0, pr, arcs, &hor, &S), HOLENT_EDOM);
  holent_region_free (r);

  /* vacuum AdS4 ball: the hemisphere */
  holent_hd_bg hb;
  HT_STATUS (holent_hd_bg_init (&hb, 3, HOLENT_HD_VACUUM, INFINITY, 1, 1, 1e-3), 0);
  HT_STATUS (holent_surface_profile (w, &hb, 1, 2.0, 1e-6), 0);
  worst = 0;
  for (size_t i = 0; i < w->cur.n; i++)
    {
      double e = fabs (hypot (w->cur.x[i], w->cur.y[i]) - 2);
      worst = e > worst ? e : worst;
    }
  HT_CHECK (worst < 1e-8, "hemisphere off by %g", worst);
  HT_STATUS (holent_surface_profile (w, &hb, 1, -1, 1e-6), HOLENT_EDOM);
  HT_STATUS (holent_surface_profile (w, &hb, 1, NAN, 1e-6), HOLENT_EINVAL);
  HT_STATUS (holent_surface_profile (NULL, &hb, 1, 1, 1e-6), HOLENT_EINVAL);

  /* time-dependent states: error paths */
  holent_quench_bg q, qc;
  holent_tfd_bg tf, tc, ts;
  HT_STATUS (holent_quench_init (&q, 0, 0, 1e-6, 1, 1), 0);
  HT_STATUS (holent_quench_init (&qc, 1, 2 * M_PI, 1e-6, 1, 1), 0);
  HT_STATUS (holent_tfd_init (&tf, 0, 0, 1e-6, 2, 1, 0), 0);
  HT_STATUS (holent_tfd_init (&tc, 1, 2 * M_PI, 1e-6, 3, 1, 0), 0);
  HT_STATUS (holent_tfd_init (&ts, 0, 0, 1e-6, 2, 1, 0.5), 0);
  HT_STATUS (holent_surface_quench (NULL, &q, 0, 1, 0.2, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_surface_quench (w, &q, NAN, 1, 0.2, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_surface_quench (w, &q, 1, 0, 0.2, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_quench (w, &q, 0, 1, INFINITY, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_quench (w, &q, 0, 1, 0.2, 0), HOLENT_EDOM);
  HT_STATUS (holent_surface_quench (w, &qc, 0, 7, 0.2, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_tfd (NULL, &tf, 0, 0, 0, 1, 0, 1, NAN, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_surface_tfd (w, &tf, 0, 0, 2, 1, 0, 1, NAN, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_surface_tfd (w, &tf, 0, 0, 1, 0, 0.5, 1, NAN, 1e-3), HOLENT_ECOINCIDE);
  HT_STATUS (holent_surface_tfd (w, &tf, 0, 0, 1, 1, 2, 1, NAN, 1e-3), HOLENT_ETIMELIKE);
  HT_STATUS (holent_surface_tfd (w, &tf, 0, INFINITY, 1, 1, 0, 1, NAN, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_tfd (w, &tc, 0, 0, 1, 1, 0, 1, NAN, 1e-3), HOLENT_EINVAL);
  HT_STATUS (holent_surface_tfd (w, &tc, 2, 0, 1, 1, 0, 1, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_tfd_horizon (NULL, &tc, 0, 1), HOLENT_EINVAL);
  HT_STATUS (holent_surface_tfd_winding (w, &tf, 0, 0, 0, 1, 0, 1, NAN, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_tfd_winding (w, &tc, 0, 0, 1, 1, 0, 1, 1, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_tfd_winding (w, &ts, 0, 0, 0, 0, 0, 1, NAN, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_tfd_winding (NULL, &tc, 0, 0, 0, 1, 0, 1, NAN, 0, 1e-3), HOLENT_EINVAL);
  /* a bridge of winding w joins the left point to the image xR + w L of
     the right one: the third column changes by xR - xL + w L, the ends
     on the boundaries X_K = -+cosh(R t), T_K = sinh(R t) (R = L/beta in
     the circle's bulk units) */
  for (long wd = -2; wd <= 2; wd++)
    for (int rl = 0; rl < 2; rl++)
      {
        double xl = 0.3, tl = 0.1, xr = 0.5, tr = -0.2, L = 2 * M_PI;
        HT_STATUS (rl ? holent_surface_tfd_winding (w, &tc, xr, tr, 1, xl, tl, 0, NAN, wd, 1e-4)
                      : holent_surface_tfd_winding (w, &tc, xl, tl, 0, xr, tr, 1, NAN, wd, 1e-4), 0);
        size_t e = w->cur.n - 1, il = rl ? e : 0, ir = rl ? 0 : e;
        HT_CLOSE (w->cur.t[0], rl ? xr : xl, 1e-13);   /* from the first point */
        HT_CLOSE (w->cur.t[ir] - w->cur.t[il], xr - xl + wd * L, 1e-13);
        HT_CLOSE (w->cur.x[il], -cosh (L / 3 * tl), 1e-13);
        HT_CLOSE (w->cur.y[ir], sinh (L / 3 * tr), 1e-13);
      }
  /* the shortest winding of holent_surface_tfd: 0.5 - 5.9 + L */
  HT_STATUS (holent_surface_tfd (w, &tc, 5.9, 0, 0, 0.5, 0, 1, NAN, 1e-4), 0);
  HT_CLOSE (w->cur.t[w->cur.n - 1], 0.5 + 2 * M_PI, 1e-13);
  HT_STATUS (holent_surface_pair (w, NULL, 0, 0, 1, 0, 1, 1e-3), HOLENT_EINVAL);
  double eta, xc, rc;
  HT_STATUS (holent_quench_crossing (NULL, 1, 0.2, &eta, &xc, &rc), HOLENT_EINVAL);
  HT_STATUS (holent_quench_crossing (&q, 1, NAN, &eta, &xc, &rc), HOLENT_EINVAL);
  HT_STATUS (holent_quench_crossing (&q, -1, 0.2, &eta, &xc, &rc), HOLENT_EDOM);

  /* the quench crossing lies on the vacuum chord: y = x r = sinh(eta),
     and on the BTZ leg from the boundary: sinh(R (l/2 - x)) = S e^-eta
     (doc/quench.md), for 0 < t < l/2 */
  HT_STATUS (holent_quench_crossing (&q, 2, 0.5, &eta, &xc, &rc), 0);
  HT_CHECK (eta > 0 && xc > 0 && xc < 1, "crossing %g %g", eta, xc);
  HT_CLOSE (xc * rc, sinh (eta), 1e-12);
  HT_CLOSE (sinh (2 * M_PI * (1 - xc)), sinh (M_PI) * exp (-eta), 1e-10);
  HT_STATUS (holent_quench_crossing (&q, 2, 1.5, &eta, &xc, &rc), 0);
  HT_CHECK (eta == 0 && xc == 0, "saturated");

  /* the two-sided geodesic at t = 0, dx = 0 is the straight bridge
     T_K = 0 from X_K = -1 to 1 (Kruskal, common practice) */
  HT_STATUS (holent_surface_tfd (w, &tf, 0.5, 0, 0, 0.5, 0, 1, NAN, 1e-4), 0);
  HT_CLOSE (w->cur.x[0], -1, 1e-15);
  HT_CLOSE (w->cur.x[w->cur.n - 1], 1, 1e-15);
  worst = 0;
  for (size_t i = 0; i < w->cur.n; i++)
    {
      double e = fabs (w->cur.y[i]) + fabs (w->cur.t[i] - 0.5);
      worst = e > worst ? e : worst;
    }
  HT_CHECK (worst < 1e-14, "bridge off by %g", worst);
  shock_pieces (w, &ts, 0.3, 0.2, 1.1, -0.4, 1.1, NOWIND);
  {
    /* the circle: the same through the shortest winding (xR lifted by -L) */
    holent_tfd_bg tcs;
    HT_STATUS (holent_tfd_init (&tcs, 1, 2 * M_PI, 1e-6, 3, 1, 1.5), 0);
    shock_pieces (w, &tcs, 0.5, 0.2, 5.9, -0.1, 5.9 - 2 * M_PI, NOWIND);
    /* and at the windings a minimiser may ask for, the shortest or not */
    for (long wd = -1; wd <= 1; wd++)
      shock_pieces (w, &tcs, 0.5, 0.2, 5.9, -0.1, 5.9 + wd * 2 * M_PI, wd);
  }
  HT_STATUS (holent_surface_tfd_horizon (w, &tc, 0, 2 * M_PI), 0);
  {
    holent_tfd_workspace *tw = holent_tfd_workspace_alloc (2);
    size_t np;
    const double *x, *t, *arcs;
    const int *side;
    const size_t *pairs;
    HT_STATUS (holent_tfd_configuration (NULL, &np, &x, &t, &side, &pairs, &arcs), HOLENT_EINVAL);
    HT_STATUS (holent_tfd_configuration (tw, &np, &x, &t, &side, &pairs, &arcs), HOLENT_EEMPTY);
    /* a bridge pair: [0, 1] on both sides at t = 0 (Hartman and
       Maldacena 2013: connected at early times for l large; here l = 3,
       beta = 2) */
    double a[1] = { 0 }, b[1] = { 3 }, z[1] = { 0 };
    holent_tfd_side sd = { 1, a, b, z, z };
    holent_rt_result res;
    HT_STATUS (holent_tfd_entropy (tw, &tf, &sd, &sd, 0, &res, NULL, NULL, NULL), 0);
    HT_STATUS (holent_tfd_configuration (tw, &np, &x, &t, &side, &pairs, &arcs), 0);
    HT_CHECK (np == 4 && side[pairs[0]] != side[pairs[1]], "bridge pairs");
    holent_tfd_workspace_free (tw);
  }
  HT_CHECK (w->cur.n == 2, "horizon points");
  {
    /* A geodesic within one side at equal late times t0 (right and left):
       every sample's v = T_K + X_K (right; u = T_K - X_K on the left) is
       e^{R t0} sqrt((r - R)/(r + R)), r = R (1 - uv)/(1 + uv) the radius
       of the constant-time BTZ geodesic over [x1, x2],
       r(x) = R cosh(R h)/sqrt(cosh^2(R h) - cosh^2(R (x - xm)))
       (Hubeny, Rangamani and Takayanagi 2007, JHEP 07, 062; common
       practice), h the half width: the picture at Killing time t0 without
       the overflow of the embedding at 2 pi t0/beta above 110.  */
    holent_tfd_bg tl;
    HT_STATUS (holent_tfd_init (&tl, 0, 0, 1e-3, 1, 1, 0), 0);
    const double R = 2 * M_PI, x1 = 0.5, x2 = 2.5, xm = 1.5, h = 1.0;
    const double t0s[4] = { 0, 3, 20, 60 };
    for (int k = 0; k < 4; k++)
      for (int sd = 0; sd < 2; sd++)
        {
          double t0 = t0s[k], worst = 0;
          HT_STATUS (holent_surface_tfd (w, &tl, x1, t0, sd, x2, t0, sd, NAN, 1e-3), 0);
          const holent_curve *c = &w->cur;
          HT_CHECK (c->n > 40, "samples %zu", c->n);
          HT_CLOSE (c->x[0], (sd ? 1 : -1) * cosh (R * t0), 1e-15);
          HT_CLOSE (c->y[c->n - 1], sinh (R * t0), 1e-15);
          for (size_t i = 1; i + 1 < c->n; i++)
            {
              double y = R * (c->t[i] - xm), ch = cosh (R * h);
              /* cosh^2(Rh) - cosh^2(y) without cancellation */
              double den = sinh (R * h - y) * sinh (R * h + y);
              double r = R * ch / sqrt (den);
              if (!(r < 1e6))   /* near the ends: the closed form cancels */
                continue;
              double q = sqrt ((r - R) / (r + R)) * exp (R * t0);
              double got = sd ? c->y[i] + c->x[i] : c->y[i] - c->x[i];
              double e = fabs (got / q - 1);
              worst = e > worst ? e : worst;
            }
          HT_CHECK (worst < 1e-9, "t0 = %g side %d: off by %g", t0, sd, worst);
        }
  }

  {
    /* The runner-up on the line's thermofield double: A_L = A_R = [0, 3]
       at t = 0 (beta = 1, c = 1), endpoints in the bridge order R0, R3,
       L3, L0.  The minimiser joins them through the bridge, 2 geodesics
       of 2 log((beta/(pi eps)) cosh(2 pi t/beta)) (Hartman and Maldacena
       2013, JHEP 05, 014); the runner-up is the pair within the sides,
       2 x 2 log((beta/(pi eps)) sinh(pi l/beta)) (Calabrese and Cardy
       2004), S = c/6 times the lengths.  */
    holent_tfd_bg tl;
    HT_STATUS (holent_tfd_init (&tl, 0, 0, 1e-3, 1, 1, 0), 0);
    const double x[4] = { 0, 3, 3, 0 }, t[4] = { 0, 0, 0, 0 };
    const int sd[4] = { 1, 1, 0, 0 };
    const size_t pmin[4] = { 0, 3, 1, 2 };
    size_t pr[4];
    double S, k = 1.0 / (M_PI * 1e-3);
    HT_STATUS (holent_surface_tfd_runner_up (w, &tl, 4, x, t, sd, pmin, pr, &S), 0);
    HT_CHECK (pr[0] == 0 && pr[1] == 1 && pr[2] == 2 && pr[3] == 3, "pairs");
    HT_CLOSE (S, 4.0 * log (k * sinh (3 * M_PI)) / 6.0, 1e-13);
    /* from the pair within the sides, the runner-up is the bridge */
    const size_t pin[4] = { 0, 1, 2, 3 };
    HT_STATUS (holent_surface_tfd_runner_up (w, &tl, 4, x, t, sd, pin, pr, &S), 0);
    HT_CHECK (pr[0] == 0 && pr[1] == 3 && pr[2] == 1 && pr[3] == 2, "pairs");
    HT_CLOSE (S, 4.0 * log (k) / 6.0, 1e-13);
    HT_STATUS (holent_surface_tfd_runner_up (w, &tl, 2, x, t, sd, pin, pr, &S), HOLENT_EDOM);
    HT_STATUS (holent_surface_tfd_runner_up (w, &tl, 3, x, t, sd, pmin, pr, &S), HOLENT_EDOM);
    HT_STATUS (holent_surface_tfd_runner_up (w, &tc, 4, x, t, sd, pmin, pr, &S), HOLENT_EUNSUP);
    HT_STATUS (holent_surface_tfd_runner_up (NULL, &tl, 4, x, t, sd, pmin, pr, &S), HOLENT_EINVAL);
    HT_STATUS (holent_surface_tfd_runner_up (w, &tl, 18, x, t, sd, pmin, pr, &S), HOLENT_ETOOBIG);
    /* the same workspace, then 8 intervals on the right (1430 pairings of
       16 points after 2 of 4: its scratch grows by entries, under ASan):
       the intervals [2k, 2k + 1] with gaps of 1; the runner-up nests two
       neighbours, [2k, 2k + 3] over [2k + 1, 2k + 2], so one geodesic of
       length 1 becomes one of length 3 (the lengths of Calabrese and
       Cardy as above) */
    double x8[16], t8[16] = { 0 };
    int s8[16];
    size_t p8[16], r8[16];
    for (int i = 0; i < 16; i++)
      {
        x8[i] = i;
        s8[i] = 1;
        p8[i] = (size_t) i;
      }
    HT_STATUS (holent_surface_tfd_runner_up (w, &tl, 16, x8, t8, s8, p8, r8, &S), 0);
    /* the Poincare line with the same points at t = 0: the vacuum
       lengths 2 log(l/eps) (common practice), one 1 -> one 3 again; the
       minimiser given in another order of its pairs; refusals */
    size_t p8r[16];
    for (int i = 0; i < 8; i++)
      {
        p8r[2 * i] = (size_t) (15 - 2 * i);
        p8r[2 * i + 1] = (size_t) (14 - 2 * i);
      }
    double Sv;
    HT_STATUS (holent_surface_hrt_runner_up (w, &bg, 16, x8, t8, p8r, r8, &Sv), 0);
    HT_CLOSE (Sv, (7.0 * 2.0 * log (1e6) + 2.0 * log (3e6)) / 6.0, 1e-13);
    HT_STATUS (holent_surface_hrt_runner_up (w, &bc, 16, x8, t8, p8, r8, &Sv), HOLENT_EUNSUP);
    HT_STATUS (holent_surface_hrt_runner_up (NULL, &bg, 16, x8, t8, p8, r8, &Sv), HOLENT_EINVAL);
    HT_STATUS (holent_surface_quench_runner_up (w, &q, 16, x8, NAN, p8, r8, &Sv), HOLENT_EINVAL);
    /* the quench before the shell (t < 0) is the vacuum */
    HT_STATUS (holent_surface_quench_runner_up (w, &q, 16, x8, -1.0, p8, r8, &Sv), 0);
    HT_CLOSE (Sv, (7.0 * 2.0 * log (1e6) + 2.0 * log (3e6)) / 6.0, 1e-13);
    HT_CLOSE (S, (7.0 * 2.0 * log (k * sinh (M_PI))
                  + 2.0 * log (k * sinh (3 * M_PI))) / 6.0, 1e-13);
  }

  holent_surface_workspace_free (w);
  holent_surface_workspace_free (NULL);
  return HT_DONE ();
}
