/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_thermo.c: BTZ thermodynamics, CFT data and Hawking-Page.
 * Derivations: doc/btz_thermodynamics.md.  GPL-3.0-or-later.  */
#include <float.h>
#include <math.h>
#include "holent_thermo.h"

#ifndef M_PI
#define M_PI 3.14159265358979323846
#endif

const char *
holent_thermo_strreason (int reason)
{
  switch (reason)
    {
    case HOLENT_THERMO_OK:           return "no problem";
    case HOLENT_THERMO_NOT_FINITE:   return "value is NaN or infinite";
    case HOLENT_THERMO_PARAM:        return "c, ell and L must be positive and finite";
    case HOLENT_THERMO_RADIUS:       return "r_plus must be positive";
    case HOLENT_THERMO_INNER:        return "|r_minus| must not exceed r_plus";
    case HOLENT_THERMO_TEMPERATURE:  return "temperature must be positive";
    case HOLENT_THERMO_OMEGA:        return "|Omega| must be below 1";
    case HOLENT_THERMO_BETA:         return "inverse temperature must be positive";
    case HOLENT_THERMO_MASSLESS:     return "massless BTZ: no horizon";
    case HOLENT_THERMO_BELOW_VACUUM: return "mass below the AdS vacuum -1/(8G)";
    case HOLENT_THERMO_CONICAL:      return "conical defect, not a black hole";
    case HOLENT_THERMO_OVERROTATING: return "over-rotating: |J| > M ell";
    case HOLENT_THERMO_RANGE:        return "result not representable";
    default:                         return "unknown reason";
    }
}

static int
refuse (int *reason, int why, int status)
{
  if (reason)
    *reason = why;
  return status;
}

static int
params_ok (double c, double ell, double L)
{
  return isfinite (c) && c > 0 && isfinite (ell) && ell > 0 && isfinite (L)
         && L > 0;
}

/* The pair as u = r_+ + r_- = L T_L >= 0, v = r_+ - r_- = L T_R >= 0,
 * not both zero, and w = u - v = 2 r_- computed without cancellation
 * (slow rotation).  R = L/(2 pi) (= ell exactly in the default frame).  */
