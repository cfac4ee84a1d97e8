/* holent_gw_hd.c: ads_background structs <-> holent_hd_bg.  The struct
 * is packed from the core object only; unpacking rebuilds the object by
 * one core call (a tabulated background from its stored spline, no
 * refit), which is also the only check of the struct.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
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
                       "%s: BG must be a background struct made by "
                       "ads_background (field '%s' is missing)", fn, name);
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
  if (strcmp (kind, "vaidya") == 0)  /* the state after the quench */
    holent_gw_string (field (s, fn, "final"), fn, "BG.final", kind,
                      sizeof kind);
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
      size_t nz, ng, n2;
      const mxArray *sp = field (s, fn, "spline");
      if (!mxIsStruct (sp) || mxGetNumberOfElements (sp) != 1)
        mexErrMsgIdAndTxt ("holent:background",
                           "%s: BG.spline must be the struct made by "
                           "ads_background", fn);
      const double *z = holent_gw_real (field (sp, fn, "z"), fn, "BG.spline.z", &nz);
      const double *g = holent_gw_real (field (sp, fn, "g"), fn, "BG.spline.g", &ng);
      const double *g2 = holent_gw_real (field (sp, fn, "g2"), fn, "BG.spline.g2", &n2);
      double noise = holent_gw_scalar (field (s, fn, "noise"), fn, "BG.noise");
      if (nz != ng || nz != n2)
        mexErrMsgIdAndTxt ("holent:background",
                           "%s: BG.spline.z, .g and .g2 differ in length", fn);
      /* the samples shown to the user are those the spline was fitted to */
      size_t ns, nf;
      const double *zs = holent_gw_real (field (s, fn, "z"), fn, "BG.z", &ns);
      holent_gw_real (field (s, fn, "f"), fn, "BG.f", &nf);
      if (ns != nz || nf != nz || memcmp (zs, z, nz * sizeof *z) != 0)
        mexErrMsgIdAndTxt ("holent:background",
                           "%s: BG.z and BG.f differ in length or from "
                           "BG.spline.z: make BG with ads_background", fn);
      st = holent_hd_bg_spline (bg, d, nz, z, g, g2, noise, ell, G, eps, &bad);
    }
  else
    mexErrMsgIdAndTxt ("holent:background", "%s: unknown BG.kind '%s'", fn,
                       kind);
  if (st)
    mexErrMsgIdAndTxt ("holent:background",
                       "%s: BG has inconsistent parameters (%s)", fn,
                       holent_strerror (st));
  /* the stored horizon must be the one the core finds again */
  double zh = holent_gw_scalar (field (s, fn, "zh"), fn, "BG.zh");
  if (!(zh > 0) || !(zh == bg->zh || fabs (zh - bg->zh) <= 1e-12 * bg->zh))
    {
      holent_hd_bg_free (bg);
      mexErrMsgIdAndTxt ("holent:background",
                         "%s: BG.zh must be positive (Inf: no horizon) and "
                         "be the background's horizon (%g): make BG with "
                         "ads_background", fn, bg->zh);
    }
}

static mxArray *
column (const double *x, size_t n)
{
  mxArray *a = mxCreateDoubleMatrix (n, 1, mxREAL);
  if (n)
    memcpy (mxGetPr (a), x, n * sizeof *x);
  return a;
}

static mxArray *
copy_column (const mxArray *a)
{
  if (a == NULL)
    return mxCreateDoubleMatrix (0, 1, mxREAL);
  return column (mxGetPr (a), mxGetNumberOfElements (a));
}

mxArray *
holent_gw_hd_pack (const holent_hd_bg *bg, const mxArray *kind,
                   const mxArray *z, const mxArray *f)
{
  static const char *names[] = {
    "dimension", "kind", "ell", "G", "cutoff", "zh", "horizon", "extremal",
    "T", "T_error", "entropy_density", "energy_density", "m", "m_error",
    "noise", "z_max", "z", "f", "spline" };
  static const char *snames[] = { "z", "g", "g2" };
  const int nf = sizeof names / sizeof names[0];
  mxArray *s = mxCreateStructMatrix (1, 1, nf, names);
  int k = 0;
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->d));
  mxSetFieldByNumber (s, 0, k++, mxDuplicateArray (kind));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->ell));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->G));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->eps));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->zh));
  mxSetFieldByNumber (s, 0, k++, mxCreateLogicalScalar (isfinite (bg->zh)));
  mxSetFieldByNumber (s, 0, k++, mxCreateLogicalScalar (bg->extremal != 0));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->T));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->T_err));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->s));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->e));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->m));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->m_err));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->noise));
  mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (bg->zmax));
  mxSetFieldByNumber (s, 0, k++, copy_column (z));
  mxSetFieldByNumber (s, 0, k++, copy_column (f));
  mxArray *sp = mxCreateStructMatrix (1, 1, 3, snames);
  mxSetFieldByNumber (sp, 0, 0, column (bg->tz, bg->n));
  mxSetFieldByNumber (sp, 0, 1, column (bg->tg, bg->n));
  mxSetFieldByNumber (sp, 0, 2, column (bg->tg2, bg->n));
  mxSetFieldByNumber (s, 0, k++, sp);
  return s;
}
