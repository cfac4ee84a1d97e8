/* TH = __holent_thermo__ ("state", PAIR, A, B, L, C, ELL [, CALLER]): BTZ
 * thermodynamics of the states given by the pair PAIR ("radii",
 * "T_Omega", "T_LR", "beta_LR" or "M_J") with values A, B on circles of
 * circumference L (A, B, L of one size, or scalars: the wrapper
 * broadcasts other shapes).  TH is a struct of arrays of that size
 * (btz_dominates logical).
 *
 * T_HP = __holent_thermo__ ("hawking_page", OMEGA, L): Hawking-Page
 * temperatures (OMEGA, L of one size).
 *
 * Errors name the argument of the public function (CALLER, default
 * btz_thermodynamics; hawking_page) and the first offending element.  GPL-3.0-or-later.  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"
#include "core/holent_thermo.h"

static const char FN[] = "__holent_thermo__";

static const struct
{
  const char *name;
  holent_thermo_pair pair;
  const char *a, *b;
} pairs[] = {
  { "radii", HOLENT_THERMO_RADII, "r_plus", "r_minus" },
  { "T_Omega", HOLENT_THERMO_T_OMEGA, "T", "Omega" },
  { "T_LR", HOLENT_THERMO_T_LR, "T_L", "T_R" },
  { "beta_LR", HOLENT_THERMO_BETA_LR, "beta_L", "beta_R" },
  { "M_J", HOLENT_THERMO_M_J, "M", "J" },
};

/* Field names of TH, in the order of the table columns below.  C_Omega
   is not among them: it equals S (doc/btz_thermodynamics.md), and the
   wrapper shares that array instead of filling a copy.  */
static const char *fields[] = {
  "r_plus", "r_minus", "M", "J", "T", "Omega", "Omega_J", "T_L", "T_R",
  "S", "F", "C_J", "horizon_length", "L0", "Lbar0", "F_thermal_ads",
  "btz_dominates"
};
#define NFIELDS (sizeof fields / sizeof fields[0])

/* Raise the error for a refused state: id by reason, message naming the
 * argument of btz_thermodynamics and the element (1-based).  */
