/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_thermo.c: BTZ thermodynamics, CFT data and Hawking-Page.
 * Derivations: doc/btz_thermodynamics.md.  GPL-3.0-or-later.  */
#include <float.h>
#include <math.h>
#include <string.h>
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

/* The state from (u, v, w) on a circle of circumference L (R = L/(2 pi)
 * or ell), every field but the echo of the given pair.  Straight-line
 * code (one select, no branch): the loop of holent_thermo_states
 * vectorises it, and one state gets the very same numbers.  */
static inline void
derive (double c, double L, double R, double u, double v, double w,
        holent_thermo_state *st)
{
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
       where the squares could overflow (x/1 = x exactly: no scaling
       below) */
    double big = u > v ? u : v;
    double dv = big < 1e150 ? 1.0 : big;
    double p = u / dv, q = v / dv;
    st->C_J = M_PI * c / 6 * sum * p * q / (p * p - p * q + q * q);
  }
  st->horizon_length = M_PI * sum;
  st->L0 = c / 24 * (u * u + 1);
  st->Lbar0 = c / 24 * (v * v + 1);
  st->F_thermal_ads = -e * c / 12;
  /* F < F_thermal_ads  <=>  u v > 1  <=>  beta_L beta_R < L^2 */
  st->btz_dominates = u * v > 1;
}

/* Echo the given pair exactly (no round trip); e = 1/R.  Selects on the
   loop-invariant pair, so the block loop stays straight.  */
static inline void
echo (holent_thermo_pair pair, double a, double b, double e,
      holent_thermo_state *st)
{
  const int radii = pair == HOLENT_THERMO_RADII;
  const int tom = pair == HOLENT_THERMO_T_OMEGA;
  const int tlr = pair == HOLENT_THERMO_T_LR;
  const int mj = pair == HOLENT_THERMO_M_J;
  st->r_plus = radii ? a : st->r_plus;
  st->r_minus = radii ? b : st->r_minus;
  st->T = tom ? a : st->T;
  st->Omega = tom ? b : st->Omega;
  st->Omega_J = tom ? e * b : st->Omega_J;
  st->T_L = tlr ? a : st->T_L;
  st->T_R = tlr ? b : st->T_R;
  st->M = mj ? a : st->M;
  st->J = mj ? b : st->J;
}

/* 0 for a state whose every field is finite, NaN otherwise (0 x = 0
   exactly for finite x): a test without a branch.  */
static inline double
nonfinite (const holent_thermo_state *st)
{
  return 0 * st->r_plus + 0 * st->r_minus + 0 * st->M + 0 * st->J
         + 0 * st->T + 0 * st->Omega + 0 * st->Omega_J + 0 * st->T_L
         + 0 * st->T_R + 0 * st->S + 0 * st->F + 0 * st->C_Omega
         + 0 * st->C_J + 0 * st->horizon_length + 0 * st->L0
         + 0 * st->Lbar0 + 0 * st->F_thermal_ads;
}

/* R = L/(2 pi), taken as ell itself in the default frame L = 2 pi ell so
   that |J| = M ell is exactly extremal there.  */
static inline double
radius_of (double ell, double L)
{
  return L == 2 * M_PI * ell ? ell : L * (1 / (2 * M_PI));
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
  const double R = radius_of (ell, L);
  int status = to_uv (c, L, R, pair, a, b, &u, &v, &w, reason);
  if (status)
    return status;
  derive (c, L, R, u, v, w, st);
  echo (pair, a, b, 1 / R, st);
  if (!(nonfinite (st) == 0))
    return refuse (reason, HOLENT_THERMO_RANGE, HOLENT_EDOM);
  return HOLENT_SUCCESS;
}

#define TH_BLOCK 256

/* Columns of a block of states (structure of arrays).  */
typedef struct
{
  double r_plus[TH_BLOCK], r_minus[TH_BLOCK], M[TH_BLOCK], J[TH_BLOCK],
      T[TH_BLOCK], Omega[TH_BLOCK], Omega_J[TH_BLOCK], T_L[TH_BLOCK],
      T_R[TH_BLOCK], S[TH_BLOCK], F[TH_BLOCK], C_J[TH_BLOCK],
      horizon_length[TH_BLOCK], L0[TH_BLOCK], Lbar0[TH_BLOCK],
      F_thermal_ads[TH_BLOCK], dom[TH_BLOCK], u[TH_BLOCK], v[TH_BLOCK], w[TH_BLOCK],
      L[TH_BLOCK];
} th_block;

