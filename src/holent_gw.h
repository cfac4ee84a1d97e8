/* holent_gw.h: argument checking and unpacking shared by the MEX
 * gateways.  Gateways check, unpack, call the core and pack; no physics
 * here.  Every error goes through holent_gw_raise, the one function that
 * turns a core status into holent:<name> and a message naming the public
 * function, the argument and what was expected, so bad input never
 * crashes Octave.  Gateways take the public function's name as their
 * first input (after a mode string, where they have modes).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_GW_H
#define HOLENT_GW_H

#include <stddef.h>
#include "mex.h"
#include "core/holent.h"
#include "core/holent_geo.h"
#include "core/holent_bg3.h"

/* Switch GSL's abort()ing error handler off: call first in every
   gateway.  */
void holent_gw_init (void);

/* The one place where a status becomes an Octave error: identifier
   holent:<holent_status_name (STATUS)>, message "FN: NAME(INDEX): REASON"
   (FN, NAME left out when NULL or empty, INDEX (0-based, shown 1-based)
   when HOLENT_NOINDEX; FMT NULL: the status's own text).  Raised through
   Octave's error (), so no gateway name is put in front.  HOLENT_EINTR
   returns to the prompt as Ctrl-C does.  Never returns.  */
void holent_gw_raise (const char *fn, int status, const char *name,
                      size_t index, const char *fmt, ...)
#if defined(__GNUC__)
  __attribute__ ((noreturn, format (printf, 5, 6)))
#endif
  ;

/* Raise the core's report E; NAMES[E->arg] (NNAMES of them) names the
   argument, E->index the element.  */
void holent_gw_raise_err (const char *fn, const holent_err *e,
                          const char *const *names, size_t nnames)
#if defined(__GNUC__)
  __attribute__ ((noreturn))
#endif
  ;

/* Raise holent:nargs unless nlhs <= maxout and minin <= nrhs <= maxin.  */
void holent_gw_nargs (const char *fn, int nlhs, int maxout, int nrhs,
                      int minin, int maxin);

/* Pointer to the data of a real, full, double array (any size, may be
   empty); raises holent:type naming the argument otherwise.  */
const double *holent_gw_real (const mxArray *a, const char *fn,
                              const char *name, size_t *n);

/* A real finite double scalar.  */
double holent_gw_scalar (const mxArray *a, const char *fn, const char *name);

/* Copy of a char row vector into buf (size bufsz); holent:type if not.  */
void holent_gw_string (const mxArray *a, const char *fn, const char *name,
                       char *buf, size_t bufsz);

/* Unpack a background struct made by ads3_background: its parameters
   are checked by the one core constructor (holent_bg3_init) and every
   derived field must match what that builds; holent:background naming FN
   and the field otherwise.  holent_gw_bg keeps the kernels' part.  */
void holent_gw_bg (const mxArray *s, const char *fn, holent_geo_bg *bg);
void holent_gw_bg3 (const mxArray *s, const char *fn, holent_bg3 *bg);

/* The options struct O of ads3_background (fields named as the
   parameters of holent_bg3.h, each optional) into *SP (given bits and
   values; state and circle left alone); holent:type or holent:option
   naming the option when a value is not a real numeric scalar (the
   saddle: a known word).  */
void holent_gw_bg3_opts (const mxArray *o, const char *fn,
                         holent_bg3_spec *sp);

/* Central charge, Newton constant and AdS radius (Brown-Henneaux, in the
   core) from the fields c, G, ell of the options struct O, each
   optional; other fields are ignored.  */
void holent_gw_units (const mxArray *o, const char *fn, double *c,
                      double *G, double *ell);

/* Raise the error matching a core status; index (0-based, or (size_t)-1
   when none) is reported 1-based.  */
void holent_gw_fail (int status, const char *fn, const char *name,
                     size_t index);

/* ---- regions and configurations, shared by the minimiser gateways ---- */

/* Check a region argument A: an n x 2 real double matrix or a cell array
   of them (raises holent:type / holent:empty naming NAME or NAME{k}
   before anything is allocated).  Returns the number of regions;
   *maxrows (may be NULL) gets the largest row count.  */
size_t holent_gw_regions (const mxArray *A, const char *fn, const char *name,
                          size_t *maxrows);

/* The k-th region of A (A itself when it is not a cell).  */
const mxArray *holent_gw_region (const mxArray *A, size_t k);

/* "NAME" or "NAME{k+1}" (A a cell), then "(ROW+1,:)" unless ROW is
   HOLENT_NOINDEX: the argument named in a message.  */
void holent_gw_region_name (char *buf, size_t sz, const char *name,
                            const mxArray *A, size_t k, size_t row);

/* An array of the size of the cell A (1 x 1 for a matrix) for one value
   per region: doubles, or a struct array with NF FIELDS.  */
mxArray *holent_gw_per_region (const mxArray *A);
mxArray *holent_gw_per_region_struct (const mxArray *A, int nf,
                                      const char **fields);

/* The geodesics of a configuration: an np x 2 matrix of 1-based indices
   into PTS (PAIRS holds 2 np 0-based ones) and, when COORDS is not NULL,
   the np x 2 matrix of their boundary coordinates.  */
mxArray *holent_gw_pairs (size_t np, const size_t *pairs, const double *pts,
                          mxArray **coords);

/* An n x 1 copy of V; an n x 2 matrix [A, B].  */
mxArray *holent_gw_column (size_t n, const double *v);
mxArray *holent_gw_columns (size_t n, const double *a, const double *b);
/* An n x 3 matrix [A, B, C] (curves with a third coordinate).  */
mxArray *holent_gw_columns3 (size_t n, const double *a, const double *b,
                             const double *c);

/* A new real double array of the same dimensions as a.  */
mxArray *holent_gw_like (const mxArray *a);

#endif /* HOLENT_GW_H */
