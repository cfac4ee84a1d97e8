/* holent_gw.c: shared gateway helpers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <string.h>
#include <strings.h>
#include <gsl/gsl_errno.h>
#include "holent_gw.h"
#include "holent_gw_poll.h"

void
holent_gw_init (void)
{
  gsl_set_error_handler_off ();
}

void
holent_gw_raise (const char *fn, int status, const char *name, size_t index,
                 const char *fmt, ...)
{
  char id[64], msg[1024];
  size_t k = 0;
  holent_gw_poll_end ();  /* the message starts on a line of its own */
  if (status == HOLENT_EINTR)
    holent_gw_interrupt ();  /* Ctrl-C: back to the prompt, no error */
  if (status == HOLENT_SUCCESS)
    status = HOLENT_EINTERNAL;
  snprintf (id, sizeof id, "holent:%s", holent_status_name (status));
  if (fn != NULL && fn[0] != '\0')
    k += (size_t) snprintf (msg + k, sizeof msg - k, "%s: ", fn);
  if (name != NULL && name[0] != '\0' && k < sizeof msg)
    k += (size_t) (index == HOLENT_NOINDEX
                   ? snprintf (msg + k, sizeof msg - k, "%s: ", name)
                   : snprintf (msg + k, sizeof msg - k, "%s(%zu): ", name,
                               index + 1));
  if (k < sizeof msg)
    {
      if (fmt == NULL)
        snprintf (msg + k, sizeof msg - k, "%s", holent_strerror (status));
      else
        {
          va_list ap;
          va_start (ap, fmt);
          vsnprintf (msg + k, sizeof msg - k, fmt, ap);
          va_end (ap);
        }
    }
  /* error (struct) keeps the message as it is: mexErrMsgIdAndTxt would
     put the gateway's name in front.  */
  const char *fields[] = { "message", "identifier" };
  mxArray *s = mxCreateStructMatrix (1, 1, 2, fields);
  mxSetField (s, 0, "message", mxCreateString (msg));
  mxSetField (s, 0, "identifier", mxCreateString (id));
  mexCallMATLAB (0, NULL, 1, &s, "error");
  mexErrMsgIdAndTxt (id, "%s", msg);  /* not reached */
#if defined(__GNUC__)
  __builtin_unreachable ();
#endif
}

void
holent_gw_raise_err (const char *fn, const holent_err *e,
                     const char *const *names, size_t nnames)
{
  const char *name = (e->arg >= 0 && (size_t) e->arg < nnames)
                     ? names[e->arg] : NULL;
  holent_gw_raise (fn, e->status, name, e->index, "%s",
                   e->reason[0] ? e->reason : holent_strerror (e->status));
}

void
holent_gw_nargs (const char *fn, int nlhs, int maxout, int nrhs, int minin,
                 int maxin)
{
  if (nrhs < minin || nrhs > maxin)
    holent_gw_raise (fn, HOLENT_ENARGS, NULL, HOLENT_NOINDEX,
                     "expected %d to %d inputs, got %d", minin, maxin, nrhs);
  if (nlhs > maxout)
    holent_gw_raise (fn, HOLENT_ENARGS, NULL, HOLENT_NOINDEX,
                     "at most %d outputs, %d requested", maxout, nlhs);
}

const double *
holent_gw_real (const mxArray *a, const char *fn, const char *name,
                size_t *n)
{
  if (a == NULL || !mxIsDouble (a) || mxIsComplex (a) || mxIsSparse (a))
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "%s must be a real, full, double array", name);
  *n = mxGetNumberOfElements (a);
  return mxGetPr (a);
}

double
holent_gw_scalar (const mxArray *a, const char *fn, const char *name)
{
  size_t n;
  const double *p = holent_gw_real (a, fn, name, &n);
  if (n != 1)
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "%s must be a scalar", name);
  if (isnan (p[0]))
    holent_gw_raise (fn, HOLENT_ENAN, NULL, HOLENT_NOINDEX,
                     "%s must not be NaN", name);
  return p[0];
}

void
holent_gw_string (const mxArray *a, const char *fn, const char *name,
                  char *buf, size_t bufsz)
{
  if (a == NULL || !mxIsChar (a) || mxGetM (a) > 1
      || mxGetN (a) + 1 > bufsz
      || mxGetString (a, buf, (mwSize) bufsz) != 0)
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "%s must be a short string", name);
}

