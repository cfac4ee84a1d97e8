/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_thermo: every error path and reason; the closed
 * forms against an independent reading of the BTZ metric (Banados,
 * Teitelboim and Zanelli 1992, PRL 69, 1849): horizons from the roots of
 * N^2(r) = -8 G M + r^2/ell^2 + 16 G^2 J^2/r^2 (gsl_poly_solve_quadratic in
 * r^2), temperature from the surface gravity kappa = (N^2)'(r_+)/2 by
 * numerical differentiation (gsl_deriv_central), Omega_H = 4 G J/r_+^2;
 * the Cardy formula (Cardy 1986, Nucl. Phys. B 270, 186); and the
 * Hawking-Page temperature as the root (gsl_root_fsolver_brent) of
 * F_btz(T) - F_thermal_ads (Hawking and Page 1983, Commun. Math. Phys. 87,
 * 577).  */
#include <float.h>
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_deriv.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_poly.h>
#include <gsl/gsl_roots.h>
#include "holent_ctest.h"
#include "holent_thermo.h"

#define ST(pair, a, b) holent_thermo_state_from (c, ell, L, pair, a, b, &st, &why)

static void
test_errors (void)
{
  holent_thermo_state st;
  int why = -1;
  const double c = 6, ell = 1, L = 2 * M_PI;

  /* parameters and pointers */
  HT_STATUS (holent_thermo_state_from (c, ell, L, HOLENT_THERMO_RADII, 1, 0, NULL, &why), HOLENT_EINVAL);
  HT_CHECK (why == HOLENT_THERMO_PARAM, "why %d", why);
  HT_STATUS (holent_thermo_state_from (NAN, ell, L, HOLENT_THERMO_RADII, 1, 0, &st, &why), HOLENT_EINVAL);
  HT_STATUS (holent_thermo_state_from (c, NAN, L, HOLENT_THERMO_RADII, 1, 0, &st, &why), HOLENT_EINVAL);
  HT_STATUS (holent_thermo_state_from (c, ell, NAN, HOLENT_THERMO_RADII, 1, 0, &st, &why), HOLENT_EINVAL);
  HT_STATUS (holent_thermo_state_from (-1, ell, L, HOLENT_THERMO_RADII, 1, 0, &st, &why), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_PARAM, "why %d", why);
  HT_STATUS (holent_thermo_state_from (c, 0, L, HOLENT_THERMO_RADII, 1, 0, &st, &why), HOLENT_EDOM);
  HT_STATUS (holent_thermo_state_from (c, ell, INFINITY, HOLENT_THERMO_RADII, 1, 0, &st, &why), HOLENT_EDOM);
  HT_STATUS (holent_thermo_state_from (c, ell, L, (holent_thermo_pair) 42, 1, 0, &st, &why), HOLENT_EINVAL);
  HT_CHECK (why == HOLENT_THERMO_PARAM, "why %d", why);
  /* reason pointer may be NULL */
  HT_STATUS (holent_thermo_state_from (c, ell, L, HOLENT_THERMO_RADII, -1, 0, &st, NULL), HOLENT_EDOM);

  /* radii */
  HT_STATUS (ST (HOLENT_THERMO_RADII, NAN, 0), HOLENT_EINVAL);
  HT_CHECK (why == HOLENT_THERMO_NOT_FINITE, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_RADII, 1, INFINITY), HOLENT_EINVAL);
  HT_STATUS (ST (HOLENT_THERMO_RADII, 0, 0), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_RADIUS, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_RADII, 1, -1.5), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_INNER, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_RADII, 1e200, 0), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_RANGE, "why %d", why);

  /* T, Omega */
  HT_STATUS (ST (HOLENT_THERMO_T_OMEGA, NAN, 0), HOLENT_EINVAL);
  HT_STATUS (ST (HOLENT_THERMO_T_OMEGA, 0, 0), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_TEMPERATURE, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_T_OMEGA, -1, 0), HOLENT_EDOM);
  HT_STATUS (ST (HOLENT_THERMO_T_OMEGA, 1, 1), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_OMEGA, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_T_OMEGA, 1, -1.2), HOLENT_EDOM);

  /* T_L, T_R */
  HT_STATUS (ST (HOLENT_THERMO_T_LR, 1, NAN), HOLENT_EINVAL);
  HT_STATUS (ST (HOLENT_THERMO_T_LR, -1, 1), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_TEMPERATURE, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_T_LR, 0, 0), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_MASSLESS, "why %d", why);

  /* beta_L, beta_R */
  HT_STATUS (ST (HOLENT_THERMO_BETA_LR, NAN, 1), HOLENT_EINVAL);
  HT_STATUS (ST (HOLENT_THERMO_BETA_LR, 1, 0), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_BETA, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_BETA_LR, -INFINITY, 1), HOLENT_EDOM);
  HT_STATUS (ST (HOLENT_THERMO_BETA_LR, INFINITY, INFINITY), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_MASSLESS, "why %d", why);

  /* M, J (ell = 1, L = 2 pi: -1/(8G) = -c/12) */
  HT_STATUS (ST (HOLENT_THERMO_M_J, INFINITY, 0), HOLENT_EINVAL);
  HT_STATUS (ST (HOLENT_THERMO_M_J, -c / 12 * 1.01, 0), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_BELOW_VACUUM, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_M_J, -c / 24, 0), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_CONICAL, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_M_J, 1, -1.001), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_OVERROTATING, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_M_J, 0, 1e-3), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_OVERROTATING, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_M_J, 0, 0), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_MASSLESS, "why %d", why);
  HT_STATUS (ST (HOLENT_THERMO_M_J, 1.7e308, 0), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_RANGE, "why %d", why);

  /* vectorised: first bad index, NULL columns */
  double a[3] = { 1, 2, 3 }, b[3] = { 0, 0.5, 4 }, S[3];
  size_t bad = 99;
  holent_thermo_table tab = { 0 };
  tab.S = S;
  HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, 3, a, b, NULL, NULL, &tab, &bad, &why), HOLENT_EDOM);
  HT_CHECK (bad == 2 && why == HOLENT_THERMO_INNER, "bad %zu why %d", bad, why);
  HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, 3, NULL, b, NULL, NULL, &tab, &bad, &why), HOLENT_EINVAL);
  HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, 3, a, b, NULL, NULL, NULL, &bad, &why), HOLENT_EINVAL);
  HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, 0, NULL, NULL, NULL, NULL, &tab, NULL, NULL), HOLENT_SUCCESS);
  b[2] = 1;
  HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, 3, a, b, NULL, NULL, &tab, NULL, NULL), HOLENT_SUCCESS);
  HT_CLOSE (S[2], M_PI * c / 3 * 3, 1e-15);
  /* steps: a scalar b and L repeated (step 0) */
  {
    double bs = 0.25, Lsc = 3, S3[3], T3[3];
    size_t step[3] = { 1, 0, 0 };
    holent_thermo_table t3 = { 0 };
    t3.S = S3;
    t3.T = T3;
    HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, 3, a, &bs, &Lsc, step, &t3, &bad, &why), HOLENT_SUCCESS);
    for (int i = 0; i < 3; i++)
      HT_CLOSE (T3[i], (a[i] * a[i] - bs * bs) / (Lsc * a[i]), 1e-15);
    bs = 1.5;
    HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, 3, a, &bs, &Lsc, step, &t3, &bad, &why), HOLENT_EDOM);
    HT_CHECK (bad == 0 && why == HOLENT_THERMO_INNER, "bad %zu why %d", bad, why);
  }
  double Ls[3] = { 1, 2, -3 };
  HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, 3, a, b, Ls, NULL, &tab, &bad, &why), HOLENT_EDOM);
  HT_CHECK (bad == 2 && why == HOLENT_THERMO_PARAM, "bad %zu why %d", bad, why);

  /* a large array takes the OpenMP path; the first bad index is found */
  {
    size_t nb = 100000;
    double *ra = malloc (nb * sizeof *ra), *rb = malloc (nb * sizeof *rb);
    double *sb = malloc (nb * sizeof *sb);
    HT_CHECK (ra && rb && sb, "malloc");
    if (ra && rb && sb)
      {
        holent_thermo_table tb = { 0 };
        tb.S = sb;
        for (size_t i = 0; i < nb; i++)
          {
            ra[i] = 1 + 1e-5 * i;
            rb[i] = 0.5;
          }
        HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, nb, ra, rb, NULL, NULL, &tb, &bad, &why), HOLENT_SUCCESS);
        HT_CLOSE (sb[nb - 1], M_PI * c / 3 * ra[nb - 1], 1e-15);
        rb[nb - 7] = -5;
        rb[nb - 3] = NAN;
        HT_STATUS (holent_thermo_states (c, ell, HOLENT_THERMO_RADII, nb, ra, rb, NULL, NULL, &tb, &bad, &why), HOLENT_EDOM);
        HT_CHECK (bad == nb - 7 && why == HOLENT_THERMO_INNER, "bad %zu why %d", bad, why);
      }
    free (ra);
    free (rb);
    free (sb);
  }

  /* Hawking-Page temperature */
  double Om[3] = { 0, 0.6, -0.999 }, Lh[3] = { 2, 2, 2 }, Th[3];
  HT_STATUS (holent_thermo_hawking_page (3, Om, Lh, Th, &bad, &why), HOLENT_SUCCESS);
  HT_CLOSE (Th[0], 0.5, 1e-15);
  HT_CLOSE (Th[1], 0.4, 1e-15);
  HT_CLOSE (Th[2], sqrt (1 - 0.999 * 0.999) / 2, 1e-13);
  HT_STATUS (holent_thermo_hawking_page (3, NULL, Lh, Th, &bad, &why), HOLENT_EINVAL);
  HT_STATUS (holent_thermo_hawking_page (0, NULL, NULL, NULL, NULL, NULL), HOLENT_SUCCESS);
  Om[1] = 1;
  HT_STATUS (holent_thermo_hawking_page (3, Om, Lh, Th, &bad, &why), HOLENT_EDOM);
  HT_CHECK (bad == 1 && why == HOLENT_THERMO_OMEGA, "bad %zu why %d", bad, why);
  Om[1] = NAN;
  HT_STATUS (holent_thermo_hawking_page (3, Om, Lh, Th, &bad, &why), HOLENT_EINVAL);
  HT_CHECK (why == HOLENT_THERMO_NOT_FINITE, "why %d", why);
  Om[1] = 0;
  Lh[2] = NAN;
  HT_STATUS (holent_thermo_hawking_page (3, Om, Lh, Th, &bad, &why), HOLENT_EINVAL);
  HT_CHECK (bad == 2 && why == HOLENT_THERMO_PARAM, "bad %zu why %d", bad, why);
  Lh[2] = 0;
  HT_STATUS (holent_thermo_hawking_page (3, Om, Lh, Th, &bad, NULL), HOLENT_EDOM);

  for (int r = 0; r <= HOLENT_THERMO_RANGE; r++)
    HT_CHECK (holent_thermo_strreason (r)[0] != '\0', "reason %d", r);
  HT_CHECK (holent_thermo_strreason (999)[0] != '\0', "unknown reason");
}

