/* RT surfaces in AdS_{d+1} (FN: the public function, named in messages):
 *   [S, FIN, DELTA, ZSTAR, REACH, ACC, DIV, NSER, SERR] = __holent_hd__ ("strip", FN, BG, L, LPERP[, NAMES[, METHOD]])
 *     (NAMES: a cell of k names when L is k arguments' widths one after
 *     the other, so that messages name the right one, or []; METHOD:
 *     "auto" (default), "exact" or "series", holent_strip_method; NSER
 *     widths came from the series, SERR their estimated relative error,
 *     NaN when none)
 *   [S, FIN, DELTA, ZTIP, REACH, ACC]       = __holent_hd__ ("ball", FN, BG, R[, NAMES])
 *   [VE, VB, ZM] = __holent_hd__ ("velocity", FN, BG)
 *   __holent_hd__ ("check", FN, BG)   (raises holent:background unless valid)
 *   [S, FIN, ZSTAR, VSTAR, JUMP, DIV] = __holent_hd__ ("vaidya", FN, BG, L, LPERP, T)
 * ACC: accuracy of FIN (and DELTA) allowed by a tabulated f's data; DIV:
 * the strip's area-law divergence (S - FIN as the cutoff goes to 0).
 * Long batches poll for Ctrl-C (holent_gw_poll).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdio.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_hd.h"
#include "holent_gw_poll.h"

typedef struct
{
  holent_hd_bg bg;
  holent_strip_workspace *sw;
  holent_ball_workspace *bw;
  holent_vaidya_workspace *vw;
  mxArray *out[9];
} job;

static void
release (job *j, int outputs)
{
  holent_hd_bg_free (&j->bg);
  holent_strip_workspace_free (j->sw);
  holent_ball_workspace_free (j->bw);
  holent_vaidya_workspace_free (j->vw);
  j->sw = NULL;
  j->bw = NULL;
  j->vw = NULL;
  for (int k = 0; outputs && k < 9; k++)
    if (j->out[k])
      {
        mxDestroyArray (j->out[k]);
        j->out[k] = NULL;
      }
}

static void
hand_out (job *j, int nlhs, mxArray *plhs[], int nout)
{
  for (int k = 0; k < nout; k++)
    if (k < (nlhs > 1 ? nlhs : 1))
      plhs[k] = j->out[k];
    else
      mxDestroyArray (j->out[k]);
  memset (j->out, 0, sizeof j->out);
}

/* The status of a batch over X as an error.  X is named NAME, or, when
   the caller passed NAMES (a cell of k names), X is k blocks of equal
   length named NAMES{1..k} (several arguments sent in one call).  The
   element and its value are named as "NAME(i) = value".  */
static void
fail (job *j, const char *fn, int st, const char *what, const char *name,
      const mxArray *names, size_t n, const double *x, size_t bad,
      double reach)
{
  char nm[64];
  size_t i = bad;
  double v = bad != HOLENT_NOINDEX ? x[bad] : NAN, eps = j->bg.eps;
  snprintf (nm, sizeof nm, "%s", name ? name : "");
  if (bad != HOLENT_NOINDEX && names != NULL && mxIsCell (names)
      && mxGetNumberOfElements (names) > 0)
    {
      size_t k = mxGetNumberOfElements (names), blk = n / k;
      const mxArray *c = blk ? mxGetCell (names, bad / blk) : NULL;
      if (c != NULL && mxIsChar (c) && mxGetString (c, nm, sizeof nm) == 0)
        i = bad % blk;
      else
        snprintf (nm, sizeof nm, "%s", name ? name : "");
    }
  release (j, 1);
  holent_gw_poll_end ();
  if (bad == HOLENT_NOINDEX)
    holent_gw_raise (fn, st, name, bad, NULL);
  if (st == HOLENT_EDOM && isfinite (v) && v > 0)
    holent_gw_raise (fn, HOLENT_EREACH, NULL, HOLENT_NOINDEX,
                     "%s(%zu) = %g is beyond the largest %s reachable in "
                     "this background (%g)", nm, i + 1, v, what, reach);
  if (st == HOLENT_EDOM)
    holent_gw_raise (fn, st, NULL, HOLENT_NOINDEX,
                     "%s(%zu) = %g must be positive (a %s)", nm, i + 1, v,
                     what);
  if (st == HOLENT_ERANGE)
    holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                     "%s(%zu) = %g gives an entropy out of double precision "
                     "range (cutoff %g): the %s must keep it finite", nm,
                     i + 1, v, eps, what);
  holent_gw_raise (fn, st, nm, i, NULL);
}

