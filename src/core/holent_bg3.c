/* holent_bg3.c: the AdS3 background object (holent_bg3.h).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stddef.h>
#include <string.h>
#include "holent_bg3.h"
#include "holent_thermo.h"

#ifndef M_PI
#define M_PI 3.14159265358979323846
#endif

static const char *const param_names[HOLENT_BG3_NPARAM] = {
  "c", "G", "ell", "cutoff", "circumference", "beta", "T", "beta_L",
  "beta_R", "Omega", "alpha", "h", "saddle", "shock_alpha", "shock_energy",
  "shock_time"
};

static const char *const state_names[HOLENT_BG3_NSTATE] = {
  "vacuum", "thermal", "rotating", "heavy", "tfd", "quench"
};

static const char *const saddle_names[] = {
  "", "dominant", "btz", "thermal_ads"
};

/* In the order of holent_bulk.  */
static const char *const bulk_names[] = {
  "poincare", "global_ads", "planar_btz", "btz", "thermal_ads",
  "rotating_btz", "planar_rotating_btz", "conical_defect"
};
#define NBULK (sizeof bulk_names / sizeof bulk_names[0])

#define BIT(p) (1u << (p))
#define COMMON (BIT (HOLENT_BG3_C) | BIT (HOLENT_BG3_G) | BIT (HOLENT_BG3_ELL) \
                | BIT (HOLENT_BG3_CUTOFF) | BIT (HOLENT_BG3_CIRCUMFERENCE))
#define TEMP (BIT (HOLENT_BG3_BETA) | BIT (HOLENT_BG3_T))

/* Options each state takes besides the common ones.  */
static const unsigned allowed[HOLENT_BG3_NSTATE] = {
  0,
  TEMP | BIT (HOLENT_BG3_SADDLE),
  TEMP | BIT (HOLENT_BG3_BETA_L) | BIT (HOLENT_BG3_BETA_R)
  | BIT (HOLENT_BG3_OMEGA) | BIT (HOLENT_BG3_SADDLE),
  BIT (HOLENT_BG3_ALPHA) | BIT (HOLENT_BG3_H),
  TEMP | BIT (HOLENT_BG3_SHOCK_ALPHA) | BIT (HOLENT_BG3_SHOCK_ENERGY)
  | BIT (HOLENT_BG3_SHOCK_TIME),
  TEMP
};

const char *
holent_bg3_param_name (int p)
{
  return p >= 0 && p < HOLENT_BG3_NPARAM ? param_names[p] : NULL;
}

const char *
holent_bg3_state_name (int s)
{
  return s >= 0 && s < HOLENT_BG3_NSTATE ? state_names[s] : NULL;
}

const char *
holent_bg3_saddle_name (int s)
{
  return s >= 0 && s <= HOLENT_BG3_SADDLE_THERMAL_ADS ? saddle_names[s]
                                                      : NULL;
}

const char *
holent_bg3_bulk_name (int b)
{
  return b >= 0 && (size_t) b < NBULK ? bulk_names[b] : NULL;
}

int
holent_bg3_bulk_from_name (const char *name)
{
  for (size_t k = 0; name != NULL && k < NBULK; k++)
    if (strcmp (name, bulk_names[k]) == 0)
      return (int) k;
  return -1;
}

static int
has (const holent_bg3_spec *s, int p)
{
  return (s->given & BIT (p)) != 0;
}

/* Parameter P as a finite number in the range KIND: 'p' positive,
   'u' (0, 1], 'o' (-1, 1), 'w' [0, hi).  */