/* BTZ metric function N^2(r) with the parameters of the current state.  */
struct metric { double G, ell, M, J; };

static double
lapse2 (double r, void *p)
{
  const struct metric *m = p;
  return -8 * m->G * m->M + r * r / (m->ell * m->ell)
         + 16 * m->G * m->G * m->J * m->J / (r * r);
}

static void
test_metric (void)
{
  /* random states on the circle 2 pi ell, with ell != 1 */
  const double ell = 1.7, c = 30, G = 3 * ell / (2 * c);
  srand (12345);
  for (int k = 0; k < 40; k++)
    {
      double M = 0.05 + 20.0 * rand () / RAND_MAX;
      double J = (2.0 * rand () / RAND_MAX - 1) * 0.95 * M * ell;
      holent_thermo_state st;
      int why;
      HT_STATUS (holent_thermo_state_from (c, ell, 2 * M_PI * ell, HOLENT_THERMO_M_J, M, J, &st, &why), HOLENT_SUCCESS);
      /* r^2 N^2 = r^4/ell^2 - 8 G M r^2 + 16 G^2 J^2: quadratic in r^2 */
      double x0, x1;
      int nr = gsl_poly_solve_quadratic (1 / (ell * ell), -8 * G * M, 16 * G * G * J * J, &x0, &x1);
      HT_CHECK (nr == 2, "two horizons");
      double rp = sqrt (x1), rm = sqrt (x0) * (J < 0 ? -1 : 1);
      HT_CLOSE (st.r_plus * ell, rp, 1e-11);
      HT_CLOSE (st.r_minus * ell, rm, 1e-7);
      struct metric m = { G, ell, M, J };
      gsl_function f = { lapse2, &m };
      double d, derr;
      gsl_deriv_central (&f, rp, 1e-4 * rp, &d, &derr);
      HT_CLOSE (st.T, d / 2 / (2 * M_PI), 1e-8);           /* T = kappa/(2 pi) */
      HT_CLOSE (st.Omega_J, 4 * G * J / (rp * rp), 1e-12); /* -N^phi(r_+) */
      HT_CLOSE (st.S, 2 * M_PI * rp / (4 * G), 1e-12);     /* area/(4G) */
      /* Cardy */
      double cardy = 2 * M_PI * sqrt (c / 6 * (st.L0 - c / 24))
                     + 2 * M_PI * sqrt (c / 6 * (st.Lbar0 - c / 24));
      HT_CLOSE (st.S, cardy, 1e-10);
      HT_CLOSE (st.L0 + st.Lbar0 - c / 12, M * ell, 1e-12);
      HT_CLOSE (st.L0 - st.Lbar0, J, 1e-10);
      HT_CHECK (st.C_J > 0 && st.C_Omega > 0, "heat capacities positive");
    }
}