static int
to_uv (double c, double L, double R, holent_thermo_pair pair, double a,
       double b, double *u, double *v, double *w, int *reason)
{
  switch (pair)
    {
    case HOLENT_THERMO_RADII:
      if (!isfinite (a) || !isfinite (b))
        return refuse (reason, HOLENT_THERMO_NOT_FINITE, HOLENT_EINVAL);
      if (!(a > 0))
        return refuse (reason, HOLENT_THERMO_RADIUS, HOLENT_EDOM);
      if (fabs (b) > a)
        return refuse (reason, HOLENT_THERMO_INNER, HOLENT_EDOM);
      *u = a + b;
      *v = a - b;
      *w = 2 * b;
      return HOLENT_SUCCESS;

    case HOLENT_THERMO_T_OMEGA:
      if (!isfinite (a) || !isfinite (b))
        return refuse (reason, HOLENT_THERMO_NOT_FINITE, HOLENT_EINVAL);
      if (!(a > 0))
        return refuse (reason, HOLENT_THERMO_TEMPERATURE, HOLENT_EDOM);
      if (!(fabs (b) < 1))
        return refuse (reason, HOLENT_THERMO_OMEGA, HOLENT_EDOM);
      /* T_L = T/(1 - Omega), T_R = T/(1 + Omega): one division */
      {
        double d = L * a / ((1 - b) * (1 + b));
        *u = d * (1 + b);
        *v = d * (1 - b);
        *w = 2 * d * b;
      }
      return HOLENT_SUCCESS;

    case HOLENT_THERMO_BETA_OMEGA:
      if (!isfinite (a) || !isfinite (b))
        return refuse (reason, HOLENT_THERMO_NOT_FINITE, HOLENT_EINVAL);
      if (!(a > 0))
        return refuse (reason, HOLENT_THERMO_BETA, HOLENT_EDOM);
      return to_uv (c, L, R, HOLENT_THERMO_T_OMEGA, 1 / a, b, u, v, w,
                    reason);

    case HOLENT_THERMO_T_LR:
      if (!isfinite (a) || !isfinite (b))
        return refuse (reason, HOLENT_THERMO_NOT_FINITE, HOLENT_EINVAL);
      if (a < 0 || b < 0)
        return refuse (reason, HOLENT_THERMO_TEMPERATURE, HOLENT_EDOM);
      if (a == 0 && b == 0)
        return refuse (reason, HOLENT_THERMO_MASSLESS, HOLENT_EDOM);
      *u = L * a;
      *v = L * b;
      *w = L * (a - b);
      return HOLENT_SUCCESS;

    case HOLENT_THERMO_BETA_LR:
      /* beta = Inf is a sector at zero temperature (extremal) */
      if (isnan (a) || isnan (b))
        return refuse (reason, HOLENT_THERMO_NOT_FINITE, HOLENT_EINVAL);
      if (!(a > 0) || !(b > 0))
        return refuse (reason, HOLENT_THERMO_BETA, HOLENT_EDOM);
      if (isinf (a) && isinf (b))
        return refuse (reason, HOLENT_THERMO_MASSLESS, HOLENT_EDOM);
      *u = L / a;
      *v = L / b;
      /* L (b - a)/(a b), arranged so that an infinite beta is harmless */
      *w = isinf (a) ? -*v : isinf (b) ? *u : L * ((b - a) / a) / b;
      return HOLENT_SUCCESS;

    case HOLENT_THERMO_M_J:
      {
        if (!isfinite (a) || !isfinite (b))
          return refuse (reason, HOLENT_THERMO_NOT_FINITE, HOLENT_EINVAL);
        /* x = M L/(2 pi) = L0 + Lbar0 - c/12 >= |J| = |L0 - Lbar0|;
           the vacuum has x = -c/12 */
        double x = R * a;
        if (x < -c / 12)
          return refuse (reason, HOLENT_THERMO_BELOW_VACUUM, HOLENT_EDOM);
        if (x < 0)
          return refuse (reason, HOLENT_THERMO_CONICAL, HOLENT_EDOM);
        double d = x - fabs (b);
        if (d < 0)
          {
            if (fabs (b) > x * (1 + 4 * DBL_EPSILON))
              return refuse (reason, HOLENT_THERMO_OVERROTATING, HOLENT_EDOM);
            d = 0; /* extremal up to rounding */
          }
        if (x == 0)
          return refuse (reason, HOLENT_THERMO_MASSLESS, HOLENT_EDOM);
        /* (r_+ +- r_-)^2 = 12 (x +- J)/c */
        double up = sqrt (12 * (x + fabs (b)) / c), dn = sqrt (12 * d / c);
        *u = b >= 0 ? up : dn;
        *v = b >= 0 ? dn : up;
        /* u - v = (u^2 - v^2)/(u + v) = (24 J/c)/(u + v) when they are
           close; the plain difference otherwise (exact at extremality) */
        *w = 2 * dn > up ? 24 * b / c / (up + dn) : *u - *v;
        return HOLENT_SUCCESS;
      }

    default:
      return refuse (reason, HOLENT_THERMO_PARAM, HOLENT_EINVAL);
    }
}

