/* holent_gw.c: shared gateway helpers.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <string.h>
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

static const mxArray *
bg_field (const mxArray *s, const char *fn, const char *field)
{
  const mxArray *f = mxGetField (s, 0, field);
  if (f == NULL)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG is missing field '%s': make it with "
                     "ads3_background", field);
  return f;
}

static const struct
{
  const char *name;
  holent_bulk bulk;
} bulk_names[] = {
  { "poincare", HOLENT_BULK_POINCARE },
  { "global_ads", HOLENT_BULK_GLOBAL_ADS },
  { "planar_btz", HOLENT_BULK_PLANAR_BTZ },
  { "btz", HOLENT_BULK_BTZ },
  { "thermal_ads", HOLENT_BULK_THERMAL_ADS },
  { "rotating_btz", HOLENT_BULK_ROTATING_BTZ },
  { "planar_rotating_btz", HOLENT_BULK_PLANAR_ROTATING_BTZ },
  { "conical_defect", HOLENT_BULK_CONICAL_DEFECT },
};

void
holent_gw_bg (const mxArray *s, const char *fn, holent_geo_bg *bg)
{
  char name[32];
  size_t k, nb = sizeof bulk_names / sizeof bulk_names[0];
  int st;
  if (s == NULL || !mxIsStruct (s) || mxGetNumberOfElements (s) != 1)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG must be a scalar struct from ads3_background");
  holent_gw_string (bg_field (s, fn, "bulk"), fn, "BG.bulk", name,
                    sizeof name);
  for (k = 0; k < nb; k++)
    if (strcmp (name, bulk_names[k].name) == 0)
      break;
  if (k == nb)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "unknown BG.bulk '%s'", name);
  st = holent_geo_bg_init (
      bg, bulk_names[k].bulk,
      holent_gw_scalar (bg_field (s, fn, "circumference"), fn,
                        "BG.circumference"),
      holent_gw_scalar (bg_field (s, fn, "cutoff"), fn, "BG.cutoff"),
      holent_gw_scalar (bg_field (s, fn, "beta_L"), fn, "BG.beta_L"),
      holent_gw_scalar (bg_field (s, fn, "beta_R"), fn, "BG.beta_R"),
      holent_gw_scalar (bg_field (s, fn, "alpha"), fn, "BG.alpha"),
      holent_gw_scalar (bg_field (s, fn, "c"), fn, "BG.c"));
  if (st)
    holent_gw_raise (fn, HOLENT_EBACKGROUND, NULL, HOLENT_NOINDEX,
                     "BG has inconsistent parameters (%s)",
                     holent_strerror (st));
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
