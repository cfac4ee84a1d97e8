/* SPDX-License-Identifier: GPL-3.0-or-later */
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
  HOLENT_EINVAL = 1,    /* argument invalid: NULL, malformed              */
  HOLENT_EDOM = 2,      /* argument outside its domain (range error, Inf) */
  HOLENT_ENOMEM = 3,    /* allocation failed                              */
  HOLENT_EOVERLAP = 4,  /* intervals of a region overlap                  */
  HOLENT_EEMPTY = 5,    /* empty or zero-length interval                  */
  HOLENT_ENOCONV = 6,   /* iteration (root finder, quadrature) failed     */
  HOLENT_EUNSUP = 7,    /* not implemented for this background            */
  HOLENT_ETOOBIG = 8,   /* problem size beyond what the core accepts      */
  HOLENT_ECOINCIDE = 9, /* two boundary points coincide                   */
  HOLENT_EINTR = 10,    /* the caller's poll callback asked to stop       */
  HOLENT_ETYPE = 11,    /* wrong class or shape (complex, sparse, ...)    */
  HOLENT_ENAN = 12,     /* a NaN where a number is expected               */
  HOLENT_ESIZE = 13,    /* sizes of arguments do not agree                */
  HOLENT_ENARGS = 14,   /* wrong number of inputs or outputs              */
  HOLENT_EBACKGROUND = 15, /* not a background, or an unknown one         */
  HOLENT_EINCONSISTENT = 16, /* parameters contradict each other          */
  HOLENT_EBOUNDARY = 17,  /* boundary kind does not fit the request       */
  HOLENT_ECUTOFF = 18,    /* cutoff too large for the region              */
  HOLENT_EREACH = 19,     /* surface wider than the background allows     */
  HOLENT_EMIXED = 20,     /* purification asked of a mixed state          */
  HOLENT_ERANGE = 21,     /* result outside the representable range       */
  HOLENT_EOVERROTATING = 22, /* |J| > M: no horizon                       */
  HOLENT_ECONICAL = 23,   /* a conical defect, not a black hole           */
  HOLENT_EBELOWVAC = 24,  /* below the vacuum energy                      */
  HOLENT_EOPTION = 25,    /* unknown, repeated or inapplicable option     */
  HOLENT_EINTERNAL = 26,  /* should never happen: please report it        */
  HOLENT_ETIMELIKE = 30   /* boundary points timelike or null separated   */
};

/* Index value meaning "no element".  */
#define HOLENT_NOINDEX ((size_t) -1)

/* A core status with what was expected: validators (background
   constructors, regions) fill it so that the caller's message names the
   argument (arg, 0-based in the core call, -1 none), the element (index,
   index2: 0-based, HOLENT_NOINDEX none) and the reason in words.  */
typedef struct
{
  int status;
  int arg;
  size_t index;
  size_t index2;
  char reason[200];
} holent_err;

/* Clear E (status 0, no argument, no index).  */
void holent_err_clear (holent_err *e);

/* Fill E (may be NULL) and return STATUS; FMT (printf-like, may be NULL
   for the status's own text) says what was expected.  */
int holent_err_set (holent_err *e, int status, int arg, size_t index,
                    const char *fmt, ...)
#if defined(__GNUC__)
  __attribute__ ((format (printf, 5, 6)))
#endif
  ;

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

/* The short name of a status ("overlap", "domain", ...), from which the
   Octave layer makes its identifier holent:<name>; never NULL.  The one
   table of status names, texts and identifiers is holent_status.c.  */
const char *holent_status_name (int status);

#endif /* HOLENT_H */
