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

/* log(sinh(x)) for x > 0 without overflow.  */
double holent_geo_lnsinh (double x);

#endif /* HOLENT_GEO_H */
