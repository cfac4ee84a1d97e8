/* holent_status.c: text for the status codes.  GPL-3.0-or-later.  */
#include "holent.h"

const char *
holent_strerror (int status)
{
  switch (status)
    {
    case HOLENT_SUCCESS:   return "success";
    case HOLENT_EINVAL:    return "invalid argument";
    case HOLENT_EDOM:      return "argument outside its domain";
    case HOLENT_ENOMEM:    return "out of memory";
    case HOLENT_EOVERLAP:  return "intervals overlap";
    case HOLENT_EEMPTY:    return "empty or zero-length interval";
    case HOLENT_ENOCONV:   return "iteration did not converge";
    case HOLENT_EUNSUP:    return "not supported for this background";
    case HOLENT_ETOOBIG:   return "problem too large";
    case HOLENT_ECOINCIDE: return "boundary points coincide";
    case HOLENT_EINTR:     return "interrupted";
    case HOLENT_ETIMELIKE: return "boundary points are timelike or null separated";
    default:               return "unknown status";
    }
}
