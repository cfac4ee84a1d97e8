/* holent_gw.h: argument checking and unpacking shared by the MEX
 * gateways.  Gateways check, unpack, call the core and pack; no physics
 * here.  Every error goes through mexErrMsgIdAndTxt with an identifier
 * holent:<reason>, so bad input never crashes Octave.
 * GPL-3.0-or-later.  */
#ifndef HOLENT_GW_H
#define HOLENT_GW_H

#include <stddef.h>
#include "mex.h"
#include "core/holent.h"
#include "core/holent_geo.h"

/* Switch GSL's abort()ing error handler off: call first in every
   gateway.  */
void holent_gw_init (void);

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

/* Unpack a background struct made by ads3_background.  */
void holent_gw_bg (const mxArray *s, const char *fn, holent_geo_bg *bg);

/* Raise the error matching a core status; index (0-based, or (size_t)-1
   when none) is reported 1-based.  */
void holent_gw_fail (int status, const char *fn, const char *name,
                     size_t index);

/* A new real double array of the same dimensions as a.  */
mxArray *holent_gw_like (const mxArray *a);

#endif /* HOLENT_GW_H */
