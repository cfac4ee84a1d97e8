/* holent_hd_vel.h: entanglement and butterfly velocities of a planar
 * AdS_{d+1} background with a horizon (holent_hd_bg.h).
 *   v_E = max_{z > zh, f < 0} sqrt(-f(z)) (zh/z)^(d-1)   (Liu and Suh 2014,
 *         PRL 112, 011601 and PRD 89, 066012): the growth rate, per unit
 *         entropy density and boundary area, of the critical surface
 *         that sits at z = z_m inside the horizon;
 *   v_B = sqrt(|f'(zh)| zh / (2 (d-1)))   (the shock-wave screening mass
 *         of Shenker and Stanford 2014 / Roberts, Stanford and Susskind
 *         2015, in the form v_B^2 = 4 pi T/((d-1) V'(r_h)), V = r^2,
 *         r = 1/z).
 * Derivations: doc/higher_dimensional.md ("Velocities").
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_HD_VEL_H
#define HOLENT_HD_VEL_H

#include "holent_hd_bg.h"

/* vE, zm (the depth of the critical surface) and vB (any may be NULL).
 * An extremal horizon gives 0, 0 (zm = zh).  EDOM without a horizon, or
 * when a tabulated f ends before the maximum of -f/z^(2d-2) inside the
 * horizon (z_max must pass it: *zneed, may be NULL, gets the depth that
 * the table reached where the rate was still growing).  */
int holent_hd_velocities (const holent_hd_bg *bg, double *vE, double *zm,
                          double *vB, double *zneed);

#endif /* HOLENT_HD_VEL_H */
