/* Unit tests of holent_bg3: every refusal with its argument index, and
 * the derived quantities against outside formulas: Brown and Henneaux
 * 1986 (Commun. Math. Phys. 104, 207), c = 3 ell/(2G); the BTZ metric
 * (Banados, Teitelboim and Zanelli 1992, PRL 69, 1849; from memory):
 * horizons r_+- from T and Omega, M = (r_+^2 + r_-^2)/(8G),
 * J = r_+ r_-/(4G), S = 2 pi r_+/(4G), with the horizons found here as the
 * roots of N^2(r) = r^2 - 8GM + 16 G^2 J^2/r^2 (gsl_poly_solve_quadratic in
 * r^2); the conical defect's and global AdS3's energies -alpha^2/(8G) and
 * -1/(8G) read off the metric -(r^2 + alpha^2) dt^2 (Balasubramanian and
 * Kraus 1999, Commun. Math. Phys. 208, 413; from memory); the
 * Hawking-Page transition at beta_L beta_R = L^2 (Hawking and Page 1983,
 * Commun. Math. Phys. 87, 577; Maldacena and Strominger 1998, JHEP 12
 * (1998) 005; from memory), located here by bisection of the free
 * energies; the Cardy entropy (Cardy 1986, Nucl. Phys. B 270, 186).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <string.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_poly.h>
#include "holent_ctest.h"
#include "holent_bg3.h"

static holent_bg3_spec
spec (holent_bg3_state state, int circle)
{
  holent_bg3_spec s;
  memset (&s, 0, sizeof s);
  s.state = state;
  s.circle = circle;
  return s;
}

static void
give (holent_bg3_spec *s, int p, double v)
{
  s->given |= 1u << p;
  s->value[p] = v;
}

/* Expect refusal STATUS naming parameter ARG.  */
#define REFUSE(s, want, warg)                                           \
  do {                                                                  \
    holent_bg3 b_;                                                      \
    holent_err e_;                                                      \
    HT_STATUS (holent_bg3_init (&b_, &(s), &e_), (want));               \
    HT_CHECK (e_.status == (want) && e_.arg == (warg),                  \
              "status %d arg %d (%s)", e_.status, e_.arg, e_.reason);   \
    HT_CHECK (e_.reason[0] != '\0', "no reason");                       \
  } while (0)

