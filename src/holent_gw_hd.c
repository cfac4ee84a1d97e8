/* holent_gw_hd.c: ads_background structs -> holent_hd_bg.
 * GPL-3.0-or-later.  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_hd.h"

static const mxArray *
field (const mxArray *s, const char *fn, const char *name)
{
  const mxArray *f = mxGetField (s, 0, name);
  if (f == NULL)
    mexErrMsgIdAndTxt ("holent:background",
                       "%s: BG is missing field '%s': make it with "
                       "ads_background", fn, name);
  return f;
}

void
holent_gw_hd_bg (const mxArray *s, const char *fn, holent_hd_bg *bg)
{
  char kind[32];
  int st = HOLENT_SUCCESS;
  size_t bad = 0;
  if (s == NULL || !mxIsStruct (s) || mxGetNumberOfElements (s) != 1)
    mexErrMsgIdAndTxt ("holent:background",
                       "%s: BG must be a scalar struct from ads_background",
                       fn);
  double dd = holent_gw_scalar (field (s, fn, "dimension"), fn, "BG.dimension");
  if (dd != floor (dd) || dd < 3 || dd > HOLENT_HD_DMAX)
    mexErrMsgIdAndTxt ("holent:background",
                       "%s: BG.dimension must be an integer in [3, %d]", fn,
                       HOLENT_HD_DMAX);
  int d = (int) dd;
  holent_gw_string (field (s, fn, "kind"), fn, "BG.kind", kind, sizeof kind);
  double ell = holent_gw_scalar (field (s, fn, "ell"), fn, "BG.ell");
  double G = holent_gw_scalar (field (s, fn, "G"), fn, "BG.G");
  double eps = holent_gw_scalar (field (s, fn, "cutoff"), fn, "BG.cutoff");
  if (strcmp (kind, "vacuum") == 0)
    st = holent_hd_bg_init (bg, d, HOLENT_HD_VACUUM, 1, ell, G, eps);
  else if (strcmp (kind, "black_brane") == 0)
    st = holent_hd_bg_init (bg, d, HOLENT_HD_BRANE,
                            holent_gw_scalar (field (s, fn, "zh"), fn, "BG.zh"),
                            ell, G, eps);
  else if (strcmp (kind, "tabulated") == 0)
    {
      size_t nz, nf;
      const double *z = holent_gw_real (field (s, fn, "z"), fn, "BG.z", &nz);
      const double *f = holent_gw_real (field (s, fn, "f"), fn, "BG.f", &nf);
      if (nz != nf)
        mexErrMsgIdAndTxt ("holent:background",
                           "%s: BG.z and BG.f differ in length", fn);
      st = holent_hd_bg_tabulated (bg, d, nz, z, f, ell, G, eps, &bad);
    }
  else
    mexErrMsgIdAndTxt ("holent:background", "%s: unknown BG.kind '%s'", fn,
                       kind);
  if (st)
    mexErrMsgIdAndTxt ("holent:background",
                       "%s: BG has inconsistent parameters (%s)", fn,
                       holent_strerror (st));
}