static void
state_fail (const char *P, int status, int why, const char *an,
            const char *bn, size_t i, double a, double b, double L, double c)
{
  size_t k = i + 1;
  double vac = -c / 12 * (2 * M_PI / L); /* -1/(8G) on the circle 2 pi ell */
  switch (why)
    {
    case HOLENT_THERMO_NOT_FINITE:
      if (isnan (a) || isnan (b))
        mexErrMsgIdAndTxt ("holent:nan", "%s: %s must not be NaN (element %zu)",
                           P, isnan (a) ? an : bn, k);
      mexErrMsgIdAndTxt ("holent:domain", "%s: %s must be finite (element %zu)",
                         P, isfinite (a) ? bn : an, k);
      break;
    case HOLENT_THERMO_PARAM:
      mexErrMsgIdAndTxt ("holent:domain",
                         "%s: circumference must be positive and finite "
                         "(element %zu)", P, k);
      break;
    case HOLENT_THERMO_RADIUS:
      mexErrMsgIdAndTxt ("holent:domain",
                         "%s: r_plus(%zu) = %g must be positive", P, k, a);
      break;
    case HOLENT_THERMO_INNER:
      mexErrMsgIdAndTxt ("holent:domain",
                         "%s: r_minus(%zu) = %g exceeds r_plus = %g in size "
                         "(r_plus is the outer horizon, |r_minus| <= r_plus)",
                         P, k, b, a);
      break;
    case HOLENT_THERMO_TEMPERATURE:
      if (strcmp (an, "T") == 0)
        mexErrMsgIdAndTxt ("holent:domain",
                           "%s: T(%zu) = %g must be positive (T = 0 is "
                           "extremal: give T_L, T_R or M, J)", P, k, a);
      mexErrMsgIdAndTxt ("holent:domain",
                         "%s: T_L(%zu) = %g and T_R(%zu) = %g must be "
                         "nonnegative", P, k, a, k, b);
      break;
    case HOLENT_THERMO_OMEGA:
      mexErrMsgIdAndTxt ("holent:domain",
                         "%s: Omega(%zu) = %g must lie in (-1, 1): |Omega| "
                         ">= 1 is extremal or beyond", P, k, b);
      break;
    case HOLENT_THERMO_BETA:
      mexErrMsgIdAndTxt ("holent:domain",
                         "%s: beta_L(%zu) = %g and beta_R(%zu) = %g must be "
                         "positive (Inf: a sector at zero temperature)",
                         P, k, a, k, b);
      break;
    case HOLENT_THERMO_MASSLESS:
      mexErrMsgIdAndTxt ("holent:domain",
                         "%s: %s(%zu) = %g, %s(%zu) = %g is the massless BTZ "
                         "geometry (M = J = 0): no horizon, not a black hole",
                         P, an, k, a, bn, k, b);
      break;
    case HOLENT_THERMO_BELOW_VACUUM:
      mexErrMsgIdAndTxt ("holent:below_vacuum",
                         "%s: M(%zu) = %g is below the AdS3 vacuum mass "
                         "-1/(8G) = %g: no black hole and no regular geometry",
                         P, k, a, vac);
      break;
    case HOLENT_THERMO_CONICAL:
      mexErrMsgIdAndTxt ("holent:conical_defect",
                         "%s: M(%zu) = %g lies in [-1/(8G), 0) = [%g, 0), below "
                         "the BTZ threshold: a conical defect (point "
                         "particle; global AdS at -1/(8G)), not a black hole",
                         P, k, a, vac);
      break;
    case HOLENT_THERMO_OVERROTATING:
      mexErrMsgIdAndTxt ("holent:overrotating",
                         "%s: J(%zu) = %g is over-rotating: |J| must not "
                         "exceed M ell = %g (M L/(2 pi) on a circle of "
                         "circumference L); no horizon", P, k, b,
                         a * L / (2 * M_PI));
      break;
    case HOLENT_THERMO_RANGE:
      mexErrMsgIdAndTxt ("holent:range",
                         "%s: the state of element %zu (%s = %g, %s = %g) "
                         "overflows double precision", P, k, an, a, bn, b);
      break;
    default:
      holent_gw_fail (status, P, "state", i);
    }
}