static void
test_errors (void)
{
  holent_bg3_spec s = spec (HOLENT_BG3_VACUUM, 0);
  holent_bg3 b;
  holent_err e;

  HT_STATUS (holent_bg3_init (NULL, &s, &e), HOLENT_EINVAL);
  s = spec ((holent_bg3_state) 9, 0);
  REFUSE (s, HOLENT_EINVAL, -1);

  /* options of other states, circle-only options */
  s = spec (HOLENT_BG3_VACUUM, 0);
  give (&s, HOLENT_BG3_BETA, 1);
  REFUSE (s, HOLENT_EOPTION, HOLENT_BG3_BETA);
  s = spec (HOLENT_BG3_THERMAL, 0);
  give (&s, HOLENT_BG3_BETA, 1);
  give (&s, HOLENT_BG3_SHOCK_ALPHA, 1);
  REFUSE (s, HOLENT_EOPTION, HOLENT_BG3_SHOCK_ALPHA);
  s = spec (HOLENT_BG3_VACUUM, 0);
  give (&s, HOLENT_BG3_CIRCUMFERENCE, 3);
  REFUSE (s, HOLENT_EOPTION, HOLENT_BG3_CIRCUMFERENCE);
  s = spec (HOLENT_BG3_THERMAL, 0);
  give (&s, HOLENT_BG3_BETA, 1);
  give (&s, HOLENT_BG3_SADDLE, HOLENT_BG3_SADDLE_BTZ);
  REFUSE (s, HOLENT_EOPTION, HOLENT_BG3_SADDLE);
  s = spec (HOLENT_BG3_THERMAL, 1);
  give (&s, HOLENT_BG3_BETA, 1);
  give (&s, HOLENT_BG3_SADDLE, 7);
  REFUSE (s, HOLENT_EOPTION, HOLENT_BG3_SADDLE);

  /* units */
  s = spec (HOLENT_BG3_VACUUM, 0);
  give (&s, HOLENT_BG3_C, NAN);
  REFUSE (s, HOLENT_ENAN, HOLENT_BG3_C);
  s = spec (HOLENT_BG3_VACUUM, 0);
  give (&s, HOLENT_BG3_ELL, -1);
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_ELL);
  s = spec (HOLENT_BG3_VACUUM, 0);
  give (&s, HOLENT_BG3_G, INFINITY);
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_G);
  s = spec (HOLENT_BG3_VACUUM, 0);
  give (&s, HOLENT_BG3_G, 1);
  give (&s, HOLENT_BG3_C, 10);
  REFUSE (s, HOLENT_EINCONSISTENT, HOLENT_BG3_C);
  s = spec (HOLENT_BG3_VACUUM, 0);
  give (&s, HOLENT_BG3_G, 1e-300);
  give (&s, HOLENT_BG3_ELL, 1e300);
  REFUSE (s, HOLENT_ERANGE, -1);
  s = spec (HOLENT_BG3_VACUUM, 0);
  give (&s, HOLENT_BG3_CUTOFF, 0);
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_CUTOFF);
  s = spec (HOLENT_BG3_VACUUM, 1);
  give (&s, HOLENT_BG3_CIRCUMFERENCE, -2);
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_CIRCUMFERENCE);

  /* temperatures */
  s = spec (HOLENT_BG3_THERMAL, 0);
  REFUSE (s, HOLENT_EOPTION, -1);
  give (&s, HOLENT_BG3_BETA, 1);
  give (&s, HOLENT_BG3_T, 1);
  REFUSE (s, HOLENT_EOPTION, HOLENT_BG3_T);
  s = spec (HOLENT_BG3_THERMAL, 0);
  give (&s, HOLENT_BG3_BETA, 0);
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_BETA);
  s = spec (HOLENT_BG3_THERMAL, 0);
  give (&s, HOLENT_BG3_T, 1e-320);
  REFUSE (s, HOLENT_ERANGE, HOLENT_BG3_T);
  s = spec (HOLENT_BG3_ROTATING, 0);
  give (&s, HOLENT_BG3_BETA, 1);
  REFUSE (s, HOLENT_EOPTION, -1);
  give (&s, HOLENT_BG3_OMEGA, 1);
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_OMEGA);
  give (&s, HOLENT_BG3_BETA_L, 1);
  REFUSE (s, HOLENT_EOPTION, HOLENT_BG3_BETA_R);
  give (&s, HOLENT_BG3_BETA_R, 1);
  REFUSE (s, HOLENT_EOPTION, HOLENT_BG3_BETA_L);
  s = spec (HOLENT_BG3_ROTATING, 0);
  give (&s, HOLENT_BG3_BETA_L, 1);
  give (&s, HOLENT_BG3_BETA_R, -1);
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_BETA_R);

  /* overflow: the BTZ state on a circle, the entropy density on a line */
  s = spec (HOLENT_BG3_THERMAL, 1);
  give (&s, HOLENT_BG3_BETA, 1e-308);
  REFUSE (s, HOLENT_ERANGE, -1);
  s = spec (HOLENT_BG3_THERMAL, 0);
  give (&s, HOLENT_BG3_BETA, 1e-308);
  REFUSE (s, HOLENT_EDOM, -1);
  /* a cutoff whose scale is subnormal */
  s = spec (HOLENT_BG3_VACUUM, 1);
  give (&s, HOLENT_BG3_CUTOFF, 1e-320);
  give (&s, HOLENT_BG3_CIRCUMFERENCE, 1e308);
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_CUTOFF);

  /* heavy */
  s = spec (HOLENT_BG3_HEAVY, 0);
  give (&s, HOLENT_BG3_ALPHA, 0.5);
  REFUSE (s, HOLENT_EBOUNDARY, -1);
  s = spec (HOLENT_BG3_HEAVY, 1);
  REFUSE (s, HOLENT_EOPTION, -1);
  give (&s, HOLENT_BG3_ALPHA, 0);
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_ALPHA);
  give (&s, HOLENT_BG3_H, 0.01);
  REFUSE (s, HOLENT_EOPTION, HOLENT_BG3_H);
  s = spec (HOLENT_BG3_HEAVY, 1);
  give (&s, HOLENT_BG3_C, 24);
  give (&s, HOLENT_BG3_H, 1);   /* h = c/24: the black-hole threshold */
  REFUSE (s, HOLENT_EDOM, HOLENT_BG3_H);

  /* names */
  HT_CHECK (strcmp (holent_bg3_param_name (HOLENT_BG3_BETA_L), "beta_L") == 0, "name");
  HT_CHECK (holent_bg3_param_name (HOLENT_BG3_NPARAM) == NULL, "name");
  HT_CHECK (strcmp (holent_bg3_state_name (HOLENT_BG3_QUENCH), "quench") == 0, "state");
  HT_CHECK (holent_bg3_state_name (-1) == NULL, "state");
  HT_CHECK (strcmp (holent_bg3_saddle_name (HOLENT_BG3_SADDLE_THERMAL_ADS), "thermal_ads") == 0, "saddle");
  HT_CHECK (holent_bg3_saddle_name (9) == NULL, "saddle");
  HT_CHECK (holent_bg3_bulk_from_name ("rotating_btz") == HOLENT_BULK_ROTATING_BTZ, "bulk");
  HT_CHECK (strcmp (holent_bg3_bulk_name (HOLENT_BULK_CONICAL_DEFECT), "conical_defect") == 0, "bulk");
  HT_CHECK (holent_bg3_bulk_from_name ("vaidya") == -1 && holent_bg3_bulk_from_name (NULL) == -1, "bulk");
  HT_CHECK (holent_bg3_bulk_name (8) == NULL, "bulk");
  (void) b;
}

