/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Transition points (gateway of holent_transition).
 *
 *   [X, FOUND] = __holent_transition__ ("plateau", FN, BG)
 *   [X, FOUND] = __holent_transition__ ("separation", FN, BG, L1, L2)
 *   [X, FOUND] = __holent_transition__ ("hawking_page", FN, OMEGA, L)
 *   [X, FOUND] = __holent_transition__ ("strip_pair", FN, HDBG, L1, L2)
 * L1, L2 (OMEGA, L) arrays of one size; X, FOUND of that size.  FN, the
 * public function's name, starts every message.  One root find per
 * element, TR_SLAB of them between two polls (Ctrl-C, progress line).  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_hd.h"
#include "holent_gw_poll.h"
#include "core/holent_slab.h"
#include "core/holent_transition.h"

static const char GW[] = "__holent_transition__";

enum { PLATEAU, SEPARATION, HAWKING_PAGE, STRIP_PAIR };

/* Elements per slab: a root find takes 1 us to a few ms.  */
#define TR_SLAB 8

typedef struct
{
  int op;
  const double *a, *b;
  const holent_geo_bg *bg;
  const holent_hd_bg *hd;
  holent_strip_workspace *w;
  double *x, *f;
  size_t bad;
} job;

static int
slab (void *ctx, size_t i0, size_t m)
{
  job *j = ctx;
  holent_transition_result r;
  int st = HOLENT_SUCCESS;
  for (size_t i = i0; i < i0 + m && !st; i++)
    {
      switch (j->op)
        {
        case PLATEAU:
          st = holent_transition_plateau (j->bg, &r);
          break;
        case SEPARATION:
          st = holent_transition_separation (j->bg, j->a[i], j->b[i], &r);
          break;
        case HAWKING_PAGE:
          st = holent_transition_hawking_page (j->a[i], j->b[i], &r);
          break;
        default:
          st = holent_transition_strip_pair (j->hd, j->w, j->a[i], j->b[i],
                                             &r);
          break;
        }
      j->x[i] = r.x;
      j->f[i] = r.found;
      j->bad = i;
    }
  return st;
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  static const char *modes[] = { "plateau", "separation", "hawking_page",
                                 "strip_pair" };
  /* inputs after MODE and FN; the names of the two arrays */
  static const int nin[] = { 1, 3, 2, 3 };
  static const char *an[][2] = { { NULL, NULL }, { "L1", "L2" },
                                 { "Omega", "L" }, { "L1", "L2" } };
  char mode[16], fn[64];
  int op;
  size_t n = 1, n2 = 1;
  holent_gw_init ();
  holent_gw_nargs (GW, nlhs, 2, nrhs, 3, 5);
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  for (op = 0; op < 4; op++)
    if (strcmp (mode, modes[op]) == 0)
      break;
  if (op == 4)
    holent_gw_raise (fn, HOLENT_EOPTION, "MODE", HOLENT_NOINDEX,
                     "unknown mode '%s'", mode);
  holent_gw_nargs (fn, nlhs, 2, nrhs, 2 + nin[op], 2 + nin[op]);
  const mxArray *shape = NULL;
  const double *a = NULL, *b = NULL;
  if (op != PLATEAU)
    {
      int k = nrhs - 2;
      a = holent_gw_real (prhs[k], fn, an[op][0], &n);
      b = holent_gw_real (prhs[k + 1], fn, an[op][1], &n2);
      if (n != n2)
        holent_gw_raise (fn, HOLENT_ESIZE, NULL, HOLENT_NOINDEX,
                         "%s and %s must have one size", an[op][0],
                         an[op][1]);
      shape = prhs[k];
    }
  holent_geo_bg bg;
  holent_hd_bg hd;
  holent_strip_workspace *w = NULL;
  if (op == PLATEAU || op == SEPARATION)
    holent_gw_bg (prhs[2], fn, &bg);
  else if (op == STRIP_PAIR)
    {
      holent_gw_hd_bg (prhs[2], fn, &hd);
      w = holent_strip_workspace_alloc ();
      if (w == NULL)
        {
          holent_hd_bg_free (&hd);
          holent_gw_raise (fn, HOLENT_ENOMEM, NULL, HOLENT_NOINDEX, NULL);
        }
    }
  mxArray *X = shape ? holent_gw_like (shape) : mxCreateDoubleScalar (0);
  mxArray *F = shape ? holent_gw_like (shape) : mxCreateDoubleScalar (0);
  job j = { op, a, b, &bg, &hd, w, mxGetPr (X), mxGetPr (F),
            HOLENT_NOINDEX };
  int st = holent_slab_run (n, TR_SLAB, slab, &j, holent_gw_poll (fn));
  size_t bad = j.bad;
  holent_gw_poll_end ();
  if (op == STRIP_PAIR)
    {
      holent_strip_workspace_free (w);
      holent_hd_bg_free (&hd);
    }
  if (st)
    {
      mxDestroyArray (X);
      mxDestroyArray (F);
      if (st == HOLENT_EUNSUP)
        {
          char bulk[32] = "this background";
          const mxArray *b = mxGetField (prhs[2], 0, "bulk");
          if (b != NULL && mxIsChar (b))
            mxGetString (b, bulk, sizeof bulk);
          if (op == PLATEAU)
            holent_gw_raise (fn, st, NULL, HOLENT_NOINDEX, "the plateau "
                             "needs a circle with a horizon (BG is %s)",
                             bulk);
          if (op == SEPARATION)
            holent_gw_raise (fn, st, NULL, HOLENT_NOINDEX, "separation "
                             "transitions (mutual information, wedge) are "
                             "available on lines and on circles without a "
                             "horizon or a defect, not in %s", bulk);
          holent_gw_raise (fn, st, "BG", HOLENT_NOINDEX, "this transition "
                           "is not available for this background");
        }
      holent_gw_raise (fn, st, shape ? an[op][0] : "BG",
                       shape ? bad : HOLENT_NOINDEX, NULL);
    }
  plhs[0] = X;
  if (nlhs > 1)
    plhs[1] = F;
  else
    mxDestroyArray (F);
}
