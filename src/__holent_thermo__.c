/* TH = __holent_thermo__ ("state", FN, PAIR, A, B, L, OPTS): BTZ
 * thermodynamics of the states given by the pair PAIR ("radii",
 * "T_Omega", "T_LR", "beta_LR" or "M_J") with values A, B on circles of
 * circumference L ([]: 2 pi ell) (A, B, L of one size, or scalars: the
 * wrapper broadcasts other shapes); c, G, ell from the options struct OPTS
 * (fields c, G, ell, each optional; Brown-Henneaux in the core).  TH is a
 * struct of arrays of that size (btz_dominates logical) and the scalars
 * c, G, ell.  Not in TH, to spare fresh result memory (doc/fast_paths.md):
 * the two fields the pair names itself (r_plus, r_minus; T, Omega; T_L,
 * T_R; M, J: the core echoes them exactly, so they are A and B) and the
 * circumference when L is given; the wrapper returns its own arrays.
 *
 * [T_HP, INFO] = __holent_thermo__ ("hawking_page", FN, PAIR, A, B, L,
 * OPTS): Hawking-Page temperatures and the comparison of the saddles at
 * the states of PAIR ("T_Omega", "beta_Omega", "beta_LR", or "Omega": B
 * is Omega and the comparison is made at T_HP).  INFO has fields T_hp,
 * Omega, circumference, c, T, F_btz, F_thermal_ads, btz_dominates.
 *
 * Errors name the argument of the public function FN and the first
 * offending element.  The states go through the core in slabs of
 * THERMO_SLAB, polled between (Ctrl-C, progress line).
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "holent_gw_array.h"
#include "holent_gw_poll.h"
#include "core/holent_slab.h"
#include "core/holent_thermo.h"

static const char GW[] = "__holent_thermo__";

static const struct
{
  const char *name;
  int pair;
  const char *a, *b;
} pairs[] = {
  { "radii", HOLENT_THERMO_RADII, "r_plus", "r_minus" },
  { "T_Omega", HOLENT_THERMO_T_OMEGA, "T", "Omega" },
  { "T_LR", HOLENT_THERMO_T_LR, "T_L", "T_R" },
  { "beta_LR", HOLENT_THERMO_BETA_LR, "beta_L", "beta_R" },
  { "M_J", HOLENT_THERMO_M_J, "M", "J" },
  { "beta_Omega", HOLENT_THERMO_BETA_OMEGA, "beta", "Omega" },
  { "Omega", -1, "", "Omega" },
};
#define NPAIRS (sizeof pairs / sizeof pairs[0])

/* Field names of TH, in the order of the table columns below.  C_Omega
   is not among them: it equals S (doc/btz_thermodynamics.md), and the
   wrapper shares that array instead of filling a copy.  */
static const char *fields[] = {
  "r_plus", "r_minus", "M", "J", "T", "Omega", "Omega_J", "T_L", "T_R",
  "S", "F", "C_J", "horizon_length", "L0", "Lbar0", "F_thermal_ads",
  "btz_dominates", "c", "G", "ell", "circumference"
};
#define NCOLS 16

/* Raise the error for a refused state: identifier by reason, message
 * naming the argument of FN and the element (1-based).  */
