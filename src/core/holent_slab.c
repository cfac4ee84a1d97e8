/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_slab.c: slabs of elementwise work, polled between (see
 * holent_slab.h).  */
#include "holent_slab.h"

int
holent_slab_run (size_t n, size_t slab, holent_slab_fn fn, void *ctx,
                 const holent_poll *poll)
{
  if (fn == NULL)
    return HOLENT_EINVAL;
  if (slab == 0)
    slab = HOLENT_SLAB_VALUES;
  for (size_t i0 = 0; i0 < n; i0 += slab)
    {
      /* between slabs only: a short call pays nothing */
      if (i0 > 0 && poll != NULL && poll->fn != NULL
          && poll->fn (poll->ctx, (double) i0, (double) n))
        return HOLENT_EINTR;
      size_t m = n - i0 < slab ? n - i0 : slab;
      int st = fn (ctx, i0, m);
      if (st != HOLENT_SUCCESS)
        return st;
    }
  return HOLENT_SUCCESS;
}
