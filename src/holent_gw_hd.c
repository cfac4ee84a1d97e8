/* holent_gw_hd.c: ads_background structs <-> holent_hd_bg.  The struct
 * is packed from the core object only; unpacking rebuilds the object by
 * one core call (a tabulated background from its stored spline, no
 * refit), which is also the only check of the struct.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdio.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_hd.h"

static const mxArray *
field (const mxArray *s, const char *fn, const char *where, const char *name)
{
  const mxArray *f = mxGetField (s, 0, name);
  if (f == NULL)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "must be a background struct made by ads_background "
                     "(field '%s%s' is missing)", where, name);
  return f;
}

static double
scalar (const mxArray *s, const char *fn, const char *name)
{
  char full[40];
  snprintf (full, sizeof full, "BG.%s", name);
  return holent_gw_scalar (field (s, fn, "", name), fn, full);
}

static const mxArray *
sub (const mxArray *s, const char *fn, const char *where, const char *name)
{
  const mxArray *t = field (s, fn, where, name);
  if (!mxIsStruct (t) || mxGetNumberOfElements (t) != 1)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "field '%s%s' must be the struct made by "
                     "ads_background", where, name);
  return t;
}

void
holent_gw_hd_bg (const mxArray *s, const char *fn, holent_hd_bg *bg)
{
  char kind[32];
  int st = HOLENT_SUCCESS, d;
  size_t bad = 0;
  holent_err err;
  if (s == NULL || !mxIsStruct (s) || mxGetNumberOfElements (s) != 1)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "must be a scalar struct from ads_background");
  if (holent_hd_dimension (scalar (s, fn, "dimension"), &d, &err))
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG.dimension", HOLENT_NOINDEX,
                     "%s", err.reason);
  holent_gw_string (field (s, fn, "", "kind"), fn, "BG.kind", kind,
                    sizeof kind);
  if (strcmp (kind, "vaidya") == 0)  /* the state after the quench */
    holent_gw_string (field (s, fn, "", "final"), fn, "BG.final", kind,
                      sizeof kind);
  double ell = scalar (s, fn, "ell");
  double G = scalar (s, fn, "G");
  double eps = scalar (s, fn, "cutoff");
  if (strcmp (kind, "vacuum") == 0)
    st = holent_hd_bg_init (bg, d, HOLENT_HD_VACUUM, 1, ell, G, eps);
  else if (strcmp (kind, "black_brane") == 0)
    st = holent_hd_bg_init (bg, d, HOLENT_HD_BRANE, scalar (s, fn, "zh"),
                            ell, G, eps);
  else if (strcmp (kind, "tabulated") == 0)
    {
      size_t nz, ng, n2, ns, nf;
      const mxArray *tb = sub (s, fn, "", "table");
      const mxArray *sp = sub (tb, fn, "table.", "spline");
      const mxArray *sm = sub (tb, fn, "table.", "samples");
      const double *z = holent_gw_real (field (sp, fn, "table.spline.", "z"),
                                        fn, "BG.table.spline.z", &nz);
      const double *g = holent_gw_real (field (sp, fn, "table.spline.", "g"),
                                        fn, "BG.table.spline.g", &ng);
      const double *g2 = holent_gw_real (field (sp, fn, "table.spline.",
                                                "g2"),
                                         fn, "BG.table.spline.g2", &n2);
      double noise = scalar (s, fn, "noise");
      if (nz != ng || nz != n2)
        holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                         "BG.table.spline.z, .g and .g2 differ in length");
      /* the samples shown to the user are those the spline was fitted to */
      const double *zs = holent_gw_real (field (sm, fn, "table.samples.",
                                                "z"),
                                         fn, "BG.table.samples.z", &ns);
      holent_gw_real (field (sm, fn, "table.samples.", "f"), fn,
                      "BG.table.samples.f", &nf);
      if (ns != nz || nf != nz || memcmp (zs, z, nz * sizeof *z) != 0)
        holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                         "BG.table.samples differ in length or from "
                         "BG.table.spline.z: make BG with ads_background");
      st = holent_hd_bg_spline (bg, d, nz, z, g, g2, noise, ell, G, eps,
                                &bad);
    }
  else
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG.kind", HOLENT_NOINDEX,
                     "unknown kind '%s'", kind);
  if (st)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "has inconsistent parameters (%s)",
                     holent_strerror (st));
  /* the stored horizon must be the one the core finds again */
  double zh = holent_gw_scalar (field (s, fn, "", "zh"), fn, "BG.zh");
  if (!(zh > 0) || !(zh == bg->zh || fabs (zh - bg->zh) <= 1e-12 * bg->zh))
    {
      double zc = bg->zh;
      holent_hd_bg_free (bg);
      holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG.zh", HOLENT_NOINDEX,
                       "must be positive (Inf: no horizon) and be the "
                       "background's horizon (%g): make BG with "
                       "ads_background", zc);
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

/* Tabulated data sit two levels down (BG.table.samples, BG.table.spline):
   Octave shows structs that deep by their sizes only, so displaying a
   background never lists every sample.  */
mxArray *
holent_gw_hd_pack (const holent_hd_bg *bg, const mxArray *kind,
                   const mxArray *z, const mxArray *f)
{
  static const char *names[] = {
    "dimension", "kind", "ell", "G", "cutoff", "zh", "horizon", "extremal",
    "T", "T_error", "entropy_density", "energy_density", "m", "m_error",
    "noise", "z_max", "table" };
  static const char *tnames[] = { "samples", "spline" };
  static const char *mnames[] = { "z", "f" };
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
  mxArray *tb = mxCreateStructMatrix (1, 1, 2, tnames);
  mxArray *sm = mxCreateStructMatrix (1, 1, 2, mnames);
  mxSetFieldByNumber (sm, 0, 0, copy_column (z));
  mxSetFieldByNumber (sm, 0, 1, copy_column (f));
  mxArray *sp = mxCreateStructMatrix (1, 1, 3, snames);
  mxSetFieldByNumber (sp, 0, 0, column (bg->tz, bg->n));
  mxSetFieldByNumber (sp, 0, 1, column (bg->tg, bg->n));
  mxSetFieldByNumber (sp, 0, 2, column (bg->tg2, bg->n));
  mxSetFieldByNumber (tb, 0, 0, sm);
  mxSetFieldByNumber (tb, 0, 1, sp);
  mxSetFieldByNumber (s, 0, k++, tb);
  return s;
}