/* The unpacker of ads3_background structs: the struct's parameters go to
   the core constructor (holent_bg3_init, the one validator), and every
   derived field must match what it builds.  Errors are
   holent:background naming FN and the field.  */

#define BG_MAKE "make BG with ads3_background"

static const mxArray *
bg_field (const mxArray *s, const char *fn, const char *field)
{
  const mxArray *f = mxGetField (s, 0, field);
  if (f == NULL)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG is not a background struct made by "
                     "ads3_background: field '%s' is missing", field);
  return f;
}

static void
bg_word (const mxArray *s, const char *fn, const char *field, char *buf,
         size_t n)
{
  const mxArray *a = bg_field (s, fn, field);
  if (!mxIsChar (a) || mxGetM (a) > 1 || mxGetN (a) + 1 > n
      || mxGetString (a, buf, (mwSize) n) != 0)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG.%s must be a short string: " BG_MAKE, field);
}

static double
bg_num (const mxArray *s, const char *fn, const char *field)
{
  const mxArray *a = bg_field (s, fn, field);
  if (!mxIsDouble (a) || mxIsComplex (a) || mxIsSparse (a)
      || mxGetNumberOfElements (a) != 1 || isnan (mxGetPr (a)[0]))
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG.%s must be a real double scalar, not NaN: " BG_MAKE,
                     field);
  return mxGetPr (a)[0];
}

static int
bg_flag (const mxArray *s, const char *fn, const char *field)
{
  const mxArray *a = bg_field (s, fn, field);
  double v = -1.0;
  if (mxGetNumberOfElements (a) == 1 && !mxIsSparse (a) && !mxIsComplex (a))
    {
      if (mxIsLogical (a))
        v = mxGetLogicals (a)[0] ? 1.0 : 0.0;
      else if (mxIsDouble (a))
        v = mxGetPr (a)[0];
    }
  if (!(v == 0.0 || v == 1.0))
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG.%s must be true or false: " BG_MAKE, field);
  return v == 1.0;
}

/* Stored and rebuilt values agree (rounding aside: the struct may have
   been made from other but equivalent parameters, beta and Omega, say).  */
static int
bg_same (double a, double b)
{
  return a == b
         || (isfinite (a) && isfinite (b)
             && fabs (a - b) <= 1e-12 * fmax (fabs (a), fabs (b)));
}