/* Horizons of the BTZ metric from M, J (G, ell = 1): r^4 - 8GM r^2
   + 16 G^2 J^2 = 0.  */
static void
btz_radii (double G, double M, double J, double *rp, double *rm)
{
  double x0, x1;
  int n = gsl_poly_solve_quadratic (1, -8 * G * M, 16 * G * G * J * J, &x0,
                                    &x1);
  HT_CHECK (n == 2, "%d roots", n);
  *rp = sqrt (x1);
  *rm = sqrt (x0);
}

static void
test_btz (void)
{
  /* Circle 2 pi, ell = 1, G = 0.01: rotating BTZ from (beta, Omega).  */
  holent_bg3_spec s = spec (HOLENT_BG3_ROTATING, 1);
  holent_bg3 b;
  holent_err e;
  const double G = 0.01, beta = 0.8, Om = 0.3;
  give (&s, HOLENT_BG3_G, G);
  give (&s, HOLENT_BG3_BETA, beta);
  give (&s, HOLENT_BG3_OMEGA, Om);
  HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
  HT_CLOSE (b.c, 3 / (2 * G), 1e-14);
  HT_CHECK (b.bulk == HOLENT_BULK_ROTATING_BTZ && b.horizon && !b.pure,
            "bulk %d", (int) b.bulk);
  HT_CHECK (b.saddle == HOLENT_BG3_SADDLE_BTZ, "saddle %d", (int) b.saddle);
  HT_CLOSE (b.beta_L, beta * (1 - Om), 1e-15);
  HT_CLOSE (b.beta_R, beta * (1 + Om), 1e-15);
  HT_CLOSE (b.Omega, Om, 1e-14);
  HT_CLOSE (b.T, 1 / beta, 1e-14);
  /* the metric: horizons from M and J; T = (r+^2 - r-^2)/(2 pi r+),
     Omega = r-/r+, S = 2 pi r+/(4G) */
  double rp, rm;
  btz_radii (G, b.M, b.J, &rp, &rm);
  HT_CLOSE (b.r_plus, rp, 1e-12);
  HT_CLOSE (b.r_minus, rm, 1e-12);
  HT_CLOSE ((rp * rp - rm * rm) / (2 * M_PI * rp), 1 / beta, 1e-12);
  HT_CLOSE (rm / rp, Om, 1e-12);
  HT_CLOSE (b.S_BH, 2 * M_PI * rp / (4 * G), 1e-12);
  HT_CLOSE (b.M, (rp * rp + rm * rm) / (8 * G), 1e-12);
  HT_CLOSE (b.J, rp * rm / (4 * G), 1e-12);
  /* Virasoro: M = L0 + Lbar0 - c/12 (L = 2 pi), J = L0 - Lbar0 */
  HT_CLOSE (b.L0 + b.Lbar0 - b.c / 12, b.M, 1e-12);
  HT_CLOSE (b.L0 - b.Lbar0, b.J, 1e-12);
  /* Cardy: S = (pi c/6) L (T_L + T_R), L = 2 pi */
  HT_CLOSE (b.S_BH, M_PI * b.c / 6 * 2 * M_PI * (b.T_L + b.T_R), 1e-12);
  HT_CHECK (!b.cutoff_large, "cutoff");

  /* The planar brane: entropy density pi c T/3, extensive M, Inf S.  */
  s = spec (HOLENT_BG3_THERMAL, 0);
  give (&s, HOLENT_BG3_T, 2.5);
  give (&s, HOLENT_BG3_C, 12);
  HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
  HT_CHECK (b.bulk == HOLENT_BULK_PLANAR_BTZ && isinf (b.S_BH) && isinf (b.M)
            && b.J == 0 && isinf (b.L), "planar");
  HT_CLOSE (b.s_density, M_PI * 12 * 2.5 / 3, 1e-14);
  s = spec (HOLENT_BG3_ROTATING, 0);
  give (&s, HOLENT_BG3_BETA_L, 2);
  give (&s, HOLENT_BG3_BETA_R, 1);
  HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
  HT_CHECK (b.bulk == HOLENT_BULK_PLANAR_ROTATING_BTZ && b.J < 0
            && isinf (b.J), "J %g", b.J);
}

