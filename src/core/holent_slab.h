/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_slab.h: elementwise work over many values run in slabs, with
 * the caller's poll (holent_poll, holent.h) between slabs, so that one
 * long vectorised call (1e8 interval lengths, 1e6 timed geodesics, a
 * vector of root finds) stops on request within one slab.  The kernels
 * themselves stay as they are: the slab loop sits around them.  */
#ifndef HOLENT_SLAB_H
#define HOLENT_SLAB_H

#include <stddef.h>
#include "holent.h"

/* Values per slab for the fast vectorised kernels (2-15 ns a value): a
   slab takes milliseconds, so a poll between slabs costs nothing
   measurable and a stop request is seen within a few hundredths of a
   second.  Per-item loops (microseconds to milliseconds an item) pass
   their own smaller slab.  */
#define HOLENT_SLAB_VALUES ((size_t) 1 << 20)

/* The work on the values [i0, i0 + m) of CTX; 0 (HOLENT_SUCCESS) or a
   status, which ends the run.  */
typedef int (*holent_slab_fn) (void *ctx, size_t i0, size_t m);

/* Call FN on [0, n) in consecutive slabs of at most SLAB values (0 means
   HOLENT_SLAB_VALUES), in order.  Between two slabs POLL (may be NULL:
   never interrupted) is called with done = the values finished and
   total = n; a nonzero answer ends the run with HOLENT_EINTR before the
   next slab.  Returns the first nonzero status of FN (the slabs after it
   are not run), HOLENT_EINTR, or HOLENT_SUCCESS.  A run of one slab never
   polls.  */
int holent_slab_run (size_t n, size_t slab, holent_slab_fn fn, void *ctx,
                     const holent_poll *poll);

#endif /* HOLENT_SLAB_H */
