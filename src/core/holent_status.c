/* holent_status.c: the one table of status codes: name (the Octave
 * identifier is holent:<name>) and default text.
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <stdarg.h>
#include <stdio.h>
#include "holent.h"

static const struct
{
  int status;
  const char *name;
  const char *text;
} table[] = {
  { HOLENT_SUCCESS, "success", "success" },
  { HOLENT_EINVAL, "invalid", "invalid argument" },
  { HOLENT_EDOM, "domain", "argument outside its domain" },
  { HOLENT_ENOMEM, "nomem", "out of memory" },
  { HOLENT_EOVERLAP, "overlap", "intervals overlap" },
  { HOLENT_EEMPTY, "empty", "empty or zero-length interval" },
  { HOLENT_ENOCONV, "noconv", "iteration did not converge" },
  { HOLENT_EUNSUP, "unsupported", "not supported for this background" },
  { HOLENT_ETOOBIG, "toobig", "problem too large" },
  { HOLENT_ECOINCIDE, "coincident", "boundary points coincide" },
  { HOLENT_EINTR, "interrupted", "interrupted" },
  { HOLENT_ETYPE, "type", "wrong type" },
  { HOLENT_ENAN, "nan", "must be a number, not NaN" },
  { HOLENT_ESIZE, "size", "sizes do not agree" },
  { HOLENT_ENARGS, "nargs", "wrong number of arguments" },
  { HOLENT_EBACKGROUND, "background", "not a background of holent" },
  { HOLENT_EINCONSISTENT, "inconsistent", "parameters contradict each other" },
  { HOLENT_EBOUNDARY, "boundary", "boundary kind does not fit" },
  { HOLENT_ECUTOFF, "cutoff", "cutoff too large" },
  { HOLENT_EREACH, "reach", "wider than the background allows" },
  { HOLENT_EMIXED, "mixed", "the state is mixed" },
  { HOLENT_ERANGE, "range", "result outside the representable range" },
  { HOLENT_EOVERROTATING, "overrotating", "|J| > M: no horizon" },
  { HOLENT_ECONICAL, "conical_defect", "a conical defect, not a black hole" },
  { HOLENT_EBELOWVAC, "below_vacuum", "below the vacuum energy" },
  { HOLENT_EOPTION, "option", "unknown or inapplicable option" },
  { HOLENT_EINTERNAL, "internal", "internal error (please report it)" },
  { HOLENT_ETIMELIKE, "timelike",
    "boundary points are timelike or null separated" },
};

#define NTABLE (sizeof table / sizeof table[0])

const char *
holent_strerror (int status)
{
  for (size_t k = 0; k < NTABLE; k++)
    if (table[k].status == status)
      return table[k].text;
  return "unknown status";
}

const char *
holent_status_name (int status)
{
  for (size_t k = 0; k < NTABLE; k++)
    if (table[k].status == status)
      return table[k].name;
  return "internal";
}

void
holent_err_clear (holent_err *e)
{
  if (e == NULL)
    return;
  e->status = HOLENT_SUCCESS;
  e->arg = -1;
  e->index = HOLENT_NOINDEX;
  e->index2 = HOLENT_NOINDEX;
  e->reason[0] = '\0';
}

int
holent_err_set (holent_err *e, int status, int arg, size_t index,
                const char *fmt, ...)
{
  if (e == NULL)
    return status;
  e->status = status;
  e->arg = arg;
  e->index = index;
  e->index2 = HOLENT_NOINDEX;
  if (fmt == NULL)
    snprintf (e->reason, sizeof e->reason, "%s", holent_strerror (status));
  else
    {
      va_list ap;
      va_start (ap, fmt);
      vsnprintf (e->reason, sizeof e->reason, fmt, ap);
      va_end (ap);
    }
  return status;
}
