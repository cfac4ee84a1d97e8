/* holent_strip.h: Ryu-Takayanagi surfaces of strips in planar
 * AdS_{d+1} backgrounds (holent_hd_bg.h): turning point by inversion of
 * the width (holent_hd_size.h), area by quadrature with the
 * turning-point singularity removed by a substitution.
 * Derivations: doc/higher_dimensional.md.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_STRIP_H
#define HOLENT_STRIP_H

#include <stddef.h>
#include "holent_hd_bg.h"

typedef struct holent_strip_workspace holent_strip_workspace;

holent_strip_workspace *holent_strip_workspace_alloc (void);
void holent_strip_workspace_free (holent_strip_workspace *w);

/* Long batches poll POLL (may be NULL: never interrupted) once per width
   and return HOLENT_EINTR when it asks to stop.  */
void holent_strip_workspace_set_poll (holent_strip_workspace *w,
                                      const holent_poll *poll);

/* How holent_strip_entropy finds the surfaces of a background with a
 * black brane or a tabulated f (the vacuum has closed forms):
 * EXACT solves every width (table, Brent on the width quadrature, area
 * quadratures); SERIES fits, once per call, piecewise Chebyshev series
 * in the root variable y = log(z* / (Z - z*)) of the width's and the
 * finite area's excess over the vacuum and of the cutoff term, with
 * degrees raised (16, 32, 64) and pieces split until the last three
 * coefficients of every series are below 1e-12 of its scale, then
 * inverts the width per strip by safeguarded Newton on the series.
 * Widths outside the fitted range, tabulated f with noise above 1e-12
 * or with a width not monotonic in z*, and series that do not converge
 * within their budget take the exact path.  AUTO (the default) is
 * SERIES for n >= HOLENT_STRIP_SERIES_MIN widths, else EXACT.
 * doc/fast_paths.md.  */
typedef enum
{
  HOLENT_STRIP_AUTO = 0,
  HOLENT_STRIP_EXACT = 1,
  HOLENT_STRIP_SERIES = 2
} holent_strip_method;

#define HOLENT_STRIP_SERIES_MIN 64

/* Any other value of M: AUTO.  */
void holent_strip_workspace_set_method (holent_strip_workspace *w,
                                        holent_strip_method m);

/* After holent_strip_entropy: the number of widths the series gave
 * (*count, may be NULL) and the series' estimated relative error (the
 * largest tail estimate over the pieces; NaN when no width came from
 * the series).  */
double holent_strip_series_error (const holent_strip_workspace *w,
                                  size_t *count);

/* The area-law divergence 2 ell^(d-1) Lperp^(d-2)/((d-2) eps^(d-2) 4G)
 * (d = 2: (2 ell/4G) log(1/eps), eps in the boundary length unit)
 * that S - fin tends to as eps -> 0.  */
double holent_strip_divergence (const holent_hd_bg *bg, double Lperp);

/* Strips of widths l[i] (transverse size Lperp): S at the cutoff,
 * fin = S - 2 ell^(d-1) Lperp^(d-2)/((d-2) eps^(d-2) 4G) in the limit
 * eps -> 0, delta = fin - (vacuum fin of the same width), zstar.  Any
 * output but S may be NULL.  EDOM with *bad = i when l[i] <= 0 or beyond
 * the widest reachable strip (*reach, may be NULL, gets that width);
 * ERANGE with *bad = i when an entropy is out of double range;
 * EINTR when the workspace's poll asks to stop.  */
int holent_strip_entropy (const holent_hd_bg *bg, holent_strip_workspace *w,
                          double Lperp, size_t n, const double *l, double *S,
                          double *fin, double *delta, double *zstar,
                          size_t *bad, double *reach);

/* Accuracy of the finite parts fin[i] (from holent_strip_entropy) that
 * the data of a tabulated f allow: |fin' - fin| with fin' computed in
 * holent_hd_bg_perturbed (bg) (first order in the data's error; Inf
 * where the perturbed background cannot reach l[i]); 0 for analytic f.
 * Costs one more solve per width.  */
int holent_strip_accuracy (const holent_hd_bg *bg, holent_strip_workspace *w,
                           double Lperp, size_t n, const double *l,
                           const double *fin, double *acc);

/* Vacuum closed forms: width/zstar of the strip, and its finite part per
 * unit 2 ell^(d-1) Lperp^(d-2)/(4G) times zstar^(d-2) (d = 2: log 2, the
 * finite part less log(zstar)); holent_strip_vacuum_fin: the finite part
 * itself per 2 ell^(d-1) Lperp^(d-2)/(4G) for the tip zs.  */
double holent_strip_ratio (int d);
double holent_strip_vacuum_j (int d);
double holent_strip_vacuum_fin (int d, double zs);

/* The divergent part int_z u^(1-d) du of the area per 2 ell^(d-1)
 * Lperp^(d-2): z^(2-d)/(d-2), and -log z in d = 2 (an interval: no
 * transverse direction, Lperp^0 = 1).  */
double holent_strip_uv (int d, double z);

#endif /* HOLENT_STRIP_H */