int
holent_thermo_state_from (double c, double ell, double L,
                          holent_thermo_pair pair, double a, double b,
                          holent_thermo_state *st, int *reason)
{
  double u, v, w;
  if (reason)
    *reason = HOLENT_THERMO_OK;
  if (st == NULL || isnan (c) || isnan (ell) || isnan (L))
    return refuse (reason, HOLENT_THERMO_PARAM, HOLENT_EINVAL);
  if (!params_ok (c, ell, L))
    return refuse (reason, HOLENT_THERMO_PARAM, HOLENT_EDOM);
  /* R = L/(2 pi), taken as ell itself in the default frame L = 2 pi ell so
     that |J| = M ell is exactly extremal there */
  const double R = L == 2 * M_PI * ell ? ell : L * (1 / (2 * M_PI));
  int status = to_uv (c, L, R, pair, a, b, &u, &v, &w, reason);
  if (status)
    return status;

  const double e = 1 / R; /* energy unit of the circle, 2 pi/L */
  const double sum = u + v;      /* 2 r_+ > 0 */
  const double isum = 1 / sum, iL = 1 / L;
  st->r_plus = sum / 2;
  st->r_minus = w / 2;
  st->M = e * c / 24 * (u * u + v * v);
  st->J = c / 24 * w * sum;
  st->T = 2 * u * v * iL * isum; /* 1/beta, beta = (beta_L + beta_R)/2 */
  st->Omega = w * isum;
  st->Omega_J = e * st->Omega;
  st->T_L = u * iL;
  st->T_R = v * iL;
  st->S = M_PI * c / 6 * sum;
  st->F = -e * c / 12 * u * v;
  st->C_Omega = st->S; /* S is linear in T at fixed Omega */
  {
    /* C_J = (pi c/6) (u + v) u v/(u^2 - u v + v^2), scaled by max(u, v)
       where the squares could overflow */
    double big = u > v ? u : v;
    if (big < 1e150)
      st->C_J = M_PI * c / 6 * sum * u * v / (u * u - u * v + v * v);
    else
      {
        double p = u / big, q = v / big;
        st->C_J = M_PI * c / 6 * sum * p * q / (p * p - p * q + q * q);
      }
  }
  st->horizon_length = M_PI * sum;
  st->L0 = c / 24 * (u * u + 1);
  st->Lbar0 = c / 24 * (v * v + 1);
  st->F_thermal_ads = -e * c / 12;
  /* F < F_thermal_ads  <=>  u v > 1  <=>  beta_L beta_R < L^2 */
  st->btz_dominates = u * v > 1;

  /* Echo the given pair exactly (no round trip).  */
  switch (pair)
    {
    case HOLENT_THERMO_RADII:
      st->r_plus = a;
      st->r_minus = b;
      break;
    case HOLENT_THERMO_T_OMEGA:
      st->T = a;
      st->Omega = b;
      st->Omega_J = e * b;
      break;
    case HOLENT_THERMO_T_LR:
      st->T_L = a;
      st->T_R = b;
      break;
    case HOLENT_THERMO_M_J:
      st->M = a;
      st->J = b;
      break;
    default:
      break;
    }

  const double all[] = { st->r_plus, st->r_minus, st->M, st->J, st->T,
                         st->Omega, st->Omega_J, st->T_L, st->T_R, st->S,
                         st->F, st->C_Omega, st->C_J, st->horizon_length,
                         st->L0, st->Lbar0, st->F_thermal_ads };
  for (size_t k = 0; k < sizeof all / sizeof all[0]; k++)
    if (!isfinite (all[k]))
      return refuse (reason, HOLENT_THERMO_RANGE, HOLENT_EDOM);
  return HOLENT_SUCCESS;
}

#define PUT(col, val)                                                   \
  do {                                                                  \
    if (out->col)                                                       \
      out->col[i] = (val);                                              \
  } while (0)

int
holent_thermo_states (double c, double ell, holent_thermo_pair pair,
                      size_t n, const double *a, const double *b,
                      const double *L, const size_t *step,
                      const holent_thermo_table *out, size_t *bad,
                      int *reason)
{
  if (reason)
    *reason = HOLENT_THERMO_OK;
  if (out == NULL || (n > 0 && (a == NULL || b == NULL)))
    return refuse (reason, HOLENT_THERMO_PARAM, HOLENT_EINVAL);
  const long nn = (long) n;
  const double Ldef = 2 * M_PI * ell;
  const size_t sa = step ? step[0] : 1, sb = step ? step[1] : 1,
               sL = step ? step[2] : 1;
  long nbad = 0;

  /* Refused states are only counted here and located afterwards, so the
     loop has no early exit and parallelises.  */
#pragma omp parallel for schedule(static) reduction(+ : nbad) if (nn > 20000)
  for (long i = 0; i < nn; i++)
    {
      holent_thermo_state st;
      if (holent_thermo_state_from (c, ell, L ? L[i * sL] : Ldef, pair,
                                    a[i * sa], b[i * sb], &st, NULL))
        {
          nbad++;
          continue;
        }
      PUT (r_plus, st.r_plus);
      PUT (r_minus, st.r_minus);
      PUT (M, st.M);
      PUT (J, st.J);
      PUT (T, st.T);
      PUT (Omega, st.Omega);
      PUT (Omega_J, st.Omega_J);
      PUT (T_L, st.T_L);
      PUT (T_R, st.T_R);
      PUT (S, st.S);
      PUT (F, st.F);
      PUT (C_Omega, st.C_Omega);
      PUT (C_J, st.C_J);
      PUT (horizon_length, st.horizon_length);
      PUT (L0, st.L0);
      PUT (Lbar0, st.Lbar0);
      PUT (F_thermal_ads, st.F_thermal_ads);
      PUT (btz_dominates, (unsigned char) st.btz_dominates);
    }

  if (nbad > 0)
    for (size_t i = 0; i < n; i++)
      {
        holent_thermo_state st;
        int status = holent_thermo_state_from (c, ell, L ? L[i * sL] : Ldef,
                                               pair, a[i * sa], b[i * sb],
                                               &st, reason);
        if (status)
          {
            if (bad)
              *bad = i;
            return status;
          }
      }
  return HOLENT_SUCCESS;
}