static void
vaidya (const char *fn, int nlhs, mxArray *plhs[], const mxArray *prhs[])
{
  job j = { 0 };
  size_t n, bad = HOLENT_NOINDEX;
  double l = holent_gw_scalar (prhs[3], fn, "L");
  double Lperp = holent_gw_scalar (prhs[4], fn, "length");
  const double *t = holent_gw_real (prhs[5], fn, "t", &n);
  const mxArray *wf = mxIsStruct (prhs[2]) && mxGetNumberOfElements (prhs[2]) == 1
                          ? mxGetField (prhs[2], 0, "shell_width") : NULL;
  if (wf == NULL)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, "BG", HOLENT_NOINDEX,
                     "must be a quench made by ads_background (d, "
                     "\"vaidya\", ...)");
  double w = holent_gw_scalar (wf, fn, "BG.shell_width");
  holent_gw_hd_bg (prhs[2], fn, &j.bg);
  j.vw = holent_vaidya_workspace_alloc ();
  if (j.vw == NULL)
    fail (&j, fn, HOLENT_ENOMEM, "", NULL, NULL, 0, NULL, HOLENT_NOINDEX, 0);
  holent_vaidya_workspace_set_poll (j.vw, holent_gw_poll (fn));
  for (int k = 0; k < 4; k++)
    j.out[k] = holent_gw_like (prhs[5]);
  j.out[4] = mxCreateLogicalArray (mxGetNumberOfDimensions (prhs[5]),
                                   mxGetDimensions (prhs[5]));
  int st = holent_vaidya_strip (&j.bg, w, j.vw, Lperp, l, n, t,
                                mxGetPr (j.out[0]), mxGetPr (j.out[1]),
                                mxGetPr (j.out[2]), mxGetPr (j.out[3]),
                                (unsigned char *) mxGetLogicals (j.out[4]),
                                &bad);
  if (st == HOLENT_ENOCONV && bad != HOLENT_NOINDEX)
    {
      release (&j, 1);
      holent_gw_poll_end ();
      holent_gw_raise (fn, st, NULL, HOLENT_NOINDEX, "t(%zu) = %g: no "
                       "extremal surface of width %g found", bad + 1, t[bad],
                       l);
    }
  if (st && bad != HOLENT_NOINDEX)
    fail (&j, fn, st, "time", "t", NULL, n, t, bad, INFINITY);
  if (st)
    fail (&j, fn, st, "width", "L", NULL, 1, &l, 0, INFINITY);
  holent_gw_poll_end ();
  j.out[5] = mxCreateDoubleScalar (holent_strip_divergence (&j.bg, Lperp));
  hand_out (&j, nlhs, plhs, 6);
  release (&j, 0);
}

static void
velocity (const char *fn, int nlhs, mxArray *plhs[], const mxArray *bgs)
{
  holent_hd_bg bg;
  double vE, vB, zm, zneed = NAN;
  holent_gw_hd_bg (bgs, fn, &bg);
  int st = holent_hd_velocities (&bg, &vE, &zm, &vB, &zneed);
  double zh = bg.zh;
  holent_hd_bg_free (&bg);
  if (st == HOLENT_EDOM && !isfinite (zh))
    holent_gw_raise (fn, st, "BG", HOLENT_NOINDEX,
                     "has no horizon: the velocities need one");
  if (st == HOLENT_EDOM && isfinite (zneed))
    holent_gw_raise (fn, st, "BG", HOLENT_NOINDEX,
                     "the samples of f must extend past the maximum of "
                     "-f(z)/z^(2d-2) inside the horizon (still growing at "
                     "z_max = %g): tabulate f further beyond zh = %g",
                     zneed, zh);
  if (st)
    holent_gw_raise (fn, st, "BG", HOLENT_NOINDEX, NULL);
  plhs[0] = mxCreateDoubleScalar (vE);
  if (nlhs > 1)
    plhs[1] = mxCreateDoubleScalar (vB);
  if (nlhs > 2)
    plhs[2] = mxCreateDoubleScalar (zm);
}

