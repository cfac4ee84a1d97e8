/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_geo.h: AdS3 backgrounds dual to 2D CFT states and the regulated
 * lengths of boundary-anchored geodesics in them.
 *
 * Units: AdS radius ell = 1 for lengths, which are returned in units of
 * ell; entropies are (c/6) times a length (Brown-Henneaux,
 * c = 3 ell/(2G), and S = Length/(4G)).  The UV cutoff eps is a length in
 * boundary units, the circle has circumference L.  See doc/conventions.md
 * and doc/ads3_geodesics.md for the derivations.  GPL-3.0-or-later.  */
#ifndef HOLENT_GEO_H
#define HOLENT_GEO_H

#include <stddef.h>
#include "holent.h"

typedef enum
{
  HOLENT_BULK_POINCARE = 0,          /* vacuum on a line                 */
  HOLENT_BULK_GLOBAL_ADS = 1,        /* vacuum on a circle               */
  HOLENT_BULK_PLANAR_BTZ = 2,        /* thermal state on a line          */
  HOLENT_BULK_BTZ = 3,               /* thermal state on a circle, BH    */
  HOLENT_BULK_THERMAL_ADS = 4,       /* thermal state on a circle, no BH */
  HOLENT_BULK_ROTATING_BTZ = 5,      /* beta_L != beta_R on a circle     */
  HOLENT_BULK_PLANAR_ROTATING_BTZ = 6, /* beta_L != beta_R on a line     */
  HOLENT_BULK_CONICAL_DEFECT = 7     /* heavy primary on a circle        */
} holent_bulk;

typedef struct
{
  holent_bulk bulk;
  int circle;        /* 1: boundary is a circle of circumference L       */
  double L;          /* circumference (ignored on a line)                */
  double eps;        /* UV cutoff, boundary length units                 */
  double beta_L;     /* left/right inverse temperatures (BTZ family)     */
  double beta_R;
  double alpha;      /* conical defect parameter in (0, 1]               */
  double c;          /* central charge                                   */
  int horizon;       /* 1 when the bulk has a horizon                    */
  double S_BH;       /* horizon entropy (circle), 0 without horizon      */
  double s_density;  /* horizon entropy per unit boundary length         */
  /* Set by init, so the kernels do no repeated work:
     len(l) = pref + wgt * (g(kL l) + g(kR l)), g = log sin or log sinh,
     or pref + 2 log l on the Poincare line.  */
  double pref, kL, kR, wgt;
} holent_geo_bg;

/* Fill *bg after checking every parameter the bulk uses; the others are
 * ignored.  Returns HOLENT_EINVAL on NaN/Inf or an unknown bulk and
 * HOLENT_EDOM on out-of-range values.  */
int holent_geo_bg_init (holent_geo_bg *bg, holent_bulk bulk, double L,
                        double eps, double beta_L, double beta_R,
                        double alpha, double c);

/* Regulated length (units of ell) of the geodesic whose endpoints bound a
 * boundary arc (or, on a line, an interval) of length arc.  On a circle
 * the geodesic is the one homotopic to that arc: arc in (0, L] with a
 * horizon or a defect, in (0, L) in global/thermal AdS.  */
int holent_geo_arc_length (const holent_geo_bg *bg, double arc,
                           double *len);

/* Vectorised form; on failure *bad (if non-NULL) is the first offending
 * index and nothing is promised about len.  */
int holent_geo_arc_lengths (const holent_geo_bg *bg, size_t n,
                            const double *arc, double *len, size_t *bad);

/* Homotopy class selector for two boundary points on a circle.  */
typedef enum
{
  HOLENT_GEO_SHORTER = 0,   /* the shorter of the two geodesics          */
  HOLENT_GEO_POSITIVE = 1,  /* over the arc from x1 to x2, positive sense */
  HOLENT_GEO_NEGATIVE = 2   /* over the other arc                         */
} holent_geo_class;

/* Regulated lengths between boundary points x1[i], x2[i].  On a line the
 * class is ignored.  Coincident points (mod L) give HOLENT_ECOINCIDE.  */
int holent_geo_point_lengths (const holent_geo_bg *bg, size_t n,
                              const double *x1, const double *x2,
                              holent_geo_class cls, double *len,
                              size_t *bad);

/* Why holent_geo_point_lengths fails on the N pairs (X1[i], X2[i]), in
 * E (arg 0: X1, 1: X2; index: the element): values first, over both
 * arrays (NaN: HOLENT_ENAN, Inf: HOLENT_EDOM), then the pairs in order (a
 * difference that overflows: HOLENT_EDOM; coincident points, modulo L on
 * a circle: HOLENT_ECOINCIDE).  HOLENT_SUCCESS (E cleared) when every
 * pair is valid.  Returns E's status.  */
int holent_geo_points_check (const holent_geo_bg *bg, size_t n,
                             const double *x1, const double *x2,
                             holent_err *e);

/* Inline kernels, for hot loops of other core modules.  They assume an
   initialised bg and an arc that holent_geo_arc_length accepts; no
   checks.  */
#include <math.h>
/* C11 alone does not define these (GSL's gsl_math.h did): */
#ifndef M_LN2
#define M_LN2 0.69314718055994530942
#endif
#ifndef M_PI
#define M_PI 3.14159265358979323846
#endif

/* log(sinh(x)) for x > 0 without overflow.  */
static inline double
holent_geo_lnsinh (double x)
{
  /* log sinh x = x - log 2 + log(1 - e^{-2x}); direct form near 0 where
     the rewrite loses digits in log1p's argument.  */
  if (x < 0.5)
    return log (sinh (x));
  if (x > 19.0)  /* exp(-2x) < 4e-17: below double rounding */
    return x - M_LN2;
  return x - M_LN2 + log1p (-exp (-2.0 * x));
}

static inline double
holent_geo_len_poincare_ (const holent_geo_bg *bg, double l)
{
  return bg->pref + 2.0 * log (l);
}

static inline double
holent_geo_len_global_ (const holent_geo_bg *bg, double l)
{
  return bg->pref + 2.0 * log (sin (bg->kL * l));
}

static inline double
holent_geo_len_btz_ (const holent_geo_bg *bg, double l)
{
  if (bg->kL == bg->kR)
    return bg->pref + 2.0 * holent_geo_lnsinh (bg->kL * l);
  return bg->pref + holent_geo_lnsinh (bg->kL * l)
         + holent_geo_lnsinh (bg->kR * l);
}

static inline double
holent_geo_len_defect_ (const holent_geo_bg *bg, double l)
{
  /* Beyond alpha*theta = pi no geodesic on that side of the defect
     exists; the infimum over curves in the class is the path through
     the apex, length 2 log(L/(pi alpha eps)).  */
  double ph = bg->kL * l;
  /* pi/2 written out: no GSL in public headers */
  if (ph >= 1.57079632679489661923 && bg->alpha < 1.0)  /* alpha = 1: no defect, no cap */
    return bg->pref;
  return bg->pref + 2.0 * log (sin (ph));
}

/* Regulated length for a validated arc.  */
static inline double
holent_geo_len_unchecked (const holent_geo_bg *bg, double arc)
{
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
      return holent_geo_len_poincare_ (bg, arc);
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
      return holent_geo_len_global_ (bg, arc);
    case HOLENT_BULK_CONICAL_DEFECT:
      return holent_geo_len_defect_ (bg, arc);
    default:
      return holent_geo_len_btz_ (bg, arc);
    }
}


#endif /* HOLENT_GEO_H */