static void
state_fail (const char *fn, int status, int why, int pair, const char *an,
            const char *bn, size_t i, double a, double b, double L, double c)
{
  size_t k = i + 1;
  double vac = -c / 12 * (2 * M_PI / L); /* -1/(8G) on the circle 2 pi ell */
  switch (why)
    {
    case HOLENT_THERMO_NOT_FINITE:
      if (isnan (a) || isnan (b))
        holent_gw_raise (fn, HOLENT_ENAN, NULL, HOLENT_NOINDEX,
                         "%s must not be NaN (element %zu)",
                         isnan (a) ? an : bn, k);
      holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                       "%s must be finite (element %zu)",
                       isfinite (a) ? bn : an, k);
    case HOLENT_THERMO_PARAM:
      holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                       "circumference(%zu) = %g must be positive and "
                       "finite (a circle's circumference must be positive)",
                       k, L);
    case HOLENT_THERMO_RADIUS:
      holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                       "r_plus(%zu) = %g must be positive", k, a);
    case HOLENT_THERMO_INNER:
      holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                       "r_minus(%zu) = %g exceeds r_plus = %g in size "
                       "(r_plus is the outer horizon, |r_minus| <= r_plus)",
                       k, b, a);
    case HOLENT_THERMO_TEMPERATURE:
      if (strcmp (an, "T") == 0 || pair < 0)
        holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                         "T(%zu) = %g must be positive (T = 0 is "
                         "extremal: give T_L, T_R or M, J)", k, a);
      holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                       "T_L(%zu) = %g and T_R(%zu) = %g must be "
                       "nonnegative", k, a, k, b);
    case HOLENT_THERMO_OMEGA:
      if (pair == HOLENT_THERMO_BETA_LR)
        holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                         "beta_L(%zu) = %g and beta_R(%zu) = %g give "
                         "|Omega| = 1 to double precision: extremal, no "
                         "Hawking-Page temperature", k, a, k, b);
      holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                       "Omega(%zu) = %g must lie in (-1, 1): |Omega| "
                       ">= 1 is extremal or beyond", k, b);
    case HOLENT_THERMO_BETA:
      if (pair == HOLENT_THERMO_BETA_OMEGA)
        holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                         "beta(%zu) = %g must be positive", k, a);
      holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                       "beta_L(%zu) = %g and beta_R(%zu) = %g must be "
                       "positive (Inf: a sector at zero temperature)",
                       k, a, k, b);
    case HOLENT_THERMO_MASSLESS:
      holent_gw_raise (fn, HOLENT_EDOM, NULL, HOLENT_NOINDEX,
                       "%s(%zu) = %g, %s(%zu) = %g is the massless BTZ "
                       "geometry (M = J = 0): no horizon, not a black hole",
                       an, k, a, bn, k, b);
    case HOLENT_THERMO_BELOW_VACUUM:
      holent_gw_raise (fn, HOLENT_EBELOWVAC, NULL, HOLENT_NOINDEX,
                       "M(%zu) = %g is below the AdS3 vacuum mass "
                       "-1/(8G) = %g: no black hole and no regular geometry",
                       k, a, vac);
    case HOLENT_THERMO_CONICAL:
      holent_gw_raise (fn, HOLENT_ECONICAL, NULL, HOLENT_NOINDEX,
                       "M(%zu) = %g lies in [-1/(8G), 0) = [%g, 0), below "
                       "the BTZ threshold: a conical defect (point "
                       "particle; global AdS at -1/(8G)), not a black hole",
                       k, a, vac);
    case HOLENT_THERMO_OVERROTATING:
      holent_gw_raise (fn, HOLENT_EOVERROTATING, NULL, HOLENT_NOINDEX,
                       "J(%zu) = %g is over-rotating: |J| must not "
                       "exceed M ell = %g (M L/(2 pi) on a circle of "
                       "circumference L); no horizon", k, b,
                       a * L / (2 * M_PI));
    case HOLENT_THERMO_RANGE:
      holent_gw_raise (fn, HOLENT_ERANGE, NULL, HOLENT_NOINDEX,
                       "the state of element %zu (%s = %g, %s = %g, "
                       "circumference = %g) overflows double precision",
                       k, an, a, bn, b, L);
    default:
      holent_gw_raise (fn, status, an, i, NULL);
    }
}

/* The common inputs of both modes: pair, A, B, L of one size n (or
   scalars), c, G, ell.  */
typedef struct
{
  int k;                      /* row of pairs[] */
  const double *a, *b, *L;    /* L NULL: 2 pi ell */
  size_t n, step[3];
  const mxArray *shape;       /* an input of n elements */
  double u[3];                /* c, G, ell */
} inputs;

static void
unpack (const char *fn, const mxArray *prhs[], inputs *in)
{
  char pname[16];
  size_t na, nb, nL = 1;
  holent_gw_string (prhs[2], fn, "PAIR", pname, sizeof pname);
  for (in->k = 0; in->k < (int) NPAIRS; in->k++)
    if (strcmp (pname, pairs[in->k].name) == 0)
      break;
  if (in->k == (int) NPAIRS)
    holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                     "unknown PAIR '%s'", pname);
  const char *an = pairs[in->k].pair < 0 ? "A" : pairs[in->k].a;
  in->a = holent_gw_real (prhs[3], fn, an, &na);
  in->b = holent_gw_real (prhs[4], fn, pairs[in->k].b, &nb);
  in->L = NULL;
  if (!mxIsEmpty (prhs[5]) || !mxIsDouble (prhs[5]))
    in->L = holent_gw_real (prhs[5], fn, "circumference", &nL);
  if (pairs[in->k].pair < 0)
    na = 1;  /* A is not used */
  /* One size n, or a scalar repeated (step 0).  */
  size_t n = na > nb ? na : nb;
  n = n > nL ? n : nL;
  if (na == 0 || nb == 0 || nL == 0)
    n = 0;
  if ((na != n && na != 1) || (nb != n && nb != 1) || (nL != n && nL != 1))
    holent_gw_raise (fn, HOLENT_ESIZE, NULL, HOLENT_NOINDEX,
                     "%s, %s and circumference must have one size or be "
                     "scalars", an, pairs[in->k].b);
  in->n = n;
  in->shape = nb == n ? prhs[4] : (na == n && pairs[in->k].pair >= 0)
                                  ? prhs[3] : prhs[5];
  in->step[0] = na == n ? 1 : 0;
  in->step[1] = nb == n ? 1 : 0;
  in->step[2] = nL == n ? 1 : 0;
  holent_gw_units (prhs[6], fn, &in->u[0], &in->u[1], &in->u[2]);
}

