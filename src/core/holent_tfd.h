/* holent_tfd.h: the thermofield double (eternal two-sided BTZ), its
 * geodesics through the Einstein-Rosen bridge, the Shenker-Stanford shock
 * wave, and the exact minimisation over two-sided regions.
 * Derivations: doc/tfd_shock.md.
 *
 * Conventions: both sides' boundary times run forward (the state evolves
 * with H_L + H_R, Hartman and Maldacena 2013, JHEP 05 (2013) 014); the
 * side coordinates x are the same Killing coordinate on both sides.  The
 * shock is the limit of a null shell sent in from the LEFT boundary long
 * ago, a shift alpha >= 0 of the Kruskal coordinate across the horizon
 * u = 0 (Shenker and Stanford 2014, JHEP 03 (2014) 067).
 *
 * The two-sided length (beta = inverse temperature, T = tL + tR,
 * dx = xR - xL, reduced to [-L/2, L/2] on a circle: the shortest winding):
 *   len = 2 log( (beta/(pi eps)) [ sqrt(cosh(pi(T + dx)/beta)
 *               cosh(pi(T - dx)/beta)) + (alpha/2) e^{pi (tL - tR)/beta} ] ).
 *
 * Copyright (C) 2026 The holent developers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_TFD_H
#define HOLENT_TFD_H

#include <stddef.h>
#include "holent.h"
#include "holent_geo.h"
#include "holent_region.h"
#include "holent_rt.h"

typedef struct
{
  holent_geo_bg side;  /* one exterior: planar BTZ (line) or BTZ (circle) */
  double beta;         /* inverse temperature                             */
  double alpha;        /* shock shift, 0 without a shock                  */
} holent_tfd_bg;

/* Fill *b: circle (1) of circumference L or line (0), cutoff eps, inverse
   temperature beta, central charge c, shock shift alpha >= 0.
   HOLENT_EINVAL for NaN, HOLENT_EDOM for values out of range.  */
int holent_tfd_init (holent_tfd_bg *b, int circle, double L, double eps,
                     double beta, double c, double alpha);

/* Everything a thermofield-double background states beside its
   parameters: one exterior (BTZ on a circle, planar BTZ on a line) and
   the shock.  */
typedef struct
{
  double S_BH;             /* horizon entropy of one side (Inf on a line) */
  double entropy_density;  /* pi c/(3 beta)                               */
  double r_plus;           /* horizon radius, units of ell                */
  double M;                /* energy of one side (Inf on a line)          */
  double shock_alpha;      /* the shift                                   */
  double shock_energy;     /* E (0 without)                               */
  double shock_time;       /* tw (NaN unless given with E)                */
  double shock_M;          /* M of the shift formula (holent_tfd_shock_alpha) */
} holent_tfd_info;

/* Arguments of holent_tfd_make, as they are named in err->arg.  */
enum
{
  HOLENT_TFD_ARG_L = 0, HOLENT_TFD_ARG_EPS, HOLENT_TFD_ARG_BETA,
  HOLENT_TFD_ARG_C, HOLENT_TFD_ARG_ELL, HOLENT_TFD_ARG_ALPHA, HOLENT_TFD_ARG_ENERGY,
  HOLENT_TFD_ARG_TIME, HOLENT_TFD_NARGS
};

/* The constructor of a thermofield double: checks every parameter (err
 * names the argument and what was expected) and fills *b and *info.  The
 * shock is given by its shift (has_alpha) or by an energy E released at
 * left time -tw (has_energy and has_time together), or not at all
 * (HOLENT_EOPTION for a mixture).  Thermodynamics of the exterior come
 * from holent_thermo on a circle.  */
int holent_tfd_make (holent_tfd_bg *b, holent_tfd_info *info, int circle,
                     double L, double eps, double beta, double c,
                     double ell, int has_alpha, double alpha, int has_energy, double E,
                     int has_time, double tw, holent_err *err);

/* Shock shift alpha = (E/(4M)) exp(2 pi tw/beta) of a shell of energy E
 * (>= 0) sent in at left time -tw, with M the energy of the black hole
 * above the massless BTZ, M = pi c L/(6 beta^2) on a circle; on a line E
 * is an energy density and M = pi c/(6 beta^2) the thermal one.  *M (if
 * not NULL) receives M.  HOLENT_EDOM for E < 0, a non-finite tw, or an
 * alpha that overflows.  */