static int
number (const holent_bg3_spec *s, int p, char kind, double hi, double *x,
        holent_err *err)
{
  double v = s->value[p];
  const char *nm = param_names[p];
  if (isnan (v))
    return holent_err_set (err, HOLENT_ENAN, p, HOLENT_NOINDEX,
                           "%s must not be NaN", nm);
  if (isinf (v))
    return holent_err_set (err, HOLENT_EDOM, p, HOLENT_NOINDEX,
                           "%s must be finite", nm);
  switch (kind)
    {
    case 'p':
      if (!(v > 0))
        return holent_err_set (err, HOLENT_EDOM, p, HOLENT_NOINDEX,
                               "%s must be positive, got %g", nm, v);
      break;
    case 'u':
      if (!(v > 0 && v <= 1))
        return holent_err_set (err, HOLENT_EDOM, p, HOLENT_NOINDEX,
                               "%s must lie in (0, 1], got %g", nm, v);
      break;
    case 'o':
      if (!(v > -1 && v < 1))
        return holent_err_set (err, HOLENT_EDOM, p, HOLENT_NOINDEX,
                               "%s must lie in (-1, 1), got %g", nm, v);
      break;
    default:
      if (!(v >= 0 && v < hi))
        return holent_err_set (err, HOLENT_EDOM, p, HOLENT_NOINDEX,
                               "%s must lie in [0, %g), got %g", nm, hi, v);
      break;
    }
  *x = v;
  return HOLENT_SUCCESS;
}

int
holent_bg3_units (const holent_bg3_spec *s, double *c, double *G,
                  double *ell, holent_err *err)
{
  int st;
  double l = 1, g, cc;
  if (has (s, HOLENT_BG3_ELL)
      && (st = number (s, HOLENT_BG3_ELL, 'p', 0, &l, err)))
    return st;
  if (has (s, HOLENT_BG3_G))
    {
      if ((st = number (s, HOLENT_BG3_G, 'p', 0, &g, err)))
        return st;
      cc = 3 * l / (2 * g);
      if (has (s, HOLENT_BG3_C))
        {
          double given;
          if ((st = number (s, HOLENT_BG3_C, 'p', 0, &given, err)))
            return st;
          if (!(fabs (given - cc) <= 1e-12 * cc))
            return holent_err_set (err, HOLENT_EINCONSISTENT, HOLENT_BG3_C,
                                   HOLENT_NOINDEX,
                                   "c = %g disagrees with 3 ell/(2G) = %g "
                                   "(Brown-Henneaux)", given, cc);
          cc = given;  /* the user's own number, not a rounded copy */
        }
    }
  else
    {
      cc = 1;
      if (has (s, HOLENT_BG3_C)
          && (st = number (s, HOLENT_BG3_C, 'p', 0, &cc, err)))
        return st;
      g = 3 * l / (2 * cc);
    }
  if (!(isfinite (cc) && cc > 0 && isfinite (g) && g > 0))
    return holent_err_set (err, HOLENT_ERANGE, -1, HOLENT_NOINDEX,
                           "c = 3 ell/(2G) is out of double precision range");
  *c = cc;
  *G = g;
  *ell = l;
  return HOLENT_SUCCESS;
}

/* Inverse temperatures of the thermal and rotating states (and of the
   time-dependent ones, as thermal).  */
