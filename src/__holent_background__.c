/* The one gateway that builds background structs from the core object.
 *
 * BG = __holent_background__ ("ads3", FN, STATE, BOUNDARY, OPTS): the
 * AdS3 background of ads3_background from its options struct OPTS (the
 * fields given, named as the options); built and checked by
 * holent_bg3_init, packed field by field.  Warns holent:cutoff when the
 * cutoff is not small against the scales of the state.
 *
 * OK = __holent_background__ ("check", FN, BG): true when BG is a
 * background struct made by ads3_background (the unpacker every gateway
 * uses, for wrappers that read BG's fields before their gateway call;
 * BCFT backgrounds are left to the unpacker of __holent_bcft__).
 *
 * [C, G, ELL] = __holent_background__ ("units", FN, OPTS): Brown-Henneaux
 * c = 3 ell/(2G) from the options c, G, ell given in OPTS.
 *
 * Errors name FN (the public function).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdio.h>
#include <string.h>
#include <strings.h>
#include "holent_gw.h"

static const char GW[] = "__holent_background__";

/* Octave's warning (ID, "FN: ..."), without the gateway's name.  */
static void
warn (const char *id, const char *msg)
{
  mxArray *a[3] = { mxCreateString (id), mxCreateString ("%s"),
                    mxCreateString (msg) };
  mexCallMATLAB (0, NULL, 3, a, "warning");
  for (int k = 0; k < 3; k++)
    mxDestroyArray (a[k]);
}

/* A word of CHOICES (case-insensitive) or holent:option naming NAME.  */
static int
choose (const mxArray *a, const char *fn, const char *name,
        const char *(*names) (int), int n)
{
  char w[32], list[160] = "";
  if (!mxIsChar (a) || mxGetM (a) > 1)
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "%s must be a string", name);
  if (mxGetN (a) + 1 > sizeof w || mxGetString (a, w, sizeof w) != 0)
    snprintf (w, sizeof w, "%s", "(a long string)");
  for (int k = 0; k < n; k++)
    {
      if (strcasecmp (w, names (k)) == 0)
        return k;
      snprintf (list + strlen (list), sizeof list - strlen (list), "%s%s",
                k ? ", " : "", names (k));
    }
  holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                   "unknown %s '%s' (expected one of: %s)", name, w, list);
}

static const char *
boundary_name (int k)
{
  return k ? "circle" : "line";
}

static const char *
state_name (int k)
{
  return holent_bg3_state_name (k);
}

/* Raise the core's refusal.  A refusal of the state as a whole (an
   overflow, say) lists the numbers given, so the user sees which.  */
static void
refuse (const char *fn, const holent_bg3_spec *sp, const holent_err *e)
{
  char given[400] = "";
  size_t k = 0;
  if (e->arg < 0 && (e->status == HOLENT_EDOM || e->status == HOLENT_ERANGE))
    for (int p = 0; p < HOLENT_BG3_SADDLE && k < sizeof given; p++)
      if (sp->given & (1u << p))
        k += (size_t) snprintf (given + k, sizeof given - k, "%s%s = %g",
                                k ? ", " : "", holent_bg3_param_name (p),
                                sp->value[p]);
  if (k > 0)
    holent_gw_raise (fn, e->status, NULL, HOLENT_NOINDEX, "%s: %s", given,
                     e->reason);
  holent_gw_raise (fn, e->status, NULL, HOLENT_NOINDEX, "%s", e->reason);
}