static void
do_state (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char pname[16], caller[40] = "btz_thermodynamics";
  size_t na, nb, nL, k, np = sizeof pairs / sizeof pairs[0];
  holent_gw_nargs (FN, nlhs, 1, nrhs, 7, 8);
  if (nrhs > 7)
    holent_gw_string (prhs[7], FN, "CALLER", caller, sizeof caller);
  holent_gw_string (prhs[1], FN, "PAIR", pname, sizeof pname);
  for (k = 0; k < np; k++)
    if (strcmp (pname, pairs[k].name) == 0)
      break;
  if (k == np)
    mexErrMsgIdAndTxt ("holent:invalid", "unknown PAIR '%s'", pname);
  const double *a = holent_gw_real (prhs[2], FN, pairs[k].a, &na);
  const double *b = holent_gw_real (prhs[3], FN, pairs[k].b, &nb);
  const double *L = holent_gw_real (prhs[4], FN, "circumference", &nL);
  /* One size n, or a scalar repeated (step 0); the result takes the
     shape of the first argument with n elements.  */
  size_t n = na > nb ? na : nb;
  n = n > nL ? n : nL;
  if (na == 0 || nb == 0 || nL == 0)
    n = 0;
  if ((na != n && na != 1) || (nb != n && nb != 1) || (nL != n && nL != 1))
    mexErrMsgIdAndTxt ("holent:size", "%s, %s and circumference must "
                       "have one size or be scalars", pairs[k].a,
                       pairs[k].b);
  const mxArray *shape = na == n ? prhs[2] : nb == n ? prhs[3] : prhs[4];
  size_t step[3] = { na == n ? 1 : 0, nb == n ? 1 : 0, nL == n ? 1 : 0 };
  double c = holent_gw_scalar (prhs[5], FN, "c");
  double ell = holent_gw_scalar (prhs[6], FN, "ell");

  mxArray *s = mxCreateStructMatrix (1, 1, (int) NFIELDS, fields);
  double *col[NFIELDS - 1];
  for (size_t f = 0; f + 1 < NFIELDS; f++)
    {
      /* every element is written by the core or the array is dropped */
      mxArray *x = mxCreateUninitNumericArray (mxGetNumberOfDimensions (shape),
                                               mxGetDimensions (shape),
                                               mxDOUBLE_CLASS, mxREAL);
      mxSetField (s, 0, fields[f], x);
      col[f] = mxGetPr (x);
    }
  mxArray *dom = mxCreateLogicalArray (mxGetNumberOfDimensions (shape),
                                       mxGetDimensions (shape));
  mxSetField (s, 0, "btz_dominates", dom);
  holent_thermo_table t = {
    col[0], col[1], col[2], col[3], col[4], col[5], col[6], col[7], col[8],
    col[9], col[10], NULL, col[11], col[12], col[13], col[14], col[15],
    (unsigned char *) mxGetLogicals (dom)
  };
  size_t bad = 0;
  int why = HOLENT_THERMO_OK;
  int st = holent_thermo_states (c, ell, pairs[k].pair, n, a, b, L, step,
                                 &t, &bad, &why);
  if (st)
    {
      if (why == HOLENT_THERMO_PARAM && (!(c > 0) || !(ell > 0)
                                         || !isfinite (c) || !isfinite (ell)))
        {
          mxDestroyArray (s);
          mexErrMsgIdAndTxt ("holent:domain", "%s: c and ell must be "
                             "positive and finite", caller);
        }
      double ab = a[bad * step[0]], bb = b[bad * step[1]];
      double Lb = L[bad * step[2]];
      mxDestroyArray (s);
      state_fail (caller, st, why, pairs[k].a, pairs[k].b, bad, ab, bb, Lb, c);
    }
  plhs[0] = s;
}

static void
do_hawking_page (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  static const char P[] = "hawking_page";
  size_t nO, nL, bad = 0;
  int why = HOLENT_THERMO_OK;
  holent_gw_nargs (FN, nlhs, 1, nrhs, 3, 3);
  const double *Om = holent_gw_real (prhs[1], FN, "Omega", &nO);
  const double *L = holent_gw_real (prhs[2], FN, "circumference", &nL);
  if (nO != nL)
    mexErrMsgIdAndTxt ("holent:size", "Omega and circumference must "
                       "have one size");
  plhs[0] = holent_gw_like (prhs[1]);
  int st = holent_thermo_hawking_page (nO, Om, L, mxGetPr (plhs[0]), &bad,
                                       &why);
  if (st == HOLENT_SUCCESS)
    return;
  size_t k = bad + 1;
  switch (why)
    {
    case HOLENT_THERMO_NOT_FINITE:
      mexErrMsgIdAndTxt ("holent:nan", "%s: Omega must not be NaN (element "
                         "%zu)", P, k);
      break;
    case HOLENT_THERMO_PARAM:
      mexErrMsgIdAndTxt ("holent:domain", "%s: circumference(%zu) = %g must "
                         "be positive and finite", P, k, L[bad]);
      break;
    case HOLENT_THERMO_OMEGA:
      mexErrMsgIdAndTxt ("holent:domain", "%s: Omega(%zu) = %g must lie in "
                         "(-1, 1)", P, k, Om[bad]);
      break;
    default:
      holent_gw_fail (st, P, "Omega", bad);
    }
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  char mode[16];
  holent_gw_init ();
  if (nrhs < 1)
    mexErrMsgIdAndTxt ("holent:nargs", "expected a MODE");
  holent_gw_string (prhs[0], FN, "MODE", mode, sizeof mode);
  if (strcmp (mode, "state") == 0)
    do_state (nlhs, plhs, nrhs, prhs);
  else if (strcmp (mode, "hawking_page") == 0)
    do_hawking_page (nlhs, plhs, nrhs, prhs);
  else
    mexErrMsgIdAndTxt ("holent:invalid", "unknown MODE '%s'", mode);
}
