/* holent_gw.c: shared gateway helpers.  GPL-3.0-or-later.  */
#include <math.h>
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
holent_gw_nargs (const char *fn, int nlhs, int maxout, int nrhs, int minin,
                 int maxin)
{
  (void) fn;  /* Octave prefixes messages with the gateway name */
  if (nrhs < minin || nrhs > maxin)
    mexErrMsgIdAndTxt ("holent:nargs", "expected %d to %d inputs, got %d", minin, maxin, nrhs);
  if (nlhs > maxout)
    mexErrMsgIdAndTxt ("holent:nargs", "at most %d outputs, %d requested", maxout, nlhs);
}

const double *
holent_gw_real (const mxArray *a, const char *fn, const char *name,
                size_t *n)
{
  (void) fn;  /* Octave prefixes messages with the gateway name */
  if (a == NULL || !mxIsDouble (a) || mxIsComplex (a) || mxIsSparse (a))
    mexErrMsgIdAndTxt ("holent:type", "%s must be a real, full, double array", name);
  *n = mxGetNumberOfElements (a);
  return mxGetPr (a);
}

double
holent_gw_scalar (const mxArray *a, const char *fn, const char *name)
{
  (void) fn;  /* Octave prefixes messages with the gateway name */
  size_t n;
  const double *p = holent_gw_real (a, fn, name, &n);
  if (n != 1)
    mexErrMsgIdAndTxt ("holent:type", "%s must be a scalar", name);
  if (isnan (p[0]))
    mexErrMsgIdAndTxt ("holent:nan", "%s must not be NaN", name);
  return p[0];
}

void
holent_gw_string (const mxArray *a, const char *fn, const char *name,
                  char *buf, size_t bufsz)
{
  (void) fn;  /* Octave prefixes messages with the gateway name */
  if (a == NULL || !mxIsChar (a) || mxGetM (a) > 1
      || mxGetN (a) + 1 > bufsz
      || mxGetString (a, buf, (mwSize) bufsz) != 0)
    mexErrMsgIdAndTxt ("holent:type", "%s must be a short string", name);
}

static const mxArray *
bg_field (const mxArray *s, const char *fn, const char *field)
{
  (void) fn;  /* Octave prefixes messages with the gateway name */
  const mxArray *f = mxGetField (s, 0, field);
  if (f == NULL)
    mexErrMsgIdAndTxt ("holent:background", "BG is missing field '%s': make it with "
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
  (void) fn;  /* Octave prefixes messages with the gateway name */
  char name[32];
  size_t k, nb = sizeof bulk_names / sizeof bulk_names[0];
  int st;
  if (s == NULL || !mxIsStruct (s) || mxGetNumberOfElements (s) != 1)
    mexErrMsgIdAndTxt ("holent:background", "BG must be a scalar struct from ads3_background");
  holent_gw_string (bg_field (s, fn, "bulk"), fn, "BG.bulk", name,
                    sizeof name);
  for (k = 0; k < nb; k++)
    if (strcmp (name, bulk_names[k].name) == 0)
      break;
  if (k == nb)
    mexErrMsgIdAndTxt ("holent:background", "unknown BG.bulk '%s'",
                       name);
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
    mexErrMsgIdAndTxt ("holent:background", "BG has inconsistent parameters (%s)",
                       holent_strerror (st));
}

void
holent_gw_fail (int status, const char *fn, const char *name, size_t index)
{
  (void) fn;  /* Octave prefixes messages with the gateway name */
  const char *id;
  holent_gw_poll_end ();  /* the message starts on a line of its own */
  if (status == HOLENT_EINTR)
    holent_gw_interrupt ();  /* Ctrl-C: back to the prompt, no error */
  switch (status)
    {
    case HOLENT_EINVAL:    id = "holent:invalid"; break;
    case HOLENT_EDOM:      id = "holent:domain"; break;
    case HOLENT_ENOMEM:    id = "holent:nomem"; break;
    case HOLENT_EOVERLAP:  id = "holent:overlap"; break;
    case HOLENT_EEMPTY:    id = "holent:empty"; break;
    case HOLENT_ENOCONV:   id = "holent:noconv"; break;
    case HOLENT_EUNSUP:    id = "holent:unsupported"; break;
    case HOLENT_ETOOBIG:   id = "holent:toobig"; break;
    case HOLENT_ECOINCIDE: id = "holent:coincident"; break;
    case HOLENT_ETIMELIKE: id = "holent:timelike"; break;
    default:               id = "holent:internal"; break;
    }
  if (index == (size_t) -1)
    mexErrMsgIdAndTxt (id, "%s: %s", name, holent_strerror (status));
  mexErrMsgIdAndTxt (id, "%s(%zu): %s", name, index + 1,
                     holent_strerror (status));
}

mxArray *
holent_gw_like (const mxArray *a)
{
  return mxCreateNumericArray (mxGetNumberOfDimensions (a),
                               mxGetDimensions (a), mxDOUBLE_CLASS, mxREAL);
}