void
holent_gw_bg3 (const mxArray *s, const char *fn, holent_bg3 *bg)
{
  char bulk[32], word[32];
  holent_bg3_spec sp;
  holent_err e;
  if (s == NULL || !mxIsStruct (s) || mxGetNumberOfElements (s) != 1)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG must be a background struct made by "
                     "ads3_background");
  /* a boundary with branes has its own gateway (rt_entropy,
     interval_entropy, page_curve): said once here for every other one */
  const mxArray *st = mxGetField (s, 0, "state");
  if (st != NULL && mxIsChar (st) && mxGetString (st, word, sizeof word) == 0
      && (strcmp (word, "bcft") == 0 || strcmp (word, "bcft_tfd") == 0))
    holent_gw_raise (fn, HOLENT_EUNSUP, NULL, HOLENT_NOINDEX,
                     "BG is a BCFT background (a boundary and a brane), "
                     "not supported on this path (this function, or "
                     "regions with endpoint times); rt_entropy, "
                     "interval_entropy and page_curve take BCFT regions "
                     "at one boundary time");
  bg_word (s, fn, "bulk", bulk, sizeof bulk);
  int b = holent_bg3_bulk_from_name (bulk);
  if (b < 0)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "unknown BG.bulk '%s': " BG_MAKE, bulk);
  memset (&sp, 0, sizeof sp);
  switch (b)
    {
    case HOLENT_BULK_POINCARE:
    case HOLENT_BULK_GLOBAL_ADS:
      sp.state = HOLENT_BG3_VACUUM;
      break;
    case HOLENT_BULK_CONICAL_DEFECT:
      sp.state = HOLENT_BG3_HEAVY;
      break;
    case HOLENT_BULK_ROTATING_BTZ:
    case HOLENT_BULK_PLANAR_ROTATING_BTZ:
      sp.state = HOLENT_BG3_ROTATING;
      break;
    default:
      sp.state = HOLENT_BG3_THERMAL;
      break;
    }
  sp.circle = !(b == HOLENT_BULK_POINCARE || b == HOLENT_BULK_PLANAR_BTZ
                || b == HOLENT_BULK_PLANAR_ROTATING_BTZ);
  bg_word (s, fn, "boundary", word, sizeof word);
  if (strcmp (word, sp.circle ? "circle" : "line") != 0)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG.boundary must be \"%s\" for the bulk '%s'",
                     sp.circle ? "circle" : "line", bulk);
  /* the thermofield double is read as one of its exteriors */
  bg_word (s, fn, "state", word, sizeof word);
  if (b == HOLENT_BULK_THERMAL_ADS && strcmp (word, "rotating") == 0)
    sp.state = HOLENT_BG3_ROTATING;  /* rotating, below Hawking-Page */
  if (strcmp (word, holent_bg3_state_name (sp.state)) != 0
      && !(strcmp (word, "tfd") == 0 && (b == HOLENT_BULK_BTZ
                                         || b == HOLENT_BULK_PLANAR_BTZ)))
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG.state '%s' does not fit the bulk '%s': " BG_MAKE,
                     word, bulk);

  /* the parameters */
  static const struct { const char *field; int param; } par[] = {
    { "c", HOLENT_BG3_C }, { "G", HOLENT_BG3_G }, { "ell", HOLENT_BG3_ELL },
    { "cutoff", HOLENT_BG3_CUTOFF },
    { "circumference", HOLENT_BG3_CIRCUMFERENCE },
    { "beta_L", HOLENT_BG3_BETA_L }, { "beta_R", HOLENT_BG3_BETA_R },
    { "alpha", HOLENT_BG3_ALPHA } };
  double v[sizeof par / sizeof par[0]];
  for (size_t k = 0; k < sizeof par / sizeof par[0]; k++)
    {
      v[k] = bg_num (s, fn, par[k].field);
      sp.value[par[k].param] = v[k];
    }
  sp.given = (1u << HOLENT_BG3_C) | (1u << HOLENT_BG3_G)
             | (1u << HOLENT_BG3_ELL) | (1u << HOLENT_BG3_CUTOFF);
  if (sp.circle)
    sp.given |= 1u << HOLENT_BG3_CIRCUMFERENCE;
  switch (sp.state)
    {
    case HOLENT_BG3_THERMAL:
      sp.given |= 1u << HOLENT_BG3_BETA;
      sp.value[HOLENT_BG3_BETA] = sp.value[HOLENT_BG3_BETA_L];
      break;
    case HOLENT_BG3_ROTATING:
      sp.given |= (1u << HOLENT_BG3_BETA_L) | (1u << HOLENT_BG3_BETA_R);
      break;
    case HOLENT_BG3_HEAVY:
      sp.given |= 1u << HOLENT_BG3_ALPHA;
      break;
    default:
      break;
    }
  if (sp.circle && (sp.state == HOLENT_BG3_THERMAL
                    || sp.state == HOLENT_BG3_ROTATING))
    {
      sp.given |= 1u << HOLENT_BG3_SADDLE;
      sp.value[HOLENT_BG3_SADDLE] = b == HOLENT_BULK_THERMAL_ADS
                                    ? HOLENT_BG3_SADDLE_THERMAL_ADS
                                    : HOLENT_BG3_SADDLE_BTZ;
    }
  if (holent_bg3_init (bg, &sp, &e))
    {
      if (e.arg >= 0)
        holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                         "BG.%s: " BG_MAKE, e.reason);
      holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                       "BG: %s: " BG_MAKE, e.reason);
    }

  /* every derived field as the core builds it */
  if (!sp.circle && !isinf (v[4]))
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG.circumference must be Inf on a line");
  const struct { const char *field; double want; } der[] = {
    { "beta_L", bg->beta_L }, { "beta_R", bg->beta_R },
    { "alpha", bg->alpha }, { "beta", bg->beta },
    { "T", bg->T }, { "T_L", bg->T_L }, { "T_R", bg->T_R },
    { "Omega", bg->Omega }, { "h", bg->h }, { "S_BH", bg->S_BH },
    { "entropy_density", bg->s_density }, { "r_plus", bg->r_plus },
    { "r_minus", bg->r_minus }, { "M", bg->M }, { "J", bg->J },
    { "L0", bg->L0 }, { "Lbar0", bg->Lbar0 } };
  for (size_t k = 0; k < sizeof der / sizeof der[0]; k++)
    {
      double x = bg_num (s, fn, der[k].field);
      if (!bg_same (x, der[k].want))
        holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                         "BG.%s = %g does not match its parameters (%g): "
                         BG_MAKE, der[k].field, x, der[k].want);
    }
  if (bg_flag (s, fn, "horizon") != bg->horizon
      || bg_flag (s, fn, "pure") != bg->pure)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG.horizon and BG.pure must be %s and %s for the "
                     "bulk '%s': " BG_MAKE, bg->horizon ? "true" : "false",
                     bg->pure ? "true" : "false", bulk);
  bg_word (s, fn, "saddle", word, sizeof word);
  if (strcmp (word, holent_bg3_saddle_name (bg->saddle)) != 0)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG.saddle must be '%s' for the bulk '%s': " BG_MAKE,
                     holent_bg3_saddle_name (bg->saddle), bulk);
}