static int
temperatures (const holent_bg3_spec *s, int rotating, double *bl,
              double *br, holent_err *err)
{
  int st, hb = has (s, HOLENT_BG3_BETA), hT = has (s, HOLENT_BG3_T);
  int hL = has (s, HOLENT_BG3_BETA_L), hR = has (s, HOLENT_BG3_BETA_R);
  double beta = 0, x;
  if (hb && hT)
    return holent_err_set (err, HOLENT_EOPTION, HOLENT_BG3_T, HOLENT_NOINDEX,
                           "give either 'beta' or 'T', not both");
  if (hb && (st = number (s, HOLENT_BG3_BETA, 'p', 0, &beta, err)))
    return st;
  if (hT)
    {
      if ((st = number (s, HOLENT_BG3_T, 'p', 0, &x, err)))
        return st;
      beta = 1 / x;
      if (!isfinite (beta))
        return holent_err_set (err, HOLENT_ERANGE, HOLENT_BG3_T,
                               HOLENT_NOINDEX, "T = %g: 1/T overflows "
                               "double precision", x);
    }
  if (!rotating)
    {
      if (!(hb || hT))
        return holent_err_set (err, HOLENT_EOPTION, -1, HOLENT_NOINDEX,
                               "the %s state needs 'beta' or 'T'",
                               state_names[s->state]);
      *bl = *br = beta;
      return HOLENT_SUCCESS;
    }
  if (hL || hR)
    {
      if (!(hL && hR))
        return holent_err_set (err, HOLENT_EOPTION, hL ? HOLENT_BG3_BETA_R
                                                       : HOLENT_BG3_BETA_L,
                               HOLENT_NOINDEX,
                               "give both 'beta_L' and 'beta_R'");
      if (hb || hT || has (s, HOLENT_BG3_OMEGA))
        return holent_err_set (err, HOLENT_EOPTION, HOLENT_BG3_BETA_L,
                               HOLENT_NOINDEX,
                               "give 'beta_L' with 'beta_R', or 'beta' with "
                               "'Omega', not both");
      if ((st = number (s, HOLENT_BG3_BETA_L, 'p', 0, bl, err))
          || (st = number (s, HOLENT_BG3_BETA_R, 'p', 0, br, err)))
        return st;
      return HOLENT_SUCCESS;
    }
  if (!(hb || hT) || !has (s, HOLENT_BG3_OMEGA))
    return holent_err_set (err, HOLENT_EOPTION, -1, HOLENT_NOINDEX,
                           "the rotating state needs 'beta_L' and 'beta_R', "
                           "or 'beta' (or 'T') and 'Omega'");
  if ((st = number (s, HOLENT_BG3_OMEGA, 'o', 0, &x, err)))
    return st;
  /* beta_L = beta (1 - Omega), beta_R = beta (1 + Omega) */
  *bl = beta * (1 - x);
  *br = beta * (1 + x);
  if (!(*bl > 0 && *br > 0 && isfinite (*bl) && isfinite (*br)))
    return holent_err_set (err, HOLENT_ERANGE, HOLENT_BG3_OMEGA,
                           HOLENT_NOINDEX, "beta (1 -+ Omega) is out of "
                           "double precision range");
  return HOLENT_SUCCESS;
}

/* The thermal and rotating states: temperatures, saddle, horizon.  */
static int
thermal (holent_bg3 *bg, const holent_bg3_spec *s, holent_err *err)
{
  int st, rot = s->state == HOLENT_BG3_ROTATING;
  double bl, br;
  if ((st = temperatures (s, rot, &bl, &br, err)))
    return st;
  bg->beta_L = bl;
  bg->beta_R = br;
  bg->beta = (bl + br) / 2;
  bg->T = 1 / bg->beta;
  bg->T_L = 1 / bl;
  bg->T_R = 1 / br;
  bg->Omega = (br - bl) / (br + bl);
  bg->pure = 0;
  bg->scale = fmin (bg->L, fmin (bl, br));
  if (s->state == HOLENT_BG3_TFD || s->state == HOLENT_BG3_QUENCH)
    return HOLENT_SUCCESS;  /* the time-dependent states fill the rest */

  holent_thermo_state th;
  int need_th = 0;
  bg->saddle = HOLENT_BG3_SADDLE_BTZ;
  if (bg->circle)
    {
      bg->saddle = has (s, HOLENT_BG3_SADDLE)
                   ? (holent_bg3_saddle) (int) s->value[HOLENT_BG3_SADDLE]
                   : HOLENT_BG3_SADDLE_DOMINANT;
      if (bg->saddle < HOLENT_BG3_SADDLE_DOMINANT
          || bg->saddle > HOLENT_BG3_SADDLE_THERMAL_ADS)
        return holent_err_set (err, HOLENT_EOPTION, HOLENT_BG3_SADDLE,
                               HOLENT_NOINDEX, "saddle must be dominant, btz "
                               "or thermal_ads");
      need_th = bg->saddle != HOLENT_BG3_SADDLE_THERMAL_ADS;
    }
  if (need_th)
    {
      /* Hawking-Page, M and J: the BTZ state of these temperatures */
      if (holent_thermo_state_from (bg->c, bg->ell, bg->L,
                                    HOLENT_THERMO_BETA_LR, bl, br, &th,
                                    NULL))
        return holent_err_set (err, HOLENT_ERANGE, -1, HOLENT_NOINDEX,
                               "the BTZ state (beta_L = %g, beta_R = %g) "
                               "overflows double precision", bl, br);
      if (bg->saddle == HOLENT_BG3_SADDLE_DOMINANT)
        bg->saddle = th.btz_dominates ? HOLENT_BG3_SADDLE_BTZ
                                      : HOLENT_BG3_SADDLE_THERMAL_ADS;
    }
  if (bg->saddle == HOLENT_BG3_SADDLE_THERMAL_ADS)
    {
      bg->bulk = HOLENT_BULK_THERMAL_ADS;
      bg->M = -M_PI * bg->c / (6 * bg->L);  /* the Casimir energy */
      return HOLENT_SUCCESS;
    }
  bg->bulk = bg->circle ? (rot ? HOLENT_BULK_ROTATING_BTZ : HOLENT_BULK_BTZ)
                        : (rot ? HOLENT_BULK_PLANAR_ROTATING_BTZ
                               : HOLENT_BULK_PLANAR_BTZ);
  bg->horizon = 1;
  if (bg->circle)
    {
      bg->r_plus = th.r_plus;
      bg->r_minus = th.r_minus;
      bg->M = th.M;
      bg->J = th.J;
      bg->L0 = th.L0;
      bg->Lbar0 = th.Lbar0;
    }
  else
    {
      /* radii of the circle 2 pi; energy and spin are extensive */
      bg->r_plus = M_PI * (1 / bl + 1 / br);
      bg->r_minus = M_PI * (1 / bl - 1 / br);
      bg->M = bg->L0 = bg->Lbar0 = INFINITY;
      bg->J = bg->Omega == 0 ? 0.0 : copysign (INFINITY, bg->Omega);
    }
  return HOLENT_SUCCESS;
}

