/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Unit tests of holent_transition: error paths and the closed forms
   (two unit intervals in the vacuum: d = sqrt(2) - 1, common practice;
   the plateau exp(2 pi l/beta) = (1 + exp(2 pi L/beta))/2 from the BTZ
   lengths; Hawking-Page T = sqrt(1 - Omega^2)/L).  */
#include <math.h>
#include "holent_ctest.h"
#include "holent_transition.h"

int
main (void)
{
  holent_geo_bg vac, btz, glob, def;
  holent_transition_result r;
  HT_STATUS (holent_geo_bg_init (&vac, HOLENT_BULK_POINCARE, 0, 1e-6, 0, 0, 1, 1), 0);
  HT_STATUS (holent_geo_bg_init (&btz, HOLENT_BULK_BTZ, 2 * M_PI, 1e-6, 1.5, 1.5, 1, 1), 0);
  HT_STATUS (holent_geo_bg_init (&glob, HOLENT_BULK_GLOBAL_ADS, 2 * M_PI, 1e-6, 0, 0, 1, 1), 0);
  HT_STATUS (holent_geo_bg_init (&def, HOLENT_BULK_CONICAL_DEFECT, 2 * M_PI, 1e-6, 0, 0, 0.5, 1), 0);

  HT_STATUS (holent_transition_separation (&vac, 1, 1, &r), 0);
  HT_CHECK (r.found, "found");
  HT_CLOSE (r.x, sqrt (2) - 1, 1e-15);
  HT_STATUS (holent_transition_separation (&vac, NAN, 1, &r), HOLENT_EINVAL);
  HT_STATUS (holent_transition_separation (&vac, -1, 1, &r), HOLENT_EDOM);
  HT_STATUS (holent_transition_separation (&btz, 1, 1, &r), HOLENT_EUNSUP);
  HT_STATUS (holent_transition_separation (&glob, 4, 3, &r), HOLENT_EDOM);
  HT_STATUS (holent_transition_separation (NULL, 1, 1, &r), HOLENT_EINVAL);
  /* global AdS, two arcs of 1: sin(d/2) sin((2 + d)/2) = sin(1/2)^2 */
  HT_STATUS (holent_transition_separation (&glob, 1, 1, &r), 0);
  HT_CLOSE (sin (r.x / 2) * sin ((2 + r.x) / 2), pow (sin (0.5), 2), 1e-14);

  HT_STATUS (holent_transition_plateau (&btz, &r), 0);
  double a = M_PI / 1.5, L = 2 * M_PI;
  HT_CLOSE (r.x, log ((1 + exp (2 * a * L)) / 2) / (2 * a), 1e-14);
  HT_STATUS (holent_transition_plateau (&vac, &r), HOLENT_EUNSUP);
  HT_STATUS (holent_transition_plateau (&def, &r), HOLENT_EUNSUP);
  HT_STATUS (holent_transition_plateau (NULL, &r), HOLENT_EINVAL);

  HT_STATUS (holent_transition_hawking_page (0.4, 3, &r), 0);
  HT_CLOSE (r.x, sqrt (1 - 0.16) / 3, 1e-13);
  HT_STATUS (holent_transition_hawking_page (1, 3, &r), HOLENT_EDOM);
  HT_STATUS (holent_transition_hawking_page (NAN, 3, &r), HOLENT_EINVAL);
  HT_STATUS (holent_transition_hawking_page (0, -3, &r), HOLENT_EDOM);

  holent_hd_bg hb;
  holent_strip_workspace *w = holent_strip_workspace_alloc ();
  HT_STATUS (holent_hd_bg_init (&hb, 3, HOLENT_HD_VACUUM, INFINITY, 1, 1, 1e-3), 0);
  HT_STATUS (holent_transition_strip_pair (&hb, w, 1, 1, &r), 0);
  /* d = 3: 1/x + 1/(2 + x) = 2, x = (sqrt(5) - 1)/2 */
  HT_CLOSE (r.x, (sqrt (5) - 1) / 2, 1e-9);
  HT_STATUS (holent_transition_strip_pair (&hb, w, 0, 1, &r), HOLENT_EDOM);
  HT_STATUS (holent_transition_strip_pair (&hb, NULL, 1, 1, &r), HOLENT_EINVAL);
  holent_strip_workspace_free (w);
  return HT_DONE ();
}