void
holent_gw_bg (const mxArray *s, const char *fn, holent_geo_bg *geo)
{
  holent_bg3 bg;
  holent_gw_bg3 (s, fn, &bg);
  *geo = bg.geo;
}

/* A numeric option value as a double; holent:type naming it otherwise.  */
static double
opt_num (const mxArray *a, const char *fn, const char *name)
{
  if (!mxIsNumeric (a) || mxIsLogical (a) || mxGetNumberOfElements (a) != 1)
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "%s must be a real numeric scalar", name);
  if (mxIsComplex (a) || mxIsSparse (a))
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "%s must be real and full, not complex or sparse", name);
  return mxGetScalar (a);
}

void
holent_gw_units (const mxArray *o, const char *fn, double *c, double *G,
                 double *ell)
{
  static const int p[] = { HOLENT_BG3_C, HOLENT_BG3_G, HOLENT_BG3_ELL };
  holent_bg3_spec sp;
  holent_err e;
  memset (&sp, 0, sizeof sp);
  if (o == NULL || !mxIsStruct (o) || mxGetNumberOfElements (o) != 1)
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "OPTS must be a scalar struct of options");
  for (int k = 0; k < 3; k++)
    {
      const char *name = holent_bg3_param_name (p[k]);
      const mxArray *a = mxGetField (o, 0, name);
      if (a != NULL)
        {
          sp.given |= 1u << p[k];
          sp.value[p[k]] = opt_num (a, fn, name);
        }
    }
  if (holent_bg3_units (&sp, c, G, ell, &e))
    holent_gw_raise (fn, e.status, NULL, HOLENT_NOINDEX, "%s", e.reason);
}

void
holent_gw_bg3_opts (const mxArray *o, const char *fn, holent_bg3_spec *sp)
{
  if (o == NULL || !mxIsStruct (o) || mxGetNumberOfElements (o) != 1)
    holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                     "OPTS must be a scalar struct of options");
  for (int p = 0; p < HOLENT_BG3_NPARAM; p++)
    {
      const char *name = holent_bg3_param_name (p);
      const mxArray *a = mxGetField (o, 0, name);
      if (a == NULL)
        continue;
      sp->given |= 1u << p;
      if (p == HOLENT_BG3_SADDLE)
        {
          char w[16];
          int k;
          if (!mxIsChar (a) || mxGetM (a) > 1 || mxGetN (a) + 1 > sizeof w
              || mxGetString (a, w, sizeof w) != 0)
            holent_gw_raise (fn, HOLENT_ETYPE, NULL, HOLENT_NOINDEX,
                             "saddle must be a short string");
          for (k = HOLENT_BG3_SADDLE_DOMINANT;
               k <= HOLENT_BG3_SADDLE_THERMAL_ADS; k++)
            if (strcasecmp (w, holent_bg3_saddle_name (k)) == 0)
              break;
          if (k > HOLENT_BG3_SADDLE_THERMAL_ADS)
            holent_gw_raise (fn, HOLENT_EOPTION, NULL, HOLENT_NOINDEX,
                             "unknown saddle '%s' (expected one of: "
                             "dominant, btz, thermal_ads)", w);
          sp->value[p] = k;
        }
      else if (p < HOLENT_BG3_SHOCK_ALPHA)  /* shocks: the tfd's own */
        sp->value[p] = opt_num (a, fn, name);
    }
}

void
holent_gw_fail (int status, const char *fn, const char *name, size_t index)
{
  holent_gw_raise (fn, status, name, index, NULL);
}

mxArray *
holent_gw_like (const mxArray *a)
{
  return mxCreateNumericArray (mxGetNumberOfDimensions (a),
                               mxGetDimensions (a), mxDOUBLE_CLASS, mxREAL);
}