static mxArray *
like (const mxArray *shape)
{
  /* every element is written by the core or the array is dropped; no
     copy on return (holent_gw_array.h) */
  return holent_gw_result_like (shape);
}

static void
fail (const char *fn, const inputs *in, int st, int why, size_t bad)
{
  double ab = pairs[in->k].pair < 0 ? 0.0 : in->a[bad * in->step[0]], bb = in->b[bad * in->step[1]];
  double Lb = in->L ? in->L[bad * in->step[2]] : 2 * M_PI * in->u[2];
  state_fail (fn, st, why, pairs[in->k].pair, pairs[in->k].a,
              pairs[in->k].b, bad, ab, bb, Lb, in->u[0]);
}

/* States per slab (about 0.1 us a state and 14 result columns of
   fresh memory): hundredths of a second.  */
#define THERMO_SLAB ((size_t) 1 << 18)

/* One slab of either mode: the inputs and every result column offset by
   the slab's first state.  */
typedef struct
{
  const inputs *in;
  int hp;                       /* 1: hawking_page, else state */
  holent_thermo_table t;
  double *col[7];
  unsigned char *dom;
  size_t bad;
  int why;
} job;

#define AT(p, i0) ((p) ? (p) + (i0) : NULL)

static int
slab (void *ctx, size_t i0, size_t m)
{
  job *j = ctx;
  const inputs *in = j->in;
  const double *a = in->a + i0 * in->step[0], *b = in->b + i0 * in->step[1];
  const double *L = in->L ? in->L + i0 * in->step[2] : NULL;
  size_t bad = 0;
  int st;
  if (j->hp)
    st = holent_thermo_hp_compare (in->u[0], in->u[2], pairs[in->k].pair, m,
                                   a, b, L, in->step, AT (j->col[0], i0),
                                   AT (j->col[1], i0), AT (j->col[4], i0),
                                   AT (j->col[5], i0), AT (j->col[6], i0),
                                   AT (j->dom, i0), &bad, &j->why);
  else
    {
      const holent_thermo_table *t = &j->t;
      holent_thermo_table u = {
        AT (t->r_plus, i0), AT (t->r_minus, i0), AT (t->M, i0),
        AT (t->J, i0), AT (t->T, i0), AT (t->Omega, i0),
        AT (t->Omega_J, i0), AT (t->T_L, i0), AT (t->T_R, i0),
        AT (t->S, i0), AT (t->F, i0), AT (t->C_Omega, i0),
        AT (t->C_J, i0), AT (t->horizon_length, i0), AT (t->L0, i0),
        AT (t->Lbar0, i0), AT (t->F_thermal_ads, i0),
        AT (t->btz_dominates, i0)
      };
      st = holent_thermo_states (in->u[0], in->u[2],
                                 (holent_thermo_pair) pairs[in->k].pair, m,
                                 a, b, L, in->step, &u, &bad, &j->why);
    }
  j->bad = i0 + bad;
  return st;
}