static int
heavy (holent_bg3 *bg, const holent_bg3_spec *s, holent_err *err)
{
  int st;
  double a, h;
  if (!bg->circle)
    return holent_err_set (err, HOLENT_EBOUNDARY, -1, HOLENT_NOINDEX,
                           "the heavy state (conical defect) lives on a "
                           "circle, not a line");
  if (has (s, HOLENT_BG3_ALPHA) && has (s, HOLENT_BG3_H))
    return holent_err_set (err, HOLENT_EOPTION, HOLENT_BG3_H, HOLENT_NOINDEX,
                           "give either 'alpha' or 'h', not both");
  if (has (s, HOLENT_BG3_ALPHA))
    {
      if ((st = number (s, HOLENT_BG3_ALPHA, 'u', 0, &a, err)))
        return st;
    }
  else if (has (s, HOLENT_BG3_H))
    {
      /* below the black-hole threshold c/24 */
      if ((st = number (s, HOLENT_BG3_H, 'w', bg->c / 24, &h, err)))
        return st;
      a = sqrt (1 - 24 * h / bg->c);
    }
  else
    return holent_err_set (err, HOLENT_EOPTION, -1, HOLENT_NOINDEX,
                           "the heavy state needs 'alpha' or 'h'");
  bg->alpha = a;
  bg->h = bg->c / 24 * (1 - a * a);  /* h = hbar = (c/24)(1 - alpha^2) */
  bg->L0 = bg->Lbar0 = bg->h;
  bg->bulk = HOLENT_BULK_CONICAL_DEFECT;
  return HOLENT_SUCCESS;
}