size_t
holent_gw_regions (const mxArray *A, const char *fn, const char *name,
                   size_t *maxrows)
{
  char nm[80];
  size_t nreg = mxIsCell (A) ? mxGetNumberOfElements (A) : 1, mr = 0;
  if (mxIsCell (A) && nreg == 0)
    holent_gw_raise (fn, HOLENT_EEMPTY, name, HOLENT_NOINDEX,
                     "is an empty cell array: give a region or a non-empty "
                     "cell of regions");
  for (size_t k = 0; k < nreg; k++)
    {
      const mxArray *a = holent_gw_region (A, k);
      holent_gw_region_name (nm, sizeof nm, name, A, k, HOLENT_NOINDEX);
      if (a == NULL || !mxIsDouble (a) || mxIsComplex (a) || mxIsSparse (a)
          || mxGetNumberOfDimensions (a) != 2)
        holent_gw_raise (fn, HOLENT_ETYPE, nm, HOLENT_NOINDEX,
                         "must be a real n x 2 matrix of [start, end] rows");
      if (mxGetM (a) == 0)
        holent_gw_raise (fn, HOLENT_EEMPTY, nm, HOLENT_NOINDEX,
                         "has no intervals");
      if (mxGetN (a) != 2)
        holent_gw_raise (fn, HOLENT_ETYPE, nm, HOLENT_NOINDEX,
                         "must be an n x 2 matrix of [start, end] rows, got "
                         "%zu columns", (size_t) mxGetN (a));
      if (mxGetM (a) > mr)
        mr = mxGetM (a);
    }
  if (maxrows)
    *maxrows = mr;
  return nreg;
}

const mxArray *
holent_gw_region (const mxArray *A, size_t k)
{
  return mxIsCell (A) ? mxGetCell (A, k) : A;
}

void
holent_gw_region_name (char *buf, size_t sz, const char *name,
                       const mxArray *A, size_t k, size_t row)
{
  int n = mxIsCell (A) ? snprintf (buf, sz, "%s{%zu}", name, k + 1)
                       : snprintf (buf, sz, "%s", name);
  if (row != HOLENT_NOINDEX && n >= 0 && (size_t) n < sz)
    snprintf (buf + n, sz - (size_t) n, "(%zu,:)", row + 1);
}

mxArray *
holent_gw_per_region (const mxArray *A)
{
  if (!mxIsCell (A))
    return mxCreateDoubleScalar (0.0);
  return mxCreateNumericArray (mxGetNumberOfDimensions (A),
                               mxGetDimensions (A), mxDOUBLE_CLASS, mxREAL);
}

mxArray *
holent_gw_per_region_struct (const mxArray *A, int nf, const char **fields)
{
  if (!mxIsCell (A))
    return mxCreateStructMatrix (1, 1, nf, fields);
  return mxCreateStructArray (mxGetNumberOfDimensions (A),
                              mxGetDimensions (A), nf, fields);
}

mxArray *
holent_gw_pairs (size_t np, const size_t *pairs, const double *pts,
                 mxArray **coords)
{
  mxArray *p = mxCreateDoubleMatrix (np, 2, mxREAL);
  double *pp = mxGetPr (p), *pc = NULL;
  if (coords)
    {
      *coords = mxCreateDoubleMatrix (np, 2, mxREAL);
      pc = mxGetPr (*coords);
    }
  for (size_t i = 0; i < np; i++)
    for (size_t j = 0; j < 2; j++)
      {
        pp[i + j * np] = (double) pairs[2 * i + j] + 1.0;
        if (pc)
          pc[i + j * np] = pts[pairs[2 * i + j]];
      }
  return p;
}

mxArray *
holent_gw_column (size_t n, const double *v)
{
  mxArray *a = mxCreateDoubleMatrix (n, 1, mxREAL);
  if (n)
    memcpy (mxGetPr (a), v, n * sizeof (double));
  return a;
}

mxArray *
holent_gw_columns (size_t n, const double *a, const double *b)
{
  mxArray *m = mxCreateDoubleMatrix (n, 2, mxREAL);
  if (n)
    {
      memcpy (mxGetPr (m), a, n * sizeof (double));
      memcpy (mxGetPr (m) + n, b, n * sizeof (double));
    }
  return m;
}

mxArray *
holent_gw_columns3 (size_t n, const double *a, const double *b,
                    const double *c)
{
  mxArray *m = mxCreateDoubleMatrix (n, 3, mxREAL);
  const double *col[3] = { a, b, c };
  for (int k = 0; k < 3 && n > 0; k++)
    memcpy (mxGetPr (m) + k * n, col[k], n * sizeof (double));
  return m;
}