int
holent_thermo_hawking_page (size_t n, const double *Omega, const double *L,
                            double *T_hp, size_t *bad, int *reason)
{
  if (reason)
    *reason = HOLENT_THERMO_OK;
  if (n > 0 && (Omega == NULL || L == NULL || T_hp == NULL))
    return refuse (reason, HOLENT_THERMO_PARAM, HOLENT_EINVAL);
  for (size_t i = 0; i < n; i++)
    {
      int status = HOLENT_SUCCESS;
      if (isnan (Omega[i]) || isnan (L[i]))
        status = refuse (reason, isnan (L[i]) ? HOLENT_THERMO_PARAM
                                              : HOLENT_THERMO_NOT_FINITE,
                         HOLENT_EINVAL);
      else if (!(isfinite (L[i]) && L[i] > 0))
        status = refuse (reason, HOLENT_THERMO_PARAM, HOLENT_EDOM);
      else if (!(fabs (Omega[i]) < 1))
        status = refuse (reason, HOLENT_THERMO_OMEGA, HOLENT_EDOM);
      if (status)
        {
          if (bad)
            *bad = i;
          return status;
        }
      /* beta^2 (1 - Omega)(1 + Omega) = L^2, factored for |Omega| near 1 */
      T_hp[i] = sqrt ((1 - Omega[i]) * (1 + Omega[i])) / L[i];
    }
  return HOLENT_SUCCESS;
}

int
holent_thermo_hp_compare (double c, double ell, int pair, size_t n,
                          const double *a, const double *b, const double *L,
                          const size_t *step, double *T_hp, double *Omega,
                          double *T, double *F, double *F_thermal_ads,
                          unsigned char *btz_dominates, size_t *bad,
                          int *reason)
{
  if (reason)
    *reason = HOLENT_THERMO_OK;
  if (n > 0 && (b == NULL || (pair >= 0 && a == NULL)))
    return refuse (reason, HOLENT_THERMO_PARAM, HOLENT_EINVAL);
  const size_t sa = step ? step[0] : 1, sb = step ? step[1] : 1,
               sL = step ? step[2] : 1;
  for (size_t i = 0; i < n; i++)
    {
      holent_thermo_state st;
      double Li = L ? L[i * sL] : 2 * M_PI * ell, om = b[i * sb], th = 0;
      int status;
      if (pair == HOLENT_THERMO_BETA_LR)
        {
          status = holent_thermo_state_from (c, ell, Li, HOLENT_THERMO_BETA_LR,
                                             a[i * sa], om, &st, reason);
          om = st.Omega;
        }
      else
        status = holent_thermo_hawking_page (1, &om, &Li, &th, NULL, reason);
      if (status == HOLENT_SUCCESS && pair == HOLENT_THERMO_BETA_LR)
        status = holent_thermo_hawking_page (1, &om, &Li, &th, NULL, reason);
      else if (status == HOLENT_SUCCESS)
        status = holent_thermo_state_from (c, ell, Li,
                                           pair < 0 ? HOLENT_THERMO_T_OMEGA
                                                    : (holent_thermo_pair) pair,
                                           pair < 0 ? th : a[i * sa], om,
                                           &st, reason);
      if (status)
        {
          if (bad)
            *bad = i;
          return status;
        }
      if (T_hp)
        T_hp[i] = th;
      if (Omega)
        Omega[i] = om;
      if (T)
        T[i] = pair < 0 ? th : st.T;
      if (F)
        F[i] = st.F;
      if (F_thermal_ads)
        F_thermal_ads[i] = st.F_thermal_ads;
      if (btz_dominates)
        btz_dominates[i] = (unsigned char) st.btz_dominates;
    }
  return HOLENT_SUCCESS;
}