int
holent_bg3_init (holent_bg3 *bg, const holent_bg3_spec *s, holent_err *err)
{
  int st;
  holent_err_clear (err);
  if (bg == NULL || s == NULL || (int) s->state < 0
      || s->state >= HOLENT_BG3_NSTATE)
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX,
                           "no such state");
  /* Options that do not belong to the state.  */
  unsigned extra = s->given & ~(COMMON | allowed[s->state]);
  for (int p = 0; extra != 0 && p < HOLENT_BG3_NPARAM; p++)
    if (extra & BIT (p))
      return holent_err_set (err, HOLENT_EOPTION, p, HOLENT_NOINDEX,
                             "option '%s' does not apply to the %s state",
                             param_names[p], state_names[s->state]);
  if (!s->circle && has (s, HOLENT_BG3_CIRCUMFERENCE))
    return holent_err_set (err, HOLENT_EOPTION, HOLENT_BG3_CIRCUMFERENCE,
                           HOLENT_NOINDEX,
                           "option 'circumference' applies to a circle only");
  if (!s->circle && has (s, HOLENT_BG3_SADDLE))
    return holent_err_set (err, HOLENT_EOPTION, HOLENT_BG3_SADDLE,
                           HOLENT_NOINDEX,
                           "option 'saddle' applies to a circle only");

  *bg = (holent_bg3) { 0 };
  bg->state = s->state;
  bg->circle = s->circle != 0;
  bg->has_bulk = 1;
  bg->beta = bg->beta_L = bg->beta_R = INFINITY;
  bg->alpha = 1;
  bg->pure = 1;
  bg->saddle = HOLENT_BG3_SADDLE_NONE;
  if ((st = holent_bg3_units (s, &bg->c, &bg->G, &bg->ell, err)))
    return st;
  bg->cutoff = 1e-6;
  if (has (s, HOLENT_BG3_CUTOFF)
      && (st = number (s, HOLENT_BG3_CUTOFF, 'p', 0, &bg->cutoff, err)))
    return st;
  bg->L = INFINITY;
  if (bg->circle)
    {
      bg->L = 2 * M_PI;
      if (has (s, HOLENT_BG3_CIRCUMFERENCE)
          && (st = number (s, HOLENT_BG3_CIRCUMFERENCE, 'p', 0, &bg->L, err)))
        return st;
    }
  bg->scale = bg->L;

  switch (s->state)
    {
    case HOLENT_BG3_VACUUM:
      bg->bulk = bg->circle ? HOLENT_BULK_GLOBAL_ADS : HOLENT_BULK_POINCARE;
      if (bg->circle)
        bg->M = -M_PI * bg->c / (6 * bg->L);  /* Casimir: -1/(8G) at 2 pi ell */
      break;
    case HOLENT_BG3_HEAVY:
      st = heavy (bg, s, err);
      break;
    case HOLENT_BG3_TFD:
    case HOLENT_BG3_QUENCH:
      bg->has_bulk = 0;
      st = thermal (bg, s, err);
      bg->Omega = 0;
      bg->pure = 1;
      break;
    default:
      st = thermal (bg, s, err);
      break;
    }
  if (st)
    return st;
  if (bg->circle)
    {
      /* M = (2 pi/L)(L0 + Lbar0 - c/12) away from BTZ (thermo has it) */
      if (bg->bulk == HOLENT_BULK_CONICAL_DEFECT)
        bg->M = (2 * M_PI / bg->L) * (bg->L0 + bg->Lbar0 - bg->c / 12);
    }
  bg->cutoff_large = bg->cutoff > 1e-2 * bg->scale;

  if (!bg->has_bulk)
    return HOLENT_SUCCESS;
  /* The kernels' background: horizon entropy, and the guard against
     derived constants that overflow or lose their digits.  */
  st = holent_geo_bg_init (&bg->geo, bg->bulk, bg->L, bg->cutoff,
                           bg->beta_L, bg->beta_R, bg->alpha, bg->c);
  if (st == HOLENT_SUCCESS)
    {
      bg->S_BH = bg->geo.S_BH;
      bg->s_density = bg->geo.s_density;
      if (bg->horizon && !(bg->S_BH > 0))
        st = HOLENT_EDOM;
    }
  if (st)
    {
      if (bg->horizon && !(isfinite (bg->geo.s_density)
                           && (!bg->circle || isfinite (bg->geo.S_BH))))
        return holent_err_set (err, HOLENT_EDOM, -1, HOLENT_NOINDEX,
                               "the horizon entropy is out of double "
                               "precision range");
      return holent_err_set (err, HOLENT_EDOM, HOLENT_BG3_CUTOFF,
                             HOLENT_NOINDEX,
                             "cutoff %g against the scales of the state "
                             "(circumference %g, beta_L %g, beta_R %g): "
                             "the geometry's constants are out of double "
                             "precision range", bg->cutoff, bg->L,
                             bg->beta_L, bg->beta_R);
    }
  return HOLENT_SUCCESS;
}
