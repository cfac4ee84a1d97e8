/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_surface: error paths, the Poincare semicircle, the
   horizon circle, the runner-up of two intervals and a vacuum profile.  */
#include <math.h>
#include "holent_ctest.h"
#include "holent_surface.h"

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
  HT_STATUS (holent_surface_tfd (w, &ts, 0, 0, 0, 0, 0, 1, NAN, 1e-3), HOLENT_EUNSUP);
  HT_STATUS (holent_surface_tfd_horizon (NULL, &tc, 0, 1), HOLENT_EINVAL);
  HT_STATUS (holent_surface_tfd_winding (w, &tf, 0, 0, 0, 1, 0, 1, NAN, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_tfd_winding (w, &tc, 0, 0, 1, 1, 0, 1, 1, 1, 1e-3), HOLENT_EDOM);
  HT_STATUS (holent_surface_tfd_winding (w, &ts, 0, 0, 0, 0, 0, 1, NAN, 0, 1e-3), HOLENT_EUNSUP);
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

  holent_surface_workspace_free (w);
  holent_surface_workspace_free (NULL);
  return HT_DONE ();
}