int holent_tfd_shock_alpha (int circle, double L, double beta, double c,
                            double E, double tw, double *alpha, double *M);

/* The shock time tw that gives a shift alpha for energy E (inverse of the
   above); HOLENT_EDOM unless alpha > 0 and E > 0.  */
int holent_tfd_shock_time (int circle, double L, double beta, double c,
                           double E, double alpha, double *tw);

/* Length of the geodesic through the bridge between the left point
   (xL, tL) and the right point (xR, tR); on a circle the shortest
   winding.  */
int holent_tfd_cross_length (const holent_tfd_bg *b, double xL, double tL,
                             double xR, double tR, double *len);

/* The same geodesic in the winding class dx = xR - xL + winding L (on
   the circle every class is a geodesic of its own, the covering space
   being the planar two-sided BTZ; doc/tfd_shock.md).  HOLENT_EDOM for a
   nonzero winding on the line.  */
int holent_tfd_cross_length_winding (const holent_tfd_bg *b, double xL,
                                     double tL, double xR, double tR,
                                     long winding, double *len);

/* The point where the bridge geodesic from the left point (xL, tL) to the
 * right point (xR, tR) crosses the shock u = 0 (doc/tfd_shock.md,
 * section 2): the Kruskal coordinate *v on the right side of the shock
 * (the same point is v + alpha on the left side) and the boundary
 * coordinate *x, the stationary point of the length (a maximum in v, a
 * minimum in x).  xL and xR are taken as given (on a circle: the lifted
 * separation of the winding class); alpha = 0 gives the point where the
 * unshocked geodesic meets the horizon u = 0.  HOLENT_ERANGE when v
 * overflows (times beyond about 100 beta).  */
int holent_tfd_shock_crossing (const holent_tfd_bg *b, double xL, double tL,
                               double xR, double tR, double *x, double *v);

/* Length between two points of one side (side 0 left, 1 right): the
   covariant BTZ length (holent_hrt_length, class cls), untouched by the
   shock.  Left times run forward, which leaves the length unchanged.  */
int holent_tfd_side_length (const holent_tfd_bg *b, double x1, double t1,
                            double x2, double t2, holent_geo_class cls,
                            double *len);

typedef struct holent_tfd_workspace holent_tfd_workspace;

/* Workspace for two-sided regions of up to nmax intervals in all.  */
holent_tfd_workspace *holent_tfd_workspace_alloc (size_t nmax);
void holent_tfd_workspace_free (holent_tfd_workspace *w);
/* Long minimisations poll (Ctrl-C): see holent_rt_set_poll.  */
int holent_tfd_workspace_set_poll (holent_tfd_workspace *w,
                                   const holent_poll *poll);

/* A side of a two-sided region: n intervals [a, b] with times ta, tb
   (n = 0: nothing on that side).  */
typedef struct
{
  size_t n;
  const double *a, *b, *ta, *tb;
} holent_tfd_side;

/* Entropy of A_L u A_R at the times given, shifted by dt on both sides:
 * the exact minimum over every candidate (doc/tfd_shock.md, section 3).
 * On the line: the non-crossing pairings of the endpoints in the
 * boundary order of the bridge slice (right side ascending, then left
 * side descending), each pair joined within a side or through the
 * bridge (the horizon is not compact).  On a circle the slice is an
 * annulus: either no geodesic crosses the bridge (each side's one-sided
 * candidates, both homotopy classes, the horizon as the Z2 homology of
 * the annulus asks), or an even number do; cutting along one of them
 * (every left-right pair of endpoints of the same kind, its winding the
 * shortest one: an optimum always has such a bridge) leaves a disk on
 * which the line's dynamic programme runs over lifted coordinates.
 * O(nL nR N^3) for N endpoints in all at worst (the lengths tabulated
 * once; a cut whose bridge plus a lower bound on the rest cannot beat the
 * best so far is skipped, which leaves few cuts once bridges are long:
 * 50 intervals a side take 0.06 s to 2 s).  A side may be the whole circle
 * (one row of length L, times ignored).  res->horizon flags the horizon,
 * res->m the number of geodesics, res->candidates the configurations the
 * minimum was taken over (counted with multiplicity over the cuts),
 * *ncross (if not NULL) the geodesics through the bridge.  Errors: those
 * of holent_region_set for each side (*bad_side 0 left, 1 right,
 * *bad_row the row), HOLENT_ETIMELIKE for a causal pair on one side,
 * HOLENT_EINTR when the poll asks to stop.  */
