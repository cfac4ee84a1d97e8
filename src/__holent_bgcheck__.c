/* __holent_bgcheck__ (BG): return nothing when BG is a well-formed
 * background struct made by ads3_background, else raise
 * holent:background with a message naming the field.  (AdS_{d+1}
 * backgrounds are checked by the core when a gateway unpacks them.)
 * The wrappers' private __holent_check_bg__ calls it: one compiled call checks every field the wrappers and gateways read
 * in a fraction of the time Octave code takes.  GPL-3.0-or-later.  */
#include <math.h>
#include <string.h>
#include "holent_gw.h"

static const char FN[] = "__holent_bgcheck__";

static const mxArray *
get (const mxArray *s, const char *f, const char *maker)
{
  const mxArray *a = mxGetField (s, 0, f);
  if (a == NULL)
    mexErrMsgIdAndTxt ("holent:background",
                       "BG is missing field '%s': make it with %s", f, maker);
  return a;
}

/* A real double scalar, not NaN.  */
static double
num (const mxArray *s, const char *f, const char *maker)
{
  const mxArray *a = get (s, f, maker);
  if (!mxIsDouble (a) || mxIsComplex (a) || mxIsSparse (a)
      || mxGetNumberOfElements (a) != 1 || isnan (mxGetPr (a)[0]))
    mexErrMsgIdAndTxt ("holent:background",
                       "BG.%s must be a real double scalar, not NaN: make BG with %s",
                       f, maker);
  return mxGetPr (a)[0];
}

/* true, false, 0 or 1.  */
static void
flag (const mxArray *s, const char *f, const char *maker)
{
  const mxArray *a = get (s, f, maker);
  double v = -1.0;
  if (mxGetNumberOfElements (a) == 1 && !mxIsSparse (a) && !mxIsComplex (a))
    {
      if (mxIsLogical (a))
        v = mxGetLogicals (a)[0] ? 1.0 : 0.0;
      else if (mxIsDouble (a))
        v = mxGetPr (a)[0];
    }
  if (!(v == 0.0 || v == 1.0))
    mexErrMsgIdAndTxt ("holent:background",
                       "BG.%s must be true or false: make BG with %s", f,
                       maker);
}

static void
word (const mxArray *s, const char *f, const char *maker, char *buf,
      size_t n)
{
  const mxArray *a = get (s, f, maker);
  if (!mxIsChar (a) || mxGetM (a) != 1 || mxGetN (a) + 1 > n
      || mxGetString (a, buf, (mwSize) n) != 0)
    mexErrMsgIdAndTxt ("holent:background",
                       "BG.%s must be a short string: make BG with %s", f,
                       maker);
}

static void
check_ads3 (const mxArray *s)
{
  static const char M[] = "ads3_background";
  static const char *line[] = { "poincare", "planar_btz",
                                "planar_rotating_btz" };
  static const char *circ[] = { "global_ads", "btz", "thermal_ads",
                                "rotating_btz", "conical_defect" };
  char bulk[32], boundary[16];
  int known = 0, circle = 0;
  size_t k;
  holent_geo_bg bg;
  word (s, "bulk", M, bulk, sizeof bulk);
  for (k = 0; k < sizeof line / sizeof line[0]; k++)
    if (strcmp (bulk, line[k]) == 0)
      known = 1;
  for (k = 0; k < sizeof circ / sizeof circ[0]; k++)
    if (strcmp (bulk, circ[k]) == 0)
      known = circle = 1;
  if (!known)
    mexErrMsgIdAndTxt ("holent:background",
                       "unknown BG.bulk '%s': make BG with %s", bulk, M);
  word (s, "boundary", M, boundary, sizeof boundary);
  if (strcmp (boundary, circle ? "circle" : "line") != 0)
    mexErrMsgIdAndTxt ("holent:background",
                       "BG.boundary must be \"%s\" for the bulk '%s'",
                       circle ? "circle" : "line", bulk);
  double L = num (s, "circumference", M);
  if (circle ? !(L > 0 && isfinite (L)) : !(L == INFINITY))
    mexErrMsgIdAndTxt ("holent:background",
                       "BG.circumference must be %s", circle
                       ? "positive and finite on a circle" : "Inf on a line");
  double eps = num (s, "cutoff", M), c = num (s, "c", M);
  if (!(eps > 0 && isfinite (eps)))
    mexErrMsgIdAndTxt ("holent:background",
                       "BG.cutoff must be positive and finite");
  if (!(c > 0 && isfinite (c)))
    mexErrMsgIdAndTxt ("holent:background", "BG.c must be positive and finite");
  if (!(num (s, "beta_L", M) > 0) || !(num (s, "beta_R", M) > 0))
    mexErrMsgIdAndTxt ("holent:background",
                       "BG.beta_L and BG.beta_R must be positive (Inf: zero "
                       "temperature)");
  double alpha = num (s, "alpha", M);
  if (!(alpha > 0 && alpha <= 1))
    mexErrMsgIdAndTxt ("holent:background", "BG.alpha must lie in (0, 1]");
  double sbh = num (s, "S_BH", M);
  if (!(sbh >= 0) || (circle && !isfinite (sbh)))
    mexErrMsgIdAndTxt ("holent:background",
                       "BG.S_BH must be nonnegative (and finite on a circle)");
  flag (s, "horizon", M);
  flag (s, "pure", M);
  /* What the bulk itself needs (finite temperatures for BTZ ...).  */
  holent_gw_bg (s, FN, &bg);
}

void
mexFunction (int nlhs, mxArray *plhs[], int nrhs, const mxArray *prhs[])
{
  (void) plhs;
  holent_gw_init ();
  holent_gw_nargs (FN, nlhs, 0, nrhs, 1, 1);
  if (!mxIsStruct (prhs[0]) || mxGetNumberOfElements (prhs[0]) != 1)
    mexErrMsgIdAndTxt ("holent:background",
                       "BG must be a scalar background struct made by "
                       "ads3_background");
  check_ads3 (prhs[0]);
}
