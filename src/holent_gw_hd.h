/* holent_gw_hd.h: unpacking of ads_background structs (AdS_{d+1}) for the
 * gateways.  SPDX-License-Identifier: GPL-3.0-or-later  */
#ifndef HOLENT_GW_HD_H
#define HOLENT_GW_HD_H

#include "mex.h"
#include "core/holent_hd_bg.h"
#include "core/holent_strip.h"
#include "core/holent_ball.h"
#include "core/holent_hd_vel.h"
#include "core/holent_vaidya.h"

/* Fill bg from a struct made by ads_background; raises holent:background
   on a malformed struct.  A tabulated background owns a spline: release
   it with holent_hd_bg_free before raising any later error.  */
void holent_gw_hd_bg (const mxArray *s, const char *fn, holent_hd_bg *bg);

/* The ads_background struct of a core background (kind: the KIND
   string; z, f: the samples of a tabulated f, or NULL).  */
mxArray *holent_gw_hd_pack (const holent_hd_bg *bg, const mxArray *kind,
                            const mxArray *z, const mxArray *f);

#endif