static mxArray *
pack (const holent_bg3 *b, const char *boundary)
{
  static const char *f[] = {
    "state", "boundary", "bulk", "c", "G", "ell", "cutoff", "circumference",
    "beta", "T", "beta_L", "beta_R", "T_L", "T_R", "Omega", "alpha", "h",
    "saddle", "horizon", "pure", "S_BH", "entropy_density", "r_plus",
    "r_minus", "M", "J", "L0", "Lbar0"
  };
  const double num[] = {
    b->c, b->G, b->ell, b->cutoff, b->L, b->beta, b->T, b->beta_L,
    b->beta_R, b->T_L, b->T_R, b->Omega, b->alpha, b->h
  };
  const double num2[] = {
    b->S_BH, b->s_density, b->r_plus, b->r_minus, b->M, b->J, b->L0,
    b->Lbar0
  };
  int nf = (int) (sizeof f / sizeof f[0]), k = 3;
  mxArray *s = mxCreateStructMatrix (1, 1, nf, f);
  mxSetFieldByNumber (s, 0, 0, mxCreateString (holent_bg3_state_name (b->state)));
  mxSetFieldByNumber (s, 0, 1, mxCreateString (boundary));
  mxSetFieldByNumber (s, 0, 2, mxCreateString (b->has_bulk
                                               ? holent_bg3_bulk_name (b->bulk)
                                               : ""));
  for (size_t j = 0; j < sizeof num / sizeof num[0]; j++)
    mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (num[j]));
  mxSetFieldByNumber (s, 0, k++, mxCreateString (holent_bg3_saddle_name (b->saddle)));
  mxSetFieldByNumber (s, 0, k++, mxCreateLogicalScalar (b->horizon != 0));
  mxSetFieldByNumber (s, 0, k++, mxCreateLogicalScalar (b->pure != 0));
  for (size_t j = 0; j < sizeof num2 / sizeof num2[0]; j++)
    mxSetFieldByNumber (s, 0, k++, mxCreateDoubleScalar (num2[j]));
  return s;
}

static void
do_ads3 (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[],
         const char *fn)
{
  holent_bg3_spec sp;
  holent_bg3 b;
  holent_err e;
  holent_gw_nargs (fn, nlhs, 1, nrhs, 5, 5);
  memset (&sp, 0, sizeof sp);
  sp.state = (holent_bg3_state) choose (prhs[2], fn, "STATE", state_name,
                                        HOLENT_BG3_NSTATE);
  sp.circle = choose (prhs[3], fn, "BOUNDARY", boundary_name, 2);
  holent_gw_bg3_opts (prhs[4], fn, &sp);
  if (holent_bg3_init (&b, &sp, &e))
    refuse (fn, &sp, &e);
  if (b.cutoff_large)
    {
      char msg[200];
      snprintf (msg, sizeof msg, "%s: cutoff %g is not small against the "
                "smallest scale %g of the state", fn, b.cutoff, b.scale);
      warn ("holent:cutoff", msg);
    }
  plhs[0] = pack (&b, boundary_name (sp.circle));
}

static void
do_units (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[],
          const char *fn)
{
  double u[3];
  holent_gw_nargs (fn, nlhs, 3, nrhs, 3, 3);
  holent_gw_units (prhs[2], fn, &u[0], &u[1], &u[2]);
  for (int k = 0; k < 3; k++)
    plhs[k] = mxCreateDoubleScalar (u[k]);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], fn[64];
  holent_gw_init ();
  holent_gw_nargs (GW, nlhs, 3, nrhs, 2, 5);
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  if (strcmp (mode, "ads3") == 0)
    do_ads3 (nlhs, plhs, nrhs, prhs, fn);
  else if (strcmp (mode, "units") == 0)
    do_units (nlhs, plhs, nrhs, prhs, fn);
  else if (strcmp (mode, "check") == 0)
    {
      holent_bg3 b;
      char st[16] = "";
      holent_gw_nargs (fn, nlhs, 1, nrhs, 3, 3);
      const mxArray *f = mxIsStruct (prhs[2])
                         && mxGetNumberOfElements (prhs[2]) == 1
                         ? mxGetField (prhs[2], 0, "state") : NULL;
      if (f != NULL && mxIsChar (f) && mxGetN (f) < sizeof st)
        mxGetString (f, st, sizeof st);
      /* BCFT backgrounds: __holent_bcft__'s unpacker checks them */
      if (strcmp (st, "bcft") != 0 && strcmp (st, "bcft_tfd") != 0)
        holent_gw_bg3 (prhs[2], fn, &b);
      plhs[0] = mxCreateLogicalScalar (1);
    }
  else
    holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                     "unknown MODE '%s' of %s", mode, GW);
}
