/* holent_hd_size.h: inversion of the size of an extremal surface (strip
 * width, ball radius) as a function of its turning depth, shared by the
 * strip and ball modules.  The depth z* in (0, Z) is parametrised by
 * y = log(z* / (Z - z*)), so turning points exponentially close to a
 * horizon keep their digits.  A table of size(y) brackets every root;
 * where size(y) is not monotonic its extrema are located by a minimiser
 * and every extremal surface of the requested size is compared.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_HD_SIZE_H
#define HOLENT_HD_SIZE_H

#include <stddef.h>
#include "holent_hd_bg.h"

/* Largest table a workspace holds (a table longer than this: ETOOBIG).  */
#define HOLENT_HD_SIZE_TABMAX 16384

typedef struct holent_hd_size_workspace holent_hd_size_workspace;

holent_hd_size_workspace *holent_hd_size_workspace_alloc (void);
void holent_hd_size_workspace_free (holent_hd_size_workspace *w);

/* The problem: size (ctx, zs, w, &v) is the size of the surface turning
 * at zs = Z - w; eval (ctx, zs, w, &fin, &cut, &extra) its finite and
 * cut-off areas and the excess over the vacuum.  Both return a status.  */
typedef struct
{
  int (*size) (void *ctx, double zs, double w, double *v);
  int (*eval) (void *ctx, double zs, double w, double *fin, double *cut,
               double *extra);
  void *ctx;
  int fine;  /* 1: non-monotonic sizes may occur, look for narrow extrema */
  int ball;  /* 1: beyond y = 20 the size grows linearly (step by 1) */
} holent_hd_size_problem;

/* Checks sizes s[0..n-1] (each finite and > 0; *bad = first offender)
   and returns their range.  */
int holent_hd_size_check (size_t n, const double *s, size_t *bad,
                          double *smin, double *smax);

/* Tabulates size(y) from below smin (the surface of size smin turns near
 * smin/ratio) up to smax or the deepest admissible turning point
 * Z - wmin; *reach gets the largest reachable size.  */
int holent_hd_size_table (const holent_hd_bg *bg, holent_hd_size_workspace *ws,
                          const holent_hd_size_problem *pb, double smin,
                          double smax, double ratio, double wmin,
                          double *reach);

/* The table of the last holent_hd_size_table call: *nt entries (root
 * variable ty, size tv) and whether the size is monotonic along it
 * (read-only; valid until the next table).  */
void holent_hd_size_table_get (const holent_hd_size_workspace *ws, size_t *nt,
                               const double **ty, const double **tv,
                               int *mono);

/* Every extremal surface of size s bracketed by the table; the one with
 * the least finite area is returned (RT): its areas, excess and depth.  */
int holent_hd_size_solve (const holent_hd_bg *bg, holent_hd_size_workspace *ws,
                          const holent_hd_size_problem *pb, double s,
                          double *fin, double *cut, double *extra,
                          double *zs);

/* Accuracy of finite parts fin[i] of sizes s[i] that the data of a
 * tabulated f allow: |fin' - fin| with fin' = solve (bg', ...) in the
 * perturbed background holent_hd_bg_perturbed (bg) (Inf where bg'
 * cannot reach s[i]); 0 for analytic f.  solve (bg, ctx, n, s, S, fin)
 * is the strip or ball solver.  */
int holent_hd_size_accuracy (const holent_hd_bg *bg,
                             int (*solve) (const holent_hd_bg *, void *,
                                           size_t, const double *, double *,
                                           double *),
                             void *ctx, size_t n, const double *s,
                             const double *fin, double *acc);

#endif /* HOLENT_HD_SIZE_H */
