/* holent_vaidya.h: strips after a global quench in Vaidya-AdS_{d+1},
 *   ds^2 = (ell^2/z^2) (-f(v, z) dv^2 - 2 dv dz + dx_1^2 + ... ),
 *   f(v, z) = 1 - s(v) (1 - F(z)),
 * a shell leaving the boundary at v = t = 0 (s = theta(v), or
 * s = (1 + tanh(v/w))/2 for a shell of width w) into the final state F
 * (holent_hd_bg: a brane or a tabulated f).  The extremal surface
 * (z(x), v(x)) is shot from its tip with a GSL ODE solver (the thin
 * shell crossed exactly, with its refraction) and the tip (z*, v*) found
 * so that the strip has width l and reaches the boundary at t.  Thin
 * shell: the curve of surfaces of width l is traced in the tip's time v*
 * (z* at fixed v* by a bracketed secant), from the vacuum strip to the
 * static strip of the final state through the folds of t(v*), and every
 * surface on it with boundary time t is a candidate (the least area is
 * taken: saturation exactly where the static strip becomes the least).
 * Smooth shell: the tip is followed continuously in t (2D Newton/Broyden)
 * and compared with the late branch from the static strip.
 * Derivations: doc/higher_dimensional.md ("Quench: Vaidya").
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_VAIDYA_H
#define HOLENT_VAIDYA_H

#include <stddef.h>
#include "holent_hd_bg.h"

typedef struct holent_vaidya_workspace holent_vaidya_workspace;

holent_vaidya_workspace *holent_vaidya_workspace_alloc (void);
void holent_vaidya_workspace_free (holent_vaidya_workspace *w);

/* Long scans poll POLL (may be NULL: never interrupted) once per time
   and return HOLENT_EINTR when it asks to stop.  */
void holent_vaidya_workspace_set_poll (holent_vaidya_workspace *w,
                                       const holent_poll *poll);

/* S(t) of a strip of width l (transverse size Lperp) at the boundary
 * times t[i] (any order) after the quench into fin with shell width w
 * (0: thin shell).  S is the finite part plus the area-law divergence
 * 2 ell^(d-1) Lperp^(d-2)/((d-2) eps^(d-2) 4G) (as strip entropies),
 * finite the finite part, zstar/vstar the tip, jump[i] = 1 where the
 * minimal surface changes branch between t[i-1] and t[i] (in time
 * order).  Outputs but S may be NULL.  EDOM with *bad = i for a bad t[i]
 * or l; ENOCONV with *bad = i when no extremal surface is found.  */
int holent_vaidya_strip (const holent_hd_bg *fin, double w,
                         holent_vaidya_workspace *ws, double Lperp, double l,
                         size_t n, const double *t, double *S, double *finite,
                         double *zstar, double *vstar, unsigned char *jump,
                         size_t *bad);

/* One shot from the tip (zs, vs): half-width lh, boundary time tb and
 * finite part of the area per 2 ell^(d-1) Lperp^(d-2)/(4G) (for tests).  */
int holent_vaidya_shoot (const holent_hd_bg *fin, double w,
                         holent_vaidya_workspace *ws, double zs, double vs,
                         double *lh, double *tb, double *jfin);

#endif /* HOLENT_VAIDYA_H */