#define TH_PUT(col)                                                     \
  do {                                                                  \
    if (out->col)                                                       \
      memcpy (out->col + i0, B->col, m * sizeof (double));              \
  } while (0)

/* m <= TH_BLOCK states from a[i sa], b[i sb], L[i sL] into the rows from
   i0 of out; returns the number refused (their rows hold no promise).  */
static long
states_block (double c, double ell, holent_thermo_pair pair, size_t m,
              const double *a, size_t sa, const double *b, size_t sb,
              const double *L, size_t sL, const holent_thermo_table *out,
              size_t i0)
{
  th_block blk, *B = &blk;
  long nbad = 0;
  for (size_t i = 0; i < m; i++)
    {
      const double Li = L[i * sL];
      double u = 1, v = 1, w = 0;  /* a harmless stand-in when refused */
      int st = !params_ok (c, ell, Li)
               || to_uv (c, Li, radius_of (ell, Li), pair, a[i * sa],
                         b[i * sb], &u, &v, &w, NULL);
      nbad += st;
      B->u[i] = st ? 1 : u;
      B->v[i] = st ? 1 : v;
      B->w[i] = st ? 0 : w;
      B->L[i] = st ? 1 : Li;
    }
  double nf = 0;
#pragma omp simd reduction(+ : nf)
  for (size_t i = 0; i < m; i++)
    {
      holent_thermo_state s;
      const double Li = B->L[i], R = radius_of (ell, Li);
      derive (c, Li, R, B->u[i], B->v[i], B->w[i], &s);
      echo (pair, a[i * sa], b[i * sb], 1 / R, &s);
      nf += nonfinite (&s);
      B->r_plus[i] = s.r_plus;
      B->r_minus[i] = s.r_minus;
      B->M[i] = s.M;
      B->J[i] = s.J;
      B->T[i] = s.T;
      B->Omega[i] = s.Omega;
      B->Omega_J[i] = s.Omega_J;
      B->T_L[i] = s.T_L;
      B->T_R[i] = s.T_R;
      B->S[i] = s.S;
      B->F[i] = s.F;
      B->C_J[i] = s.C_J;
      B->horizon_length[i] = s.horizon_length;
      B->L0[i] = s.L0;
      B->Lbar0[i] = s.Lbar0;
      B->F_thermal_ads[i] = s.F_thermal_ads;
      B->dom[i] = s.btz_dominates;
    }
  if (!(nf == 0))
    nbad++;
  TH_PUT (r_plus);
  TH_PUT (r_minus);
  TH_PUT (M);
  TH_PUT (J);
  TH_PUT (T);
  TH_PUT (Omega);
  TH_PUT (Omega_J);
  TH_PUT (T_L);
  TH_PUT (T_R);
  TH_PUT (S);
  TH_PUT (F);
  if (out->C_Omega)
    memcpy (out->C_Omega + i0, B->S, m * sizeof (double));
  TH_PUT (C_J);
  TH_PUT (horizon_length);
  TH_PUT (L0);
  TH_PUT (Lbar0);
  TH_PUT (F_thermal_ads);
  if (out->btz_dominates)
    for (size_t i = 0; i < m; i++)
      out->btz_dominates[i0 + i] = (unsigned char) B->dom[i];
  return nbad;
}

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

  /* Blocks of TH_BLOCK states: the pair to (u, v, w) one by one (refused
     states are only counted here and located afterwards, so the loop has
     no early exit and parallelises), then every field of the block in
     one straight loop, then the columns that were asked for.  */
  const long nblk = (long) ((n + TH_BLOCK - 1) / TH_BLOCK);
#pragma omp parallel for schedule(static) reduction(+ : nbad) if (nn > 20000)
  for (long k = 0; k < nblk; k++)
    {
      size_t i0 = (size_t) k * TH_BLOCK;
      size_t m = n - i0 < TH_BLOCK ? n - i0 : TH_BLOCK;
      nbad += states_block (c, ell, pair, m, a + i0 * sa, sa, b + i0 * sb,
                            sb, L ? L + i0 * sL : &Ldef, L ? sL : 0, out,
                            i0);
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
