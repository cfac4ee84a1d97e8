/* holent_gw_poll.h: the gateway side of the core's poll contract
 * (holent_poll in core/holent.h): Ctrl-C and a progress line.
 *
 * Use in a gateway (plain C):
 *
 *   const holent_poll *poll = holent_gw_poll ("rt_entropy");
 *   st = holent_rt_... (..., poll);       // the core polls it
 *   ... free everything the gateway allocated ...
 *   holent_gw_poll_end ();                // clears the progress line
 *   if (st == HOLENT_EINTR)
 *     holent_gw_interrupt ();             // back to the prompt, no return
 *
 * holent_gw_fail (HOLENT_EINTR, ...) does the last two steps itself.
 * Elementwise work over many values (a kernel over a long array, a loop
 * of core calls in the gateway) runs through holent_slab_run
 * (core/holent_slab.h), which polls between slabs.
 * The callback may be called from any thread (OpenMP loops in the core):
 * only the calling (main) thread talks to Octave; the others see the
 * stop flag it sets.  Implemented in C++ (holent_gw_poll.cc) because the
 * MEX API offers no interrupt check: it calls Octave's own octave_quit.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_GW_POLL_H
#define HOLENT_GW_POLL_H

#include "core/holent.h"

#ifdef __cplusplus
extern "C" {
#endif

/* The poll object for one gateway call, reset (timer, stop flag, progress
   line) by this call.  LABEL (may be NULL) names the work in the progress
   line, normally the public function's name.  Never NULL.  */
const holent_poll *holent_gw_poll (const char *label);

/* Nonzero once the poll has seen Ctrl-C during this call.  */
int holent_gw_poll_stopped (void);

/* Clear the progress line if one is shown.  Harmless to call twice.  */
void holent_gw_poll_end (void);

/* Hand the interrupt back to Octave: ends the progress line and throws
   Octave's interrupt, so the session returns to the prompt exactly as for
   Ctrl-C in Octave code.  Free everything first: it does not return.  */
#if defined (__GNUC__)
__attribute__ ((noreturn))
#endif
void holent_gw_interrupt (void);

#ifdef __cplusplus
}
#endif

#endif /* HOLENT_GW_POLL_H */
