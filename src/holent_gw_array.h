/* holent_gw_array.h: result arrays Octave takes over without a copy
 * (holent_gw_array.cc).
 *
 *   mxArray *x = holent_gw_result_like (shape);  // real double, shape's size
 *   double *p = mxGetPr (x);                     // write every element
 *   plhs[0] = x;   or   mxSetField (s, 0, "name", x);
 *
 * Its elements are not initialised.  Free it with mxDestroyArray like any
 * other array (on an error path, before raising).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_GW_ARRAY_H
#define HOLENT_GW_ARRAY_H

#ifdef __cplusplus
class mxArray;    /* Octave's class (mxarray.h); void in C (mex.h) */
extern "C" {
#else
#include "mex.h"
#endif

/* A new real double array of the dimensions of A, owned by Octave.  */
mxArray *holent_gw_result_like (const mxArray *a);

#ifdef __cplusplus
}
#endif

#endif /* HOLENT_GW_ARRAY_H */