/* F_btz - F_thermal_ads on the circle L as a function of beta at fixed
   Omega (ell = 1): -(pi c L/6)/(beta_L beta_R) + pi c/(6 L).  */
static double
dF (double beta, double Om, double L)
{
  return -(M_PI * L / 6) / (beta * (1 - Om) * beta * (1 + Om))
         + M_PI / (6 * L);
}

static void
test_saddles (void)
{
  const double L = 3, Om = 0.4;
  /* the transition by bisection of the free energies */
  double lo = 0.1, hi = 100;
  for (int k = 0; k < 200; k++)
    {
      double mid = 0.5 * (lo + hi);
      if (dF (mid, Om, L) < 0)
        lo = mid;
      else
        hi = mid;
    }
  const double bc = 0.5 * (lo + hi);
  for (int side = 0; side < 2; side++)
    {
      holent_bg3_spec s = spec (HOLENT_BG3_ROTATING, 1);
      holent_bg3 b;
      holent_err e;
      give (&s, HOLENT_BG3_CIRCUMFERENCE, L);
      give (&s, HOLENT_BG3_BETA, side ? 1.01 * bc : 0.99 * bc);
      give (&s, HOLENT_BG3_OMEGA, Om);
      HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
      HT_CHECK (b.saddle == (side ? HOLENT_BG3_SADDLE_THERMAL_ADS
                                  : HOLENT_BG3_SADDLE_BTZ),
                "side %d saddle %d", side, (int) b.saddle);
      HT_CHECK (b.horizon == !side, "horizon");
      if (side)
        {
          /* thermal AdS: the vacuum's Casimir energy -pi c/(6 L) */
          HT_CLOSE (b.M, -M_PI / (6 * L), 1e-14);
          HT_CHECK (b.S_BH == 0 && b.bulk == HOLENT_BULK_THERMAL_ADS, "tads");
        }
      /* forcing the other saddle */
      give (&s, HOLENT_BG3_SADDLE, side ? HOLENT_BG3_SADDLE_BTZ
                                        : HOLENT_BG3_SADDLE_THERMAL_ADS);
      HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
      HT_CHECK (b.horizon == side, "forced");
    }
}

static void
test_vacuum_heavy (void)
{
  const double G = 0.02, alpha = 0.6;
  holent_bg3_spec s = spec (HOLENT_BG3_VACUUM, 1);
  holent_bg3 b;
  holent_err e;
  give (&s, HOLENT_BG3_G, G);
  HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
  HT_CHECK (b.bulk == HOLENT_BULK_GLOBAL_ADS && b.pure && !b.horizon, "vac");
  HT_CLOSE (b.M, -1 / (8 * G), 1e-13);
  s = spec (HOLENT_BG3_HEAVY, 1);
  give (&s, HOLENT_BG3_G, G);
  give (&s, HOLENT_BG3_ALPHA, alpha);
  HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
  HT_CLOSE (b.M, -alpha * alpha / (8 * G), 1e-13);
  HT_CLOSE (b.h, b.c / 24 * (1 - alpha * alpha), 1e-14);
  /* the same state by its weight */
  double h = b.h;
  s = spec (HOLENT_BG3_HEAVY, 1);
  give (&s, HOLENT_BG3_G, G);
  give (&s, HOLENT_BG3_H, h);
  HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
  HT_CLOSE (b.alpha, alpha, 1e-14);
  /* a cutoff not small against the circle is flagged */
  s = spec (HOLENT_BG3_VACUUM, 1);
  give (&s, HOLENT_BG3_CUTOFF, 0.1);
  HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
  HT_CHECK (b.cutoff_large, "cutoff 0.1 on 2 pi");
  s = spec (HOLENT_BG3_QUENCH, 0);
  give (&s, HOLENT_BG3_BETA, 2);
  HT_STATUS (holent_bg3_init (&b, &s, &e), HOLENT_SUCCESS);
  HT_CHECK (!b.has_bulk && b.beta == 2 && b.pure && b.scale == 2, "quench");
}

int
main (void)
{
  test_errors ();
  test_btz ();
  test_saddles ();
  test_vacuum_heavy ();
  return HT_DONE ();
}