int holent_tfd_entropy (holent_tfd_workspace *w, const holent_tfd_bg *b,
                        const holent_tfd_side *left,
                        const holent_tfd_side *right, double dt,
                        holent_rt_result *res, size_t *ncross,
                        int *bad_side, size_t *bad_row);

/* The minimiser of the last successful holent_tfd_entropy on w (pointers
 * into w, valid until its next use).  The npts endpoints x with their
 * times t (the shift included) and sides (0 left, 1 right), in the
 * boundary order of the bridge slice: right side ascending, then left
 * side descending (one side: ascending; on a circle x in [0, L)).  The
 * npts/2 geodesics as index pairs into them (first < second, sorted by
 * first index); per geodesic within a side on a circle the arc it
 * subtends (holent_rt_entropy's arcs: it runs over the arc of that
 * length from one endpoint to the other in the positive sense), NaN
 * through the bridge and on the two-sided line; per geodesic through the
 * bridge its winding w, the lifted separation being xR - xL + w L (0 on
 * the line and within a side).  horizon: 1 when the horizon circle is
 * part of the surface, with horizon_side the side s whose A_s + gamma_s
 * is homologous to it (a one-sided circle region: that side; on the
 * annulus: the side whose face of the hole lies in A_s alone), -1
 * without.  A two-sided region of two whole circles has npts = 0.  */
typedef struct
{
  size_t npts;
  const double *x, *t;
  const int *side;
  const size_t *pairs;
  const double *arcs;
  const long *winding;
  int horizon, horizon_side;
} holent_tfd_config;

/* *conf receives the minimiser above; HOLENT_EEMPTY when there is none
   (no successful holent_tfd_entropy on w yet).  */
int holent_tfd_minimiser (const holent_tfd_workspace *w,
                          holent_tfd_config *conf);

/* The same as separate outputs (without the windings and the horizon's
 * side: holent_tfd_minimiser).  HOLENT_EEMPTY when there is none or it
 * has no endpoints.  */
int holent_tfd_configuration (const holent_tfd_workspace *w, size_t *npts,
                              const double **x, const double **t,
                              const int **side, const size_t **pairs,
                              const double **arcs);

/* The first shift dt in [0, tmax] at which the two-sided mutual
 * information I(A_L : A_R) = S(A_L) + S(A_R) - S(A_L u A_R) vanishes
 * (to a relative 1e-12 of beta); *dt = Inf when it is still positive at
 * tmax or never vanishes (on a circle, when the geodesics over the
 * complements on both sides beat the one-sided surfaces without a
 * bridge, e.g. A_L = A_R longer than L/2), 0 when it already vanishes.  A negative tmax means the default,
 * 100 beta.  */
int holent_tfd_mi_zero (holent_tfd_workspace *w, const holent_tfd_bg *b,
                        const holent_tfd_side *left,
                        const holent_tfd_side *right, double tmax,
                        double *dt);

/* Scrambling: the smallest shock shift alpha at which I(A_L : A_R)
 * vanishes at the given times (the shift in b is ignored); *alpha = 0
 * when it vanishes without a shock, Inf when no shock removes it (see
 * holent_tfd_mi_zero).  */
int holent_tfd_mi_zero_alpha (holent_tfd_workspace *w, const holent_tfd_bg *b,
                              const holent_tfd_side *left,
                              const holent_tfd_side *right, double *alpha);

/* The scrambling time: *alpha as holent_tfd_mi_zero_alpha, and *t_star the
 * shock time tw at which a perturbation of energy E gives that shift
 * (holent_tfd_shock_time: tw = (beta/(2 pi)) log(4 M alpha/E)); NaN when
 * E = 0 or *alpha = 0 (no perturbation needed, or none given), Inf when
 * *alpha is.  */
int holent_tfd_scrambling (holent_tfd_workspace *w, const holent_tfd_bg *b,
                           const holent_tfd_side *left,
                           const holent_tfd_side *right, double E,
                           double *alpha, double *t_star);

#endif /* HOLENT_TFD_H */