static void
do_state (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[],
          const char *fn)
{
  inputs in;
  holent_gw_nargs (fn, nlhs, 1, nrhs, 7, 7);
  unpack (fn, prhs, &in);
  if (pairs[in.k].pair < 0 || pairs[in.k].pair == HOLENT_THERMO_BETA_OMEGA)
    holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                     "PAIR '%s' is for hawking_page", pairs[in.k].name);
  /* The fields of the pair itself, left to the wrapper (core echo).  */
  const char *pa = pairs[in.k].pair == HOLENT_THERMO_BETA_LR ? ""
                                                              : pairs[in.k].a;
  const char *pb = pairs[in.k].pair == HOLENT_THERMO_BETA_LR ? ""
                                                              : pairs[in.k].b;
  const char *names[sizeof fields / sizeof fields[0]];
  int nf = 0;
  for (size_t f = 0; f < sizeof fields / sizeof fields[0]; f++)
    if (strcmp (fields[f], pa) && strcmp (fields[f], pb)
        && !(in.L && strcmp (fields[f], "circumference") == 0))
      names[nf++] = fields[f];
  mxArray *s = mxCreateStructMatrix (1, 1, nf, names);
  double *col[NCOLS];
  for (size_t f = 0; f < NCOLS; f++)
    {
      col[f] = NULL;
      if (!strcmp (fields[f], pa) || !strcmp (fields[f], pb))
        continue;
      mxArray *x = like (in.shape);
      mxSetField (s, 0, fields[f], x);
      col[f] = mxGetPr (x);
    }
  mxArray *dom = mxCreateLogicalArray (mxGetNumberOfDimensions (in.shape),
                                       mxGetDimensions (in.shape));
  mxSetField (s, 0, "btz_dominates", dom);
  for (int u = 0; u < 3; u++)
    mxSetField (s, 0, fields[NCOLS + 1 + u], mxCreateDoubleScalar (in.u[u]));
  if (!in.L)
    mxSetField (s, 0, "circumference",
                mxCreateDoubleScalar (2 * M_PI * in.u[2]));
  holent_thermo_table t = {
    col[0], col[1], col[2], col[3], col[4], col[5], col[6], col[7], col[8],
    col[9], col[10], NULL, col[11], col[12], col[13], col[14], col[15],
    (unsigned char *) mxGetLogicals (dom)
  };
  job j = { &in, 0, t, { NULL }, NULL, 0, HOLENT_THERMO_OK };
  int st = holent_slab_run (in.n, THERMO_SLAB, slab, &j, holent_gw_poll (fn));
  holent_gw_poll_end ();
  if (st)
    {
      mxDestroyArray (s);
      fail (fn, &in, st, j.why, j.bad);
    }
  plhs[0] = s;
}

static void
do_hawking_page (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[],
                 const char *fn)
{
  static const char *f[] = { "T_hp", "Omega", "circumference", "c", "T",
                             "F_btz", "F_thermal_ads", "btz_dominates" };
  inputs in;
  holent_gw_nargs (fn, nlhs, 2, nrhs, 7, 7);
  unpack (fn, prhs, &in);
  if (pairs[in.k].pair >= 0 && pairs[in.k].pair != HOLENT_THERMO_T_OMEGA
      && pairs[in.k].pair != HOLENT_THERMO_BETA_OMEGA
      && pairs[in.k].pair != HOLENT_THERMO_BETA_LR)
    holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                     "PAIR '%s' is not for hawking_page", pairs[in.k].name);
  mxArray *s = mxCreateStructMatrix (1, 1, 8, f);
  double *col[7];
  for (int j = 0; j < 7; j++)
    {
      mxArray *x = j == 3 ? mxCreateDoubleScalar (in.u[0]) : like (in.shape);
      mxSetField (s, 0, f[j], x);
      col[j] = mxGetPr (x);
    }
  mxArray *dom = mxCreateLogicalArray (mxGetNumberOfDimensions (in.shape),
                                       mxGetDimensions (in.shape));
  mxSetField (s, 0, "btz_dominates", dom);
  job j = { &in, 1, { NULL }, { col[0], col[1], NULL, NULL, col[4], col[5],
                                 col[6] },
            (unsigned char *) mxGetLogicals (dom), 0, HOLENT_THERMO_OK };
  int st = holent_slab_run (in.n, THERMO_SLAB, slab, &j, holent_gw_poll (fn));
  holent_gw_poll_end ();
  if (st)
    {
      mxDestroyArray (s);
      fail (fn, &in, st, j.why, j.bad);
    }
  /* the circumference of every point */
  for (size_t i = 0; i < in.n; i++)
    col[2][i] = in.L ? in.L[i * in.step[2]] : 2 * M_PI * in.u[2];
  plhs[0] = mxDuplicateArray (mxGetField (s, 0, "T_hp"));
  if (nlhs > 1)
    plhs[1] = s;
  else
    mxDestroyArray (s);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16], fn[64];
  holent_gw_init ();
  holent_gw_nargs (GW, nlhs, 2, nrhs, 2, 7);
  holent_gw_string (prhs[0], GW, "MODE", mode, sizeof mode);
  holent_gw_string (prhs[1], GW, "FN", fn, sizeof fn);
  if (strcmp (mode, "state") == 0)
    do_state (nlhs, plhs, nrhs, prhs, fn);
  else if (strcmp (mode, "hawking_page") == 0)
    do_hawking_page (nlhs, plhs, nrhs, prhs, fn);
  else
    holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                     "unknown MODE '%s' of %s", mode, GW);
}