static void
surfaces (const char *fn, int strip, int nlhs, mxArray *plhs[], int nrhs,
          const mxArray *prhs[])
{
  const mxArray *names = nrhs > (strip ? 5 : 4) ? prhs[strip ? 5 : 4] : NULL;
  job j = { 0 };
  size_t n, bad = HOLENT_NOINDEX;
  double reach = INFINITY, Lperp = 1;
  const char *name = strip ? "L" : "R", *what = strip ? "width" : "radius";
  const double *x = holent_gw_real (prhs[3], fn, name, &n);
  holent_strip_method method = HOLENT_STRIP_AUTO;
  if (strip)
    Lperp = holent_gw_scalar (prhs[4], fn, "length");
  if (strip && nrhs > 6)
    {
      static const char *mnames[] = { "auto", "exact", "series" };
      char m[16];
      int k;
      holent_gw_string (prhs[6], fn, "method", m, sizeof m);
      for (k = 0; k < 3 && strcmp (m, mnames[k]); k++)
        ;
      if (k == 3)
        holent_gw_raise (fn, HOLENT_EOPTION, "method", HOLENT_NOINDEX,
                         "must be \"auto\", \"exact\" or \"series\"");
      method = (holent_strip_method) k;
    }
  /* all Octave-side checks done: from here release before raising */
  holent_gw_hd_bg (prhs[2], fn, &j.bg);
  if (!strip)
    {
      holent_err e;
      static const char *const bgname[] = { "BG" };
      if (holent_ball_check (&j.bg, &e))
        {
          release (&j, 1);
          holent_gw_raise_err (fn, &e, bgname, 1);
        }
    }
  if (strip)
    j.sw = holent_strip_workspace_alloc ();
  else
    j.bw = holent_ball_workspace_alloc ();
  if (j.sw == NULL && j.bw == NULL)
    fail (&j, fn, HOLENT_ENOMEM, what, NULL, NULL, n, x, bad, reach);
  const holent_poll *poll = holent_gw_poll (fn);
  holent_strip_workspace_set_poll (j.sw, poll);
  holent_strip_workspace_set_method (j.sw, method);
  holent_ball_workspace_set_poll (j.bw, poll);
  for (int k = 0; k < 4; k++)
    j.out[k] = holent_gw_like (prhs[3]);
  j.out[5] = holent_gw_like (prhs[3]);
  double *S = mxGetPr (j.out[0]), *fin = mxGetPr (j.out[1]);
  double *del = mxGetPr (j.out[2]), *zs = mxGetPr (j.out[3]);
  int st = strip ? holent_strip_entropy (&j.bg, j.sw, Lperp, n, x, S, fin,
                                         del, zs, &bad, &reach)
                 : holent_ball_entropy (&j.bg, j.bw, n, x, S, fin, del, zs,
                                        &bad, &reach);
  if (st)
    fail (&j, fn, st, what, name, names, n, x, bad, reach);
  size_t nser = 0;
  double serr = holent_strip_series_error (j.sw, &nser);
  if (nlhs > 5)
    {
      double *acc = mxGetPr (j.out[5]);
      st = strip ? holent_strip_accuracy (&j.bg, j.sw, Lperp, n, x, fin, acc)
                 : holent_ball_accuracy (&j.bg, j.bw, n, x, fin, acc);
      if (st)
        fail (&j, fn, st, what, "accuracy", NULL, n, x, HOLENT_NOINDEX,
              reach);
    }
  holent_gw_poll_end ();
  j.out[4] = mxCreateDoubleScalar (reach);
  j.out[6] = mxCreateDoubleScalar (strip ? holent_strip_divergence (&j.bg,
                                                                    Lperp)
                                         : NAN);
  if (strip)
    {
      j.out[7] = mxCreateDoubleScalar ((double) nser);
      j.out[8] = mxCreateDoubleScalar (serr);
    }
  hand_out (&j, nlhs, plhs, strip ? 9 : 6);
  release (&j, 1);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  static const struct
  {
    const char *mode;
    int nin, nmax, nout;
  } modes[] = { { "strip", 5, 7, 9 }, { "ball", 4, 5, 6 },
                { "velocity", 3, 3, 3 }, { "check", 3, 3, 0 },
                { "vaidya", 6, 6, 6 } };
  char mode[16], fn[64] = "";
  size_t k, nm = sizeof modes / sizeof modes[0];
  holent_gw_init ();
  if (nrhs >= 2)
    holent_gw_string (prhs[1], "__holent_hd__", "FN", fn, sizeof fn);
  holent_gw_nargs (fn, nlhs, 9, nrhs, 3, 7);
  holent_gw_string (prhs[0], fn, "MODE", mode, sizeof mode);
  for (k = 0; k < nm; k++)
    if (strcmp (mode, modes[k].mode) == 0)
      break;
  if (k == nm)
    holent_gw_raise (fn, HOLENT_EINVAL, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s'", mode);
  holent_gw_nargs (fn, nlhs, modes[k].nout > 0 ? modes[k].nout : 0, nrhs,
                   modes[k].nin, modes[k].nmax);
  if (strcmp (mode, "check") == 0)
    {
      /* the background checked by one core call (its unpacking) */
      holent_hd_bg bg;
      holent_gw_hd_bg (prhs[2], fn, &bg);
      holent_hd_bg_free (&bg);
    }
  else if (strcmp (mode, "vaidya") == 0)
    vaidya (fn, nlhs, plhs, prhs);
  else if (strcmp (mode, "velocity") == 0)
    velocity (fn, nlhs, plhs, prhs[2]);
  else
    surfaces (fn, strcmp (mode, "strip") == 0, nlhs, plhs, nrhs, prhs);
}