struct hp { double c, ell, L, Omega; };

static double
f_gap (double T, void *p)
{
  const struct hp *h = p;
  holent_thermo_state st;
  holent_thermo_state_from (h->c, h->ell, h->L, HOLENT_THERMO_T_OMEGA, T, h->Omega, &st, NULL);
  return (st.M - T * st.S - st.Omega_J * st.J) - st.F_thermal_ads;
}

static void
test_extremal_and_hp (void)
{
  holent_thermo_state st;
  int why;
  const double c = 12, ell = 1;
  /* exactly extremal: T = 0, Omega = -1, no NaN */
  HT_STATUS (holent_thermo_state_from (c, ell, 2 * M_PI, HOLENT_THERMO_M_J, 0.3, -0.3, &st, &why), HOLENT_SUCCESS);
  HT_CHECK (st.T == 0 && st.Omega == -1 && st.T_L == 0 && st.C_J == 0, "extremal");
  HT_CHECK (!isnan (st.F) && !isnan (st.C_Omega) && st.S > 0, "extremal finite");
  HT_CHECK (!st.btz_dominates, "extremal: thermal AdS dominates");
  HT_STATUS (holent_thermo_state_from (c, ell, 2 * M_PI, HOLENT_THERMO_BETA_LR, 0.5, INFINITY, &st, &why), HOLENT_SUCCESS);
  HT_CHECK (st.T == 0 && st.Omega == 1 && st.T_R == 0, "extremal from beta");
  HT_STATUS (holent_thermo_state_from (c, ell, 2 * M_PI, HOLENT_THERMO_T_LR, 0, 0.7, &st, &why), HOLENT_SUCCESS);
  HT_CHECK (st.T == 0 && st.Omega == -1 && st.T_L == 0 && st.T_R == 0.7, "extremal from T_L, T_R");
  HT_CLOSE (st.r_minus, -0.7 * M_PI, 1e-15); /* r_- = -r_+ = -(L/2) T_R */
  {
    holent_thermo_state s2;
    HT_STATUS (holent_thermo_state_from (c, ell, 5, HOLENT_THERMO_T_LR, 0.4, 0.3, &st, &why), HOLENT_SUCCESS);
    HT_STATUS (holent_thermo_state_from (c, ell, 5, HOLENT_THERMO_RADII, st.r_plus, st.r_minus, &s2, &why), HOLENT_SUCCESS);
    HT_CLOSE (s2.T_L, 0.4, 1e-15);
    HT_CLOSE (s2.T_R, 0.3, 1e-15);
    HT_CLOSE (st.r_plus, 5 * 0.7 / 2, 1e-15); /* r_+ = (L/2)(T_L + T_R) */
  }
  HT_STATUS (holent_thermo_state_from (c, ell, 2 * M_PI, HOLENT_THERMO_RADII, 2, 2, &st, &why), HOLENT_SUCCESS);
  HT_CLOSE (st.J, st.M * ell, 1e-15);
  /* slow rotation: r_- and J without cancellation, from every pair */
  HT_STATUS (holent_thermo_state_from (c, ell, 3, HOLENT_THERMO_T_OMEGA, 0.8, 1e-9, &st, &why), HOLENT_SUCCESS);
  HT_CLOSE (st.r_minus / st.r_plus / 1e-9, 1, 1e-14);
  HT_STATUS (holent_thermo_state_from (c, ell, 2 * M_PI, HOLENT_THERMO_M_J, 1, 1e-12, &st, &why), HOLENT_SUCCESS);
  HT_CLOSE (c / 6 * st.r_plus * st.r_minus / 1e-12, 1, 1e-14); /* J = (c/6) r_+ r_- */
  HT_CLOSE (st.Omega / (st.r_minus / st.r_plus), 1, 1e-15);
  HT_STATUS (holent_thermo_state_from (c, ell, 3, HOLENT_THERMO_T_LR, 0.5 + 1e-12, 0.5, &st, &why), HOLENT_SUCCESS);
  HT_CLOSE (st.r_minus / (1.5 * (0.5 + 1e-12 - 0.5)), 1, 1e-15);
  {
    const double bb = 2 * (1 + 1e-10); /* bb - 2 is exact (Sterbenz) */
    HT_STATUS (holent_thermo_state_from (c, ell, 3, HOLENT_THERMO_BETA_LR, 2, bb, &st, &why), HOLENT_SUCCESS);
    HT_CLOSE (st.r_minus / (1.5 * (bb - 2) / (2 * bb)), 1, 1e-14);
  }
  HT_CLOSE (st.J / (c / 6 * st.r_plus * st.r_minus), 1, 1e-14);
  /* within rounding of extremal */
  HT_STATUS (holent_thermo_state_from (c, ell, 2 * M_PI, HOLENT_THERMO_M_J, 0.1, 0.1 * (1 + DBL_EPSILON), &st, &why), HOLENT_SUCCESS);
  HT_CHECK (st.T == 0, "rounding-extremal");

  /* Hawking-Page: the root of F_btz - F_ads from a bracketing solver */
  const double Ls[3] = { 2 * M_PI, 3, 0.4 }, Oms[3] = { 0, 0.5, -0.93 };
  for (int i = 0; i < 3; i++)
    {
      struct hp h = { c, ell, Ls[i], Oms[i] };
      gsl_function f = { f_gap, &h };
      gsl_root_fsolver *s = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
      HT_CHECK (s != NULL, "alloc");
      if (!s)
        continue;
      gsl_root_fsolver_set (s, &f, 0.01 / Ls[i], 10 / Ls[i]);
      int status = GSL_CONTINUE;
      for (int it = 0; it < 200 && status == GSL_CONTINUE; it++)
        {
          gsl_root_fsolver_iterate (s);
          status = gsl_root_test_interval (gsl_root_fsolver_x_lower (s), gsl_root_fsolver_x_upper (s), 0, 1e-14);
        }
      HT_CHECK (status == GSL_SUCCESS, "brent converged");
      double Th;
      HT_STATUS (holent_thermo_hawking_page (1, &Oms[i], &Ls[i], &Th, NULL, NULL), HOLENT_SUCCESS);
      HT_CLOSE (gsl_root_fsolver_root (s), Th, 1e-12);
      gsl_root_fsolver_free (s);
      holent_thermo_state_from (c, ell, Ls[i], HOLENT_THERMO_T_OMEGA, Th * 1.01, Oms[i], &st, NULL);
      HT_CHECK (st.btz_dominates, "BTZ above T_hp");
      holent_thermo_state_from (c, ell, Ls[i], HOLENT_THERMO_T_OMEGA, Th * 0.99, Oms[i], &st, NULL);
      HT_CHECK (!st.btz_dominates, "thermal AdS below T_hp");
    }
}

