/* holent.h: status codes and shared declarations of the holent core.
 *
 * The core is plain C11: no Octave headers, no global state, no I/O.
 * Every public function returns a status code and writes its results
 * through pointers supplied (and owned) by the caller.
 *
 * Copyright (C) 2026 The holent developers.  GPL-3.0-or-later.  */
#ifndef HOLENT_H
#define HOLENT_H

#include <stddef.h>

enum holent_status
{
  HOLENT_SUCCESS = 0,
  HOLENT_EINVAL = 1,    /* argument invalid: NULL, NaN, wrong kind       */
  HOLENT_EDOM = 2,      /* argument outside its domain (range error)     */
  HOLENT_ENOMEM = 3,    /* allocation failed                              */
  HOLENT_EOVERLAP = 4,  /* intervals of a region overlap                  */
  HOLENT_EEMPTY = 5,    /* empty or zero-length interval                  */
  HOLENT_ENOCONV = 6,   /* iteration (root finder, quadrature) failed     */
  HOLENT_EUNSUP = 7,    /* not implemented for this background            */
  HOLENT_ETOOBIG = 8,   /* problem size beyond what the core accepts      */
  HOLENT_ECOINCIDE = 9, /* two boundary points coincide                   */
  HOLENT_EINTR = 10,    /* the caller's poll callback asked to stop       */
  /* Time-dependent states (issue 12); numbered apart from the codes the
     error-protocol work adds, so both can be merged.  */
  HOLENT_ETIMELIKE = 30 /* boundary points timelike or null separated     */
};

/* Long core loops call poll->fn (poll->ctx, done, total) every
   ~1e5 elementary operations (or every item of a batch); a nonzero
   return makes the core free its temporaries and return HOLENT_EINTR.
   poll == NULL or poll->fn == NULL means never interrupted.  done/total
   feed progress displays.  */
typedef struct
{
  int (*fn) (void *ctx, double done, double total);
  void *ctx;
} holent_poll;

/* Short English description of a status code; never NULL.  */
const char *holent_strerror (int status);

#endif /* HOLENT_H */