/* hawking_page's comparison: at the transition the two grand potentials
   tie (Hawking and Page 1983); (beta, Omega) is the state (1/beta, Omega);
   (beta_L, beta_R) gives Omega = (beta_R - beta_L)/(beta_R + beta_L) and
   T_hp = sqrt(1 - Omega^2)/L; every refusal.  */
static void
test_hp_compare (void)
{
  const double c = 12, ell = 1, L[3] = { 2, 3, 5 };
  const double Om[3] = { -0.5, 0, 0.6 }, beta[3] = { 0.5, 2, 9 };
  const double bl[3] = { 0.4, 1, 3 }, br[3] = { 0.9, 1, 2 };
  double Th[3], O[3], T[3], F[3], Ft[3], T2[3], F2[3];
  unsigned char dom[3];
  size_t bad = 9;
  int why;
  HT_STATUS (holent_thermo_hp_compare (c, ell, -1, 3, NULL, Om, L, NULL, Th, O, T, F, Ft, dom, &bad, &why), HOLENT_SUCCESS);
  for (int i = 0; i < 3; i++)
    {
      HT_CLOSE (F[i], Ft[i], 1e-12);
      HT_CLOSE (T[i], Th[i], 0);
      HT_CLOSE (Th[i], sqrt (1 - Om[i] * Om[i]) / L[i], 1e-15);
    }
  double Tb[3] = { 1 / beta[0], 1 / beta[1], 1 / beta[2] };
  HT_STATUS (holent_thermo_hp_compare (c, ell, HOLENT_THERMO_BETA_OMEGA, 3, beta, Om, L, NULL, Th, O, T, F, Ft, dom, &bad, &why), HOLENT_SUCCESS);
  HT_STATUS (holent_thermo_hp_compare (c, ell, HOLENT_THERMO_T_OMEGA, 3, Tb, Om, L, NULL, Th, O, T2, F2, Ft, NULL, &bad, &why), HOLENT_SUCCESS);
  for (int i = 0; i < 3; i++)
    {
      HT_CLOSE (T[i], T2[i], 1e-14);
      HT_CLOSE (F[i], F2[i], 1e-13);
      /* BTZ dominates above T_hp */
      HT_CHECK (dom[i] == (T[i] > Th[i]), "point %d", i);
    }
  HT_STATUS (holent_thermo_hp_compare (c, ell, HOLENT_THERMO_BETA_LR, 3, bl, br, NULL, NULL, Th, O, T, F, Ft, dom, &bad, &why), HOLENT_SUCCESS);
  for (int i = 0; i < 3; i++)
    {
      HT_CLOSE (O[i], (br[i] - bl[i]) / (br[i] + bl[i]), 1e-14);
      HT_CLOSE (Th[i], sqrt (1 - O[i] * O[i]) / (2 * M_PI), 1e-14);
      /* beta_L beta_R < L^2 = (2 pi)^2 */
      HT_CHECK (dom[i] == (bl[i] * br[i] < 4 * M_PI * M_PI), "point %d", i);
    }
  /* refusals: pointers, beta, Omega, circumference, |Omega| = 1 by rounding */
  HT_STATUS (holent_thermo_hp_compare (c, ell, -1, 1, NULL, NULL, L, NULL, Th, O, T, F, Ft, dom, &bad, &why), HOLENT_EINVAL);
  const double neg[2] = { 1, -1 }, one[2] = { 0, 1 }, Lbad[2] = { 1, 0 };
  HT_STATUS (holent_thermo_hp_compare (c, ell, HOLENT_THERMO_BETA_OMEGA, 2, neg, Om, L, NULL, Th, O, T, F, Ft, dom, &bad, &why), HOLENT_EDOM);
  HT_CHECK (bad == 1 && why == HOLENT_THERMO_BETA, "bad %zu why %d", bad, why);
  HT_STATUS (holent_thermo_hp_compare (c, ell, -1, 2, NULL, one, L, NULL, Th, O, T, F, Ft, dom, &bad, &why), HOLENT_EDOM);
  HT_CHECK (bad == 1 && why == HOLENT_THERMO_OMEGA, "bad %zu why %d", bad, why);
  HT_STATUS (holent_thermo_hp_compare (c, ell, -1, 2, NULL, Om, Lbad, NULL, Th, O, T, F, Ft, dom, &bad, &why), HOLENT_EDOM);
  HT_CHECK (bad == 1 && why == HOLENT_THERMO_PARAM, "bad %zu why %d", bad, why);
  const double huge[1] = { 1e308 }, two[1] = { 2 };
  HT_STATUS (holent_thermo_hp_compare (c, ell, HOLENT_THERMO_BETA_LR, 1, huge, two, NULL, NULL, Th, O, T, F, Ft, dom, &bad, &why), HOLENT_EDOM);
  HT_CHECK (why == HOLENT_THERMO_OMEGA, "why %d", why);
}

int
main (void)
{
  gsl_set_error_handler_off ();
  test_errors ();
  test_metric ();
  test_extremal_and_hp ();
  test_hp_compare ();
  return HT_DONE ();
}
